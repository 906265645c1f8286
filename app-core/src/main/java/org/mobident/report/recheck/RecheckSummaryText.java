package org.mobident.report.recheck;

import java.io.PrintWriter;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.mobident.recheck.AnalyteRecheck;
import org.mobident.recheck.PairCheck;
import org.mobident.recheck.PredictionError;
import org.mobident.recheck.RecheckResult;
import org.mobident.recheck.Verdict;
import org.mobident.text.NumberText;

/**
 * A readable summary of a recheck for a terminal, per analyte rather than per peak: the buffer
 * change, the count per verdict, one line per library analyte (its verdict over all its earlier
 * assignments, the shift with its standard uncertainty, how many of its peaks are affected, its
 * window in the new buffer and, when the new library was measured, how far the model was off), the
 * pairs that merge or separate, the notes, where the per-peak details are, and the closing caution
 * that identification by mobility is presumptive. Mobilities in 1e-9 m²/(V s), two decimals; a
 * value that is not known is printed as "-", never as "NaN". The per-peak verdicts and reasons are
 * in {@link RecheckReportCsv}.
 */
public final class RecheckSummaryText {

    /** Most pairs listed per kind (merge, separate); the rest are counted. */
    public static final int MAX_PAIR_LINES = 6;
    /** Decimals of mobilities, 1e-9 m²/(V s). */
    private static final int DECIMALS = 2;
    /** A value that is not known. */
    private static final String NONE = "-";
    /** Most notes listed; the rest are counted. */
    public static final int MAX_NOTE_LINES = 5;
    /** Widest analyte column; longer names are cut with "…". */
    private static final int MAX_NAME_WIDTH = 22;

    private RecheckSummaryText() {
    }

    /** Writes the summary; the writer is flushed, not closed. */
    public static void write(RecheckResult r, PrintWriter out) {
        out.println("Recheck of assignments made with " + r.libraryA() + " (the old buffer's library)");
        if (r.predicted()) {
            out.println("  against a library predicted for the new buffer"
                    + (r.bufferB() != null ? ": " + r.bufferB().describe() : ""));
        } else {
            out.println("  against the library measured in the new buffer: " + r.libraryB()
                    + (r.bufferB() != null ? " (" + r.bufferB().describe() + ")" : ""));
        }
        Set<String> runs = new LinkedHashSet<>();
        r.assignments().forEach(a -> runs.add(a.run()));
        out.printf(Locale.ROOT, "Assignments: %d checked in %d run(s); %d still hold, %d moved but still unique, "
                        + "%d still ambiguous, %d now ambiguous, %d reassigned, %d lost%n",
                r.assignments().size(), runs.size(), r.count(Verdict.STILL_HOLDS),
                r.count(Verdict.MOVED_BUT_STILL_UNIQUE), r.count(Verdict.STILL_AMBIGUOUS),
                r.count(Verdict.NOW_AMBIGUOUS), r.count(Verdict.REASSIGNED), r.count(Verdict.LOST));
        out.println();
        analyteTable(r, out);
        out.println();
        pairs("Pairs that merge (told apart before, not in the new buffer):", r.newlyUnresolvable(), out);
        pairs("Pairs that separate (not told apart before, told apart now):", r.newlyResolvable(), out);
        if (r.newlyUnresolvable().isEmpty() && r.newlyResolvable().isEmpty()) {
            out.println("No analyte pair merges or separates.");
        }
        if (!r.notes().isEmpty()) {
            out.println("Notes:");
            for (int i = 0; i < r.notes().size() && i < MAX_NOTE_LINES; i++) {
                out.println("  - " + r.notes().get(i));
            }
            if (r.notes().size() > MAX_NOTE_LINES) {
                out.println("  - and " + (r.notes().size() - MAX_NOTE_LINES) + " more");
            }
        }
        out.println("Per-peak verdicts with their reasons: --csv FILE; pairs: --pairs-csv FILE; per-analyte "
                + "predictions: --analytes-csv FILE.");
        long stillAmbiguous = r.count(Verdict.STILL_AMBIGUOUS);
        out.println(r.needsAttention() ? "Attention needed: some assignments or pairs change in the new buffer."
                : stillAmbiguous == 0 ? "All assignments still hold in the new buffer."
                : String.format(Locale.ROOT, "Nothing changes in the new buffer: the %d call(s) ambiguous before "
                        + "stay ambiguous, all others still hold.", stillAmbiguous));
        out.println(r.caution());
        out.flush();
    }

