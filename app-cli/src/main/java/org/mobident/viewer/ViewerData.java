package org.mobident.viewer;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.mobident.library.Library;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;
import org.mobident.summary.RecurringUnknowns;

/**
 * Everything loaded: the library, the rule for its windows, and the runs in the order given.
 * Immutable; a finished run replaces its waiting entry through {@link #withRun}.
 */
public record ViewerData(Library library, ToleranceBand bandRule, List<ViewerRun> runs) {

    public ViewerData {
        Objects.requireNonNull(library, "library");
        Objects.requireNonNull(bandRule, "bandRule");
        runs = List.copyOf(runs);
    }

    /** The same data with run {@code index} replaced. */
    public ViewerData withRun(int index, ViewerRun run) {
        List<ViewerRun> copy = new ArrayList<>(runs);
        copy.set(index, Objects.requireNonNull(run, "run"));
        return new ViewerData(library, bandRule, copy);
    }

    /**
     * The unknowns that recur in the loaded runs: unassigned peaks grouped by mobility within each
     * buffer ({@link RecurringUnknowns}, the same groups as the batch reports).
     */
    public List<RecurringUnknowns.Group> recurringUnknowns() {
        List<RunResult> results = new ArrayList<>();
        for (ViewerRun r : runs) {
            if (r.result() != null) {
                results.add(r.result());
            }
        }
        return RecurringUnknowns.of(results, library);
    }

    /** The recurring unknown the peak {@code ref} belongs to, or null. */
    public RecurringUnknowns.Group recurringUnknownOf(PeakRef ref) {
        if (peak(ref) == null) {
            return null;
        }
        String run = runs.get(ref.run()).result().spec().name();
        for (RecurringUnknowns.Group g : recurringUnknowns()) {
            for (RecurringUnknowns.Member m : g.members()) {
                if (m.run().equals(run) && m.peakNumber() == ref.peak() + 1) {
                    return g;
                }
            }
        }
        return null;
    }

    /** The peak {@code ref} names, or null when it names none (run waiting, index out of range). */
    public PeakResult peak(PeakRef ref) {
        if (ref == null || ref.run() >= runs.size()) {
            return null;
        }
        ViewerRun r = runs.get(ref.run());
        if (r.result() == null || ref.peak() >= r.result().peaks().size()) {
            return null;
        }
        return r.result().peaks().get(ref.peak());
    }

    /** Every peak of the drawable ticked runs, in run order and then in order of apex time. */
    public List<PeakRef> peaksOf(List<Integer> tickedRuns) {
        List<PeakRef> out = new ArrayList<>();
        for (int i : tickedRuns) {
            if (i < runs.size() && runs.get(i).drawable()) {
                int n = runs.get(i).result().peaks().size();
                for (int k = 0; k < n; k++) {
                    out.add(new PeakRef(i, k));
                }
            }
        }
        return out;
    }
}
