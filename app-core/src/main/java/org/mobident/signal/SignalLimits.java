package org.mobident.signal;

/**
 * Named constants of the signal package: fractions, multiples and floors used by the
 * detection steps. They are kept here, in one place, so that every comparison in the package
 * refers to a named value. Each constant says where its value comes from.
 */
final class SignalLimits {

    /** 1 / Φ⁻¹(3/4): turns a median absolute deviation into a normal standard deviation
     *  (Rousseeuw &amp; Croux, J. Am. Stat. Assoc. 88 (1993) 1273). */
    static final double MAD_TO_SD = 1.482602218505602;

    /** The noise SD is never taken below this fraction of the (robust) signal range, so that a perfect
     *  synthetic trace still gets finite thresholds and a finite S/N (common practice). */
    static final double NOISE_FLOOR_RELATIVE = 1e-9;

    /** The background opening/closing of long traces runs on at most about this many block extremes. */
    static final int MORPHOLOGY_MAX_BLOCKS = 4_096;

    /** The robust noise estimates of a whole run use at most this many evenly strided samples: the
     *  normal-scaled MAD of 4,096 values has a standard error under 2 % (asymptotic variance
     *  1.36 σ²/n; from memory). */
    static final int NOISE_SAMPLE_CAP = 4_096;

    /** Robust scales of a whole run that need no more (the baseline noise outside the peaks, the
     *  spike residuals, the top-hat noise, the span behind the noise floor)
     *  use at most this many evenly strided samples: the normal-scaled MAD of 2,048 values has a
     *  standard error under 3 % (asymptotic variance 1.36 σ²/n; from memory). */
    static final int SCALE_SAMPLE_CAP = 2_048;

    /** The signal span for the noise floor leaves out this fraction of the values at each end, so
     *  that one wild point (a spike of 1e100) cannot lift the floor above every peak. */
    static final double SPAN_TAIL_FRACTION = 0.001;

    /** Automatic smoothing window, as a fraction of the typical full width at half height.
     *  A Savitzky–Golay window below the peak width keeps its height and width
     *  (Enke &amp; Nieman, Anal. Chem. 48 (1976) 705A, from memory; common practice). */
    static final double SMOOTHING_FRACTION_OF_WIDTH = 0.5;

    /** Reach (half-window) of the SNIP clipping, in typical widths at half height. An isolated
     *  Gaussian is fully clipped when the reach exceeds about 3.5 w½; 4 leaves margin. */
    static final double BASELINE_REACH_IN_WIDTHS = 4.0;

    /** Half-width of the closing that fills dips before the clipping, in typical widths at
     *  half height: a Gaussian dip is about 1.7 w½ wide at its base (4σ). */
    static final double BASELINE_CLOSING_IN_WIDTHS = 1.0;

    /** Zones closer than this (in typical widths at half height, gap between their feet) form one
     *  group whose baseline is bridged: the clipping reach, within which the clipping rises into
     *  a neighbour. */
    static final double GROUP_GAP_IN_WIDTHS = BASELINE_REACH_IN_WIDTHS;

    /** Width of the windows outside a group whose mean signal fixes the group's chord, in widths. */
    static final double GROUP_EDGE_IN_WIDTHS = 0.5;

    /** Longest group bridged by a chord, in widths (common practice: a chord much longer than the
     *  clipping reach would cut across real baseline curvature). */
    static final double GROUP_MAX_SPAN_IN_WIDTHS = 40.0;

    /** A single zone that stands above the clipped baseline over more than this many typical widths
     *  gets the chord of a group too (a concentrated zone with a long diffuse flank; a Gaussian
     *  zone a thousand noise SDs tall stands about 3.1 widths above the baseline's noise). */
    static final double WIDE_ZONE_IN_WIDTHS = 4.0;

    /** Step of the walk down a group's outer flanks, as a fraction of the group's length. */
    static final double WALK_STEP_OF_GROUP = 0.25;

    /** A group holding a dip (see {@code ClusterBaseline}) may span this many times the longest
     *  group: the sagging clipped baseline beside a dip is known to be wrong, a long chord only
     *  possibly so (common practice). */
    static final double GROUP_DIP_SPAN_FACTOR = 2.0;

    /** Time bins per typical width at half height in the decimated grid of the baseline. */
    static final double BASELINE_BINS_PER_WIDTH = 8.0;

    /** Half-range, in bin noise SDs, of the trimmed median that re-centres the baseline on the
     *  noise (common practice). */
    static final double BASELINE_OFFSET_TRIM_SIGMAS = 2.5;

