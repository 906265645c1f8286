package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotLayout;
import org.mobident.report.plot.ToleranceBand;

class PlotSceneTest {
    private static final int W = 900;
    private static final int H = 400;
    private static final double EPS = 1e-9;

    static {
        System.setProperty("java.awt.headless", "true");
    }

    @Test
    void runsWithDifferentEofLineUpOnTheMobilityAxisButNotOnTheTimeAxis() {
        ViewerData data = ViewerFixtures.data();
        PlotScene time = PlotScene.of(data, ViewState.initial(Axis.TIME, List.of(0, 1)));
        PlotScene mob = PlotScene.of(data, ViewState.initial(Axis.MOBILITY, List.of(0, 1)));
        PeakRef early = new PeakRef(0, ViewerFixtures.NITRATE);
        PeakRef late = new PeakRef(1, ViewerFixtures.NITRATE);
        // nitrate (−30): 12000/(−30 + 60) = 400 s with the marker at 200 s; 12000/(−30 + 48) = 666.7 s at 250 s
        assertEquals(400, time.spotOf(early).x(), 1e-6);
        assertEquals(12000.0 / 18, time.spotOf(late).x(), 1e-6);
        assertEquals(-30, mob.spotOf(early).x(), 1e-6);
        assertEquals(mob.spotOf(early).x(), mob.spotOf(late).x(), 1e-6);
        assertEquals(2, mob.model().series().size());
        assertEquals(8, mob.spots().size());
    }

    @Test
    void aRunWithoutAScaleIsLeftOffTheMobilityAxisAndSaidSo() {
        ViewerData data = ViewerFixtures.data();
        PlotScene mob = PlotScene.of(data, ViewState.initial(Axis.MOBILITY, List.of(0, 2)));
        assertEquals(List.of("unscaled"), mob.omittedRuns());
        assertTrue(mob.spots().stream().allMatch(s -> s.ref().run() == 0));
        PlotScene time = PlotScene.of(data, ViewState.initial(Axis.TIME, List.of(2)));
        assertEquals(4, time.spots().size(), "on the time axis it is drawn with its peaks");
        assertTrue(time.omittedRuns().isEmpty());
    }

    @Test
    void aClickPicksTheNearestPeakInPixelsAndNothingFarAway() {
        ViewerData data = ViewerFixtures.data();
        PlotScene scene = PlotScene.of(data, ViewState.initial(Axis.TIME, List.of(0)));
        PlotLayout layout = PlotLayout.of(scene.model(), W, H);
        for (PlotScene.PeakSpot s : scene.spots()) {
            double px = layout.px(s.x());
            double py = layout.py(s.y());
            assertEquals(s.ref(), scene.pick(layout, px + 3, py - 40), "just beside " + s.ref());
            assertEquals(s.ref(), scene.pick(layout, px - PlotScene.PICK_RADIUS_PX + 0.5, layout.plotBottom()));
        }
        double between = (layout.px(ViewerFixtures.scaleFor(200).timeS(20)) + layout.px(200)) / 2;
        assertNull(scene.pick(layout, between, layout.py(ViewerFixtures.BASELINE)), "25 s from any peak");
    }

    @Test
    void ofPeaksLinedUpAcrossRunsTheOneOnTheClickedCurveWins() {
        ViewerData data = ViewerFixtures.data();
        PlotScene scene = PlotScene.of(data, ViewState.initial(Axis.MOBILITY, List.of(0, 1)));
        PlotLayout layout = PlotLayout.of(scene.model(), W, H);
        PlotScene.PeakSpot early = scene.spotOf(new PeakRef(0, ViewerFixtures.NITRATE));
        PlotScene.PeakSpot late = scene.spotOf(new PeakRef(1, ViewerFixtures.NITRATE));
        assertEquals(layout.px(early.x()), layout.px(late.x()), 0.5, "same column");
        // the late run is drawn at half the height: a click on either apex picks that run's peak
        double px = layout.px(early.x());
        assertEquals(early.ref(), scene.pick(layout, px, layout.py(early.y())));
        assertEquals(late.ref(), scene.pick(layout, px, layout.py(late.y())));
        assertTrue(Math.abs(layout.py(early.y()) - layout.py(late.y())) > 20, "apexes apart vertically");
    }

