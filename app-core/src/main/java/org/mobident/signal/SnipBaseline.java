package org.mobident.signal;

/**
 * Baseline by SNIP clipping (statistics-sensitive non-linear iterative peak clipping: Ryan,
 * Clayton, Griffin, Sie &amp; Cousens, Nucl. Instrum. Methods B 34 (1988) 396), with the
 * clipping window decreasing from the widest to one point (Morháč, Kliman, Matoušek, Veselský
 * &amp; Turzo, Nucl. Instrum. Methods A 401 (1997) 113). One pass with window {@code p} replaces
 * each value by {@code min(v_i, (v_{i−p} + v_{i+p})/2)}: a peak narrower than the window is
 * cut down to the chord under it, a straight or convex baseline is left as it is.
 *
 * <p>Steps, all linear in the number of points:
 * <ol>
 * <li>Decimate: average the samples in time bins of {@code w½/8} ({@code w½} the typical width
 *     at half height, never below the sampling interval). Bins are uniform in time, so irregular
 *     sampling is handled; an empty bin is filled by linear interpolation. Averaging also lowers
 *     the noise the clipping sees.</li>
 * <li>Fill the dips: a morphological closing (moving maximum, then moving minimum, over
 *     ±1 w½; Serra 1982) fills every excursion below the background narrower than about
 *     2 w½ and leaves the peaks and a concave drift as they are (a convex drift is lifted by
 *     about {@code a·w½²}, removed with the re-centring below). Without it the clipping chords
 *     would reach into negative system peaks and pull the baseline down around them.</li>
 * <li>Clip with windows from {@code P} bins down to one, {@code P} reaching {@code 4 w½}, the
 *     window shrinking by √2 from pass to pass (our variant: every integer window, as in
 *     Morháč et al., cuts a concave drift by the sum of all the passes). An isolated Gaussian is
 *     removed entirely once the reach exceeds about 3.5 w½. The ends are extended by odd
 *     reflection so that they are clipped like the interior. About 10 passes over
 *     {@code n·Δt/bin} bins: O(n).</li>
 * <li>Re-centre: clipping a noisy series follows the lower edge of its noise, and a concave
 *     (downward curved) drift {@code a t²} is cut by about {@code |a|·(reach)²}, the same amount
 *     everywhere. Both are removed by adding the trimmed median of the residuals (median of the
 *     residuals within 2.5 noise SDs of the current centre, iterated; common practice): the
 *     noise is symmetric about the true baseline, the peaks are one-sided.</li>
 * <li>Interpolate linearly from the bin centres (mean sample time of each bin) back to every
 *     sample time.</li>
 * </ol>
 * A drift that curves on the scale of the reach is followed, and a cluster of overlapping peaks
 * wider than about twice the reach is cut into.
 */
final class SnipBaseline {

    private SnipBaseline() {
    }

    /**
     * Baseline at every sample.
     *
     * @param timeS            strictly increasing times, s (not modified)
     * @param y                signal (not modified), peaks pointing up
     * @param typicalWidthS    typical width at half height of the peaks, s
     * @param samplingS        typical sampling interval, s
     * @return a new array of baseline values, one per sample
     */
    static double[] estimate(double[] timeS, double[] y, double typicalWidthS, double samplingS) {
        int n = y.length;
        double t0 = timeS[0];
        double span = timeS[n - 1] - t0;
        double binS = Math.max(typicalWidthS / SignalLimits.BASELINE_BINS_PER_WIDTH, samplingS);
        int bins = (int) Math.floor(span / binS) + 1;
        double[] sum = new double[bins];
        double[] timeSum = new double[bins];
        int[] count = new int[bins];
        // times increase, so each bin's samples are consecutive: sum them in registers and store
        // once per bin (the same additions in the same order as summing into the arrays)
        int current = 0;
        double s = 0;
        double ts = 0;
        int c = 0;
        for (int i = 0; i < n; i++) {
            int b = Math.min(bins - 1, (int) ((timeS[i] - t0) / binS));
            if (b != current) {
                sum[current] = s;
                timeSum[current] = ts;
                count[current] = c;
                current = b;
                s = 0;
                ts = 0;
                c = 0;
            }
            s += y[i];
            ts += timeS[i];
            c++;
        }
        sum[current] = s;
        timeSum[current] = ts;
        count[current] = c;
        double[] value = new double[bins];
        double[] centre = new double[bins];
        fillBins(sum, timeSum, count, t0, binS, value, centre);

        int reach = Math.max(1, (int) Math.round(
                SignalLimits.BASELINE_REACH_IN_WIDTHS * typicalWidthS / binS));
        int closingRadius = Math.max(1, (int) Math.round(
                SignalLimits.BASELINE_CLOSING_IN_WIDTHS * typicalWidthS / binS));
        int pad = Math.min(Math.max(reach, closingRadius), bins - 1);
        double[] extended = reflect(value, pad);
        double[] closed = PeakWidthEstimator.movingExtreme(
                PeakWidthEstimator.movingExtreme(extended, closingRadius, true), closingRadius, false);
        double[] base = java.util.Arrays.copyOfRange(clipPasses(closed, reach), pad, pad + bins);
        double offset = residualCentre(value, base);
        for (int b = 0; b < bins; b++) {
            base[b] += offset;
        }
        return interpolate(centre, base, timeS);
    }