    /** Iterations of that trimmed median. */
    static final int BASELINE_OFFSET_ITERATIONS = 4;

    /** Structuring element of the top-hat used to estimate the typical width, as a fraction of
     *  the trace duration (common practice: much wider than any single zone). */
    static final double TOPHAT_FRACTION_OF_SPAN = 0.05;

    /** A feature must rise this many noise SDs above the top-hat floor to enter the width
     *  estimate (common practice). */
    static final double WIDTH_ESTIMATE_MIN_SIGMAS = 10.0;

    /** An excursion, for the width estimate, is a run of points above this many noise SDs
     *  (common practice); it counts when its maximum passes the threshold above. */
    static final double WIDTH_ESTIMATE_REGION_SIGMAS = 3.0;

    /** Widths below this many sampling intervals are spikes for the width estimate. */
    static final double WIDTH_ESTIMATE_MIN_SAMPLES = 3.0;

    /** Fallback typical width, in sampling intervals, when the trace shows no clear peak. */
    static final double FALLBACK_WIDTH_SAMPLES = 10.0;

    /** Default minimum width at half height (spike rejection), fraction of the typical width. */
    static final double MIN_WIDTH_FRACTION_OF_TYPICAL = 0.25;

    /** Default minimum width at half height, in sampling intervals: a one-point spike has a
     *  width of one interval. */
    static final double MIN_WIDTH_SAMPLES = 2.0;

    /** The signal has returned to the baseline when the smoothed corrected signal is within
     *  this many smoothed-noise SDs of zero (common practice). */
    static final double RETURN_TO_BASELINE_SIGMAS = 1.0;

    /** Hysteresis of the valley split: two maxima are separate peaks when the signal falls and
     *  rises again by at least this fraction of the minimum reportable height ... */
    static final double SPLIT_FRACTION_OF_MIN_HEIGHT = 0.5;

    /** ... and by at least this many smoothed-noise SDs (common practice). */
    static final double SPLIT_MIN_SIGMAS = 4.0;

    /**
     * Window of the peak-to-peak noise h, in widths at half height of the peak. Ph. Eur. 2.2.46
     * asked for 20 w½ before Supplement 6.4 (2009), for "at least 5 w½" from 6.4 to 10.8, again
     * for 20 w½ in the harmonised text of Ph. Eur. 11.0 (2023), after which the EDQM advised users
     * (December 2022) to keep calculating on at least 5 w½ until a further revision (Supplement
     * 11.3); from the EDQM knowledge-database FAQ and trade press, the printed chapters not read
     * here. We follow the 5 w½ text: it is the window the pharmacopoeia used for most of the last
     * fifteen years and advises today, and it keeps h about the peak's own time span (its base is
     * about 3.4 w½). The number of samples in the window sets h = d₂(n)·σ, so a longer window gives
     * a larger h and a lower S/N for the same peak.
     */
    static final double PEAK_TO_PEAK_WINDOW_WIDTHS = 5.0;

    /** The noise SD around a peak is measured on the baseline samples within this many of its
     *  widths at half height (centred on the apex), widened when they are too few
     *  (see {@code LocalNoise}): wide enough to hold the baseline on both sides of the peak. */
    static final double NOISE_SUPPORT_WIDTHS = 20.0;

    /** Fewest baseline samples of a local noise SD for white noise; correlated noise needs more
     *  (see {@code LocalNoise}). With 200 samples the robust SD has a standard error of about 8 %
     *  (asymptotic variance 1.36 σ²/n of the normal-scaled MAD; Rousseeuw &amp; Croux 1993, from memory). */
    static final int LOCAL_NOISE_MIN_SAMPLES = 200;

    /** A local noise SD works on at most this many (evenly strided) samples: a standard error of
     *  about 5 %, small beside the spread of the observed peak-to-peak noise it stands for. */
    static final int LOCAL_NOISE_SAMPLE_CAP = 512;

    /** Samples of the smoothed corrected signal in a run that passes this many smoothed-noise SDs
     *  (the local level, see {@code BackgroundNoise}) belong to a peak and are left out of the noise (noise alone passes ±5 SDs about once
     *  in 1.7 million independent samples, so the noise keeps its tails). */
    static final double PEAK_MASK_SIGMAS = 5.0;

    /** ... together with this many typical widths at half height on each side (the feet). */
    static final double PEAK_MASK_MARGIN_WIDTHS = 0.5;

    /** The lag-one correlation of the noise is taken at most this large (the variance factors
     *  (1 + ρ)/(1 − ρ) stay finite). */
    static final double MAX_NOISE_CORRELATION = 0.99;

