package org.mobident.assess;

import java.util.Locale;

/** What the truth says about one reported peak, or about a known row that no peak was found for. */
public enum Verdict {
    /** An analyte peak called (identified or ambiguous) by the name of the analyte it is. */
    RIGHT,
    /** An analyte peak called by another name than that of the library analyte it is. */
    WRONG_NAME,
    /** An analyte peak called by a library name where no library analyte is (a foreign zone, the marker, a spike, or nothing known). */
    CALLED_ABSENT,
    /** An analyte peak left unassigned although it is a library analyte. */
    NOT_NAMED,
    /** An analyte peak left unassigned that is indeed none of the library analytes. */
    RIGHTLY_UNASSIGNED,
    /** An unassigned analyte peak whose truth is not known (the run lists analytes without times). */
    NO_VERDICT,
    /** A marker peak on the known marker. */
    MARKER_RIGHT,
    /** A marker peak that is not on the known marker. */
    MARKER_ELSEWHERE,
    /** A known row that no reported peak belongs to. */
    NOT_FOUND;

    /** The word used in tables. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
