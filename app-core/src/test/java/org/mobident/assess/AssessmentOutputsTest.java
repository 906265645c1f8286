package org.mobident.assess;

import org.mobident.report.assess.AssessmentCsv;
import org.mobident.report.assess.AssessmentHtml;
import org.mobident.report.assess.AssessmentText;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.mobident.recheck.PeakTableReader;
import org.mobident.report.html.HtmlReport;
import org.mobident.report.plot.PlotFixtures;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;

/** The text, CSV and HTML forms of the scores of {@link AssessorTest}'s tables. */
class AssessmentOutputsTest {

    private static final String EVIL = "<b>\"=evil&run'</b>";
    private static final AcceptanceLimits LIMITS = new AcceptanceLimits(0.5, 0.5, Double.NaN);

    private static List<CSVRecord> csv(String text) throws Exception {
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(text)).getRecords();
    }

    private static String value(List<CSVRecord> rows, String section, String subject, String measure) {
        return rows.stream().filter(r -> r.get("section").equals(section) && r.get("subject").equals(subject)
                && r.get("measure").equals(measure)).map(r -> r.get("value")).findFirst().orElseThrow(
                    () -> new AssertionError(section + "/" + subject + "/" + measure + " missing"));
    }

    @Test
    void scoresTableIsLongAndTidy() throws Exception {
        StringWriter w = new StringWriter();
        AssessmentCsv.writeScores(AssessorTest.assessment(), LIMITS, w);
        String text = w.toString();
        assertTrue(text.startsWith("section,subject,measure,value\n"), text.substring(0, 40));
        List<CSVRecord> rows = csv(text);
        assertTrue(rows.stream().allMatch(r -> r.size() == 4));
        // the values of AssessorTest, with 4 decimals
        assertEquals("0.6000", value(rows, "identification", "all", "precision"));
        assertEquals("0.3333", value(rows, "identification", "all", "recall"));
        assertEquals("0.4000", value(rows, "identification", "all", "recall_height_sd_10_up"));
        assertEquals("0.3517", value(rows, "calibration", "calls", "ece"), "2.11 / 6");
        assertEquals("0.2500", value(rows, "calibration", "unassigned", "brier"));
        assertEquals("3", value(rows, "reliability_calls", "0.9-1.0", "count"));
        assertEquals("", value(rows, "reliability_calls", "0.0-0.1", "accuracy"), "empty bin: unknown");
        assertEquals("0.0250", value(rows, "mobility_error", "all", "bias"));
        assertEquals("-0.1500", value(rows, "analyte", "chloride", "mobility_bias"));
        assertEquals("1", value(rows, "height_sd", "3-10", "zones_detected"));
        assertEquals("1", value(rows, "detection", "all", "spikes_reported"));
        assertEquals("off", value(rows, "run", "r6", "marker"));
        assertEquals("failed", value(rows, "run", "r2", "state"));
        assertEquals("no_scale", value(rows, "run", "r7", "state"));
        assertEquals("not_scored", value(rows, "run", "r4", "state"));
        assertEquals("not_in_peak_table", value(rows, "run", "r5", "state"));
        assertEquals("yes", value(rows, "limit", "precision", "met"));
        assertEquals("no", value(rows, "limit", "recall", "met"));
        assertFalse(rows.stream().anyMatch(r -> r.get("subject").equals("ECE")), "no ECE limit was given");
    }

    @Test
    void verdictsTableHasOneRowPerPeakAndPerUnfoundRow() throws Exception {
        StringWriter w = new StringWriter();
        Assessment a = AssessorTest.assessment();
        AssessmentCsv.writeVerdicts(a, w);
        List<CSVRecord> rows = csv(w.toString());
        assertEquals(a.verdicts().size(), rows.size());
        CSVRecord second = rows.get(1);
        assertEquals(Map.of("run", "r1", "peak", "2", "assigned", "nitrate", "known_name", "sulfate",
                "matched_by", "time", "verdict", "wrong_name"), Map.of("run", second.get("run"), "peak",
                second.get("peak"), "assigned", second.get("assigned"), "known_name", second.get("known_name"),
                "matched_by", second.get("matched_by"), "verdict", second.get("verdict")));
        assertTrue(rows.stream().anyMatch(r -> r.get("verdict").equals("not_found") && r.get("known_name")
                .equals("fluoride") && r.get("peak").isEmpty()));
    }

    @Test
    void terminalSummaryStatesUnitsAndShortNumbers() throws Exception {
        StringWriter w = new StringWriter();
        AssessmentText.write(AssessorTest.assessment(), LIMITS, new PrintWriter(w));
        String text = w.toString();
        assertTrue(text.contains("precision of identified calls    60.0 %  3 of 5 right"), text);
        assertTrue(text.contains("ECE 0.352, Brier score 0.2192"), text);
        assertTrue(text.contains("1e-9 m^2/(V s)"), "mobility unit stated");
        assertTrue(text.contains("recall >= 0.5: NOT MET (measured 0.3333)"), text);
        assertTrue(text.contains("r6: the neutral marker chosen is at 250.00 s; the known marker is at 300.00 s"));
        assertFalse(text.matches("(?s).*\\d\\.\\d{6,}.*"), "no long decimals:\n" + text);
    }

    @Test
    void pageAndReportSectionAreWellFormedAndEscaped() throws Exception {
        KnownIdentities known = KnownIdentitiesReader.read("run,analyte,time_s,height_sd\n" + "\"" + EVIL.replace("\"",
                "\"\"") + "\",chloride,100.0,40\n", "k<1>.csv");
        String peaks = "run,peak,role,apex_time_s,width_half_s,mobility,mobility_sd,mobility_at_library_temp,"
                + "assigned,confidence,status\n\"" + EVIL.replace("\"", "\"\"") + "\",1,analyte,100.1,0.5,-76,0.01,"
                + "-76,chloride,0.9,identified\n";
        Assessment a = Assessor.assess(known, ReportedRuns.fromTable(PeakTableReader.read(new StringReader(peaks),
                "p.csv")), "p.csv", null);
        String page = AssessmentHtml.page(a, LIMITS, null, "1.2.3", "2030-01-01T00:00:00Z");
        assertFalse(page.contains(EVIL) || page.contains("<b>"), "user text escaped");
        assertFalse(page.toLowerCase(java.util.Locale.ROOT).contains("<script"));
        Document doc = parse(page);
        assertEquals(1, doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "svg").getLength(),
                "one reliability diagram");
        assertTrue(doc.getDocumentElement().getTextContent().contains("k<1>.csv"));

        PlotFixtures.SyntheticRun run = PlotFixtures.run("day1", 200, 1.0);
        String report = HtmlReport.render(List.of(run.result()), Map.of("day1", run.trace()), PlotFixtures.library(),
                HtmlReport.Options.defaults(), List.of(AssessmentHtml.asSection(a, AcceptanceLimits.NONE)));
        Document reportDoc = parse(report);
        assertEquals("section", findSection(reportDoc));
        assertTrue(report.indexOf("id=\"summary\"") < report.indexOf("id=\"assessment\""), "after the summary");
        assertEquals(HtmlReport.render(List.of(run.result()), Map.of("day1", run.trace()), PlotFixtures.library(),
                HtmlReport.Options.defaults()), HtmlReport.render(List.of(run.result()), Map.of("day1", run.trace()),
                PlotFixtures.library(), HtmlReport.Options.defaults(), List.of()), "no section, same page");
    }

    private static String findSection(Document doc) {
        var sections = doc.getElementsByTagName("section");
        for (int i = 0; i < sections.getLength(); i++) {
            if (AssessmentHtml.SECTION_ID.equals(((org.w3c.dom.Element) sections.item(i)).getAttribute("id"))) {
                return "section";
            }
        }
        return "no section with id " + AssessmentHtml.SECTION_ID;
    }

    private static Document parse(String html) throws Exception {
        assertTrue(html.startsWith("<!DOCTYPE html>\n"));
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(
                html.substring("<!DOCTYPE html>\n".length()))));
    }
}
