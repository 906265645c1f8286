package org.mobident.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.mobident.io.SafeFiles;
import org.mobident.pipeline.RunResult;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotModel;
import org.mobident.report.plot.PngPlot;
import org.mobident.report.plot.SvgPlot;
import org.mobident.trace.Trace;
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

    @Option(names = "--size", paramLabel = "WxH", description = "Image size in pixels (default ${DEFAULT-VALUE}).")
    String size = "1200x520";

    @Option(names = "--no-bands", description = "Do not draw the library's match windows.")
    boolean noBands;

    @Option(names = "--overwrite", description = "Replace the file if it exists.")
    boolean overwrite;

    /** The image formats written, chosen by the name's extension. */
    enum ImageKind {
        PNG, SVG;

        /** The kind a file name asks for, or null when it names no format written here. */
        static ImageKind of(Path file) {
            String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
            if (name.endsWith(".png")) {
                return PNG;
            }
            return name.endsWith(".svg") ? SVG : null;
        }
    }

    @Override
    public Integer call() throws Exception {
        var err = spec.commandLine().getErr();
        if (!batch.runsGiven()) {
            err.println("mobident plot: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        Axis ax = axis;
        ImageKind kind = ImageKind.of(out);
        if (kind == null) {
            err.println("mobident plot: --out must name a .png or .svg file, got '" + out.getFileName()
                    + "'; other image formats are not written");
            return ExitCodes.USAGE;
        }
        String[] wh = size.toLowerCase(Locale.ROOT).split("x");
        int w;
        int h;
        try {
            w = Integer.parseInt(wh[0].trim());
            h = Integer.parseInt(wh[1].trim());
        } catch (RuntimeException e) {
            err.println("mobident plot: --size must look like 1200x520, got '" + size + "'");
            return ExitCodes.USAGE;
        }
        if (w < 200 || h < 150 || w > 10000 || h > 10000) {
            err.println("mobident plot: --size must be between 200x150 and 10000x10000 pixels");
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, out);
        BatchOptions.Batch done = batch.identify();
        Map<String, Trace> traces = done.traces();
        PlotModel.Builder b = PlotModel.builder(ax);
        int drawn = 0;
        for (RunResult r : done.results()) {
            if (!runNames.isEmpty() && runNames.stream().noneMatch(n -> n.trim().equals(r.spec().name()))) {
                continue;
            }
            Trace t = traces.get(r.spec().name());
            if (t != null) {
                b.run(t, r);
                drawn++;
            }
        }
        for (String n : runNames) {
            if (done.results().stream().noneMatch(r -> r.spec().name().equals(n.trim()))) {
                err.println("mobident plot: --show: no run is named '" + n.trim() + "'");
                return ExitCodes.BAD_INPUT;
            }
        }
        if (drawn == 0) {
            err.println("mobident plot: no run could be drawn");
            return Outputs.reportRunProblems(done.results(), err) == ExitCodes.OK
                    ? ExitCodes.BAD_INPUT : ExitCodes.SOME_RUNS_FAILED;
        }
        if (!noBands) {
            b.library(done.library());
        }
        // labels of many overlaid runs would pile up: markers alone then, the status in their shape
        b.peakLabels(drawn <= 2);
        if (drawn == 1) {
            b.title(runNames.isEmpty() ? done.results().get(0).spec().name() : runNames.get(0).trim());
        } else {
            b.title(drawn + " runs");
        }
        PlotModel model = b.build();
        try {
            if (kind == ImageKind.SVG) {
                String svg = SvgPlot.render(model, w, h);
                SafeFiles.write(out, overwrite, "add --overwrite to replace it", wr -> wr.write(svg));
            } else {
                PngPlot.write(model, w, h, out, overwrite);
            }
        } catch (IOException e) {
            throw new OutputException(out + ": " + e.getMessage(), e);
        }
        spec.commandLine().getOut().println("plot of " + drawn + " run(s) written to " + out);
        return Outputs.reportRunProblems(done.results(), err);
    }
}
