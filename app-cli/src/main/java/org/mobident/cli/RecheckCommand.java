package org.mobident.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.PeakTableReader;
import org.mobident.recheck.PeakTableRow;
import org.mobident.report.recheck.RecheckHtml;
import org.mobident.report.recheck.RecheckReportCsv;
import org.mobident.recheck.RecheckResult;
import org.mobident.report.recheck.RecheckSummaryText;
import org.mobident.usecase.ReferenceData;
import org.mobident.usecase.RecheckAssignments;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident recheck}: which earlier assignments survive a buffer change. */
@Command(name = "recheck",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Takes an earlier peak table (from 'identify --csv') with the library it was matched against, "
                + "and either a library measured in the new buffer (--new-library) or only the new buffer's "
                + "conditions (--ph, --ionic-strength-mm, --temperature-c; mobilities are then predicted). Each peak "
                + "is moved by its analyte's shift and re-matched; the verdict per earlier assignment is: still holds "
                + "(still the only match, and the moved peak stays inside the analyte's window of the old library), "
                + "moved but still unique (the only match, but outside its old window: the window must move), now "
                + "ambiguous (and with what), reassigned (would now be taken for another analyte) or lost. It also "
                + "lists which library pairs can no longer be told apart and, with a measured new library, which "
                + "old analytes it lacks. With a measured new "
                + "library it also reports how far the model's prediction was off. The terminal summary has one line "
                + "per library analyte (its verdict over all its peaks, shift ± SD, peaks affected, window in the new "
                + "buffer); the per-peak verdicts and reasons go to --csv.",
        footer = {"", "Exit codes: 0 nothing needs attention; 1 something needs attention (see the summary); "
                + "2 bad command line; 3 unusable input; 4 output not written."})
public final class RecheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = {"-t", "--table"}, required = true, paramLabel = "FILE", description = "Earlier peak table (CSV).")
    Path tableFile;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE",
            description = "The library the table was matched against (old buffer).")
    Path libraryFile;

    @Option(names = "--new-library", paramLabel = "FILE", description = "A library measured in the new buffer.")
    Path newLibraryFile;

    @Option(names = "--reference", paramLabel = "FILE",
            description = "Reference library with pKa values and limiting mobilities (e.g. reference-libraries/ions-25C.csv).")
    Path referenceFile;

    @Mixin
    BufferOptions buffers;

    @Option(names = "--csv", paramLabel = "FILE", description = "Write the verdict per assignment as CSV.")
    Path csvOut;

    @Option(names = "--pairs-csv", paramLabel = "FILE", description = "Write the pair checks as CSV.")
    Path pairsOut;

    @Option(names = "--analytes-csv", paramLabel = "FILE",
            description = "Write the per-analyte predictions (new mobility, uncertainty, basis, model error) as CSV.")
    Path analytesOut;

    @Option(names = "--html", paramLabel = "FILE",
            description = "Write the recheck as a self-contained HTML page: per analyte, pairs, every assignment.")
    Path htmlOut;

    @Option(names = "--overwrite", description = "Replace output files that already exist.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        if (newLibraryFile == null && !buffers.newGiven()) {
            spec.commandLine().getErr().println("mobident recheck: give --new-library, or the new buffer's --ph and "
                    + "--ionic-strength-mm.");
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, csvOut, pairsOut, analytesOut, htmlOut);
        List<PeakTableRow> rows = PeakTableReader.read(tableFile);
        Library libraryA = LibraryCsv.read(libraryFile);
        BufferTransfer predictor = ReferenceData.transfer(referenceFile);
        Library libraryB = newLibraryFile == null ? null : LibraryCsv.read(newLibraryFile);
        var job = new RecheckAssignments(rows, tableFile.toString(), libraryA, buffers.oldBuffer(), predictor);
        RecheckResult result = libraryB != null
                ? job.againstMeasured(libraryB, buffers.newGiven() ? adjustedNewBuffer() : null)
                : job.againstPredicted(adjustedNewBuffer());
        RecheckSummaryText.write(result, spec.commandLine().getOut());
        if (csvOut != null) {
            Outputs.write(csvOut, overwrite, w -> RecheckReportCsv.writeAssignments(result, w));
        }
        if (pairsOut != null) {
            Outputs.write(pairsOut, overwrite, w -> RecheckReportCsv.writePairs(result, w));
        }
        if (analytesOut != null) {
            Outputs.write(analytesOut, overwrite, w -> RecheckReportCsv.writeAnalytes(result, w));
        }
        if (htmlOut != null) {
            Outputs.write(htmlOut, overwrite, w -> RecheckHtml.write(result, w));
        }
        return result.needsAttention() ? ExitCodes.SOME_RUNS_FAILED : ExitCodes.OK;
    }

    private org.mobident.recheck.BufferSpec adjustedNewBuffer() throws org.mobident.InputException {
        return BufferOptions.adjustedNewBuffer(buffers, referenceFile, spec.commandLine().getOut());
    }
}
