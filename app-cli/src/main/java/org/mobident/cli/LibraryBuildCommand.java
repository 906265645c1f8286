package org.mobident.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.mobident.io.SafeFiles;
import org.mobident.library.LibraryCsv;
import org.mobident.library.standards.BuildResult;
import org.mobident.report.library.BuildText;
import org.mobident.library.standards.BuildWarning;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident library build}: a new library from standards runs. */
@Command(name = "build",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Processes replicate runs of standard mixes, groups each analyte's peaks across the runs, names them from the standards sheet, and writes a library with mean, SD, n, window, conditions and provenance (runs and their SHA-256). Outliers are tested (Grubbs) and reported.",
        footer = {"", "Exit codes: 0 written without warnings; 1 written, with warnings or failed runs; 2 bad command "
                + "line; 3 unusable input; 4 output not written (exists: add --overwrite, the old one is kept as .prev)."})
public final class LibraryBuildCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    StandardsOptions standards;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "FILE", description = "Library file to write.")
    Path out;

    @Option(names = "--overwrite", description = "Replace an existing library; its previous version is kept as FILE.prev.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        var err = spec.commandLine().getErr();
        if (!standards.inputs.given()) {
            err.println("mobident library build: give the standards runs as a run sheet (--runs SHEET) or trace files.");
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, out);
        BuildResult result = standards.build();
        BuildText.write(result, spec.commandLine().getOut());
        if (result.library().entries().isEmpty()) {
            err.println("mobident library build: no analyte could be named, so no library was written to " + out
                    + ". Say which peak is which: an approx_mobility or order column in the --mixes sheet, or "
                    + "--reference FILE (with --ph and --ionic-strength-mm of the standards' buffer).");
            return ExitCodes.BAD_INPUT;
        }
        writeLibrary(out, overwrite, result.library());
        spec.commandLine().getOut().println("library written to " + out + " (" + result.library().size() + " analytes)");
        return BuildWarning.anyWarning(result.warnings()) ? ExitCodes.SOME_RUNS_FAILED : ExitCodes.OK;
    }

    /** Writes atomically; an existing file is replaced only when allowed, and kept as .prev. */
    static void writeLibrary(Path target, boolean overwrite, org.mobident.library.Library library)
            throws OutputException {
        try {
            if (Files.exists(target)) {
                if (!overwrite) {
                    throw new OutputException(target + " already exists; add --overwrite to replace it", null);
                }
                SafeFiles.writeKeepingPrevious(target, w -> LibraryCsv.write(library, w));
            } else {
                SafeFiles.write(target, false, w -> LibraryCsv.write(library, w));
            }
        } catch (IOException e) {
            throw new OutputException(target + ": " + e.getMessage(), e);
        }
    }
}
