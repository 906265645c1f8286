package org.mobident.viewer;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Objects;
import java.util.TreeSet;
import org.mobident.report.plot.Axis;

/**
 * What the viewer shows, as an immutable value: every gesture produces a new one. No Swing here,
 * so all the arithmetic of zooming, panning and selecting is tested without a display.
 *
 * <p>Ranges given to and returned by the methods are <em>requested</em> data ranges in the units
 * of {@link #axis()}; the plot widens the one it draws outwards to whole tick steps.
 *
 * @param axis         time or effective mobility
 * @param xRange       the requested x range, or null for the automatic one (peaks, bands, data)
 * @param tickedRuns   indices of the runs drawn, ascending, without repeats
 * @param selectedPeak the peak whose details are shown, or null; always of a ticked run
 * @param bands        whether the library windows are drawn
 */
public record ViewState(Axis axis, XRange xRange, List<Integer> tickedRuns, PeakRef selectedPeak, boolean bands) {

    /** Deepest zoom, as a fraction of the range the data cover (a thousandth: finer shows single samples). */
    public static final double MIN_SPAN_FRACTION = 1e-3;

    /** Span factor of one zoom-in step (wheel notch or button); zooming out divides by it. */
    public static final double ZOOM_STEP = 0.8;

    public ViewState {
        Objects.requireNonNull(axis, "axis");
        tickedRuns = List.copyOf(new TreeSet<>(tickedRuns));
        for (int r : tickedRuns) {
            if (r < 0) {
                throw new IllegalArgumentException("negative run index " + r);
            }
        }
        if (selectedPeak != null && !tickedRuns.contains(selectedPeak.run())) {
            throw new IllegalArgumentException("selected peak of run " + selectedPeak.run() + " which is not shown");
        }
    }

    /** The state at start: automatic range, no peak selected, library windows shown. */
    public static ViewState initial(Axis axis, Collection<Integer> tickedRuns) {
        return new ViewState(axis, null, new ArrayList<>(tickedRuns), null, true);
    }

    /** Whether run {@code index} is drawn. */
    public boolean isTicked(int index) {
        return tickedRuns.contains(index);
    }

    /**
     * Another axis. The x range returns to automatic (a range in seconds means nothing in
     * mobility units); ticked runs and the selected peak stay.
     */
    public ViewState withAxis(Axis newAxis) {
        if (newAxis == axis) {
            return this;
        }
        return new ViewState(newAxis, null, tickedRuns, selectedPeak, bands);
    }

    /** Run {@code index} ticked or not; unticking the run of the selected peak clears the selection. */
    public ViewState withRunTicked(int index, boolean ticked) {
        List<Integer> runs = new ArrayList<>(tickedRuns);
        if (ticked) {
            runs.add(index);
        } else {
            runs.remove(Integer.valueOf(index));
        }
        PeakRef peak = selectedPeak != null && selectedPeak.run() == index && !ticked ? null : selectedPeak;
        return new ViewState(axis, xRange, runs, peak, bands);
    }

    /** Library windows shown or hidden. */
    public ViewState withBands(boolean shown) {
        return new ViewState(axis, xRange, tickedRuns, selectedPeak, shown);
    }

    /**
     * Another selected peak (null: none).
     *
     * @throws IllegalArgumentException when the peak's run is not ticked
     */
    public ViewState withSelectedPeak(PeakRef peak) {
        return new ViewState(axis, xRange, tickedRuns, peak, bands);
    }

    /** Back to the automatic x range; everything else stays. */
    public ViewState reset() {
        return xRange == null ? this : new ViewState(axis, null, tickedRuns, selectedPeak, bands);
    }

    /**
     * Zoomed by {@code factor} (&lt; 1 in, &gt; 1 out) about {@code anchor}: the anchor keeps its
     * place in the range. The span stays between {@link #MIN_SPAN_FRACTION} of the limits and the
     * limits, and the range stays inside them.
     *
     * @param current the range shown now (requested, not widened)
     * @param anchor  x value that stays in place, e.g. under the mouse
     * @param limits  what the data cover
     */
    public ViewState zoomedAt(XRange current, double anchor, double factor, XRange limits) {
        if (!(factor > 0) || !Double.isFinite(factor) || !Double.isFinite(anchor)) {
            throw new IllegalArgumentException("bad zoom: factor " + factor + " at " + anchor);
        }
        double span = clampSpan(current.span() * factor, limits);
        double lo = anchor - (anchor - current.lo()) * span / current.span();
        return withXRange(new XRange(lo, lo + span).keptInside(limits));
    }

    /**
     * Zoomed to the range between {@code a} and {@code b} (either order), e.g. a range dragged
     * with the mouse; a range narrower than the deepest zoom is widened about its centre.
     */
    public ViewState zoomedTo(double a, double b, XRange limits) {
        double lo = Math.min(a, b);
        double hi = Math.max(a, b);
        if (!(Double.isFinite(lo) && Double.isFinite(hi))) {
            throw new IllegalArgumentException("bad zoom range " + a + ".." + b);
        }
        double span = clampSpan(hi - lo, limits);
        double centre = (lo + hi) / 2;
        return withXRange(new XRange(centre - span / 2, centre + span / 2).keptInside(limits));
    }

    /** The current range moved by {@code dx} axis units, stopped at the limits. */
    public ViewState pannedBy(XRange current, double dx, XRange limits) {
        if (!Double.isFinite(dx)) {
            throw new IllegalArgumentException("bad pan " + dx);
        }
        return withXRange(current.shifted(dx).keptInside(limits));
    }

    private ViewState withXRange(XRange r) {
        return new ViewState(axis, r, tickedRuns, selectedPeak, bands);
    }

    private static double clampSpan(double span, XRange limits) {
        return Math.max(limits.span() * MIN_SPAN_FRACTION, Math.min(limits.span(), span));
    }
}
