package org.mobident.signal;

/**
 * The noise of a run's baseline stretches: robust SDs (1.4826 · MAD about the median) of the
 * baseline-corrected raw and smoothed signal over the samples outside the peaks, and which samples
 * those peaks cover.
 *
 * <p><b>The noise level along the run.</b> The run is cut into blocks of a given length (wide
 * against a zone, see the caller); each block's smoothed signal gives a robust SD from an evenly
 * strided subset of its samples, and the level at a block is the median of the SDs of the five
 * blocks centred on it. The median absolute deviation ignores the peaks as long as they fill less
 * than half a block, and the median over five blocks a stretch crowded with zones (Rousseeuw &amp;
 * Croux, J. Am. Stat. Assoc. 88 (1993) 1273, for the breakdown of the MAD; the block median is common
 * practice). No sample is excluded for this, so the tails of the noise are kept.
 *
 * <p><b>The peaks.</b> A run of the smoothed signal beyond ±1 level whose extreme passes
 * ±{@link SignalLimits#PEAK_MASK_SIGMAS} levels, widened by a margin for the feet, belongs to a
 * peak. The level is the local one, so that where the noise is larger its excursions are not taken
 * for peaks (a single level for the whole run would cut the tails of the larger noise and bias its
 * SD low).
 *
 * <p><b>The run's SDs</b> are taken over every k-th sample outside the peaks (k chosen so that about
 * {@link SignalLimits#SCALE_SAMPLE_CAP} are used), the peaks traced on those samples alone; the
 * samples inside peaks are traced on every sample once the baseline is final. Every step is linear
 * in the number of points.
 */
final class BackgroundNoise {

    /** Blocks on each side of a block whose SDs enter its level (five blocks in all). */
    private static final int LEVEL_NEIGHBOURS = 2;
    /** A block's SD is taken from at most this many of its samples, evenly strided. */
    private static final int BLOCK_SAMPLE_CAP = 64;

    private BackgroundNoise() {
    }

    /**
     * The noise level along a run (see the class notes), of the corrected signal
     * {@code smooth − baseline}.
     *
     * @param smooth      smoothed signal
     * @param baseline    its baseline
     * @param blockLength samples per block, at least 2
     * @param floor       least level
     */
    static Levels levels(double[] smooth, double[] baseline, int blockLength, double floor) {
        int block = Math.max(2, Math.min(blockLength, smooth.length));
        return new Levels(block, levelsOf(smooth, baseline, block, floor));
    }

    /**
     * The noise level of each block of {@code block} samples.
     *
     * @param block  samples per block
     * @param values level of each block, signal units of the smoothed signal
     */
    record Levels(int block, double[] values) {
    }

    /**
     * The samples inside peaks, traced on every sample.
     *
     * @param smooth baseline-corrected smoothed signal
     * @param levels the noise level along the run
     * @param margin samples added on each side of a peak
     */
    static boolean[] peaks(double[] smooth, Levels levels, int margin) {
        return mask(smooth, 1, levels, margin);
    }

    /**
     * The run's SDs outside the peaks, on every k-th sample of the corrected signals
     * {@code y − baseline} and {@code smooth − baseline} (k chosen so that about
     * {@link SignalLimits#SCALE_SAMPLE_CAP} samples are used; no corrected copy of the run is made),
     * the peaks traced on those samples alone. A zone narrower than k samples is then left in, which
     * the median absolute deviation does not notice.
     */
    static LocalNoise.Estimate sds(double[] y, double[] smooth, double[] baseline, Levels levels, int margin,
                                         double floor, double gain) {
        int n = smooth.length;
        int cap = SignalLimits.SCALE_SAMPLE_CAP;
        int k = Math.max(1, n / cap);
        int m = (n + k - 1) / k;
        double[] smoothSampled = new double[m];
        double[] rawSampled = new double[m];
        for (int j = 0; j < m; j++) {
            smoothSampled[j] = smooth[j * k] - baseline[j * k];
            rawSampled[j] = y[j * k] - baseline[j * k];
        }
        boolean[] mask = mask(smoothSampled, k, levels, (margin + k - 1) / k);
        double smoothSd = Math.max(NoiseEstimator.marginalSd(smoothSampled, mask, cap), floor * gain);
        double rawSd = Math.max(NoiseEstimator.marginalSd(rawSampled, mask, cap), floor);
        return new LocalNoise.Estimate(rawSd, smoothSd, n);
    }

