package org.mobident.library.standards;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Groups the analyte peaks of replicate runs of one mix into one group per zone, each group taking
 * at most one peak per run.
 *
 * <p>Method (alignment to consensus centres, in the spirit of Lloyd's k-means but with the
 * one-peak-per-run constraint built into each assignment step):
 * <ol>
 *   <li>The run with the most peaks seeds one slot per peak, at its mobility.</li>
 *   <li>Each further run is matched to the current slot centres by the optimal monotone one-to-one
 *       matching of {@link MonotoneMatcher}: peak j may join slot c only when
 *       |μ_j − c| ≤ w_j = max(k·σ_j, floor) (σ_j the peak's own mobility uncertainty, k and floor from
 *       {@link BuildSettings#groupingSdMultiple()} and {@link BuildSettings#groupingFloor()}); a match
 *       costs (|μ_j − c|/w_j)², leaving a slot or a peak unmatched costs 1. A peak left unmatched
 *       starts a new slot (an analyte missing from the seed run, or an unexpected peak).</li>
 *   <li>The centres are then set to the group means and every run is assigned again (step 2 with
 *       centres fixed), until the grouping no longer changes or {@value #MAX_PASSES} passes are done.</li>
 * </ol>
 * Why not a general-purpose clustering (k-means, DBSCAN, hierarchical): none of them knows that two
 * peaks of one run can never be the same analyte, and that constraint is what separates close zones
 * reliably; and because mobilities keep their order within a run, the constrained assignment on the
 * line is solved exactly by the monotone alignment rather than approximately.
 */
final class PeakAligner {

    /** Upper bound on refinement passes; the grouping of real data settles in two or three. */
    static final int MAX_PASSES = 20;

    private PeakAligner() {
    }

    /** One slot of a pass: a centre and the peaks that joined it. */
    private static final class Slot {
        final double seed;
        final boolean fixed;
        final List<Measurement> members = new ArrayList<>();

        Slot(double seed, boolean fixed) {
            this.seed = seed;
            this.fixed = fixed;
        }

        double centre() {
            if (fixed || members.isEmpty()) {
                return seed;
            }
            return meanOf(members);
        }
    }

    /**
     * @param runs         each run's peaks (any order), runs in a fixed order
     * @param sdMultiple   k of the joining distance
     * @param floor        floor of the joining distance, mobility units
     * @return the groups, ordered by mean mobility, each member list in run order
     */
    static List<List<Measurement>> group(List<List<Measurement>> runs, double sdMultiple, double floor) {
        List<List<Measurement>> sorted = new ArrayList<>();
        int seedRun = -1;
        for (int r = 0; r < runs.size(); r++) {
            List<Measurement> s = new ArrayList<>(runs.get(r));
            s.sort(Comparator.comparingDouble(Measurement::mobility));
            sorted.add(s);
            if (seedRun < 0 || s.size() > sorted.get(seedRun).size()) {
                seedRun = r;
            }
        }
        List<Integer> order = new ArrayList<>();
        if (seedRun >= 0) {
            order.add(seedRun);
        }
        for (int r = 0; r < runs.size(); r++) {
            if (r != seedRun) {
                order.add(r);
            }
        }
        List<Double> centres = List.of();
        boolean fixed = false;
        List<List<Measurement>> previous = null;
        List<List<Measurement>> groups = List.of();
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            List<Slot> slots = new ArrayList<>();
            for (double c : centres) {
                slots.add(new Slot(c, fixed));
            }
            for (int r : order) {
                assign(sorted.get(r), slots, sdMultiple, floor);
            }
            slots.removeIf(s -> s.members.isEmpty());
            slots.sort(Comparator.comparingDouble(Slot::centre));
            groups = new ArrayList<>();
            List<Double> next = new ArrayList<>();
            for (Slot s : slots) {
                List<Measurement> members = new ArrayList<>(s.members);
                members.sort(Comparator.comparingInt(m -> runIndex(m, runs)));
                groups.add(List.copyOf(members));
                next.add(meanOf(members));
            }
            if (groups.equals(previous)) {
                break;
            }
            previous = groups;
            centres = next;
            fixed = true;
        }
        groups.sort(Comparator.comparingDouble(PeakAligner::meanOf));
        return List.copyOf(groups);
    }

    private static void assign(List<Measurement> peaks, List<Slot> slots, double sdMultiple, double floor) {
        slots.sort(Comparator.comparingDouble(Slot::centre));
        double[] centre = new double[slots.size()];
        for (int i = 0; i < centre.length; i++) {
            centre[i] = slots.get(i).centre();
        }
        double[] window = new double[peaks.size()];
        for (int j = 0; j < window.length; j++) {
            double sd = peaks.get(j).mobilitySd();
            window[j] = Double.isNaN(sd) ? floor : Math.max(sdMultiple * sd, floor);
        }
        int[] partner = MonotoneMatcher.match(slots.size(), peaks.size(), (i, j) -> {
            double d = Math.abs(peaks.get(j).mobility() - centre[i]);
            if (d > window[j]) {
                return Double.POSITIVE_INFINITY;
            }
            double z = d / window[j];
            return z * z;
        }, 1.0);
        boolean[] taken = new boolean[peaks.size()];
        for (int i = 0; i < partner.length; i++) {
            if (partner[i] >= 0) {
                slots.get(i).members.add(peaks.get(partner[i]));
                taken[partner[i]] = true;
            }
        }
        for (int j = 0; j < peaks.size(); j++) {
            if (!taken[j]) {
                Slot s = new Slot(peaks.get(j).mobility(), false);
                s.members.add(peaks.get(j));
                slots.add(s);
            }
        }
    }

    private static int runIndex(Measurement m, List<List<Measurement>> runs) {
        for (int r = 0; r < runs.size(); r++) {
            if (runs.get(r).contains(m)) {
                return r;
            }
        }
        return runs.size();
    }

    static double meanOf(List<Measurement> ms) {
        double[] v = new double[ms.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = ms.get(i).mobility();
        }
        return ReplicateStatistics.of(v).mean();
    }
}
