package org.mobident.report.plot;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.trace.RunConditions;

/**
 * Splits runs to be overlaid into groups that belong on one axis: the same buffer label (in any
 * case, as library entries match it) and the
 * same sign of their analytes' mobilities (anions and cations). Runs of different buffers do not
 * share a library window or an EOF, and anion and cation runs share no mobility range, so an
 * overlay draws one panel per group.
 */
public final class BufferGroups {

    /** Which ions a run separates, by the sign of most of its analytes' mobilities. */
    public enum Charge {
        ANIONS("anions"), CATIONS("cations"), UNKNOWN("");

        private final String word;

        Charge(String word) {
            this.word = word;
        }

        /** Plural noun for panel titles; empty when unknown. */
        public String word() {
            return word;
        }
    }

    /**
     * Runs that share an axis.
     *
     * @param buffer the runs' buffer label, or null when they give none
     * @param charge the ions they separate
     * @param runs   the runs, in the order given
     */
    public record Group(String buffer, Charge charge, List<RunResult> runs) {
        public Group {
            runs = List.copyOf(runs);
        }

        /** A panel title: buffer, ions and number of runs, e.g. "Buffer CHR-8, anions: 6 runs". */
        public String title() {
            StringBuilder sb = new StringBuilder(buffer == null ? "No buffer given" : "Buffer " + buffer);
            if (charge != Charge.UNKNOWN) {
                sb.append(", ").append(charge.word());
            }
            sb.append(": ").append(runs.size()).append(runs.size() == 1 ? " run" : " runs");
            return sb.toString();
        }
    }

    private BufferGroups() {
    }

    /** The groups of {@code runs}, in the order their first run appears. */
    public static List<Group> of(List<RunResult> runs) {
        Map<String, List<RunResult>> byKey = new LinkedHashMap<>();
        Map<String, Group> keys = new LinkedHashMap<>();
        for (RunResult r : runs) {
            String buffer = bufferOf(r);
            Charge charge = chargeOf(r);
            String key = (buffer == null ? "\u0000" : buffer.toLowerCase(Locale.ROOT)) + "\u0001" + charge;
            byKey.computeIfAbsent(key, k -> new ArrayList<>()).add(r);
            keys.putIfAbsent(key, new Group(buffer, charge, List.of()));
        }
        List<Group> out = new ArrayList<>();
        for (Map.Entry<String, List<RunResult>> e : byKey.entrySet()) {
            Group g = keys.get(e.getKey());
            out.add(new Group(g.buffer(), g.charge(), e.getValue()));
        }
        return out;
    }

    /** The run's buffer label, trimmed; null when it gives none. */
    static String bufferOf(RunResult r) {
        RunConditions c = r.spec() == null ? null : r.spec().conditions();
        if (c == null || c.buffer() == null || c.buffer().isBlank()) {
            return null;
        }
        return c.buffer().trim();
    }

    /** The sign most of the run's analyte mobilities have; unknown without mobilities or on a tie. */
    static Charge chargeOf(RunResult r) {
        if (r.failed() || r.peaks() == null) {
            return Charge.UNKNOWN;
        }
        int negative = 0;
        int positive = 0;
        for (PeakResult p : r.peaks()) {
            if (p.role() != PeakRole.ANALYTE || !Double.isFinite(p.mobility()) || p.mobility() == 0) {
                continue;
            }
            if (p.mobility() < 0) {
                negative++;
            } else {
                positive++;
            }
        }
        return negative > positive ? Charge.ANIONS : positive > negative ? Charge.CATIONS : Charge.UNKNOWN;
    }
}
