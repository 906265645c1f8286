package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class SnipBaselineTest {

    private static final double STEP_S = 0.1;
    private static final double SIGMA_S = 2.0;
    /** Gaussian identity: w½ = 2√(2 ln 2) σ = 2.3548 σ. */
    private static final double WIDTH_S = 2 * Math.sqrt(2 * Math.log(2)) * SIGMA_S;

    private static double maxDeviation(double[] a, double[] b) {
        double worst = 0;
        for (int i = 0; i < a.length; i++) {
            worst = Math.max(worst, Math.abs(a[i] - b[i]));
        }
        return worst;
    }

    private static double[] peaks(double[] t) {
        double[] y = new double[t.length];
        for (int k = 1; k <= 5; k++) {
            Synthetic.addGaussian(t, y, 100 * k, 10.0, SIGMA_S);
        }
        return y;
    }

    @Test
    void followsLinearDriftUnderPeaks() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 6000);
        double[] drift = new double[t.length];
        Synthetic.addDrift(t, drift, 3, 0.02, 0);
        double[] y = peaks(t);
        Synthetic.addDrift(t, y, 3, 0.02, 0);
        double[] base = SnipBaseline.estimate(t, y, WIDTH_S, STEP_S);
        // peaks of height 10: the baseline under them stays within 0.2 % of the height
        assertEquals(0.0, maxDeviation(base, drift), 0.02);
    }

    @Test
    void followsCurvedDriftUnderPeaks() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 6000);
        double[] drift = new double[t.length];
        Synthetic.addDrift(t, drift, 3, 0.05, -1e-4); // concave: rises 15, falls back by 36 − 30
        double[] convex = new double[t.length];
        Synthetic.addDrift(t, convex, 3, -0.05, 1e-4);
        double[] y = peaks(t);
        Synthetic.addDrift(t, y, 3, 0.05, -1e-4);
        double[] base = SnipBaseline.estimate(t, y, WIDTH_S, STEP_S);
        // a drift bending by 36 units over the run, peaks of 10: within 1 % of the height
        assertEquals(0.0, maxDeviation(base, drift), 0.1);
        double[] y2 = peaks(t);
        Synthetic.addDrift(t, y2, 3, -0.05, 1e-4);
        assertEquals(0.0, maxDeviation(SnipBaseline.estimate(t, y2, WIDTH_S, STEP_S), convex), 0.1);
    }

    @Test
    void sitsInTheMiddleOfTheNoise() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 6000);
        double[] y = peaks(t);
        Synthetic.addNoise(y, 0.1, 21);
        double[] base = SnipBaseline.estimate(t, y, WIDTH_S, STEP_S);
        double mean = 0;
        for (double b : base) {
            mean += b;
        }
        mean /= base.length;
        // the true baseline is 0; a clipped baseline without re-centring would sit about 0.1 below
        assertEquals(0.0, mean, 0.02);
    }

    @Test
    void irregularSamplingGivesTheSameBaseline() {
        double[] t = Synthetic.jitteredTimes(0, STEP_S, 6000, 0.4, 8);
        double[] drift = new double[t.length];
        Synthetic.addDrift(t, drift, 3, 0.02, -2e-5);
        double[] y = peaks(t);
        Synthetic.addDrift(t, y, 3, 0.02, -2e-5);
        assertEquals(0.0, maxDeviation(SnipBaseline.estimate(t, y, WIDTH_S, STEP_S), drift), 0.02);
    }

    @Test
    void clipCutsATriangleToItsChord() {
        // hand-checked: the pass with p = 2 gives (0, 0, 0.5, 0, 0.5, 0, 0), the pass with p = 1 zero
        double[] v = {0, 0, 1, 2, 1, 0, 0};
        assertArrayEquals(new double[] {0, 0, 0, 0, 0, 0, 0}, SnipBaseline.clip(v, 2), 1e-15);
    }
}
