package org.mobident.trace.io;

import org.mobident.trace.TimeScale;

/**
 * How to read a delimited trace file. Each {@code null} means "decide from the file".
 *
 * @param timeScale    unit of the time column; {@code null}: from the header, seconds when it says none
 * @param timeColumn   name of the time column (case-insensitive), or its position as a whole number
 *                     (1 = first) where no column has that name; {@code null}: recognised from the header
 *                     (the first column of a file without a header line)
 * @param signalColumn name or position of the signal column, as for the time; {@code null}: recognised
 *                     from the header, else the first column that is not the time column (the other of
 *                     two columns in a file without a header line)
 */
public record TraceReadOptions(TimeScale timeScale, String timeColumn, String signalColumn) {

    /** Everything decided from the file. */
    public static final TraceReadOptions DEFAULT = new TraceReadOptions(null, null, null);

    /** A copy with the given time unit. */
    public TraceReadOptions withTimeScale(TimeScale scale) {
        return new TraceReadOptions(scale, timeColumn, signalColumn);
    }

    /** A copy with the given column names ({@code null} = recognise from the header). */
    public TraceReadOptions withColumns(String time, String signal) {
        return new TraceReadOptions(timeScale, time, signal);
    }
}
