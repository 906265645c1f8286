package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;

class PeakDetailsTest {

    private static Map<String, String> asMap(List<String[]> rows) {
        return rows.stream().collect(Collectors.toMap(r -> r[0], r -> r[1]));
    }

    @Test
    void anAmbiguousPeakShowsItsMeasuresAndBothCandidates() {
        ViewerRun run = ViewerFixtures.run("early", 200, true);
        PeakResult pr = run.result().peaks().get(0);
        Map<String, String> m = asMap(PeakDetails.measures("early", pr));
        assertEquals("lithium (55 %), ambiguous", m.get("Assigned"));
        assertEquals("early", m.get("Run"));
        assertEquals("8.0000 (rise)", m.get("Height"));
        assertEquals("20.00 ± 0.050 " + PeakDetails.MOBILITY_UNIT, m.get("Mobility"));
        // apex 12000/(20 + 60) = 150 s
        assertEquals("150.00 ± 0.010 s", m.get("Apex time"));
        assertEquals(PeakDetails.UNKNOWN, m.get("Resolution"));
        assertFalse(m.containsKey("At library temperature"), "same as the run value here");

        List<String[]> cand = PeakDetails.candidates(pr.match());
        assertEquals(2, cand.size());
        assertEquals(List.of("lithium", "20.10", "-0.10", "-0.20", "55 %"), List.of(cand.get(0)));
        assertEquals("sodium", cand.get(1)[0]);
    }

    @Test
    void withItsRunThePlusMinusIsTheUncertaintyThatDecidedTheMatch() {
        // lithium's candidate: residual -0.10 at z -0.20, so the combined SD that decided it is
        // |-0.10 / -0.20| = 0.5, not the 0.05 of the apex timing alone
        ViewerRun run = ViewerFixtures.run("early", 200, true);
        PeakResult pr = run.result().peaks().get(0);
        Map<String, String> m = asMap(PeakDetails.summary("early", run.result(), pr));
        assertEquals("20.00 ± 0.500 " + PeakDetails.MOBILITY_UNIT, m.get("Mobility"));
        assertEquals("150.00 ± 0.010 s", m.get("Apex time"));
    }

    @Test
    void markersAndUnassignedPeaksSayWhatTheyAre() {
        ViewerRun run = ViewerFixtures.run("early", 200, true);
        Map<String, String> marker = asMap(PeakDetails.measures("early", run.result().peaks().get(1)));
        assertEquals("neutral marker", marker.get("Role"));
        assertFalse(marker.containsKey("Assigned"));
        Map<String, String> unknown = asMap(PeakDetails.measures("early", run.result().peaks().get(2)));
        assertEquals("none; not in the library: 93 %", unknown.get("Assigned"));
        assertTrue(PeakDetails.html("early", run.result().peaks().get(2)).contains("No library analyte"));
    }

    @Test
    void namesAreEscapedInTheHtml() {
        PeakMatch m = new PeakMatch("a<b>&c", 0.999, MatchStatus.IDENTIFIED, null, 0,
                List.of(new Candidate("a<b>&c", -1, 0.004, 0.01, 0.999), new Candidate("x", -2, 1, 2, 0.001)));
        PeakResult pr = new PeakResult(ViewerFixtures.peak(100, 1), PeakRole.ANALYTE, -1, 0.1, -1.2, m);
        String html = PeakDetails.html("run<1>", pr);
        assertFalse(html.contains("a<b>"));
        assertTrue(html.contains("a&lt;b&gt;&amp;c"));
        assertTrue(html.contains("run&lt;1&gt;"));
        assertTrue(html.contains("&lt;1 %"), "a tiny probability is not rounded to 0 %");
        assertTrue(html.contains("-1.20"), "the value at the library temperature is shown when it differs");
    }

    @Test
    void probabilitiesAreWholePercentages() {
        assertEquals("100 %", PeakDetails.percent(1.0));
        assertEquals(PeakDetails.UNKNOWN, PeakDetails.percent(Double.NaN));
    }
}
