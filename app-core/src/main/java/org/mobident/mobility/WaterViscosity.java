package org.mobident.mobility;

/**
 * Dynamic viscosity of liquid water at 0.1 MPa as a function of temperature.
 *
 * <p>Uses the four-term reference correlation for liquid water at 0.1 MPa,
 * η = Σ aᵢ·(T / 300 K)^bᵢ µPa·s with a = (280.68, 511.45, 61.131, 0.45903) and
 * b = (−1.9, −7.7, −19.6, −40), given by Pátek, Hrubý, Klomfar, Součková &amp; Harvey,
 * J. Phys. Chem. Ref. Data 38 (2009) 21, for use beside the IAPWS 2008 formulation for the
 * viscosity of ordinary water (Huber et al., J. Phys. Chem. Ref. Data 38 (2009) 101, whose
 * §3.7 treats liquid H₂O at 0.1 MPa). Coefficients: recalled, then corroborated by an
 * independent transcription of the Pátek et al. correlation (primary paper not read). The result agrees
 * with the IAPWS-based saturated-liquid table of Perry's Chemical Engineers' Handbook
 * (9th ed., Table 2-135) to better than 0.1 % from 0 to 100 °C (checked in the tests).
 *
 * <p>Accepted range: 0 to 100 °C, the liquid range that matters for capillary electrophoresis.
 */
public final class WaterViscosity {

    /** Lowest accepted temperature, °C. */
    public static final double MIN_TEMPERATURE_C = 0.0;

    /** Highest accepted temperature, °C. */
    public static final double MAX_TEMPERATURE_C = 100.0;

    private static final double REDUCING_TEMPERATURE_K = 300.0;
    private static final double MICRO_TO_MILLI = 1e-3;
    private static final double[] A_MICRO_PA_S = {280.68, 511.45, 61.131, 0.45903};
    private static final double[] B = {-1.9, -7.7, -19.6, -40.0};

    private WaterViscosity() {
    }

    /**
     * Viscosity of liquid water at 0.1 MPa.
     *
     * @param temperatureC temperature in °C, within [{@value #MIN_TEMPERATURE_C},
     *                     {@value #MAX_TEMPERATURE_C}]
     * @return viscosity in mPa·s
     * @throws IllegalArgumentException outside the accepted range or for NaN
     */
    public static double mPaS(double temperatureC) {
        if (!(temperatureC >= MIN_TEMPERATURE_C && temperatureC <= MAX_TEMPERATURE_C)) {
            throw new IllegalArgumentException("water viscosity is available from " + MIN_TEMPERATURE_C
                    + " to " + MAX_TEMPERATURE_C + " °C, got " + temperatureC);
        }
        double reduced = (temperatureC + org.mobident.Units.CELSIUS_ZERO_K) / REDUCING_TEMPERATURE_K;
        double sum = 0.0;
        for (int i = 0; i < A_MICRO_PA_S.length; i++) {
            sum += A_MICRO_PA_S[i] * Math.pow(reduced, B[i]);
        }
        return sum * MICRO_TO_MILLI;
    }
}
