package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.testing.Mutation;
import org.mobident.testing.ReaderRobustness;
import org.mobident.testing.ReaderRobustness.Outcome;

/**
 * Seeded random damage to valid standards sheets: {@link StandardsSheetReader#read(Path)} gives a
 * valid sheet or an {@link InputException} naming the file, never another exception (in particular
 * never the {@link IllegalArgumentException} of the value types it builds), never a hang.
 */
class StandardsSheetRobustnessTest {

    private static final int ROUNDS = 400;
    private static final int MAX_EDITS = 5;

    // Invented sheets in the file format; they only need to be valid.
    private static final List<String> BASES = List.of(
            "# standards for the anion method\nmix,analyte,charge,approx_mobility,order,note\n"
                    + "mixA,chloride,-1,-76,1,\"first, fast\"\nmixA,sulfate,2-,-74,2,\n"
                    + "mixA,nitrate,-,\u221270,3,\n\nmixB,bromide,-1,-78,,\nmixB,acetate,,-41,,late\n",
            "\uFEFFMix;Analyte;Approx-Mobility;Charge\r\ncations;potassium;76,2;+\r\ncations;sodium;51,9;1+\r\n"
                    + "cations;calcium;61,7;+2\r\n",
            "mix\tanalyte\torder\nA\tfluoride\t1\nA\tphosphate\t2\nB\tformate\t\n");

    @TempDir
    Path dir;

    @Test
    void theBasesAreValid() throws Exception {
        int i = 0;
        for (String base : BASES) {
            Outcome<StandardsSheet> o = ReaderRobustness.read(dir.resolve("base" + i++ + ".csv"),
                    base.getBytes(StandardCharsets.UTF_8), StandardsSheetReader::read, "base");
            assertFalse(o.failed(), () -> o.error().getMessage());
            assertTrue(o.value().mixes().size() >= 1);
        }
    }

    @Test
    void damagedSheetsReadOrFailCleanly() throws Exception {
        Random random = new Random(31L);
        Path file = dir.resolve("mixes.csv");
        int accepted = 0;
        int refused = 0;
        for (int round = 0; round < ROUNDS; round++) {
            int b = random.nextInt(BASES.size());
            List<Mutation> edits = Mutation.randomEdits(random, MAX_EDITS);
            byte[] bytes = Mutation.applyAll(BASES.get(b).getBytes(StandardCharsets.UTF_8), edits);
            String context = "seed 31, round " + round + ", base " + b + ", edits " + edits;
            Outcome<StandardsSheet> o = ReaderRobustness.read(file, bytes, StandardsSheetReader::read, context);
            if (o.failed()) {
                refused++;
                continue;
            }
            accepted++;
            StandardsSheet s = o.value();
            assertEquals(file.toString(), s.sourceFile());
            assertFalse(s.mixes().isEmpty(), context);
            for (StandardsMix m : s.mixes()) {
                for (StandardAnalyte a : m.analytes()) {
                    assertTrue(a.line() > 0, context);
                    assertTrue(Double.isNaN(a.approxMobility()) || Double.isFinite(a.approxMobility()), context);
                }
            }
        }
        assertTrue(accepted > 0 && refused > 0, "accepted " + accepted + ", refused " + refused);
    }
}
