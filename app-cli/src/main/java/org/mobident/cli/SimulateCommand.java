package org.mobident.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.simulate.ElectromigrationDispersion;
import org.mobident.simulate.LabDayBench;
import org.mobident.simulate.LabDaySummary;
import org.mobident.usecase.SimulateRuns;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident simulate}: writes synthetic runs for trials, speed measurements and honest benches. */
@Command(name = "simulate",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = {
            "Writes invented runs to try the tool, time it, or measure how well it identifies. Two scenarios:",
            "  archive  (default) anion runs drawn from --library: reversed polarity, EOF drifting ±15 %%, "
                    + "indirect detection, noise and drift, plus their run sheet. The speed benchmark.",
            "  lab-day  a hard bench from three built-in invented methods (two anion, one cation): standards "
                    + "runs with run and standards sheets for building libraries, sample runs, and truth tables "
                    + "saying what every run really holds. The runs carry a working day's troubles: a temperature "
                    + "the sheet does not know, EOF drift, concentration-dependent peak skew, weak markers, "
                    + "foreign zones, spikes, correlated noise, wandering baselines, three file layouts. "
                    + "README.txt in the folder explains it and gives the commands to build, identify and score.",
            "The data are invented; never mix them with real records."},
        footer = {"", "Examples:",
            "  mobident simulate --library demo-data/library.csv --count 1000 --points 60000 --out /tmp/archive",
            "  mobident simulate --scenario lab-day --count 160 --seed 7 --out /tmp/bench-7"})
public final class SimulateCommand implements Callable<Integer> {

    private static final String OVERWRITE_HINT = "add --overwrite to replace it";

    @Spec
    CommandSpec spec;

    @Option(names = "--scenario", paramLabel = "NAME", description = "archive (default) or lab-day.")
    String scenario = SimulateRuns.ARCHIVE;

    @Option(names = {"-l", "--library"}, paramLabel = "FILE",
            description = "archive: library to draw anions from (required). lab-day: not used (built-in panels).")
    Path libraryFile;

    @Option(names = "--count", paramLabel = "N",
            description = "archive: number of runs (default " + SimulateRuns.DEFAULT_ARCHIVE_RUNS + "). lab-day: "
                    + "number of sample runs, besides the standards (default " + SimulateRuns.DEFAULT_LAB_DAY_SAMPLES
                    + ").")
    Integer count;

    @Option(names = "--points", paramLabel = "N",
            description = "archive: points per run (default " + SimulateRuns.DEFAULT_POINTS + "). lab-day: not used "
                    + "(each run has its own sampling rate and length).")
    Integer points;

    @Option(names = "--seed", paramLabel = "N", description = "Random seed (default ${DEFAULT-VALUE}); the same seed "
            + "gives the same files.")
    long seed = 1;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "DIR", description = "Folder to write into.")
    Path out;

    @Option(names = "--skew-shape", paramLabel = "FORM", description = "lab-day: the form of zones skewed by "
            + "electromigration dispersion: exponential (default; exponentially modified Gaussians), triangle "
            + "(sharp front, straight diffuse flank, smoothed by diffusion), mixed (triangles where a zone is at "
            + "least three times as dispersed as the standards, exponential below) or none (every zone Gaussian). "
            + "Zones, times and noise stay the same, so a detector can be tried on a zone form it was not built "
            + "around.")
    String skewShape = "exponential";

    @Option(names = "--overwrite", description = "Replace files that already exist.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        ElectromigrationDispersion.Shape shape = switch (skewShape.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "exponential" -> ElectromigrationDispersion.Shape.EXPONENTIAL;
            case "triangle" -> ElectromigrationDispersion.Shape.TRIANGLE;
            case "none" -> ElectromigrationDispersion.Shape.NONE;
            case "mixed" -> ElectromigrationDispersion.Shape.MIXED;
            default -> null;
        };
        if (shape == null) {
            spec.commandLine().getErr().println("mobident simulate: unknown --skew-shape '" + skewShape
                    + "'; choose exponential, triangle, mixed or none");
            return ExitCodes.USAGE;
        }
        var request = new SimulateRuns.Request(scenario, libraryFile != null, count, points, seed, out, overwrite,
                OVERWRITE_HINT, shape);
        if (request.problem() != null) {
            spec.commandLine().getErr().println("mobident simulate: " + request.problem());
            return ExitCodes.USAGE;
        }
        var o = spec.commandLine().getOut();
        try {
            if (SimulateRuns.ARCHIVE.equals(scenario)) {
                Library library = LibraryCsv.read(libraryFile);
                try {
                    Path sheet = SimulateRuns.archive(request, library);
                    o.println(request.runs() + " runs of " + request.pointsPerRun() + " points written; run sheet "
                            + sheet);
                } catch (IllegalArgumentException e) {
                    spec.commandLine().getErr().println("mobident simulate: " + e.getMessage());
                    return ExitCodes.BAD_INPUT;
                }
            } else {
                LabDaySummary summary = SimulateRuns.labDay(request);
                o.println(summary.paragraph());
                o.println("Written to " + out + "; start with " + out.resolve(LabDayBench.README) + ".");
            }
        } catch (IOException e) {
            throw new OutputException(out + ": " + e.getMessage(), e);
        }
        return ExitCodes.OK;
    }
}
