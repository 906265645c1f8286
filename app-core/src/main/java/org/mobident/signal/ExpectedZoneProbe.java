package org.mobident.signal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import java.util.function.ToDoubleBiFunction;
import org.apache.commons.math3.distribution.FDistribution;
import org.mobident.Tolerances;
import org.mobident.result.Peak;

/**
 * A second look at one analysed trace, at the times where a zone is expected (a library entry
 * that the run's other peaks place there) but no peak was reported: a zone hidden on the flank of
 * a much taller one, or merged with a neighbour into one peak.
 *
 * <p><b>Why.</b> Without knowing where to look, a small zone on the steep flank of a zone 10–30
 * times taller, or a zone less than a width from a neighbour, shows no valley and at most a weak
 * inflection: the detector's own tests for hidden zones (curvature minima, a split of a cluster
 * that must beat one zone at F-test 10⁻⁶ over every place the split could go) are strict because
 * they look everywhere. Knowing the time where the zone would be, one looks once, and the same
 * extra-sum-of-squares test at a level for one look finds it (the known-position advantage of a
 * targeted search; the position is still fitted, within the match window).
 *
 * <p><b>Test.</b> An expected time is looked at only where the library places the zone about as
 * sharply as the zone is wide (reach at most {@value #MAX_REACH_WIDTHS} expected widths) and at most
 * {@value #MAX_NEIGHBOURS} peaks take part: those whose extent the reach meets, and those near it
 * (within {@value #MARGIN_WIDTHS} expected widths) by their apex; a peak whose flank alone runs
 * near takes no part and bounds the stretch. Around it, over the samples of those peaks (every m-th
 * sample of a finely sampled run, at most {@value #MAX_FIT_SAMPLES}), the cluster is fitted without
 * and with one more zone started at the expected time, as Gaussians and, for at most
 * {@value #MAX_SKEWED_ZONES} zones, as skewed zones in the skew direction of the tallest neighbour
 * ({@link GaussianClusterFit}, {@link SkewedClusterFit}); each fit keeps the form with the smaller
 * Bayesian information criterion (Gaussians alone when they already reach the noise). The extra
 * zone is kept when
 * <ul>
 *   <li>the fall of the residual sum of squares passes the extra-sum-of-squares F-test (Bates
 *       &amp; Watts 1988, §3.5) at {@value #MAX_P_VALUE}, on residuals prewhitened for noise of
 *       lag-one correlation ρ ({@link #whitenedRss}: first-order autoregressive noise becomes
 *       independent innovations, and a zone, sharper than the noise's slow wander, keeps most of
 *       its fall). Dividing F by the long-run inflation (1 + ρ)/(1 − ρ) instead, as earlier
 *       versions did, treats every residual as slow as the noise: at ρ = 0.85 it left 3 effective
 *       degrees of freedom of 20, and zones whose fit took 95 % of the residual failed;</li>
 *   <li>the fit with it explains the samples down to the noise (residual variance at most
 *       {@link SignalLimits#SKEWED_CLUSTER_MISFIT_RATIO} times the local noise variance), or is a
 *       fit of skewed zones that leaves at most 1/{@value #MISFIT_EXPLAINED_RATIO} of the residual
 *       without the zone: a zone added to make up for a shape that no form follows would otherwise
 *       be taken for an analyte (two Gaussians follow one skewed zone far better than one does);</li>
 *   <li>its centre lies within the expected time's reach, the fit places it to better than its
 *       width, its width is {@value #MIN_WIDTH_FACTOR}–{@value #MAX_WIDTH_FACTOR} times the width
 *       expected at its time, and its S/N is at least 2:1, the lower end of the detection limits
 *       the ICH accepts (the look's test, at one time and with the library's word that a zone
 *       belongs there, reaches below the detector's own; below 2:1 it began to name noise and
 *       spikes on the lab-day bench);</li>
 *   <li>every neighbour keeps its place (its fitted apex within its own width at half height of
 *       the reported one).</li>
 * </ul>
 * Two cheap screens come first. The expected window must overlap a neighbour's extent, or
 * the concavity of the signal must have a local maximum of at least
 * {@value #SCREEN_CONCAVITY_SIGMAS} noise SDs within the reach (a hidden zone makes the signal
 * concave where it sits). Then, on the residual of the neighbours' Gaussian fit alone (once per set
 * of neighbours), and first on that of the neighbours taken as Gaussians of their measured apex,
 * height and width where the tallest shows no skew, a Gaussian of the expected width, placed
 * anywhere within the reach and scaled to their residual by linear least squares, must take from
 * it more than the noise alone would at 0.01: the fall over the local noise variance, times the
 * variance the template's sum gathers from correlated noise ({@link #correlatedVarianceRatio}), at
 * least the 0.99 quantile of χ²(1), {@value #SCREEN_CHI_SQUARE} (a matched filter on the residual). The full fits run only where it does. The noise, not the residual left,
 * is the yardstick: where the neighbours' stand-in misses their shape somewhere in the stretch, a
 * residual yardstick would swallow the zone's own fall (a stand-in that misses lets more looks
 * through, which costs time, not calls: the full test decides). A skewed neighbour's measured apex
 * and width say little of its shape, so it skips the first screen, and no skewed fit screens: one
 * skewed zone fitted to a merged pair of skewed zones (two concentrated analytes 1–2 % apart)
 * follows the sum so closely that no zone-like residual is left, while two skewed zones fit it far
 * better (on the lab-day bench such pairs were the largest share of library zones at ≥ 10 noise
 * SDs never found).
 *
 * <p><b>Starts.</b> The fit with the extra zone starts it at the expected time and, where the
 * tallest neighbour is skewed (apex and first moment more than {@value #SHIFTED_START_MIN_WIDTHS}
 * expected widths apart), again with its apex as far from the expected time as the neighbour's
 * apex is from the neighbour's first moment: the expected time is a first moment, and a skewed
 * zone's apex lies on its sharp side. The fit with the smaller residual is judged first; where
 * it fails the tests below, the other is (one skewed zone and a bump on its diffuse toe can follow
 * a merged pair about as closely as the pair itself, with the extra zone far from where it is
 * expected), each at the F-test level divided by the number of fits tried. Two more fits join
 * them where a neighbour takes part: where a peak holds the expected time, one that starts the
 * extra zone at that peak's top and the peak's own zone half its width beyond, away from the
 * expected time (a merged pair of skewed zones can sum to one top without skew, the top being the
 * expected zone's sharp side; measured on a lab-day pair 1.2 s apart, only this start reached the
 * noise; only where the peak is wider than {@value #SWAPPED_MIN_WIDTHS} expected widths); and,
 * for one neighbour that is skewed or that Gaussians do not follow down to the noise, one with the
 * extra zone held nearly symmetric ({@link
 * SkewedClusterFit}: a small zone is too dilute to be dispersed, and a free shape let it take over
 * the tall zone's flank, its first moment seconds from its own top and out of the reach while the
 * top sat where the library expected it). Which fitted zone
 * is the extra one: the choice that pairs the others with the neighbours in time order at the least
 * sum of distances (first moments for skewed fits, apexes for Gaussians) plus the extra zone's
 * distance from the expected time.
 *
 * <p>A neighbour that held the extra zone inside its extent (a merged pair) is replaced by its own
 * fitted zone; the others keep their measures. Times and uncertainties of fitted zones are those of
 * the fit (s²(JᵀJ)⁻¹), widened by √((1 + ρ)/(1 − ρ)) as for the detector's other fitted zones.
 */
