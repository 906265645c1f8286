package org.mobident.report;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;
import org.mobident.text.NumberText;

/**
 * A readable terminal summary of processed runs, in plain ASCII.
 *
 * <p>For each run: a heading (run name, how the mobility scale was set, EOF mobility), an
 * aligned table of its analyte peaks (apex time, mobility ± standard uncertainty, assigned
 * analyte or "-", confidence in %, status), then the run's notes. A failed run gets one line
 * with the reason. The summary ends with counts of runs and peaks and a caution that mobility
 * identification is presumptive.
 */
public final class RunSummaryText {

    /** The closing caution printed under every summary. */
    public static final String CAUTION =
            "Caution: identification by mobility alone is presumptive. Where a result carries legal, "
            + "clinical or safety weight, confirm it by an orthogonal method and follow your "
            + "laboratory's validated procedures.";

    /** What the table shows for a missing value. */
    static final String NONE = "-";

    private static final String[] HEADERS = {"peak", "time/s", "mobility +/- u", "assigned", "confidence", "status"};
    private static final boolean[] RIGHT_ALIGNED = {true, true, true, false, true, false};
    private static final String COLUMN_GAP = "  ";
    private static final String TABLE_INDENT = "  ";
    private static final int TIME_DECIMALS = 2;
    private static final int MOBILITY_DECIMALS = 2;
    private static final int SD_DECIMALS = 3;
    private static final int PERCENT_DECIMALS = 0;

    private RunSummaryText() {
    }

    /** Writes the summary of {@code runs} to {@code out} (flushed, not closed). */
    public static void write(List<RunResult> runs, PrintWriter out) {
        write(runs, List.of(), out);
    }

    /**
     * Writes the summary of {@code runs} to {@code out} (flushed, not closed), with the block of
     * recurring unknowns ({@link RecurringUnknownsText}) before the closing counts.
     */
    public static void write(List<RunResult> runs, List<RecurringUnknowns.Group> unknowns, PrintWriter out) {
        write(runs, null, unknowns, out);
    }

    /**
     * As {@link #write(List, List, PrintWriter)}, opening with one line per run that names the
     * library analytes called in it ({@code samples} may be null: no such block).
     */
    public static void write(List<RunResult> runs, SampleCalls samples, List<RecurringUnknowns.Group> unknowns,
                             PrintWriter out) {
        if (samples != null && !samples.runs().isEmpty()) {
            writeSamples(samples, out);
            out.println();
        }
        out.println("Effective mobilities in 1e-9 m^2/(V s), as compared with the library: converted to its");
        out.println("temperature and corrected for the run's scale (see each run's note). +/- u: for a named peak,");
        out.println("the standard uncertainty that decided its match (zone and marker times, the scale correction");
        out.println("and the library's run-to-run spread); for a peak without a name, its times' share only.");
        int ok = 0;
        int failed = 0;
        int withoutScale = 0;
        int noMobility = 0;
        int identified = 0;
        int ambiguous = 0;
        int unassigned = 0;
        for (RunResult run : runs) {
            out.println();
            if (run.failed()) {
                failed++;
                out.println("Run " + run.spec().name() + ": FAILED - " + oneLine(run.error().getMessage()));
                continue;
            }
            ok++;
            if (!run.mobilityKnown()) {
                withoutScale++;
            }
            out.println(heading(run));
            List<String[]> rows = new ArrayList<>();
            int number = 0;
            for (PeakResult pr : run.peaks()) {
                number++;
                if (pr.role() != PeakRole.ANALYTE) {
                    continue;
                }
                MatchStatus status = pr.match().status();
                if (!Double.isFinite(pr.mobility())) {
                    noMobility++;
                } else if (status == MatchStatus.IDENTIFIED) {
                    identified++;
                } else if (status == MatchStatus.AMBIGUOUS) {
                    ambiguous++;
                } else {
                    unassigned++;
                }
                rows.add(row(run, number, pr));
            }
            if (rows.isEmpty()) {
                out.println(TABLE_INDENT + "no analyte peaks detected");
            } else {
                printTable(rows, out);
            }
            for (String note : run.notes()) {
                out.println(TABLE_INDENT + "note: " + oneLine(note));
            }
        }
        out.println();
        if (!unknowns.isEmpty()) {
            RecurringUnknownsText.write(unknowns, out);
            out.println();
        }
        out.println(String.format(Locale.ROOT,
                "%d run%s: %d ok%s, %d failed. Analyte peaks: %d identified, %d ambiguous, %d unassigned%s.",
                runs.size(), runs.size() == 1 ? "" : "s", ok,
                withoutScale > 0 ? " (" + withoutScale + " without mobility scale)" : "", failed,
                identified, ambiguous, unassigned, noMobility > 0 ? ", " + noMobility + " without mobility" : ""));
        out.println(CAUTION);
        out.flush();
    }

