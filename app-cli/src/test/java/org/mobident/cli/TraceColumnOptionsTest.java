package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The trace column options through the real command line: a trace exported without a header line,
 * and with a column the tool would otherwise take for the signal, gives the same peaks as the demo
 * trace it was made from once its columns are named by position.
 */
class TraceColumnOptionsTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @TempDir
    Path dir;

    /** The rows of the peak table without the run name, which differs with the file name. */
    private List<String> peakRows(Path table) throws IOException {
        List<String> out = new ArrayList<>();
        for (String line : Files.readAllLines(table, StandardCharsets.UTF_8)) {
            out.add(line.substring(line.indexOf(',') + 1));
        }
        return out;
    }

    private BadInputCatalogueTest.Run identify(Path trace, Path table, String... extra) {
        List<String> args = new ArrayList<>(List.of("identify", trace.toString(), "--library",
                DEMO.resolve("library.csv").toString(), "--method", DEMO.resolve("chr8.method").toString(),
                "--csv", table.toString(), "--quiet"));
        args.addAll(List.of(extra));
        return BadInputCatalogueTest.run(args.toArray(String[]::new));
    }

    @Test
    void headerlessTraceWithAnExtraColumnIsReadByPosition() throws IOException {
        // the demo trace with its header dropped and a constant current column put between time and signal
        StringBuilder text = new StringBuilder();
        for (String line : Files.readAllLines(DEMO.resolve("spring-01.csv"), StandardCharsets.UTF_8)) {
            if (line.isBlank() || line.startsWith("#") || line.startsWith("time")) {
                continue;
            }
            int comma = line.indexOf(',');
            text.append(line, 0, comma).append('\t').append("12.5").append('\t').append(line.substring(comma + 1))
                    .append('\n');
        }
        Path headerless = Files.writeString(dir.resolve("spring-01.txt"), text.toString());

        BadInputCatalogueTest.Run demo = identify(DEMO.resolve("spring-01.csv"), dir.resolve("demo.csv"));
        assertEquals(ExitCodes.OK, demo.code(), demo.err());

        // three columns and no header: the signal column must be named, and the message says how
        BadInputCatalogueTest.Run refused = identify(headerless, dir.resolve("refused.csv"));
        assertEquals(ExitCodes.SOME_RUNS_FAILED, refused.code(), refused.err());
        BadInputCatalogueTest.assertMessage(refused, "spring-01.txt", "line 1", "field 'signal'", "--signal-column");

        BadInputCatalogueTest.Run read = identify(headerless, dir.resolve("read.csv"), "--signal-column", "3");
        assertEquals(ExitCodes.OK, read.code(), read.err());
        List<String> expected = peakRows(dir.resolve("demo.csv"));
        assertTrue(expected.size() > 4, "the demo run has its marker and analyte peaks");
        assertEquals(expected, peakRows(dir.resolve("read.csv")));

        // the same from a method file that says how the method's traces are written (an option would win)
        Path method = Files.writeString(dir.resolve("export.method"),
                Files.readString(DEMO.resolve("chr8.method"), StandardCharsets.UTF_8) + "signal-column = 3\n");
        BadInputCatalogueTest.Run fromMethod = BadInputCatalogueTest.run("identify", headerless.toString(),
                "--library", DEMO.resolve("library.csv").toString(), "--method", method.toString(),
                "--csv", dir.resolve("method-peaks.csv").toString(), "--quiet");
        assertEquals(ExitCodes.OK, fromMethod.code(), fromMethod.err());
        assertEquals(expected, peakRows(dir.resolve("method-peaks.csv")));
        BadInputCatalogueTest.Run overridden = BadInputCatalogueTest.run("identify", headerless.toString(),
                "--library", DEMO.resolve("library.csv").toString(), "--method", method.toString(),
                "--signal-column", "2", "--csv", dir.resolve("overridden.csv").toString(), "--quiet");
        // the option wins: column 2 is the constant current, which holds no peaks
        assertEquals(ExitCodes.SOME_RUNS_FAILED, overridden.code(), overridden.err());
        BadInputCatalogueTest.assertMessage(overridden, "spring-01", "no peaks found");

        // the same by name in a file with a header the tool does not recognise
        Path named = Files.writeString(dir.resolve("named.csv"), "X\tI\tY\n" + text);
        BadInputCatalogueTest.Run byName = identify(named, dir.resolve("named-peaks.csv"),
                "--time-column", "x", "--signal-column", "Y");
        assertEquals(ExitCodes.OK, byName.code(), byName.err());
        assertEquals(expected, peakRows(dir.resolve("named-peaks.csv")));
    }
}