public final class ExpectedZoneProbe {

    /** Most peaks fitted with the extra zone. */
    static final int MAX_NEIGHBOURS = 2;
    /** The level of the extra-sum-of-squares test for one expected zone (a modelling choice: a
     *  one-sided look at a known time, strict enough that noise seldom passes in a run of tens of looks). */
    static final double MAX_P_VALUE = 1e-3;
    /** Where the fit with the extra zone stays above the noise, it must be a fit of skewed zones and
     *  leave at most this fraction's inverse of the residual without it (a modelling choice: two
     *  Gaussians follow one skewed zone far better than one Gaussian does, so a Gaussian pair
     *  that does not reach the noise proves nothing). */
    static final double MISFIT_EXPLAINED_RATIO = 3.0;
    /** The least concavity maximum within the reach, noise SDs of the concavity (as for a shoulder). */
    static final double SCREEN_CONCAVITY_SIGMAS = 2.0;
    /** The reach of an expected zone at most this many expected widths: a zone is looked for only
     *  where the library places it about as sharply as the zone is wide (a modelling choice; a wider
     *  window would let the look fit the zone wherever the trace allows one). */
    static final double MAX_REACH_WIDTHS = 3.0;
    /** The level of the cheap matched-filter test before the full fits: the 0.99 quantile of χ²(1),
     *  6.635 (2.5758², the normal 0.995 quantile squared; Abramowitz &amp; Stegun 1964, tables
     *  26.1 and 26.8, from memory). A screen, lenient at 0.01: the full test decides. */
    static final double SCREEN_CHI_SQUARE = 6.635;
    /** Most samples of one fit: finer traces are fitted on every m-th sample. */
    static final int MAX_FIT_SAMPLES = 120;
    /** Most zones fitted in skewed forms (their fits try 2^K starts per form and direction). */
    static final int MAX_SKEWED_ZONES = 2;
    /** ... keeping at least this many samples per expected width at half height. */
    static final double SAMPLES_PER_WIDTH = 8.0;
    /** A second start for the extra zone where the tallest neighbour's apex and first moment lie
     *  more than this many expected widths apart (a modelling choice: below it the two starts are
     *  the same for the fit). */
    static final double SHIFTED_START_MIN_WIDTHS = 0.25;
    /** The swapped start puts the neighbour this many of its widths at half height beyond its top
     *  (a modelling choice: about where the far zone of a merged pair of equal skewed zones has its
     *  top). */
    static final double SWAPPED_START_WIDTHS = 0.5;
    /** ... and is tried only where that peak is wider than this many expected widths (a modelling
     *  choice: a merged pair is wider than one zone; on three lab-day seeds no zone was lost by it). */
    static final double SWAPPED_MIN_WIDTHS = 1.5;
    /** Fitted width at half height of the extra zone, as multiples of the width expected there. */
    static final double MIN_WIDTH_FACTOR = 0.5;
    static final double MAX_WIDTH_FACTOR = 4.0;
    /** The fitted stretch reaches this many expected widths beyond the reach and the neighbours. */
    static final double MARGIN_WIDTHS = 2.0;
    /** ... and at most this many expected widths beyond the reach on either side. */
    static final double MAX_STRETCH_WIDTHS = 10.0;

    /**
     * A time where a zone is expected.
     *
     * @param timeS  the expected centre time, s
     * @param reachS how far from it the zone's centre may lie, s (&gt; 0)
     */
    public record ExpectedZone(double timeS, double reachS) {
    }

    /**
     * The peaks after the look.
     *
     * @param peaks the peaks in order of apex time, with those found and those refitted
     * @param added the peaks found at expected times (also in {@code peaks})
     */
    public record Outcome(List<Peak> peaks, List<Peak> added) {
        public Outcome {
            peaks = List.copyOf(peaks);
            added = List.copyOf(added);
        }
    }

