package org.mobident.report.assess;

import java.util.List;
import java.util.Locale;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.AnalyteScore;
import org.mobident.assess.Assessment;
import org.mobident.assess.Calibration;
import org.mobident.assess.Detection;
import org.mobident.assess.HeightStratum;
import org.mobident.assess.Identification;
import org.mobident.assess.MobilityError;
import org.mobident.assess.Ratio;
import org.mobident.assess.ReliabilityBin;
import org.mobident.assess.RunCheck;
import org.mobident.assess.StratumScore;
import org.mobident.report.html.HtmlSection;
import org.mobident.report.plot.Markup;
import org.mobident.text.NumberText;

/**
 * The scores as HTML: a {@link #section} that the peak-identification report includes
 * ({@link org.mobident.report.html.HtmlReport} takes it as an {@link HtmlSection}), and a
 * self-contained {@link #page} around the same section. The markup is XHTML-compatible, all user
 * text is escaped, the reliability diagram is inline SVG; there is no script and nothing is fetched.
 */
public final class AssessmentHtml {

    /** The id of the section element (a link target). */
    public static final String SECTION_ID = "assessment";

    static final String MISSING = "–";

    /** Reliability diagram: outer size and plot margins, px. */
    static final int DIAGRAM_SIZE = 360;
    private static final int MARGIN_LEFT = 52;
    private static final int MARGIN_RIGHT = 14;
    private static final int MARGIN_TOP = 22;
    private static final int MARGIN_BOTTOM = 44;
    /** Grid and tick step on both axes of the diagram. */
    private static final double TICK_STEP = 0.2;
    private static final int TICKS = 5;
    private static final double DOT_RADIUS = 3.5;
    private static final String SVG_NS = "http://www.w3.org/2000/svg";

    private static final String CSS = String.join("\n",
            "body{font-family:'DejaVu Sans',Verdana,Arial,sans-serif;color:#262b30;background:#fbfbfa;"
                    + "margin:0;padding:1.5rem 2rem;line-height:1.4;font-size:14px}",
            "h1{font-size:1.6rem;margin:0 0 .3rem}",
            "h2{font-size:1.2rem;margin:2rem 0 .6rem;padding-bottom:.2rem;border-bottom:1px solid #d5d9de}",
            "h3{font-size:1rem;margin:1.2rem 0 .4rem}",
            ".meta{color:#56606a;margin:.2rem 0}",
            "table{border-collapse:collapse;margin:.5rem 0 1rem;font-size:.9rem}",
            "th,td{border:1px solid #d5d9de;padding:.25rem .5rem;text-align:left;vertical-align:top}",
            "th{background:#eef1f4;font-weight:600}",
            "td.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}",
            "figure{margin:.5rem 0 1rem}",
            "figure svg{max-width:100%;height:auto;border:1px solid #e3e6ea;background:#fff}",
            "figcaption{color:#56606a;font-size:.85rem;max-width:40rem}",
            "footer{margin-top:2.5rem;color:#56606a;font-size:.85rem}");

    private AssessmentHtml() {
    }

    /** The scores as a section for the identification report. */
    public static HtmlSection asSection(Assessment a, AcceptanceLimits limits) {
        String markup = section(a, limits);
        return () -> markup;
    }

    /**
     * A self-contained page with the scores.
     *
     * @param title       page title (null for the default)
     * @param toolVersion version of the tool, or null
     * @param generatedAt when the page was made, as it is to be shown, or null for "not recorded"
     */
    public static String page(Assessment a, AcceptanceLimits limits, String title, String toolVersion,
                              String generatedAt) {
        String t = title == null || title.isBlank() ? "Identification scores against known identities" : title;
        StringBuilder sb = new StringBuilder(64 * 1024);
        sb.append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n");
        sb.append("<meta charset=\"utf-8\"/>\n");
        sb.append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n");
        sb.append("<title>").append(esc(t)).append("</title>\n");
        sb.append("<style>\n").append(CSS).append("\n</style>\n</head>\n<body>\n");
        sb.append("<header>\n<h1>").append(esc(t)).append("</h1>\n<p class=\"meta\">Made with Mobident");
        if (toolVersion != null && !toolVersion.isBlank()) {
            sb.append(' ').append(esc(toolVersion));
        }
        sb.append(". Generated at: ").append(generatedAt == null ? "not recorded" : esc(generatedAt))
                .append(".</p>\n</header>\n<main>\n");
        sb.append(section(a, limits));
        sb.append("</main>\n<footer><p>The scores measure the identification against what the known-identities "
                + "table says is in the runs; they are only as good as that table.</p></footer>\n");
        sb.append("</body>\n</html>\n");
        return sb.toString();
    }

