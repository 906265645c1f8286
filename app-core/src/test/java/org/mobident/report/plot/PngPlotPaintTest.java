package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;

/** {@link PngPlot#paint}: the public entry point that paints on a caller's graphics context. */
class PngPlotPaintTest {
    private static final int W = 700;
    private static final int H = 300;
    private static final int DX = 37;
    private static final int DY = 21;
    private static final int FILLER = 0x123456;

    static {
        System.setProperty("java.awt.headless", "true");
    }

    @Test
    void paintingAtAnOffsetGivesTheSamePixelsAsRender() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(run.trace(), run.result(), PlotFixtures.library(), Axis.MOBILITY);
        BufferedImage alone = PngPlot.render(model, W, H);

        BufferedImage big = new BufferedImage(W + 2 * DX, H + 2 * DY, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = big.createGraphics();
        g.setColor(new Color(FILLER));
        g.fillRect(0, 0, big.getWidth(), big.getHeight());
        g.translate(DX, DY);
        PlotLayout layout = PngPlot.paint(g, model, W, H);
        g.dispose();

        PlotLayout expected = PlotLayout.of(model, W, H);
        assertEquals(expected.plotLeft(), layout.plotLeft());
        assertEquals(expected.plotBottom(), layout.plotBottom());
        assertEquals(expected.markers().size(), layout.markers().size());
        int differing = 0;
        for (int y = 0; y < H; y++) {
            for (int x = 0; x < W; x++) {
                if ((alone.getRGB(x, y) & 0xffffff) != (big.getRGB(x + DX, y + DY) & 0xffffff)) {
                    differing++;
                }
            }
        }
        assertEquals(0, differing, "pixels that differ between render() and paint() at an offset");
        // Outside the painted rectangle the caller's own drawing is untouched.
        assertEquals(FILLER, big.getRGB(DX - 1, DY - 1) & 0xffffff);
        assertEquals(FILLER, big.getRGB(DX + W, DY + H) & 0xffffff);
    }

    @Test
    void tooSmallACanvasIsRefusedBeforeAnythingIsDrawn() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(run.trace(), run.result(), null, Axis.TIME);
        BufferedImage img = new BufferedImage(50, 40, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            assertThrows(IllegalArgumentException.class, () -> PngPlot.paint(g, model, 50, 40));
        } finally {
            g.dispose();
        }
        assertEquals(0, img.getRGB(25, 20) & 0xffffff, "nothing painted");
    }
}
