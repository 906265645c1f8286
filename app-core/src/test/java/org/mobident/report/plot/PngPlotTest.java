package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Draws synthetic runs headless and checks the pixels against positions computed from the
 * data through {@link PlotLayout} (never against a stored image).
 */
class PngPlotTest {
    private static final int W = 900;
    private static final int H = 340;
    /** Largest per-channel difference for a pixel to count as a given colour (anti-aliased edges differ more). */
    private static final int COLOUR_TOLERANCE = 40;

    static {
        System.setProperty("java.awt.headless", "true");
    }

    @Test
    void theTraceReachesTheComputedApexOfAGaussianPeak() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(run.trace(), run.result(), null, Axis.TIME);
        BufferedImage img = PngPlot.render(model, W, H);
        PlotLayout layout = PlotLayout.of(model, W, H);
        Color series = Java2dCanvas.colour(PlotStyle.seriesColour(0));

        double apexTime = PlotFixtures.scaleFor(200).timeS(PlotFixtures.ANION_MOBILITY);
        int x = (int) Math.round(layout.px(apexTime));
        int y = (int) Math.round(layout.py(PlotFixtures.BASELINE + PlotFixtures.ANION_HEIGHT));
        int top = topmostRow(img, series, x - 2, x + 2, 0, H - 1);
        assertTrue(Math.abs(top - y) <= 2, "apex drawn at row " + top + ", expected " + y);
        // Just beside the narrow peak the trace is down at the baseline, not at the apex height.
        int beside = (int) Math.round(layout.px(apexTime + 20));
        assertEquals(-1, topmostRow(img, series, beside, beside, 0, y + 20),
                "no trace near the apex height 20 s away from the peak");
    }

    @Test
    void eachPeakHasItsMarkerAndLabelNearIt() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(run.trace(), run.result(), null, Axis.TIME);
        BufferedImage img = PngPlot.render(model, W, H);
        PlotLayout layout = PlotLayout.of(model, W, H);

        assertEquals(4, layout.markers().size());
        assertEquals(4, layout.peakLabels().size());
        for (PlotLayout.MarkerSpot m : layout.markers()) {
            double apexX = layout.px(m.mark().x());
            double apexY = layout.py(m.mark().y());
            assertTrue(Math.abs(m.cx() - apexX) <= 1, "marker centred on its peak");
            assertTrue(m.cy() < apexY && apexY - m.cy() < 15, "marker just above its apex");
            Color c = Java2dCanvas.colour(PlotStyle.statusColour(m.mark().status()));
            int r = (int) Math.ceil(PlotStyle.MARKER_RADIUS) + 1;
            int found = count(img, c, (int) m.cx() - r, (int) m.cx() + r, (int) m.cy() - r, (int) m.cy() + r);
            assertTrue(found >= 4, "marker of " + m.mark().label() + " drawn in its colour, found " + found);
        }
        Color ink = Java2dCanvas.colour(PlotStyle.TEXT);
        for (PlotLayout.TextBox box : layout.peakLabels()) {
            int found = countDark(img, (int) box.left(), (int) Math.ceil(box.right()),
                    (int) box.top(), (int) Math.ceil(box.bottom()));
            assertTrue(found >= 3, "label '" + box.text() + "' has ink, found " + found);
            assertTrue(box.bottom() < layout.py(peakY(layout, box)) , "label above its peak");
        }
        assertTrue(ink.getRed() < 100, "text colour is dark");
    }

    @Test
    void nothingIsDrawnAboveAFlatBaseline() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(run.trace(), run.result(), null, Axis.TIME);
        BufferedImage img = PngPlot.render(model, W, H);
        PlotLayout layout = PlotLayout.of(model, W, H);
        // 460–540 s: every peak is at least 60 s (40 σ) away, so the trace is flat baseline.
        int x0 = (int) Math.ceil(layout.px(460));
        int x1 = (int) Math.floor(layout.px(540));
        int y0 = (int) Math.ceil(layout.plotTop()) + 1;
        int y1 = (int) Math.floor(layout.py(PlotFixtures.BASELINE)) - 4;
        assertTrue(x1 - x0 > 50 && y1 - y0 > 100, "a sizeable region is checked");
        int white = 0xffffff;
        for (int x = x0; x <= x1; x++) {
            for (int y = y0; y <= y1; y++) {
                assertEquals(white, img.getRGB(x, y) & 0xffffff, "pixel (" + x + "," + y + ") is blank");
            }
        }
        // ...and the baseline itself is drawn there.
        int mid = (x0 + x1) / 2;
        int base = (int) Math.round(layout.py(PlotFixtures.BASELINE));
        // (a 1.4 px line on a whole pixel row is drawn as two rows at 70 %, so ink is judged by darkness)
        int inked = 0;
        for (int y = base - 2; y <= base + 2; y++) {
            Color p = new Color(img.getRGB(mid, y));
            inked += p.getBlue() > p.getRed() && p.getRed() < 160 ? 1 : 0;
        }
        assertTrue(inked > 0, "the baseline is drawn in the series colour");
    }

    @Test
    void runsWithDifferentEofLineUpOnTheMobilityAxis() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("early EOF", 200, 1.0);
        PlotFixtures.SyntheticRun b = PlotFixtures.run("late EOF", 240, 0.6);
        // Same analyte, different migration times: 400 s against 600 s.
        assertTrue(Math.abs(a.result().peaks().get(3).peak().apexTimeS()
                - b.result().peaks().get(3).peak().apexTimeS()) > 100);
        PlotModel model = PlotModel.builder(Axis.MOBILITY).run(a.trace(), a.result()).run(b.trace(), b.result())
                .peakLabels(false).build();
        BufferedImage img = PngPlot.render(model, W, H);
        PlotLayout layout = PlotLayout.of(model, W, H);
        Color ca = Java2dCanvas.colour(PlotStyle.seriesColour(0));
        Color cb = Java2dCanvas.colour(PlotStyle.seriesColour(1));

        for (double mobility : new double[] {PlotFixtures.ANION_MOBILITY, PlotFixtures.CATION_MOBILITY}) {
            int expected = (int) Math.round(layout.px(mobility));
            int[] apexA = apexColumn(img, ca, expected - 15, expected + 15, layout);
            int[] apexB = apexColumn(img, cb, expected - 15, expected + 15, layout);
            assertTrue(Math.abs(apexA[0] - apexB[0]) <= 2,
                    "same analyte at the same column: " + apexA[0] + " vs " + apexB[0]);
            assertTrue(Math.abs(apexA[0] - expected) <= 2, "at the mobility's column " + expected);
            assertTrue(apexB[1] > apexA[1] + 10, "the smaller run's apex is lower");
        }
        // The peak markers of the two runs share the column as well.
        for (int k = 0; k < 4; k++) {
            double xa = layout.markers().stream().filter(m -> m.mark().series() == 0).toList().get(k).cx();
            double xb = layout.markers().stream().filter(m -> m.mark().series() == 1).toList().get(k).cx();
            assertTrue(Math.abs(xa - xb) <= 2, "markers line up: " + xa + " vs " + xb);
        }
    }

    @Test
    void writesAPngFileThatReadsBack(@TempDir Path dir) throws Exception {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel model = PlotModel.of(run.trace(), run.result(), PlotFixtures.library(), Axis.MOBILITY);
        Path file = dir.resolve("a.png");
        PngPlot.write(model, 640, 300, file, false);
        BufferedImage back = ImageIO.read(file.toFile());
        assertEquals(640, back.getWidth());
        assertEquals(300, back.getHeight());
        assertFalse(Files.exists(dir.resolve("a.png.tmp")));
    }

    /** The signal of the peak a label belongs to (the peak whose marker sits under it). */
    private static double peakY(PlotLayout layout, PlotLayout.TextBox box) {
        return layout.markers().stream().filter(m -> Math.abs(m.cx() - box.anchorX()) < 0.5)
                .findFirst().orElseThrow().mark().y();
    }

    /** [column, row] of the highest pixel of colour c within the columns, inside the plot area. */
    private static int[] apexColumn(BufferedImage img, Color c, int x0, int x1, PlotLayout layout) {
        int bestX = -1;
        int bestY = Integer.MAX_VALUE;
        for (int x = x0; x <= x1; x++) {
            int y = topmostRow(img, c, x, x, (int) layout.plotTop(), (int) layout.plotBottom() - 1);
            if (y >= 0 && y < bestY) {
                bestY = y;
                bestX = x;
            }
        }
        assertTrue(bestX >= 0, "curve found near column " + (x0 + x1) / 2);
        return new int[] {bestX, bestY};
    }

    private static int topmostRow(BufferedImage img, Color c, int x0, int x1, int y0, int y1) {
        for (int y = Math.max(0, y0); y <= Math.min(img.getHeight() - 1, y1); y++) {
            for (int x = Math.max(0, x0); x <= Math.min(img.getWidth() - 1, x1); x++) {
                if (near(img.getRGB(x, y), c)) {
                    return y;
                }
            }
        }
        return -1;
    }

    private static int count(BufferedImage img, Color c, int x0, int x1, int y0, int y1) {
        int n = 0;
        for (int y = Math.max(0, y0); y <= Math.min(img.getHeight() - 1, y1); y++) {
            for (int x = Math.max(0, x0); x <= Math.min(img.getWidth() - 1, x1); x++) {
                if (near(img.getRGB(x, y), c)) {
                    n++;
                }
            }
        }
        return n;
    }

    private static int countDark(BufferedImage img, int x0, int x1, int y0, int y1) {
        int n = 0;
        for (int y = Math.max(0, y0); y <= Math.min(img.getHeight() - 1, y1); y++) {
            for (int x = Math.max(0, x0); x <= Math.min(img.getWidth() - 1, x1); x++) {
                Color p = new Color(img.getRGB(x, y));
                if (p.getRed() + p.getGreen() + p.getBlue() < 3 * 128) {
                    n++;
                }
            }
        }
        return n;
    }

    private static boolean near(int rgb, Color c) {
        Color p = new Color(rgb);
        return Math.abs(p.getRed() - c.getRed()) <= COLOUR_TOLERANCE
                && Math.abs(p.getGreen() - c.getGreen()) <= COLOUR_TOLERANCE
                && Math.abs(p.getBlue() - c.getBlue()) <= COLOUR_TOLERANCE;
    }
}
