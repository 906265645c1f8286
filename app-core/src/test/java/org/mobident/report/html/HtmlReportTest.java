package org.mobident.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.report.plot.PlotFixtures;
import org.mobident.result.RunResult;
import org.mobident.trace.Trace;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

class HtmlReportTest {
    private static final String EVIL = "<script>alert(1)</script>";

    private final PlotFixtures.SyntheticRun a = PlotFixtures.run("day1-a", 200, 1.0);
    private final PlotFixtures.SyntheticRun b = PlotFixtures.run("day1-b & co", 240, 0.6);
    private final PlotFixtures.SyntheticRun evil = PlotFixtures.run(EVIL, 220, 0.8);

    private List<RunResult> results() {
        return List.of(a.result(), b.result(), evil.result(),
                PlotFixtures.failed("broken", "time column holds \"abc\" <not a number>"));
    }

    private Map<String, Trace> traces() {
        Map<String, Trace> m = new HashMap<>();
        m.put("day1-a", a.trace());
        m.put(EVIL, evil.trace());
        // "day1-b & co" has no trace: it must still be reported
        return m;
    }

    private String page(String when) throws Exception {
        StringWriter out = new StringWriter();
        HtmlReport.write(results(), traces(), PlotFixtures.library(),
                HtmlReport.Options.defaults().withGeneratedAt(when), out);
        return out.toString();
    }

