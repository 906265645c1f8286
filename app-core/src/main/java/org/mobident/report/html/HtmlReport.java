package org.mobident.report.html;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import org.mobident.io.SafeFiles;
import org.mobident.library.Library;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.BufferGroups;
import org.mobident.report.plot.Markup;
import org.mobident.report.plot.PeakStatus;
import org.mobident.report.plot.PlotModel;
import org.mobident.report.plot.SvgPlot;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;
import org.mobident.settings.MatchSettings;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;
import org.mobident.text.NumberText;
import org.mobident.trace.RunConditions;
import org.mobident.trace.Trace;

/**
 * Writes a batch of runs as one self-contained HTML5 page: a summary table, all runs overlaid
 * on the mobility axis, and for each run its plot, its peak table and its notes. The page has
 * inline CSS and inline SVG only: no script, no external file, nothing fetched. Its markup is
 * XHTML-compatible, so an XML parser reads it once the doctype is removed.
 *
 * <p>Apart from the one line marked "Generated at" (taken from the options, never from the
 * clock), equal inputs give byte-identical output.
 */
public final class HtmlReport {

    /** Name of the tool, as the page states it. */
    public static final String TOOL_NAME = "Mobident";

    /** Probabilities below this are shown as "&lt;1%" rather than rounded to 0 %. */
    private static final double LESS_THAN_ONE_PERCENT = 0.005;

    /** Shown where a number is unknown. */
    static final String MISSING = "–";
    /** Significant digits of the baseline noise, a value of any size. */
    private static final int NOISE_DIGITS = 3;

    /** Size of the overlay plot, px. */
    static final int OVERLAY_WIDTH = 960;
    static final int OVERLAY_HEIGHT = 420;
    /** Size of each run's plot, px. */
    static final int RUN_WIDTH = 960;
    static final int RUN_HEIGHT = 330;
    /** Size of the status shapes beside the table text, px. */
    static final int ICON_SIZE = 12;

    /** The caution printed near the top of every report. */
    static final String CAUTION = "Identification by mobility is presumptive: a match says which library "
            + "analyte a peak is most likely to be, not that it is that analyte. Where a result carries "
            + "legal, clinical or safety weight, confirm it by an orthogonal method and follow your "
            + "laboratory's validated procedures.";

    private static final String CSS = String.join("\n",
            "body{font-family:'DejaVu Sans',Verdana,Arial,sans-serif;color:#262b30;background:#fbfbfa;"
                    + "margin:0;padding:1.5rem 2rem;line-height:1.4;font-size:14px}",
            "h1{font-size:1.6rem;margin:0 0 .3rem}",
            "h2{font-size:1.2rem;margin:2rem 0 .6rem;padding-bottom:.2rem;border-bottom:1px solid #d5d9de}",
            ".meta{color:#56606a;margin:.2rem 0}",
            ".stamp{color:#56606a;margin:.2rem 0;font-size:.9rem}",
            ".caution{border-left:4px solid #c77d0a;background:#fdf6ea;padding:.6rem 1rem;margin:1rem 0;"
                    + "max-width:60rem}",
            "table{border-collapse:collapse;margin:.5rem 0 1rem;font-size:.9rem}",
            "th,td{border:1px solid #d5d9de;padding:.25rem .5rem;text-align:left;vertical-align:top}",
            "th{background:#eef1f4;font-weight:600}",
            "td.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}",
            "tr.failed td{background:#fbecee}",
            "figure{margin:.5rem 0 1rem}",
            "figure svg{max-width:100%;height:auto;border:1px solid #e3e6ea;background:#fff}",
            "figcaption{color:#56606a;font-size:.85rem;max-width:60rem}",
            ".status svg{vertical-align:-1px;margin-right:.3rem}",
            ".error{color:#8e2437;font-weight:600}",
            "dl.facts{display:grid;grid-template-columns:max-content auto;gap:.1rem 1rem;margin:.4rem 0}",
            "dl.facts dt{color:#56606a}",
            "dl.facts dd{margin:0}",
            "ul.notes li{color:#5b4a1d}",
            "footer{margin-top:2.5rem;color:#56606a;font-size:.85rem}");

    /**
     * What the page says about itself.
     *
     * @param title       page title and heading
     * @param toolVersion version of the tool, or null
     * @param generatedAt when the report was made, as the caller wants it shown (the only place
     *                    a time appears), or null for "not recorded"
     */
    public record Options(String title, String toolVersion, String generatedAt) {
        public Options {
            title = title == null || title.isBlank() ? "Peak identification report" : title;
        }

