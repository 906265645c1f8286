package org.mobident.signal;

import java.util.Arrays;

/**
 * Typical full width at half height of the peaks of a trace, before any baseline is known; it
 * sets the smoothing window, the baseline reach, the spike limit and the noise window.
 *
 * <p>Steps, all linear: a light 5-point quadratic Savitzky–Golay smoothing; removal of the
 * slow background by a morphological top-hat (the signal minus its opening, i.e. a moving
 * minimum followed by a moving maximum over 5 % of the trace duration: Serra, Image Analysis
 * and Mathematical Morphology, 1982), computed with the van Herk / Gil–Werman block algorithm; then every excursion (a
 * run of points above 3 smoothed-noise SDs) whose maximum rises more than 10 smoothed-noise
 * SDs is measured at half its maximum by linear
 * interpolation between samples. The smoothed-noise SD is the white-noise value σ√(Σw²) or, when
 * larger, the robust SD (1.4826 · MAD) of the top-hat series itself: correlated noise passes the
 * light smoothing almost unchanged and is understated by first differences, and without the
 * measured value its excursions would be taken for peaks and the width for the noise's own. When there is no such excursion, those below the background
 * (the closing minus the signal) are measured instead: the width scale of a run does not depend
 * on the sign of its zones, and the baseline must know the width of dips as well. Excursions
 * below are only a fallback because, beside a large peak on a sloping background, the closing
 * leaves a step of about slope × window that would pass for a broad dip. Excursions narrower than 3 sampling intervals are taken for
 * spikes. The result is the median of the widths (an overlapped pair counts as one wider
 * excursion, which the median tolerates); with no excursion it falls back to 10 sampling
 * intervals.
 */
final class PeakWidthEstimator {

    private static final int LIGHT_HALF_WIDTH = 2;
    private static final int LIGHT_ORDER = 2;

    private PeakWidthEstimator() {
    }

    /**
     * @param timeS     strictly increasing times, s (not modified)
     * @param y         signal with peaks pointing up (not modified)
     * @param noiseSd   noise SD of y
     * @param samplingS typical sampling interval, s
     * @return typical width at half height, s
     */
    static double typicalWidthS(double[] timeS, double[] y, double noiseSd, double samplingS) {
        int n = y.length;
        double[] light = SavitzkyGolay.smooth(y, LIGHT_HALF_WIDTH, LIGHT_ORDER);
        double gain = Math.sqrt(sumOfSquares(SavitzkyGolay.weights(LIGHT_HALF_WIDTH, LIGHT_ORDER)));
        double span = timeS[n - 1] - timeS[0];
        int radius = Math.max(1, (int) Math.round(
                0.5 * SignalLimits.TOPHAT_FRACTION_OF_SPAN * span / samplingS));
        // extended by odd reflection, so that a sloping background has no step at the ends
        int pad = Math.min(2 * radius, n - 1);
        double[] extended = SnipBaseline.reflect(light, pad);
        double[] opening = morphological(extended, radius, false);
        double[] excursion = new double[n];
        for (int i = 0; i < n; i++) {
            excursion[i] = light[i] - opening[i + pad]; // rise above the background
        }
        // the noise of the light smoothing: its white-noise value, or the spread of the top-hat
        // itself when that is larger (correlated noise is barely lowered by a 5-point smoothing, and
        // its first differences understate it)
        double lightNoise = Math.max(noiseSd * gain, NoiseEstimator.marginalSd(excursion, null, SignalLimits.SCALE_SAMPLE_CAP));
        double threshold = SignalLimits.WIDTH_ESTIMATE_MIN_SIGMAS * lightNoise;
        double minWidth = SignalLimits.WIDTH_ESTIMATE_MIN_SAMPLES * samplingS;
        double[] widths = new double[16];
        int[] found = {0};
        widths = collectWidths(timeS, excursion, threshold, minWidth, widths, found);
        if (found[0] == 0) {
            // the closing is only needed for the fallback, so it is only computed then
            double[] closing = morphological(extended, radius, true);
            for (int i = 0; i < n; i++) {
                excursion[i] = closing[i + pad] - light[i]; // fall below the background
            }
            widths = collectWidths(timeS, excursion, threshold, minWidth, widths, found);
        }
        if (found[0] == 0) {
            return SignalLimits.FALLBACK_WIDTH_SAMPLES * samplingS;
        }
        return Selection.medianInPlace(widths, found[0]);
    }

