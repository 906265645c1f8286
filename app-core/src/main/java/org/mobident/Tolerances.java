package org.mobident;

/** Numeric tolerances and default thresholds of the engine, all in one place. */
public final class Tolerances {
    /** Relative tolerance for treating two doubles as equal in geometry checks. */
    public static final double RELATIVE_EPSILON = 1e-12;

    /** Signal-to-noise ratio of the detection limit, 3:1 (ICH Q2(R1), 2005, § 6.2; from memory). */
    public static final double DETECTION_LIMIT_SIGNAL_TO_NOISE = 3.0;

    /** Signal-to-noise ratio of the quantitation limit, 10:1 (ICH Q2(R1), 2005, § 7.2; from memory). */
    public static final double QUANTITATION_LIMIT_SIGNAL_TO_NOISE = 10.0;

    /** Lower end of the signal-to-noise ratios accepted for the detection limit: "a signal-to-noise
     *  ratio between 3 or 2:1 is generally considered acceptable" (ICH Q2(R1), 2005, § 6.2; from memory). */
    public static final double LOWEST_DETECTION_LIMIT_SIGNAL_TO_NOISE = 2.0;

    /**
     * Default signal-to-noise threshold for a peak to be reported: the lower end of the detection
     * limit, 2:1. Peaks between 2 and 3 are reported and marked "at detection limit", those between
     * 3 and 10 "below quantitation limit". With S/N = 2H/h and h the peak-to-peak noise, S/N 2 is
     * a height of about 4–5 noise SDs; faint peaks below 3 must also have the width of the run's
     * zones and stand significantly above the smoothed noise (see {@code PeakDetector}).
     */
    public static final double DEFAULT_MIN_SIGNAL_TO_NOISE = LOWEST_DETECTION_LIMIT_SIGNAL_TO_NOISE;

    private Tolerances() {
    }
}