        /** Default title, no version, no time. */
        public static Options defaults() {
            return new Options(null, null, null);
        }

        public Options withGeneratedAt(String when) {
            return new Options(title, toolVersion, when);
        }
    }

    private HtmlReport() {
    }

    /**
     * Writes the report with default options (no time recorded).
     *
     * @param results     the runs, in the order they are to be shown
     * @param tracesByRun traces by run name; runs whose trace is missing are shown without a plot
     *                    (may be null)
     * @param library     the library matched against, for its bands and name (may be null)
     * @param out         receives the page; the caller chooses its encoding (UTF-8 is declared)
     *                    and closes it
     */
    public static void write(List<RunResult> results, Map<String, Trace> tracesByRun, Library library,
                             Writer out) throws IOException {
        write(results, tracesByRun, library, Options.defaults(), out);
    }

    /** Writes the report; see {@link #write(List, Map, Library, Writer)}. */
    public static void write(List<RunResult> results, Map<String, Trace> tracesByRun, Library library,
                             Options options, Writer out) throws IOException {
        write(results, tracesByRun, library, options, List.of(), out);
    }

    /**
     * Writes the report with extra sections (such as scores against known identities), placed after
     * the batch summary; see {@link #write(List, Map, Library, Writer)}.
     */
    public static void write(List<RunResult> results, Map<String, Trace> tracesByRun, Library library,
                             Options options, List<HtmlSection> sections, Writer out) throws IOException {
        out.write(render(results, tracesByRun, library, options, sections));
        out.flush();
    }

    /** Writes the report to a UTF-8 file, atomically (see {@link SafeFiles}). */
    public static void writeFile(List<RunResult> results, Map<String, Trace> tracesByRun, Library library,
                                 Options options, Path target, boolean overwrite) throws IOException {
        String page = render(results, tracesByRun, library, options);
        SafeFiles.write(target, overwrite, w -> w.write(page));
    }

    /** The whole page as a string. */
    public static String render(List<RunResult> results, Map<String, Trace> tracesByRun, Library library,
                                Options options) {
        return render(results, tracesByRun, library, options, List.of());
    }

    /** The whole page as a string, with extra sections after the batch summary. */
    public static String render(List<RunResult> results, Map<String, Trace> tracesByRun, Library library,
                                Options options, List<HtmlSection> sections) {
        Objects.requireNonNull(results, "results");
        Objects.requireNonNull(sections, "sections");
        Objects.requireNonNull(options, "options");
        Map<String, Trace> traces = tracesByRun == null ? Map.of() : tracesByRun;
        StringBuilder sb = new StringBuilder(256 * 1024);
        sb.append("<!DOCTYPE html>\n");
        sb.append("<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n");
        sb.append("<meta charset=\"utf-8\"/>\n");
        sb.append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n");
        sb.append("<meta name=\"generator\" content=\"").append(TOOL_NAME).append("\"/>\n");
        sb.append("<title>").append(esc(options.title())).append("</title>\n");
        sb.append("<style>\n").append(CSS).append("\n</style>\n</head>\n<body>\n");

        header(sb, results, library, options);
        sb.append("<main>\n");
        if (library != null && !results.isEmpty()) {
            samples(sb, SampleCalls.of(results, library));
        }
        summary(sb, results);
        if (library != null) {
            unknowns(sb, RecurringUnknowns.of(results, library));
        }
        for (HtmlSection section : sections) {
            sb.append(section.markup());
        }
        overlay(sb, results, traces, library);
        for (int i = 0; i < results.size(); i++) {
            run(sb, i + 1, results.get(i), traces, library);
        }
        sb.append("</main>\n");
        sb.append("<footer><p>").append(esc(CAUTION)).append("</p></footer>\n");
        sb.append("</body>\n</html>\n");
        return sb.toString();
    }

