package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** 'predict' and 'recheck' as a user runs them. */
class PredictRecheckCommandTest {

    private static final Path DEMO = Path.of("..", "demo-data");
    private static final Path REFERENCE = Path.of("..", "reference-libraries", "ions-25C.csv");

    @TempDir
    Path dir;

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        assertFalse(err.toString().contains("\tat "), err::toString);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void predictWritesALibraryForTheNewBuffer() throws Exception {
        Path out = dir.resolve("b.csv");
        String[] r = run("predict", "--library", DEMO.resolve("library.csv").toString(), "--ph", "4.76",
                "--ionic-strength-mm", "0.001", "--temperature-c", "25", "--reference", REFERENCE.toString(),
                "--out", out.toString());
        assertEquals("0", r[0], r[2]);
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setCommentMarker('#')
                .get().parse(Files.newBufferedReader(out)).getRecords();
        double acetate = Double.NaN;
        double chloride = Double.NaN;
        for (CSVRecord row : rows) {
            if (row.get("name").equals("acetate")) {
                acetate = Double.parseDouble(row.get("mobility"));
            }
            if (row.get("name").equals("chloride")) {
                chloride = Double.parseDouble(row.get("mobility"));
            }
        }
        // Henderson–Hasselbalch: at pH = pKa (acetic acid 4.76, CRC Handbook, from memory) half the acid is
        // ionised, so acetate keeps half its fully ionised mobility (demo library: -41.3 at pH 8, I = 12 mM).
        // Going from I = 12 mM to ~0 also removes the ionic-strength retardation, which the Onsager limiting
        // law puts at (0.2300·λ + 60.66)/λ·√I ≈ 19 % for λ = 40.9 S cm²/mol (Robinson & Stokes, from memory;
        // less with the Debye–Hückel denominator): the ratio must lie between 0.5 and 0.5 × 1.2.
        double ratio = acetate / -41.3;
        assertTrue(ratio >= 0.5 && ratio <= 0.6, "acetate ratio " + ratio);
        // chloride is a strong anion: only the ionic strength changes (12 mM → ~0), so it grows in magnitude
        assertTrue(chloride < -76.3, "chloride " + chloride);
    }

    @Test
    void scanListsCoMigrationRanges() {
        String[] r = run("predict", "--library", DEMO.resolve("library.csv").toString(), "--scan", "3:8:0.05",
                "--ionic-strength-mm", "10", "--analytes", "acetate,formate,fluoride", "--reference",
                REFERENCE.toString());
        assertEquals("0", r[0], r[2]);
        // a readable table on the terminal: units line, analyte header, pH rows; no CSV without --out
        assertTrue(r[1].startsWith("Predicted effective mobility against pH, 1e-9 m^2/(V s)"), r[1].substring(0, 80));
        assertTrue(r[1].lines().anyMatch(l -> l.matches("\\s+pH\\s+acetate\\s+formate\\s+fluoride")), r[1]);
        assertFalse(r[1].contains("ph,acetate"), r[1]);
        long rows = r[1].lines().filter(l -> l.matches("\\s*\\d+\\.\\d\\d( +-?\\d+\\.\\d\\d){3}")).count();
        assertTrue(rows >= 20 && rows <= 30, rows + " rows");
        assertFalse(r[1].contains("NaN"), r[1]);
        assertTrue(r[1].contains("co-migration") || r[1].contains("not reliably resolved")
                || r[1].contains("No pair comes closer"), r[1]);
    }

