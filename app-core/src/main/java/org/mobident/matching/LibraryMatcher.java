package org.mobident.matching;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.special.Gamma;
import org.jgrapht.Graph;
import org.jgrapht.alg.interfaces.MatchingAlgorithm;
import org.jgrapht.alg.matching.MaximumWeightBipartiteMatching;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.mobident.Tolerances;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.result.RunScale;
import org.mobident.settings.MatchSettings;
import org.mobident.settings.ScalePrior;

/**
 * Matches the peaks of one run to library analytes by effective mobility, one analyte to at most
 * one peak, with a probability for every assignment, after correcting the run's mobility scale.
 *
 * <h2>Model</h2>
 * For peak i (mobility x_ij after conversion to entry j's temperature, standard uncertainty σ_i)
 * and entry j (library mobility μ_j, predictive variance τ_j² from {@link SpreadModel}):
 * <ul>
 *   <li>the run's mobilities share a systematic error, x ≈ a·μ + b ({@link RunScale});
 *       the residual is r_ij = (x_ij − b)/a − μ_j;</li>
 *   <li>its variance is v_ij = τ_j² + σ_i²/a² + u_j², u_j² the variance the uncertainty of a and
 *       b adds at μ_j ({@link RunScale#varianceAt});</li>
 *   <li>the likelihood f(r_ij) is Student's t with the Welch–Satterthwaite degrees of freedom of
 *       the estimated part of v (JCGM 100:2008, G.4.1), scale √v: spreads from a few runs are
 *       themselves uncertain, and the t tails keep a peak a few "σ" away from being declared
 *       foreign with false certainty (Student, Biometrika 6 (1908) 1). It is the normal density
 *       when nothing is estimated from few runs;</li>
 *   <li>where the peak's centre uncertainty has a shape term, f is the two-scale mixture
 *       w·f_u + (1 − w)·f, f_u the same density with σ_i replaced by the peak's usual-case SD
 *       ({@link org.mobident.result.Peak#migrationTimeUsualSdS()}, w =
 *       {@link Tolerances#CENTRE_SHAPE_USUAL_WEIGHT}): the centres of skewed zones are usually
 *       much closer than their shape term allows and sometimes as far (McLachlan &amp; Peel, Finite
 *       Mixture Models, 2000, ch. 1);</li>
 *   <li>entry j is a candidate only inside its {@link MatchWindow};</li>
 *   <li>the run is modelled as in multi-target data association (Bar-Shalom &amp; Fortmann,
 *       Tracking and Data Association, 1988, ch. 9): each library analyte is present with prior
 *       probability q_j and then gives exactly one peak; peaks of substances not in the library
 *       arrive independently with a uniform density λ per mobility unit. A joint one-to-one
 *       assignment then has posterior odds, against "every peak foreign", equal to the product
 *       over its pairs of ρ_ij = q_j·f(r_ij) / ((1 − q_j)·λ). q and λ come from the prior share
 *       π₀ of peaks not in the library ({@link MatchSettings#notInLibraryPrior()}), the range W
 *       they spread over ({@link MatchSettings#notInLibraryRange}), the number P of peaks and the library size M: the expected number of
 *       library peaks is L = min((1 − π₀)·P, {@value #MAX_PRESENCE}·M), q = L/M and
 *       λ = (P − L)/W; an entry the lab marks as internal standard has q = {@value #INTERNAL_STANDARD_PRESENCE}.</li>
 * </ul>
 *
 * <h2>The run's scale</h2>
 * a and b have a normal prior ({@link ScalePrior}). The posterior over (a, b) is searched on a
 * grid over the plausible bounds with the score ln p(a, b) + Σ_i ln(1 + Σ_j ρ_ij) (peaks taken
 * independently), and each local maximum within ln 1000 of the best is refined by expectation–
 * maximisation (Dempster, Laird &amp; Rubin, J. R. Stat. Soc. B 39 (1977) 1): the E-step gives each
 * peak's probabilities over its candidates and "none", the M-step the weighted least-squares line
 * x = a·μ + b with the prior as two extra observations, the Student-t pairs reweighted by
 * (ν + 1)/(ν + z²) so that a stray pair cannot pull the line (the EM form of a t regression,
 * Lange, Little &amp; Taylor, J. Am. Stat. Assoc. 84 (1989) 881). The inverse of the final normal
 * matrix is the covariance of (a, b). Each refined mode is weighed by its Laplace approximation
 * of the evidence, ln Z(a*, b*) + ln p(a*, b*) + ln 2π + ½ ln det Σ (MacKay, Information Theory,
 * Inference and Learning Algorithms, 2003, ch. 27), with Z the exact sum over one-to-one
 * assignments. When the best mode rests on fewer than {@value #MIN_ANCHORS} expected peaks, the run is
 * reported as not corrected (its mobilities compared at the prior's centre); its matches still weigh
 * every way its few peaks could fit within the prior.
 *
 * <h2>Assignment and confidence</h2>
 * The reported assignment is the most probable joint one under the best mode, found exactly as a
 * maximum-weight bipartite matching (JGraphT's {@link MaximumWeightBipartiteMatching}; Kuhn, Naval
 * Res. Logist. Q. 2 (1955) 83) with edge weights ln ρ_ij (only pairs with ρ &gt; 1). The
 * confidence of an assigned peak is its marginal posterior probability of being that analyte,
 * summed exactly over every valid one-to-one assignment ({@link AssignmentMarginals}) with the
 * uncertainty of (a, b) added to every v, and averaged over the modes by their weights; when the
 * candidate windows overlap so much that the exact sum would need more than {@value #MAX_STATES}
 * states per peak, each peak's own posterior without the entries the optimal matching gave to
 * other peaks is used. An unassigned peak reports the probability that it is none of the library
 * analytes. Status: see {@link MatchSettings}.
 */
