package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.zip.CRC32;
import java.util.zip.Deflater;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The catalogue of bad inputs, each run through the real command line: the exit code, a message
 * naming the file, the line and the field, never a Java stack trace, and in a batch the other runs
 * still processed and written.
 *
 * <p>Messages have the form {@code mobident: run NAME not processed: FILE, line N, field 'F': problem}
 * for a run of a batch, and {@code mobident: FILE, line N, field 'F': problem} for an input the whole
 * command depends on (library, run sheet). The demo trace {@code spring-01.csv} (80/72 cm, −20 kV,
 * neutral marker at 576 s, indirect detection; demo-data/TRUTH.md) is the valid run beside the bad one.
 */
class BadInputCatalogueTest {

    private static final Path DEMO = Path.of("..", "demo-data");
    private static final String SHEET_HEADER =
            "file,total_length_cm,detector_length_cm,voltage_kv,marker_from_s,marker_to_s,detection\n";
    /** Conditions of the demo spring runs (demo-data/runs.csv). */
    private static final String SPRING_CONDITIONS = ",80,72,-20,450,700,indirect\n";
    private static final String GOOD_ROW = "good.csv" + SPRING_CONDITIONS;
    private static final String TRACE_HEADER = "time_s,signal\n";

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    /** A batch result: the command's run and the statuses of each run in the --csv table. */
    record Batch(Run run, Map<String, List<String>> statusByRun, Map<String, String> noteByRun) {
    }

