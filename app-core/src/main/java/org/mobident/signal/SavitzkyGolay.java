package org.mobident.signal;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Savitzky–Golay smoothing: each point is replaced by the value at that point of the
 * least-squares polynomial fitted to the {@code 2m + 1} points around it (Savitzky &amp; Golay,
 * Anal. Chem. 36 (1964) 1627; corrections to their tables: Steinier, Termonia &amp; Deltour,
 * Anal. Chem. 44 (1972) 1906).
 *
 * <p>The weights are computed, not tabulated: with the design matrix {@code X} of the powers
 * {@code u^j} ({@code u = k/m}, {@code k = −m…m}, {@code j = 0…order}), the fitted value at
 * offset {@code r} is {@code x_rᵀ (XᵀX)⁻¹ Xᵀ y}, so the weights are the row
 * {@code x_rᵀ (XᵀX)⁻¹ Xᵀ} (Steinier et al. 1972). The central row ({@code r = 0}) is the
 * classical convolution; the first and last {@code m} points of a series are smoothed with the
 * off-centre rows of the same fit (the polynomial evaluated at the edge point), so the output
 * has the input's length and no edge is left unsmoothed.
 *
 * <p>Derivatives come from the same fit: the d-th derivative of the fitted polynomial at the
 * evaluation point ({@link #derivativeWeights}, {@link #derivative}), the "convolutes" for
 * derivatives that Savitzky &amp; Golay tabulate beside the smoothing ones.
 *
 * <p>The weights assume equally spaced points. On an irregular time axis the smoothing acts on
 * the sample index; the peak measures of this package are taken on times, not on indices.
 *
 * <p>Cost: for polynomial orders up to 3 the central weights are a quadratic in {@code k},
 * {@code w_k = α + β k²} (Savitzky &amp; Golay 1964, quadratic/cubic table), so the smoothed
 * value is {@code α S₀ + β S₂} with running sums {@code S₀ = Σ y}, {@code S₂ = Σ k² y} updated
 * in O(1) per point: the whole series costs O(n) whatever the window. Higher orders use the
 * plain convolution, O(n·m).
 */
public final class SavitzkyGolay {

    private SavitzkyGolay() {
    }

    /**
     * Central convolution weights ({@code 2m + 1} values, offsets −m…m).
     *
     * @param halfWidth m ≥ 1
     * @param order     polynomial order, 0 ≤ order ≤ 2m
     */
    public static double[] weights(int halfWidth, int order) {
        return weights(halfWidth, order, 0);
    }

    /**
     * Weights that give the fitted polynomial at offset {@code position} from the window centre
     * ({@code −m ≤ position ≤ m}); position 0 gives the classical central weights.
     *
     * @param halfWidth m ≥ 1
     * @param order     polynomial order, 0 ≤ order ≤ 2m
     * @param position  offset of the evaluation point, −m…m
     * @return {@code 2m + 1} weights for the points at offsets −m…m
     */
    public static double[] weights(int halfWidth, int order, int position) {
        return projectionRows(halfWidth, order)[position + halfWidth];
    }

    /**
     * Weights that give the {@code derivative}-th derivative, with respect to the sample index,
     * of the fitted polynomial at offset {@code position} from the window centre. Derivative 0
     * gives the smoothing weights of {@link #weights(int, int, int)}.
     *
     * <p>The fitted polynomial is {@code p(u) = Σ c_j u^j} with {@code u = k/m} and
     * {@code c = (XᵀX)⁻¹ Xᵀ y}; its d-th derivative in k at {@code k = r} is
     * {@code m^(−d) Σ_{j ≥ d} j!/(j − d)! c_j (r/m)^(j−d)}, so the weights are that combination
     * of the rows of {@code (XᵀX)⁻¹ Xᵀ} (Savitzky &amp; Golay 1964 tabulate the central rows as
     * "convolutes" for the first to fifth derivatives; Steinier et al. 1972 correct them).
     * Divide the result by {@code Δt^d} for a derivative in time.
     *
     * @param halfWidth  m ≥ 1
     * @param order      polynomial order, 0 ≤ order ≤ 2m
     * @param position   offset of the evaluation point, −m…m
     * @param derivative derivative order, 0 ≤ derivative ≤ order
     * @return {@code 2m + 1} weights for the points at offsets −m…m
     */
    public static double[] derivativeWeights(int halfWidth, int order, int position, int derivative) {
        return derivativeRow(coefficientRows(halfWidth, order), halfWidth, order, position, derivative);
    }

    /** One row of derivative weights from the coefficient rows {@code (XᵀX)⁻¹ Xᵀ}. */
    private static double[] derivativeRow(double[][] coefficients, int halfWidth, int order, int position,
                                          int derivative) {
        if (derivative < 0 || derivative > order) {
            throw new IllegalArgumentException("derivative order must be 0…" + order + ", got " + derivative);
        }
        if (position < -halfWidth || position > halfWidth) {
            throw new IllegalArgumentException("position must be within ±" + halfWidth + ", got " + position);
        }
        int size = 2 * halfWidth + 1;
        double u = (double) position / halfWidth;
        double[] w = new double[size];
        for (int j = derivative; j <= order; j++) {
            double factor = 1.0;
            for (int q = j - derivative + 1; q <= j; q++) {
                factor *= q; // j!/(j − d)!
            }
            factor *= Math.pow(u, j - derivative);
            for (int k = 0; k < size; k++) {
                w[k] += factor * coefficients[j][k];
            }
        }
        double scale = Math.pow(halfWidth, -derivative);
        for (int k = 0; k < size; k++) {
            w[k] *= scale;
        }
        return w;
    }

    /** The rows of {@code (XᵀX)⁻¹ Xᵀ}: row j gives the coefficient of {@code u^j} of the fit. */
    private static double[][] coefficientRows(int halfWidth, int order) {
        RealMatrix design = design(halfWidth, order);
        RealMatrix gram = design.transpose().multiply(design);
        RealMatrix inverse = new LUDecomposition(gram).getSolver().getInverse();
        return inverse.multiply(design.transpose()).getData();
    }

    /** Design matrix of the powers u^j, u = k/m, k = −m…m, j = 0…order, after checking both. */
    private static RealMatrix design(int halfWidth, int order) {
        if (halfWidth < 1) {
            throw new IllegalArgumentException("half-width must be at least 1, got " + halfWidth);
        }
        int size = 2 * halfWidth + 1;
        if (order < 0 || order >= size) {
            throw new IllegalArgumentException("polynomial order must be 0…" + (size - 1)
                    + " for a window of " + size + " points, got " + order);
        }
        double[][] x = new double[size][order + 1];
        for (int k = -halfWidth; k <= halfWidth; k++) {
            double u = (double) k / halfWidth;
            double p = 1.0;
            for (int j = 0; j <= order; j++) {
                x[k + halfWidth][j] = p;
                p *= u;
            }
        }
        return new Array2DRowRealMatrix(x, false);
    }

    /**
     * The {@code derivative}-th derivative of {@code y} with respect to the sample index, from the
     * least-squares polynomial of the {@code 2m + 1} points around each point (the first and last
     * m points from the off-centre rows of the same fit). Divide by {@code Δt^d} for a derivative
     * in time. Even derivatives with orders up to 3 use the running moments (O(n)); odd ones the
     * plain convolution (O(n·m)).
     *
     * @param y          values on equally spaced points (not modified), at least 2m + 1 of them
     * @param halfWidth  m ≥ 1
     * @param order      polynomial order, derivative ≤ order ≤ 2m
     * @param derivative derivative order ≥ 0
     * @return a new array of the same length
     */
    public static double[] derivative(double[] y, int halfWidth, int order, int derivative) {
        int n = y.length;
        int size = 2 * halfWidth + 1;
        if (n < size) {
            throw new IllegalArgumentException("a window of " + size + " points needs at least as many values, got " + n);
        }
        double[][] coefficients = coefficientRows(halfWidth, order);
        double[][] rows = new double[size][];
        for (int r = -halfWidth; r <= halfWidth; r++) {
            rows[r + halfWidth] = derivativeRow(coefficients, halfWidth, order, r, derivative);
        }
        double[] out = new double[n];
        for (int i = 0; i < halfWidth; i++) {
            out[i] = dot(rows[i], y, 0);
            out[n - 1 - i] = dot(rows[size - 1 - i], y, n - size);
        }
        double[] central = rows[halfWidth];
        if (order <= 3 && derivative % 2 == 0 && halfWidth >= SignalLimits.SMOOTHING_MOMENTS_MIN_HALF_WIDTH) {
            smoothCentralByMoments(y, halfWidth, central, out);
        } else {
            for (int i = halfWidth; i < n - halfWidth; i++) {
                out[i] = dot(central, y, i - halfWidth);
            }
        }
        return out;
    }

    /**
     * All rows of the least-squares projection {@code X (XᵀX)⁻¹ Xᵀ}: row {@code r + m} evaluates
     * the fit at offset {@code r}.
     */
    static double[][] projectionRows(int halfWidth, int order) {
        RealMatrix design = design(halfWidth, order);
        RealMatrix gram = design.transpose().multiply(design);
        RealMatrix inverse = new LUDecomposition(gram).getSolver().getInverse();
        RealMatrix hat = design.multiply(inverse).multiply(design.transpose());
        return hat.getData();
    }

    /**
     * Smooths {@code y} (not modified) with a window of {@code 2m + 1} points.
     * When the series is shorter than the window, the window shrinks to fit (and the order
     * with it, so that the fit stays a smoothing).
     *
     * @param y         values on equally spaced points
     * @param halfWidth m ≥ 0 (0 returns a copy)
     * @param order     polynomial order ≥ 0
     * @return a new array of the same length
     */
    public static double[] smooth(double[] y, int halfWidth, int order) {
        int n = y.length;
        int m = Math.min(halfWidth, (n - 1) / 2);
        if (m < 1 || order >= 2 * m) {
            return y.clone();
        }
        double[][] rows = projectionRows(m, order);
        int size = 2 * m + 1;
        double[] out = new double[n];
        for (int i = 0; i < m; i++) {
            out[i] = dot(rows[i], y, 0);
            out[n - 1 - i] = dot(rows[size - 1 - i], y, n - size);
        }
        double[] central = rows[m];
        if (order <= 3 && m >= SignalLimits.SMOOTHING_MOMENTS_MIN_HALF_WIDTH) {
            smoothCentralByMoments(y, m, central, out);
        } else {
            for (int i = m; i < n - m; i++) {
                out[i] = dot(central, y, i - m);
            }
        }
        return out;
    }

    private static double dot(double[] w, double[] y, int from) {
        double s = 0;
        for (int j = 0; j < w.length; j++) {
            s += w[j] * y[from + j];
        }
        return s;
    }

    /** Central points by running sums, valid when the central weights are α + β k² (smoothing
     *  and second derivative with orders up to 3: the odd powers drop out at the centre). */
    private static void smoothCentralByMoments(double[] y, int m, double[] central, double[] out) {
        int n = y.length;
        double alpha = central[m];
        double beta = central[m + 1] - central[m];
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        for (int i = m; i < n - m; i++) {
            if ((i - m) % SignalLimits.SMOOTHING_MOMENTS_REFRESH == 0) {
                s0 = 0;
                s1 = 0;
                s2 = 0;
                for (int k = -m; k <= m; k++) {
                    double v = y[i + k];
                    s0 += v;
                    s1 += k * v;
                    s2 += (double) k * k * v;
                }
            } else {
                // shift the centre from i-1 to i: the point at offset -m leaves, one enters at +m
                double old = y[i - 1 - m];
                double neu = y[i + m];
                double mm = (double) m * m;
                double s0Prev = s0;
                double s1Prev = s1;
                s0 = s0Prev - old + neu;
                s1 = s1Prev + m * old - s0Prev + old + m * neu;
                s2 = s2 - mm * old - 2 * (s1Prev + m * old) + (s0Prev - old) + mm * neu;
            }
            out[i] = alpha * s0 + beta * s2;
        }
    }
}
