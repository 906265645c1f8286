package org.mobident.signal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;

/**
 * Least-squares fit of a sum of Gaussian zones to the baseline-corrected samples of one cluster
 * of overlapping peaks, and the test that decides whether more zones are warranted.
 *
 * <p><b>Model.</b> {@code f(t) = Σ_j H_j exp(−(t − t_j)² / (2 s_j²))}, three parameters per
 * zone (height, apex time, standard deviation), fitted to the raw corrected samples by the
 * Levenberg–Marquardt method (Levenberg, Q. Appl. Math. 2 (1944) 164; Marquardt, J. Soc. Ind.
 * Appl. Math. 11 (1963) 431) as implemented by Apache Commons Math
 * ({@link LevenbergMarquardtOptimizer}, a translation of MINPACK's lmder: Moré, in Numerical
 * Analysis, ed. G. A. Watson, Springer LNM 630 (1978) 105). Times are taken relative to the first sample of the cluster so the
 * parameters have comparable sizes. A parameter validator keeps every height positive, every
 * apex inside the cluster and every SD inside the given bounds. The starting heights are the
 * linear least-squares heights for the starting apexes and SD (the model is linear in the
 * heights), floored at a small positive value.
 *
 * <p><b>Uncertainty.</b> The parameter covariance is {@code s² (JᵀJ)⁻¹} at the optimum with
 * {@code s² = RSS/(n − p)}, the residual variance (the usual large-sample approximation of
 * non-linear least squares: Bates &amp; Watts, Nonlinear Regression Analysis and Its Applications,
 * 1988, §2.3; from memory). Using the residual variance rather than the baseline noise makes the
 * standard errors grow when the shape does not fit.
 *
 * <p><b>More zones or fewer.</b> Two nested fits (p₀ &lt; p₁ parameters) of the same n samples
 * are compared by the extra-sum-of-squares F-test,
 * {@code F = ((RSS₀ − RSS₁)/(p₁ − p₀)) / (RSS₁/(n − p₁))} against the F distribution with
 * {@code (p₁ − p₀, n − p₁)} degrees of freedom (Draper &amp; Smith, Applied Regression Analysis,
 * 3rd ed. 1998, §6 "extra sum of squares"; Bates &amp; Watts 1988 §3.5 for its approximate use
 * with non-linear models; from memory).
 */
final class GaussianClusterFit {

    /** √(2π): the area of a Gaussian of unit height and unit SD. */
    static final double SQRT_TWO_PI = Math.sqrt(2 * Math.PI);
    /** Full width at half height per SD of a Gaussian, 2√(2 ln 2). */
    static final double HALF_WIDTH_PER_SIGMA = 2 * Math.sqrt(2 * Math.log(2));

    /** The quadratic term of the crossing equation is dropped when it is this small relative to
     *  the linear one over the apex gap (equal SDs make it vanish). */
    private static final double LINEAR_RELATIVE = 1e-12;
    /** Cap on model evaluations of one fit. */
    private static final int MAX_EVALUATIONS = 2000;
    /** Cap on Levenberg–Marquardt iterations of one fit. */
    private static final int MAX_ITERATIONS = 400;
    /** Starting heights are floored at this fraction of the largest sample of the cluster. */
    private static final double MIN_START_HEIGHT_FRACTION = 0.05;
    /** Heights are kept at least this fraction of the largest sample (a zero height leaves the
     *  apex and SD undetermined and (JᵀJ) singular). */
    private static final double MIN_HEIGHT_FRACTION = 1e-6;

    /**
     * One fitted zone.
     *
     * @param apexTimeS   apex time, s
     * @param apexTimeSdS standard error of the apex time, s
     * @param height      apex height, signal units
     * @param sigmaS      standard deviation of the zone, s
     */
    record Component(double apexTimeS, double apexTimeSdS, double height, double sigmaS) {

        /** Area of the Gaussian, H s √(2π), signal units × s. */
        double area() {
            return height * sigmaS * SQRT_TWO_PI;
        }

        /** Full width at half height, 2√(2 ln 2) s, s. */
        double widthHalfS() {
            return HALF_WIDTH_PER_SIGMA * sigmaS;
        }

        /** Value of this zone at time t. */
        double value(double timeS) {
            double z = (timeS - apexTimeS) / sigmaS;
            return height * Math.exp(-0.5 * z * z);
        }
    }

    /**
     * A converged fit.
     *
     * @param components          zones in order of apex time
     * @param residualSumOfSquares RSS of the fit, signal units²
     * @param points              number of samples fitted
     */
    record Result(List<Component> components, double residualSumOfSquares, int points) {
        Result {
            components = List.copyOf(components);
        }

