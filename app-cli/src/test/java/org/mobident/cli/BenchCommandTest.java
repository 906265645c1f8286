package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The hidden bench command: what each stage counts, and that it stays out of the help. */
class BenchCommandTest {

    private static final Path DEMO = Path.of("..", "demo-data");
    private static final Pattern LINE = Pattern.compile(
            "^(read|detect|identify): 7 runs \\(0 failed\\), ([0-9,]+) (points|peaks), \\d+ MB in [0-9.]+ s wall, "
                    + "[0-9.]+ s CPU \\(process\\), 1 thread; .*$", Pattern.MULTILINE);

    private static Matcher bench(String stage) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"bench", "--stage", stage, "--threads", "1", "--runs",
            DEMO.resolve("runs.csv").toString(), "--library", DEMO.resolve("library.csv").toString()},
                new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(ExitCodes.OK, code, err.toString());
        Matcher m = LINE.matcher(out.toString());
        assertTrue(m.find(), out.toString());
        assertEquals(stage, m.group(1));
        return m;
    }

    @Test
    void readCountsEveryDataRowOfTheSheetsTraces() throws IOException {
        long rows = 0;
        List<String> sheet = Files.readAllLines(DEMO.resolve("runs.csv"));
        for (String line : sheet.subList(1, sheet.size())) {
            // every demo trace: one header line, then one row per point
            rows += Files.readAllLines(DEMO.resolve(line.substring(0, line.indexOf(',')))).size() - 1;
        }
        assertEquals(rows, Long.parseLong(bench("read").group(2).replace(",", "")));
    }

    @Test
    void detectAndIdentifyReportPeaks() {
        assertTrue(Long.parseLong(bench("detect").group(2).replace(",", "")) >= 7, "at least a marker per run");
        assertTrue(Long.parseLong(bench("identify").group(2).replace(",", "")) >= 7);
    }

    @Test
    void hiddenFromTheHelp() {
        StringWriter out = new StringWriter();
        Main.run(new String[] {"--help"}, new PrintWriter(out, true), new PrintWriter(new StringWriter(), true));
        assertTrue(out.toString().contains("identify") && !out.toString().contains("bench"), out.toString());
    }
}