public final class LibraryMatcher {

    /** Largest number of partial-assignment states per peak for the exact marginals. */
    static final int MAX_STATES = 1 << 15;
    /** Largest prior probability that an analyte is present: absence always keeps 5 % (a modelling choice). */
    static final double MAX_PRESENCE = 0.95;
    /** Prior presence of an internal standard, which the lab adds to every run (a modelling choice). */
    static final double INTERNAL_STANDARD_PRESENCE = 0.98;
    /** Grid step of the scale factor a in the mode search (about a quarter of a typical match width). */
    static final double FACTOR_GRID_STEP = 0.0025;
    /** Grid step of the offset b in the mode search, mobility units. */
    static final double OFFSET_GRID_STEP = 0.25;
    /** The mode search covers the prior's centre ± this many prior SDs (within the plausible bounds). */
    static final double PRIOR_REACH_SDS = 3.5;
    /** Modes whose grid score is more than this below the best are not refined (a factor of 1000). */
    static final double MODE_LOG_DROP = Math.log(1000.0);
    /** Most modes refined and mixed. */
    static final int MAX_MODES = 4;
    /** Most expectation–maximisation rounds per mode. */
    static final int MAX_EM_ROUNDS = 25;
    /** The EM stops when a moves less than this. */
    static final double FACTOR_CONVERGED = 1e-6;
    /** The EM stops when b moves less than this (and a converged), mobility units. */
    static final double OFFSET_CONVERGED = 1e-5;
    /** Two refined modes closer than this in a are the same. */
    static final double SAME_MODE_FACTOR = 1e-3;
    /** Two refined modes closer than this in b are the same, mobility units. */
    static final double SAME_MODE_OFFSET = 0.05;
    /**
     * Fewest expected matched peaks for a fitted scale: two peaks matched with good probability (with
     * the prior, the two-parameter line needs two).
     */
    static final double MIN_ANCHORS = 1.5;
    /** Modes with less weight than this are dropped from the mixture. */
    static final double NEGLIGIBLE_MODE_WEIGHT = 1e-6;

    private static final double LOG_SQRT_2PI = 0.5 * Math.log(2.0 * Math.PI);
    private static final double LOG_2PI = Math.log(2.0 * Math.PI);

    private LibraryMatcher() {
    }

    /**
     * Matches the peaks of one run with the scale correction the settings ask for.
     *
     * @param mobility   peak effective mobilities at the run conditions, 1e-9 m²/(V s), signed;
     *                   NaN when unknown (not modified)
     * @param mobilitySd their standard uncertainties, NaN when unknown; may be null (not modified)
     * @param library    the entries to match against (already those of the run's buffer)
     * @param spread     the spread model of exactly those entries
     * @param settings   window rule, priors and thresholds
     * @param adjuster   converts a peak mobility to an entry's conditions
     * @throws IllegalArgumentException when the arrays differ in length or a σ is negative
     */
    public static RunMatch matchRun(double[] mobility, double[] mobilitySd, Library library, SpreadModel spread,
                                    MatchSettings settings, MobilityAdjuster adjuster) {
        return new Problem(mobility, mobilitySd, null, library, spread, settings, adjuster, MAX_STATES).solve();
    }

    /**
     * As {@link #matchRun(double[], double[], Library, SpreadModel, MatchSettings, MobilityAdjuster)},
     * with each peak's error a two-scale mixture: with probability
     * {@link Tolerances#CENTRE_SHAPE_USUAL_WEIGHT} its SD is {@code mobilityUsualSd}, otherwise
     * {@code mobilitySd} (see {@link org.mobident.result.Peak#migrationTimeUsualSdS()}). The windows
     * stay those of {@code mobilitySd}.
     *
     * @param mobilityUsualSd the peaks' SDs in the usual case, never above {@code mobilitySd}; may be null
     */
    public static RunMatch matchRun(double[] mobility, double[] mobilitySd, double[] mobilityUsualSd,
                                    Library library, SpreadModel spread, MatchSettings settings,
                                    MobilityAdjuster adjuster) {
        return new Problem(mobility, mobilitySd, mobilityUsualSd, library, spread, settings, adjuster, MAX_STATES)
                .solve();
    }

    /**
     * Matches with the run's scale taken as stated (no correction), for comparisons that carry
     * mobilities between libraries.
     */
    public static List<PeakMatch> match(double[] mobility, double[] mobilitySd, Library library,
                                        MatchSettings settings, MobilityAdjuster adjuster) {
        MatchSettings fixed = settings.withScalePrior(null);
        return new Problem(mobility, mobilitySd, null, library, SpreadModel.of(library, fixed), fixed, adjuster,
                MAX_STATES).solve().matches();
    }

