package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.Assessment;
import org.mobident.assess.AssessmentCsv;
import org.mobident.assess.AssessmentHtml;
import org.mobident.assess.AssessmentText;
import org.mobident.assess.Assessor;
import org.mobident.assess.KnownIdentities;
import org.mobident.assess.KnownIdentitiesReader;
import org.mobident.assess.ReportedRun;
import org.mobident.assess.ReportedRuns;
import org.mobident.library.Library;
import org.mobident.recheck.PeakTableReader;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code mobident assess}: scores an identification against what is known to be in the runs. */
@Command(name = "assess",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        modelTransformer = AssessCommand.LibraryOnlyWhenIdentifying.class,
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

    @Option(names = "--csv", paramLabel = "FILE",
            description = "Write the scores as a long CSV table (section, subject, measure, value).")
    Path csvOut;

    @Option(names = "--peaks-csv", paramLabel = "FILE",
            description = "Write every reported peak of the scored runs with the known zone it belongs to and its "
                    + "verdict, then the known zones no peak was found for.")
    Path verdictsOut;

    @Option(names = "--html", paramLabel = "FILE",
            description = "Write the scores as a self-contained HTML page with a reliability diagram.")
    Path htmlOut;

    @Option(names = "--min-precision", paramLabel = "P",
            description = "Acceptance limit: least precision of the identified calls, a fraction, such as 0.95.")
    Double minPrecision;

    @Option(names = "--min-recall", paramLabel = "R",
            description = "Acceptance limit: least recall of the analytes present (identified with the right "
                    + "name), a fraction.")
    Double minRecall;

    @Option(names = "--max-ece", paramLabel = "E",
            description = "Acceptance limit: largest expected calibration error of the calls' confidences, a "
                    + "fraction, such as 0.05.")
    Double maxEce;

    @Option(names = "--overwrite", description = "Replace output files that already exist.")
    boolean overwrite;

    @Option(names = "--quiet", description = "Do not print the scores (the files and the exit code still tell).")
    boolean quiet;

    /**
     * The library option of the shared run options is required by the commands that always
     * identify; here it is needed only without {@code --table}, which {@link #call} checks.
     */
    static final class LibraryOnlyWhenIdentifying implements CommandLine.IModelTransformer {
        @Override
        public CommandSpec transform(CommandSpec commandSpec) {
            OptionSpec library = commandSpec.findOption("--library");
            if (library != null && library.required()) {
                commandSpec.remove(library);
                commandSpec.addOption(OptionSpec.builder(library).required(false)
                        .description("Mobility library (CSV), to identify the runs now (not with --table).").build());
            }
            return commandSpec;
        }
    }

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
        AcceptanceLimits limits = limits();
        Outputs.checkFree(overwrite, csvOut, verdictsOut, htmlOut);
        KnownIdentities known = KnownIdentitiesReader.read(knownFile);
        List<ReportedRun> reported;
        String source;
        Library library = null;
        int runProblems = ExitCodes.OK;
        if (tableFile != null) {
            reported = ReportedRuns.fromTable(PeakTableReader.read(tableFile));
            source = tableFile.toString();
        } else {
            BatchOptions.Batch done = batch.identify();
            reported = ReportedRuns.fromResults(done.results());
            library = done.library();
            source = "identified now with " + batch.libraryFile;
            runProblems = Outputs.reportRunProblems(done.results(), err);
        }
        Assessment assessment = Assessor.assess(known, reported, source, library);
        if (!assessment.anythingScored()) {
            err.println("mobident assess: none of the " + assessment.notInTable().size() + " runs named in "
                    + knownFile + " is in the reported peaks (runs there: " + preview(reported) + "); nothing to score.");
            return ExitCodes.BAD_INPUT;
        }
        if (!quiet) {
            AssessmentText.write(assessment, limits, out);
        }
        if (csvOut != null) {
            Outputs.write(csvOut, overwrite, w -> AssessmentCsv.writeScores(assessment, limits, w));
        }
        if (verdictsOut != null) {
            Outputs.write(verdictsOut, overwrite, w -> AssessmentCsv.writeVerdicts(assessment, w));
        }
        if (htmlOut != null) {
            String page = AssessmentHtml.page(assessment, limits, null, VersionProvider.version(), Outputs.timestamp());
            Outputs.write(htmlOut, overwrite, w -> w.write(page));
        }
        if (!limits.allMet(assessment)) {
            err.println("mobident assess: an acceptance limit was not met.");
            return ExitCodes.SOME_RUNS_FAILED;
        }
        return runProblems;
    }

    /** The limits given; a value outside [0, 1] is a usage error. */
    private AcceptanceLimits limits() {
        double p = minPrecision == null ? Double.NaN : minPrecision;
        double r = minRecall == null ? Double.NaN : minRecall;
        double e = maxEce == null ? Double.NaN : maxEce;
        String[] names = {"--min-precision", "--min-recall", "--max-ece"};
        double[] values = {p, r, e};
        for (int i = 0; i < names.length; i++) {
            if (!Double.isNaN(values[i]) && !(values[i] >= 0 && values[i] <= 1)) {
                throw new CommandLine.ParameterException(spec.commandLine(), names[i]
                        + ": a limit is a fraction between 0 and 1, got " + values[i]);
            }
        }
        return new AcceptanceLimits(p, r, e);
    }

    /** The first few run names of the peaks, for the message when nothing matches. */
    private static String preview(List<ReportedRun> runs) {
        final int shown = 5;
        List<String> names = runs.stream().limit(shown).map(ReportedRun::name).toList();
        return names.isEmpty() ? "none" : String.join(", ", names) + (runs.size() > shown ? ", ..." : "");
    }
}
