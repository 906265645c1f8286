package org.mobident.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * Locale-independent number formatting shared by the reports, so the same result always gives
 * the same bytes. Non-finite values (NaN, infinities) format as {@code null}: the writers turn
 * that into an empty CSV cell or a JSON {@code null}. A value that rounds to zero is written
 * without a minus sign.
 */
final class Numbers {

    /** Significant digits of library model values (pKa, limiting mobilities) written as text. */
    static final int LIBRARY_DIGITS = 6;

    private Numbers() {
    }

    /** {@code value} with exactly {@code decimals} decimals (half-up), or null when not finite. */
    static String fixed(double value, int decimals) {
        if (!Double.isFinite(value)) {
            return null;
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", value);
        return dropNegativeZero(s);
    }

    /**
     * {@code value} rounded to {@code digits} significant digits (half-even), in plain decimal
     * notation without trailing zeros, or null when not finite.
     */
    static String significant(double value, int digits) {
        if (!Double.isFinite(value)) {
            return null;
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        String s = rounded.stripTrailingZeros().toPlainString();
        return dropNegativeZero(s);
    }

    /** The integer nearest to {@code value}, or null when not finite. */
    static String integer(double value) {
        return fixed(value, 0);
    }

    private static String dropNegativeZero(String s) {
        if (s.startsWith("-")) {
            for (int i = 1; i < s.length(); i++) {
                char c = s.charAt(i);
                if (c != '0' && c != '.') {
                    return s;
                }
            }
            return s.substring(1);
        }
        return s;
    }
}
