package org.mobident.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.mobident.Tolerances;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.settings.MatchSettings;

/**
 * Unit tests of {@link LibraryMatcher} with the run's scale as stated (no scale correction) and no
 * between-session spread, so that each expected value follows from the formulas alone. All mobilities are invented test values in 1e-9 m²/(V s); the
 * expected probabilities are computed from the model stated in {@link LibraryMatcher}'s javadoc.
 */
class LibraryMatcherTest {

    private static final double EXACT = 1e-12;
    private static final double INF = Double.POSITIVE_INFINITY;
    private static final MatchSettings S = MatchSettings.DEFAULT.withSessionRsd(0.0).withNotInLibraryRange(200.0);

    private static Library lib(LibraryEntry... entries) {
        return new Library(List.of(entries), "test", List.of());
    }

    private static List<PeakMatch> run(Library lib, MatchSettings s, double[] mu, double[] sd) {
        return LibraryMatcher.match(mu, sd, lib, s, MobilityAdjuster.IDENTITY);
    }

    /** The window of entry j for a peak whose combined standard uncertainty with the entry is {@code combinedSd}. */
    private static double window(Library lib, int j, double combinedSd, MatchSettings s) {
        SpreadModel spread = SpreadModel.of(lib, s);
        double extra = Math.max(0.0, combinedSd * combinedSd - spread.predictiveVariance(j));
        return MatchWindow.halfWidth(lib.entries().get(j), spread, j, extra, s);
    }

    private static PeakMatch one(Library lib, MatchSettings s, double mu, double sd) {
        return run(lib, s, new double[] {mu}, new double[] {sd}).get(0);
    }

    /** Normal density N(r; 0, v). */
    private static double normal(double r, double variance) {
        return Math.exp(-0.5 * r * r / variance) / Math.sqrt(2 * Math.PI * variance);
    }

    /**
     * Likelihood ratio ρ = q·N(r; 0, v) / ((1 − q)·λ) under the default settings (n unknown), for a
     * run of P peaks and a library of M: L = min((1 − π₀)·P, 0.95·M), q = L / M, λ = (P − L) / W
     * (see {@link LibraryMatcher}).
     */
    private static double ratio(double r, double peakSd, double entrySd, int librarySize, int peaks) {
        double v = peakSd * peakSd + entrySd * entrySd + S.sdFloor() * S.sdFloor();
        double libraryPeaks = Math.min((1 - S.notInLibraryPrior()) * peaks, 0.95 * librarySize);
        double q = libraryPeaks / librarySize;
        double lambda = (peaks - libraryPeaks) / S.notInLibraryRangeUnits();
        return q * normal(r, v) / ((1 - q) * lambda);
    }

    private static Library spreadOut() {
        return lib(LibraryEntry.of("Chloride", -79.1, 0.2), LibraryEntry.of("Sulfate", -60.0, 0.2),
                LibraryEntry.of("Acetate", -42.0, 0.2), LibraryEntry.of("Sodium", 51.0, 0.2),
                LibraryEntry.of("Potassium", 75.0, 0.2));
    }

    @Test
    void exactHitIsIdentifiedWithTheModelProbability() {
        PeakMatch m = one(spreadOut(), S, -42.0, 0.05);
        assertEquals("Acetate", m.assigned());
        assertEquals(MatchStatus.IDENTIFIED, m.status());
        double rho = ratio(0.0, 0.05, 0.2, 5, 1);
        assertEquals(rho / (1 + rho), m.confidence(), EXACT, "single candidate: ρ / (1 + ρ)");
        assertTrue(m.confidence() > 0.99, "ρ ≈ 300 here");
        assertEquals(1, m.candidates().size());
        assertEquals(0.0, m.candidates().get(0).residual(), EXACT);
        assertNull(m.runnerUp());
    }

    @Test
    void predictiveSpreadGrowsWithFewRuns() {
        LibraryEntry fromThree = new LibraryEntry("X", 10.0, 0.3, 3, 1, Double.NaN, List.of(), List.of(),
                null, Double.NaN, Double.NaN, Double.NaN, null);
        PeakMatch m = one(lib(fromThree), S, 10.4, 0.1);
        double v = 0.1 * 0.1 + 0.3 * 0.3 * (1 + 1.0 / 3) + S.sdFloor() * S.sdFloor();
        assertEquals(0.4 / Math.sqrt(v), m.candidates().get(0).z(), EXACT);
    }

