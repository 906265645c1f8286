package org.mobident.report.plot;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Where everything of a {@link PlotModel} goes on a canvas of a given size, in pixels (origin
 * top left, y down). Both renderers draw from this one layout, so the SVG and the PNG agree
 * point for point: the plot area, nice ticks on both axes, the data-to-pixel mapping, the
 * decimated curves, markers, labels, bands and the legend.
 */
public final class PlotLayout {

    /** Target number of ticks on the x axis. */
    static final int X_TICKS = 8;
    /** Target number of ticks on the y axis. */
    static final int Y_TICKS = 5;
    /** Room above the highest signal for labels, as a fraction of the signal range. */
    static final double LABEL_HEADROOM = 0.28;
    /** Room above and below the signal when no labels need it, as a fraction of its range. */
    static final double PLAIN_HEADROOM = 0.05;
    /** How many rows a label may be raised to avoid its neighbours. */
    static final int MAX_LABEL_LEVELS = 6;
    /** Most curves named in the legend; the rest are summed up as "+ n more". */
    static final int MAX_LEGEND_SERIES = 12;

    private static final double OUTER = 8;
    private static final double LEGEND_ROW = 18;
    private static final double LEGEND_SWATCH = 16;
    private static final double LEGEND_GAP = 16;

    private final PlotModel model;
    private final int width;
    private final int height;
    private final double left;
    private final double top;
    private final double right;
    private final double bottom;
    private final NiceTicks xTicks;
    private final NiceTicks yTicks;
    private final List<Polyline> curves;
    private final List<MarkerSpot> markers;
    private final List<TextBox> peakLabels;
    private final List<BandSpot> bands;
    private final List<TextBox> bandLabels;
    private final List<LegendItem> legend;
    private final double legendTop;

    /** A decimated curve in pixels. */
    public record Polyline(int series, double[] xs, double[] ys) {
        public int size() {
            return xs.length;
        }
    }

    /** A peak marker's centre in pixels. */
    public record MarkerSpot(PlotModel.PeakMark mark, double cx, double cy) {
    }

    /**
     * A piece of text: left edge, baseline and estimated box; {@code leader} says whether a line
     * joins it to the point at ({@code anchorX}, {@code anchorY}).
     */
    public record TextBox(String text, double left, double baseline, double width, double fontPx,
                          boolean leader, double anchorX, double anchorY) {
        public double top() {
            return baseline - PlotStyle.ASCENT_EM * fontPx;
        }

        public double bottom() {
            return baseline + PlotStyle.DESCENT_EM * fontPx;
        }

        public double right() {
            return left + width;
        }

        boolean overlaps(TextBox o, double gap) {
            return left < o.right() + gap && o.left < right() + gap
                    && top() < o.bottom() + gap && o.top() < bottom() + gap;
        }
    }

    /** A band's horizontal extent in pixels, already cut to the plot area. */
    public record BandSpot(PlotModel.Band band, double left, double right) {
    }

    /**
     * A legend entry: a curve (series ≥ 0), a status (series = -1) or a plain note (both unset);
     * {@code x} is the left edge of its swatch, {@code baseline} its text baseline.
     */
    public record LegendItem(int series, PeakStatus status, String text, double x, double baseline) {
    }

