package org.mobident.summary;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;

/**
 * Unassigned peaks that come back at one mobility in several runs of one buffer: a contaminant, a
 * degradant or an analyte missing from the library, which the peak tables scatter over many
 * "unassigned" rows.
 *
 * <p>The rule, deliberately simple so that an analyst can check it by hand:
 * <ol>
 *   <li>Take every analyte peak left unassigned in a processed run with a mobility scale, at its
 *       mobility as compared with the library (library temperature, after the run's scale correction).</li>
 *   <li>Give each an uncertainty u: its own (zone and marker times, carried through the scale), the
 *       scale correction's at that mobility, and the spread between runs that one peak cannot show,
 *       taken as the median SD of the library's entries for that buffer ({@link #FALLBACK_SPREAD}
 *       when the library states none), all added in quadrature.</li>
 *   <li>Per buffer, sort the peaks by mobility and put two neighbours in one group when they differ
 *       by at most {@link #LINK_SIGMAS}·√(u₁² + u₂²) (single linkage along the mobility axis, so a
 *       group may be wider than one step when its peaks lie densely).</li>
 *   <li>Report a group when its peaks come from at least {@code minRuns} different runs
 *       ({@link #DEFAULT_MIN_RUNS} by default). A run's two peaks in one group count once.</li>
 * </ol>
 * Groups are named {@code unknown-1}, {@code unknown-2}, … by falling number of runs, then by mobility.
 * One-dimensional grouping along a sorted axis needs no clustering library; a density method with
 * one fixed radius would ignore that the peaks' uncertainties differ.
 */
public final class RecurringUnknowns {

    /** How many combined standard uncertainties two neighbouring peaks may lie apart and still be grouped. */
    public static final double LINK_SIGMAS = 3.0;

    /** The fewest different runs a group must come from to be reported. */
    public static final int DEFAULT_MIN_RUNS = 2;

    /**
     * Spread between runs, 1e-9 m²/(V s), assumed when the library states no SD for the buffer
     * (common practice: replicate SDs of small ions in a stable method are a few tenths).
     */
    public static final double FALLBACK_SPREAD = 0.3;

    /** The name prefix of a reported group. */
    public static final String NAME_PREFIX = "unknown-";

    private RecurringUnknowns() {
    }

    /**
     * One unassigned peak of a group.
     *
     * @param run         the run's name
     * @param runOrder    1-based position of the run in the batch
     * @param peakNumber  the peak's 1-based number in the run's peak table
     * @param mobility    its mobility as compared with the library, 1e-9 m²/(V s)
     * @param uncertainty the u used for grouping, same unit
     * @param apexTimeS   its apex time, s
     * @param correctedArea its time-corrected area
     */
    public record Member(String run, int runOrder, int peakNumber, double mobility, double uncertainty,
                         double apexTimeS, double correctedArea) {
    }

    /**
     * A reported group.
     *
     * @param name          {@code unknown-N}
     * @param buffer        the runs' buffer label (null when they name none)
     * @param meanMobility  mean mobility of the members, 1e-9 m²/(V s)
     * @param mobilitySd    sample SD of the members' mobilities (NaN below two)
     * @param lowest        lowest member mobility
     * @param highest       highest member mobility
     * @param runs          the runs it was seen in, in batch order
     * @param runsInBuffer  processed runs with a mobility scale in that buffer
     * @param meanCorrectedArea mean time-corrected area of the members
     * @param members       its peaks, by run order then peak number
     */
    public record Group(String name, String buffer, double meanMobility, double mobilitySd, double lowest,
                        double highest, List<String> runs, int runsInBuffer, double meanCorrectedArea,
                        List<Member> members) {
        public Group {
            runs = List.copyOf(runs);
            members = List.copyOf(members);
        }
    }

    /** The recurring unknowns of a batch with the default minimum of runs. */
    public static List<Group> of(List<RunResult> results, Library library) {
        return of(results, library, DEFAULT_MIN_RUNS);
    }

