package org.mobident.pipeline;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.mobident.Tolerances;
import org.mobident.matching.RunMatch;
import org.mobident.mobility.ChargedMarkerScale;
import org.mobident.mobility.NeutralMarkerScale;
import org.mobident.mobility.PhysicalBounds;
import org.mobident.mobility.TwoMarkerScale;
import org.mobident.result.MobilityScale;
import org.mobident.result.Peak;
import org.mobident.trace.RunConditions;

/**
 * Finds a run's markers and sets its mobility scale.
 *
 * <ul>
 *   <li>A charged marker of known mobility is the tallest peak in its window; with the neutral
 *       marker it needs no lengths or voltage (Jumppanen &amp; Riekkola 1995); alone, with lengths
 *       and voltage, it gives the EOF.</li>
 *   <li>The neutral marker is chosen as the peak under which the library explains the run best:
 *       each candidate peak is weighed by its prior (the peaks inside the marker window share
 *       {@value #IN_WINDOW_PRIOR} of it, the tallest peaks outside the rest; without a window the
 *       tallest peaks share it; within a share a peak below the detection limit weighs
 *       {@value #FAINT_CANDIDATE_WEIGHT} of a detected one) times the run's evidence under the
 *       library with that marker ({@link RunMatch#logEvidence()}: every analyte peak matched, the
 *       run's scale fitted).
 *       The peaks inside the window are always tried; the others only when the window holds no
 *       peak or the best peak inside it leaves most of the run unexplained. A taller foreign peak
 *       in the window therefore does not win when the library disagrees, and a weak marker is
 *       still found. The weights of the hypotheses tried are returned, so the uncertainty of the
 *       choice can enter the confidences.</li>
 *   <li>With an empty library the tallest peak in the window (or of the run) is taken.</li>
 * </ul>
 * A scale whose EOF mobility lies beyond {@link PhysicalBounds#MAX_EOF_MOBILITY} is not considered.
 */
final class MarkerLocator {

    /** How many of the tallest peaks are tried as neutral marker outside (or without) a window. */
    static final int MAX_MARKER_HYPOTHESES = 15;
    /** Most peaks inside the marker window tried (the tallest). */
    static final int MAX_IN_WINDOW = 8;
    /** Prior probability that the neutral marker lies inside the window the user gave. */
    static final double IN_WINDOW_PRIOR = 0.95;
    /**
     * The best in-window marker explains the run "well enough" to skip the peaks outside the
     * window when the library explains at least this share of the other peaks (a modelling choice).
     */
    static final double WELL_EXPLAINED_SHARE = 0.5;
    /** Hypotheses with less weight than this are left out of the mixture. */
    static final double NEGLIGIBLE_WEIGHT = 1e-6;
    /**
     * Prior weight of a marker candidate below the detection limit against one of a detected
     * peak (a modelling choice): the search for a weak marker reports zones down to S/N 1.5, and
     * there noise bumps pass as well; without this, one of them could win when a run's scale can
     * be bent to fit it (on the lab-day bench recorded at 3–5 Hz, a bump of S/N 1.5 was taken over a
     * marker of S/N 47 in a run 1.4 K warm). A weak marker that the library agrees with still wins.
     */
    static final double FAINT_CANDIDATE_WEIGHT = 0.2;
    /** A marker choice less certain than this is mentioned in the run's notes. */
    static final double MENTION_BELOW = 0.99;

    /** Evaluates the run's analyte peaks under a scale. */
    interface Evaluator {
        /** The match of the analyte peaks; {@code mobilityUsualSd} as {@link Peak#migrationTimeUsualSdS()}. */
        RunMatch match(double[] mobility, double[] mobilitySd, double[] mobilityUsualSd);
    }

    /**
     * One way of reading the run: a scale from a choice of markers, and the match of the other peaks.
     *
     * @param scale        the scale
     * @param neutralIndex index of the neutral marker peak, or -1
     * @param refIndex     index of the charged marker peak, or -1
     * @param analytes     indices of the other peaks, in order
     * @param mobility     their mobilities under the scale
     * @param mobilitySd   their standard uncertainties
     * @param mobilityUsualSd their uncertainties in the usual case ({@link Peak#migrationTimeUsualSdS()})
     * @param match        their match (null when the library is empty)
     * @param logScore     ln prior + ln evidence
     */
    record Hypothesis(MobilityScale scale, int neutralIndex, int refIndex, int[] analytes, double[] mobility,
                      double[] mobilitySd, double[] mobilityUsualSd, RunMatch match, double logScore) {
    }

