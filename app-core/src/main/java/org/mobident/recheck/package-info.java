/**
 * Rechecking earlier identifications after a change of buffer: predicting how each library
 * analyte's effective mobility moves to new conditions (pH, ionic strength, temperature),
 * deciding for every earlier assignment whether it still holds, and listing analyte pairs that
 * can no longer be told apart.
 *
 * <p>Units: mobility in 1e-9 m² V⁻¹ s⁻¹, signed (cations +, anions −); ionic strength in mol/L
 * in the API ({@code …Molar}) and mmol/L where a name says {@code …Mm}; temperature in °C; pH on
 * the operational (activity) scale. The physico-chemical model is {@link org.mobident.chem};
 * this package anchors it on measured library values ({@link org.mobident.recheck.Predictor}).
 *
 * <p>Identification by mobility is presumptive; so is every verdict of this package, which
 * rests on a model of the buffer change. All types are immutable; nothing here prints.
 */
package org.mobident.recheck;
