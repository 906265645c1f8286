package org.mobident.report.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MobilityScale;
import org.mobident.result.Peak;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.settings.MatchSettings;
import org.mobident.trace.Trace;

/**
 * An immutable description of one electropherogram plot: what to draw, in data units, before
 * any pixel is decided. {@link PlotLayout} maps it to pixels; {@link SvgPlot} and
 * {@link PngPlot} draw it.
 *
 * <p>On the {@link Axis#MOBILITY} axis each sample's time is converted with its run's
 * {@link MobilityScale}; since μ = a/t' + b is monotonic only for t' &gt; 0, a run keeps only
 * its last stretch of samples whose mobility is finite and changes in one direction (early
 * samples at or before the ramp-corrected time origin are dropped). Several runs overlaid on
 * this axis line up even when their electro-osmotic flow differs.
 *
 * @param axis           what the x axis shows
 * @param title          plot title (may be empty, never null)
 * @param series         the signal curves, in drawing order
 * @param peaks          peak markers with their labels
 * @param bands          library tolerance bands in x units
 * @param xMin           left end of the data range to show (the axis is widened to nice ticks)
 * @param xMax           right end, &gt; xMin
 * @param yMin           lowest signal shown in [xMin, xMax]
 * @param yMax           highest signal shown, &gt; yMin
 * @param peakLabels     whether peak labels are drawn (markers always are)
 * @param bandLabels     whether bands carry the analyte name
 * @param omittedRuns    names of runs given to the builder that could not be drawn on this axis
 */
