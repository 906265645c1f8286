package org.mobident.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;

/**
 * The one table reader. Every check value is read off the small tables written in the tests
 * (line numbers counted in the text as given).
 */
class TableReaderTest {

    private static final TableSpec LIBRARY = TableSpec.of("library file", List.of("name", "mobility", "note"),
            List.of("name", "mobility"));
    private static final TableSpec SHEET = TableSpec.of("run sheet", List.of("file", "voltage_kv", "sample"),
            List.of("file")).withSniffedDelimiter().withSpacesAsUnderscore();

    /** Every row as "line:name=mobility". */
    private static List<String> rows(String text, TableSpec spec, List<String> comments) throws InputException {
        List<String> out = new ArrayList<>();
        try (TableReader t = TableReader.open(new StringReader(text), "t.csv", spec)) {
            for (TableRow r = t.next(); r != null; r = t.next()) {
                out.add(r.line() + ":" + r.get("name") + "=" + r.get("mobility"));
            }
            if (comments != null) {
                comments.addAll(t.comments());
            }
        }
        return out;
    }

    private static InputException refused(String text, TableSpec spec) {
        return assertThrows(InputException.class, () -> rows(text, spec, null));
    }

    @Test
    void byteOrderMarkCommentsBlankLinesAndLineNumbers() throws Exception {
        String text = "\uFEFF# note one\n\nName , Mobility\n# between\nCl,-79.1\n,,\n\"multi\nline\",-5\n"
                + "  # indented note\nlast, 3 \n# trailer";
        List<String> comments = new ArrayList<>();
        assertEquals(List.of("5:Cl=-79.1", "7:multi\nline=-5", "10:last=3"), rows(text, LIBRARY, comments));
        assertEquals(List.of("note one", "between", "indented note", "trailer"), comments);
    }

    @Test
    void crLfAndLoneCrLineEnds() throws Exception {
        assertEquals(List.of("2:a=1", "4:b=2"), rows("name,mobility\r\na,1\r\n# c\r\nb,2\r\n", LIBRARY, null));
        assertEquals(List.of("2:a=1", "3:b=2"), rows("name,mobility\ra,1\rb,2\r", LIBRARY, null));
    }

    @Test
    void aQuotedHashIsAValueNotAComment() throws Exception {
        assertEquals(List.of("2:#hash=1"), rows("name,mobility\n\"#hash\",1\n", LIBRARY, null));
        TableSpec noComments = LIBRARY.withoutComments();
        assertEquals(List.of("2:#3=1"), rows("name,mobility\n#3,1\n", noComments, null));
    }

    @Test
    void delimiterFromTheHeader() throws Exception {
        for (String text : List.of("File;Voltage-kV\na.csv;-20\n", "file\tvoltage kv\na.csv\t-20\n",
                "file,voltage_kv\na.csv,-20\n")) {
            try (TableReader t = TableReader.open(new StringReader(text), "s.csv", SHEET)) {
                TableRow r = t.next();
                assertEquals("a.csv", r.get("file"), text);
                assertEquals("-20", r.get("voltage_kv"), text);
                assertEquals("", r.get("sample"), "a column the sheet lacks reads empty");
                assertNull(t.next());
            }
        }
        // a decimal comma stays inside its cell with semicolons
        try (TableReader t = TableReader.open(new StringReader("file;voltage_kv\na.csv;2,5\n"), "s.csv", SHEET)) {
            assertEquals(';', t.delimiter());
            assertEquals("2,5", t.next().get("voltage_kv"));
        }
    }

    @Test
    void headerProblemsNameFileLineAndField() {
        InputException unknown = refused("# c\nnmae,mobility\nx,1\n", LIBRARY);
        assertEquals("t.csv", unknown.file());
        assertEquals(2, unknown.line());
        assertEquals("nmae", unknown.field());
        assertTrue(unknown.problem().contains("did you mean 'name'"), unknown.getMessage());
        assertTrue(unknown.problem().contains("known columns: name, mobility, note"), unknown.getMessage());

        InputException semicolons = refused("name;mobility\nx;1\n", LIBRARY);
        assertTrue(semicolons.problem().contains("comma-delimited"), semicolons.getMessage());

        InputException missing = refused("name,note\nx,y\n", LIBRARY);
        assertEquals(1, missing.line());
        assertEquals("mobility", missing.field());
        assertTrue(missing.problem().contains("required column 'mobility' is missing"), missing.getMessage());
        InputException listed = refused("voltage_kv\n20\n", SHEET.listingPresentColumns());
        assertTrue(listed.problem().contains("columns present: voltage_kv"), listed.getMessage());

        InputException twice = refused("name,mobility,Name\nx,1,y\n", LIBRARY);
        assertEquals("name", twice.field());
        assertTrue(twice.problem().contains("columns 1 and 3"), twice.getMessage());

        InputException empty = refused("# only a comment\n\n,,\n", LIBRARY);
        assertEquals(0, empty.line());
        assertTrue(empty.problem().contains("library file is empty"), empty.getMessage());
    }

    @Test
    void unknownColumnsCanBeIgnored() throws Exception {
        assertEquals(List.of("2:x=1"), rows("name,colour,mobility\nx,red,1,extra\n", LIBRARY.ignoringUnknownColumns(),
                null));
    }

