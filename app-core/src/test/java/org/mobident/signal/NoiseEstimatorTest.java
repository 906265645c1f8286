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
    void expectedRangeForLargeSamplesFromTheTable() {
        // d2(1000) = 6.483 (Tippett, Biometrika 17 (1925) 364, table of the mean range; from memory)
        assertEquals(6.483, NoiseEstimator.expectedNormalRange(1000), 2e-3);
        // the interpolated table agrees with the integral itself
        for (long n : new long[] {129, 150, 1000, 12_345, 1_000_000}) {
            assertEquals(NoiseEstimator.integratedNormalRange(n), NoiseEstimator.expectedNormalRange(n), 1e-4,
                    "n = " + n);
        }
    }

    @Test
    void marginalSdOfAutoregressiveNoiseAndWhatFirstDifferencesMakeOfIt() {
        // AR(1) e_i = φ e_{i−1} + a_i has Var(e) = σ_a²/(1 − φ²) and lag-one correlation φ (Box &
        // Jenkins 1970, ch. 3); first differences have variance 2σ²(1 − φ), so the difference-based
        // estimate is σ√(1 − φ): for φ = 0.9 about a third of the true SD
        double sd = 0.5;
        double phi = 0.9;
        double[] y = new double[200_000];
        Synthetic.addCorrelatedNoise(y, sd, phi, 17);
        assertEquals(sd, NoiseEstimator.marginalSd(y, null), 0.06 * sd);
        assertEquals(sd * Math.sqrt(1 - phi), NoiseEstimator.robustSd(y), 0.06 * sd * Math.sqrt(1 - phi));
    }

    @Test
    void marginalSdLeavesOutTheExcludedSamples() {
        double sd = 0.2;
        double[] y = new double[50_000];
        Synthetic.addNoise(y, sd, 23);
        boolean[] excluded = new boolean[y.length];
        for (int i = 10_000; i < 20_000; i++) {
            y[i] += 50; // a fifth of the run far off the noise: the MAD alone would be pulled
            excluded[i] = true;
        }
        assertEquals(sd, NoiseEstimator.marginalSd(y, excluded), 0.05 * sd);
    }

    @Test
    void tooShortGivesZero() {
        assertEquals(0.0, NoiseEstimator.robustSd(new double[] {1, 2}));
    }

    /** The written-out table of d₂ is what the integral gives, bit for bit, at every tabulated count. */
    @Test
    void theWrittenTableIsTheIntegral() {
        for (int n = 2; n <= NoiseEstimator.RangeTable.EXACT_UP_TO; n++) {
            assertEquals(NoiseEstimator.integratedNormalRange(n), NoiseEstimator.RangeTable.EXACT[n], 0.0, "n = " + n);
        }
        int steps = (int) Math.ceil(Math.log(NoiseEstimator.RangeTable.LARGEST / NoiseEstimator.RangeTable.EXACT_UP_TO)
                / Math.log(NoiseEstimator.RangeTable.RATIO));
        assertEquals(steps + 1, NoiseEstimator.RangeTable.GRID.length);
        for (int k = 0; k <= steps; k++) {
            double n = NoiseEstimator.RangeTable.EXACT_UP_TO * Math.pow(NoiseEstimator.RangeTable.RATIO, k);
            assertEquals(NoiseEstimator.integratedNormalRange(n), NoiseEstimator.RangeTable.GRID[k], 0.0, "k = " + k);
        }
    }
}
