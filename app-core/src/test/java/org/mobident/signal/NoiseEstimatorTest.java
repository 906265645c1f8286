package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;

class NoiseEstimatorTest {

    @Test
    void sdOfWhiteNoiseWithinTenPercent() {
        double sd = 0.3;
        double[] y = new double[20_000];
        Synthetic.addNoise(y, sd, 11);
        assertEquals(sd, NoiseEstimator.robustSd(y), 0.10 * sd);
    }

    @Test
    void sdIgnoresDriftAndPeaks() {
        double sd = 0.05;
        double[] t = Synthetic.regularTimes(0, 0.1, 20_000);
        double[] y = new double[t.length];
        Synthetic.addDrift(t, y, 50, 0.01, -2e-6);
        for (int k = 1; k <= 15; k++) {
            Synthetic.addGaussian(t, y, 120 * k, 5.0, 2.0);
        }
        Synthetic.addNoise(y, sd, 12);
        assertEquals(sd, NoiseEstimator.robustSd(y), 0.10 * sd);
    }

    @Test
    void expectedRangeOfNormalSamples() {
        // n = 2: E|X1 − X2| = 2/√π exactly (difference of two standard normals has SD √2)
        assertEquals(2 / Math.sqrt(Math.PI), NoiseEstimator.expectedNormalRange(2), 1e-9);
        // control-chart constant d2 (Tippett 1925; ASTM E2587 table; from memory)
        assertEquals(2.326, NoiseEstimator.expectedNormalRange(5), 1e-3);
        assertEquals(3.078, NoiseEstimator.expectedNormalRange(10), 1e-3);
        assertEquals(3.735, NoiseEstimator.expectedNormalRange(20), 1e-3);
        assertThrows(IllegalArgumentException.class, () -> NoiseEstimator.expectedNormalRange(1));
    }

    @Test
    void simulatedPeakToPeakMatchesTheExpectedRange() {
        // mean range of 400 windows of 200 white-noise samples against d2(200)·σ
        Random random = new Random(5);
        int windows = 400;
        int size = 200;
        double total = 0;
        for (int w = 0; w < windows; w++) {
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < size; i++) {
                double v = random.nextGaussian();
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
            total += max - min;
        }
        double expected = NoiseEstimator.expectedNormalRange(size);
        assertEquals(expected, total / windows, 0.03 * expected);
    }

    @Test
    void tooShortGivesZero() {
        assertEquals(0.0, NoiseEstimator.robustSd(new double[] {1, 2}));
    }
}
