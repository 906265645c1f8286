package org.mobident.summary;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;

/**
 * The sample × analyte table of a batch: for every run and every analyte of the library (by name,
 * in library order), whether the analyte was called in that run, with the call's confidence, the
 * peak's time-corrected area and its mobility as compared with the library.
 *
 * @param analytes the analyte names, one column each, in library order (a name in several buffers once)
 * @param runs     one row per run, in batch order
 */
public record SampleCalls(List<String> analytes, List<RunRow> runs) {

    public SampleCalls {
        analytes = List.copyOf(analytes);
        runs = List.copyOf(runs);
    }

    /** What became of one analyte in one run. */
    public enum Outcome {
        /** Called, and the call is clear. */
        IDENTIFIED("identified"),
        /** Called as the most likely analyte of a peak, but another stays likely too. */
        AMBIGUOUS("ambiguous"),
        /** Looked for and not called. */
        NOT_FOUND("not found"),
        /** The library has no entry of this name for the run's buffer. */
        NOT_LOOKED_FOR("not in library for this buffer"),
        /** The run has no mobility scale, so nothing could be called. */
        NO_SCALE("no mobility scale"),
        /** The run could not be processed. */
        RUN_FAILED("run failed");

        private final String label;

        Outcome(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** True for the two outcomes that name the analyte in the run. */
        public boolean called() {
            return this == IDENTIFIED || this == AMBIGUOUS;
        }
    }

    /**
     * One cell of the table.
     *
     * @param outcome        what became of the analyte in the run
     * @param confidence     the call's probability (NaN when not called)
     * @param correctedArea  time-corrected area A/t of the called peak, signal·s/s (NaN when not called)
     * @param mobility       the called peak's mobility as compared with the library, 1e-9 m²/(V s) (NaN when not called)
     * @param peakNumber     the peak's 1-based number in the run's peak table (0 when not called)
     * @param uncorrectedMobility the same peak's mobility at the library temperature before the run's scale
     *                       correction, 1e-9 m²/(V s) (NaN when not called): what drifts over a day
     */
    public record Call(Outcome outcome, double confidence, double correctedArea, double mobility, int peakNumber,
                       double uncorrectedMobility) {
        static Call without(Outcome outcome) {
            return new Call(outcome, Double.NaN, Double.NaN, Double.NaN, 0, Double.NaN);
        }
    }

    /**
     * One run's row.
     *
     * @param run    the run's result
     * @param order  1-based position of the run in the batch
     * @param calls  one call per analyte, in the order of {@link SampleCalls#analytes}
     */
    public record RunRow(RunResult run, int order, List<Call> calls) {
        public RunRow {
            calls = List.copyOf(calls);
        }
    }

    /** The table of a batch identified against {@code library}. */
    public static SampleCalls of(List<RunResult> results, Library library) {
        List<String> names = analyteNames(library);
        List<RunRow> rows = new ArrayList<>();
        int order = 0;
        for (RunResult run : results) {
            order++;
            List<Call> calls = new ArrayList<>(names.size());
            Library forRun = run.failed() ? library : library.forBuffer(run.spec().conditions().buffer());
            for (String name : names) {
                calls.add(callOf(run, forRun, name));
            }
            rows.add(new RunRow(run, order, calls));
        }
        return new SampleCalls(names, rows);
    }

    /** Distinct analyte names of the library, in file order. */
    static List<String> analyteNames(Library library) {
        Set<String> names = new LinkedHashSet<>();
        for (LibraryEntry e : library.entries()) {
            names.add(e.name());
        }
        return List.copyOf(names);
    }

    private static Call callOf(RunResult run, Library forRun, String name) {
        if (run.failed()) {
            return Call.without(Outcome.RUN_FAILED);
        }
        if (forRun.find(name).isEmpty()) {
            return Call.without(Outcome.NOT_LOOKED_FOR);
        }
        if (!run.mobilityKnown()) {
            return Call.without(Outcome.NO_SCALE);
        }
        int number = 0;
        for (PeakResult pr : run.peaks()) {
            number++;
            if (pr.role() != PeakRole.ANALYTE || !Double.isFinite(pr.mobility())) {
                continue;
            }
            MatchStatus s = pr.match().status();
            if (name.equals(pr.match().assigned()) && (s == MatchStatus.IDENTIFIED || s == MatchStatus.AMBIGUOUS)) {
                return new Call(s == MatchStatus.IDENTIFIED ? Outcome.IDENTIFIED : Outcome.AMBIGUOUS,
                        pr.match().confidence(), pr.peak().correctedArea(), pr.mobilityCorrected(), number,
                        pr.mobilityAtLibraryTemp());
            }
        }
        return Call.without(Outcome.NOT_FOUND);
    }
}
