package org.mobident.signal;

import java.util.List;

/**
 * Finds and removes electrical spikes: features one or two samples wide, of either sign, that no
 * migrating zone can produce.
 *
 * <p><b>The test.</b> For every block of one or two neighbouring samples, a parabola in time is
 * fitted by least squares to the two samples beyond each shoulder of the block (four anchors; the
 * block and its two shoulders are left out), and the residuals of the block and of its shoulders
 * from that parabola are taken. A spike is a block that
 * <ol>
 * <li>stands out: every residual of the block has the same sign and at least
 *     {@link SignalLimits#SPIKE_MIN_RESIDUAL_SIGMAS} times the robust SD of the one-sample
 *     residuals over the whole trace (1.4826 · MAD, Rousseeuw &amp; Croux 1993; measured, so
 *     correlated noise needs no model), and</li>
 * <li>has no shoulders: the mean residual of its two shoulders, in the direction of the block, is
 *     at most {@link SignalLimits#SPIKE_SHOULDER_FRACTION} of the block's smaller residual, and</li>
 * <li>holds the largest one-sample residual of its sign within reach (its shoulders and anchors):
 *     a spike among the anchors of a neighbouring block bends that block's parabola, and the clean
 *     samples beside it would otherwise seem to stand out. (Two samples from a spike, where it is an
 *     anchor, the residual has the opposite sign and nine tenths of its size; three samples away,
 *     the same sign and two fifths: worked out from the least-squares weights of the anchors at
 *     ±2 and ±3 samples. So only residuals of the same sign are compared.)</li>
 * </ol>
 * The second condition is about shape alone, so it holds for spikes of any height. A Gaussian zone
 * whose width at half height spans at least two sampling intervals keeps shoulders of at least
 * about a quarter of its top above such a parabola, wherever its apex falls between samples
 * (worked out for apexes on a sample and midway between two); narrower zones are undersampled and
 * cannot be told from a spike by their samples. The parabola follows a baseline, a drift or the
 * flank and top of a zone much wider than the block, so a spike riding on a peak is found as well,
 * and its samples are replaced by the parabola's values: the peak's apex, height and area are then
 * measured as if the spike had not been there. This is the outlier test of a running filter (the
 * Hampel identifier: Hampel, J. Am. Stat. Assoc. 69 (1974) 383; from memory), with a local
 * parabola instead of the window median, so that the tops of narrow zones are not cut, and with
 * the shoulder condition that tells a one- or two-sample glitch from a zone.
 *
 * <p>One pass from left to right (after each spike removed, the few samples before it whose
 * anchors it was are looked at again, so a smaller spike beside a larger one is found too), with a
 * fixed number of operations per sample (fixed weights when
 * the sampling is regular, a 3×3 least-squares solve per tested block otherwise), and the robust
 * scale from an evenly strided subset: linear in the number of points. Times, not indices, enter
 * the parabola, so irregular sampling is handled.
 */
final class SpikeFilter {

    /** Anchor samples on each side of a block (beyond its shoulder). */
    private static final int ANCHORS_PER_SIDE = 2;
    /** Widest block tested, samples. */
    static final int MAX_SPIKE_SAMPLES = 2;
    /** Samples a block needs on each side: its shoulder and the anchors beyond. */
    private static final int REACH = 1 + ANCHORS_PER_SIDE;
    /** A sample is tested only when its screening residual reaches this fraction of the least
     *  residual of a spike: the screen's parabola (or, for irregular sampling, line) differs a little
     *  from a block's, and a two-sample spike's first sample stands out on either. */
    private static final double SCREEN_FRACTION = 0.5;
    /** Sampling is treated as regular when every interval is within this fraction of the first. */
    private static final double REGULAR_RELATIVE = 1e-4;

    private SpikeFilter() {
    }

    /**
     * Removes the spikes of {@code y} in place.
     *
     * @param t times, s, strictly increasing (not modified)
     * @param y signal (modified: spike samples replaced by the local parabola)
     * @return the number of spikes removed
     */
    static int despike(double[] t, double[] y) {
        return despike(t, y, null);
    }

