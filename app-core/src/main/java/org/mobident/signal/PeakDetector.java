package org.mobident.signal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleUnaryOperator;
import java.util.function.IntToDoubleFunction;
import org.apache.commons.math3.special.Erf;
import org.mobident.Tolerances;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;

/**
 * Finds and measures the peaks of one CZE electropherogram.
 *
 * <p>With {@link Detection#INDIRECT} the analytes are dips; the signal is sign-flipped first,
 * every step then looks for peaks that rise, and the peaks are reported with
 * {@code dip = true} and positive heights and areas. Steps (each linear in the number of points):
 * <ol>
 * <li>Spikes: one- and two-sample features of either sign with no shoulders are replaced by the
 *     local parabola through their neighbours ({@link SpikeFilter}), so that nothing after this
 *     sees them and a spike on a peak does not move its apex, height or area.</li>
 * <li>White-noise scale σ_d from the first differences ({@link NoiseEstimator#robustSd}): used
 *     where a white-noise scale is meant (the floor of the width estimate, the noise of the
 *     curvature, the weights of the apex fit) and, against the marginal SD below, for the lag-one
 *     correlation of the noise.</li>
 * <li>Typical width at half height w½ of the trace ({@link PeakWidthEstimator}).</li>
 * <li>Quadratic Savitzky–Golay smoothing ({@link SavitzkyGolay}); the window is
 *     {@link PeakSettings#smoothingWindowS()} or, when NaN, w½/2.</li>
 * <li>Baseline by SNIP clipping of the smoothed signal ({@link SnipBaseline}), lowered to a
 *     common chord under crowded stretches and replaced by one where a dip drags it down
 *     ({@link ClusterBaseline}); the corrected signal is the signal minus the baseline, raw and
 *     smoothed.</li>
 * <li>The run's noise ({@link BackgroundNoise}): the noise level along the run, the samples that
 *     belong to peaks, and the robust SDs σ (raw) and σ_s (smoothed) of the corrected signal
 *     itself outside them: the marginal SDs, right for correlated noise too. The lag-one
 *     correlation is ρ = 1 − σ_d²/σ² (first differences have variance 2σ²(1 − ρ)).</li>
 * <li>Segments ({@link PeakSegmenter}): the smoothed corrected signal leaves the baseline when it
 *     exceeds σ_s; maxima are split at the valley minimum when the signal falls and rises again
 *     by half the minimum reportable height of the run (at least 4 σ_s).</li>
 * <li>Clusters ({@link ShoulderFinder}, {@link GaussianClusterFit}): the segments that touch at
 *     valleys form a region. A region is a cluster when the concavity −y″ (Savitzky–Golay
 *     second derivative) shows more significant maxima than the region has signal maxima (a
 *     zone hidden in a shoulder, no valley), or when a valley rises above
 *     {@link SignalLimits#CLUSTER_VALLEY_FRACTION} of the lower neighbouring maximum (deep
 *     overlap: the apex of the sum leans towards the other zone). A cluster is fitted by a sum of
 *     Gaussians (Levenberg–Marquardt) started from the curvature maxima, and by one Gaussian per
 *     segment; the extra zones stand when the extra-sum-of-squares F-test accepts them at
 *     {@link SignalLimits#SHOULDER_F_TEST_ALPHA}, every zone reaches the minimum height and width,
 *     and no two zones are closer than {@link SignalLimits#SHOULDER_MIN_SEPARATION_SIGMAS} σ; a
 *     shoulder inside a single segment must moreover beat one skewed zone, of whichever form
 *     ({@link SkewedZoneFit}: exponentially modified Gaussian or smoothed triangle) fits it
 *     closer, by the same test; where the Gaussians find no plausible pair there (two skewed zones
 *     a width apart), two skewed zones must beat the one at
 *     {@link SignalLimits#SKEWED_SPLIT_F_TEST_ALPHA}. A deeply overlapped region without extra zones keeps the one-per-segment
 *     fit on the same checks. Every zone of an accepted fit is one peak: apex time, its standard
 *     error (s²(JᵀJ)⁻¹) and height from the fit, area H σ √(2π) and width at half height
 *     2.3548 σ from the fitted Gaussian, start and end at the time where the neighbouring zone
 *     starts to dominate (the outer ends of the cluster where the signal returns to the
 *     baseline), centre from the zone's share of the signal. Plates, S/N and resolution follow
 *     from these as for any peak. Otherwise (and for every other region) the segments stand as
 *     they are. Only clusters are fitted, so the cost outside them stays linear in the number of
 *     points.</li>
 * <li>Measures of each segment (below); a segment narrower at half height (raw corrected signal)
 *     than {@link PeakSettings#minWidthS()} (by default the larger of 2 sampling intervals and
 *     w½/4) is not a peak.</li>
 * <li>The last checks, with the noise where the peak sits ({@link LocalNoise}): the robust SDs of
 *     the raw and smoothed corrected signal on the baseline samples within
 *     {@link SignalLimits#NOISE_SUPPORT_WIDTHS} of the peak's widths around it; the peak-to-peak
 *     noise h = d₂(n)·σ_local over a window of {@link SignalLimits#PEAK_TO_PEAK_WINDOW_WIDTHS} of its
 *     widths (n samples; see below); S/N = 2H/h. A peak is reported when (a) its S/N reaches
 *     {@link PeakSettings#segmentMinSignalToNoise()} (by default 2, the lower end of the detection limit), (b) its smoothed
 *     height stands z = Φ⁻¹(1 − α/M) local smoothed-noise SDs above the baseline, α =
 *     {@link SignalLimits#DETECTION_FALSE_ALARM_PER_RUN} the chance of a false peak anywhere in the
 *     run and M the number of smoothing windows in it (the significance of the detection itself,
 *     measured on the smoothed signal, not assumed white), and (c) when it is narrower than
 *     {@link SignalLimits#SPIKE_CHECK_WIDTH_SAMPLES} samples, its top has shoulders (a barely
 *     sampled zone, not a spike). Then the uncertainty of its centre time is set.</li>
 * <li>Faint zones between the peaks ({@link FaintZoneSearch}): a matched filter as wide as the
 *     run's zones at each time finds zones down to about three noise SDs tall, whatever their S/N,
 *     at the same family-wise false-alarm rate α; each is fitted by one Gaussian and judged as
 *     above, without test (b), which the filter replaces, and with {@link PeakSettings#minSignalToNoise()}
 *     (by default none) for (a).</li>
 * </ol>
 *
 * <p><b>The peak-to-peak noise and the detection limit.</b> Ph. Eur. 2.2.46 defines h as the range
 * of the background noise over a window around the peak. For noise of SD σ the expected range of n
 * samples is d₂(n)·σ (Tippett 1925); for positively correlated noise the expected range is smaller
 * (the maximum of positively correlated normal variables is stochastically smaller than that of
 * independent ones: Slepian, Bell Syst. Tech. J. 41 (1962) 463; from memory), so h = d₂(n)·σ with
 * σ the marginal SD never overstates the S/N. The range grows with the number of samples, so the
 * same peak has a lower S/N when it is sampled faster or is wider: a Gaussian peak ten noise SDs
 * tall has S/N 3.6 at 20 Hz and 2.3 s wide at half height (n = 231, d₂ = 5.6), and 3.0 at 50 Hz
 * and 5.7 s (n = 1426, d₂ = 6.7); over 20 w½ it would be 3.1 and 2.7. So "a peak ten noise SDs
 * tall is always found" and "S/N ≥ 3" cannot both hold for every sampling rate: the height in noise
 * SDs of a detectable peak depends on the number of samples the range is taken over. We keep the
 * pharmacopoeial definition, report down to the lower end of the ICH Q2 detection limit, 2:1
 * ("a signal-to-noise ratio between 3 or 2:1 is generally considered acceptable", ICH Q2(R1) § 6.2;
 * from memory), marked as at the detection limit below 3, and take the window of 5 w½ that the
 * pharmacopoeia asked for from Supplement 6.4 and advises again (see
 * {@link SignalLimits#PEAK_TO_PEAK_WINDOW_WIDTHS}); the older 20 w½ would lower every S/N further.
 * A segment below 2 but significant on the smoothed signal is reported only when
 * {@code minSignalToNoise} is set lower; below 2 the segments are mostly the narrow tops of noise
 * and spike residues. Fainter zones are found by the matched filter instead, which looks only for
 * zones as wide as the run's and so needs no S/N floor; they are marked "below detection limit"
 * ({@link SignalToNoiseClass}). Below 3,
 * a peak must also have both flanks inside the recording and be about as narrow as the run's zones at its time (see
 * {@code withoutDoubtfulFaintPeaks}), and how peaks are split and fitted never uses a height below
 * the 3:1 limit, so that faint peaks do not change how the large zones are cut.
 *
 * <p>Measures (all on times, so irregular sampling needs no special case):
 * apex time, height and apex-time uncertainty from a weighted least-squares fit of the top
 * ({@link ApexFit}); area by the trapezoidal rule on the raw corrected signal over
 * [start, end]; corrected area A / t_apex (Altria, Chromatographia 35 (1993) 177); width at
 * half height by a straight line through the middle of each flank solved for H/2
 * (see {@code flankWidthS}); plates
 * N = 5.54 (t/w½)², resolution to the nearest peak Rs = 1.18 (t₂ − t₁)/(w½,₁ + w½,₂) and
 * S/N = 2H/h (Ph. Eur. 2.2.46; USP &lt;621&gt;); centre time, the first moment of the raw corrected
 * signal over [start, end], and its uncertainty ({@link ZoneCentre}). Times are those of the
 * trace, taken as time since injection.
 */
