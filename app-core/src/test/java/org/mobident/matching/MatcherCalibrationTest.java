package org.mobident.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.PeakMatch;
import org.mobident.settings.MatchSettings;
import org.opentest4j.AssertionFailedError;

/**
 * Calibration of the reported confidences: among assignments reported with confidence near c,
 * a fraction of about c must be right.
 *
 * <p>Simulated runs (fixed seeds): libraries of 10–30 analytes with mobilities spread over −80 …
 * +70 units, about 30 % of them in near-coeluting pairs 0.5–2 units from another analyte,
 * between-run spreads of 0.15–0.8 units; each library mean is itself the mean of n = 3–10 earlier
 * runs. In every run some analytes are absent, each present analyte gives one peak with noise of
 * its spread plus the peak's own stated measurement uncertainty (0.05–0.3 units), and some peaks
 * are substances that are not in the library. One scenario follows the matcher's stated
 * assumptions (see {@link #AS_MODELLED}); the other bends them (see {@link #BENT}) with the
 * default settings unchanged.
 */
class MatcherCalibrationTest {

    /** Allowed gap between mean confidence and observed accuracy in a bin (from the requirement). */
    private static final double CALIBRATION_TOLERANCE = 0.08;
    /** Fewest assignments in a bin for its accuracy to be judged (binomial SE ≤ 0.035 at 200). */
    private static final int MIN_BIN_COUNT = 200;
    private static final int RUNS = 2500;
    private static final double NEAR_PAIR_FRACTION = 0.3;

    /** One simulated peak with its truth. */
    private record Truth(double mobility, double sd, String analyte) {
    }

    private static final class Bins {
        final double[] edges;
        final int[] count;
        final int[] right;
        final double[] confidenceSum;

        Bins(double... edges) {
            this.edges = edges;
            count = new int[edges.length - 1];
            right = new int[edges.length - 1];
            confidenceSum = new double[edges.length - 1];
        }

        void add(double confidence, boolean correct) {
            for (int b = 0; b < count.length; b++) {
                boolean last = b == count.length - 1;
                if (confidence >= edges[b] && (confidence < edges[b + 1] || (last && confidence <= edges[b + 1]))) {
                    count[b]++;
                    confidenceSum[b] += confidence;
                    right[b] += correct ? 1 : 0;
                }
            }
        }

        int judged(String what, StringBuilder report) {
            int judged = 0;
            for (int b = 0; b < count.length; b++) {
                if (count[b] == 0) {
                    continue;
                }
                double mean = confidenceSum[b] / count[b];
                double accuracy = (double) right[b] / count[b];
                report.append(String.format("%s [%.2f, %.2f): n=%d mean confidence %.3f, accuracy %.3f%n",
                        what, edges[b], edges[b + 1], count[b], mean, accuracy));
                if (count[b] >= MIN_BIN_COUNT) {
                    judged++;
                    assertEquals(mean, accuracy, CALIBRATION_TOLERANCE,
                            what + " bin [" + edges[b] + ", " + edges[b + 1] + ")\n" + report);
                }
            }
            return judged;
        }
    }

    /**
     * How runs are simulated.
     *
     * @param presentFraction  chance that a library analyte is in the sample
     * @param foreignPerPeak   foreign peaks per library peak, on average
     * @param foreignLow       foreign peaks are uniform over [foreignLow, foreignHigh]
     * @param foreignHigh      see foreignLow
     * @param estimatedSpreads library spreads are the sample SDs of the library's n runs (as in a
     *                         real library) rather than the true spread
     */
    private record Scenario(double presentFraction, double foreignPerPeak, double foreignLow, double foreignHigh,
                            boolean estimatedSpreads) {
    }

    /**
     * The matcher's assumptions: a quarter of the analytes absent, a fifth of the peaks foreign and
     * spread over 200 units, library spreads being sample SDs of the library's n runs.
     */
    private static final Scenario AS_MODELLED = new Scenario(0.75, 0.25, -100.0, 100.0, true);

    /**
     * Assumptions bent: fewer analytes present, more foreign peaks crowded into the library's range
     * (density about 1/150 instead of 1/200).
     */
    private static final Scenario BENT = new Scenario(0.6, 0.3, -80.0, 70.0, true);

    @Test
    void confidenceIsCalibratedWhenTheModelHolds() {
        check(AS_MODELLED, 20240611L);
    }

    /**
     * The assignment confidences must hold up; the probabilities of "none" follow the user's
     * prior fraction of unknown peaks, which this scenario deliberately gets wrong, so they are
     * not judged here.
     */
    @Test
    void assignmentConfidenceStaysCalibratedWhenAssumptionsAreBent() {
        check(BENT, 7L, false);
    }

