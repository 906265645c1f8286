package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.xml.sax.InputSource;

/**
 * {@code mobident assess} and {@code identify --known} on the bundled demo data, scored against
 * {@code assess/demo-known.csv} (test resources): the zones of demo-data/TRUTH.md with their times,
 * their mobilities where the run was at 25 °C (well-02 ran at 30 °C: left empty) and height / noise SD.
 */
class AssessCommandTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    /** Library analytes in the seven demo sample runs (TRUTH.md: 4 + 6 + 5 + 6 + 6 + 3 + 5). */
    private static final int DEMO_ANALYTES = 35;
    /** Known zones: the analytes and unknown-X of well-01, which is not in the library. */
    private static final int DEMO_ZONES = 36;
    /** Analytes with a known mobility at 25 °C: all but the six of well-02. */
    private static final int DEMO_MOBILITIES = 29;
    /** The simulated mobilities are the inputs the engine recovers; a loose bound, not a measured value. */
    private static final double MOBILITY_ERROR_BOUND = 0.05;

    @TempDir
    Path dir;

    private Path known;
    private Path peaks;

    record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        Run r = new Run(code, out.toString(), err.toString());
        assertFalse(r.err().contains("\tat ") || r.out().contains("\tat "), () -> "stack trace shown:\n" + r.err());
        return r;
    }

    private static String demo(String file) {
        return DEMO.resolve(file).toString();
    }

    private static List<CSVRecord> csv(String text) throws IOException {
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(new StringReader(text))
                .getRecords();
    }

    private static String value(List<CSVRecord> rows, String section, String subject, String measure) {
        return rows.stream().filter(r -> r.get("section").equals(section) && r.get("subject").equals(subject)
                && r.get("measure").equals(measure)).map(r -> r.get("value")).findFirst()
                .orElseThrow(() -> new AssertionError(section + "/" + subject + "/" + measure + " missing"));
    }

    private static double number(List<CSVRecord> rows, String section, String subject, String measure) {
        return Double.parseDouble(value(rows, section, subject, measure));
    }

    @BeforeEach
    void demoPeakTable() throws IOException, URISyntaxException {
        known = Path.of(AssessCommandTest.class.getResource("/assess/demo-known.csv").toURI());
        peaks = dir.resolve("peaks.csv");
        Run identify = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--csv",
                peaks.toString(), "--quiet");
        assertEquals(ExitCodes.OK, identify.code(), identify.err());
    }

    /** Confidences of the called (identified or ambiguous) analyte peaks in identify's own table, as written. */
    private List<Double> callConfidences() throws IOException {
        return csv(Files.readString(peaks)).stream()
                .filter(r -> r.get("status").equals("identified") || r.get("status").equals("ambiguous"))
                .map(r -> Double.parseDouble(r.get("confidence"))).collect(Collectors.toList());
    }

    @Test
    void scoresTheDemoRunsIdentifiedNow() throws Exception {
        Path scores = dir.resolve("scores.csv");
        Path verdicts = dir.resolve("verdicts.csv");
        Path page = dir.resolve("scores.html");
        Run r = run("assess", "--known", known.toString(), "--runs", demo("runs.csv"), "--library",
                demo("library.csv"), "--csv", scores.toString(), "--peaks-csv", verdicts.toString(), "--html",
                page.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("recall counting ambiguous calls  100.0 %  35 of 35"), r.out());
        List<CSVRecord> rows = csv(Files.readString(scores));
        // TRUTH.md: every library analyte of the demo is called under its own name; spring-03's
        // bromide is only 0.80 likely, below the 4:1 odds an identification needs, so it is ambiguous
        assertEquals(DEMO_ANALYTES, (int) number(rows, "identification", "all", "analytes_present"));
        assertEquals(DEMO_ANALYTES, (int) number(rows, "identification", "all", "calls_right"));
        assertEquals(DEMO_ANALYTES - 1, (int) number(rows, "identification", "all", "identified_calls"));
        assertEquals("1.0000", value(rows, "identification", "all", "precision"));
        assertEquals("1.0000", value(rows, "identification", "all", "recall_with_ambiguous"));
        assertEquals(String.format(java.util.Locale.ROOT, "%.4f", (DEMO_ANALYTES - 1) / (double) DEMO_ANALYTES),
                value(rows, "identification", "all", "recall"));
        for (String count : List.of("wrong_names", "called_absent", "missed")) {
            assertEquals("0", value(rows, "identification", "all", count), count);
        }
        // unknown-X (well-01) is a zone but no library analyte: detected, left unassigned, rightly
        assertEquals(DEMO_ZONES, (int) number(rows, "detection", "all", "analyte_peaks"));
        assertEquals(DEMO_ZONES, (int) number(rows, "detection", "all", "analyte_peaks_on_zone"));
        assertEquals(DEMO_ZONES, (int) number(rows, "detection", "all", "zones_detected"));
        assertEquals("1", value(rows, "calibration", "unassigned", "count"));
        assertEquals("1.0000", value(rows, "calibration", "unassigned", "accuracy"));
        for (String count : List.of("spikes_reported", "runs_failed", "runs_without_scale", "runs_marker_off")) {
            assertEquals("0", value(rows, "detection", "all", count), count);
        }
        for (String run : List.of("spring-01", "spring-02", "well-01", "well-02", "well-03", "spring-03-uv214",
                "well-04-cations")) {
            assertEquals("right", value(rows, "run", run, "marker"), run);
        }
        // heights over noise SD in the fixture: two analytes in 10-30 (well-03 fluoride 28.6, formate 25.0),
        // 16 in 30-100, 17 in 100-1000
        assertEquals("2", value(rows, "height_sd", "10-30", "analytes_present"));
        assertEquals("16", value(rows, "height_sd", "30-100", "analytes_present"));
        assertEquals("17", value(rows, "height_sd", "100-1000", "analytes_present"));
        // every call is right, so each bin's accuracy is 1 and ECE = Σ (n_b/N)(1 − conf_b) = 1 − mean confidence,
        // Brier = mean (1 − c)²: computed here from identify's own peak table
        List<Double> c = callConfidences();
        assertEquals(DEMO_ANALYTES, c.size());
        double mean = c.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
        double brier = c.stream().mapToDouble(p -> (1 - p) * (1 - p)).average().orElseThrow();
        assertEquals(DEMO_ANALYTES, (int) number(rows, "calibration", "calls", "count"));
        assertEquals(1 - mean, number(rows, "calibration", "calls", "ece"), 0.5e-4);
        assertEquals(brier, number(rows, "calibration", "calls", "brier"), 0.5e-4);
        // mobility error over the analytes with a known mobility
        assertEquals(DEMO_MOBILITIES, (int) number(rows, "mobility_error", "all", "n"));
        double mae = number(rows, "mobility_error", "all", "mae");
        assertTrue(mae < MOBILITY_ERROR_BOUND && Math.abs(number(rows, "mobility_error", "all", "bias")) <= mae,
                "MAE " + mae);
        // the verdicts: one per reported peak (36 analyte peaks and 7 markers), every one as expected
        List<CSVRecord> v = csv(Files.readString(verdicts));
        assertEquals(DEMO_ZONES + 7, v.size());
        assertEquals(DEMO_ANALYTES, v.stream().filter(x -> x.get("verdict").equals("right")).count());
        assertEquals(7, v.stream().filter(x -> x.get("verdict").equals("marker_right")).count());
        CSVRecord unknownX = v.stream().filter(x -> x.get("known_name").equals("unknown-X")).findFirst().orElseThrow();
        assertEquals("rightly_unassigned", unknownX.get("verdict"));
        // the page: well-formed, with the reliability diagram, no script
        String html = Files.readString(page);
        assertFalse(html.toLowerCase(java.util.Locale.ROOT).contains("<script"));
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        var doc = f.newDocumentBuilder().parse(new InputSource(new StringReader(html.substring(html.indexOf('\n')
                + 1))));
        assertEquals(1, doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "svg").getLength());
    }

    @Test
    void scoringTheWrittenTableGivesTheSameScores() throws Exception {
        Path fromTable = dir.resolve("from-table.csv");
        Path fromRuns = dir.resolve("from-runs.csv");
        assertEquals(ExitCodes.OK, run("assess", "-k", known.toString(), "--table", peaks.toString(), "--csv",
                fromTable.toString(), "--quiet").code());
        assertEquals(ExitCodes.OK, run("assess", "-k", known.toString(), "--runs", demo("runs.csv"), "--library",
                demo("library.csv"), "--csv", fromRuns.toString(), "--quiet").code());
        String a = Files.readString(fromTable).lines().filter(l -> !l.startsWith("source,"))
                .collect(Collectors.joining("\n"));
        String b = Files.readString(fromRuns).lines().filter(l -> !l.startsWith("source,"))
                .collect(Collectors.joining("\n"));
        assertEquals(a, b);
    }

    @Test
    void aWrongNameLowersPrecisionAndTheLimitFails() throws IOException {
        // the known table now says the zone at 228.30 s in spring-01 is bromide; the engine calls it chloride
        Path swapped = dir.resolve("swapped.csv");
        Files.writeString(swapped, Files.readString(known).replace("spring-01,analyte,chloride,",
                "spring-01,analyte,bromide,"));
        Path scores = dir.resolve("scores.csv");
        Run failing = run("assess", "-k", swapped.toString(), "-t", peaks.toString(), "--min-precision", "0.98",
                "--csv", scores.toString());
        assertEquals(ExitCodes.SOME_RUNS_FAILED, failing.code());
        assertTrue(failing.err().contains("acceptance limit was not met"), failing.err());
        // 33 of 34 identified calls right (spring-03's bromide is ambiguous) = 0.9706 < 0.98
        assertTrue(failing.out().contains("precision >= 0.98: NOT MET (measured 0.9706)"), failing.out());
        List<CSVRecord> rows = csv(Files.readString(scores));
        assertEquals("1", value(rows, "identification", "all", "wrong_names"));
        assertEquals("1", value(rows, "identification", "all", "missed"));
        assertEquals("1", value(rows, "analyte", "chloride", "wrong_calls"));
        assertEquals("no", value(rows, "limit", "precision", "met"));
        // recall: 33 of 35 present identified by their right name = 0.943
        Run passing = run("assess", "-k", swapped.toString(), "-t", peaks.toString(), "--min-precision", "0.97",
                "--min-recall", "0.94", "--quiet");
        assertEquals(ExitCodes.OK, passing.code(), passing.err());
    }

    @Test
    void theCalibrationLimitFailsWhenTheConfidencesUnderstateTheSuccess() throws IOException {
        // every demo call is right at confidences near 0.97, so ECE = 1 - mean confidence, about 0.03
        double ece = 1 - callConfidences().stream().mapToDouble(Double::doubleValue).average().orElseThrow();
        assertTrue(ece > 0.01, "ECE " + ece);
        Run r = run("assess", "-k", known.toString(), "-t", peaks.toString(), "--max-ece", "0.01", "--quiet");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, r.code());
        assertEquals(ExitCodes.OK, run("assess", "-k", known.toString(), "-t", peaks.toString(), "--max-ece", "0.1",
                "--quiet").code());
    }

    @Test
    void wrongUseAndUnusableInputsGiveTheirExitCodes() throws IOException {
        assertEquals(ExitCodes.USAGE, run("assess", "-k", known.toString()).code(), "neither table nor runs");
        assertEquals(ExitCodes.USAGE, run("assess", "-k", known.toString(), "-t", peaks.toString(), "--runs",
                demo("runs.csv"), "--library", demo("library.csv")).code(), "both");
        assertEquals(ExitCodes.USAGE, run("assess", "-k", known.toString(), "--runs", demo("runs.csv")).code(),
                "runs without a library");
        assertEquals(ExitCodes.USAGE, run("assess", "-t", peaks.toString()).code(), "no --known");
        Run limit = run("assess", "-k", known.toString(), "-t", peaks.toString(), "--min-precision", "95");
        assertEquals(ExitCodes.USAGE, limit.code());
        assertTrue(limit.err().contains("--min-precision"), limit.err());

        Path bad = dir.resolve("bad-known.csv");
        Files.writeString(bad, "run,kind,analyte,time_s\nspring-01,analyte,chloride,228.3\nspring-01,anlyte,x,1\n");
        Run badKnown = run("assess", "-k", bad.toString(), "-t", peaks.toString());
        assertEquals(ExitCodes.BAD_INPUT, badKnown.code());
        assertTrue(badKnown.err().contains("bad-known.csv, line 3, field 'kind'")
                && badKnown.err().contains("did you mean 'analyte'?"), badKnown.err());

        Path elsewhere = dir.resolve("elsewhere.csv");
        Files.writeString(elsewhere, "run,analyte\nspring-1,chloride\n");
        Run none = run("assess", "-k", elsewhere.toString(), "-t", peaks.toString());
        assertEquals(ExitCodes.BAD_INPUT, none.code());
        assertTrue(none.err().contains("nothing to score") && none.err().contains("spring-01"), none.err());

        Path taken = dir.resolve("taken.csv");
        Files.writeString(taken, "keep me");
        Run exists = run("assess", "-k", known.toString(), "-t", peaks.toString(), "--csv", taken.toString());
        assertEquals(ExitCodes.CANNOT_WRITE, exists.code());
        assertEquals("keep me", Files.readString(taken));
        assertEquals(ExitCodes.OK, run("assess", "-k", known.toString(), "-t", peaks.toString(), "--csv",
                taken.toString(), "--overwrite", "--quiet").code());
        assertTrue(Files.readString(taken).startsWith("section,subject,measure,value"));
    }

    @Test
    void identifyWithKnownAddsTheScoresToItsReport() throws Exception {
        Path report = dir.resolve("report.html");
        Run r = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--known",
                known.toString(), "--html", report.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("Scores against known identities"), r.out());
        String html = Files.readString(report);
        assertTrue(html.contains("<section id=\"assessment\">"));
        assertTrue(html.indexOf("id=\"summary\"") < html.indexOf("id=\"assessment\"")
                && html.indexOf("id=\"assessment\"") < html.indexOf("id=\"overlay\""));
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        f.newDocumentBuilder().parse(new InputSource(new StringReader(html.substring(html.indexOf('\n') + 1))));
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "run,analyt\n");
        Run badKnown = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--known",
                bad.toString(), "--quiet");
        assertEquals(ExitCodes.BAD_INPUT, badKnown.code());
        assertTrue(badKnown.err().contains("did you mean 'analyte'?"), badKnown.err());
    }

    @Test
    void helpIsCleanAndListed() {
        java.io.PrintStream systemErr = System.err;
        java.io.ByteArrayOutputStream stray = new java.io.ByteArrayOutputStream();
        Run h;
        try {
            System.setErr(new java.io.PrintStream(stray, true, java.nio.charset.StandardCharsets.UTF_8));
            h = run("assess", "--help");
        } finally {
            System.setErr(systemErr);
        }
        assertEquals(ExitCodes.OK, h.code());
        assertTrue(h.err().isEmpty() && stray.size() == 0, h.err() + stray);
        assertTrue(h.out().contains("Usage: mobident assess") && h.out().contains("--min-precision")
                && h.out().contains("Exit codes"), h.out());
        assertTrue(run("--help").out().contains("assess"));
        assertTrue(run("identify", "--help").out().contains("--known"));
    }
}
