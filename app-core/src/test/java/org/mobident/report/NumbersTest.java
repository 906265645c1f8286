package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

class NumbersTest {
    @Test
    void fixedDecimals() {
        assertEquals("123.4500", Numbers.fixed(123.45, 4));
        assertEquals("-71.520", Numbers.fixed(-71.52, 3));
        assertEquals("0.000", Numbers.fixed(-0.0001, 3), "no negative zero");
        assertEquals("0", Numbers.fixed(-0.2, 0));
        assertNull(Numbers.fixed(Double.NaN, 2));
        assertNull(Numbers.fixed(Double.POSITIVE_INFINITY, 2));
    }

    @Test
    void significantDigits() {
        assertEquals("1234570", Numbers.significant(1234567.0, 6));
        assertEquals("0.000123457", Numbers.significant(0.0001234567, 6));
        assertEquals("5", Numbers.significant(5.0, 6));
        assertEquals("-2.5", Numbers.significant(-2.5, 6));
        assertEquals("0", Numbers.significant(-0.0, 6));
        assertNull(Numbers.significant(Double.NaN, 6));
    }
}
