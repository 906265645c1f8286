package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.Assessment;
import org.mobident.assess.KnownIdentities;
import org.mobident.assess.KnownIdentitiesReader;
import org.mobident.recheck.PeakTableReader;
import org.mobident.usecase.AssessIdentification;
import org.mobident.usecase.IdentifiedBatch;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code mobident assess}: scores an identification against what is known to be in the runs. */
@Command(name = "assess",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        modelTransformer = LibraryOnlyWhenIdentifying.class,
        description = "Scores an identification against a known-identities table (--known): what is really in "
                + "spiked samples, standards or synthetic runs. The peaks come from a peak table written by "
                + "'identify --csv' (--table), or are found now from a run sheet or trace files with a library, "
                + "exactly as 'identify' finds them. Each known zone takes the reported peak nearest its time "
                + "(within max(2 x width at half height, 1 %% of the time, 0.5 s), one peak per zone); a known "
                + "analyte without a time takes the peak called by its name. Reported: precision and recall of "
                + "the calls (overall, by zone height over noise SD, per analyte), calibration of the confidences "
                + "(reliability table, expected calibration error, Brier score), mobility error against the known "
                + "mobilities, and detection (peaks on known zones, spikes reported, runs without a mobility scale "
                + "or with the wrong neutral marker). Only runs named in both tables are scored. Acceptance "
                + "limits (--min-precision, --min-recall, --max-ece) turn the scores into a pass or fail.",
        footer = {"", "Exit codes: 0 scored, every limit given was met; 1 a limit was not met (or, when "
                + "identifying now, some runs failed or got no mobility scale); 2 bad command line; 3 unusable "
                + "input (known table, peak table, library, run sheet), or no run named in both tables; "
                + "4 an output could not be written; 5 internal error."})
public final class AssessCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = {"-k", "--known"}, required = true, paramLabel = "FILE",
            description = "Known-identities table (CSV: run, kind, analyte, time_s, mobility, height_sd).")
    Path knownFile;

    @Option(names = {"-t", "--table"}, paramLabel = "FILE",
            description = "Peak table written by 'identify --csv'. Without it, give runs and --library to identify now.")
    Path tableFile;

    @Mixin
    BatchOptions batch;

    @Mixin
    AssessOutputs outputs;

    @Option(names = "--quiet", description = "Do not print the scores (the files and the exit code still tell).")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        boolean runsGiven = batch.inputs.runSheet != null || !batch.inputs.traces.isEmpty();
        if (tableFile != null && (runsGiven || batch.libraryFile != null)) {
            err.println("mobident assess: give either a peak table (--table) or runs with --library, not both.");
            return ExitCodes.USAGE;
        }
        if (tableFile == null && (!batch.runsGiven() || batch.libraryFile == null)) {
            err.println("mobident assess: give a peak table (--table FILE), or a run sheet (--runs SHEET) or trace "
                    + "files together with --library.");
            return ExitCodes.USAGE;
        }
        AcceptanceLimits limits = outputs.limits(spec.commandLine());
        outputs.checkFree();
        KnownIdentities known = KnownIdentitiesReader.read(knownFile);
        AssessIdentification.Result scored;
        int runProblems = ExitCodes.OK;
        if (tableFile != null) {
            scored = AssessIdentification.ofTable(known, PeakTableReader.read(tableFile), tableFile.toString());
        } else {
            IdentifiedBatch done = batch.identify();
            scored = AssessIdentification.ofBatch(known, done, "identified now with " + batch.libraryFile);
            runProblems = Outputs.reportRunProblems(done, err);
        }
        Assessment assessment = scored.assessment();
        if (!assessment.anythingScored()) {
            err.println("mobident assess: none of the " + assessment.notInTable().size() + " runs named in "
                    + knownFile + " is in the reported peaks (runs there: " + scored.preview()
                    + "); nothing to score.");
            return ExitCodes.BAD_INPUT;
        }
        outputs.write(assessment, limits, quiet ? null : out);
        if (!limits.allMet(assessment)) {
            err.println("mobident assess: an acceptance limit was not met.");
            return ExitCodes.SOME_RUNS_FAILED;
        }
        return runProblems;
    }
}