    private static void header(StringBuilder sb, List<RunResult> results, Library library, Options options) {
        sb.append("<header>\n<h1>").append(esc(options.title())).append("</h1>\n");
        sb.append("<p class=\"meta\">Made with ").append(TOOL_NAME);
        if (options.toolVersion() != null && !options.toolVersion().isBlank()) {
            sb.append(' ').append(esc(options.toolVersion()));
        }
        sb.append(", which identifies capillary electrophoresis peaks by their effective mobility. ");
        sb.append(results.size()).append(results.size() == 1 ? " run" : " runs").append(". ");
        if (library != null) {
            sb.append("Library: ").append(esc(library.sourceFile())).append(" (").append(library.size())
                    .append(library.size() == 1 ? " analyte" : " analytes").append(").");
        } else {
            sb.append("No library was given.");
        }
        sb.append("</p>\n");
        sb.append("<p class=\"stamp\" id=\"generated-at\"><strong>Generated at:</strong> ")
                .append(options.generatedAt() == null ? "not recorded" : esc(options.generatedAt()))
                .append("</p>\n");
        sb.append("<div class=\"caution\" role=\"note\"><p><strong>Caution.</strong> ").append(esc(CAUTION))
                .append("</p></div>\n</header>\n");
    }

    private static void summary(StringBuilder sb, List<RunResult> results) {
        sb.append("<section id=\"summary\">\n<h2>Batch summary</h2>\n");
        if (results.isEmpty()) {
            sb.append("<p>No runs.</p>\n</section>\n");
            return;
        }
        sb.append("<table class=\"summary\">\n<thead><tr><th>Run</th><th>Sample</th><th>Trace file</th><th>Buffer</th>"
                + "<th>How mobilities were set</th><th>EOF mobility (10⁻⁹ m² V⁻¹ s⁻¹)</th>"
                + "<th>Analyte peaks</th><th>Identified</th><th>Ambiguous</th><th>Unassigned</th>"
                + "<th>Outcome</th></tr></thead>\n<tbody>\n");
        for (int i = 0; i < results.size(); i++) {
            RunResult r = results.get(i);
            int[] counts = counts(r);
            sb.append(r.failed() ? "<tr class=\"failed\">" : "<tr>");
            sb.append("<td><a href=\"#run-").append(i + 1).append("\">").append(esc(runName(r))).append("</a></td>");
            sb.append("<td>").append(esc(sampleText(r))).append("</td>");
            sb.append("<td>").append(esc(sampleFile(r))).append("</td>");
            sb.append("<td>").append(esc(buffer(r))).append("</td>");
            sb.append("<td>").append(esc(r.scaleNote())).append("</td>");
            sb.append("<td class=\"num\">").append(NumberText.fixed(r.eofMobility(), 2, MISSING)).append("</td>");
            for (int c : counts) {
                sb.append("<td class=\"num\">").append(r.failed() ? MISSING : Integer.toString(c)).append("</td>");
            }
            sb.append("<td>").append(r.failed() ? "failed: " + esc(r.error().getMessage()) : "processed")
                    .append("</td></tr>\n");
        }
        sb.append("</tbody>\n</table>\n</section>\n");
    }

    /**
     * Which library analytes were called in which run: the first section, what a lab reports. A
     * cell holds the call's confidence; an ambiguous call is marked, an analyte looked for and not
     * called shows a dot, one not in the library for the run's buffer stays empty.
     */
    private static void samples(StringBuilder sb, SampleCalls table) {
        List<Integer> shown = new ArrayList<>();
        for (int a = 0; a < table.analytes().size(); a++) {
            for (SampleCalls.RunRow row : table.runs()) {
                SampleCalls.Outcome o = row.calls().get(a).outcome();
                if (o != SampleCalls.Outcome.NOT_LOOKED_FOR && o != SampleCalls.Outcome.RUN_FAILED) {
                    shown.add(a);
                    break;
                }
            }
        }
        sb.append("<section id=\"samples\">\n<h2>Analytes found in each sample</h2>\n");
        sb.append("<p>Each cell gives the confidence of the call; <strong>?</strong> marks an ambiguous call "
                + "(another analyte is nearly as likely), a dot an analyte looked for and not found; an empty "
                + "cell means the library has no entry for it in that run's buffer.</p>\n");
        sb.append("<table class=\"summary\">\n<thead><tr><th>Run</th><th>Sample</th>");
        for (int a : shown) {
            sb.append("<th>").append(esc(table.analytes().get(a))).append("</th>");
        }
        sb.append("</tr></thead>\n<tbody>\n");
        for (SampleCalls.RunRow row : table.runs()) {
            RunResult r = row.run();
            sb.append(r.failed() ? "<tr class=\"failed\">" : "<tr>");
            sb.append("<td><a href=\"#run-").append(row.order()).append("\">").append(esc(runName(r)))
                    .append("</a></td><td>").append(esc(sampleText(r))).append("</td>");
            for (int a : shown) {
                SampleCalls.Call c = row.calls().get(a);
                sb.append("<td class=\"num\">");
                switch (c.outcome()) {
                    case IDENTIFIED -> sb.append(percent(c.confidence()));
                    case AMBIGUOUS -> sb.append(percent(c.confidence())).append(" ?");
                    case NOT_FOUND -> sb.append("·");
                    case NO_SCALE -> sb.append("no scale");
                    case RUN_FAILED -> sb.append("failed");
                    default -> { }
                }
                sb.append("</td>");
            }
            sb.append("</tr>\n");
        }
        sb.append("</tbody>\n</table>\n</section>\n");
    }

