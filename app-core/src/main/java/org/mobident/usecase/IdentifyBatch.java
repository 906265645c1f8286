package org.mobident.usecase;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.atomic.AtomicReferenceArray;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.standards.LibraryCheck;
import org.mobident.pipeline.Identifier;
import org.mobident.result.BatchProgress;
import org.mobident.result.RunListener;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;

/**
 * The main job: the peaks of every run of a batch, their mobilities and their library matches
 * ({@link Identifier#identifyAll}, two passes, several runs at once). The command line, the
 * report, the plot, the scoring and the viewer all identify through here.
 */
public final class IdentifyBatch {

    private final Library library;

    /**
     * A job that matches against {@code library}.
     *
     * @throws InputException when the library cannot be matched against (an entry without a usable mobility …)
     */
    public IdentifyBatch(Library library) throws InputException {
        this.library = Objects.requireNonNull(library, "library");
        LibraryCheck.requirePlausible(library);
    }

    /** The library matched against. */
    public Library library() {
        return library;
    }

    /** Identifies the runs; see {@link #run(RunBatch, IdentifySettings, BatchProgress, RunListener)}. */
    public IdentifiedBatch run(RunBatch runs, IdentifySettings settings) {
        return run(runs, settings, BatchProgress.NONE, RunListener.NONE);
    }

    /**
     * Identifies the runs.
     *
     * @param progress told as each pass advances (a progress bar)
     * @param listener told each run's result as soon as it is known, with the run's index in
     *                 {@code runs.runs()}; told again when a later result replaces it (second pass).
     *                 Rejected rows are not told: they are known before the job starts.
     * @return the results in run order, the rejected rows last
     */
    public IdentifiedBatch run(RunBatch runs, IdentifySettings settings, BatchProgress progress,
                               RunListener listener) {
        AtomicReferenceArray<RunResult> told = new AtomicReferenceArray<>(runs.runs().size());
        RunListener remembering = (index, result) -> {
            told.set(index, result);
            listener.runDone(index, result);
        };
        List<RunResult> identified = new Identifier(library, settings).identifyAll(runs.runs(), progress, remembering);
        for (int i = 0; i < identified.size(); i++) {
            // a run whose task crashed was never told; its final result is
            if (told.get(i) != identified.get(i)) {
                listener.runDone(i, identified.get(i));
            }
        }
        List<RunResult> results = new ArrayList<>(identified);
        results.addAll(runs.rejected());
        return new IdentifiedBatch(library, settings, results);
    }
}
