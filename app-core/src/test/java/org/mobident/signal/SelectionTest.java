package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class SelectionTest {

    @Test
    void medianAgreesWithSortingForManyRandomArrays() {
        Random random = new Random(3);
        for (int trial = 0; trial < 500; trial++) {
            int n = 1 + random.nextInt(60);
            double[] values = new double[n];
            for (int i = 0; i < n; i++) {
                // few distinct values, so ties are frequent
                values[i] = trial % 2 == 0 ? random.nextInt(5) : random.nextGaussian();
            }
            double[] sorted = values.clone();
            Arrays.sort(sorted);
            double expected = n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
            double[] copy = values.clone();
            assertEquals(expected, Selection.median(values), 0.0, "trial " + trial);
            assertArrayEquals(copy, values, 0.0, "median must not modify its input");
        }
    }

    @Test
    void selectFindsEveryOrderStatistic() {
        double[] values = {5, 1, 4, 1, 5, 9, 2, 6, 5, 3};
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        for (int k = 0; k < values.length; k++) {
            assertEquals(sorted[k], Selection.select(values.clone(), 0, values.length - 1, k));
        }
    }

    @Test
    void handChecked() {
        assertEquals(2.5, Selection.median(new double[] {4, 1, 3, 2}));
        assertEquals(7.0, Selection.median(new double[] {7}));
        assertThrows(IllegalArgumentException.class, () -> Selection.median(new double[0]));
    }

    @Test
    void stridedMedianTakesEveryKthValueOfItsStretch() {
        // 0..99 in a stretch from 10 of length 100: every 10th value (10, 20, ..., 100), median 55;
        // with more samples asked than values, the median of all of them, 59.5
        double[] v = new double[120];
        for (int i = 0; i < v.length; i++) {
            v[i] = i;
        }
        assertEquals(55.0, Selection.stridedMedian(v, 10, 100, 10));
        assertEquals(59.5, Selection.stridedMedian(v, 10, 100, 1000));
        assertEquals(5.0, v[5], "the values are not moved");
    }
}
