package org.mobident.assess;

import java.util.Locale;

/**
 * Number formats of the scoring reports (text, CSV, HTML), all {@link Locale#ROOT}, so equal
 * scores always give equal bytes. A value that rounds to zero has no minus sign.
 */
final class Figures {

    /** Decimals of fractions (precision, recall, confidence, ECE) in tables. */
    static final int FRACTION_DECIMALS = 4;
    /** Decimals of the Brier score in the terminal and the page. */
    static final int BRIER_DECIMALS = 4;
    /** Decimals of a percentage. */
    static final int PERCENT_DECIMALS = 1;
    /** Decimals of confidences and ECE in the terminal and the page. */
    static final int CONFIDENCE_DECIMALS = 3;
    /** Decimals of mobilities and mobility errors, 1e-9 m²/(V s). */
    static final int MOBILITY_DECIMALS = 4;
    /** Decimals of mobility errors in the terminal and the page. */
    static final int MOBILITY_ERROR_DECIMALS = 3;
    /** Decimals of times in tables, s (as in the peak table). */
    static final int TABLE_TIME_DECIMALS = 4;

    private static final double PERCENT = 100.0;

    private Figures() {
    }

    /** {@code value} with {@code decimals} decimals, or {@code missing} when not finite. */
    static String fixed(double value, int decimals, String missing) {
        if (!Double.isFinite(value)) {
            return missing;
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", value);
        return s.matches("-0(\\.0+)?") ? s.substring(1) : s;
    }

    /** As {@link #fixed} with an explicit sign for non-zero values ("+0.012", "-0.003", "0.000"). */
    static String signed(double value, int decimals, String missing) {
        String s = fixed(value, decimals, missing);
        return Double.isFinite(value) && !s.startsWith("-") && s.matches(".*[1-9].*") ? "+" + s : s;
    }

    /** "97.2 %", or {@code missing} when there was nothing to count. */
    static String percent(Ratio r, String missing) {
        return Double.isNaN(r.value()) ? missing : fixed(PERCENT * r.value(), PERCENT_DECIMALS, missing) + " %";
    }

    /** "35 of 36". */
    static String counted(Ratio r) {
        return r.count() + " of " + r.of();
    }

    /** A limit as the user gave it, without trailing zeros ("0.95"). */
    static String plain(double value) {
        return java.math.BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /** "0.9-1.0": a reliability bin's edges. */
    static String bin(ReliabilityBin b) {
        return fixed(b.lower(), 1, "") + "-" + fixed(b.upper(), 1, "");
    }
}