    @Test
    void valuesUnderNoColumn() throws Exception {
        InputException beyond = refused("name,mobility\nx,1\ny,2,5\n", LIBRARY);
        assertEquals(3, beyond.line());
        assertEquals("column 3", beyond.field());
        assertTrue(beyond.problem().contains("decimal comma"), beyond.getMessage());
        InputException unnamed = refused("name,,mobility\nx,oops,1\n", LIBRARY);
        assertEquals("column 2", unnamed.field());
        assertEquals(List.of("2:x=1"), rows("name,,mobility\nx,,1\n", LIBRARY, null), "an empty cell there is fine");

        try (TableReader t = TableReader.open(new StringReader("name,mobility\nx,1,2\ny,3\n"), "t.csv",
                LIBRARY.withUnnamedValuesPerRow())) {
            TableRow first = t.next();
            assertNotNull(first.unnamedValueProblem(), "left to the caller");
            assertEquals(2, first.unnamedValueProblem().line());
            assertNull(t.next().unnamedValueProblem());
        }
    }

    @Test
    void anOpenQuoteIsReportedFromItsLine() {
        InputException open = refused("name,mobility\nx,1\n\"open,2\ny,3\n", LIBRARY);
        assertEquals(3, open.line());
        assertTrue(open.problem().contains("quotes"), open.getMessage());
        InputException inHeader = refused("# c\n\"name,mobility\nx,1\n", LIBRARY);
        assertEquals(2, inHeader.line(), "the header's own line, after the comment");
    }

    @Test
    void filesAreStrictUtf8WithTheMarkStripped(@TempDir Path dir) throws IOException, InputException {
        Path bom = dir.resolve("bom.csv");
        Files.write(bom, "\uFEFFname,mobility\nchlorure \u00e9,-79\n".getBytes(StandardCharsets.UTF_8));
        try (TableReader t = TableReader.open(bom, LIBRARY)) {
            assertEquals(bom.toString(), t.file());
            assertEquals("chlorure \u00e9", t.next().get("name"));
        }
        Path latin = dir.resolve("latin.csv");
        Files.write(latin, "name,mobility\nchlorure \u00e9,-79\n".getBytes(StandardCharsets.ISO_8859_1));
        InputException notUtf8 = assertThrows(InputException.class, () -> TableReader.open(latin, LIBRARY));
        assertEquals(latin.toString(), notUtf8.file());
        assertTrue(notUtf8.problem().contains("not valid UTF-8"), notUtf8.getMessage());
        // bytes that are not UTF-8 far down a long file, met while the rows stream
        StringBuilder longText = new StringBuilder("name,mobility\n");
        for (int i = 0; i < 5000; i++) {
            longText.append("ion").append(i).append(",-").append(i % 90).append('\n');
        }
        byte[] bytes = (longText + "chlor").getBytes(StandardCharsets.UTF_8);
        byte[] bad = java.util.Arrays.copyOf(bytes, bytes.length + 3);
        bad[bytes.length] = (byte) 0xE9;
        bad[bytes.length + 1] = ',';
        bad[bytes.length + 2] = '1';
        Path far = dir.resolve("far.csv");
        Files.write(far, bad);
        InputException farOff = assertThrows(InputException.class, () -> {
            try (TableReader t = TableReader.open(far, LIBRARY)) {
                for (TableRow r = t.next(); r != null; r = t.next()) {
                    assertTrue(r.get("name").startsWith("ion"), "rows before the bad bytes read as written");
                }
            }
        });
        assertEquals(far.toString(), farOff.file());
        assertTrue(farOff.problem().contains("not valid UTF-8"), farOff.getMessage());
        InputException none = assertThrows(InputException.class,
                () -> TableReader.open(dir.resolve("none.csv"), LIBRARY));
        assertTrue(none.problem().contains("cannot read the library file: file not found"), none.getMessage());
    }

    @Test
    void filesWithAUtf16MarkAreReadAsUtf16(@TempDir Path dir) throws IOException, InputException {
        // "Unicode" text as Windows programs save it: a byte order mark of either order
        String text = "name,mobility\nchlorure \u00e9,-79\nnitrate,-71.5\n";
        for (java.nio.charset.Charset cs : List.of(StandardCharsets.UTF_16LE, StandardCharsets.UTF_16BE)) {
            Path p = dir.resolve("u16-" + cs.name() + ".csv");
            Files.write(p, ("\uFEFF" + text).getBytes(cs));
            try (TableReader t = TableReader.open(p, LIBRARY)) {
                TableRow first = t.next();
                assertEquals("chlorure \u00e9", first.get("name"), cs.name());
                assertEquals("-79", first.get("mobility"), cs.name());
                assertEquals("nitrate", t.next().get("name"), cs.name());
                assertNull(t.next(), cs.name());
            }
        }
    }

    @Test
    void theMarkIsStrippedInOnePlace() {
        byte[] withMark = "\uFEFFa".getBytes(StandardCharsets.UTF_8);
        assertEquals(3, TextFiles.bomLength(withMark));
        assertEquals(0, TextFiles.bomLength("a".getBytes(StandardCharsets.UTF_8)));
        assertEquals("a", TextFiles.withoutBom("\uFEFFa"));
        assertEquals("a\uFEFF", TextFiles.withoutBom("a\uFEFF"), "only a leading mark");
    }
}
