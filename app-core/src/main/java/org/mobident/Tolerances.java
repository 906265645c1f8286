package org.mobident;

/** Numeric tolerances and default thresholds of the engine, all in one place. */
public final class Tolerances {
    /** Relative tolerance for treating two doubles as equal in geometry checks. */
    public static final double RELATIVE_EPSILON = 1e-12;

    /** Signal-to-noise ratio of the detection limit, 3:1 (ICH Q2(R1), 2005, § 6.2; from memory). */
    public static final double DETECTION_LIMIT_SIGNAL_TO_NOISE = 3.0;

    /** Signal-to-noise ratio of the quantitation limit, 10:1 (ICH Q2(R1), 2005, § 7.2; from memory). */
    public static final double QUANTITATION_LIMIT_SIGNAL_TO_NOISE = 10.0;

    /**
     * Default signal-to-noise threshold for a peak to be reported: the detection limit. Peaks
     * between it and the quantitation limit are reported and marked as such.
     */
    public static final double DEFAULT_MIN_SIGNAL_TO_NOISE = DETECTION_LIMIT_SIGNAL_TO_NOISE;

    private Tolerances() {
    }
}
