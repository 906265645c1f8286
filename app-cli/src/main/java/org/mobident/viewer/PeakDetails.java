package org.mobident.viewer;

import java.util.ArrayList;
import java.util.List;
import org.mobident.report.ScaleCorrectionText;
import org.mobident.report.plot.Markup;
import org.mobident.report.plot.PeakStatus;
import org.mobident.result.Candidate;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.text.NumberText;

/** The words and numbers shown for a selected peak: its measures and its candidate analytes. */
final class PeakDetails {

    /** Shown where a number is unknown. */
    static final String UNKNOWN = "–";

    /** Mobility unit as written next to values. */
    static final String MOBILITY_UNIT = "10⁻⁹ m²/(V s)";

    /** Most candidates listed; the rest are counted (they carry little probability). */
    static final int MAX_CANDIDATES_SHOWN = 4;

    /** Colour of the row labels when the look and feel names none. */
    private static final String DEFAULT_LABEL_COLOUR = "#5a636c";

    /** Mobilities closer than this are shown once (run and library temperature agree), mobility units. */
    private static final double SAME_MOBILITY = 1e-9;

    private PeakDetails() {
    }

    /** Label and value rows naming the peak and its assignment (shown above the candidates). */
    static List<String[]> summary(String runName, PeakResult pr) {
        return summary(runName, null, pr);
    }

    /**
     * As {@link #summary(String, PeakResult)}; with the peak's run given, the ± beside the mobility
     * compared with the library is the uncertainty that decided its match (as in the terminal and
     * HTML reports), and apex timing keeps its own row.
     */
    static List<String[]> summary(String runName, RunResult run, PeakResult pr) {
        double u = run == null ? pr.mobilitySd() : run.decidingSd(pr);
        List<String[]> rows = new ArrayList<>();
        Peak p = pr.peak();
        PeakStatus status = PeakStatus.of(pr);
        rows.add(row("Run", runName));
        if (pr.role() != PeakRole.ANALYTE) {
            rows.add(row("Role", pr.role().label()));
        } else {
            PeakMatch m = pr.match();
            if (m != null && m.assigned() != null && status != PeakStatus.UNASSIGNED) {
                rows.add(row("Assigned", m.assigned() + " (" + percent(m.confidence()) + "), " + status.label()));
            } else if (m != null) {
                rows.add(row("Assigned", "none; not in the library: " + percent(m.confidence())));
            } else {
                rows.add(row("Assigned", "none"));
            }
        }
        boolean corrected = Double.isFinite(pr.mobilityCorrected())
                && !(Math.abs(pr.mobilityCorrected() - pr.mobilityAtLibraryTemp()) < SAME_MOBILITY);
        rows.add(row("Mobility", (corrected ? NumberText.fixed(pr.mobility(), 2, UNKNOWN) : withSd(pr.mobility(), 2, u, 3))
                + " " + MOBILITY_UNIT));
        if (Double.isFinite(pr.mobilityAtLibraryTemp())
                && !(Math.abs(pr.mobilityAtLibraryTemp() - pr.mobility()) < SAME_MOBILITY)) {
            rows.add(row("At library temperature", NumberText.fixed(pr.mobilityAtLibraryTemp(), 2, UNKNOWN)));
        }
        if (corrected) {
            rows.add(row("Compared with library", withSd(pr.mobilityCorrected(), 2, u, 3) + " (scale corrected)"));
        }
        if (p != null) {
            rows.add(row("Apex time", withSd(p.apexTimeS(), 2, p.apexTimeSdS(), 3) + " s"));
        }
        return rows;
    }

