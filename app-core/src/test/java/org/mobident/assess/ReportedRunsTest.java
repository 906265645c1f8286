package org.mobident.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.recheck.PeakTableReader;
import org.mobident.report.PeakTableCsv;
import org.mobident.report.plot.PlotFixtures;

/** The reported runs as the scoring sees them, from a peak table and from identification results. */
class ReportedRunsTest {

    private static final String HEADER = "run,peak,role,apex_time_s,width_half_s,mobility,mobility_sd,"
            + "mobility_at_library_temp,assigned,confidence,status";

    @Test
    void theMobilityComparedIsCorrectedThenAtLibraryTemperatureThenAsMeasured() throws Exception {
        String text = HEADER + ",mobility_corrected\n"
                + "r,1,analyte,100,0.5,-84.9,0.01,-76.05,chloride,0.96,identified,-76.11\n"
                + "r,2,analyte,110,0.5,-84.1,0.01,-75.30,,0.90,unassigned,\n"
                + "r,3,analyte,120,0.5,-83.0,0.01,,,0.90,unassigned,\n";
        List<ReportedPeak> peaks = ReportedRuns.fromTable(PeakTableReader.read(new StringReader(text), "t.csv"))
                .get(0).peaks();
        assertEquals(-76.11, peaks.get(0).mobility(), 0, "scale-corrected value of a newer engine");
        assertEquals(-75.30, peaks.get(1).mobility(), 0, "at the library temperature");
        assertEquals(-83.0, peaks.get(2).mobility(), 0, "as measured");
    }

    @Test
    void aPeaksTimeIsItsCentreWhereTheTableGivesOne() throws Exception {
        // two skewed zones: the first zone's apex (its sharp flank) lies nearer the second zone's
        // centre than its own; the known times are centres, so the centres must pair them
        String text = HEADER + ",centre_time_s\n"
                + "r,1,analyte,107.1,3.3,-78.8,0.5,-78.8,bromide,0.8,identified,104.04\n"
                + "r,2,analyte,105.4,1.7,-78.4,0.3,-78.4,iodide,0.8,identified,104.41\n"
                + "r,3,analyte,120,0.5,-70.0,0.01,-70.0,nitrate,0.9,identified,\n";
        List<ReportedPeak> peaks = ReportedRuns.fromTable(PeakTableReader.read(new StringReader(text), "t.csv"))
                .get(0).peaks();
        assertEquals(104.04, peaks.get(0).timeS(), 0);
        assertEquals(104.41, peaks.get(1).timeS(), 0);
        assertEquals(120.0, peaks.get(2).timeS(), 0, "the apex where no centre is given");
        List<KnownIdentity> known = KnownIdentitiesReader.read(
                "run,kind,analyte,time_s\nr,analyte,bromide,103.66\nr,analyte,iodide,104.70\n", "k.csv").rows();
        List<ZoneMatching.Pair> pairs = ZoneMatching.match(known, peaks);
        assertEquals("bromide", pairs.get(0).known().name());
        assertEquals("iodide", pairs.get(1).known().name());
    }

    @Test
    void runStatesFromTheTable() throws Exception {
        String text = HEADER + "\n"
                + "ok,1,analyte,100,0.5,-70.0,0.01,-70.0,nitrate,0.95,identified\n"
                + "ok,2,neutral marker,500,1.0,0.000,,0.000,,,marker\n"
                + "broken,,,,,,,,,,failed\n"
                + "noscale,1,analyte,100,0.5,,,,,,unassigned\n"
                + "empty,,,,,,,,,,no_peaks\n";
        List<ReportedRun> runs = ReportedRuns.fromTable(PeakTableReader.read(new StringReader(text), "t.csv"));
        assertEquals(List.of("ok", "broken", "noscale", "empty"), runs.stream().map(ReportedRun::name).toList());
        assertTrue(runs.get(0).mobilityKnown() && !runs.get(0).failed());
        assertEquals(2, runs.get(0).peaks().size());
        assertTrue(runs.get(0).peaks().get(1).isNeutralMarker());
        assertTrue(runs.get(0).peaks().get(0).isCall());
        assertTrue(runs.get(1).failed() && runs.get(1).peaks().isEmpty());
        assertFalse(runs.get(2).mobilityKnown());
        assertTrue(runs.get(2).peaks().get(0).isUnassigned());
        assertTrue(runs.get(3).peaks().isEmpty() && !runs.get(3).mobilityKnown());
    }

    @Test
    void resultsAreSeenExactlyAsTheirPeakTable() throws Exception {
        PlotFixtures.SyntheticRun run = PlotFixtures.run("=day1", 200, 1.0);
        StringWriter table = new StringWriter();
        PeakTableCsv.write(List.of(run.result()), table);
        List<ReportedRun> fromTable = ReportedRuns.fromTable(
                PeakTableReader.read(new StringReader(table.toString()), "t.csv"));
        List<ReportedRun> fromResults = ReportedRuns.fromResults(List.of(run.result()));
        assertEquals(fromTable, fromResults);
        assertEquals("=day1", fromResults.get(0).name(), "the spreadsheet guard is taken off again");
        assertFalse(fromResults.get(0).peaks().isEmpty());
    }
}