        int parameters() {
            return 3 * components.size();
        }
    }

    private GaussianClusterFit() {
    }

    /**
     * Fits {@code startApexS.length} Gaussians to {@code v[first..last]}.
     *
     * @param t            sample times, s (not modified)
     * @param v            baseline-corrected signal, peaks up (not modified)
     * @param first        first sample of the cluster (inclusive)
     * @param last         last sample of the cluster (inclusive)
     * @param startApexS   starting apex times, s
     * @param startSigmaS  starting SD of every zone, s
     * @param minSigmaS    smallest SD allowed, s (&gt; 0)
     * @param maxSigmaS    largest SD allowed, s
     * @return the fit, or null when it fails (no convergence, singular, too few samples)
     */
    static Result fit(double[] t, double[] v, int first, int last, double[] startApexS,
                      double startSigmaS, double minSigmaS, double maxSigmaS) {
        int k = startApexS.length;
        int n = last - first + 1;
        if (k == 0 || n <= 3 * k + 1) {
            return null;
        }
        double ref = t[first];
        double span = t[last] - ref;
        double[] u = new double[n];
        double[] target = new double[n];
        double maxValue = window(t, v, first, ref, u, target);
        if (!(maxValue > 0)) {
            return null;
        }
        double sigma0 = Math.min(maxSigmaS, Math.max(minSigmaS, startSigmaS));
        double[] heights = startHeights(u, target, startApexS, ref, sigma0, maxValue);
        if (heights == null) {
            return null;
        }
        double[] start = new double[3 * k];
        for (int j = 0; j < k; j++) {
            start[3 * j] = heights[j];
            start[3 * j + 1] = Math.min(span, Math.max(0, startApexS[j] - ref));
            start[3 * j + 2] = sigma0;
        }
        double minHeight = MIN_HEIGHT_FRACTION * maxValue;
        ParameterValidator validator = p -> {
            double[] q = p.toArray();
            for (int j = 0; j < k; j++) {
                q[3 * j] = Math.max(minHeight, q[3 * j]);
                q[3 * j + 1] = Math.min(span, Math.max(0, q[3 * j + 1]));
                q[3 * j + 2] = Math.min(maxSigmaS, Math.max(minSigmaS, q[3 * j + 2]));
            }
            return new ArrayRealVector(q, false);
        };
        LevenbergMarquardt.Solution solution = LevenbergMarquardt.fit(start, model(u, k), target, validator,
                MAX_EVALUATIONS, MAX_ITERATIONS, true);
        if (solution == null) {
            return null; // no convergence within the caps, or parameters not determined
        }
        double[] p = solution.point();
        double rss = solution.rss();
        double[][] covariance = solution.covariance();
        int dof = n - 3 * k;
        double residualVariance = rss / dof;
        List<Component> components = new ArrayList<>(k);
        for (int j = 0; j < k; j++) {
            double varApex = covariance[3 * j + 1][3 * j + 1] * residualVariance;
            if (!(varApex >= 0) || !Double.isFinite(p[3 * j + 1])) {
                return null;
            }
            components.add(new Component(ref + p[3 * j + 1], Math.sqrt(varApex), p[3 * j], p[3 * j + 2]));
        }
        components.sort(Comparator.comparingDouble(Component::apexTimeS));
        return new Result(components, rss, n);
    }

    /**
     * Fills {@code u} with the times from {@code ref} and {@code target} with the values of the
     * samples from {@code first} on; returns the largest value (0 when none is positive). A method of
     * its own, so that the JIT compiles this loop over the cluster's samples without all of
     * {@link #fit}.
     */
    private static double window(double[] t, double[] v, int first, double ref, double[] u, double[] target) {
        double maxValue = 0;
        for (int i = 0; i < u.length; i++) {
            u[i] = t[first + i] - ref;
            target[i] = v[first + i];
            maxValue = Math.max(maxValue, target[i]);
        }
        return maxValue;
    }

    /**
     * p-value of the extra-sum-of-squares F-test of {@code reduced} (fewer zones) against
     * {@code full} (more zones) on the same samples: the probability of an improvement at least
     * this large if the extra zones were not there.
     */
    static double extraZonesPValue(Result reduced, Result full) {
        if (reduced.points() != full.points()) {
            throw new IllegalArgumentException("fits are not nested on the same samples");
        }
        return extraParametersPValue(reduced.residualSumOfSquares(), full.residualSumOfSquares(),
                full.parameters() - reduced.parameters(), full.points() - full.parameters());
    }