    /**
     * Opening (minimum then maximum; {@code closing} false) or closing (maximum then minimum) over
     * [i − r, i + r]. On long series the two passes run on block extremes of
     * {@link SignalLimits#MORPHOLOGY_MAX_BLOCKS} blocks at most and the result is interpolated
     * linearly between the block centres: the background it describes varies over 5 % of the run,
     * so a block of a few samples changes it by nothing that matters, and the cost drops by the
     * block length.
     */
    static double[] morphological(double[] x, int radius, boolean closing) {
        int n = x.length;
        int k = Math.max(1, n / SignalLimits.MORPHOLOGY_MAX_BLOCKS);
        if (k == 1 || radius < 2 * k) {
            return movingExtreme(movingExtreme(x, radius, closing), radius, !closing);
        }
        int blocks = (n + k - 1) / k;
        double[] b = new double[blocks];
        for (int j = 0; j < blocks; j++) {
            int from = j * k;
            int to = Math.min(n, from + k);
            double e = x[from];
            if (closing) {
                for (int i = from + 1; i < to; i++) {
                    e = Math.max(e, x[i]);
                }
            } else {
                for (int i = from + 1; i < to; i++) {
                    e = Math.min(e, x[i]);
                }
            }
            b[j] = e;
        }
        int blockRadius = (radius + k - 1) / k;
        double[] coarse = movingExtreme(movingExtreme(b, blockRadius, closing), blockRadius, !closing);
        // between block centres the background is interpolated: spread as a step over each block, it
        // would put a tooth of slope × block on every block of a steep flank (a large disturbance at
        // the start of a run gave a dozen such teeth, narrower than any zone, and their width became
        // the run's typical width)
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double at = (i + 0.5) / k - 0.5;
            int j = (int) Math.floor(at);
            if (j < 0) {
                out[i] = coarse[0];
            } else if (j >= blocks - 1) {
                out[i] = coarse[blocks - 1];
            } else {
                out[i] = coarse[j] + (at - j) * (coarse[j + 1] - coarse[j]);
            }
        }
        return out;
    }

    /** Appends the half-height widths of the excursions of {@code v} above the threshold. */
    private static double[] collectWidths(double[] timeS, double[] v, double threshold, double minWidth,
                                          double[] widths, int[] found) {
        int n = v.length;
        double regionLevel = threshold * SignalLimits.WIDTH_ESTIMATE_REGION_SIGMAS
                / SignalLimits.WIDTH_ESTIMATE_MIN_SIGMAS;
        int i = 0;
        while (i < n) {
            if (!(v[i] > regionLevel)) {
                i++;
                continue;
            }
            // the excursion: contiguous points above the lower region level, and its maximum;
            // it counts only when the maximum passes the threshold
            int end = i;
            int apex = i;
            while (end + 1 < n && v[end + 1] > regionLevel) {
                end++;
                if (v[end] > v[apex]) {
                    apex = end;
                }
            }
            if (!(v[apex] > threshold)) {
                i = end + 1;
                continue;
            }
            double half = 0.5 * v[apex];
            int left = apex;
            while (left > 0 && v[left - 1] > half) {
                left--;
            }
            int right = apex;
            while (right < n - 1 && v[right + 1] > half) {
                right++;
            }
            double tLeft = left > 0 ? crossing(timeS, v, left - 1, left, half) : timeS[0];
            double tRight = right < n - 1 ? crossing(timeS, v, right, right + 1, half) : timeS[n - 1];
            double width = tRight - tLeft;
            if (width >= minWidth) {
                if (found[0] == widths.length) {
                    widths = Arrays.copyOf(widths, 2 * found[0]);
                }
                widths[found[0]++] = width;
            }
            i = Math.max(end, right) + 1;
        }
        return widths;
    }

    private static double crossing(double[] t, double[] v, int a, int b, double level) {
        double f = (level - v[a]) / (v[b] - v[a]);
        return t[a] + f * (t[b] - t[a]);
    }

    static double sumOfSquares(double[] w) {
        double s = 0;
        for (double v : w) {
            s += v * v;
        }
        return s;
    }

    /**
     * Moving minimum or maximum over [i − r, i + r] (clipped to the ends) by the van Herk /
     * Gil–Werman block algorithm (van Herk, Pattern Recognit. Lett. 13 (1992) 517; Gil &amp; Werman,
     * IEEE Trans. PAMI 15 (1993) 504): prefix and suffix extremes within blocks of 2r + 1 samples,
     * three branch-light passes, O(n) whatever the radius.
     */
    static double[] movingExtreme(double[] x, int radius, boolean max) {
        int n = x.length;
        if (n == 0) {
            return new double[0];
        }
        int w = 2 * radius + 1;
        int m = n + 2 * radius;
        // g: running extreme from each block's start; h: from each block's end (padded index j ↔ x[j − r];
        // the padding is neutral, so the window is clipped to the ends)
        double[] g = new double[m];
        double[] h = new double[m];
        double neutral = max ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
        for (int blockStart = 0; blockStart < m; blockStart += w) {
            int blockEnd = Math.min(m, blockStart + w);
            double run = neutral;
            for (int j = blockStart; j < blockEnd; j++) {
                int i = j - radius;
                double v = i >= 0 && i < n ? x[i] : neutral;
                run = max ? (v > run ? v : run) : (v < run ? v : run);
                g[j] = run;
            }
            run = neutral;
            for (int j = blockEnd - 1; j >= blockStart; j--) {
                int i = j - radius;
                double v = i >= 0 && i < n ? x[i] : neutral;
                run = max ? (v > run ? v : run) : (v < run ? v : run);
                h[j] = run;
            }
        }
        double[] out = new double[n];
        if (max) {
            for (int i = 0; i < n; i++) {
                double a = h[i];
                double b = g[i + w - 1];
                out[i] = a > b ? a : b;
            }
        } else {
            for (int i = 0; i < n; i++) {
                double a = h[i];
                double b = g[i + w - 1];
                out[i] = a < b ? a : b;
            }
        }
        return out;
    }
}
