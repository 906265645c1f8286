package org.mobident.signal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.IntToDoubleFunction;
import org.apache.commons.math3.special.Erf;

/**
 * A search for faint zones between the peaks found, by a matched filter: the run's zones have a
 * known width at each time, so the best linear test for a zone of that width in the noise is the
 * signal averaged over about that width (the matched filter of detection theory: North, RCA Lab.
 * Rep. PTR-6C (1943), reprinted Proc. IEEE 51 (1963) 1016; for a Gaussian zone of SD s a box of
 * 2.8 s keeps about 94 % of the optimal signal-to-noise ratio, worked out here from the two
 * integrals). A zone three noise SDs tall and 2 s wide at half height, sampled at 10 Hz, stands
 * about nine noise SDs of the box mean above the baseline, where its apex alone stands three and
 * its pharmacopoeial S/N is about 1.3: such zones are plain to the test although below the S/N
 * that the smoothed-signal checks need.
 *
 * <p>Steps, each linear in the number of samples:
 * <ol>
 * <li>The free stretches: the samples outside the core of every peak already found
 *     ({@link #CORE_WIDTHS} of its widths around its apex and centre; its tails beyond may hold
 *     faint zones) and away from the spikes removed.</li>
 * <li>Sums over blocks of about a quarter of the shortest box (one pass over the samples; a zone's
 *     score changes little over a quarter of its box).</li>
 * <li>At each block whose box lies wholly in a free stretch, the mean of the baseline-corrected
 *     signal over the box less its background from a ring (the free samples of two flanks as long
 *     as the box, from {@link #RING_GAP_WIDTHS} widths out, beyond a zone's reach: their mean, or
 *     the higher flank's when the two differ clearly, so that a dip, a glitch or a falling tail on
 *     one side never lifts the box), so that what is left of a baseline offset or slow wave under
 *     the box does not count. Divided by its white-noise SD in noise SDs (√(1/box + 1/ring)) this
 *     score has SD σ for white noise of SD σ, whatever the box; for correlated noise or a baseline
 *     that still waves at the zones' scale it has more, which is measured, not assumed: the ratio of
 *     its SD ({@link #scoreSd}) to that of the signal, over the free samples outside the peak mask,
 *     scales the local noise SD of the signal around each candidate.</li>
 * <li>The threshold is z = Φ⁻¹(1 − α/M), α = {@link SignalLimits#DETECTION_FALSE_ALARM_PER_RUN}
 *     and M the number of box lengths in the free stretches (the Bonferroni bound over the
 *     independent looks; the same family-wise false-alarm rate as the other detection test). A
 *     candidate must also pass with its box clipped at its {@value #CLIP_RANK}rd highest sample (a
 *     spike's residue does not), and its contrast must allow a zone {@link #MIN_HEIGHT_SIGMAS} noise
 *     SDs tall.</li>
 * <li>The local maxima, strongest first, at least {@link #SEPARATION_WIDTHS} widths apart, are each
 *     fitted by one Gaussian ({@link GaussianClusterFit}) over ±{@link #FIT_HALF_WINDOW_WIDTHS}
 *     widths within their free stretch, after the straight line through the medians of the window's
 *     ends is taken away (a tail's slope). The zone stands when the fit puts its apex inside the
 *     window, its width within 0.45–{@link #MAX_WIDTH_RATIO} times the expected (not pressed against
 *     a bound), and its height between {@link #MIN_HEIGHT_SIGMAS} and {@link #MAX_HEIGHT_SIGMAS}
 *     local noise SDs and no taller than its box contrast allows.</li>
 * </ol>
 * What the fit gives (apex, height, width, area) is then judged like any peak ({@code PeakDetector}):
 * S/N, and the width checks for peaks below the detection limit.
 */
final class FaintZoneSearch {

