package org.mobident.matching;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.special.Gamma;
import org.jgrapht.Graph;
import org.jgrapht.alg.interfaces.MatchingAlgorithm;
import org.jgrapht.alg.matching.MaximumWeightBipartiteMatching;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Matches the peaks of one run to library analytes by effective mobility, one analyte to at most
 * one peak, with a probability for every assignment.
 *
 * <h2>Model</h2>
 * For peak i (mobility μ_i, standard uncertainty σ_i) and entry j (mobility μ_j, between-run
 * spread s_j from n_j runs):
 * <ul>
 *   <li>residual r_ij = adjust(μ_i, entry j) − μ_j (the {@link MobilityAdjuster} brings the peak
 *       to the entry's conditions);</li>
 *   <li>combined variance v_ij = σ_i² + s_j²·(1 + 1/n_j) + σ_floor². The factor (1 + 1/n) makes it
 *       the variance of a new observation about a mean of n earlier ones (the normal prediction
 *       interval, e.g. Montgomery &amp; Runger, Applied Statistics and Probability for Engineers,
 *       sect. 8.4); it is 1 when n is unknown. An unknown σ_i counts as 0 (the library spread
 *       then carries the run-to-run variation); an unknown s_j is replaced by
 *       {@link MatchSettings#assumedEntrySd()}; σ_floor is {@link MatchSettings#sdFloor()};</li>
 *   <li>likelihood f(r_ij): the normal density N(r_ij; 0, v_ij) when the entry's spread is given
 *       without n (or with n ≤ 1). When it is the sample standard deviation of n ≥ 2 runs, the
 *       residual follows Student's t instead (the prediction interval for a new observation,
 *       Montgomery &amp; Runger, sect. 8.4), with the Welch–Satterthwaite effective degrees of
 *       freedom ν = v_ij² / [(s_j²(1 + 1/n_j))² / (n_j − 1)] (JCGM 100:2008, GUM, G.4.1), scale
 *       √v_ij. Spreads from three or four runs are themselves uncertain; the t tails keep a peak
 *       a few "σ" away from being declared foreign with false certainty;</li>
 *   <li>entry j is a candidate only when |r_ij| ≤ its window half-width (see {@link MatchSettings};
 *       for the spread rule k is widened to the t quantile of the same coverage). The window is a
 *       filter, not part of the model: inside it the likelihood is f(r_ij) unchanged, outside it
 *       the entry is not considered;</li>
 *   <li>the run is modelled as in multi-target data association (Bar-Shalom &amp; Fortmann,
 *       Tracking and Data Association, 1988, ch. 9, joint probabilistic data association): each
 *       library analyte is present with prior probability q and then gives exactly one peak;
 *       peaks of substances not in the library arrive independently with a uniform density of
 *       λ per mobility unit. A joint assignment then has posterior odds, against "every peak
 *       foreign, every analyte absent", equal to the product over its assigned pairs of
 *       ρ_ij = q · f(r_ij) / ((1 − q) · λ);</li>
 *   <li>q and λ come from the user's prior fraction π₀ of peaks not in the library
 *       ({@link MatchSettings#notInLibraryPrior()}), the range W over which such peaks are spread
 *       ({@link MatchSettings#notInLibraryRangeUnits()}), the number P of peaks with a known
 *       mobility and the library size M: the expected number of library peaks is
 *       L = min((1 − π₀)·P, {@value #MAX_PRESENCE}·M), q = L / M and λ = (P − L) / W. When q is
 *       small (few peaks, a large library) ρ reduces to the per-peak rule "prior π₀ for none with
 *       density 1/W, the analytes sharing 1 − π₀ equally"; the factor 1/(1 − q) is what the
 *       one-to-one constraint adds when a large part of the library is present (an analyte that
 *       explains no peak must be absent). Without it, confidences come out too low for
 *       assignments and too high for "none" (the calibration test shows it).</li>
 * </ul>
 * A run is explained by a one-to-one assignment: each peak to one candidate or to none, each
 * analyte to at most one peak. Its joint posterior is proportional to the product of ρ over the
 * assigned pairs (peaks independent given their assignment).
 *
 * <h2>Assignment</h2>
 * The reported assignment is the most probable joint one, found exactly as a maximum-weight
 * bipartite matching (JGraphT's {@link MaximumWeightBipartiteMatching}, a Hungarian-type method:
 * Kuhn, Naval Res. Logist. Q. 2 (1955) 83) with edge weights ln ρ_ij; only pairs with ρ &gt; 1
 * are edges, because a pair with ρ ≤ 1 never raises the product.
 *
 * <h2>Confidence</h2>
 * The confidence of an assigned peak is the marginal posterior probability, summed over every
 * valid one-to-one assignment of the whole run, that the peak is the assigned analyte; likewise
 * each {@link Candidate#probability()}. These marginals are computed exactly (see
 * {@link AssignmentMarginals}). Only when the candidate windows overlap so much that the exact sum
 * would need more than {@value #MAX_STATES} states per peak is it approximated: each peak's own
 * posterior over {none, candidates}, with the entries the optimal matching gave to other peaks
 * removed, renormalised. An unassigned peak reports as confidence the probability that it is none
 * of the library analytes. The runner-up is the most probable analyte other than the assigned one.
 *
 * <p>Status: see {@link MatchSettings}.
 */
public final class Matcher {

    /** Largest number of partial-assignment states per peak for the exact marginals. */
    static final int MAX_STATES = 1 << 15;

    /** Largest prior probability that an analyte is present: absence always keeps 5 % (a modelling choice). */
    static final double MAX_PRESENCE = 0.95;

    /** Degrees of freedom beyond which Student's t is replaced by the normal (they differ by &lt; 0.1 %). */
    static final double NORMAL_DF = 1000.0;

    /**
     * Largest widening of the spread window for spreads from few runs (a modelling choice: with
     * n = 2 the t quantile would be ~80 × k and make nearly every entry a candidate).
     */
    static final double MAX_T_WIDENING = 3.0;

    private static final double LOG_SQRT_2PI = 0.5 * Math.log(2.0 * Math.PI);

    private Matcher() {
    }

    /**
     * Matches the peaks of one run.
     *
     * @param mobility   peak effective mobilities, 1e-9 m²/(V s), signed; NaN when unknown (not modified)
     * @param mobilitySd their standard uncertainties, same unit, NaN when unknown; may be null
     *                   (all unknown) (not modified)
     * @param library    the library to match against
     * @param settings   window rule, priors and thresholds
     * @param adjuster   converts a peak mobility to an entry's conditions
     * @return one match per peak, in the order of {@code mobility}
     * @throws IllegalArgumentException when the arrays differ in length or a σ is negative
     */
    public static List<PeakMatch> match(double[] mobility, double[] mobilitySd, Library library,
                                        MatchSettings settings, MobilityAdjuster adjuster) {
        return match(mobility, mobilitySd, library, settings, adjuster, MAX_STATES);
    }

    /** As {@link #match(double[], double[], Library, MatchSettings, MobilityAdjuster)} with a state limit. */
    static List<PeakMatch> match(double[] mobility, double[] mobilitySd, Library library,
                                 MatchSettings settings, MobilityAdjuster adjuster, int maxStates) {
        if (mobilitySd != null && mobilitySd.length != mobility.length) {
            throw new IllegalArgumentException("mobility and mobilitySd differ in length: "
                    + mobility.length + " vs " + mobilitySd.length);
        }
        int peaks = mobility.length;
        List<LibraryEntry> entries = library.entries();
        int known = 0;
        for (double mu : mobility) {
            known += Double.isFinite(mu) ? 1 : 0;
        }
        double logPriorOdds = logPriorOdds(known, entries.size(), settings);
        CoverageFactors coverage = new CoverageFactors(settings.windowValue());
        List<List<Pair>> pairs = new ArrayList<>(peaks);
        for (int i = 0; i < peaks; i++) {
            double sd = mobilitySd == null ? Double.NaN : mobilitySd[i];
            if (sd < 0) {
                throw new IllegalArgumentException("peak " + i + ": negative mobility uncertainty " + sd);
            }
            pairs.add(Double.isFinite(mobility[i])
                    ? candidates(mobility[i], Double.isNaN(sd) ? 0.0 : sd, entries, settings, adjuster, logPriorOdds,
                            coverage)
                    : List.of());
        }
        int[] assignedEntry = optimalAssignment(pairs, entries.size());
        double[][] marginal = marginals(pairs, mobility, assignedEntry, maxStates);

        List<PeakMatch> out = new ArrayList<>(peaks);
        for (int i = 0; i < peaks; i++) {
            out.add(result(pairs.get(i), marginal[i], assignedEntry[i], entries, settings));
        }
        return out;
    }

    /** One candidate entry of one peak. */
    private record Pair(int entry, double residual, double z, double logRatio) {
    }

    /**
     * ln[q / ((1 − q)·λ)], the part of every ln ρ that does not depend on the residual.
     *
     * @param peaks   number of peaks with a known mobility
     * @param entries library size
     */
    static double logPriorOdds(int peaks, int entries, MatchSettings s) {
        if (peaks == 0 || entries == 0) {
            return Double.NaN;
        }
        double libraryPeaks = Math.min((1.0 - s.notInLibraryPrior()) * peaks, MAX_PRESENCE * entries);
        double presence = libraryPeaks / entries;
        double foreignDensity = (peaks - libraryPeaks) / s.notInLibraryRangeUnits();
        return Math.log(presence) - Math.log1p(-presence) - Math.log(foreignDensity);
    }

    private static List<Pair> candidates(double mu, double sd, List<LibraryEntry> entries,
                                         MatchSettings s, MobilityAdjuster adjuster, double logPriorOdds,
                                         CoverageFactors coverage) {
        int m = entries.size();
        if (m == 0) {
            return List.of();
        }
        List<Pair> out = new ArrayList<>();
        for (int j = 0; j < m; j++) {
            LibraryEntry e = entries.get(j);
            double adjusted = adjuster.adjust(mu, e);
            if (!Double.isFinite(adjusted) || !Double.isFinite(e.mobility())) {
                continue;
            }
            double r = adjusted - e.mobility();
            boolean stated = Double.isFinite(e.mobilitySd());
            double spread = stated ? e.mobilitySd() : s.assumedEntrySd();
            double predictive = e.n() > 0 ? spread * spread * (1.0 + 1.0 / e.n()) : spread * spread;
            double variance = sd * sd + predictive + s.sdFloor() * s.sdFloor();
            double sigma = Math.sqrt(variance);
            // Welch–Satterthwaite degrees of freedom: only the library spread is an estimate (n − 1 df).
            double df = stated && e.n() >= 2 && predictive > 0
                    ? variance * variance / (predictive * predictive / (e.n() - 1))
                    : Double.POSITIVE_INFINITY;
            double z = r / sigma;
            double factor = s.windowRule() == MatchSettings.WindowRule.SPREAD
                    ? coverage.factor(Math.abs(z), df) : Double.NaN;
            if (Math.abs(r) > windowWithFactor(e, sigma, factor, s)) {
                continue;
            }
            out.add(new Pair(j, r, z, logPriorOdds + logDensity(z, df) - Math.log(sigma)));
        }
        return out;
    }

    /**
     * ln of the standard density at z: Student's t with {@code df} degrees of freedom, or the
     * normal when df is infinite or beyond {@value #NORMAL_DF} (Student, Biometrika 6 (1908) 1).
     */
    static double logDensity(double z, double df) {
        if (!(df < NORMAL_DF)) {
            return -0.5 * z * z - LOG_SQRT_2PI;
        }
        return Gamma.logGamma(0.5 * (df + 1)) - Gamma.logGamma(0.5 * df) - 0.5 * Math.log(df * Math.PI)
                - 0.5 * (df + 1) * Math.log1p(z * z / df);
    }

    /**
     * The multiple of the combined standard uncertainty with the same two-sided coverage under
     * Student's t with {@code df} degrees of freedom (rounded down, so never narrower) as k has
     * under the normal distribution, at most {@value #MAX_T_WIDENING} × k.
     */
    static double coverageFactor(double k, double df) {
        if (!(df < NORMAL_DF)) {
            return k;
        }
        double upper = 1.0 - 0.5 * Erf.erfc(k / Math.sqrt(2.0));
        double t = new TDistribution(null, Math.max(1.0, Math.floor(df))).inverseCumulativeProbability(upper);
        return Math.min(t, MAX_T_WIDENING * k);
    }

    /** {@link #coverageFactor} for one k, remembered per whole number of degrees of freedom. */
    static final class CoverageFactors {
        private final double k;
        private final Map<Integer, Double> byDf = new HashMap<>();

        CoverageFactors(double k) {
            this.k = k;
        }

        /** The factor, or k itself when |z| is within k anyway (no quantile needed). */
        double factor(double absZ, double df) {
            if (absZ <= k || !(df < NORMAL_DF)) {
                return k;
            }
            if (absZ > MAX_T_WIDENING * k) {
                return MAX_T_WIDENING * k;
            }
            return byDf.computeIfAbsent((int) Math.max(1.0, Math.floor(df)), d -> coverageFactor(k, d));
        }
    }

    /**
     * The half-width of the candidate window of an entry, mobility units.
     *
     * @param combinedSd combined standard uncertainty of the residual
     * @param df         its degrees of freedom (infinite when no spread is estimated from few runs)
     */
    static double window(LibraryEntry e, double combinedSd, double df, MatchSettings s) {
        double k = s.windowRule() == MatchSettings.WindowRule.SPREAD ? coverageFactor(s.windowValue(), df) : Double.NaN;
        return windowWithFactor(e, combinedSd, k, s);
    }

    /** As {@link #window} with the spread rule's (possibly widened) factor already known. */
    private static double windowWithFactor(LibraryEntry e, double combinedSd, double spreadFactor, MatchSettings s) {
        if (Double.isFinite(e.tolerance()) && e.tolerance() > 0) {
            return e.tolerance();
        }
        return switch (s.windowRule()) {
            case ABSOLUTE -> s.windowValue();
            case RELATIVE -> Math.max(s.windowValue() * Math.abs(e.mobility()), s.minimumWindow());
            case SPREAD -> Math.max(spreadFactor * combinedSd, s.minimumWindow());
        };
    }

    /** Entry index assigned to each peak by the maximum-weight matching, −1 for none. */
    private static int[] optimalAssignment(List<List<Pair>> pairs, int entryCount) {
        int peaks = pairs.size();
        int[] assigned = new int[peaks];
        Arrays.fill(assigned, -1);
        Graph<Integer, DefaultWeightedEdge> g = new SimpleWeightedGraph<>(DefaultWeightedEdge.class);
        Set<Integer> peakSide = new LinkedHashSet<>();
        Set<Integer> entrySide = new LinkedHashSet<>();
        for (int i = 0; i < peaks; i++) {
            for (Pair p : pairs.get(i)) {
                if (p.logRatio() <= 0) {
                    continue;
                }
                int ev = peaks + p.entry();
                if (peakSide.add(i)) {
                    g.addVertex(i);
                }
                if (entrySide.add(ev)) {
                    g.addVertex(ev);
                }
                DefaultWeightedEdge edge = g.addEdge(i, ev);
                g.setEdgeWeight(edge, p.logRatio());
            }
        }
        if (peakSide.isEmpty()) {
            return assigned;
        }
        MatchingAlgorithm.Matching<Integer, DefaultWeightedEdge> matching =
                new MaximumWeightBipartiteMatching<>(g, peakSide, entrySide).getMatching();
        for (DefaultWeightedEdge edge : matching.getEdges()) {
            int a = g.getEdgeSource(edge);
            int b = g.getEdgeTarget(edge);
            int peak = Math.min(a, b);
            int entryVertex = Math.max(a, b);
            assigned[peak] = entryVertex - peaks;
        }
        return assigned;
    }

    /** Per peak: [P(none), P(candidate 0), …] in the order of that peak's candidate list. */
    private static double[][] marginals(List<List<Pair>> pairs, double[] mobility, int[] assigned, int maxStates) {
        int peaks = pairs.size();
        double[][] out = new double[peaks][];
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < peaks; i++) {
            if (pairs.get(i).isEmpty()) {
                out[i] = new double[] {1.0};
            } else {
                order.add(i);
            }
        }
        if (order.isEmpty()) {
            return out;
        }
        // Peaks in mobility order keep the sets of contested entries small.
        order.sort(Comparator.comparingDouble(i -> mobility[i]));
        int[][] entryOf = new int[order.size()][];
        double[][] logWeight = new double[order.size()][];
        for (int t = 0; t < order.size(); t++) {
            List<Pair> ps = pairs.get(order.get(t));
            entryOf[t] = ps.stream().mapToInt(Pair::entry).toArray();
            logWeight[t] = ps.stream().mapToDouble(Pair::logRatio).toArray();
        }
        double[][] exact = AssignmentMarginals.compute(entryOf, logWeight, maxStates);
        for (int t = 0; t < order.size(); t++) {
            int i = order.get(t);
            out[i] = exact != null ? exact[t] : approximate(pairs.get(i), i, assigned);
        }
        return out;
    }

    /** The peak's own posterior without the entries the optimal matching gave to other peaks. */
    private static double[] approximate(List<Pair> ps, int peak, int[] assigned) {
        Set<Integer> takenByOthers = new LinkedHashSet<>();
        for (int k = 0; k < assigned.length; k++) {
            if (k != peak && assigned[k] >= 0) {
                takenByOthers.add(assigned[k]);
            }
        }
        double maxLog = 0.0;
        for (Pair p : ps) {
            maxLog = Math.max(maxLog, p.logRatio());
        }
        double[] m = new double[ps.size() + 1];
        m[0] = Math.exp(-maxLog);
        double z = m[0];
        for (int k = 0; k < ps.size(); k++) {
            Pair p = ps.get(k);
            m[k + 1] = takenByOthers.contains(p.entry()) ? 0.0 : Math.exp(p.logRatio() - maxLog);
            z += m[k + 1];
        }
        for (int k = 0; k < m.length; k++) {
            m[k] /= z;
        }
        return m;
    }

    private static PeakMatch result(List<Pair> ps, double[] marginal, int assignedEntry,
                                    List<LibraryEntry> entries, MatchSettings s) {
        if (ps.isEmpty()) {
            return PeakMatch.none();
        }
        List<Candidate> cands = new ArrayList<>(ps.size());
        double assignedProbability = 0.0;
        String assignedName = null;
        for (int k = 0; k < ps.size(); k++) {
            Pair p = ps.get(k);
            LibraryEntry e = entries.get(p.entry());
            cands.add(new Candidate(e.name(), e.mobility(), p.residual(), p.z(), marginal[k + 1]));
            if (p.entry() == assignedEntry) {
                assignedName = e.name();
                assignedProbability = marginal[k + 1];
            }
        }
        cands.sort(Comparator.comparingDouble(Candidate::probability).reversed()
                .thenComparingDouble(c -> Math.abs(c.z())));
        Candidate runnerUp = null;
        for (Candidate c : cands) {
            if (!c.name().equals(assignedName)) {
                runnerUp = c;
                break;
            }
        }
        String runnerName = runnerUp == null ? null : runnerUp.name();
        double runnerProbability = runnerUp == null ? 0.0 : runnerUp.probability();
        if (assignedName == null) {
            return new PeakMatch(null, marginal[0], MatchStatus.UNASSIGNED, runnerName, runnerProbability, cands);
        }
        boolean ambiguous = assignedProbability < s.minIdentifiedConfidence()
                || runnerProbability >= s.ambiguityRatio() * assignedProbability;
        return new PeakMatch(assignedName, assignedProbability,
                ambiguous ? MatchStatus.AMBIGUOUS : MatchStatus.IDENTIFIED, runnerName, runnerProbability, cands);
    }
}
