package org.mobident.report.plot;

/** Draws a {@link PlotLayout} on a {@link Canvas}; the one drawing routine of both renderers. */
final class PlotPainter {

    private PlotPainter() {
    }

    static void paint(PlotLayout layout, Canvas c) {
        PlotModel model = layout.model();
        double l = layout.plotLeft();
        double r = layout.plotRight();
        double t = layout.plotTop();
        double b = layout.plotBottom();

        c.rect(0, 0, layout.width(), layout.height(), PlotStyle.BACKGROUND, 1.0);

        if (!layout.bands().isEmpty()) {
            c.begin("bands");
            for (PlotLayout.BandSpot band : layout.bands()) {
                c.rect(band.left(), t, band.right() - band.left(), b - t, PlotStyle.BAND_FILL, PlotStyle.BAND_OPACITY);
            }
            for (PlotLayout.TextBox box : layout.bandLabels()) {
                c.text(box.text(), box.left(), box.baseline(), box.fontPx(), Canvas.Anchor.START,
                        PlotStyle.BAND_TEXT, false);
            }
            c.end();
        }

        c.begin("axes");
        c.line(l, b, r, b, PlotStyle.AXIS, PlotStyle.AXIS_WIDTH);
        c.line(l, t, l, b, PlotStyle.AXIS, PlotStyle.AXIS_WIDTH);
        NiceTicks xt = layout.xTicks();
        for (double v : xt.values()) {
            double x = layout.px(v);
            c.line(x, b, x, b + PlotStyle.TICK_LENGTH, PlotStyle.AXIS, PlotStyle.AXIS_WIDTH);
            c.text(xt.format(v), x, layout.xTickBaseline(), PlotStyle.TICK_FONT, Canvas.Anchor.MIDDLE,
                    PlotStyle.TEXT, false);
        }
        NiceTicks yt = layout.yTicks();
        for (double v : yt.values()) {
            double y = layout.py(v);
            c.line(l - PlotStyle.TICK_LENGTH, y, l, y, PlotStyle.AXIS, PlotStyle.AXIS_WIDTH);
            c.text(yt.format(v), l - PlotStyle.TICK_LENGTH - 3, y + PlotStyle.TICK_FONT * 0.35,
                    PlotStyle.TICK_FONT, Canvas.Anchor.END, PlotStyle.TEXT, false);
        }
        c.text(model.axis().title(), (l + r) / 2, layout.xTitleBaseline(), PlotStyle.AXIS_TITLE_FONT,
                Canvas.Anchor.MIDDLE, PlotStyle.TEXT, false);
        c.verticalText("Signal (detector units)", layout.yTitleX(), (t + b) / 2, PlotStyle.AXIS_TITLE_FONT,
                PlotStyle.TEXT);
        c.end();

        c.begin("traces");
        for (PlotLayout.Polyline p : layout.curves()) {
            if (p.size() > 1) {
                c.polyline(p.xs(), p.ys(), PlotStyle.seriesColour(p.series()), PlotStyle.SERIES_WIDTH);
            }
        }
        c.end();

        if (!layout.markers().isEmpty()) {
            c.begin("peaks");
            for (PlotLayout.TextBox box : layout.peakLabels()) {
                if (box.leader()) {
                    c.line(box.anchorX(), box.anchorY(), box.leaderEndX(), box.leaderEndY(), PlotStyle.LEADER, 0.8);
                }
            }
            for (PlotLayout.MarkerSpot m : layout.markers()) {
                marker(c, m.mark().status(), m.cx(), m.cy(), PlotStyle.MARKER_RADIUS);
            }
            for (PlotLayout.TextBox box : layout.peakLabels()) {
                c.text(box.text(), box.left(), box.baseline(), box.fontPx(), Canvas.Anchor.START,
                        PlotStyle.TEXT, false);
            }
            c.end();
        }

        if (!model.title().isEmpty()) {
            c.text(model.title(), l, 8 + PlotStyle.TITLE_FONT, PlotStyle.TITLE_FONT, Canvas.Anchor.START,
                    PlotStyle.TEXT, true);
        }

        if (!layout.legend().isEmpty()) {
            c.begin("legend");
            double sw = PlotLayout.legendSwatchWidth();
            for (PlotLayout.LegendItem item : layout.legend()) {
                double midY = item.baseline() - PlotStyle.LEGEND_FONT * 0.35;
                if (item.status() != null) {
                    marker(c, item.status(), item.x() + sw / 2, midY, PlotStyle.MARKER_RADIUS);
                } else if (item.series() >= 0) {
                    c.line(item.x(), midY, item.x() + sw, midY, PlotStyle.seriesColour(item.series()), 2.5);
                }
                c.text(item.text(), item.x() + sw + 6, item.baseline(), PlotStyle.LEGEND_FONT,
                        Canvas.Anchor.START, PlotStyle.MUTED_TEXT, false);
            }
            c.end();
        }
    }

    /**
     * A status marker of radius about {@code r} centred on (cx, cy): identified = filled circle,
     * ambiguous = filled diamond, unassigned = hollow downward triangle, marker = hollow square.
     */
    static void marker(Canvas c, PeakStatus status, double cx, double cy, double r) {
        String colour = PlotStyle.statusColour(status);
        double w = PlotStyle.MARKER_STROKE;
        switch (status) {
            case IDENTIFIED:
                c.circle(cx, cy, r, colour, colour, w);
                break;
            case AMBIGUOUS: {
                double d = r * 1.3;
                c.polygon(new double[] {cx, cx + d, cx, cx - d}, new double[] {cy - d, cy, cy + d, cy},
                        colour, colour, w);
                break;
            }
            case UNASSIGNED: {
                double h = r * 1.15;
                c.polygon(new double[] {cx - h, cx + h, cx}, new double[] {cy - r, cy - r, cy + h},
                        PlotStyle.BACKGROUND, colour, w);
                break;
            }
            default: {
                double h = r * 0.9;
                c.polygon(new double[] {cx - h, cx + h, cx + h, cx - h}, new double[] {cy - h, cy - h, cy + h, cy + h},
                        PlotStyle.BACKGROUND, colour, w);
                break;
            }
        }
    }
}
