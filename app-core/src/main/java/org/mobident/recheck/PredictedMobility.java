package org.mobident.recheck;

import java.util.List;
import java.util.Locale;

/**
 * One analyte's effective mobility transferred from the buffer it was measured in (A) to a new
 * buffer (B), see {@link BufferTransfer}.
 *
 * @param name             analyte name
 * @param bufferA          the conditions of the measured value
 * @param bufferB          the conditions predicted for
 * @param measuredA        measured mobility in A (the library value), 1e-9 m²/(V s), signed
 * @param spreadA          its between-run spread as used (the entry's mobility_sd, or the assumed one)
 * @param runsA            number of runs behind the measured mean (0 if unknown)
 * @param modelA           the model's own value in A (NaN without model)
 * @param modelB           the model's own value in B (NaN without model)
 * @param predicted        predicted mobility in B, same unit
 * @param uncertainty      standard uncertainty of a single new measurement in B: spread and model combined
 * @param modelUncertainty the part of {@code uncertainty} from the model (inputs and form), ≥ 0
 * @param commonUncertainty the part of {@code modelUncertainty} common to every analyte of the same
 *                         buffer change (the temperature scaling), which cancels when analytes are
 *                         compared with one another, ≥ 0
 * @param slope            ∂predicted/∂measuredA: how strongly the anchor carries over (model(B)/model(A) for ratio transfer)
 * @param meanChargeB      average charge number in B (NaN without model)
 * @param basis            where the model data came from
 * @param method           how the anchor was transferred
 * @param note             remarks for the analyst (empty when none)
 */
public record PredictedMobility(String name, BufferSpec bufferA, BufferSpec bufferB, double measuredA,
                                double spreadA, int runsA, double modelA, double modelB, double predicted,
                                double uncertainty, double modelUncertainty, double commonUncertainty, double slope, double meanChargeB,
                                PredictionBasis basis, Method method, String note) {

    /** How a measured value is carried to the new buffer. */
    public enum Method {
        /** μ_B = μ_A,measured × model(B)/model(A). */
        RATIO,
        /** μ_B = μ_A,measured + (model(B) − model(A)): the anchor was too weakly ionised to scale. */
        DIFFERENCE,
        /** Viscosity and univalent ionic-strength factors only (no model data). */
        VISCOSITY_AND_IONIC_STRENGTH;

        /** snake_case label for reports. */
        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    public PredictedMobility {
        note = note == null ? "" : note;
    }

    /**
     * The uncertainty that matters when this analyte is compared with another one moved by the
     * same buffer change: {@code uncertainty} without the common part.
     */
    public double comparisonUncertainty() {
        return Math.sqrt(Math.max(0.0, uncertainty * uncertainty - commonUncertainty * commonUncertainty));
    }

    /** {@code modelUncertainty} without the common part. */
    public double comparisonModelUncertainty() {
        return Math.sqrt(Math.max(0.0, modelUncertainty * modelUncertainty - commonUncertainty * commonUncertainty));
    }

    /**
     * The remarks that say more than the basis does: {@link #note()} without the parts that only
     * restate what the prediction rests on (reference data, strong ion, no model data, pH change
     * not modelled), joined with "; "; empty when nothing is left.
     */
    public String specificNote() {
        List<String> kept = new java.util.ArrayList<>();
        for (String part : note.split("; ")) {
            if (!part.isBlank() && !BufferTransfer.BASIS_NOTES.contains(part)) {
                kept.add(part);
            }
        }
        return String.join("; ", kept);
    }

    /** predicted − measuredA. */
    public double shift() {
        return predicted - measuredA;
    }

    /**
     * Standard uncertainty of the shift of the mean: the model part combined with the measured
     * mean's own uncertainty carried through (slope − 1)·spread/√n.
     */
    public double shiftUncertainty() {
        double carried = Math.abs(slope - 1.0) * spreadA / Math.sqrt(Math.max(runsA, 1));
        return Math.hypot(modelUncertainty, carried);
    }
}
