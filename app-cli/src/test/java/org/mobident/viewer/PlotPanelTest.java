package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotLayout;
import org.mobident.report.plot.PngPlot;

/** The plot component painted headless into an image; expected pixels come from the layout. */
class PlotPanelTest {
    private static final int W = 900;
    private static final int H = 420;
    /** Largest per-channel difference for a pixel to count as a colour (anti-aliased edges vary). */
    private static final int COLOUR_TOLERANCE = 40;
    private static final int WHITE = 0xffffff;

    static {
        System.setProperty("java.awt.headless", "true");
    }

    @Test
    void withNothingSelectedThePanelPaintsExactlyThePlotOfTheReports() {
        PlotPanel panel = new PlotPanel();
        PlotScene scene = PlotScene.of(ViewerFixtures.data(), ViewState.initial(Axis.MOBILITY, List.of(0, 1)));
        panel.show(scene, "");
        BufferedImage shown = panel.snapshot(W, H);
        BufferedImage report = PngPlot.render(scene.model(), W, H);
        int differing = 0;
        for (int y = 0; y < H; y++) {
            for (int x = 0; x < W; x++) {
                differing += (shown.getRGB(x, y) & WHITE) == (report.getRGB(x, y) & WHITE) ? 0 : 1;
            }
        }
        assertEquals(0, differing);
    }

    @Test
    void theTraceIsDrawnThroughEachComputedApexAndIsFlatBetweenPeaks() {
        PlotPanel panel = new PlotPanel();
        PlotScene scene = PlotScene.of(ViewerFixtures.data(), ViewState.initial(Axis.TIME, List.of(0)).withBands(false));
        panel.show(scene, "");
        BufferedImage img = panel.snapshot(W, H);
        PlotLayout layout = panel.layoutOrNull();
        assertNotNull(layout);
        for (PlotScene.PeakSpot s : scene.spots()) {
            int x = (int) Math.round(layout.px(s.x()));
            int y = (int) Math.round(layout.py(s.y()));
            assertTrue(ink(img, x - 2, x + 2, y - 2, y + 2) > 0, "curve at the apex of " + s.ref());
        }
        // 470–520 s lies 70 s (58 σ) from every peak: only the baseline is drawn there
        int x0 = (int) Math.ceil(layout.px(470));
        int x1 = (int) Math.floor(layout.px(520));
        int base = (int) Math.round(layout.py(ViewerFixtures.BASELINE));
        assertTrue(x1 - x0 > 20);
        assertEquals(0, ink(img, x0, x1, (int) layout.plotTop() + 1, base - 4), "nothing above the flat baseline");
        assertTrue(ink(img, (x0 + x1) / 2, (x0 + x1) / 2, base - 2, base + 2) > 0, "the baseline itself");
    }

    @Test
    void theSelectedPeakIsRingedAndMarkedByAVerticalLine() {
        PlotPanel panel = new PlotPanel();
        ViewerData data = ViewerFixtures.data();
        PeakRef nitrate = new PeakRef(0, ViewerFixtures.NITRATE);
        PlotScene scene = PlotScene.of(data, ViewState.initial(Axis.TIME, List.of(0)).withSelectedPeak(nitrate));
        panel.show(scene, "");
        BufferedImage img = panel.snapshot(W, H);
        PlotLayout layout = panel.layoutOrNull();
        PlotScene.PeakSpot spot = scene.spotOf(nitrate);
        int x = (int) Math.round(layout.px(spot.x()));
        int y = (int) Math.round(layout.py(spot.y()));
        int r = (int) Math.round(PlotPanel.RING_RADIUS_PX);
        // the ring's left and right sides, on the apex row
        assertTrue(count(img, PlotPanel.SELECTION, x - r - 1, x - r + 1, y - 1, y + 1) > 0, "ring, left side");
        assertTrue(count(img, PlotPanel.SELECTION, x + r - 1, x + r + 1, y - 1, y + 1) > 0, "ring, right side");
        // the dashed line: about half of the plot height near the baseline row below the apex
        int lineStart = y + r + 4;
        int lineEnd = (int) layout.plotBottom() - 2;
        int dashes = count(img, PlotPanel.SELECTION, x, x, lineStart, lineEnd);
        assertTrue(dashes > (lineEnd - lineStart) / 4, "dashed line below the apex: " + dashes);
        // no ring at another peak
        PlotScene.PeakSpot other = scene.spotOf(new PeakRef(0, 0));
        int ox = (int) Math.round(layout.px(other.x()));
        int oy = (int) Math.round(layout.py(other.y()));
        assertEquals(0, count(img, PlotPanel.SELECTION, ox + r - 1, ox + r + 1, oy - 1, oy + 1));
    }

    @Test
    void anEmptySceneShowsItsMessageAndATinyPanelSaysToEnlarge() {
        PlotPanel panel = new PlotPanel();
        panel.show(PlotScene.of(ViewerFixtures.data(), ViewState.initial(Axis.TIME, List.of())), "Tick a run");
        BufferedImage img = panel.snapshot(W, H);
        PlotLayout layout = panel.layoutOrNull();
        int cx = (int) ((layout.plotLeft() + layout.plotRight()) / 2);
        int cy = (int) ((layout.plotTop() + layout.plotBottom()) / 2);
        assertTrue(count(img, PlotPanel.MESSAGE, cx - 60, cx + 60, cy - 12, cy + 12) > 10, "message text");

        BufferedImage tiny = panel.snapshot(60, 40);
        assertNull(panel.layoutOrNull());
        assertEquals(WHITE, tiny.getRGB(1, 1) & WHITE);
    }

    /** Pixels in the box that are not white (inclusive bounds, clipped to the image). */
    static int ink(BufferedImage img, int x0, int x1, int y0, int y1) {
        int n = 0;
        for (int x = Math.max(0, x0); x <= Math.min(img.getWidth() - 1, x1); x++) {
            for (int y = Math.max(0, y0); y <= Math.min(img.getHeight() - 1, y1); y++) {
                n += (img.getRGB(x, y) & WHITE) == WHITE ? 0 : 1;
            }
        }
        return n;
    }

    /** Pixels in the box within {@link #COLOUR_TOLERANCE} of {@code c} in every channel. */
    static int count(BufferedImage img, Color c, int x0, int x1, int y0, int y1) {
        int n = 0;
        for (int x = Math.max(0, x0); x <= Math.min(img.getWidth() - 1, x1); x++) {
            for (int y = Math.max(0, y0); y <= Math.min(img.getHeight() - 1, y1); y++) {
                Color p = new Color(img.getRGB(x, y));
                if (Math.abs(p.getRed() - c.getRed()) <= COLOUR_TOLERANCE
                        && Math.abs(p.getGreen() - c.getGreen()) <= COLOUR_TOLERANCE
                        && Math.abs(p.getBlue() - c.getBlue()) <= COLOUR_TOLERANCE) {
                    n++;
                }
            }
        }
        return n;
    }
}
