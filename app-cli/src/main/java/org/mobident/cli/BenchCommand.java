package org.mobident.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.RunResult;
import org.mobident.signal.PeakDetector;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

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

    /** What {@code --stage} accepts. */
    enum Stage {
        READ, DETECT, IDENTIFY
    }

    @Spec
    CommandSpec spec;

    @Mixin
    BatchOptions batch;

    @Option(names = "--stage", paramLabel = "STAGE", defaultValue = "identify",
            description = "read, detect or identify (default: ${DEFAULT-VALUE}).")
    Stage stage;

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
                org.mobident.matching.MatchSettings.DEFAULT));
        long bytes = 0;
        for (RunSpec r : runs) {
            bytes += Files.size(r.traceFile());
        }
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        long cpu0 = os.getProcessCpuTime();
        long t0 = System.nanoTime();
        long[] counts;
        if (stage == Stage.IDENTIFY) {
            List<RunResult> results = new Identifier(library, settings).identifyAll(runs);
            counts = new long[] {0, 0, 0};
            for (RunResult r : results) {
                counts[r.failed() ? 2 : 0]++;
                counts[1] += r.peaks().size();
            }
        } else {
            counts = perRun(runs, settings, stage == Stage.DETECT);
        }
        double wallS = (System.nanoTime() - t0) / 1e9;
        double cpuS = (os.getProcessCpuTime() - cpu0) / 1e9;
        String what = stage == Stage.READ ? String.format(Locale.ROOT, "%,d points", counts[1])
                : String.format(Locale.ROOT, "%,d peaks", counts[1]);
        out.println(String.format(Locale.ROOT,
                "%s: %,d runs (%,d failed), %s, %.0f MB in %.2f s wall, %.2f s CPU (process), %d thread%s; "
                        + "%.2f ms wall per run, %.2f ms CPU per run, %.0f MB/s",
                stage.name().toLowerCase(Locale.ROOT), runs.size(), counts[2], what, bytes / 1e6, wallS, cpuS,
                settings.threads(), settings.threads() == 1 ? "" : "s", 1e3 * wallS / Math.max(1, runs.size()),
                1e3 * cpuS / Math.max(1, runs.size()), bytes / 1e6 / wallS));
        out.flush();
        return ExitCodes.OK;
    }

    /** Reads (and detects) every run on the settings' threads; {ok runs, points or peaks, failed runs}. */
    private static long[] perRun(List<RunSpec> runs, IdentifySettings settings, boolean detect)
            throws InterruptedException {
        ExecutorService pool = Executors.newFixedThreadPool(settings.threads(), r -> {
            Thread t = new Thread(r, "mobident-bench");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<long[]>> futures = new ArrayList<>(runs.size());
            for (RunSpec run : runs) {
                futures.add(pool.submit(() -> {
                    try {
                        Trace trace = TraceFiles.read(run.traceFile(), settings.readOptions());
                        if (!detect) {
                            return new long[] {1, trace.size(), 0};
                        }
                        int peaks = PeakDetector.analyse(trace, run.conditions().detectionOrDirect(),
                                settings.peakSettings()).peaks().size();
                        return new long[] {1, peaks, 0};
                    } catch (InputException e) {
                        return new long[] {0, 0, 1};
                    }
                }));
            }
            long[] sum = new long[3];
            for (Future<long[]> f : futures) {
                long[] c;
                try {
                    c = f.get();
                } catch (ExecutionException e) {
                    c = new long[] {0, 0, 1};
                }
                for (int k = 0; k < 3; k++) {
                    sum[k] += c[k];
                }
            }
            return sum;
        } finally {
            pool.shutdownNow();
        }
    }
}
