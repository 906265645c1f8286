package org.mobident.signal;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Tops cut flat by a saturated detector or converter, and their repair from the flanks.
 *
 * <p>A detector driven beyond its range (too much sample, too little dilution) records the same
 * largest value for every sample over a zone's top. Left as it is, the flat top reads as two zones
 * (its two edges curve like two apexes), its height and area are too small and its apex time is
 * wherever the noise-free plateau happens to end. A plateau is taken for saturation when at least
 * {@link SignalLimits#FLAT_TOP_MIN_SAMPLES} consecutive samples carry exactly the trace's largest
 * value (after the trace is turned peaks-up), and that value stands far above the trace's median.
 *
 * <p>The unsaturated flanks on both sides are then fitted by a bi-Gaussian on a constant,
 * {@code y = c + A exp(−(t − μ)²/(2s²))} with its own {@code s} on each side of {@code μ} (zones
 * dispersed by their own concentration rise on one side and fall steeply on the other; the
 * bi-Gaussian follows both: Buys &amp; de Clerk, Anal. Chem. 44 (1972) 1273, from memory), by
 * Levenberg–Marquardt, and the plateau is replaced by the fitted curve (never below the cut level):
 * the usual way to estimate the top of a clipped peak from
 * its flanks (censored data: the samples at the cut carry only "at least this much"). A fit that puts
 * its centre outside the plateau, does not rise clearly above the cut (a coarse converter repeats a
 * true apex's value without any cut), or extrapolates the height more than
 * {@link SignalLimits#FLAT_TOP_MAX_RISE} times the cut's height is not used, and the plateau is left
 * as it is. The run is told of every repaired top: a saturated zone's height and area are
 * estimates, and its centre carries the fit's uncertainty.
 */
final class FlatTops {

    private FlatTops() {
    }

    /**
     * Finds the saturated plateaus of {@code y} (peaks up) and replaces each, where its flanks allow,
     * by the flank fit.
     *
     * @param t strictly increasing times, s
     * @param y signal, peaks up; modified in place
     * @return the plateaus in time order (empty for most traces)
     */
    static List<FlatTop> repair(double[] t, double[] y) {
        int n = y.length;
        if (n < 4 * SignalLimits.FLAT_TOP_MIN_SAMPLES) {
            return List.of();
        }
        double top = y[0];
        for (int i = 1; i < n; i++) {
            if (y[i] > top) {
                top = y[i];
            }
        }
        List<int[]> plateaus = plateaus(y, top, n / SignalLimits.FLAT_TOP_MAX_SHARE_DIVISOR);
        if (plateaus.isEmpty()) {
            return List.of();
        }
        double median = Selection.stridedMedian(y, 0, n, SignalLimits.SCALE_SAMPLE_CAP);
        double spread = NoiseEstimator.robustSd(y);
        if (!(top - median > SignalLimits.FLAT_TOP_MIN_RISE_SIGMAS * spread)) {
            return List.of();
        }
        List<FlatTop> out = new ArrayList<>(plateaus.size());
        for (int k = 0; k < plateaus.size(); k++) {
            int a = plateaus.get(k)[0];
            int b = plateaus.get(k)[1];
            int length = b - a + 1;
            int reach = Math.max(SignalLimits.FLAT_TOP_MIN_FLANK_SAMPLES,
                    (int) Math.ceil(SignalLimits.FLAT_TOP_FLANK_IN_PLATEAUS * length));
            int lo = falling(y, a, -1, Math.max(k > 0 ? plateaus.get(k - 1)[1] + 1 : 0, a - reach), spread);
            int hi = falling(y, b, +1, Math.min(k + 1 < plateaus.size() ? plateaus.get(k + 1)[0] - 1 : n - 1,
                    b + reach), spread);
            double[] fit = a - lo >= SignalLimits.FLAT_TOP_MIN_FLANK_SAMPLES
                    && hi - b >= SignalLimits.FLAT_TOP_MIN_FLANK_SAMPLES ? flankFit(t, y, lo, a, b, hi, top, spread) : null;
            if (fit == null) {
                continue; // not shown to be a cut top: left as it is
            }
            double c = fit[0];
            double amplitude = fit[1];
            double mu = fit[2];
            for (int i = a; i <= b; i++) {
                double u = (t[i] - mu) / (t[i] < mu ? fit[3] : fit[4]);
                y[i] = Math.max(top, c + amplitude * Math.exp(-0.5 * u * u));
            }
            out.add(new FlatTop(t[a], t[b], mu, fit[5]));
        }
        return List.copyOf(out);
    }

    /**
     * The last index of the flank that falls from the plateau edge {@code edge} in direction
     * {@code step} (±1), no further than {@code limit}: the flank ends where the signal rises again
     * by more than the noise allows above its lowest value so far (a neighbouring zone begins).
     */
    private static int falling(double[] y, int edge, int step, int limit, double noiseSd) {
        double lowest = y[edge];
        double rise = SignalLimits.FLAT_TOP_FLANK_RISE_SIGMAS * noiseSd;
        int last = edge;
        for (int i = edge + step; step < 0 ? i >= limit : i <= limit; i += step) {
            if (y[i] > lowest + rise) {
                break;
            }
            lowest = Math.min(lowest, y[i]);
            last = i;
        }
        return last;
    }

    /** Maximal runs of at least the minimum length at {@code top}, none longer than {@code longest}. */
    private static List<int[]> plateaus(double[] y, double top, int longest) {
        List<int[]> found = new ArrayList<>(2);
        int n = y.length;
        int i = 0;
        while (i < n) {
            if (y[i] != top) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < n && y[j + 1] == top) {
                j++;
            }
            int length = j - i + 1;
            if (length >= SignalLimits.FLAT_TOP_MIN_SAMPLES) {
                if (length > longest) {
                    return List.of(); // a flat stretch this long is a dead or idle signal, not a cut top
                }
                found.add(new int[] {i, j});
            }
            i = j + 1;
        }
        return found;
    }

    /**
     * The bi-Gaussian-on-a-constant fit of the flanks [lo, a) and (b, hi]: {c, A, μ, s_left, s_right,
     * sd(μ)}, or null when it fails or is implausible.
     */
    private static double[] flankFit(double[] t, double[] y, int lo, int a, int b, int hi, double top,
                                     double noiseSd) {
        int left = a - lo;
        int m = left + (hi - b);
        double[] ts = new double[m];
        double[] ys = new double[m];
        for (int i = lo, j = 0; i <= hi; i++) {
            if (i < a || i > b) {
                ts[j] = t[i];
                ys[j++] = y[i];
            }
        }
        double base = Double.POSITIVE_INFINITY;
        for (double v : ys) {
            base = Math.min(base, v);
        }
        double cut = top - base;
        if (!(cut > 0)) {
            return null;
        }
        double halfPlateau = 0.5 * (t[b] - t[a]) + 0.5 * (t[Math.min(b + 1, t.length - 1)] - t[b]);
        // a start that reaches twice the cut's height at the centre and the cut at the plateau's edges
        double s0 = halfPlateau / Math.sqrt(2 * Math.log(2));
        double[] start = {base, 2 * cut, 0.5 * (t[a] + t[b]), s0, s0};
        double floorS = 1e-6 * Math.max(halfPlateau, 1e-9);
        MultivariateJacobianFunction model = p -> {
            double[] value = new double[m];
            double[][] jacobian = new double[m][5];
            for (int i = 0; i < m; i++) {
                int side = ts[i] < p.getEntry(2) ? 3 : 4;
                double sd = p.getEntry(side);
                double u = (ts[i] - p.getEntry(2)) / sd;
                double g = Math.exp(-0.5 * u * u);
                value[i] = p.getEntry(0) + p.getEntry(1) * g;
                jacobian[i][0] = 1;
                jacobian[i][1] = g;
                jacobian[i][2] = p.getEntry(1) * g * u / sd;
                jacobian[i][side] = p.getEntry(1) * g * u * u / sd;
            }
            return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
        };
        LevenbergMarquardt.Solution fit = LevenbergMarquardt.fit(start, model, ys,
                p -> {
                    double[] q = p.toArray();
                    q[3] = Math.max(Math.abs(q[3]), floorS);
                    q[4] = Math.max(Math.abs(q[4]), floorS);
                    return new ArrayRealVector(q, false);
                },
                SignalLimits.FLAT_TOP_MAX_EVALUATIONS, SignalLimits.FLAT_TOP_MAX_EVALUATIONS, true);
        if (fit == null || m <= 5) {
            return null;
        }
        double[] p = fit.point();
        double c = p[0];
        double amplitude = p[1];
        double mu = p[2];
        double variance = fit.rss() / (m - 5);
        double muSd = Math.sqrt(Math.max(0.0, fit.covariance()[2][2] * variance));
        return new double[] {c, amplitude, mu, Math.abs(p[3]), Math.abs(p[4]),
                Double.isFinite(muSd) ? muSd : 0.5 * (t[b] - t[a])};
    }
}