    /**
     * As {@link #despike(double[], double[])}, and adds to {@code touched} (when not null) the first
     * and last sample that each removed spike's replacement rests on: the block and its shoulders and
     * anchors, whose noise the parabola carries into the replaced values.
     */
    static int despike(double[] t, double[] y, List<int[]> touched) {
        int n = y.length;
        if (n < 2 * REACH + MAX_SPIKE_SAMPLES) {
            return 0;
        }
        Parabola parabola = regular(t) ? new Stencils(t[1] - t[0]) : new LeastSquares();
        double scale = residualSd(t, y, parabola);
        if (!(scale > 0)) {
            return 0;
        }
        double minResidual = SignalLimits.SPIKE_MIN_RESIDUAL_SIGMAS * scale;
        double[] r = new double[MAX_SPIKE_SAMPLES + 2];
        double screen = SCREEN_FRACTION * minResidual;
        int removed = 0;
        int i = REACH;
        while (i < n - REACH) {
            // a block of one or two samples starting at i stands out only if sample i does
            if (!(Math.abs(parabola.screen(t, y, i)) >= screen)) {
                i++;
                continue;
            }
            int width = 0;
            for (int w = 1; w <= MAX_SPIKE_SAMPLES && i + w - 1 < n - REACH; w++) {
                if (test(t, y, i, w, minResidual, parabola, r) == Verdict.SPIKE) {
                    width = w;
                    break;
                }
            }
            if (width == 0) {
                i++;
                continue;
            }
            // r holds the block residuals: subtracting them leaves the parabola's values
            for (int k = 0; k < width; k++) {
                y[i + k] -= r[k];
            }
            if (touched != null) {
                touched.add(new int[] {i - REACH, i + width + REACH - 1});
            }
            removed++;
            // the samples just before had this spike among their anchors: look at them again
            i = Math.max(REACH, i - REACH - MAX_SPIKE_SAMPLES + 1);
        }
        return removed;
    }

    /** Outcome of the test of one block: no spike, a spike, or a spike-like block beside a larger
     *  residual (left for when that one is gone). */
    private enum Verdict { NONE, SPIKE, DEFERRED }

    /**
     * True when the block [first, first + width − 1] (one or two samples, the top of a narrow peak
     * that points up) has the shape of a spike whatever its height, as far as the noise lets one
     * tell: its shoulders stand at most {@link SignalLimits#SPIKE_SHOULDER_FRACTION} of its height
     * above the parabola through the anchors, and also so far below the least shoulders of a zone,
     * {@link SignalLimits#SPIKE_ZONE_SHOULDER_FRACTION} of its height, that a zone is rejected at
     * {@link SignalLimits#SPIKE_SHAPE_SIGMAS} standard deviations of the shoulders' noise. A low,
     * barely sampled zone whose shoulders drown in the noise is thus not taken for a spike; a tall
     * spike is.
     *
     * @param noiseSd SD of the noise of {@code y} (white-noise propagation through the parabola
     *                gives the SD of the shoulders' mean residual)
     */
    static boolean looksLikeSpike(double[] t, double[] y, int first, int width, double noiseSd) {
        if (first - REACH < 0 || first + width - 1 + REACH >= y.length) {
            return false;
        }
        double[] r = new double[MAX_SPIKE_SAMPLES + 2];
        if (!new LeastSquares().residuals(t, y, first, width, r)) {
            return false;
        }
        double top = Double.POSITIVE_INFINITY;
        for (int k = 0; k < width; k++) {
            top = Math.min(top, r[k]);
        }
        if (!(top > 0)) {
            return false;
        }
        double shoulders = 0.5 * (r[width] + r[width + 1]);
        double shoulderSd = noiseSd * shoulderNoiseFactor(t, first, width);
        return shoulders <= SignalLimits.SPIKE_SHOULDER_FRACTION * top
                && shoulders <= SignalLimits.SPIKE_ZONE_SHOULDER_FRACTION * top
                        - SignalLimits.SPIKE_SHAPE_SIGMAS * shoulderSd;
    }

