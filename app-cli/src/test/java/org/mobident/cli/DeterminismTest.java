package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Predicate;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same inputs give byte-identical outputs, apart from the one line that states when the file
 * was made (the report's {@code id="generated-at"} line, the library's build-date note), whatever
 * the number of threads.
 */
class DeterminismTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

    private static String demo(String file) {
        return DEMO.resolve(file).toString();
    }

    private static BadInputCatalogueTest.Run run(String... args) {
        return BadInputCatalogueTest.run(args);
    }

    @Test
    void identifyTwiceGivesIdenticalTables() throws IOException {
        for (int i = 1; i <= 2; i++) {
            // the second time on one thread: parallel processing must not change the order or content
            BadInputCatalogueTest.Run r = run("identify", "--runs", demo("runs.csv"), "--library", demo("library.csv"),
                    "--csv", dir.resolve("peaks" + i + ".csv").toString(),
                    "--json", dir.resolve("peaks" + i + ".json").toString(), "--quiet",
                    "--threads", i == 1 ? "4" : "1");
            assertEquals(ExitCodes.OK, r.code(), r.err());
        }
        byte[] csv = Files.readAllBytes(dir.resolve("peaks1.csv"));
        assertTrue(csv.length > 1000);
        assertArrayEquals(csv, Files.readAllBytes(dir.resolve("peaks2.csv")), "CSV differs between runs");
        assertArrayEquals(Files.readAllBytes(dir.resolve("peaks1.json")), Files.readAllBytes(dir.resolve("peaks2.json")),
                "JSON differs between runs");
    }

    @Test
    void reportTwiceDiffersOnlyInTheGeneratedAtLine() throws IOException {
        for (int i = 1; i <= 2; i++) {
            BadInputCatalogueTest.Run r = run("report", "--runs", demo("runs.csv"), "--library", demo("library.csv"),
                    "--out", dir.resolve("r" + i + ".html").toString());
            assertEquals(ExitCodes.OK, r.code(), r.err());
        }
        assertSameApartFrom(dir.resolve("r1.html"), dir.resolve("r2.html"), line -> line.contains("id=\"generated-at\""),
                1);
    }

    @Test
    void libraryBuildTwiceDiffersOnlyInTheBuildDateNote() throws IOException {
        for (int i = 1; i <= 2; i++) {
            BadInputCatalogueTest.Run r = run("library", "build", "--runs", demo("standards/standards-runs.csv"),
                    "--mixes", demo("standards/mixes.csv"), "--out", dir.resolve("lib" + i + ".csv").toString());
            assertEquals(ExitCodes.OK, r.code(), r.err());
        }
        assertSameApartFrom(dir.resolve("lib1.csv"), dir.resolve("lib2.csv"),
                line -> line.startsWith("# ") && line.contains(" built ") && line.matches(".* on \\d{4}-\\d\\d-\\d\\dT.*"),
                1);
    }

    /**
     * Compares two text files line by line: lines matching {@code stamp} may differ (exactly
     * {@code stampLines} of them must be present in each), all others must be identical.
     */
    private static void assertSameApartFrom(Path a, Path b, Predicate<String> stamp, int stampLines)
            throws IOException {
        List<String> x = Files.readAllLines(a, StandardCharsets.UTF_8);
        List<String> y = Files.readAllLines(b, StandardCharsets.UTF_8);
        assertEquals(x.size(), y.size(), "line counts differ");
        assertEquals(stampLines, x.stream().filter(stamp).count(), "time stamp lines in " + a);
        assertEquals(stampLines, y.stream().filter(stamp).count(), "time stamp lines in " + b);
        for (int i = 0; i < x.size(); i++) {
            boolean isStamp = stamp.test(x.get(i));
            assertEquals(isStamp, stamp.test(y.get(i)), "the time stamp moved, line " + (i + 1));
            if (!isStamp) {
                assertEquals(x.get(i), y.get(i), "line " + (i + 1) + " of " + a.getFileName());
            }
        }
        // the byte content apart from line ends is covered above; the files must also end alike
        assertEquals(Files.size(a) - x.stream().filter(stamp).mapToInt(String::length).sum(),
                Files.size(b) - y.stream().filter(stamp).mapToInt(String::length).sum(), "sizes apart from stamps");
        assertNotEquals(0, x.size());
    }
}