    @Test
    void dataXUndoesPx() {
        PlotScene scene = PlotScene.of(ViewerFixtures.data(), ViewState.initial(Axis.MOBILITY, List.of(0)));
        PlotLayout layout = PlotLayout.of(scene.model(), W, H);
        for (double x : new double[] {-30, -10, 0, 20}) {
            assertEquals(x, PlotScene.dataX(layout, layout.px(x)), 1e-9);
        }
    }

    @Test
    void theStateDecidesRangeAndBands() {
        ViewerData data = ViewerFixtures.data();
        ViewState s = ViewState.initial(Axis.MOBILITY, List.of(0));
        PlotScene withBands = PlotScene.of(data, s);
        assertEquals(3, withBands.model().bands().size());
        assertTrue(withBands.model().bandLabels());
        PlotScene without = PlotScene.of(data, s.withBands(false));
        assertTrue(without.model().bands().isEmpty());

        PlotScene zoomed = PlotScene.of(data, s.zoomedTo(-35, -25, withBands.limits()));
        assertEquals(-35, zoomed.model().xMin(), EPS);
        assertEquals(-25, zoomed.model().xMax(), EPS);
        assertEquals(new XRange(-35, -25), zoomed.current());
        // the run ends at 720 s: 12000/720 − 60 = −43.3, the lowest mobility it reaches
        assertEquals(12000.0 / 720 - 60, zoomed.limits().lo(), 1e-6);
        assertTrue(zoomed.limits().contains(40),
                "the limits are what the data cover, not the zoomed range: " + zoomed.limits());
        assertFalse(zoomed.limits().contains(-PlotSceneTest.MAX_SHOWN));
    }

    @Test
    void nothingTickedGivesAnEmptyButValidScene() {
        PlotScene scene = PlotScene.of(ViewerFixtures.data(), ViewState.initial(Axis.TIME, List.of()));
        assertFalse(scene.hasCurves());
        assertTrue(scene.spots().isEmpty());
        assertNotNull(PlotLayout.of(scene.model(), W, H));
    }

    /** Beyond the largest mobility the plot shows ({@code PlotModel.MAX_DISPLAY_MOBILITY}). */
    private static final double MAX_SHOWN = 401;

    @Test
    void aWarmRunsPeaksSitWhereTheyAreDrawnAtTheLibraryTemperature() {
        ViewerRun early = ViewerFixtures.run("early", 200, true);
        java.util.List<org.mobident.result.PeakResult> peaks = new java.util.ArrayList<>();
        for (org.mobident.result.PeakResult p : early.result().peaks()) {
            peaks.add(new org.mobident.result.PeakResult(p.peak(), p.role(), p.mobility(), p.mobilitySd(),
                    0.9 * p.mobility(), p.match()));
        }
        org.mobident.result.RunResult r = early.result();
        ViewerRun warm = new ViewerRun(early.spec(), early.trace(), new org.mobident.result.RunResult(r.spec(), null,
                r.scaleNote(), r.eofMobility(), r.scale(), peaks, r.notes(), r.noiseSd(),
                org.mobident.result.RunScale.OFF, 0.9));
        ViewerData data = new ViewerData(ViewerFixtures.library(), ToleranceBand.matching(ViewerFixtures.library(),
                org.mobident.settings.MatchSettings.DEFAULT), List.of(warm));
        PlotScene mob = PlotScene.of(data, ViewState.initial(Axis.MOBILITY, List.of(0)));
        // nitrate: −30 at the run temperature, compared with the library as 0.9 × −30 = −27
        assertEquals(-27, mob.spotOf(new PeakRef(0, ViewerFixtures.NITRATE)).x(), 1e-6);
    }
}
