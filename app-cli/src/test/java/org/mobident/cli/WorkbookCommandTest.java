package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.dhatim.fastexcel.reader.CellType;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code identify --xlsx} and {@code report --xlsx} on the demo batch, read back with an independent reader. */
class WorkbookCommandTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

    @Test
    void demoBatchWorkbookOpensWithTheSamplesAndCarriesTheCsvMobilities() throws IOException {
        Path csv = dir.resolve("peaks.csv");
        Path xlsx = dir.resolve("results.xlsx");
        BadInputCatalogueTest.Run r = BadInputCatalogueTest.run("identify", "--runs", DEMO.resolve("runs.csv").toString(),
                "--library", DEMO.resolve("library.csv").toString(), "--csv", csv.toString(), "--xlsx",
                xlsx.toString(), "--quiet");
        assertTrue(r.code() == ExitCodes.OK || r.code() == ExitCodes.SOME_RUNS_FAILED, r.err());
        List<CSVRecord> records = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(csv, StandardCharsets.UTF_8))).getRecords();
        try (ReadableWorkbook wb = new ReadableWorkbook(xlsx.toFile())) {
            assertEquals("Samples", wb.getFirstSheet().getName());
            List<Row> samples = wb.getFirstSheet().read();
            long runs = records.stream().map(rec -> rec.get("run")).distinct().count();
            assertEquals(runs + 2, samples.size(), "two header rows and one row per run");
            List<Row> peaks = wb.findSheet("Peaks").orElseThrow().read();
            assertEquals(records.size() + 1, peaks.size());
            int mobilityColumn = records.get(0).getParser().getHeaderNames().indexOf("mobility_corrected");
            int compared = 0;
            for (int i = 0; i < records.size(); i++) {
                String expected = records.get(i).get("mobility_corrected");
                if (expected.isEmpty()) {
                    continue;
                }
                var cell = peaks.get(i + 1).getCell(mobilityColumn);
                assertEquals(CellType.NUMBER, cell.getType());
                assertEquals(0, new BigDecimal(expected).compareTo(cell.asNumber()), "row " + (i + 1));
                compared++;
            }
            assertTrue(compared > 20, "the demo batch has many peaks with a mobility, got " + compared);
        }
    }

    @Test
    void anExistingWorkbookIsKeptUnlessOverwriteIsGiven() throws IOException {
        Path xlsx = Files.writeString(dir.resolve("results.xlsx"), "keep");
        BadInputCatalogueTest.Run r = BadInputCatalogueTest.run("identify", "--runs",
                DEMO.resolve("runs.csv").toString(), "--library", DEMO.resolve("library.csv").toString(), "--xlsx",
                xlsx.toString(), "--quiet");
        assertEquals(ExitCodes.CANNOT_WRITE, r.code(), r.err());
        assertTrue(r.err().contains("--overwrite"), r.err());
        assertArrayEquals("keep".getBytes(StandardCharsets.UTF_8), Files.readAllBytes(xlsx));

        Path html = dir.resolve("report.html");
        BadInputCatalogueTest.Run report = BadInputCatalogueTest.run("report", "--runs",
                DEMO.resolve("runs.csv").toString(), "--library", DEMO.resolve("library.csv").toString(), "--out",
                html.toString(), "--xlsx", xlsx.toString(), "--overwrite");
        assertTrue(report.code() == ExitCodes.OK || report.code() == ExitCodes.SOME_RUNS_FAILED, report.err());
        try (ReadableWorkbook wb = new ReadableWorkbook(xlsx.toFile())) {
            assertEquals(7, wb.getSheets().count());
        }
    }
}