    /** As {@link #match} with a state limit, for tests of the approximation. */
    static List<PeakMatch> match(double[] mobility, double[] mobilitySd, Library library, MatchSettings settings,
                                 MobilityAdjuster adjuster, int maxStates) {
        MatchSettings fixed = settings.withScalePrior(null);
        return new Problem(mobility, mobilitySd, null, library, SpreadModel.of(library, fixed), fixed, adjuster,
                maxStates).solve().matches();
    }

    /**
     * ln[q / ((1 − q)·λ)] for an ordinary entry, the part of every ln ρ that does not depend on the
     * residual.
     *
     * @param peaks   number of peaks with a known mobility
     * @param entries library size
     */
    static double logPriorOdds(int peaks, int entries, MatchSettings s, double rangeUnits) {
        if (peaks == 0 || entries == 0) {
            return Double.NaN;
        }
        double presence = presence(peaks, entries, s);
        return Math.log(presence) - Math.log1p(-presence) - Math.log(foreignDensity(peaks, entries, s, rangeUnits));
    }

    private static double presence(int peaks, int entries, MatchSettings s) {
        return libraryPeaks(peaks, entries, s) / entries;
    }

    private static double libraryPeaks(int peaks, int entries, MatchSettings s) {
        return Math.min((1.0 - s.notInLibraryPrior()) * peaks, MAX_PRESENCE * entries);
    }

    private static double foreignDensity(int peaks, int entries, MatchSettings s, double rangeUnits) {
        return (peaks - libraryPeaks(peaks, entries, s)) / rangeUnits;
    }