    private final double[] t;
    private final double[] raw;
    private final double[] concavity;
    private final double concavitySd;
    private final LocalNoise noise;
    private final double correlation;
    private final double sampling;
    private final double minSigmaS;
    private final double maxSigmaS;
    private final double widthPerTime;
    private final double widthFloorS;
    private final boolean dip;

    ExpectedZoneProbe(double[] t, double[] raw, double[] concavity, double concavitySd, LocalNoise noise,
                      double correlation, double sampling, double minSigmaS, double maxSigmaS, double widthPerTime,
                      double widthFloorS, boolean dip) {
        this.t = t;
        this.raw = raw;
        this.concavity = concavity;
        this.concavitySd = concavitySd;
        this.noise = noise;
        this.correlation = correlation;
        this.sampling = sampling;
        this.minSigmaS = minSigmaS;
        this.maxSigmaS = maxSigmaS;
        this.widthPerTime = widthPerTime;
        this.widthFloorS = widthFloorS;
        this.dip = dip;
    }

    /** The width at half height expected of a zone at a time, s (NaN when the run gives none). */
    double expectedWidthS(double timeS) {
        return Math.max(widthPerTime * timeS, widthFloorS);
    }

    /**
     * Looks for a zone at each expected time, in order; a zone found joins the peaks that the next
     * looks see.
     *
     * @param peaks    the trace's peaks in order of apex time (as reported by {@link PeakDetector})
     * @param expected where zones are expected
     */
    public Outcome lookFor(List<Peak> peaks, List<ExpectedZone> expected) {
        List<Peak> current = new ArrayList<>(peaks);
        List<Peak> added = new ArrayList<>();
        if (!(widthPerTime > 0) || t.length < SignalLimits.MIN_POINTS) {
            return new Outcome(current, added);
        }
        List<ExpectedZone> order = new ArrayList<>(expected);
        order.sort(Comparator.comparingDouble(ExpectedZone::timeS));
        Map<List<Peak>, Optional<Fit>> neighbourFits = new HashMap<>();
        for (ExpectedZone e : order) {
            if (!(e.timeS() > t[0] && e.timeS() < t[t.length - 1] && e.reachS() > 0)) {
                continue;
            }
            Found f = look(current, e, neighbourFits);
            if (f != null) {
                current.removeAll(f.replaced());
                current.addAll(f.refitted());
                current.add(f.zone());
                current.sort(Comparator.comparingDouble(Peak::apexTimeS));
                added.add(f.zone());
                neighbourFits.clear(); // the stretches of cached fits may have changed with the new peak
            }
        }
        if (added.isEmpty()) {
            return new Outcome(peaks, added);
        }
        List<Peak> resolved = withResolutions(current);
        List<Peak> addedNow = new ArrayList<>();
        for (Peak p : resolved) {
            for (Peak a : added) {
                if (p.apexTimeS() == a.apexTimeS() && p.height() == a.height()) {
                    addedNow.add(p);
                }
            }
        }
        return new Outcome(resolved, addedNow);
    }

    /**
     * The residual sum of squares of a fit after the first-order autoregressive filter of lag-one
     * correlation ρ: w₁ = √(1 − ρ²)·r₁, w_i = r_i − ρ·r_{i−1} (the Prais–Winsten transformation;
     * Prais &amp; Winsten 1954, from memory). Residuals of AR(1) noise of marginal variance σ²
     * become independent innovations of variance σ²(1 − ρ²) (Box &amp; Jenkins, Time Series
     * Analysis, 1970, §3.2); ρ = 0 gives the plain sum.
     */
    static double whitenedRss(double[] residuals, double rho) {
        double previous = residuals[0];
        double sum = (1 - rho * rho) * previous * previous;
        for (int i = 1; i < residuals.length; i++) {
            double w = residuals[i] - rho * previous;
            sum += w * w;
            previous = residuals[i];
        }
        return sum;
    }

    /** The residuals of a fit at the fitted samples. */
    private static double[] residuals(Fit fit, double[] ft, double[] fv) {
        double[] r = new double[ft.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = fv[i] - fit.model.applyAsDouble(ft[i]);
        }
        return r;
    }

    /**
     * How much more a weighted sum Σ g_i e_i varies over AR(1) noise of lag-one correlation ρ than
     * over white noise of the same variance: gᵀRg / gᵀg with R_ij = ρ^|i−j| (the variance of a
     * linear form, Var(gᵀe) = σ² gᵀRg). A template much wider than the noise's correlation length
     * gives the long-run inflation (1 + ρ)/(1 − ρ); a narrow one much less. Computed in O(n) with
     * the forward and backward filters a_i = g_i + ρ a_{i−1}, b_i = g_i + ρ b_{i+1}, whose sum less
     * g_i is Σ_j ρ^|i−j| g_j.
     */
    static double correlatedVarianceRatio(double[] g, double rho) {
        int n = g.length;
        double gg = 0;
        for (double x : g) {
            gg += x * x;
        }
        if (!(rho > 0) || !(gg > 0)) {
            return 1.0;
        }
        double[] forward = new double[n];
        for (int i = 0; i < n; i++) {
            forward[i] = g[i] + (i > 0 ? rho * forward[i - 1] : 0);
        }
        double backward = 0;
        double gRg = 0;
        for (int i = n - 1; i >= 0; i--) {
            backward = g[i] + (i < n - 1 ? rho * backward : 0);
            gRg += g[i] * (forward[i] + backward - g[i]);
        }
        return gRg / gg;
    }

    /** Of the peaks, the one whose extent holds a time (the nearest apex of several), or null. */
    private static Peak holder(List<Peak> peaks, double timeS) {
        Peak out = null;
        for (Peak p : peaks) {
            if (timeS >= p.startTimeS() && timeS <= p.endTimeS()
                    && (out == null || Math.abs(p.apexTimeS() - timeS) < Math.abs(out.apexTimeS() - timeS))) {
                out = p;
            }
        }
        return out;
    }

