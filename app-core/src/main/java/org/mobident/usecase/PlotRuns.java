package org.mobident.usecase;

import java.util.List;
import java.util.Objects;
import org.mobident.InputException;
import org.mobident.pipeline.RunResult;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotModel;
import org.mobident.trace.Trace;

/**
 * The plot of an identified batch: the chosen runs overlaid on the mobility or time axis, with the
 * library's windows as bands; the traces are reopened for it ({@link RunResult#reopenTrace}).
 */
public final class PlotRuns {

    /** Most runs drawn with peak labels; more would pile up, so their markers alone show the status. */
    public static final int MAX_LABELLED_RUNS = 2;

    private PlotRuns() {
    }

    /**
     * What was drawn.
     *
     * @param model       the plot, or null when nothing could be drawn or a name matched no run
     * @param drawn       how many runs it shows
     * @param unknownName the first name asked for that no run has, or null
     */
    public record Drawing(PlotModel model, int drawn, String unknownName) {
        /** True when there is a plot to render. */
        public boolean any() {
            return model != null;
        }
    }

    /**
     * Draws the runs named in {@code names} (all when empty), in the batch's order.
     *
     * @param bands whether the library's match windows are drawn
     */
    public static Drawing plot(IdentifiedBatch batch, List<String> names, Axis axis, boolean bands) {
        Objects.requireNonNull(axis, "axis");
        PlotModel.Builder b = PlotModel.builder(axis);
        int drawn = 0;
        for (RunResult r : batch.results()) {
            if (!names.isEmpty() && names.stream().noneMatch(n -> n.trim().equals(r.spec().name()))) {
                continue;
            }
            Trace t = reopened(batch, r);
            if (t != null) {
                b.run(t, r);
                drawn++;
            }
        }
        for (String n : names) {
            if (batch.results().stream().noneMatch(r -> r.spec().name().equals(n.trim()))) {
                return new Drawing(null, 0, n.trim());
            }
        }
        if (drawn == 0) {
            return new Drawing(null, 0, null);
        }
        if (bands) {
            b.library(batch.library());
        }
        b.peakLabels(drawn <= MAX_LABELLED_RUNS);
        if (drawn == 1) {
            b.title(names.isEmpty() ? batch.results().get(0).spec().name() : names.get(0).trim());
        } else {
            b.title(drawn + " runs");
        }
        return new Drawing(b.build(), drawn, null);
    }

    /** The run's trace read again, or null when it failed or its file cannot be read (any more). */
    private static Trace reopened(IdentifiedBatch batch, RunResult r) {
        if (r.failed() || r.spec().traceFile() == null) {
            return null;
        }
        try {
            return r.reopenTrace(batch.settings().readOptions());
        } catch (InputException e) {
            return null;
        }
    }
}