    /** The groups of unassigned peaks seen in at least {@code minRuns} runs of one buffer. */
    public static List<Group> of(List<RunResult> results, Library library, int minRuns) {
        if (minRuns < 1) {
            throw new IllegalArgumentException("minRuns must be at least 1, got " + minRuns);
        }
        Map<String, List<Member>> byBuffer = new LinkedHashMap<>();
        Map<String, String> labels = new LinkedHashMap<>();
        Map<String, Integer> runsInBuffer = new LinkedHashMap<>();
        int order = 0;
        for (RunResult run : results) {
            order++;
            if (run.failed() || !run.mobilityKnown()) {
                continue;
            }
            String label = run.spec().conditions().buffer();
            String key = AnalyteStats.bufferKey(label);
            labels.putIfAbsent(key, label == null ? null : label.trim());
            runsInBuffer.merge(key, 1, Integer::sum);
            double spread = spreadOf(library == null ? null : library.forBuffer(label));
            List<Member> members = byBuffer.computeIfAbsent(key, k -> new ArrayList<>());
            int number = 0;
            for (PeakResult pr : run.peaks()) {
                number++;
                if (!unassigned(pr)) {
                    continue;
                }
                double mu = pr.mobilityCorrected();
                double own = pr.mobilitySd() * run.comparedSdFactor();
                double u2 = (Double.isFinite(own) ? own * own : 0.0) + run.runScale().varianceAt(mu) + spread * spread;
                members.add(new Member(run.spec().name(), order, number, mu, Math.sqrt(u2), pr.peak().apexTimeS(),
                        pr.peak().correctedArea()));
            }
        }
        List<Group> groups = new ArrayList<>();
        for (Map.Entry<String, List<Member>> e : byBuffer.entrySet()) {
            for (List<Member> linked : link(e.getValue())) {
                Group g = groupOf(linked, labels.get(e.getKey()), runsInBuffer.get(e.getKey()));
                if (g.runs().size() >= minRuns) {
                    groups.add(g);
                }
            }
        }
        groups.sort(Comparator.comparingInt((Group g) -> -g.runs().size()).thenComparingDouble(Group::meanMobility));
        List<Group> named = new ArrayList<>(groups.size());
        for (int i = 0; i < groups.size(); i++) {
            Group g = groups.get(i);
            named.add(new Group(NAME_PREFIX + (i + 1), g.buffer(), g.meanMobility(), g.mobilitySd(), g.lowest(),
                    g.highest(), g.runs(), g.runsInBuffer(), g.meanCorrectedArea(), g.members()));
        }
        return named;
    }

    private static boolean unassigned(PeakResult pr) {
        if (pr.role() != PeakRole.ANALYTE || !Double.isFinite(pr.mobilityCorrected())) {
            return false;
        }
        MatchStatus s = pr.match().status();
        return pr.match().assigned() == null || s == null || s == MatchStatus.UNASSIGNED;
    }

    /** The median SD of the entries that state one, or {@link #FALLBACK_SPREAD}. */
    static double spreadOf(Library library) {
        List<Double> sds = new ArrayList<>();
        if (library != null) {
            for (LibraryEntry e : library.entries()) {
                if (Double.isFinite(e.mobilitySd()) && e.mobilitySd() > 0) {
                    sds.add(e.mobilitySd());
                }
            }
        }
        if (sds.isEmpty()) {
            return FALLBACK_SPREAD;
        }
        sds.sort(Double::compare);
        int n = sds.size();
        return n % 2 == 1 ? sds.get(n / 2) : 0.5 * (sds.get(n / 2 - 1) + sds.get(n / 2));
    }

    /** Single linkage along the sorted mobility axis. */
    private static List<List<Member>> link(List<Member> members) {
        List<Member> sorted = new ArrayList<>(members);
        sorted.sort(Comparator.comparingDouble(Member::mobility));
        List<List<Member>> out = new ArrayList<>();
        List<Member> current = new ArrayList<>();
        for (Member m : sorted) {
            if (!current.isEmpty()) {
                Member last = current.get(current.size() - 1);
                double reach = LINK_SIGMAS * Math.hypot(last.uncertainty(), m.uncertainty());
                if (m.mobility() - last.mobility() > reach) {
                    out.add(current);
                    current = new ArrayList<>();
                }
            }
            current.add(m);
        }
        if (!current.isEmpty()) {
            out.add(current);
        }
        return out;
    }

    private static Group groupOf(List<Member> linked, String buffer, int runsInBuffer) {
        List<Member> members = new ArrayList<>(linked);
        members.sort(Comparator.comparingInt(Member::runOrder).thenComparingInt(Member::peakNumber));
        Set<String> runs = new LinkedHashSet<>();
        List<Double> mobility = new ArrayList<>();
        List<Double> area = new ArrayList<>();
        for (Member m : members) {
            runs.add(m.run());
            mobility.add(m.mobility());
            if (Double.isFinite(m.correctedArea())) {
                area.add(m.correctedArea());
            }
        }
        double lowest = linked.get(0).mobility();
        double highest = linked.get(linked.size() - 1).mobility();
        return new Group(null, buffer, Stats.mean(mobility), Stats.sd(mobility), lowest, highest,
                List.copyOf(runs), runsInBuffer, Stats.mean(area), members);
    }
}
