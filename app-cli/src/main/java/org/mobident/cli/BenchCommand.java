package org.mobident.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.RunSpec;
import org.mobident.usecase.MeasureStage;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code mobident bench} (hidden): times one stage of a batch on the runs of a sheet, with the
 * same inputs and threads as {@code identify}, and writes nothing but one line of figures. The
 * stages nest: {@code read} (read and parse every trace), {@code detect} (read and detect the
 * peaks), {@code identify} (the whole batch as {@code identify} runs it, without writing tables).
 * Run each stage in its own process, so that none profits from another's warmed-up JIT; see
 * "Speed" in the README.
 */
@Command(name = "bench",
        hidden = true,
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Times one stage of a batch (read, detect or identify) and prints wall and CPU time; "
                + "writes no files. For speed measurements only.")
public final class BenchCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    BatchOptions batch;

    @Option(names = "--stage", paramLabel = "STAGE", defaultValue = "identify",
            description = "read, detect or identify (default: ${DEFAULT-VALUE}).")
    MeasureStage.Stage stage;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (!batch.runsGiven()) {
            spec.commandLine().getErr().println("mobident bench: give either a run sheet (--runs SHEET) or trace files.");
            return ExitCodes.USAGE;
        }
        Library library = LibraryCsv.read(batch.libraryFile);
        List<RunSpec> runs = batch.inputs.load().runs();
        IdentifySettings settings = batch.inputs.settings(batch.matching.toSettings(
                org.mobident.settings.MatchSettings.DEFAULT));
        MeasureStage.Figures f = MeasureStage.run(stage, library, runs, settings);
        String what = stage == MeasureStage.Stage.READ ? String.format(Locale.ROOT, "%,d points", f.counted())
                : String.format(Locale.ROOT, "%,d peaks", f.counted());
        out.println(String.format(Locale.ROOT,
                "%s: %,d runs (%,d failed), %s, %.0f MB in %.2f s wall, %.2f s CPU (process), %d thread%s; "
                        + "%.2f ms wall per run, %.2f ms CPU per run, %.0f MB/s",
                stage.name().toLowerCase(Locale.ROOT), f.runs(), f.failed(), what, f.bytes() / 1e6, f.wallS(),
                f.cpuS(), f.threads(), f.threads() == 1 ? "" : "s", 1e3 * f.wallS() / Math.max(1, f.runs()),
                1e3 * f.cpuS() / Math.max(1, f.runs()), f.bytes() / 1e6 / f.wallS()));
        out.flush();
        return ExitCodes.OK;
    }
}
