package org.mobident.library.standards;

import org.apache.commons.math3.distribution.TDistribution;
import org.mobident.Tolerances;

/**
 * Grubbs' test for a single outlier in a normal sample (Grubbs, Technometrics 11 (1969) 1;
 * ASTM E178, "Standard Practice for Dealing With Outlying Observations").
 *
 * <p>Statistic: G = |x* − x̄| / s with x̄ the mean, s the sample standard deviation (n − 1) and x*
 * the value examined: the one farthest from the mean (two-sided), the largest, or the smallest
 * (one-sided). Critical value (ASTM E178; Grubbs &amp; Beck, Technometrics 14 (1972) 847):
 * <pre>
 *   G_crit = ((n − 1)/√n) · √( t² / (n − 2 + t²) )
 * </pre>
 * with t the upper α/(2n) quantile (two-sided) or upper α/n quantile (one-sided) of Student's t
 * distribution with n − 2 degrees of freedom. The value is an outlier when G &gt; G_crit. The test
 * is applied once, to the single most extreme value: ASTM E178 cautions against repeating it on
 * what remains, and with a handful of replicates a second pass has almost no power.
 */
public final class Grubbs {

    /** Which extreme the test examines. */
    public enum Alternative {
        /** The value farthest from the mean, either side: for when no direction is suspected in advance. */
        TWO_SIDED,
        /** Only the largest value (one-sided). */
        LARGEST,
        /** Only the smallest value (one-sided). */
        SMALLEST
    }

    /** The smallest sample the test applies to. */
    public static final int MIN_N = 3;

    private Grubbs() {
    }

    /**
     * The outcome of one test.
     *
     * @param index     index of the examined value in the input
     * @param value     the examined value
     * @param g         its statistic G
     * @param gCritical the critical value
     * @param outlier   G &gt; G_crit
     */
    public record Result(int index, double value, double g, double gCritical, boolean outlier) {
    }

    /**
     * The critical value G_crit (see the class description).
     *
     * @param n           sample size, at least {@value #MIN_N}
     * @param alpha       significance level, 0 &lt; α &lt; 1
     * @param alternative two-sided or one-sided
     */
    public static double criticalValue(int n, double alpha, Alternative alternative) {
        if (n < MIN_N) {
            throw new IllegalArgumentException("the Grubbs test needs at least " + MIN_N + " values, got " + n);
        }
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("alpha must be between 0 and 1, got " + alpha);
        }
        double tail = alternative == Alternative.TWO_SIDED ? alpha / (2.0 * n) : alpha / n;
        TDistribution t = new TDistribution(null, n - 2.0);
        double q = t.inverseCumulativeProbability(1.0 - tail);
        double q2 = q * q;
        return (n - 1) / Math.sqrt(n) * Math.sqrt(q2 / (n - 2 + q2));
    }

    /**
     * Tests the most extreme value of a sample.
     *
     * @param values      the sample (not modified)
     * @param alpha       significance level
     * @param alternative which extreme to examine
     * @return the outcome, or null when the sample has fewer than {@value #MIN_N} values or no spread
     *         beyond rounding (SD at most {@link Tolerances#RELATIVE_EPSILON} times the largest magnitude)
     */
    public static Result test(double[] values, double alpha, Alternative alternative) {
        int n = values.length;
        if (n < MIN_N) {
            return null;
        }
        double mean = ReplicateStatistics.mean(values);
        double sd = ReplicateStatistics.sampleSd(values);
        double scale = 0;
        for (double v : values) {
            scale = Math.max(scale, Math.abs(v));
        }
        if (!(sd > Tolerances.RELATIVE_EPSILON * scale)) {
            return null;
        }
        int pick = 0;
        for (int i = 1; i < n; i++) {
            boolean better = switch (alternative) {
                case TWO_SIDED -> Math.abs(values[i] - mean) > Math.abs(values[pick] - mean);
                case LARGEST -> values[i] > values[pick];
                case SMALLEST -> values[i] < values[pick];
            };
            if (better) {
                pick = i;
            }
        }
        double g = switch (alternative) {
            case TWO_SIDED -> Math.abs(values[pick] - mean) / sd;
            case LARGEST -> (values[pick] - mean) / sd;
            case SMALLEST -> (mean - values[pick]) / sd;
        };
        double crit = criticalValue(n, alpha, alternative);
        return new Result(pick, values[pick], g, crit, g > crit);
    }
}
