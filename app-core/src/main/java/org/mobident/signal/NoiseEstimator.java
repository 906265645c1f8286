package org.mobident.signal;

import org.apache.commons.math3.special.Erf;

/**
 * Baseline noise of a trace.
 *
 * <p><b>Standard deviation.</b> For white noise of SD σ the first differences
 * {@code d_i = y_{i+1} − y_i} have SD σ√2, and slow drift or peaks that span many points
 * barely change them. The noise SD is therefore taken as
 * {@code σ = 1.4826 · MAD(d) / √2}, the median absolute deviation of the differences scaled to a
 * normal SD (Rousseeuw &amp; Croux, J. Am. Stat. Assoc. 88 (1993) 1273) and divided by √2. The
 * medians are found by selection in linear time. Correlated noise (a detector time constant)
 * has smaller differences than its SD, so σ is then a lower estimate.
 *
 * <p><b>Peak-to-peak noise.</b> Ph. Eur. 2.2.46 defines {@code S/N = 2H/h} with {@code h} the
 * range of the background noise over a window of 20 widths at half height (from memory). For
 * white Gaussian noise the expected range of {@code n} independent samples is {@code d₂(n)·σ},
 * with {@code d₂(n) = ∫ [1 − Φ(x)ⁿ − (1 − Φ(x))ⁿ] dx} (Tippett, Biometrika 17 (1925) 364), so
 * this package takes {@code h = d₂(n)·σ} with {@code n} the number of samples in that window:
 * about 5σ for 100 samples and 6.5σ for 1000.
 */
final class NoiseEstimator {

    private static final double SQRT2 = Math.sqrt(2.0);
    /** Integration range of d₂, in SDs: Φ(±10) differs from 0/1 by less than 1e-23. */
    private static final double RANGE_INTEGRAL_LIMIT = 10.0;
    /** Simpson intervals of the d₂ integral (even). */
    private static final int RANGE_INTEGRAL_STEPS = 800;

    private NoiseEstimator() {
    }

    /**
     * Robust noise SD from the first differences, σ = 1.4826 MAD(d)/√2.
     *
     * @param y values (not modified); at least 3
     */
    static double robustSd(double[] y) {
        int all = y.length - 1;
        if (all < 2) {
            return 0.0;
        }
        // Long traces: an evenly strided subset of the differences estimates the same MAD to within
        // about 3 % (its standard error for n = 2,048 normal values) at a fraction of the cost.
        int stride = Math.max(1, all / SignalLimits.SCALE_SAMPLE_CAP);
        int count = all / stride;
        double[] d = new double[count];
        for (int j = 0; j < count; j++) {
            int i = j * stride;
            d[j] = y[i + 1] - y[i];
        }
        double center = Selection.medianInPlace(d.clone(), count);
        for (int i = 0; i < count; i++) {
            d[i] = Math.abs(d[i] - center);
        }
        double mad = Selection.medianInPlace(d, count);
        return SignalLimits.MAD_TO_SD * mad / SQRT2;
    }

    /**
     * The spread of the values between their 0.1 % and 99.9 % quantiles (from an evenly strided
     * subset on long traces): the signal range without the pull of a few wild points.
     *
     * @param y values (not modified); at least 1
     */
    static double robustSpan(double[] y) {
        int stride = Math.max(1, y.length / SignalLimits.SCALE_SAMPLE_CAP);
        int count = y.length / stride;
        double[] s = new double[count];
        for (int j = 0; j < count; j++) {
            s[j] = y[j * stride];
        }
        int lowRank = (int) Math.floor(SignalLimits.SPAN_TAIL_FRACTION * (count - 1));
        int highRank = (count - 1) - lowRank;
        double low = Selection.select(s, 0, count - 1, lowRank);
        double high = Selection.select(s, 0, count - 1, highRank);
        return high - low;
    }

    /**
     * Robust SD of the first {@code count} entries of {@code work} (reordered): 1.4826 times their
     * median absolute deviation from their median (Rousseeuw &amp; Croux 1993). Selection only: linear.
     *
     * @param work  values, reordered and overwritten
     * @param count how many leading entries to use, at least 1
     */
    static double madSdInPlace(double[] work, int count) {
        double centre = Selection.medianInPlace(work, count);
        for (int i = 0; i < count; i++) {
            work[i] = Math.abs(work[i] - centre);
        }
        return SignalLimits.MAD_TO_SD * Selection.medianInPlace(work, count);
    }

    /**
     * Robust SD (1.4826 · MAD about the median) of the values themselves, not of their differences,
     * over the samples that are not {@code excluded}, from an evenly strided subset of at most
     * {@link SignalLimits#NOISE_SAMPLE_CAP} of them. On a baseline-corrected signal with the peaks
     * excluded this is the marginal SD of the noise, right for correlated noise too; 0 when fewer
     * than two samples remain. (When most samples are excluded, the stride leaves fewer than the cap.)
     *
     * @param v        values (not modified)
     * @param excluded samples to leave out, or null for none (not modified)
     */
    static double marginalSd(double[] v, boolean[] excluded) {
        return marginalSd(v, excluded, SignalLimits.NOISE_SAMPLE_CAP);
    }

