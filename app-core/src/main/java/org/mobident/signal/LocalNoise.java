package org.mobident.signal;

/**
 * The background noise where a peak sits, measured on the baseline stretches around it.
 *
 * <p>Ph. Eur. 2.2.46 and USP &lt;621&gt; take the noise from a window centred on the place of the
 * peak (in a blank run). Here the run itself serves: the samples of the baseline-corrected signal
 * in a window around the peak, without the samples that belong to any peak
 * ({@link BackgroundNoise#peaks}), give the robust SD (1.4826 · MAD about their median: Rousseeuw &amp; Croux, J. Am. Stat. Assoc. 88
 * (1993) 1273) of the raw signal and, on the same samples, of the smoothed signal. Both are SDs of
 * the values themselves, not of their differences, so correlated noise (a detector time constant)
 * is measured as it is: its first differences would understate it.
 *
 * <p>A window must hold enough samples for a stable SD. Correlated noise carries less information
 * per sample: for lag-one correlation ρ a series of n samples weighs like about n(1 − ρ)/(1 + ρ)
 * independent ones (the variance inflation of the mean of a first-order autoregressive series: Box
 * &amp; Jenkins, Time Series Analysis, 1970, ch. 3; from memory), so the least number of baseline samples
 * is {@link SignalLimits#LOCAL_NOISE_MIN_SAMPLES} times (1 + ρ)/(1 − ρ); a window that holds fewer is
 * widened (doubled) until it does or covers the run. Long windows are read at an even stride so that
 * each estimate works on at most {@link SignalLimits#LOCAL_NOISE_SAMPLE_CAP} samples: the cost per
 * peak is bounded, and a run costs O(n) to prepare (the mask and its running count).
 *
 * <p>One instance serves one trace and keeps work buffers: not for use by several threads.
 */
final class LocalNoise {

    /**
     * Noise around one peak.
     *
     * @param rawSd    robust SD of the baseline-corrected raw signal, signal units
     * @param smoothSd robust SD of the baseline-corrected smoothed signal, signal units
     * @param samples  baseline samples the estimates rest on (after the stride)
     */
    record Estimate(double rawSd, double smoothSd, int samples) {
    }

    private final double[] raw;
    private final double[] smooth;
    private final boolean[] excluded;
    /** kept[i] = number of samples before i that are not excluded. */
    private final int[] kept;
    private final int minSamples;
    private final Estimate global;
    private final double rawFloor;
    private final double smoothFloor;
    private final double[] workRaw = new double[SignalLimits.LOCAL_NOISE_SAMPLE_CAP + 1];
    private final double[] workSmooth = new double[SignalLimits.LOCAL_NOISE_SAMPLE_CAP + 1];

    /**
     * @param raw         baseline-corrected raw signal, peaks up (not modified, not copied)
     * @param smooth      baseline-corrected smoothed signal (not modified, not copied)
     * @param excluded    samples inside peaks (not modified, not copied)
     * @param correlation lag-one correlation ρ of the noise, in [0, 1)
     * @param global      the whole run's estimate, used when no baseline sample is left
     * @param rawFloor    least raw SD returned (a noiseless trace still gets a finite S/N)
     * @param smoothFloor least smoothed SD returned
     */
    LocalNoise(double[] raw, double[] smooth, boolean[] excluded, double correlation, Estimate global,
               double rawFloor, double smoothFloor) {
        this.raw = raw;
        this.smooth = smooth;
        this.excluded = excluded;
        this.global = global;
        this.rawFloor = rawFloor;
        this.smoothFloor = smoothFloor;
        int n = raw.length;
        kept = new int[n + 1];
        for (int i = 0; i < n; i++) {
            kept[i + 1] = kept[i] + (excluded[i] ? 0 : 1);
        }
        double inflation = (1 + correlation) / (1 - correlation);
        minSamples = (int) Math.min(kept[n], Math.ceil(SignalLimits.LOCAL_NOISE_MIN_SAMPLES * inflation));
    }

    /** The whole run's estimate. */
    Estimate global() {
        return global;
    }

    /**
     * The noise around sample {@code centre}, from the baseline samples within
     * {@code halfWindow} samples of it (the window widened as needed, see the class notes).
     */
    Estimate around(int centre, int halfWindow) {
        return around(centre, halfWindow, true);
    }

    /**
     * As {@link #around(int, int)}; without {@code withSmooth} only the raw SD is found and the
     * smoothed one is NaN (half the work, for peaks whose significance is plain without it).
     */
    Estimate around(int centre, int halfWindow, boolean withSmooth) {
        int n = raw.length;
        int half = Math.max(1, halfWindow);
        int from;
        int to;
        while (true) {
            from = Math.max(0, centre - half);
            to = Math.min(n - 1, centre + half);
            if (kept[to + 1] - kept[from] >= minSamples || (from == 0 && to == n - 1)) {
                break;
            }
            half = half > n ? n : 2 * half;
        }
        int available = kept[to + 1] - kept[from];
        if (available < 2) {
            return global;
        }
        int stride = Math.max(1, (to - from + 1) / SignalLimits.LOCAL_NOISE_SAMPLE_CAP);
        int m = 0;
        for (int i = from; i <= to && m < workRaw.length; i += stride) {
            if (!excluded[i]) {
                workRaw[m] = raw[i];
                workSmooth[m] = smooth[i];
                m++;
            }
        }
        if (m < 2) {
            return global;
        }
        double smoothSd = withSmooth ? Math.max(NoiseEstimator.madSdInPlace(workSmooth, m), smoothFloor) : Double.NaN;
        return new Estimate(Math.max(NoiseEstimator.madSdInPlace(workRaw, m), rawFloor), smoothSd, m);
    }
}
