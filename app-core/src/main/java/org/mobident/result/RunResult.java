package org.mobident.result;

import java.util.List;
import org.mobident.InputException;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceFiles;
import org.mobident.trace.io.TraceReadOptions;

/**
 * The outcome of one run: either its peaks, or the reason it could not be processed.
 *
 * @param spec        the run as declared
 * @param error       why the run failed as a whole (file unreadable, bad conditions), or null
 * @param scaleNote   how mobilities were obtained (e.g. "neutral marker at 212.4 s"), or a
 *                    statement that they could not be (no marker found), never null
 * @param eofMobility EOF mobility of the run, 1e-9 m²/(V s), NaN when unknown
 * @param scale       the run's time-to-mobility conversion, or null when none could be set
 * @param peaks       peaks in order of apex time (empty when the run failed)
 * @param notes       warnings and remarks an analyst should read (temperature conversion, …)
 * @param noiseSd     baseline noise standard deviation of the trace (NaN when failed)
 * @param runScale    the run-wide correction a, b applied before matching ({@link RunScale#OFF} when none)
 * @param temperatureFactor factor that converts the run's mobilities to the library temperature
 *                    (viscosity ratio; 1 when the temperatures agree or the run's is unknown)
 */
public record RunResult(RunSpec spec, InputException error, String scaleNote, double eofMobility,
                        MobilityScale scale, List<PeakResult> peaks, List<String> notes, double noiseSd,
                        RunScale runScale, double temperatureFactor) {
    public RunResult {
        peaks = List.copyOf(peaks);
        notes = List.copyOf(notes);
        if (runScale == null) {
            runScale = RunScale.OFF;
        }
    }

    /** The same result with a note put first. */
    public RunResult withFirstNote(String note) {
        List<String> more = new java.util.ArrayList<>(notes.size() + 1);
        more.add(note);
        more.addAll(notes);
        return new RunResult(spec, error, scaleNote, eofMobility, scale, peaks, more, noiseSd, runScale,
                temperatureFactor);
    }

    /** A run without scale correction or temperature conversion. */
    public RunResult(RunSpec spec, InputException error, String scaleNote, double eofMobility, MobilityScale scale,
                     List<PeakResult> peaks, List<String> notes, double noiseSd) {
        this(spec, error, scaleNote, eofMobility, scale, peaks, notes, noiseSd, RunScale.OFF, 1.0);
    }

    /**
     * A mobility of this run (at its own temperature) as compared with the library: converted to the
     * library temperature, then corrected for the run's scale, (f·μ − b)/a.
     */
    public double comparedMobility(double runMobility) {
        return runScale.corrected(runMobility * temperatureFactor);
    }

    /** The inverse of {@link #comparedMobility}: the run mobility that is compared as {@code compared}. */
    public double runMobility(double compared) {
        return (runScale.factor() * compared + runScale.offset()) / temperatureFactor;
    }

    /** The factor by which a run mobility's standard uncertainty carries over to the compared value, |f/a|. */
    public double comparedSdFactor() {
        return Math.abs(temperatureFactor / runScale.factor());
    }

    /**
     * Standard uncertainty of the mobility a peak of this run shows beside its compared value: the
     * run mobility's SD carried by |f/a| for an analyte peak (its value is corrected for the run's
     * scale), by |f| for a marker (only converted to the library temperature).
     */
    public double comparedSd(PeakResult pr) {
        double factor = pr.role() == PeakRole.ANALYTE ? comparedSdFactor() : Math.abs(temperatureFactor);
        return pr.mobilitySd() * factor;
    }

    /**
     * The uncertainty shown beside a peak's compared mobility: for a peak with a name, the combined
     * uncertainty that decided its match ({@link org.mobident.result.Candidate#combinedSd}:
     * measurement, scale correction and library spread); otherwise {@link #comparedSd}.
     */
    public double decidingSd(PeakResult pr) {
        String name = pr.match().assigned();
        if (name != null) {
            for (org.mobident.result.Candidate c : pr.match().candidates()) {
                if (c.name().equals(name) && Double.isFinite(c.combinedSd())) {
                    return c.combinedSd();
                }
            }
        }
        return comparedSd(pr);
    }

    /** True when a mobility scale was set for this run. */
    public boolean mobilityKnown() {
        return scale != null;
    }

    public boolean failed() {
        return error != null;
    }

    /**
     * Reads the run's trace again, for plots and reports: results keep no trace, so that a batch
     * holds at most one trace per thread while it works.
     *
     * @throws InputException when the run has no trace file or it cannot be read (any more)
     */
    public Trace reopenTrace(TraceReadOptions options) throws InputException {
        if (spec.traceFile() == null) {
            throw new InputException(spec.name(), 0, null, "the run has no trace file");
        }
        return TraceFiles.read(spec.traceFile(), options);
    }

    public static RunResult failure(RunSpec spec, InputException error) {
        return new RunResult(spec, error, "run not processed", Double.NaN, null, List.of(), List.of(), Double.NaN);
    }
}
