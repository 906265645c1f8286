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
    /** Rows of labels kept free beyond the highest peak (or below the deepest dip), px per row as a label's. */
    static final int LABEL_ROOM_ROWS = 2;
    /** Room between the signal and the plot's edge where no marker or label needs it, px. */
    static final double PLAIN_PAD_PX = 6;
    /** Least share of the plot's height the signal itself keeps, however much room labels ask for. */
    static final double MIN_SIGNAL_SHARE = 0.55;
    /** Rows of band names at the top of the plot. */
    static final int BAND_LABEL_ROWS = 2;
    /** How many rows a label may be moved away from its peak to avoid its neighbours. */
    static final int MAX_LABEL_LEVELS = 6;
    /**
     * Sideways moves tried for a label at each row, in half label widths (plus a small gap) from
     * the position centred on its peak; a label moved sideways or up is joined to its peak by a
     * leader line.
     */
    static final double[] LABEL_SHIFTS = {0, -1, 1, -2, 2};
    /** Least free space between two labels, and between a label and a marker, px. */
    static final double LABEL_GAP = 2;
    /** Most curves named in the legend; the rest are summed up as "+ n more". */
    static final int MAX_LEGEND_SERIES = 12;

    private static final double OUTER = 8;
    private static final double LEGEND_ROW = 18;
    private static final double LEGEND_SWATCH = 16;
    private static final double LEGEND_GAP = 16;
    /** Most rounds of fitting the y tick labels, the legend and the y range to each other. */
    private static final int MAX_LAYOUT_PASSES = 4;

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
    /** The signal at the bottom and at the top of the plot area (the y axis ends; tight, not widened to ticks). */
    private double yLow;
    private double yHigh;
    /** Labels left out because no free place was found for them. */
    private int hiddenLabels;

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

        /** Whether the box comes within {@code gap} of the rectangle [x1, x2] × [y1, y2]. */
        boolean overlaps(double x1, double y1, double x2, double y2, double gap) {
            return left < x2 + gap && x1 < right() + gap && top() < y2 + gap && y1 < bottom() + gap;
        }

        /** Where the leader line meets the box: the point of its near edge closest to the anchor. */
        public double leaderEndX() {
            return Math.max(left, Math.min(right(), anchorX));
        }

        /** See {@link #leaderEndX()}. */
        public double leaderEndY() {
            return anchorY < top() ? top() - 1 : bottom() + 1;
        }

        /** Whether the leader line from the anchor to the box passes through {@code o}. */
        boolean leaderCrosses(TextBox o) {
            return leader && segmentMeetsBox(anchorX, anchorY, leaderEndX(), leaderEndY(),
                    o.left, o.top(), o.right(), o.bottom());
        }
    }

    /** Whether the segment (x1, y1)–(x2, y2) passes through the rectangle [l, r] × [t, b] (Liang–Barsky clipping). */
    static boolean segmentMeetsBox(double x1, double y1, double x2, double y2, double l, double t, double r, double b) {
        double dx = x2 - x1;
        double dy = y2 - y1;
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {x1 - l, r - x1, y1 - t, b - y1};
        double u0 = 0;
        double u1 = 1;
        for (int i = 0; i < 4; i++) {
            if (p[i] == 0) {
                if (q[i] < 0) {
                    return false;
                }
            } else {
                double u = q[i] / p[i];
                if (p[i] < 0) {
                    u0 = Math.max(u0, u);
                } else {
                    u1 = Math.min(u1, u);
                }
            }
        }
        return u0 <= u1;
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

        this.xTicks = NiceTicks.of(model.xMin(), model.xMax(), X_TICKS);
        double[] xv = xTicks.values();
        double lastXLabel = PlotStyle.textWidth(xTicks.format(xv[xv.length - 1]), PlotStyle.TICK_FONT);
        this.right = width - Math.max(OUTER + 8, lastXLabel / 2 + OUTER);
        this.top = model.title().isEmpty() ? OUTER + 4 : OUTER + PlotStyle.TITLE_FONT + 12;
        List<LegendItem> items = legendItems();
        double axisBlock = PlotStyle.TICK_LENGTH + 4 + PlotStyle.TICK_FONT + 8 + PlotStyle.AXIS_TITLE_FONT + 6;

        // The y tick labels decide the left edge, the left edge the legend's rows, the rows the
        // plot's height, the height the y range and so the tick labels: repeat until they agree
        // (the width only grows, so this ends at once in practice).
        double yLabelWidth = PlotStyle.textWidth("-0.0", PlotStyle.TICK_FONT);
        NiceTicks ticks = null;
        double l = 0;
        double b = 0;
        for (int pass = 0; pass < MAX_LAYOUT_PASSES; pass++) {
            l = OUTER + PlotStyle.AXIS_TITLE_FONT + 8 + yLabelWidth + 4 + PlotStyle.TICK_LENGTH;
            int rows = legendRows(items, l);
            double legendHeight = rows == 0 ? 0 : rows * LEGEND_ROW + 4;
            b = height - OUTER - legendHeight - axisBlock;
            if (!(b - top > 20 && right - l > 20)) {
                throw new IllegalArgumentException("plot too small for its axes and legend: "
                        + width + "×" + height + " px");
            }
            chooseYRange(b - top);
            ticks = NiceTicks.within(yLow, yHigh, Y_TICKS);
            double needed = 0;
            for (double v : ticks.values()) {
                needed = Math.max(needed, PlotStyle.textWidth(ticks.format(v), PlotStyle.TICK_FONT));
            }
            if (needed <= yLabelWidth) {
                break;
            }
            yLabelWidth = needed;
        }
        this.yTicks = ticks;
        this.left = l;
        this.bottom = b;
        this.legendTop = bottom + axisBlock;
        this.legend = placeLegend(items, left);

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
        return bottom - (y - yLow) / (yHigh - yLow) * (bottom - top);
    }

    /** The signal at the bottom of the plot area (the lower end of the y axis). */
    public double yAxisLow() {
        return yLow;
    }

    /** The signal at the top of the plot area. */
    public double yAxisHigh() {
        return yHigh;
    }

    /** How many peak labels were left out because no free place was found for them. */
    public int hiddenLabels() {
        return hiddenLabels;
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
        double[] rowEnds = new double[BAND_LABEL_ROWS];
        Arrays.fill(rowEnds, Double.NEGATIVE_INFINITY);
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

    /**
     * The tight y range: the signal's own range, with just the room in pixels that markers,
     * labels and band names need above or below it (a plot area of {@code areaPx} px).
     */
    private void chooseYRange(double areaPx) {
        boolean up = false;
        boolean down = false;
        boolean labelsUp = false;
        boolean labelsDown = false;
        for (PlotModel.PeakMark p : model.peaks()) {
            up |= !p.dip();
            down |= p.dip();
            boolean labelled = model.peakLabels() && !p.label().isEmpty();
            labelsUp |= labelled && !p.dip();
            labelsDown |= labelled && p.dip();
        }
        double markerRoom = PlotStyle.MARKER_GAP + 2 * PlotStyle.MARKER_RADIUS + PLAIN_PAD_PX;
        double labelRoom = PlotStyle.MARKER_GAP + PlotStyle.MARKER_RADIUS + markerReach() + LABEL_GAP + 1
                + LABEL_ROOM_ROWS * labelRowStep();
        double roomUp = labelsUp ? labelRoom : up ? markerRoom : PLAIN_PAD_PX;
        double roomDown = labelsDown ? labelRoom : down ? markerRoom : PLAIN_PAD_PX;
        if (model.bandLabels() && !model.bands().isEmpty()) {
            roomUp += bandLabelsHeight();
        }
        double signalPx = areaPx - roomUp - roomDown;
        if (signalPx < MIN_SIGNAL_SHARE * areaPx) {
            double shrink = (1 - MIN_SIGNAL_SHARE) * areaPx / (roomUp + roomDown);
            roomUp *= shrink;
            roomDown *= shrink;
            signalPx = MIN_SIGNAL_SHARE * areaPx;
        }
        double perPx = (model.yMax() - model.yMin()) / signalPx;
        yLow = model.yMin() - roomDown * perPx;
        yHigh = model.yMax() + roomUp * perPx;
    }

    private static double labelRowStep() {
        return PlotStyle.LABEL_FONT + LABEL_GAP;
    }

    private static double bandLabelsHeight() {
        return 3 + BAND_LABEL_ROWS * (PlotStyle.BAND_FONT + 2);
    }

    /**
     * Markers for every peak in the plot; then labels, most important first (named peaks before
     * markers before unassigned ones, larger peaks before smaller), each at the first free place:
     * next to its peak, moved sideways, or moved further away row by row with a leader line. A
     * place is free when the label keeps {@link #LABEL_GAP} from every label and marker already
     * there and no leader line crosses it or is crossed by it. A label with no free place is left
     * out (counted in {@link #hiddenLabels()}); its marker stays.
     */
    private void placePeaks() {
        List<PlotModel.PeakMark> sorted = new ArrayList<>(model.peaks());
        sorted.sort(Comparator.comparingDouble(PlotModel.PeakMark::x));
        double r = PlotStyle.MARKER_RADIUS;
        for (PlotModel.PeakMark p : sorted) {
            double x = px(p.x());
            if (x < left || x > right) {
                continue;
            }
            double apexY = py(p.y());
            double cy = p.dip() ? apexY + PlotStyle.MARKER_GAP + r : apexY - PlotStyle.MARKER_GAP - r;
            cy = Math.max(top + r, Math.min(bottom - r, cy));
            markers.add(new MarkerSpot(p, x, cy));
        }
        if (!model.peakLabels()) {
            return;
        }
        double labelTop = top + 1;
        for (TextBox b : bandLabels) {
            labelTop = Math.max(labelTop, b.bottom() + 2);
        }
        List<MarkerSpot> queue = new ArrayList<>();
        for (MarkerSpot m : markers) {
            if (!m.mark().label().isEmpty()) {
                queue.add(m);
            }
        }
        queue.sort(Comparator.comparingInt((MarkerSpot m) -> labelRank(m.mark()))
                .thenComparingDouble(m -> Double.isNaN(m.mark().size()) ? 0 : -m.mark().size())
                .thenComparingDouble(MarkerSpot::cx));
        for (MarkerSpot m : queue) {
            TextBox box = placeLabel(m, labelTop);
            if (box == null) {
                hiddenLabels++;
            } else {
                peakLabels.add(box);
            }
        }
        peakLabels.sort(Comparator.comparingDouble(TextBox::left).thenComparingDouble(TextBox::baseline));
    }

    /** Which labels go first where they crowd: named analytes, then markers, then unassigned peaks. */
    private static int labelRank(PlotModel.PeakMark p) {
        if (p.status() == PeakStatus.UNASSIGNED || !p.named()) {
            return 2;
        }
        return p.status() == PeakStatus.MARKER ? 1 : 0;
    }

    /** The first free place for the label of {@code m}, or null. */
    private TextBox placeLabel(MarkerSpot m, double labelTop) {
        PlotModel.PeakMark p = m.mark();
        double r = PlotStyle.MARKER_RADIUS;
        double font = PlotStyle.LABEL_FONT;
        double w = PlotStyle.textWidth(p.label(), font);
        double anchorY = p.dip() ? m.cy() + r : m.cy() - r;
        double offset = markerReach() + LABEL_GAP + 1;
        for (int level = 0; level < MAX_LABEL_LEVELS; level++) {
            double baseline = p.dip()
                    ? m.cy() + offset + PlotStyle.ASCENT_EM * font + level * labelRowStep()
                    : m.cy() - offset - PlotStyle.DESCENT_EM * font - level * labelRowStep();
            double boxTop = baseline - PlotStyle.ASCENT_EM * font;
            double boxBottom = baseline + PlotStyle.DESCENT_EM * font;
            if (boxTop < labelTop || boxBottom > bottom - 1) {
                return null;
            }
            for (double shift : LABEL_SHIFTS) {
                double centred = m.cx() - w / 2 + shift * (w / 2 + LABEL_GAP + r);
                double lx = Math.max(left + 2, Math.min(right - 2 - w, centred));
                boolean away = level > 0 || m.cx() < lx || m.cx() > lx + w;
                TextBox box = new TextBox(p.label(), lx, baseline, w, font, away, m.cx(), anchorY);
                if (free(box, m)) {
                    return box;
                }
            }
        }
        return null;
    }

    /** Whether {@code box} (the label of {@code own}) keeps clear of labels, markers and leader lines. */
    private boolean free(TextBox box, MarkerSpot own) {
        for (TextBox o : peakLabels) {
            if (box.overlaps(o, LABEL_GAP) || box.leaderCrosses(o) || o.leaderCrosses(box)) {
                return false;
            }
        }
        for (TextBox o : bandLabels) {
            if (box.overlaps(o, LABEL_GAP)) {
                return false;
            }
        }
        double reach = markerReach();
        for (MarkerSpot m : markers) {
            if (box.overlaps(m.cx() - reach, m.cy() - reach, m.cx() + reach, m.cy() + reach, LABEL_GAP)) {
                return false;
            }
            boolean touchesOwn = Math.abs(m.cx() - own.cx()) < 2 * reach && Math.abs(m.cy() - own.cy()) < 2 * reach;
            if (!touchesOwn && box.leader() && segmentMeetsBox(box.anchorX(), box.anchorY(), box.leaderEndX(),
                    box.leaderEndY(), m.cx() - reach, m.cy() - reach, m.cx() + reach, m.cy() + reach)) {
                return false;
            }
        }
        return true;
    }

    /** Half the side of the square every marker shape fits in, px (the diamond is the widest). */
    static double markerReach() {
        return PlotStyle.MARKER_RADIUS * 1.3 + PlotStyle.MARKER_STROKE / 2;
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

    private int legendRows(List<LegendItem> items, double left) {
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

    private List<LegendItem> placeLegend(List<LegendItem> items, double left) {
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
