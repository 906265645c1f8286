package org.mobident.signal;

import java.util.ArrayList;
import java.util.List;

/**
 * Hidden zones of a peak cluster from the curvature of the signal.
 *
 * <p><b>Why the curvature.</b> Two zones closer than about 2σ merge into one maximum with a
 * shoulder: the signal shows no valley, but its second derivative still shows one local minimum
 * per zone, because −y″ of a Gaussian, (H/σ²)(1 − z²)e^(−z²/2), is a peak about half as wide
 * as the zone itself (width at half height 1.25σ against 2.35σ; the resolution enhancement
 * of derivative spectroscopy: Talsky, Mayring &amp; Kreuzer, Angew. Chem. Int. Ed. 17 (1978) 785; O'Haver &amp; Green,
 * Anal. Chem. 48 (1976) 312; from memory). Each separate, significant minimum of y″ inside a peak
 * marks a zone.
 *
 * <p><b>The derivative.</b> y″ is the quadratic Savitzky–Golay second derivative over a window
 * of {@link SignalLimits#CURVATURE_WINDOW_FRACTION_OF_WIDTH} of the typical width at half height
 * (Savitzky &amp; Golay, Anal. Chem. 36 (1964) 1627; weights computed by
 * {@link SavitzkyGolay#derivativeWeights}), taken per sample and divided by Δt² with Δt the
 * median sampling interval (on irregular sampling an approximation, used only to flag clusters:
 * the fit that follows works on the true times). A window of 0.75 w½ still separates the
 * curvature minima of two zones at Rs = 0.6 with heights 1:3 (checked numerically), while
 * smoothing the noise of y″ over about 1.8σ. The quadratic/cubic second-derivative weights are
 * α + βk², so the whole series costs O(n) with running moments.
 *
 * <p><b>Noise of y″.</b> For white noise of SD σ the derivative has SD σ√(Σw²)/Δt² (variance
 * of a weighted sum). Correlated noise (a detector time constant) and baseline ripple put more
 * power where the filter passes it, so the SD is also measured on the derivative itself as
 * 1.4826·MAD over the whole trace (Rousseeuw &amp; Croux 1993; the peaks are a small part of a
 * run), on every m-th value (m the window half-width: the derivative is correlated over its
 * window) and by selection, in linear time; the larger of the two is used.
 *
 * <p><b>Significant minima.</b> In the concavity {@code c = −y″} a zone is a local maximum
 * where the signal is significantly concave (c of at least
 * {@link SignalLimits#SHOULDER_MIN_CONCAVITY_SIGMAS} noise SDs) and which rises by
 * {@link SignalLimits#SHOULDER_PROMINENCE_SIGMAS} noise SDs above the lowest concavity within
 * one typical width at half height on its left, and again on its right; two such maxima count
 * as two zones when c falls by as much between them. The reach of one width holds every dip
 * that belongs to a zone: the convex flank of a Gaussian bottoms out 1.73σ = 0.74 w½ from its
 * apex, and two zones that overlap enough to matter (Rs ≤ 1, gap ≤ 4σ = 1.7 w½) have the dip
 * between them within 0.85 w½ of each. The short reach also keeps the noise of a long, slowly
 * bending stretch (a tail) from adding up to a false rise, and the concavity floor keeps a
 * noise wiggle in a tail, where c climbs back from the convex flank towards zero, from passing
 * for a zone (the noise of a Savitzky–Golay derivative oscillates, so its peak-to-trough
 * swings are larger than its SD suggests). A single zone, Gaussian or tailing, has one maximum
 * of c at its top and convex flanks that return monotonically to zero, so it gives one zone.
 *
 * <p><b>Limits.</b> A flat-topped zone (a long injection plug) also shows two curvature maxima
 * and is resolved like a pair, which its shape cannot tell apart; a strongly tailing zone
 * (exponential tail τ above about 2σ) fits two Gaussians much better than one, so the F-test
 * of the fit does not protect it, and only the curvature criteria above do.
 */
final class ShoulderFinder {

    /**
     * Candidate maxima that are scanned directly for their one-sided minima, as long as the scans
     * cost at most this many times the length of the region (beyond it the moving minima of the
     * whole region, linear whatever the count, are cheaper).
     */
    private static final int DIRECT_SCAN_FACTOR = 4;

