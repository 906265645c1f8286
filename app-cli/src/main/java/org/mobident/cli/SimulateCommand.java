package org.mobident.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.simulate.ArchiveGenerator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident simulate}: writes synthetic runs for trials and speed measurements. */
@Command(name = "simulate",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Writes synthetic anion runs drawn from a library (reversed polarity, EOF drifting "
                + "±15 %%, indirect detection, noise and drift) plus their run sheet, to try the tool or time it. "
                + "The data are invented; never mix them with real records.")
public final class SimulateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "Library to draw anions from.")
    Path libraryFile;

    @Option(names = "--count", paramLabel = "N", description = "Number of runs (default ${DEFAULT-VALUE}).")
    int runs = 20;

    @Option(names = "--points", paramLabel = "N", description = "Points per run (default ${DEFAULT-VALUE}).")
    int points = 14_400;

    @Option(names = "--seed", paramLabel = "N", description = "Random seed (default ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "DIR", description = "Folder to write into.")
    Path out;

    @Option(names = "--overwrite", description = "Replace files that already exist.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        if (runs < 1 || runs > 100_000 || points < 100 || points > 10_000_000) {
            spec.commandLine().getErr().println("mobident simulate: --count must be 1..100000 and --points 100..10000000");
            return ExitCodes.USAGE;
        }
        Library library = LibraryCsv.read(libraryFile);
        try {
            Path sheet = ArchiveGenerator.write(library, runs, points, seed, out, overwrite);
            spec.commandLine().getOut().println(runs + " runs of " + points + " points written; run sheet " + sheet);
        } catch (IllegalArgumentException e) {
            spec.commandLine().getErr().println("mobident simulate: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        } catch (IOException e) {
            throw new OutputException(out + ": " + e.getMessage(), e);
        }
        return ExitCodes.OK;
    }
}
