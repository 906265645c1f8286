package org.mobident.assess;

/**
 * One reported peak, as far as the scoring needs it.
 *
 * @param number        peak number within its run (1-based)
 * @param role          role label as written in the peak table ("analyte", "neutral marker", "mobility marker")
 * @param timeS         the peak's migration time, s: its centre time where the table gives one (the time
 *                      its mobility comes from), else its apex time (NaN when unknown)
 * @param widthHalfS    full width at half height, s (NaN when unknown)
 * @param signalToNoise signal-to-noise ratio (NaN when unknown)
 * @param mobility      the reported mobility compared with the truth, 1e-9 m²/(V s): the scale-corrected
 *                      mobility when reported, else the one at the library temperature, else as measured
 *                      (NaN when the run has no mobility scale)
 * @param assigned      assigned analyte, or null
 * @param confidence    probability that the assignment is right; for an unassigned peak the probability
 *                      that it is none of the library analytes (NaN when not reported)
 * @param status        what the identification concluded
 */
public record ReportedPeak(int number, String role, double timeS, double widthHalfS, double signalToNoise,
                           double mobility, String assigned, double confidence, Status status) {

    /** Role label of an analyte peak. */
    public static final String ROLE_ANALYTE = "analyte";
    /** Role label of the neutral marker chosen for the run. */
    public static final String ROLE_NEUTRAL_MARKER = "neutral marker";

    /** The status column of the peak table, for peaks. */
    public enum Status {
        IDENTIFIED, AMBIGUOUS, UNASSIGNED, MARKER;

        /** The word used in the peak table. */
        public String label() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** True for a peak in the analyte role (not a marker). */
    public boolean isAnalyte() {
        return ROLE_ANALYTE.equals(role);
    }

    /** True for the run's neutral marker. */
    public boolean isNeutralMarker() {
        return ROLE_NEUTRAL_MARKER.equals(role);
    }

    /** True for an analyte peak with a name: identified or ambiguous. */
    public boolean isCall() {
        return isAnalyte() && assigned != null && (status == Status.IDENTIFIED || status == Status.AMBIGUOUS);
    }

    /** True for an analyte peak that no library analyte was given to. */
    public boolean isUnassigned() {
        return isAnalyte() && !isCall();
    }
}
