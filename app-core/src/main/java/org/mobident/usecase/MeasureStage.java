package org.mobident.usecase;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.pipeline.Identifier;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.signal.PeakDetector;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceFiles;

/**
 * Speed measurement: times one stage of a batch with the same inputs and threads as an
 * identification, and counts what it did. The stages nest: {@link Stage#READ} (read and parse
 * every trace), {@link Stage#DETECT} (read and detect the peaks), {@link Stage#IDENTIFY} (the whole
 * batch, {@link Identifier#identifyAll}).
 */
public final class MeasureStage {

    /** The stages that can be timed. */
    public enum Stage {
        READ, DETECT, IDENTIFY
    }

    private MeasureStage() {
    }

    /**
     * What one stage took.
     *
     * @param stage   the stage
     * @param runs    runs given
     * @param failed  runs that failed
     * @param counted points read ({@link Stage#READ}) or peaks found (the others)
     * @param bytes   size of the trace files
     * @param wallS   wall time, s
     * @param cpuS    CPU time of the whole process, s
     * @param threads threads used
     */
    public record Figures(Stage stage, int runs, long failed, long counted, long bytes, double wallS, double cpuS,
                          int threads) {
    }

    /** Times {@code stage} on {@code runs}. */
    public static Figures run(Stage stage, Library library, List<RunSpec> runs, IdentifySettings settings)
            throws IOException, InterruptedException {
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
        return new Figures(stage, runs.size(), counts[2], counts[1], bytes, wallS, cpuS, settings.threads());
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
