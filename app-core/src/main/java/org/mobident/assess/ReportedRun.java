package org.mobident.assess;

import java.util.List;
import java.util.Objects;

/**
 * One run of a peak table, as far as the scoring needs it.
 *
 * @param name          run name
 * @param failed        true when the run could not be processed (it has no peaks)
 * @param mobilityKnown true when a mobility scale was set for the run
 * @param peaks         its peaks in table order
 */
public record ReportedRun(String name, boolean failed, boolean mobilityKnown, List<ReportedPeak> peaks) {
    public ReportedRun {
        Objects.requireNonNull(name, "name");
        peaks = List.copyOf(peaks);
    }
}
