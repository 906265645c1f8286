package org.mobident.trace.io;

/**
 * Parses a decimal number straight from bytes, correctly rounded.
 *
 * <p>Accepted syntax: optional sign, digits with an optional decimal separator (at least one
 * digit on either side), optional exponent {@code e|E[sign]digits}. No spaces, no hex, no
 * {@code NaN}/{@code Infinity}, no type suffix. The exact fast path is Clinger's (W. D. Clinger,
 * "How to read floating point numbers accurately", PLDI 1990): when the decimal significand
 * {@code m} is at most 2^53 and the power {@code 10^|e|} is itself exactly representable
 * ({@code |e| ≤ 22}), {@code m × 10^e} or {@code m / 10^-e} is a single correctly rounded IEEE
 * operation on exact operands. Everything else goes to {@link Double#parseDouble}.
 */
final class FastDoubleParser {

    /** Largest integer such that it and every smaller one is exact in a double: 2^53. */
    private static final long MAX_EXACT_SIGNIFICAND = 1L << 53;
    /** Significand digits kept in a long without overflow (10^18 - 1 &lt; 2^63). */
    private static final int MAX_SIGNIFICAND_DIGITS = 18;
    /** 10^22 is the largest power of ten that a double holds exactly (5^22 &lt; 2^53). */
    private static final int MAX_EXACT_POWER = 22;
    /** Exponent magnitudes past this overflow or underflow any double; clamping avoids int overflow. */
    private static final int EXPONENT_CLAMP = 100_000;

    private static final double[] POWERS_OF_TEN = new double[MAX_EXACT_POWER + 1];
    private static final long[] LONG_POWERS_OF_TEN = new long[MAX_SIGNIFICAND_DIGITS + 1];

    static {
        double p = 1.0;
        for (int i = 0; i <= MAX_EXACT_POWER; i++) {
            POWERS_OF_TEN[i] = p;
            p *= 10.0;
        }
        long q = 1L;
        for (int i = 0; i <= MAX_SIGNIFICAND_DIGITS; i++) {
            LONG_POWERS_OF_TEN[i] = q;
            q *= 10L;
        }
    }

    private FastDoubleParser() {
    }

    /**
     * Parses {@code bytes[from, to)}.
     *
     * @param decimalComma whether {@code ','} is accepted as decimal separator (as well as {@code '.'})
     * @return the correctly rounded value (±Infinity when it overflows), or {@code NaN} when the
     *         text is not a number in the accepted syntax (a valid number never gives NaN)
     */
    static double parse(byte[] bytes, int from, int to, boolean decimalComma) {
        int i = from;
        if (i >= to) {
            return Double.NaN;
        }
        boolean negative = false;
        byte c = bytes[i];
        if (c == '-' || c == '+') {
            negative = c == '-';
            i++;
        }
        long significand = 0;
        int keptDigits = 0;
        int exponent = 0;
        boolean dropped = false;
        boolean anyDigit = false;
        while (i < to && (c = bytes[i]) >= '0' && c <= '9') {
            anyDigit = true;
            if (keptDigits < MAX_SIGNIFICAND_DIGITS) {
                significand = significand * 10 + (c - '0');
                if (significand != 0) {
                    keptDigits++;
                }
            } else {
                exponent++;
                dropped |= c != '0';
            }
            i++;
        }
        if (i < to && (bytes[i] == '.' || (decimalComma && bytes[i] == ','))) {
            i++;
            while (i < to && (c = bytes[i]) >= '0' && c <= '9') {
                anyDigit = true;
                if (keptDigits < MAX_SIGNIFICAND_DIGITS) {
                    significand = significand * 10 + (c - '0');
                    if (significand != 0) {
                        keptDigits++;
                    }
                    exponent--;
                } else {
                    dropped |= c != '0';
                }
                i++;
            }
        }
        if (!anyDigit) {
            return Double.NaN;
        }
        if (i < to && (bytes[i] == 'e' || bytes[i] == 'E')) {
            i++;
            boolean negativeExponent = false;
            if (i < to && (bytes[i] == '-' || bytes[i] == '+')) {
                negativeExponent = bytes[i] == '-';
                i++;
            }
            if (i >= to) {
                return Double.NaN;
            }
            int e = 0;
            while (i < to && (c = bytes[i]) >= '0' && c <= '9') {
                if (e < EXPONENT_CLAMP) {
                    e = e * 10 + (c - '0');
                }
                i++;
            }
            if (i < to) {
                return Double.NaN;
            }
            exponent += negativeExponent ? -e : e;
        } else if (i < to) {
            return Double.NaN;
        }
        if (significand == 0) {
            // Only zero digits were kept; the dropped ones (beyond 18 significant) cannot be non-zero
            // because digits are kept from the first non-zero one on.
            return negative ? -0.0 : 0.0;
        }
        if (!dropped && significand <= MAX_EXACT_SIGNIFICAND) {
            if (exponent >= 0 && exponent <= MAX_EXACT_POWER) {
                double v = significand * POWERS_OF_TEN[exponent];
                return negative ? -v : v;
            }
            if (exponent < 0 && exponent >= -MAX_EXACT_POWER) {
                double v = significand / POWERS_OF_TEN[-exponent];
                return negative ? -v : v;
            }
            // Clinger's extension: move surplus powers of ten into the significand while it stays exact.
            int surplus = exponent - MAX_EXACT_POWER;
            if (surplus > 0 && surplus <= MAX_SIGNIFICAND_DIGITS
                    && significand <= MAX_EXACT_SIGNIFICAND / LONG_POWERS_OF_TEN[surplus]) {
                double v = (significand * LONG_POWERS_OF_TEN[surplus]) * POWERS_OF_TEN[MAX_EXACT_POWER];
                return negative ? -v : v;
            }
        }
        return slowPath(bytes, from, to);
    }

    /** Hands the already validated text to the JDK, with a decimal comma turned into a point. */
    private static double slowPath(byte[] bytes, int from, int to) {
        char[] chars = new char[to - from];
        for (int k = from; k < to; k++) {
            byte b = bytes[k];
            chars[k - from] = b == ',' ? '.' : (char) b;
        }
        try {
            return Double.parseDouble(new String(chars));
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
