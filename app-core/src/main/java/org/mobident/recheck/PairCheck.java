package org.mobident.recheck;

/**
 * Whether two library analytes are told apart by mobility before and after the buffer change.
 *
 * @param first        one analyte (earlier in library A)
 * @param second       the other
 * @param deltaA       μ_first − μ_second in library A
 * @param thresholdA   |Δμ| needed in A ({@link SeparationRule#threshold})
 * @param deltaB       μ_first − μ_second in library B
 * @param uncertaintyB combined standard uncertainty of deltaB
 * @param thresholdB   |Δμ| needed in B
 */
public record PairCheck(String first, String second, double deltaA, double thresholdA, double deltaB,
                        double uncertaintyB, double thresholdB) {

    /** Resolved in buffer A. */
    public boolean resolvedA() {
        return Math.abs(deltaA) >= thresholdA;
    }

    /** Resolved in buffer B. */
    public boolean resolvedB() {
        return Math.abs(deltaB) >= thresholdB;
    }

    /** Resolved before, not any more. */
    public boolean becameUnresolvable() {
        return resolvedA() && !resolvedB();
    }

    /** Not resolved before, resolved now. */
    public boolean becameResolvable() {
        return !resolvedA() && resolvedB();
    }
}
