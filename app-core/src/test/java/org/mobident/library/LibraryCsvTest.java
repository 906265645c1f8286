package org.mobident.library;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;

class LibraryCsvTest {

    private static final String FILE = "lib.csv";

    private static Library parse(String text) throws InputException {
        return LibraryCsv.read(new StringReader(text), FILE);
    }

    private static InputException failure(String text) {
        return assertThrows(InputException.class, () -> parse(text));
    }

    // The numbers below are invented test data, not reference values.
    @Test
    void readsCommentsBlankLinesAnyColumnOrderAndLists() throws InputException {
        String text = "\uFEFF# Borate 20 mM, pH 9.2\n"
                + "#  measured 2024-03  \n"
                + "Mobility , NAME,pKa,Limiting_Mobility,n,charge,mobility_sd,Buffer,pH,temperature_c,source\n"
                + "\n"
                + "-79.1,Chloride,,,6,-1,0.4,borate,9.2,25,standards run 12\n"
                + "# phosphate needs its three pKa values\n"
                + "−35.2,Phosphate,2.15 7.20  12.35,-35.1 -61.5 -71.4,,-2,,,,,\n"
                + ",,,,,,,,,,\n";
        Library lib = parse(text);
        assertEquals(2, lib.size());
        assertEquals(List.of("Borate 20 mM, pH 9.2", "measured 2024-03", "phosphate needs its three pKa values"),
                lib.notes());
        assertEquals(FILE, lib.sourceFile());

        LibraryEntry cl = lib.entries().get(0);
        assertEquals("Chloride", cl.name());
        assertEquals(-79.1, cl.mobility());
        assertEquals(0.4, cl.mobilitySd());
        assertEquals(6, cl.n());
        assertEquals(-1, cl.charge());
        assertEquals("borate", cl.buffer());
        assertEquals(9.2, cl.pH());
        assertEquals(25.0, cl.temperatureC());
        assertEquals("standards run 12", cl.source());
        assertTrue(Double.isNaN(cl.tolerance()));
        assertTrue(Double.isNaN(cl.ionicStrengthMm()));
        assertTrue(cl.pKa().isEmpty());

        LibraryEntry po = lib.find("Phosphate").orElseThrow();
        assertEquals(-35.2, po.mobility(), "the typographic minus sign reads as '-'");
        assertEquals(List.of(2.15, 7.20, 12.35), po.pKa());
        assertEquals(List.of(-35.1, -61.5, -71.4), po.limitingMobilities());
        assertEquals(0, po.n());
        assertEquals(-2, po.charge());
        assertTrue(Double.isNaN(po.mobilitySd()));
        assertNull(po.buffer());
        assertNull(po.source());
    }

    @Test
    void roundTripIsExact() throws InputException {
        LibraryEntry full = new LibraryEntry("Phosphate, total", -55.43, 0.123, 7, -2, 1.5,
                List.of(2.15, 7.2, 12.35), List.of(-35.1, -61.5, -71.4), "borate \"20\" mM", 9.2, 1e-3, 25.0,
                "Smith 2020; table 3", true, 0.21);
        LibraryEntry odd = new LibraryEntry("#hash-first", 1e-3, 1e-10, 0, 0, Double.NaN,
                List.of(), List.of(0.1 + 0.2), null, Double.NaN, Double.NaN, -0.0, null);
        LibraryEntry tiny = LibraryEntry.of("Lithium ion Li⁺", 40.1, Double.NaN);
        LibraryEntry huge = LibraryEntry.of("multi\nline", 1.7976931348623157e308, 4.9e-324);
        Library lib = new Library(List.of(full, odd, tiny, huge), "memory",
                List.of("first note", "", "third, with comma"));

        String csv = LibraryCsv.toCsv(lib);
        Library back = LibraryCsv.read(new StringReader(csv), "memory");

        assertEquals(lib.entries(), back.entries(), csv);
        assertEquals(lib.notes(), back.notes(), csv);
        assertEquals(List.of(5L, 6L, 7L, 8L), back.entryLines(), "each entry's first line in the file");
        assertTrue(csv.contains(",yes,0.21\n"), csv);
        assertTrue(csv.startsWith("# first note\n#\n# third, with comma\nname,mobility,"), csv);
    }

    @Test
    void writesOrdinaryValuesReadably() {
        LibraryEntry e = new LibraryEntry("Chloride", -79.1, 0.4, 6, -1, Double.NaN, List.of(), List.of(),
                null, Double.NaN, 20.0, 25.0, null);
        String csv = LibraryCsv.toCsv(new Library(List.of(e), "x", List.of()));
        assertEquals("name,mobility,mobility_sd,n,charge,ionic_strength_mm,temperature_c\n"
                + "Chloride,-79.1,0.4,6,-1,20,25\n", csv, "unused columns are left out; integers without '.0'");
    }

