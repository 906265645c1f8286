package org.mobident.cli;

import java.nio.file.Path;
import org.mobident.InputException;
import org.mobident.library.LibraryCsv;
import org.mobident.result.BatchProgress;
import org.mobident.result.RunListener;
import org.mobident.settings.MatchSettings;
import org.mobident.usecase.IdentifiedBatch;
import org.mobident.usecase.IdentifyBatch;
import org.mobident.usecase.RunBatch;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The inputs every command that identifies runs shares: the runs, the library and the match
 * settings. {@link #identify()} parses them and hands them to {@link IdentifyBatch}.
 */
public final class BatchOptions {

    @Mixin
    RunInputs inputs;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "Mobility library (CSV).")
    Path libraryFile;

    @Mixin
    MatchOptions matching;

    /** True when exactly one of run sheet and trace files was given. */
    boolean runsGiven() {
        return inputs.given();
    }

    IdentifiedBatch identify() throws InputException {
        return identify(BatchProgress.NONE);
    }

    /** Loads the inputs and identifies the runs, telling {@code progress} as runs are done. */
    IdentifiedBatch identify(BatchProgress progress) throws InputException {
        IdentifyBatch job = new IdentifyBatch(LibraryCsv.read(libraryFile));
        RunBatch runs = inputs.load();
        return job.run(runs, inputs.settings(matching.toSettings(MatchSettings.DEFAULT)), progress, RunListener.NONE)
                .withResults(OptionNames::forCommandLine);
    }
}