    /**
     * The outcome.
     *
     * @param best    the chosen reading, or null when no scale could be set
     * @param others  every reading tried with a weight (the chosen one included), for mixing
     * @param weights their normalised weights
     * @param note    what an analyst should know about the choice ("" when nothing)
     */
    record Choice(Hypothesis best, List<Hypothesis> others, double[] weights, String note) {
    }

    private final boolean emptyLibrary;

    MarkerLocator(boolean emptyLibrary) {
        this.emptyLibrary = emptyLibrary;
    }

    Choice locate(RunConditions c, List<Peak> peaks, Evaluator evaluator) {
        if (peaks.isEmpty()) {
            return failed("no peaks found above the S/N threshold: no mobility scale (if the peaks dip below the "
                    + "baseline, the detection mode should be 'indirect'; if they rise, 'direct')");
        }
        int ref = -1;
        if (c.hasRefMarker()) {
            ref = tallestIn(peaks, c.refMarkerFromS(), c.refMarkerToS(), -1);
            if (ref < 0) {
                return failed(String.format(Locale.ROOT,
                        "no peak in the charged-marker window %.1f–%.1f s: mobilities not computed",
                        c.refMarkerFromS(), c.refMarkerToS()));
            }
        }
        if (ref >= 0 && c.hasGeometry() && !c.hasMarkerWindow()) {
            Peak m = peaks.get(ref);
            MobilityScale scale = new ChargedMarkerScale(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(),
                    c.rampOrZeroS(), m.migrationTimeS(), m.migrationTimeSdS(), c.refMarkerMobility());
            Hypothesis h = hypothesis(scale, -1, ref, peaks, 0.0, evaluator);
            return single(h, "");
        }
        List<Integer> inWindow = new ArrayList<>();
        List<Integer> outside = new ArrayList<>();
        for (int i = 0; i < peaks.size(); i++) {
            if (i == ref) {
                continue;
            }
            Peak p = peaks.get(i);
            if (c.hasMarkerWindow() && p.apexTimeS() >= c.markerFromS() && p.apexTimeS() <= c.markerToS()) {
                inWindow.add(i);
            } else {
                outside.add(i);
            }
        }
        Comparator<Integer> tallestFirst = Comparator.comparingDouble((Integer i) -> -peaks.get(i).height())
                .thenComparingInt(i -> i);
        inWindow.sort(tallestFirst);
        outside.sort(tallestFirst);
        if (inWindow.size() > MAX_IN_WINDOW) {
            inWindow = inWindow.subList(0, MAX_IN_WINDOW);
        }
        if (outside.size() > MAX_MARKER_HYPOTHESES) {
            outside = outside.subList(0, MAX_MARKER_HYPOTHESES);
        }
        if (inWindow.isEmpty() && outside.isEmpty()) {
            return failed("no peak left to serve as neutral marker: mobilities not computed");
        }
        if (emptyLibrary) {
            int n = !inWindow.isEmpty() ? inWindow.get(0) : outside.get(0);
            Hypothesis h = hypothesis(scale(c, peaks, n, ref), n, ref, peaks, 0.0, evaluator);
            String note = inWindow.isEmpty() ? String.format(Locale.ROOT, "%s and the library is empty: tallest peak "
                    + "at %.2f s taken as neutral marker", c.hasMarkerWindow() ? "no peak in the marker window"
                    : "no marker window given", peaks.get(n).apexTimeS()) : "";
            return single(h, note);
        }
        List<Hypothesis> tried = new ArrayList<>();
        double inShare = c.hasMarkerWindow() ? (outside.isEmpty() ? 1.0 : IN_WINDOW_PRIOR) : 0.0;
        double outShare = 1.0 - inShare;
        double inWeight = candidateWeight(peaks, inWindow);
        for (int n : inWindow) {
            addIfPlausible(tried, c, peaks, n, ref, Math.log(inShare * candidateWeight(peaks.get(n)) / inWeight),
                    evaluator);
        }
        boolean tryOutside = inWindow.isEmpty() || !explainsWell(best(tried));
        if (tryOutside) {
            double share = inWindow.isEmpty() ? 1.0 : outShare;
            double outWeight = candidateWeight(peaks, outside);
            for (int n : outside) {
                addIfPlausible(tried, c, peaks, n, ref, Math.log(share * candidateWeight(peaks.get(n)) / outWeight),
                        evaluator);
            }
        }
        if (tried.isEmpty()) {
            return failed(String.format(Locale.ROOT, "every candidate neutral marker gives an EOF mobility beyond "
                    + "±%.0f units: check the time unit of the trace (minutes read as seconds?), the voltage and "
                    + "the capillary lengths", PhysicalBounds.MAX_EOF_MOBILITY));
        }
        Hypothesis best = best(tried);
        if (c.hasMarkerWindow() && inWindow.isEmpty() && (best.analytes().length == 0 || !explainsWell(best))) {
            // nothing in the window, and no peak outside it lets the library explain the run: a scale
            // from one of them would be a guess, and wrong mobilities are worse than none
            return failed(String.format(Locale.ROOT, "no peak in the marker window %.1f–%.1f s (not even a faint "
                    + "one), and no other peak taken as marker lets the library explain the run: mobilities not "
                    + "computed; check the marker window and whether the marker was injected",
                    c.markerFromS(), c.markerToS()));
        }
        double[] weights = weights(tried);
        int bestIndex = tried.indexOf(best);
        return new Choice(best, tried, weights, note(c, peaks, inWindow, best, weights[bestIndex], tried.size()));
    }

