package org.mobident.simulate;

/** What a row of a known-identities table stands for. */
public enum TruthKind {
    /** A library analyte present in the run. */
    ANALYTE("analyte"),
    /** A real zone of a substance that is not in the library. */
    FOREIGN("foreign"),
    /** The neutral (EOF) marker. */
    MARKER("marker"),
    /** An electrical spike: not a zone, never to be reported as a peak. */
    SPIKE("spike");

    private final String label;

    TruthKind(String label) {
        this.label = label;
    }

    /** The word written in the table's {@code kind} column. */
    public String label() {
        return label;
    }
}
