package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.mobident.InputException;
import org.mobident.library.LibraryCsv;
import org.mobident.report.plot.Axis;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.settings.MatchSettings;
import org.mobident.trace.RunSpec;
import org.mobident.trace.io.TraceFiles;
import org.mobident.usecase.IdentifyBatch;
import org.mobident.usecase.RunBatch;
import org.mobident.viewer.Viewer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code mobident view}: the runs in a window, on the time or the mobility axis. */
@Command(name = "view",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Opens a window with the electropherograms of the runs, their peaks and assignments, and the library windows. Switch between the time and the effective-mobility axis; on the mobility axis ticked runs line up even when their electro-osmotic flow differed. Click a peak for its measures and candidate analytes; save the plot as PNG or SVG. Runs and options are those of 'identify'. Needs a display.",
        footer = {"", "Exit codes: 0 the window was closed; 2 bad command line, or no display to open a window on; "
                + "3 unusable library, run sheet or setting; 5 internal error."})
public final class ViewCommand implements Callable<Integer> {

    /** Exit code when no window can be opened (headless Java, no display). */
    public static final int NO_DISPLAY = ExitCodes.USAGE;

    @Spec
    CommandSpec spec;

    @Mixin
    RunInputs inputs;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "Mobility library (CSV).")
    Path libraryFile;

    @Option(names = "--axis", paramLabel = "AXIS", description = AxisWords.DESCRIPTION)
    Axis axis = Axis.MOBILITY;

    @Option(names = {"--show", "--run"}, paramLabel = "RUN", split = ",",
            description = "Runs ticked when the window opens, by name, comma-separated or repeated (default: the "
                    + "first run), as in 'plot'.")
    List<String> shown = new ArrayList<>();

    @Option(names = "--theme", paramLabel = "THEME", description = "Window colours: light (default) or dark; the plot stays white.")
    Viewer.Theme theme = Viewer.Theme.LIGHT;

    @Mixin
    MatchOptions matching;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        if (!Viewer.canShowWindow()) {
            err.println("mobident view: no display to open a window on (Java runs headless here). "
                    + "Run it in a desktop session, or under a virtual display such as Xvfb; "
                    + "'mobident identify' gives the same results as tables.");
            err.flush();
            return NO_DISPLAY;
        }
        if (!inputs.given()) {
            err.println("mobident view: give either a run sheet (--runs SHEET) or trace files, not both or neither.");
            return ExitCodes.USAGE;
        }
        IdentifyBatch job = new IdentifyBatch(LibraryCsv.read(libraryFile));
        RunBatch loaded = inputs.load();
        List<RunSpec> runs = loaded.runs();
        List<RunResult> rejected = loaded.rejected();
        IdentifySettings settings = inputs.settings(matching.toSettings(MatchSettings.DEFAULT));
        List<Integer> ticked = tickedAtStart(runs, rejected);
        String title = (inputs.runSheet != null ? inputs.runSheet.getFileName().toString()
                : inputs.traces.size() == 1 ? inputs.traces.get(0).getFileName().toString()
                : inputs.traces.size() + " traces")
                + " · " + libraryFile.getFileName();
        CountDownLatch closed = Viewer.open(new Viewer.Setup(title, job, runs, rejected, settings,
                TraceFiles::read, axis, ticked, theme));
        try {
            closed.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return ExitCodes.OK;
    }

    /** Indices of the runs named by --show, in the order the window lists runs. */
    private List<Integer> tickedAtStart(List<RunSpec> runs, List<RunResult> rejected) throws InputException {
        List<String> names = new ArrayList<>();
        runs.forEach(r -> names.add(r.name()));
        rejected.forEach(r -> names.add(r.spec().name()));
        List<Integer> out = new ArrayList<>();
        for (String s : shown) {
            int i = names.indexOf(s.trim());
            if (i < 0) {
                throw new InputException("command line", 0, "--show",
                        "no run is named '" + s.trim() + "'; the runs are: " + String.join(", ", names));
            }
            out.add(i);
        }
        return out;
    }
}
