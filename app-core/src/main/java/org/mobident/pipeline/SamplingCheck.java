package org.mobident.pipeline;

import java.util.Locale;
import org.mobident.trace.Trace;

/**
 * Whether a run is sampled finely enough for its zones. Zones narrow with earlier migration (at a
 * given plate number the width at half height grows in proportion to the time), so the earliest
 * zone the library puts in the run is the narrowest. Where it would be under
 * {@value #MIN_SAMPLES_ACROSS_WIDTH} sampling intervals wide at half height, the run is told so: a
 * zone that narrow leaves no shoulders that tell it from an electrical spike (see the spike filter
 * of the detector), so it may be removed as one and missed. On the lab-day bench recorded at 2 Hz,
 * a quarter of the zones of at least 10 noise SD went missing this way, against a few per cent at
 * 4 Hz and faster.
 */
public final class SamplingCheck {

    /** How the note begins, so that other reports can pick it out of a run's notes. */
    public static final String NOTE_START = "sampled too slowly for its earliest zones";

    /** Below this many sampling intervals across its width at half height a zone can pass for a
     *  spike (a Gaussian zone two intervals wide keeps shoulders of about a quarter of its top). */
    static final double MIN_SAMPLES_ACROSS_WIDTH = 2.0;
    /** The rate advised puts this many samples across the narrowest zone's width at half height
     *  (common practice: 15–20 points across a whole peak, about 2.5 widths at half height). */
    static final double ADVISED_SAMPLES_ACROSS_WIDTH = 8.0;

    /**
     * The sampling of a trace.
     *
     * @param startS    first time, s
     * @param endS      last time, s
     * @param intervalS mean sampling interval, s
     */
    record Span(double startS, double endS, double intervalS) {
        static Span of(Trace trace) {
            int n = trace.size();
            return new Span(trace.startTimeS(), trace.endTimeS(),
                    n > 1 ? (trace.endTimeS() - trace.startTimeS()) / (n - 1) : Double.NaN);
        }

        static final Span UNKNOWN = new Span(Double.NaN, Double.NaN, Double.NaN);

        boolean covers(double timeS) {
            return timeS >= startS && timeS <= endS;
        }
    }

    private SamplingCheck() {
    }

    /** True for the note {@link #note} writes. */
    public static boolean isNote(String runNote) {
        return runNote != null && runNote.startsWith(NOTE_START);
    }

    /**
     * The run's note when the zone of {@code name}, expected at {@code timeS}, would be narrower than
     * {@value #MIN_SAMPLES_ACROSS_WIDTH} sampling intervals; "" otherwise or when unknown.
     *
     * @param widthPerTime width at half height over migration time of the run's narrower zones
     */
    static String note(Span span, double widthPerTime, String name, double timeS) {
        double widthS = widthPerTime * timeS;
        if (!(widthS > 0) || !(span.intervalS() > 0) || !span.covers(timeS)
                || widthS >= MIN_SAMPLES_ACROSS_WIDTH * span.intervalS()) {
            return "";
        }
        double advisedHz = ADVISED_SAMPLES_ACROSS_WIDTH / widthS;
        return String.format(Locale.ROOT, NOTE_START + ": a zone of %s, expected at "
                + "%.1f s, would be about %.2f s wide at half height, %.1f sampling intervals of %.3f s; a zone "
                + "under %.0f intervals wide cannot be told from an electrical spike and may be missed (about "
                + "%.0f Hz would put %.0f samples across it)", name, timeS, widthS, widthS / span.intervalS(),
                span.intervalS(), MIN_SAMPLES_ACROSS_WIDTH, Math.ceil(advisedHz), ADVISED_SAMPLES_ACROSS_WIDTH);
    }
}