    static Document parseXhtml(String html) throws Exception {
        assertTrue(html.startsWith("<!DOCTYPE html>\n"));
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(html.substring("<!DOCTYPE html>\n".length()))));
    }

    @Test
    void isWellFormedAndNamesEveryRun() throws Exception {
        String html = page("2025-03-14 09:26");
        Document doc = parseXhtml(html);
        assertEquals("html", doc.getDocumentElement().getLocalName());
        String text = doc.getDocumentElement().getTextContent();
        for (RunResult r : results()) {
            assertTrue(text.contains(r.spec().name()), "run " + r.spec().name() + " named");
        }
        NodeList sections = doc.getElementsByTagName("section");
        int runs = 0;
        for (int i = 0; i < sections.getLength(); i++) {
            if ("run".equals(((Element) sections.item(i)).getAttribute("class"))) {
                runs++;
            }
        }
        assertEquals(4, runs, "one section per run");
        // plots: the overlay and one for each run with a trace (day1-a and the evil one)
        assertEquals(4, doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "polyline").getLength(),
                "overlay: two curves; the two run plots: one each");
    }

    @Test
    void theOverlayHasOnePanelPerBuffer() throws Exception {
        RunResult other = new RunResult(PlotFixtures.spec("acetate run", "acetate 10 mM"), null,
                evil.result().scaleNote(), evil.result().eofMobility(), evil.result().scale(), evil.result().peaks(),
                List.of(), 0.01);
        Map<String, Trace> traces = traces();
        traces.put("acetate run", evil.trace());
        StringWriter out = new StringWriter();
        HtmlReport.write(List.of(a.result(), other), traces, PlotFixtures.library(),
                HtmlReport.Options.defaults().withGeneratedAt("now"), out);
        Element overlay = section(parseXhtml(out.toString()), "overlay");
        NodeList figures = overlay.getElementsByTagName("figure");
        assertEquals(2, figures.getLength(), "borate and acetate are drawn apart");
        assertTrue(figures.item(0).getTextContent().contains("Buffer borate 20 mM, anions: 1 run"));
        assertTrue(figures.item(1).getTextContent().contains("Buffer acetate 10 mM, anions: 1 run"));
        for (int i = 0; i < figures.getLength(); i++) {
            assertEquals(1, ((Element) figures.item(i)).getElementsByTagNameNS("http://www.w3.org/2000/svg", "polyline")
                    .getLength(), "one curve in each panel");
        }
    }

    @Test
    void userTextIsEscapedEverywhere() throws Exception {
        String html = page(EVIL);
        assertFalse(html.toLowerCase(Locale.ROOT).contains("<script"), "no script element can appear");
        assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt;"));
        assertTrue(html.contains("day1-b &amp; co"));
        assertTrue(html.contains("&quot;abc&quot; &lt;not a number&gt;"), "error message escaped");
        Document doc = parseXhtml(html);
        assertTrue(doc.getDocumentElement().getTextContent().contains(EVIL), "shown as text");
    }

    /** The {@code <section>} with that id. */
    static Element section(Document doc, String id) {
        NodeList sections = doc.getElementsByTagName("section");
        for (int i = 0; i < sections.getLength(); i++) {
            Element e = (Element) sections.item(i);
            if (id.equals(e.getAttribute("id"))) {
                return e;
            }
        }
        throw new AssertionError("no section " + id);
    }

    @Test
    void opensWithTheAnalytesFoundInEachSample() throws Exception {
        Document doc = parseXhtml(page(null));
        Element first = (Element) doc.getElementsByTagName("section").item(0);
        assertEquals("samples", first.getAttribute("id"));
        Element table = (Element) first.getElementsByTagName("table").item(0);
        NodeList heads = table.getElementsByTagName("th");
        assertEquals("Run", heads.item(0).getTextContent());
        assertEquals(2 + PlotFixtures.library().entries().stream().map(e -> e.name()).distinct().count(),
                heads.getLength(), "run, sample and every analyte of the library");
        NodeList rows = table.getElementsByTagName("tbody").item(0).getChildNodes();
        int tr = 0;
        for (int i = 0; i < rows.getLength(); i++) {
            if (rows.item(i) instanceof Element) {
                tr++;
            }
        }
        assertEquals(4, tr, "one row per run, the failed one too");
        assertTrue(table.getTextContent().contains("failed"), table.getTextContent());
    }

    @Test
    void carriesTheCautionAndTheSummary() throws Exception {
        String html = page(null);
        assertTrue(html.contains("presumptive"));
        assertTrue(html.contains("orthogonal method"));
        assertTrue(html.contains("validated procedures"));
        assertTrue(html.contains("<strong>Generated at:</strong> not recorded"));
        Document doc = parseXhtml(html);
        Element summary = (Element) section(doc, "summary").getElementsByTagName("table").item(0);
        NodeList rows = summary.getElementsByTagName("tbody").item(0).getChildNodes();
        int tr = 0;
        for (int i = 0; i < rows.getLength(); i++) {
            if (rows.item(i) instanceof Element) {
                tr++;
            }
        }
        assertEquals(4, tr);
        String table = summary.getTextContent();
        assertTrue(table.contains("failed: broken.csv, line 3"), table);
        assertTrue(table.contains("60.00"), "EOF mobility of day1-a");
        assertTrue(html.contains("not available"), "a run without trace says so");
    }

    @Test
    void onlyTheMarkedTimestampDiffers() throws Exception {
        String one = page("2025-03-14 09:26");
        String two = page("2026-01-01 00:00");
        assertEquals(one, page("2025-03-14 09:26"), "byte-identical for identical inputs");
        String[] l1 = one.split("\n", -1);
        String[] l2 = two.split("\n", -1);
        assertEquals(l1.length, l2.length);
        int differing = 0;
        for (int i = 0; i < l1.length; i++) {
            if (!l1[i].equals(l2[i])) {
                differing++;
                assertTrue(l1[i].contains("id=\"generated-at\""), "only the stamp line: " + l1[i]);
            }
        }
        assertEquals(1, differing);
    }

    @Test
    void selfContained() throws Exception {
        String html = page(null);
        assertFalse(html.contains("http://") && html.replace("http://www.w3.org/", "").contains("http://"),
                "no link other than namespace names");
        assertFalse(html.contains("https://"));
        assertFalse(html.contains(" src="));
        assertFalse(html.contains("<link"));
    }

    @Test
    void writesAUtf8File(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("report.html");
        HtmlReport.writeFile(results(), traces(), PlotFixtures.library(), HtmlReport.Options.defaults(), file, false);
        String back = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(back.contains("10⁻⁹ m² V⁻¹ s⁻¹"));
        parseXhtml(back);
    }

    @Test
    void anEmptyBatchIsStillAPage() throws Exception {
        StringWriter out = new StringWriter();
        HtmlReport.write(List.of(), null, null, out);
        Document doc = parseXhtml(out.toString());
        assertTrue(doc.getDocumentElement().getTextContent().contains("No runs."));
    }

    @Test
    void numbersAreFormattedWithoutLocale() {
        assertEquals("97%", HtmlReport.percent(0.971));
        assertEquals(HtmlReport.MISSING, HtmlReport.percent(Double.NaN));
    }

    @Test
    void smallProbabilitiesAreNotShownAsZero() {
        assertEquals("&lt;1%", HtmlReport.percent(0.002));
        assertEquals("0%", HtmlReport.percent(0.0));
        assertEquals("50%", HtmlReport.percent(0.5));
    }
}