    private PlotLayout(PlotModel model, int width, int height) {
        if (width < 80 || height < 60) {
            throw new IllegalArgumentException("plot too small: " + width + "×" + height + " px");
        }
        this.model = model;
        this.width = width;
        this.height = height;

        boolean labelsUp = false;
        boolean labelsDown = false;
        if (model.peakLabels()) {
            for (PlotModel.PeakMark p : model.peaks()) {
                labelsUp |= !p.dip();
                labelsDown |= p.dip();
            }
        }
        double range = model.yMax() - model.yMin();
        double yLo = model.yMin() - range * (labelsDown ? LABEL_HEADROOM : PLAIN_HEADROOM);
        double yHi = model.yMax() + range * (labelsUp ? LABEL_HEADROOM : PLAIN_HEADROOM);
        if (model.bandLabels() && !model.bands().isEmpty()) {
            yHi += range * PLAIN_HEADROOM * 2;
        }
        this.yTicks = NiceTicks.of(yLo, yHi, Y_TICKS);
        this.xTicks = NiceTicks.of(model.xMin(), model.xMax(), X_TICKS);

        double yLabelWidth = 0;
        for (double v : yTicks.values()) {
            yLabelWidth = Math.max(yLabelWidth, PlotStyle.textWidth(yTicks.format(v), PlotStyle.TICK_FONT));
        }
        double[] xv = xTicks.values();
        double lastXLabel = PlotStyle.textWidth(xTicks.format(xv[xv.length - 1]), PlotStyle.TICK_FONT);

        this.left = OUTER + PlotStyle.AXIS_TITLE_FONT + 8 + yLabelWidth + 4 + PlotStyle.TICK_LENGTH;
        this.right = width - Math.max(OUTER + 8, lastXLabel / 2 + OUTER);
        this.top = model.title().isEmpty() ? OUTER + 4 : OUTER + PlotStyle.TITLE_FONT + 12;

        List<LegendItem> items = legendItems();
        int rows = legendRows(items);
        double legendHeight = rows == 0 ? 0 : rows * LEGEND_ROW + 4;
        double axisBlock = PlotStyle.TICK_LENGTH + 4 + PlotStyle.TICK_FONT + 8 + PlotStyle.AXIS_TITLE_FONT + 6;
        this.bottom = height - OUTER - legendHeight - axisBlock;
        if (!(bottom - top > 20 && right - left > 20)) {
            throw new IllegalArgumentException("plot too small for its axes and legend: "
                    + width + "×" + height + " px");
        }
        this.legendTop = bottom + axisBlock;
        this.legend = placeLegend(items);

        this.curves = new ArrayList<>();
        for (int i = 0; i < model.series().size(); i++) {
            curves.add(decimate(i, model.series().get(i)));
        }
        this.bands = placeBands();
        this.bandLabels = placeBandLabels();
        this.markers = new ArrayList<>();
        this.peakLabels = new ArrayList<>();
        placePeaks();
    }

    /** The layout of {@code model} on a canvas of {@code widthPx} × {@code heightPx}. */
    public static PlotLayout of(PlotModel model, int widthPx, int heightPx) {
        return new PlotLayout(model, widthPx, heightPx);
    }

