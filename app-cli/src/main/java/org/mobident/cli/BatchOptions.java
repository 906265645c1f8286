package org.mobident.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.matching.MatchSettings;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.RunResult;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.RunSheet;
import org.mobident.trace.io.RunSheetReader;
import org.mobident.trace.io.TraceFiles;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The inputs every command that identifies runs shares: runs (a run sheet or trace files), the
 * library, run conditions, match and detection settings. {@link #identify()} does the work.
 */
public final class BatchOptions {

    @Option(names = {"-r", "--runs"}, paramLabel = "SHEET",
            description = "Run sheet (CSV, one row per run; trace paths relative to the sheet).")
    Path runSheet;

    @Parameters(paramLabel = "TRACE", arity = "0..*", description = "Trace files to process without a run sheet.")
    List<Path> traces = new ArrayList<>();

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "Mobility library (CSV).")
    Path libraryFile;

    @Mixin
    ConditionOptions conditions;

    @Mixin
    MatchOptions matching;

    @Mixin
    CommonOptions common;

    /** The loaded inputs and the results, in run order (rejected sheet rows last). */
    record Batch(Library library, List<RunSpec> runs, List<RunResult> results, IdentifySettings settings) {
        /** Re-reads the traces of the runs that were processed, for plots; runs that fail are left out. */
        Map<String, Trace> traces() {
            Map<String, Trace> out = new LinkedHashMap<>();
            for (RunResult r : results) {
                if (!r.failed() && r.spec().traceFile() != null) {
                    try {
                        out.put(r.spec().name(), TraceFiles.read(r.spec().traceFile(), settings.readOptions()));
                    } catch (InputException e) {
                        // the run was read once already; if it vanished since, its plot is left out
                    }
                }
            }
            return out;
        }
    }

    /** True when exactly one of run sheet and trace files was given. */
    boolean runsGiven() {
        return (runSheet == null) != traces.isEmpty();
    }

    Batch identify() throws InputException {
        Library library = LibraryCsv.read(libraryFile);
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
        } else {
            for (Path t : traces) {
                try {
                    runs.add(RunSheetReader.single(t, defaults));
                } catch (InputException e) {
                    rejected.add(RunResult.failure(new RunSpec(RunSpec.runNameOf(t), null, defaults,
                            "command line", 0), e));
                }
            }
        }
        IdentifySettings settings = IdentifySettings.defaults()
                .withMatchSettings(matching.toSettings(MatchSettings.DEFAULT))
                .withPeakSettings(common.peakSettings())
                .withReadOptions(common.readOptions());
        if (common.threads != null) {
            settings = settings.withThreads(common.threads);
        }
        List<RunResult> results = new ArrayList<>(new Identifier(library, settings).identifyAll(runs));
        results.addAll(rejected);
        return new Batch(library, runs, results, settings);
    }
}
