package org.mobident.assess;

/**
 * One scored run: whether it was processed, got a mobility scale, and chose the right neutral marker.
 *
 * @param run           run name
 * @param failed        the run could not be processed
 * @param mobilityKnown a mobility scale was set
 * @param marker        how the chosen neutral marker compares with the known one
 * @param markerNote    a sentence on the marker when it is off or missing, else null
 */
public record RunCheck(String run, boolean failed, boolean mobilityKnown, MarkerCheck marker, String markerNote) {

    /** How the run's chosen neutral marker compares with the known marker. */
    public enum MarkerCheck {
        /** The chosen neutral marker is the peak on the known marker. */
        RIGHT,
        /** A neutral marker was chosen, but not the peak on the known marker. */
        OFF,
        /** The known marker has a time but no neutral marker was reported. */
        NOT_REPORTED,
        /** Nothing to compare: no known marker with a time, or the run failed. */
        NOT_CHECKED;

        /** The word used in tables. */
        public String label() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }

        /** True when the check found a problem. */
        public boolean problem() {
            return this == OFF || this == NOT_REPORTED;
        }
    }
}