    /** Around each peak found, this many of its widths at half height beyond its apex and centre
     *  are its core, where no box goes; its tails beyond may hold faint zones. */
    static final double CORE_WIDTHS = 2.0;
    /** The box is this many expected widths at half height long (2.8 SDs of a Gaussian zone,
     *  where the box mean's signal-to-noise ratio is highest). */
    static final double BOX_WIDTHS = 1.19;
    /** The ring that gives the local background starts this many expected widths from the
     *  candidate (a Gaussian zone has fallen below 0.2 % of its height there). */
    static final double RING_GAP_WIDTHS = 1.5;
    /** The Gaussian of a faint zone may be at most this many times as wide as expected: a zone
     *  too faint to be dispersed by its own concentration has about the width of the run's
     *  narrower zones; broader faint bumps are the baseline's. */
    static final double MAX_WIDTH_RATIO = 2.0;
    /** A faint zone's fitted height must reach this many local noise SDs (a zone that tall and as
     *  wide as expected is what the search is for; lower ones that pass the box test are residues of
     *  the baseline). */
    static final double MIN_HEIGHT_SIGMAS = 2.0;
    /** The mean of a Gaussian zone over a box of {@link #BOX_WIDTHS} w½ centred on it, in units of
     *  its height: √(2π)·(2Φ(1.4) − 1)/2.8 = 0.75 (Φ(1.4) = 0.9192, normal table). A candidate whose
     *  box contrast is below this fraction of the least height cannot be fitted that tall: it is
     *  not fitted. */
    static final double BOX_MEAN_FRACTION = 0.75;
    /** The two flanks of a ring are uneven when their means differ by more than this many SDs of
     *  the difference (white noise; correlated noise makes them uneven more often, which only makes
     *  the test stricter). */
    static final double UNEVEN_RING_SIGMAS = 3.0;
    /** A faint zone is at most this many local noise SDs tall: a zone that clear is a segment of the
     *  smoothed signal, so a fit that tall between the peaks found follows an artefact (a glitch of
     *  a few samples that the spike filter left drags the baseline down beside it). */
    static final double MAX_HEIGHT_SIGMAS = 25.0;
    /** The least mean of a zone the fit accepts over the box, in units of its height: 0.40 for a
     *  Gaussian 0.45 times as wide as expected (the box then spans ±3.1 of its SDs), 0.92 for one
     *  twice as wide; a little less, for the noise. A fitted height above the box contrast divided
     *  by this (plus the least height, for the noise) is not the zone the box saw. */
    static final double LEAST_BOX_MEAN_FRACTION = 0.35;
    /** Each end of a fitting window gives the level of the straight line taken away under a faint
     *  zone as the median of at least this many samples (a glitch of up to three samples that the
     *  spike filter left does not tilt it). */
    static final int MIN_EDGE_SAMPLES = 7;
    /** Two faint zones are at least this many expected widths apart (closer maxima are one zone's
     *  noise). */
    static final double SEPARATION_WIDTHS = 1.5;
    /** Each candidate is fitted over this many expected widths on each side of it. */
    static final double FIT_HALF_WINDOW_WIDTHS = 1.5;
    /** A fitted apex must lie this many expected widths inside its fitting window. */
    static final double EDGE_WIDTHS = 0.25;
    /** The expected width is taken as at least this fraction of the narrowest quantifiable zone's:
     *  w½ ∝ t holds for the zones' diffusion, but the injected plug adds a width of its own that does
     *  not shrink with t (σ² of independent causes add: Jorgenson &amp; Lukacs, Anal. Chem. 53 (1981)
     *  1298; from memory), so early zones are not much narrower than the narrowest seen. */
    static final double EARLY_WIDTH_FRACTION = 0.5;
    /** The expected width is taken as at least this many sampling intervals. */
    static final double MIN_BOX_SAMPLES = 2.0;
    /** The box and ring follow the expected width in steps of this many blocks (about two boxes:
     *  w½ ∝ t changes by about 2 % over such a step at the narrowest plate numbers seen). */
    static final int WIDTH_UPDATE_BLOCKS = 8;
    /** A fitted SD within this fraction of a bound counts as pressed against it. */
    static final double BOUND_MARGIN = 0.01;
    /** The score SD is measured on at most this many evenly strided free samples (a robust SD from
     *  2,048 independent values has a standard error of about 2.6 %; the scores are correlated over a
     *  box, so fewer count, and the upper-tail scale is rougher still). */
    static final int NOISE_SAMPLE_CAP = 2048;
    /** Candidates are first screened against this fraction of the threshold on the run-wide noise
     *  (the local noise may be lower). */
    static final double PRESCREEN_FRACTION = 0.8;
    /** Rank of the value at which {@link #clippedScore} clips a box's samples. */
    static final int CLIP_RANK = 3;
    /** The upper quantile of {@link #scoreSd} and its standard normal value Φ⁻¹(0.99). */
    private static final double UPPER_QUANTILE = 0.99;
    private static final double UPPER_QUANTILE_Z = 2.3263478740408408;
    /** Fewest free samples for the box-sum SD; with fewer, nothing is searched. */
    static final int MIN_NOISE_SAMPLES = 200;

