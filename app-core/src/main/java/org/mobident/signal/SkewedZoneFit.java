package org.mobident.signal;

import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.util.Pair;

/**
 * One skewed zone fitted to the samples of a peak, in one of the two forms of {@link ZoneForm}:
 * the exponentially modified Gaussian (EMG, Grushka, Anal. Chem. 44 (1972) 1733) of a mildly
 * overloaded zone, or the triangle smoothed by diffusion of a strongly overloaded one.
 * Electromigration dispersion gives a concentrated CZE zone a sharp and a diffuse flank (Mikkers,
 * Everaerts &amp; Verheggen, J. Chromatogr. 169 (1979) 1). The fit serves two questions: whether a
 * peak that the curvature shows as two zones (a shoulder) is not rather one skewed zone, whose long
 * flank a sum of Gaussians can only follow with an extra zone ({@link #closest}); and where the
 * zone's first moment lies, as a check on the moment of its samples ({@link #better}).
 *
 * <p><b>Model.</b> {@code f(t) = A·g(s(t − μ); σ, |τ|)} with g the unit-area form, s the sign of τ
 * (tailing +1, fronting −1), μ the zone's sharp side (the EMG's Gaussian centre, the triangle's
 * front) and |τ| its size, the distance from the sharp side to the first moment μ + τ (the EMG's
 * time constant, a third of the triangle's base). Parameters (A, μ, σ, τ) by Levenberg–Marquardt
 * (Apache Commons Math) with the analytic Jacobian of {@link ZoneForm}. The skew direction is fixed
 * from the sign of the third central moment of the samples and |τ| kept at least
 * {@link #MIN_TAU_FRACTION} of the starting σ, so the fit never has to pass through τ = 0, where
 * the form degenerates to a Gaussian. Starting values by the method of moments: mean μ + τ,
 * variance σ² + v·τ², third central moment c·τ³ (EMG: v = 1, c = 2, Grushka 1972; triangle of base
 * 3|τ|: v = 1/2, c = 1/5, those of the triangular distribution).
 *
 * @param areaTimesS  A, signal units × s
 * @param centreS     μ, the zone's sharp side, s
 * @param sigmaS      σ, s
 * @param tauS        τ, s, signed (negative: fronting)
 * @param residualSumOfSquares RSS of the fit, signal units²
 * @param points      samples fitted
 * @param form        the zone's form
 */
