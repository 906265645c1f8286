package org.mobident.chem;

/**
 * One point of a mobility–pH curve.
 *
 * @param pH       pH
 * @param mobility predicted effective mobility, 1e-9 m²/(V·s), signed
 */
public record CurvePoint(double pH, double mobility) {
}
