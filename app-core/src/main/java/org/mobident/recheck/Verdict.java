package org.mobident.recheck;

import java.util.Locale;

/**
 * What becomes of an earlier assignment in the new buffer. The peak is first moved by the
 * analyte's predicted (or measured) shift to where it is expected in the new buffer; see
 * {@link Rechecker} for the full rule.
 */
public enum Verdict {
    /**
     * Re-matched to the same analyte, uniquely, and the moved peak still falls inside the
     * analyte's window of the old library (the old buffer's window still catches it).
     */
    STILL_HOLDS,
    /**
     * Re-matched to the same analyte, uniquely, but the moved peak falls outside the analyte's
     * window of the old library: the window must move with the new buffer.
     */
    MOVED_BUT_STILL_UNIQUE,
    /**
     * Ambiguous before, and the re-match still does not identify the analyte uniquely: nothing the
     * new buffer changes.
     */
    STILL_AMBIGUOUS,
    /** The moved peak is still taken for the analyte, or could be, but other analytes are (nearly) as likely. */
    NOW_AMBIGUOUS,
    /** The moved peak would now be taken for a different analyte. */
    REASSIGNED,
    /**
     * The analyte would not be seen as before: missing from the new library, near-zero or
     * sign-reversed mobility, outside the run's mobility range, or no analyte's window reaches the moved peak.
     */
    LOST;

    /** True for the verdicts that mean the new buffer changes nothing for the assignment. */
    public boolean unchanged() {
        return this == STILL_HOLDS || this == STILL_AMBIGUOUS;
    }

    /** snake_case label for reports. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The label in words, for text. */
    public String text() {
        return name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }
}
