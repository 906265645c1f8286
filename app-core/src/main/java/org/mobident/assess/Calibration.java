package org.mobident.assess;

import java.util.ArrayList;
import java.util.List;

/**
 * How well stated confidences agree with how often the statements were right.
 *
 * <ul>
 *   <li><b>Reliability table</b>: the predictions in {@link #BINS} equal-width confidence bins
 *       [0, 0.1), [0.1, 0.2), …, [0.9, 1] with their count, mean confidence and observed accuracy.</li>
 *   <li><b>Expected calibration error</b> ECE = Σ_b (n_b / N) · |acc_b − conf_b| over those bins
 *       (Naeini, Cooper &amp; Hauskrecht, AAAI 2015; Guo, Pleiss, Sun &amp; Weinberger, ICML 2017).</li>
 *   <li><b>Brier score</b> = (1/N) · Σ_i (p_i − o_i)², with p_i the stated confidence and o_i 1 when the
 *       statement was right, 0 otherwise (Brier, Monthly Weather Review 78 (1950) 1–3, for the one event
 *       "the statement is right"; Brier's two-class sum counts each prediction twice and is twice this).</li>
 * </ul>
 *
 * @param count          number of predictions N
 * @param meanConfidence mean stated confidence (NaN when N = 0)
 * @param accuracy       fraction right (NaN when N = 0)
 * @param ece            expected calibration error (NaN when N = 0)
 * @param brier          Brier score (NaN when N = 0)
 * @param bins           the reliability table, always {@link #BINS} bins
 */
public record Calibration(int count, double meanConfidence, double accuracy, double ece, double brier,
                          List<ReliabilityBin> bins) {

    /** Number of equal-width confidence bins of the reliability table. */
    public static final int BINS = 10;

    public Calibration {
        bins = List.copyOf(bins);
    }

    /**
     * The calibration of a set of predictions.
     *
     * @param confidence stated probabilities, each in [0, 1]
     * @param right      whether each prediction was right
     */
    public static Calibration of(double[] confidence, boolean[] right) {
        if (confidence.length != right.length) {
            throw new IllegalArgumentException("one outcome per confidence is needed");
        }
        int n = confidence.length;
        int[] count = new int[BINS];
        double[] sumConfidence = new double[BINS];
        int[] rightInBin = new int[BINS];
        double sumAll = 0;
        int rightAll = 0;
        double squares = 0;
        for (int i = 0; i < n; i++) {
            double p = confidence[i];
            if (!(p >= 0 && p <= 1)) {
                throw new IllegalArgumentException("a confidence lies in [0, 1], got " + p);
            }
            int b = bin(p);
            int outcome = right[i] ? 1 : 0;
            count[b]++;
            sumConfidence[b] += p;
            rightInBin[b] += outcome;
            sumAll += p;
            rightAll += outcome;
            squares += (p - outcome) * (p - outcome);
        }
        List<ReliabilityBin> bins = new ArrayList<>(BINS);
        double ece = 0;
        for (int b = 0; b < BINS; b++) {
            double meanConfidence = count[b] == 0 ? Double.NaN : sumConfidence[b] / count[b];
            double accuracy = count[b] == 0 ? Double.NaN : (double) rightInBin[b] / count[b];
            bins.add(new ReliabilityBin((double) b / BINS, (double) (b + 1) / BINS, count[b], meanConfidence, accuracy));
            if (count[b] > 0) {
                ece += (double) count[b] / n * Math.abs(accuracy - meanConfidence);
            }
        }
        if (n == 0) {
            return new Calibration(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, bins);
        }
        return new Calibration(n, sumAll / n, (double) rightAll / n, ece, squares / n, bins);
    }

    /** The bin of a confidence: ⌊p · BINS⌋, with p = 1 in the last bin. */
    static int bin(double p) {
        return Math.min(BINS - 1, (int) Math.floor(p * BINS));
    }
}
