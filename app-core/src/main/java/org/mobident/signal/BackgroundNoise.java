package org.mobident.signal;

/**
 * The noise of a run's baseline stretches: robust SDs (1.4826 · MAD about the median) of the
 * baseline-corrected raw and smoothed signal over the samples outside the peaks, with the peaks
 * found by the smoothed SD itself.
 *
 * <p>The SD over all samples is inflated by the peaks, so the peaks and the SD are found in turn:
 * runs of the smoothed signal beyond ±1 SD whose extreme passes ±{@link SignalLimits#PEAK_MASK_SIGMAS}
 * SDs are left out (with a margin for their feet, see {@link LocalNoise#peakMask}), the SD is taken
 * again, and so on, {@link SignalLimits#NOISE_MASK_ITERATIONS} times at most
 * ({@link SignalLimits#NOISE_MASK_FIRST_ROUNDS} for a first look that only sets thresholds) or
 * until it changes by less than {@link SignalLimits#NOISE_MASK_CONVERGENCE}. The rounds work on every k-th sample
 * (k chosen so that there are about {@link SignalLimits#SCALE_SAMPLE_CAP} of them), which both
 * traces the runs and gives the SD; a zone narrower than k samples is then left in, but it adds
 * at most one value to the SD, which its median absolute deviation does not notice. Every round
 * costs O(n/k), and the exact mask of all samples, when asked for, one pass: linear.
 */
final class BackgroundNoise {

    /**
     * @param estimate the SDs (the sample count is that of the trace)
     * @param inPeak   samples inside peaks at the final level, or null when not asked for
     */
    record Result(LocalNoise.Estimate estimate, boolean[] inPeak) {
    }

    private BackgroundNoise() {
    }

    /**
     * @param raw       baseline-corrected raw signal, peaks up
     * @param smooth    baseline-corrected smoothed signal
     * @param margin    samples added on each side of a peak
     * @param floor     least raw SD; the least smoothed SD is {@code floor · gain}
     * @param gain      noise gain of the smoothing
     * @param start     smoothed SD to start from, or NaN to start from all samples
     * @param exactMask true to return the samples inside peaks
     */
    static Result of(double[] raw, double[] smooth, int margin, double floor, double gain, double start,
                     boolean exactMask) {
        int n = smooth.length;
        int k = Math.max(1, n / SignalLimits.SCALE_SAMPLE_CAP);
        int blocks = (n + k - 1) / k;
        double[] sampled = new double[blocks];
        for (int b = 0; b < blocks; b++) {
            sampled[b] = smooth[b * k];
        }
        int marginBlocks = (margin + k - 1) / k;
        double smoothFloor = floor * gain;
        boolean[] blockMask = new boolean[blocks];
        double[] work = new double[blocks];
        double smoothSd = Math.max(Double.isNaN(start) ? sd(smooth, k, blockMask, work) : start, smoothFloor);
        int rounds = exactMask ? SignalLimits.NOISE_MASK_ITERATIONS : SignalLimits.NOISE_MASK_FIRST_ROUNDS;
        for (int round = 0; round < rounds; round++) {
            java.util.Arrays.fill(blockMask, false);
            double returnLevel = SignalLimits.RETURN_TO_BASELINE_SIGMAS * smoothSd;
            double peakLevel = SignalLimits.PEAK_MASK_SIGMAS * smoothSd;
            markRuns(sampled, 1, returnLevel, peakLevel, marginBlocks, blockMask);
            markRuns(sampled, -1, returnLevel, peakLevel, marginBlocks, blockMask);
            double next = Math.max(sd(smooth, k, blockMask, work), smoothFloor);
            boolean settled = Math.abs(next - smoothSd) <= SignalLimits.NOISE_MASK_CONVERGENCE * smoothSd;
            smoothSd = next;
            if (settled) {
                break;
            }
        }
        double rawSd = Math.max(sd(raw, k, blockMask, work), floor);
        boolean[] inPeak = exactMask ? LocalNoise.peakMask(smooth, SignalLimits.RETURN_TO_BASELINE_SIGMAS * smoothSd,
                SignalLimits.PEAK_MASK_SIGMAS * smoothSd, margin) : null;
        return new Result(new LocalNoise.Estimate(rawSd, smoothSd, n), inPeak);
    }

    /** Marks the runs of blocks whose sample (times sign) is beyond the return level and reaches
     *  the peak level, with the margin. */
    private static void markRuns(double[] extreme, double sign, double returnLevel, double peakLevel,
                                 int marginBlocks, boolean[] mask) {
        int blocks = extreme.length;
        int b = 0;
        while (b < blocks) {
            if (!(sign * extreme[b] > returnLevel)) {
                b++;
                continue;
            }
            int e = b;
            double top = sign * extreme[b];
            while (e + 1 < blocks && sign * extreme[e + 1] > returnLevel) {
                e++;
                top = Math.max(top, sign * extreme[e]);
            }
            if (top > peakLevel) {
                for (int j = Math.max(0, b - marginBlocks); j <= Math.min(blocks - 1, e + marginBlocks); j++) {
                    mask[j] = true;
                }
            }
            b = e + 1;
        }
    }

    /** Robust SD of the first sample of every block not masked; 0 when fewer than two remain. */
    private static double sd(double[] v, int k, boolean[] blockMask, double[] work) {
        int m = 0;
        for (int b = 0; b < blockMask.length; b++) {
            if (!blockMask[b]) {
                work[m++] = v[b * k];
            }
        }
        return m < 2 ? 0.0 : NoiseEstimator.madSdInPlace(work, m);
    }
}
