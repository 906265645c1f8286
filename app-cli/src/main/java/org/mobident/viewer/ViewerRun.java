package org.mobident.viewer;

import java.util.Locale;
import java.util.Objects;
import org.mobident.result.RunResult;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/**
 * One run as the viewer knows it: waiting to be processed, or done with its trace and result.
 *
 * @param spec   the run as declared
 * @param trace  its trace, or null while waiting or when it could not be read
 * @param result its identification, or null while waiting
 */
public record ViewerRun(RunSpec spec, Trace trace, RunResult result) {

    public ViewerRun {
        Objects.requireNonNull(spec, "spec");
    }

    /** A run not yet processed. */
    public static ViewerRun waiting(RunSpec spec) {
        return new ViewerRun(spec, null, null);
    }

    /** A run that could not be processed at all (its result carries the error). */
    public static ViewerRun failed(RunResult failure) {
        return new ViewerRun(failure.spec(), null, failure);
    }

    public String name() {
        return spec.name();
    }

    public boolean isWaiting() {
        return result == null;
    }

    /** True when the run has a trace to draw and a result that did not fail. */
    public boolean drawable() {
        return trace != null && result != null && !result.failed();
    }

    /** A short plain statement of where the run stands, for the run list. */
    public String statusText() {
        if (result == null) {
            return "working…";
        }
        if (result.failed()) {
            return "not processed";
        }
        if (!result.mobilityKnown()) {
            return "no mobility scale";
        }
        if (Double.isFinite(result.eofMobility())) {
            return String.format(Locale.ROOT, "EOF %.2f", result.eofMobility());
        }
        return "ready";
    }

    /** The longer explanation behind {@link #statusText()} (the error, or how mobilities were set). */
    public String statusDetail() {
        if (result == null) {
            return "Reading the trace and identifying its peaks.";
        }
        if (result.failed()) {
            return result.error().getMessage();
        }
        StringBuilder sb = new StringBuilder(result.scaleNote());
        for (String note : result.notes()) {
            if (!note.equals(result.scaleNote())) {
                sb.append("; ").append(note);
            }
        }
        return sb.toString();
    }
}
