package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The progress line's text, the closing totals line, and that neither appears where it must not. */
class ProgressAndTotalsTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @Test
    void progressLineShowsCountRateAndTimeLeftWithinTheWidth() {
        String line = ProgressDisplay.line(1, 412, 1000, 2.0, 80);
        assertTrue(line.startsWith("identifying ["), line);
        assertTrue(line.contains("  412/1,000 runs"), line);
        assertTrue(line.contains("206 runs/s"), line);
        assertTrue(line.endsWith("3 s left"), line); // 588 runs at 206 per second
        assertEquals(79, line.length(), line);
        int filled = line.length() - line.replace("#", "").length();
        int bar = filled + line.length() - line.replace("-", "").length();
        assertEquals(Math.round(0.412 * bar), filled, 1.0, line);
    }

    @Test
    void progressLineBeforeAnyRateAndOnANarrowTerminal() {
        assertFalse(ProgressDisplay.line(1, 0, 50, 0.0, 80).contains("left"));
        assertTrue(ProgressDisplay.line(2, 10, 50, 1.0, 80).startsWith("matching again ["));
        String narrow = ProgressDisplay.line(1, 10, 5000, 1.0, 30);
        assertTrue(narrow.length() < 30 && !narrow.contains("["), narrow);
        assertTrue(ProgressDisplay.line(1, 7000, 7000, 100, 80).contains("[" + "#".repeat(10)), "full bar when done");
        assertTrue(ProgressDisplay.line(1, 5000, 100_000, 10, 80).contains("3 min 10 s left")); // 95,000 runs at 500 per second
    }

    @Test
    void aDisabledDisplayPrintsNothing() {
        StringWriter err = new StringWriter();
        try (ProgressDisplay p = ProgressDisplay.on(new PrintWriter(err, true), false)) {
            p.passStarted(1, 3);
            p.runDone(1);
            p.runDone(1);
        }
        assertEquals("", err.toString());
    }

    @Test
    void totalsLineClosesTheBatchUnlessQuiet() {
        String[] args = {"identify", "--runs", DEMO.resolve("runs.csv").toString(), "--library",
            DEMO.resolve("library.csv").toString()};
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(ExitCodes.OK, Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true)));
        // the demo's seven runs: 34 analyte peaks identified, spring-03's bromide ambiguous (0.80 likely:
        // below the 4:1 odds an identification needs); the summary's own count on stdout agrees
        assertTrue(Pattern.compile("^7 runs: 7 ok, 0 failed, 34 peaks identified in \\d+\\.\\d s$", Pattern.MULTILINE)
                .matcher(err.toString()).find(), err.toString());
        assertTrue(out.toString().contains("Analyte peaks: 34 identified, 1 ambiguous"), out.toString());
        assertFalse(err.toString().contains("\r"), "no progress bar when standard error is not a terminal");

        String[] quiet = java.util.Arrays.copyOf(args, args.length + 1);
        quiet[args.length] = "--quiet";
        StringWriter quietErr = new StringWriter();
        StringWriter quietOut = new StringWriter();
        assertEquals(ExitCodes.OK, Main.run(quiet, new PrintWriter(quietOut, true), new PrintWriter(quietErr, true)));
        assertEquals("", quietErr.toString());
        assertEquals("", quietOut.toString());
    }
}
