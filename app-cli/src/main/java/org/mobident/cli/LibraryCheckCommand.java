package org.mobident.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.LibraryCheck;
import org.mobident.report.library.BuildText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code mobident library check}: reads a library, prints it and says what needs attention. */
@Command(name = "check",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Reads a library (any format error is reported with line and column), prints it readably, and warns about impossible entries (mobility sign against the charge, magnitudes beyond any common ion), entries with too few measurements or no spread, high RSD, analytes whose match windows overlap (a peak between them may be ambiguous) and analytes too close to be told apart by mobility alone. It ends by saying which analytes predict and recheck can carry to another buffer, and how to give the others their charge, pKa and limiting mobilities.",
        footer = {"", "Exit codes: 0 no findings; 1 findings printed; 3 the file cannot be read as a library."})
public final class LibraryCheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "LIBRARY", description = "The library file.")
    Path libraryFile;

    @picocli.CommandLine.Mixin
    MatchOptions matching;

    @picocli.CommandLine.Option(names = "--reference", paramLabel = "FILE",
            description = "Reference library whose pKa values and limiting mobilities predict/recheck would use by "
                    + "name (e.g. reference-libraries/ions-25C.csv); the check then says which analytes cannot be "
                    + "predicted in another buffer even with it.")
    Path referenceFile;

    @Override
    public Integer call() throws Exception {
        Library library = LibraryCsv.read(libraryFile);
        org.mobident.settings.MatchSettings match = matching.toSettings(org.mobident.settings.MatchSettings.DEFAULT);
        List<BuildWarning> findings = LibraryCheck.check(library, BuildSettings.defaults(), match);
        var out = spec.commandLine().getOut();
        BuildText.write(library, findings, match, out);
        org.mobident.recheck.BufferTransfer transfer = referenceFile == null
                ? org.mobident.recheck.BufferTransfer.withoutReference()
                : org.mobident.recheck.BufferTransfer.withReference(LibraryCsv.read(referenceFile));
        out.println();
        for (String line : org.mobident.recheck.ModelCoverage.of(library, transfer).lines()) {
            out.println(line);
        }
        if (referenceFile == null) {
            out.println("  (without --reference: analytes named as in reference-libraries/ions-25C.csv would be "
                    + "modelled from it when predict/recheck are given --reference)");
        }
        out.flush();
        return BuildWarning.anyWarning(findings) ? ExitCodes.SOME_RUNS_FAILED : ExitCodes.OK;
    }
}
