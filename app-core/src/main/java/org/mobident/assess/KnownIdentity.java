package org.mobident.assess;

import java.util.Locale;
import java.util.Objects;

/**
 * One row of a known-identities table: something that is really in a run.
 *
 * @param line     1-based line of the row in its file (0 when built in code)
 * @param run      run name, as in the peak table's {@code run} column
 * @param kind     what it is
 * @param name     library analyte name for {@link KnownKind#ANALYTE} rows; a free label or null for the
 *                 other kinds
 * @param timeS    true migration time of the zone's centre (or of the spike), s; NaN when not given
 * @param mobility true effective mobility at the library temperature, 1e-9 m²/(V s), signed; NaN when not given
 * @param heightSd apex height of the undispersed zone divided by the run's noise SD; NaN when not given
 */
public record KnownIdentity(long line, String run, KnownKind kind, String name, double timeS, double mobility,
                            double heightSd) {

    public KnownIdentity {
        Objects.requireNonNull(run, "run");
        Objects.requireNonNull(kind, "kind");
        if (kind == KnownKind.ANALYTE && (name == null || name.isBlank())) {
            throw new IllegalArgumentException("an analyte row needs the analyte's name");
        }
    }

    /** True when the row gives a migration time, so it is matched to peaks by time. */
    public boolean hasTime() {
        return Double.isFinite(timeS);
    }

    /** The name compared with reported analyte names: stripped, lower case; null when there is no name. */
    public String nameKey() {
        return key(name);
    }

    /** How analyte names are compared throughout the scoring: stripped, without regard to case. */
    public static String key(String name) {
        return name == null || name.isBlank() ? null : name.strip().toLowerCase(Locale.ROOT);
    }

    /** A short description for messages and tables: "chloride", "foreign-2", "marker", "spike". */
    public String describe() {
        return name == null || name.isBlank() ? kind.label() : name;
    }
}
