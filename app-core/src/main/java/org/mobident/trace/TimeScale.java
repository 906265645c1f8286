package org.mobident.trace;

/** Unit of the time column in a trace file. */
public enum TimeScale {
    SECONDS(1.0),
    MINUTES(60.0),
    MILLISECONDS(0.001);

    private final double seconds;

    TimeScale(double seconds) {
        this.seconds = seconds;
    }

    /** Converts a value in this unit to seconds. */
    public double toSeconds(double value) {
        return value * seconds;
    }
}
