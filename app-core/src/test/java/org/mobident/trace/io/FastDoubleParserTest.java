package org.mobident.trace.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Checks {@link FastDoubleParser} bit for bit against {@link Double#parseDouble}. */
class FastDoubleParserTest {

    private static double parse(String s, boolean decimalComma) {
        byte[] b = s.getBytes(StandardCharsets.ISO_8859_1);
        return FastDoubleParser.parse(b, 0, b.length, decimalComma);
    }

    private static void assertSameAsJdk(String s) {
        double expected = Double.parseDouble(s);
        double actual = parse(s, false);
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                () -> "'" + s + "': JDK " + expected + ", ours " + actual);
    }

    @Test
    void edgeCasesMatchTheJdk() {
        String[] cases = {
            "0", "-0", "+0", "0.0", "-0.0", "00000", "0e0", "0e999999", "-0e-999999", "1", "-1", "+1",
            "0.1", "0.2", "0.3", ".5", "5.", "-.5", "123.456", "1e22", "1e23", "9e22", "1.5e22",
            "123e20", "12345e30", "1e-22", "1e-23", "4.35", "8.41e21", "1.7976931348623157e308",
            "1.7976931348623158e308", "1.7976931348623159e308", "1e308", "1e309", "-1e309", "2e-308",
            "2.2250738585072011e-308", "2.2250738585072014e-308", "4.9e-324", "2.4703282292062327e-324",
            "2.4703282292062328e-324", "1e-400", "9007199254740992", "9007199254740993",
            "9007199254740994", "9007199254740995", "18014398509481985", "123456789012345678",
            "1234567890123456789", "12345678901234567890", "99999999999999999999999",
            "0.000000000000000000000000000000001", "3.141592653589793238462643383279",
            "1.00000000000000000000000000000001", "1.0000000000000000000000000", "100000000000000000000000",
            "7.2057594037927933e16", "0.30000000000000004", "1E5", "1e+5", "1E-5", "-123.456e-7",
            "4503599627370496.5", "4503599627370497.5", "1e0000000000000000000000000000010",
            "0.000000000000000000000000000000000000000000000000000000000000000000000001e60",
            "12.3456789", "1000000000000000000000000e-24", "9007199254740993e-5", "9007199254740993e5",
        };
        for (String c : cases) {
            assertSameAsJdk(c);
        }
    }

    @Test
    void randomDecimalStringsMatchTheJdk() {
        Random random = new Random(20240611L);
        for (int k = 0; k < 200_000; k++) {
            StringBuilder sb = new StringBuilder();
            if (random.nextInt(3) == 0) {
                sb.append(random.nextBoolean() ? '-' : '+');
            }
            int digits = 1 + random.nextInt(random.nextInt(4) == 0 ? 30 : 17);
            int point = random.nextInt(digits + 1);
            for (int d = 0; d < digits; d++) {
                if (d == point && point > 0) {
                    sb.append('.');
                }
                sb.append((char) ('0' + random.nextInt(10)));
            }
            if (random.nextInt(3) == 0) {
                sb.append(random.nextBoolean() ? 'e' : 'E');
                int range = random.nextBoolean() ? 30 : 700;
                sb.append(random.nextInt(2 * range + 1) - range);
            }
            assertSameAsJdk(sb.toString());
        }
    }

    @Test
    void shortestReprOfRandomDoublesRoundTrips() {
        Random random = new Random(7L);
        for (int k = 0; k < 100_000; k++) {
            double v = k % 2 == 0 ? Double.longBitsToDouble(random.nextLong()) : random.nextGaussian() * 1000;
            if (!Double.isFinite(v)) {
                continue;
            }
            String s = Double.toString(v);
            assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(parse(s, false)), s);
            assertSameAsJdk(String.format(java.util.Locale.ROOT, "%.6f", v));
        }
    }

    @Test
    void decimalCommaOnlyWhenAllowed() {
        assertEquals(1.5, parse("1,5", true));
        assertEquals(-0.25, parse("-0,25", true));
        assertEquals(2.5e-3, parse("2,5e-3", true));
        assertEquals(3.25, parse("3.25", true), "a point stays allowed");
        assertTrue(Double.isNaN(parse("1,5", false)));
        // the slow path must turn the comma into a point as well (more than 18 digits)
        assertEquals(Double.parseDouble("0.1234567890123456789012"), parse("0,1234567890123456789012", true));
    }

    @Test
    void rejectsWhatIsNotAPlainDecimalNumber() {
        String[] bad = {"", "-", "+", ".", "-.", "e5", ".e5", "1e", "1e+", "1e-", "1.2.3", "1..2", "0x10", "0x1p3",
            "NaN", "Infinity", "-Infinity", "inf", "1d", "1f", "1D", " 1", "1 ", "1,5", "--1", "+-1", "1e5.5",
            "1_000", "abc", "1e5e5", "١"};
        for (String s : bad) {
            assertTrue(Double.isNaN(parse(s, false)), "'" + s + "' must be rejected");
        }
    }

    @Test
    void overflowIsInfinityNotNaN() {
        assertEquals(Double.POSITIVE_INFINITY, parse("1e400", false));
        assertEquals(Double.NEGATIVE_INFINITY, parse("-2e99999999999", false));
        assertEquals(0.0, parse("1e-99999999999", false));
    }

    @Test
    void readsOnlyTheGivenRange() {
        byte[] b = "xx12.5yy".getBytes(StandardCharsets.ISO_8859_1);
        assertEquals(12.5, FastDoubleParser.parse(b, 2, 6, false));
        assertEquals(2.0, FastDoubleParser.parse(b, 3, 4, false));
    }
}
