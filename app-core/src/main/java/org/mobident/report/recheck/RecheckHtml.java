package org.mobident.report.recheck;

import java.io.IOException;
import java.io.Writer;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.mobident.recheck.AnalyteRecheck;
import org.mobident.recheck.AssignmentCheck;
import org.mobident.recheck.PairCheck;
import org.mobident.recheck.PredictionError;
import org.mobident.recheck.RecheckResult;
import org.mobident.recheck.Verdict;
import org.mobident.report.plot.Markup;
import org.mobident.text.NumberText;

/**
 * A recheck after a buffer change as one self-contained HTML page: the change and the count per
 * verdict, the per-analyte table of the terminal summary, the pairs that merge or separate, every
 * earlier assignment with its verdict and reason (the per-peak detail of the CSV), the notes and the
 * caution. Mobilities in 1e-9 m²/(V s), two decimals; a value that is not known shows as "–".
 */
public final class RecheckHtml {

    private static final String MISSING = "–";
    private static final int DECIMALS = 2;

    private RecheckHtml() {
    }

    /** Writes the page. */
    public static void write(RecheckResult r, Writer out) throws IOException {
        StringBuilder sb = new StringBuilder(8192);
        sb.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n")
                .append("<title>Recheck of assignments after a buffer change</title>\n<style>\n")
                .append("body{font-family:sans-serif;margin:1.5em;color:#222}table{border-collapse:collapse;")
                .append("margin:.5em 0 1.5em}th,td{border:1px solid #bbb;padding:.2em .5em;text-align:left}")
                .append("td.num{text-align:right;font-variant-numeric:tabular-nums}th{background:#eef}")
                .append(".attention{color:#a40}.caution{border:1px solid #a40;padding:.5em;max-width:60em}\n")
                .append("</style></head><body>\n<h1>Recheck of assignments after a buffer change</h1>\n");
        sb.append("<p>Assignments made with ").append(esc(r.libraryA())).append(" (the old buffer's library), ");
        if (r.predicted()) {
            sb.append("checked against a library predicted for the new buffer");
            if (r.bufferB() != null) {
                sb.append(": ").append(esc(r.bufferB().describe()));
            }
        } else {
            sb.append("checked against the library measured in the new buffer: ").append(esc(r.libraryB()));
        }
        sb.append(".</p>\n");
        Set<String> runs = new LinkedHashSet<>();
        r.assignments().forEach(a -> runs.add(a.run()));
        sb.append("<p>").append(r.assignments().size()).append(" assignment(s) in ").append(runs.size())
                .append(" run(s):");
        for (Verdict v : Verdict.values()) {
            sb.append(' ').append(r.count(v)).append(' ').append(esc(v.text())).append(';');
        }
        sb.setLength(sb.length() - 1);
        sb.append(".</p>\n");
        sb.append(r.needsAttention()
                ? "<p class=\"attention\">Attention needed: some assignments or pairs change in the new buffer.</p>\n"
                : "<p>Nothing that was told apart before merges in the new buffer.</p>\n");
        analytes(r, sb);
        pairs("Pairs that merge (told apart before, not in the new buffer)", r.newlyUnresolvable(), sb);
        pairs("Pairs that separate (not told apart before, told apart now)", r.newlyResolvable(), sb);
        assignments(r, sb);
        if (!r.notes().isEmpty()) {
            sb.append("<h2>Notes</h2>\n<ul>\n");
            for (String n : r.notes()) {
                sb.append("<li>").append(esc(n)).append("</li>\n");
            }
            sb.append("</ul>\n");
        }
        sb.append("<p class=\"caution\">").append(esc(r.caution())).append("</p>\n</body></html>\n");
        out.write(sb.toString());
        out.flush();
    }