    /** Unassigned peaks recurring at one mobility, one line each with its runs. */
    private static void unknowns(StringBuilder sb, List<RecurringUnknowns.Group> groups) {
        if (groups.isEmpty()) {
            return;
        }
        sb.append("<section id=\"recurring-unknowns\">\n<h2>Recurring unknowns</h2>\n");
        sb.append("<p>Unassigned peaks at one mobility (as compared with the library) in ")
                .append(RecurringUnknowns.DEFAULT_MIN_RUNS).append(" or more runs of a buffer: a contaminant, a "
                        + "degradant or an analyte missing from the library.</p>\n");
        sb.append("<table class=\"summary\">\n<thead><tr><th>Unknown</th><th>Buffer</th>"
                + "<th>Mobility (10⁻⁹ m² V⁻¹ s⁻¹)</th><th>SD over runs</th><th>Runs</th><th>Seen in</th></tr></thead>\n"
                + "<tbody>\n");
        for (RecurringUnknowns.Group g : groups) {
            sb.append("<tr><td>").append(esc(g.name())).append("</td><td>")
                    .append(esc(g.buffer() == null ? MISSING : g.buffer())).append("</td><td class=\"num\">")
                    .append(NumberText.fixed(g.meanMobility(), 2, MISSING)).append("</td><td class=\"num\">")
                    .append(NumberText.fixed(g.mobilitySd(), 2, MISSING)).append("</td><td class=\"num\">")
                    .append(g.runs().size())
                    .append(" of ").append(g.runsInBuffer()).append("</td><td>")
                    .append(esc(String.join(", ", g.runs()))).append("</td></tr>\n");
        }
        sb.append("</tbody>\n</table>\n</section>\n");
    }

    /** Analyte peaks, identified, ambiguous, unassigned. */
    static int[] counts(RunResult r) {
        int[] c = new int[4];
        for (PeakResult p : r.peaks()) {
            PeakStatus s = PeakStatus.of(p);
            if (s == PeakStatus.MARKER) {
                continue;
            }
            c[0]++;
            c[s == PeakStatus.IDENTIFIED ? 1 : s == PeakStatus.AMBIGUOUS ? 2 : 3]++;
        }
        return c;
    }

    private static void overlay(StringBuilder sb, List<RunResult> results, Map<String, Trace> traces,
                                Library library) {
        sb.append("<section id=\"overlay\">\n<h2>All runs on the mobility axis</h2>\n");
        List<String> missing = new ArrayList<>();
        List<RunResult> placed = new ArrayList<>();
        for (RunResult r : results) {
            Trace t = traces.get(runName(r));
            if (r.failed()) {
                missing.add(runName(r) + " (failed)");
            } else if (t == null) {
                missing.add(runName(r) + " (trace not available)");
            } else if (r.scale() == null) {
                missing.add(runName(r) + " (no mobility scale)");
            } else {
                placed.add(r);
            }
        }
        if (placed.isEmpty()) {
            sb.append("<p>No run could be placed on the mobility axis.</p>\n");
        }
        // one panel per buffer (and sign of the ions): other buffers share no windows and no range
        List<BufferGroups.Group> groups = BufferGroups.of(placed);
        for (BufferGroups.Group g : groups) {
            PlotModel.Builder b = PlotModel.builder(Axis.MOBILITY).peakLabels(false).bandLabels(true);
            if (groups.size() > 1) {
                b.title(g.title());
            }
            if (library != null) {
                b.library(library.forBuffer(g.buffer()), ToleranceBand.matching(library, MatchSettings.DEFAULT));
            }
            for (RunResult r : g.runs()) {
                b.run(traces.get(runName(r)), r);
            }
            PlotModel model = b.build();
            for (String name : model.omittedRuns()) {
                missing.add(name + " (no usable mobility range)");
            }
            sb.append("<figure>\n").append(plot(model, OVERLAY_WIDTH, OVERLAY_HEIGHT));
            sb.append("<figcaption>");
            if (groups.size() > 1) {
                sb.append(esc(g.title())).append(". ");
            }
            sb.append("Each curve is one run, placed by its own mobility scale, so runs with "
                    + "different electro-osmotic flow line up. Markers show each peak's status");
            if (library != null) {
                sb.append("; shaded bands are the library analytes with their tolerance windows");
            }
            sb.append(".</figcaption>\n</figure>\n");
        }
        if (!missing.isEmpty()) {
            sb.append("<p>Not shown: ").append(esc(String.join(", ", missing))).append(".</p>\n");
        }
        sb.append("</section>\n");
    }

