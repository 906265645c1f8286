package org.mobident.pipeline;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.settings.ScalePrior;

/**
 * Learns from a batch of runs in one buffer how far their mobility scales scatter, so that a run
 * with too few peaks to pin its own scale borrows the certainty of the others (empirical Bayes).
 *
 * <p>Each run whose scale was fitted from at least {@value #MIN_ANCHORS} matched peaks gives an
 * estimate a_r with standard error s_r (likewise b). Their spread between runs, τ², is estimated
 * by the random-effects method of moments of DerSimonian &amp; Laird (Control. Clin. Trials 7 (1986)
 * 177): with weights w_r = 1/s_r², the weighted mean m and Q = Σ w_r (a_r − m)²,
 * τ² = max(0, (Q − (k − 1)) / (Σw − Σw²/Σw)). The prior for every run of the buffer is then
 * centred on the random-effects mean (weights 1/(s_r² + τ²)), with a standard deviation of
 * √(τ² + SE²) (SE the standard error of that mean), widened for a new run as the prediction
 * interval of Higgins et al. (2009) widens it ({@link #predictionWidening}: a spread learned from five
 * runs is itself uncertain, and a run a kelvin off must not be pulled to the others), but never
 * below {@link #MIN_FACTOR_SD} and {@link #MIN_OFFSET_SD}. The spread of b never exceeds the settings' own prior; that of a may,
 * up to {@value #MAX_FACTOR_SD_SHARE_OF_BOUND} of the plausible bound on |a − 1| (so the bound
 * stays two SDs out): runs whose capillaries scatter by ±2.5 K (±6 % on every mobility) must not
 * be read against a prior that allows ±0.9 K, or a run far off reads its pattern shifted by one
 * library entry with high confidence. At least {@value #MIN_RUNS} such runs are needed.
 */
final class BatchScalePrior {

    /** Fewest runs with a fitted scale before a buffer's prior is learned. */
    static final int MIN_RUNS = 5;
    /** Fewest expected matched peaks of a run whose fitted scale is used. */
    static final double MIN_ANCHORS = 3.0;
    /** Smallest learned SD of a: 0.2 %, about 0.1 K of capillary temperature (a modelling choice). */
    static final double MIN_FACTOR_SD = 0.002;
    /** Smallest learned SD of b, mobility units (a modelling choice: the marker's own timing error). */
    static final double MIN_OFFSET_SD = 0.15;
    /** The learned SD of a is at most this share of the prior's bound on |a − 1| (or the settings'
     *  own SD when that is larger; a modelling choice: the bound then lies two SDs out). */
    static final double MAX_FACTOR_SD_SHARE_OF_BOUND = 0.5;

    /**
     * A prior learned from a batch.
     *
     * @param prior the prior for the buffer's runs
     * @param runs  how many runs it was learned from
     */
    record Learned(ScalePrior prior, int runs) {
        String describe() {
            return String.format(Locale.ROOT, "prior learned from %d runs of this buffer in the batch: "
                            + "a = %.4f ± %.4f, b = %+.2f ± %.2f", runs,
                    prior.factorCentre(), prior.factorSd(), prior.offsetCentre(), prior.offsetSd());
        }
    }

    private BatchScalePrior() {
    }

    /** The prior learned from {@code runs} (one buffer), or empty when too few of them pin their scale. */
    static Optional<Learned> learn(List<RunResult> runs, ScalePrior base) {
        List<double[]> a = new ArrayList<>();
        List<double[]> b = new ArrayList<>();
        for (RunResult r : runs) {
            RunScale s = r.runScale();
            if (r.failed() || !s.fitted() || s.anchors() < MIN_ANCHORS) {
                continue;
            }
            a.add(new double[] {s.factor(), s.factorSd()});
            b.add(new double[] {s.offset(), s.offsetSd()});
        }
        if (a.size() < MIN_RUNS) {
            return Optional.empty();
        }
        double[] fa = randomEffects(a);
        double[] fb = randomEffects(b);
        double widen = predictionWidening(a.size());
        double sdA = learnedFactorSd(widen * fa[1], base);
        double sdB = Math.min(base.offsetSd(), Math.max(MIN_OFFSET_SD, widen * fb[1]));
        return Optional.of(new Learned(base.centredOn(fa[0], sdA, fb[0], sdB), a.size()));
    }

    /**
     * The factor that widens √(τ² + SE²) into the spread of a new run's value learned from k runs:
     * the random-effects prediction interval of Higgins, Thompson &amp; Spiegelhalter (J. R. Stat. Soc. A
     * 172 (2009) 137) is m ± t(0.975, k − 2)·√(τ² + SE²), as τ² itself comes from few runs; a normal
     * prior of the same 95 % width has the SD times t(0.975, k − 2)/z(0.975) (1.62 for five runs, 1.03
     * for fifty).
     */
    static double predictionWidening(int runs) {
        if (runs < 3) {
            throw new IllegalArgumentException("a prediction needs at least three runs, got " + runs);
        }
        double t = new TDistribution(null, runs - 2).inverseCumulativeProbability(0.975);
        double z = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.975);
        return t / z;
    }

    /** The prior's SD of a from the batch's spread: at least {@link #MIN_FACTOR_SD}, at most the larger
     *  of the settings' own SD and {@value #MAX_FACTOR_SD_SHARE_OF_BOUND} of the bound on |a − 1|. */
    static double learnedFactorSd(double spread, ScalePrior base) {
        double most = Math.max(base.factorSd(), MAX_FACTOR_SD_SHARE_OF_BOUND * base.maxFactorDeviation());
        return Math.min(most, Math.max(MIN_FACTOR_SD, spread));
    }

    /**
     * {random-effects mean, √(τ² + SE²)} of estimates {value, standard error} (DerSimonian &amp; Laird 1986).
     */
    static double[] randomEffects(List<double[]> estimates) {
        int k = estimates.size();
        double sw = 0;
        double sw2 = 0;
        double swx = 0;
        for (double[] e : estimates) {
            double w = 1.0 / Math.max(e[1] * e[1], Double.MIN_NORMAL);
            sw += w;
            sw2 += w * w;
            swx += w * e[0];
        }
        double fixed = swx / sw;
        double q = 0;
        for (double[] e : estimates) {
            double w = 1.0 / Math.max(e[1] * e[1], Double.MIN_NORMAL);
            q += w * (e[0] - fixed) * (e[0] - fixed);
        }
        double tau2 = Math.max(0.0, (q - (k - 1)) / (sw - sw2 / sw));
        double rw = 0;
        double rwx = 0;
        for (double[] e : estimates) {
            double w = 1.0 / (e[1] * e[1] + tau2);
            rw += w;
            rwx += w * e[0];
        }
        return new double[] {rwx / rw, Math.sqrt(tau2 + 1.0 / rw)};
    }
}