    @Test
    void spreadFromFewRunsUsesStudentT() {
        // Definition check against Commons Math's own Student-t density.
        org.apache.commons.math3.distribution.TDistribution t3 =
                new org.apache.commons.math3.distribution.TDistribution(null, 3.0);
        for (double z : new double[] {0.0, 0.7, -2.5, 6.0}) {
            assertEquals(Math.log(t3.density(z)), LibraryMatcher.logDensity(z, 3.0), 1e-10);
        }
        assertEquals(-0.5 * 4.0 - 0.5 * Math.log(2 * Math.PI), LibraryMatcher.logDensity(2.0, INF), EXACT);
        // The widened window keeps the normal 3σ coverage, 2Φ(3) − 1 = 0.99730 (normal table, from memory).
        assertEquals(3.0, MatchWindow.coverageFactor(3.0, INF), EXACT);
        double k10 = MatchWindow.coverageFactor(3.0, 10.0);
        org.apache.commons.math3.distribution.TDistribution t10 =
                new org.apache.commons.math3.distribution.TDistribution(null, 10.0);
        assertEquals(0.99730, 2 * t10.cumulativeProbability(k10) - 1, 1e-5);
        assertTrue(k10 > 3.5 && k10 < 4.5, "t with 10 df: a little wider than 3");
        assertEquals(MatchWindow.MAX_T_WIDENING * 3.0, MatchWindow.coverageFactor(3.0, 2.0), EXACT,
                "with 2 df the quantile (~19) is capped");

        // A peak 5 combined σ from an entry measured 3 times is still a candidate; with n unknown it is not.
        LibraryEntry three = new LibraryEntry("Three", 10.0, 0.3, 3, 0, Double.NaN, List.of(), List.of(),
                null, Double.NaN, Double.NaN, Double.NaN, null);
        double sigma = Math.sqrt(0.09 * (1 + 1.0 / 3) + S.sdFloor() * S.sdFloor());
        PeakMatch far = one(lib(three), S, 10.0 + 5 * sigma, 0.0);
        assertEquals(1, far.candidates().size());
        assertEquals(5.0, far.candidates().get(0).z(), 1e-9);
        assertEquals(0, one(lib(LibraryEntry.of("Unknown n", 10.0, 0.3)), S, 10.0 + 5 * sigma, 0.0)
                .candidates().size());
    }

    @Test
    void peakBetweenTwoCloseEntriesIsAmbiguous() {
        Library lib = lib(LibraryEntry.of("Malonate", -30.0, 0.3), LibraryEntry.of("Succinate", -30.6, 0.3),
                LibraryEntry.of("Chloride", -79.1, 0.3));
        PeakMatch m = one(lib, S, -30.3, 0.05);
        assertEquals(MatchStatus.AMBIGUOUS, m.status());
        assertTrue(m.assigned().equals("Malonate") || m.assigned().equals("Succinate"), m.assigned());
        assertEquals(2, m.candidates().size());
        assertEquals(m.confidence(), m.runnerUpProbability(), 1e-9, "symmetric: equally likely");
        assertTrue(m.confidence() < 0.5);
        assertNotEquals(m.assigned(), m.runnerUp());
    }

