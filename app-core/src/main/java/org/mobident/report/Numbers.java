package org.mobident.report;

import org.mobident.text.NumberText;

/**
 * The peak tables' number formats, kept as a thin delegate to {@link NumberText}: non-finite
 * values (NaN, infinities) format as {@code null}, which the writers turn into an empty CSV cell or
 * a JSON {@code null}.
 */
final class Numbers {

    /** Significant digits of library model values (pKa, limiting mobilities) written as text. */
    static final int LIBRARY_DIGITS = 6;

    private Numbers() {
    }

    /** {@link NumberText#fixed}, or null when not finite. */
    static String fixed(double value, int decimals) {
        return NumberText.fixed(value, decimals, null);
    }

    /** {@link NumberText#significant}, or null when not finite. */
    static String significant(double value, int digits) {
        return NumberText.significant(value, digits, null);
    }

    /** The integer nearest to {@code value}, or null when not finite. */
    static String integer(double value) {
        return NumberText.fixed(value, 0, null);
    }
}
