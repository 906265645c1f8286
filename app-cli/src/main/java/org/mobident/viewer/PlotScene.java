package org.mobident.viewer;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.BufferGroups;
import org.mobident.report.plot.PlotLayout;
import org.mobident.report.plot.PlotModel;
import org.mobident.result.MobilityScale;
import org.mobident.result.Peak;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;

/**
 * What one {@link ViewState} of one {@link ViewerData} looks like, before any pixel: the plot
 * model, the positions of the pickable peaks, the range shown and the range the data cover.
 * Immutable. Pixel questions (which peak is under the mouse, which x is at a column) are answered
 * through the {@link PlotLayout} the plot was drawn with.
 */
public final class PlotScene {

    /** How far from a peak's apex, horizontally in pixels, a click still selects it. */
    public static final double PICK_RADIUS_PX = 10;

    /**
     * A peak's apex in data units.
     *
     * @param ref which peak
     * @param x   apex position on the current axis
     * @param y   signal at the apex
     */
    public record PeakSpot(PeakRef ref, double x, double y) {
    }

    private final ViewState state;
    private final PlotModel model;
    private final List<PeakSpot> spots;
    private final XRange current;
    private final XRange limits;
    private final boolean hasCurves;
    /** Run index to the index of its curve in the model (runs drawn only). */
    private final Map<Integer, Integer> seriesOfRun;
    private final List<BufferGroups.Group> bufferGroups;

    private PlotScene(ViewState state, PlotModel model, List<PeakSpot> spots, XRange limits,
                      Map<Integer, Integer> seriesOfRun, List<BufferGroups.Group> bufferGroups) {
        this.state = state;
        this.model = model;
        this.spots = List.copyOf(spots);
        this.seriesOfRun = Map.copyOf(seriesOfRun);
        this.bufferGroups = List.copyOf(bufferGroups);
        this.current = new XRange(model.xMin(), model.xMax());
        this.limits = limits.union(current);
        this.hasCurves = !model.series().isEmpty();
    }

    /** The scene of {@code state} over {@code data}. */
    public static PlotScene of(ViewerData data, ViewState state) {
        Axis axis = state.axis();
        PlotModel.Builder b = PlotModel.builder(axis).peakLabels(true);
        List<PeakSpot> spots = new ArrayList<>();
        List<String> added = new ArrayList<>();
        List<Integer> addedRuns = new ArrayList<>();
        for (int i : state.tickedRuns()) {
            if (i >= data.runs().size() || !data.runs().get(i).drawable()) {
                continue;
            }
            ViewerRun run = data.runs().get(i);
            b.run(run.trace(), run.result());
            added.add(run.result().spec().name());
            addedRuns.add(i);
            MobilityScale scale = run.result().scale();
            if (axis == Axis.MOBILITY && scale == null) {
                continue;
            }
            List<PeakResult> peaks = run.result().peaks();
            // the same mobilities the plot draws: those compared with the library
            for (int k = 0; k < peaks.size(); k++) {
                Peak p = peaks.get(k).peak();
                if (p == null) {
                    continue;
                }
                double x = axis == Axis.TIME ? p.apexTimeS() : run.result().comparedMobility(scale.mobility(p.apexTimeS()));
                if (Double.isFinite(x)) {
                    spots.add(new PeakSpot(new PeakRef(i, k), x, PlotModel.apexSignal(run.trace(), p)));
                }
            }
        }
        if (state.bands()) {
            b.library(data.library(), data.bandRule()).bandLabels(true);
        }
        if (state.xRange() != null) {
            b.xRange(state.xRange().lo(), state.xRange().hi());
        }
        PlotModel model = b.build();
        if (!model.omittedRuns().isEmpty()) {
            // a run the model could not place has no peaks to pick either
            spots.removeIf(s -> model.omittedRuns().contains(data.runs().get(s.ref().run()).name()));
        }
        // the curves are the added runs in order, less those the model could not place
        Map<Integer, Integer> seriesOfRun = new HashMap<>();
        List<RunResult> drawn = new ArrayList<>();
        int series = 0;
        for (int k = 0; k < added.size(); k++) {
            if (!model.omittedRuns().contains(added.get(k))) {
                seriesOfRun.put(addedRuns.get(k), series++);
                drawn.add(data.runs().get(addedRuns.get(k)).result());
            }
        }
        return new PlotScene(state, model, spots, dataExtent(model), seriesOfRun, BufferGroups.of(drawn));
    }

