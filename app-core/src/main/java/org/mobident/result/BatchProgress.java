package org.mobident.result;

/**
 * Told how a batch of {@link org.mobident.pipeline.Identifier#identifyAll(java.util.List, BatchProgress)} advances, for a
 * progress display. Calls come from the worker threads, so an implementation must be thread-safe
 * and quick (count, do not print); it must not throw.
 */
public interface BatchProgress {

    /** Listens to nothing. */
    BatchProgress NONE = new BatchProgress() {
        @Override
        public void passStarted(int pass, int runs) {
        }

        @Override
        public void runDone(int pass) {
        }
    };

    /**
     * A pass begins.
     *
     * @param pass 1 (every run read, detected and matched) or 2 (runs matched again with the prior
     *             learned from the batch)
     * @param runs the number of runs the pass will process
     */
    void passStarted(int pass, int runs);

    /** One run of the pass is done (successfully or not). */
    void runDone(int pass);
}
