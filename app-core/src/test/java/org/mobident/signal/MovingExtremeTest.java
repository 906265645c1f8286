package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The block moving minimum/maximum against its definition, evaluated by brute force. */
class MovingExtremeTest {

    private static double[] bruteForce(double[] x, int r, boolean max) {
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            double e = max ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
            for (int j = Math.max(0, i - r); j <= Math.min(x.length - 1, i + r); j++) {
                e = max ? Math.max(e, x[j]) : Math.min(e, x[j]);
            }
            out[i] = e;
        }
        return out;
    }

    @Test
    void matchesTheDefinitionForManyLengthsAndRadii() {
        SplittableRandom rnd = new SplittableRandom(7);
        for (int n : new int[] {1, 2, 3, 7, 50, 333}) {
            for (int r : new int[] {0, 1, 2, 5, 40, 400}) {
                double[] x = new double[n];
                for (int i = 0; i < n; i++) {
                    x[i] = rnd.nextInt(20) - 10; // ties included
                }
                assertArrayEquals(bruteForce(x, r, true), PeakWidthEstimator.movingExtreme(x, r, true), 0.0,
                        "max n=" + n + " r=" + r);
                assertArrayEquals(bruteForce(x, r, false), PeakWidthEstimator.movingExtreme(x, r, false), 0.0,
                        "min n=" + n + " r=" + r);
            }
        }
    }
}
