package org.mobident.trace.io;

import java.util.Locale;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.mobident.text.NumberText;

/**
 * The even sampling grid under times written with too few decimals.
 *
 * <p>A detector sampled every 0.05 s whose times are exported in minutes to three decimals (steps of
 * 0.06 s) writes some times twice. Those rows are not out of order: their times were rounded. When
 * the written times are what rounding an even grid gives, the grid is the better reading of them: the
 * straight line t = a + b·i through the written times (least squares over the row index, Commons
 * Math's {@link SimpleRegression}) is taken when every written time lies within the rounding of its
 * grid time, i.e. within half the writing step (the smallest rise between two rows) plus the fit's
 * own uncertainty; the writing step is clearly coarser than the grid's step (else rounding could not
 * have made a repeat); and as many rows repeat as rounding gives (every value of the writing step
 * between the first and the last time is written once or more). A row written twice by mistake in a
 * finely written trace, times that run backwards, or a table of fewer than {@link #MIN_ROWS} rows
 * fail this test, and the file is refused as before.
 */
record EvenGrid(double[] timesS, double stepS, double writtenStepS) {

    /** Room for the fit's own uncertainty beyond half the writing step, as a share of that step. */
    private static final double FIT_ROOM = 0.1;

    /** Fewest rows for which a grid is looked for: a short table says too little about its sampling. */
    static final int MIN_ROWS = 50;

    /** The writing step must be at least this much coarser than the grid's step. */
    private static final double MIN_COARSENESS = 1.05;

    /** How far the count of repeated rows may stray from what rounding gives (the two ends, and
     *  floating-point steps read from decimal text). */
    private static final double REPEAT_COUNT_SLACK = 2.0;

    /**
     * The even grid under {@code timesS} (non-decreasing, at least three), or null when the written
     * times are not an even grid rounded.
     */
    static EvenGrid under(double[] timesS) {
        int n = timesS.length;
        if (n < MIN_ROWS) {
            return null;
        }
        double written = Double.POSITIVE_INFINITY;
        int repeats = 0;
        SimpleRegression line = new SimpleRegression();
        for (int i = 0; i < n; i++) {
            line.addData(i, timesS[i]);
            if (i > 0) {
                double rise = timesS[i] - timesS[i - 1];
                if (rise < 0) {
                    return null;
                }
                if (rise > 0) {
                    written = Math.min(written, rise);
                } else {
                    repeats++;
                }
            }
        }
        double step = line.getSlope();
        double start = line.getIntercept();
        if (!(step > 0) || !Double.isFinite(written) || !(written >= MIN_COARSENESS * step)) {
            return null;
        }
        // rounding an even grid to a coarser step writes every value of that step between the first
        // and the last time once or more: so many rows repeat, give or take the two ends
        double distinct = (timesS[n - 1] - timesS[0]) / written + 1;
        if (!(Math.abs(n - distinct - repeats) <= REPEAT_COUNT_SLACK)) {
            return null;
        }
        double tolerance = (0.5 + FIT_ROOM) * written;
        double[] grid = new double[n];
        for (int i = 0; i < n; i++) {
            grid[i] = start + step * i;
            if (!(Math.abs(grid[i] - timesS[i]) <= tolerance)) {
                return null;
            }
        }
        return new EvenGrid(grid, step, written);
    }

    /** The run note: what was written, and how it was read. */
    String describe() {
        return String.format(Locale.ROOT, "the trace's times are written to steps of %s s, coarser than its "
                        + "sampling, so some repeat: read as an even grid of %s s from %s s, which every written "
                        + "time matches to within its rounding; export the time with more decimals to avoid this",
                NumberText.trimmed(writtenStepS, 4, "?"), NumberText.trimmed(stepS, 6, "?"),
                NumberText.trimmed(timesS[0], 4, "?"));
    }
}
