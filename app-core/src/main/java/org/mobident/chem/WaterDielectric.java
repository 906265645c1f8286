package org.mobident.chem;

/**
 * Relative permittivity (static dielectric constant) of liquid water at atmospheric pressure.
 *
 * <p>Malmberg &amp; Maryott, J. Res. Natl. Bur. Stand. 56 (1956) 1, eq. for 0–100 °C:
 * ε = 87.740 − 0.40008·t + 9.398·10⁻⁴·t² − 1.410·10⁻⁶·t³ (t in °C), which gives 78.30 at
 * 25 °C. Coefficients recalled (from memory), checked in the tests against ε(25 °C) = 78.3–78.4
 * quoted throughout the electrolyte literature (Robinson &amp; Stokes, Electrolyte Solutions).
 */
public final class WaterDielectric {

    /** Lowest accepted temperature, °C (range of the correlation). */
    public static final double MIN_TEMPERATURE_C = 0.0;
    /** Highest accepted temperature, °C (range of the correlation). */
    public static final double MAX_TEMPERATURE_C = 100.0;

    private static final double[] COEFFICIENTS = {87.740, -0.40008, 9.398e-4, -1.410e-6};

    private WaterDielectric() {
    }

    /**
     * Relative permittivity of water.
     *
     * @param temperatureC temperature, °C, within [0, 100]
     * @return ε (dimensionless)
     * @throws IllegalArgumentException outside the range or for NaN
     */
    public static double relativePermittivity(double temperatureC) {
        if (!(temperatureC >= MIN_TEMPERATURE_C && temperatureC <= MAX_TEMPERATURE_C)) {
            throw new IllegalArgumentException("the dielectric constant of water is available from "
                    + MIN_TEMPERATURE_C + " to " + MAX_TEMPERATURE_C + " °C, got " + temperatureC);
        }
        double t = temperatureC;
        return COEFFICIENTS[0] + t * (COEFFICIENTS[1] + t * (COEFFICIENTS[2] + t * COEFFICIENTS[3]));
    }
}