record SkewedZoneFit(double areaTimesS, double centreS, double sigmaS, double tauS, double residualSumOfSquares,
                     int points, ZoneForm form) {

    /** Parameters of the model. */
    static final int PARAMETERS = 4;
    /** |τ| is kept at least this fraction of the starting σ. */
    static final double MIN_TAU_FRACTION = 0.05;
    /** Caps of one fit. */
    private static final int MAX_EVALUATIONS = 400;
    private static final int MAX_ITERATIONS = 200;

    /** The first moment of the zone, μ + τ, s (Grushka 1972 for the EMG; the centroid of the triangle). */
    double firstMomentS() {
        return centreS + tauS;
    }

    /** +1 when the diffuse flank trails (tailing), −1 when it leads (fronting). */
    double direction() {
        return Math.signum(tauS);
    }

    /**
     * p-value of the extra-sum-of-squares F-test of this one zone against a fit of several
     * Gaussian zones to the same samples: the probability of an improvement at least as large if
     * one skewed zone were the truth. The models are not nested, so the test is approximate
     * (Bates &amp; Watts, Nonlinear Regression Analysis and Its Applications, 1988, §3.5; from memory);
     * it is used only to keep a split that the data clearly ask for.
     */
    double pValueAgainst(GaussianClusterFit.Result zones) {
        if (zones.points() != points) {
            throw new IllegalArgumentException("the Gaussian fit must have more parameters on the same samples");
        }
        return GaussianClusterFit.extraParametersPValue(residualSumOfSquares, zones.residualSumOfSquares(),
                zones.parameters() - PARAMETERS, zones.points() - zones.parameters());
    }

    /**
     * The form that describes the zone, fitted to {@code v[first..last]}, or null when neither
     * fits: the triangle when it lowers n·ln(RSS) by at least
     * {@link SignalLimits#TRIANGLE_FORM_MIN_GAIN} (both forms have four parameters), the EMG
     * otherwise. For the zone's first moment.
     */
    static SkewedZoneFit better(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
        return choose(t, v, first, last, minSigmaS, maxSigmaS, true);
    }

    /**
     * Of the two forms fitted to {@code v[first..last]}, the one with the smaller residual, or null
     * when neither fits. Against it a split into several zones is judged: the samples are one zone
     * when either form explains them as well as the split does (two triangles can follow an
     * exponential flank, and two EMGs a straight one).
     */
    static SkewedZoneFit closest(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
        return choose(t, v, first, last, minSigmaS, maxSigmaS, false);
    }

    /** Both forms fitted; the triangle when it is clearly better ({@code preferExponential}) or merely closer. */
    private static SkewedZoneFit choose(double[] t, double[] v, int first, int last, double minSigmaS,
                                        double maxSigmaS, boolean preferExponential) {
        SkewedZoneFit emg = fit(ZoneForm.EXPONENTIAL, t, v, first, last, minSigmaS, maxSigmaS);
        SkewedZoneFit triangle = fit(ZoneForm.TRIANGLE, t, v, first, last, minSigmaS, maxSigmaS);
        if (emg == null || triangle == null) {
            return emg == null ? triangle : emg;
        }
        boolean takeTriangle = preferExponential
                ? clearlyBetter(triangle.residualSumOfSquares, emg.residualSumOfSquares, emg.points)
                : triangle.residualSumOfSquares < emg.residualSumOfSquares;
        return takeTriangle ? triangle : emg;
    }

    /**
     * True when a fit of residual sum of squares {@code rss} beats one of {@code reference} with as
     * many parameters on the same {@code points} by {@link SignalLimits#TRIANGLE_FORM_MIN_GAIN} in
     * n·ln(RSS).
     */
    static boolean clearlyBetter(double rss, double reference, int points) {
        return points * Math.log(reference / rss) >= SignalLimits.TRIANGLE_FORM_MIN_GAIN;
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

    /** Fits one EMG to {@code v[first..last]}; see
     *  {@link #fit(ZoneForm, double[], double[], int, int, double, double)}. */
    static SkewedZoneFit fit(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
        return fit(ZoneForm.EXPONENTIAL, t, v, first, last, minSigmaS, maxSigmaS);
    }

    /**
     * Fits one zone of {@code form} to {@code v[first..last]}.
     *
     * @param t         sample times, s
     * @param v         baseline-corrected signal, peak up
     * @param minSigmaS least σ allowed, s (&gt; 0)
     * @param maxSigmaS largest σ allowed, s
     * @return the fit, or null when the samples show no skew, are too few, or the fit fails
     */
    static SkewedZoneFit fit(ZoneForm form, double[] t, double[] v, int first, int last, double minSigmaS,
                             double maxSigmaS) {
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
        double size0 = Math.cbrt(Math.abs(m3) / form.thirdMomentPerCubedSize());
        double sigma0 = Math.sqrt(Math.max(m2 - form.variancePerSquaredSize() * size0 * size0, 0.25 * m2));
        sigma0 = Math.min(maxSigmaS, Math.max(minSigmaS, sigma0));
        double minTau = MIN_TAU_FRACTION * sigma0;
        double tau0 = sign * Math.max(minTau, size0);
        double[] start = {area, m1 - tau0, sigma0, tau0};
        ParameterValidator validator = p -> {
            double[] q = p.toArray();
            q[0] = Math.max(Double.MIN_NORMAL, q[0]);
            q[1] = Math.min(2 * span, Math.max(-span, q[1]));
            q[2] = Math.min(maxSigmaS, Math.max(minSigmaS, q[2]));
            q[3] = sign * Math.min(span, Math.max(minTau, sign * q[3]));
            return new ArrayRealVector(q, false);
        };
        LevenbergMarquardt.Solution solution = LevenbergMarquardt.fit(start, model(u, form), target, validator,
                MAX_EVALUATIONS, MAX_ITERATIONS, false);
        if (solution == null) {
            return null;
        }
        double[] p = solution.point();
        return new SkewedZoneFit(p[0], ref + p[1], p[2], p[3], solution.rss(), n, form);
    }

    /** The unit-area EMG g at offset {@code time − centre} ({@link ZoneForm#EXPONENTIAL}); s = sign of τ. */
    static double shape(double offsetS, double sigmaS, double tauS) {
        return ZoneForm.EXPONENTIAL.value(Math.signum(tauS) * offsetS, sigmaS, Math.abs(tauS));
    }

    /** One zone of {@code form} and its Jacobian at the offsets u (parameters A, μ, σ, τ). */
    private static MultivariateJacobianFunction model(double[] u, ZoneForm form) {
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
                form.evaluate(s * (u[i] - mu), sigma, a, g);
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