    /**
     * The extra-sum-of-squares F-test: the probability of a fall of the residual sum of squares from
     * {@code rssFewer} to {@code rssMore} at least this large, with {@code extra} more parameters
     * and {@code dof} residual degrees of freedom of the larger fit, if those parameters were not
     * needed (Bates &amp; Watts, Nonlinear Regression Analysis and Its Applications, 1988, §3.5).
     */
    static double extraParametersPValue(double rssFewer, double rssMore, int extra, int dof) {
        if (extra <= 0 || dof <= 0) {
            throw new IllegalArgumentException("the larger fit must have more parameters and residual degrees of freedom");
        }
        double improvement = rssFewer - rssMore;
        if (!(improvement > 0)) {
            return 1.0;
        }
        if (!(rssMore > 0)) {
            return 0.0;
        }
        double f = (improvement / extra) / (rssMore / dof);
        return 1.0 - new FDistribution(extra, dof).cumulativeProbability(f);
    }

    /**
     * Time between two neighbouring zones where the later one starts to dominate: the root in
     * [t₁, t₂] of {@code ln g₁(t) = ln g₂(t)} (a quadratic in t); when the zones do not cross
     * between their apexes (one is far larger), the point that divides [t₁, t₂] in the ratio of
     * their SDs.
     */
    static double dominanceBoundaryS(Component a, Component b) {
        double t1 = a.apexTimeS();
        double t2 = b.apexTimeS();
        double va = a.sigmaS() * a.sigmaS();
        double vb = b.sigmaS() * b.sigmaS();
        // ln Ha − (t − t1)²/(2va) − ln Hb + (t − t2)²/(2vb) = 0, in x = t − t1, d = t2 − t1:
        // x²(1/vb − 1/va)/2 − x d/vb + d²/(2vb) + ln(Ha/Hb) = 0
        double d = t2 - t1;
        double qa = 0.5 * (1 / vb - 1 / va);
        double qb = -d / vb;
        double qc = 0.5 * d * d / vb + Math.log(a.height() / b.height());
        double root = Double.NaN;
        if (Math.abs(qa) * d <= LINEAR_RELATIVE * Math.abs(qb)) {
            root = -qc / qb;
        } else {
            double disc = qb * qb - 4 * qa * qc;
            if (disc >= 0) {
                double q = -0.5 * (qb + Math.copySign(Math.sqrt(disc), qb));
                double r1 = q / qa;
                double r2 = qc / q;
                if (r1 >= 0 && r1 <= d) {
                    root = r1;
                } else if (r2 >= 0 && r2 <= d) {
                    root = r2;
                }
            }
        }
        if (Double.isNaN(root) || root < 0 || root > d) {
            root = d * a.sigmaS() / (a.sigmaS() + b.sigmaS());
        }
        return t1 + root;
    }

    /** Linear least-squares heights for fixed apexes and SD, floored; null when singular. */
    private static double[] startHeights(double[] u, double[] target, double[] apexS, double ref,
                                         double sigma, double maxValue) {
        int n = u.length;
        int k = apexS.length;
        double[][] x = new double[n][k];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < k; j++) {
                double z = (u[i] - (apexS[j] - ref)) / sigma;
                x[i][j] = Math.exp(-0.5 * z * z);
            }
        }
        double[] h;
        try {
            h = new QRDecomposition(new Array2DRowRealMatrix(x, false)).getSolver()
                    .solve(new ArrayRealVector(target, false)).toArray();
        } catch (SingularMatrixException e) {
            return null;
        }
        double floor = MIN_START_HEIGHT_FRACTION * maxValue;
        for (int j = 0; j < k; j++) {
            h[j] = Double.isFinite(h[j]) ? Math.max(floor, h[j]) : floor;
        }
        return h;
    }

    /** The sum of Gaussians and its Jacobian at the sample offsets u. */
    private static MultivariateJacobianFunction model(double[] u, int k) {
        return point -> {
            double[] p = point.toArray();
            int n = u.length;
            double[] value = new double[n];
            double[][] jacobian = new double[n][3 * k];
            for (int j = 0; j < k; j++) {
                double h = p[3 * j];
                double c = p[3 * j + 1];
                double s = p[3 * j + 2];
                for (int i = 0; i < n; i++) {
                    double x = u[i] - c;
                    double z = x / s;
                    double e = Math.exp(-0.5 * z * z);
                    value[i] += h * e;
                    jacobian[i][3 * j] = e;
                    jacobian[i][3 * j + 1] = h * e * x / (s * s);
                    jacobian[i][3 * j + 2] = h * e * x * x / (s * s * s);
                }
            }
            RealVector v = new ArrayRealVector(value, false);
            RealMatrix m = new Array2DRowRealMatrix(jacobian, false);
            return new Pair<>(v, m);
        };
    }
}
