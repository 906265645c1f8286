package org.mobident.signal;

import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.util.Pair;

/**
 * One skewed zone fitted to the samples of a peak: the exponentially modified Gaussian (EMG,
 * Grushka, Anal. Chem. 44 (1972) 1733), a Gaussian of SD σ convolved with an exponential of time
 * constant |τ|, tailing for τ &gt; 0 and mirrored (fronting) for τ &lt; 0. Electromigration
 * dispersion gives a concentrated CZE zone a sharp and a diffuse flank (Mikkers, Everaerts &amp;
 * Verheggen, J. Chromatogr. 169 (1979) 1); the EMG is the usual simple model of such a zone. It
 * serves one question: whether a peak that the curvature shows as two zones (a shoulder) is not
 * rather one skewed zone, whose long flank a sum of Gaussians can only follow with an extra zone.
 *
 * <p><b>Model.</b> With x = s(t − μ), s the sign of τ and a = |τ|:
 * {@code f = A/(2a) · exp(σ²/(2a²) − x/a) · erfc((σ/a − x/σ)/√2)}, evaluated where the erfc argument
 * z is not negative as {@code A/(2a) · exp(−x²/(2σ²)) · erfcx(z)} (erfcx(z) = exp(z²) erfc(z)), which
 * neither overflows nor underflows. A is the area. Parameters (A, μ, σ, τ) by Levenberg–Marquardt
 * (Apache Commons Math) with the analytic Jacobian of {@link ZoneForm#EXPONENTIAL}. The skew
 * direction is fixed from the sign of the third central moment of the samples and a kept at least {@link #MIN_TAU_FRACTION} of the
 * starting σ, so the fit never has to pass through τ = 0, where the form degenerates to a
 * Gaussian. Starting values by the method of moments (Grushka 1972: mean μ + τ, variance σ² + τ²,
 * third central moment 2τ³).
 *
 * @param areaTimesS  A, signal units × s
 * @param centreS     μ, the centre of the Gaussian part, s
 * @param sigmaS      σ, s
 * @param tauS        τ, s, signed (negative: fronting)
 * @param residualSumOfSquares RSS of the fit, signal units²
 * @param points      samples fitted
 */
record SkewedZoneFit(double areaTimesS, double centreS, double sigmaS, double tauS, double residualSumOfSquares,
                     int points) implements OneSkewedZone {

    /** Parameters of the model. */
    static final int PARAMETERS = 4;
    /** |τ| is kept at least this fraction of the starting σ. */
    static final double MIN_TAU_FRACTION = 0.05;
    /** Caps of one fit. */
    private static final int MAX_EVALUATIONS = 400;
    private static final int MAX_ITERATIONS = 200;

    /** The first moment of the zone, μ + τ, s (Grushka 1972). */
    @Override
    public double firstMomentS() {
        return centreS + tauS;
    }

    @Override
    public double direction() {
        return Math.signum(tauS);
    }

    @Override
    public int parameters() {
        return PARAMETERS;
    }

    /**
     * Area, mean, variance and third central moment of the positive part of {@code target} over
     * the offsets {@code u} (trapezoid weights), or null when it has no area, spread or skew.
     */
    static double[] positiveMoments(double[] u, double[] target) {
        int n = u.length;
        double[] w = new double[n];
        double area = 0;
        double m1 = 0;
        for (int i = 0; i < n; i++) {
            double left = i > 0 ? u[i] - u[i - 1] : 0;
            double right = i < n - 1 ? u[i + 1] - u[i] : 0;
            w[i] = 0.5 * (left + right) * Math.max(0.0, target[i]);
            area += w[i];
            m1 += w[i] * u[i];
        }
        if (!(area > 0)) {
            return null;
        }
        m1 /= area;
        double m2 = 0;
        double m3 = 0;
        for (int i = 0; i < n; i++) {
            double d = u[i] - m1;
            m2 += w[i] * d * d;
            m3 += w[i] * d * d * d;
        }
        m2 /= area;
        m3 /= area;
        if (!(m2 > 0) || m3 == 0) {
            return null;
        }
        return new double[] {area, m1, m2, m3};
    }

    /**
     * Fits one EMG to {@code v[first..last]}.
     *
     * @param t         sample times, s
     * @param v         baseline-corrected signal, peak up
     * @param minSigmaS least σ allowed, s (&gt; 0)
     * @param maxSigmaS largest σ allowed, s
     * @return the fit, or null when the samples show no skew, are too few, or the fit fails
     */
    static SkewedZoneFit fit(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
        int n = last - first + 1;
        if (n <= PARAMETERS + 1) {
            return null;
        }
        double ref = t[first];
        double span = t[last] - ref;
        double[] u = new double[n];
        double[] target = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = t[first + i] - ref;
            target[i] = v[first + i];
        }
        double[] moments = positiveMoments(u, target);
        if (moments == null) {
            return null;
        }
        double area = moments[0];
        double m1 = moments[1];
        double m2 = moments[2];
        double m3 = moments[3];
        double sign = Math.signum(m3);
        double tau0 = sign * Math.cbrt(Math.abs(m3) / 2);
        double sigma0 = Math.sqrt(Math.max(m2 - tau0 * tau0, 0.25 * m2));
        sigma0 = Math.min(maxSigmaS, Math.max(minSigmaS, sigma0));
        double minTau = MIN_TAU_FRACTION * sigma0;
        if (Math.abs(tau0) < minTau) {
            tau0 = sign * minTau;
        }
        double[] start = {area, m1 - tau0, sigma0, tau0};
        ParameterValidator validator = p -> {
            double[] q = p.toArray();
            q[0] = Math.max(Double.MIN_NORMAL, q[0]);
            q[1] = Math.min(2 * span, Math.max(-span, q[1]));
            q[2] = Math.min(maxSigmaS, Math.max(minSigmaS, q[2]));
            q[3] = sign * Math.min(span, Math.max(minTau, sign * q[3]));
            return new ArrayRealVector(q, false);
        };
        LevenbergMarquardt.Solution solution = LevenbergMarquardt.fit(start, model(u), target, validator,
                MAX_EVALUATIONS, MAX_ITERATIONS, false);
        if (solution == null) {
            return null;
        }
        double[] p = solution.point();
        double rss = solution.rss();
        return new SkewedZoneFit(p[0], ref + p[1], p[2], p[3], rss, n);
    }

    /** The unit-area EMG g at offset {@code time − centre} ({@link ZoneForm#EXPONENTIAL}); s = sign of τ. */
    static double shape(double offsetS, double sigmaS, double tauS) {
        return ZoneForm.EXPONENTIAL.value(Math.signum(tauS) * offsetS, sigmaS, Math.abs(tauS));
    }

    /** The EMG and its Jacobian at the offsets u (parameters A, μ, σ, τ). */
    private static MultivariateJacobianFunction model(double[] u) {
        return point -> {
            double[] p = point.toArray();
            double area = p[0];
            double mu = p[1];
            double sigma = p[2];
            double tau = p[3];
            double s = Math.signum(tau);
            double a = Math.abs(tau);
            int n = u.length;
            double[] value = new double[n];
            double[][] jacobian = new double[n][PARAMETERS];
            double[] g = new double[4];
            for (int i = 0; i < n; i++) {
                ZoneForm.EXPONENTIAL.evaluate(s * (u[i] - mu), sigma, a, g);
                value[i] = area * g[0];
                jacobian[i][0] = g[0];
                jacobian[i][1] = -s * area * g[1];
                jacobian[i][2] = area * g[2];
                jacobian[i][3] = s * area * g[3];
            }
            return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
        };
    }
}
