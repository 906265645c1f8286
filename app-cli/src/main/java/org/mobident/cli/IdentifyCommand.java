package org.mobident.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.InputException;
import org.mobident.io.SafeFiles;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.matching.MatchSettings;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.RunResult;
import org.mobident.report.PeakTableCsv;
import org.mobident.report.PeakTableJson;
import org.mobident.report.RunSummaryText;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.io.RunSheet;
import org.mobident.trace.io.RunSheetReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident identify}: the main job. */
@Command(name = "identify",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = {
            "Finds the peaks of each run, turns their migration times into effective mobilities with the",
            "run's markers, and matches them to a mobility library with a confidence for each assignment.",
            "Runs come from a run sheet (--runs) or as trace files with their conditions as options.",
            "Identification by mobility is presumptive; confirm where results carry weight."},
        footer = {"", "Exit codes: 0 all runs processed; 1 some runs failed or got no mobility scale (the rest "
                + "were written); 2 bad command line; 3 unusable library, run sheet or setting; "
                + "4 an output could not be written; 5 internal error."})
public final class IdentifyCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

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

    @Option(names = "--csv", paramLabel = "FILE", description = "Write the peak table as CSV.")
    Path csvOut;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the peak table as JSON.")
    Path jsonOut;

    @Option(names = "--overwrite", description = "Replace output files that already exist.")
    boolean overwrite;

    @Option(names = "--quiet", description = "Do not print the per-run summary.")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if ((runSheet == null) == traces.isEmpty()) {
            err.println("mobident identify: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        checkOutputsFree();
        Library library = LibraryCsv.read(libraryFile);
        RunConditions defaults = conditions.toConditions();
        List<RunSpec> runs = new ArrayList<>();
        List<RunResult> rejected = new ArrayList<>();
        if (runSheet != null) {
            RunSheet sheet = RunSheetReader.read(runSheet, defaults);
            runs.addAll(sheet.runs());
            for (InputException problem : sheet.rowProblems()) {
                rejected.add(RunResult.failure(new RunSpec("sheet line " + problem.line(), runSheet,
                        RunConditions.EMPTY, runSheet.toString(), problem.line()), problem));
            }
        } else {
            for (Path t : traces) {
                try {
                    runs.add(RunSheetReader.single(t, defaults));
                } catch (InputException e) {
                    rejected.add(RunResult.failure(new RunSpec(RunSpec.runNameOf(t), t, defaults,
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

        if (!quiet) {
            RunSummaryText.write(results, out);
        }
        if (csvOut != null) {
            write(csvOut, w -> PeakTableCsv.write(results, w));
        }
        if (jsonOut != null) {
            write(jsonOut, w -> PeakTableJson.write(results, w));
        }
        long failed = results.stream().filter(r -> r.failed() || !r.mobilityKnown()).count();
        for (RunResult r : results) {
            if (r.failed()) {
                err.println("mobident: run " + r.spec().name() + " not processed: " + r.error().getMessage());
            } else if (!r.mobilityKnown()) {
                err.println("mobident: run " + r.spec().name() + " has no mobility scale: " + r.scaleNote());
            }
        }
        out.flush();
        return failed > 0 ? ExitCodes.SOME_RUNS_FAILED : ExitCodes.OK;
    }

    private void checkOutputsFree() throws OutputException {
        for (Path p : new Path[] {csvOut, jsonOut}) {
            if (p != null && !overwrite && java.nio.file.Files.exists(p)) {
                throw new OutputException(p + " already exists; add --overwrite to replace it", null);
            }
        }
    }

    private void write(Path target, SafeFiles.ContentWriter content) throws OutputException {
        try {
            SafeFiles.write(target, overwrite, content);
        } catch (IOException e) {
            throw new OutputException(target + ": " + e.getMessage(), e);
        }
    }
}
