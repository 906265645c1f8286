package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the tool writes is safe to open: spreadsheet cells cannot start a formula, HTML shows user
 * text as text, and a write that fails leaves neither a half-written file nor a temporary one.
 */
class OutputSafetyTest {

    private static final Path DEMO = Path.of("..", "demo-data");
    private static final String SHEET_HEADER =
            "file,total_length_cm,detector_length_cm,voltage_kv,marker_from_s,marker_to_s,detection,buffer,sample\n";
    /** Conditions of demo-data/spring-01.csv (demo-data/runs.csv). */
    private static final String SPRING_CONDITIONS = ",80,72,-20,450,700,indirect";

    @TempDir
    Path dir;

    private static BadInputCatalogueTest.Run run(String... args) {
        return BadInputCatalogueTest.run(args);
    }

    private Path copyDemoTrace(String name) throws IOException {
        return Files.copy(DEMO.resolve("spring-01.csv"), dir.resolve(name));
    }

    private static List<CSVRecord> csv(Path p) throws IOException {
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(p, StandardCharsets.UTF_8))).getRecords();
    }

    /** Hidden temporary files SafeFiles leaves behind if a write is interrupted. */
    private List<String> leftovers() throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".tmp") || n.startsWith("."))
                    .collect(Collectors.toList());
        }
    }

    @Test
    void runAndAnalyteNamesThatLookLikeFormulasAreInertInTheCsv() throws IOException {
        copyDemoTrace("=cmd.csv");
        // the demo library with chloride and sulfate renamed (demo-data/TRUTH.md: spring-01 holds both)
        String lib = Files.readString(DEMO.resolve("library.csv"), StandardCharsets.UTF_8)
                .replaceFirst("\nchloride,", "\n+SUM(A1),").replaceFirst("\nsulfate,", "\n@evil,");
        Path library = Files.writeString(dir.resolve("lib.csv"), lib);
        Path sheet = Files.writeString(dir.resolve("runs.csv"), SHEET_HEADER + "=cmd.csv" + SPRING_CONDITIONS
                + ",CHR-8,plain\n");
        Path out = dir.resolve("peaks.csv");
        BadInputCatalogueTest.Run r = run("identify", "--runs", sheet.toString(), "--library", library.toString(),
                "--csv", out.toString(), "--quiet");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        List<String> assigned = new ArrayList<>();
        for (CSVRecord row : csv(out)) {
            assertEquals("'=cmd", row.get("run"), "the run name is made inert with a leading apostrophe");
            assigned.add(row.get("assigned"));
            for (String cell : row.values()) {
                assertFalse(!cell.isEmpty() && "=+@".indexOf(cell.charAt(0)) >= 0,
                        () -> "a cell starts a formula: " + cell);
            }
        }
        assertTrue(assigned.contains("'+SUM(A1)") && assigned.contains("'@evil"), assigned::toString);
        // the raw text shows the same: no line and no cell starts with a formula character
        String text = Files.readString(out);
        assertFalse(text.contains(",=") || text.contains(",+") || text.contains(",@") || text.contains("\n="), text);
    }

    @Test
    void theHtmlReportEscapesRunNamesAndLibraryText() throws IOException {
        copyDemoTrace("<b>bold<script>x.csv");
        String lib = Files.readString(DEMO.resolve("library.csv"), StandardCharsets.UTF_8)
                .replaceFirst("\nchloride,", "\n<img src=x onerror=alert(1)>,").replace(",CHR-8,", ",<i>buffer</i>,");
        Path library = Files.writeString(dir.resolve("lib.csv"), lib);
        Path sheet = Files.writeString(dir.resolve("runs.csv"), SHEET_HEADER
                + "\"<b>bold<script>x.csv\"" + SPRING_CONDITIONS + ",<i>buffer</i>,\"<script>alert(2)</script>\"\n");
        Path html = dir.resolve("r.html");
        BadInputCatalogueTest.Run r = run("report", "--runs", sheet.toString(), "--library", library.toString(),
                "--out", html.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        String page = Files.readString(html, StandardCharsets.UTF_8);
        assertTrue(page.contains("&lt;b&gt;bold&lt;script&gt;x"), "the run name is shown, escaped");
        assertTrue(page.contains("&lt;img src=x onerror=alert(1)&gt;"), "the analyte name is shown, escaped");
        assertFalse(page.contains("<script"), "no script element from user text");
        assertFalse(page.contains("<b>bold") || page.contains("<img") || page.contains("<i>buffer"),
                "no markup from user text");
    }

    @Test
    void aFailedMoveLeavesNoHalfWrittenOrTemporaryFile() throws IOException {
        // a folder stands where the JSON should go: the CSV is written, the JSON's final move fails
        Path taken = Files.createDirectories(dir.resolve("peaks.json"));
        Files.writeString(taken.resolve("keep.txt"), "keep");
        Path csv = dir.resolve("peaks.csv");
        BadInputCatalogueTest.Run r = run("identify", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--csv", csv.toString(), "--json", taken.toString(),
                "--overwrite", "--quiet");
        assertEquals(ExitCodes.CANNOT_WRITE, r.code(), r.err());
        BadInputCatalogueTest.assertMessage(r, "cannot write output", "peaks.json");
        assertEquals(List.of(), leftovers(), "no temporary file is left");
        assertTrue(Files.isDirectory(taken) && Files.readString(taken.resolve("keep.txt")).equals("keep"));
        assertTrue(Files.readString(csv).endsWith("\n") && csv(csv).size() > 30, "the CSV written before is complete");

        // a library is never replaced by a folder's 'previous version' either
        Path libTarget = Files.createDirectories(dir.resolve("built.csv"));
        BadInputCatalogueTest.Run build = run("library", "build", "--runs",
                DEMO.resolve("standards/standards-runs.csv").toString(), "--mixes",
                DEMO.resolve("standards/mixes.csv").toString(), "--out", libTarget.toString(), "--overwrite");
        assertEquals(ExitCodes.CANNOT_WRITE, build.code(), build.err());
        assertEquals(List.of(), leftovers(), "no temporary file is left");
        assertFalse(Files.exists(dir.resolve("built.csv.prev")), "no .prev copy of the folder");
    }

    @Test
    void aReadOnlyFolderIsReportedWithExitCode4() throws IOException {
        Path folder = Files.createDirectories(dir.resolve("locked"));
        assertTrue(folder.toFile().setWritable(false, false));
        try {
            assumeFalse(Files.isWritable(folder), "the file system lets this user write anyway (e.g. root)");
            BadInputCatalogueTest.Run r = run("identify", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
                    DEMO.resolve("library.csv").toString(), "--csv", folder.resolve("peaks.csv").toString(), "--quiet");
            assertEquals(ExitCodes.CANNOT_WRITE, r.code(), r.err());
            BadInputCatalogueTest.assertMessage(r, "cannot write output", "peaks.csv");
            try (Stream<Path> s = Files.list(folder)) {
                assertEquals(0, s.count(), "nothing is left in the folder");
            }
        } finally {
            folder.toFile().setWritable(true, false);
        }
    }
}
