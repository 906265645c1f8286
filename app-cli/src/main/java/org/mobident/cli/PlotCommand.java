package org.mobident.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.mobident.report.plot.Axis;
import org.mobident.usecase.IdentifiedBatch;
import org.mobident.usecase.PlotRuns;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident plot}: draws runs to a PNG or SVG file without opening a window. */
@Command(name = "plot",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Identifies the runs and draws the chosen ones (default: all, overlaid) to a PNG or SVG file, on the effective-mobility axis (runs line up whatever their EOF) or on the time axis. Needs no display.",
        footer = {"", "Exit codes as for 'identify'."})
public final class PlotCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    BatchOptions batch;

    @Option(names = {"--show", "--run"}, paramLabel = "RUN", split = ",",
            description = "Runs to draw, by name, comma-separated or repeated (default all), as in 'view'.")
    List<String> runNames = new ArrayList<>();

    @Option(names = "--axis", paramLabel = "AXIS", description = AxisWords.DESCRIPTION)
    Axis axis = Axis.MOBILITY;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "FILE",
            description = "Image to write: a name ending in .png or .svg.")
    Path out;

    @Option(names = "--size", paramLabel = "WxH",
            description = "Image size in pixels (default ${DEFAULT-VALUE}); runs of several buffers get a panel of this size each, stacked.")
    String size = "1200x520";

    @Option(names = "--no-bands", description = "Do not draw the library's match windows.")
    boolean noBands;

    @Option(names = "--overwrite", description = "Replace the file if it exists.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        var err = spec.commandLine().getErr();
        if (!batch.runsGiven()) {
            err.println("mobident plot: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        ImageKind kind = ImageKind.of(out);
        if (kind == null) {
            err.println("mobident plot: --out must name a .png or .svg file, got '" + out.getFileName()
                    + "'; other image formats are not written");
            return ExitCodes.USAGE;
        }
        int[] wh = ImageKind.size(size, err);
        if (wh == null) {
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, out);
        IdentifiedBatch done = batch.identify();
        PlotRuns.Drawing drawing = PlotRuns.plot(done, runNames, axis, !noBands);
        if (drawing.unknownName() != null) {
            err.println("mobident plot: --show: no run is named '" + drawing.unknownName() + "'");
            return ExitCodes.BAD_INPUT;
        }
        if (!drawing.any()) {
            err.println("mobident plot: no run could be drawn");
            return Outputs.reportRunProblems(done, err) == ExitCodes.OK ? ExitCodes.BAD_INPUT : ExitCodes.SOME_RUNS_FAILED;
        }
        kind.write(drawing.figure(), wh[0], wh[1], out, overwrite);
        int panels = drawing.figure().size();
        spec.commandLine().getOut().println("plot of " + drawing.drawn() + " run(s) written to " + out
                + (panels > 1 ? " (" + panels + " panels, one per buffer)" : ""));
        return Outputs.reportRunProblems(done, err);
    }
}
