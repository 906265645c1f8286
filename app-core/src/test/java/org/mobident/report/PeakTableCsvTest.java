package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.trace.RunSpec;

class PeakTableCsvTest {

    private static String csv(List<RunResult> runs) throws IOException {
        StringWriter out = new StringWriter();
        PeakTableCsv.write(runs, out);
        return out.toString();
    }

    private static List<CSVRecord> records(String text) throws IOException {
        try (CSVParser p = CSVParser.parse(new StringReader(text),
                CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get())) {
            return p.getRecords();
        }
    }

    @Test
    void headerHasTheColumnsInOrder() throws IOException {
        String first = csv(List.of()).split("\n")[0];
        assertEquals("run,sample,peak,role,apex_time_s,apex_time_sd_s,start_s,end_s,height,area,corrected_area,"
                + "width_half_s,plates,resolution,signal_to_noise,direction,mobility,mobility_sd,"
                + "mobility_at_library_temp,mobility_corrected,assigned,confidence,status,runner_up,"
                + "runner_up_probability,candidates,centre_time_s,centre_time_sd_s,sn_class,scale_factor,"
                + "scale_factor_sd,scale_offset,scale_offset_sd,note", first);
    }

    @Test
    void analyteRowCarriesFormattedValues() throws IOException {
        List<CSVRecord> rows = records(csv(List.of(ReportFixtures.okRun())));
        assertEquals(4, rows.size());
        CSVRecord r = rows.get(0);
        assertEquals("spring-01", r.get("run"));
        assertEquals("1", r.get("peak"));
        assertEquals("analyte", r.get("role"));
        assertEquals("223.4568", r.get("apex_time_s"), "4 decimals, rounded");
        assertEquals("0.0123", r.get("apex_time_sd_s"));
        assertEquals("220.9568", r.get("start_s"));
        assertEquals("3.2", r.get("height"), "6 significant digits, no padding");
        assertEquals("5.44", r.get("area"));
        assertEquals("0.0243448", r.get("corrected_area"), "5.44 / 223.45678 to 6 significant digits");
        assertEquals("1.5000", r.get("width_half_s"));
        assertEquals("123456", r.get("plates"));
        assertEquals("2.35", r.get("resolution"));
        assertEquals("57.3", r.get("signal_to_noise"));
        assertEquals("dip", r.get("direction"));
        assertEquals("-71.520", r.get("mobility"));
        assertEquals("0.210", r.get("mobility_sd"));
        assertEquals("-71.520", r.get("mobility_at_library_temp"));
        assertEquals("chloride", r.get("assigned"));
        assertEquals("0.973", r.get("confidence"));
        assertEquals("identified", r.get("status"));
        assertEquals("bromide", r.get("runner_up"));
        assertEquals("0.027", r.get("runner_up_probability"));
        assertEquals("chloride:0.973 bromide:0.027", r.get("candidates"));
        assertEquals("223.5000", r.get("centre_time_s"), "223.45678 + 0.04321, 4 decimals");
        assertEquals("0.0211", r.get("centre_time_sd_s"));
        assertEquals("quantifiable", r.get("sn_class"), "S/N 57.25 is above the quantitation limit 10");
        assertEquals("", r.get("note"));
    }

    @Test
    void signalToNoiseClassAgainstTheDetectionAndQuantitationLimits() throws IOException {
        List<CSVRecord> rows = records(csv(List.of(ReportFixtures.okRun())));
        // ICH Q2(R1): detection limit S/N 3, quantitation limit S/N 10; the fixture's third peak has 6.5
        assertEquals("below quantitation limit", rows.get(2).get("sn_class"));
        assertEquals("6.5", rows.get(2).get("signal_to_noise"));
        // a peak made without a centre measurement reports the apex as its centre
        assertEquals(rows.get(3).get("apex_time_s"), rows.get(3).get("centre_time_s"));
        assertEquals(rows.get(3).get("apex_time_sd_s"), rows.get(3).get("centre_time_sd_s"));
    }

