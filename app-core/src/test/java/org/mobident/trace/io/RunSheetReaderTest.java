package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

class RunSheetReaderTest {

    private static final double EXACT = 0.0;
    private static final double NaN = Double.NaN;

    @TempDir
    Path dir;

    @BeforeEach
    void traces() throws IOException {
        Files.createDirectories(dir.resolve("traces"));
        for (String n : new String[] {"a", "b", "c", "d", "e"}) {
            Files.writeString(dir.resolve("traces/" + n + ".csv"), "time,signal\n0,1\n1,2\n");
        }
    }

    private Path sheet(String content) throws IOException {
        Path p = dir.resolve("runs.csv");
        Files.write(p, content.getBytes(StandardCharsets.UTF_8));
        return p;
    }

    private static RunConditions defaults() {
        return new RunConditions(60.0, 50.0, 25.0, 0.5, 25.0, "borate", 100.0, 200.0, Detection.DIRECT,
                NaN, NaN, NaN);
    }

    private RunSheet read(String content) throws Exception {
        return RunSheetReader.read(sheet(content), RunConditions.EMPTY);
    }

    /** A sheet whose only data row is bad: the problem is returned, not thrown. */
    private InputException rowProblem(String content) throws Exception {
        RunSheet s = read(content);
        assertEquals(0, s.runs().size());
        assertEquals(1, s.rowProblems().size());
        InputException e = s.rowProblems().get(0);
        assertEquals(dir.resolve("runs.csv").toString(), e.file());
        return e;
    }

    private static void assertWhere(InputException e, long line, String field) {
        assertEquals(line, e.line(), e::getMessage);
        assertEquals(field, e.field(), e::getMessage);
    }

    @Test
    void happyPathCommaSheet() throws Exception {
        Path p = sheet("file,total_length_cm,detector_length_cm,voltage_kv,ramp_s,temperature_c,buffer,"
                + "marker_from_s,marker_to_s,detection,ref_marker_mobility,ref_marker_from_s,ref_marker_to_s,"
                + "sample,note\n"
                + "traces/a.csv,64.5,56,-30,1.2,25,\"20 mM MES, pH 6\",120,180,indirect,-79.1,300,360,S1,first\n");
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertTrue(s.clean());
        RunSpec r = s.runs().get(0);
        assertEquals("a", r.name());
        assertEquals(dir.resolve("traces/a.csv"), r.traceFile());
        assertEquals(p.toString(), r.origin());
        assertEquals(2, r.originLine());
        RunConditions c = r.conditions();
        assertEquals(new RunConditions(64.5, 56, -30, 1.2, 25, "20 mM MES, pH 6", 120, 180, Detection.INDIRECT,
                -79.1, 300, 360), c);
    }

    @Test
    void semicolonDecimalCommaBomCommentsAndHeaderSpelling() throws Exception {
        byte[] body = ("# day 1\n\nFILE;Total Length cm;Detector-Length_cm;Voltage_kV\n# a comment\n"
                + "traces/a.csv;64,5;56;-30\n\ntraces/b.csv;60;50,5;25\n").getBytes(StandardCharsets.UTF_8);
        byte[] bom = new byte[body.length + 3];
        bom[0] = (byte) 0xEF;
        bom[1] = (byte) 0xBB;
        bom[2] = (byte) 0xBF;
        System.arraycopy(body, 0, bom, 3, body.length);
        Path p = dir.resolve("runs.csv");
        Files.write(p, bom);
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertTrue(s.clean(), () -> s.rowProblems().toString());
        assertEquals(64.5, s.runs().get(0).conditions().totalLengthCm(), EXACT);
        assertEquals(5, s.runs().get(0).originLine());
        assertEquals(50.5, s.runs().get(1).conditions().detectorLengthCm(), EXACT);
        assertEquals(7, s.runs().get(1).originLine());
    }