public final class PeakDetector {

    /** Ph. Eur. 2.2.46 plate-number factor (8 ln 2 rounded as the pharmacopoeia prints it). */
    static final double PLATE_FACTOR = 5.54;
    /** Ph. Eur. 2.2.46 resolution factor for widths at half height. */
    static final double RESOLUTION_FACTOR = 1.18;
    /** Polynomial order of the main smoothing (quadratic, Savitzky &amp; Golay 1964). */
    static final int SMOOTHING_ORDER = 2;

    private PeakDetector() {
    }

    /**
     * Detects and measures the peaks of a trace.
     *
     * @param trace     the trace (times strictly increasing; sampling may be irregular)
     * @param detection DIRECT (peaks rise) or INDIRECT (peaks are dips)
     * @param settings  detection settings
     * @return peaks in order of apex time, with the run's noise SD and peak-to-peak noise
     */
    public static TraceAnalysis analyse(Trace trace, Detection detection, PeakSettings settings) {
        Objects.requireNonNull(trace, "trace");
        Objects.requireNonNull(detection, "detection");
        Objects.requireNonNull(settings, "settings");
        boolean dip = detection == Detection.INDIRECT;
        double[] t = trace.timesS();
        double[] y = trace.signals();
        int n = y.length;
        if (dip) {
            negate(y);
        }
        if (n < SignalLimits.MIN_POINTS) {
            double sigma = flooredNoise(y);
            return new TraceAnalysis(List.of(), sigma, NoiseEstimator.expectedNormalRange(2) * sigma);
        }
        List<FlatTop> flatTops = FlatTops.repair(t, y);
        List<int[]> spikes = new ArrayList<>();
        SpikeFilter.despike(t, y, spikes);
        double floor = noiseFloor(y);
        double whiteSigma = Math.max(NoiseEstimator.robustSd(y), floor);
        double sampling = medianInterval(t);
        double typicalWidth = Double.isFinite(settings.zoneWidthS()) && settings.zoneWidthS() > 0
                ? settings.zoneWidthS() : PeakWidthEstimator.typicalWidthS(t, y, whiteSigma, sampling);

        double windowS = Double.isFinite(settings.smoothingWindowS()) && settings.smoothingWindowS() > 0
                ? settings.smoothingWindowS()
                : SignalLimits.SMOOTHING_FRACTION_OF_WIDTH * typicalWidth;
        int halfWidth = Math.max(1, (int) Math.round(0.5 * (windowS / sampling - 1)));
        halfWidth = Math.min(halfWidth, (n - 1) / 2);
        double[] smooth = SavitzkyGolay.smooth(y, halfWidth, SMOOTHING_ORDER);
        boolean smoothing = halfWidth >= 1 && SMOOTHING_ORDER < 2 * halfWidth;
        double[] smoothWeights = smoothing ? SavitzkyGolay.weights(halfWidth, SMOOTHING_ORDER) : new double[] {1.0};
        double smoothGain = Math.sqrt(PeakWidthEstimator.sumOfSquares(smoothWeights));
        double smoothBound = sumOfMagnitudes(smoothWeights);
        int typicalPoints = (int) Math.round(SignalLimits.PEAK_TO_PEAK_WINDOW_WIDTHS * typicalWidth / sampling) + 1;
        double typicalRange = NoiseEstimator.expectedNormalRange(Math.max(2, Math.min(n, typicalPoints)));

        // the run's noise: the marginal SDs of the corrected raw and smoothed signal outside the peaks
        // (measured, not derived from first differences); the common baseline then changes the
        // baseline only under groups of zones, which leaves these SDs as they are, and the samples
        // inside peaks are traced again on the final baseline
        double[] baseline = SnipBaseline.estimate(t, smooth, typicalWidth, sampling);
        int margin = (int) Math.ceil(SignalLimits.PEAK_MASK_MARGIN_WIDTHS * typicalWidth / sampling);
        int block = (int) Math.max(SignalLimits.LOCAL_NOISE_MIN_SAMPLES,
                Math.round(SignalLimits.NOISE_SUPPORT_WIDTHS * typicalWidth / sampling));
        BackgroundNoise.Levels levels = BackgroundNoise.levels(smooth, baseline, block, floor * smoothGain);
        LocalNoise.Estimate background = BackgroundNoise.sds(y, smooth, baseline, levels, margin, floor, smoothGain);
        double sigma = background.rawSd();
        double smoothSigma = background.smoothSd();
        ClusterBaseline.bridge(t, smooth, baseline,
                SignalLimits.RETURN_TO_BASELINE_SIGMAS * smoothSigma,
                Math.max(settings.minSignalToNoise(), Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE)
                        * typicalRange * Math.max(sigma, whiteSigma) / 2,
                SignalLimits.GROUP_GAP_IN_WIDTHS * typicalWidth, SignalLimits.GROUP_EDGE_IN_WIDTHS * typicalWidth,
                SignalLimits.GROUP_MAX_SPAN_IN_WIDTHS * typicalWidth,
                SignalLimits.WIDE_ZONE_IN_WIDTHS * typicalWidth);
        double[] raw = minusBaseline(y, smooth, baseline);

        // the samples of the peaks (runs passing 5 noise levels, with their feet), left out of the
        // local noise
        boolean[] inPeak = BackgroundNoise.peaks(smooth, levels, margin);
        double correlation = lagOneCorrelation(whiteSigma, sigma);
        LocalNoise localNoise = new LocalNoise(raw, smooth, inPeak, correlation,
                new LocalNoise.Estimate(sigma, smoothSigma, n), floor, floor * smoothGain);

        double peakToPeak = typicalRange * sigma;
        double segmentSn = settings.segmentMinSignalToNoise();
        double minHeight = segmentSn * peakToPeak / 2;
        // how peaks are split and fitted does not go below the detection limit: reporting fainter
        // isolated peaks must not let noise and spikes split the large zones
        double structureHeight = Math.max(settings.minSignalToNoise(), Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE)
                * peakToPeak / 2;
        double significance = significanceSigmas(n, halfWidth);
        double returnLevel = SignalLimits.RETURN_TO_BASELINE_SIGMAS * smoothSigma;
        double hysteresis = Math.max(SignalLimits.SPLIT_FRACTION_OF_MIN_HEIGHT * structureHeight,
                SignalLimits.SPLIT_MIN_SIGMAS * smoothSigma);
        double prefilter = SignalLimits.PREFILTER_FRACTION * Math.max(minHeight, significance * smoothSigma);
        double minWidth = Double.isFinite(settings.minWidthS()) && settings.minWidthS() >= 0
                ? settings.minWidthS()
                : Math.max(SignalLimits.MIN_WIDTH_SAMPLES * sampling,
                        SignalLimits.MIN_WIDTH_FRACTION_OF_TYPICAL * typicalWidth);

        int curvatureHalfWidth = ShoulderFinder.halfWidth(typicalWidth, sampling, n);
        double[] concavity = ShoulderFinder.concavity(y, curvatureHalfWidth, sampling);
        double concavitySd = ShoulderFinder.noiseSd(concavity, whiteSigma, curvatureHalfWidth, sampling);
        Cluster cluster = new Cluster(t, raw, smooth, concavity,
                SignalLimits.SHOULDER_MIN_CONCAVITY_SIGMAS * concavitySd,
                SignalLimits.SHOULDER_PROMINENCE_SIGMAS * concavitySd,
                Math.max(1, (int) Math.round(SignalLimits.SHOULDER_REACH_IN_WIDTHS * typicalWidth / sampling)),
                typicalWidth / GaussianClusterFit.HALF_WIDTH_PER_SIGMA, structureHeight, minWidth, sigma);

        List<int[]> segments = PeakSegmenter.segments(smooth, returnLevel, hysteresis);
        List<Measured> found = measureRegions(segments, cluster, t, raw, smooth, returnLevel, whiteSigma, halfWidth,
                prefilter, minWidth);
        double typicalSigma = typicalWidth / GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
        Reporting reporting = new Reporting(t, raw, smooth, sampling, localNoise, correlation, significance,
                smoothBound, segmentSn, settings.minSignalToNoise(), returnLevel,
                SignalLimits.FIT_MIN_SIGMA_FACTOR * typicalSigma, SignalLimits.FIT_MAX_SIGMA_FACTOR * typicalSigma);
        List<Measured> reported = new ArrayList<>(found.size());
        for (Measured m : found) {
            Measured r = reporting.judge(m, false);
            if (r != null) {
                reported.add(r);
            }
        }
        reported = withoutDoubtfulFaintPeaks(reported, t[0], t[n - 1]);
        reported = withFaintZones(reported, t, raw, inPeak, spikes, sampling, localNoise, reporting);
        reported = withoutBaselineSteps(reported, t, y);
        List<Peak> peaks = new ArrayList<>(reported.size());
        for (int k = 0; k < reported.size(); k++) {
            Measured m = reported.get(k);
            double resolution = Double.NaN;
            Measured neighbour = nearest(reported, k);
            if (neighbour != null) {
                resolution = resolution(m.apexTimeS, m.widthHalfS, neighbour.apexTimeS, neighbour.widthHalfS);
            }
            double apexTime = m.apexTimeS;
            double plates = PLATE_FACTOR * (apexTime / m.widthHalfS) * (apexTime / m.widthHalfS);
            double correctedArea = apexTime > 0 ? m.area / apexTime : Double.NaN;
            double apexSd = m.apexTimeSdS;
            if (!m.fitted) {
                double overlap = overlapShiftS(reported, k);
                apexSd = Math.sqrt(apexSd * apexSd + overlap * overlap);
            }
            double centreSd = m.centreTimeSdS;
            double cut = flatTopCentreSd(flatTops, m.startTimeS, m.endTimeS);
            if (cut > 0) {
                // a top repaired from its flanks: its centre is as sure as the flank fit, no surer
                apexSd = Math.hypot(apexSd, cut);
                centreSd = Math.hypot(centreSd, cut);
            }
            peaks.add(new Peak(nearestIndex(t, apexTime), apexTime, apexSd, m.centreTimeS, centreSd,
                    m.startTimeS, m.endTimeS, m.height, m.area, correctedArea, m.widthHalfS,
                    plates, resolution, m.signalToNoise, dip, m.centreShapeSdS));
        }
        double[] rule = expectedWidthRule(reported, sampling);
        ExpectedZoneProbe probe = new ExpectedZoneProbe(t, raw, concavity, concavitySd, localNoise, correlation,
                sampling, SignalLimits.FIT_MIN_SIGMA_FACTOR * typicalSigma,
                SignalLimits.FIT_MAX_SIGMA_FACTOR * typicalSigma, rule[0], rule[1], dip);
        return new TraceAnalysis(peaks, sigma, peakToPeak, probe, flatTops);
    }

