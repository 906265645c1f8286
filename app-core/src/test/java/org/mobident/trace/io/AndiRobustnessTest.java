package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.trace.Trace;

/**
 * Damaged interchange files (seeded random bit flips, overwritten header words, truncations, inserted
 * and deleted bytes) must give a valid trace or an {@link InputException} that names the file and a
 * byte offset; never another exception, a hang or a huge allocation. The loop stops after
 * {@link #MAX_ROUNDS} rounds or about {@link #BUDGET_NANOS} of work, whichever comes first (the time is
 * a bound on the work, never asserted).
 */
class AndiRobustnessTest {

    private static final String FILE = "fuzz.cdf";
    private static final int MAX_ROUNDS = 20_000;
    private static final long BUDGET_NANOS = 2_000_000_000L;
    /** Guard against endless loops only. */
    private static final java.time.Duration HANG_GUARD = java.time.Duration.ofSeconds(20);
    /** Header words worth trying: zero, small counts, the list tags, extremes, -1 (STREAMING). */
    private static final int[] NASTY_INTS = {0, 1, 2, 3, 4, 5, 6, 7, 0x0A, 0x0B, 0x0C, -1, -2, Integer.MAX_VALUE,
        Integer.MIN_VALUE, 0x7FFFFFFC, 1 << 16, 1 << 24, 1 << 30};

    /** Valid files covering the reader's paths: uniform sampling, CDF-2, retention times, record variables. */
    private static List<byte[]> bases() {
        double[] y = AndiTraceReaderTest.electropherogram(64, 0.05);
        double[] times = new double[y.length];
        for (int i = 0; i < times.length; i++) {
            times[i] = 0.5 * i + (i % 3) * 0.1;
        }
        String[] point = {"point_number"};
        return List.of(
                AndiTraceReaderTest.layout(1, "seconds", 0.05, 0, y).write().bytes(),
                AndiTraceReaderTest.layout(2, "Minutes", 0.001, 0.2, y).write().bytes(),
                new NetcdfTestWriter(1).dim("point_number", y.length)
                        .global(NetcdfTestWriter.text("retention_unit", "seconds"))
                        .var("ordinate_values", NetcdfTestWriter.FLOAT, point, y)
                        .var("raw_data_retention", NetcdfTestWriter.DOUBLE, point, times).write().bytes(),
                new NetcdfTestWriter(1).dim("point_number", 0)
                        .global(NetcdfTestWriter.number("actual_sampling_interval", NetcdfTestWriter.FLOAT, 0.1))
                        .var("ordinate_values", NetcdfTestWriter.SHORT, point, new double[] {1, 2, 3, 4, 5})
                        .var("raw_data_retention", NetcdfTestWriter.FLOAT, point, new double[] {1, 2, 3, 4, 5})
                        .write().bytes());
    }

    @Test
    void theBasesAreValid() throws Exception {
        for (byte[] b : bases()) {
            assertTrue(AndiTraceReader.parse(b, "x", FILE, null).size() >= 5);
        }
    }

    @Test
    void damagedFilesReadOrFailCleanly() {
        List<byte[]> bases = bases();
        int[] outcomes = new int[2];
        assertTimeoutPreemptively(HANG_GUARD, () -> {
            Random random = new Random(20_240_917L);
            long start = System.nanoTime();
            for (int round = 0; round < MAX_ROUNDS && System.nanoTime() - start < BUDGET_NANOS; round++) {
                byte[] base = bases.get(random.nextInt(bases.size()));
                byte[] damaged = damage(base, random);
                outcomes[check(damaged, round)]++;
            }
        });
        // both outcomes must occur, or the damage is not exercising the reader
        assertTrue(outcomes[0] > 0 && outcomes[1] > 0, () -> Arrays.toString(outcomes));
    }

    /** 0 for a clean failure, 1 for a valid trace; any other outcome fails the test. */
    private static int check(byte[] damaged, int round) {
        Trace t;
        try {
            t = AndiTraceReader.parse(damaged, "fuzz", FILE, TraceReadOptions.DEFAULT);
        } catch (InputException e) {
            assertEquals(FILE, e.file());
            assertEquals(0, e.line());
            assertTrue(e.getMessage().contains("at byte "), () -> "round " + round + ": " + e.getMessage());
            return 0;
        } catch (RuntimeException | OutOfMemoryError e) {
            fail("round " + round + ": " + e + " for bytes " + HexFormat.of().formatHex(damaged), e);
            return -1;
        }
        assertTrue(t.size() >= 2);
        for (int i = 0; i < t.size(); i++) {
            assertTrue(Double.isFinite(t.timeS(i)) && Double.isFinite(t.signal(i)));
            assertTrue(i == 0 || t.timeS(i) > t.timeS(i - 1));
        }
        return 1;
    }

    /** One to three random edits, biased towards the header where the counts and offsets live. */
    private static byte[] damage(byte[] base, Random random) {
        byte[] b = base;
        int edits = 1 + random.nextInt(3);
        for (int k = 0; k < edits && b.length > 0; k++) {
            int n = b.length;
            int headerish = Math.min(n, 400);
            int at = random.nextInt(4) == 0 ? random.nextInt(n) : random.nextInt(headerish);
            switch (random.nextInt(6)) {
                case 0:
                    b = b.clone();
                    b[at] ^= (byte) (1 << random.nextInt(8));
                    break;
                case 1: {
                    int word = (at & ~3);
                    if (word + 4 <= n) {
                        b = b.clone();
                        int v = random.nextBoolean() ? NASTY_INTS[random.nextInt(NASTY_INTS.length)] : random.nextInt();
                        b[word] = (byte) (v >>> 24);
                        b[word + 1] = (byte) (v >>> 16);
                        b[word + 2] = (byte) (v >>> 8);
                        b[word + 3] = (byte) v;
                    }
                    break;
                }
                case 2:
                    b = Arrays.copyOf(b, random.nextInt(n));
                    break;
                case 3: {
                    byte[] out = new byte[n + 1];
                    System.arraycopy(b, 0, out, 0, at);
                    out[at] = (byte) random.nextInt(256);
                    System.arraycopy(b, at, out, at + 1, n - at);
                    b = out;
                    break;
                }
                case 4: {
                    byte[] out = new byte[n - 1];
                    System.arraycopy(b, 0, out, 0, at);
                    System.arraycopy(b, at + 1, out, at, n - at - 1);
                    b = out;
                    break;
                }
                default:
                    b = b.clone();
                    Arrays.fill(b, at, Math.min(n, at + 1 + random.nextInt(16)), (byte) 0xFF);
                    break;
            }
        }
        return b;
    }
}
