package org.mobident.recheck;

/**
 * How far the model was off for one analyte, when library B was measured.
 *
 * @param analyte    analyte
 * @param predicted  mobility predicted for B from library A, 1e-9 m²/(V s)
 * @param uncertainty its standard uncertainty
 * @param measured   library B's measured mobility
 * @param basis      model basis of the prediction
 */
public record PredictionError(String analyte, double predicted, double uncertainty, double measured,
                              PredictionBasis basis) {

    /** measured − predicted, mobility units. */
    public double error() {
        return measured - predicted;
    }

    /** The error in multiples of the predicted standard uncertainty (NaN when that is 0). */
    public double errorInSd() {
        return uncertainty > 0 ? error() / uncertainty : Double.NaN;
    }
}