    public PlotModel model() {
        return model;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** Left edge of the plot area, px. */
    public double plotLeft() {
        return left;
    }

    public double plotRight() {
        return right;
    }

    public double plotTop() {
        return top;
    }

    /** Bottom of the plot area (the x axis line), px. */
    public double plotBottom() {
        return bottom;
    }

    public NiceTicks xTicks() {
        return xTicks;
    }

    public NiceTicks yTicks() {
        return yTicks;
    }

    /** Pixel column of the data value {@code x} (linear between the first and last x tick). */
    public double px(double x) {
        return left + (x - xTicks.first()) / (xTicks.last() - xTicks.first()) * (right - left);
    }

    /** Pixel row of the signal value {@code y}. */
    public double py(double y) {
        return bottom - (y - yTicks.first()) / (yTicks.last() - yTicks.first()) * (bottom - top);
    }

    public List<Polyline> curves() {
        return List.copyOf(curves);
    }

    public List<MarkerSpot> markers() {
        return List.copyOf(markers);
    }

    public List<TextBox> peakLabels() {
        return List.copyOf(peakLabels);
    }

    public List<BandSpot> bands() {
        return List.copyOf(bands);
    }

    public List<TextBox> bandLabels() {
        return List.copyOf(bandLabels);
    }

    public List<LegendItem> legend() {
        return List.copyOf(legend);
    }

    /** Baseline of the x axis title. */
    double xTitleBaseline() {
        return bottom + PlotStyle.TICK_LENGTH + 4 + PlotStyle.TICK_FONT + 8 + PlotStyle.AXIS_TITLE_FONT;
    }

    /** Baseline of the x tick labels. */
    double xTickBaseline() {
        return bottom + PlotStyle.TICK_LENGTH + 3 + PlotStyle.TICK_FONT * PlotStyle.ASCENT_EM;
    }

    /** Horizontal position of the (rotated) y axis title's baseline. */
    double yTitleX() {
        return OUTER + PlotStyle.AXIS_TITLE_FONT;
    }

    double legendTop() {
        return legendTop;
    }

    /**
     * Min/max decimation per pixel column: within each column the first, lowest, highest and
     * last point are kept, in their order, so no peak is lost however many samples share a
     * column and a 60,000-point trace becomes at most four points per column.
     */
    private Polyline decimate(int index, PlotModel.Series s) {
        double lo = Math.min(xTicks.first(), xTicks.last());
        double hi = Math.max(xTicks.first(), xTicks.last());
        double[] xs = new double[Math.min(s.size(), 4 * (int) (right - left + 2) + 8)];
        double[] ys = new double[xs.length];
        int n = 0;
        long column = Long.MIN_VALUE;
        int first = -1;
        int last = -1;
        int min = -1;
        int max = -1;
        for (int i = 0; i < s.size(); i++) {
            double x = s.x(i);
            if (!(x >= lo && x <= hi)) {
                continue;
            }
            long c = (long) Math.floor(px(x));
            if (c != column) {
                if (first >= 0) {
                    if (n + 4 > xs.length) {
                        xs = Arrays.copyOf(xs, Math.max(2 * xs.length, n + 4));
                        ys = Arrays.copyOf(ys, xs.length);
                    }
                    n = flush(s, first, min, max, last, xs, ys, n);
                }
                column = c;
                first = i;
                last = i;
                min = i;
                max = i;
            } else {
                last = i;
                if (s.y(i) < s.y(min)) {
                    min = i;
                }
                if (s.y(i) > s.y(max)) {
                    max = i;
                }
            }
        }
        if (first >= 0) {
            if (n + 4 > xs.length) {
                xs = Arrays.copyOf(xs, n + 4);
                ys = Arrays.copyOf(ys, xs.length);
            }
            n = flush(s, first, min, max, last, xs, ys, n);
        }
        return new Polyline(index, Arrays.copyOf(xs, n), Arrays.copyOf(ys, n));
    }

    private int flush(PlotModel.Series s, int first, int min, int max, int last, double[] xs, double[] ys, int n) {
        int a = Math.min(min, max);
        int b = Math.max(min, max);
        int[] order = {first, a, b, last};
        int prev = -1;
        for (int k : order) {
            if (k != prev) {
                xs[n] = px(s.x(k));
                ys[n] = py(s.y(k));
                n++;
                prev = k;
            }
        }
        return n;
    }

    private List<BandSpot> placeBands() {
        List<BandSpot> out = new ArrayList<>();
        for (PlotModel.Band b : model.bands()) {
            double a = Math.max(left, Math.min(px(b.from()), px(b.to())));
            double z = Math.min(right, Math.max(px(b.from()), px(b.to())));
            if (z > a) {
                out.add(new BandSpot(b, a, z));
            }
        }
        return out;
    }

    private List<TextBox> placeBandLabels() {
        List<TextBox> out = new ArrayList<>();
        if (!model.bandLabels()) {
            return out;
        }
        List<BandSpot> sorted = new ArrayList<>(bands);
        sorted.sort(Comparator.comparingDouble(b -> (b.left() + b.right()) / 2));
        double baseline = top + 3 + PlotStyle.ASCENT_EM * PlotStyle.BAND_FONT;
        double[] rowEnds = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (BandSpot b : sorted) {
            String text = b.band().name();
            double w = PlotStyle.textWidth(text, PlotStyle.BAND_FONT);
            double x = (b.left() + b.right()) / 2 - w / 2;
            if (x < left + 1 || x + w > right - 1) {
                continue;
            }
            for (int row = 0; row < rowEnds.length; row++) {
                if (x > rowEnds[row] + 4) {
                    double base = baseline + row * (PlotStyle.BAND_FONT + 2);
                    out.add(new TextBox(text, x, base, w, PlotStyle.BAND_FONT, false,
                            (b.left() + b.right()) / 2, base));
                    rowEnds[row] = x + w;
                    break;
                }
            }
        }
        return out;
    }

    private void placePeaks() {
        List<PlotModel.PeakMark> sorted = new ArrayList<>(model.peaks());
        sorted.sort(Comparator.comparingDouble(PlotModel.PeakMark::x));
        double labelTop = top + 1;
        for (TextBox b : bandLabels) {
            labelTop = Math.max(labelTop, b.bottom() + 2);
        }
        double r = PlotStyle.MARKER_RADIUS;
        double font = PlotStyle.LABEL_FONT;
        double rowStep = font + 2;
        for (PlotModel.PeakMark p : sorted) {
            double x = px(p.x());
            if (x < left || x > right) {
                continue;
            }
            double apexY = py(p.y());
            double cy = p.dip() ? apexY + PlotStyle.MARKER_GAP + r : apexY - PlotStyle.MARKER_GAP - r;
            cy = Math.max(top + r, Math.min(bottom - r, cy));
            markers.add(new MarkerSpot(p, x, cy));
            if (!model.peakLabels() || p.label().isEmpty()) {
                continue;
            }
            double w = PlotStyle.textWidth(p.label(), font);
            double lx = Math.max(left + 2, Math.min(right - 2 - w, x - w / 2));
            TextBox chosen = null;
            TextBox fallback = null;
            for (int level = 0; level < MAX_LABEL_LEVELS; level++) {
                double baseline = p.dip()
                        ? cy + r + 3 + PlotStyle.ASCENT_EM * font + level * rowStep
                        : cy - r - 3 - PlotStyle.DESCENT_EM * font - level * rowStep;
                TextBox box = new TextBox(p.label(), lx, baseline, w, font, level > 0, x,
                        p.dip() ? cy + r : cy - r);
                if (box.top() < labelTop || box.bottom() > bottom - 1) {
                    break;
                }
                if (fallback == null) {
                    fallback = box;
                }
                if (peakLabels.stream().noneMatch(o -> o.overlaps(box, 2))) {
                    chosen = box;
                    break;
                }
            }
            if (chosen == null) {
                chosen = fallback;
            }
            if (chosen != null) {
                peakLabels.add(chosen);
            }
        }
    }

    private List<LegendItem> legendItems() {
        List<LegendItem> items = new ArrayList<>();
        Set<PeakStatus> present = EnumSet.noneOf(PeakStatus.class);
        for (PlotModel.PeakMark p : model.peaks()) {
            present.add(p.status());
        }
        for (PeakStatus s : present) {
            items.add(new LegendItem(-1, s, s.label(), 0, 0));
        }
        int n = model.series().size();
        if (n > 1) {
            for (int i = 0; i < Math.min(n, MAX_LEGEND_SERIES); i++) {
                items.add(new LegendItem(i, null, model.series().get(i).label(), 0, 0));
            }
            if (n > MAX_LEGEND_SERIES) {
                items.add(new LegendItem(-1, null, "+ " + (n - MAX_LEGEND_SERIES) + " more", 0, 0));
            }
        }
        return items;
    }

    private static double itemWidth(LegendItem item) {
        return LEGEND_SWATCH + 6 + PlotStyle.textWidth(item.text(), PlotStyle.LEGEND_FONT) + LEGEND_GAP;
    }

    private int legendRows(List<LegendItem> items) {
        if (items.isEmpty()) {
            return 0;
        }
        int rows = 1;
        double x = left;
        for (LegendItem item : items) {
            double w = itemWidth(item);
            if (x > left && x + w > width - OUTER) {
                rows++;
                x = left;
            }
            x += w;
        }
        return rows;
    }

    private List<LegendItem> placeLegend(List<LegendItem> items) {
        List<LegendItem> out = new ArrayList<>();
        double x = left;
        int row = 0;
        for (LegendItem item : items) {
            double w = itemWidth(item);
            if (x > left && x + w > width - OUTER) {
                row++;
                x = left;
            }
            double baseline = legendTop + 4 + row * LEGEND_ROW + PlotStyle.ASCENT_EM * PlotStyle.LEGEND_FONT;
            out.add(new LegendItem(item.series(), item.status(), item.text(), x, baseline));
            x += w;
        }
        return out;
    }

    static double legendSwatchWidth() {
        return LEGEND_SWATCH;
    }
}
