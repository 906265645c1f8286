package org.mobident.assess;

import java.util.Locale;

/** How a reported peak was tied to a row of the known-identities table. */
public enum MatchedBy {
    /** Its apex is the nearest to the row's time, within the tolerance. */
    TIME,
    /** The row has no time and the peak carries the row's analyte name. */
    NAME;

    /** The word used in tables. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
