package org.mobident.assess;

import java.util.List;
import java.util.Locale;

/** What a row of a known-identities table says is really in a run. */
public enum KnownKind {
    /** A library analyte present in the run. */
    ANALYTE,
    /** A real zone of a substance that is not in the library. */
    FOREIGN,
    /** The neutral (EOF) marker. */
    MARKER,
    /** An electrical spike: not a zone, never to be reported as a peak. */
    SPIKE;

    /** The word used in the table's {@code kind} column. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Every label, in declaration order (for messages). */
    public static List<String> labels() {
        return java.util.Arrays.stream(values()).map(KnownKind::label).toList();
    }

    /** The kind named by {@code word} (any case, surrounding blanks ignored), or null when none is. */
    public static KnownKind parse(String word) {
        String w = word.strip().toLowerCase(Locale.ROOT);
        for (KnownKind k : values()) {
            if (k.label().equals(w)) {
                return k;
            }
        }
        return null;
    }

    /** True for the kinds that are zones migrating past the detector (analyte, foreign, marker). */
    public boolean isZone() {
        return this != SPIKE;
    }
}
