package org.mobident.summary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.result.RunResult;
import org.mobident.summary.SummaryFixtures.P;

/** Recurring unknowns written as provisional entries of a library file, and read back. */
class ProvisionalEntriesTest {

    private static List<RunResult> batch() {
        List<RunResult> runs = new ArrayList<>();
        double[] at = {-52.1, -52.4, -51.9, -52.3};
        for (int i = 0; i < 8; i++) {
            runs.add(i % 2 == 0
                    ? SummaryFixtures.run("run-" + i, "borate", P.called("chloride", -75.0), P.unknown(at[i / 2]))
                    : SummaryFixtures.run("run-" + i, "borate", P.called("chloride", -75.0)));
        }
        return runs;
    }

    @Test
    void aRecurringUnknownBecomesAnEntryThatReadsBack() throws Exception {
        Library library = new Library(List.of(LibraryEntry.of("chloride", -75.0, 0.2),
                LibraryEntry.of("sulfate", -80.0, 0.3), LibraryEntry.of("nitrate", -70.0, 0.4)), "lib.csv", List.of());
        List<RecurringUnknowns.Group> groups = RecurringUnknowns.of(batch(), library);
        assertEquals(1, groups.size(), groups.toString());
        Library provisional = ProvisionalEntries.of(groups, library, "runs.csv");
        Library back = LibraryCsv.read(new StringReader(LibraryCsv.toCsv(provisional)), "provisional.csv");
        assertEquals(1, back.size());
        LibraryEntry e = back.entries().get(0);
        assertEquals("unknown-1", e.name());
        // mean of the four members, the group's own figure, to the thousandth of a unit
        assertEquals(-52.175, e.mobility(), 1e-9);
        assertTrue(LibraryCsv.toCsv(provisional).contains("unknown-1,-52.175,"), LibraryCsv.toCsv(provisional));
        assertEquals(4, e.n());
        assertEquals("borate", e.buffer());
        assertTrue(e.source().contains("4 of 8 runs of runs.csv"), e.source());
    }

    @Test
    void aNameTheLibraryAlreadyHoldsIsNotReused() {
        Library library = new Library(List.of(LibraryEntry.of("chloride", -75.0, 0.2),
                LibraryEntry.of("unknown-1", -40.0, 0.3), LibraryEntry.of("nitrate", -70.0, 0.4)), "lib.csv", List.of());
        List<RecurringUnknowns.Group> groups = RecurringUnknowns.of(batch(), library);
        assertEquals(1, groups.size(), groups.toString());
        assertEquals("unknown-2", ProvisionalEntries.of(groups, library, "runs.csv").entries().get(0).name());
    }
}
