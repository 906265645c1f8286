package org.mobident.recheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.report.PeakTableCsv;
import org.mobident.testing.Mutation;
import org.mobident.testing.ReaderRobustness;
import org.mobident.testing.ReaderRobustness.Outcome;

/**
 * Seeded random damage to a peak table as Mobident writes it: {@link PeakTableReader#read(Path)}
 * gives valid rows or an {@link InputException} naming the file, never another exception, never a
 * hang.
 */
class PeakTableRobustnessTest {

    private static final int ROUNDS = 300;
    private static final int MAX_EDITS = 5;

    @TempDir
    Path dir;

    private static byte[] base() throws IOException {
        StringWriter w = new StringWriter();
        PeakTableCsv.write(List.of(RecheckFixtures.okRun("=spring-01"), RecheckFixtures.failedRun("well-09"),
                RecheckFixtures.noPeaksRun("well-10")), w);
        return w.toString().getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void theBaseIsValid() throws Exception {
        Outcome<List<PeakTableRow>> o = ReaderRobustness.read(dir.resolve("peaks.csv"), base(),
                PeakTableReader::read, "base");
        assertFalse(o.failed(), () -> o.error().getMessage());
        assertEquals(6, o.value().size());
    }

    @Test
    void damagedTablesReadOrFailCleanly() throws Exception {
        Random random = new Random(41L);
        Path file = dir.resolve("peaks.csv");
        byte[] base = base();
        int accepted = 0;
        int refused = 0;
        for (int round = 0; round < ROUNDS; round++) {
            List<Mutation> edits = Mutation.randomEdits(random, MAX_EDITS);
            byte[] bytes = Mutation.applyAll(base, edits);
            String context = "seed 41, round " + round + ", edits " + edits;
            Outcome<List<PeakTableRow>> o = ReaderRobustness.read(file, bytes, PeakTableReader::read, context);
            if (o.failed()) {
                refused++;
                continue;
            }
            accepted++;
            for (PeakTableRow r : o.value()) {
                assertTrue(r.line() > 0, context);
                assertTrue(r.run() != null && !r.run().isBlank(), context);
                assertTrue(PeakTableReader.STATUSES.contains(r.status()), context);
                assertTrue(Double.isNaN(r.confidence()) || (r.confidence() >= 0 && r.confidence() <= 1), context);
                assertTrue(Double.isNaN(r.mobilitySd()) || r.mobilitySd() >= 0, context);
                assertTrue(r.peak() >= 0, context);
            }
        }
        assertTrue(accepted > 0 && refused > 0, "accepted " + accepted + ", refused " + refused);
    }
}
