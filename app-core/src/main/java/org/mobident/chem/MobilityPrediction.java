package org.mobident.chem;

/**
 * A predicted effective mobility with its uncertainty.
 *
 * @param mobility            effective mobility, 1e-9 m²/(V·s), signed
 * @param standardUncertainty standard uncertainty of the prediction from the stated pKa and
 *                            limiting-mobility uncertainties, same unit, ≥ 0
 * @param meanCharge          average charge number Σαᵢzᵢ of the species in the buffer
 */
public record MobilityPrediction(double mobility, double standardUncertainty, double meanCharge) {
}
