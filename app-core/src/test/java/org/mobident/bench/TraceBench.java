package org.mobident.bench;

import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.mobident.settings.PeakSettings;
import org.mobident.signal.PeakDetector;
import org.mobident.signal.TraceAnalysis;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;
import org.mobident.trace.io.DelimitedTraceReader;

/**
 * Micro-benchmark of the two per-run steps of a batch: parsing a delimited trace and analysing
 * it. Not a test (no assertions, not run by the build); see "Profiling" in DEVELOPERS.md.
 *
 * <pre>
 * java -cp app-cli/target/mobident.jar:app-core/target/test-classes org.mobident.bench.TraceBench \
 *     [--direct] [--parse-only] [--rounds N] trace.csv [more.csv ...]
 * </pre>
 * Each round reads every file given (distinct files, as in a real batch, so that nothing stays in
 * the caches); the second half of the rounds is reported, per trace: wall time of reading the
 * bytes, of parsing and of the analysis, the thread's CPU time of each (less disturbed by a busy
 * machine) and the bytes allocated by each step; {@code --parse-only} leaves the analysis out.
 */
public final class TraceBench {

    private TraceBench() {
    }

    public static void main(String[] args) throws Exception {
        int rounds = 10;
        boolean parseOnly = false;
        Detection detection = Detection.INDIRECT;
        List<Path> files = new ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--rounds" -> rounds = Integer.parseInt(args[++i]);
                case "--direct" -> detection = Detection.DIRECT;
                case "--parse-only" -> parseOnly = true;
                default -> files.add(Paths.get(args[i]));
            }
        }
        if (files.isEmpty()) {
            System.err.println("usage: TraceBench [--direct] [--parse-only] [--rounds N] trace.csv [more.csv ...]");
            return;
        }
        com.sun.management.ThreadMXBean threads =
                (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long self = Thread.currentThread().getId();
        long[] nanos = new long[3];
        long[] cpu = new long[3];
        long[] bytes = new long[3];
        int measured = 0;
        int peaks = 0;
        for (int round = 0; round < rounds; round++) {
            boolean count = round >= rounds / 2;
            for (Path f : files) {
                long a0 = threads.getThreadAllocatedBytes(self);
                long c0 = threads.getCurrentThreadCpuTime();
                long t0 = System.nanoTime();
                byte[] raw = Files.readAllBytes(f);
                long t1 = System.nanoTime();
                long c1 = threads.getCurrentThreadCpuTime();
                long a1 = threads.getThreadAllocatedBytes(self);
                Trace trace = DelimitedTraceReader.parse(raw, "bench", f.toString(), null);
                long t2 = System.nanoTime();
                long c2 = threads.getCurrentThreadCpuTime();
                long a2 = threads.getThreadAllocatedBytes(self);
                if (!parseOnly) {
                    TraceAnalysis analysis = PeakDetector.analyse(trace, detection, PeakSettings.DEFAULT);
                    peaks += analysis.peaks().size();
                }
                long t3 = System.nanoTime();
                long c3 = threads.getCurrentThreadCpuTime();
                long a3 = threads.getThreadAllocatedBytes(self);
                if (count) {
                    nanos[0] += t1 - t0;
                    nanos[1] += t2 - t1;
                    nanos[2] += t3 - t2;
                    cpu[0] += c1 - c0;
                    cpu[1] += c2 - c1;
                    cpu[2] += c3 - c2;
                    bytes[0] += a1 - a0;
                    bytes[1] += a2 - a1;
                    bytes[2] += a3 - a2;
                    measured++;
                }
            }
        }
        String[] names = {"read bytes", "parse", "analyse"};
        for (int k = 0; k < (parseOnly ? 2 : 3); k++) {
            System.out.printf(Locale.ROOT, "%-10s %7.2f ms wall %7.2f ms CPU %7.2f MB per trace%n", names[k],
                    nanos[k] / 1e6 / measured, cpu[k] / 1e6 / measured, bytes[k] / 1e6 / measured);
        }
        System.out.printf(Locale.ROOT, "%d traces measured, %d peaks found in all rounds%n", measured, peaks);
    }
}