    @Test
    void ambiguousUnassignedAndMarkerRows() throws IOException {
        List<CSVRecord> rows = records(csv(List.of(ReportFixtures.okRun())));
        assertEquals("ambiguous", rows.get(1).get("status"));
        assertEquals("nitrite", rows.get(1).get("runner_up"));
        CSVRecord unassigned = rows.get(2);
        assertEquals("unassigned", unassigned.get("status"));
        assertEquals("", unassigned.get("assigned"));
        assertEquals("0.990", unassigned.get("confidence"), "probability that it is none of the library");
        assertEquals("", unassigned.get("runner_up_probability"), "no runner-up: empty, not 0");
        CSVRecord marker = rows.get(3);
        assertEquals("neutral marker", marker.get("role"));
        assertEquals("marker", marker.get("status"));
        assertEquals("", marker.get("plates"), "NaN is an empty cell");
        assertEquals("", marker.get("resolution"));
        assertEquals("0.000", marker.get("mobility"));
        assertEquals("", marker.get("mobility_sd"));
        assertEquals("", marker.get("confidence"));
    }

    @Test
    void failedRunIsOneRowWithTheReason() throws IOException {
        List<CSVRecord> rows = records(csv(List.of(ReportFixtures.okRun(), ReportFixtures.failedRun())));
        assertEquals(5, rows.size());
        CSVRecord f = rows.get(4);
        assertEquals("well-09", f.get("run"));
        assertEquals("failed", f.get("status"));
        assertEquals("samples/well-09.csv, line 3, field 'signal': not a number: 'abc'", f.get("note"));
        assertEquals("", f.get("peak"));
        assertEquals("", f.get("mobility"));
    }

    @Test
    void runWithoutMarkerSaysWhyInTheNote() throws IOException {
        CSVRecord r = records(csv(List.of(ReportFixtures.noMarkerRun()))).get(0);
        assertEquals("", r.get("mobility"));
        assertEquals("", r.get("confidence"));
        assertEquals("rise", r.get("direction"));
        assertEquals("no neutral marker found", r.get("note"));
    }

    @Test
    void runWithoutPeaksStillAppears() throws IOException {
        RunResult empty = new RunResult(ReportFixtures.spec("blank"), null, "neutral marker at 500.0 s",
                -50, ReportFixtures.scale(), List.of(), List.of(), 0.01);
        CSVRecord r = records(csv(List.of(empty))).get(0);
        assertEquals("blank", r.get("run"));
        assertEquals("no_peaks", r.get("status"));
    }

    @Test
    void textCellsAreQuotedAndMadeInert() throws IOException {
        RunResult base = ReportFixtures.okRun();
        RunSpec evil = new RunSpec("=cmd|' /C calc'!A0", Path.of("x.csv"), base.spec().conditions(), "cli", 0);
        PeakResult p = base.peaks().get(0);
        PeakMatch m = new PeakMatch("a, \"quoted\"\nname", 0.9, p.match().status(), null, 0, p.match().candidates());
        RunResult run = new RunResult(evil, null, "ok", -50, ReportFixtures.scale(),
                List.of(new PeakResult(p.peak(), PeakRole.ANALYTE, -71.52, 0.2, -71.52, m)), List.of(), 0.02);
        String text = csv(List.of(run));
        CSVRecord r = records(text).get(0);
        assertEquals("'=cmd|' /C calc'!A0", r.get("run"));
        assertEquals("a, \"quoted\"\nname", r.get("assigned"), "round-trips through quoting");
        assertEquals("-71.520", r.get("mobility"), "numbers are not made inert");
    }

    @Test
    void sameInputGivesSameBytes() throws IOException {
        List<RunResult> runs = List.of(ReportFixtures.okRun(), ReportFixtures.failedRun(), ReportFixtures.noMarkerRun());
        String a = csv(runs);
        String b = csv(runs);
        assertEquals(a, b);
        assertTrue(a.endsWith("\n") && !a.contains("\r\n"), "\\n line ends only");
    }
}
