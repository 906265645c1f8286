package org.mobident.library.standards;

/**
 * Something an analyst should read before trusting a built or merged library.
 *
 * @param kind    what kind of problem
 * @param mix     the mix concerned, or null
 * @param analyte the analyte concerned, or null
 * @param run     the run concerned, or null
 * @param message a complete sentence for the analyst
 */
public record BuildWarning(Kind kind, String mix, String analyte, String run, String message) {

    /** The kinds of warning. */
    public enum Kind {
        /** A run failed as a whole and was left out. */
        RUN_FAILED,
        /** A run has no mobility scale (no marker found) and was left out. */
        NO_MOBILITY_SCALE,
        /** A run names no mix, or one the standards sheet does not define, and was left out. */
        RUN_WITHOUT_MIX,
        /** A run's trace file could not be hashed for the provenance notes. */
        TRACE_NOT_HASHED,
        /** The runs differ in buffer, temperature, lengths or voltage. */
        MIXED_CONDITIONS,
        /** Fewer replicates than the settings ask for. */
        FEW_REPLICATES,
        /** Replicate RSD above the limit of the settings. */
        HIGH_RSD,
        /** A replicate failed the Grubbs test. */
        OUTLIER,
        /**
         * Two analytes' match windows overlap: a peak between them may be ambiguous (identification
         * still tells apart peaks that lie near one of them).
         */
        OVERLAPPING_WINDOWS,
        /**
         * Two analytes lie closer than twice the SD of their difference, √(s₁² + s₂²), or closer than
         * 1 mobility unit: they cannot be told apart by mobility alone.
         */
        INDISTINGUISHABLE,
        /** An analyte of a mix was found in none of its runs (or could not be named). */
        ANALYTE_NOT_FOUND,
        /**
         * A run is sampled too slowly for its earliest zones: a zone under two samples wide at half
         * height cannot be told from a spike, so an analyte there may be missing from its runs.
         */
        SAMPLED_TOO_SLOWLY,
        /** A peak, or a group of peaks, that fits no expected analyte (or is too small to be one). */
        UNEXPECTED_PEAK,
        /** A group that is probably one of the mix's analytes, but nothing tells which. */
        UNNAMED_GROUP,
        /** The data contradict the standards sheet (migration order, charge sign). */
        NAMING_CONFLICT,
        /** A mix's approx_mobility values fit its peaks only at a common factor well away from 1. */
        APPROX_SCALED,
        /** A group's nearest reference value was not clearly nearer than a rival's: left unnamed. */
        DOUBTFUL_REFERENCE_NAME,
        /**
         * Reference values were compared as stated (limiting, infinite-dilution values, or values of an
         * unknown buffer) rather than predicted for the standards' buffer.
         */
        REFERENCE_AS_STATED,
        /** Check: an entry's mobility sign contradicts its charge (cations +, anions −). */
        SIGN_CONTRADICTS_CHARGE,
        /** Check: a mobility faster than any common ion but H⁺ and OH⁻ (probably a unit or typing error). */
        IMPLAUSIBLE_MOBILITY,
        /** Merge: the fresh mean differs from the existing one by more than their combined uncertainty. */
        MEANS_DIFFER,
        /** Merge: the existing entry has no n or SD, so its value was replaced rather than pooled. */
        NOT_POOLED;

        /**
         * True for a finding that is information rather than a warning: overlapping windows are normal
         * for neighbouring analytes (the matcher weighs both), so they are printed but do not make a
         * build or a check end with "warnings".
         */
        public boolean informational() {
            return this == OVERLAPPING_WINDOWS;
        }
    }

    /** True when any of {@code findings} is a warning rather than information. */
    public static boolean anyWarning(java.util.List<BuildWarning> findings) {
        return findings.stream().anyMatch(w -> !w.kind().informational());
    }
}
