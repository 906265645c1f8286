package org.mobident.viewer;

import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.BiConsumer;
import javax.swing.SwingWorker;
import org.mobident.InputException;
import org.mobident.result.BatchProgress;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.usecase.IdentifyBatch;
import org.mobident.usecase.RunBatch;

/**
 * Identifies the runs in the background through the same use case as {@code identify}
 * ({@link IdentifyBatch}: several runs at once, the batch's second pass) and hands each run to the
 * Event Dispatch Thread as soon as its result is known, with its trace for drawing, so the window
 * fills in run by run; a run matched again in the second pass is handed on again.
 */
final class RunLoader extends SwingWorker<Void, RunLoader.Done> {

    /** A finished run and its place in the list. */
    record Done(int index, ViewerRun run) {
    }

    private final List<RunSpec> runs;
    private final IdentifyBatch job;
    private final IdentifySettings settings;
    private final TraceLoader loader;
    private final BiConsumer<Integer, ViewerRun> onRun;
    private final Runnable onFinished;
    /** Each run's trace once read for drawing, so that a second-pass result does not read it again. */
    private final Map<Integer, Trace> traces = new ConcurrentHashMap<>();

    /**
     * @param runs     the runs to process; run {@code i} is reported with index {@code i}
     * @param loader   reads a run's trace for drawing
     * @param onRun    called on the Event Dispatch Thread for each finished run
     * @param onFinish called on the Event Dispatch Thread when all are done (or loading was cancelled)
     */
    RunLoader(List<RunSpec> runs, IdentifyBatch job, IdentifySettings settings, TraceLoader loader,
              BiConsumer<Integer, ViewerRun> onRun, Runnable onFinish) {
        this.runs = List.copyOf(runs);
        this.job = job;
        this.settings = settings;
        this.loader = loader;
        this.onRun = onRun;
        this.onFinished = onFinish;
    }

    @Override
    protected Void doInBackground() {
        if (!runs.isEmpty()) {
            job.run(new RunBatch(runs, List.of(), Map.of(), Map.of()), settings, BatchProgress.NONE, (i, r) -> {
                if (!isCancelled()) {
                    publish(new Done(i, shown(i, r)));
                }
            });
        }
        return null;
    }

    /**
     * A run's result as the window shows it: with its trace, read once; a run that failed, or whose
     * trace can no longer be read for drawing, is shown as not processed with the reason.
     */
    ViewerRun shown(int index, RunResult result) {
        if (result.failed()) {
            return ViewerRun.failed(result);
        }
        try {
            Trace trace = traces.get(index);
            if (trace == null) {
                trace = loader.read(result.spec().traceFile(), settings.readOptions());
                traces.put(index, trace);
            }
            return new ViewerRun(result.spec(), trace, result);
        } catch (InputException e) {
            return ViewerRun.failed(RunResult.failure(result.spec(), e));
        } catch (RuntimeException e) {
            return ViewerRun.failed(RunResult.failure(result.spec(), new InputException(
                    String.valueOf(result.spec().traceFile()), 0, null, "could not be read for drawing (" + e + ")", e)));
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