    /** The run's scale correction a, b in words: fitted values with SDs, not fitted, or switched off. */
    static String scaleText(RunResult r) {
        return org.mobident.report.ScaleCorrectionText.of(r);
    }

    private static void run(StringBuilder sb, int index, RunResult r, Map<String, Trace> traces, Library library) {
        sb.append("<section class=\"run\" id=\"run-").append(index).append("\">\n");
        sb.append("<h2>Run ").append(index).append(": ").append(esc(runName(r))).append("</h2>\n");
        sb.append("<dl class=\"facts\">");
        fact(sb, "Sample", esc(sampleText(r)));
        fact(sb, "Trace file", esc(sampleFile(r)));
        fact(sb, "Declared in", esc(origin(r)));
        fact(sb, "Buffer", esc(buffer(r)));
        fact(sb, "How mobilities were set", esc(r.scaleNote()));
        fact(sb, "EOF mobility", NumberText.fixed(r.eofMobility(), 2, MISSING) + " × 10⁻⁹ m² V⁻¹ s⁻¹");
        fact(sb, "Run scale correction", esc(scaleText(r)));
        fact(sb, "Baseline noise (SD)", NumberText.general(r.noiseSd(), NOISE_DIGITS, MISSING));
        sb.append("</dl>\n");
        if (r.failed()) {
            sb.append("<p class=\"error\">This run failed: ").append(esc(r.error().getMessage())).append("</p>\n");
        }
        Trace t = traces.get(runName(r));
        if (!r.failed()) {
            if (t == null) {
                sb.append("<p>The trace of this run is not available, so it is not plotted.</p>\n");
            } else {
                Axis axis = r.scale() != null ? Axis.MOBILITY : Axis.TIME;
                PlotModel model = PlotModel.of(t, r, library, axis);
                if (axis == Axis.TIME) {
                    sb.append("<p>No mobility scale could be set for this run, so it is plotted against "
                            + "migration time.</p>\n");
                }
                sb.append("<figure>\n").append(plot(model, RUN_WIDTH, RUN_HEIGHT));
                sb.append("<figcaption>").append(esc(runName(r)))
                        .append(": labels give the assigned analyte and confidence; “?” marks a peak no "
                                + "library analyte explains.</figcaption>\n</figure>\n");
            }
            peakTable(sb, r);
        }
        if (!r.notes().isEmpty()) {
            sb.append("<h3>Notes</h3>\n<ul class=\"notes\">\n");
            for (String note : r.notes()) {
                sb.append("<li>").append(esc(note)).append("</li>\n");
            }
            sb.append("</ul>\n");
        }
        sb.append("</section>\n");
    }

    /**
     * The plot as SVG, or a short paragraph saying why it cannot be drawn (a degenerate model
     * must not cost the reader the rest of the report).
     */
    private static String plot(PlotModel model, int width, int height) {
        try {
            return SvgPlot.render(model, width, height);
        } catch (IllegalArgumentException e) {
            return "<p class=\"error\">The plot could not be drawn: " + esc(e.getMessage()) + "</p>\n";
        }
    }

    private static void fact(StringBuilder sb, String term, String escapedValue) {
        sb.append("<dt>").append(term).append("</dt><dd>").append(escapedValue).append("</dd>");
    }

