package org.mobident.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.BuildText;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.LibraryCheck;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident library check}: reads a library, prints it and says what needs attention. */
@Command(name = "check",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Reads a library (any format error is reported with line and column), prints it readably, and warns about impossible entries (mobility sign against the charge, magnitudes beyond any common ion), entries with too few measurements or no spread, high RSD, analytes whose match windows overlap (a peak between them may be ambiguous) and analytes too close to be told apart by mobility alone.",
        footer = {"", "Exit codes: 0 no findings; 1 findings printed; 3 the file cannot be read as a library."})
public final class LibraryCheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "LIBRARY", description = "The library file.")
    Path libraryFile;

    @picocli.CommandLine.Mixin
    MatchOptions matching;

    @Override
    public Integer call() throws Exception {
        Library library = LibraryCsv.read(libraryFile);
        org.mobident.matching.MatchSettings match = matching.toSettings(org.mobident.matching.MatchSettings.DEFAULT);
        List<BuildWarning> findings = LibraryCheck.check(library, BuildSettings.defaults(), match);
        BuildText.write(library, findings, match, spec.commandLine().getOut());
        return BuildWarning.anyWarning(findings) ? ExitCodes.SOME_RUNS_FAILED : ExitCodes.OK;
    }
}