    /**
     * Samples inside peaks, on a series holding every {@code step}-th sample of the run (1: all):
     * runs beyond ±1 level whose extreme passes ±{@link SignalLimits#PEAK_MASK_SIGMAS} levels, with
     * {@code margin} samples of the series on each side.
     */
    private static boolean[] mask(double[] v, int step, Levels levels, int margin) {
        int n = v.length;
        boolean[] mask = new boolean[n];
        double[] level = levels.values();
        // samples of the series per block of the levels; the last level also serves any remainder
        int perBlock = Math.max(1, levels.block() / step);
        int i = 0;
        int b = 0;
        int blockEnd = Math.min(n, perBlock);
        while (i < n) {
            if (i >= blockEnd) {
                b = Math.min(level.length - 1, b + 1);
                blockEnd = b == level.length - 1 ? n : Math.min(n, blockEnd + perBlock);
                continue;
            }
            double back = SignalLimits.RETURN_TO_BASELINE_SIGMAS * level[b];
            if (!(Math.abs(v[i]) > back)) {
                i++;
                continue;
            }
            double sign = Math.signum(v[i]);
            boolean peak = sign * v[i] > SignalLimits.PEAK_MASK_SIGMAS * level[b];
            int j = i;
            int c = b;
            int cEnd = blockEnd;
            while (j + 1 < n) {
                if (j + 1 >= cEnd) {
                    c = Math.min(level.length - 1, c + 1);
                    cEnd = c == level.length - 1 ? n : Math.min(n, cEnd + perBlock);
                }
                if (!(sign * v[j + 1] > SignalLimits.RETURN_TO_BASELINE_SIGMAS * level[c])) {
                    break;
                }
                j++;
                peak |= sign * v[j] > SignalLimits.PEAK_MASK_SIGMAS * level[c];
            }
            if (peak) {
                for (int q = Math.max(0, i - margin); q <= Math.min(n - 1, j + margin); q++) {
                    mask[q] = true;
                }
            }
            i = j + 1;
        }
        return mask;
    }

    /** The noise level of every block: the median of the robust SDs of it and its neighbours. */
    private static double[] levelsOf(double[] v, double[] baseline, int block, double floor) {
        int n = v.length;
        int blocks = (n + block - 1) / block;
        double[] sd = new double[blocks];
        double[] work = new double[BLOCK_SAMPLE_CAP + 1];
        for (int b = 0; b < blocks; b++) {
            int from = b * block;
            int to = Math.min(n, from + block);
            int stride = Math.max(1, (to - from) / BLOCK_SAMPLE_CAP);
            int m = 0;
            for (int k = from; k < to && m < work.length; k += stride) {
                work[m++] = v[k] - baseline[k];
            }
            sd[b] = m < 2 ? floor : Math.max(NoiseEstimator.madSdInPlace(work, m), floor);
        }
        double[] level = new double[blocks];
        double[] near = new double[2 * LEVEL_NEIGHBOURS + 1];
        for (int b = 0; b < blocks; b++) {
            int m = 0;
            for (int c = Math.max(0, b - LEVEL_NEIGHBOURS); c <= Math.min(blocks - 1, b + LEVEL_NEIGHBOURS); c++) {
                near[m++] = sd[c];
            }
            level[b] = Selection.medianInPlace(near, m);
        }
        return level;
    }
}