    @Test
    void formatsNumbersShortAndExact() {
        assertEquals("-55.43", LibraryCsv.formatNumber(-55.43));
        assertEquals("0.001", LibraryCsv.formatNumber(1e-3));
        assertEquals("25", LibraryCsv.formatNumber(25.0));
        assertEquals("1e-10", LibraryCsv.formatNumber(1e-10));
        assertEquals("1.5e12", LibraryCsv.formatNumber(1.5e12));
        assertEquals("-0", LibraryCsv.formatNumber(-0.0));
        assertEquals("", LibraryCsv.formatNumber(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> LibraryCsv.formatNumber(Double.POSITIVE_INFINITY));
        java.util.Random rnd = new java.util.Random(42);
        for (int k = 0; k < 20000; k++) {
            double v = switch (k % 3) {
                case 0 -> Double.longBitsToDouble(rnd.nextLong());
                case 1 -> (rnd.nextDouble() - 0.5) * 200;
                default -> Math.round((rnd.nextDouble() - 0.5) * 20000) / 100.0;
            };
            if (!Double.isFinite(v)) {
                continue;
            }
            String s = LibraryCsv.formatNumber(v);
            assertEquals(Double.doubleToLongBits(v), Double.doubleToLongBits(Double.parseDouble(s)), s);
        }
    }

    @Test
    void readsAndWritesFiles(@TempDir Path dir) throws Exception {
        Library lib = new Library(List.of(LibraryEntry.of("Nitrate", -74.1, 0.3)), "x", List.of("note"));
        Path f = dir.resolve("lib.csv");
        LibraryCsv.write(lib, f);
        Library back = LibraryCsv.read(f);
        assertEquals(lib.entries(), back.entries());
        assertEquals(lib.notes(), back.notes());
        assertEquals(f.toString(), back.sourceFile());
    }

    @Test
    void rejectsInvalidUtf8(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("bad.csv");
        Files.write(f, new byte[] {'n', 'a', 'm', 'e', ',', 'm', 'o', 'b', 'i', 'l', 'i', 't', 'y', '\n',
            (byte) 0xC3, (byte) 0x28, ',', '1', '\n'});
        InputException e = assertThrows(InputException.class, () -> LibraryCsv.read(f));
        assertEquals(f.toString(), e.file());
        assertTrue(e.problem().contains("UTF-8"), e.getMessage());
        assertThrows(InputException.class, () -> LibraryCsv.read(dir.resolve("missing.csv")));
    }

    @Test
    void duplicateNameNamesBothLines() {
        InputException e = failure("name,mobility\nA,1\n# c\nB,2\nA,3\n");
        assertEquals(FILE, e.file());
        assertEquals(5, e.line());
        assertEquals("name", e.field());
        assertTrue(e.problem().contains("lines 2 and 5"), e.getMessage());
    }

    @Test
    void missingOrEmptyName() {
        InputException e = failure("name,mobility\nA,1\n  ,2\n");
        assertEquals(3, e.line());
        assertEquals("name", e.field());
        InputException col = failure("mobility,buffer\n1,x\n");
        assertEquals(1, col.line());
        assertEquals("name", col.field());
    }

    @Test
    void missingMobility() {
        InputException col = failure("name,buffer\nA,x\n");
        assertEquals(1, col.line());
        assertEquals("mobility", col.field());
        InputException cell = failure("name,mobility,buffer\nA,1,x\nB,,x\n");
        assertEquals(3, cell.line());
        assertEquals("mobility", cell.field());
        assertTrue(cell.problem().contains("'B'"), cell.getMessage());
        InputException shortRow = failure("name,mobility\nA,1\nB\n");
        assertEquals(3, shortRow.line());
        assertEquals("mobility", shortRow.field());
    }

    @Test
    void badMobilitySd() {
        InputException text = failure("name,mobility,mobility_sd\nA,1,abc\n");
        assertEquals(2, text.line());
        assertEquals("mobility_sd", text.field());
        InputException neg = failure("name,mobility,mobility_sd\nA,1,0.2\nB,2,-0.1\n");
        assertEquals(3, neg.line());
        assertEquals("mobility_sd", neg.field());
    }

    @Test
    void nonIntegerN() {
        InputException e = failure("name,mobility,n\nA,1,3.5\n");
        assertEquals(2, e.line());
        assertEquals("n", e.field());
        InputException neg = failure("name,mobility,n\nA,1,-2\n");
        assertEquals("n", neg.field());
    }

    @Test
    void nanAndInfinityAnywhere() {
        assertEquals("mobility", failure("name,mobility\nA,NaN\n").field());
        assertEquals("mobility", failure("name,mobility\nA,Infinity\n").field());
        assertEquals("mobility", failure("name,mobility\nA,1e999\n").field());
        assertEquals("ph", failure("name,mobility,ph\nA,1,-Infinity\n").field());
        assertEquals("pka", failure("name,mobility,pka\nA,1,2.1 NaN\n").field());
        assertEquals("limiting_mobility", failure("name,mobility,limiting_mobility\nA,1,\"-3,-4\"\n").field());
        assertEquals("mobility", failure("name,mobility\nA,0x1p3\n").field(), "no hexadecimal numbers");
    }

    @Test
    void otherFieldChecks() {
        assertEquals("tolerance", failure("name,mobility,tolerance\nA,1,0\n").field());
        assertEquals("ionic_strength_mm", failure("name,mobility,ionic_strength_mm\nA,1,-5\n").field());
        assertEquals("column 3", failure("name,mobility\nA,1,stray\n").field());
        assertEquals("mobility", failure("name,mobility,Mobility\nA,1,2\n").field(), "a repeated column");
    }

    @Test
    void emptyFileAndHeaderOnly() {
        InputException empty = failure("");
        assertEquals(0, empty.line());
        assertTrue(empty.problem().contains("empty"), empty.getMessage());
        InputException comments = failure("# only a note\n\n");
        assertTrue(comments.problem().contains("empty"), comments.getMessage());
        InputException header = failure("name,mobility\n# nothing yet\n");
        assertTrue(header.problem().contains("no analytes"), header.getMessage());
    }

    @Test
    void unknownColumnIsNamedAndKnownOnesListed() {
        InputException e = failure("name,mobility,mobilty_sd\nA,1,0.1\n");
        assertEquals(1, e.line());
        assertEquals("mobilty_sd", e.field());
        assertTrue(e.problem().contains("mobility_sd") && e.problem().contains("limiting_mobility")
                && e.problem().contains("temperature_c"), e.getMessage());
    }

    @Test
    void aSpreadsheetsSemicolonsAndDecimalCommasAreReadAsTheCommaFile() throws InputException {
        Library semicolons = parse("name;mobility;mobility_sd;pka\nA;\u221276,30;0,40;2,15 7,20\n");
        Library commas = parse("name,mobility,mobility_sd,pka\nA,-76.30,0.40,2.15 7.20\n");
        LibraryEntry a = semicolons.entries().get(0);
        LibraryEntry b = commas.entries().get(0);
        assertEquals(b.mobility(), a.mobility(), 0.0);
        assertEquals(b.mobilitySd(), a.mobilitySd(), 0.0);
        assertEquals(b.pKa(), a.pKa());
        InputException e = failure("name;mobility\nA;1.2.3\n");
        assertEquals("mobility", e.field(), e.getMessage());
    }

    @Test
    void lineNumbersCountMultiLineFieldsAndComments() {
        InputException e = failure("# a\nname,mobility,source\nA,1,\"two\nlines\"\n\nB,x,y\n");
        assertEquals(6, e.line());
        assertEquals("mobility", e.field());
        InputException quote = failure("name,mobility\nA,1\nB,\"2\"x\n");
        assertEquals(FILE, quote.file());
        assertTrue(quote.line() >= 3, quote.getMessage());
    }

    @Test
    void aRunsBufferSeesItsOwnEntriesAndTheUnlabelledOnes() throws InputException {
        String csv = "name,mobility,buffer\nnitrate,-70.0,\nnitrate,-69.5,CHR-8\nchloride,-76.0,\n"
                + "nitrate,-68.0,IMZ-4.5\n";
        Library lib = LibraryCsv.read(new StringReader(csv), "l.csv");
        assertEquals(List.of("CHR-8", "IMZ-4.5"), lib.bufferLabels());
        Library chr = lib.forBuffer("chr-8");
        // the buffer's own nitrate replaces the unlabelled one; the unlabelled chloride applies to every buffer
        assertEquals(List.of("nitrate", "chloride"), chr.entries().stream().map(LibraryEntry::name).toList());
        assertEquals(-69.5, chr.find("nitrate").orElseThrow().mobility(), 0.0);
        assertEquals(List.of(3L, 4L), chr.entryLines());
        assertEquals(lib, lib.forBuffer(null));
        InputException twice = org.junit.jupiter.api.Assertions.assertThrows(InputException.class,
                () -> LibraryCsv.read(new StringReader(csv + "nitrate,-69.4,chr-8\n"), "l.csv"));
        assertEquals(6, twice.line());
    }
}