    /** A zone found: the new peak, the neighbours it replaces and their refitted versions. */
    private record Found(Peak zone, List<Peak> replaced, List<Peak> refitted) {
    }

    /** One fitted zone in common terms. */
    private record Zone(double apexS, double apexSdS, double centreS, double centreSdS, double height, double area,
                        double widthHalfS, boolean placed) {
    }

    private Found look(List<Peak> peaks, ExpectedZone e, Map<List<Peak>, Optional<Fit>> neighbourFits) {
        double expectedWidth = expectedWidthS(e.timeS());
        if (!(expectedWidth > 0)) {
            return null;
        }
        if (e.reachS() > MAX_REACH_WIDTHS * expectedWidth) {
            return null;
        }
        double lo = e.timeS() - e.reachS() - MARGIN_WIDTHS * expectedWidth;
        double hi = e.timeS() + e.reachS() + MARGIN_WIDTHS * expectedWidth;
        List<Peak> neighbours = new ArrayList<>();
        boolean under = false;
        for (Peak p : peaks) {
            // a peak takes part when the reach meets its extent or its apex lies near the reach; a
            // peak whose flank alone runs into the stretch only bounds it
            boolean holds = e.timeS() + e.reachS() >= p.startTimeS() && e.timeS() - e.reachS() <= p.endTimeS();
            if (p.endTimeS() >= lo && p.startTimeS() <= hi && (holds || (p.apexTimeS() >= lo && p.apexTimeS() <= hi))) {
                neighbours.add(p);
                under |= holds;
            }
        }
        if (neighbours.size() > MAX_NEIGHBOURS) {
            return null;
        }
        if (!under && !concaveWithin(e.timeS() - e.reachS(), e.timeS() + e.reachS())) {
            return null;
        }
        double from = lo;
        double to = hi;
        for (Peak p : neighbours) {
            from = Math.min(from, p.startTimeS() - MARGIN_WIDTHS * expectedWidth);
            to = Math.max(to, p.endTimeS() + MARGIN_WIDTHS * expectedWidth);
        }
        double[] outside = outsideBounds(peaks, neighbours, e.timeS(), expectedWidth);
        from = Math.max(outside[0], Math.max(from, e.timeS() - e.reachS() - MAX_STRETCH_WIDTHS * expectedWidth));
        to = Math.min(outside[1], Math.min(to, e.timeS() + e.reachS() + MAX_STRETCH_WIDTHS * expectedWidth));
        double[][] samples = sampled(from, to, expectedWidth);
        double[] ft = samples[0];
        double[] fv = samples[1];
        int n = ft.length;
        int k = neighbours.size();
        if (n < 4 * (k + 1) + 2) {
            return null;
        }
        double[] without = new double[k];
        double[] with = new double[k + 1];
        for (int j = 0; j < k; j++) {
            without[j] = Math.min(ft[n - 1], Math.max(ft[0], neighbours.get(j).apexTimeS()));
            with[j] = without[j];
        }
        with[k] = e.timeS();
        Arrays.sort(with);
        double startSigma = expectedWidth / GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
        // no zone of the fits wider than the widest that takes part: a broad zone would follow what
        // is left of the baseline instead
        double widest = MAX_WIDTH_FACTOR * expectedWidth;
        for (Peak p : neighbours) {
            widest = Math.max(widest, MAX_WIDTH_FACTOR * p.widthHalfS());
        }
        double maxSigma = Math.min(maxSigmaS, Math.max(minSigmaS, widest / GaussianClusterFit.HALF_WIDTH_PER_SIGMA));
        // the skew direction of the tallest neighbour when it shows one (both otherwise); a zone on
        // the baseline alone is fitted as a Gaussian (too dilute to be dispersed)
        int direction = 0;
        Peak tallest = null;
        for (Peak p : neighbours) {
            tallest = tallest == null || p.height() > tallest.height() ? p : tallest;
        }
        if (tallest != null && Math.abs(tallest.centreTimeS() - tallest.apexTimeS())
                >= SignalLimits.SKEW_CHECK_MIN_WIDTHS * tallest.widthHalfS()) {
            direction = tallest.centreTimeS() > tallest.apexTimeS() ? 1 : -1;
        }
        // the cheap tests first: on the measured peaks where they are not skewed, then on the
        // neighbours' own Gaussian fit (one per set of neighbours and run)
        int centreIndex = nearestIndex(e.timeS());
        int support = (int) Math.ceil(0.5 * SignalLimits.NOISE_SUPPORT_WIDTHS * expectedWidth / sampling);
        double localSd = noise.around(centreIndex, support, false).rawSd();
        double rho = sampledCorrelation(ft);
        double noiseVariance = localSd * localSd;
        boolean skewedToo = k < MAX_SKEWED_ZONES;
        if (k > 0 && direction == 0
                && !residualHoldsZone(ft, fv, Fit.measured(neighbours), e, startSigma, noiseVariance, rho)) {
            return null; // not even the peaks as measured leave room for a zone there
        }
        Optional<Fit> alone = k == 0 ? Optional.of(Fit.empty(fv)) : neighbourFits.computeIfAbsent(neighbours,
                key -> Optional.ofNullable(neighboursFit(key, outside, expectedWidth, startSigma, maxSigma)));
        if (alone.isEmpty() || !residualHoldsZone(ft, fv, alone.get(), e, startSigma, noiseVariance, rho)) {
            return null;
        }
        Fit reduced = k == 0 ? alone.get() : best(ft, fv, without, startSigma, maxSigma, skewedToo, direction);
        if (reduced == null) {
            return null;
        }
        List<Fit> candidates = new ArrayList<>(2);
        Fit atExpected = best(ft, fv, with, startSigma, maxSigma, k > 0, direction);
        if (atExpected != null && atExpected.zones.size() == k + 1) {
            candidates.add(atExpected);
        }
        double apexOffset = tallest == null ? 0 : tallest.apexTimeS() - tallest.centreTimeS();
        if (k > 0 && Math.abs(apexOffset) > SHIFTED_START_MIN_WIDTHS * expectedWidth) {
            double[] shifted = Arrays.copyOf(without, k + 1);
            shifted[k] = Math.min(ft[n - 1], Math.max(ft[0], e.timeS() + apexOffset));
            Arrays.sort(shifted);
            Fit other = best(ft, fv, shifted, startSigma, maxSigma, true, direction);
            if (other != null && other.zones.size() == k + 1) {
                candidates.add(other);
            }
        }
        Peak holder = holder(neighbours, e.timeS());
        if (holder != null && holder.widthHalfS() > SWAPPED_MIN_WIDTHS * expectedWidth) {
            // the top of the peak that holds the expected time may be the expected zone's own, with
            // the zone that peak was taken for hidden beyond it (a merged pair of skewed zones whose
            // sum shows one top and no skew, wider than one zone): the extra zone started at that
            // top, the neighbour half the peak's width further on, away from the expected time
            double[] swapped = Arrays.copyOf(without, k + 1);
            int j = neighbours.indexOf(holder);
            double away = holder.apexTimeS() >= e.timeS() ? 1 : -1;
            swapped[j] = Math.min(ft[n - 1], Math.max(ft[0], holder.apexTimeS() + away * SWAPPED_START_WIDTHS
                    * holder.widthHalfS()));
            swapped[k] = Math.min(ft[n - 1], Math.max(ft[0], holder.apexTimeS()));
            Arrays.sort(swapped);
            Fit other = best(ft, fv, swapped, startSigma, maxSigma, true, direction);
            if (other != null && other.zones.size() == k + 1) {
                candidates.add(other);
            }
        }
        if (k > 0 && k < MAX_SKEWED_ZONES && (reduced.skewed || !adequate(reduced))) {
            // the extra zone nearly symmetric among skewed neighbours: a small zone is too dilute to
            // be dispersed, and a free shape lets it take over the tall neighbour's flank, which puts
            // its first moment seconds from its own top (a zone behind a tailing neighbour then
            // fails the reach with its top where the library expects it). Only where the
            // neighbour alone is skewed or leaves more than the noise: Gaussian neighbours that
            // explain the samples leave little for a held shape to add, and its fits cost a tenth
            // more time on the README benchmark
            boolean[] held = new boolean[k + 1];
            for (int j = 0; j <= k; j++) {
                held[j] = with[j] == e.timeS();
            }
            Fit symmetric = skewedFit(SkewedClusterFit.fit(ft, fv, 0, n - 1, with, startSigma, minSigmaS, maxSigma,
                    noise.global().rawSd(), direction, held));
            if (symmetric != null && symmetric.zones.size() == k + 1) {
                candidates.add(symmetric);
            }
        }
        // the better fit first; a fit that puts the extra zone elsewhere (one skewed zone and a
        // bump on its toe can follow a merged pair as closely as the pair itself) gives way to the
        // other, at the test level shared between them
        candidates.sort(Comparator.comparingDouble(Fit::rss));
        double level = MAX_P_VALUE / Math.max(1, candidates.size());
        for (Fit full : candidates) {
            Found found = judged(full, reduced, level, ft, fv, rho, localSd, neighbours, e, expectedWidth);
            if (found != null) {
                return found;
            }
        }
        return null;
    }