    @Test
    void aPeakWhoseErrorIsUsuallySmallIsWeighedAsATwoScaleMixture() {
        // a skewed zone's centre 0.1 units from one entry and 1.1 from its neighbour, stated SD 1.0,
        // SD 0.2 in the usual case; the scale is taken as stated
        Library lib = lib(LibraryEntry.of("Near", -71.1, 0.05), LibraryEntry.of("Far", -72.3, 0.05),
                LibraryEntry.of("Chloride", -79.1, 0.05));
        MatchSettings fixed = S.withScalePrior(null);
        SpreadModel spread = SpreadModel.of(lib, fixed);
        double[] mu = {-71.2};
        PeakMatch plain = LibraryMatcher.matchRun(mu, new double[] {1.0}, lib, spread, fixed,
                MobilityAdjuster.IDENTITY).matches().get(0);
        PeakMatch mixed = LibraryMatcher.matchRun(mu, new double[] {1.0}, new double[] {0.2}, lib, spread, fixed,
                MobilityAdjuster.IDENTITY).matches().get(0);
        // one peak, two candidates of equal prior: their probabilities stand as their densities. The
        // density of a two-component normal mixture, w·N(r; 0, v_u) + (1 − w)·N(r; 0, v) (McLachlan &
        // Peel, Finite Mixture Models, 2000, eq. 1.1), from Commons Math's normal distribution
        double w = Tolerances.CENTRE_SHAPE_USUAL_WEIGHT;
        double entry = 0.05 * 0.05 + fixed.sdFloor() * fixed.sdFloor();
        NormalDistribution broad = new NormalDistribution(null, 0.0, Math.sqrt(entry + 1.0));
        NormalDistribution usual = new NormalDistribution(null, 0.0, Math.sqrt(entry + 0.04));
        double near = w * usual.density(-0.1) + (1 - w) * broad.density(-0.1);
        double far = w * usual.density(1.1) + (1 - w) * broad.density(1.1);
        assertEquals(near / far, probability(mixed, "Near") / probability(mixed, "Far"), 1e-9 * near / far);
        assertEquals(broad.density(-0.1) / broad.density(1.1),
                probability(plain, "Near") / probability(plain, "Far"), 1e-9, "without the usual SD: one normal");
        assertEquals("Near", mixed.assigned());
        assertTrue(mixed.confidence() > plain.confidence() + 0.2,
                plain.confidence() + " -> " + mixed.confidence());
        assertEquals(plain.candidates().get(0).z(), mixed.candidates().get(0).z(), EXACT,
                "residuals and z stay those of the stated SD");
    }

    @Test
    void aUsualSdEqualToTheStatedOneChangesNothing() {
        Library lib = lib(LibraryEntry.of("Near", -71.1, 0.05), LibraryEntry.of("Far", -72.3, 0.05));
        SpreadModel spread = SpreadModel.of(lib, S);
        double[] mu = {-71.2, -72.0};
        double[] sd = {0.6, 0.3};
        RunMatch plain = LibraryMatcher.matchRun(mu, sd, lib, spread, S, MobilityAdjuster.IDENTITY);
        RunMatch same = LibraryMatcher.matchRun(mu, sd, sd.clone(), lib, spread, S, MobilityAdjuster.IDENTITY);
        assertEquals(plain, same);
    }

    private static double probability(PeakMatch m, String name) {
        return m.candidates().stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow().probability();
    }

    @Test
    void peakFarFromEverythingIsUnassigned() {
        PeakMatch m = one(spreadOut(), S, 10.0, 0.1);
        assertEquals(PeakMatch.none(), m);
        assertEquals(MatchStatus.UNASSIGNED, m.status());
        assertEquals(1.0, m.confidence());
    }

    @Test
    void candidateTooUnlikelyToBeatNoneStaysUnassigned() {
        // A 1000-entry library makes each entry's prior small; a peak 2.5 σ away loses to "none".
        List<LibraryEntry> many = new ArrayList<>();
        for (int k = 0; k < 1000; k++) {
            many.add(LibraryEntry.of("A" + k, 1000.0 + 10 * k, 0.3));
        }
        many.add(LibraryEntry.of("Target", 20.0, 0.3));
        Library lib = new Library(many, "test", List.of());
        PeakMatch m = one(lib, S, 20.75, 0.0);
        assertNull(m.assigned());
        assertEquals(MatchStatus.UNASSIGNED, m.status());
        assertEquals("Target", m.runnerUp());
        assertEquals(1, m.candidates().size());
        double rho = ratio(0.75, 0.0, 0.3, 1001, 1);
        assertEquals(1 / (1 + rho), m.confidence(), EXACT, "confidence of an unassigned peak is P(none)");
        assertEquals(rho / (1 + rho), m.runnerUpProbability(), EXACT);
    }