    @Test
    void recheckSaysWhatNeedsAttention() throws Exception {
        Path table = dir.resolve("peaks.csv");
        String[] id = run("identify", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--csv", table.toString(), "--quiet");
        assertEquals("0", id[0], id[2]);
        String[] same = run("recheck", "--table", table.toString(), "--library", DEMO.resolve("library.csv").toString(),
                "--new-library", DEMO.resolve("library.csv").toString());
        assertEquals("0", same[0], "same library in and out needs no attention: " + same[1]);
        Path verdicts = dir.resolve("verdicts.csv");
        String[] moved = run("recheck", "--table", table.toString(), "--library", DEMO.resolve("library.csv").toString(),
                "--ph", "4.5", "--ionic-strength-mm", "12", "--reference", REFERENCE.toString(),
                "--csv", verdicts.toString());
        assertEquals("1", moved[0], moved[1]);
        assertTrue(moved[1].contains("presumptive"));
        assertTrue(Files.readString(verdicts).contains("phosphate"));
        String[] none = run("recheck", "--table", table.toString(), "--library", DEMO.resolve("library.csv").toString());
        assertEquals("2", none[0]);
    }

    @Test
    void predictTableSaysWhatEachPredictionRestsOnAndLabelsTheLibrary() throws Exception {
        Path out = dir.resolve("b.csv");
        String[] r = run("predict", "--library", DEMO.resolve("library.csv").toString(), "--ph", "7.0",
                "--ionic-strength-mm", "20", "--out", out.toString());
        assertEquals("0", r[0], r[2]);
        String header = r[1].lines().filter(l -> l.startsWith("analyte")).findFirst().orElseThrow();
        assertTrue(header.contains("basis"), header);
        assertFalse(header.contains("model data"), header);
        assertFalse(r[1].contains("entry model"), r[1]);
        assertTrue(r[1].contains("own pKa data"), r[1]);
        boolean anyRemark = r[1].lines().anyMatch(l -> l.contains("assumed") || l.contains("barely ionised"));
        assertEquals(anyRemark, header.contains("remark"), "remark column only when some remark is given: " + r[1]);
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setCommentMarker('#')
                .get().parse(Files.newBufferedReader(out)).getRecords();
        for (CSVRecord row : rows) {
            assertEquals("predicted: pH 7.00, I 20 mM, 25 °C", row.get("buffer"), row.toString());
        }
        Path labelled = dir.resolve("c.csv");
        run("predict", "--library", DEMO.resolve("library.csv").toString(), "--ph", "7.0", "--ionic-strength-mm",
                "20", "--buffer-label", "PHOS-7", "--out", labelled.toString());
        assertTrue(Files.readString(labelled).contains(",PHOS-7,"));
    }

    @Test
    void scanReportsTheTrueClosestApproachWhateverTheStep() {
        String[] lines = new String[2];
        String[] steps = {"0.5", "0.05"};
        for (int i = 0; i < 2; i++) {
            String[] r = run("predict", "--library", DEMO.resolve("library.csv").toString(), "--ionic-strength-mm",
                    "12", "--scan", "3:10:" + steps[i], "--analytes", "fluoride,formate,phosphate,acetate,nitrite");
            assertEquals("0", r[0], r[2]);
            String fp = r[1].lines().filter(l -> l.contains("fluoride and phosphate")).findFirst().orElseThrow();
            // fluoride is below phosphate in |μ| at pH 3 and above it at pH 3.5 (table): the curves cross
            assertTrue(fp.contains("the curves cross"), fp);
            assertFalse(r[1].contains("3.00 and 3.00") || r[1].contains("pH 3.00 to 3.00"), r[1]);
            lines[i] = r[1].lines().filter(l -> l.startsWith("co-migration") || l.startsWith("not reliably")
                    || l.startsWith("No pair")).toList().toString();
        }
        assertEquals(lines[0], lines[1], "the intervals do not depend on the printed step");
    }

    @Test
    void recheckWritesTheSameVerdictsAsAnHtmlPage() throws Exception {
        Path table = dir.resolve("peaks.csv");
        run("identify", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--csv", table.toString(), "--quiet");
        Path verdicts = dir.resolve("rc.csv");
        Path page = dir.resolve("recheck.html");
        String[] r = run("recheck", "--table", table.toString(), "--library", DEMO.resolve("library.csv").toString(),
                "--ph", "4.5", "--ionic-strength-mm", "12", "--reference", REFERENCE.toString(),
                "--csv", verdicts.toString(), "--html", page.toString());
        assertEquals("1", r[0], r[2]);
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(Files.newBufferedReader(verdicts)).getRecords();
        String html = Files.readString(page);
        String every = html.substring(html.indexOf("<h2>Every earlier assignment</h2>"));
        every = every.substring(0, every.indexOf("</table>"));
        // one row per assignment of the CSV, each with its run and verdict
        assertEquals(rows.size(), every.split("<tr><td>", -1).length - 1, every);
        for (CSVRecord row : rows) {
            assertTrue(every.contains("<tr><td>" + row.get("run") + "</td>"), row.get("run"));
        }
        assertTrue(html.contains("<h2>Per analyte</h2>") && html.contains("phosphate"), html);
        assertTrue(html.contains("presumptive"), "the page carries the caution");
        assertFalse(html.contains("NaN"), "no NaN a person reads");
    }

    @Test
    void recheckVerdictsFollowTheStatedWindowRule() throws Exception {
        Path table = dir.resolve("peaks.csv");
        run("identify", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--csv", table.toString(), "--quiet");
        Path verdicts = dir.resolve("rc.csv");
        String[] r = run("recheck", "--table", table.toString(), "--library", DEMO.resolve("library.csv").toString(),
                "--ph", "7.0", "--ionic-strength-mm", "20", "--csv", verdicts.toString());
        assertEquals("1", r[0], r[2]);
        assertFalse(r[1].contains("moved still unique"), r[1]);
        assertFalse(r[1].contains("rests on the measured"), r[1]);
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(Files.newBufferedReader(verdicts)).getRecords();
        int nitrates = 0;
        for (CSVRecord row : rows) {
            if (!row.get("analyte").equals("nitrate")) {
                continue;
            }
            nitrates++;
            String verdict = row.get("verdict");
            String reason = row.get("reason");
            if (verdict.equals("still_holds")) {
                assertTrue(reason.contains("stays inside the window of nitrate in the old library"), reason);
            } else {
                assertEquals("moved_but_still_unique", verdict, reason);
                assertTrue(reason.contains("falls outside the window of nitrate in the old library"), reason);
            }
        }
        assertTrue(nitrates >= 4);
        // the same shift for every nitrate: whether the old window holds is ordered by the moved mobility
        double worstInside = rows.stream().filter(x -> x.get("analyte").equals("nitrate")
                && x.get("verdict").equals("still_holds")).mapToDouble(x -> Double.parseDouble(x.get("new_mobility")))
                .map(v -> Math.abs(v - -69.5)).max().orElse(0);
        double bestOutside = rows.stream().filter(x -> x.get("analyte").equals("nitrate")
                && !x.get("verdict").equals("still_holds")).mapToDouble(x -> Double.parseDouble(x.get("new_mobility")))
                .map(v -> Math.abs(v - -69.5)).min().orElse(Double.POSITIVE_INFINITY);
        assertTrue(worstInside < bestOutside, worstInside + " vs " + bestOutside);
    }

    /**
     * A Tris buffer adjusted to pH 8.10 at 25 °C and run at 37 °C: its pH falls with its pKa, by
     * 0.32 (ΔrH° 47.45 kJ/mol, Goldberg, Kishore &amp; Lennen 2002, from memory; checked against a read
     * value in PkaTemperatureTest), and the predictions are made at the shifted pH.
     */
    @Test
    void buffersOwnPhFollowsTheMethodTemperature() {
        String[] r = run("predict", "--library", DEMO.resolve("library.csv").toString(), "--ph", "8.10",
                "--ionic-strength-mm", "20", "--temperature-c", "37", "--reference", REFERENCE.toString(),
                "--buffer-substance", "Tris", "--ph-measured-at-c", "25");
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].contains("Buffer pH: Tris at pH 8.10 (measured at 25 °C) is at pH 7.78"), r[1]);
        assertTrue(r[1].contains("tabulated enthalpy"), r[1]);
        assertTrue(r[1].contains("in pH 7.78, I 20.0 mmol/L, 37.0 °C"), r[1]);
        String[] unknown = run("predict", "--library", DEMO.resolve("library.csv").toString(), "--ph", "8.10",
                "--ionic-strength-mm", "20", "--temperature-c", "37", "--reference", REFERENCE.toString(),
                "--buffer-substance", "no such buffer", "--ph-measured-at-c", "25");
        assertEquals("3", unknown[0], unknown[1] + unknown[2]);
    }
}