    private ShoulderFinder() {
    }

    /**
     * Half-width, in samples, of the second-derivative window for a typical width.
     *
     * @param typicalWidthS typical full width at half height, s
     * @param samplingS     median sampling interval, s
     * @param n             number of samples
     */
    static int halfWidth(double typicalWidthS, double samplingS, int n) {
        int m = (int) Math.round(0.5 * (SignalLimits.CURVATURE_WINDOW_FRACTION_OF_WIDTH * typicalWidthS / samplingS - 1));
        m = Math.max(SignalLimits.CURVATURE_MIN_HALF_WIDTH, m);
        return Math.min(m, (n - 1) / 2);
    }

    /**
     * Concavity {@code c = −y″} in signal units per s², quadratic Savitzky–Golay.
     *
     * @param y         signal, peaks up (not modified), at least 2m + 1 points
     * @param halfWidth m ≥ 1
     * @param samplingS sampling interval Δt, s
     */
    static double[] concavity(double[] y, int halfWidth, double samplingS) {
        double[] c = SavitzkyGolay.derivative(y, halfWidth, PeakDetector.SMOOTHING_ORDER, 2);
        double scale = -1.0 / (samplingS * samplingS);
        for (int i = 0; i < c.length; i++) {
            c[i] *= scale;
        }
        return c;
    }

    /**
     * SD of the concavity: the larger of the white-noise value σ√(Σw²)/Δt² and 1.4826·MAD of
     * {@code concavity} itself.
     *
     * @param concavity the concavity series (not modified)
     * @param noiseSd   SD σ of the signal noise
     * @param halfWidth m of the derivative window
     * @param samplingS sampling interval Δt, s
     */
    static double noiseSd(double[] concavity, double noiseSd, int halfWidth, double samplingS) {
        double[] w = SavitzkyGolay.derivativeWeights(halfWidth, PeakDetector.SMOOTHING_ORDER, 0, 2);
        double white = noiseSd * Math.sqrt(PeakWidthEstimator.sumOfSquares(w)) / (samplingS * samplingS);
        // the derivative is correlated over its window: every m-th value carries nearly all the
        // information, at 1/m of the cost
        int stride = Math.max(1, halfWidth);
        int count = (concavity.length + stride - 1) / stride;
        double[] work = new double[count];
        for (int k = 0; k < count; k++) {
            work[k] = concavity[k * stride];
        }
        double centre = Selection.medianInPlace(work, count);
        for (int k = 0; k < count; k++) {
            work[k] = Math.abs(concavity[k * stride] - centre);
        }
        double measured = SignalLimits.MAD_TO_SD * Selection.medianInPlace(work, count);
        return Math.max(white, measured);
    }

    /**
     * Indices of the distinct, significant maxima of the concavity inside [first, last]. A
     * local maximum is significant when it reaches {@code level} and rises by at least {@code prominence} above the lowest
     * concavity within {@code reach} samples on its left and, again, on its right (both windows
     * clipped to [first, last]); two significant maxima are distinct when the concavity between
     * them falls by at least {@code prominence} below each, otherwise the higher one stands for
     * both. Linear in last − first: the one-sided minima are scanned directly at the candidate
     * maxima when they are few, else taken from moving minima over the whole region
     * ({@link PeakWidthEstimator#movingExtreme}); then one merging pass.
     *
     * @param concavity  c = −y″ (not modified)
     * @param first      first index (inclusive)
     * @param last       last index (inclusive)
     * @param level      a maximum counts only when c reaches this level
     * @param prominence rise and fall that make a maximum significant (&gt; 0)
     * @param reach      how far, in samples, the rise and fall are looked for (≥ 1)
     * @return indices in increasing order
     */
    static List<Integer> zones(double[] concavity, int first, int last, double level, double prominence,
                               int reach) {
        int n = last - first + 1;
        // the minimum over [i − 2r, i] is the centred minimum at i − r, that over [i, i + 2r] the one at i + r
        int r = Math.max(1, reach / 2);
        // Most regions are short noise excursions with few or no local maxima above the level: the
        // one-sided minima are then scanned directly at those maxima (the same minima, so the same
        // result) instead of being computed for every point, which keeps the cost and the
        // allocation of a region proportional to its length.
        int candidates = 0;
        for (int i = 1; i < n - 1; i++) {
            int g = first + i;
            if (isLocalMaximum(concavity, g, level)) {
                candidates++;
            }
        }
        if (candidates == 0) {
            return new ArrayList<>(0);
        }
        if ((long) candidates * (2L * r + 1) <= DIRECT_SCAN_FACTOR * (long) n) {
            return select(concavity, first, n, level, prominence, r, null, null, null);
        }
        double[] c = java.util.Arrays.copyOfRange(concavity, first, last + 1);
        double[] centred = PeakWidthEstimator.movingExtreme(c, r, false);
        // within r of an end the one-sided window is clipped there: running minima from each end
        double[] fromStart = new double[n];
        double[] fromEnd = new double[n];
        for (int i = 0; i < n; i++) {
            fromStart[i] = i == 0 ? c[0] : Math.min(fromStart[i - 1], c[i]);
            int j = n - 1 - i;
            fromEnd[j] = i == 0 ? c[j] : Math.min(fromEnd[j + 1], c[j]);
        }
        return select(concavity, first, n, level, prominence, r, centred, fromStart, fromEnd);
    }

