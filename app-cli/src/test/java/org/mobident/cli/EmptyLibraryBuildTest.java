package org.mobident.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A build that can name no analyte refuses to write an empty library and says what would name them. */
class EmptyLibraryBuildTest {

    private static final Path STANDARDS = Path.of("..", "demo-data", "standards");

    @TempDir
    Path dir;

    @Test
    void nothingToNameThePeaksByWritesNoLibrary() throws IOException {
        // the demo standards sheet without its approx_mobility column, and no --reference
        String mixes = Files.readAllLines(STANDARDS.resolve("mixes.csv"), StandardCharsets.UTF_8).stream()
                .map(l -> l.startsWith("#") ? l : l.replaceFirst(",[^,]*$", "")).collect(Collectors.joining("\n"));
        assertTrue(mixes.startsWith("mix,analyte\n") || mixes.contains("\nmix,analyte\n"), mixes);
        Path sheet = Files.writeString(dir.resolve("mixes.csv"), mixes + "\n");
        Path out = dir.resolve("lib.csv");
        BadInputCatalogueTest.Run r = BadInputCatalogueTest.run("library", "build", "--runs",
                STANDARDS.resolve("standards-runs.csv").toString(), "--mixes", sheet.toString(), "--out", out.toString());
        assertEquals(ExitCodes.BAD_INPUT, r.code(), r.err());
        assertFalse(Files.exists(out), "no empty library is written");
        assertTrue(r.err().contains("approx_mobility") && r.err().contains("--reference"), r.err());
    }
}