    /** Runs the command line; fails when a stack trace is shown and {@code --debug} was not given. */
    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        Run r = new Run(code, out.toString(), err.toString());
        if (!Arrays.asList(args).contains("--debug")) {
            assertNoStackTrace(r);
        }
        return r;
    }

    static void assertNoStackTrace(Run r) {
        for (String text : List.of(r.out(), r.err())) {
            assertFalse(text.contains("\tat ") || text.contains("Exception in thread"),
                    () -> "stack trace shown to the user:\n" + r.err());
        }
    }

    /** Asserts that stderr holds every piece, in one line. */
    static void assertMessage(Run r, String... pieces) {
        for (String line : r.err().split("\n")) {
            boolean all = true;
            for (String p : pieces) {
                all &= line.contains(p);
            }
            if (all) {
                return;
            }
        }
        throw new AssertionError("no message line holds all of " + Arrays.toString(pieces) + ":\n" + r.err());
    }

    private Path write(String name, String text) throws IOException {
        return write(name, text.getBytes(StandardCharsets.UTF_8));
    }

    private Path write(String name, byte[] bytes) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, bytes);
        return p;
    }

    private static byte[] demoTrace() throws IOException {
        return Files.readAllBytes(DEMO.resolve("spring-01.csv"));
    }

    private static String demo(String file) {
        return DEMO.resolve(file).toString();
    }

    /**
     * Identifies a run sheet holding the demo trace ({@code good.csv}, line 2) and {@code rows}, with
     * the demo library, and reads back the --csv table.
     */
    private Batch batch(String... rows) throws IOException {
        write("good.csv", demoTrace());
        Path sheet = write("runs.csv", SHEET_HEADER + GOOD_ROW + String.join("", rows));
        Path csv = dir.resolve("out.csv");
        Files.deleteIfExists(csv);
        Run r = run("identify", "--runs", sheet.toString(), "--library", demo("library.csv"),
                "--csv", csv.toString(), "--quiet");
        Map<String, List<String>> status = new LinkedHashMap<>();
        Map<String, String> note = new LinkedHashMap<>();
        if (Files.exists(csv)) {
            for (CSVRecord row : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                    .parse(new StringReader(Files.readString(csv))).getRecords()) {
                status.computeIfAbsent(row.get("run"), k -> new ArrayList<>()).add(row.get("status"));
                note.putIfAbsent(row.get("run"), row.get("note"));
            }
        }
        return new Batch(r, status, note);
    }

    /** One bad trace beside the good one: exit 1, the good run written and identified, the bad one failed. */
    private Batch badTrace(String name, byte[] content) throws IOException {
        write(name, content);
        Batch b = batch(name + SPRING_CONDITIONS);
        assertEquals(ExitCodes.SOME_RUNS_FAILED, b.run().code(), b.run().err());
        assertOtherRunWritten(b);
        String run = name.substring(0, name.lastIndexOf('.'));
        assertEquals(List.of("failed"), b.statusByRun().get(run), b.statusByRun()::toString);
        assertMessage(b.run(), "run " + run + " not processed", name);
        return b;
    }

    private Batch badTrace(String name, String content) throws IOException {
        return badTrace(name, content.getBytes(StandardCharsets.UTF_8));
    }

    private static void assertOtherRunWritten(Batch b) {
        List<String> good = b.statusByRun().get("good");
        assertTrue(good != null && good.contains("identified") && good.contains("marker"),
                () -> "the valid run must still be processed and written: " + b.statusByRun() + "\n" + b.run().err());
    }

    /** Runs 'library check' and 'identify' on a library file; both must refuse it with exit 3. */
    private Run badLibrary(Path lib, String... pieces) {
        Run check = run("library", "check", lib.toString());
        assertEquals(ExitCodes.BAD_INPUT, check.code(), check.err());
        assertMessage(check, pieces);
        Run identify = run("identify", "--runs", demo("runs.csv"), "--library", lib.toString(), "--quiet");
        assertEquals(ExitCodes.BAD_INPUT, identify.code(), identify.err());
        assertMessage(identify, pieces);
        return identify;
    }

    /** Runs identify on a run sheet that cannot be used at all: exit 3. */
    private Run badSheet(Path sheet, String... pieces) throws IOException {
        write("good.csv", demoTrace());
        Run r = run("identify", "--runs", sheet.toString(), "--library", demo("library.csv"), "--quiet");
        assertEquals(ExitCodes.BAD_INPUT, r.code(), r.err());
        assertMessage(r, pieces);
        return r;
    }

    // ---- the catalogue ----

    @Test
    void emptyFile() throws IOException {
        badTrace("empty.csv", "");
        assertMessage(batch("empty.csv" + SPRING_CONDITIONS).run(), "empty.csv", "the file is empty");
        badSheet(write("sheet.csv", ""), "sheet.csv", "the run sheet is empty");
        badLibrary(write("lib.csv", ""), "lib.csv", "the library file is empty");
    }

    @Test
    void headerOnly() throws IOException {
        Batch b = badTrace("header.csv", "# exported 2024-05-02\n" + TRACE_HEADER);
        assertMessage(b.run(), "header.csv", "has a header but no data rows");
        badSheet(write("sheet.csv", SHEET_HEADER), "sheet.csv", "has a header but no runs");
        badLibrary(write("lib.csv", "name,mobility,mobility_sd\n"), "lib.csv", "has a header but no analytes");
    }

    @Test
    void missingOrUnknownColumns() throws IOException {
        Batch noTime = badTrace("notime.csv", "minute_count,signal\n0,1\n1,2\n");
        assertMessage(noTime.run(), "notime.csv, line 1, field 'time'", "no time column");
        Batch noSignal = badTrace("nosignal.csv", "time_s\n0\n1\n");
        assertMessage(noSignal.run(), "nosignal.csv, line 1", "single column");
        badSheet(write("sheet.csv", SHEET_HEADER.replace("\n", ",colour\n") + "good.csv,80,72,-20,450,700,indirect,red\n"),
                "sheet.csv, line 1, field 'colour'", "unknown column 'colour'", "known columns");
        badSheet(write("sheet2.csv", "trace,voltage_kv\ngood.csv,-20\n"), "sheet2.csv, line 1, field 'trace'",
                "unknown column");
        badLibrary(write("lib.csv", "name,mobility_sd\nchloride,0.4\n"), "lib.csv, line 1, field 'mobility'",
                "required column 'mobility' is missing");
        badLibrary(write("lib2.csv", "name,mobility,spread\nchloride,-76.2,0.4\n"), "lib2.csv, line 1, field 'spread'",
                "unknown column");
    }

    @Test
    void textInANumberField() throws IOException {
        Batch b = badTrace("text.csv", TRACE_HEADER + "0,1\n0.5,abc\n1,2\n");
        assertMessage(b.run(), "text.csv, line 3, field 'signal'", "'abc' is not a number");
        assertTrue(b.noteByRun().get("text").contains("line 3"), "the reason is in the table too");
        Batch sheet = batch("good2.csv,eighty,72,-20,450,700,indirect\n");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, sheet.run().code());
        assertOtherRunWritten(sheet);
        assertMessage(sheet.run(), "runs.csv, line 3, field 'total_length_cm'", "'eighty' is not a number");
    }

    @Test
    void nanAndInfinity() throws IOException {
        Batch b = badTrace("nan.csv", TRACE_HEADER + "0,1\nNaN,2\n1,2\n");
        assertMessage(b.run(), "nan.csv, line 3, field 'time_s'", "'NaN' is not allowed", "finite");
        Batch inf = badTrace("inf.csv", TRACE_HEADER + "0,1\n0.5,2\n1,-Infinity\n");
        assertMessage(inf.run(), "inf.csv, line 4, field 'signal'", "'-Infinity' is not allowed");
        Batch sheet = batch("g2.csv,80,72,NaN,450,700,indirect\n");
        assertMessage(sheet.run(), "runs.csv, line 3, field 'voltage_kv'", "not a number");
        badLibrary(write("lib.csv", "name,mobility\nchloride,NaN\n"), "lib.csv, line 2, field 'mobility'",
                "expected a number, got 'NaN'");
    }

    @Test
    void duplicatedOrDescendingTimes() throws IOException {
        Batch dup = badTrace("dup.csv", TRACE_HEADER + "0,1\n0.5,2\n0.5,3\n1,2\n");
        assertMessage(dup.run(), "dup.csv, line 4, field 'time_s'", "time 0.5 repeats the previous time 0.5 (line 3)");
        Batch desc = badTrace("desc.csv", TRACE_HEADER + "0,1\n0.5,2\n0.4,3\n1,2\n");
        assertMessage(desc.run(), "desc.csv, line 4, field 'time_s'", "is before the previous time",
                "must strictly increase");
    }

    @Test
    void aSinglePoint() throws IOException {
        Batch b = badTrace("single.csv", TRACE_HEADER + "0,1\n");
        assertMessage(b.run(), "single.csv, line 2", "a single data point", "at least two");
    }

    @Test
    void mixedDelimiters() throws IOException {
        Batch b = badTrace("mixed.csv", TRACE_HEADER + "0,1\n0.5;2\n1,2\n");
        assertMessage(b.run(), "mixed.csv, line 3, field 'signal'", "semicolon", "mixed delimiters");
    }

    @Test
    void decimalCommaInACommaDelimitedFile() throws IOException {
        // the row splits into three fields, so no single field is to blame: the line is named
        Batch b = badTrace("comma.csv", TRACE_HEADER + "0,1\n0,5,2\n1,2\n");
        assertMessage(b.run(), "comma.csv, line 3", "decimal comma in a comma-delimited file");
        write("g3.csv", demoTrace());
        Batch sheet = batch("g3.csv,80,72,\"-20,5\",450,700,indirect\n");
        assertMessage(sheet.run(), "runs.csv, line 3, field 'voltage_kv'", "'-20,5' is not a number",
                "decimal comma needs a semicolon-delimited sheet");
        assertOtherRunWritten(sheet);
        // the semicolon-delimited demo trace with decimal commas is fine (demo-data/well-03.csv)
        write("g4.csv", Files.readAllBytes(DEMO.resolve("well-03.csv")));
        Batch ok = batch("g4.csv" + SPRING_CONDITIONS);
        assertTrue(ok.statusByRun().get("g4").contains("identified"), ok.statusByRun()::toString);
    }

    @Test
    void utf16AndLatin1Encodings() throws IOException {
        String text = new String(demoTrace(), StandardCharsets.UTF_8);
        // UTF-16 ("Unicode" text), with a byte order mark or without: the same peaks as the UTF-8 original
        write("utf16.csv", text.getBytes(StandardCharsets.UTF_16));
        write("utf16le.csv", text.getBytes(StandardCharsets.UTF_16LE));
        Batch wide = batch("utf16.csv" + SPRING_CONDITIONS, "utf16le.csv" + SPRING_CONDITIONS);
        assertEquals(ExitCodes.OK, wide.run().code(), wide.run().err());
        assertEquals(wide.statusByRun().get("good"), wide.statusByRun().get("utf16"));
        assertEquals(wide.statusByRun().get("good"), wide.statusByRun().get("utf16le"));

        // Latin-1: only the header and comments hold text, so the trace reads correctly
        String latin = "# Kapillare 80 cm, 25 \u00b0C\ntime (s),signal (\u00b5AU)\n" + text.substring(text.indexOf('\n') + 1);
        write("latin.csv", latin.getBytes(StandardCharsets.ISO_8859_1));
        Batch b = batch("latin.csv" + SPRING_CONDITIONS);
        assertEquals(ExitCodes.OK, b.run().code(), b.run().err());
        assertEquals(b.statusByRun().get("good"), b.statusByRun().get("latin"), "same peaks as the UTF-8 original");

        // a library must be UTF-8: a Latin-1 one is refused, not misread
        Path lib = write("lib.csv", "name,mobility,source\nchlorid,-76.2,Hersteller \u00e4\n"
                .getBytes(Charset.forName("ISO-8859-1")));
        badLibrary(lib, "lib.csv", "not valid UTF-8");
    }

    @Test
    void aTruncatedLastLine() throws IOException {
        byte[] full = demoTrace();
        String text = new String(full, StandardCharsets.UTF_8);
        int cut = text.lastIndexOf(',');  // the last line "720,1.003226" loses its signal
        long lastLine = text.lines().count();
        Batch b = badTrace("cut.csv", Arrays.copyOf(full, cut));
        assertMessage(b.run(), "cut.csv, line " + lastLine + ", field 'signal'", "the file looks truncated");
    }

    @Test
    void hugeValues() throws IOException {
        // 1e309 is 1e308 × 10: beyond the largest double
        Batch b = badTrace("huge.csv", TRACE_HEADER + "0,1\n0.5,1e309\n1,2\n");
        assertMessage(b.run(), "huge.csv, line 3, field 'signal'", "'1e309' is too large", "overflows");
        write("g2.csv", demoTrace());
        Batch sheet = batch("g2.csv,80,72,-1e309,450,700,indirect\n");
        assertMessage(sheet.run(), "runs.csv, line 3, field 'voltage_kv'", "too large a number");
        assertOtherRunWritten(sheet);
        // each value finite, but 100·Ld·Lt/V overflows: every mobility would be infinite
        Batch overflow = batch("g2.csv,1e308,1e307,-20,450,700,indirect\n");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, overflow.run().code(), overflow.run().err());
        assertMessage(overflow.run(), "runs.csv, line 3, field 'total_length_cm'", "out of range");
        assertOtherRunWritten(overflow);
        Run options = run("identify", "--library", demo("library.csv"), "--total-length-cm", "80",
                "--detector-length-cm", "72", "--voltage-kv", "1e-307", "--quiet", dir.resolve("g2.csv").toString());
        assertEquals(ExitCodes.SOME_RUNS_FAILED, options.code(), options.err());
        assertMessage(options, "options, field 'voltage_kv'", "out of range");
        badLibrary(write("lib.csv", "name,mobility\nchloride,-1e400\n"), "lib.csv, line 2, field 'mobility'",
                "out of range");
    }

    @Test
    void aFileThatIsNotTextAtAll() throws IOException {
        byte[] noise = new byte[4096];
        new Random(5L).nextBytes(noise);
        Batch random = badTrace("noise.csv", noise);
        assertMessage(random.run(), "noise.csv", "not a text file");
        Batch png = badTrace("picture.png", tinyPng());
        assertMessage(png.run(), "picture.png", "not a text file");
        badSheet(write("sheet.csv", tinyPng()), "sheet.csv", "not a text file");
        badLibrary(write("lib.csv", noise), "lib.csv", "not valid UTF-8");
    }

    @Test
    void aRunSheetNamingAMissingFile() throws IOException {
        Batch b = batch("missing.csv" + SPRING_CONDITIONS);
        assertEquals(ExitCodes.SOME_RUNS_FAILED, b.run().code(), b.run().err());
        assertMessage(b.run(), "runs.csv, line 3, field 'file'", "trace file not found", "missing.csv");
        assertOtherRunWritten(b);
        assertEquals(List.of("failed"), b.statusByRun().get("sheet line 3"), b.statusByRun()::toString);
    }

    @Test
    void impossibleGeometry() throws IOException {
        for (String n : List.of("g2", "g3", "g4", "g5")) {
            write(n + ".csv", demoTrace());
        }
        Batch b = batch("g2.csv,80,80,-20,450,700,indirect\n", "g3.csv,80,72,0,450,700,indirect\n",
                "g4.csv,-80,72,-20,450,700,indirect\n", "g5.csv,80,-72,-20,450,700,indirect\n");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, b.run().code());
        assertOtherRunWritten(b);
        assertMessage(b.run(), "runs.csv, line 3, field 'detector_length_cm'", "must be shorter than total length");
        assertMessage(b.run(), "runs.csv, line 4, field 'voltage_kv'", "non-zero");
        assertMessage(b.run(), "runs.csv, line 5, field 'total_length_cm'", "positive");
        assertMessage(b.run(), "runs.csv, line 6, field 'detector_length_cm'", "positive");
        Run options = run("identify", "--library", demo("library.csv"), "--total-length-cm", "80",
                "--detector-length-cm", "90", "--voltage-kv", "-20", dir.resolve("g2.csv").toString());
        assertEquals(ExitCodes.BAD_INPUT, options.code(), options.err());
        assertMessage(options, "command line", "detector length (90.0 cm) must be shorter than total length");
    }

    @Test
    void aMarkerWindowOutsideTheRun() throws IOException {
        write("late.csv", demoTrace());
        Batch b = batch("late.csv,80,72,-20,5000,6000,indirect\n");
        assertEquals(ExitCodes.SOME_RUNS_FAILED, b.run().code());
        assertMessage(b.run(), "run late not processed", "runs.csv, line 3, field 'marker_from_s'",
                "marker window 5000.0–6000.0 s lies outside the run (0.0–720.0 s)");
        assertOtherRunWritten(b);
        assertEquals(List.of("failed"), b.statusByRun().get("late"));
    }

    @Test
    void noMarkerPeakInTheWindow() throws IOException {
        write("nomarker.csv", demoTrace());
        // demo-data/TRUTH.md: the first zone of spring-01 (chloride) arrives at 228.3 s, so 100–150 s holds none;
        // the marker is then the peak under which the library explains the run (576.0 s), and the run says so
        Batch b = batch("nomarker.csv,80,72,-20,100,150,indirect\n");
        assertEquals(ExitCodes.OK, b.run().code(), b.run().err());
        assertOtherRunWritten(b);
        List<String> statuses = b.statusByRun().get("nomarker");
        assertEquals(List.of("identified", "identified", "identified", "identified", "marker"), statuses);
    }

    @Test
    void aLibraryWithDuplicateNamesMissingMobilityOrANonNumericSpread() throws IOException {
        badLibrary(write("dup.csv", "name,mobility,mobility_sd\nchloride,-76.2,0.4\nnitrate,-69.8,0.3\n"
                + "chloride,-70,0.2\n"), "dup.csv, line 4, field 'name'", "duplicate analyte name 'chloride' (lines 2 and 4)");
        badLibrary(write("nomob.csv", "name,mobility,mobility_sd\nchloride,-76.2,0.4\nnitrate,,0.3\n"),
                "nomob.csv, line 3, field 'mobility'", "the mobility of 'nitrate' is missing");
        badLibrary(write("spread.csv", "name,mobility,mobility_sd\nchloride,-76.2,0.4\nnitrate,-69.8,wide\n"),
                "spread.csv, line 3, field 'mobility_sd'", "expected a number, got 'wide'");
    }

    @Test
    void debugShowsTheStackTraceOnlyWhenAsked() throws IOException {
        // no internal error is reachable from user input that we know of; a refused output file
        // (a folder where the CSV should go) is the error whose trace --debug must show
        Path folder = Files.createDirectories(dir.resolve("taken.csv"));
        Files.writeString(folder.resolve("keep.txt"), "x");
        String[] identify = {"identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"), "--quiet",
            "--overwrite", "--csv", folder.toString()};
        Run plain = run(identify);
        assertEquals(ExitCodes.CANNOT_WRITE, plain.code(), plain.err());
        assertMessage(plain, "cannot write output", "taken.csv");
        Run debug = run(concat(identify, "--debug"));
        assertEquals(ExitCodes.CANNOT_WRITE, debug.code());
        assertTrue(debug.err().contains("\tat org.mobident."), () -> "--debug shows the trace:\n" + debug.err());

        // also for a command two levels down
        String[] build = {"library", "build", "--runs", demo("standards/standards-runs.csv"), "--mixes",
            demo("standards/mixes.csv"), "--out", folder.toString(), "--overwrite"};
        Run buildPlain = run(build);
        assertEquals(ExitCodes.CANNOT_WRITE, buildPlain.code(), buildPlain.err());
        assertMessage(buildPlain, "cannot write output", "taken.csv", "folder");
        Run buildDebug = run(concat(build, "--debug"));
        assertTrue(buildDebug.err().contains("\tat org.mobident."), () -> "--debug shows the trace:\n"
                + buildDebug.err());
    }

    @Test
    void optionValuesTheEngineRefusesAreUsageErrorsNotInternalOnes() throws IOException {
        write("good.csv", demoTrace());
        String[] base = {"identify", "--library", demo("library.csv"), "--total-length-cm", "80",
            "--detector-length-cm", "72", "--voltage-kv", "-20", "--quiet", dir.resolve("good.csv").toString()};
        for (String[] option : List.of(new String[] {"--threads", "0"}, new String[] {"--min-sn", "-1"},
                new String[] {"--time-unit", "hours"}, new String[] {"--signal-column", " "})) {
            Run r = run(concat(base, option));
            assertEquals(ExitCodes.USAGE, r.code(), r.err());
            assertMessage(r, option[0]);
            assertFalse(r.err().contains("unexpected error"), r.err());
            assertTrue(r.err().contains("mobident identify --help"), r.err());
        }
    }

    // ---- helpers ----

    private static String[] concat(String[] a, String... b) {
        String[] out = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    /** A valid 4×4 grey PNG (PNG specification, W3C 2003: signature, IHDR, IDAT, IEND with CRC-32). */
    static byte[] tinyPng() throws IOException {
        ByteArrayOutputStream png = new ByteArrayOutputStream();
        png.write(new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'});
        chunk(png, "IHDR", new byte[] {0, 0, 0, 4, 0, 0, 0, 4, 8, 0, 0, 0, 0});
        byte[] raw = new byte[4 * 5];
        for (int i = 0; i < raw.length; i++) {
            raw[i] = (byte) (i % 5 == 0 ? 0 : i * 13);
        }
        Deflater deflater = new Deflater();
        deflater.setInput(raw);
        deflater.finish();
        byte[] packed = new byte[256];
        int n = deflater.deflate(packed);
        deflater.end();
        chunk(png, "IDAT", Arrays.copyOf(packed, n));
        chunk(png, "IEND", new byte[0]);
        return png.toByteArray();
    }

    private static void chunk(ByteArrayOutputStream out, String type, byte[] data) throws IOException {
        byte[] t = type.getBytes(StandardCharsets.US_ASCII);
        out.write(int32(data.length));
        out.write(t);
        out.write(data);
        CRC32 crc = new CRC32();
        crc.update(t);
        crc.update(data);
        out.write(int32((int) crc.getValue()));
    }

    private static byte[] int32(int v) {
        return new byte[] {(byte) (v >>> 24), (byte) (v >>> 16), (byte) (v >>> 8), (byte) v};
    }
}
