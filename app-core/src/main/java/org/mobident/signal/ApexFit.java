package org.mobident.signal;

/**
 * Apex time and height of one peak, refined between samples, with the standard uncertainty of
 * the apex time.
 *
 * <p><b>Model.</b> The top of the peak (the contiguous samples around the highest smoothed
 * sample down to half of it) is fitted, on the raw baseline-corrected data, by a parabola in
 * the logarithm, {@code ln y = a + b u + c u²} with {@code u = (t − t_ref)/s}: exact for a
 * Gaussian (Caruana, Searle &amp; Shupack, Anal. Chem. 60 (1988) 1896; from memory). The noise of {@code ln y}
 * is {@code σ/y}, so each point carries the weight {@code y²/σ²} (Guo, IEEE Signal Process. Mag.
 * 28(5) (2011) 134; from memory), with {@code y} taken from the smoothed signal so the weights do not carry
 * the noise. Apex {@code u₀ = −b/(2c)}, height {@code exp(a + b u₀ + c u₀²)}. Times, not indices,
 * are used throughout, so irregular sampling needs no special case. When a point of the top is
 * not positive the same fit is made on {@code y} itself (a plain parabola, weights 1/σ²); when
 * neither gives a maximum inside the fitted span the apex is the highest smoothed sample.
 *
 * <p><b>Uncertainty.</b> With weights equal to inverse variances, the covariance of
 * {@code (a, b, c)} is {@code (XᵀWX)⁻¹} (weighted least squares, e.g. Bevington &amp; Robinson,
 * Data Reduction and Error Analysis, 3rd ed. 2003, ch. 7). First-order propagation through
 * {@code u₀ = −b/(2c)} gives
 * {@code Var(u₀) = gᵀ C_bc g} with {@code g = (−1/(2c), b/(2c²))}, and {@code sd(t₀) = s·√Var(u₀)}.
 * The estimate thus grows with the noise SD, falls with the height, grows with the peak width
 * (a flatter top) and falls with the number of samples across the top (the sampling). It
 * assumes white noise and ignores the baseline error (a constant offset does not move a
 * symmetric apex). When the residuals show that the top is not the assumed shape, the result
 * is scaled by √(χ²/ν) (see {@link #lackOfFit}). A Monte Carlo test checks its size against
 * the scatter of repeated fits.
 *
 * @param apexTimeS   apex time, s
 * @param height      apex height above the baseline, signal units
 * @param apexTimeSdS standard uncertainty of the apex time, s
 */
record ApexFit(double apexTimeS, double height, double apexTimeSdS) {

    /**
     * @param timeS     sample times, s
     * @param raw       baseline-corrected signal, peak up
     * @param smooth    smoothed baseline-corrected signal, peak up
     * @param apex      index of the highest smoothed sample of the peak
     * @param first     first index of the peak (inclusive)
     * @param last      last index of the peak (inclusive)
     * @param noiseSd   noise SD of {@code raw}, &gt; 0
     */
    static ApexFit fit(double[] timeS, double[] raw, double[] smooth, int apex, int first, int last,
                       double noiseSd) {
        double level = SignalLimits.APEX_FIT_LEVEL * smooth[apex];
        int lo = apex;
        while (lo > first && smooth[lo - 1] >= level) {
            lo--;
        }
        int hi = apex;
        while (hi < last && smooth[hi + 1] >= level) {
            hi++;
        }
        // at least one neighbour on each side, inside the peak
        lo = Math.min(lo, Math.max(first, apex - 1));
        hi = Math.max(hi, Math.min(last, apex + 1));
        ApexFit fallback = new ApexFit(timeS[apex], smooth[apex], samplingSd(timeS, apex));
        if (hi - lo < 2) {
            return fallback;
        }
        boolean positive = true;
        for (int i = lo; i <= hi; i++) {
            if (!(raw[i] > 0 && smooth[i] > 0)) {
                positive = false;
                break;
            }
        }
        ApexFit fitted = positive ? quadratic(timeS, raw, smooth, apex, lo, hi, noiseSd, true) : null;
        if (fitted == null) {
            fitted = quadratic(timeS, raw, smooth, apex, lo, hi, noiseSd, false);
        }
        return fitted != null ? fitted : fallback;
    }

    /** Half a sampling interval's uniform spread, Δt/√12, around a sample taken as the apex. */
    private static double samplingSd(double[] t, int i) {
        int a = Math.max(0, i - 1);
        int b = Math.min(t.length - 1, i + 1);
        return 0.5 * (t[b] - t[a]) / Math.sqrt(12.0);
    }