    private static void check(Scenario scenario, long seed) {
        check(scenario, seed, true);
    }

    private static void check(Scenario scenario, long seed, boolean judgeNone) {
        Bins assigned = new Bins(0.3, 0.5, 0.7, 0.9, 1.0);
        Bins unassigned = new Bins(0.0, 0.3, 0.5, 0.7, 0.9, 1.0);
        Bins overstated = new Bins(0.3, 0.5, 0.7, 0.9, 1.0);
        Random rnd = new Random(seed);
        for (int r = 0; r < RUNS; r++) {
            simulateRun(scenario, rnd, assigned, unassigned, overstated);
        }
        // The check must be able to fail: the same assignments with confidence c reported as √c.
        assertThrows(AssertionFailedError.class, () -> overstated.judged("overstated", new StringBuilder()));
        StringBuilder report = new StringBuilder();
        int judgedAssigned = assigned.judged("assigned", report);
        assertTrue(judgedAssigned >= 3, "the 0.5–0.7, 0.7–0.9 and 0.9–1.0 bins must all be judged\n" + report);
        if (judgeNone) {
            int judgedUnassigned = unassigned.judged("unassigned (P none)", report);
            assertTrue(judgedUnassigned >= 1, report.toString());
        }
    }

    private static void simulateRun(Scenario sc, Random rnd, Bins assigned, Bins unassigned, Bins overstated) {
        int m = 10 + rnd.nextInt(21);
        List<LibraryEntry> entries = new ArrayList<>();
        double[] trueMobility = new double[m];
        double[] trueSpread = new double[m];
        for (int j = 0; j < m; j++) {
            if (j > 0 && rnd.nextDouble() < NEAR_PAIR_FRACTION) {
                double gap = 0.5 + 1.5 * rnd.nextDouble();
                trueMobility[j] = trueMobility[rnd.nextInt(j)] + (rnd.nextBoolean() ? gap : -gap);
            } else {
                trueMobility[j] = -80.0 + 150.0 * rnd.nextDouble();
            }
            trueSpread[j] = 0.15 + 0.65 * rnd.nextDouble();
            int n = 3 + rnd.nextInt(8);
            double sum = 0;
            double sumSq = 0;
            for (int k = 0; k < n; k++) {
                double x = trueSpread[j] * rnd.nextGaussian();
                sum += x;
                sumSq += x * x;
            }
            double stated = trueMobility[j] + sum / n;
            double spread = sc.estimatedSpreads() ? Math.sqrt((sumSq - sum * sum / n) / (n - 1)) : trueSpread[j];
            entries.add(new LibraryEntry("A" + j, stated, spread, n, 0, Double.NaN, List.of(), List.of(),
                    null, Double.NaN, Double.NaN, Double.NaN, null));
        }
        Library library = new Library(entries, "simulated", List.of());

        List<Truth> peaks = new ArrayList<>();
        for (int j = 0; j < m; j++) {
            if (rnd.nextDouble() < sc.presentFraction()) {
                double peakSd = 0.05 + 0.25 * rnd.nextDouble();
                double observed = trueMobility[j] + trueSpread[j] * rnd.nextGaussian()
                        + peakSd * rnd.nextGaussian();
                peaks.add(new Truth(observed, peakSd, entries.get(j).name()));
            }
        }
        int present = peaks.size();
        for (int k = 0; k < 2 * present; k++) {
            if (rnd.nextDouble() < sc.foreignPerPeak() / 2) {
                double peakSd = 0.05 + 0.25 * rnd.nextDouble();
                double mu = sc.foreignLow() + (sc.foreignHigh() - sc.foreignLow()) * rnd.nextDouble();
                peaks.add(new Truth(mu, peakSd, null));
            }
        }
        Collections.shuffle(peaks, rnd);

        double[] mu = new double[peaks.size()];
        double[] sd = new double[peaks.size()];
        for (int i = 0; i < mu.length; i++) {
            mu[i] = peaks.get(i).mobility();
            sd[i] = peaks.get(i).sd();
        }
        List<PeakMatch> matches = LibraryMatcher.match(mu, sd, library, MatchSettings.DEFAULT, MobilityAdjuster.IDENTITY);
        for (int i = 0; i < mu.length; i++) {
            PeakMatch pm = matches.get(i);
            String truth = peaks.get(i).analyte();
            if (pm.assigned() != null) {
                assigned.add(pm.confidence(), pm.assigned().equals(truth));
                overstated.add(Math.sqrt(pm.confidence()), pm.assigned().equals(truth));
            } else if (!pm.candidates().isEmpty()) {
                unassigned.add(pm.confidence(), truth == null);
            }
        }
    }
}
