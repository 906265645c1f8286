package org.mobident.recheck;

import java.util.Locale;

/** What becomes of an earlier assignment in the new buffer. */
public enum Verdict {
    /** The same analyte, still unique, and the peak's old mobility still falls in its window. */
    STILL_HOLDS,
    /** Still unique once moved by the predicted shift, but the shift takes it out of its old window. */
    MOVED_STILL_UNIQUE,
    /** Once moved, other analytes are (nearly) as likely, or the assignment changes. */
    NOW_AMBIGUOUS,
    /** The analyte would not be seen as before: missing from library B, near-zero or sign-reversed mobility, or outside the run's mobility range. */
    LOST;

    /** snake_case label for reports. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
