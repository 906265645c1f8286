package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;

/** The recurring-unknowns block and CSV, and the samples CSV, from constructed values. */
class BatchSummaryOutputsTest {

    private static RecurringUnknowns.Group group(String name, int runs) {
        List<String> names = new ArrayList<>();
        List<RecurringUnknowns.Member> members = new ArrayList<>();
        for (int i = 1; i <= runs; i++) {
            names.add("run-" + i);
            members.add(new RecurringUnknowns.Member("run-" + i, i, 3, -52.0 - 0.01 * i, 0.31, 240.5 + i, 0.0123));
        }
        return new RecurringUnknowns.Group(name, "borate", -52.05, 0.0316, -52.1, -52.01, names, 40, 0.0123, members);
    }

    @Test
    void terminalBlockNamesEachUnknownOnceWithItsRuns() {
        StringWriter s = new StringWriter();
        RecurringUnknownsText.write(List.of(group("unknown-1", 12), group("unknown-2", 2)), new PrintWriter(s));
        String text = s.toString();
        assertTrue(text.contains("  unknown-1 at -52.05 +/- 0.03 in 12 of 40 runs (borate): run-1, run-2, run-3, "
                + "run-4, run-5, run-6, run-7, run-8 and 4 more\n"), text);
        assertTrue(text.contains("  unknown-2 at -52.05 +/- 0.03 in 2 of 40 runs (borate): run-1, run-2\n"), text);
        assertEquals(1, text.split("unknown-1 ", -1).length - 1, "said once");
    }

    @Test
    void noUnknownsNoBlock() {
        StringWriter s = new StringWriter();
        RecurringUnknownsText.write(List.of(), new PrintWriter(s));
        assertEquals("", s.toString());
        StringWriter summary = new StringWriter();
        RunSummaryText.write(List.of(ReportFixtures.okRun()), List.of(group("unknown-1", 2)), new PrintWriter(summary));
        String text = summary.toString();
        assertTrue(text.indexOf("unknown-1 at") < text.indexOf("1 run: 1 ok"), "the block comes before the counts");
    }

    @Test
    void unknownsCsvHasOneRowPerPeak() throws IOException {
        StringWriter s = new StringWriter();
        BatchSummaryCsv.writeUnknowns(List.of(group("unknown-1", 2)), s);
        assertEquals(String.join(",", BatchSummaryCsv.UNKNOWN_COLUMNS) + "\n"
                + "unknown-1,borate,2,40,-52.050,0.032,run-1,3,241.5000,-52.010,0.310,0.0123\n"
                + "unknown-1,borate,2,40,-52.050,0.032,run-2,3,242.5000,-52.020,0.310,0.0123\n", s.toString());
    }

    @Test
    void samplesCsvHasOneRowPerRunAndAnalyte() throws IOException {
        Library lib = new Library(List.of(LibraryEntry.of("chloride", -71.6, 0.2), LibraryEntry.of("=bad", -60, 0.2)),
                "lib.csv", List.of());
        StringWriter s = new StringWriter();
        BatchSummaryCsv.writeSamples(SampleCalls.of(List.of(ReportFixtures.okRun(), ReportFixtures.failedRun()), lib), s);
        String[] lines = s.toString().split("\n");
        assertEquals(5, lines.length, s.toString());
        assertEquals("spring-01,,chromate pH 8,chloride,identified,0.973,0.0243448,-71.520,1", lines[1]);
        assertEquals("spring-01,,chromate pH 8,'=bad,not found,,,,", lines[2]);
        assertEquals("well-09,,chromate pH 8,chloride,run failed,,,,", lines[3]);
    }

    @Test
    void terminalSummaryOpensWithTheAnalytesFoundPerRun() {
        Library lib = new Library(List.of(LibraryEntry.of("chloride", -71.6, 0.2), LibraryEntry.of("nitrate", -69.6, 0.2)),
                "lib.csv", List.of());
        var runs = List.of(ReportFixtures.okRun(), ReportFixtures.failedRun(), ReportFixtures.noMarkerRun());
        StringWriter s = new StringWriter();
        RunSummaryText.write(runs, SampleCalls.of(runs, lib), List.of(), new PrintWriter(s));
        String[] lines = s.toString().split("\n");
        assertEquals("Analytes found per run (confidence; '?' marks an ambiguous call):", lines[0]);
        assertEquals("  spring-01  chloride 97 %, nitrate 62 % ?", lines[1]);
        assertEquals("  well-09    run failed", lines[2]);
        assertEquals("  spring-02  no mobility scale", lines[3]);
    }

    @Test
    void anUnassignedPeakShowsItsConfidenceOfNoneAsTheHtmlDoes() {
        StringWriter s = new StringWriter();
        RunSummaryText.write(List.of(ReportFixtures.okRun()), new PrintWriter(s));
        // the fixture's third peak is unassigned with probability 0.99 of being none of the analytes
        String row = s.toString().lines().filter(l -> l.contains("unassigned") && l.contains("-59.60")).findFirst()
                .orElseThrow();
        assertTrue(row.contains("99 % none"), row);
    }

    @Test
    void theTerminalSummaryWritesUnitsOneWay() {
        assertEquals("EOF mobility +41.00e-9 m^2/(V s); (mu - b)/a with a = 1.0012 +/- 0.0085, b = -0.01",
                RunSummaryText.oneLine("EOF mobility +41.00e-9 m²/(V s); (μ − b)/a with a = 1.0012 ± 0.0085, b = -0.01"));
        StringWriter s = new StringWriter();
        RunSummaryText.write(List.of(ReportFixtures.okRun()), new PrintWriter(s));
        assertTrue(s.toString().chars().allMatch(c -> c < 128), "plain ASCII: " + s);
    }
}
