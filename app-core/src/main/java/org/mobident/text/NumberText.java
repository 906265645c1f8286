package org.mobident.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * The one way numbers become text in Mobident's outputs (tables, CSV, JSON, HTML, SVG, terminal
 * text, generated files), so that the same value always gives the same bytes.
 *
 * <p>Rules every method keeps:
 * <ul>
 * <li><b>Locale-independent</b>: a point as decimal separator, no grouping, ASCII digits and signs.</li>
 * <li><b>No negative zero</b>: a value that rounds to zero is written without a minus sign
 *     ({@code -0.0004} with three decimals is {@code "0.000"}, never {@code "-0.000"}). The one
 *     exception is {@link #roundTrip}, whose job is to keep the exact double.</li>
 * <li><b>No 17-digit doubles</b>: except {@link #roundTrip}, every method rounds to a stated number
 *     of decimals or significant digits, so a computed 0.30000000000000004 is written 0.3.</li>
 * <li><b>Missing values</b>: NaN and the infinities are written as the {@code missing} placeholder
 *     the caller passes (an empty CSV cell {@code ""}, a JSON {@code null}, a dash on a terminal, …).</li>
 * <li><b>Rounding: half-up on the decimal the value reads as</b>. A double is first taken as the
 *     shortest decimal that reads back to it (what {@link Double#toString} shows) and that decimal
 *     is rounded half away from zero: 2.675 → "2.68", 0.125 → "0.13", -0.25 → "-0.3". This is the
 *     rule of {@link java.util.Formatter}'s {@code %f}, which every output used before this class
 *     existed (so outputs stayed byte-identical), and it is the rule a reader checks by hand: a
 *     value shown as 2.675 in one file is 2.68, not 2.67, in a file with two decimals. Half-even
 *     (banker's rounding) would only matter for sums of many rounded values, which no output has.</li>
 * </ul>
 */
public final class NumberText {

    /**
     * Significant digits of {@link #plain}: enough for any value a user types (settings, limits,
     * conditions), few enough that a computed value never shows binary noise in its last digits.
     */
    public static final int PLAIN_DIGITS = 12;

    /** Smallest magnitude {@link #roundTrip} writes in plain notation; smaller ones get an exponent. */
    private static final double ROUND_TRIP_PLAIN_MIN = 1e-4;
    /** Magnitude from which {@link #roundTrip} writes an exponent. */
    private static final double ROUND_TRIP_PLAIN_MAX = 1e9;

    private static final double PERCENT = 100.0;

    private static final long[] POW10 = {1L, 10L, 100L, 1_000L, 10_000L, 100_000L, 1_000_000L};
    /**
     * Largest |value·10^decimals| formatted by the fast path of {@link #trimmed}: below it the double
     * product and the shortest decimal of the value both lie within 1e-6 of the exact scaled value
     * (relative error 2^-53 each), so rounding either gives the same integer unless the scaled value
     * is within {@link #TIE_MARGIN} of a half.
     */
    private static final double FAST_LIMIT = 1e9;
    /** Distance from a rounding tie below which {@link #trimmed} leaves the fast path. */
    private static final double TIE_MARGIN = 1e-6;

    private NumberText() {
    }

    /**
     * {@code value} with exactly {@code decimals} decimals ({@code fixed(-71.52, 3)} is
     * {@code "-71.520"}), half-up, no negative zero; {@code missing} when not finite.
     */
    public static String fixed(double value, int decimals, String missing) {
        if (!Double.isFinite(value)) {
            return missing;
        }
        long rounded = fastRounded(value, decimals);
        if (rounded >= 0) {
            // the fast path of trimmed, with the zeros kept
            return fixedDigits(value < 0, rounded, POW10[decimals], decimals);
        }
        return dropNegativeZero(String.format(Locale.ROOT, "%." + decimals + "f", value));
    }

    /**
     * As {@link #fixed} with a plus sign on values that do not round to zero: {@code "+0.012"},
     * {@code "-0.003"}, {@code "0.000"}; {@code missing} when not finite.
     */
    public static String signed(double value, int decimals, String missing) {
        String s = fixed(value, decimals, missing);
        return Double.isFinite(value) && !s.startsWith("-") && !isZero(s) ? "+" + s : s;
    }

    /**
     * {@code value} rounded half-up to at most {@code maxDecimals} decimals (0 to 6), trailing zeros
     * and a trailing point dropped: {@code trimmed(12.5, 3)} is {@code "12.5"}, {@code trimmed(8.0, 3)}
     * is {@code "8"}, {@code trimmed(-0.04, 1)} is {@code "0"}; {@code missing} when not finite.
     * Fast (no {@link String#format}) for ordinary values, so it can write plot coordinates by the
     * hundred thousand; its result is always that of {@link #fixed} with the zeros dropped.
     */
    public static String trimmed(double value, int maxDecimals, String missing) {
        if (!Double.isFinite(value)) {
            return missing;
        }
        long rounded = fastRounded(value, maxDecimals);
        if (rounded >= 0) {
            return plainDigits(value < 0, rounded, POW10[maxDecimals]);
        }
        return stripZeros(fixed(value, maxDecimals, missing));
    }

    /**
     * {@code value} rounded half-up to {@code digits} significant digits, in plain notation without
     * trailing zeros: {@code significant(1234567, 6)} is {@code "1234570"},
     * {@code significant(0.0001234567, 6)} is {@code "0.000123457"}; {@code missing} when not finite.
     */
    public static String significant(double value, int digits, String missing) {
        if (!Double.isFinite(value)) {
            return missing;
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(Double.toString(value)).round(new MathContext(digits, RoundingMode.HALF_UP));
        return dropNegativeZero(rounded.stripTrailingZeros().toPlainString());
    }

    /**
     * A number as written or set by a person (a setting, a limit, a run condition), with at most
     * {@link #PLAIN_DIGITS} significant digits and no trailing zeros: {@code "25"}, {@code "0.05"},
     * {@code "-30.5"}, {@code "0.3"} for 0.1 + 0.2; {@code missing} when not finite.
     */
    public static String plain(double value, String missing) {
        return significant(value, PLAIN_DIGITS, missing);
    }

    /**
     * {@code value} with {@code digits} significant digits in {@link java.util.Formatter}'s
     * {@code %g} form, for values of any size: plain from 1e-4 up to 10^digits ({@code "0.00123"},
     * {@code "12.3"}), else with an exponent ({@code "1.23e-05"}); trailing zeros are kept.
     * {@code missing} when not finite.
     */
    public static String general(double value, int digits, String missing) {
        if (!Double.isFinite(value)) {
            return missing;
        }
        return dropNegativeZero(String.format(Locale.ROOT, "%." + digits + "g", value));
    }

    /**
     * A fraction as a percentage with {@code decimals} decimals and a space before the sign, as SI
     * writes it: {@code percent(0.9721, 1)} is {@code "97.2 %"}; {@code missing} when not finite.
     */
    public static String percent(double fraction, int decimals, String missing) {
        String s = fixed(PERCENT * fraction, decimals, null);
        return s == null ? missing : s + " %";
    }

    /**
     * |value|·10^decimals rounded half-up when the fast paths may write it (decimals 0 to 6, below
     * {@link #FAST_LIMIT}, not within {@link #TIE_MARGIN} of a tie, where the binary value may lie
     * on either side); −1 otherwise, and {@link String#format} decides.
     */
    private static long fastRounded(double value, int decimals) {
        if (decimals < 0 || decimals >= POW10.length) {
            return -1;
        }
        double scaled = Math.abs(value * POW10[decimals]);
        return scaled < FAST_LIMIT && Math.abs(scaled - Math.floor(scaled) - 0.5) > TIE_MARGIN
                ? Math.round(scaled) : -1;
    }

    /**
     * The shortest decimal that reads back to exactly {@code value} (a data file that must keep the
     * double): plain notation for magnitudes from 1e-4 up to 1e9 ({@code "-55.43"}, {@code "0.001"},
     * {@code "25"}), an exponent otherwise ({@code "1e-10"}, {@code "1.5e12"}). Being exact, it keeps
     * the sign of zero ({@code "-0"}). {@code missing} when not finite.
     */
    public static String roundTrip(double value, String missing) {
        if (!Double.isFinite(value)) {
            return missing;
        }
        if (value == 0.0) {
            return Double.doubleToRawLongBits(value) == 0L ? "0" : "-0";
        }
        // Double.toString gives a decimal string that parses back to exactly value (Double javadoc).
        String repr = Double.toString(value);
        double mag = Math.abs(value);
        int e = repr.indexOf('E');
        if (e < 0 || (mag >= ROUND_TRIP_PLAIN_MIN && mag < ROUND_TRIP_PLAIN_MAX)) {
            return new BigDecimal(repr).stripTrailingZeros().toPlainString();
        }
        String mantissa = new BigDecimal(repr.substring(0, e)).stripTrailingZeros().toPlainString();
        return mantissa + "e" + repr.substring(e + 1);
    }

    private static String plainDigits(boolean negative, long rounded, long scale) {
        if (rounded == 0) {
            return "0";
        }
        StringBuilder sb = new StringBuilder(24);
        if (negative) {
            sb.append('-');
        }
        sb.append(rounded / scale);
        long frac = rounded % scale;
        if (frac != 0) {
            String f = Long.toString(frac + scale).substring(1);
            int end = f.length();
            while (f.charAt(end - 1) == '0') {
                end--;
            }
            sb.append('.').append(f, 0, end);
        }
        return sb.toString();
    }

    /** {@code rounded / scale} with exactly {@code decimals} decimals (scale = 10^decimals), no negative zero. */
    private static String fixedDigits(boolean negative, long rounded, long scale, int decimals) {
        StringBuilder sb = new StringBuilder(24);
        if (negative && rounded != 0) {
            sb.append('-');
        }
        sb.append(rounded / scale);
        if (decimals > 0) {
            sb.append('.').append(Long.toString(rounded % scale + scale), 1, decimals + 1);
        }
        return sb.toString();
    }

    private static String stripZeros(String fixed) {
        if (fixed.indexOf('.') < 0) {
            return fixed;
        }
        int end = fixed.length();
        while (fixed.charAt(end - 1) == '0') {
            end--;
        }
        if (fixed.charAt(end - 1) == '.') {
            end--;
        }
        return dropNegativeZero(fixed.substring(0, end));
    }

    private static boolean isZero(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '0' && c != '.' && c != '-') {
                return false;
            }
        }
        return true;
    }

    private static String dropNegativeZero(String s) {
        return s.startsWith("-") && isZero(s) ? s.substring(1) : s;
    }
}
