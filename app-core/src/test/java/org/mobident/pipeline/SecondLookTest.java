package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.simulate.SimulationSpec;
import org.mobident.simulate.TraceSimulator;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/**
 * The second look where the library expects a zone ({@link Identifier} with
 * {@link IdentifySettings#lookWhereExpected()}): a small zone 1.6 s behind a zone 30 times taller
 * (Rs ≈ 0.6, no valley) is named when the run's other peaks say where it must be, and nothing else
 * changes. Traces from {@link TraceSimulator} (μ_app = Ld·Lt/(V·t'), IUPAC), whose zones are placed
 * by construction; the library values are invented test values.
 */
class SecondLookTest {

    private static final Library ANIONS = new Library(List.of(
            entry("chloride", -76.2), entry("nitrite", -71.1), entry("nitrate", -69.8), entry("chlorate", -63.3),
            entry("formate", -53.3), entry("acetate", -40.9)), "test", List.of());

    private static LibraryEntry entry(String name, double mobility) {
        return new LibraryEntry(name, mobility, 0.4, 6, -1, Double.NaN, List.of(), List.of(), "test buffer",
                Double.NaN, Double.NaN, 25.0, "test");
    }

    private static RunResult run(long seed, boolean look) {
        RunConditions c = new RunConditions(80, 72, -20, 0, 25.0, "test buffer", 380, 800, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(-50).neutralMarker(1.0).samplingHz(20)
                .durationS(900).noiseSd(0.004).baseline(0.3).seed(seed)
                .zone("chloride", -76.2, 0.8, 120_000)
                .zone("nitrite", -71.1, 2.0, 120_000)
                // 0.5 units (1.25 library SDs) towards nitrite: 1.6 s behind it, 17 noise SDs tall
                .zone("nitrate", -70.3, 0.07, 120_000)
                .zone("chlorate", -63.3, 0.8, 120_000)
                .zone("formate", -53.3, 0.6, 120_000)
                .zone("acetate", -40.9, 0.5, 120_000);
        Trace t = TraceSimulator.simulate("run-" + seed, b.build());
        RunSpec spec = new RunSpec("run-" + seed, Path.of("run-" + seed + ".csv"), c, "test", 0);
        IdentifySettings s = IdentifySettings.defaults().withThreads(1).withLookWhereExpected(look);
        return new Identifier(ANIONS, s).identify(spec, t);
    }

    private static PeakResult named(RunResult r, String name) {
        for (PeakResult p : r.peaks()) {
            if (name.equals(p.match().assigned())) {
                return p;
            }
        }
        return null;
    }

    @Test
    void namesTheZoneHiddenBehindATallerOne() {
        Set<String> truth = Set.of("chloride", "nitrite", "nitrate", "chlorate", "formate", "acetate");
        int hidden = 0;
        for (long seed = 1; seed <= 4; seed++) {
            RunResult plain = run(seed, false);
            RunResult looked = run(seed, true);
            assertFalse(looked.failed(), () -> String.valueOf(looked.error()));
            for (PeakResult p : looked.peaks()) {
                String name = p.match().assigned();
                assertTrue(name == null || truth.contains(name), "seed " + seed + ": " + p);
            }
            if (named(plain, "nitrate") != null) {
                continue; // the detector split the pair without help
            }
            hidden++;
            PeakResult nitrate = named(looked, "nitrate");
            assertTrue(nitrate != null, "seed " + seed + ": nitrate not named: " + looked.peaks());
            assertTrue(nitrate.note() != null && nitrate.note().contains(Identifier.FOUND_WHERE_EXPECTED),
                    "seed " + seed + ": " + nitrate.note());
            // the true mobility by construction, within the stated uncertainty (4 SD)
            assertEquals(-70.3, nitrate.mobility(), 4 * nitrate.mobilitySd() + 0.05, "seed " + seed);
            assertEquals(plain.peaks().size() + 1, looked.peaks().size(), "seed " + seed);
            assertTrue(named(looked, "nitrite") != null, "seed " + seed);
        }
        assertTrue(hidden >= 2, "the pair was split without help in " + (4 - hidden) + " of 4 runs");
    }

    private static PeakResult call(String name, double confidence, MatchStatus status) {
        return new PeakResult(null, PeakRole.ANALYTE, -70, 0.1, -70,
                new PeakMatch(name, confidence, status, null, 0.0, List.of()));
    }

    @Test
    void dropsZonesThatTakeANameAwayOrMakeItMuchLessSure() {
        List<PeakResult> before = List.of(call("nitrite", 0.99, MatchStatus.IDENTIFIED),
                call("chlorate", 0.60, MatchStatus.AMBIGUOUS), call(null, 1.0, MatchStatus.UNASSIGNED));
        // a merged pair split: the neighbour's name kept, surer, and one more name
        assertTrue(Identifier.keepsEveryIdentification(before, List.of(call("nitrite", 0.995, MatchStatus.IDENTIFIED),
                call("nitrate", 0.95, MatchStatus.IDENTIFIED), call("chlorate", 0.62, MatchStatus.AMBIGUOUS),
                call(null, 1.0, MatchStatus.UNASSIGNED))));
        // a little less sure (odds 99 -> 65.7, within a factor of 2) is kept; an ambiguous call may
        // become surer or less sure
        assertTrue(Identifier.keepsEveryIdentification(before, List.of(call("nitrite", 0.985, MatchStatus.IDENTIFIED),
                call("nitrate", 0.9, MatchStatus.IDENTIFIED), call("chlorate", 0.9, MatchStatus.IDENTIFIED))));
        assertTrue(Identifier.keepsEveryIdentification(before, List.of(call("nitrite", 0.99, MatchStatus.IDENTIFIED),
                call("nitrate", 0.9, MatchStatus.IDENTIFIED), call("chlorate", 0.4, MatchStatus.AMBIGUOUS))));
        // one zone made into two: the identified name lost, or left ambiguous
        assertFalse(Identifier.keepsEveryIdentification(before, List.of(call("nitrate", 0.95, MatchStatus.IDENTIFIED),
                call("chlorate", 0.60, MatchStatus.AMBIGUOUS), call(null, 1.0, MatchStatus.UNASSIGNED))));
        assertFalse(Identifier.keepsEveryIdentification(before, List.of(call("nitrite", 0.70, MatchStatus.AMBIGUOUS),
                call("nitrate", 0.6, MatchStatus.AMBIGUOUS), call("chlorate", 0.60, MatchStatus.AMBIGUOUS))));
        // still identified but far less sure: odds 99 -> 13.3, more than halved
        assertFalse(Identifier.keepsEveryIdentification(before, List.of(call("nitrite", 0.93, MatchStatus.IDENTIFIED),
                call("nitrate", 0.85, MatchStatus.IDENTIFIED), call("chlorate", 0.60, MatchStatus.AMBIGUOUS))));
    }

    @Test
    void dropsZonesThatRenameTheAmbiguousCalls() {
        // a run that reads two ways, its three names ambiguous at 0.46; a zone looked for under the
        // other reading tips the run to it: every name changes, none was identified before
        List<PeakResult> before = List.of(call("bromide", 0.46, MatchStatus.AMBIGUOUS),
                call("nitrite", 0.46, MatchStatus.AMBIGUOUS), call("fluoride", 0.46, MatchStatus.AMBIGUOUS));
        assertFalse(Identifier.keepsEveryIdentification(before, List.of(call("chloride", 0.92, MatchStatus.IDENTIFIED),
                call("nitrate", 0.92, MatchStatus.IDENTIFIED), call("formate", 0.92, MatchStatus.IDENTIFIED),
                call("phosphate", 0.91, MatchStatus.IDENTIFIED))));
        // the same zone added under the run's one reading keeps every name
        assertTrue(Identifier.keepsEveryIdentification(before, List.of(call("bromide", 0.5, MatchStatus.AMBIGUOUS),
                call("nitrite", 0.5, MatchStatus.AMBIGUOUS), call("fluoride", 0.5, MatchStatus.AMBIGUOUS),
                call("phosphate", 0.5, MatchStatus.AMBIGUOUS))));
    }
}
