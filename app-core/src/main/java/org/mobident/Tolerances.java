package org.mobident;

/** Numeric tolerances and default thresholds of the engine, all in one place. */
public final class Tolerances {
    /** Relative tolerance for treating two doubles as equal in geometry checks. */
    public static final double RELATIVE_EPSILON = 1e-12;

    /** Default signal-to-noise threshold for a peak to be reported (ICH Q2 LOD convention is 3). */
    public static final double DEFAULT_MIN_SIGNAL_TO_NOISE = 5.0;

    private Tolerances() {
    }
}
