package org.mobident.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class NumberTextTest {

    @Test
    void fixedDecimals() {
        assertEquals("123.4500", NumberText.fixed(123.45, 4, null));
        assertEquals("-71.520", NumberText.fixed(-71.52, 3, null));
        assertEquals("25", NumberText.fixed(25.4, 0, null));
    }

    /**
     * Half-up on the decimal the double reads as (java.util.Formatter's %f): 2.675 is stored as
     * 2.67499999999999982…, yet it reads as 2.675 and is written 2.68, as a reader rounding the
     * printed value by hand would; ties go away from zero, not to even.
     */
    @Test
    void roundsHalfUpOnTheDecimalTheValueReadsAs() {
        assertEquals("2.68", NumberText.fixed(2.675, 2, null));
        assertEquals("0.13", NumberText.fixed(0.125, 2, null));
        assertEquals("-0.13", NumberText.fixed(-0.125, 2, null));
        assertEquals("3", NumberText.fixed(2.5, 0, null), "half-up, not half-even (which gives 2)");
        assertEquals("-3", NumberText.fixed(-2.5, 0, null), "ties away from zero");
        assertEquals("1.01", NumberText.trimmed(1.005, 2, null));
        assertEquals("-0.3", NumberText.trimmed(-0.25, 1, null));
        assertEquals("3", NumberText.significant(2.5, 1, null));
        assertEquals("0.13", NumberText.significant(0.125, 2, null));
    }

    @Test
    void noNegativeZero() {
        assertEquals("0.000", NumberText.fixed(-0.0001, 3, null));
        assertEquals("0.00", NumberText.fixed(-0.0, 2, null));
        assertEquals("0", NumberText.fixed(-0.2, 0, null));
        assertEquals("0", NumberText.trimmed(-0.04, 1, null));
        assertEquals("0", NumberText.trimmed(-0.0, 3, null));
        assertEquals("0", NumberText.significant(-0.0, 6, null));
        assertEquals("0", NumberText.plain(-0.0, null));
        assertEquals("0.00", NumberText.general(-0.0, 3, null));
        assertEquals("0.0 %", NumberText.percent(-1e-7, 1, null));
        assertEquals("0.000", NumberText.signed(-0.0004, 3, null));
    }

    @Test
    void notFiniteIsTheCallersPlaceholder() {
        for (double v : new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY}) {
            assertNull(NumberText.fixed(v, 2, null));
            assertEquals("", NumberText.fixed(v, 2, ""));
            assertEquals("-", NumberText.signed(v, 2, "-"));
            assertEquals("0", NumberText.trimmed(v, 1, "0"));
            assertEquals("–", NumberText.significant(v, 6, "–"));
            assertEquals("?", NumberText.plain(v, "?"));
            assertEquals("n/a", NumberText.general(v, 3, "n/a"));
            assertEquals("-", NumberText.percent(v, 1, "-"));
            assertEquals("", NumberText.roundTrip(v, ""));
        }
    }

    @Test
    void largeAndTinyValues() {
        assertEquals("100000000000000000000.0", NumberText.fixed(1e20, 1, null));
        assertEquals("123456789012.35", NumberText.fixed(123456789012.345, 2, null));
        assertEquals("0.000", NumberText.fixed(1e-10, 3, null));
        assertEquals("0.000", NumberText.fixed(-1e-10, 3, null));
        assertEquals("1000000000000", NumberText.trimmed(1e12, 1, null));
        assertEquals("1234570", NumberText.significant(1234567.0, 6, null));
        assertEquals("0.000123457", NumberText.significant(0.0001234567, 6, null));
        assertEquals("0.00000000000000000001", NumberText.significant(1e-20, 3, null));
        assertEquals("1500000000000", NumberText.significant(1.5e12, 2, null));
        assertEquals("0.0000001", NumberText.plain(1e-7, null));
        assertEquals("0.00123", NumberText.general(0.00123456, 3, null));
        assertEquals("12.3", NumberText.general(12.345, 3, null));
        assertEquals("1.23e-05", NumberText.general(1.23e-5, 3, null));
        assertEquals("1.23e+05", NumberText.general(123456, 3, null));
        assertEquals("1e-10", NumberText.roundTrip(1e-10, null));
        assertEquals("1.5e12", NumberText.roundTrip(1.5e12, null));
        assertEquals("123456789", NumberText.roundTrip(123456789.0, null));
    }

    @Test
    void noSeventeenDigitDoubles() {
        double noisy = 0.1 + 0.2; // 0.30000000000000004
        assertEquals("0.300", NumberText.fixed(noisy, 3, null));
        assertEquals("0.3", NumberText.trimmed(noisy, 3, null));
        assertEquals("0.3", NumberText.plain(noisy, null));
        assertEquals("0.3", NumberText.significant(noisy, 12, null));
        assertEquals("0.30000000000000004", NumberText.roundTrip(noisy, null), "only the exact form keeps them");
    }

    @Test
    void signedTrimmedPlainAndPercent() {
        assertEquals("+0.012", NumberText.signed(0.012, 3, null));
        assertEquals("-0.003", NumberText.signed(-0.003, 3, null));
        assertEquals("0.000", NumberText.signed(0.0, 3, null));
        assertEquals("12.5", NumberText.trimmed(12.5, 3, null));
        assertEquals("8", NumberText.trimmed(8.0, 3, null));
        assertEquals("0.1", NumberText.trimmed(0.05, 1, null));
        assertEquals("-1.5", NumberText.trimmed(-1.5, 1, null));
        assertEquals("25", NumberText.plain(25.0, null));
        assertEquals("0.05", NumberText.plain(0.05, null));
        assertEquals("-30.5", NumberText.plain(-30.5, null));
        assertEquals("97.2 %", NumberText.percent(0.9721, 1, null));
        assertEquals("100 %", NumberText.percent(1.0, 0, null));
        assertEquals("13 %", NumberText.percent(0.125, 0, null));
    }

    @Test
    void roundTripIsExactAndKeepsTheSignOfZero() {
        assertEquals("-55.43", NumberText.roundTrip(-55.43, null));
        assertEquals("0.001", NumberText.roundTrip(1e-3, null));
        assertEquals("25", NumberText.roundTrip(25.0, null));
        assertEquals("-0", NumberText.roundTrip(-0.0, null));
        SplittableRandom random = new SplittableRandom(11);
        for (int i = 0; i < 20_000; i++) {
            double v = randomValue(random);
            assertEquals(v, Double.parseDouble(NumberText.roundTrip(v, null)), "reads back: " + v);
        }
    }

    /** The fast path of {@link NumberText#trimmed} gives what Formatter's %f gives, zeros dropped. */
    @Test
    void trimmedAgreesWithFixed() {
        SplittableRandom random = new SplittableRandom(7);
        for (int i = 0; i < 50_000; i++) {
            double v = randomValue(random);
            if (i % 4 == 0) {
                v = Math.round(v * 1000) / 1000.0 + (random.nextBoolean() ? 0.0005 : -0.0005); // near ties
            }
            int decimals = random.nextInt(7);
            String viaFormatter = String.format(Locale.ROOT, "%." + decimals + "f", v);
            if (viaFormatter.contains(".")) {
                viaFormatter = viaFormatter.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            if (viaFormatter.matches("-0")) {
                viaFormatter = "0";
            }
            assertEquals(viaFormatter, NumberText.trimmed(v, decimals, null), v + " with " + decimals + " decimals");
        }
    }

    /** The fast path of {@link NumberText#fixed} gives what Formatter's %f gives (no negative zero). */
    @Test
    void fixedAgreesWithFormatter() {
        SplittableRandom random = new SplittableRandom(13);
        for (int i = 0; i < 200_000; i++) {
            double v = randomValue(random);
            if (i % 4 == 0) {
                v = Math.round(v * 1000) / 1000.0 + (random.nextBoolean() ? 0.0005 : -0.0005); // near ties
            }
            int decimals = random.nextInt(8);
            String viaFormatter = String.format(Locale.ROOT, "%." + decimals + "f", v);
            if (viaFormatter.matches("-0(\\.0*)?")) {
                viaFormatter = viaFormatter.substring(1);
            }
            assertEquals(viaFormatter, NumberText.fixed(v, decimals, null), v + " with " + decimals + " decimals");
        }
    }

    private static double randomValue(SplittableRandom random) {
        double magnitude = Math.pow(10, random.nextInt(-8, 13));
        return (random.nextBoolean() ? 1 : -1) * random.nextDouble() * magnitude;
    }
}
