package org.mobident.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import org.mobident.result.Candidate;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;

/**
 * The machine-readable peak table as JSON (RFC 8259), deterministic for a given input:
 *
 * <pre>
 * {"runs": [
 *   {"run": "...", "sample": "..." | null, "file": "...", "status": "ok" | "failed", "error": null | "...",
 *    "scale": "...", "eof_mobility": number | null, "mobility_known": true | false,
 *    "noise_sd": number | null, "notes": ["..."],
 *    "peaks": [{"peak": 1, "role": "analyte", "apex_time_s": ..., ..., "candidates": [
 *        {"name": "nitrate", "probability": 0.930, "library_mobility": -69.600,
 *         "residual": 0.120, "z": 0.40}], "note": null}]}]}
 * </pre>
 *
 * <p>Each peak object carries the columns of {@link PeakTableColumn} that describe a peak (those
 * of the whole run, such as {@code run} and the scale correction, are the run's own fields), with
 * the same number formats as the CSV; numbers are JSON numbers and unknown
 * values are {@code null}. Unlike the CSV, {@code candidates} is an array of objects. A failed
 * run has an empty {@code peaks} array and its reason in {@code error}.
 */
public final class PeakTableJson {

    private static final String INDENT = "  ";
    private static final int Z_DECIMALS = 2;

    private PeakTableJson() {
    }

    /** Writes all runs as one JSON document to {@code out} (flushed, not closed). */
    public static void write(List<RunResult> runs, Writer out) throws IOException {
        StringBuilder sb = new StringBuilder();
        sb.append("{\n").append(INDENT).append("\"runs\": [");
        for (int r = 0; r < runs.size(); r++) {
            sb.append(r == 0 ? "\n" : ",\n");
            appendRun(sb, runs.get(r));
            out.write(sb.toString());
            sb.setLength(0);
        }
        sb.append(runs.isEmpty() ? "]\n" : "\n" + INDENT + "]\n").append("}\n");
        out.write(sb.toString());
        out.flush();
    }

    private static void appendRun(StringBuilder sb, RunResult run) {
        String in = INDENT + INDENT;
        String in2 = in + INDENT;
        sb.append(in).append("{\n");
        field(sb, in2, "run", Json.quote(run.spec().name()));
        field(sb, in2, "sample", Json.quote(run.spec().sample()));
        field(sb, in2, "file", Json.quote(run.spec().traceFile() == null ? null
                : run.spec().traceFile().toString()));
        field(sb, in2, "status", Json.quote(run.failed() ? PeakTableStatus.FAILED.word() : "ok"));
        field(sb, in2, "error", Json.quote(run.failed() ? run.error().getMessage() : null));
        field(sb, in2, "scale", Json.quote(run.scaleNote()));
        field(sb, in2, "eof_mobility", Json.number(PeakTableColumn.Format.MOBILITY.write(run.eofMobility())));
        field(sb, in2, "mobility_known", Boolean.toString(run.mobilityKnown()));
        field(sb, in2, "noise_sd", Json.number(PeakTableColumn.Format.MAGNITUDE.write(run.noiseSd())));
        List<PeakRows.Cell> scale = PeakRows.scaleCells(run);
        List<PeakTableColumn> runValues = PeakTableColumn.runValues();
        for (int k = 0; k < runValues.size(); k++) {
            field(sb, in2, runValues.get(k).header(), Json.number(scale.get(k).text()));
        }
        StringBuilder notes = new StringBuilder("[");
        for (int i = 0; i < run.notes().size(); i++) {
            notes.append(i == 0 ? "" : ", ").append(Json.quote(run.notes().get(i)));
        }
        field(sb, in2, "notes", notes.append(']').toString());
        sb.append(in2).append("\"peaks\": [");
        if (!run.failed()) {
            List<List<PeakRows.Cell>> rows = PeakRows.rowsOf(run);
            List<PeakResult> peaks = run.peaks();
            for (int i = 0; i < peaks.size(); i++) {
                sb.append(i == 0 ? "\n" : ",\n").append(in2).append(INDENT);
                appendPeak(sb, rows.get(i), peaks.get(i));
            }
            if (!peaks.isEmpty()) {
                sb.append('\n').append(in2);
            }
        }
        sb.append("]\n").append(in).append('}');
    }

    private static void appendPeak(StringBuilder sb, List<PeakRows.Cell> row, PeakResult pr) {
        sb.append('{');
        boolean first = true;
        for (PeakTableColumn column : PeakTableColumn.values()) {
            if (column.scope() == PeakTableColumn.Scope.RUN) {
                continue; // stated once for the run
            }
            int c = column.ordinal();
            String value;
            if (column == PeakTableColumn.CANDIDATES) {
                value = candidates(pr);
            } else {
                PeakRows.Cell cell = row.get(c);
                if (cell.empty()) {
                    value = "null";
                } else {
                    value = cell.numeric() ? cell.text() : Json.quote(cell.text());
                }
            }
            sb.append(first ? "" : ", ").append(Json.quote(column.header())).append(": ").append(value);
            first = false;
        }
        sb.append('}');
    }

    private static String candidates(PeakResult pr) {
        if (pr.role() != PeakRole.ANALYTE || !Double.isFinite(pr.mobility())) {
            return "[]";
        }
        StringBuilder sb = new StringBuilder("[");
        List<Candidate> list = pr.match().candidates();
        for (int i = 0; i < list.size(); i++) {
            Candidate c = list.get(i);
            sb.append(i == 0 ? "" : ", ")
                    .append("{\"name\": ").append(Json.quote(c.name()))
                    .append(", \"probability\": ")
                    .append(Json.number(PeakTableColumn.Format.PROBABILITY.write(c.probability())))
                    .append(", \"library_mobility\": ")
                    .append(Json.number(PeakTableColumn.Format.MOBILITY.write(c.libraryMobility())))
                    .append(", \"residual\": ")
                    .append(Json.number(PeakTableColumn.Format.MOBILITY.write(c.residual())))
                    .append(", \"z\": ")
                    .append(Json.number(Numbers.fixed(c.z(), Z_DECIMALS)))
                    .append('}');
        }
        return sb.append(']').toString();
    }

    /** One {@code "name": literal,} line of a run object (the last field, peaks, is written apart). */
    private static void field(StringBuilder sb, String indent, String name, String literal) {
        sb.append(indent).append(Json.quote(name)).append(": ").append(literal).append(",\n");
    }
}