    private static ApexFit quadratic(double[] t, double[] raw, double[] smooth, int apex, int lo, int hi,
                                     double noiseSd, boolean logarithmic) {
        double ref = t[apex];
        double scale = 0.5 * (t[hi] - t[lo]);
        double variance = noiseSd * noiseSd;
        // weighted normal equations: sums of w u^k (k = 0…4) and w u^k z (k = 0…2)
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0, z0 = 0, z1 = 0, z2 = 0;
        for (int i = lo; i <= hi; i++) {
            double u = (t[i] - ref) / scale;
            double w;
            double z;
            if (logarithmic) {
                w = smooth[i] * smooth[i] / variance;
                z = Math.log(raw[i]);
            } else {
                w = 1.0 / variance;
                z = raw[i];
            }
            double u2 = u * u;
            s0 += w;
            s1 += w * u;
            s2 += w * u2;
            s3 += w * u2 * u;
            s4 += w * u2 * u2;
            z0 += w * z;
            z1 += w * u * z;
            z2 += w * u2 * z;
        }
        double[][] inv = inverseSymmetric3(s0, s1, s2, s3, s4);
        if (inv == null) {
            return null;
        }
        double a = inv[0][0] * z0 + inv[0][1] * z1 + inv[0][2] * z2;
        double b = inv[1][0] * z0 + inv[1][1] * z1 + inv[1][2] * z2;
        double c = inv[2][0] * z0 + inv[2][1] * z1 + inv[2][2] * z2;
        if (!(c < 0)) {
            return null;
        }
        double u0 = -b / (2 * c);
        double uLo = (t[lo] - ref) / scale;
        double uHi = (t[hi] - ref) / scale;
        if (!(u0 >= uLo && u0 <= uHi)) {
            return null;
        }
        double top = a + b * u0 + c * u0 * u0;
        double height = logarithmic ? Math.exp(top) : top;
        double gb = -1.0 / (2 * c);
        double gc = b / (2 * c * c);
        double varU0 = gb * gb * inv[1][1] + 2 * gb * gc * inv[1][2] + gc * gc * inv[2][2];
        double sd = scale * Math.sqrt(Math.max(0.0, varU0)) * lackOfFit(t, raw, smooth, lo, hi, ref, scale,
                variance, logarithmic, a, b, c);
        return new ApexFit(ref + scale * u0, height, sd);
    }

    /**
     * √(χ²/ν) of the fit when above 1, else 1: when the top is not the assumed shape (a tailing
     * zone, an unresolved neighbour) the residuals exceed the noise and the parameter uncertainty
     * is scaled up by the square root of the reduced chi-square (Bevington &amp; Robinson, Data
     * Reduction and Error Analysis, 3rd ed. 2003, §8.1). A white-noise Gaussian top gives χ²/ν ≈ 1
     * and keeps its noise-only uncertainty.
     */
    private static double lackOfFit(double[] t, double[] raw, double[] smooth, int lo, int hi, double ref,
                                    double scale, double variance, boolean logarithmic, double a, double b,
                                    double c) {
        int dof = hi - lo + 1 - 3;
        if (dof < 1) {
            return 1.0;
        }
        double chi2 = 0;
        for (int i = lo; i <= hi; i++) {
            double u = (t[i] - ref) / scale;
            double model = a + b * u + c * u * u;
            double w = logarithmic ? smooth[i] * smooth[i] / variance : 1.0 / variance;
            double z = logarithmic ? Math.log(raw[i]) : raw[i];
            chi2 += w * (z - model) * (z - model);
        }
        return Math.max(1.0, Math.sqrt(chi2 / dof));
    }

    /**
     * The sums of an unweighted least-squares parabola a + b·u + c·u², filled point by point
     * ({@link #add}) and solved once ({@link #solve}); one per fit, not shared.
     */
    static final class QuadraticSums {
        private double s0;
        private double s1;
        private double s2;
        private double s3;
        private double s4;
        private double z0;
        private double z1;
        private double z2;

        void add(double u, double v) {
            double u2 = u * u;
            s0 += 1;
            s1 += u;
            s2 += u2;
            s3 += u2 * u;
            s4 += u2 * u2;
            z0 += v;
            z1 += u * v;
            z2 += u2 * v;
        }

        /** {a, b, c} of the least-squares parabola, or null when the normal equations are singular. */
        double[] solve() {
            double[][] inv = inverseSymmetric3(s0, s1, s2, s3, s4);
            if (inv == null) {
                return null;
            }
            double[] c = new double[3];
            for (int r = 0; r < 3; r++) {
                c[r] = inv[r][0] * z0 + inv[r][1] * z1 + inv[r][2] * z2;
            }
            return c;
        }
    }

    /** Inverse of [[s0,s1,s2],[s1,s2,s3],[s2,s3,s4]] by cofactors, or null when singular. */
    static double[][] inverseSymmetric3(double s0, double s1, double s2, double s3, double s4) {
        double c00 = s2 * s4 - s3 * s3;
        double c01 = -(s1 * s4 - s2 * s3);
        double c02 = s1 * s3 - s2 * s2;
        double c11 = s0 * s4 - s2 * s2;
        double c12 = -(s0 * s3 - s1 * s2);
        double c22 = s0 * s2 - s1 * s1;
        double det = s0 * c00 + s1 * c01 + s2 * c02;
        double scaleOfDet = Math.abs(s0 * s2 * s4) + Math.abs(s1 * s1 * s4) + Math.abs(s2 * s2 * s2);
        if (!(Math.abs(det) > SINGULAR_RELATIVE * scaleOfDet)) {
            return null;
        }
        return new double[][] {
            {c00 / det, c01 / det, c02 / det},
            {c01 / det, c11 / det, c12 / det},
            {c02 / det, c12 / det, c22 / det}};
    }

    /** A 3×3 determinant this small relative to its terms is treated as singular. */
    private static final double SINGULAR_RELATIVE = 1e-12;
}