    @Test
    void aTypesetMinusSignReadsAsMinus() throws Exception {
        // a voltage copied from a document: U+2212, not the hyphen-minus
        Path p = sheet("file,total_length_cm,detector_length_cm,voltage_kv\ntraces/a.csv,64.5,56,\u221230\n");
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertTrue(s.clean(), () -> s.rowProblems().toString());
        assertEquals(-30, s.runs().get(0).conditions().voltageKv(), EXACT);
    }

    @Test
    void aCellMayCarryItsColumnsOwnUnitButNoOther() throws Exception {
        Path p = sheet("file,total_length_cm,detector_length_cm,voltage_kv,temperature_c,marker_from_s,marker_to_s\n"
                + "traces/a.csv,64.5 cm,56cm,-30 kV,22.5 °C,120 s,180 S\n"
                + "traces/b.csv,645 mm,56,-30,25,120,180\n"
                + "traces/c.csv,64.5,56,-30000 V,25,120,180\n");
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertEquals(1, s.runs().size(), () -> s.rowProblems().toString());
        RunConditions c = s.runs().get(0).conditions();
        assertEquals(64.5, c.totalLengthCm(), EXACT);
        assertEquals(56, c.detectorLengthCm(), EXACT);
        assertEquals(-30, c.voltageKv(), EXACT);
        assertEquals(22.5, c.temperatureC(), EXACT);
        assertEquals(120, c.markerFromS(), EXACT);
        assertEquals(180, c.markerToS(), EXACT);
        String problems = s.rowProblems().toString();
        assertTrue(problems.contains("'645 mm' is in mm, but this column is in cm"), problems);
        assertTrue(problems.contains("'-30000 V' is in V, but this column is in kV"), problems);
    }

    @Test
    void headerNamesWithUnitsInBrackets() throws Exception {
        // how a spreadsheet user writes the columns: words, units in brackets, a degree sign
        Path p = sheet("File,Total length (cm),Detector length [cm],Voltage (kV),Temperature (°C),"
                + "Marker from (s),Marker to (s),Detection\n"
                + "traces/a.csv,64.5,56,-30,22.5,120,180,indirect\n");
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertTrue(s.clean(), () -> s.rowProblems().toString());
        RunConditions c = s.runs().get(0).conditions();
        assertEquals(64.5, c.totalLengthCm(), EXACT);
        assertEquals(56, c.detectorLengthCm(), EXACT);
        assertEquals(-30, c.voltageKv(), EXACT);
        assertEquals(22.5, c.temperatureC(), EXACT);
        assertEquals(120, c.markerFromS(), EXACT);
        assertEquals(180, c.markerToS(), EXACT);
        assertEquals(Detection.INDIRECT, c.detection());
        // a name that still matches nothing is refused with the known names
        InputException e = assertThrows(InputException.class,
                () -> RunSheetReader.read(sheet("file,Length (mm)\ntraces/a.csv,640\n"), RunConditions.EMPTY));
        assertEquals("Length (mm)", e.field());
    }

    @Test
    void defaultsFillEmptyCellsAndRowValuesOverride() throws Exception {
        Path p = sheet("file,voltage_kv,buffer,detection\ntraces/a.csv,,,\ntraces/b.csv,-20,acetate,indirect\n");
        RunSheet s = RunSheetReader.read(p, defaults());
        assertEquals(defaults(), s.runs().get(0).conditions());
        RunConditions b = s.runs().get(1).conditions();
        assertEquals(-20, b.voltageKv(), EXACT);
        assertEquals("acetate", b.buffer());
        assertEquals(Detection.INDIRECT, b.detection());
        assertEquals(60, b.totalLengthCm(), EXACT);
    }

    @Test
    void backslashFoldersOfASheetWrittenOnWindows() throws Exception {
        Path p = sheet("file\ntraces\\a.csv\n");
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertTrue(s.clean(), () -> s.rowProblems().toString());
        assertEquals(dir.resolve("traces/a.csv"), s.runs().get(0).traceFile());
        assertEquals("a", s.runs().get(0).name());
        // a path that exists under neither reading is still reported as written
        RunSheet missing = RunSheetReader.read(sheet("file\ntraces\\none.csv\n"), RunConditions.EMPTY);
        assertTrue(missing.rowProblems().get(0).getMessage().contains("traces\\none.csv"),
                () -> missing.rowProblems().toString());
    }

