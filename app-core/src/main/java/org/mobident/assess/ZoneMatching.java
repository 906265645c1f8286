package org.mobident.assess;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Ties the reported peaks of one run to the rows of the known-identities table for that run.
 *
 * <ol>
 *   <li><b>By time.</b> A peak may belong to a row with a time when |t − time| is at most
 *       {@link #toleranceS}: max(2 × the peak's width at half height, 1 % of the row's time,
 *       0.5 s). Pairs are taken nearest first, each peak and each row at most once (ties broken
 *       by peak number, then by the row's line), so every row gets its nearest free peak; rows of
 *       real zones are served before spike rows, so a spike that sits on a zone does not take the
 *       zone's peak (a spike counts as reported only for a peak no zone claims).</li>
 *   <li><b>By name.</b> An analyte row without a time then takes the first still free analyte
 *       peak (in table order) that was called (identified or ambiguous) by that name.</li>
 * </ol>
 * The rule is the one fixed by the known-identities format; its constants are named here and
 * nowhere else.
 */
public final class ZoneMatching {

    /** The tolerance is at least this many widths at half height of the peak. */
    public static final double WIDTH_FACTOR = 2.0;
    /** … at least this fraction of the known migration time … */
    public static final double RELATIVE_TIME = 0.01;
    /** … and never less than this, s. */
    public static final double FLOOR_S = 0.5;

    /**
     * One peak tied to one row.
     *
     * @param peak  index of the peak in the run's list
     * @param known the row
     * @param how   by time or by name
     */
    public record Pair(int peak, KnownIdentity known, MatchedBy how) {
    }

    private ZoneMatching() {
    }

    /**
     * The largest distance between a peak's migration time t (its centre time where reported, else its
     * apex: the time its mobility comes from, which a skewed zone's apex is not) and a known time at
     * which the peak may belong to the row, s.
     *
     * @param widthHalfS the peak's width at half height, s (NaN when unknown: that term is left out)
     * @param knownTimeS the row's migration time, s
     */
    public static double toleranceS(double widthHalfS, double knownTimeS) {
        double byWidth = Double.isFinite(widthHalfS) ? WIDTH_FACTOR * widthHalfS : 0.0;
        return Math.max(byWidth, Math.max(RELATIVE_TIME * knownTimeS, FLOOR_S));
    }

    /**
     * The pairs of one run.
     *
     * @param known the run's rows of the known-identities table
     * @param peaks the run's reported peaks
     * @return the pairs, in the order of the peaks; a peak or row appears at most once
     */
    public static List<Pair> match(List<KnownIdentity> known, List<ReportedPeak> peaks) {
        record Candidate(int peak, int row, double distanceS) {
        }
        List<Candidate> candidates = new ArrayList<>();
        for (int p = 0; p < peaks.size(); p++) {
            ReportedPeak peak = peaks.get(p);
            if (!Double.isFinite(peak.timeS())) {
                continue;
            }
            for (int k = 0; k < known.size(); k++) {
                KnownIdentity row = known.get(k);
                if (!row.hasTime()) {
                    continue;
                }
                double d = Math.abs(peak.timeS() - row.timeS());
                if (d <= toleranceS(peak.widthHalfS(), row.timeS())) {
                    candidates.add(new Candidate(p, k, d));
                }
            }
        }
        // real zones first: a spike on top of a zone (removed before the zone was measured) does not
        // take the zone's peak from it
        candidates.sort(Comparator.comparing((Candidate c) -> known.get(c.row()).kind() == KnownKind.SPIKE)
                .thenComparingDouble(Candidate::distanceS).thenComparingInt(Candidate::peak)
                .thenComparingLong(c -> known.get(c.row()).line()).thenComparingInt(Candidate::row));
        Map<Integer, Pair> byPeak = new HashMap<>();
        boolean[] rowTaken = new boolean[known.size()];
        for (Candidate c : candidates) {
            if (!byPeak.containsKey(c.peak()) && !rowTaken[c.row()]) {
                byPeak.put(c.peak(), new Pair(c.peak(), known.get(c.row()), MatchedBy.TIME));
                rowTaken[c.row()] = true;
            }
        }
        for (KnownIdentity row : known) {
            if (row.hasTime() || row.kind() != KnownKind.ANALYTE) {
                continue;
            }
            for (int p = 0; p < peaks.size(); p++) {
                ReportedPeak peak = peaks.get(p);
                if (!byPeak.containsKey(p) && peak.isCall() && row.nameKey().equals(KnownIdentity.key(peak.assigned()))) {
                    byPeak.put(p, new Pair(p, row, MatchedBy.NAME));
                    break;
                }
            }
        }
        List<Pair> pairs = new ArrayList<>();
        for (int p = 0; p < peaks.size(); p++) {
            Pair pair = byPeak.get(p);
            if (pair != null) {
                pairs.add(pair);
            }
        }
        return pairs;
    }
}
