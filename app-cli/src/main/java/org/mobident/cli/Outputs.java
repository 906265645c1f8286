package org.mobident.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.mobident.io.SafeFiles;
import org.mobident.usecase.IdentifiedBatch;

/** Writing output files and reporting run problems, the same way for every command. */
final class Outputs {
    private Outputs() {
    }

    /** Refuses, before any work is done, to replace existing files unless asked to. */
    static void checkFree(boolean overwrite, Path... targets) throws OutputException {
        for (Path p : targets) {
            if (p != null && !overwrite && Files.exists(p)) {
                throw new OutputException(p + " already exists; add --overwrite to replace it", null);
            }
        }
    }

    /** Writes through a temp file and an atomic move. */
    static void write(Path target, boolean overwrite, SafeFiles.ContentWriter content) throws OutputException {
        try {
            SafeFiles.write(target, overwrite, "add --overwrite to replace it", content);
        } catch (IOException e) {
            throw new OutputException(target + ": " + e.getMessage(), e);
        }
    }

    /** Writes binary content through a temp file and an atomic move. */
    static void writeBytes(Path target, boolean overwrite, SafeFiles.ByteWriter content) throws OutputException {
        try {
            SafeFiles.writeBytes(target, overwrite, "add --overwrite to replace it", content);
        } catch (IOException e) {
            throw new OutputException(target + ": " + e.getMessage(), e);
        }
    }

    /** Options of a results workbook made now by this version. */
    static org.mobident.report.ResultsWorkbook.Options workbookOptions() {
        return new org.mobident.report.ResultsWorkbook.Options(VersionProvider.version(), timestamp());
    }

    /** The time stamp put in reports, to the second, UTC. */
    static String timestamp() {
        return Instant.now().truncatedTo(ChronoUnit.SECONDS).toString();
    }

    /** Options of an HTML report made now by this version. */
    static org.mobident.report.html.HtmlReport.Options htmlOptions() {
        return new org.mobident.report.html.HtmlReport.Options(null, VersionProvider.version(),
                timestamp());
    }

    /** Prints one line per failed run or run without mobility scale; returns the exit code. */
    static int reportRunProblems(IdentifiedBatch batch, PrintWriter err) {
        List<IdentifiedBatch.RunProblem> problems = batch.problems();
        for (IdentifiedBatch.RunProblem p : problems) {
            err.println("mobident: run " + p.result().spec().name() + (p.failed() ? " not processed: "
                    : " has no mobility scale: ") + p.reason());
        }
        err.flush();
        return problems.isEmpty() ? ExitCodes.OK : ExitCodes.SOME_RUNS_FAILED;
    }
}
