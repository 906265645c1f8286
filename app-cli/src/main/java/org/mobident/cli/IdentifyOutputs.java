package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.mobident.io.SafeFiles;
import org.mobident.library.LibraryCsv;
import org.mobident.report.BatchSummaryCsv;
import org.mobident.report.PeakTableCsv;
import org.mobident.report.PeakTableJson;
import org.mobident.report.ResultsWorkbook;
import org.mobident.report.RunSummaryText;
import org.mobident.report.html.HtmlReport;
import org.mobident.summary.ProvisionalEntries;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;
import org.mobident.usecase.IdentifiedBatch;
import picocli.CommandLine.Option;

/** The result files of {@code identify} (and the known identities to score against) and their rendering. */
public final class IdentifyOutputs {

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

    @Option(names = "--unknowns-library", paramLabel = "FILE",
            description = "Write the recurring unknowns as provisional library entries (unknown-1, ...: mean mobility, "
                    + "SD, runs, buffer), to follow them in later batches once checked and added to your library.")
    Path unknownsLibraryOut;

    @Option(names = "--known", paramLabel = "FILE",
            description = "Known-identities table: score the results against it as 'assess' does, print the scores "
                    + "and add them to the --html report.")
    Path knownFile;

    @Option(names = "--overwrite", description = "Replace output files that already exist.")
    boolean overwrite;

    /** Refuses, before any work is done, to replace existing files unless asked to. */
    void checkFree() throws OutputException {
        Outputs.checkFree(overwrite, csvOut, jsonOut, htmlOut, xlsxOut, summaryCsvOut, unknownsCsvOut,
                unknownsLibraryOut);
    }

    /** The summary on {@code out} (none when null) and every output file asked for. */
    void write(IdentifiedBatch done, KnownScores scored, PrintWriter out) throws OutputException {
        var results = done.results();
        List<RecurringUnknowns.Group> unknowns = RecurringUnknowns.of(results, done.library());
        SampleCalls samples = SampleCalls.of(results, done.library());
        if (out != null) {
            RunSummaryText.write(results, samples, unknowns, out);
            if (scored != null) {
                scored.print(out);
            }
        }
        writeIf(csvOut, w -> PeakTableCsv.write(results, w));
        writeIf(jsonOut, w -> PeakTableJson.write(results, w));
        if (htmlOut != null) {
            var traces = done.traces();
            writeIf(htmlOut, w -> HtmlReport.write(results, traces, done.library(), Outputs.htmlOptions(),
                    KnownScores.sections(scored), w));
        }
        writeIf(summaryCsvOut, w -> BatchSummaryCsv.writeSamples(samples, w));
        writeIf(unknownsCsvOut, w -> BatchSummaryCsv.writeUnknowns(unknowns, w));
        writeIf(unknownsLibraryOut, w -> LibraryCsv.write(ProvisionalEntries.of(unknowns, done.library(),
                "this batch"), w));
        if (xlsxOut != null) {
            Outputs.writeBytes(xlsxOut, overwrite, o -> ResultsWorkbook.write(results, done.library(), unknowns,
                    Outputs.workbookOptions(), o));
        }
    }

    private void writeIf(Path target, SafeFiles.ContentWriter content) throws OutputException {
        if (target != null) {
            Outputs.write(target, overwrite, content);
        }
    }
}