    /** Label and value rows of the peak's shape and size (shown below the candidates). */
    static List<String[]> shape(PeakResult pr) {
        List<String[]> rows = new ArrayList<>();
        Peak p = pr.peak();
        if (p == null) {
            return rows;
        }
        rows.add(row("Start – end",
                NumberText.fixed(p.startTimeS(), 2, UNKNOWN) + " – " + NumberText.fixed(p.endTimeS(), 2, UNKNOWN) + " s"));
        rows.add(row("Height", NumberText.fixed(p.height(), 4, UNKNOWN) + (p.dip() ? " (dip)" : " (rise)")));
        rows.add(row("Area", NumberText.fixed(p.area(), 4, UNKNOWN)));
        rows.add(row("Area / time", NumberText.fixed(p.correctedArea(), 5, UNKNOWN)));
        rows.add(row("Width at half height", NumberText.fixed(p.widthHalfS(), 3, UNKNOWN) + " s"));
        rows.add(row("Plates", NumberText.fixed(p.plates(), 0, UNKNOWN)));
        rows.add(row("Resolution", NumberText.fixed(p.resolution(), 2, UNKNOWN)));
        rows.add(row("Signal / noise", NumberText.fixed(p.signalToNoise(), 1, UNKNOWN)));
        return rows;
    }

    /** A recurring unknown in a few words: its name, mean mobility and in how many of the runs it is seen. */
    static String recurrence(RecurringUnknowns.Group g) {
        return g.name() + ": μ ≈ " + NumberText.fixed(g.meanMobility(), 2, UNKNOWN) + " in " + g.runs().size()
                + " of " + g.runsInBuffer() + " runs";
    }

    /** Every label and value row: {@link #summary} then {@link #shape}. */
    static List<String[]> measures(String runName, PeakResult pr) {
        List<String[]> rows = new ArrayList<>(summary(runName, pr));
        rows.addAll(shape(pr));
        return rows;
    }

    /** One row per candidate analyte: name, library mobility, residual, z, probability. */
    static List<String[]> candidates(PeakMatch match) {
        List<String[]> rows = new ArrayList<>();
        if (match == null) {
            return rows;
        }
        for (Candidate c : match.candidates()) {
            rows.add(new String[] {c.name(), NumberText.fixed(c.libraryMobility(), 2, UNKNOWN),
                NumberText.signed(c.residual(), 2, UNKNOWN),
                NumberText.signed(c.z(), 2, UNKNOWN), percent(c.probability())});
        }
        return rows;
    }

    /** The whole description as simple HTML for a text pane: summary, candidates, shape. */
    static String html(String runName, PeakResult pr) {
        return html(runName, null, pr);
    }

    /**
     * The whole description as simple HTML for a text pane, in two columns so that it fits the
     * window's details panel without scrolling: run, assignment, mobilities and the candidates on
     * the left; the run's scale correction (when {@code run} is given) and the peak's shape and
     * size on the right.
     */
    static String html(String runName, RunResult run, PeakResult pr) {
        return html(runName, run, pr, null);
    }

