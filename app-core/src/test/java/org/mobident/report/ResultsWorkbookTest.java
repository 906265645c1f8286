package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.StringReader;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.dhatim.fastexcel.reader.Cell;
import org.dhatim.fastexcel.reader.CellType;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.dhatim.fastexcel.reader.Sheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.io.SafeFiles;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.RunResult;
import org.mobident.summary.RecurringUnknowns;

/** The workbook read back with an independent reader (fastexcel-reader) and as its sheet XML. */
class ResultsWorkbookTest {

    @TempDir
    Path dir;

    private static Library library() {
        return new Library(List.of(LibraryEntry.of("chloride", -71.6, 0.2), LibraryEntry.of("nitrate", -69.6, 0.25),
                LibraryEntry.of("sulfate", -80.0, 0.3)), "lib.csv", List.of());
    }

    private static List<RunResult> runs() {
        return List.of(ReportFixtures.okRun(), ReportFixtures.failedRun(), ReportFixtures.noMarkerRun());
    }

    private Path write(List<RunResult> runs) throws IOException {
        Path file = dir.resolve("results.xlsx");
        SafeFiles.writeBytes(file, false, out -> ResultsWorkbook.write(runs, library(),
                RecurringUnknowns.of(runs, library()), new ResultsWorkbook.Options("0.1.0", "2026-01-02T03:04:05Z"),
                out));
        return file;
    }

    @Test
    void samplesSheetComesFirstAndSaysWhatWasFoundWhere() throws IOException {
        Path file = write(runs());
        try (ReadableWorkbook wb = new ReadableWorkbook(file.toFile())) {
            List<String> names = wb.getSheets().map(Sheet::getName).toList();
            assertEquals(List.of(ResultsWorkbook.SHEET_SAMPLES, ResultsWorkbook.SHEET_PEAKS,
                    ResultsWorkbook.SHEET_ANALYTES, ResultsWorkbook.SHEET_UNKNOWNS, ResultsWorkbook.SHEET_RUNS,
                    ResultsWorkbook.SHEET_LIBRARY, ResultsWorkbook.SHEET_ABOUT), names);
            List<Row> rows = wb.getFirstSheet().read();
            assertEquals("chloride", rows.get(0).getCellText(4));
            assertEquals("nitrate", rows.get(0).getCellText(8));
            assertEquals("sulfate", rows.get(0).getCellText(12));
            assertEquals("result", rows.get(1).getCellText(4));
            Row spring = rows.get(2);
            assertEquals("spring-01", spring.getCellText(1));
            assertEquals("identified", spring.getCellText(4));
            assertNumber(spring.getCell(5), 0.9731);
            // corrected area of the fixture's chloride peak: 3.2·1.7 / 223.45678
            assertEquals(3.2 * 1.7 / 223.45678, spring.getCell(6).asNumber().doubleValue(), 1e-12);
            assertNumber(spring.getCell(7), -71.52);
            assertEquals("ambiguous", spring.getCellText(8));
            assertEquals("not found", spring.getCellText(12));
            assertTrue(spring.getOptionalCell(13).map(c -> c.getType() == CellType.EMPTY).orElse(true),
                    "no confidence where nothing was called");
            assertEquals("run failed", rows.get(3).getCellText(4));
            assertEquals("no mobility scale", rows.get(4).getCellText(4));
        }
    }

