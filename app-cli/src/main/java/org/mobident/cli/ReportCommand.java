package org.mobident.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.mobident.report.ResultsWorkbook;
import org.mobident.report.html.HtmlReport;
import org.mobident.summary.RecurringUnknowns;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident report}: identifies the runs and writes one shareable HTML page. */
@Command(name = "report",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Identifies the runs like 'identify' and writes one self-contained HTML file (inline plots, no scripts, no network) with a batch summary and, per run, its plot on the mobility axis and its peak table. The page carries the caution that identification by mobility is presumptive.",
        footer = {"", "Exit codes as for 'identify'."})
public final class ReportCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    BatchOptions batch;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "FILE", description = "The HTML file to write.")
    Path out;

    @Option(names = "--xlsx", paramLabel = "FILE",
            description = "Also write the results workbook (.xlsx), as 'identify --xlsx' does.")
    Path xlsxOut;

    @Option(names = "--overwrite", description = "Replace the file if it exists.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        var err = spec.commandLine().getErr();
        if (!batch.runsGiven()) {
            err.println("mobident report: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, out, xlsxOut);
        var done = batch.identify();
        var traces = done.traces();
        Outputs.write(out, overwrite, w -> HtmlReport.write(done.results(), traces, done.library(),
                Outputs.htmlOptions(), w));
        if (xlsxOut != null) {
            var unknowns = RecurringUnknowns.of(done.results(), done.library());
            Outputs.writeBytes(xlsxOut, overwrite, o -> ResultsWorkbook.write(done.results(), done.library(),
                    unknowns, Outputs.workbookOptions(), o));
        }
        spec.commandLine().getOut().println("report written to " + out + " (" + done.results().size() + " runs)");
        return Outputs.reportRunProblems(done, err);
    }
}
