package org.mobident.library;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.testing.Mutation;
import org.mobident.testing.ReaderRobustness;
import org.mobident.testing.ReaderRobustness.Outcome;

/**
 * Seeded random damage (byte flips, truncation, shuffled, repeated or deleted lines, injected
 * junk) to valid library files: {@link LibraryCsv#read(Path)} gives a valid library or an
 * {@link InputException} naming the file, never another exception, never a hang. A library it
 * accepts must also write and read back unchanged, so that nothing it lets in breaks the writer.
 */
class LibraryCsvRobustnessTest {

    private static final int ROUNDS = 400;
    private static final int MAX_EDITS = 5;

    // Invented values in the file format; they only need to be valid.
    private static final List<String> BASES = List.of(
            "\uFEFF# demo library, CHR-8 buffer\n# second note, with \"quotes\"\n"
                    + "name,mobility,mobility_sd,n,charge,tolerance,pka,limiting_mobility,buffer,ph,"
                    + "ionic_strength_mm,temperature_c,source\n"
                    + "chloride,-76.30,0.40,12,-1,,,-79.1,CHR-8,8.0,12,25,demo (invented)\n"
                    + "phosphate,-35.2,0.5,4,-2,1.2,2.15 7.20 12.35,-35.1 -61.5 -71.4,CHR-8,8.0,12,25,\"a, b\"\n"
                    + "\n"
                    + "\"odd \"\"name\"\"\",\u221212.5e0,,,,,,,,,,,\n"
                    + ",,,,,,,,,,,,\n",
            "Mobility , NAME,mobility_sd\r\n-79.1,Chloride,0.4\r\n\r\n-70.2,nitrate,\r\n# trailer note\r\n",
            "name,mobility\nsodium,51.9\npotassium,76.2\nlithium,40.1\n");

    @TempDir
    Path dir;

    @Test
    void theBasesAreValid() throws Exception {
        int i = 0;
        for (String base : BASES) {
            Outcome<Library> o = ReaderRobustness.read(dir.resolve("base" + i++ + ".csv"),
                    base.getBytes(StandardCharsets.UTF_8), LibraryCsv::read, "base");
            assertFalse(o.failed(), () -> o.error().getMessage());
            assertTrue(o.value().size() >= 2);
        }
    }

    @Test
    void damagedLibrariesReadOrFailCleanly() throws Exception {
        Random random = new Random(21L);
        Path file = dir.resolve("lib.csv");
        int accepted = 0;
        int refused = 0;
        for (int round = 0; round < ROUNDS; round++) {
            int b = random.nextInt(BASES.size());
            List<Mutation> edits = Mutation.randomEdits(random, MAX_EDITS);
            byte[] bytes = Mutation.applyAll(BASES.get(b).getBytes(StandardCharsets.UTF_8), edits);
            String context = "seed 21, round " + round + ", base " + b + ", edits " + edits;
            Outcome<Library> o = ReaderRobustness.read(file, bytes, LibraryCsv::read, context);
            if (o.failed()) {
                refused++;
            } else {
                checkValid(o.value(), file, context);
                accepted++;
            }
        }
        // The property is only exercised if the damage produces both outcomes.
        assertTrue(accepted > 0 && refused > 0, "accepted " + accepted + ", refused " + refused);
    }

    private static void checkValid(Library lib, Path file, String context) throws InputException {
        assertEquals(file.toString(), lib.sourceFile());
        assertFalse(lib.entries().isEmpty(), context);
        Set<String> names = new HashSet<>();
        for (LibraryEntry e : lib.entries()) {
            assertTrue(e.name() != null && !e.name().isBlank(), context);
            assertTrue(names.add(e.name()), () -> "duplicate name accepted: " + e.name() + "; " + context);
            assertTrue(Double.isFinite(e.mobility()), context);
            assertTrue(Double.isNaN(e.mobilitySd()) || e.mobilitySd() >= 0, context);
            assertTrue(Double.isNaN(e.tolerance()) || e.tolerance() > 0, context);
            assertTrue(e.n() >= 0, context);
            for (double v : e.pKa()) {
                assertTrue(Double.isFinite(v), context);
            }
            for (double v : e.limitingMobilities()) {
                assertTrue(Double.isFinite(v), context);
            }
        }
        String written = LibraryCsv.toCsv(lib);
        Library again = LibraryCsv.read(new StringReader(written), file.toString());
        assertEquals(lib.entries(), again.entries(), () -> "write/read changed the library; " + context);
    }
}