    /**
     * As {@link #html(String, RunResult, PeakResult)}, saying for an unassigned peak which recurring
     * unknown of the loaded runs it belongs to ({@code recurring}, or null).
     */
    static String html(String runName, RunResult run, PeakResult pr, RecurringUnknowns.Group recurring) {
        List<String[]> summary = new ArrayList<>(summary(runName, run, pr));
        if (recurring != null) {
            summary.add(row("Recurs as", recurrence(recurring)));
        }
        List<String[]> runRows = new ArrayList<>();
        if (run != null) {
            // may break after the comma only
            runRows.add(row("Run scale correction", ScaleCorrectionText.brief(run).replace(" = ", "\u00a0=\u00a0")));
        }
        StringBuilder sb = new StringBuilder("<html><body><table cellspacing='0' cellpadding='0'><tr><td valign='top'>");
        rows(sb, summary);
        if (pr.role() == PeakRole.ANALYTE) {
            List<String[]> cand = candidates(pr.match());
            sb.append("<div style='margin-top:6px'><b>Candidates</b></div>");
            if (cand.isEmpty()) {
                sb.append("<div>No library analyte has this peak inside its window.</div>");
            } else {
                sb.append("<table cellspacing='0' cellpadding='1'><tr>");
                for (String h : new String[] {"Analyte", "Library μ", "Residual", "z", "Probability"}) {
                    sb.append("<th align='left' nowrap>").append(Markup.escape(h)).append("&nbsp;</th>");
                }
                sb.append("</tr>");
                for (String[] r : cand.subList(0, Math.min(cand.size(), MAX_CANDIDATES_SHOWN))) {
                    sb.append("<tr>");
                    for (int i = 0; i < r.length; i++) {
                        sb.append(i == 0 ? "<td>" : "<td align='right' nowrap>").append(Markup.escape(r[i]))
                                .append("&nbsp;</td>");
                    }
                    sb.append("</tr>");
                }
                sb.append("</table>");
                if (cand.size() > MAX_CANDIDATES_SHOWN) {
                    sb.append("<div><font color='" + labelColour() + "'>and ").append(cand.size() - MAX_CANDIDATES_SHOWN)
                            .append(" less likely</font></div>");
                }
            }
        }
        sb.append("</td><td width='14'></td><td valign='top'>");
        rows(sb, runRows, true, true);
        List<String[]> shape = shape(pr);
        if (!shape.isEmpty()) {
            sb.append("<div><b>Peak</b></div>");
            rows(sb, shape, true); // the shorter column: its rows may take two lines
        }
        sb.append("</td></tr></table></body></html>");
        return sb.toString();
    }

    private static void rows(StringBuilder sb, List<String[]> rows) {
        rows(sb, rows, false);
    }

    /**
     * A table of label and value rows. Values stay on one line (write U+00A0 between words that
     * must stay together in a value that may wrap); labels too, unless {@code wrapLabels}.
     */
    private static void rows(StringBuilder sb, List<String[]> rows, boolean wrapLabels) {
        rows(sb, rows, wrapLabels, false);
    }

    private static void rows(StringBuilder sb, List<String[]> rows, boolean wrapLabels, boolean wrapValues) {
        sb.append("<table cellspacing='0' cellpadding='1'>");
        for (String[] r : rows) {
            sb.append(wrapLabels ? "<tr><td>" : "<tr><td nowrap>").append("<font color='" + labelColour() + "'>")
                    .append(Markup.escape(r[0])).append("</font>&nbsp;</td>")
                    .append(wrapValues ? "<td>" : "<td nowrap>").append(Markup.escape(r[1])).append("</td></tr>");
        }
        sb.append("</table>");
    }

    /** The colour of row labels on a dark background. */
    private static final String DARK_LABEL_COLOUR = "#a3abb4";

    /** Brightness (0 to 1) below which a panel counts as dark. */
    private static final float DARK_BACKGROUND = 0.5f;

    /** The colour for secondary text, readable in the light and the dark theme, as "#rrggbb". */
    static String labelColour() {
        java.awt.Color bg = javax.swing.UIManager.getColor("Panel.background");
        if (bg == null) {
            return DEFAULT_LABEL_COLOUR;
        }
        float[] hsb = java.awt.Color.RGBtoHSB(bg.getRed(), bg.getGreen(), bg.getBlue(), null);
        return hsb[2] < DARK_BACKGROUND ? DARK_LABEL_COLOUR : DEFAULT_LABEL_COLOUR;
    }

    static String percent(double p) {
        if (!Double.isFinite(p)) {
            return UNKNOWN;
        }
        if (p > 0 && 100 * p < 1) {
            return "<1 %";
        }
        return NumberText.percent(p, 0, UNKNOWN);
    }

    private static String withSd(double v, int digits, double sd, int sdDigits) {
        if (!Double.isFinite(v)) {
            return UNKNOWN;
        }
        String value = NumberText.fixed(v, digits, UNKNOWN);
        return Double.isFinite(sd) ? value + " ± " + NumberText.fixed(sd, sdDigits, UNKNOWN) : value;
    }

    private static String[] row(String label, String value) {
        return new String[] {label, value};
    }
}