    private static void peakTable(StringBuilder sb, RunResult r) {
        if (r.peaks().isEmpty()) {
            sb.append("<p>No peaks were found.</p>\n");
            return;
        }
        sb.append("<table class=\"peaks\">\n<thead><tr><th>#</th><th>Apex time (s)</th>"
                + "<th>Mobility ± u (10⁻⁹ m² V⁻¹ s⁻¹, as compared with the library; u: the uncertainty that decided the match)</th><th>Assigned</th><th>Confidence</th>"
                + "<th>Status</th><th>Runner-up</th><th>S/N</th><th>Plates</th><th>Resolution</th>"
                + "</tr></thead>\n<tbody>\n");
        int n = 0;
        for (PeakResult pr : r.peaks()) {
            n++;
            Peak p = pr.peak();
            PeakMatch m = pr.match() == null ? PeakMatch.none() : pr.match();
            PeakStatus status = PeakStatus.of(pr);
            boolean marker = status == PeakStatus.MARKER;
            sb.append("<tr><td class=\"num\">").append(n).append("</td>");
            sb.append("<td class=\"num\">").append(NumberText.fixed(p.apexTimeS(), 2, MISSING)).append("</td>");
            // the value compared with the library: at its temperature, corrected for the run's scale
            double compared = Double.isFinite(pr.mobilityCorrected()) ? pr.mobilityCorrected() : pr.mobility();
            sb.append("<td class=\"num\">").append(NumberText.fixed(compared, 2, MISSING));
            if (Double.isFinite(pr.mobilitySd())) {
                sb.append(" ± ").append(NumberText.fixed(r.decidingSd(pr), 3, MISSING));
            }
            sb.append("</td>");
            sb.append("<td>").append(marker || m.assigned() == null ? MISSING : esc(m.assigned())).append("</td>");
            sb.append("<td class=\"num\">");
            if (marker || !Double.isFinite(pr.mobility())) {
                sb.append(MISSING);
            } else if (status == PeakStatus.UNASSIGNED) {
                sb.append(percent(m.confidence())).append(" none");
            } else {
                sb.append(percent(m.confidence()));
            }
            sb.append("</td>");
            sb.append("<td class=\"status\">").append(SvgPlot.statusIcon(status, ICON_SIZE))
                    .append(marker ? esc(pr.role().label()) : !Double.isFinite(pr.mobility()) ? "no mobility"
                            : status.label()).append("</td>");
            sb.append("<td>");
            if (!marker && m.runnerUp() != null) {
                sb.append(esc(m.runnerUp())).append(" (").append(percent(m.runnerUpProbability())).append(')');
            } else {
                sb.append(MISSING);
            }
            sb.append("</td>");
            sb.append("<td class=\"num\">").append(NumberText.fixed(p.signalToNoise(), 1, MISSING)).append("</td>");
            sb.append("<td class=\"num\">").append(NumberText.fixed(p.plates(), 0, MISSING)).append("</td>");
            sb.append("<td class=\"num\">").append(NumberText.fixed(p.resolution(), 2, MISSING))
                    .append("</td></tr>\n");
        }
        sb.append("</tbody>\n</table>\n");
    }

    private static String runName(RunResult r) {
        return r.spec() == null ? "(unnamed run)" : r.spec().name();
    }

    /** The run sheet's sample description, or a dash. */
    private static String sampleText(RunResult r) {
        return r.spec() == null || r.spec().sample() == null || r.spec().sample().isBlank() ? "–" : r.spec().sample();
    }

    private static String sampleFile(RunResult r) {
        if (r.spec() == null || r.spec().traceFile() == null || r.spec().traceFile().getFileName() == null) {
            return MISSING;
        }
        return r.spec().traceFile().getFileName().toString();
    }

    private static String origin(RunResult r) {
        if (r.spec() == null || r.spec().origin() == null) {
            return MISSING;
        }
        return r.spec().originLine() > 0 ? r.spec().origin() + ", line " + r.spec().originLine() : r.spec().origin();
    }

    private static String buffer(RunResult r) {
        RunConditions c = r.spec() == null ? null : r.spec().conditions();
        return c == null || c.buffer() == null || c.buffer().isBlank() ? MISSING : c.buffer();
    }

    /** Escapes user text for the page (the one escape function, shared with the SVG plots). */
    static String esc(String text) {
        return Markup.escape(text);
    }

    /** A confidence as a whole percentage ("97%"), with "&lt;1%" for a small one that is not zero. */
    static String percent(double p) {
        if (!Double.isFinite(p)) {
            return MISSING;
        }
        if (p > 0 && p < LESS_THAN_ONE_PERCENT) {
            return "&lt;1%"; // inserted into the page as markup
        }
        return NumberText.fixed(100 * p, 0, MISSING) + "%";
    }
}