    /**
     * A candidate's weight within its share of the prior: {@value #FAINT_CANDIDATE_WEIGHT} for a peak
     * below the detection limit (S/N 3, ICH Q2: found by the search for a weak marker or for faint
     * zones, where noise and the edges of baseline steps pass more often than above it), 1 for any
     * other. (Below S/N 2 only, a faint window peak 40 times smaller than the marker beside it was
     * taken as the marker in a run of four zones, two of them foreign, sampled at 2 Hz.)
     */
    static double candidateWeight(Peak p) {
        double sn = p.signalToNoise();
        return Double.isFinite(sn) && sn < Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE
                ? FAINT_CANDIDATE_WEIGHT : 1.0;
    }

    private static double candidateWeight(List<Peak> peaks, List<Integer> group) {
        double sum = 0;
        for (int i : group) {
            sum += candidateWeight(peaks.get(i));
        }
        return sum;
    }

    private static Choice failed(String note) {
        return new Choice(null, List.of(), new double[0], note);
    }

    private static Choice single(Hypothesis h, String note) {
        if (!PhysicalBounds.plausibleEof(h.scale().eofMobility())) {
            return failed(String.format(Locale.ROOT, "the EOF mobility comes out at %.1f units (1e-9 m²/(V s)), "
                    + "beyond the physical bound of ±%.0f: check the time unit of the trace (minutes read as "
                    + "seconds?), the voltage and the capillary lengths", h.scale().eofMobility(),
                    PhysicalBounds.MAX_EOF_MOBILITY));
        }
        return new Choice(h, List.of(h), new double[] {1.0}, note);
    }

    private void addIfPlausible(List<Hypothesis> tried, RunConditions c, List<Peak> peaks, int n, int ref,
                                double logPrior, Evaluator evaluator) {
        MobilityScale scale = scale(c, peaks, n, ref);
        if (PhysicalBounds.plausibleEof(scale.eofMobility())) {
            tried.add(hypothesis(scale, n, ref, peaks, logPrior, evaluator));
        }
    }

    private static Hypothesis hypothesis(MobilityScale scale, int neutral, int ref, List<Peak> peaks, double logPrior,
                                         Evaluator evaluator) {
        int count = 0;
        for (int i = 0; i < peaks.size(); i++) {
            count += i != neutral && i != ref ? 1 : 0;
        }
        int[] analytes = new int[count];
        double[] mob = new double[count];
        double[] sd = new double[count];
        double[] usual = new double[count];
        int k = 0;
        for (int i = 0; i < peaks.size(); i++) {
            if (i == neutral || i == ref) {
                continue;
            }
            Peak p = peaks.get(i);
            analytes[k] = i;
            mob[k] = scale.mobility(p.migrationTimeS());
            sd[k] = scale.mobilitySd(p.migrationTimeS(), p.migrationTimeSdS());
            usual[k] = scale.mobilitySd(p.migrationTimeS(), p.migrationTimeUsualSdS());
            k++;
        }
        RunMatch match = evaluator == null ? null : evaluator.match(mob, sd, usual);
        double evidence = match == null || !Double.isFinite(match.logEvidence()) ? 0.0 : match.logEvidence();
        return new Hypothesis(scale, neutral, ref, analytes, mob, sd, usual, match, logPrior + evidence);
    }

    private static Hypothesis best(List<Hypothesis> tried) {
        Hypothesis best = null;
        for (Hypothesis h : tried) {
            if (best == null || h.logScore() > best.logScore()) {
                best = h;
            }
        }
        return best;
    }