    @Test
    void fileIsRelativeToTheSheetFolderOrAbsolute() throws Exception {
        Path sub = Files.createDirectories(dir.resolve("day1"));
        Files.writeString(sub.resolve("x.csv"), "time,signal\n0,1\n1,2\n");
        Path p = sub.resolve("sheet.csv");
        Files.writeString(p, "file\nx.csv\n../traces/a.csv\n" + dir.resolve("traces/b.csv").toAbsolutePath() + "\n");
        RunSheet s = RunSheetReader.read(p, RunConditions.EMPTY);
        assertTrue(s.clean(), () -> s.rowProblems().toString());
        assertEquals(sub.resolve("x.csv"), s.runs().get(0).traceFile());
        assertTrue(Files.isSameFile(dir.resolve("traces/a.csv"), s.runs().get(1).traceFile()));
        assertEquals(dir.resolve("traces/b.csv").toAbsolutePath(), s.runs().get(2).traceFile());
    }

    @Test
    void unknownColumnIsAnErrorListingTheKnownOnes() throws Exception {
        InputException e = assertThrows(InputException.class,
                () -> read("file,voltage_kV,temprature_c\ntraces/a.csv,20,25\n"));
        assertWhere(e, 1, "temprature_c");
        assertTrue(e.problem().contains("temperature_c"), e.getMessage());
    }

    @Test
    void wholeSheetProblemsThrow() throws Exception {
        InputException noFile = assertThrows(InputException.class, () -> read("# c\nvoltage_kv\n20\n"));
        assertWhere(noFile, 2, "file");
        assertTrue(noFile.problem().contains("voltage_kv"), noFile.getMessage());
        assertWhere(assertThrows(InputException.class, () -> read("")), 0, null);
        assertWhere(assertThrows(InputException.class, () -> read("# nothing\n\n")), 0, null);
        InputException headerOnly = assertThrows(InputException.class, () -> read("file,voltage_kv\n"));
        assertTrue(headerOnly.problem().contains("no runs"), headerOnly.getMessage());
        // the field is the column's own name, as in every other message about it
        assertWhere(assertThrows(InputException.class, () -> read("file,buffer,Buffer\na,b,c\n")), 1, "buffer");
        assertThrows(InputException.class, () -> RunSheetReader.read(dir.resolve("none.csv"), RunConditions.EMPTY));
        // a sheet saved as "Unicode" text is read as its UTF-8 equivalent
        Path u16 = dir.resolve("u16.csv");
        Files.write(u16, "file,voltage_kv\ntraces/a.csv,-20\n".getBytes(StandardCharsets.UTF_16));
        RunSheet u = RunSheetReader.read(u16, RunConditions.EMPTY);
        assertTrue(u.clean(), () -> u.rowProblems().toString());
        assertEquals(dir.resolve("traces/a.csv"), u.runs().get(0).traceFile());
        assertEquals(-20, u.runs().get(0).conditions().voltageKv(), EXACT);
    }

    @Test
    void batchGoesOnPastBadRows() throws Exception {
        RunSheet s = read("file,total_length_cm,detector_length_cm,voltage_kv,detection\n"
                + "traces/a.csv,60,50,20,direct\n"
                + "traces/b.csv,60,50,twenty,direct\n"
                + "traces/c.csv,60,50,20,direct\n"
                + "traces/missing.csv,60,50,20,direct\n"
                + "traces/d.csv,60,50,20,sideways\n"
                + "traces/e.csv,60,50,20,\n");
        assertEquals(List.of("a", "c", "e"), s.runs().stream().map(RunSpec::name).toList());
        assertEquals(3, s.rowProblems().size());
        assertWhere(s.rowProblems().get(0), 3, "voltage_kv");
        assertTrue(s.rowProblems().get(0).problem().contains("'twenty' is not a number"));
        assertWhere(s.rowProblems().get(1), 5, "file");
        assertTrue(s.rowProblems().get(1).problem().contains("not found"));
        assertWhere(s.rowProblems().get(2), 6, "detection");
    }