    @Test
    void optimalAssignmentBeatsGreedy() {
        // A at 10.0 and B at 10.8. Peak 1 (10.05) fits A best, B acceptably; peak 2 (9.5) fits only A.
        Library lib = lib(LibraryEntry.of("A", 10.0, 0.3), LibraryEntry.of("B", 10.8, 0.3));
        double[] mu = {10.05, 9.5};
        double[] sd = {0.0, 0.0};
        double p1a = Math.log(ratio(0.05, 0, 0.3, 2, 2));
        double p1b = Math.log(ratio(-0.75, 0, 0.3, 2, 2));
        double p2a = Math.log(ratio(-0.5, 0, 0.3, 2, 2));
        // Greedy takes the strongest pair (peak 1–A) first and leaves peak 2 without a partner ...
        assertTrue(p1a > p2a && p1a > p1b && p1b > 0 && p2a > 0);
        // ... but peak 1–B plus peak 2–A explains more (larger summed log-likelihood ratio).
        assertTrue(p1b + p2a > p1a);
        List<PeakMatch> m = run(lib, S, mu, sd);
        assertEquals("B", m.get(0).assigned());
        assertEquals("A", m.get(1).assigned());
        assertTrue(m.get(1).candidates().size() == 1, "B lies outside peak 2's window");
    }

    @Test
    void marginalsMatchHandEnumerationForTwoPeaksOneEntry() {
        Library lib = lib(LibraryEntry.of("A", 10.0, 0.3));
        List<PeakMatch> m = run(lib, S, new double[] {10.0, 10.3}, new double[] {0.0, 0.0});
        double r1 = ratio(0.0, 0, 0.3, 1, 2);
        double r2 = ratio(0.3, 0, 0.3, 1, 2);
        // Valid assignments: (none, none) = 1, (A, none) = r1, (none, A) = r2.
        double z = 1 + r1 + r2;
        assertEquals("A", m.get(0).assigned());
        assertNull(m.get(1).assigned(), "one analyte explains at most one peak");
        assertEquals(r1 / z, m.get(0).confidence(), EXACT);
        assertEquals((1 + r1) / z, m.get(1).confidence(), EXACT, "peak 2 is 'none' unless it takes A");
        assertEquals(r2 / z, m.get(1).candidates().get(0).probability(), EXACT);
    }

    @Test
    void perEntryToleranceOverridesTheRule() {
        LibraryEntry wide = new LibraryEntry("Wide", 20.0, 0.3, 0, 0, 5.0, List.of(), List.of(), null,
                Double.NaN, Double.NaN, Double.NaN, null);
        LibraryEntry tight = new LibraryEntry("Tight", -20.0, 0.3, 0, 0, 0.1, List.of(), List.of(), null,
                Double.NaN, Double.NaN, Double.NaN, null);
        Library lib = lib(wide, tight);
        assertEquals(1, one(lib, S, 23.0, 0.1).candidates().size(), "3 units away, inside the 5-unit tolerance");
        assertEquals(0, one(lib(LibraryEntry.of("Wide", 20.0, 0.3)), S, 23.0, 0.1).candidates().size(),
                "outside the default k·σ window (~0.95 units)");
        assertEquals(0, one(lib, S, -20.2, 0.1).candidates().size(), "0.2 away but the entry allows only 0.1");
        assertEquals("Tight", one(lib, S, -20.05, 0.1).assigned());
    }

    @Test
    void absoluteAndRelativeWindows() {
        Library lib = lib(LibraryEntry.of("X", -50.0, 0.5), LibraryEntry.of("Y", 10.0, 0.5));
        MatchSettings abs2 = S.withAbsoluteWindow(2.0);
        assertEquals(1, one(lib, abs2, -51.9, 0.1).candidates().size());
        assertEquals(0, one(lib, abs2, -52.1, 0.1).candidates().size());
        MatchSettings rel = S.withRelativeWindow(0.02);
        assertEquals(1.0, window(lib, 0, 1.0, rel), EXACT, "2 % of 50");
        assertEquals(1, one(lib, rel, -50.95, 0.1).candidates().size());
        assertEquals(0, one(lib, rel, -51.05, 0.1).candidates().size());
        assertEquals(0.5, window(lib, 1, 1.0, rel), EXACT, "2 % of 10 is below the floor");
        assertEquals(1, one(lib, rel, 10.45, 0.1).candidates().size());
        assertEquals(0, one(lib, rel, 10.55, 0.1).candidates().size());
        assertEquals(MatchSettings.WindowRule.ABSOLUTE, MatchSettings.ABSOLUTE.windowRule());
        assertEquals(MatchSettings.WindowRule.RELATIVE, MatchSettings.RELATIVE.windowRule());
        assertEquals(3.0 * 2.0, window(lib, 0, 2.0, S), EXACT, "k = 3 by default");
        assertEquals(0.5, window(lib(LibraryEntry.of("Z", -50.0, 0.1)), 0, 0.1, S), EXACT, "the 0.5-unit floor");
    }

