package org.mobident.simulate;

import java.util.Objects;
import org.mobident.trace.TimeScale;

/**
 * How {@link TraceSimulator} lays out a trace file: header names, delimiter, decimal mark and
 * time unit. Times are written with up to {@link #TIME_DECIMALS_S} decimals in seconds (8 in
 * minutes), the signal with up to {@link #SIGNAL_DECIMALS} decimals; trailing zeros are dropped.
 *
 * @param timeHeader   header of the time column
 * @param signalHeader header of the signal column
 * @param delimiter    field delimiter
 * @param decimalComma write ',' as the decimal mark (needs a delimiter other than ',')
 * @param timeUnit     unit of the time column
 */
public record TraceFileStyle(String timeHeader, String signalHeader, char delimiter, boolean decimalComma,
                             TimeScale timeUnit) {

    /** Decimals of a time in seconds (1 µs). */
    public static final int TIME_DECIMALS_S = 6;
    /** Decimals of a time in minutes (below 1 µs). */
    public static final int TIME_DECIMALS_MIN = 8;
    /** Decimals of a signal value. */
    public static final int SIGNAL_DECIMALS = 6;

    /** {@code time_s,signal}, seconds, decimal point: the format the engine writes. */
    public static final TraceFileStyle SECONDS_CSV =
            new TraceFileStyle("time_s", "signal", ',', false, TimeScale.SECONDS);

    /** {@code Time (min);Signal}, minutes, decimal comma: as some instrument exports look. */
    public static final TraceFileStyle MINUTES_SEMICOLON_DECIMAL_COMMA =
            new TraceFileStyle("Time (min)", "Signal", ';', true, TimeScale.MINUTES);

    /** {@code Time [s]<TAB>Absorbance [mAU]}, seconds, decimal point: a tab-separated export. */
    public static final TraceFileStyle SECONDS_TAB =
            new TraceFileStyle("Time [s]", "Absorbance [mAU]", '\t', false, TimeScale.SECONDS);

    public TraceFileStyle {
        Objects.requireNonNull(timeHeader, "timeHeader");
        Objects.requireNonNull(signalHeader, "signalHeader");
        Objects.requireNonNull(timeUnit, "timeUnit");
        if (decimalComma && delimiter == ',') {
            throw new IllegalArgumentException("a decimal comma needs a delimiter other than ','");
        }
    }

    int timeDecimals() {
        return timeUnit == TimeScale.MINUTES ? TIME_DECIMALS_MIN : TIME_DECIMALS_S;
    }
}
