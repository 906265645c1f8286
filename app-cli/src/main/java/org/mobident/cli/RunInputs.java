package org.mobident.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.InputException;
import org.mobident.settings.IdentifySettings;
import org.mobident.settings.MatchSettings;
import org.mobident.trace.RunConditions;
import org.mobident.usecase.RunBatch;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Which runs to process and under which conditions: a run sheet or trace files, plus options. */
public final class RunInputs {

    @Option(names = {"-r", "--runs"}, paramLabel = "SHEET",
            description = "Run sheet (CSV, one row per run; trace paths relative to the sheet).")
    Path runSheet;

    @Parameters(paramLabel = "TRACE", arity = "0..*", description = "Trace files to process without a run sheet.")
    List<Path> traces = new ArrayList<>();

    @Option(names = "--no-second-look",
            description = "Do not look again, where the library expects a zone that no peak explains, for a "
                    + "zone hidden in a larger peak or on its flank.")
    boolean noSecondLook;

    @Mixin
    ConditionOptions conditions;

    @Mixin
    CommonOptions common;

    /** True when exactly one of run sheet and trace files was given. */
    boolean given() {
        return (runSheet == null) != traces.isEmpty();
    }

    /** The runs named by the options: a sheet's, or the trace files under the conditions given as options. */
    RunBatch load() throws InputException {
        RunConditions defaults = conditions.toConditions();
        return runSheet != null ? RunBatch.fromSheet(runSheet, defaults)
                : RunBatch.fromTraces(traces, defaults, OptionNames.COMMAND_LINE);
    }

    /** The settings from the options; an option value the engine refuses is a usage error, not an internal one. */
    IdentifySettings settings(MatchSettings matchSettings) throws InputException {
        common.takeFrom(conditions.method());
        try {
            IdentifySettings s = IdentifySettings.defaults()
                    .withMatchSettings(matchSettings)
                    .withPeakSettings(common.peakSettings())
                    .withReadOptions(common.readOptions())
                    .withLookWhereExpected(!noSecondLook);
            return common.threads != null ? s.withThreads(common.threads) : s;
        } catch (IllegalArgumentException e) {
            String option = common.threads != null && common.threads < 1 ? "--threads" : "--min-sn";
            throw new picocli.CommandLine.ParameterException(new picocli.CommandLine(this),
                    option + ": " + e.getMessage());
        }
    }
}
