package org.mobident.recheck;

import java.util.List;

/**
 * The recheck of one earlier assignment.
 *
 * @param run              run name
 * @param peak             peak number
 * @param analyte          the analyte assigned before
 * @param oldStatus        its status before (identified / ambiguous)
 * @param oldConfidence    its confidence before (NaN when unknown)
 * @param oldMobility      the peak's mobility as compared with library A, 1e-9 m²/(V s)
 * @param oldMobilitySd    its standard uncertainty (NaN when unknown)
 * @param libraryMobilityA the analyte's mobility in library A (NaN when not there)
 * @param libraryMobilityB its mobility in library B, measured or predicted (NaN when not there)
 * @param shift            libraryMobilityB − libraryMobilityA
 * @param shiftUncertainty standard uncertainty of the shift
 * @param newMobility      the peak moved by the shift: where it is expected in buffer B
 * @param newConfidence    probability of the analyte for the moved peak on re-matching (NaN when not re-matched)
 * @param verdict          the verdict
 * @param collidesWith     other analytes within the moved peak's windows (most likely first)
 * @param basis            model basis of the prediction (null when library B was measured)
 * @param reason           why, in words
 */
public record AssignmentCheck(String run, int peak, String analyte, String oldStatus, double oldConfidence,
                              double oldMobility, double oldMobilitySd, double libraryMobilityA,
                              double libraryMobilityB, double shift, double shiftUncertainty, double newMobility,
                              double newConfidence, Verdict verdict, List<String> collidesWith,
                              PredictionBasis basis, String reason) {
    public AssignmentCheck {
        collidesWith = List.copyOf(collidesWith);
        reason = reason == null ? "" : reason;
    }

    /** The shift in multiples of its standard uncertainty (NaN when that is 0 or unknown). */
    public double shiftInSd() {
        return shiftUncertainty > 0 ? shift / shiftUncertainty : Double.NaN;
    }
}
