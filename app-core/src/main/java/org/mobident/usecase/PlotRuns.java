package org.mobident.usecase;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.mobident.InputException;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.BufferGroups;
import org.mobident.report.plot.PlotFigure;
import org.mobident.report.plot.PlotModel;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.RunResult;
import org.mobident.trace.Trace;

/**
 * The plot of an identified batch: the chosen runs overlaid on the mobility or time axis, a panel
 * per buffer, with the library's windows as named bands; the traces are reopened for it
 * ({@link RunResult#reopenTrace}).
 */
public final class PlotRuns {

    /** Most runs of a panel drawn with peak labels; more would pile up, so their markers alone show the status. */
    public static final int MAX_LABELLED_RUNS = 2;

    private PlotRuns() {
    }

    /**
     * What was drawn.
     *
     * @param figure      the plot, one panel per buffer group, or null when nothing could be drawn or a
     *                    name matched no run
     * @param drawn       how many runs it shows
     * @param unknownName the first name asked for that no run has, or null
     */
    public record Drawing(PlotFigure figure, int drawn, String unknownName) {
        /** True when there is a plot to render. */
        public boolean any() {
            return figure != null;
        }
    }

    /**
     * Draws the runs named in {@code names} (all when empty), in the batch's order. Runs of
     * different buffers, or anion and cation runs, get a panel each ({@link BufferGroups}), with
     * the library entries that apply to that buffer as named bands.
     *
     * @param bands whether the library's match windows are drawn
     */
    public static Drawing plot(IdentifiedBatch batch, List<String> names, Axis axis, boolean bands) {
        Objects.requireNonNull(axis, "axis");
        for (String n : names) {
            if (batch.results().stream().noneMatch(r -> r.spec().name().equals(n.trim()))) {
                return new Drawing(null, 0, n.trim());
            }
        }
        List<RunResult> chosen = new ArrayList<>();
        Map<RunResult, Trace> traces = new IdentityHashMap<>();
        for (RunResult r : batch.results()) {
            if (!names.isEmpty() && names.stream().noneMatch(n -> n.trim().equals(r.spec().name()))) {
                continue;
            }
            Trace t = reopened(batch, r);
            if (t != null) {
                chosen.add(r);
                traces.put(r, t);
            }
        }
        if (chosen.isEmpty()) {
            return new Drawing(null, 0, null);
        }
        List<BufferGroups.Group> groups = BufferGroups.of(chosen);
        ToleranceBand rule = bands ? ToleranceBand.matching(batch.library(), batch.settings().matchSettings()) : null;
        List<PlotModel> panels = new ArrayList<>();
        for (BufferGroups.Group g : groups) {
            PlotModel.Builder b = PlotModel.builder(axis);
            for (RunResult r : g.runs()) {
                b.run(traces.get(r), r);
            }
            if (bands) {
                b.library(batch.library().forBuffer(g.buffer()), rule).bandLabels(true);
            }
            b.peakLabels(g.runs().size() <= MAX_LABELLED_RUNS);
            if (groups.size() > 1) {
                b.title(g.title());
            } else if (chosen.size() == 1) {
                b.title(chosen.get(0).spec().name());
            } else {
                b.title(chosen.size() + " runs");
            }
            PlotModel m = b.build();
            if (!m.series().isEmpty() || groups.size() == 1) {
                panels.add(m);
            }
        }
        if (panels.isEmpty()) {
            return new Drawing(null, 0, null);
        }
        return new Drawing(new PlotFigure(panels), chosen.size(), null);
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