    /** Bin means and mean times; empty bins linearly interpolated from their neighbours. */
    private static void fillBins(double[] sum, double[] timeSum, int[] count, double t0, double binS,
                                 double[] value, double[] centre) {
        int bins = sum.length;
        int lastFilled = -1;
        for (int b = 0; b < bins; b++) {
            if (count[b] == 0) {
                continue;
            }
            value[b] = sum[b] / count[b];
            centre[b] = timeSum[b] / count[b];
            if (lastFilled >= 0 && b - lastFilled > 1) {
                for (int e = lastFilled + 1; e < b; e++) {
                    double f = (double) (e - lastFilled) / (b - lastFilled);
                    value[e] = value[lastFilled] + f * (value[b] - value[lastFilled]);
                    centre[e] = t0 + (e + 0.5) * binS;
                }
            }
            lastFilled = b;
        }
    }

    /**
     * SNIP with windows decreasing geometrically, p = reach, reach/√2, reach/2, … 1 (each
     * pass on the result of the previous one), on the series extended at both ends by odd
     * reflection.
     */
    static double[] clip(double[] value, int reach) {
        int pad = Math.min(reach, value.length - 1);
        return java.util.Arrays.copyOfRange(clipPasses(reflect(value, pad), reach), pad, pad + value.length);
    }

    /**
     * The series extended at each end by {@code pad} points of odd reflection through the end
     * value ({@code v₋ₖ = 2v₀ − vₖ}): a straight line continues straight, so the moving windows
     * near the ends see the same trend as in the interior.
     */
    static double[] reflect(double[] value, int pad) {
        int bins = value.length;
        double[] a = new double[bins + 2 * pad];
        System.arraycopy(value, 0, a, pad, bins);
        for (int k = 1; k <= pad; k++) {
            a[pad - k] = 2 * value[0] - value[k];
            a[pad + bins - 1 + k] = 2 * value[bins - 1] - value[bins - 1 - k];
        }
        return a;
    }

    private static double[] clipPasses(double[] series, int reach) {
        int size = series.length;
        double[] a = series.clone();
        double[] next = new double[size];
        int previous = Integer.MAX_VALUE;
        for (double w = Math.min(reach, (size - 1) / 2); w >= 1; w /= WINDOW_RATIO) {
            int p = (int) Math.round(w);
            if (p == previous) {
                continue;
            }
            previous = p;
            System.arraycopy(a, 0, next, 0, size);
            for (int i = p; i < size - p; i++) {
                double chord = 0.5 * (a[i - p] + a[i + p]);
                if (chord < a[i]) {
                    next[i] = chord;
                }
            }
            double[] swap = a;
            a = next;
            next = swap;
        }
        return a;
    }

    /** Ratio of successive clipping windows. Every window from the reach down to one point
     *  would clip a concave drift {@code a t²} by Σ|a|p² ≈ |a|P³/3; halving the window every two
     *  passes bounds the total near 2|a|P², which the re-centring then removes. */
    private static final double WINDOW_RATIO = Math.sqrt(2.0);

    /**
     * Trimmed median of value − base: the level of the noise above the clipped baseline. On long
     * series the trimmed medians are taken of an evenly strided subset of at most
     * {@link SignalLimits#SCALE_SAMPLE_CAP} bins (the median of 2,048 values has a standard error of
     * about 3 % of their SD).
     */
    private static double residualCentre(double[] value, double[] base) {
        int bins = value.length;
        double[] r = new double[bins];
        for (int b = 0; b < bins; b++) {
            r[b] = value[b] - base[b];
        }
        if (bins < 3) {
            return 0.0;
        }
        double sd = NoiseEstimator.robustSd(r);
        double halfRange = SignalLimits.BASELINE_OFFSET_TRIM_SIGMAS * sd;
        int stride = Math.max(1, bins / SignalLimits.SCALE_SAMPLE_CAP);
        int count = (bins + stride - 1) / stride;
        double[] subset = new double[count];
        for (int j = 0; j < count; j++) {
            subset[j] = r[j * stride];
        }
        double centre = Selection.median(subset);
        double[] work = new double[count];
        for (int it = 0; it < SignalLimits.BASELINE_OFFSET_ITERATIONS; it++) {
            int kept = 0;
            for (int j = 0; j < count; j++) {
                if (Math.abs(subset[j] - centre) <= halfRange) {
                    work[kept++] = subset[j];
                }
            }
            if (kept == 0) {
                break;
            }
            centre = Selection.medianInPlace(work, kept);
        }
        return centre;
    }

    /** Linear interpolation of (centre, base) at the given times; constant beyond the ends. */
    private static double[] interpolate(double[] centre, double[] base, double[] timeS) {
        int n = timeS.length;
        int bins = centre.length;
        double[] out = new double[n];
        // the times increase: first those up to the first centre, then bin by bin the times from a
        // centre (inclusive) to the next, then those from the last centre on
        int i = 0;
        while (i < n && timeS[i] <= centre[0]) {
            out[i++] = base[0];
        }
        for (int b = 0; b < bins - 1 && i < n; b++) {
            double from = centre[b];
            double to = centre[b + 1];
            double span = to - from;
            double level = base[b];
            double rise = base[b + 1] - level;
            while (i < n && timeS[i] < to) {
                double f = (timeS[i] - from) / span;
                out[i++] = level + f * rise;
            }
        }
        while (i < n) {
            out[i++] = base[bins - 1];
        }
        return out;
    }
}
