package org.mobident.trace;

import java.util.Arrays;
import java.util.Objects;

/**
 * One detector trace: strictly increasing times in seconds and the signal at each time.
 * Immutable: the arrays are copied in and copied out. Sampling may be irregular.
 */
public final class Trace {
    private final String name;
    private final String sourceFile;
    private final double[] timeS;
    private final double[] signal;

    /**
     * @param name       run name (trace file name without extension)
     * @param sourceFile file the trace came from, as named by the user (for messages)
     * @param timeS      strictly increasing finite times in s (copied, not modified)
     * @param signal     finite signal values, same length (copied, not modified)
     */
    public Trace(String name, String sourceFile, double[] timeS, double[] signal) {
        this.name = Objects.requireNonNull(name, "name");
        this.sourceFile = Objects.requireNonNull(sourceFile, "sourceFile");
        if (timeS.length != signal.length) {
            throw new IllegalArgumentException("time and signal differ in length: "
                    + timeS.length + " vs " + signal.length);
        }
        if (timeS.length < 2) {
            throw new IllegalArgumentException("a trace needs at least two points");
        }
        for (int i = 0; i < timeS.length; i++) {
            if (!Double.isFinite(timeS[i]) || !Double.isFinite(signal[i])) {
                throw new IllegalArgumentException("non-finite value at point " + i);
            }
            if (i > 0 && !(timeS[i] > timeS[i - 1])) {
                throw new IllegalArgumentException("time not strictly increasing at point " + i);
            }
        }
        this.timeS = timeS.clone();
        this.signal = signal.clone();
    }

    public String name() {
        return name;
    }

    public String sourceFile() {
        return sourceFile;
    }

    public int size() {
        return timeS.length;
    }

    /** Time of point {@code i} in s. */
    public double timeS(int i) {
        return timeS[i];
    }

    /** Signal at point {@code i}. */
    public double signal(int i) {
        return signal[i];
    }

    /** A copy of the times in s. */
    public double[] timesS() {
        return timeS.clone();
    }

    /** A copy of the signal. */
    public double[] signals() {
        return signal.clone();
    }

    public double startTimeS() {
        return timeS[0];
    }

    public double endTimeS() {
        return timeS[timeS.length - 1];
    }

    /** Index of the first point with time ≥ {@code tS} (size() when none), by binary search. */
    public int indexAtOrAfter(double tS) {
        int i = Arrays.binarySearch(timeS, tS);
        return i >= 0 ? i : -i - 1;
    }

    /** A new trace with the same times and source but another signal. */
    public Trace withSignal(double[] newSignal) {
        return new Trace(name, sourceFile, timeS, newSignal);
    }

    @Override
    public String toString() {
        return "Trace[" + name + ", " + timeS.length + " points, " + timeS[0] + "–"
                + timeS[timeS.length - 1] + " s]";
    }
}
