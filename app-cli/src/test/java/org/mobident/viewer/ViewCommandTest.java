package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.cli.ExitCodes;
import org.mobident.cli.ViewCommand;
import picocli.CommandLine;

/** {@code mobident view} without a display (surefire runs with java.awt.headless=true). */
class ViewCommandTest {

    static {
        System.setProperty("java.awt.headless", "true");
    }

    private record Outcome(int code, String out, String err) {
    }

    private static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new ViewCommand());
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        int code = cl.execute(args);
        return new Outcome(code, out.toString(), err.toString());
    }

    @Test
    void headlessItSaysThereIsNoDisplayAndExitsWithTheDocumentedCode(@TempDir Path dir) {
        assertFalse(Viewer.canShowWindow(), "the test runs headless");
        // the library does not exist: the display check comes first, before any file is read
        Outcome o = run("--runs", dir.resolve("runs.csv").toString(), "--library", dir.resolve("lib.csv").toString(),
                "--axis", "time");
        assertEquals(ViewCommand.NO_DISPLAY, o.code());
        assertEquals(ExitCodes.USAGE, o.code());
        assertTrue(o.err().contains("no display"), o.err());
        assertTrue(o.err().contains("Xvfb"), "says how to get one: " + o.err());
        assertFalse(o.err().contains("Exception"), "no stack trace: " + o.err());
        assertEquals("", o.out());
    }

    @Test
    void theHelpDocumentsTheExitCodes() {
        Outcome o = run("--help");
        assertEquals(ExitCodes.OK, o.code());
        assertTrue(o.out().contains("--axis"));
        assertTrue(o.out().contains("no display"), o.out());
    }

    @Test
    void aMissingLibraryOptionIsAUsageError() {
        Outcome o = run("--runs", "runs.csv");
        assertEquals(ExitCodes.USAGE, o.code());
        assertTrue(o.err().contains("--library"), o.err());
    }
}
