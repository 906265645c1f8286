package org.mobident.report.assess;

import org.mobident.assess.Ratio;
import org.mobident.assess.ReliabilityBin;
import org.mobident.text.NumberText;

/**
 * The decimals of the scoring reports (text, CSV, HTML) and their few composite forms; the
 * numbers themselves are written by {@link NumberText}, so equal scores always give equal bytes.
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

    private Figures() {
    }

    /** "97.2 %", or {@code missing} when there was nothing to count. */
    static String percent(Ratio r, String missing) {
        return NumberText.percent(r.value(), PERCENT_DECIMALS, missing);
    }

    /** "35 of 36". */
    static String counted(Ratio r) {
        return r.count() + " of " + r.of();
    }

    /** "0.9-1.0": a reliability bin's edges. */
    static String bin(ReliabilityBin b) {
        return NumberText.fixed(b.lower(), 1, "") + "-" + NumberText.fixed(b.upper(), 1, "");
    }
}