    /** One line per run: the analytes called in it with their confidence, ambiguous calls marked. */
    static void writeSamples(SampleCalls samples, PrintWriter out) {
        out.println("Analytes found per run (confidence; '?' marks an ambiguous call):");
        int width = 0;
        for (SampleCalls.RunRow row : samples.runs()) {
            width = Math.max(width, row.run().spec().name().length());
        }
        for (SampleCalls.RunRow row : samples.runs()) {
            StringBuilder sb = new StringBuilder(TABLE_INDENT).append(row.run().spec().name());
            sb.append(" ".repeat(width - row.run().spec().name().length())).append("  ");
            if (row.run().failed()) {
                sb.append("run failed");
            } else if (!row.run().mobilityKnown()) {
                sb.append("no mobility scale");
            } else {
                List<String> found = new ArrayList<>();
                for (int a = 0; a < samples.analytes().size(); a++) {
                    SampleCalls.Call c = row.calls().get(a);
                    if (c.outcome().called()) {
                        found.add(samples.analytes().get(a) + " "
                                + NumberText.percent(c.confidence(), PERCENT_DECIMALS, NONE)
                                + (c.outcome() == SampleCalls.Outcome.AMBIGUOUS ? " ?" : ""));
                    }
                }
                sb.append(found.isEmpty() ? "no library analyte found" : String.join(", ", found));
            }
            out.println(sb);
        }
    }

    private static String heading(RunResult run) {
        StringBuilder sb = new StringBuilder("Run ").append(run.spec().name());
        if (run.spec().sample() != null && !run.spec().sample().isBlank()) {
            sb.append(" [").append(oneLine(run.spec().sample())).append(']');
        }
        sb.append(": ").append(oneLine(run.scaleNote()));
        if (!run.scaleNote().contains("EOF")) {
            String eof = NumberText.fixed(run.eofMobility(), MOBILITY_DECIMALS, null);
            sb.append("; EOF mobility ").append(eof == null ? "unknown" : eof);
        }
        return sb.toString();
    }

    private static String[] row(RunResult run, int number, PeakResult pr) {
        PeakMatch m = pr.match();
        boolean known = Double.isFinite(pr.mobility());
        String mobility;
        if (!known) {
            mobility = "n/a";
        } else {
            double compared = Double.isFinite(pr.mobilityCorrected()) ? pr.mobilityCorrected() : pr.mobility();
            double sdCompared = run.decidingSd(pr);
            String sd = NumberText.fixed(sdCompared, SD_DECIMALS, null);
            mobility = NumberText.fixed(compared, MOBILITY_DECIMALS, null) + " +/- " + (sd == null ? "?" : sd);
        }
        boolean assigned = known && m.assigned() != null;
        // an unassigned peak's confidence is that it is none of the library's analytes, shown as in the HTML report
        String percent = NumberText.percent(m.confidence(), PERCENT_DECIMALS, NONE);
        String confidence = assigned ? percent : known ? percent + " none" : NONE;
        String status = !known ? "no mobility"
                : m.status() == null ? MatchStatus.UNASSIGNED.label() : m.status().label();
        if (m.status() == MatchStatus.AMBIGUOUS && m.runnerUp() != null) {
            status += " (or " + m.runnerUp() + " " + NumberText.percent(m.runnerUpProbability(), PERCENT_DECIMALS, NONE)
                    + ")";
        }
        return new String[] {
            Integer.toString(number),
            NumberText.fixed(pr.peak().apexTimeS(), TIME_DECIMALS, null),
            mobility,
            assigned ? m.assigned() : NONE,
            confidence,
            status
        };
    }

    private static void printTable(List<String[]> rows, PrintWriter out) {
        int[] width = new int[HEADERS.length];
        for (int c = 0; c < HEADERS.length; c++) {
            width[c] = HEADERS[c].length();
        }
        for (String[] r : rows) {
            for (int c = 0; c < r.length; c++) {
                width[c] = Math.max(width[c], r[c] == null ? 0 : r[c].length());
            }
        }
        out.println(line(HEADERS, width));
        for (String[] r : rows) {
            out.println(line(r, width));
        }
    }

    private static String line(String[] cells, int[] width) {
        StringBuilder sb = new StringBuilder(TABLE_INDENT);
        for (int c = 0; c < cells.length; c++) {
            String cell = cells[c] == null ? "" : cells[c];
            boolean last = c == cells.length - 1;
            if (c > 0) {
                sb.append(COLUMN_GAP);
            }
            int pad = width[c] - cell.length();
            if (RIGHT_ALIGNED[c]) {
                sb.append(" ".repeat(pad)).append(cell);
            } else {
                sb.append(cell);
                if (!last) {
                    sb.append(" ".repeat(pad));
                }
            }
        }
        return sb.toString();
    }

    /**
     * Text on a single line: line breaks and tabs become spaces, and the unit and sign characters the
     * engine's notes use are written as the rest of this summary writes them (m^2, mu, +/-, -), so one
     * output does not say "m^2" in one line and "m²" in the next.
     */
    static String oneLine(String text) {
        if (text == null) {
            return "";
        }
        return text.replace("\r\n", " ").replace('\n', ' ').replace('\r', ' ').replace('\t', ' ')
                .replace("m²", "m^2").replace("μ", "mu").replace("±", "+/-").replace('\u2212', '-')
                .replace("–", "-");
    }
}
