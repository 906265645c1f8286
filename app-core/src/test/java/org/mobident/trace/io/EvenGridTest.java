package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.trace.Trace;

/**
 * Times written with too few decimals for the sampling rate repeat; the even grid under them is
 * recovered when, and only when, rounding explains every written time. Check values are the grids the
 * times were drawn from.
 */
class EvenGridTest {

    /** {@code count} times from {@code startS} every {@code stepS}, written rounded to {@code quantumS}. */
    private static double[] written(double startS, double stepS, int count, double quantumS) {
        double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            t[i] = Math.round((startS + i * stepS) / quantumS) * quantumS;
        }
        return t;
    }

    @Test
    void minutesToThreeDecimalsAtTwentyHertz() {
        // 0.001 min = 0.06 s, coarser than the 0.05 s sampling: one row in six repeats
        double[] t = written(12.34, 0.05, 6_000, 0.06);
        EvenGrid grid = EvenGrid.under(t);
        assertNotNull(grid);
        assertEquals(0.05, grid.stepS(), 1e-6);
        assertEquals(0.06, grid.writtenStepS(), 1e-12);
        double worstWritten = 0;
        for (int i = 0; i < t.length; i++) {
            // the written times are off by up to 0.03 s; the rounding errors repeat every six rows, so
            // the line through them keeps a bias of a few thousandths of a second, well within a
            // sixth of the writing step
            assertEquals(12.34 + i * 0.05, grid.timesS()[i], 0.01, "row " + i);
            worstWritten = Math.max(worstWritten, Math.abs(t[i] - (12.34 + i * 0.05)));
        }
        assertTrue(worstWritten > 0.025, "the written times must be the coarser reading: " + worstWritten);
    }

    @Test
    void secondsToOneDecimalAtThirtyHertz() {
        double[] t = written(0.0, 1.0 / 30, 9_000, 0.1);
        EvenGrid grid = EvenGrid.under(t);
        assertNotNull(grid);
        assertEquals(1.0 / 30, grid.stepS(), 1e-6);
    }

    @Test
    void aRowWrittenTwiceInAFinelyWrittenTraceIsNoGrid() {
        // times to the millisecond at 20 Hz never repeat by rounding: a repeat there is a mistake
        double[] t = written(0.0, 0.05, 3_000, 0.001);
        t[1_500] = t[1_499];
        assertNull(EvenGrid.under(t));
    }

    @Test
    void aBlockOfRepeatedRowsIsNoGrid() {
        // coarse writing, but a stretch written five times over is more than rounding gives
        double[] t = written(0.0, 0.05, 3_000, 0.06);
        for (int i = 1_001; i < 1_005; i++) {
            t[i] = t[1_000];
        }
        for (int i = 1_005; i < t.length; i++) {
            t[i] = Math.max(t[i], t[1_000]);
        }
        assertNull(EvenGrid.under(t));
    }

    @Test
    void timesThatRunBackwardsOrTooFewRowsAreNoGrid() {
        double[] t = written(0.0, 0.05, 3_000, 0.06);
        t[2_000] = t[1_990];
        assertNull(EvenGrid.under(t));
        assertNull(EvenGrid.under(written(0.0, 0.05, EvenGrid.MIN_ROWS - 1, 0.06)));
    }

    @Test
    void theReaderTakesTheGridAndSaysSo() throws Exception {
        StringBuilder text = new StringBuilder("Time (min),Signal\n");
        for (int i = 0; i < 2_000; i++) {
            text.append(String.format(Locale.ROOT, "%.3f,%.4f%n", i * 0.05 / 60, Math.sin(i * 0.01)));
        }
        Trace trace = DelimitedTraceReader.parse(text.toString().getBytes(StandardCharsets.UTF_8), "rounded",
                "rounded.csv", null);
        assertEquals(2_000, trace.size());
        for (int i = 0; i < trace.size(); i++) {
            assertEquals(i * 0.05, trace.timeS(i), 0.01, "row " + i);
        }
        assertTrue(trace.readingNote().contains("even grid of 0.05 s"), trace.readingNote());

        // the same table with one time set back is refused as before, naming the line
        String[] lines = text.toString().split("\n");
        lines[1_001] = lines[990];
        InputException e = assertThrows(InputException.class, () -> DelimitedTraceReader.parse(
                String.join("\n", lines).getBytes(StandardCharsets.UTF_8), "back", "back.csv", null));
        assertEquals(1_002, e.line());
        assertTrue(e.problem().contains("is before the previous time"), e.getMessage());
    }
}
