package org.mobident.trace.io;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.testing.Mutation;

/**
 * Seeded random damage ({@link Mutation}) to valid traces and run sheets: each reads to a valid
 * result or fails with an {@link org.mobident.InputException} naming the file, never another
 * exception, never a hang ({@link RobustnessChecks}).
 */
class TraceIoRobustnessTest {

    private static final int ROUNDS = 300;

    private static List<Mutation> edits(Random random) {
        return Mutation.randomEdits(random, 6);
    }

    @Test
    void damagedTracesReadOrFailCleanly() {
        Random random = new Random(11L);
        for (int i = 0; i < ROUNDS; i++) {
            byte[] base = RobustnessChecks.trace(random.nextBoolean());
            RobustnessChecks.traceReadsOrFailsCleanly(Mutation.applyAll(base, edits(random)));
        }
    }

    @Test
    void damagedSheetsReadOrFailCleanly(@TempDir Path dir) throws Exception {
        Path folder = RobustnessChecks.sheetFolder(dir);
        Random random = new Random(12L);
        byte[] base = RobustnessChecks.SHEET.getBytes(StandardCharsets.UTF_8);
        for (int i = 0; i < ROUNDS / 2; i++) {
            RobustnessChecks.sheetReadsOrFailsCleanly(folder, Mutation.applyAll(base, edits(random)));
        }
    }

    @Test
    void theUndamagedFilesAreValid(@TempDir Path dir) throws Exception {
        org.junit.jupiter.api.Assertions.assertEquals(5,
                DelimitedTraceReader.parse(RobustnessChecks.trace(false), "x", "x", null).size());
        org.junit.jupiter.api.Assertions.assertEquals(5,
                DelimitedTraceReader.parse(RobustnessChecks.trace(true), "x", "x", null).size());
        java.nio.file.Files.writeString(RobustnessChecks.sheetFolder(dir).resolve("runs.csv"), RobustnessChecks.SHEET);
        RunSheet s = RunSheetReader.read(dir.resolve("runs.csv"), org.mobident.trace.RunConditions.EMPTY);
        org.junit.jupiter.api.Assertions.assertEquals(3, s.runs().size(), () -> s.rowProblems().toString());
    }
}
