package org.mobident.trace;

import java.util.Arrays;
import java.util.Objects;

/**
 * One detector trace: strictly increasing times in seconds and the signal at each time.
 * Immutable: the arrays are copied in (except by {@link #adopting}, whose caller hands them over)
 * and copied out. Sampling may be irregular.
 */
public final class Trace {
    private final String name;
    private final String sourceFile;
    private final double[] timeS;
    private final double[] signal;
    private final String readingNote;

    /**
     * @param name       run name (trace file name without extension)
     * @param sourceFile file the trace came from, as named by the user (for messages)
     * @param timeS      strictly increasing finite times in s (copied, not modified)
     * @param signal     finite signal values, same length (copied, not modified)
     */
    public Trace(String name, String sourceFile, double[] timeS, double[] signal) {
        this(name, sourceFile, timeS, signal, true, "");
    }

    private Trace(String name, String sourceFile, double[] timeS, double[] signal, boolean copy, String readingNote) {
        this.name = Objects.requireNonNull(name, "name");
        this.readingNote = Objects.requireNonNull(readingNote, "readingNote");
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
        this.timeS = copy ? timeS.clone() : timeS;
        this.signal = copy ? signal.clone() : signal;
    }

    /**
     * A trace that takes over {@code timeS} and {@code signal} instead of copying them, for code
     * that has just filled fresh arrays (a file reader) and would otherwise copy them once more.
     * The checks are those of the constructor. The caller hands the arrays over: it must neither
     * keep nor change them afterwards, nor pass them to anyone else; the trace itself never
     * changes them and still hands out copies only, so it is as immutable as one built by the
     * constructor.
     *
     * @param name       run name (trace file name without extension)
     * @param sourceFile file the trace came from, as named by the user (for messages)
     * @param timeS      strictly increasing finite times in s (taken over, not copied)
     * @param signal     finite signal values, same length (taken over, not copied)
     */
    public static Trace adopting(String name, String sourceFile, double[] timeS, double[] signal) {
        return new Trace(name, sourceFile, timeS, signal, false, "");
    }

    /**
     * How the file was read where that departs from what it says (e.g. times rebuilt as an even grid
     * because they were written with too few decimals); empty when it was read as written.
     */
    public String readingNote() {
        return readingNote;
    }

    /** The same trace with a note on how it was read (see {@link #readingNote()}). */
    public Trace withReadingNote(String note) {
        return new Trace(name, sourceFile, timeS, signal, false, note);
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

    /** The points [fromIndex, toIndex) as a trace of their own (same name and source), copied once. */
    public Trace slice(int fromIndex, int toIndex) {
        return new Trace(name, sourceFile, Arrays.copyOfRange(timeS, fromIndex, toIndex),
                Arrays.copyOfRange(signal, fromIndex, toIndex), false, readingNote);
    }

    /** A new trace with the same times and source but another signal. */
    public Trace withSignal(double[] newSignal) {
        return new Trace(name, sourceFile, timeS, newSignal.clone(), false, readingNote);
    }

    @Override
    public String toString() {
        return "Trace[" + name + ", " + timeS.length + " points, " + timeS[0] + "–"
                + timeS[timeS.length - 1] + " s]";
    }
}
