package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;

class SavitzkyGolayTest {

    private static final double EXACT = 1e-12;

    private static double[] scaled(double norm, double... integers) {
        double[] out = new double[integers.length];
        for (int i = 0; i < integers.length; i++) {
            out[i] = integers[i] / norm;
        }
        return out;
    }

    @Test
    void fivePointQuadraticWeights() {
        // Savitzky & Golay, Anal. Chem. 36 (1964) 1627, table of quadratic/cubic smoothing
        // convolutes, 5 points: (−3, 12, 17, 12, −3)/35
        assertArrayEquals(scaled(35, -3, 12, 17, 12, -3), SavitzkyGolay.weights(2, 2), EXACT);
    }

    @Test
    void sevenPointQuadraticWeights() {
        // Savitzky & Golay 1964, same table, 7 points: (−2, 3, 6, 7, 6, 3, −2)/21
        assertArrayEquals(scaled(21, -2, 3, 6, 7, 6, 3, -2), SavitzkyGolay.weights(3, 2), EXACT);
    }

    @Test
    void ninePointQuadraticWeights() {
        // Savitzky & Golay 1964, same table, 9 points: (−21, 14, 39, 54, 59, 54, 39, 14, −21)/231
        // (from memory)
        assertArrayEquals(scaled(231, -21, 14, 39, 54, 59, 54, 39, 14, -21),
                SavitzkyGolay.weights(4, 2), EXACT);
    }

    @Test
    void sevenPointQuarticWeights() {
        // Savitzky & Golay 1964, quartic/quintic table, 7 points: (5, −30, 75, 131, 75, −30, 5)/231
        // (from memory)
        assertArrayEquals(scaled(231, 5, -30, 75, 131, 75, -30, 5), SavitzkyGolay.weights(3, 4), EXACT);
    }

    @Test
    void cubicSharesTheQuadraticCentralWeights() {
        // Savitzky & Golay 1964 tabulate quadratic and cubic together: odd terms vanish at the centre
        for (int m = 2; m <= 12; m++) {
            assertArrayEquals(SavitzkyGolay.weights(m, 2), SavitzkyGolay.weights(m, 3), EXACT, "m=" + m);
        }
    }

    @Test
    void weightsOfEveryRowSumToOne() {
        // definition: a constant is fitted exactly by any polynomial
        for (int position = -5; position <= 5; position++) {
            double sum = 0;
            for (double w : SavitzkyGolay.weights(5, 3, position)) {
                sum += w;
            }
            assertEquals(1.0, sum, EXACT, "position " + position);
        }
    }

