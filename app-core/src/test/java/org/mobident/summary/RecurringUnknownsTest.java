package org.mobident.summary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.RunResult;
import org.mobident.summary.SummaryFixtures.P;

class RecurringUnknownsTest {

    /** Library SDs 0.2, 0.3, 0.4: the spread used for grouping is their median, 0.3. */
    private static final Library LIBRARY = new Library(List.of(LibraryEntry.of("chloride", -75.0, 0.2),
            LibraryEntry.of("sulfate", -80.0, 0.3), LibraryEntry.of("nitrate", -70.0, 0.4)), "lib.csv", List.of());

    @Test
    void anUnknownSeenInSeveralRunsIsReportedOnceWithItsRuns() {
        List<RunResult> runs = new ArrayList<>();
        double[] at = {-52.1, -52.4, -51.9, -52.3};
        for (int i = 0; i < 12; i++) {
            if (i % 3 == 0) {
                runs.add(SummaryFixtures.run("run-" + i, "borate", P.called("chloride", -75.0),
                        P.unknown(at[i / 3]), P.unknown(-30.0 - 5 * i)));
            } else {
                runs.add(SummaryFixtures.run("run-" + i, "borate", P.called("chloride", -75.0)));
            }
        }
        List<RecurringUnknowns.Group> groups = RecurringUnknowns.of(runs, LIBRARY);
        assertEquals(1, groups.size(), groups.toString());
        RecurringUnknowns.Group g = groups.get(0);
        assertEquals("unknown-1", g.name());
        assertEquals("borate", g.buffer());
        assertEquals(List.of("run-0", "run-3", "run-6", "run-9"), g.runs());
        assertEquals(12, g.runsInBuffer());
        assertEquals(-52.175, g.meanMobility(), 1e-12);
        assertEquals(-52.4, g.lowest(), 1e-12);
        assertEquals(-51.9, g.highest(), 1e-12);
        assertEquals(2, g.members().get(0).peakNumber());
    }

    @Test
    void peaksFurtherApartThanTheirUncertaintiesStaySeparate() {
        // u = sqrt(0.01² + 0.3²) ≈ 0.30 each; reach 3·√2·0.30 ≈ 1.27: 1.0 apart links, 2.0 apart does not
        List<RunResult> runs = List.of(
                SummaryFixtures.run("a", "borate", P.unknown(-50.0), P.unknown(-60.0)),
                SummaryFixtures.run("b", "borate", P.unknown(-51.0), P.unknown(-62.0)));
        List<RecurringUnknowns.Group> groups = RecurringUnknowns.of(runs, LIBRARY);
        assertEquals(1, groups.size(), groups.toString());
        assertEquals(-50.5, groups.get(0).meanMobility(), 1e-12);
    }

    @Test
    void runsOfDifferentBuffersAreNotGroupedTogether() {
        List<RunResult> runs = List.of(
                SummaryFixtures.run("a", "borate", P.unknown(-50.0)),
                SummaryFixtures.run("b", "phosphate", P.unknown(-50.0)),
                SummaryFixtures.run("c", "Borate ", P.unknown(-50.1)));
        List<RecurringUnknowns.Group> groups = RecurringUnknowns.of(runs, LIBRARY);
        assertEquals(1, groups.size());
        assertEquals(List.of("a", "c"), groups.get(0).runs());
        assertEquals(2, groups.get(0).runsInBuffer());
    }

    @Test
    void twoPeaksOfOneRunDoNotMakeARecurrence() {
        List<RunResult> runs = List.of(SummaryFixtures.run("a", "borate", P.unknown(-50.0), P.unknown(-50.2)));
        assertTrue(RecurringUnknowns.of(runs, LIBRARY).isEmpty());
        assertEquals(1, RecurringUnknowns.of(runs, LIBRARY, 1).size());
    }

    @Test
    void groupsAreNumberedByRunsThenMobility() {
        List<RunResult> runs = List.of(
                SummaryFixtures.run("a", "borate", P.unknown(-40.0), P.unknown(-20.0)),
                SummaryFixtures.run("b", "borate", P.unknown(-40.1), P.unknown(-20.1)),
                SummaryFixtures.run("c", "borate", P.unknown(-20.2)));
        List<RecurringUnknowns.Group> groups = RecurringUnknowns.of(runs, LIBRARY);
        assertEquals(2, groups.size());
        assertEquals(3, groups.get(0).runs().size());
        assertEquals(-20.1, groups.get(0).meanMobility(), 1e-12);
        assertEquals("unknown-2", groups.get(1).name());
        assertEquals(0.3, RecurringUnknowns.spreadOf(LIBRARY), 1e-12);
    }
}