    /**
     * A faint zone found by the search.
     *
     * @param fit          the Gaussian fitted to it
     * @param first        first sample of the fitting window
     * @param last         last sample of the fitting window
     */
    record Zone(GaussianClusterFit.Component fit, int first, int last) {
    }

    private FaintZoneSearch() {
    }

    /**
     * The faint zones between the peaks found.
     *
     * @param t             sample times, s (not modified)
     * @param raw           baseline-corrected signal, peaks up (not modified)
     * @param inPeak        samples that belong to the run's peaks, left out of the noise (not modified)
     * @param spikes        first and last sample that each removed spike's replacement rests on: the
     *                      parabola that replaced the spike carries their noise, so no box holds them
     * @param occupied      start and end times of the peaks found, s
     * @param expectedWidth expected width at half height of a zone at a sample index, s
     * @param sampling      median sampling interval, s
     * @param rawSd         the run's robust SD of {@code raw} outside the peaks (the marginal noise SD)
     * @param localSd       the local noise SD of {@code raw} around a sample index
     * @return the zones, in time order
     */
    static List<Zone> find(double[] t, double[] raw, boolean[] inPeak, List<int[]> spikes, List<double[]> occupied,
                           IntToDoubleFunction expectedWidth, double sampling, double rawSd,
                           IntToDoubleFunction localSd) {
        int n = raw.length;
        Busy busy = Busy.of(t, spikes, occupied);
        int stride = Math.max(1, halfBox(expectedWidth.applyAsDouble(0), sampling) / 2);
        Blocks blocks = new Blocks(raw, busy, stride, expectedWidth, sampling, rawSd);
        Scores scores = blocks.scores(inPeak);
        if ((long) scores.eligible * stride < MIN_NOISE_SAMPLES || !(rawSd > 0)) {
            return List.of();
        }
        double scoreSd = scoreSd(scores.score, scores.excluded);
        if (!(scoreSd > 0)) {
            return List.of();
        }
        double inflation = Math.max(1.0, scoreSd / rawSd);
        double threshold = Math.sqrt(2.0) * Erf.erfcInv(2 * SignalLimits.DETECTION_FALSE_ALARM_PER_RUN
                / Math.max(1.0, scores.looks));
        List<double[]> significant = new ArrayList<>();
        for (int j : blocks.localMaxima(scores.score, threshold * scoreSd * PRESCREEN_FRACTION)) {
            int i = blocks.centre(j);
            double sd = inflation * localSd.applyAsDouble(i);
            double z = scores.score[j] / sd;
            if (z >= threshold && clippedScore(raw, blocks, j, scores.score[j]) >= threshold * sd
                    && blocks.contrast(j, scores.score[j]) >= BOX_MEAN_FRACTION * MIN_HEIGHT_SIGMAS * sd / inflation) {
                significant.add(new double[] {i, z, blocks.contrast(j, scores.score[j])});
            }
        }
        significant.sort((a, b) -> Double.compare(b[1], a[1]));
        List<Zone> zones = new ArrayList<>();
        List<Double> taken = new ArrayList<>();
        for (double[] c : significant) {
            int i = (int) c[0];
            double width = expectedWidth.applyAsDouble(i);
            boolean apart = true;
            for (double when : taken) {
                apart &= Math.abs(when - t[i]) >= SEPARATION_WIDTHS * width;
            }
            if (!apart) {
                continue;
            }
            Zone zone = fitted(t, raw, busy, i, width, sampling, c[2], localSd.applyAsDouble(i));
            if (zone != null) {
                zones.add(zone);
                taken.add(t[i]);
            }
        }
        zones.sort((a, b) -> Double.compare(a.fit().apexTimeS(), b.fit().apexTimeS()));
        return zones;
    }