    /**
     * Probability that the significance test of the smoothed signal passes a noise excursion
     * anywhere in a run (a family-wise false-alarm rate). The threshold in smoothed-noise SDs is
     * the one-sided normal quantile z = Φ⁻¹(1 − α/M), M the number of smoothing windows in the run
     * (the Bonferroni bound for M looks; correlated noise has fewer independent looks, so the test
     * is then conservative). About 4.5 SDs for 60,000 samples and a 25-point window.
     */
    static final double DETECTION_FALSE_ALARM_PER_RUN = 0.01;

    /** Segments whose smoothed maximum stays below this fraction of the significance threshold or
     *  of the minimum height (both for the run as a whole) are not measured at all: a local noise
     *  half the run's would be needed to pass. */
    static final double PREFILTER_FRACTION = 0.5;

    /** Electrical spikes: a one- or two-sample block must stand this many robust SDs of the
     *  one-sample residuals away from the local parabola (common practice: a 5σ outlier test) ... */
    static final double SPIKE_MIN_RESIDUAL_SIGMAS = 5.0;

    /** ... and its shoulders at most this fraction of its height above the parabola. A Gaussian
     *  zone at least two sampling intervals wide at half height keeps shoulders of about 0.23 of its
     *  top or more (worked out for the least favourable sampling, apex midway between two samples);
     *  the shoulders of a spike are noise. */
    static final double SPIKE_SHOULDER_FRACTION = 0.15;

    /** A Gaussian zone at least two sampling intervals wide at half height keeps shoulders of at
     *  least this fraction of its top above the anchor parabola (worked out for the least favourable
     *  sampling, apex midway between two samples; see {@code SpikeFilter}). */
    static final double SPIKE_ZONE_SHOULDER_FRACTION = 0.23;

    /** Before a narrow peak is dropped as a spike, a zone's shoulders must be rejected by this many
     *  SDs of the shoulders' noise (one-sided, about 2 %; common practice). */
    static final double SPIKE_SHAPE_SIGMAS = 2.0;

    /** A peak narrower than this many sampling intervals at half height is tested for the shape
     *  of a spike before it is reported (a zone this narrow is barely sampled). */
    static final double SPIKE_CHECK_WIDTH_SAMPLES = 3.5;

    /** Shape term of the centre-time uncertainty: this fraction of the distance between apex and
     *  centre (a modelling choice, see {@code ZoneCentre}). */
    static final double CENTRE_SHAPE_FACTOR = 1.0 / 3.0;

    /** A peak whose apex and centre lie more than this many half-height widths apart is skewed
     *  enough for its centre to be checked against a fitted skewed zone (a modelling choice). */
    static final double SKEW_CHECK_MIN_WIDTHS = 0.1;

    /** Least shape term of a skewed zone whose centre a fitted zone confirms: this fraction of the
     *  apex–centre distance (a modelling choice: the fitted shape is itself a model). */
    static final double CENTRE_SHAPE_FLOOR_FACTOR = 0.1;

    /** Points of the apex fit: the top of the peak down to this fraction of the apex. */
    static final double APEX_FIT_LEVEL = 0.5;

    /** Band of each flank, as fractions of the height, whose samples give the straight line
     *  that is solved for half height (common practice: the middle of a flank is nearly straight). */
    static final double FLANK_LOWER = 0.25;
    static final double FLANK_UPPER = 0.75;

    /** Window of the Savitzky–Golay second derivative that looks for hidden zones, as a
     *  fraction of the typical width at half height: narrow enough to keep the curvature minima
     *  of two zones at Rs = 0.6 (heights 1:3) apart, wide enough to smooth the noise of the
     *  derivative (checked numerically, see {@code ShoulderFinder}). */
    static final double CURVATURE_WINDOW_FRACTION_OF_WIDTH = 0.75;

    /** Smallest half-width of that window, samples (5 points: the shortest quadratic fit that
     *  smooths at all). */
    static final int CURVATURE_MIN_HALF_WIDTH = 2;

    /** A maximum of the concavity −y″ marks a zone when it rises this many noise SDs of −y″
     *  above the lowest concavity on each side (between it and its neighbours): a two-sided
     *  5σ excursion of the noise alone is far rarer than the 3σ of a detection limit (common
     *  practice); the false-shoulder tests check the choice. */
    static final double SHOULDER_PROMINENCE_SIGMAS = 5.0;

