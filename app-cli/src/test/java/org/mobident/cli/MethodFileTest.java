package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One trace identified with --method and no condition options, as a new user would. */
class MethodFileTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    /** The conditions of demo-data/spring-01.csv in demo-data/runs.csv. */
    private static final String CHR8 = "# CHR-8 anion method\n"
            + "total-length-cm = 80\n"
            + "detector-length-cm = 72   # inlet to window\n"
            + "voltage-kv = -20\n"
            + "\n"
            + "detection = indirect\n"
            + "marker-window = 450:700\n"
            + "buffer = CHR-8\n";

    @TempDir
    Path dir;

    private BadInputCatalogueTest.Run identify(Path method, String... more) {
        String[] base = {"identify", DEMO.resolve("spring-01.csv").toString(), "--library",
            DEMO.resolve("library.csv").toString(), "--method", method.toString()};
        String[] args = new String[base.length + more.length];
        System.arraycopy(base, 0, args, 0, base.length);
        System.arraycopy(more, 0, args, base.length, more.length);
        return BadInputCatalogueTest.run(args);
    }

    @Test
    void aMethodFileStandsForTheConditionOptions() throws IOException {
        BadInputCatalogueTest.Run r = identify(Files.writeString(dir.resolve("chr8.method"), CHR8));
        assertEquals(ExitCodes.OK, r.code(), r.err());
        // demo-data/TRUTH.md: spring-01 holds chloride and sulfate
        assertTrue(r.out().contains("spring-01  chloride") && r.out().contains("sulfate"), r.out());
    }

    @Test
    void aByteOrderMarkBeforeTheFirstLineIsNotPartOfItsName() throws IOException {
        // a file whose first line is a setting, saved with a UTF-8 byte-order mark (U+FEFF, Unicode 15, § 23.8)
        String noComment = CHR8.substring(CHR8.indexOf('\n') + 1);
        BadInputCatalogueTest.Run r = identify(Files.writeString(dir.resolve("bom.method"), "\uFEFF" + noComment));
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("spring-01  chloride"), r.out());
    }

    @Test
    void anOptionGivenAsWellWins() throws IOException {
        Path m = Files.writeString(dir.resolve("zero.method"), CHR8.replace("voltage-kv = -20", "voltage-kv = 0"));
        BadInputCatalogueTest.Run alone = identify(m, "--quiet");
        assertEquals(ExitCodes.BAD_INPUT, alone.code(), "a zero voltage is refused: " + alone.err());
        BadInputCatalogueTest.Run overridden = identify(m, "--voltage-kv", "-20", "--quiet");
        assertEquals(ExitCodes.OK, overridden.code(), overridden.err());
    }

    @Test
    void aBadValueNamesTheFileLineAndName() throws IOException {
        Path m = Files.writeString(dir.resolve("bad.method"), CHR8.replace("voltage-kv = -20", "voltage-kv = -20 kV"));
        BadInputCatalogueTest.Run r = identify(m);
        assertEquals(ExitCodes.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("bad.method, line 4, field 'voltage-kv'"), r.err());

        Path unknown = Files.writeString(dir.resolve("unknown.method"), "capillary = 80\n");
        BadInputCatalogueTest.Run u = identify(unknown);
        assertEquals(ExitCodes.BAD_INPUT, u.code(), u.err());
        assertTrue(u.err().contains("line 1") && u.err().contains("total-length-cm"), u.err());
    }
}