    @Test
    void peakSheetHoldsTheCsvValuesAsNumbers() throws IOException {
        List<RunResult> runs = runs();
        StringWriter csv = new StringWriter();
        PeakTableCsv.write(runs, csv);
        List<CSVRecord> records;
        try (CSVParser p = CSVParser.parse(new StringReader(csv.toString()),
                CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get())) {
            records = p.getRecords();
        }
        Path file = write(runs);
        try (ReadableWorkbook wb = new ReadableWorkbook(file.toFile())) {
            List<Row> rows = wb.findSheet(ResultsWorkbook.SHEET_PEAKS).orElseThrow().read();
            assertEquals(records.size() + 1, rows.size());
            assertEquals("apex time (s)", rows.get(0).getCellText(PeakRows.COLUMNS.indexOf("apex_time_s")));
            int numbers = 0;
            for (int i = 0; i < records.size(); i++) {
                CSVRecord rec = records.get(i);
                Row row = rows.get(i + 1);
                for (int c = 0; c < PeakRows.COLUMNS.size(); c++) {
                    String expected = rec.get(c);
                    Optional<Cell> cell = row.getOptionalCell(c);
                    boolean empty = cell.isEmpty() || cell.get().getType() == CellType.EMPTY;
                    String where = PeakRows.COLUMNS.get(c) + " of row " + (i + 1);
                    if (expected.isEmpty()) {
                        assertTrue(empty, where + " should be empty");
                    } else if (isNumber(expected)) {
                        assertEquals(CellType.NUMBER, cell.orElseThrow().getType(), where + " should be a number");
                        assertEquals(0, new BigDecimal(expected).compareTo(cell.get().asNumber()), where);
                        numbers++;
                    } else {
                        assertEquals(expected, cell.orElseThrow().asString(), where);
                    }
                }
            }
            assertTrue(numbers > 60, "the fixture's peaks give many numeric cells, got " + numbers);
        }
    }

    @Test
    void everySheetHasItsHeaderRowsFrozen() throws IOException {
        Path file = write(runs());
        int sheets = 0;
        try (ZipFile zip = new ZipFile(file.toFile())) {
            Pattern pane = Pattern.compile("<pane [^>]*ySplit=\"(\\d+)\"[^>]*state=\"frozen\"");
            for (ZipEntry e : Collections.list(zip.entries())) {
                if (!e.getName().startsWith("xl/worksheets/sheet")) {
                    continue;
                }
                sheets++;
                String xml;
                try (InputStream in = zip.getInputStream(e)) {
                    xml = new String(in.readAllBytes(), StandardCharsets.UTF_8);
                }
                Matcher m = pane.matcher(xml);
                assertTrue(m.find(), e.getName() + " has no frozen pane");
                int expected = e.getName().endsWith("sheet1.xml") ? 2 : 1;
                assertEquals(expected, Integer.parseInt(m.group(1)), e.getName());
            }
        }
        assertEquals(7, sheets);
    }

    @Test
    void runSheetStatesConditionsAndFailures() throws IOException {
        Path file = write(runs());
        try (ReadableWorkbook wb = new ReadableWorkbook(file.toFile())) {
            List<Row> rows = wb.findSheet(ResultsWorkbook.SHEET_RUNS).orElseThrow().read();
            assertEquals("voltage (kV)", rows.get(0).getCellText(7));
            assertNumber(rows.get(1).getCell(7), -20);
            assertNumber(rows.get(1).getCell(15), -50.0);
            assertEquals("off", rows.get(1).getCellText(16), "the fixture's run has no scale correction");
            assertTrue(rows.get(2).getCellText(27).contains("not a number"), rows.get(2).getCellText(27));
            List<Row> lib = wb.findSheet(ResultsWorkbook.SHEET_LIBRARY).orElseThrow().read();
            assertEquals(4, lib.size());
            assertNumber(lib.get(3).getCell(2), -80.0);
        }
    }

    @Test
    void versionIsCutToWhatTheFormatAllows() {
        assertEquals("0.1", ResultsWorkbook.workbookVersion("0.1.0"));
        assertEquals("12.34", ResultsWorkbook.workbookVersion("v12.34-SNAPSHOT"));
        assertEquals("0.0", ResultsWorkbook.workbookVersion(null));
    }

    @Test
    void writingIntoAStreamLeavesItOpen() throws IOException {
        // SafeFiles closes the stream itself; the writer must not depend on closing it
        OutputStream sink = OutputStream.nullOutputStream();
        ResultsWorkbook.write(List.of(), library(), List.of(), new ResultsWorkbook.Options("0.1.0", "t"), sink);
        assertFalse(Files.exists(dir.resolve("results.xlsx")));
    }

    private static boolean isNumber(String s) {
        return s.matches("-?\\d+(\\.\\d+)?");
    }

    private static void assertNumber(Cell cell, double expected) {
        assertEquals(CellType.NUMBER, cell.getType(), "cell " + cell.getAddress());
        assertEquals(expected, cell.asNumber().doubleValue(), 1e-12, "cell " + cell.getAddress());
    }
}