    /** The zone found by a fit with the extra zone, or null when the fit fails any of the tests. */
    private Found judged(Fit full, Fit reduced, double level, double[] ft, double[] fv, double rho, double localSd,
                         List<Peak> neighbours, ExpectedZone e, double expectedWidth) {
        int n = ft.length;
        int dof = n - full.parameters;
        double fall = reduced.rss - full.rss;
        if (!(fall > 0) || !(full.rss > 0) || dof < 1) {
            return null;
        }
        // the extra-sum-of-squares test on the prewhitened residuals: correlated noise wanders
        // slowly, and its residuals would pass for zones
        int extra = Math.max(1, full.parameters - reduced.parameters);
        double whiteFull = whitenedRss(residuals(full, ft, fv), rho);
        double whiteFall = whitenedRss(residuals(reduced, ft, fv), rho) - whiteFull;
        if (!(whiteFall > 0) || !(whiteFull > 0)) {
            return null;
        }
        double f = (whiteFall / extra) / (whiteFull / dof);
        double p = 1.0 - new FDistribution(null, extra, dof).cumulativeProbability(f);
        if (!(p < level)) {
            return null;
        }
        if (!(full.rss / dof <= SignalLimits.SKEWED_CLUSTER_MISFIT_RATIO * localSd * localSd)
                && !(full.skewed && reduced.rss >= MISFIT_EXPLAINED_RATIO * full.rss)) {
            return null;
        }
        // which fitted zone is each neighbour's: nearest apex, in order (both lists are in time order)
        int extraIndex = extraZone(full.zones, neighbours, e.timeS(), full.skewed);
        if (extraIndex < 0) {
            return null;
        }
        Zone z = full.zones.get(extraIndex);
        if (!z.placed || Math.abs(z.centreS - e.timeS()) > e.reachS()
                || z.widthHalfS < MIN_WIDTH_FACTOR * expectedWidth || z.widthHalfS > MAX_WIDTH_FACTOR * expectedWidth) {
            return null;
        }
        double rootInflation = Math.sqrt(inflation());
        Peak found = peak(z, rootInflation, z.apexS - 1.5 * z.widthHalfS, z.apexS + 1.5 * z.widthHalfS);
        if (!(found.signalToNoise() >= Tolerances.LOWEST_DETECTION_LIMIT_SIGNAL_TO_NOISE)) {
            return null;
        }
        List<Peak> replaced = new ArrayList<>();
        List<Peak> refitted = new ArrayList<>();
        int j = 0;
        for (int i = 0; i < full.zones.size(); i++) {
            if (i == extraIndex) {
                continue;
            }
            Peak old = neighbours.get(j++);
            Zone own = full.zones.get(i);
            if (Math.abs(own.apexS - old.apexTimeS()) > old.widthHalfS()) {
                return null; // the fit moved a neighbour: not the same peaks with one zone more
            }
            if (!full.skewed && Math.abs(own.apexS - z.apexS) < SignalLimits.SHOULDER_MIN_SEPARATION_SIGMAS
                    * Math.max(own.widthHalfS, z.widthHalfS) / GaussianClusterFit.HALF_WIDTH_PER_SIGMA) {
                return null; // two Gaussians on one top: a shape the Gaussian does not follow, not two zones
            }
            if (z.centreS > old.startTimeS() && z.centreS < old.endTimeS()) {
                // the new zone lay inside this peak: the peak is split at the crossing of the two zones
                double cut = 0.5 * (own.apexS + z.apexS);
                double start = own.apexS < z.apexS ? old.startTimeS() : cut;
                double end = own.apexS < z.apexS ? cut : old.endTimeS();
                replaced.add(old);
                refitted.add(peak(own, rootInflation, start, end));
            }
        }
        if (found.startTimeS() < t[0] || found.endTimeS() > t[t.length - 1]) {
            return null;
        }
        return new Found(found, replaced, refitted);
    }