    /** ... and only when −y″ there is itself this many noise SDs above zero, i.e. the signal
     *  is significantly concave (bends down) at the zone: in a tail, where −y″ climbs back
     *  from the convex flank towards zero, the rise alone says nothing, and the oscillating noise
     *  of a Savitzky–Golay derivative then supplies the fall (common practice: 3σ). */
    static final double SHOULDER_MIN_CONCAVITY_SIGMAS = 3.0;

    /** How far from a maximum of −y″ its rise and fall are looked for, in typical widths at
     *  half height (see {@code ShoulderFinder}). */
    static final double SHOULDER_REACH_IN_WIDTHS = 1.0;

    /** Clusters with more zones than this are left as the valley split found them (the fit
     *  grows as the cube of the parameter count). */
    static final int SHOULDER_MAX_ZONES = 8;

    /** Significance level of the extra-sum-of-squares F-test that accepts the extra zones
     *  (common practice: a strict level, since the curvature has already flagged the cluster). */
    static final double SHOULDER_F_TEST_ALPHA = 1e-3;

    /** Significance level at which two skewed zones replace one skewed zone that already explains
     *  a shoulder as well as Gaussians do (a modelling choice, stricter than
     *  {@link #SHOULDER_F_TEST_ALPHA}: real dispersion profiles are only roughly exponential, and
     *  their misfit must not pass for a second zone). */
    static final double SKEWED_SPLIT_F_TEST_ALPHA = 1e-6;

    /** Skewed zones are tried on a cluster only where the Gaussians leave a residual variance above
     *  this multiple of the noise variance (a modelling choice: Gaussian zones that fit leave about
     *  the noise variance, and the skewed fit costs several non-linear fits). */
    static final double SKEWED_CLUSTER_MISFIT_RATIO = 2.0;

    /** Least fall of the Bayesian information criterion (nats) for which skewed zones replace the
     *  Gaussians of a cluster (a modelling choice: Kass &amp; Raftery, J. Am. Stat. Assoc. 90 (1995)
     *  773 call a difference above 10 very strong evidence; from memory). */
    static final double SKEWED_CLUSTER_MIN_GAIN = 10.0;

    /** Least fall of n·ln(RSS) (nats; both forms have as many parameters, so it is the fall of the
     *  Bayesian information criterion) for which zones are taken as smoothed triangles rather than
     *  exponentially modified Gaussians (a modelling choice, on the evidence scale of
     *  {@link #SKEWED_CLUSTER_MIN_GAIN}: the EMG stays the form of mildly skewed zones, where the two
     *  fit about equally and a change of form would only move the zones by the noise). */
    static final double TRIANGLE_FORM_MIN_GAIN = 10.0;

    /** A cluster whose triangles do not fit down to the noise is still taken as triangles when they
     *  leave at most this fraction's inverse of the EMGs' residual sum of squares (a modelling
     *  choice: on the lab-day bench, triangular zones left EMG sums 10–100 times the triangles'
     *  residual, while an EMG pair that neither form fitted to the noise left 2.8 times). */
    static final double TRIANGLE_FORM_MIN_RSS_RATIO = 3.0;

    /** Fitted zones closer than this many SDs (the larger of the two) are one zone whose shape
     *  the Gaussian does not fit, not two (two equal zones 1σ apart show no curvature minimum
     *  of their own). */
    static final double SHOULDER_MIN_SEPARATION_SIGMAS = 1.0;

    /** A peak below the detection limit (S/N &lt; 3) whose w½/t exceeds this many times that of the
     *  run's narrower quantifiable zones is not reported (see {@code PeakDetector}): a modelling
     *  choice, with room for the growth of w½/t with t and for the scatter of the reference. */
    static final double FAINT_MAX_WIDTH_RATIO = 3.0;

    /** A peak below the detection limit whose w½/t is below this fraction of that of the run's
     *  narrower quantifiable zones is not reported either: it would need 1/0.45² ≈ 5 times their plate
     *  number (N = 5.54 (t/w½)², Ph. Eur. 2.2.46), more than diffusion and injection leave any zone of
     *  the same run; such narrow faint tops are spikes and noise (a modelling choice; on six lab-day
     *  benches the faint peaks below it were five noise tops, one spike and one foreign zone). */
    static final double FAINT_MIN_WIDTH_RATIO = 0.45;

    /** The flank walk of {@code ClusterBaseline} goes on only while a step falls by less than this
     *  fraction of the step before. An exponential flank exp(−t/τ) falls per step s by the factor
     *  exp(−s/τ) less each step (about 0.4 for s ≈ τ: the group above the detection level spans a
     *  few τ of a concentrated zone's diffuse flank and a step is a quarter of it); a drifting
     *  baseline falls by the same amount each step (ratio 1, scattered by the noise of the step
     *  means). A modelling choice, not tuned. */
    static final double WALK_DRIFT_DROP_RATIO = 0.9;