    @Test
    void adjusterIsApplied() {
        LibraryEntry warm = new LibraryEntry("Warm", 30.0, 0.2, 0, 1, Double.NaN, List.of(), List.of(), null,
                Double.NaN, Double.NaN, 35.0, null);
        Library lib = lib(warm);
        MobilityAdjuster toEntryTemperature = (mu, e) -> mu * (1 + 0.02 * (e.temperatureOrDefaultC() - 25.0));
        PeakMatch adjusted = LibraryMatcher.match(new double[] {25.0}, new double[] {0.05}, lib, S, toEntryTemperature).get(0);
        assertEquals("Warm", adjusted.assigned());
        assertEquals(0.0, adjusted.candidates().get(0).residual(), 1e-9, "25 × 1.2 = 30");
        assertNull(one(lib, S, 25.0, 0.05).assigned(), "without conversion the peak is 5 units off");
        MobilityAdjuster unknown = (mu, e) -> Double.NaN;
        assertEquals(PeakMatch.none(), LibraryMatcher.match(new double[] {30.0}, null, lib, S, unknown).get(0));
    }

    @Test
    void unknownInputs() {
        List<PeakMatch> m = run(spreadOut(), S, new double[] {Double.NaN, -42.0}, new double[] {0.1, Double.NaN});
        assertEquals(PeakMatch.none(), m.get(0));
        assertEquals("Acetate", m.get(1).assigned(), "an unknown σ counts as 0");
        assertEquals("Acetate", LibraryMatcher.match(new double[] {-42.0}, null, spreadOut(), S,
                MobilityAdjuster.IDENTITY).get(0).assigned());
        assertEquals(0, run(spreadOut(), S, new double[0], new double[0]).size());
        assertThrows(IllegalArgumentException.class, () -> run(spreadOut(), S, new double[2], new double[1]));
        assertThrows(IllegalArgumentException.class, () -> run(spreadOut(), S, new double[] {1}, new double[] {-1}));
        LibraryEntry noSd = LibraryEntry.of("NoSd", 5.0, Double.NaN);
        double v = S.assumedEntrySd() * S.assumedEntrySd() + S.sdFloor() * S.sdFloor();
        assertEquals(1.0 / Math.sqrt(v), one(lib(noSd), S, 6.0, 0.0).candidates().get(0).z(), EXACT);
    }

