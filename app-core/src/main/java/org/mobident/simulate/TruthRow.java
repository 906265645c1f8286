package org.mobident.simulate;

import java.util.Objects;

/**
 * One row of a known-identities table: what is really in a generated run.
 *
 * @param run      run name (trace file name without extension)
 * @param kind     analyte, foreign zone, neutral marker or spike
 * @param analyte  library name for an analyte, a free label such as {@code foreign-2} for a foreign
 *                 zone, {@code null} for the marker and spikes
 * @param timeS    true migration time in s (the zone's centroid), or when a spike occurs
 * @param mobility true effective mobility at 25 °C, 1e-9 m²/(V s), signed; 0 for the marker, NaN
 *                 for a spike
 * @param heightSd apex height of the undispersed zone divided by the run's noise SD; NaN for a spike
 */
public record TruthRow(String run, TruthKind kind, String analyte, double timeS, double mobility, double heightSd) {
    public TruthRow {
        Objects.requireNonNull(run, "run");
        Objects.requireNonNull(kind, "kind");
        if ((kind == TruthKind.ANALYTE || kind == TruthKind.FOREIGN) && analyte == null) {
            throw new IllegalArgumentException(run + ": an " + kind.label() + " row needs a name");
        }
        if (!(timeS > 0) || !Double.isFinite(timeS)) {
            throw new IllegalArgumentException(run + ": time must be a positive number of s, got " + timeS);
        }
    }
}