    /** The variance inflation of the run's correlated noise, (1 + ρ)/(1 − ρ): on the screens' noise
     *  variance and on F (see the class comment for the degrees of freedom). */
    private double inflation() {
        return (1 + correlation) / (1 - correlation);
    }

    /** The lag-one correlation of the noise between successive fitted samples (every m-th sample of
     *  the run: ρ^m). */
    private double sampledCorrelation(double[] ft) {
        int n = ft.length;
        if (n < 2 || !(correlation > 0)) {
            return 0.0;
        }
        long stride = Math.max(1, Math.round((ft[n - 1] - ft[0]) / ((n - 1) * sampling)));
        return Math.pow(correlation, stride);
    }

    /** The samples from one time to another, every m-th on a finely sampled run (at most
     *  {@value #MAX_FIT_SAMPLES}, keeping {@value #SAMPLES_PER_WIDTH} per expected width): {times, values}. */
    private double[][] sampled(double fromS, double toS, double expectedWidth) {
        int first = Math.max(0, lowerIndex(fromS));
        int last = Math.min(t.length - 1, lowerIndex(toS));
        int stride = (int) Math.max(1, Math.min(Math.ceil((last - first + 1.0) / MAX_FIT_SAMPLES),
                Math.floor(expectedWidth / (SAMPLES_PER_WIDTH * sampling))));
        int n = Math.max(0, (last - first) / stride + 1);
        double[] ft = new double[n];
        double[] fv = new double[n];
        for (int i = 0; i < n; i++) {
            ft[i] = t[first + i * stride];
            fv[i] = raw[first + i * stride];
        }
        return new double[][] {ft, fv};
    }

    /**
     * Where the fitted stretch must stop: {@code marginS} after the end of the last peak before the
     * neighbours that takes no part in the fit, and as much before the start of the first after them
     * ({start, end}; infinite where there is none). A flank of such a peak inside the stretch is
     * modelled by no fitted zone: it would spoil the fits without and with the extra zone alike, and
     * the misfit test would then refuse a zone that is there. A peak's extent ends where the detector
     * split it from its neighbour, and its flank runs on beyond (a modelling choice: on three seeds of
     * the lab-day bench, stopping one expected width off found more of the zones ≥ 10 noise SDs than
     * half a width or one and a half, at the same precision; it costs where a neighbour's own
     * diffuse toe lies in that width, as for a merged pair of fronting zones just after a tall one,
     * whose cut toe can leave the pair's second zone unfound).
     *
     * @param reference the time that tells before from after when there are no neighbours
     * @param marginS   how far from such a peak's extent the stretch stops, s
     */
    private static double[] outsideBounds(List<Peak> peaks, List<Peak> neighbours, double reference, double marginS) {
        double first = reference;
        double last = reference;
        for (Peak p : neighbours) {
            first = Math.min(first, p.apexTimeS());
            last = Math.max(last, p.apexTimeS());
        }
        double start = Double.NEGATIVE_INFINITY;
        double end = Double.POSITIVE_INFINITY;
        for (Peak p : peaks) {
            if (neighbours.contains(p)) {
                continue;
            }
            if (p.apexTimeS() < first) {
                start = Math.max(start, p.endTimeS() + marginS);
            } else if (p.apexTimeS() > last) {
                end = Math.min(end, p.startTimeS() - marginS);
            }
        }
        return new double[] {start, end};
    }

