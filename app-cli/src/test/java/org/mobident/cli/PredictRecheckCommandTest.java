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
        assertTrue(r[1].startsWith("ph,acetate,formate,fluoride"), r[1].substring(0, 60));
        assertTrue(r[1].contains("co-migration") || r[1].contains("No pair co-migrates"), r[1]);
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
}