    /** The samples no box may hold, as sorted, disjoint index intervals: those of the peaks found
     *  (start to end) and those a removed spike's replacement rests on. */
    private record Busy(int[] first, int[] last) {

        static Busy of(double[] t, List<int[]> spikes, List<double[]> occupied) {
            List<int[]> spans = new ArrayList<>(spikes.size() + occupied.size());
            spans.addAll(spikes);
            for (double[] span : occupied) {
                int from = Arrays.binarySearch(t, span[0]);
                from = Math.max(0, from >= 0 ? from : -from - 2);
                int to = Arrays.binarySearch(t, span[1]);
                to = Math.min(t.length - 1, to >= 0 ? to : -to - 1);
                spans.add(new int[] {from, to});
            }
            spans.sort((a, b) -> Integer.compare(a[0], b[0]));
            int[] first = new int[spans.size()];
            int[] last = new int[spans.size()];
            int count = 0;
            for (int[] s : spans) {
                if (count > 0 && s[0] <= last[count - 1] + 1) {
                    last[count - 1] = Math.max(last[count - 1], s[1]);
                } else {
                    first[count] = s[0];
                    last[count] = s[1];
                    count++;
                }
            }
            return new Busy(Arrays.copyOf(first, count), Arrays.copyOf(last, count));
        }

        /** The last busy sample before {@code i}, or −1. */
        int before(int i) {
            int k = Arrays.binarySearch(first, i);
            k = k >= 0 ? k - 1 : -k - 2; // the last interval starting before i
            return k < 0 ? -1 : Math.min(last[k], i - 1);
        }

        /** The first busy sample after {@code i}, or {@code n}. */
        int after(int i, int n) {
            int k = Arrays.binarySearch(first, i + 1);
            k = k >= 0 ? k : -k - 1; // the first interval starting after i
            int next = k < first.length ? first[k] : n;
            int j = k - 1; // an interval starting at or before i may reach past it
            return j >= 0 && last[j] > i ? i + 1 : next;
        }
    }

    /**
     * Running sums over blocks of {@code stride} samples (of the signal, of its free samples, of
     * the busy samples), and each block's box and ring: the box half-width in blocks and the ring's
     * distance follow the expected width in steps of {@link #WIDTH_UPDATE_BLOCKS} blocks.
     */
    private static final class Blocks {
        final int n;
        final int stride;
        final int m;
        final double[] sums;
        final double[] freeSums;
        final int[] busyBefore;
        final int[] groupHalf;
        final int[] groupGap;
        final double noiseSd;
        /** {@link #ring}'s result: the background and the samples it rests on (one search, one thread). */
        private final double[] ringWork = new double[2];

        Blocks(double[] raw, Busy busy, int stride, IntToDoubleFunction expectedWidth, double sampling,
               double noiseSd) {
            this.noiseSd = noiseSd;
            this.n = raw.length;
            this.stride = stride;
            this.m = (n + stride - 1) / stride;
            sums = new double[m + 1];
            freeSums = new double[m + 1];
            busyBefore = new int[m + 1];
            // the busy samples' sums and counts per block, first in the slots of the running sums
            for (int k = 0; k < busy.first().length; k++) {
                for (int i = busy.first()[k]; i <= busy.last()[k]; i++) {
                    freeSums[i / stride + 1] += raw[i];
                    busyBefore[i / stride + 1]++;
                }
            }
            for (int k = 0; k < m; k++) {
                double sum = blockSum(raw, k * stride, Math.min(n, (k + 1) * stride));
                sums[k + 1] = sums[k] + sum;
                freeSums[k + 1] = freeSums[k] + (sum - freeSums[k + 1]);
                busyBefore[k + 1] += busyBefore[k];
            }
            int groups = (m + WIDTH_UPDATE_BLOCKS - 1) / WIDTH_UPDATE_BLOCKS;
            groupHalf = new int[groups];
            groupGap = new int[groups];
            for (int g = 0; g < groups; g++) {
                double width = expectedWidth.applyAsDouble(centre(g * WIDTH_UPDATE_BLOCKS));
                int h = Math.max(0, (int) Math.round((double) halfBox(width, sampling) / stride));
                groupHalf[g] = h;
                groupGap[g] = Math.max(h + 1, (int) Math.round(RING_GAP_WIDTHS * width / sampling / stride));
            }
        }