    @Test
    void geometryProblemsNameTheColumn() throws Exception {
        assertWhere(rowProblem("file,total_length_cm,detector_length_cm\ntraces/a.csv,50,60\n"), 2,
                "detector_length_cm");
        assertWhere(rowProblem("file,total_length_cm\ntraces/a.csv,-5\n"), 2, "total_length_cm");
        assertWhere(rowProblem("file,voltage_kv\ntraces/a.csv,0\n"), 2, "voltage_kv");
        assertWhere(rowProblem("file,ramp_s\ntraces/a.csv,-1\n"), 2, "ramp_s");
        assertWhere(rowProblem("file,temperature_c\ntraces/a.csv,150\n"), 2, "temperature_c");
        assertWhere(rowProblem("file,marker_from_s,marker_to_s\ntraces/a.csv,200,100\n"), 2, "marker_to_s");
        assertWhere(rowProblem("file,marker_from_s\ntraces/a.csv,200\n"), 2, "marker_to_s");
        assertWhere(rowProblem("file,ref_marker_mobility,ref_marker_from_s,ref_marker_to_s\n"
                + "traces/a.csv,-40,300,250\n"), 2, "ref_marker_to_s");
    }

    @Test
    void lengthsAndVoltageWhoseMobilityFactorOverflowsAreRejected() throws Exception {
        // each value is finite and valid alone, but 100·Ld·Lt/V overflows (or underflows to 0)
        InputException lengths = rowProblem("file,total_length_cm,detector_length_cm,voltage_kv\n"
                + "traces/a.csv,1e308,1e307,-20\n");
        assertWhere(lengths, 2, "total_length_cm");
        assertTrue(lengths.problem().contains("out of range"), lengths::getMessage);
        assertWhere(rowProblem("file,total_length_cm,detector_length_cm,voltage_kv\ntraces/a.csv,80,72,1e-307\n"),
                2, "voltage_kv");
        assertWhere(rowProblem("file,total_length_cm,detector_length_cm,voltage_kv\n"
                + "traces/a.csv,1e-200,1e-201,25\n"), 2, "total_length_cm");
        InputException single = assertThrows(InputException.class, () -> RunSheetReader.single(
                dir.resolve("traces/a.csv"), new RunConditions(1e308, 1e307, 25, 0, 25, null, NaN, NaN, null,
                        NaN, NaN, NaN)));
        assertEquals(RunSheetReader.OPTIONS, single.file());
        assertEquals("total_length_cm", single.field());
    }

    @Test
    void geometryIsCheckedAfterDefaults() throws Exception {
        // the row's detector length is fine alone but not against the default total length of 60 cm
        RunSheet s = RunSheetReader.read(sheet("file,detector_length_cm\ntraces/a.csv,70\n"), defaults());
        assertWhere(s.rowProblems().get(0), 2, "detector_length_cm");
    }

    @Test
    void otherRowProblems() throws Exception {
        assertWhere(rowProblem("file,voltage_kv\n,20\n"), 2, "file");
        assertWhere(rowProblem("file,voltage_kv\ntraces,20\n"), 2, "file");
        assertWhere(rowProblem("file,voltage_kv\ntraces/a.csv,NaN\n"), 2, "voltage_kv");
        assertWhere(rowProblem("file,voltage_kv\ntraces/a.csv,1e999\n"), 2, "voltage_kv");
        InputException many = rowProblem("file,voltage_kv\ntraces/a.csv,2,5\n");
        assertWhere(many, 2, "column 3"); // the one table reader names the cell that stands under no column
        assertTrue(many.problem().contains("decimal comma"), many.getMessage());
        InputException quotedComma = rowProblem("file,voltage_kv\ntraces/a.csv,\"2,5\"\n");
        assertWhere(quotedComma, 2, "voltage_kv");
        assertTrue(quotedComma.problem().contains("semicolon"), quotedComma.getMessage());
    }