    /** The scores as one {@code <section>} element. */
    public static String section(Assessment a, AcceptanceLimits limits) {
        StringBuilder sb = new StringBuilder(32 * 1024);
        sb.append("<section id=\"").append(SECTION_ID).append("\">\n<h2>Scores against known identities</h2>\n");
        sb.append("<p class=\"meta\">Known identities: ").append(esc(a.knownSource())).append(". Reported peaks: ")
                .append(esc(a.tableSource())).append(". Runs scored (named in both): ").append(a.runs().size())
                .append("; in the peak table only (ignored): ").append(a.notScored().size())
                .append("; in the known table only (ignored): ").append(a.notInTable().size()).append(".</p>\n");
        if (!a.anythingScored()) {
            sb.append("<p>Nothing to score: no run is named in both tables.</p>\n</section>\n");
            return sb.toString();
        }
        identification(sb, a.identification());
        strata(sb, a.strata());
        analytes(sb, a.analytes());
        calibration(sb, a);
        mobility(sb, a.mobilityError());
        detection(sb, a);
        List<AcceptanceLimits.Check> checks = limits.check(a);
        if (!checks.isEmpty()) {
            sb.append("<h3>Acceptance limits</h3>\n<ul>\n");
            for (AcceptanceLimits.Check c : checks) {
                sb.append("<li>").append(esc(AssessmentText.limitLine(c))).append("</li>\n");
            }
            sb.append("</ul>\n");
        }
        if (!a.notes().isEmpty()) {
            sb.append("<h3>Notes</h3>\n<ul>\n");
            for (String n : a.notes()) {
                sb.append("<li>").append(esc(n)).append("</li>\n");
            }
            sb.append("</ul>\n");
        }
        sb.append("</section>\n");
        return sb.toString();
    }

    private static void identification(StringBuilder sb, Identification id) {
        sb.append("<h3>Identification</h3>\n<p>A call is a peak reported identified or ambiguous; it is right "
                + "when the peak belongs to the known zone of the analyte it names.</p>\n");
        sb.append("<table class=\"scores\">\n<thead><tr><th>Measure</th><th>Value</th><th>Count</th></tr></thead>\n"
                + "<tbody>\n");
        ratioRow(sb, "Precision of identified calls", id.precision(), "right");
        ratioRow(sb, "Precision of all calls (identified or ambiguous)", id.precisionWithAmbiguous(), "right");
        ratioRow(sb, "Recall of the analytes present", id.recall(), "identified by name");
        ratioRow(sb, "Recall counting ambiguous calls", id.recallWithAmbiguous(), "called by name");
        ratioRow(sb, "Recall at a height of at least " + NumberText.fixed(HeightStratum.CLEAR_HEIGHT_SD, 0, MISSING)
                + " noise SD", id.recallClear(), "identified by name");
        sb.append("</tbody>\n</table>\n");
        sb.append("<p>Wrong names: ").append(id.wrongNames()).append(". Called but absent: ")
                .append(id.calledAbsent()).append(". Missed (present without a right call): ").append(id.missed())
                .append(".</p>\n");
    }

    private static void ratioRow(StringBuilder sb, String what, Ratio r, String counted) {
        sb.append("<tr><td>").append(esc(what)).append("</td><td class=\"num\">")
                .append(esc(Figures.percent(r, MISSING))).append("</td><td>").append(esc(Figures.counted(r)))
                .append(' ').append(esc(counted)).append("</td></tr>\n");
    }

