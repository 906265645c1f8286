package org.mobident.buffer;

/**
 * The buffer an analyte migrates in, as far as the mobility model needs it.
 *
 * @param pH                 pH on the operational (activity) scale, within [{@value #MIN_PH}, {@value #MAX_PH}]
 * @param ionicStrengthMolar ionic strength I = ½Σcᵢzᵢ², mol/L, within [0, {@value #MAX_IONIC_STRENGTH_MOLAR}]
 * @param temperatureC       temperature, °C, within [0, 100] (range of the water property correlations)
 */
public record BufferConditions(double pH, double ionicStrengthMolar, double temperatureC) {

    /** Lowest accepted pH. */
    public static final double MIN_PH = 0.0;
    /** Highest accepted pH. */
    public static final double MAX_PH = 14.0;
    /**
     * Highest accepted ionic strength, mol/L. The Davies and Onsager-type corrections are only
     * reliable up to about 0.1 mol/L; beyond 0.5 mol/L they are meaningless.
     */
    public static final double MAX_IONIC_STRENGTH_MOLAR = 0.5;
    /** Reference temperature of tabulated limiting mobilities and pKa values, °C. */
    public static final double REFERENCE_TEMPERATURE_C = 25.0;
    /** Lowest accepted temperature, °C. */
    public static final double MIN_TEMPERATURE_C = 0.0;
    /** Highest accepted temperature, °C. */
    public static final double MAX_TEMPERATURE_C = 100.0;

    public BufferConditions {
        if (!(pH >= MIN_PH && pH <= MAX_PH)) {
            throw new IllegalArgumentException("pH must be within " + MIN_PH + "–" + MAX_PH + ", got " + pH);
        }
        if (!(ionicStrengthMolar >= 0.0 && ionicStrengthMolar <= MAX_IONIC_STRENGTH_MOLAR)) {
            throw new IllegalArgumentException("ionic strength must be within 0–" + MAX_IONIC_STRENGTH_MOLAR
                    + " mol/L, got " + ionicStrengthMolar);
        }
        if (!(temperatureC >= MIN_TEMPERATURE_C && temperatureC <= MAX_TEMPERATURE_C)) {
            throw new IllegalArgumentException("temperature must be within " + MIN_TEMPERATURE_C + "–"
                    + MAX_TEMPERATURE_C + " °C, got " + temperatureC);
        }
    }

    /** Infinite dilution at 25 °C and the given pH. */
    public static BufferConditions infiniteDilution(double pH) {
        return new BufferConditions(pH, 0.0, REFERENCE_TEMPERATURE_C);
    }

    /** The same buffer at another pH. */
    public BufferConditions withPh(double newPh) {
        return new BufferConditions(newPh, ionicStrengthMolar, temperatureC);
    }
}