        private static double blockSum(double[] v, int from, int to) {
            double sum = 0;
            for (int i = from; i < to; i++) {
                sum += v[i];
            }
            return sum;
        }

        /** The middle sample of block j. */
        int centre(int j) {
            return Math.min(n - 1, j * stride + stride / 2);
        }

        /** Half the box of block j, in blocks. */
        int half(int j) {
            return groupHalf[j / WIDTH_UPDATE_BLOCKS];
        }

        /** First sample of block j's box. */
        int boxFirst(int j) {
            return (j - half(j)) * stride;
        }

        /** Last sample of block j's box. */
        int boxLast(int j) {
            return Math.min(n, (j + half(j) + 1) * stride) - 1;
        }

        /** The box mean less the ring mean of block j, from its score. */
        double contrast(int j, double score) {
            return score * scale(j, boxLast(j) - boxFirst(j) + 1);
        }

        /**
         * The score of block j: its box mean less the background from its ring, divided by
         * {@link #scale}; NaN when the ring holds fewer free samples than the box (see {@link #ring}).
         */
        double score(int j, int box, double boxMean) {
            if (!ring(j, box)) {
                return Double.NaN;
            }
            return (boxMean - ringWork[0]) / Math.sqrt(1.0 / box + 1.0 / ringWork[1]);
        }

        /** The white-noise SD, in noise SDs, of block j's box mean less its background (as
         *  {@link #score} takes it), or NaN when the ring holds fewer free samples than the box. */
        double scale(int j, int box) {
            return ring(j, box) ? Math.sqrt(1.0 / box + 1.0 / ringWork[1]) : Double.NaN;
        }

        /**
         * Block j's ring (two flanks, each as long as the box, {@link #RING_GAP_WIDTHS} widths out)
         * into {@code ringWork}: the background and the number of samples it rests on. The background
         * is the mean of the ring's free samples or, when the two flanks differ clearly
         * ({@code uneven}), the higher of their two means (resting on the smaller flank), so that a
         * dip or a glitch on one side (or the fall of a tail) never lifts the box above its
         * background. False when the ring holds fewer free samples than the box.
         */
        private boolean ring(int j, int box) {
            int h = half(j);
            int gap = groupGap[j / WIDTH_UPDATE_BLOCKS];
            int left = freeCount(j - gap - 2 * h, j - gap);
            int right = freeCount(j + gap, j + gap + 2 * h);
            if (left + right < box) {
                return false;
            }
            double leftSum = freeSum(j - gap - 2 * h, j - gap);
            double rightSum = freeSum(j + gap, j + gap + 2 * h);
            if (uneven(left, right, leftSum, rightSum, box)) {
                ringWork[0] = Math.max(leftSum / left, rightSum / right);
                ringWork[1] = Math.min(left, right);
            } else {
                ringWork[0] = (leftSum + rightSum) / (left + right);
                ringWork[1] = left + right;
            }
            return true;
        }

        /** True when both flanks of a ring are at least half free and their means differ by more
         *  than {@link #UNEVEN_RING_SIGMAS} of their white-noise SD: one side holds a dip, a glitch or
         *  a tail's fall, and only the higher side is a fair background. */
        private boolean uneven(int left, int right, double leftSum, double rightSum, int box) {
            if (2 * left < box || 2 * right < box) {
                return false;
            }
            double difference = Math.abs(leftSum / left - rightSum / right);
            return difference > UNEVEN_RING_SIGMAS * noiseSd * Math.sqrt(1.0 / left + 1.0 / right);
        }