    /** Two maxima split at a valley are fitted as a cluster when the valley rises above this
     *  fraction of the lower maximum. On a pair of Gaussians the apex of the sum then leans more
     *  than about 0.02 σ towards the other zone (computed for heights 1:1, 1:3 and 1:0.7: a valley
     *  at 0.4 of the lower maximum means Rs ≈ 0.9–1.0); below it the tops are practically
     *  undisturbed and the valley split stands. */
    static final double CLUSTER_VALLEY_FRACTION = 0.4;

    /** The same for a pair of which one zone is broad ({@link #BROAD_ZONE_WIDTHS}): concentrated
     *  zones are not Gaussian, and the long diffuse flank of one (electromigration dispersion) runs
     *  under its neighbour while the valley stands at only a fifth of the lower maximum; a split
     *  there hands that flank to the neighbour and moves both first moments by tenths of a second
     *  (SkewedClusterTest). Below 0.15 the flanks carry too little of either zone to matter; a
     *  modelling choice, checked on the lab-day bench. */
    static final double SKEWED_CLUSTER_VALLEY_FRACTION = 0.15;

    /** A zone wider at half height than this many typical widths counts as broad (dispersed). */
    static final double BROAD_ZONE_WIDTHS = 1.5;


    /** Bounds of a fitted zone SD, as multiples of the typical SD (w½ / 2.3548). */
    static final double FIT_MIN_SIGMA_FACTOR = 0.1;
    static final double FIT_MAX_SIGMA_FACTOR = 10.0;

    /** Smallest trace that is analysed at all, points. */
    static final int MIN_POINTS = 7;

    /** Above this half-width the quadratic/cubic smoothing uses running moments, O(n). */
    static final int SMOOTHING_MOMENTS_MIN_HALF_WIDTH = 8;

    /** Running moments are recomputed from scratch this often, to bound rounding drift. */
    static final int SMOOTHING_MOMENTS_REFRESH = 2048;

    /** A saturated top: at least this many consecutive samples at exactly the trace's largest value
     *  (with noise of even one converter step, three equal samples at a true apex are rare; a
     *  modelling choice). */
    static final int FLAT_TOP_MIN_SAMPLES = 3;

    /** A flat stretch longer than the trace's length over this divisor is a dead or idle signal, not
     *  a cut top. */
    static final int FLAT_TOP_MAX_SHARE_DIVISOR = 20;

    /** The cut level must stand this many noise SDs above the trace's median to be a zone's top. */
    static final double FLAT_TOP_MIN_RISE_SIGMAS = 20.0;

    /** Samples fitted on each side of a flat top: this many plateau lengths, at least the minimum. */
    static final double FLAT_TOP_FLANK_IN_PLATEAUS = 1.5;
    static final int FLAT_TOP_MIN_FLANK_SAMPLES = 4;

    /** A flank ends where the signal climbs this many noise SDs above its lowest value so far (the
     *  next zone begins there; a modelling choice). */
    static final double FLAT_TOP_FLANK_RISE_SIGMAS = 4.0;

    /** The flank fit's top must pass the cut by this many noise SDs, or this fraction of the cut's
     *  height, whichever is larger (modelling choices, checked on clipped simulated zones). */
    static final double FLAT_TOP_MIN_EXCESS_SIGMAS = 3.0;
    static final double FLAT_TOP_MIN_EXCESS_FRACTION = 0.02;

    /** A flank fit whose height is more than this many times the cut's height extrapolates too far
     *  to be used. */
    static final double FLAT_TOP_MAX_RISE = 20.0;

    /** Evaluation and iteration cap of the flank fit. */
    static final int FLAT_TOP_MAX_EVALUATIONS = 200;

    /** A peak whose w½/t exceeds this many times that of the run's narrower quantifiable zones is
     *  checked for being a baseline step's edge. */
    static final double STEP_MIN_WIDTH_RATIO = 1.5;

    /** The levels before and after a peak are medians over this many of its widths. */
    static final double STEP_LEVEL_WIDTHS = 2.0;

    /** A broad peak whose levels before and after differ by more than this share of its height is a
     *  step's edge, not a zone (a modelling choice, checked on baseline steps of 3–15 noise SDs from
     *  the independent generator and of ±12 and ±150 in BaselineStepTest). */
    static final double STEP_MAX_LEVEL_SHARE = 0.5;

    private SignalLimits() {
    }
}
