package org.mobident.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.matching.MatchSettings;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.RunResult;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.io.RunSheet;
import org.mobident.trace.io.RunSheetReader;
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

    @Mixin
    ConditionOptions conditions;

    @Mixin
    CommonOptions common;

    /** The runs that can be processed, the rows that cannot (as failed results), and sheet text columns. */
    record Loaded(List<RunSpec> runs, List<RunResult> rejected, Map<String, String> sampleByRun,
                  Map<String, String> mixByRun) {
    }

    /** True when exactly one of run sheet and trace files was given. */
    boolean given() {
        return (runSheet == null) != traces.isEmpty();
    }

    Loaded load() throws InputException {
        RunConditions defaults = conditions.toConditions();
        List<RunSpec> runs = new ArrayList<>();
        List<RunResult> rejected = new ArrayList<>();
        if (runSheet != null) {
            RunSheet sheet = RunSheetReader.read(runSheet, defaults);
            runs.addAll(sheet.runs());
            for (InputException problem : sheet.rowProblems()) {
                rejected.add(RunResult.failure(new RunSpec("sheet line " + problem.line(), null,
                        RunConditions.EMPTY, runSheet.toString(), problem.line()), problem));
            }
            return new Loaded(runs, rejected, sheet.sampleByRun(), sheet.mixByRun());
        }
        for (Path t : traces) {
            try {
                runs.add(RunSheetReader.single(t, defaults));
            } catch (InputException e) {
                rejected.add(RunResult.failure(new RunSpec(RunSpec.runNameOf(t), null, defaults, OptionNames.COMMAND_LINE, 0), e));
            }
        }
        return new Loaded(runs, rejected, Map.of(), Map.of());
    }

    /** The settings from the options; an option value the engine refuses is a usage error, not an internal one. */
    IdentifySettings settings(MatchSettings matchSettings) {
        try {
            IdentifySettings s = IdentifySettings.defaults()
                    .withMatchSettings(matchSettings)
                    .withPeakSettings(common.peakSettings())
                    .withReadOptions(common.readOptions());
            return common.threads != null ? s.withThreads(common.threads) : s;
        } catch (IllegalArgumentException e) {
            String option = common.threads != null && common.threads < 1 ? "--threads" : "--min-sn";
            throw new picocli.CommandLine.ParameterException(new picocli.CommandLine(this),
                    option + ": " + e.getMessage());
        }
    }
}
