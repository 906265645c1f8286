package org.mobident.report.plot;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.mobident.io.SafeFiles;

/**
 * Renders a {@link PlotModel} to a raster image with Java2D, laid out exactly as
 * {@link SvgPlot} lays it out. Needs no display: it draws into a {@link BufferedImage}, which
 * works with {@code java.awt.headless=true}.
 */
public final class PngPlot {

    private PngPlot() {
    }

    /** The plot as an RGB image of {@code widthPx} × {@code heightPx}. */
    public static BufferedImage render(PlotModel model, int widthPx, int heightPx) {
        BufferedImage image = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            paint(g, model, widthPx, heightPx);
        } finally {
            g.dispose();
        }
        return image;
    }

    /**
     * Paints the plot on a caller's graphics context (a Swing component, an image, a printer
     * page) with the one drawing routine the PNG and SVG output use, in the context's current
     * coordinate system from (0, 0) to ({@code widthPx}, {@code heightPx}). Rendering hints are
     * set on {@code g} for smooth curves and text; its colour, stroke, font and composite are
     * left changed, so pass a copy ({@code g.create()}) when that matters.
     *
     * @return the layout that was drawn, to map data values to pixels and back
     * @throws IllegalArgumentException when the size is too small for the axes (see {@link PlotLayout#of})
     */
    public static PlotLayout paint(Graphics2D g, PlotModel model, int widthPx, int heightPx) {
        PlotLayout layout = PlotLayout.of(model, widthPx, heightPx);
        hints(g);
        PlotPainter.paint(layout, new Java2dCanvas(g));
        return layout;
    }

    private static void hints(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
    }

    /**
     * The figure as one RGB image: its panels stacked top to bottom, each {@code widthPx} ×
     * {@code panelHeightPx}, laid out as {@link SvgPlot#render(PlotFigure, int, int)} lays them out.
     */
    public static BufferedImage render(PlotFigure figure, int widthPx, int panelHeightPx) {
        List<PlotLayout> layouts = new ArrayList<>();
        for (PlotModel m : figure.panels()) {
            layouts.add(PlotLayout.of(m, widthPx, panelHeightPx));
        }
        BufferedImage image = new BufferedImage(widthPx, figure.heightPx(panelHeightPx), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            for (int i = 0; i < layouts.size(); i++) {
                Graphics2D panel = (Graphics2D) g.create(0, i * panelHeightPx, widthPx, panelHeightPx);
                try {
                    hints(panel);
                    PlotPainter.paint(layouts.get(i), new Java2dCanvas(panel));
                } finally {
                    panel.dispose();
                }
            }
        } finally {
            g.dispose();
        }
        return image;
    }

    /** Renders the figure and writes it as a PNG file, atomically (see {@link SafeFiles}). */
    public static void write(PlotFigure figure, int widthPx, int panelHeightPx, Path target, boolean overwrite)
            throws IOException {
        writeImage(render(figure, widthPx, panelHeightPx), target, overwrite);
    }

    /**
     * Renders the plot and writes it as a PNG file, atomically (see {@link SafeFiles}).
     *
     * @param overwrite whether an existing file may be replaced
     */
    public static void write(PlotModel model, int widthPx, int heightPx, Path target, boolean overwrite)
            throws IOException {
        writeImage(render(model, widthPx, heightPx), target, overwrite);
    }

    private static void writeImage(BufferedImage image, Path target, boolean overwrite) throws IOException {
        SafeFiles.writeBytes(target, overwrite, out -> {
            if (!ImageIO.write(image, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
    }
}
