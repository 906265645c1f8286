package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class ShoulderFinderTest {

    private static final double STEP = 0.1;
    private static final double[] T = Synthetic.regularTimes(0, STEP, 2000);

    @Test
    void concavityOfAParabolaIsMinusTwiceItsLeadingCoefficient() {
        // definition: y = a t² has y″ = 2a, so −y″ = −2a
        double[] y = new double[T.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = -0.3 * T[i] * T[i];
        }
        for (double c : ShoulderFinder.concavity(y, 12, STEP)) {
            assertEquals(0.6, c, 1e-6);
        }
    }

    @Test
    void concavityNoiseOfWhiteNoise() {
        // variance of a weighted sum: σ² Σ w², divided by Δt⁴ for a second derivative in time
        double sd = 0.05;
        double[] y = new double[T.length * 5];
        Synthetic.addNoise(y, sd, 3);
        int m = 10;
        double[] c = ShoulderFinder.concavity(y, m, STEP);
        double expected = sd * Math.sqrt(PeakWidthEstimator.sumOfSquares(
                SavitzkyGolay.derivativeWeights(m, 2, 0, 2))) / (STEP * STEP);
        assertEquals(expected, ShoulderFinder.noiseSd(c, sd, m, STEP), 0.1 * expected);
        double sumSq = 0;
        for (int i = m; i < c.length - m; i++) {
            sumSq += c[i] * c[i];
        }
        assertEquals(expected, Math.sqrt(sumSq / (c.length - 2 * m)), 0.05 * expected);
    }

    @Test
    void aShoulderWithoutValleyGivesTwoZonesAndALoneGaussianOne() {
        double sigma = 2;
        double widthHalf = 2.3548 * sigma; // Gaussian identity w½ = 2√(2 ln 2) σ
        int m = ShoulderFinder.halfWidth(widthHalf, STEP, T.length);
        int reach = (int) Math.round(widthHalf / STEP);
        // Rs = 0.6: Δt = 0.6 · 4σ; heights 1:3 merge into one maximum with a shoulder
        double[] pair = new double[T.length];
        Synthetic.addGaussian(T, pair, 95.2, 1.0, sigma);
        Synthetic.addGaussian(T, pair, 100, 3.0, sigma);
        Synthetic.addNoise(pair, 0.01, 5);
        double[] c = ShoulderFinder.concavity(pair, m, STEP);
        double noise = ShoulderFinder.noiseSd(c, 0.01, m, STEP);
        List<Integer> zones = ShoulderFinder.zones(c, 850, 1150, 3 * noise, 5 * noise, reach);
        assertEquals(2, zones.size(), zones.toString());
        assertEquals(95.2, T[zones.get(0)], 0.5 * sigma);
        assertEquals(100, T[zones.get(1)], 0.5 * sigma);

        double[] single = new double[T.length];
        Synthetic.addGaussian(T, single, 100, 3.0, sigma);
        Synthetic.addNoise(single, 0.01, 6);
        double[] cs = ShoulderFinder.concavity(single, m, STEP);
        List<Integer> one = ShoulderFinder.zones(cs, 850, 1150, 3 * noise, 5 * noise, reach);
        assertEquals(1, one.size());
        assertEquals(100, T[one.get(0)], 0.1 * sigma);
    }
}