    /** A local maximum of c at {@code g} (flat on its left allowed) that reaches {@code level}. */
    private static boolean isLocalMaximum(double[] c, int g, double level) {
        double v = c[g];
        return v >= c[g - 1] && v > c[g + 1] && v >= level;
    }

    /** Lowest of c[from..to] (inclusive). */
    private static double minimum(double[] c, int from, int to) {
        double m = c[from];
        for (int i = from + 1; i <= to; i++) {
            double v = c[i];
            m = v < m ? v : m;
        }
        return m;
    }

    /**
     * The merging pass of {@link #zones}; region-local index i is {@code concavity[first + i]}. With
     * {@code centred} null the one-sided minima are scanned directly, else taken from the moving
     * minima ({@code centred}, {@code fromStart}, {@code fromEnd} over the region).
     */
    private static List<Integer> select(double[] concavity, int first, int n, double level, double prominence,
                                        int r, double[] centred, double[] fromStart, double[] fromEnd) {
        List<Integer> kept = new ArrayList<>();
        double between = Double.POSITIVE_INFINITY; // lowest c after the last kept maximum
        for (int i = 1; i < n - 1; i++) {
            int g = first + i;
            double ci = concavity[g];
            boolean significant = isLocalMaximum(concavity, g, level)
                    && ci - leftMinimum(concavity, first, i, r, centred, fromStart) >= prominence
                    && ci - rightMinimum(concavity, first, n, i, r, centred, fromEnd) >= prominence;
            if (!significant) {
                between = Math.min(between, ci);
                continue;
            }
            if (!kept.isEmpty()) {
                int k = kept.get(kept.size() - 1);
                double ck = concavity[first + k];
                if (ck - between < prominence || ci - between < prominence) {
                    if (ci > ck) {
                        kept.set(kept.size() - 1, i); // the higher stands for both
                        between = Double.POSITIVE_INFINITY;
                    } else {
                        between = Math.min(between, ci);
                    }
                    continue;
                }
            }
            kept.add(i);
            between = Double.POSITIVE_INFINITY;
        }
        List<Integer> out = new ArrayList<>(kept.size());
        for (int i : kept) {
            out.add(first + i);
        }
        return out;
    }

    /** Lowest concavity over region indices [i − 2r, i], clipped to the region. */
    private static double leftMinimum(double[] concavity, int first, int i, int r, double[] centred,
                                      double[] fromStart) {
        if (centred == null) {
            return minimum(concavity, first + Math.max(0, i - 2 * r), first + i);
        }
        return i >= r ? centred[i - r] : fromStart[i];
    }

    /** Lowest concavity over region indices [i, i + 2r], clipped to the region. */
    private static double rightMinimum(double[] concavity, int first, int n, int i, int r, double[] centred,
                                       double[] fromEnd) {
        if (centred == null) {
            return minimum(concavity, first + i, first + Math.min(n - 1, i + 2 * r));
        }
        return i + r <= n - 1 ? centred[i + r] : fromEnd[i];
    }
}
