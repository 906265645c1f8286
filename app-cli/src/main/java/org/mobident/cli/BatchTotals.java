package org.mobident.cli;

import java.util.List;
import java.util.Locale;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;

/** The closing line of a batch: "1,000 runs: 998 ok, 2 failed, 7,047 peaks identified in 2.9 s". */
final class BatchTotals {
    private BatchTotals() {
    }

    /**
     * The totals of {@code results}: runs, runs processed and failed, analyte peaks identified
     * (status {@link MatchStatus#IDENTIFIED}), and the time taken.
     *
     * @param seconds wall time of the batch
     */
    static String line(List<RunResult> results, double seconds) {
        int failed = 0;
        int identified = 0;
        for (RunResult r : results) {
            if (r.failed()) {
                failed++;
                continue;
            }
            for (PeakResult p : r.peaks()) {
                if (p.role() == PeakRole.ANALYTE && Double.isFinite(p.mobility())
                        && p.match().status() == MatchStatus.IDENTIFIED) {
                    identified++;
                }
            }
        }
        int runs = results.size();
        return String.format(Locale.ROOT, "%,d run%s: %,d ok, %,d failed, %,d peak%s identified in %.1f s",
                runs, runs == 1 ? "" : "s", runs - failed, failed, identified, identified == 1 ? "" : "s", seconds);
    }
}
