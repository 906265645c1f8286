package org.mobident.summary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MatchStatus;
import org.mobident.result.RunResult;
import org.mobident.summary.SummaryFixtures.P;

class SampleCallsTest {

    private static final Library LIBRARY = new Library(List.of(LibraryEntry.of("chloride", -75.0, 0.2),
            LibraryEntry.of("sulfate", -80.0, 0.3)), "lib.csv", List.of());

    @Test
    void eachRunSaysForEachAnalyteWhetherItWasCalled() {
        List<RunResult> runs = List.of(
                SummaryFixtures.run("a", "borate", P.called("chloride", -75.1), P.unknown(-60.0)),
                SummaryFixtures.run("b", "borate", new P(-80.2, "sulfate", MatchStatus.AMBIGUOUS, 1.0)));
        SampleCalls t = SampleCalls.of(runs, LIBRARY);
        assertEquals(List.of("chloride", "sulfate"), t.analytes());
        SampleCalls.Call a = t.runs().get(0).calls().get(0);
        assertEquals(SampleCalls.Outcome.IDENTIFIED, a.outcome());
        assertEquals(-75.1, a.mobility(), 1e-12);
        assertEquals(0.9, a.confidence(), 1e-12);
        assertEquals(1, a.peakNumber());
        assertEquals(SampleCalls.Outcome.NOT_FOUND, t.runs().get(0).calls().get(1).outcome());
        assertEquals(SampleCalls.Outcome.AMBIGUOUS, t.runs().get(1).calls().get(1).outcome());
        assertTrue(Double.isNaN(t.runs().get(1).calls().get(0).confidence()));
    }

    @Test
    void analyteOfAnotherBufferIsNotLookedFor() {
        Library lib = new Library(List.of(new LibraryEntry("nitrite", -70, 0.2, 4, -1, Double.NaN, List.of(), List.of(),
                "phosphate", Double.NaN, Double.NaN, Double.NaN, null)), "lib.csv", List.of());
        SampleCalls t = SampleCalls.of(List.of(SummaryFixtures.run("a", "borate", P.unknown(-70.0))), lib);
        assertEquals(SampleCalls.Outcome.NOT_LOOKED_FOR, t.runs().get(0).calls().get(0).outcome());
    }

    @Test
    void driftIsTheSlopeOfTheUncorrectedMobilityAgainstRunOrder() {
        // compared mobility stays at -75.0; the uncorrected one rises 0.1 per run, with +-0.01 scatter
        double[] noise = {0.0, 0.01, -0.01, 0.0};
        RunResult[] runs = new RunResult[4];
        for (int i = 0; i < 4; i++) {
            runs[i] = SummaryFixtures.run("r" + i, "borate", 0.1 * i + noise[i], P.called("chloride", -75.0));
        }
        List<AnalyteStats> stats = AnalyteStats.of(SampleCalls.of(List.of(runs), LIBRARY));
        AnalyteStats cl = stats.get(0);
        assertEquals("chloride", cl.analyte());
        assertEquals("borate", cl.buffer());
        assertEquals(4, cl.runsLookedFor());
        assertEquals(4, cl.runsIdentified());
        assertEquals(-75.0, cl.meanMobility(), 1e-12);
        assertEquals(0.0, cl.mobilitySd(), 1e-12);
        // y = -75 + 0.1·(k−1) + noise at x = k: Sxy = 0.5 + (−1.5·0 − 0.5·0.01 + 0.5·(−0.01) + 1.5·0) = 0.49, Sxx = 5
        assertEquals(0.49 / 5, cl.driftPerRun(), 1e-12);
        assertTrue(cl.driftSd() > 0 && cl.driftSd() < 0.01, "slope SE " + cl.driftSd());
        AnalyteStats so = stats.get(1);
        assertEquals(0, so.runsCalled());
        assertTrue(Double.isNaN(so.meanMobility()));
    }

    @Test
    void slopeStandardErrorMatchesTheTextbookFormula() {
        // x = 1..5, y = 2, 4, 5, 4, 5: b = 0.6, residual SS = 2.4 -> se = sqrt(2.4/3/10) (hand-computed)
        double[] r = Stats.slope(List.of(1.0, 2.0, 3.0, 4.0, 5.0), List.of(2.0, 4.0, 5.0, 4.0, 5.0));
        assertEquals(0.6, r[0], 1e-12);
        assertEquals(Math.sqrt(2.4 / 3 / 10), r[1], 1e-12);
        assertTrue(Double.isNaN(Stats.slope(List.of(1.0, 2.0), List.of(1.0, 3.0))[1]));
    }
}
