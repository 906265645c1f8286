package org.mobident.recheck;

import java.io.PrintWriter;
import java.util.Locale;

/**
 * A readable summary of a recheck for a terminal: the buffer change, a count per verdict, every
 * assignment that needs attention with its reason, the pairs that became unresolvable, how far
 * the model was off (when library B was measured), the notes, and the closing caution that
 * identification by mobility is presumptive. Mobilities in 1e-9 m²/(V s), two decimals.
 */
public final class RecheckSummaryText {

    private RecheckSummaryText() {
    }

    /** Writes the summary; the writer is flushed, not closed. */
    public static void write(RecheckResult r, PrintWriter out) {
        out.println("Recheck of assignments made with " + r.libraryA() + " (the old buffer's library)");
        if (r.predicted()) {
            out.println("  against a library predicted for the new buffer"
                    + (r.bufferB() != null ? ": " + r.bufferB().describe() : ""));
        } else {
            out.println("  against the library measured in the new buffer: " + r.libraryB());
            if (r.bufferB() != null) {
                out.println("  new buffer: " + r.bufferB().describe());
            }
        }
        out.println();
        out.printf(Locale.ROOT, "Assignments: %d checked; %d still hold, %d moved but still unique, %d now ambiguous, "
                        + "%d reassigned, %d lost%n",
                r.assignments().size(), r.count(Verdict.STILL_HOLDS), r.count(Verdict.MOVED_BUT_STILL_UNIQUE),
                r.count(Verdict.NOW_AMBIGUOUS), r.count(Verdict.REASSIGNED), r.count(Verdict.LOST));
        out.println("  (the moved peak is the old peak plus its analyte's shift; \"still hold\" means it stays inside "
                + "the analyte's window of the old library)");
        for (AssignmentCheck a : r.assignments()) {
            if (a.verdict() == Verdict.STILL_HOLDS) {
                continue;
            }
            out.printf(Locale.ROOT, "  %s peak %d, %s: %s (%.2f -> %.2f)%s — %s%n", a.run(), a.peak(), a.analyte(),
                    a.verdict().text(), a.oldMobility(), a.newMobility(),
                    a.collidesWith().isEmpty() ? "" : ", with " + String.join(", ", a.collidesWith()), a.reason());
        }
        out.println();
        if (r.newlyUnresolvable().isEmpty()) {
            out.println("No analyte pair becomes unresolvable.");
        } else {
            out.println("Pairs that become unresolvable:");
            for (PairCheck p : r.newlyUnresolvable()) {
                out.printf(Locale.ROOT, "  %s / %s: |Δμ| %.2f before, %.2f ± %.2f after (needs %.2f)%n", p.first(),
                        p.second(), Math.abs(p.deltaA()), Math.abs(p.deltaB()), p.uncertaintyB(), p.thresholdB());
            }
        }
        if (!r.predictionErrors().isEmpty()) {
            out.println();
            out.println("How far the model was off (measured in the new buffer − predicted from the old library):");
            for (PredictionError e : r.predictionErrors()) {
                out.printf(Locale.ROOT, "  %s: %+.2f (%+.1f × its uncertainty %.2f; %s)%n", e.analyte(), e.error(),
                        e.errorInSd(), e.uncertainty(), e.basis().description());
            }
        }
        if (!r.notes().isEmpty()) {
            out.println();
            out.println("Notes:");
            for (String n : r.notes()) {
                out.println("  - " + n);
            }
        }
        out.println();
        out.println(r.needsAttention() ? "Attention needed: some assignments or pairs change in the new buffer."
                : "All assignments still hold in the new buffer.");
        out.println(r.caution());
        out.flush();
    }
}
