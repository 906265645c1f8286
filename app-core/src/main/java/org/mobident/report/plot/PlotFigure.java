package org.mobident.report.plot;

import java.util.List;

/**
 * One picture of one or more plots stacked top to bottom, each drawn at the full width and its
 * own height (a panel per buffer when an overlay mixes buffers, see {@link BufferGroups}). Both
 * renderers take it: {@link SvgPlot#render(PlotFigure, int, int)} and {@link PngPlot#write(PlotFigure, int, int,
 * java.nio.file.Path, boolean)}.
 *
 * @param panels the plots, top first; at least one
 */
public record PlotFigure(List<PlotModel> panels) {

    public PlotFigure {
        panels = List.copyOf(panels);
        if (panels.isEmpty()) {
            throw new IllegalArgumentException("a figure needs at least one plot");
        }
    }

    /** A figure of a single plot. */
    public static PlotFigure of(PlotModel model) {
        return new PlotFigure(List.of(model));
    }

    /** The number of panels. */
    public int size() {
        return panels.size();
    }

    /** Total height of the picture when every panel is {@code panelHeightPx} high. */
    public int heightPx(int panelHeightPx) {
        return panels.size() * panelHeightPx;
    }
}