    @Test
    void settingsAreValidated() {
        assertThrows(IllegalArgumentException.class, () -> S.withNotInLibraryPrior(0.0));
        assertThrows(IllegalArgumentException.class, () -> S.withNotInLibraryPrior(1.0));
        assertThrows(IllegalArgumentException.class, () -> S.withAbsoluteWindow(-1));
        assertThrows(IllegalArgumentException.class, () -> S.withRelativeWindow(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> S.withAmbiguity(0.0, 0.5));
        assertEquals(0.3, S.withNotInLibraryPrior(0.3).notInLibraryPrior());
    }

    @Test
    void exactMarginalsAgreeWithBruteForce() {
        Random rnd = new Random(7);
        for (int trial = 0; trial < 200; trial++) {
            int peaks = 1 + rnd.nextInt(5);
            int entries = 1 + rnd.nextInt(5);
            int[][] entryOf = new int[peaks][];
            double[][] logW = new double[peaks][];
            for (int t = 0; t < peaks; t++) {
                List<Integer> es = new ArrayList<>();
                for (int e = 0; e < entries; e++) {
                    if (rnd.nextDouble() < 0.6) {
                        es.add(e);
                    }
                }
                entryOf[t] = es.stream().mapToInt(Integer::intValue).toArray();
                logW[t] = new double[es.size()];
                for (int k = 0; k < es.size(); k++) {
                    logW[t][k] = rnd.nextGaussian() * 3;
                }
            }
            double[][] fast = AssignmentMarginals.compute(entryOf, logW, LibraryMatcher.MAX_STATES);
            double[][] slow = bruteForce(entryOf, logW);
            for (int t = 0; t < peaks; t++) {
                for (int k = 0; k < slow[t].length; k++) {
                    assertEquals(slow[t][k], fast[t][k], 1e-9, "trial " + trial + " peak " + t + " option " + k);
                }
            }
        }
    }

    /** Sums the product of weights over every one-to-one assignment, by enumeration. */
    private static double[][] bruteForce(int[][] entryOf, double[][] logW) {
        int peaks = entryOf.length;
        double[][] acc = new double[peaks][];
        for (int t = 0; t < peaks; t++) {
            acc[t] = new double[entryOf[t].length + 1];
        }
        int[] choice = new int[peaks];
        enumerate(0, choice, entryOf, logW, acc);
        for (double[] a : acc) {
            double z = 0;
            for (double v : a) {
                z += v;
            }
            for (int k = 0; k < a.length; k++) {
                a[k] /= z;
            }
        }
        return acc;
    }

    private static void enumerate(int t, int[] choice, int[][] entryOf, double[][] logW, double[][] acc) {
        if (t == entryOf.length) {
            double w = 1;
            for (int i = 0; i < choice.length; i++) {
                w *= choice[i] == 0 ? 1.0 : Math.exp(logW[i][choice[i] - 1]);
            }
            for (int i = 0; i < choice.length; i++) {
                acc[i][choice[i]] += w;
            }
            return;
        }
        for (int option = 0; option <= entryOf[t].length; option++) {
            boolean free = true;
            for (int i = 0; i < t && option > 0; i++) {
                if (choice[i] > 0 && entryOf[i][choice[i] - 1] == entryOf[t][option - 1]) {
                    free = false;
                }
            }
            if (free) {
                choice[t] = option;
                enumerate(t + 1, choice, entryOf, logW, acc);
            }
        }
    }

    @Test
    void approximationWhenTheExactSumIsTooLarge() {
        Library lib = lib(LibraryEntry.of("A", 10.0, 0.3), LibraryEntry.of("B", 10.8, 0.3));
        double[] mu = {10.05, 9.5};
        double[] sd = {0.0, 0.0};
        List<PeakMatch> exact = run(lib, S, mu, sd);
        List<PeakMatch> approx = LibraryMatcher.match(mu, sd, lib, S, MobilityAdjuster.IDENTITY, 1);
        for (int i = 0; i < 2; i++) {
            assertEquals(exact.get(i).assigned(), approx.get(i).assigned(), "the assignment itself is exact");
        }
        // Peak 1's own posterior without A (taken by peak 2): ρ_B / (1 + ρ_B).
        double rb = ratio(-0.75, 0, 0.3, 2, 2);
        assertEquals(rb / (1 + rb), approx.get(0).confidence(), EXACT);
    }

    @Test
    void largeDenseRunIsOneToOne() {
        // 300 entries every 0.5 units, 150 peaks: the candidate windows overlap heavily.
        List<LibraryEntry> es = new ArrayList<>();
        for (int k = 0; k < 300; k++) {
            es.add(LibraryEntry.of("E" + k, -75.0 + 0.5 * k, 0.3));
        }
        Library lib = new Library(es, "test", List.of());
        Random rnd = new Random(3);
        double[] mu = new double[150];
        double[] sd = new double[150];
        for (int i = 0; i < mu.length; i++) {
            mu[i] = es.get(2 * i).mobility() + 0.3 * rnd.nextGaussian();
            sd[i] = 0.1;
        }
        List<PeakMatch> m = run(lib, S, mu, sd);
        java.util.Set<String> used = new java.util.HashSet<>();
        for (PeakMatch p : m) {
            double total = 0;
            for (Candidate c : p.candidates()) {
                total += c.probability();
            }
            assertTrue(total <= 1 + 1e-9, "probabilities of one peak sum to at most 1");
            if (p.assigned() != null) {
                assertTrue(used.add(p.assigned()), "analyte assigned twice: " + p.assigned());
            }
        }
    }
}
