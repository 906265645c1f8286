/**
 * Rechecking earlier identifications after a change of buffer: predicting how each library
 * analyte's effective mobility moves to new conditions (pH, ionic strength, temperature),
 * deciding for every earlier assignment whether it still holds, and listing analyte pairs that
 * can no longer be told apart.
 *
 * <p>Units: mobility in 1e-9 m² V⁻¹ s⁻¹, signed (cations +, anions −); ionic strength in mol/L
 * in the API ({@code …Molar}) and mmol/L where a name says {@code …Mm}; temperature in °C; pH on
 * the operational (activity) scale. The physico-chemical model is {@link org.mobident.chem};
 * this package anchors it on measured library values ({@link org.mobident.recheck.BufferTransfer}).
 *
 * <p>In the API, "A" is the old buffer and the library the earlier results were matched with,
 * "B" the new buffer and its library (measured, or predicted from A); text written for users
 * says "old" and "new" instead. The verdicts ({@link org.mobident.recheck.Verdict}): still holds,
 * moved but still unique, now ambiguous, reassigned, lost.
 *
 * <p>Identification by mobility is presumptive; so is every verdict of this package, which
 * rests on the new library: a model of the buffer change, or a library measured in it. All types are immutable; nothing here prints.
 */
package org.mobident.recheck;
