package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Loose labelling after Heckbert, "Nice numbers for graph labels", Graphics Gems (1990); values worked by hand. */
class NiceTicksTest {

    @Test
    void niceNumbersRoundToOneTwoFiveTimesAPowerOfTen() {
        assertEquals(500, NiceTicks.niceNumber(438, false), 1e-9); // 4.38 → 5 (not below)
        assertEquals(100, NiceTicks.niceNumber(125, true), 1e-9); // 1.25 < 1.5 → 1
        assertEquals(200, NiceTicks.niceNumber(150, true), 1e-9); // 1.5 → 2
        assertEquals(0.5, NiceTicks.niceNumber(0.31, false), 1e-12);
        assertEquals(10, NiceTicks.niceNumber(7.2, true), 1e-12);
        assertEquals(1, NiceTicks.niceNumber(1, false), 1e-12);
    }

    @Test
    void hundredsFromAnUnevenRange() {
        // 105..543 with 5 ticks: span nice(438) = 500, step nice(125) = 100, axis 100..600.
        NiceTicks t = NiceTicks.of(105, 543, 5);
        assertArrayEquals(new double[] {100, 200, 300, 400, 500, 600}, t.values(), 1e-9);
        assertEquals(0, t.fractionDigits());
        assertEquals("300", t.format(300));
    }

    @Test
    void unitIntervalGetsTenthsWithoutBinaryNoise() {
        // 0..1 with 5 ticks: span 1, step nice(0.25) = 0.2.
        NiceTicks t = NiceTicks.of(0, 1, 5);
        assertArrayEquals(new double[] {0, 0.2, 0.4, 0.6, 0.8, 1.0}, t.values(), 0);
        assertEquals(1, t.fractionDigits());
        assertEquals("0.6", t.format(t.values()[3]));
    }

    @Test
    void mobilityRangeAcrossZero() {
        // -37.2..12.5 with 6 ticks: span nice(49.7) = 50, step nice(10) = 10, axis -40..20.
        NiceTicks t = NiceTicks.of(-37.2, 12.5, 6);
        assertArrayEquals(new double[] {-40, -30, -20, -10, 0, 10, 20}, t.values(), 1e-9);
        assertEquals("0", t.format(0.0));
        assertEquals("-40", t.format(-40));
    }

    @Test
    void smallValuesGetEnoughDecimals() {
        // 0.00012..0.00047 with 4 ticks: span 0.0005, step nice(0.000167) = 0.0002.
        NiceTicks t = NiceTicks.of(0.00012, 0.00047, 4);
        assertArrayEquals(new double[] {0, 0.0002, 0.0004, 0.0006}, t.values(), 1e-15);
        assertEquals(4, t.fractionDigits());
        assertEquals("0.0002", t.format(0.0002));
    }

    @Test
    void negativeZeroIsNeverPrinted() {
        NiceTicks t = NiceTicks.of(-1, 0, 3);
        double[] v = t.values();
        assertEquals("0.0", t.format(v[v.length - 1]));
        assertEquals("0.0", t.format(-0.0));
        assertEquals("0.0", t.format(-0.01));
    }

    @Test
    void ticksAlwaysCoverTheRange() {
        double[][] ranges = {{3.3, 3.31}, {-1e6, 2.5e6}, {0.5, 699.5}, {-205.0, 362.5}};
        for (double[] r : ranges) {
            NiceTicks t = NiceTicks.of(r[0], r[1], 7);
            assertTrue(t.first() <= r[0] && t.last() >= r[1], "covers " + r[0] + ".." + r[1]);
            assertTrue(t.count() >= 2 && t.count() <= 14, "a readable number of ticks: " + t.count());
        }
    }

    @Test
    void anEmptyRangeIsWidened() {
        NiceTicks t = NiceTicks.of(5, 5, 5);
        assertTrue(t.first() < 5 && t.last() > 5);
        NiceTicks z = NiceTicks.of(0, 0, 5);
        assertTrue(z.first() < 0 && z.last() > 0);
    }

    @Test
    void rejectsBadInput() {
        assertThrows(IllegalArgumentException.class, () -> NiceTicks.of(2, 1, 5));
        assertThrows(IllegalArgumentException.class, () -> NiceTicks.of(0, Double.NaN, 5));
        assertThrows(IllegalArgumentException.class, () -> NiceTicks.of(0, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> NiceTicks.niceNumber(0, true));
    }
}
