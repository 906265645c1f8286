package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code mobident simulate}: both scenarios as a user runs them. */
class SimulateCommandTest {

    private static final Path DEMO_LIBRARY = Path.of("..", "demo-data", "library.csv");

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

    @Test
    void labDayWritesABenchAndSaysWhatItHolds() throws IOException {
        Path out = dir.resolve("bench");
        Run r = run("simulate", "--scenario", "lab-day", "--count", "9", "--seed", "7", "--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("9 sample runs and 24 standards runs"), r.out());
        assertTrue(r.out().contains("invented"), r.out());
        for (String f : new String[] {"README.txt", "truth.csv", "hidden-conditions.csv", "standards/runs.csv",
            "standards/mixes.csv", "standards/truth.csv", "standards/AN-A-runs.csv", "standards/AN-A-mixes.csv",
            "standards/CAT-C-mixes.csv", "samples/runs.csv", "samples/AN-B-runs.csv", "samples/AN-B-truth.csv"}) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        String truth = Files.readString(out.resolve("truth.csv"));
        Run again = run("simulate", "--scenario", "lab-day", "--count", "9", "--seed", "8", "--out", out.toString());
        assertEquals(ExitCodes.CANNOT_WRITE, again.code(), again.out());
        assertTrue(again.err().contains("--overwrite"), again.err());
        assertEquals(truth, Files.readString(out.resolve("truth.csv")), "nothing replaced");
        Run forced = run("simulate", "--scenario", "lab-day", "--count", "9", "--seed", "8", "--out", out.toString(),
                "--overwrite");
        assertEquals(ExitCodes.OK, forced.code(), forced.err());
    }

    @Test
    void labDayBuildsLibrariesWithTheLibraryCommand() {
        Path out = dir.resolve("bench");
        assertEquals(ExitCodes.OK, run("simulate", "--scenario", "lab-day", "--count", "3", "--out", out.toString())
                .code());
        Run build = run("library", "build", "--runs", out.resolve("standards/CAT-C-runs.csv").toString(),
                "--mixes", out.resolve("standards/CAT-C-mixes.csv").toString(),
                "--out", dir.resolve("cat.csv").toString());
        assertTrue(build.code() == ExitCodes.OK || build.code() == ExitCodes.SOME_RUNS_FAILED, build.err());
        assertTrue(build.out().contains("(10 analytes)"), build.out());
    }

    @Test
    void scenarioOptionsAreChecked() {
        String out = dir.resolve("x").toString();
        Run noLibrary = run("simulate", "--out", out);
        assertEquals(ExitCodes.USAGE, noLibrary.code());
        assertTrue(noLibrary.err().contains("--library"), noLibrary.err());
        Run withLibrary = run("simulate", "--scenario", "lab-day", "--library", DEMO_LIBRARY.toString(), "--out", out);
        assertEquals(ExitCodes.USAGE, withLibrary.code());
        Run withPoints = run("simulate", "--scenario", "lab-day", "--points", "5000", "--out", out);
        assertEquals(ExitCodes.USAGE, withPoints.code());
        Run unknown = run("simulate", "--scenario", "lab-night", "--out", out);
        assertEquals(ExitCodes.USAGE, unknown.code());
        assertTrue(unknown.err().contains("lab-day"), unknown.err());
        Run badShape = run("simulate", "--scenario", "lab-day", "--skew-shape", "square", "--out", out);
        assertEquals(ExitCodes.USAGE, badShape.code());
        assertTrue(badShape.err().contains("triangle"), badShape.err());
        Run archiveShape = run("simulate", "--library", DEMO_LIBRARY.toString(), "--skew-shape", "triangle",
                "--out", out);
        assertEquals(ExitCodes.USAGE, archiveShape.code());
        assertTrue(archiveShape.err().contains("lab-day"), archiveShape.err());
        assertFalse(Files.exists(Path.of(out)), "nothing written on a usage error");
    }

    @Test
    void triangularZonesChangeTheTracesButNotWhatTheyHold() throws IOException {
        Path emg = dir.resolve("emg");
        Path tri = dir.resolve("tri");
        assertEquals(ExitCodes.OK, run("simulate", "--scenario", "lab-day", "--count", "3", "--seed", "4",
                "--out", emg.toString()).code());
        assertEquals(ExitCodes.OK, run("simulate", "--scenario", "lab-day", "--count", "3", "--seed", "4",
                "--skew-shape", "triangle", "--out", tri.toString()).code());
        assertEquals(Files.readString(emg.resolve("truth.csv")), Files.readString(tri.resolve("truth.csv")));
        assertEquals(Files.readString(emg.resolve("samples/runs.csv")), Files.readString(tri.resolve("samples/runs.csv")));
        java.util.List<String> files = Files.readString(emg.resolve("samples/runs.csv")).lines()
                .filter(l -> !l.startsWith("#")).skip(1).map(l -> l.split(",")[0]).toList();
        assertEquals(3, files.size());
        long differ = 0;
        for (String f : files) {
            differ += Files.readString(emg.resolve("samples").resolve(f))
                    .equals(Files.readString(tri.resolve("samples").resolve(f))) ? 0 : 1;
        }
        assertTrue(differ > 0, "the skewed zones are drawn anew");
    }

    @Test
    void archiveStillWorksAsBefore() throws IOException {
        Path out = dir.resolve("arch");
        Run r = run("simulate", "--library", DEMO_LIBRARY.toString(), "--count", "2", "--points", "500",
                "--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().startsWith("2 runs of 500 points written"), r.out());
        try (var files = Files.list(out)) {
            assertEquals(3, files.count(), "two traces and the run sheet");
        }
    }
}
