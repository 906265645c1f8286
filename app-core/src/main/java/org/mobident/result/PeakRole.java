package org.mobident.result;

import java.util.Locale;

/** The part a peak plays in its run. */
public enum PeakRole {
    ANALYTE,
    /** The neutral marker that moves with the electro-osmotic flow. */
    NEUTRAL_MARKER,
    /** A charged marker of known mobility (two-marker mode). */
    MOBILITY_MARKER;

    public String label() {
        return name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }
}
