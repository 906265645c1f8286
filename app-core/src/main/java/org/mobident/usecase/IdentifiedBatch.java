package org.mobident.usecase;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.UnaryOperator;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.matching.MatchWindow;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.Trace;

/**
 * A batch identified by {@link IdentifyBatch}: every run's result (its peaks and matches, its
 * scale correction {@link RunResult#runScale()}, its temperature factor
 * {@link RunResult#temperatureFactor()}, its notes), the library, the window of every entry, the
 * runs that need attention and a way to reopen the traces for plots and reports.
 *
 * @param library  the library matched against
 * @param settings the settings applied
 * @param results  one result per run, in run order, rows refused before processing last
 */
public record IdentifiedBatch(Library library, IdentifySettings settings, List<RunResult> results) {

    public IdentifiedBatch {
        Objects.requireNonNull(library, "library");
        Objects.requireNonNull(settings, "settings");
        results = List.copyOf(results);
    }

    /** The same batch with every result passed through {@code rewrite} (e.g. to reword errors for a user interface). */
    public IdentifiedBatch withResults(UnaryOperator<RunResult> rewrite) {
        List<RunResult> out = new ArrayList<>(results.size());
        for (RunResult r : results) {
            out.add(rewrite.apply(r));
        }
        return new IdentifiedBatch(library, settings, out);
    }

    /**
     * The half-width of the window matching applied to each library entry, in the library's order,
     * mobility units, for a peak measured without uncertainty ({@link MatchWindow#halfWidths}).
     */
    public double[] windowHalfWidths() {
        return MatchWindow.halfWidths(library, settings.matchSettings());
    }

    /** The runs that need attention: failed, or without a mobility scale. */
    public List<RunProblem> problems() {
        List<RunProblem> out = new ArrayList<>();
        for (RunResult r : results) {
            if (r.failed()) {
                out.add(new RunProblem(r, true, r.error().getMessage()));
            } else if (!r.mobilityKnown()) {
                out.add(new RunProblem(r, false, r.scaleNote()));
            }
        }
        return List.copyOf(out);
    }

    /**
     * The traces of the processed runs, read again (results keep no trace), by run name in run
     * order; a run that failed, or whose file vanished meanwhile, is left out.
     */
    public Map<String, Trace> traces() {
        Map<String, Trace> out = new LinkedHashMap<>();
        for (RunResult r : results) {
            if (!r.failed() && r.spec().traceFile() != null) {
                try {
                    out.put(r.spec().name(), r.reopenTrace(settings.readOptions()));
                } catch (InputException e) {
                    // read once already; if it vanished since, its plot is left out
                }
            }
        }
        return out;
    }

    /**
     * A run that needs attention.
     *
     * @param result the run
     * @param failed true when it was not processed at all; false when it got no mobility scale
     * @param reason the error or the scale note
     */
    public record RunProblem(RunResult result, boolean failed, String reason) {
    }
}