    /**
     * {@link #marginalSd(double[], boolean[])} from the samples at an even stride that holds at most
     * {@code cap} of them (the excluded ones among them left out).
     */
    static double marginalSd(double[] v, boolean[] excluded, int cap) {
        int stride = Math.max(1, v.length / cap);
        double[] work = new double[(v.length + stride - 1) / stride];
        int m = 0;
        for (int i = 0; i < v.length; i += stride) {
            if (excluded == null || !excluded[i]) {
                work[m++] = v[i];
            }
        }
        return m < 2 ? 0.0 : madSdInPlace(work, m);
    }

    /**
     * Expected range of {@code n} independent standard normal values, d₂(n) (Tippett 1925):
     * exact (Simpson integration, {@link #integratedNormalRange}) up to
     * {@link RangeTable#EXACT_UP_TO}, beyond that interpolated linearly in ln n on a table of
     * exact values whose neighbours are 5 % apart in n (the error is below 1e-4: d₂ bends
     * slowly in ln n). The table is computed once and never modified.
     *
     * @param n sample count ≥ 2
     */
    static double expectedNormalRange(long n) {
        if (n < 2) {
            throw new IllegalArgumentException("a range needs at least two samples, got " + n);
        }
        return RangeTable.value(n);
    }

    /**
     * d₂(n) by Simpson integration of {@code 1 − Φⁿ − (1 − Φ)ⁿ} over ±10 SD.
     *
     * @param n sample count ≥ 2 (a real number: the table interpolates between integers)
     */
    static double integratedNormalRange(double n) {
        double step = 2 * RANGE_INTEGRAL_LIMIT / RANGE_INTEGRAL_STEPS;
        double sum = 0;
        for (int i = 0; i <= RANGE_INTEGRAL_STEPS; i++) {
            double weight = (i == 0 || i == RANGE_INTEGRAL_STEPS) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += weight * (1.0 - Math.pow(NormalGrid.LOWER[i], n) - Math.pow(NormalGrid.UPPER[i], n));
        }
        return sum * step / 3;
    }

    /** d₂(n) tabulated once: every n up to {@link #EXACT_UP_TO}, then a geometric grid in n. */
    private static final class RangeTable {
        /** Sample counts up to this are tabulated one by one. */
        static final int EXACT_UP_TO = 128;
        /** Ratio of neighbouring sample counts in the geometric part. */
        static final double RATIO = 1.05;
        /** Largest count of the geometric part; beyond it d₂ is extrapolated linearly in ln n. */
        static final double LARGEST = 1e8;
        static final double[] EXACT = new double[EXACT_UP_TO + 1];
        static final double[] GRID;

        static {
            for (int n = 2; n <= EXACT_UP_TO; n++) {
                EXACT[n] = integratedNormalRange(n);
            }
            int steps = (int) Math.ceil(Math.log(LARGEST / EXACT_UP_TO) / Math.log(RATIO));
            GRID = new double[steps + 1];
            for (int k = 0; k <= steps; k++) {
                GRID[k] = integratedNormalRange(EXACT_UP_TO * Math.pow(RATIO, k));
            }
        }

        private RangeTable() {
        }

        static double value(long n) {
            if (n <= EXACT_UP_TO) {
                return EXACT[(int) n];
            }
            double x = Math.log((double) n / EXACT_UP_TO) / Math.log(RATIO);
            int k = Math.min((int) Math.floor(x), GRID.length - 2);
            double f = x - k;
            return GRID[k] + f * (GRID[k + 1] - GRID[k]);
        }
    }

    /**
     * Φ(x) and 1 − Φ(x) at the Simpson nodes of the d₂ integral, computed once: the nodes do not
     * depend on n, so each call only raises them to the power n. Never modified after class set-up.
     */
    private static final class NormalGrid {
        static final double[] LOWER = new double[RANGE_INTEGRAL_STEPS + 1];
        static final double[] UPPER = new double[RANGE_INTEGRAL_STEPS + 1];

        static {
            double a = -RANGE_INTEGRAL_LIMIT;
            double step = 2 * RANGE_INTEGRAL_LIMIT / RANGE_INTEGRAL_STEPS;
            for (int i = 0; i <= RANGE_INTEGRAL_STEPS; i++) {
                double x = a + i * step;
                // Φ(x) and 1 − Φ(x) each from erfc, to keep precision in both tails
                UPPER[i] = 0.5 * Erf.erfc(x / SQRT2);
                LOWER[i] = 0.5 * Erf.erfc(-x / SQRT2);
            }
        }

        private NormalGrid() {
        }
    }
}
