package org.mobident.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.mobident.usecase.IdentifiedBatch;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident identify}: the main job. */
@Command(name = "identify",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Finds the peaks of each run, turns their migration times into effective mobilities with the run's markers, and matches them to a mobility library with a confidence for each assignment. Runs come from a run sheet (--runs) or as trace files with their conditions as options. Identification by mobility is presumptive; confirm where results carry weight.",
        footer = {"", "Exit codes: 0 all runs processed; 1 some runs failed or got no mobility scale (the rest "
                + "were written); 2 bad command line; 3 unusable library, run sheet or setting; "
                + "4 an output could not be written; 5 internal error."})
public final class IdentifyCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    BatchOptions batch;

    @Mixin
    IdentifyOutputs outputs;

    @Option(names = "--quiet", description = "Print neither the per-run summary, nor the progress bar, nor the "
            + "closing totals line.")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        if (!batch.runsGiven()) {
            err.println("mobident identify: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        long start = System.nanoTime();
        outputs.checkFree();
        KnownScores known = KnownScores.read(outputs.knownFile);
        IdentifiedBatch done;
        try (ProgressDisplay progress = ProgressDisplay.on(err, !quiet && ProgressDisplay.stderrIsTerminal())) {
            done = batch.identify(progress);
        }
        outputs.write(done, known == null ? null : known.score(done), quiet ? null : spec.commandLine().getOut());
        int code = Outputs.reportRunProblems(done, err);
        if (!quiet) {
            err.println(BatchTotals.line(done.results(), (System.nanoTime() - start) / 1e9));
            err.flush();
        }
        return code;
    }
}