    @Test
    void polynomialsUpToTheOrderPassUnchangedIncludingTheEdges() {
        // definition of a least-squares polynomial fit: a cubic is reproduced by a cubic fit
        int n = 200;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double u = (i - 80) / 50.0;
            y[i] = 2 - 3 * u + 0.5 * u * u + 1.5 * u * u * u;
        }
        assertArrayEquals(y, SavitzkyGolay.smooth(y, 4, 3), 1e-10);   // direct convolution
        assertArrayEquals(y, SavitzkyGolay.smooth(y, 20, 3), 1e-9);   // running moments
        double[] quadratic = new double[n];
        for (int i = 0; i < n; i++) {
            quadratic[i] = 7 + 0.01 * i - 2e-4 * i * i;
        }
        assertArrayEquals(quadratic, SavitzkyGolay.smooth(quadratic, 30, 2), 1e-9);
    }

    @Test
    void runningMomentsEqualTheDirectConvolution() {
        Random random = new Random(42);
        int n = 10_000;
        int m = 25;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 1000 + random.nextGaussian() + Math.sin(i / 300.0);
        }
        double[] smoothed = SavitzkyGolay.smooth(y, m, 2);
        double[] w = SavitzkyGolay.weights(m, 2);
        for (int i = m; i < n - m; i++) {
            double direct = 0;
            for (int k = 0; k < w.length; k++) {
                direct += w[k] * y[i - m + k];
            }
            assertEquals(direct, smoothed[i], 1e-8, "point " + i);
        }
    }

    @Test
    void smoothingLowersWhiteNoiseBySqrtOfSumOfSquaredWeights() {
        // variance of a weighted sum of independent values: σ² Σ w² (any statistics text)
        Random random = new Random(7);
        int n = 50_000;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = random.nextGaussian();
        }
        double[] s = SavitzkyGolay.smooth(y, 10, 2);
        double sumSq = 0;
        for (int i = 10; i < n - 10; i++) {
            sumSq += s[i] * s[i];
        }
        double expected = Math.sqrt(PeakWidthEstimator.sumOfSquares(SavitzkyGolay.weights(10, 2)));
        assertEquals(expected, Math.sqrt(sumSq / (n - 20)), 0.03 * expected);
    }

    @Test
    void shortSeriesAndIdentityWindows() {
        double[] y = {1, 4, 2};
        assertArrayEquals(y, SavitzkyGolay.smooth(y, 5, 2), EXACT); // window shrinks to 3: quadratic fit is exact
        assertArrayEquals(new double[] {0, 1, 0}, SavitzkyGolay.weights(1, 2), EXACT);
        assertEquals(0, SavitzkyGolay.smooth(new double[0], 2, 2).length);
    }

    @Test
    void rejectsImpossibleWindows() {
        assertThrows(IllegalArgumentException.class, () -> SavitzkyGolay.weights(0, 0));
        assertThrows(IllegalArgumentException.class, () -> SavitzkyGolay.weights(2, 5));
        assertThrows(IllegalArgumentException.class, () -> SavitzkyGolay.weights(2, -1));
    }

    @Test
    void fivePointQuadraticFirstDerivativeWeights() {
        // Savitzky & Golay, Anal. Chem. 36 (1964) 1627, first-derivative convolutes, quadratic/cubic
        // 5 points: (−2, −1, 0, 1, 2)/10 (from memory)
        assertArrayEquals(scaled(10, -2, -1, 0, 1, 2), SavitzkyGolay.derivativeWeights(2, 2, 0, 1), EXACT);
    }

    @Test
    void sevenPointQuadraticFirstDerivativeWeights() {
        // Savitzky & Golay 1964, same table, 7 points: (−3, −2, −1, 0, 1, 2, 3)/28 (from memory)
        assertArrayEquals(scaled(28, -3, -2, -1, 0, 1, 2, 3), SavitzkyGolay.derivativeWeights(3, 2, 0, 1), EXACT);
    }

    @Test
    void fivePointQuarticFirstDerivativeWeights() {
        // Savitzky & Golay 1964, first-derivative convolutes, cubic/quartic, 5 points:
        // (1, −8, 0, 8, −1)/12 (from memory; also the five-point central difference)
        assertArrayEquals(scaled(12, 1, -8, 0, 8, -1), SavitzkyGolay.derivativeWeights(2, 3, 0, 1), EXACT);
    }

    @Test
    void quadraticSecondDerivativeWeights() {
        // Savitzky & Golay 1964, second-derivative convolutes, quadratic/cubic (from memory):
        // 5 points (2, −1, −2, −1, 2)/7; 7 points (5, 0, −3, −4, −3, 0, 5)/42
        assertArrayEquals(scaled(7, 2, -1, -2, -1, 2), SavitzkyGolay.derivativeWeights(2, 2, 0, 2), EXACT);
        assertArrayEquals(scaled(42, 5, 0, -3, -4, -3, 0, 5), SavitzkyGolay.derivativeWeights(3, 3, 0, 2), EXACT);
    }

    @Test
    void derivativeZeroIsTheSmoothing() {
        for (int position = -4; position <= 4; position++) {
            assertArrayEquals(SavitzkyGolay.weights(4, 3, position),
                    SavitzkyGolay.derivativeWeights(4, 3, position, 0), 1e-12, "position " + position);
        }
    }

    @Test
    void derivativesOfAPolynomialAreExactIncludingTheEdges() {
        // definition: a cubic is reproduced by a cubic fit, so are its derivatives (per index step)
        int n = 300;
        double[] y = new double[n];
        double[] d1 = new double[n];
        double[] d2 = new double[n];
        for (int i = 0; i < n; i++) {
            double x = i - 120.0;
            y[i] = 3 + 0.2 * x - 1e-3 * x * x + 2e-6 * x * x * x;
            d1[i] = 0.2 - 2e-3 * x + 6e-6 * x * x;
            d2[i] = -2e-3 + 12e-6 * x;
        }
        assertArrayEquals(d1, SavitzkyGolay.derivative(y, 5, 3, 1), 1e-9);   // convolution
        assertArrayEquals(d2, SavitzkyGolay.derivative(y, 5, 3, 2), 1e-9);   // convolution (m < 8)
        assertArrayEquals(d2, SavitzkyGolay.derivative(y, 20, 3, 2), 1e-9);  // running moments
        // a quadratic fit gives the exact second derivative of a parabola everywhere
        double[] parabola = new double[n];
        for (int i = 0; i < n; i++) {
            parabola[i] = 50 - 0.5 * (i - 100.0) * (i - 100.0) * 1e-2;
        }
        double[] curvature = SavitzkyGolay.derivative(parabola, 25, 2, 2);
        for (double v : curvature) {
            assertEquals(-1e-2, v, 1e-11);
        }
    }

    @Test
    void secondDerivativeByMomentsEqualsTheDirectConvolution() {
        Random random = new Random(43);
        int n = 5000;
        int m = 17;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 100 + random.nextGaussian() + 5 * Math.sin(i / 200.0);
        }
        double[] fast = SavitzkyGolay.derivative(y, m, 2, 2);
        double[] w = SavitzkyGolay.derivativeWeights(m, 2, 0, 2);
        for (int i = m; i < n - m; i++) {
            double direct = 0;
            for (int k = 0; k < w.length; k++) {
                direct += w[k] * y[i - m + k];
            }
            assertEquals(direct, fast[i], 1e-9, "point " + i);
        }
    }

    @Test
    void rejectsImpossibleDerivatives() {
        assertThrows(IllegalArgumentException.class, () -> SavitzkyGolay.derivativeWeights(2, 2, 0, 3));
        assertThrows(IllegalArgumentException.class, () -> SavitzkyGolay.derivativeWeights(2, 2, 3, 1));
        assertThrows(IllegalArgumentException.class, () -> SavitzkyGolay.derivative(new double[4], 2, 2, 2));
    }
}
