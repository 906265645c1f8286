package org.mobident.report.plot;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
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
        PlotLayout layout = PlotLayout.of(model, widthPx, heightPx);
        BufferedImage image = new BufferedImage(widthPx, heightPx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            PlotPainter.paint(layout, new Java2dCanvas(g));
        } finally {
            g.dispose();
        }
        return image;
    }

    /**
     * Renders the plot and writes it as a PNG file, atomically (see {@link SafeFiles}).
     *
     * @param overwrite whether an existing file may be replaced
     */
    public static void write(PlotModel model, int widthPx, int heightPx, Path target, boolean overwrite)
            throws IOException {
        BufferedImage image = render(model, widthPx, heightPx);
        SafeFiles.writeBytes(target, overwrite, out -> {
            if (!ImageIO.write(image, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
    }
}
