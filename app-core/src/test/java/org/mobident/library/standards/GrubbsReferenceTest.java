package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;

class GrubbsReferenceTest {

    /** Published tables give three decimals. */
    private static final double TABLE_3_DECIMALS = 1e-3;
    /** A table with two decimals. */
    private static final double TABLE_2_DECIMALS = 5e-3;

    @Test
    void twoSidedCriticalValuesMatchThePublishedTable() {
        // Harvey, Analytical Chemistry 2.1 (LibreTexts), Appendix 7 "Critical values for Grubb's test",
        // alpha = 0.05 column (two-sided); also Grubbs & Beck, Technometrics 14 (1972) 847, 2.5 % one-sided.
        assertEquals(1.155, Grubbs.criticalValue(3, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        assertEquals(1.481, Grubbs.criticalValue(4, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        assertEquals(1.715, Grubbs.criticalValue(5, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        assertEquals(1.887, Grubbs.criticalValue(6, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        assertEquals(2.290, Grubbs.criticalValue(10, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        assertEquals(2.549, Grubbs.criticalValue(15, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        // Same table, alpha = 0.01 column.
        assertEquals(1.764, Grubbs.criticalValue(5, 0.01, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        assertEquals(2.482, Grubbs.criticalValue(10, 0.01, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
        // Grubbs & Beck 1972, n = 20, two-sided 5 % (= one-sided 2.5 %): 2.709 — from memory; the two-decimal
        // table of Grubbs (1969) as reproduced in the DIN 32645 context reads 2.71 (checked).
        assertEquals(2.709, Grubbs.criticalValue(20, 0.05, Grubbs.Alternative.TWO_SIDED), TABLE_3_DECIMALS);
    }

    @Test
    void oneSidedCriticalValuesMatchThePublishedTable() {
        // Grubbs & Beck, Technometrics 14 (1972) 847, one-sided 5 %: n = 3 → 1.153, n = 10 → 2.176
        // (from memory); a two-decimal reproduction of Grubbs (1969), 0.05 column, reads 1.15 and 2.18 (checked),
        // and n = 20 → 2.56.
        assertEquals(1.153, Grubbs.criticalValue(3, 0.05, Grubbs.Alternative.LARGEST), TABLE_3_DECIMALS);
        assertEquals(2.176, Grubbs.criticalValue(10, 0.05, Grubbs.Alternative.LARGEST), TABLE_3_DECIMALS);
        assertEquals(2.56, Grubbs.criticalValue(20, 0.05, Grubbs.Alternative.SMALLEST), TABLE_2_DECIMALS);
        // One-sided at alpha equals two-sided at 2·alpha by construction.
        assertEquals(Grubbs.criticalValue(7, 0.10, Grubbs.Alternative.TWO_SIDED),
                Grubbs.criticalValue(7, 0.05, Grubbs.Alternative.LARGEST), 1e-12);
    }

    @Test
    void criticalValueStaysBelowTheLargestPossibleStatistic() {
        // Shiffler, Am. Stat. 42 (1988) 79 (from memory): G can never exceed (n − 1)/√n.
        for (int n = 3; n <= 50; n++) {
            double bound = (n - 1) / Math.sqrt(n);
            double g = Grubbs.criticalValue(n, 0.05, Grubbs.Alternative.TWO_SIDED);
            assertTrue(g < bound && g > 1.0, "n = " + n + ": " + g);
        }
    }

    @Test
    void statisticIsTheLargestStandardisedDeviation() {
        double[] v = {10.1, 10.3, 9.9, 10.0, 12.5, 10.2};
        DescriptiveStatistics ds = new DescriptiveStatistics(v);
        Grubbs.Result r = Grubbs.test(v, 0.05, Grubbs.Alternative.TWO_SIDED);
        assertNotNull(r);
        assertEquals(4, r.index());
        assertEquals((12.5 - ds.getMean()) / ds.getStandardDeviation(), r.g(), 1e-12);
        assertTrue(r.outlier(), "12.5 among values near 10 is an outlier: " + r);
    }

    @Test
    void handComputedExample() {
        // {1, 2, 3, 4, 100}: mean 22, s = √(7610/4) = 43.61765, G = 78/43.61765 = 1.788267 (hand computation),
        // above 1.715 (n = 5, two-sided 5 %).
        Grubbs.Result r = Grubbs.test(new double[] {1, 2, 3, 4, 100}, 0.05, Grubbs.Alternative.TWO_SIDED);
        assertNotNull(r);
        assertEquals(100.0, r.value());
        assertEquals(1.788267, r.g(), 1e-6);
        assertTrue(r.outlier());
    }

    @Test
    void oneSidedTestsLookOnlyAtTheirEnd() {
        double[] v = {10.0, 10.1, 9.9, 10.05, 9.95, 5.0};
        Grubbs.Result low = Grubbs.test(v, 0.05, Grubbs.Alternative.SMALLEST);
        Grubbs.Result high = Grubbs.test(v, 0.05, Grubbs.Alternative.LARGEST);
        assertTrue(low.outlier());
        assertEquals(5.0, low.value());
        assertFalse(high.outlier());
        assertEquals(10.1, high.value());
    }

    @Test
    void ordinaryScatterIsNotAnOutlier() {
        Grubbs.Result r = Grubbs.test(new double[] {-56.2, -56.4, -56.3, -56.25, -56.35}, 0.05,
                Grubbs.Alternative.TWO_SIDED);
        assertFalse(r.outlier(), r.toString());
    }

    @Test
    void tooFewValuesOrNoSpreadGiveNoResult() {
        assertNull(Grubbs.test(new double[] {1, 2}, 0.05, Grubbs.Alternative.TWO_SIDED));
        assertNull(Grubbs.test(new double[] {3, 3, 3, 3}, 0.05, Grubbs.Alternative.TWO_SIDED));
        assertThrows(IllegalArgumentException.class, () -> Grubbs.criticalValue(2, 0.05, Grubbs.Alternative.TWO_SIDED));
        assertThrows(IllegalArgumentException.class, () -> Grubbs.criticalValue(5, 1.5, Grubbs.Alternative.TWO_SIDED));
    }
}
