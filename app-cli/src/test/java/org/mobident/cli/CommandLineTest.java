package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The commands as a user runs them: exit codes, messages, files written, on the demo data. */
class CommandLineTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

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

    private static List<CSVRecord> csv(Path p) throws IOException {
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(Files.newBufferedReader(p)).getRecords();
    }

    @Test
    void helpAndVersion() {
        Run help = run("--help");
        assertEquals(ExitCodes.OK, help.code());
        for (String cmd : List.of("identify", "report", "plot", "library")) {
            assertTrue(help.out().contains(cmd), () -> "help lists " + cmd + ":\n" + help.out());
        }
        assertTrue(help.out().contains("presumptive"));
        Run version = run("--version");
        assertEquals(ExitCodes.OK, version.code());
        assertTrue(version.out().startsWith("mobident "), version.out());
        for (String[] cmd : List.of(new String[] {"identify"}, new String[] {"report"}, new String[] {"plot"},
                new String[] {"view"}, new String[] {"library", "build"}, new String[] {"library", "add"},
                new String[] {"library", "check"}, new String[] {"predict"}, new String[] {"recheck"},
                new String[] {"simulate"})) {
            String[] args = java.util.Arrays.copyOf(cmd, cmd.length + 1);
            args[cmd.length] = "--help";
            // picocli reports a badly formatted help text (e.g. a lone '%') on System.err
            java.io.PrintStream systemErr = System.err;
            java.io.ByteArrayOutputStream stray = new java.io.ByteArrayOutputStream();
            Run h;
            try {
                System.setErr(new java.io.PrintStream(stray, true, StandardCharsets.UTF_8));
                h = run(args);
            } finally {
                System.setErr(systemErr);
            }
            assertEquals(ExitCodes.OK, h.code(), String.join(" ", cmd));
            String complaints = h.err() + stray.toString(StandardCharsets.UTF_8);
            assertTrue(complaints.isEmpty(), () -> String.join(" ", cmd) + " help complains: " + complaints);
            assertTrue(h.out().contains("Usage: mobident " + String.join(" ", cmd)), h.out());
        }
        Run sub = run("identify", "--help");
        assertEquals(ExitCodes.OK, sub.code());
        assertTrue(sub.out().contains("--marker-window") && sub.out().contains("Exit codes"), sub.out());
    }

    @Test
    void identifiesTheDemoRunsAndWritesTables() throws IOException {
        Path csv = dir.resolve("peaks.csv");
        Path json = dir.resolve("peaks.json");
        Run r = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"),
                "--csv", csv.toString(), "--json", json.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        for (String name : List.of("spring-01", "spring-02", "well-01", "well-02", "well-03", "well-04-cations")) {
            assertTrue(r.out().contains("Run " + name), () -> name + " missing:\n" + r.out());
        }
        assertTrue(r.out().contains("presumptive"));
        List<CSVRecord> rows = csv(csv);
        assertTrue(rows.size() > 30);
        // demo-data/TRUTH.md: well-01 holds chloride, sulfate, nitrite, nitrate, chlorate and unknown-X
        List<String> well01 = new ArrayList<>();
        for (CSVRecord row : rows) {
            if (row.get("run").equals("well-01") && row.get("role").equals("analyte")) {
                well01.add(row.get("assigned").isEmpty() ? "(none)" : row.get("assigned"));
            }
        }
        assertEquals(List.of("chloride", "sulfate", "nitrite", "nitrate", "chlorate", "(none)"), well01);
        // the run sheet's sample text travels with every row of its run
        assertTrue(rows.stream().filter(row -> row.get("run").equals("well-01"))
                .allMatch(row -> row.get("sample").equals("Well W1 (farmyard borehole), diluted 1:5")),
                "sample column");
        assertTrue(r.out().contains("Run well-01 [Well W1 (farmyard borehole), diluted 1:5]"), r.out());
        String text = Files.readString(json);
        assertTrue(text.startsWith("{") && text.contains("\"well-04-cations\""), text.substring(0, 80));
    }

    @Test
    void existingOutputIsNotReplacedWithoutPermission() throws IOException {
        Path csv = dir.resolve("peaks.csv");
        Files.writeString(csv, "keep me");
        Run r = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--csv", csv.toString(),
                "--quiet");
        assertEquals(ExitCodes.CANNOT_WRITE, r.code());
        assertTrue(r.err().contains("--overwrite"), r.err());
        assertEquals("keep me", Files.readString(csv));
        Run again = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--csv",
                csv.toString(), "--quiet", "--overwrite");
        assertEquals(ExitCodes.OK, again.code(), again.err());
        assertTrue(Files.readString(csv).startsWith("run,"));
    }

    @Test
    void wrongCommandLineIsAUsageError() {
        Run r = run("identify", "--library", demo("library.csv"), "--no-such-option");
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("--no-such-option"), r.err());
        Run neither = run("identify", "--library", demo("library.csv"));
        assertEquals(ExitCodes.USAGE, neither.code());
    }

    @Test
    void badLibraryNamesFileLineAndField() throws IOException {
        Path lib = dir.resolve("lib.csv");
        Files.writeString(lib, "name,mobility,mobility_sd\nchloride,-76.2,0.4\nnitrate,-69.8,abc\n");
        Run r = run("identify", "--runs", demo("runs.csv"), "--library", lib.toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code());
        assertTrue(r.err().contains("lib.csv") && r.err().contains("line 3") && r.err().contains("mobility_sd"),
                r.err());
        Run missing = run("identify", "--runs", demo("runs.csv"), "--library", dir.resolve("none.csv").toString());
        assertEquals(ExitCodes.BAD_INPUT, missing.code());
        assertTrue(missing.err().contains("none.csv"), missing.err());
    }

    @Test
    void aBadRowDoesNotStopTheBatch() throws IOException {
        Files.copy(DEMO.resolve("spring-01.csv"), dir.resolve("spring-01.csv"));
        Files.copy(DEMO.resolve("spring-01.csv"), dir.resolve("spring-01b.csv"));
        Files.writeString(dir.resolve("broken.csv"), "time_s,signal\n0,1\n1,2\n1,3\n2,4\n");
        Path sheet = dir.resolve("runs.csv");
        Files.writeString(sheet, "file,total_length_cm,detector_length_cm,voltage_kv,marker_from_s,marker_to_s,detection\n"
                + "spring-01.csv,80,72,-20,450,700,indirect\n"
                + "missing.csv,80,72,-20,450,700,indirect\n"
                + "broken.csv,80,72,-20,450,700,indirect\n"
                + "spring-01b.csv,40,72,-20,450,700,indirect\n");
        Path csv = dir.resolve("out.csv");
        Run r = run("identify", "--runs", sheet.toString(), "--library", demo("library.csv"), "--csv", csv.toString());
        assertEquals(ExitCodes.SOME_RUNS_FAILED, r.code());
        assertTrue(r.err().contains("line 3") && r.err().contains("missing.csv"), r.err());
        assertTrue(r.err().contains("broken.csv") && r.err().contains("line 4"), r.err());
        assertTrue(r.err().contains("detector length"), r.err());
        Map<String, Integer> perRun = new LinkedHashMap<>();
        for (CSVRecord row : csv(csv)) {
            perRun.merge(row.get("run"), 1, Integer::sum);
        }
        assertTrue(perRun.getOrDefault("spring-01", 0) >= 5, perRun.toString());
        assertTrue(perRun.containsKey("broken"), perRun.toString());
    }

    @Test
    void libraryBuiltFromDemoStandardsIdentifiesTheAnionRunsLikeTheShippedOne() throws IOException {
        Path lib = dir.resolve("built.csv");
        Run build = run("library", "build", "--runs", demo("standards/standards-runs.csv"),
                "--mixes", demo("standards/mixes.csv"), "--out", lib.toString(), "--ph", "8.0",
                "--ionic-strength-mm", "12");
        assertEquals(ExitCodes.OK, build.code(), build.out() + build.err());
        String built = Files.readString(lib);
        assertTrue(built.contains("sha256"));
        // conditions recorded per entry: buffer label from the run sheet, pH and ionic strength as given
        assertTrue(built.contains(",CHR-8,8,12,25,") || built.contains(",CHR-8,8.0,12.0,25"), built);

        Path withBuilt = dir.resolve("a.csv");
        Path withShipped = dir.resolve("b.csv");
        // the built library holds the CHR-8 anions only: the cation run (buffer IMZ-4.5) is refused, the others go on
        Run withBuiltRun = run("identify", "--runs", demo("runs.csv"), "--library", lib.toString(),
                "--csv", withBuilt.toString(), "--quiet");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, withBuiltRun.code(), withBuiltRun.err());
        assertTrue(withBuiltRun.err().contains("buffer 'IMZ-4.5' has no entries"), withBuiltRun.err());
        assertEquals(ExitCodes.OK, run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"),
                "--csv", withShipped.toString(), "--quiet").code());
        Map<String, String> a = new LinkedHashMap<>();
        for (CSVRecord row : csv(withBuilt)) {
            a.put(row.get("run") + "#" + row.get("peak"), row.get("assigned"));
        }
        int compared = 0;
        for (CSVRecord row : csv(withShipped)) {
            if (row.get("run").contains("cations") || !row.get("role").equals("analyte")) {
                continue; // the demo standards hold anions only
            }
            assertEquals(row.get("assigned"), a.get(row.get("run") + "#" + row.get("peak")), row.toString());
            compared++;
        }
        assertTrue(compared >= 25, "compared " + compared);

        Run refused = run("library", "build", "--runs", demo("standards/standards-runs.csv"),
                "--mixes", demo("standards/mixes.csv"), "--out", lib.toString());
        assertEquals(ExitCodes.CANNOT_WRITE, refused.code());
        String before = Files.readString(lib);
        Run replaced = run("library", "build", "--runs", demo("standards/standards-runs.csv"),
                "--mixes", demo("standards/mixes.csv"), "--out", lib.toString(), "--overwrite");
        assertEquals(ExitCodes.OK, replaced.code());
        assertEquals(before, Files.readString(dir.resolve("built.csv.prev")));

        Run check = run("library", "check", lib.toString());
        assertTrue(check.out().contains("chloride"), check.out());
    }

    @Test
    void standardsWithoutMarkerWindowsBuildTheSameLibrary() throws IOException {
        // the same standards run sheet with its marker windows blanked: the marker must then be found
        // from the standards sheet's approximate mobilities
        Path std = DEMO.resolve("standards");
        for (String f : List.of("std-mixA-1", "std-mixA-2", "std-mixA-3", "std-mixA-4", "std-mixB-1", "std-mixB-2",
                "std-mixB-3", "std-mixB-4")) {
            Files.copy(std.resolve(f + ".csv"), dir.resolve(f + ".csv"));
        }
        List<String> lines = Files.readAllLines(std.resolve("standards-runs.csv"));
        StringBuilder blanked = new StringBuilder(lines.get(0)).append('\n');
        for (String line : lines.subList(1, lines.size())) {
            blanked.append(line.replace(",450,700,", ",,,")).append('\n');
        }
        Path sheet = dir.resolve("standards-runs.csv");
        Files.writeString(sheet, blanked.toString());
        assertFalse(Files.readString(sheet).contains(",450,700,"));
        Path windowed = dir.resolve("windowed.csv");
        Path guessed = dir.resolve("guessed.csv");
        assertEquals(ExitCodes.OK, run("library", "build", "--runs", demo("standards/standards-runs.csv"),
                "--mixes", demo("standards/mixes.csv"), "--out", windowed.toString()).code());
        Run r = run("library", "build", "--runs", sheet.toString(), "--mixes", demo("standards/mixes.csv"),
                "--out", guessed.toString());
        assertEquals(ExitCodes.OK, r.code(), r.out() + r.err());
        Map<String, Double> a = means(windowed);
        Map<String, Double> b = means(guessed);
        assertEquals(a.keySet(), b.keySet());
        for (String name : a.keySet()) {
            assertEquals(a.get(name), b.get(name), 1e-6, name);
        }
    }

    private static Map<String, Double> means(Path library) throws IOException {
        Map<String, Double> out = new LinkedHashMap<>();
        for (CSVRecord row : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setCommentMarker('#')
                .get().parse(Files.newBufferedReader(library)).getRecords()) {
            out.put(row.get("name"), Double.parseDouble(row.get("mobility")));
        }
        return out;
    }

    @Test
    void reportAndPlotAreWritten() throws IOException {
        Path html = dir.resolve("r.html");
        Run r = run("report", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--out", html.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        String page = Files.readString(html, StandardCharsets.UTF_8);
        assertTrue(page.contains("well-04-cations") && page.contains("presumptive"));
        Path png = dir.resolve("p.png");
        Run p = run("plot", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--out", png.toString());
        assertEquals(ExitCodes.OK, p.code(), p.err());
        byte[] head = Files.readAllBytes(png);
        assertEquals((byte) 0x89, head[0]);
        assertEquals('P', head[1]);
    }
}
