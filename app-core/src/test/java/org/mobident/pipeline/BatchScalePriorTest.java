package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.settings.ScalePrior;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

/** The batch-learned scale prior: the DerSimonian–Laird random-effects estimate, worked by hand. */
class BatchScalePriorTest {

    @Test
    void randomEffectsEstimateMatchesTheHandWorkedExample() {
        // five runs, a = 1.00, 1.02, 0.98, 1.01, 0.99, each ± 0.01 (DerSimonian & Laird 1986):
        // w = 1/0.01² = 10000 each; fixed mean 1.00; Q = 10000·(0 + 4 + 4 + 1 + 1)·1e-4 = 10;
        // τ² = (Q − (k − 1)) / (Σw − Σw²/Σw) = 6 / (50000 − 10000) = 1.5e-4;
        // random-effects weights 1/(1e-4 + 1.5e-4) = 4000 each, mean 1.00, SE² = 1/20000 = 5e-5;
        // spread of the prior √(τ² + SE²) = √2e-4 = 0.014142
        double[] r = BatchScalePrior.randomEffects(List.of(new double[] {1.00, 0.01}, new double[] {1.02, 0.01},
                new double[] {0.98, 0.01}, new double[] {1.01, 0.01}, new double[] {0.99, 0.01}));
        assertEquals(1.00, r[0], 1e-12);
        assertEquals(Math.sqrt(2e-4), r[1], 1e-12);
    }

    @Test
    void runsThatAgreeBetterThanTheirErrorsGiveNoBetweenRunSpread() {
        // Q below its expectation k − 1: τ² = 0, only the standard error of the mean remains
        double[] r = BatchScalePrior.randomEffects(List.of(new double[] {1.001, 0.01}, new double[] {0.999, 0.01},
                new double[] {1.000, 0.01}));
        assertEquals(1.0, r[0], 1e-12);
        assertEquals(Math.sqrt(1e-4 / 3), r[1], 1e-12);
    }

    @Test
    void runsThatScatterWidelyWidenThePriorUpToHalfItsBound() {
        // a = 1.00, 1.06, 0.94, 1.03, 0.97, each ± 0.01 (capillaries up to 2.6 K off):
        // Q = 10000·(0 + 36 + 36 + 9 + 9)·1e-4 = 90; τ² = (90 − 4) / 40000 = 0.00215;
        // SE² = (1e-4 + 0.00215) / 5 = 0.00045; √(τ² + SE²) = √0.0026 = 0.05099
        double[] r = BatchScalePrior.randomEffects(List.of(new double[] {1.00, 0.01}, new double[] {1.06, 0.01},
                new double[] {0.94, 0.01}, new double[] {1.03, 0.01}, new double[] {0.97, 0.01}));
        assertEquals(Math.sqrt(0.0026), r[1], 1e-12);
        // the default prior: SD 0.02, bound ±0.06 → at most 0.03
        assertEquals(0.03, BatchScalePrior.learnedFactorSd(r[1], ScalePrior.DEFAULT), 1e-15);
        assertEquals(0.025, BatchScalePrior.learnedFactorSd(0.025, ScalePrior.DEFAULT), 1e-15);
        assertEquals(BatchScalePrior.MIN_FACTOR_SD, BatchScalePrior.learnedFactorSd(1e-4, ScalePrior.DEFAULT), 0.0);
        // a settings prior wider than half its bound is never narrowed from above
        ScalePrior wide = new ScalePrior(1.0, 0.0, 0.04, 0.5, 0.06, 3.0);
        assertEquals(0.04, BatchScalePrior.learnedFactorSd(0.05, wide), 1e-15);
    }

    @Test
    void aNewRunIsPredictedWithStudentsTForTheRunsLearnedFrom() {
        // Student t table, two-sided 95 %: t(3) = 3.182, t(48) = 2.011; z = 1.960 (any statistics
        // handbook, e.g. Fisher & Yates, Statistical Tables, table III; from memory)
        assertEquals(3.182 / 1.960, BatchScalePrior.predictionWidening(5), 0.001);
        assertEquals(2.011 / 1.960, BatchScalePrior.predictionWidening(50), 0.001);
        // the five runs of the hand-worked example: the spread √2e-4 widened by t(3)/z
        List<RunResult> runs = new ArrayList<>();
        double[] factors = {1.00, 1.02, 0.98, 1.01, 0.99};
        for (int k = 0; k < factors.length; k++) {
            RunSpec spec = new RunSpec("r" + k, Path.of("r" + k + ".csv"), RunConditions.EMPTY, "runs.csv", k + 2);
            RunScale scale = new RunScale(RunScale.Status.FITTED, factors[k], 0.01, 0.0, 0.2, 0.0, 4);
            runs.add(new RunResult(spec, null, "", 40.0, null, List.of(), List.of(), 0.01, scale, 1.0));
        }
        ScalePrior learned = BatchScalePrior.learn(runs, ScalePrior.DEFAULT).orElseThrow().prior();
        assertEquals(1.00, learned.factorCentre(), 1e-12);
        assertEquals(Math.sqrt(2e-4) * 3.182 / 1.960, learned.factorSd(), 2e-5);
    }
}