        /** The score of every block whose box is free and whose ring holds enough free samples. */
        Scores scores(boolean[] inPeak) {
            Scores out = new Scores(m);
            for (int j = 0; j < m; j++) {
                out.score[j] = Double.NaN;
                out.excluded[j] = true;
                int h = half(j);
                int lo = j - h;
                int hi = j + h;
                if (lo < 0 || hi >= m || busyBefore[hi + 1] - busyBefore[lo] > 0) {
                    continue;
                }
                int box = boxLast(j) - boxFirst(j) + 1;
                double score = score(j, box, (sums[hi + 1] - sums[lo]) / box);
                if (Double.isNaN(score)) {
                    continue;
                }
                out.score[j] = score;
                out.excluded[j] = inPeak[centre(j)];
                out.eligible++;
                out.looks += (double) stride / box;
            }
            return out;
        }

        /** The blocks whose score reaches {@code level} and is the highest within their box. */
        List<Integer> localMaxima(double[] score, double level) {
            List<Integer> out = new ArrayList<>();
            for (int j = 0; j < m; j++) {
                double s = score[j];
                if (!(s >= level)) {
                    continue;
                }
                int h = half(j);
                boolean top = true;
                for (int k = Math.max(0, j - h); k <= Math.min(m - 1, j + h) && top; k++) {
                    top = !(score[k] > s) && (k >= j || score[k] != s);
                }
                if (top) {
                    out.add(j);
                }
            }
            return out;
        }

        /** Free samples in blocks [from, to], clipped to the run. */
        private int freeCount(int from, int to) {
            int a = Math.max(0, from);
            int b = Math.min(m - 1, to);
            if (b < a) {
                return 0;
            }
            return Math.min(n, (b + 1) * stride) - a * stride - (busyBefore[b + 1] - busyBefore[a]);
        }

        /** Sum of the free samples in blocks [from, to], clipped to the run. */
        private double freeSum(int from, int to) {
            int a = Math.max(0, from);
            int b = Math.min(m - 1, to);
            return b < a ? 0.0 : freeSums[b + 1] - freeSums[a];
        }
    }

    /** The scores of the blocks (NaN where a box is not free), which blocks are left out of the
     *  noise (not free, or in the peak mask), and the number of looks. */
    private static final class Scores {
        final double[] score;
        final boolean[] excluded;
        double looks;
        int eligible;

        Scores(int m) {
            score = new double[m];
            excluded = new boolean[m];
        }
    }

    /**
     * The SD of the scores over the free samples (evenly strided): the larger of the robust SD
     * (1.4826 · MAD) and the scale of the upper tail, (Q₀.₉₉ − Q₀.₅)/Φ⁻¹(0.99). Both equal the SD
     * for normal scores; the second is larger when what is left of the baseline skews them upwards
     * (a baseline that follows the troughs of slow noise leaves bumps between them), which the MAD,
     * symmetric, does not see. The 99th percentile, not the 95th: on the lab-day bench the scores of
     * strongly correlated noise had tails heavier than their 95th percentile shows (17 false zones in
     * 640 runs against 6 with the 99th; 168 true faint zones against 164). The faint zones of a run
     * hold about 1 % of its free samples or less; where they hold more, the threshold rises a little.
     * Selection only (no sort): linear.
     */
    static double scoreSd(double[] score, boolean[] excluded) {
        int stride = Math.max(1, score.length / NOISE_SAMPLE_CAP);
        double[] work = new double[(score.length + stride - 1) / stride];
        int m = 0;
        for (int i = 0; i < score.length; i += stride) {
            if (!excluded[i]) {
                work[m++] = score[i];
            }
        }
        if (m < 2) {
            return 0.0;
        }
        double median = Selection.medianInPlace(work, m);
        double upper = Selection.select(work, 0, m - 1, (int) Math.floor(UPPER_QUANTILE * (m - 1)));
        return Math.max(NoiseEstimator.madSdInPlace(work, m), (upper - median) / UPPER_QUANTILE_Z);
    }