    /** The fit uncertainty of a repaired flat top whose centre lies in [from, to], s (0 when none does). */
    private static double flatTopCentreSd(List<FlatTop> flatTops, double fromS, double toS) {
        for (FlatTop top : flatTops) {
            if (top.centredWithin(fromS, toS)) {
                return top.centreSdS();
            }
        }
        return 0.0;
    }

    /**
     * The measured peaks of every region (segments that share a valley point above the return
     * level): the zones of a confirmed cluster, else each segment measured on its own.
     */
    private static List<Measured> measureRegions(List<int[]> segments, Cluster cluster, double[] t, double[] raw,
                                                 double[] smooth, double returnLevel, double whiteSigma,
                                                 int halfWidth, double prefilter, double minWidth) {
        List<Measured> found = new ArrayList<>();
        int s = 0;
        while (s < segments.size()) {
            int e = s;
            while (e + 1 < segments.size() && segments.get(e)[1] == segments.get(e + 1)[0]
                    && smooth[segments.get(e)[1]] > returnLevel) {
                e++;
            }
            List<int[]> region = segments.subList(s, e + 1);
            List<Measured> resolved = cluster.resolve(region);
            if (resolved != null) {
                found.addAll(resolved);
            } else {
                for (int[] segment : region) {
                    Measured m = measure(t, raw, smooth, segment[0], segment[1], whiteSigma, halfWidth,
                            prefilter, minWidth);
                    if (m != null) {
                        found.add(m);
                    }
                }
            }
            s = e + 1;
        }
        return found;
    }

    /**
     * The last checks of a measured peak, with the noise where it sits: the local noise SDs of the
     * raw and the smoothed signal ({@link LocalNoise}), the peak-to-peak noise h = d₂(n)·σ over
     * {@link SignalLimits#PEAK_TO_PEAK_WINDOW_WIDTHS} of its widths, its S/N = 2H/h, the
     * significance of its smoothed height, the spike shape of a barely sampled top, and the
     * uncertainty of its centre time.
     */
    private record Reporting(double[] t, double[] raw, double[] smooth, double sampling, LocalNoise noise,
                             double correlation, double significance, double smoothBound,
                             double segmentMinSignalToNoise, double minSignalToNoise, double returnLevel,
                             double minSigmaS, double maxSigmaS) {

        /** The peak with its S/N and centre uncertainty, or null when it is not to be reported;
         *  {@code significant} when the matched filter has already shown it significant. */
        Measured judge(Measured m, boolean significant) {
            int apex = nearestIndex(t, m.apexTimeS);
            int support = (int) Math.ceil(0.5 * SignalLimits.NOISE_SUPPORT_WIDTHS * m.widthHalfS / sampling);
            LocalNoise.Estimate local = noise.around(apex, support, false);
            double peakToPeak = peakToPeak(local, m.widthHalfS, sampling);
            double signalToNoise = 2 * m.height / peakToPeak;
            if (!(signalToNoise >= (significant ? minSignalToNoise : segmentMinSignalToNoise))) {
                return null;
            }
            // the smoothed noise SD never exceeds Σ|w| times the raw one, whatever the correlation
            // (|Cov| ≤ σ²): a peak above z·Σ|w|·σ_raw is significant without measuring it
            if (!significant && !(m.smoothedHeight >= significance * smoothBound * local.rawSd())
                    && !(m.smoothedHeight >= significance * noise.around(apex, support, true).smoothSd())) {
                return null;
            }
            if (!m.fitted && m.widthHalfS < SignalLimits.SPIKE_CHECK_WIDTH_SAMPLES * sampling
                    && spikeShaped(apex, local.rawSd())) {
                return null;
            }
            if (m.centre == null) {
                return m.reported(signalToNoise, m.centreTimeS, m.centreTimeSdS, m.centreShapeSdS);
            }
            CentreEstimate c = centre(m, signalToNoise);
            double centreSd = m.centre.uncertaintyWithShapeS(local.rawSd(), correlation, c.shapeTermS(),
                    new ZoneCentre.Boundaries(m.startTimeS, aboveBaseline(m.startTimeS), m.endTimeS,
                            aboveBaseline(m.endTimeS)),
                    m.widthHalfS, m.area);
            return m.reported(signalToNoise, c.centreTimeS(), centreSd, Math.min(c.shapeTermS(), centreSd));
        }

        /** A peak's reported centre time and the shape term of its uncertainty, s. */
        private record CentreEstimate(double centreTimeS, double shapeTermS) {
        }

        /**
         * The centre of a measured peak and the shape term of its uncertainty ({@link ZoneCentre}). A skewed zone
         * (apex and centre more than {@link SignalLimits#SKEW_CHECK_MIN_WIDTHS} w½ apart) measured
         * well enough to fit (S/N at least the quantitation limit) gets a second estimate of its
         * first moment, that of one skewed zone fitted to its samples, in the form that fits it
         * better ({@link SkewedZoneFit#better}: μ + τ of an exponentially modified Gaussian, Grushka 1972,
         * or the centroid of a smoothed triangle; an EMG's μ + τ on a triangular zone is off by up
         * to a second, which had left such zones ambiguous): the model extrapolates the diffuse
         * flank where the moment of the samples stops at the peak's end. The two estimates agree on a zone recorded
         * whole and differ where the flank was cut or the baseline took part of it; the fitted one
         * is reported, and their difference is the term, never below
         * {@link SignalLimits#CENTRE_SHAPE_FLOOR_FACTOR} of its distance from the apex. On the
         * lab-day bench (seeds 7 and 3, 386 skewed zones with no other zone within 1.5 widths) the
         * fitted first moment lay closer to the true one: root-mean-square error 0.08 s against
         * 0.17 s for the moment of the samples, which the cut diffuse flank biases towards the
         * apex (the largest errors 1.0 s against 1.5 s). Otherwise (symmetric, faint, or no
         * plausible fit) the centre is the moment of the samples and the term is
         * {@link SignalLimits#CENTRE_SHAPE_FACTOR} of the apex–centre distance.
         */
        private CentreEstimate centre(Measured m, double signalToNoise) {
            double moment = m.centre.centreTimeS();
            double skew = moment - m.apexTimeS;
            CentreEstimate byDistance = new CentreEstimate(moment, SignalLimits.CENTRE_SHAPE_FACTOR * Math.abs(skew));
            if (Math.abs(skew) < SignalLimits.SKEW_CHECK_MIN_WIDTHS * m.widthHalfS
                    || !(signalToNoise >= Tolerances.QUANTITATION_LIMIT_SIGNAL_TO_NOISE)) {
                return byDistance;
            }
            SkewedZoneFit f = SkewedZoneFit.better(t, raw, nearestIndex(t, m.startTimeS),
                    nearestIndex(t, m.endTimeS), minSigmaS, maxSigmaS);
            if (f == null || f.direction() != Math.signum(skew)) {
                return byDistance;
            }
            double fitted = f.firstMomentS();
            if (!(fitted > m.startTimeS && fitted < m.endTimeS)) {
                return byDistance;
            }
            return new CentreEstimate(fitted, Math.max(Math.abs(moment - fitted),
                    SignalLimits.CENTRE_SHAPE_FLOOR_FACTOR * Math.abs(fitted - m.apexTimeS)));
        }

        /** How far the smoothed corrected signal stands above the return level at a time (a peak's
         *  end on the baseline gives 0, a valley shared with a neighbour its excess). */
        private double aboveBaseline(double timeS) {
            return Math.max(0.0, valueAt(timeS) - returnLevel);
        }

        /** The smoothed corrected signal at a time, by linear interpolation between samples. */
        private double valueAt(double timeS) {
            int i = Arrays.binarySearch(t, timeS);
            if (i >= 0) {
                return smooth[i];
            }
            int after = -i - 1;
            if (after == 0) {
                return smooth[0];
            }
            if (after >= t.length) {
                return smooth[t.length - 1];
            }
            double f = (timeS - t[after - 1]) / (t[after] - t[after - 1]);
            return smooth[after - 1] + f * (smooth[after] - smooth[after - 1]);
        }

        /** True when the highest one or two raw samples at the apex have no shoulders. */
        private boolean spikeShaped(int apex, double noiseSd) {
            int top = apex;
            for (int i = Math.max(0, apex - 1); i <= Math.min(raw.length - 1, apex + 1); i++) {
                if (raw[i] > raw[top]) {
                    top = i;
                }
            }
            int pair = top > 0 && (top + 1 >= raw.length || raw[top - 1] > raw[top + 1]) ? top - 1 : top;
            return SpikeFilter.looksLikeSpike(t, raw, top, 1, noiseSd)
                    || (pair + 1 < raw.length && SpikeFilter.looksLikeSpike(t, raw, pair, 2, noiseSd));
        }
    }

