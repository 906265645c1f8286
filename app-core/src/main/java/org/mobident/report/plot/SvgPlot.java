package org.mobident.report.plot;

import java.util.ArrayList;
import java.util.List;

/**
 * Renders a {@link PlotModel} as a standalone SVG document (also valid inline in XHTML-style
 * HTML5). The output depends only on the model and the size, so equal inputs give equal bytes.
 */
public final class SvgPlot {

    private SvgPlot() {
    }

    /** The plot as an {@code <svg>} element of {@code widthPx} × {@code heightPx}, scalable by its viewBox. */
    public static String render(PlotModel model, int widthPx, int heightPx) {
        PlotLayout layout = PlotLayout.of(model, widthPx, heightPx);
        StringBuilder sb = new StringBuilder(64 * 1024);
        String label = model.title().isEmpty() ? "Electropherogram" : model.title();
        openSvg(sb, widthPx, heightPx, label);
        PlotPainter.paint(layout, new SvgCanvas(sb));
        sb.append("</svg>\n");
        return sb.toString();
    }

    /**
     * The figure as one {@code <svg>} element: its panels stacked top to bottom, each
     * {@code widthPx} × {@code panelHeightPx} in a group of class "panel". A figure of one panel
     * gives exactly {@link #render(PlotModel, int, int)}.
     */
    public static String render(PlotFigure figure, int widthPx, int panelHeightPx) {
        if (figure.size() == 1) {
            return render(figure.panels().get(0), widthPx, panelHeightPx);
        }
        List<PlotLayout> layouts = new ArrayList<>();
        for (PlotModel m : figure.panels()) {
            layouts.add(PlotLayout.of(m, widthPx, panelHeightPx));
        }
        int heightPx = figure.heightPx(panelHeightPx);
        StringBuilder sb = new StringBuilder(64 * 1024 * figure.size());
        List<String> titles = new ArrayList<>();
        for (PlotModel m : figure.panels()) {
            titles.add(m.title().isEmpty() ? "Electropherogram" : m.title());
        }
        String label = String.join("; ", titles);
        openSvg(sb, widthPx, heightPx, label);
        for (int i = 0; i < layouts.size(); i++) {
            sb.append("  <g class=\"panel\" transform=\"translate(0 ").append(i * panelHeightPx).append(")\">\n");
            PlotPainter.paint(layouts.get(i), new SvgCanvas(sb));
            sb.append("  </g>\n");
        }
        sb.append("</svg>\n");
        return sb.toString();
    }

    /**
     * A small inline SVG of the marker shape of {@code status}, {@code sizePx} square, for use
     * beside text in tables (so the table and the plot speak the same shapes).
     */
    public static String statusIcon(PeakStatus status, int sizePx) {
        StringBuilder sb = new StringBuilder(256);
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"").append(sizePx).append("\" height=\"")
                .append(sizePx).append("\" viewBox=\"0 0 ").append(sizePx).append(' ').append(sizePx)
                .append("\" role=\"img\" aria-label=\"").append(status.label()).append("\">");
        StringBuilder body = new StringBuilder();
        SvgCanvas c = new SvgCanvas(body);
        double half = sizePx / 2.0;
        PlotPainter.marker(c, status, half, half, sizePx * 0.3);
        sb.append(body.toString().replace("\n", "").replace("  <", "<")).append("</svg>");
        return sb.toString();
    }

    /** The opening {@code <svg>} tag of a plot of that size with its accessible label, and its title. */
    private static void openSvg(StringBuilder sb, int widthPx, int heightPx, String label) {
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"").append(widthPx)
                .append("\" height=\"").append(heightPx).append("\" viewBox=\"0 0 ").append(widthPx)
                .append(' ').append(heightPx).append("\" role=\"img\" aria-label=\"")
                .append(Markup.escape(label)).append("\" font-family=\"").append(PlotStyle.FONT_FAMILY)
                .append("\">\n");
        sb.append("  <title>").append(Markup.escape(label)).append("</title>\n");
    }
}