public record PlotModel(Axis axis, String title, List<Series> series, List<PeakMark> peaks,
                        List<Band> bands, double xMin, double xMax, double yMin, double yMax,
                        boolean peakLabels, boolean bandLabels, List<String> omittedRuns) {

    /** Largest |mobility| shown when nothing else bounds the axis, 1e-9 m²/(V s); above any ion's (H⁺ ≈ 362, from memory). */
    public static final double MAX_DISPLAY_MOBILITY = 400.0;

    /** Margin added on each side of the peaks and bands, as a fraction of their span. */
    public static final double X_PAD_FRACTION = 0.06;

    /** Smallest margin on each side of the peaks and bands on the mobility axis, 1e-9 m²/(V s). */
    public static final double MIN_X_PAD_MOBILITY = 2.0;

    public PlotModel {
        Objects.requireNonNull(axis, "axis");
        title = title == null ? "" : title;
        series = List.copyOf(series);
        peaks = List.copyOf(peaks);
        bands = List.copyOf(bands);
        omittedRuns = List.copyOf(omittedRuns);
        if (!(Double.isFinite(xMin) && Double.isFinite(xMax) && xMax > xMin)) {
            throw new IllegalArgumentException("bad x range " + xMin + ".." + xMax);
        }
        if (!(Double.isFinite(yMin) && Double.isFinite(yMax) && yMax > yMin)) {
            throw new IllegalArgumentException("bad y range " + yMin + ".." + yMax);
        }
    }

    /**
     * One run's plot with peak labels and, when a library is given, its bands.
     *
     * @param library may be null
     */
    public static PlotModel of(Trace trace, RunResult result, Library library, Axis axis) {
        Builder b = builder(axis).run(trace, result).peakLabels(true);
        if (library != null) {
            b.library(library, ToleranceBand.matching(library, MatchSettings.DEFAULT));
        }
        return b.build();
    }

    /** The colour ("#rrggbb") both renderers draw series {@code index} in: the viewer's run list shows the same. */
    public static String seriesColour(int index) {
        return PlotStyle.seriesColour(index);
    }

    /**
     * The plot's word for a marker of {@code role}: "marker" for the neutral marker (the legend's
     * word for every marker) and "ref. marker" for a charged marker of known mobility; null for
     * an analyte.
     */
    public static String markerWord(PeakRole role) {
        if (role == PeakRole.NEUTRAL_MARKER) {
            return PeakStatus.MARKER.label();
        }
        return role == PeakRole.MOBILITY_MARKER ? "ref. " + PeakStatus.MARKER.label() : null;
    }

    public static Builder builder(Axis axis) {
        return new Builder(axis);
    }

    /** One signal curve: x in axis units and signal, in drawing order (arrays are copied). */
    public static final class Series {
        private final String label;
        private final double[] x;
        private final double[] y;

        public Series(String label, double[] x, double[] y) {
            if (x.length != y.length) {
                throw new IllegalArgumentException("x and y differ in length");
            }
            this.label = label == null ? "" : label;
            this.x = x.clone();
            this.y = y.clone();
        }

        public String label() {
            return label;
        }

        public int size() {
            return x.length;
        }

        public double x(int i) {
            return x[i];
        }

        public double y(int i) {
            return y[i];
        }
    }

    /**
     * A peak to mark.
     *
     * @param series index of the series it belongs to
     * @param x      apex position in axis units
     * @param y      signal at the apex
     * @param dip    true when the peak points down (indirect detection): marked below
     * @param label  short text: analyte and confidence, "?" when unassigned, the marker's role
     * @param status how it is drawn
     * @param size   the peak's height in detector units (NaN when unknown): where labels crowd, larger
     *               peaks keep theirs
     */
    public record PeakMark(int series, double x, double y, boolean dip, String label, PeakStatus status,
                           double size) {
        public PeakMark {
            label = label == null ? "" : label;
            Objects.requireNonNull(status, "status");
        }

        /** A mark whose size is not known. */
        public PeakMark(int series, double x, double y, boolean dip, String label, PeakStatus status) {
            this(series, x, y, dip, label, status, Double.NaN);
        }

        /** Whether the label names something (an analyte or a marker) rather than saying "unknown". */
        public boolean named() {
            return !label.isEmpty() && status != PeakStatus.UNASSIGNED;
        }
    }

    /**
     * A library analyte's tolerance band in axis units.
     *
     * @param name analyte name
     * @param from lower edge
     * @param to   upper edge, &ge; from
     */
    public record Band(String name, double from, double to) {
        public Band {
            name = name == null ? "" : name;
        }

        public double centre() {
            return (from + to) / 2;
        }
    }

    /** Collects runs and a library into a {@link PlotModel}. Not thread-safe; build once. */
    public static final class Builder {
        private final Axis axis;
        private String title = "";
        private final List<Series> series = new ArrayList<>();
        private final List<PeakMark> peaks = new ArrayList<>();
        private final List<MobilityScale> scales = new ArrayList<>();
        /** Per series: the run, whose {@link RunResult#comparedMobility} places its mobilities (null: none). */
        private final List<RunResult> compared = new ArrayList<>();
        private final List<String> omitted = new ArrayList<>();
        private Library library;
        private ToleranceBand bandRule;
        private boolean peakLabels = true;
        private boolean bandLabels;
        private double xLo = Double.NaN;
        private double xHi = Double.NaN;

        private Builder(Axis axis) {
            this.axis = Objects.requireNonNull(axis, "axis");
        }

        public Builder title(String text) {
            this.title = text == null ? "" : text;
            return this;
        }

        /**
         * Adds a run's trace and its peaks. On the mobility axis a run without a mobility scale
         * (or without a result, or failed) cannot be placed and is listed in
         * {@link PlotModel#omittedRuns()} instead.
         *
         * @param result may be null: the trace alone is drawn (time axis only)
         */
        public Builder run(Trace trace, RunResult result) {
            Objects.requireNonNull(trace, "trace");
            String name = result != null && result.spec() != null ? result.spec().name() : trace.name();
            MobilityScale scale = result == null ? null : result.scale();
            double[] t = trace.timesS();
            double[] s = trace.signals();
            double[] x;
            double[] y;
            if (axis == Axis.TIME) {
                x = t;
                y = s;
            } else {
                if (scale == null) {
                    omitted.add(name);
                    return this;
                }
                double[] mu = new double[t.length];
                for (int i = 0; i < t.length; i++) {
                    mu[i] = t[i] > 0 ? result.comparedMobility(scale.mobility(t[i])) : Double.NaN;
                }
                int[] kept = monotoneFiniteTail(mu);
                if (kept[1] - kept[0] < 1) {
                    omitted.add(name);
                    return this;
                }
                x = java.util.Arrays.copyOfRange(mu, kept[0], kept[1] + 1);
                y = java.util.Arrays.copyOfRange(s, kept[0], kept[1] + 1);
            }
            int index = series.size();
            series.add(new Series(name, x, y));
            scales.add(scale);
            compared.add(result);
            if (result != null) {
                for (PeakResult pr : result.peaks()) {
                    PeakMark m = mark(index, trace, scale, result, pr);
                    if (m != null) {
                        peaks.add(m);
                    }
                }
            }
            return this;
        }

        /** Draws a band for every library entry: the window matching applies under the default settings. */
        public Builder library(Library lib) {
            return library(lib, ToleranceBand.matching(lib, MatchSettings.DEFAULT));
        }

        /** Draws a band for every library entry, {@code rule} giving its half-width. */
        public Builder library(Library lib, ToleranceBand rule) {
            this.library = lib;
            this.bandRule = Objects.requireNonNull(rule, "rule");
            return this;
        }

        public Builder peakLabels(boolean on) {
            this.peakLabels = on;
            return this;
        }

        public Builder bandLabels(boolean on) {
            this.bandLabels = on;
            return this;
        }

        /** Fixes the x data range instead of choosing it from peaks, bands and data. */
        public Builder xRange(double lo, double hi) {
            if (!(Double.isFinite(lo) && Double.isFinite(hi) && hi > lo)) {
                throw new IllegalArgumentException("bad x range " + lo + ".." + hi);
            }
            this.xLo = lo;
            this.xHi = hi;
            return this;
        }

        public PlotModel build() {
            List<Band> bands = bands();
            double[] xr = Double.isNaN(xLo) ? chooseXRange(bands) : new double[] {xLo, xHi};
            double[] yr = yRange(xr[0], xr[1]);
            return new PlotModel(axis, title, series, withOneMarkerLabel(peaks), bands, xr[0], xr[1], yr[0], yr[1],
                    peakLabels, bandLabels, omitted);
        }

        /**
         * On the mobility axis the markers of overlaid runs coincide, so only the first run's marker
         * keeps its label; the others keep their shape. On the time axis every label stays.
         */
        private List<PeakMark> withOneMarkerLabel(List<PeakMark> marks) {
            if (axis != Axis.MOBILITY || series.size() < 2) {
                return marks;
            }
            List<PeakMark> out = new ArrayList<>(marks.size());
            boolean labelled = false;
            for (PeakMark m : marks) {
                if (m.status() == PeakStatus.MARKER && !m.label().isEmpty()) {
                    if (labelled) {
                        m = new PeakMark(m.series(), m.x(), m.y(), m.dip(), "", m.status(), m.size());
                    }
                    labelled = true;
                }
                out.add(m);
            }
            return out;
        }

        private List<Band> bands() {
            List<Band> out = new ArrayList<>();
            if (library == null) {
                return out;
            }
            MobilityScale timeScale = null;
            if (axis == Axis.TIME) {
                // Bands in time make sense only for a single run with a mobility scale.
                if (scales.size() != 1 || scales.get(0) == null) {
                    return out;
                }
                timeScale = scales.get(0);
            }
            for (LibraryEntry e : library.entries()) {
                double hw = bandRule.halfWidth(e);
                if (!(Double.isFinite(hw) && hw > 0 && Double.isFinite(e.mobility()))) {
                    continue;
                }
                double a = e.mobility() - hw;
                double b = e.mobility() + hw;
                if (timeScale != null) {
                    RunResult run = compared.get(0);
                    a = timeScale.timeS(run == null ? a : run.runMobility(a));
                    b = timeScale.timeS(run == null ? b : run.runMobility(b));
                }
                if (Double.isFinite(a) && Double.isFinite(b)) {
                    out.add(new Band(e.name(), Math.min(a, b), Math.max(a, b)));
                }
            }
            return out;
        }

        private double[] chooseXRange(List<Band> bands) {
            double dataLo = Double.POSITIVE_INFINITY;
            double dataHi = Double.NEGATIVE_INFINITY;
            for (Series s : series) {
                for (int i = 0; i < s.size(); i++) {
                    double v = s.x(i);
                    if (axis == Axis.MOBILITY && Math.abs(v) > MAX_DISPLAY_MOBILITY) {
                        continue;
                    }
                    dataLo = Math.min(dataLo, v);
                    dataHi = Math.max(dataHi, v);
                }
            }
            if (axis == Axis.TIME) {
                return finiteRange(dataLo, dataHi);
            }
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (PeakMark p : peaks) {
                lo = Math.min(lo, p.x());
                hi = Math.max(hi, p.x());
            }
            for (Band b : bands) {
                // Bands count only where some run has data, so that a large library does not
                // stretch the axis over empty space.
                if (b.to() >= dataLo && b.from() <= dataHi) {
                    lo = Math.min(lo, b.from());
                    hi = Math.max(hi, b.to());
                }
            }
            if (!(lo <= hi)) {
                return finiteRange(dataLo, dataHi);
            }
            double pad = Math.max(X_PAD_FRACTION * (hi - lo), MIN_X_PAD_MOBILITY);
            lo -= pad;
            hi += pad;
            double clippedLo = Math.max(lo, dataLo);
            double clippedHi = Math.min(hi, dataHi);
            return clippedHi > clippedLo ? new double[] {clippedLo, clippedHi} : new double[] {lo, hi};
        }

        private double[] yRange(double lo, double hi) {
            double yLo = Double.POSITIVE_INFINITY;
            double yHi = Double.NEGATIVE_INFINITY;
            for (Series s : series) {
                for (int i = 0; i < s.size(); i++) {
                    double v = s.x(i);
                    if (v >= lo && v <= hi) {
                        yLo = Math.min(yLo, s.y(i));
                        yHi = Math.max(yHi, s.y(i));
                    }
                }
            }
            return finiteRange(yLo, yHi);
        }

        private PeakMark mark(int seriesIndex, Trace trace, MobilityScale scale, RunResult run, PeakResult pr) {
            Peak p = pr.peak();
            if (p == null) {
                return null;
            }
            double x = axis == Axis.TIME ? p.apexTimeS() : run.comparedMobility(scale.mobility(p.apexTimeS()));
            if (!Double.isFinite(x)) {
                return null;
            }
            return new PeakMark(seriesIndex, x, apexSignal(trace, p), p.dip(), labelOf(pr), PeakStatus.of(pr),
                    Math.abs(p.height()));
        }
    }

    /**
     * The signal at a peak's apex: the apex sample when it is valid, else interpolated at the apex
     * time (the end sample outside the trace). The plots and the viewer mark peaks with it.
     */
    public static double apexSignal(Trace trace, Peak p) {
        int i = p.apexIndex();
        if (i >= 0 && i < trace.size()) {
            return trace.signal(i);
        }
        int j = trace.indexAtOrAfter(p.apexTimeS());
        if (j <= 0) {
            return trace.signal(0);
        }
        if (j >= trace.size()) {
            return trace.signal(trace.size() - 1);
        }
        double t0 = trace.timeS(j - 1);
        double t1 = trace.timeS(j);
        double f = (p.apexTimeS() - t0) / (t1 - t0);
        return trace.signal(j - 1) + f * (trace.signal(j) - trace.signal(j - 1));
    }

    /**
     * The label of a peak: "analyte 97%", "?" when unassigned, "marker" for the neutral marker (the
     * legend's word for it) and "ref. marker" for a charged marker of known mobility.
     */
    public static String labelOf(PeakResult pr) {
        if (pr.role() != PeakRole.ANALYTE) {
            return markerWord(pr.role());
        }
        if (pr.match() == null || pr.match().assigned() == null || PeakStatus.of(pr) == PeakStatus.UNASSIGNED) {
            return "?";
        }
        double c = pr.match().confidence();
        String pct = Double.isFinite(c) ? String.format(Locale.ROOT, " %d%%", Math.round(100 * c)) : "";
        return pr.match().assigned() + pct;
    }

    /**
     * Indices [first, last] of the last stretch of {@code values} that is finite and monotonic
     * in one direction; {first, first - 1 or less} when fewer than two such values exist.
     */
    static int[] monotoneFiniteTail(double[] values) {
        int end = values.length - 1;
        while (end >= 0 && !Double.isFinite(values[end])) {
            end--;
        }
        if (end < 1) {
            return new int[] {0, -1};
        }
        int start = end;
        int direction = 0;
        while (start - 1 >= 0 && Double.isFinite(values[start - 1])) {
            int s = Double.compare(values[start], values[start - 1]);
            s = Integer.signum(s);
            if (s != 0) {
                if (direction == 0) {
                    direction = s;
                } else if (s != direction) {
                    break;
                }
            }
            start--;
        }
        return new int[] {start, end};
    }

    private static double[] finiteRange(double lo, double hi) {
        if (!(Double.isFinite(lo) && Double.isFinite(hi))) {
            return new double[] {0, 1};
        }
        if (hi > lo) {
            return new double[] {lo, hi};
        }
        double half = lo == 0 ? 1 : Math.abs(lo) * 0.1;
        return new double[] {lo - half, hi + half};
    }
}