    private static void analytes(RecheckResult r, StringBuilder sb) {
        Map<String, PredictionError> errors = new HashMap<>();
        for (PredictionError e : r.predictionErrors()) {
            errors.put(e.analyte(), e);
        }
        sb.append("<h2>Per analyte</h2>\n<table><thead><tr><th>Analyte</th><th>Verdict</th>")
                .append("<th>Shift ± SD</th><th>Peaks affected / assigned</th><th>New window</th>")
                .append(errors.isEmpty() ? "" : "<th>Model off (measured − predicted)</th>")
                .append("</tr></thead><tbody>\n");
        for (AnalyteRecheck a : r.analytes()) {
            sb.append("<tr><td>").append(esc(a.name())).append("</td><td>")
                    .append(esc(RecheckSummaryText.verdictText(a))).append("</td><td class=\"num\">")
                    .append(plusMinus(a.shift(), a.shiftSd(), true)).append("</td><td class=\"num\">")
                    .append(a.peaks() == 0 ? MISSING : a.affected() + " / " + a.peaks())
                    .append("</td><td class=\"num\">").append(plusMinus(a.mobilityB(), a.windowHalfWidth(), false))
                    .append("</td>");
            if (!errors.isEmpty()) {
                PredictionError e = errors.get(a.name());
                sb.append("<td class=\"num\">").append(e == null ? MISSING
                        : NumberText.signed(e.error(), DECIMALS, MISSING) + " ("
                        + NumberText.signed(e.errorInSd(), 1, MISSING) + " SD)").append("</td>");
            }
            sb.append("</tr>\n");
        }
        sb.append("</tbody></table>\n");
    }

    private static void pairs(String title, List<PairCheck> pairs, StringBuilder sb) {
        if (pairs.isEmpty()) {
            return;
        }
        sb.append("<h2>").append(esc(title)).append("</h2>\n<table><thead><tr><th>Pair</th><th>|Δμ| before</th>")
                .append("<th>|Δμ| now ± u</th><th>Needed now</th></tr></thead><tbody>\n");
        for (PairCheck p : pairs) {
            sb.append("<tr><td>").append(esc(p.first())).append(" / ").append(esc(p.second()))
                    .append("</td><td class=\"num\">").append(num(Math.abs(p.deltaA())))
                    .append("</td><td class=\"num\">").append(plusMinus(Math.abs(p.deltaB()), p.uncertaintyB(), false))
                    .append("</td><td class=\"num\">").append(num(p.thresholdB())).append("</td></tr>\n");
        }
        sb.append("</tbody></table>\n");
    }

    private static void assignments(RecheckResult r, StringBuilder sb) {
        sb.append("<h2>Every earlier assignment</h2>\n<table><thead><tr><th>Run</th><th>Peak</th><th>Analyte</th>")
                .append("<th>Status before</th><th>Confidence before</th><th>Mobility before</th>")
                .append("<th>Shift ± u</th><th>Mobility now</th><th>Confidence now</th><th>Verdict</th>")
                .append("<th>Collides with</th><th>Why</th></tr></thead><tbody>\n");
        for (AssignmentCheck a : r.assignments()) {
            sb.append("<tr><td>").append(esc(a.run())).append("</td><td class=\"num\">").append(a.peak())
                    .append("</td><td>").append(esc(a.analyte())).append("</td><td>").append(esc(a.oldStatus()))
                    .append("</td><td class=\"num\">").append(NumberText.percent(a.oldConfidence(), 0, MISSING))
                    .append("</td><td class=\"num\">").append(num(a.oldMobility()))
                    .append("</td><td class=\"num\">").append(plusMinus(a.shift(), a.shiftUncertainty(), true))
                    .append("</td><td class=\"num\">").append(num(a.newMobility()))
                    .append("</td><td class=\"num\">").append(NumberText.percent(a.newConfidence(), 0, MISSING))
                    .append("</td><td>").append(esc(a.verdict().text())).append("</td><td>")
                    .append(esc(String.join(", ", a.collidesWith()))).append("</td><td>").append(esc(a.reason()))
                    .append("</td></tr>\n");
        }
        sb.append("</tbody></table>\n");
    }

    private static String plusMinus(double value, double sd, boolean signed) {
        if (!Double.isFinite(value)) {
            return MISSING;
        }
        String v = signed ? NumberText.signed(value, DECIMALS, MISSING) : num(value);
        return Double.isFinite(sd) ? v + " ± " + num(sd) : v;
    }

    private static String num(double v) {
        return NumberText.fixed(v, DECIMALS, MISSING);
    }

    private static String esc(String s) {
        return s == null ? "" : Markup.escape(s);
    }
}