    private static void strata(StringBuilder sb, List<StratumScore> strata) {
        sb.append("<h3>By zone height over noise SD</h3>\n");
        sb.append("<table class=\"scores\">\n<thead><tr><th>Height / noise SD</th><th>Analytes present</th>"
                + "<th>Identified right</th><th>Recall</th><th>Recall with ambiguous</th><th>Known zones</th>"
                + "<th>Detected</th><th>Detection rate</th></tr></thead>\n<tbody>\n");
        for (StratumScore s : strata) {
            if (s.zones() == 0 && s.analyteRows() == 0) {
                continue;
            }
            sb.append("<tr><td>").append(esc(s.stratum().label())).append("</td>");
            num(sb, Integer.toString(s.analyteRows()));
            num(sb, Integer.toString(s.identifiedRight()));
            num(sb, Figures.percent(s.recall(), MISSING));
            num(sb, Figures.percent(s.recallWithAmbiguous(), MISSING));
            num(sb, Integer.toString(s.zones()));
            num(sb, Integer.toString(s.detected()));
            num(sb, Figures.percent(s.detectionRate(), MISSING));
            sb.append("</tr>\n");
        }
        sb.append("</tbody>\n</table>\n");
    }

    private static void analytes(StringBuilder sb, List<AnalyteScore> analytes) {
        sb.append("<h3>Per analyte</h3>\n");
        sb.append("<table class=\"scores\">\n<thead><tr><th>Analyte</th><th>Present</th><th>Identified right</th>"
                + "<th>Ambiguous right</th><th>Wrong calls</th><th>Missed</th><th>Precision</th><th>Recall</th>"
                + "<th>Mobility MAE (10⁻⁹ m² V⁻¹ s⁻¹)</th><th>Mobility bias (10⁻⁹ m² V⁻¹ s⁻¹)</th></tr></thead>\n"
                + "<tbody>\n");
        for (AnalyteScore s : analytes) {
            sb.append("<tr><td>").append(esc(s.name())).append("</td>");
            num(sb, Integer.toString(s.present()));
            num(sb, Integer.toString(s.identifiedRight()));
            num(sb, Integer.toString(s.ambiguousRight()));
            num(sb, Integer.toString(s.wrongCalls()));
            num(sb, Integer.toString(s.missed()));
            num(sb, Figures.percent(s.precision(), MISSING));
            num(sb, Figures.percent(s.recall(), MISSING));
            num(sb, NumberText.fixed(s.mobilityError().meanAbsoluteError(), Figures.MOBILITY_ERROR_DECIMALS, MISSING));
            num(sb, NumberText.signed(s.mobilityError().bias(), Figures.MOBILITY_ERROR_DECIMALS, MISSING));
            sb.append("</tr>\n");
        }
        sb.append("</tbody>\n</table>\n<p>Precision: right calls of the name out of all its calls (identified or "
                + "ambiguous). Recall: identified with the right name out of the runs the analyte is in.</p>\n");
    }

    private static void calibration(StringBuilder sb, Assessment a) {
        Calibration c = a.calls();
        sb.append("<h3>Calibration of the confidence</h3>\n");
        sb.append("<p>Calls: ").append(esc(overall(c, "call", "calls"))).append(".</p>\n");
        if (c.count() > 0) {
            sb.append("<figure>\n").append(diagram(c));
            sb.append("<figcaption>Reliability of the calls: for each confidence bin with calls, the bar is the "
                    + "fraction of calls that were right and the dot sits at the bin's mean confidence; on the "
                    + "dashed diagonal, stated confidence and observed accuracy agree.</figcaption>\n</figure>\n");
            sb.append("<table class=\"scores\">\n<thead><tr><th>Confidence bin</th><th>Calls</th>"
                    + "<th>Mean confidence</th><th>Observed accuracy</th></tr></thead>\n<tbody>\n");
            for (ReliabilityBin b : c.bins()) {
                sb.append("<tr><td>").append(esc(Figures.bin(b))).append("</td>");
                num(sb, Integer.toString(b.count()));
                num(sb, NumberText.fixed(b.meanConfidence(), Figures.CONFIDENCE_DECIMALS, MISSING));
                num(sb, NumberText.fixed(b.accuracy(), Figures.CONFIDENCE_DECIMALS, MISSING));
                sb.append("</tr>\n");
            }
            sb.append("</tbody>\n</table>\n");
        }
        sb.append("<p>Unassigned peaks (confidence: that the peak is none of the library analytes): ")
                .append(esc(overall(a.unassigned(), "peak", "peaks"))).append(".</p>\n");
        sb.append("<p>ECE is the expected calibration error over ").append(Calibration.BINS)
                .append(" equal confidence bins, Σ (n_b/N)·|accuracy_b − confidence_b| (Naeini et al. 2015; "
                        + "Guo et al. 2017); the Brier score is the mean of (confidence − outcome)² with outcome 1 "
                        + "for a right statement (Brier 1950).</p>\n");
    }

