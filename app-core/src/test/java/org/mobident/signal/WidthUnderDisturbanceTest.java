package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The typical width of a run's zones must not follow a large disturbance at its start (the
 * swing of the voltage switching on, or of the injection). The zones are Gaussians of SD σ, whose
 * width at half height is 2√(2 ln 2)·σ = 2.3548σ (the definition of the normal density).
 */
class WidthUnderDisturbanceTest {

    private static final double SIGMA_S = 0.85;
    private static final double NOISE_SD = 0.002;

    /** A 600 s run at 50 Hz (30,001 samples) with six zones of SD 0.85 s, heights 20-120 noise SDs. */
    private static double[][] run(boolean disturbed) {
        double[] t = Synthetic.regularTimes(0, 0.02, 30_001);
        double[] y = new double[t.length];
        double[] apexes = {220, 240, 255, 300, 320, 560};
        for (int k = 0; k < apexes.length; k++) {
            Synthetic.addGaussian(t, y, apexes[k], (20 + 20 * k) * NOISE_SD, SIGMA_S);
        }
        if (disturbed) {
            // a swing up and down within the first 12 s, 2,000 noise SDs each way, steep on its flanks
            Synthetic.addGaussian(t, y, 4.0, 2000 * NOISE_SD, 1.0);
            Synthetic.addGaussian(t, y, 8.0, -1600 * NOISE_SD, 1.5);
        }
        Synthetic.addNoise(y, NOISE_SD, 17);
        return new double[][] {t, y};
    }

    @Test
    void aSwingAtTheStartLeavesTheTypicalWidthNearTheZones() {
        double expected = 2.3548 * SIGMA_S;
        double[][] plain = run(false);
        double[][] disturbed = run(true);
        double wPlain = PeakWidthEstimator.typicalWidthS(plain[0], plain[1], NOISE_SD, 0.02);
        double wDisturbed = PeakWidthEstimator.typicalWidthS(disturbed[0], disturbed[1], NOISE_SD, 0.02);
        assertEquals(expected, wPlain, 0.15 * expected, "without the swing");
        // the swing's own two excursions may join the six zones' widths in the median, never the
        // teeth a stepwise background once cut into its steep flanks (about 0.08 s wide)
        assertTrue(wDisturbed > 0.75 * expected && wDisturbed < 1.5 * expected,
                () -> "with the swing: " + wDisturbed + " s, zones " + expected + " s");
    }
}
