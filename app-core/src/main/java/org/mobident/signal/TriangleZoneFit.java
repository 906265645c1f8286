package org.mobident.signal;

import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.util.Pair;

/**
 * One skewed zone fitted to the samples of a peak as a smoothed triangle: a right triangle,
 * highest at its sharp front and falling linearly to zero over its base L, convolved with a
 * Gaussian of SD σ (diffusion). A strongly overloaded CZE zone takes this form: electromigration
 * dispersion turns one flank into a shock and the other into a straight diffuse flank (Mikkers,
 * Everaerts &amp; Verheggen, J. Chromatogr. 169 (1979) 1). It is the second form, beside the
 * exponentially modified Gaussian ({@link SkewedZoneFit}), against which a peak is judged one zone:
 * an EMG follows a triangle's straight flank badly, and a sum of zones that follows it better
 * would otherwise be taken for two zones.
 *
 * <p><b>Model.</b> {@code f(t) = A·g(s(t − t₀))} with g the unit-area smoothed triangle of
 * {@link ZoneForm#TRIANGLE} (s = +1 tailing, −1 fronting, from the sign of the samples' third
 * moment). The first moment is t₀ + sL/3 (the triangle's centroid; the Gaussian is symmetric); the
 * variance σ² + L²/18 and third central moment s·L³/135 (of the triangular distribution) give the
 * starting values. Parameters (A, t₀, σ, L) by Levenberg–Marquardt with the analytic Jacobian.
 *
 * @param areaTimesS           A, signal units × s
 * @param frontS               t₀, the sharp front, s
 * @param sigmaS               σ, s
 * @param baseS                sL, s, signed (negative: fronting)
 * @param residualSumOfSquares RSS of the fit, signal units²
 * @param points               samples fitted
 */
record TriangleZoneFit(double areaTimesS, double frontS, double sigmaS, double baseS, double residualSumOfSquares,
                       int points) implements OneSkewedZone {

    /** Parameters of the model. */
    static final int PARAMETERS = 4;
    /** The base is kept at least this fraction of the starting σ (a shorter one is a Gaussian). */
    static final double MIN_BASE_FRACTION = 0.1;
    /** Third central moment of a right triangle of base L is L³/135 (triangular distribution). */
    private static final double THIRD_MOMENT_DIVISOR = 135.0;
    /** Variance of a right triangle of base L is L²/18. */
    private static final double VARIANCE_DIVISOR = 18.0;
    /** Caps of one fit. */
    private static final int MAX_EVALUATIONS = 400;
    private static final int MAX_ITERATIONS = 200;

    @Override
    public double firstMomentS() {
        return frontS + baseS / 3;
    }

    @Override
    public double direction() {
        return Math.signum(baseS);
    }

    @Override
    public int parameters() {
        return PARAMETERS;
    }

    /**
     * Fits one smoothed triangle to {@code v[first..last]}.
     *
     * @param t         sample times, s
     * @param v         baseline-corrected signal, peak up
     * @param minSigmaS least σ allowed, s (&gt; 0)
     * @param maxSigmaS largest σ allowed, s
     * @return the fit, or null when the samples show no skew, are too few, or the fit fails
     */
    static TriangleZoneFit fit(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
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
        double[] moments = SkewedZoneFit.positiveMoments(u, target);
        if (moments == null) {
            return null;
        }
        double area = moments[0];
        double m1 = moments[1];
        double m2 = moments[2];
        double m3 = moments[3];
        double sign = Math.signum(m3);
        double base0 = Math.cbrt(THIRD_MOMENT_DIVISOR * Math.abs(m3));
        double sigma0 = Math.sqrt(Math.max(m2 - base0 * base0 / VARIANCE_DIVISOR, 0.25 * m2));
        sigma0 = Math.min(maxSigmaS, Math.max(minSigmaS, sigma0));
        double minBase = MIN_BASE_FRACTION * sigma0;
        base0 = Math.min(span, Math.max(minBase, base0));
        double[] start = {area, m1 - sign * base0 / 3, sigma0, base0};
        ParameterValidator validator = p -> {
            double[] q = p.toArray();
            q[0] = Math.max(Double.MIN_NORMAL, q[0]);
            q[1] = Math.min(2 * span, Math.max(-span, q[1]));
            q[2] = Math.min(maxSigmaS, Math.max(minSigmaS, q[2]));
            q[3] = Math.min(2 * span, Math.max(minBase, q[3]));
            return new ArrayRealVector(q, false);
        };
        LevenbergMarquardt.Solution solution = LevenbergMarquardt.fit(start, model(u, sign), target, validator,
                MAX_EVALUATIONS, MAX_ITERATIONS, false);
        if (solution == null) {
            return null;
        }
        double[] p = solution.point();
        return new TriangleZoneFit(p[0], ref + p[1], p[2], sign * p[3], solution.rss(), n);
    }

    /** The smoothed triangle and its Jacobian at the offsets u (parameters A, t₀, σ, L; direction s fixed). */
    private static MultivariateJacobianFunction model(double[] u, double s) {
        return point -> {
            double[] p = point.toArray();
            double area = p[0];
            double front = p[1];
            double sigma = p[2];
            double size = p[3] / ZoneForm.TRIANGLE_BASE_PER_SIZE;
            int n = u.length;
            double[] value = new double[n];
            double[][] jacobian = new double[n][PARAMETERS];
            double[] g = new double[4];
            for (int i = 0; i < n; i++) {
                ZoneForm.TRIANGLE.evaluate(s * (u[i] - front), sigma, size, g);
                value[i] = area * g[0];
                jacobian[i][0] = g[0];
                jacobian[i][1] = -s * area * g[1];
                jacobian[i][2] = area * g[2];
                jacobian[i][3] = area * g[3] / ZoneForm.TRIANGLE_BASE_PER_SIZE;
            }
            return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
        };
    }
}