    /**
     * The peak-to-peak noise h of a peak of width w½ where the noise is {@code local}: d₂(n)·σ over
     * n samples of {@link SignalLimits#PEAK_TO_PEAK_WINDOW_WIDTHS} widths.
     */
    private static double peakToPeak(LocalNoise.Estimate local, double widthHalfS, double sampling) {
        long points = Math.max(2, Math.round(SignalLimits.PEAK_TO_PEAK_WINDOW_WIDTHS * widthHalfS / sampling) + 1);
        return NoiseEstimator.expectedNormalRange(points) * local.rawSd();
    }

    /** The peak-to-peak noise h of a peak of width w½ whose apex is sample {@code apex} ({@link #peakToPeak}). */
    static double peakToPeakNoise(LocalNoise noise, int apex, double widthHalfS, double sampling) {
        int support = (int) Math.ceil(0.5 * SignalLimits.NOISE_SUPPORT_WIDTHS * widthHalfS / sampling);
        return peakToPeak(noise.around(apex, support, false), widthHalfS, sampling);
    }

    /** Resolution Rs = 1.18 (t₂ − t₁)/(w½,₁ + w½,₂) of two peaks (Ph. Eur. 2.2.46). */
    static double resolution(double apexAS, double widthAS, double apexBS, double widthBS) {
        return RESOLUTION_FACTOR * Math.abs(apexBS - apexAS) / (widthAS + widthBS);
    }

    /** The lag-one correlation ρ = 1 − σ_d²/σ² of the noise from the white-noise equivalent σ_d of
     *  its first differences (Var(y_{i+1} − y_i) = 2σ²(1 − ρ)) and its marginal SD σ, in [0, 0.99]. */
    private static double lagOneCorrelation(double whiteSigma, double sigma) {
        if (!(sigma > 0)) {
            return 0.0;
        }
        double ratio = whiteSigma / sigma;
        return Math.min(SignalLimits.MAX_NOISE_CORRELATION, Math.max(0.0, 1 - ratio * ratio));
    }

    /** The significance threshold, in smoothed-noise SDs, for a run of n samples smoothed over
     *  2m + 1: z = Φ⁻¹(1 − α/M) with M = n/(2m + 1) looks ({@link SignalLimits#DETECTION_FALSE_ALARM_PER_RUN}). */
    private static double significanceSigmas(int n, int halfWidth) {
        double looks = Math.max(1.0, (double) n / (2 * halfWidth + 1));
        double tail = SignalLimits.DETECTION_FALSE_ALARM_PER_RUN / looks;
        return Math.sqrt(2.0) * Erf.erfcInv(2 * tail);
    }

    /**
     * A measured peak, before the checks that need the local noise and its neighbours.
     *
     * @param smoothedHeight height of the smoothed corrected signal at the apex (for a fitted zone,
     *                       the fitted height), for the significance test
     * @param centre         the first moment of a segment; null for a fitted zone, whose centre
     *                       is the fitted one
     * @param signalToNoise  NaN until judged
     */
    private record Measured(double apexTimeS, double apexTimeSdS, double height, double startTimeS,
                            double endTimeS, double area, double widthHalfS, boolean fitted,
                            double smoothedHeight, ZoneCentre centre, double centreTimeS, double centreTimeSdS,
                            double signalToNoise, double centreShapeSdS) {

        Measured reported(double sn, double centre, double centreSd, double shapeSd) {
            return new Measured(apexTimeS, apexTimeSdS, height, startTimeS, endTimeS, area, widthHalfS, fitted,
                    smoothedHeight, this.centre, centre, centreSd, sn, shapeSd);
        }
    }

    /**
     * The reported peaks without the edges of baseline steps. A sharp step of the background (a
     * bubble, a lamp or a junction settling) leaves, while the baseline follows it, a broad hump
     * beside it; a zone returns to the level it left, a step does not. A peak whose w½/t exceeds
     * {@link SignalLimits#STEP_MIN_WIDTH_RATIO} times that of the run's narrower quantifiable zones
     * (zones broaden with their migration time) and that has no other peak within
     * {@link SignalLimits#STEP_LEVEL_WIDTHS} of its widths is dropped when the signal's median levels
     * over that reach before its start and after its end differ by more than
     * {@link SignalLimits#STEP_MAX_LEVEL_SHARE} of its height. Small steps leave humps below the
     * quantitation limit; a step of 40 noise SDs or more leaves one of S/N 10 to 50.
     */
    private static List<Measured> withoutBaselineSteps(List<Measured> reported, double[] t, double[] y) {
        double reference = widthReference(reported);
        if (Double.isNaN(reference)) {
            return reported;
        }
        List<Measured> kept = new ArrayList<>(reported.size());
        for (Measured m : reported) {
            if (!(m.apexTimeS > 0) || !(m.widthHalfS / m.apexTimeS > SignalLimits.STEP_MIN_WIDTH_RATIO * reference)) {
                kept.add(m);
                continue;
            }
            double reach = SignalLimits.STEP_LEVEL_WIDTHS * m.widthHalfS;
            if (hasNeighbourWithin(reported, m, m.startTimeS - reach, m.endTimeS + reach)) {
                kept.add(m); // a neighbour's flank would pass for a step: judged only on its own
                continue;
            }
            double before = levelBetween(t, y, m.startTimeS - reach, m.startTimeS);
            double after = levelBetween(t, y, m.endTimeS, m.endTimeS + reach);
            if (!(Math.abs(after - before) > SignalLimits.STEP_MAX_LEVEL_SHARE * m.height)) {
                kept.add(m);
            }
        }
        return kept;
    }

    /** True when another of the peaks reaches into [fromS, toS]. */
    private static boolean hasNeighbourWithin(List<Measured> peaks, Measured self, double fromS, double toS) {
        for (Measured o : peaks) {
            if (o != self && o.endTimeS > fromS && o.startTimeS < toS) {
                return true;
            }
        }
        return false;
    }

    /** Median of y over the samples with times in [fromS, toS] (NaN when there is none). */
    private static double levelBetween(double[] t, double[] y, double fromS, double toS) {
        int from = Math.max(0, nearestIndex(t, fromS));
        int to = Math.min(t.length - 1, nearestIndex(t, toS));
        if (to < from) {
            return Double.NaN;
        }
        return Selection.stridedMedian(y, from, to - from + 1, SignalLimits.SCALE_SAMPLE_CAP);
    }

