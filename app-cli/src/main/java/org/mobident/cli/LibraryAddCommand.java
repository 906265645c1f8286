package org.mobident.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.mobident.library.LibraryCsv;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.MergeResult;
import org.mobident.report.library.BuildText;
import org.mobident.settings.MatchSettings;
import org.mobident.usecase.AddToLibrary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code mobident library add}: pools new standards runs into an existing library. */
@Command(name = "add",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Processes new standards runs like 'library build' and pools them into an existing library: analytes in both get the mean and SD of all measurements together; new analytes are added. Runs the library already holds (same trace SHA-256 in its notes) are refused, exit 3, library unchanged. The library is rewritten in place (atomically); its previous version is kept as FILE.prev.",
        footer = {"", "Exit codes: 0 updated without warnings; 1 updated, with warnings; 2 bad command line; "
                + "3 unusable input; 4 library not written."})
public final class LibraryAddCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "The library to update.")
    Path libraryFile;

    @Mixin
    StandardsOptions standards;

    @Override
    public Integer call() throws Exception {
        var out = spec.commandLine().getOut();
        var err = spec.commandLine().getErr();
        if (!standards.inputs.given()) {
            err.println("mobident library add: give the standards runs as a run sheet (--runs SHEET) or trace files.");
            return ExitCodes.USAGE;
        }
        AddToLibrary job = new AddToLibrary(LibraryCsv.read(libraryFile), standards.job());
        // refuses runs already pooled (same trace SHA-256 in the library's notes) before anything is written
        AddToLibrary.Result done = job.run(standards.inputs.settings(MatchSettings.DEFAULT), standards.buildSettings());
        MergeResult merged = done.merged();
        BuildText.write(done.fresh(), out);
        LibraryBuildCommand.writeLibrary(libraryFile, true, merged.library());
        if (!merged.pooled().isEmpty()) {
            out.println("pooled: " + String.join(", ", merged.pooled()));
        }
        if (!merged.added().isEmpty()) {
            out.println("added: " + String.join(", ", merged.added()));
        }
        if (!merged.replaced().isEmpty()) {
            out.println("replaced (had no spread): " + String.join(", ", merged.replaced()));
        }
        for (BuildWarning w : merged.warnings()) {
            out.println("  - " + w.message());
        }
        printWritten(merged, out);
        out.println("library " + libraryFile + " updated; previous version kept as " + libraryFile + ".prev");
        return done.anyWarning() ? ExitCodes.SOME_RUNS_FAILED : ExitCodes.OK;
    }

    /**
     * The entries this call changed as they now stand in the library (the pooled mean, SD and n, not
     * the new runs' own statistics printed above them).
     */
    private static void printWritten(MergeResult merged, java.io.PrintWriter out) {
        java.util.List<String> names = new java.util.ArrayList<>(merged.pooled());
        names.addAll(merged.added());
        names.addAll(merged.replaced());
        if (names.isEmpty()) {
            return;
        }
        out.println("Entries as written (mobility +/- SD in 1e-9 m^2/(V s), n):");
        for (String name : names) {
            merged.library().find(name).ifPresent(e -> out.println(String.format(java.util.Locale.ROOT,
                    "  %-16s %9.2f +/- %.2f  n = %d", e.name(), e.mobility(), e.mobilitySd(), e.n())));
        }
    }
}