    @Test
    void duplicateRunNamesAreRowProblems() throws Exception {
        Files.createDirectories(dir.resolve("other"));
        Files.writeString(dir.resolve("other/a.txt"), "time,signal\n0,1\n1,2\n");
        RunSheet s = read("file\ntraces/a.csv\ntraces/b.csv\nother/a.txt\n");
        assertEquals(2, s.runs().size());
        InputException e = s.rowProblems().get(0);
        assertWhere(e, 4, "file");
        assertTrue(e.problem().contains("line 2"), e.getMessage());
    }

    @Test
    void freeTextColumnsAreIgnored() throws Exception {
        RunSheet s = read("file;sample;note\ntraces/a.csv;tap water; 1:10, filtered\n");
        assertTrue(s.clean());
        assertEquals(RunConditions.EMPTY, s.runs().get(0).conditions());
    }

    @Test
    void singleRunWithoutSheet() throws Exception {
        Path a = dir.resolve("traces/a.csv");
        RunSpec r = RunSheetReader.single(a, defaults());
        assertEquals("a", r.name());
        assertEquals(RunSheetReader.COMMAND_LINE, r.origin());
        assertEquals(0, r.originLine());
        assertEquals(defaults(), r.conditions());

        RunConditions bad = new RunConditions(50, 60, 20, NaN, NaN, null, NaN, NaN, null, NaN, NaN, NaN);
        InputException g = assertThrows(InputException.class, () -> RunSheetReader.single(a, bad));
        assertEquals(RunSheetReader.OPTIONS, g.file());
        assertEquals("detector_length_cm", g.field());

        InputException m = assertThrows(InputException.class,
                () -> RunSheetReader.single(dir.resolve("nope.csv"), defaults()));
        assertEquals(dir.resolve("nope.csv").toString(), m.file());
        assertNull(m.field());
    }

    @Test
    void aSheetWithoutItsHeaderRowIsToldSo() throws Exception {
        // the header row left out: the first run's row is not read as column names
        InputException e = assertThrows(InputException.class,
                () -> read("traces/a.csv,64.5,56,-30,1.2,25,borate,120,180,indirect\n"
                        + "traces/b.csv,64.5,56,-30,1.2,25,borate,120,180,indirect\n"));
        assertEquals(1, e.line(), e::getMessage);
        assertTrue(e.problem().startsWith("the first row is not a header"), e.getMessage());
        assertTrue(e.problem().contains("traces/a.csv, 64.5, 56, -30, ..."), e.getMessage());
        // a header of unknown names stays an unknown column, with its suggestion
        InputException typo = assertThrows(InputException.class, () -> read("fiel,temprature_c\ntraces/a.csv,25\n"));
        assertTrue(typo.problem().startsWith("unknown column 'fiel'"), typo.getMessage());
    }

    @Test
    void aLibraryGivenAsTheRunSheetIsToldItMayBeTheWrongFile() throws Exception {
        InputException library = assertThrows(InputException.class,
                () -> read("name,mobility,mobility_sd,n,charge,buffer\nchloride,-79.1,0.3,6,-1,borate\n"));
        assertTrue(library.problem().contains("is it the right file"), library.getMessage());
        // one misspelt column among known ones is a misspelling, not another file
        InputException typo = assertThrows(InputException.class,
                () -> read("file,total_length_cm,detector_length_cm,voltage_kv,temprature_c\ntraces/a.csv,60,50,25,25\n"));
        assertTrue(typo.problem().startsWith("unknown column 'temprature_c'"), typo.getMessage());
        assertTrue(!typo.problem().contains("right file"), typo.getMessage());
    }
}