    /**
     * The reported peaks without the doubtful ones below the detection limit (S/N &lt; 3): those cut
     * by the start or end of the recording (a flank missing, so nothing shows that the signal
     * falls again), and those much broader than the run's zones at their time: w½/t above
     * {@link SignalLimits#FAINT_MAX_WIDTH_RATIO} times the lower quartile of w½/t of the detected
     * peaks (S/N ≥ 3; at least {@value #MIN_WIDTH_REFERENCES} of them, otherwise the width is not
     * judged). A faint zone is too dilute for electromigration dispersion, the one cause of a zone
     * much wider than its neighbours, so it has the width that diffusion and injection give every
     * zone at that time (w½ grows about in proportion to t); broad low bumps at that level are the
     * baseline's waves. The lower quartile, because the concentrated zones among the references
     * are themselves dispersed. Likewise a faint peak far narrower than that width (below
     * {@link SignalLimits#FAINT_MIN_WIDTH_RATIO} of it) is no zone: narrow faint tops are spikes
     * that escaped the spike filter and noise.
     */
    private static List<Measured> withoutDoubtfulFaintPeaks(List<Measured> reported, double firstTimeS,
                                                            double lastTimeS) {
        double reference = widthReference(reported);
        double maxRatio = Double.isNaN(reference) ? Double.POSITIVE_INFINITY : SignalLimits.FAINT_MAX_WIDTH_RATIO * reference;
        double minRatio = Double.isNaN(reference) ? 0.0 : SignalLimits.FAINT_MIN_WIDTH_RATIO * reference;
        List<Measured> kept = new ArrayList<>(reported.size());
        for (Measured m : reported) {
            boolean faint = m.signalToNoise < Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE;
            boolean cut = m.startTimeS <= firstTimeS || m.endTimeS >= lastTimeS
                    || m.apexTimeS - firstTimeS < m.widthHalfS || lastTimeS - m.apexTimeS < m.widthHalfS;
            boolean broad = m.apexTimeS > 0 && m.widthHalfS / m.apexTimeS > maxRatio;
            boolean narrow = m.apexTimeS > 0 && m.widthHalfS / m.apexTimeS < minRatio;
            if (!(faint && (cut || broad || narrow))) {
                kept.add(m);
            }
        }
        return kept;
    }

    /**
     * The reported peaks with the faint zones that the matched filter finds between them
     * ({@link FaintZoneSearch}), judged like the others (S/N, then the width checks below the
     * detection limit). The expected width of a zone at time t is w½/t of the run's narrower
     * quantifiable zones (the lower quartile, as for the width checks) times t, but never below
     * {@link FaintZoneSearch#EARLY_WIDTH_FRACTION} of the narrowest of them (the injected plug
     * gives every zone a width that does not shrink with t); with fewer than four quantifiable zones
     * the narrowest gives the width (a neutral marker, never dispersed by its own concentration, is
     * a good one), and without any nothing is searched. A fitted zone's apex uncertainty
     * (s²(JᵀJ)⁻¹, white-noise theory) is widened by √((1 + ρ)/(1 − ρ)) for noise of lag-one
     * correlation ρ (the variance inflation of a mean of correlated samples; see {@link LocalNoise}).
     */
    private static List<Measured> withFaintZones(List<Measured> reported, double[] t, double[] raw, boolean[] inPeak,
                                                 List<int[]> spikes, double sampling, LocalNoise localNoise,
                                                 Reporting reporting) {
        double[] rule = expectedWidthRule(reported, sampling);
        double ratio = rule[0];
        if (Double.isNaN(ratio)) {
            return reported; // no width to look for: no quantifiable zone gives it
        }
        double floor = rule[1];
        IntToDoubleFunction expected = i -> Math.max(ratio * t[i], floor);
        List<double[]> occupied = new ArrayList<>(reported.size());
        for (Measured m : reported) {
            // a peak's core: its samples beyond it, on its tails, may hold a faint zone (the search's
            // ring takes away a tail's slope)
            double reach = FaintZoneSearch.CORE_WIDTHS * m.widthHalfS;
            occupied.add(new double[] {Math.max(m.startTimeS, Math.min(m.apexTimeS, m.centreTimeS) - reach),
                    Math.min(m.endTimeS, Math.max(m.apexTimeS, m.centreTimeS) + reach)});
        }
        IntToDoubleFunction localSd = i -> localNoise.around(i,
                (int) Math.ceil(0.5 * SignalLimits.NOISE_SUPPORT_WIDTHS * expected.applyAsDouble(i) / sampling),
                false).rawSd();
        List<FaintZoneSearch.Zone> zones = FaintZoneSearch.find(t, raw, inPeak, spikes, occupied, expected, sampling,
                localNoise.global().rawSd(), localSd);
        if (zones.isEmpty()) {
            return reported;
        }
        double inflation = Math.sqrt((1 + reporting.correlation()) / (1 - reporting.correlation()));
        List<Measured> all = new ArrayList<>(reported);
        for (FaintZoneSearch.Zone zone : zones) {
            GaussianClusterFit.Component z = zone.fit();
            double sd = z.apexTimeSdS() * inflation;
            double half = z.widthHalfS();
            Measured m = new Measured(z.apexTimeS(), sd, z.height(), Math.max(t[zone.first()], z.apexTimeS() - half),
                    Math.min(t[zone.last()], z.apexTimeS() + half), z.area(), z.widthHalfS(), true, z.height(), null,
                    z.apexTimeS(), sd, Double.NaN, 0.0);
            Measured judged = reporting.judge(m, true);
            if (judged != null) {
                all.add(judged);
            }
        }
        all.sort((a, b) -> Double.compare(a.apexTimeS, b.apexTimeS));
        return withoutDoubtfulFaintPeaks(all, t[0], t[t.length - 1]);
    }

    /**
     * The width expected of a zone at time t, as {@link #withFaintZones} describes it: {w½/t of the
     * narrower quantifiable zones (NaN when there are none), the floor in s}.
     */
    private static double[] expectedWidthRule(List<Measured> reported, double sampling) {
        double ratio = widthReference(reported, 1);
        double narrowest = Double.POSITIVE_INFINITY;
        for (Measured m : reported) {
            if (m.signalToNoise >= Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE) {
                narrowest = Math.min(narrowest, m.widthHalfS);
            }
        }
        double floor = Math.max(FaintZoneSearch.EARLY_WIDTH_FRACTION * narrowest,
                FaintZoneSearch.MIN_BOX_SAMPLES * sampling);
        return new double[] {ratio, floor};
    }

    /** w½/t of the run's narrower quantifiable zones: the lower quartile over the reported peaks
     *  with S/N of at least the detection limit; NaN when fewer than {@value #MIN_WIDTH_REFERENCES}. */
    private static double widthReference(List<Measured> reported) {
        return widthReference(reported, MIN_WIDTH_REFERENCES);
    }

    /** As {@link #widthReference(List)} from at least {@code fewest} quantifiable zones (the
     *  narrowest when there are fewer than four). */
    private static double widthReference(List<Measured> reported, int fewest) {
        double[] ratios = new double[reported.size()];
        int count = 0;
        for (Measured m : reported) {
            if (m.signalToNoise >= Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE && m.apexTimeS > 0) {
                ratios[count++] = m.widthHalfS / m.apexTimeS;
            }
        }
        if (count < fewest) {
            return Double.NaN;
        }
        Arrays.sort(ratios, 0, count);
        return ratios[(count - 1) / 4];
    }

    /** Fewest detected peaks that give the run's width scale for {@link #withoutDoubtfulFaintPeaks}. */
    private static final int MIN_WIDTH_REFERENCES = 3;

    /**
     * How far the tails of the neighbouring zones move the apex of a zone that was measured on its
     * own (not resolved by a joint fit): for Gaussian zones the apex of f + g lies where
     * f′ + g′ = 0, to first order δ = g′(t₀)/(−f″(t₀)) = (h/H)·(t_g − t₀)·(σ²/σ_g²)·exp(−d²/2) with
     * d = (t₀ − t_g)/σ_g (derived from the definition of the apex; σ = w½/2.3548). The shifts of
     * both neighbours are summed; the result is added in quadrature to the apex uncertainty, since
     * the measured apex is not corrected for it.
     */
    private static double overlapShiftS(List<Measured> found, int k) {
        Measured m = found.get(k);
        double sigma = m.widthHalfS / GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
        double shift = 0;
        for (int j = Math.max(0, k - 1); j <= Math.min(found.size() - 1, k + 1); j++) {
            if (j == k) {
                continue;
            }
            Measured g = found.get(j);
            double sigmaG = g.widthHalfS / GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
            if (!(sigma > 0 && sigmaG > 0 && m.height > 0)) {
                continue;
            }
            double d = (m.apexTimeS - g.apexTimeS) / sigmaG;
            shift += (g.height / m.height) * (g.apexTimeS - m.apexTimeS) * (sigma * sigma) / (sigmaG * sigmaG)
                    * Math.exp(-0.5 * d * d);
        }
        return shift;
    }

