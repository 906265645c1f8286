package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;

class RunSummaryTextTest {

    private static String summary(List<RunResult> runs) {
        StringWriter sw = new StringWriter();
        RunSummaryText.write(runs, new PrintWriter(sw));
        return sw.toString();
    }

    @Test
    void namesRunsAssignmentsAndCaution() {
        String text = summary(List.of(ReportFixtures.okRun(), ReportFixtures.failedRun(), ReportFixtures.noMarkerRun()));
        assertTrue(text.contains("Run spring-01: neutral marker at 576.0 s; EOF mobility -50.00"), text);
        assertTrue(text.contains("chloride"), text);
        assertTrue(text.contains("nitrate"), text);
        assertTrue(text.contains("97 %"), text);
        assertTrue(text.contains("ambiguous (or nitrite 38 %)"), text);
        // a named peak shows the uncertainty that decided its match: |residual / z| = 0.08 / 0.2 = 0.4
        assertTrue(text.contains("-71.52 +/- 0.400"), text);
        assertTrue(text.contains("note: run at 30.0 C"), text);
        assertTrue(text.contains("Run well-09: FAILED - samples/well-09.csv, line 3"), text);
        assertTrue(text.contains("Run spring-02: no neutral marker found; EOF mobility unknown"), text);
        assertTrue(text.contains("3 runs: 2 ok (1 without mobility scale), 1 failed. Analyte peaks: 1 identified, "
                + "1 ambiguous, 1 unassigned, 1 without mobility."), text);
        assertTrue(text.contains("no mobility"), text);
        assertTrue(text.contains("presumptive"), text);
        assertTrue(text.contains("orthogonal method"), text);
        assertTrue(text.contains("validated procedures"), text);
        assertTrue(text.trim().endsWith(RunSummaryText.CAUTION), "caution closes the summary");
    }

    @Test
    void showsTheMobilityComparedWithTheLibrary() {
        // a run at 30 °C: the table shows the value converted to the library temperature, the one matched
        RunResult warm = ReportFixtures.okRun();
        List<PeakResult> peaks = new java.util.ArrayList<>();
        for (PeakResult p : warm.peaks()) {
            peaks.add(new PeakResult(p.peak(), p.role(), p.mobility(), p.mobilitySd(), p.mobility() * 0.8957,
                    p.match()));
        }
        RunResult converted = new RunResult(warm.spec(), null, warm.scaleNote(), warm.eofMobility(), warm.scale(),
                peaks, warm.notes(), warm.noiseSd(), org.mobident.result.RunScale.OFF, 0.8957);
        String text = summary(List.of(converted));
        // -71.52 × 0.8957 = -64.06; the times' SD scales with it: 0.21 × 0.8957 = 0.188; the table shows
        // the named peak's deciding uncertainty, 0.08 / 0.2 = 0.4
        assertTrue(text.contains("-64.06 +/- 0.400"), text);
        PeakResult chloride = converted.peaks().stream().filter(x -> "chloride".equals(x.match().assigned()))
                .findFirst().orElseThrow();
        assertEquals(0.21 * 0.8957, converted.comparedSd(chloride), 1e-12);
        assertEquals(0.4, converted.decidingSd(chloride), 1e-12);
        assertFalse(text.contains("-71.52"), text);
    }

    @Test
    void tableIsAlignedAndMarkersAreLeftOut() {
        String text = summary(List.of(ReportFixtures.okRun()));
        List<String> lines = Arrays.asList(text.split("\n"));
        int header = -1;
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).trim().startsWith("peak")) {
                header = i;
                break;
            }
        }
        assertTrue(header >= 0, text);
        String h = lines.get(header);
        int statusCol = h.indexOf("status");
        for (int i = header + 1; i <= header + 3; i++) {
            String row = lines.get(i);
            assertTrue(row.length() > statusCol, row);
            assertTrue(row.charAt(statusCol - 1) == ' ' && row.charAt(statusCol) != ' ', "aligned: " + row);
        }
        assertTrue(lines.get(header + 4).isBlank() || lines.get(header + 4).contains("note"),
                "marker row not in the analyte table");
        assertEquals(-1, text.indexOf("576.00  "), "marker time is not a table row");
    }

    @Test
    void outputIsAscii() {
        String text = summary(List.of(ReportFixtures.okRun(), ReportFixtures.failedRun()));
        for (char c : text.toCharArray()) {
            assertTrue(c < 128, "non-ASCII character " + (int) c);
        }
    }
}