    /** The range of unknown peaks for these entries ({@link MatchSettings#notInLibraryRange}). */
    static double range(List<LibraryEntry> entries, MatchSettings s) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (LibraryEntry e : entries) {
            if (Double.isFinite(e.mobility())) {
                lo = Math.min(lo, e.mobility());
                hi = Math.max(hi, e.mobility());
            }
        }
        return s.notInLibraryRange(lo, hi);
    }

    /**
     * ln(w·e^usual + (1 − w)·e^broad), w = {@link Tolerances#CENTRE_SHAPE_USUAL_WEIGHT}: the density
     * of a peak whose error is usually small and sometimes as large as stated.
     */
    static double logMixture(double usual, double broad) {
        double w = Tolerances.CENTRE_SHAPE_USUAL_WEIGHT;
        double max = Math.max(usual, broad);
        return max + Math.log(w * Math.exp(usual - max) + (1 - w) * Math.exp(broad - max));
    }

    /**
     * ln of the standard density at z: Student's t with {@code df} degrees of freedom, or the
     * normal when df is infinite or beyond {@link MatchWindow#NORMAL_DF} (Student 1908).
     */
    static double logDensity(double z, double df) {
        if (!(df < MatchWindow.NORMAL_DF)) {
            return -0.5 * z * z - LOG_SQRT_2PI;
        }
        return logDensityConstant(df) - 0.5 * (df + 1) * Math.log1p(z * z / df);
    }

    /** The z-free part of the t log density. */
    static double logDensityConstant(double df) {
        return Gamma.logGamma(0.5 * (df + 1)) - Gamma.logGamma(0.5 * df) - 0.5 * Math.log(df * Math.PI);
    }

    /**
     * One peak's match averaged over several readings of its run (for example several choices of
     * the neutral marker), weighted by {@code weights}; a null match means the peak is not an
     * analyte in that reading, and its weight then counts as "none of the library analytes". The
     * assignment stays that of {@code chosen} (the reading reported); its confidence, the
     * candidates' probabilities and the status follow from the averaged probabilities.
     */
    public static PeakMatch mix(List<PeakMatch> perReading, double[] weights, PeakMatch chosen, MatchSettings s) {
        Map<String, double[]> byName = new java.util.LinkedHashMap<>(); // name -> {probability, μ_lib, residual, z}
        for (Candidate c : chosen.candidates()) {
            byName.put(c.name(), new double[] {0, c.libraryMobility(), c.residual(), c.z()});
        }
        for (int h = 0; h < perReading.size(); h++) {
            PeakMatch m = perReading.get(h);
            if (m == null || weights[h] == 0) {
                continue;
            }
            for (Candidate c : m.candidates()) {
                double[] acc = byName.computeIfAbsent(c.name(),
                        n -> new double[] {0, c.libraryMobility(), c.residual(), c.z()});
                acc[0] += weights[h] * c.probability();
            }
        }
        List<Candidate> cands = new ArrayList<>();
        double total = 0;
        for (Map.Entry<String, double[]> e : byName.entrySet()) {
            double[] v = e.getValue();
            cands.add(new Candidate(e.getKey(), v[1], v[2], v[3], v[0]));
            total += v[0];
        }
        if (cands.isEmpty()) {
            return PeakMatch.none();
        }
        cands.sort(Comparator.comparingDouble(Candidate::probability).reversed()
                .thenComparingDouble(c -> Math.abs(c.z())).thenComparing(Candidate::name));
        String assigned = chosen.assigned();
        double assignedProbability = assigned == null ? 0.0 : byName.get(assigned)[0];
        Candidate runnerUp = null;
        for (Candidate c : cands) {
            if (!c.name().equals(assigned)) {
                runnerUp = c;
                break;
            }
        }
        String runnerName = runnerUp == null ? null : runnerUp.name();
        double runnerProbability = runnerUp == null ? 0.0 : runnerUp.probability();
        if (assigned == null) {
            return new PeakMatch(null, Math.max(0.0, 1.0 - total), MatchStatus.UNASSIGNED, runnerName,
                    runnerProbability, cands);
        }
        boolean ambiguous = assignedProbability < s.minIdentifiedConfidence()
                || runnerProbability >= s.ambiguityRatio() * assignedProbability;
        return new PeakMatch(assigned, assignedProbability, ambiguous ? MatchStatus.AMBIGUOUS : MatchStatus.IDENTIFIED,
                runnerName, runnerProbability, cands);
    }

    /** One candidate entry of one peak at a given scale. */
    private record Pair(int entry, double residual, double z, double logRatio) {
    }

    /** A refined scale: a, b, their covariance and how many peaks carried it. */
    private record Fit(double factor, double offset, double varFactor, double varOffset, double cov,
                       double anchors) {
        RunScale toScale(RunScale.Status status) {
            return new RunScale(status, factor, Math.sqrt(varFactor), offset, Math.sqrt(varOffset), cov, anchors);
        }
    }

    /** A weighed hypothesis about the run's scale with its matching. */
    private record Mode(RunScale scale, List<List<Pair>> pairs, double[][] marginal, double logEvidence) {
    }

    /** One run's matching problem. Not thread-safe; one per call. */
    private static final class Problem {
        private final int peaks;
        private final double[] mobility;
        private final List<LibraryEntry> entries;
        private final SpreadModel spread;
        private final MatchSettings s;
        private final int maxStates;
        private final double[] peakVariance;
        /** Per peak: the variance in the usual case (equal to peakVariance when the peak's error is not mixed). */
        private final double[] usualVariance;
        private final double[] entryMobility;
        private final double[] logOdds;
        /** Per peak: the entries that can be candidates at some plausible scale, and the converted mobility. */
        private final int[][] pairEntry;
        private final double[][] pairX;
        /** Per pair, at the stated scale with no scale uncertainty: variance, df, window, ln-density base. */
        private final double[][] baseVar;
        private final double[][] baseDf;
        private final double[][] baseWindow;
        private final double[][] baseLog;
        /** As baseVar, baseDf and baseLog for the usual case of a mixed peak (null for the others). */
        private final double[][] usualVar;
        private final double[][] usualDf;
        private final double[][] usualLog;

        Problem(double[] mobility, double[] mobilitySd, double[] mobilityUsualSd, Library library,
                SpreadModel spread, MatchSettings s, MobilityAdjuster adjuster, int maxStates) {
            if (mobilitySd != null && mobilitySd.length != mobility.length) {
                throw new IllegalArgumentException("mobility and mobilitySd differ in length: "
                        + mobility.length + " vs " + mobilitySd.length);
            }
            this.peaks = mobility.length;
            this.mobility = mobility;
            this.entries = library.entries();
            this.spread = spread;
            this.s = s;
            this.maxStates = maxStates;
            int m = entries.size();
            int known = 0;
            for (double mu : mobility) {
                known += Double.isFinite(mu) ? 1 : 0;
            }
            entryMobility = new double[m];
            logOdds = new double[m];
            double rangeUnits = range(entries, s);
            double ordinary = logPriorOdds(known, m, s, rangeUnits);
            double logForeign = known > 0 && m > 0 ? Math.log(foreignDensity(known, m, s, rangeUnits)) : Double.NaN;
            for (int j = 0; j < m; j++) {
                LibraryEntry e = entries.get(j);
                entryMobility[j] = e.mobility();
                logOdds[j] = e.internalStandard()
                        ? Math.log(INTERNAL_STANDARD_PRESENCE) - Math.log1p(-INTERNAL_STANDARD_PRESENCE) - logForeign
                        : ordinary;
            }
            peakVariance = new double[peaks];
            usualVariance = new double[peaks];
            usualVar = new double[peaks][];
            usualDf = new double[peaks][];
            usualLog = new double[peaks][];
            pairEntry = new int[peaks][];
            pairX = new double[peaks][];
            baseVar = new double[peaks][];
            baseDf = new double[peaks][];
            baseWindow = new double[peaks][];
            baseLog = new double[peaks][];
            ScalePrior prior = s.scalePrior();
            for (int i = 0; i < peaks; i++) {
                double sd = mobilitySd == null ? Double.NaN : mobilitySd[i];
                if (sd < 0) {
                    throw new IllegalArgumentException("peak " + i + ": negative mobility uncertainty " + sd);
                }
                peakVariance[i] = Double.isNaN(sd) ? 0.0 : sd * sd;
                double usual = mobilityUsualSd == null ? Double.NaN : mobilityUsualSd[i];
                usualVariance[i] = usual >= 0 && usual * usual < peakVariance[i] ? usual * usual : peakVariance[i];
                fillPairs(i, adjuster, prior);
            }
        }

        /**
         * The candidate pairs of peak i (entries within reach) and their base terms, into
         * {@code pairEntry[i]} … {@code baseLog[i]}: a method of its own, so that the JIT compiles
         * this loop over the entries without the rest of the constructor.
         */
        private void fillPairs(int i, MobilityAdjuster adjuster, ScalePrior prior) {
            int m = entries.size();
            List<double[]> kept = new ArrayList<>();
            if (Double.isFinite(mobility[i])) {
                for (int j = 0; j < m; j++) {
                    LibraryEntry e = entries.get(j);
                    double x = adjuster.adjust(mobility[i], e);
                    if (!Double.isFinite(x) || !Double.isFinite(e.mobility())) {
                        continue;
                    }
                    double reach;
                    if (prior == null) {
                        reach = window(j, peakVariance[i]);
                    } else {
                        double priorVar = RunScale.prior(ScalePrior.DEFAULT, 0).varianceAt(e.mobility())
                                + RunScale.prior(prior, 0).varianceAt(e.mobility());
                        reach = prior.maxFactorDeviation() * Math.abs(e.mobility()) + prior.maxOffset()
                                + window(j, peakVariance[i] + priorVar) * (1 + prior.maxFactorDeviation());
                    }
                    if (Math.abs(x - e.mobility()) <= reach) {
                        kept.add(new double[] {j, x});
                    }
                }
            }
            int c = kept.size();
            pairEntry[i] = new int[c];
            pairX[i] = new double[c];
            baseVar[i] = new double[c];
            baseDf[i] = new double[c];
            baseWindow[i] = new double[c];
            baseLog[i] = new double[c];
            boolean mixed = usualVariance[i] < peakVariance[i];
            if (mixed) {
                usualVar[i] = new double[c];
                usualDf[i] = new double[c];
                usualLog[i] = new double[c];
            }
            for (int k = 0; k < c; k++) {
                int j = (int) kept.get(k)[0];
                pairEntry[i][k] = j;
                pairX[i][k] = kept.get(k)[1];
                double v = spread.predictiveVariance(j) + peakVariance[i];
                double df = MatchWindow.combinedDf(v, spread.estimatedVariance(j), spread.degreesOfFreedom(j));
                baseVar[i][k] = v;
                baseDf[i][k] = df;
                baseWindow[i][k] = window(j, peakVariance[i]);
                baseLog[i][k] = logOdds[j] - 0.5 * Math.log(v)
                        + (df < MatchWindow.NORMAL_DF ? logDensityConstant(df) : -LOG_SQRT_2PI);
                if (mixed) {
                    double vu = spread.predictiveVariance(j) + usualVariance[i];
                    double dfu = MatchWindow.combinedDf(vu, spread.estimatedVariance(j), spread.degreesOfFreedom(j));
                    usualVar[i][k] = vu;
                    usualDf[i][k] = dfu;
                    usualLog[i][k] = logOdds[j] - 0.5 * Math.log(vu)
                            + (dfu < MatchWindow.NORMAL_DF ? logDensityConstant(dfu) : -LOG_SQRT_2PI);
                }
            }
        }

        private double window(int j, double extraVariance) {
            return MatchWindow.halfWidth(entries.get(j), spread, j, extraVariance, s);
        }

        RunMatch solve() {
            boolean any = false;
            for (int[] p : pairEntry) {
                any |= p.length > 0;
            }
            ScalePrior prior = s.scalePrior();
            if (!any) {
                RunScale scale = prior == null ? RunScale.OFF : RunScale.prior(prior, 0);
                List<PeakMatch> none = new ArrayList<>();
                for (int i = 0; i < peaks; i++) {
                    none.add(PeakMatch.none());
                }
                return new RunMatch(none, scale, 0.0, 1);
            }
            List<Mode> modes = new ArrayList<>();
            if (prior == null) {
                modes.add(evaluate(RunScale.OFF, false));
            } else {
                for (Fit f : searchModes(prior)) {
                    if (prior.plausible(f.factor(), f.offset())) {
                        modes.add(evaluate(f.toScale(RunScale.Status.FITTED), true));
                    }
                }
                if (modes.isEmpty()) {
                    modes.add(evaluate(RunScale.prior(prior, 0), false));
                }
            }
            return combine(modes);
        }

        /** Grid search and EM refinement of the modes of the posterior over (a, b). */
        private List<Fit> searchModes(ScalePrior prior) {
            // the plausible bounds, narrowed to the prior's own reach when it is tight (a prior learned from a batch)
            double reachA = Math.min(prior.maxFactorDeviation(), PRIOR_REACH_SDS * prior.factorSd());
            double reachB = Math.min(prior.maxOffset(), PRIOR_REACH_SDS * prior.offsetSd());
            double loA = Math.max(1 - prior.maxFactorDeviation(), prior.factorCentre() - reachA);
            double hiA = Math.min(1 + prior.maxFactorDeviation(), prior.factorCentre() + reachA);
            double loB = Math.max(-prior.maxOffset(), prior.offsetCentre() - reachB);
            double hiB = Math.min(prior.maxOffset(), prior.offsetCentre() + reachB);
            int na = Math.max(1, (int) Math.ceil((hiA - loA) / FACTOR_GRID_STEP) + 1);
            int nb = Math.max(1, (int) Math.ceil((hiB - loB) / OFFSET_GRID_STEP) + 1);
            double a0 = na == 1 ? prior.factorCentre() : loA;
            double b0 = nb == 1 ? prior.offsetCentre() : loB;
            // the grid and its seeds in methods of their own: their loops are the long ones, and
            // the JIT then compiles them without the rest of the search
            double[][] score = scoreGrid(prior, a0, b0, na, nb);
            List<int[]> seeds = seeds(score, largest(score));
            seeds.sort(Comparator.comparingDouble((int[] c) -> -score[c[0]][c[1]]));
            List<Fit> fits = new ArrayList<>();
            for (int[] c : seeds) {
                if (fits.size() >= MAX_MODES) {
                    break;
                }
                Fit f = refine(prior, a0 + c[0] * FACTOR_GRID_STEP, b0 + c[1] * OFFSET_GRID_STEP);
                boolean seen = false;
                for (Fit g : fits) {
                    seen |= Math.abs(g.factor() - f.factor()) < SAME_MODE_FACTOR
                            && Math.abs(g.offset() - f.offset()) < SAME_MODE_OFFSET;
                }
                if (!seen) {
                    fits.add(f);
                }
            }
            return fits;
        }

        /** The log posterior score on the grid a0 + ia·step, b0 + ib·step. */
        private double[][] scoreGrid(ScalePrior prior, double a0, double b0, int na, int nb) {
            double[][] score = new double[na][nb];
            for (int ia = 0; ia < na; ia++) {
                double a = a0 + ia * FACTOR_GRID_STEP;
                for (int ib = 0; ib < nb; ib++) {
                    double b = b0 + ib * OFFSET_GRID_STEP;
                    score[ia][ib] = prior.logDensity(a, b) + independentLogScore(a, b);
                }
            }
            return score;
        }

        /** The largest score (NaN when any is NaN, as Math.max gives). */
        private static double largest(double[][] score) {
            double best = Double.NEGATIVE_INFINITY;
            for (double[] row : score) {
                for (double v : row) {
                    best = Math.max(best, v);
                }
            }
            return best;
        }

        /** The grid cells that are local maxima within {@link #MODE_LOG_DROP} of the best, in grid order. */
        private static List<int[]> seeds(double[][] score, double best) {
            List<int[]> seeds = new ArrayList<>();
            for (int ia = 0; ia < score.length; ia++) {
                for (int ib = 0; ib < score[ia].length; ib++) {
                    double v = score[ia][ib];
                    if (v < best - MODE_LOG_DROP || !localMaximum(score, ia, ib)) {
                        continue;
                    }
                    seeds.add(new int[] {ia, ib});
                }
            }
            return seeds;
        }

        private static boolean localMaximum(double[][] score, int ia, int ib) {
            double v = score[ia][ib];
            for (int da = -1; da <= 1; da++) {
                for (int db = -1; db <= 1; db++) {
                    int x = ia + da;
                    int y = ib + db;
                    if ((da != 0 || db != 0) && x >= 0 && y >= 0 && x < score.length && y < score[0].length) {
                        double w = score[x][y];
                        // strict against earlier neighbours, non-strict against later ones: one cell per plateau
                        if (w > v || (w == v && (da < 0 || (da == 0 && db < 0)))) {
                            return false;
                        }
                    }
                }
            }
            return true;
        }

        /** Σ_i ln(1 + Σ_j ρ_ij) at scale (a, b) with no scale uncertainty. */
        private double independentLogScore(double a, double b) {
            double total = 0;
            for (int i = 0; i < peaks; i++) {
                double acc = 0;
                int[] pe = pairEntry[i];
                for (int k = 0; k < pe.length; k++) {
                    double r = (pairX[i][k] - b) / a - entryMobility[pe[k]];
                    if (Math.abs(r) > baseWindow[i][k]) {
                        continue;
                    }
                    acc += Math.exp(baseLogRatio(i, k, r));
                }
                total += Math.log1p(acc);
            }
            return total;
        }

        private double baseLogRatio(int i, int k, double r) {
            double broad = logRatio(baseLog[i][k], r * r / baseVar[i][k], baseDf[i][k]);
            if (usualVar[i] == null) {
                return broad;
            }
            return logMixture(logRatio(usualLog[i][k], r * r / usualVar[i][k], usualDf[i][k]), broad);
        }

        private static double logRatio(double base, double z2, double df) {
            return df < MatchWindow.NORMAL_DF ? base - 0.5 * (df + 1) * Math.log1p(z2 / df) : base - 0.5 * z2;
        }

        /** Expectation–maximisation from (a, b) to the nearby mode. */
        private Fit refine(ScalePrior prior, double a, double b) {
            double ia2 = 1.0 / (prior.factorSd() * prior.factorSd());
            double ib2 = 1.0 / (prior.offsetSd() * prior.offsetSd());
            double h11 = ia2;
            double h12 = 0;
            double h22 = ib2;
            double anchors = 0;
            double[] logs = new double[entries.size()];
            for (int round = 0; round < MAX_EM_ROUNDS; round++) {
                h11 = ia2;
                h12 = 0;
                h22 = ib2;
                double g1 = ia2 * prior.factorCentre();
                double g2 = ib2 * prior.offsetCentre();
                anchors = 0;
                for (int i = 0; i < peaks; i++) {
                    int[] pe = pairEntry[i];
                    double max = 0;
                    for (int k = 0; k < pe.length; k++) {
                        double r = (pairX[i][k] - b) / a - entryMobility[pe[k]];
                        logs[k] = Math.abs(r) > baseWindow[i][k] ? Double.NEGATIVE_INFINITY : baseLogRatio(i, k, r);
                        max = Math.max(max, logs[k]);
                    }
                    double z = Math.exp(-max);
                    for (int k = 0; k < pe.length; k++) {
                        z += Math.exp(logs[k] - max);
                    }
                    for (int k = 0; k < pe.length; k++) {
                        if (logs[k] == Double.NEGATIVE_INFINITY) {
                            continue;
                        }
                        double p = Math.exp(logs[k] - max) / z;
                        anchors += p;
                        double mu = entryMobility[pe[k]];
                        double x = pairX[i][k];
                        double varObs = a * a * (baseVar[i][k] - peakVariance[i]) + peakVariance[i];
                        double df = baseDf[i][k];
                        double weight = p / varObs;
                        if (df < MatchWindow.NORMAL_DF) {
                            double res = x - a * mu - b;
                            weight *= (df + 1) / (df + res * res / varObs);
                        }
                        h11 += weight * mu * mu;
                        h12 += weight * mu;
                        h22 += weight;
                        g1 += weight * mu * x;
                        g2 += weight * x;
                    }
                }
                double det = h11 * h22 - h12 * h12;
                double na = (h22 * g1 - h12 * g2) / det;
                double nb = (h11 * g2 - h12 * g1) / det;
                na = clamp(na, 1 - prior.maxFactorDeviation(), 1 + prior.maxFactorDeviation());
                nb = clamp(nb, -prior.maxOffset(), prior.maxOffset());
                boolean done = Math.abs(na - a) < FACTOR_CONVERGED && Math.abs(nb - b) < OFFSET_CONVERGED;
                a = na;
                b = nb;
                if (done) {
                    break;
                }
            }
            double det = h11 * h22 - h12 * h12;
            return new Fit(a, b, h22 / det, h11 / det, -h12 / det, anchors);
        }

        private static double clamp(double v, double lo, double hi) {
            return Math.max(lo, Math.min(hi, v));
        }

        /** The pairs, marginals and evidence of the run at a given scale. */
        private Mode evaluate(RunScale scale, boolean laplace) {
            List<List<Pair>> pairs = pairsAt(scale);
            AssignmentMarginals.Result exact = exactMarginals(pairs);
            double logZ;
            if (laplace) {
                List<List<Pair>> sharp = pairsAt(new RunScale(RunScale.Status.FITTED, scale.factor(), 0, scale.offset(),
                        0, 0, scale.anchors()));
                AssignmentMarginals.Result atMode = exactMarginals(sharp);
                logZ = atMode != null ? atMode.logNormaliser() : independentLogZ(sharp);
            } else {
                logZ = exact != null ? exact.logNormaliser() : independentLogZ(pairs);
            }
            double[][] marginal;
            if (exact != null) {
                marginal = exact.marginals();
            } else {
                marginal = new double[peaks][];
                int[] assigned = optimalAssignment(pairs);
                for (int i = 0; i < peaks; i++) {
                    marginal[i] = approximate(pairs.get(i), i, assigned);
                }
            }
            double evidence = logZ;
            if (laplace) {
                ScalePrior prior = s.scalePrior();
                double det = scale.factorSd() * scale.factorSd() * scale.offsetSd() * scale.offsetSd()
                        - scale.covariance() * scale.covariance();
                evidence += prior.logDensity(scale.factor(), scale.offset()) + LOG_2PI + 0.5 * Math.log(Math.max(det,
                        Double.MIN_NORMAL));
            }
            return new Mode(scale, pairs, marginal, evidence);
        }

        private List<List<Pair>> pairsAt(RunScale scale) {
            double a = scale.factor();
            double b = scale.offset();
            List<List<Pair>> out = new ArrayList<>(peaks);
            for (int i = 0; i < peaks; i++) {
                int[] pe = pairEntry[i];
                List<Pair> list = new ArrayList<>(pe.length);
                for (int k = 0; k < pe.length; k++) {
                    int j = pe[k];
                    double r = (pairX[i][k] - b) / a - entryMobility[j];
                    double extra = peakVariance[i] / (a * a) + scale.varianceAt(entryMobility[j]);
                    if (Math.abs(r) > window(j, extra)) {
                        continue;
                    }
                    double v = spread.predictiveVariance(j) + extra;
                    double df = MatchWindow.combinedDf(v, spread.estimatedVariance(j), spread.degreesOfFreedom(j));
                    double z = r / Math.sqrt(v);
                    double log = logDensity(z, df) - 0.5 * Math.log(v);
                    if (usualVariance[i] < peakVariance[i]) {
                        double vu = v - (peakVariance[i] - usualVariance[i]) / (a * a);
                        double dfu = MatchWindow.combinedDf(vu, spread.estimatedVariance(j), spread.degreesOfFreedom(j));
                        log = logMixture(logDensity(r / Math.sqrt(vu), dfu) - 0.5 * Math.log(vu), log);
                    }
                    list.add(new Pair(j, r, z, logOdds[j] + log));
                }
                out.add(list);
            }
            return out;
        }

        private double independentLogZ(List<List<Pair>> pairs) {
            double total = 0;
            for (List<Pair> ps : pairs) {
                double acc = 0;
                for (Pair p : ps) {
                    acc += Math.exp(p.logRatio());
                }
                total += Math.log1p(acc);
            }
            return total;
        }

        /** Exact marginals over one-to-one assignments, peaks in mobility order; null when too large. */
        private AssignmentMarginals.Result exactMarginals(List<List<Pair>> pairs) {
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < peaks; i++) {
                if (!pairs.get(i).isEmpty()) {
                    order.add(i);
                }
            }
            double[][] out = new double[peaks][];
            for (int i = 0; i < peaks; i++) {
                if (pairs.get(i).isEmpty()) {
                    out[i] = new double[] {1.0};
                }
            }
            if (order.isEmpty()) {
                return new AssignmentMarginals.Result(out, 0.0);
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
            AssignmentMarginals.Result r = AssignmentMarginals.computeWithNormaliser(entryOf, logWeight, maxStates);
            if (r == null) {
                return null;
            }
            for (int t = 0; t < order.size(); t++) {
                out[order.get(t)] = r.marginals()[t];
            }
            return new AssignmentMarginals.Result(out, r.logNormaliser());
        }

        /** Mixes the modes by their evidence; the best mode gives the assignment and the reported scale. */
        private RunMatch combine(List<Mode> modes) {
            double maxEvidence = Double.NEGATIVE_INFINITY;
            int bestMode = 0;
            for (int m = 0; m < modes.size(); m++) {
                if (modes.get(m).logEvidence() > maxEvidence) {
                    maxEvidence = modes.get(m).logEvidence();
                    bestMode = m;
                }
            }
            double[] weight = new double[modes.size()];
            double sum = 0;
            for (int m = 0; m < modes.size(); m++) {
                weight[m] = Math.exp(modes.get(m).logEvidence() - maxEvidence);
                sum += weight[m];
            }
            int carrying = 0;
            for (int m = 0; m < modes.size(); m++) {
                weight[m] /= sum;
                if (weight[m] < NEGLIGIBLE_MODE_WEIGHT) {
                    weight[m] = 0;
                } else {
                    carrying++;
                }
            }
            double logEvidence = maxEvidence + Math.log(sum);
            Mode best = modes.get(bestMode);
            int[] assigned = optimalAssignment(best.pairs());
            List<PeakMatch> out = new ArrayList<>(peaks);
            for (int i = 0; i < peaks; i++) {
                out.add(result(i, modes, weight, bestMode, assigned[i]));
            }
            RunScale reported = best.scale();
            if (reported.fitted() && reported.anchors() < MIN_ANCHORS) {
                // one matched peak cannot pin a scale: report the run as not corrected (its matches still
                // weigh every way the peak could fit, with the prior's uncertainty)
                reported = RunScale.prior(s.scalePrior(), reported.anchors());
            }
            return new RunMatch(out, reported, logEvidence, carrying);
        }

        /** One peak's match, its probabilities averaged over the weighted modes. */
        private PeakMatch result(int i, List<Mode> modes, double[] weight, int bestMode, int assignedEntry) {
            Map<Integer, double[]> byEntry = new HashMap<>(); // entry -> {probability, residual, z}
            double none = 0;
            boolean anyPair = false;
            // the best mode first, then by weight: residual and z are reported from the first mode that has the pair
            Integer[] order = new Integer[modes.size()];
            for (int m = 0; m < order.length; m++) {
                order[m] = m;
            }
            Arrays.sort(order, Comparator.comparingDouble((Integer m) -> m == bestMode ? -2.0 : -weight[m]));
            for (int m : order) {
                if (weight[m] == 0) {
                    continue;
                }
                List<Pair> ps = modes.get(m).pairs().get(i);
                double[] marg = modes.get(m).marginal()[i];
                none += weight[m] * marg[0];
                for (int k = 0; k < ps.size(); k++) {
                    anyPair = true;
                    Pair p = ps.get(k);
                    double[] acc = byEntry.computeIfAbsent(p.entry(), e -> new double[] {0, p.residual(), p.z()});
                    acc[0] += weight[m] * marg[k + 1];
                }
            }
            if (!anyPair) {
                return PeakMatch.none();
            }
            List<Candidate> cands = new ArrayList<>(byEntry.size());
            double assignedProbability = 0.0;
            String assignedName = null;
            for (Map.Entry<Integer, double[]> en : byEntry.entrySet()) {
                LibraryEntry e = entries.get(en.getKey());
                double[] acc = en.getValue();
                cands.add(new Candidate(e.name(), e.mobility(), acc[1], acc[2], acc[0]));
                if (en.getKey() == assignedEntry) {
                    assignedName = e.name();
                    assignedProbability = acc[0];
                }
            }
            cands.sort(Comparator.comparingDouble(Candidate::probability).reversed()
                    .thenComparingDouble(c -> Math.abs(c.z()))
                    .thenComparing(Candidate::name));
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
                return new PeakMatch(null, none, MatchStatus.UNASSIGNED, runnerName, runnerProbability, cands);
            }
            boolean ambiguous = assignedProbability < s.minIdentifiedConfidence()
                    || runnerProbability >= s.ambiguityRatio() * assignedProbability;
            return new PeakMatch(assignedName, assignedProbability,
                    ambiguous ? MatchStatus.AMBIGUOUS : MatchStatus.IDENTIFIED, runnerName, runnerProbability, cands);
        }

        /** The most probable joint assignment: entry index per peak, -1 for none. */
        private int[] optimalAssignment(List<List<Pair>> pairs) {
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
                    if (peakSide.add(i)) {
                        g.addVertex(i);
                    }
                    int ev = peaks + p.entry();
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
                assigned[Math.min(a, b)] = Math.max(a, b) - peaks;
            }
            return assigned;
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
    }
}
