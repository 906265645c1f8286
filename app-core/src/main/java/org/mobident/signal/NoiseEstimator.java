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
        // about 1 % (its standard error for n = 16 384 normal values) at a fraction of the cost.
        int stride = Math.max(1, all / SignalLimits.NOISE_SAMPLE_CAP);
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
        int stride = Math.max(1, y.length / SignalLimits.NOISE_SAMPLE_CAP);
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
     * Expected range of {@code n} independent standard normal values, d₂(n) (Tippett 1925),
     * by Simpson integration of {@code 1 − Φⁿ − (1 − Φ)ⁿ}.
     *
     * @param n sample count ≥ 2
     */
    static double expectedNormalRange(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("a range needs at least two samples, got " + n);
        }
        double step = 2 * RANGE_INTEGRAL_LIMIT / RANGE_INTEGRAL_STEPS;
        double sum = 0;
        for (int i = 0; i <= RANGE_INTEGRAL_STEPS; i++) {
            double weight = (i == 0 || i == RANGE_INTEGRAL_STEPS) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += weight * (1.0 - Math.pow(NormalGrid.LOWER[i], n) - Math.pow(NormalGrid.UPPER[i], n));
        }
        return sum * step / 3;
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