    /**
     * SD of the mean shoulder residual per unit SD of white noise: the shoulders' own noise and that
     * of the parabola's values there, a weighted sum of the anchors (variance of a weighted sum of
     * independent samples). The weights are the parabola's responses to each anchor.
     */
    private static double shoulderNoiseFactor(double[] t, int first, int width) {
        double[] unit = new double[t.length];
        double[] r = new double[MAX_SPIKE_SAMPLES + 2];
        LeastSquares fit = new LeastSquares();
        double variance = 0.5; // the mean of two independent shoulder samples: (1 + 1)/4
        for (int k = 0; k < 2 * ANCHORS_PER_SIDE; k++) {
            int j = anchor(first, width, k);
            unit[j] = 1.0;
            fit.residuals(t, unit, first, width, r);
            unit[j] = 0.0;
            double weight = -0.5 * (r[width] + r[width + 1]); // the shoulders are 0: residual = −value
            variance += weight * weight;
        }
        return Math.sqrt(variance);
    }

    private static Verdict test(double[] t, double[] y, int first, int width, double minResidual,
                                Parabola parabola, double[] r) {
        if (!parabola.residuals(t, y, first, width, r)) {
            return Verdict.NONE;
        }
        double sign = Math.signum(r[0]);
        if (!(sign * r[0] >= minResidual)) {
            return Verdict.NONE;
        }
        double top = Double.POSITIVE_INFINITY;
        double largest = 0;
        for (int k = 0; k < width; k++) {
            double v = sign * r[k];
            if (!(v >= minResidual)) {
                return Verdict.NONE;
            }
            top = Math.min(top, v);
            largest = Math.max(largest, v);
        }
        if (!(0.5 * sign * (r[width] + r[width + 1]) <= SignalLimits.SPIKE_SHOULDER_FRACTION * top)) {
            return Verdict.NONE;
        }
        // the block must hold the largest one-sample residual around it: a spike among the anchors
        // of a neighbouring block bends that block's parabola and makes clean samples stand out
        double[] own = new double[MAX_SPIKE_SAMPLES + 2];
        int last = first + width - 1;
        for (int j = Math.max(REACH, first - REACH); j <= Math.min(y.length - 1 - REACH, last + REACH); j++) {
            if (j >= first && j <= last) {
                continue;
            }
            if (parabola.residuals(t, y, j, 1, own) && sign * own[0] > largest) {
                return Verdict.DEFERRED;
            }
        }
        return Verdict.SPIKE;
    }

    private static boolean regular(double[] t) {
        double step = t[1] - t[0];
        double tolerance = REGULAR_RELATIVE * step;
        for (int i = 2; i < t.length; i++) {
            if (Math.abs(t[i] - t[i - 1] - step) > tolerance) {
                return false;
            }
        }
        return true;
    }

    /**
     * Residuals from the anchor parabola of a block: {@code r[0..width−1]} for the block samples,
     * {@code r[width]} for the left shoulder and {@code r[width + 1]} for the right one.
     */
    private interface Parabola {
        boolean residuals(double[] t, double[] y, int first, int width, double[] r);

        /** A cheap look at how far sample i stands from its neighbours, signal units. */
        double screen(double[] t, double[] y, int i);
    }

    /** Index of the k-th anchor (0…3) of the block of {@code width} samples starting at {@code first}. */
    private static int anchor(int first, int width, int k) {
        return k < ANCHORS_PER_SIDE ? first - REACH + k : first + width + 1 + (k - ANCHORS_PER_SIDE);
    }

    /** The general case: a least-squares parabola in time through the anchors of each block. */
    private static final class LeastSquares implements Parabola {
        @Override
        public boolean residuals(double[] t, double[] y, int first, int width, double[] r) {
            double ref = t[first];
            ApexFit.QuadraticSums sums = new ApexFit.QuadraticSums();
            for (int k = 0; k < 2 * ANCHORS_PER_SIDE; k++) {
                int j = anchor(first, width, k);
                sums.add(t[j] - ref, y[j]);
            }
            double[] fit = sums.solve();
            if (fit == null) {
                return false;
            }
            double a = fit[0];
            double b = fit[1];
            double c = fit[2];
            for (int k = 0; k < width + 2; k++) {
                int j = k < width ? first + k : (k == width ? first - 1 : first + width);
                double u = t[j] - ref;
                r[k] = y[j] - (a + u * (b + u * c));
            }
            return true;
        }