    private static String overall(Calibration c, String one, String many) {
        if (c.count() == 0) {
            return "none with a verdict";
        }
        return c.count() + " " + (c.count() == 1 ? one : many) + ", mean confidence "
                + NumberText.fixed(c.meanConfidence(), Figures.CONFIDENCE_DECIMALS, MISSING) + ", observed accuracy "
                + NumberText.fixed(c.accuracy(), Figures.CONFIDENCE_DECIMALS, MISSING) + ", ECE "
                + NumberText.fixed(c.ece(), Figures.CONFIDENCE_DECIMALS, MISSING) + ", Brier score "
                + NumberText.fixed(c.brier(), Figures.BRIER_DECIMALS, MISSING);
    }

    /** The reliability diagram of a calibration as inline SVG. */
    static String diagram(Calibration c) {
        int plot = DIAGRAM_SIZE - MARGIN_LEFT - MARGIN_RIGHT;
        int plotHeight = DIAGRAM_SIZE - MARGIN_TOP - MARGIN_BOTTOM;
        StringBuilder sb = new StringBuilder(4096);
        sb.append("<svg xmlns=\"").append(SVG_NS).append("\" width=\"").append(DIAGRAM_SIZE).append("\" height=\"")
                .append(DIAGRAM_SIZE).append("\" viewBox=\"0 0 ").append(DIAGRAM_SIZE).append(' ').append(DIAGRAM_SIZE)
                .append("\" role=\"img\" aria-label=\"Reliability diagram\" font-family=\"DejaVu Sans, Verdana, "
                        + "Arial, sans-serif\" font-size=\"11\">\n");
        sb.append("<rect x=\"0\" y=\"0\" width=\"").append(DIAGRAM_SIZE).append("\" height=\"").append(DIAGRAM_SIZE)
                .append("\" fill=\"#ffffff\"/>\n");
        for (int i = 0; i <= TICKS; i++) {
            double v = i * TICK_STEP;
            double x = MARGIN_LEFT + v * plot;
            double y = MARGIN_TOP + (1 - v) * plotHeight;
            String label = NumberText.fixed(v, 1, "");
            sb.append(line(x, MARGIN_TOP, x, MARGIN_TOP + plotHeight, "#e6e9ed", null));
            sb.append(line(MARGIN_LEFT, y, MARGIN_LEFT + plot, y, "#e6e9ed", null));
            sb.append(text(x, MARGIN_TOP + plotHeight + 14, "middle", label));
            sb.append(text(MARGIN_LEFT - 6, y + 4, "end", label));
        }
        for (ReliabilityBin b : c.bins()) {
            if (b.count() == 0) {
                continue;
            }
            double x0 = MARGIN_LEFT + b.lower() * plot + 1;
            double w = (b.upper() - b.lower()) * plot - 2;
            double h = b.accuracy() * plotHeight;
            sb.append("<rect x=\"").append(coordinate(x0)).append("\" y=\"")
                    .append(coordinate(MARGIN_TOP + plotHeight - h)).append("\" width=\"").append(coordinate(w))
                    .append("\" height=\"").append(coordinate(h))
                    .append("\" fill=\"#4f7cac\" fill-opacity=\"0.55\" stroke=\"#2f5a88\"><title>")
                    .append(esc(Figures.bin(b))).append(": ").append(b.count()).append(", observed ")
                    .append(NumberText.fixed(b.accuracy(), Figures.CONFIDENCE_DECIMALS, MISSING))
                    .append("</title></rect>\n");
            sb.append("<circle cx=\"").append(coordinate(MARGIN_LEFT + b.meanConfidence() * plot)).append("\" cy=\"")
                    .append(coordinate(MARGIN_TOP + (1 - b.accuracy()) * plotHeight)).append("\" r=\"")
                    .append(coordinate(DOT_RADIUS)).append("\" fill=\"#c0392b\"/>\n");
            sb.append(text(x0 + w / 2, MARGIN_TOP + plotHeight - h - 4, "middle", Integer.toString(b.count())));
        }
        sb.append(line(MARGIN_LEFT, MARGIN_TOP + plotHeight, MARGIN_LEFT + plot, MARGIN_TOP, "#56606a", "4 3"));
        sb.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" fill=\"none\" "
                + "stroke=\"#56606a\"/>\n", MARGIN_LEFT, MARGIN_TOP, plot, plotHeight));
        sb.append(text(MARGIN_LEFT + plot / 2.0, DIAGRAM_SIZE - 10, "middle", "stated confidence"));
        String middle = coordinate(MARGIN_TOP + plotHeight / 2.0);
        sb.append("<text x=\"14\" y=\"").append(middle).append("\" text-anchor=\"middle\" transform=\"rotate(-90 14 ")
                .append(middle).append(")\">observed accuracy</text>\n");
        sb.append("</svg>\n");
        return sb.toString();
    }

    private static String line(double x1, double y1, double x2, double y2, String colour, String dash) {
        return "<line x1=\"" + coordinate(x1) + "\" y1=\"" + coordinate(y1) + "\" x2=\"" + coordinate(x2)
                + "\" y2=\"" + coordinate(y2) + "\" stroke=\"" + colour + "\""
                + (dash == null ? "" : " stroke-dasharray=\"" + dash + "\"") + "/>\n";
    }

    private static String text(double x, double y, String anchor, String content) {
        return "<text x=\"" + coordinate(x) + "\" y=\"" + coordinate(y) + "\" text-anchor=\"" + anchor + "\">"
                + esc(content) + "</text>\n";
    }

    /** A diagram coordinate, px, with one decimal. */
    private static String coordinate(double px) {
        return NumberText.fixed(px, 1, "0");
    }

    private static void mobility(StringBuilder sb, MobilityError e) {
        sb.append("<h3>Mobility error</h3>\n<p>Reported mobility (scale-corrected when the peak table has it, "
                + "else converted to the library temperature) minus the known mobility, over analyte peaks on "
                + "known analyte zones with a known mobility: ");
        if (e.count() == 0) {
            sb.append("no such peak.</p>\n");
            return;
        }
        sb.append(e.count()).append(e.count() == 1 ? " peak" : " peaks").append(", mean absolute error ")
                .append(NumberText.fixed(e.meanAbsoluteError(), Figures.MOBILITY_ERROR_DECIMALS, MISSING))
                .append(", bias ").append(NumberText.signed(e.bias(), Figures.MOBILITY_ERROR_DECIMALS, MISSING))
                .append(" × 10⁻⁹ m² V⁻¹ s⁻¹.</p>\n");
    }

    private static void detection(StringBuilder sb, Assessment a) {
        Detection d = a.detection();
        sb.append("<h3>Detection</h3>\n<table class=\"scores\">\n<thead><tr><th>Measure</th><th>Value</th>"
                + "<th>Count</th></tr></thead>\n<tbody>\n");
        ratioRow(sb, "Analyte peaks on a known zone (detection precision)", d.precision(), "");
        ratioRow(sb, "Known zones with a peak (detection rate)", d.rate(), "");
        countRow(sb, "Spikes reported as peaks (should be 0)", d.spikesReported());
        countRow(sb, "Runs that failed", d.runsFailed());
        countRow(sb, "Runs without a mobility scale", d.runsWithoutScale());
        countRow(sb, "Runs with the neutral marker off the known marker", d.runsMarkerOff());
        sb.append("</tbody>\n</table>\n");
        StringBuilder items = new StringBuilder();
        for (RunCheck r : a.runs()) {
            if (r.failed()) {
                items.append("<li>").append(esc(r.run())).append(": not processed</li>\n");
            } else if (!r.mobilityKnown()) {
                items.append("<li>").append(esc(r.run())).append(": no mobility scale</li>\n");
            }
            if (r.markerNote() != null) {
                items.append("<li>").append(esc(r.run())).append(": ").append(esc(r.markerNote())).append("</li>\n");
            }
        }
        if (items.length() > 0) {
            sb.append("<ul>\n").append(items).append("</ul>\n");
        }
    }

    private static void countRow(StringBuilder sb, String what, int count) {
        sb.append("<tr><td>").append(esc(what)).append("</td><td class=\"num\">").append(count)
                .append("</td><td></td></tr>\n");
    }

    private static void num(StringBuilder sb, String value) {
        sb.append("<td class=\"num\">").append(esc(value)).append("</td>");
    }

    private static String esc(String s) {
        return Markup.escape(s);
    }
}
