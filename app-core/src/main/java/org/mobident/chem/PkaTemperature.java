package org.mobident.chem;

import java.util.ArrayList;
import java.util.List;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.SpeciesModel;

/**
 * The temperature dependence of acidity constants: the integrated van 't Hoff equation with a
 * constant heat-capacity change,
 * <pre>  pKa(T) = pKa(θ) + ΔH/(R·ln10)·(1/T − 1/θ) + ΔCp/(R·ln10)·(θ/T − 1 + ln(T/θ)),  θ = 298.15 K</pre>
 * (Goldberg, Kishore &amp; Lennen, J. Phys. Chem. Ref. Data 31 (2002) 231, eq. 4, with ΔH and ΔCp
 * the standard enthalpy and heat-capacity change of the ionisation HA → H⁺ + A at θ). A positive
 * ΔH lowers the pKa on warming: amines (ΔH ≈ 35–55 kJ/mol, Tris −0.028 pKa units per K) shift far
 * more than carboxylic and phosphoric acids (|ΔH| ≲ 10 kJ/mol).
 *
 * <p>Where no enthalpy is tabulated, a class value stands in with a stated uncertainty (common
 * practice, from the spread of the values in the table above, recalled): {@value #CATIONIC_ACID_ENTHALPY_KJ}
 * ± {@value #CATIONIC_ACID_ENTHALPY_SD_KJ} kJ/mol for a cationic acid (a protonated amine: the acid
 * form carries a positive charge), {@value #NEUTRAL_OR_ANIONIC_ACID_ENTHALPY_KJ} ±
 * {@value #NEUTRAL_OR_ANIONIC_ACID_ENTHALPY_SD_KJ} kJ/mol otherwise (carboxylic, phosphoric and
 * similar acids).
 */
public final class PkaTemperature {

    /** Molar gas constant, J/(K·mol) (CODATA 2018, exact). */
    public static final double GAS_CONSTANT = 8.314462618;
    /** Reference temperature θ of the tabulated values, K. */
    public static final double REFERENCE_K = 298.15;
    /** Kelvin at 0 °C. */
    public static final double KELVIN_AT_ZERO_C = 273.15;
    /** Enthalpy assumed for a cationic acid without a tabulated value, kJ/mol (common practice). */
    public static final double CATIONIC_ACID_ENTHALPY_KJ = 45.0;
    /** Its standard uncertainty, kJ/mol (common practice: amines and amino buffers lie within 30–55). */
    public static final double CATIONIC_ACID_ENTHALPY_SD_KJ = 15.0;
    /** Enthalpy assumed for a neutral or anionic acid without a tabulated value, kJ/mol (common practice). */
    public static final double NEUTRAL_OR_ANIONIC_ACID_ENTHALPY_KJ = 0.0;
    /** Its standard uncertainty, kJ/mol (common practice: carboxylic and phosphoric acids lie within ±10). */
    public static final double NEUTRAL_OR_ANIONIC_ACID_ENTHALPY_SD_KJ = 10.0;
    /**
     * Standard uncertainty of a tabulated enthalpy, kJ/mol (common practice: the selected values are
     * mostly good to 0.1–1 kJ/mol; 2 allows for values recalled rather than read).
     */
    public static final double TABULATED_ENTHALPY_SD_KJ = 2.0;

    private static final double J_PER_KJ = 1000.0;
    private static final double LN10 = Math.log(10.0);

    private PkaTemperature() {
    }

    /**
     * pKa at a temperature from its value at 25 °C.
     *
     * @param pKa25               pKa at 25 °C
     * @param enthalpyKjPerMol    ΔH of ionisation at 25 °C, kJ/mol
     * @param heatCapacityJPerKMol ΔCp of ionisation, J/(K·mol); NaN or 0 when not known (then ΔH is taken as constant)
     * @param temperatureC        the temperature, °C
     */
    public static double pKaAt(double pKa25, double enthalpyKjPerMol, double heatCapacityJPerKMol,
                               double temperatureC) {
        double t = temperatureC + KELVIN_AT_ZERO_C;
        double rLn10 = GAS_CONSTANT * LN10;
        double shift = enthalpyKjPerMol * J_PER_KJ / rLn10 * (1.0 / t - 1.0 / REFERENCE_K);
        if (Double.isFinite(heatCapacityJPerKMol)) {
            shift += heatCapacityJPerKMol / rLn10 * (REFERENCE_K / t - 1.0 + Math.log(t / REFERENCE_K));
        }
        return pKa25 + shift;
    }

    /**
     * Standard uncertainty of the change of pKa between two temperatures that an enthalpy
     * uncertainty causes: σ(ΔH)/(R·ln10)·|1/T₂ − 1/T₁|.
     */
    public static double shiftSd(double enthalpySdKjPerMol, double fromC, double toC) {
        return enthalpySdKjPerMol * J_PER_KJ / (GAS_CONSTANT * LN10)
                * Math.abs(1.0 / (toC + KELVIN_AT_ZERO_C) - 1.0 / (fromC + KELVIN_AT_ZERO_C));
    }

    /**
     * Enthalpy and heat capacity of one ionisation step.
     *
     * @param enthalpyKjPerMol     ΔH, kJ/mol
     * @param enthalpySdKjPerMol   its standard uncertainty, kJ/mol
     * @param heatCapacityJPerKMol ΔCp, J/(K·mol), NaN when not known
     * @param tabulated            true when taken from a table, false for the class value
     */
    public record Step(double enthalpyKjPerMol, double enthalpySdKjPerMol, double heatCapacityJPerKMol,
                       boolean tabulated) {

        /** The class value for a step whose acid form has the given charge (see the class javadoc). */
        public static Step assumed(int acidFormCharge) {
            return acidFormCharge > 0
                    ? new Step(CATIONIC_ACID_ENTHALPY_KJ, CATIONIC_ACID_ENTHALPY_SD_KJ, Double.NaN, false)
                    : new Step(NEUTRAL_OR_ANIONIC_ACID_ENTHALPY_KJ, NEUTRAL_OR_ANIONIC_ACID_ENTHALPY_SD_KJ, Double.NaN,
                    false);
        }
    }

    /**
     * The species with its pKa values moved from 25 °C to {@code temperatureC} (the limiting
     * mobilities stay at 25 °C, as {@link MobilityPredictor} expects them). Steps are re-sorted if
     * the shift makes two of them cross.
     *
     * @param model        the species, pKa at 25 °C
     * @param steps        one entry per pKa, in the model's order
     * @param temperatureC the temperature, °C
     */
    public static SpeciesModel atTemperature(SpeciesModel model, List<Step> steps, double temperatureC) {
        if (steps.size() != model.pKa().size()) {
            throw new IllegalArgumentException(model.name() + ": " + model.pKa().size() + " pKa values but "
                    + steps.size() + " enthalpies");
        }
        if (temperatureC == BufferConditions.REFERENCE_TEMPERATURE_C || steps.isEmpty()) {
            return model;
        }
        List<Double> shifted = new ArrayList<>(steps.size());
        for (int i = 0; i < steps.size(); i++) {
            Step s = steps.get(i);
            shifted.add(pKaAt(model.pKa().get(i), s.enthalpyKjPerMol(), s.heatCapacityJPerKMol(), temperatureC));
        }
        shifted.sort(null);
        return new SpeciesModel(model.name(), model.highestCharge(), shifted, model.limitingMobilities());
    }
}
