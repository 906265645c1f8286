package org.mobident.result;

/**
 * Told of each run's result as soon as it is known, for a display that fills in run by run (the
 * viewer). Calls come from the worker threads, so an implementation must be thread-safe and quick
 * (hand the result on, do not draw); it must not throw.
 */
@FunctionalInterface
public interface RunListener {

    /** Listens to nothing. */
    RunListener NONE = (index, result) -> {
    };

    /**
     * A run's result. A run matched again in the second pass is told a second time; the later
     * result replaces the earlier one.
     *
     * @param index  the run's place in the list given to {@link org.mobident.pipeline.Identifier#identifyAll}
     * @param result its result so far
     */
    void runDone(int index, RunResult result);
}
