package org.mobident.report;

import java.io.PrintWriter;
import java.util.List;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.text.NumberText;

/** The terminal block that names the recurring unknowns of a batch, in plain ASCII. */
public final class RecurringUnknownsText {

    /** Runs named on a group's line before the rest are only counted. */
    static final int RUNS_LISTED = 8;

    private static final int MOBILITY_DECIMALS = 2;

    private RecurringUnknownsText() {
    }

    /** Writes the block; nothing when there are no groups. */
    public static void write(List<RecurringUnknowns.Group> groups, PrintWriter out) {
        if (groups.isEmpty()) {
            return;
        }
        out.println("Recurring unknowns: unassigned peaks at one mobility (as compared with the library) in "
                + RecurringUnknowns.DEFAULT_MIN_RUNS + " or more runs of a buffer. +/- is the SD over the runs.");
        for (RecurringUnknowns.Group g : groups) {
            StringBuilder sb = new StringBuilder("  ").append(g.name()).append(" at ")
                    .append(NumberText.fixed(g.meanMobility(), MOBILITY_DECIMALS, null));
            String sd = NumberText.fixed(g.mobilitySd(), MOBILITY_DECIMALS, null);
            if (sd != null) {
                sb.append(" +/- ").append(sd);
            }
            sb.append(" in ").append(g.runs().size()).append(" of ").append(g.runsInBuffer()).append(" runs");
            if (g.buffer() != null) {
                sb.append(" (").append(g.buffer()).append(')');
            }
            sb.append(": ");
            int shown = Math.min(RUNS_LISTED, g.runs().size());
            sb.append(String.join(", ", g.runs().subList(0, shown)));
            if (g.runs().size() > shown) {
                sb.append(" and ").append(g.runs().size() - shown).append(" more");
            }
            out.println(sb);
        }
        out.println("  A recurring unknown may be a contaminant, a degradant or an analyte missing from the library.");
    }
}