    /**
     * The score of block j with the samples of its box clipped at the box's
     * {@value #CLIP_RANK}rd highest value: a zone's top holds several samples of about the same
     * height and keeps its score, while a spike the spike filter left (one or two samples) loses
     * what made it stand out.
     */
    private static double clippedScore(double[] raw, Blocks blocks, int j, double score) {
        int from = blocks.boxFirst(j);
        int to = blocks.boxLast(j);
        double first = Double.NEGATIVE_INFINITY;
        double second = Double.NEGATIVE_INFINITY;
        double third = Double.NEGATIVE_INFINITY;
        for (int i = from; i <= to; i++) {
            double v = raw[i];
            if (v > first) {
                third = second;
                second = first;
                first = v;
            } else if (v > second) {
                third = second;
                second = v;
            } else if (v > third) {
                third = v;
            }
        }
        if (third == Double.NEGATIVE_INFINITY) {
            return score;
        }
        int box = to - from + 1;
        return score - ((first - third) + (second - third)) / box / blocks.scale(j, box);
    }

    /** Half the box length in samples for an expected width at half height. */
    static int halfBox(double widthS, double sampling) {
        return Math.max(1, (int) Math.round(0.5 * (BOX_WIDTHS * widthS / sampling - 1)));
    }

    /**
     * {@code v} (a window of samples at times {@code t}) with the straight line through the medians
     * of its first and last {@code edge} samples (at least {@link #MIN_EDGE_SAMPLES}) taken away, in place (a peak's tail or a baseline slope
     * under a faint zone).
     */
    private static double[] detrended(double[] t, double[] v, int edge) {
        int n = v.length;
        int k = Math.max(1, Math.min(Math.max(edge, MIN_EDGE_SAMPLES), n / 4));
        double t0 = 0.5 * (t[0] + t[k - 1]);
        double t1 = 0.5 * (t[n - k] + t[n - 1]);
        double v0 = Selection.median(Arrays.copyOfRange(v, 0, k));
        double v1 = Selection.median(Arrays.copyOfRange(v, n - k, n));
        double slope = t1 > t0 ? (v1 - v0) / (t1 - t0) : 0.0;
        for (int j = 0; j < n; j++) {
            v[j] -= v0 + slope * (t[j] - t0);
        }
        return v;
    }

    /** One Gaussian fitted around candidate sample {@code i} within its free stretch, or null. */
    private static Zone fitted(double[] t, double[] raw, Busy busy, int i, double width, double sampling,
                               double contrast, double noiseSd) {
        int reach = (int) Math.ceil(FIT_HALF_WINDOW_WIDTHS * width / sampling);
        int first = Math.max(Math.max(0, i - reach), busy.before(i) + 1);
        int last = Math.min(Math.min(raw.length - 1, i + reach), busy.after(i, raw.length) - 1);
        double sigma = width / GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
        double[] times = Arrays.copyOfRange(t, first, last + 1);
        double[] local = detrended(times, Arrays.copyOfRange(raw, first, last + 1),
                Math.max(2, (int) Math.round(EDGE_WIDTHS * width / sampling)));
        GaussianClusterFit.Result fit = GaussianClusterFit.fit(times, local, 0, last - first, new double[] {t[i]}, sigma,
                SignalLimits.FAINT_MIN_WIDTH_RATIO * sigma, MAX_WIDTH_RATIO * sigma);
        if (fit == null) {
            return null;
        }
        GaussianClusterFit.Component zone = fit.components().get(0);
        if (!(zone.height() >= MIN_HEIGHT_SIGMAS * noiseSd)
                || zone.height() > contrast / LEAST_BOX_MEAN_FRACTION + MIN_HEIGHT_SIGMAS * noiseSd
                || zone.height() > MAX_HEIGHT_SIGMAS * noiseSd) {
            return null; // too low, far taller than its box said, or too tall to be missed as a segment
        }
        double low = SignalLimits.FAINT_MIN_WIDTH_RATIO * sigma;
        double high = MAX_WIDTH_RATIO * sigma;
        if (!(zone.sigmaS() > low * (1 + BOUND_MARGIN) && zone.sigmaS() < high * (1 - BOUND_MARGIN))) {
            return null; // pressed against a width bound: a spike's residue or a wave, not a zone
        }
        double edge = EDGE_WIDTHS * width;
        if (!(zone.apexTimeS() >= t[first] + edge && zone.apexTimeS() <= t[last] - edge)) {
            return null;
        }
        return new Zone(zone, first, last);
    }
}
