package org.mobident.result;

import java.util.Locale;

/** What the matching concluded for a peak. */
public enum MatchStatus {
    /** One library analyte clearly explains the peak. */
    IDENTIFIED,
    /** An analyte is assigned, but another explanation is nearly as likely. */
    AMBIGUOUS,
    /** No library analyte explains the peak well enough (or all were taken by better peaks). */
    UNASSIGNED;

    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
