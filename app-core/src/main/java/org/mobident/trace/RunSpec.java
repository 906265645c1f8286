package org.mobident.trace;

import java.nio.file.Path;

/**
 * One run to process: its trace file and conditions, and where it was declared.
 *
 * @param name       run name: the trace file name without extension
 * @param traceFile  resolved path of the trace file
 * @param conditions the run's conditions after defaults were applied
 * @param origin     where the run was declared (the run sheet path, or "command line")
 * @param originLine 1-based line of the run sheet, or 0
 * @param sample     the run sheet's free-text sample description, or null
 */
public record RunSpec(String name, Path traceFile, RunConditions conditions, String origin, long originLine,
                      String sample) {

    /** A run without a sample description. */
    public RunSpec(String name, Path traceFile, RunConditions conditions, String origin, long originLine) {
        this(name, traceFile, conditions, origin, originLine, null);
    }

    /** The same run with other conditions. */
    public RunSpec withConditions(RunConditions other) {
        return new RunSpec(name, traceFile, other, origin, originLine, sample);
    }

    /** The run name for a trace file: its file name without the last extension. */
    public static String runNameOf(Path file) {
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }
}