    /** The Gaussian fit of the neighbours alone over their own samples (their extents and a margin,
     *  within {@code outside}), or null. */
    private Fit neighboursFit(List<Peak> neighbours, double[] outside, double expectedWidth, double startSigma,
                              double maxSigma) {
        double from = Double.POSITIVE_INFINITY;
        double to = Double.NEGATIVE_INFINITY;
        for (Peak p : neighbours) {
            from = Math.min(from, p.startTimeS() - MARGIN_WIDTHS * expectedWidth);
            to = Math.max(to, p.endTimeS() + MARGIN_WIDTHS * expectedWidth);
        }
        from = Math.max(from, outside[0]);
        to = Math.min(to, outside[1]);
        double[][] samples = sampled(from, to, expectedWidth);
        if (samples[0].length < 4 * neighbours.size() + 2) {
            return null;
        }
        double[] apexes = new double[neighbours.size()];
        for (int j = 0; j < apexes.length; j++) {
            apexes[j] = neighbours.get(j).apexTimeS();
        }
        return best(samples[0], samples[1], apexes, startSigma, maxSigma, false, 0);
    }

    /**
     * The cheap test before the fit with the extra zone: a Gaussian of the expected width placed
     * anywhere within the reach (steps of half its SD) and scaled by linear least squares to the
     * residual of the fit without it takes from the residual sum of squares at least
     * {@value #SCREEN_CHI_SQUARE} times the noise variance (a matched filter on the residual: for
     * noise alone and a stand-in that follows the neighbours, the fall at one place over the noise
     * variance is χ²(1)).
     *
     * @param noiseVariance the local noise variance
     * @param rho           the lag-one correlation of the noise between the fitted samples
     */
    private static boolean residualHoldsZone(double[] ft, double[] fv, Fit reduced, ExpectedZone e, double sigma,
                                             double noiseVariance, double rho) {
        int n = ft.length;
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = fv[i] - reduced.model.applyAsDouble(ft[i]);
        }
        double bestFall = 0;
        double step = 0.5 * sigma;
        for (double at = e.timeS() - e.reachS(); at <= e.timeS() + e.reachS() + 1e-9 * step; at += step) {
            double[] g = new double[n];
            double rg = 0;
            double gg = 0;
            for (int i = 0; i < n; i++) {
                double z = (ft[i] - at) / sigma;
                if (Math.abs(z) < 5) {
                    g[i] = Math.exp(-0.5 * z * z);
                    rg += r[i] * g[i];
                    gg += g[i] * g[i];
                }
            }
            if (rg > 0 && gg > 0) {
                bestFall = Math.max(bestFall, rg * rg / gg / correlatedVarianceRatio(g, rho));
            }
        }
        return bestFall >= SCREEN_CHI_SQUARE * noiseVariance;
    }

    /** The index of the zone in {@code zones} (k + 1 of them) that no neighbour claims; −1 if unclear.
     *  {@code byFirstMoment}: pair skewed zones with the neighbours by first moment, not apex. */
    private static int extraZone(List<Zone> zones, List<Peak> neighbours, double expectedS, boolean byFirstMoment) {
        // the zones in time order; leaving out zone i must pair the rest with the neighbours in order.
        // Of the choices, the one whose pairs lie closest plus the left-out zone's distance from the
        // expected time
        int best = -1;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int i = 0; i < zones.size(); i++) {
            double cost = 0;
            int j = 0;
            for (int m = 0; m < zones.size(); m++) {
                if (m == i) {
                    continue;
                }
                Peak neighbour = neighbours.get(j++);
                cost += byFirstMoment ? Math.abs(zones.get(m).centreS - neighbour.centreTimeS())
                        : Math.abs(zones.get(m).apexS - neighbour.apexTimeS());
            }
            cost += Math.abs(zones.get(i).centreS - expectedS);
            if (cost < bestCost) {
                bestCost = cost;
                best = i;
            }
        }
        return best;
    }

    /** A peak from a fitted zone, with its S/N measured as the detector measures it. */
    private Peak peak(Zone z, double rootInflation, double startS, double endS) {
        int apex = nearestIndex(z.apexS);
        double peakToPeak = PeakDetector.peakToPeakNoise(noise, apex, z.widthHalfS, sampling);
        double sn = 2 * z.height / peakToPeak;
        double plates = PeakDetector.PLATE_FACTOR * (z.apexS / z.widthHalfS) * (z.apexS / z.widthHalfS);
        return new Peak(apex, z.apexS, z.apexSdS * rootInflation, z.centreS, z.centreSdS * rootInflation,
                Math.max(t[0], startS), Math.min(t[t.length - 1], endS), z.height, z.area,
                z.apexS > 0 ? z.area / z.apexS : Double.NaN, z.widthHalfS, plates, Double.NaN, sn, dip);
    }

    /** A fit in common terms, with its residual and parameter count. */
    private record Fit(List<Zone> zones, double rss, int parameters, int points, DoubleUnaryOperator model,
                       boolean skewed) {

        static Fit empty(double[] v) {
            double rss = 0;
            for (double x : v) {
                rss += x * x;
            }
            return new Fit(List.of(), rss, 0, v.length, x -> 0.0, false);
        }

        /** The peaks as Gaussians of their measured apex, height and width, not fitted (a cheap
         *  stand-in for the screen: a fit only lowers the residual it leaves). */
        static Fit measured(List<Peak> peaks) {
            double[] apex = new double[peaks.size()];
            double[] height = new double[peaks.size()];
            double[] sigma = new double[peaks.size()];
            for (int j = 0; j < apex.length; j++) {
                apex[j] = peaks.get(j).apexTimeS();
                height[j] = peaks.get(j).height();
                sigma[j] = peaks.get(j).widthHalfS() / GaussianClusterFit.HALF_WIDTH_PER_SIGMA;
            }
            return new Fit(List.of(), Double.NaN, 3 * apex.length, 0, x -> {
                double sum = 0;
                for (int j = 0; j < apex.length; j++) {
                    double z = (x - apex[j]) / sigma[j];
                    sum += height[j] * Math.exp(-0.5 * z * z);
                }
                return sum;
            }, false);
        }

        double bic() {
            return points * Math.log(rss / points) + parameters * Math.log(points);
        }
    }

    /** The Gaussian or the skewed fit of zones started at {@code apexes}, whichever has the smaller BIC. */
    private Fit best(double[] ft, double[] fv, double[] apexes, double startSigma, double maxSigma, boolean skewedToo,
                     int direction) {
        int first = 0;
        int last = ft.length - 1;
        Fit gaussian = null;
        GaussianClusterFit.Result g = GaussianClusterFit.fit(ft, fv, first, last, apexes, startSigma, minSigmaS,
                maxSigma);
        if (g != null) {
            List<Zone> zones = new ArrayList<>();
            for (GaussianClusterFit.Component c : g.components()) {
                zones.add(new Zone(c.apexTimeS(), c.apexTimeSdS(), c.apexTimeS(), c.apexTimeSdS(), c.height(), c.area(),
                        c.widthHalfS(), c.apexTimeSdS() < c.widthHalfS()));
            }
            gaussian = new Fit(zones, g.residualSumOfSquares(), g.parameters(), g.points(),
                    sumOf(g.components(), GaussianClusterFit.Component::value), false);
        }
        double noiseSd = noise.global().rawSd();
        if (gaussian != null && adequate(gaussian)) {
            return gaussian; // Gaussians follow the samples down to the noise: no skewed form needed
        }
        if (apexes.length > MAX_SKEWED_ZONES || !skewedToo) {
            return gaussian;
        }
        Fit skewed = skewedFit(SkewedClusterFit.fit(ft, fv, first, last, apexes, startSigma, minSigmaS,
                maxSigma, noiseSd, direction));
        if (gaussian == null || skewed == null) {
            return gaussian == null ? skewed : gaussian;
        }
        return skewed.bic() < gaussian.bic() ? skewed : gaussian;
    }

    /** A skewed-cluster fit in common terms; null for null. */
    private static Fit skewedFit(SkewedClusterFit.Result s) {
        if (s == null) {
            return null;
        }
        List<Zone> zones = new ArrayList<>();
        for (SkewedClusterFit.Zone c : s.zones()) {
            double apex = c.apexTimeS();
            zones.add(new Zone(apex, c.centreSdS(), c.firstMomentS(), c.firstMomentSdS(), c.value(apex),
                    c.areaTimesS(), c.widthHalfS(), c.placed()));
        }
        zones.sort(Comparator.comparingDouble(Zone::apexS));
        return new Fit(zones, s.residualSumOfSquares(), s.parameters(), s.points(),
                sumOf(s.zones(), SkewedClusterFit.Zone::value), true);
    }

    /** The sum of fitted zones as a function of time. */
    private static <T> DoubleUnaryOperator sumOf(List<T> zones, ToDoubleBiFunction<T, Double> value) {
        return x -> {
            double sum = 0;
            for (T z : zones) {
                sum += value.applyAsDouble(z, x);
            }
            return sum;
        };
    }

    /** True when a fit leaves a residual variance of at most
     *  {@link SignalLimits#SKEWED_CLUSTER_MISFIT_RATIO} times the run's noise variance. */
    private boolean adequate(Fit f) {
        double noiseSd = noise.global().rawSd();
        return f.rss / Math.max(1, f.points - f.parameters) <= SignalLimits.SKEWED_CLUSTER_MISFIT_RATIO * noiseSd * noiseSd;
    }

    /** True when the concavity has a local maximum of at least the screen level between two times. */
    private boolean concaveWithin(double fromS, double toS) {
        int from = Math.max(1, lowerIndex(fromS));
        int to = Math.min(t.length - 2, lowerIndex(toS) + 1);
        double level = SCREEN_CONCAVITY_SIGMAS * concavitySd;
        for (int i = from; i <= to; i++) {
            double c = concavity[i];
            if (c >= level && c >= concavity[i - 1] && c >= concavity[i + 1]) {
                return true;
            }
        }
        return false;
    }

    /** The peaks with their resolution to the nearest neighbour measured again. */
    private static List<Peak> withResolutions(List<Peak> peaks) {
        List<Peak> out = new ArrayList<>(peaks.size());
        for (int k = 0; k < peaks.size(); k++) {
            Peak m = peaks.get(k);
            Peak neighbour = null;
            for (int j = Math.max(0, k - 1); j <= Math.min(peaks.size() - 1, k + 1); j++) {
                if (j != k && (neighbour == null
                        || Math.abs(peaks.get(j).apexTimeS() - m.apexTimeS()) < Math.abs(neighbour.apexTimeS() - m.apexTimeS()))) {
                    neighbour = peaks.get(j);
                }
            }
            double resolution = neighbour == null ? Double.NaN
                    : PeakDetector.resolution(m.apexTimeS(), m.widthHalfS(), neighbour.apexTimeS(), neighbour.widthHalfS());
            out.add(new Peak(m.apexIndex(), m.apexTimeS(), m.apexTimeSdS(), m.centreTimeS(), m.centreTimeSdS(),
                    m.startTimeS(), m.endTimeS(), m.height(), m.area(), m.correctedArea(), m.widthHalfS(), m.plates(),
                    resolution, m.signalToNoise(), m.dip(), m.centreShapeSdS()));
        }
        return out;
    }

    /** Index of the last sample at or before a time (0 when before the first). */
    private int lowerIndex(double timeS) {
        int i = Arrays.binarySearch(t, timeS);
        return i >= 0 ? i : Math.max(0, -i - 2);
    }

    private int nearestIndex(double timeS) {
        int i = lowerIndex(timeS);
        return i + 1 < t.length && t[i + 1] - timeS < timeS - t[i] ? i + 1 : i;
    }
}