    /**
     * Resolution of one region (segments joined at valleys) into Gaussian zones by a
     * least-squares fit, when the region is a cluster: its curvature shows more zones than it has
     * maxima (a shoulder), or two of its maxima overlap so much that the valley rises above
     * {@link SignalLimits#CLUSTER_VALLEY_FRACTION} of the lower one (their tops then lean towards
     * each other and the apex of the sum is no longer the apex of either zone).
     */
    private record Cluster(double[] t, double[] raw, double[] smooth, double[] concavity,
                           double level, double prominence, int reach, double typicalSigmaS,
                           double minHeight, double minWidth, double noiseSd) {

        /** The measured zones of a confirmed cluster, or null to keep the valley segments. */
        List<Measured> resolve(List<int[]> region) {
            int first = region.get(0)[0];
            int last = region.get(region.size() - 1)[1];
            List<Integer> zones = ShoulderFinder.zones(concavity, first, last, level, prominence, reach);
            // starting apexes: a maximum per segment (fewer zones); the curvature zones, plus the
            // maximum of any segment without one (more zones)
            int[] tops = new int[region.size()];
            double[] fewerStart = new double[region.size()];
            List<Double> moreStart = new ArrayList<>();
            for (int k = 0; k < region.size(); k++) {
                int[] segment = region.get(k);
                int top = highest(smooth, segment[0], segment[1]);
                tops[k] = top;
                fewerStart[k] = t[top];
                boolean seen = false;
                for (int z : zones) {
                    if (z >= segment[0] && z <= segment[1]) {
                        if (!moreStart.contains(t[z])) {
                            moreStart.add(t[z]);
                        }
                        seen = true;
                    }
                }
                if (!seen) {
                    moreStart.add(t[top]);
                }
            }
            boolean shoulder = moreStart.size() > region.size()
                    && moreStart.size() <= SignalLimits.SHOULDER_MAX_ZONES;
            boolean overlapped = false;
            double broad = SignalLimits.BROAD_ZONE_WIDTHS * typicalSigmaS * GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
            for (int k = 0; k + 1 < region.size(); k++) {
                double lower = Math.min(smooth[tops[k]], smooth[tops[k + 1]]);
                double valley = smooth[region.get(k)[1]];
                overlapped |= valley > SignalLimits.CLUSTER_VALLEY_FRACTION * lower
                        || valley > SignalLimits.SKEWED_CLUSTER_VALLEY_FRACTION * lower
                        && (halfWidthS(region.get(k), tops[k]) > broad
                            || halfWidthS(region.get(k + 1), tops[k + 1]) > broad);
            }
            overlapped &= region.size() <= SignalLimits.SHOULDER_MAX_ZONES;
            if (!shoulder && !overlapped) {
                return null;
            }
            double minSigma = SignalLimits.FIT_MIN_SIGMA_FACTOR * typicalSigmaS;
            double maxSigma = SignalLimits.FIT_MAX_SIGMA_FACTOR * typicalSigmaS;
            GaussianClusterFit.Result fewer = GaussianClusterFit.fit(t, raw, first, last, fewerStart,
                    typicalSigmaS, minSigma, maxSigma);
            GaussianClusterFit.Result chosen = null;
            double[] chosenStart = fewerStart;
            if (shoulder && fewer != null) {
                double[] start = new double[moreStart.size()];
                for (int k = 0; k < start.length; k++) {
                    start[k] = moreStart.get(k);
                }
                Arrays.sort(start); // a handful of values, once per cluster
                GaussianClusterFit.Result more = GaussianClusterFit.fit(t, raw, first, last, start,
                        typicalSigmaS, minSigma, maxSigma);
                if (more != null && plausible(more)
                        && GaussianClusterFit.extraZonesPValue(fewer, more) <= SignalLimits.SHOULDER_F_TEST_ALPHA) {
                    chosen = more;
                    chosenStart = start;
                }
                if (region.size() == 1) {
                    SkewedZoneFit one = SkewedZoneFit.closest(t, raw, first, last, minSigma, maxSigma);
                    // the shoulder may be the diffuse flank of one skewed zone, or a second skewed
                    // zone: where one skewed zone explains the peak as well as the Gaussians do, or
                    // the Gaussians found no plausible pair (two skewed zones a width apart, whose
                    // sum Gaussians cannot follow), the split into skewed zones must beat one skewed
                    // zone on its own
                    if (chosen == null ? one != null : oneSkewedZone(one, more)) {
                        SkewedClusterFit.Result split = SkewedClusterFit.fit(t, raw, first, last, start,
                                typicalSigmaS, minSigma, maxSigma, noiseSd);
                        if (split != null && plausible(split) && GaussianClusterFit.extraParametersPValue(
                                one.residualSumOfSquares(), split.residualSumOfSquares(),
                                split.parameters() - SkewedZoneFit.PARAMETERS, split.points() - split.parameters())
                                <= SignalLimits.SKEWED_SPLIT_F_TEST_ALPHA) {
                            return skewedZones(split, first, last);
                        }
                        if (chosen != null) {
                            return null;
                        }
                    }
                }
            }
            if (chosen == null && overlapped && fewer != null && plausible(fewer)) {
                chosen = fewer;
            }
            // skewed zones instead of Gaussians, started from the same tops as the Gaussians (the
            // maxima of the data: a skewed zone's top is its sharp flank, where Gaussians do not put
            // their apexes)
            GaussianClusterFit.Result reference = chosen != null ? chosen : overlapped ? fewer : null;
            if (reference != null) {
                SkewedClusterFit.Result skewed = skewedAlternative(reference, chosenStart, first, last, minSigma,
                        maxSigma);
                if (skewed != null) {
                    return skewedZones(skewed, first, last);
                }
            }
            if (chosen == null) {
                return null;
            }
            List<GaussianClusterFit.Component> c = chosen.components();
            List<Measured> out = new ArrayList<>(c.size());
            double start = t[first];
            for (int k = 0; k < c.size(); k++) {
                GaussianClusterFit.Component z = c.get(k);
                double end = k + 1 < c.size() ? GaussianClusterFit.dominanceBoundaryS(z, c.get(k + 1)) : t[last];
                ZoneCentre centre = shareCentre(c, k, first, last);
                out.add(new Measured(z.apexTimeS(), z.apexTimeSdS(), z.height(), start, end, z.area(),
                        z.widthHalfS(), true, z.height(), centre,
                        centre == null ? z.apexTimeS() : centre.centreTimeS(), z.apexTimeSdS(), Double.NaN, 0.0));
                start = end;
            }
            return out;
        }

        /** Width at half height of a segment's top on the smoothed signal, within the segment, s (0 when unknown). */
        private double halfWidthS(int[] segment, int top) {
            double width = halfHeightWidthS(t, smooth, top, segment[0], segment[1], 0.5 * smooth[top]);
            return Double.isNaN(width) ? 0.0 : width;
        }

        /**
         * The first moment of one fitted zone's share of the signal: each sample of the cluster is
         * dealt out to the zones in proportion to their fitted values there, and the moment is taken
         * of zone k's part ({@link ZoneCentre}). For Gaussian zones that fit, it is the fitted centre;
         * for a skewed zone the data's own flank moves it towards the zone's centre of mass, which a
         * symmetric model cannot. Null when the share has no positive area.
         */
        private ZoneCentre shareCentre(List<GaussianClusterFit.Component> c, int k, int first, int last) {
            List<DoubleUnaryOperator> values = new ArrayList<>(c.size());
            for (GaussianClusterFit.Component z : c) {
                values.add(z::value);
            }
            double[] part = shares(values, k, first, last, null);
            double[] times = Arrays.copyOfRange(t, first, last + 1);
            ZoneCentre centre = ZoneCentre.of(times, part, 0, part.length - 1);
            return Double.isNaN(centre.centreTimeS()) ? null : centre;
        }

        /**
         * True when one skewed zone ({@link SkewedZoneFit}) explains the samples of a single peak as
         * well as the Gaussian zones the curvature suggested: the extra-sum-of-squares test of the
         * zones against it does not reach {@link SignalLimits#SHOULDER_F_TEST_ALPHA}. Electromigration
         * dispersion gives a zone one long flank, which a sum of Gaussians follows with a false extra
         * zone.
         */
        private static boolean oneSkewedZone(SkewedZoneFit skewed, GaussianClusterFit.Result zones) {
            return skewed != null && zones.parameters() > SkewedZoneFit.PARAMETERS
                    && skewed.pValueAgainst(zones) > SignalLimits.SHOULDER_F_TEST_ALPHA;
        }

        /**
         * The same zones as skewed ones ({@link SkewedClusterFit}) when they describe the cluster
         * clearly better than the Gaussians: a lower Bayesian information criterion
         * n ln(RSS/n) + p ln n (Schwarz, Ann. Statist. 6 (1978) 461) by at least
         * {@link SignalLimits#SKEWED_CLUSTER_MIN_GAIN}, and every zone reportable; null otherwise.
         * Zones of electromigration dispersion have long diffuse flanks that run into the
         * neighbour, and Gaussians put both the zones and their shares of the signal in the wrong
         * places. When the fit fails, the fits with one zone fewer are tried (the best criterion
         * kept); when it comes out as smoothed triangles, they must also beat those (two triangles
         * end to end can follow the convex flank of one EMG zone).
         */
        private SkewedClusterFit.Result skewedAlternative(GaussianClusterFit.Result gaussians, double[] start,
                                                         int first, int last, double minSigma, double maxSigma) {
            double residualVariance = gaussians.residualSumOfSquares() / (gaussians.points() - gaussians.parameters());
            if (!(residualVariance > SignalLimits.SKEWED_CLUSTER_MISFIT_RATIO * noiseSd * noiseSd)) {
                return null; // the Gaussians fit to the noise: nothing for skewed zones to explain
            }
            int n = gaussians.points();
            double bicGaussians = n * Math.log(gaussians.residualSumOfSquares() / n) + gaussians.parameters() * Math.log(n);
            SkewedClusterFit.Result skewed = SkewedClusterFit.fit(t, raw, first, last, start, typicalSigmaS,
                    minSigma, maxSigma, noiseSd);
            boolean kept = skewed != null && plausible(skewed)
                    && bic(skewed) <= bicGaussians - SignalLimits.SKEWED_CLUSTER_MIN_GAIN;
            if (kept && skewed.zones().get(0).form() == ZoneForm.EXPONENTIAL) {
                return skewed;
            }
            // two smoothed triangles end to end can follow the convex flank of one EMG zone: triangles
            // must also beat every fit with one zone fewer
            if (start.length < 2) {
                return kept ? skewed : null;
            }
            // one zone fewer: a Gaussian fit follows a long diffuse flank with an extra zone, which
            // the skewed zones must not keep (each start left out in turn, the lowest criterion kept)
            SkewedClusterFit.Result best = null;
            for (int drop = 0; drop < start.length; drop++) {
                double[] fewer = new double[start.length - 1];
                for (int k = 0, j = 0; k < start.length; k++) {
                    if (k != drop) {
                        fewer[j++] = start[k];
                    }
                }
                SkewedClusterFit.Result f = SkewedClusterFit.fit(t, raw, first, last, fewer, typicalSigmaS, minSigma,
                        maxSigma, noiseSd);
                if (f != null && plausible(f) && (best == null || bic(f) < bic(best))) {
                    best = f;
                }
            }
            if (best != null && bic(best) <= bicGaussians - SignalLimits.SKEWED_CLUSTER_MIN_GAIN
                    && (!kept || bic(best) <= bic(skewed))) {
                return best;
            }
            return kept ? skewed : null;
        }

        /** Bayesian information criterion n ln(RSS/n) + p ln n of a skewed-cluster fit. */
        private static double bic(SkewedClusterFit.Result fit) {
            int n = fit.points();
            return n * Math.log(fit.residualSumOfSquares() / n) + fit.parameters() * Math.log(n);
        }

        /** The measured zones of a skewed-cluster fit; the centre of each is its first moment μ + τ. */
        private List<Measured> skewedZones(SkewedClusterFit.Result fit, int first, int last) {
            List<SkewedClusterFit.Zone> zones = fit.zones();
            List<Measured> out = new ArrayList<>(zones.size());
            double start = t[first];
            for (int k = 0; k < zones.size(); k++) {
                SkewedClusterFit.Zone z = zones.get(k);
                double end = k + 1 < zones.size() ? fit.dominanceBoundaryS(k) : t[last];
                double apex = z.apexTimeS();
                double height = z.value(apex);
                double skew = Math.abs(z.firstMomentS() - apex);
                double shape = SignalLimits.CENTRE_SHAPE_FACTOR * skew;
                double[] share = skewedShareMomentS(zones, k, first, last);
                if (Double.isFinite(share[0])) {
                    shape = Math.hypot(Math.max(Math.abs(share[0] - z.firstMomentS()),
                            SignalLimits.CENTRE_SHAPE_FLOOR_FACTOR * skew), share[1]);
                }
                double centreSd = Math.hypot(z.firstMomentSdS(), shape);
                out.add(new Measured(apex, z.centreSdS(), height, start, end, z.areaTimesS(), z.widthHalfS(), true,
                        height, null, z.firstMomentS(), centreSd, Double.NaN, shape));
                start = end;
            }
            return out;
        }

        /**
         * Zone k's part of each sample of [first, last] when the cluster's samples are dealt out to
         * the zones in proportion to their fitted values there: raw · v_k / Σ v (0 where Σ v is not
         * positive). With {@code fraction} given, v_k / Σ v is written into it.
         */
        private double[] shares(List<DoubleUnaryOperator> zones, int k, int first, int last,
                                double[] fraction) {
            double[] part = new double[last - first + 1];
            for (int i = first; i <= last; i++) {
                double total = 0;
                for (DoubleUnaryOperator z : zones) {
                    total += z.applyAsDouble(t[i]);
                }
                double own = zones.get(k).applyAsDouble(t[i]);
                part[i - first] = total > 0 ? raw[i] * own / total : 0.0;
                if (fraction != null) {
                    fraction[i - first] = total > 0 ? own / total : 0.0;
                }
            }
            return part;
        }

        /**
         * The first moment of skewed zone k's share of the data, and how much of it rests on samples
         * the neighbours share. Each sample of the cluster is dealt out to the zones in proportion to
         * their fitted values (as {@link #shareCentre} does for Gaussians): the moment of zone k's
         * part estimates the same moment as the fitted μ + τ without the model's shape, and the two
         * agree when the zone follows the model. Where the neighbours share a sample, the deal itself
         * rests on the model: Σ p_i (1 − f_i) |t_i − c| / A (p_i zone k's part, f_i its fraction of the
         * sample, A the part's area) is how far the moment would move if those contested parts were
         * all misplaced by their whole lever, an order-of-magnitude term for the overlap. Returns
         * {moment, overlap term}, s; the moment NaN when the share has no positive area.
         */
        private double[] skewedShareMomentS(List<SkewedClusterFit.Zone> zones, int k, int first, int last) {
            List<DoubleUnaryOperator> values = new ArrayList<>(zones.size());
            for (SkewedClusterFit.Zone z : zones) {
                values.add(z::value);
            }
            double[] fraction = new double[last - first + 1];
            double[] part = shares(values, k, first, last, fraction);
            double[] times = Arrays.copyOfRange(t, first, last + 1);
            double centre = ZoneCentre.of(times, part, 0, part.length - 1).centreTimeS();
            double area = 0;
            double contested = 0;
            for (int i = 0; i < part.length; i++) {
                double w = 0.5 * ((i > 0 ? times[i] - times[i - 1] : 0) + (i + 1 < part.length ? times[i + 1] - times[i] : 0));
                area += w * part[i];
                contested += w * Math.abs(part[i]) * (1 - fraction[i]) * Math.abs(times[i] - centre);
            }
            return new double[] {centre, area > 0 ? contested / area : Double.NaN};
        }

        /**
         * Every skewed zone reportable (height and width), placed by the fit to better than its own
         * width at half height (a zone whose first moment the fit cannot place within its width is
         * not resolved: two components sharing one dispersed zone give SDs of seconds to minutes),
         * and no two closer than the minimum separation.
         */
        private boolean plausible(SkewedClusterFit.Result fit) {
            List<SkewedClusterFit.Zone> zones = fit.zones();
            for (int k = 0; k < zones.size(); k++) {
                SkewedClusterFit.Zone z = zones.get(k);
                double apex = z.apexTimeS();
                if (!(z.value(apex) >= minHeight) || !(z.widthHalfS() >= minWidth)
                        || !z.placed()) {
                    return false;
                }
                if (k > 0 && z.firstMomentS() - zones.get(k - 1).firstMomentS()
                        < SignalLimits.SHOULDER_MIN_SEPARATION_SIGMAS * z.sigmaS()) {
                    return false;
                }
            }
            return true;
        }

        /** Every zone reportable (height and width) and no two closer than the minimum separation. */
        private boolean plausible(GaussianClusterFit.Result fit) {
            List<GaussianClusterFit.Component> c = fit.components();
            for (int k = 0; k < c.size(); k++) {
                GaussianClusterFit.Component z = c.get(k);
                if (!(z.height() >= minHeight) || !(z.widthHalfS() >= minWidth)) {
                    return false;
                }
                if (k > 0 && z.apexTimeS() - c.get(k - 1).apexTimeS()
                        < SignalLimits.SHOULDER_MIN_SEPARATION_SIGMAS * Math.max(z.sigmaS(), c.get(k - 1).sigmaS())) {
                    return false;
                }
            }
            return true;
        }
    }