    /**
     * The buffer groups ({@link BufferGroups}) of the drawn runs, in list order: more than one
     * means runs of different buffers, or anion and cation runs, share this one axis (the plot
     * command and the report draw them in panels of their own).
     */
    public List<BufferGroups.Group> bufferGroups() {
        return bufferGroups;
    }

    /** The colour ("#rrggbb") run {@code run} is drawn in, or null when it is not drawn. */
    public String colourOf(int run) {
        Integer series = seriesOfRun.get(run);
        return series == null ? null : PlotModel.seriesColour(series);
    }

    /**
     * The peak next to {@code ref} along the axis, {@code step} peaks to the right (positive) or
     * left (negative), for stepping through the peaks with the keyboard; peaks of overlaid runs at
     * the same position are taken in run order. Without a current peak, the first peak (stepping
     * right) or the last (stepping left). Null when there is no peak; at either end it stays there.
     */
    public PeakRef neighbour(PeakRef ref, int step) {
        if (spots.isEmpty() || step == 0) {
            return spots.isEmpty() ? null : ref;
        }
        List<PeakSpot> byX = new ArrayList<>(spots);
        byX.sort(Comparator.comparingDouble(PeakSpot::x).thenComparingInt(p -> p.ref().run())
                .thenComparingInt(p -> p.ref().peak()));
        int at = -1;
        for (int i = 0; i < byX.size(); i++) {
            if (byX.get(i).ref().equals(ref)) {
                at = i;
            }
        }
        int next = at < 0 ? (step > 0 ? 0 : byX.size() - 1) : Math.max(0, Math.min(byX.size() - 1, at + step));
        return byX.get(next).ref();
    }

    public ViewState state() {
        return state;
    }

    public PlotModel model() {
        return model;
    }

    /** Apexes of the peaks that can be picked, in run order. */
    public List<PeakSpot> spots() {
        return spots;
    }

    /** The requested range now shown (before the plot widens it to whole ticks). */
    public XRange current() {
        return current;
    }

    /** The range the drawn curves cover (on the mobility axis cut at ±{@link PlotModel#MAX_DISPLAY_MOBILITY}). */
    public XRange limits() {
        return limits;
    }

    /** Whether any curve is drawn. */
    public boolean hasCurves() {
        return hasCurves;
    }

    /** Names of ticked runs that cannot be placed on this axis (mobility axis without a scale). */
    public List<String> omittedRuns() {
        return model.omittedRuns();
    }

    /** The apex of {@code ref}, or null when it is not in this scene. */
    public PeakSpot spotOf(PeakRef ref) {
        for (PeakSpot s : spots) {
            if (s.ref().equals(ref)) {
                return s;
            }
        }
        return null;
    }

    /**
     * The peak a click at pixel ({@code px}, {@code py}) means: among the peaks whose apex column
     * lies within {@link #PICK_RADIUS_PX} of {@code px} (and inside the plot area), the one whose
     * apex is nearest in straight pixel distance, so that of peaks lined up across overlaid runs
     * the one on the clicked curve wins. Null when no peak is that close.
     */
    public PeakRef pick(PlotLayout layout, double px, double py) {
        PeakRef best = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (PeakSpot s : spots) {
            double x = layout.px(s.x());
            if (x < layout.plotLeft() || x > layout.plotRight()) {
                continue;
            }
            double dx = Math.abs(x - px);
            if (dx > PICK_RADIUS_PX) {
                continue;
            }
            double d = Math.hypot(dx, layout.py(s.y()) - py);
            if (d < bestDistance) {
                bestDistance = d;
                best = s.ref();
            }
        }
        return best;
    }

    /** The x value (axis units) at pixel column {@code px} of {@code layout}; the inverse of {@link PlotLayout#px}. */
    public static double dataX(PlotLayout layout, double px) {
        double first = layout.xTicks().first();
        double last = layout.xTicks().last();
        return first + (px - layout.plotLeft()) / (layout.plotRight() - layout.plotLeft()) * (last - first);
    }

    private static XRange dataExtent(PlotModel model) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (PlotModel.Series s : model.series()) {
            for (int i = 0; i < s.size(); i++) {
                double x = s.x(i);
                if (model.axis() == Axis.MOBILITY && Math.abs(x) > PlotModel.MAX_DISPLAY_MOBILITY) {
                    continue;
                }
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        if (!(hi > lo)) {
            return new XRange(model.xMin(), model.xMax());
        }
        return new XRange(lo, hi);
    }
}