    private static void analyteTable(RecheckResult r, PrintWriter out) {
        Map<String, PredictionError> errors = new HashMap<>();
        for (PredictionError e : r.predictionErrors()) {
            errors.put(e.analyte(), e);
        }
        boolean withErrors = !errors.isEmpty();
        int nameWidth = Math.min(MAX_NAME_WIDTH, Math.max("analyte".length(),
                r.analytes().stream().mapToInt(a -> a.name().length()).max().orElse(0)));
        List<String> verdicts = r.analytes().stream().map(RecheckSummaryText::verdictText).toList();
        int verdictWidth = Math.max("verdict".length(), verdicts.stream().mapToInt(String::length).max().orElse(0));
        String layout = "%-" + nameWidth + "s  %-" + verdictWidth + "s  %-16s %-8s %-16s" + (withErrors ? " %s" : "");
        out.println("Per analyte (mobilities in 1e-9 m^2/(V s); peaks = affected/assigned; new window = mobility in the "
                + "new buffer ± the match half-width" + (withErrors ? "; model off = measured − predicted" : "") + "):");
        out.println(String.format(Locale.ROOT, layout, "analyte", "verdict", "shift ± SD", "peaks", "new window",
                "model off").stripTrailing());
        for (int i = 0; i < r.analytes().size(); i++) {
            AnalyteRecheck a = r.analytes().get(i);
            String shift = Double.isFinite(a.shift())
                    ? signed(a.shift()) + (Double.isFinite(a.shiftSd()) ? " ± " + num(a.shiftSd()) : "") : "-";
            String window = Double.isFinite(a.mobilityB())
                    ? num(a.mobilityB()) + (Double.isFinite(a.windowHalfWidth()) ? " ± " + num(a.windowHalfWidth()) : "")
                    : "-";
            PredictionError e = errors.get(a.name());
            String off = e == null ? "-" : signed(e.error()) + String.format(Locale.ROOT, " (%+.1f SD)", e.errorInSd());
            out.println(String.format(Locale.ROOT, layout, cut(a.name(), nameWidth), verdicts.get(i), shift,
                    a.peaks() == 0 ? "-" : a.affected() + "/" + a.peaks(), window, off).stripTrailing());
        }
    }

    /** The analyte's verdict: the worst of its assignments, with what it collides with; "no peaks" when unassigned. */
    static String verdictText(AnalyteRecheck a) {
        Verdict worst = a.worst();
        if (worst == null) {
            return Double.isFinite(a.mobilityB()) ? "no peaks assigned" : "no peaks; not in new library";
        }
        String text = worst.text();
        if ((worst == Verdict.REASSIGNED || worst == Verdict.NOW_AMBIGUOUS
                || worst == Verdict.STILL_AMBIGUOUS) && !a.collidesWith().isEmpty()) {
            text += (worst == Verdict.REASSIGNED ? " to " : " with ") + a.collidesWith().get(0)
                    + (a.collidesWith().size() > 1 ? " +" + (a.collidesWith().size() - 1) : "");
        }
        if (worst == Verdict.LOST && !Double.isFinite(a.mobilityB())) {
            text += " (not in new library)";
        }
        return text;
    }

    private static void pairs(String title, List<PairCheck> pairs, PrintWriter out) {
        if (pairs.isEmpty()) {
            return;
        }
        out.println(title);
        for (int i = 0; i < pairs.size() && i < MAX_PAIR_LINES; i++) {
            PairCheck p = pairs.get(i);
            out.printf(Locale.ROOT, "  %s / %s: |Δμ| %s before, %s ± %s now (needs %s)%n", p.first(), p.second(),
                    num(Math.abs(p.deltaA())), num(Math.abs(p.deltaB())), num(p.uncertaintyB()),
                    num(p.thresholdB()));
        }
        if (pairs.size() > MAX_PAIR_LINES) {
            out.println("  and " + (pairs.size() - MAX_PAIR_LINES) + " more (see --pairs-csv)");
        }
    }

    private static String cut(String name, int width) {
        return name.length() <= width ? name : name.substring(0, width - 1) + "…";
    }

    /** A mobility (difference) with two decimals, "-" when not known. */
    private static String num(double v) {
        return NumberText.fixed(v, DECIMALS, NONE);
    }

    /** As {@link #num}, with a plus sign when not zero. */
    private static String signed(double v) {
        return NumberText.signed(v, DECIMALS, NONE);
    }
}
