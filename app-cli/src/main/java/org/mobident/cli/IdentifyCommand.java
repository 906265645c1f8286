package org.mobident.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.io.SafeFiles;
import org.mobident.pipeline.RunResult;
import org.mobident.report.BatchSummaryCsv;
import org.mobident.report.PeakTableCsv;
import org.mobident.report.PeakTableJson;
import org.mobident.report.ResultsWorkbook;
import org.mobident.report.RunSummaryText;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;
import org.mobident.report.html.HtmlReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident identify}: the main job. */
@Command(name = "identify",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Finds the peaks of each run, turns their migration times into effective mobilities with the run's markers, and matches them to a mobility library with a confidence for each assignment. Runs come from a run sheet (--runs) or as trace files with their conditions as options. Identification by mobility is presumptive; confirm where results carry weight.",
        footer = {"", "Exit codes: 0 all runs processed; 1 some runs failed or got no mobility scale (the rest "
                + "were written); 2 bad command line; 3 unusable library, run sheet or setting; "
                + "4 an output could not be written; 5 internal error."})
public final class IdentifyCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    BatchOptions batch;

    @Option(names = "--csv", paramLabel = "FILE", description = "Write the peak table as CSV.")
    Path csvOut;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the peak table as JSON.")
    Path jsonOut;

    @Option(names = "--html", paramLabel = "FILE", description = "Write a self-contained HTML report with plots.")
    Path htmlOut;

    @Option(names = "--xlsx", paramLabel = "FILE",
            description = "Write a results workbook (.xlsx): samples x analytes first, then the peak table, each "
                    + "analyte over the batch, recurring unknowns, run facts and the library used.")
    Path xlsxOut;

    @Option(names = "--summary-csv", paramLabel = "FILE",
            description = "Write the samples x analytes summary as CSV: one row per run and library analyte "
                    + "(result, confidence, corrected area, mobility).")
    Path summaryCsvOut;

    @Option(names = "--unknowns-csv", paramLabel = "FILE",
            description = "Write the recurring unknowns as CSV: unassigned peaks at one mobility in two or more "
                    + "runs of a buffer, one row per peak.")
    Path unknownsCsvOut;

    @Option(names = "--known", paramLabel = "FILE",
            description = "Known-identities table: score the results against it as 'assess' does, print the scores "
                    + "and add them to the --html report.")
    Path knownFile;

    @Option(names = "--overwrite", description = "Replace output files that already exist.")
    boolean overwrite;

    @Option(names = "--quiet", description = "Print neither the per-run summary, nor the progress bar, nor the "
            + "closing totals line.")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!batch.runsGiven()) {
            err.println("mobident identify: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        long start = System.nanoTime();
        Outputs.checkFree(overwrite, csvOut, jsonOut, htmlOut, xlsxOut, summaryCsvOut, unknownsCsvOut);
        KnownScores known = KnownScores.read(knownFile);
        BatchOptions.Batch done;
        try (ProgressDisplay progress = ProgressDisplay.on(err, !quiet && ProgressDisplay.stderrIsTerminal())) {
            done = batch.identify(progress);
        }
        var results = done.results();
        KnownScores scored = known == null ? null : known.score(results, done.library());
        List<RecurringUnknowns.Group> unknowns = RecurringUnknowns.of(results, done.library());
        SampleCalls samples = SampleCalls.of(results, done.library());
        if (!quiet) {
            RunSummaryText.write(results, samples, unknowns, out);
            if (scored != null) {
                scored.print(out);
            }
        }
        if (csvOut != null) {
            Outputs.write(csvOut, overwrite, w -> PeakTableCsv.write(results, w));
        }
        if (jsonOut != null) {
            Outputs.write(jsonOut, overwrite, w -> PeakTableJson.write(results, w));
        }
        if (htmlOut != null) {
            var traces = done.traces();
            Outputs.write(htmlOut, overwrite, w -> HtmlReport.write(results, traces, done.library(),
                    Outputs.htmlOptions(), KnownScores.sections(scored), w));
        }
        if (summaryCsvOut != null) {
            Outputs.write(summaryCsvOut, overwrite, w -> BatchSummaryCsv.writeSamples(samples, w));
        }
        if (unknownsCsvOut != null) {
            Outputs.write(unknownsCsvOut, overwrite, w -> BatchSummaryCsv.writeUnknowns(unknowns, w));
        }
        if (xlsxOut != null) {
            Outputs.writeBytes(xlsxOut, overwrite, o -> ResultsWorkbook.write(results, done.library(), unknowns,
                    Outputs.workbookOptions(), o));
        }
        int code = Outputs.reportRunProblems(results, err);
        if (!quiet) {
            err.println(BatchTotals.line(results, (System.nanoTime() - start) / 1e9));
            err.flush();
        }
        return code;
    }
}
