package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MobilityScale;
import org.mobident.result.RunResult;
import org.mobident.trace.Trace;

class PlotModelTest {

    @Test
    void timeAxisKeepsEverySample() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel m = PlotModel.of(run.trace(), run.result(), null, Axis.TIME);
        assertEquals(1, m.series().size());
        assertEquals(run.trace().size(), m.series().get(0).size());
        assertEquals(0.0, m.xMin(), 0);
        assertEquals(PlotFixtures.END_S, m.xMax(), 1e-9);
        assertEquals(PlotFixtures.BASELINE, m.yMin(), 1e-6);
        assertEquals(PlotFixtures.BASELINE + PlotFixtures.ANION_HEIGHT, m.yMax(), 1e-3);
    }

    @Test
    void peaksCarryStatusAndLabel() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel m = PlotModel.of(run.trace(), run.result(), null, Axis.MOBILITY);
        List<PlotModel.PeakMark> p = m.peaks();
        assertEquals(4, p.size());
        assertEquals("lithium 55%", p.get(0).label());
        assertEquals(PeakStatus.AMBIGUOUS, p.get(0).status());
        assertEquals("marker", p.get(1).label(), "the legend's word for the marker");
        assertEquals(PeakStatus.MARKER, p.get(1).status());
        assertEquals("?", p.get(2).label());
        assertEquals(PeakStatus.UNASSIGNED, p.get(2).status());
        assertEquals("nitrate 97%", p.get(3).label());
        assertEquals(PeakStatus.IDENTIFIED, p.get(3).status());
        // positions in mobility: a/t + b at the apex time gives back the analyte's mobility
        assertEquals(PlotFixtures.ANION_MOBILITY, p.get(3).x(), 1e-9);
        assertEquals(PlotFixtures.BASELINE + PlotFixtures.ANION_HEIGHT, p.get(3).y(), 1e-6);
    }

    @Test
    void mobilityAxisDropsSamplesWithoutAFiniteMobility() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel m = PlotModel.of(run.trace(), run.result(), null, Axis.MOBILITY);
        PlotModel.Series s = m.series().get(0);
        // t = 0 maps to an infinite mobility and is dropped; all others are kept.
        assertEquals(run.trace().size() - 1, s.size());
        for (int i = 0; i < s.size(); i++) {
            assertTrue(Double.isFinite(s.x(i)));
            if (i > 0) {
                assertTrue(s.x(i) < s.x(i - 1), "mobility falls with time (a > 0)");
            }
        }
        // the axis is bounded by peaks and padding, not by the huge mobilities of early samples
        assertTrue(m.xMin() > -50 && m.xMax() < 40, m.xMin() + ".." + m.xMax());
        assertTrue(m.xMin() < PlotFixtures.ANION_MOBILITY && m.xMax() > PlotFixtures.CATION_MOBILITY);
    }

    /** μ = a/(t − τ/2) + b with a ramp of τ = 10 s: samples before 5 s lie on the other branch of the hyperbola. */
    private record RampedScale(double a, double b, double originS) implements MobilityScale {
        @Override
        public double mobility(double timeS) {
            return a / (timeS - originS) + b;
        }

        @Override
        public double mobilitySd(double timeS, double timeSdS) {
            return Double.NaN;
        }

        @Override
        public double timeS(double mobility) {
            return originS + a / (mobility - b);
        }

        @Override
        public double eofMobility() {
            return -b;
        }

        @Override
        public String describe() {
            return "ramped test scale";
        }
    }

    @Test
    void samplesBeforeTheRampCorrectedOriginAreDropped() {
        for (double offset : new double[] {0.0, 0.2}) {
            double[] t = new double[200];
            double[] y = new double[200];
            for (int i = 0; i < t.length; i++) {
                t[i] = offset + i * 0.5;
                y[i] = 1;
            }
            Trace trace = new Trace("r", "r.csv", t, y);
            RunResult result = new RunResult(PlotFixtures.spec("r", null), null, "x", 60,
                    new RampedScale(12000, -60, 5), List.of(), List.of(), 0);
            PlotModel m = PlotModel.builder(Axis.MOBILITY).run(trace, result).build();
            PlotModel.Series s = m.series().get(0);
            // offset 0: ten samples before 5 s plus the one at 5 s (infinite); offset 0.2: ten before.
            int dropped = offset == 0.0 ? 11 : 10;
            assertEquals(t.length - dropped, s.size(), "samples at t <= 5 s dropped, offset " + offset);
            assertTrue(s.x(0) > 1000, "first kept sample is just after the origin");
        }
    }

    @Test
    void runWithoutScaleCannotBePlacedOnTheMobilityAxis() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotFixtures.SyntheticRun other = PlotFixtures.run("b", 220, 1.0);
        RunResult noScale = new RunResult(run.result().spec(), null, "no marker found", Double.NaN, null,
                run.result().peaks(), List.of(), 0.01);
        PlotModel m = PlotModel.builder(Axis.MOBILITY).run(run.trace(), noScale)
                .run(other.trace(), other.result()).build();
        assertEquals(List.of("a"), m.omittedRuns());
        assertEquals(1, m.series().size());
        assertEquals("b", m.series().get(0).label());
        // on the time axis the same run draws fine
        assertEquals(4, PlotModel.of(run.trace(), noScale, null, Axis.TIME).peaks().size());
    }

    @Test
    void bandsFollowTheRuleGiven() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        Library lib = PlotFixtures.library();
        PlotModel byDefault = PlotModel.builder(Axis.MOBILITY).run(run.trace(), run.result()).library(lib).build();
        PlotModel.Band nitrate = byDefault.bands().stream().filter(b -> b.name().equals("nitrate")).findFirst()
                .orElseThrow();
        // by default the band is the window matching applies (see WindowContractTest)
        LibraryEntry entry = lib.find("nitrate").orElseThrow();
        double hw = ToleranceBand.matching(lib, org.mobident.settings.MatchSettings.DEFAULT).halfWidth(entry);
        assertEquals(-30.0 - hw, nitrate.from(), 1e-9);
        assertEquals(-30.0 + hw, nitrate.to(), 1e-9);
        PlotModel fixed = PlotModel.builder(Axis.MOBILITY).run(run.trace(), run.result())
                .library(lib, e -> 1.0).build();
        assertEquals(-31.0, fixed.bands().get(2).from(), 1e-9);
        PlotModel none = PlotModel.builder(Axis.MOBILITY).run(run.trace(), run.result())
                .library(lib, e -> Double.NaN).build();
        assertTrue(none.bands().isEmpty());
    }

    @Test
    void onTheTimeAxisASingleRunsBandsAreConvertedToTime() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        PlotModel m = PlotModel.of(run.trace(), run.result(), PlotFixtures.library(), Axis.TIME);
        PlotModel.Band nitrate = m.bands().get(2);
        Library lib = PlotFixtures.library();
        double hw = ToleranceBand.matching(lib, org.mobident.settings.MatchSettings.DEFAULT)
                .halfWidth(lib.find("nitrate").orElseThrow());
        // μ = 12000/t − 60 → t = 12000/(μ + 60); nitrate −30 ± hw
        assertEquals(12000 / (30 + hw), nitrate.from(), 1e-6);
        assertEquals(12000 / (30 - hw), nitrate.to(), 1e-6, "later edge from the lower mobility");
        assertTrue(nitrate.from() < 400 && nitrate.to() > 400);
    }

    @Test
    void rejectsAnEmptyRange() {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("a", 200, 1.0);
        assertThrows(IllegalArgumentException.class,
                () -> PlotModel.builder(Axis.TIME).run(run.trace(), run.result()).xRange(5, 5));
    }

    @Test
    void aRunAtAnotherTemperatureIsDrawnAtTheMobilitiesComparedWithTheLibrary() {
        // the run's mobilities were compared with the library after a viscosity factor of 0.9
        PlotFixtures.SyntheticRun warm = PlotFixtures.run("warm", 200, 1.0);
        java.util.List<org.mobident.result.PeakResult> peaks = new java.util.ArrayList<>();
        for (org.mobident.result.PeakResult p : warm.result().peaks()) {
            peaks.add(new org.mobident.result.PeakResult(p.peak(), p.role(), p.mobility(), p.mobilitySd(),
                    0.9 * p.mobility(), p.match()));
        }
        org.mobident.result.RunResult r = warm.result();
        org.mobident.result.RunResult converted = new org.mobident.result.RunResult(r.spec(), null, r.scaleNote(),
                r.eofMobility(), r.scale(), peaks, r.notes(), r.noiseSd(), org.mobident.result.RunScale.OFF, 0.9);
        PlotModel model = PlotModel.of(warm.trace(), converted, null, Axis.MOBILITY);
        for (PlotModel.PeakMark m : model.peaks()) {
            if (m.status() != PeakStatus.MARKER) {
                boolean found = false;
                for (org.mobident.result.PeakResult p : peaks) {
                    found |= Math.abs(m.x() - p.mobilityAtLibraryTemp()) < 1e-9;
                }
                assertTrue(found, "mark at " + m.x() + " is a compared mobility");
            }
        }
        assertEquals(0.9, converted.temperatureFactor(), 1e-12);
        assertEquals(1.0, r.temperatureFactor(), 1e-12);
    }

    @Test
    void overlaidRunsLabelTheCoincidingMarkersOnce() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotFixtures.SyntheticRun b = PlotFixtures.run("b", 250, 0.5);
        PlotModel model = PlotModel.builder(Axis.MOBILITY).run(a.trace(), a.result()).run(b.trace(), b.result()).build();
        long markers = model.peaks().stream().filter(m -> m.status() == PeakStatus.MARKER).count();
        long labelled = model.peaks().stream().filter(m -> m.status() == PeakStatus.MARKER && !m.label().isEmpty())
                .count();
        assertEquals(2, markers);
        assertEquals(1, labelled);
        PlotModel time = PlotModel.builder(Axis.TIME).run(a.trace(), a.result()).run(b.trace(), b.result()).build();
        assertEquals(2, time.peaks().stream().filter(m -> m.status() == PeakStatus.MARKER && !m.label().isEmpty())
                .count(), "on the time axis the markers are apart and keep their labels");
    }
}