        /** Distance of sample i from the straight line through samples i − 2 and i + 2: no solve. */
        @Override
        public double screen(double[] t, double[] y, int i) {
            double f = (t[i] - t[i - 2]) / (t[i + 2] - t[i - 2]);
            return y[i] - (y[i - 2] + f * (y[i + 2] - y[i - 2]));
        }
    }

    /**
     * Regular sampling: the parabola's value at a block or shoulder sample is a fixed weighted sum of
     * the four anchors, so each block costs a few multiplications. Weights per block width: rows for
     * the block samples, then the left and the right shoulder.
     */
    private static final class Stencils implements Parabola {
        private final double[][][] weights = new double[MAX_SPIKE_SAMPLES + 1][][];
        private final double[] oneSample;

        Stencils(double stepS) {
            for (int width = 1; width <= MAX_SPIKE_SAMPLES; width++) {
                int first = REACH;
                double[] times = new double[first + width + REACH];
                for (int i = 0; i < times.length; i++) {
                    times[i] = i * stepS;
                }
                double[][] w = new double[width + 2][2 * ANCHORS_PER_SIDE];
                // the weights are the parabola's response to a unit value at each anchor in turn
                double[] unit = new double[times.length];
                double[] r = new double[MAX_SPIKE_SAMPLES + 2];
                for (int k = 0; k < 2 * ANCHORS_PER_SIDE; k++) {
                    java.util.Arrays.fill(unit, 0.0);
                    unit[anchor(first, width, k)] = 1.0;
                    new LeastSquares().residuals(times, unit, first, width, r);
                    for (int row = 0; row < width + 2; row++) {
                        w[row][k] = -r[row]; // the sample itself is 0, so the residual is −value
                    }
                }
                weights[width] = w;
            }
            oneSample = weights[1][0];
        }

        @Override
        public boolean residuals(double[] t, double[] y, int first, int width, double[] r) {
            double[][] w = weights[width];
            double y0 = y[first - REACH];
            double y1 = y[first - REACH + 1];
            double y2 = y[first + width + 1];
            double y3 = y[first + width + 2];
            for (int k = 0; k < width + 2; k++) {
                int j = k < width ? first + k : (k == width ? first - 1 : first + width);
                double[] row = w[k];
                r[k] = y[j] - (row[0] * y0 + row[1] * y1 + row[2] * y2 + row[3] * y3);
            }
            return true;
        }

        /** The one-sample residual of sample i itself. */
        @Override
        public double screen(double[] t, double[] y, int i) {
            double[] row = oneSample;
            return y[i] - (row[0] * y[i - REACH] + row[1] * y[i - REACH + 1] + row[2] * y[i + 2] + row[3] * y[i + 3]);
        }
    }

    /**
     * Robust SD (1.4826 · MAD about the median) of the one-sample residuals over an evenly strided
     * subset of at most {@link SignalLimits#SCALE_SAMPLE_CAP} samples.
     */
    static double residualSd(double[] t, double[] y) {
        if (y.length < 2 * REACH + MAX_SPIKE_SAMPLES) {
            return 0.0;
        }
        return residualSd(t, y, regular(t) ? new Stencils(t[1] - t[0]) : new LeastSquares());
    }

    private static double residualSd(double[] t, double[] y, Parabola parabola) {
        int first = REACH;
        int last = y.length - 1 - REACH;
        int all = last - first + 1;
        if (all < 2) {
            return 0.0;
        }
        int stride = Math.max(1, all / SignalLimits.SCALE_SAMPLE_CAP);
        int count = (all + stride - 1) / stride;
        double[] values = new double[count];
        double[] r = new double[MAX_SPIKE_SAMPLES + 2];
        int m = 0;
        for (int i = first; i <= last && m < count; i += stride) {
            if (parabola.residuals(t, y, i, 1, r)) {
                values[m++] = r[0];
            }
        }
        if (m < 2) {
            return 0.0;
        }
        double centre = Selection.medianInPlace(values.clone(), m);
        for (int k = 0; k < m; k++) {
            values[k] = Math.abs(values[k] - centre);
        }
        return SignalLimits.MAD_TO_SD * Selection.medianInPlace(values, m);
    }
}