    /**
     * Measures one segment, or null when it is far too low to be reported ({@code prefilter}, on
     * the smoothed signal), has no positive fitted height, or is narrower than {@code minWidth}.
     */
    private static Measured measure(double[] t, double[] raw, double[] smooth, int first, int last,
                                    double sigma, int halfWidth, double prefilter, double minWidth) {
        int apex = highest(smooth, first, last);
        if (!(smooth[apex] >= prefilter)) {
            return null; // far too low to pass the checks: skip the fit
        }
        ApexFit fit = ApexFit.fit(t, raw, smooth, apex, first, last, sigma);
        if (!(fit.height() > 0)) {
            return null;
        }
        if (rawWidthS(t, raw, apex, first, last, halfWidth) < minWidth) {
            return null; // a spike
        }
        double width = flankWidthS(t, raw, smooth, apex, first, last, fit.height());
        if (!(width > 0)) {
            return null;
        }
        ZoneCentre centre = ZoneCentre.of(t, raw, first, last);
        if (Double.isNaN(centre.centreTimeS())) {
            centre = null;
        }
        return new Measured(fit.apexTimeS(), fit.apexTimeSdS(), fit.height(), t[first], t[last],
                trapezoid(t, raw, first, last), width, false, smooth[apex], centre,
                centre == null ? fit.apexTimeS() : centre.centreTimeS(), fit.apexTimeSdS(), Double.NaN, 0.0);
    }

