package org.mobident.recheck;

import java.util.Locale;

/** Where the model data of a predicted mobility came from, in decreasing order of trust. */
public enum PredictionBasis {
    /** The library entry's own pKa values and limiting mobilities. */
    ENTRY_MODEL,
    /** Matched by name to the shipped reference library (handbook pKa and limiting mobilities). */
    REFERENCE_MODEL,
    /** Only the entry's charge number: treated as a strong ion, its measured mobility as the limiting one. */
    CHARGE_ONLY,
    /**
     * No model data: only the viscosity (temperature) and a univalent ionic-strength transfer,
     * with a larger uncertainty; a pH change is not accounted for.
     */
    NO_MODEL;

    /** snake_case label for reports. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** What the prediction rests on, in words for a table column. */
    public String description() {
        return switch (this) {
            case ENTRY_MODEL -> "own pKa data";
            case REFERENCE_MODEL -> "reference pKa data";
            case CHARGE_ONLY -> "charge only";
            case NO_MODEL -> "no model: temperature and ionic strength only";
        };
    }

    /** True when the pH dependence was modelled (pKa values, or a strong ion known to have none). */
    public boolean modelled() {
        return this != NO_MODEL;
    }
}
