package org.mobident.library.standards;

/** How a group of replicate peaks got its analyte name. */
public enum NamingBasis {
    /** Nearest approx_mobility of the standards sheet (one-to-one). */
    APPROX_MOBILITY,
    /** Expected migration order of the standards sheet. */
    ORDER,
    /** Nearest entry of the reference library with the analyte's name and the same charge sign. */
    REFERENCE_LIBRARY,
    /** The mix holds a single analyte and the runs a single group. */
    ONLY_ANALYTE,
    /**
     * The last analyte of a mix still unnamed took the last group seen in its runs (its reference
     * value, where there is one, agreeing), or the mix's last analytes took its last groups in the
     * one pairing their reference values make clear.
     */
    ELIMINATION
}
