package org.mobident.viewer;

import java.util.List;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.BiConsumer;
import javax.swing.SwingWorker;
import org.mobident.InputException;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.RunResult;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceReadOptions;

/**
 * Reads and identifies the runs on background threads (several at once) and hands each finished
 * run to the Event Dispatch Thread as soon as it is done, so the window fills in run by run.
 */
final class RunLoader extends SwingWorker<Void, RunLoader.Done> {

    /** A finished run and its place in the list. */
    record Done(int index, ViewerRun run) {
    }

    private final List<RunSpec> runs;
    private final Identifier identifier;
    private final TraceLoader loader;
    private final TraceReadOptions options;
    private final int threads;
    private final BiConsumer<Integer, ViewerRun> onRun;
    private final Runnable onFinished;

    /**
     * @param runs     the runs to process; run {@code i} is reported with index {@code i}
     * @param onRun    called on the Event Dispatch Thread for each finished run
     * @param onFinish called on the Event Dispatch Thread when all are done (or loading was cancelled)
     */
    RunLoader(List<RunSpec> runs, Identifier identifier, TraceLoader loader, TraceReadOptions options,
              int threads, BiConsumer<Integer, ViewerRun> onRun, Runnable onFinish) {
        this.runs = List.copyOf(runs);
        this.identifier = identifier;
        this.loader = loader;
        this.options = options;
        this.threads = Math.max(1, Math.min(threads, runs.size()));
        this.onRun = onRun;
        this.onFinished = onFinish;
    }

    @Override
    protected Void doInBackground() throws InterruptedException {
        if (runs.isEmpty()) {
            return null;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "mobident-viewer-run");
            t.setDaemon(true);
            return t;
        });
        try {
            CompletionService<Done> done = new ExecutorCompletionService<>(pool);
            for (int i = 0; i < runs.size(); i++) {
                int index = i;
                done.submit(() -> new Done(index, process(runs.get(index))));
            }
            for (int i = 0; i < runs.size() && !isCancelled(); i++) {
                try {
                    publish(done.take().get());
                } catch (ExecutionException e) {
                    // process() catches everything it can; nothing is left to report here
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return null;
    }

    /** One run: read, identify; any problem becomes a failed run with the reason. */
    ViewerRun process(RunSpec spec) {
        try {
            Trace trace = loader.read(spec.traceFile(), options);
            return new ViewerRun(spec, trace, identifier.identify(spec, trace));
        } catch (InputException e) {
            return ViewerRun.failed(RunResult.failure(spec, e));
        } catch (RuntimeException e) {
            return ViewerRun.failed(RunResult.failure(spec, new InputException(String.valueOf(spec.traceFile()), 0,
                    null, "could not be processed (" + e + "); please report this with the file", e)));
        }
    }

    @Override
    protected void process(List<Done> chunks) {
        for (Done d : chunks) {
            onRun.accept(d.index(), d.run());
        }
    }

    @Override
    protected void done() {
        onFinished.run();
    }
}
