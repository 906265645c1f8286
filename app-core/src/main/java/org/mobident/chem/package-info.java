/**
 * Physico-chemical model of ionic mobility: predicts the effective mobility of an analyte in a
 * buffer of given pH, ionic strength and temperature from its acidity constants and the limiting
 * mobilities of its ionic forms.
 *
 * <p>Units: mobility in 1e-9 m² V⁻¹ s⁻¹, signed (cations positive, anions negative); ionic
 * strength in mol/L; temperature in °C; pH on the operational (activity) scale,
 * pH = −log10 a(H⁺).
 *
 * <p>The chain of a prediction ({@link org.mobident.chem.MobilityPredictor}):
 * <ol>
 *   <li>limiting mobilities at 25 °C are scaled to the buffer temperature by the viscosity of
 *       water (Walden's rule, {@link org.mobident.mobility.MobilityMath#atTemperature});</li>
 *   <li>each form's limiting mobility is lowered to its actual mobility at the buffer's ionic
 *       strength ({@link org.mobident.chem.IonicStrengthCorrection}, Debye–Hückel–Onsager);</li>
 *   <li>thermodynamic pKa values are turned into mixed constants at that ionic strength
 *       ({@link org.mobident.chem.Activity}, Davies equation);</li>
 *   <li>the mole fractions of the forms at the buffer pH weight the actual mobilities
 *       ({@link org.mobident.chem.IonicForms}): μ_eff = Σ αᵢ μᵢ.</li>
 * </ol>
 * pKa values are taken as independent of temperature (their change is typically below
 * 0.01–0.02 per kelvin for carboxylic acids but larger for amines; this is a stated limitation).
 *
 * <p>All types are immutable; invalid arguments raise {@link java.lang.IllegalArgumentException},
 * invalid library rows an {@link org.mobident.InputException}.
 */
package org.mobident.chem;