    /**
     * Width at half height H/2. On each flank the samples whose smoothed value lies between
     * 25 % and 75 % of H (found by walking out from the apex) are fitted by least squares on the
     * raw corrected signal with a parabola in time (a straight line when there are only two),
     * which is solved for H/2: interpolation at half height, made robust to the noise by using
     * the whole middle of the flank and free of the broadening that the smoothing gives a narrow
     * peak. On a Gaussian the parabola's bias is below 0.1 % of w½ (a straight line would be
     * 1 % too wide: the flank bends). A flank with fewer than two such samples falls back to
     * linear interpolation of the smoothed signal between the samples that straddle H/2
     * ({@link #halfHeightWidthS}).
     */
    private static double flankWidthS(double[] t, double[] raw, double[] smooth, int apex, int first, int last,
                                      double height) {
        double half = 0.5 * height;
        double left = flankCrossing(t, raw, smooth, apex, first, height, -1);
        double right = flankCrossing(t, raw, smooth, apex, last, height, +1);
        if (Double.isNaN(left) || Double.isNaN(right)) {
            return halfHeightWidthS(t, smooth, apex, first, last, half);
        }
        return right - left;
    }

    private static double flankCrossing(double[] t, double[] raw, double[] smooth, int apex, int bound,
                                        double height, int direction) {
        double upper = SignalLimits.FLANK_UPPER * height;
        double lower = SignalLimits.FLANK_LOWER * height;
        int i = apex;
        while (i != bound && smooth[i] > upper) {
            i += direction;
        }
        int from = i;
        while (smooth[i] >= lower && smooth[i] <= upper && i != bound) {
            i += direction;
        }
        int to = smooth[i] >= lower && smooth[i] <= upper ? i : i - direction;
        int lo = Math.min(from, to);
        int hi = Math.max(from, to);
        int count = hi - lo + 1;
        if (!(smooth[from] >= lower && smooth[from] <= upper) || count < 2) {
            return Double.NaN;
        }
        double ref = 0;
        for (int k = lo; k <= hi; k++) {
            ref += t[k];
        }
        ref /= count;
        double half = 0.5 * height;
        if (count >= 3) {
            double[] c = quadraticFit(t, raw, lo, hi, ref);
            if (c != null) {
                double root = nearestRoot(c[2], c[1], c[0] - half);
                double span = t[hi] - t[lo];
                if (Math.abs(root) <= span && (c[1] + 2 * c[2] * root) * direction < 0) {
                    return ref + root;
                }
            }
        }
        double st = 0, sv = 0, stt = 0, stv = 0;
        for (int k = lo; k <= hi; k++) {
            double u = t[k] - ref;
            st += u;
            sv += raw[k];
            stt += u * u;
            stv += u * raw[k];
        }
        double slope = (count * stv - st * sv) / (count * stt - st * st);
        double intercept = (sv - slope * st) / count;
        if (!(slope * direction < 0)) {
            return Double.NaN;
        }
        return ref + (half - intercept) / slope;
    }

    /** Least-squares a + b u + c u² through (t − ref, v) over [lo, hi]; null when singular. */
    private static double[] quadraticFit(double[] t, double[] v, int lo, int hi, double ref) {
        ApexFit.QuadraticSums sums = new ApexFit.QuadraticSums();
        for (int k = lo; k <= hi; k++) {
            sums.add(t[k] - ref, v[k]);
        }
        return sums.solve();
    }

    /** The root of a u² + b u + c of smallest magnitude (a may be 0), by the cancellation-free
     *  form c / q with q = −(b + sign(b)·√(b² − 4ac))/2 (Press et al., Numerical Recipes, 3rd ed.
     *  2007, §5.6); NaN when there is no real root. */
    private static double nearestRoot(double a, double b, double c) {
        double disc = b * b - 4 * a * c;
        if (disc < 0) {
            return Double.NaN;
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(disc), b));
        return c / q;
    }

    /** Width at half height of the raw corrected signal around its highest point near the apex. */
    private static double rawWidthS(double[] t, double[] raw, int apex, int first, int last, int halfWidth) {
        int lo = Math.max(first, apex - halfWidth);
        int hi = Math.min(last, apex + halfWidth);
        int top = lo;
        for (int i = lo + 1; i <= hi; i++) {
            if (raw[i] > raw[top]) {
                top = i;
            }
        }
        double width = halfHeightWidthS(t, raw, top, first, last, 0.5 * raw[top]);
        return Double.isNaN(width) ? 0.0 : width;
    }

    /**
     * Full width at {@code level} by linear interpolation between the samples that straddle it;
     * when one side stays above the level up to the segment end, twice the other half-width;
     * NaN when neither side reaches it.
     */
    static double halfHeightWidthS(double[] t, double[] v, int apex, int first, int last, double level) {
        int left = apex;
        while (left > first && v[left - 1] > level) {
            left--;
        }
        int right = apex;
        while (right < last && v[right + 1] > level) {
            right++;
        }
        double tLeft = Double.NaN;
        if (left > first) {
            tLeft = interpolate(t, v, left - 1, left, level);
        }
        double tRight = Double.NaN;
        if (right < last) {
            tRight = interpolate(t, v, right, right + 1, level);
        }
        double apexT = t[apex];
        if (!Double.isNaN(tLeft) && !Double.isNaN(tRight)) {
            return tRight - tLeft;
        }
        if (!Double.isNaN(tLeft)) {
            return 2 * (apexT - tLeft);
        }
        if (!Double.isNaN(tRight)) {
            return 2 * (tRight - apexT);
        }
        return Double.NaN;
    }

    private static double interpolate(double[] t, double[] v, int a, int b, double level) {
        double f = (level - v[a]) / (v[b] - v[a]);
        return t[a] + f * (t[b] - t[a]);
    }

    /** Trapezoidal area of v over [first, last] on the time axis. */
    static double trapezoid(double[] t, double[] v, int first, int last) {
        double area = 0;
        for (int i = first; i < last; i++) {
            area += 0.5 * (v[i] + v[i + 1]) * (t[i + 1] - t[i]);
        }
        return area;
    }

    private static Measured nearest(List<Measured> found, int k) {
        double tk = found.get(k).apexTimeS;
        Measured best = null;
        double bestGap = Double.POSITIVE_INFINITY;
        for (int j = Math.max(0, k - 1); j <= Math.min(found.size() - 1, k + 1); j++) {
            if (j == k) {
                continue;
            }
            double gap = Math.abs(found.get(j).apexTimeS - tk);
            if (gap < bestGap) {
                bestGap = gap;
                best = found.get(j);
            }
        }
        return best;
    }

    private static int nearestIndex(double[] t, double time) {
        int i = Arrays.binarySearch(t, time);
        if (i >= 0) {
            return i;
        }
        int after = -i - 1;
        if (after == 0) {
            return 0;
        }
        if (after >= t.length) {
            return t.length - 1;
        }
        return time - t[after - 1] <= t[after] - time ? after - 1 : after;
    }

    /*
     * The whole-trace loops of analyse live in small methods of their own: a loop over every
     * sample inside analyse would have the JIT compile all of analyse (and what it inlines) while
     * that loop runs, again for each such loop and again after each rarely taken branch, which
     * cost more compiler time in a batch than the loops themselves.
     */

    /** The index of the first largest value in [first, last]. */
    private static int highest(double[] v, int first, int last) {
        int top = first;
        for (int i = first + 1; i <= last; i++) {
            if (v[i] > v[top]) {
                top = i;
            }
        }
        return top;
    }

    /** Flips the sign of every value, in place. */
    private static void negate(double[] y) {
        for (int i = 0; i < y.length; i++) {
            y[i] = -y[i];
        }
    }

    /** Σ|w|. */
    private static double sumOfMagnitudes(double[] w) {
        double sum = 0;
        for (double v : w) {
            sum += Math.abs(v);
        }
        return sum;
    }

    /** The raw signal minus the baseline (a new array); the baseline is taken off {@code smooth} in place. */
    private static double[] minusBaseline(double[] y, double[] smooth, double[] baseline) {
        int n = y.length;
        double[] raw = new double[n];
        for (int i = 0; i < n; i++) {
            raw[i] = y[i] - baseline[i];
            smooth[i] -= baseline[i];
        }
        return raw;
    }

    /** Median sampling interval, from an evenly strided subset of at most
     *  {@link SignalLimits#NOISE_SAMPLE_CAP} intervals (exact for regular sampling). */
    private static double medianInterval(double[] t) {
        int all = t.length - 1;
        int stride = Math.max(1, all / SignalLimits.NOISE_SAMPLE_CAP);
        double[] d = new double[(all + stride - 1) / stride];
        int m = 0;
        for (int i = 0; i < all && m < d.length; i += stride) {
            d[m++] = t[i + 1] - t[i];
        }
        return Selection.medianInPlace(d, m);
    }

    /** Robust noise SD, never below a tiny fraction of the signal range (nor zero). */
    private static double flooredNoise(double[] y) {
        return Math.max(NoiseEstimator.robustSd(y), noiseFloor(y));
    }

    /** A tiny fraction of the signal range, never zero: the least noise SD a trace is given. */
    private static double noiseFloor(double[] y) {
        return Math.max(SignalLimits.NOISE_FLOOR_RELATIVE * NoiseEstimator.robustSpan(y), Double.MIN_NORMAL);
    }
}
