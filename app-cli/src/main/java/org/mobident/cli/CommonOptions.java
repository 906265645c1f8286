package org.mobident.cli;

import org.mobident.settings.PeakSettings;
import org.mobident.trace.TimeScale;
import org.mobident.trace.io.TraceReadOptions;
import picocli.CommandLine.Option;

/** Options shared by the commands that read traces. */
public final class CommonOptions {
    @Option(names = "--time-unit", paramLabel = "UNIT",
            description = "Unit of the trace time column when its header does not say: s, min or ms.")
    String timeUnit;

    @Option(names = "--time-column", paramLabel = "NAME|N",
            description = "Time column of the trace files, by its header name or its position (1 = first). Default:"
                    + " the column whose header names a time, or the first column of a file without a header line.")
    String timeColumn;

    @Option(names = "--signal-column", paramLabel = "NAME|N",
            description = "Signal column of the trace files, by its header name or its position (1 = first)."
                    + " Default: the column whose header names a detector signal, else the first other column;"
                    + " a file without a header line and with more than two columns needs it.")
    String signalColumn;

    @Option(names = "--min-sn", paramLabel = "S/N",
            description = "Smallest signal-to-noise ratio of a reported peak, S/N = 2H/h with h the peak-to-peak"
                    + " noise over 5 peak widths around it (Ph. Eur. 2.2.46). Default ${DEFAULT-VALUE}: every peak"
                    + " that stands significantly above the noise around it is reported (about one false peak in"
                    + " a hundred runs), whatever its S/N; the sn_class column marks those below 2 and 3 (the ICH Q2"
                    + " detection limit) and below 10 (the quantitation limit). Set your validated limit, e.g. 3,"
                    + " to report only peaks above it.")
    double minSignalToNoise = PeakSettings.DEFAULT.minSignalToNoise();

    @Option(names = "--threads", paramLabel = "N", description = "Runs processed at once (default: all cores).")
    Integer threads;

    @Option(names = "--debug", description = "Show the full error trace when something goes wrong.")
    boolean debug;

    /** Takes the time unit and the columns the command line leaves unset from a method file, if any. */
    void takeFrom(MethodFile method) {
        if (method == null) {
            return;
        }
        timeUnit = timeUnit != null ? timeUnit : method.text("time-unit");
        timeColumn = timeColumn != null ? timeColumn : method.text("time-column");
        signalColumn = signalColumn != null ? signalColumn : method.text("signal-column");
    }

    TraceReadOptions readOptions() {
        String time = blankToNull(timeColumn, "--time-column");
        String signal = blankToNull(signalColumn, "--signal-column");
        if (timeUnit == null) {
            return new TraceReadOptions(null, time, signal);
        }
        TimeScale scale;
        switch (timeUnit.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "s":
            case "sec":
            case "seconds":
                scale = TimeScale.SECONDS;
                break;
            case "min":
            case "minutes":
                scale = TimeScale.MINUTES;
                break;
            case "ms":
            case "milliseconds":
                scale = TimeScale.MILLISECONDS;
                break;
            default:
                throw new picocli.CommandLine.ParameterException(new picocli.CommandLine(this),
                        "--time-unit: expected s, min or ms, got '" + timeUnit + "'");
        }
        return new TraceReadOptions(scale, time, signal);
    }

    /** The column option as given, or null when not given; a blank one is refused. */
    private String blankToNull(String value, String option) {
        if (value == null) {
            return null;
        }
        if (value.isBlank()) {
            throw new picocli.CommandLine.ParameterException(new picocli.CommandLine(this),
                    option + ": expected a column name or position (1 = first), got an empty value");
        }
        return value.trim();
    }

    PeakSettings peakSettings() {
        return PeakSettings.DEFAULT.withMinSignalToNoise(minSignalToNoise);
    }
}