    /**
     * True when the choice needs no further marker candidates: a chosen marker inside the window
     * (or no window), that leaves the run well explained and is nearly certain.
     */
    static boolean settled(Choice choice, RunConditions c) {
        Hypothesis best = choice.best();
        if (best == null || best.neutralIndex() < 0) {
            return best != null;
        }
        int index = choice.others().indexOf(best);
        double weight = index >= 0 && index < choice.weights().length ? choice.weights()[index] : 1.0;
        return explainsWell(best) && weight >= MENTION_BELOW && choice.note().isEmpty();
    }

    private static boolean explainsWell(Hypothesis h) {
        if (h == null || h.match() == null) {
            return false;
        }
        int n = h.analytes().length;
        return n == 0 || h.match().explainedPeaks() >= WELL_EXPLAINED_SHARE * n;
    }

    private static double[] weights(List<Hypothesis> tried) {
        double max = Double.NEGATIVE_INFINITY;
        for (Hypothesis h : tried) {
            max = Math.max(max, h.logScore());
        }
        double[] w = new double[tried.size()];
        double sum = 0;
        for (int k = 0; k < w.length; k++) {
            w[k] = Math.exp(tried.get(k).logScore() - max);
            sum += w[k];
        }
        for (int k = 0; k < w.length; k++) {
            w[k] /= sum;
            if (w[k] < NEGLIGIBLE_WEIGHT) {
                w[k] = 0;
            }
        }
        return w;
    }

    private static String note(RunConditions c, List<Peak> peaks, List<Integer> inWindow, Hypothesis best,
                               double weight, int tried) {
        Peak chosen = peaks.get(best.neutralIndex());
        String explained = best.match() == null ? "" : String.format(Locale.ROOT,
                "the library explains %.1f of the other %d peaks with it", best.match().explainedPeaks(),
                best.analytes().length);
        String certainty = weight < MENTION_BELOW ? String.format(Locale.ROOT,
                "; this choice is %.0f %% certain and its doubt is carried into the confidences", 100 * weight) : "";
        if (!c.hasMarkerWindow()) {
            return String.format(Locale.ROOT, "no marker window given: peak at %.2f s taken as neutral marker because "
                    + "%s (%d peaks tried)%s; give marker_from_s/marker_to_s to fix it", chosen.apexTimeS(),
                    explained, tried, certainty);
        }
        String window = String.format(Locale.ROOT, "%.1f–%.1f s", c.markerFromS(), c.markerToS());
        if (inWindow.isEmpty()) {
            return String.format(Locale.ROOT, "no peak in the marker window %s: peak at %.2f s taken as neutral "
                    + "marker because %s%s", window, chosen.apexTimeS(), explained, certainty);
        }
        if (!inWindow.contains(best.neutralIndex())) {
            return String.format(Locale.ROOT, "the peaks in the marker window %s leave the run unexplained: peak at "
                    + "%.2f s, outside the window, taken as neutral marker because %s%s", window, chosen.apexTimeS(),
                    explained, certainty);
        }
        if (best.neutralIndex() != inWindow.get(0)) {
            return String.format(Locale.ROOT, "neutral marker: peak at %.2f s in the window %s, not the taller one at "
                    + "%.2f s, because %s%s", chosen.apexTimeS(), window, peaks.get(inWindow.get(0)).apexTimeS(),
                    explained, certainty);
        }
        return certainty.isEmpty() ? "" : "neutral marker" + certainty;
    }

    private static MobilityScale scale(RunConditions c, List<Peak> peaks, int neutral, int ref) {
        Peak n = peaks.get(neutral);
        if (ref >= 0) {
            Peak m = peaks.get(ref);
            return new TwoMarkerScale(c.rampOrZeroS(), n.migrationTimeS(), n.migrationTimeSdS(),
                    m.migrationTimeS(), m.migrationTimeSdS(), c.refMarkerMobility());
        }
        return new NeutralMarkerScale(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(), c.rampOrZeroS(),
                n.migrationTimeS(), n.migrationTimeSdS());
    }

    /** Index of the tallest peak with apex in [fromS, toS], skipping {@code exclude}; -1 if none. */
    private static int tallestIn(List<Peak> peaks, double fromS, double toS, int exclude) {
        int best = -1;
        for (int i = 0; i < peaks.size(); i++) {
            Peak p = peaks.get(i);
            if (i != exclude && p.apexTimeS() >= fromS && p.apexTimeS() <= toS
                    && (best < 0 || p.height() > peaks.get(best).height())) {
                best = i;
            }
        }
        return best;
    }
}
