package org.mobident.pipeline;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.mobident.library.Library;
import org.mobident.matching.MatchSettings;
import org.mobident.matching.Matcher;
import org.mobident.matching.MobilityAdjuster;
import org.mobident.matching.PeakMatch;
import org.mobident.mobility.ChargedMarkerScale;
import org.mobident.mobility.MobilityScale;
import org.mobident.mobility.NeutralMarkerScale;
import org.mobident.mobility.TwoMarkerScale;
import org.mobident.signal.Peak;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

/**
 * Finds a run's markers and sets its mobility scale.
 *
 * <ul>
 *   <li>With a neutral-marker window: the tallest peak in the window is the neutral marker.</li>
 *   <li>With a charged marker of known mobility: the tallest peak in its window; combined with the
 *       neutral marker it needs no lengths or voltage (Jumppanen &amp; Riekkola 1995); alone, with
 *       lengths and voltage, it gives the EOF.</li>
 *   <li>Without a window, each of the tallest peaks is tried as the neutral marker and the one
 *       under which the library explains the run best (the largest sum of assignment
 *       confidences over the other peaks) is taken; ties go to the taller peak. With an empty
 *       library the tallest peak is taken. The note says so, since this is a guess an analyst
 *       should see.</li>
 * </ul>
 */
final class MarkerLocator {

    /** How many of the tallest peaks are tried as neutral marker when no window is given. */
    static final int MAX_MARKER_HYPOTHESES = 15;

    /** Scores closer than this count as a tie (sum of confidences). */
    static final double SCORE_TIE = 1e-6;

    /** The outcome: the scale (null when none could be set), marker indices (-1 when absent), a note. */
    record Choice(MobilityScale scale, int neutralIndex, int refIndex, String note) {
    }

    private final Library library;
    private final MatchSettings matchSettings;

    MarkerLocator(Library library, MatchSettings matchSettings) {
        this.library = library;
        this.matchSettings = matchSettings;
    }

    Choice locate(RunSpec run, List<Peak> peaks, MobilityAdjuster adjuster) {
        RunConditions c = run.conditions();
        if (peaks.isEmpty()) {
            return new Choice(null, -1, -1, "no peaks found above the S/N threshold: no mobility scale (if the "
                    + "peaks dip below the baseline, the detection mode should be 'indirect'; if they rise, 'direct')");
        }
        int ref = -1;
        if (c.hasRefMarker()) {
            ref = tallestIn(peaks, c.refMarkerFromS(), c.refMarkerToS(), -1);
            if (ref < 0) {
                return new Choice(null, -1, -1, String.format(Locale.ROOT,
                        "no peak in the charged-marker window %.1f–%.1f s: mobilities not computed",
                        c.refMarkerFromS(), c.refMarkerToS()));
            }
        }
        if (c.hasMarkerWindow()) {
            int n = tallestIn(peaks, c.markerFromS(), c.markerToS(), ref);
            if (n < 0) {
                return new Choice(null, -1, ref, String.format(Locale.ROOT,
                        "no peak in the neutral-marker window %.1f–%.1f s: mobilities not computed",
                        c.markerFromS(), c.markerToS()));
            }
            return new Choice(scale(c, peaks, n, ref), n, ref, "");
        }
        if (ref >= 0 && c.hasGeometry()) {
            Peak m = peaks.get(ref);
            return new Choice(new ChargedMarkerScale(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(),
                    c.rampOrZeroS(), m.apexTimeS(), m.apexTimeSdS(), c.refMarkerMobility()), -1, ref, "");
        }
        return byLibraryFit(c, peaks, ref, adjuster);
    }

    private Choice byLibraryFit(RunConditions c, List<Peak> peaks, int ref, MobilityAdjuster adjuster) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < peaks.size(); i++) {
            if (i != ref) {
                order.add(i);
            }
        }
        if (order.isEmpty()) {
            return new Choice(null, -1, ref, "no peak left to serve as neutral marker: mobilities not computed");
        }
        order.sort(Comparator.comparingDouble((Integer i) -> -peaks.get(i).height()));
        if (library.size() == 0) {
            int n = order.get(0);
            return new Choice(scale(c, peaks, n, ref), n, ref, String.format(Locale.ROOT,
                    "no marker window given and the library is empty: tallest peak at %.2f s taken as neutral marker",
                    peaks.get(n).apexTimeS()));
        }
        int best = -1;
        double bestScore = Double.NEGATIVE_INFINITY;
        double secondScore = Double.NEGATIVE_INFINITY;
        int tried = Math.min(MAX_MARKER_HYPOTHESES, order.size());
        for (int h = 0; h < tried; h++) {
            int n = order.get(h);
            double score = explained(scale(c, peaks, n, ref), peaks, n, ref, adjuster);
            if (score > bestScore + SCORE_TIE) {
                secondScore = bestScore;
                bestScore = score;
                best = n;
            } else if (score > secondScore) {
                secondScore = score;
            }
        }
        String note = String.format(Locale.ROOT,
                "no marker window given: peak at %.2f s taken as neutral marker because the library explains "
                        + "the run best with it (score %.2f; next best %.2f); give marker_from_s/marker_to_s to fix it",
                peaks.get(best).apexTimeS(), bestScore, Double.isInfinite(secondScore) ? 0.0 : secondScore);
        return new Choice(scale(c, peaks, best, ref), best, ref, note);
    }

    /** Sum of assignment confidences of the other peaks under a candidate scale. */
    private double explained(MobilityScale scale, List<Peak> peaks, int neutral, int ref, MobilityAdjuster adjuster) {
        int n = peaks.size();
        double[] mob = new double[n];
        double[] sd = new double[n];
        int k = 0;
        for (int i = 0; i < n; i++) {
            if (i == neutral || i == ref) {
                continue;
            }
            Peak p = peaks.get(i);
            mob[k] = scale.mobility(p.apexTimeS());
            sd[k] = scale.mobilitySd(p.apexTimeS(), p.apexTimeSdS());
            k++;
        }
        if (k == 0) {
            return 0.0;
        }
        List<PeakMatch> matches = Matcher.match(java.util.Arrays.copyOf(mob, k), java.util.Arrays.copyOf(sd, k),
                library, matchSettings, adjuster);
        double sum = 0;
        for (PeakMatch m : matches) {
            if (m.assigned() != null) {
                sum += m.confidence();
            }
        }
        return sum;
    }

    private static MobilityScale scale(RunConditions c, List<Peak> peaks, int neutral, int ref) {
        Peak n = peaks.get(neutral);
        if (ref >= 0) {
            Peak m = peaks.get(ref);
            return new TwoMarkerScale(c.rampOrZeroS(), n.apexTimeS(), n.apexTimeSdS(),
                    m.apexTimeS(), m.apexTimeSdS(), c.refMarkerMobility());
        }
        return new NeutralMarkerScale(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(), c.rampOrZeroS(),
                n.apexTimeS(), n.apexTimeSdS());
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
