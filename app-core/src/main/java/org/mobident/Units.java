package org.mobident;

/**
 * Physical constants and unit conversions used across the engine; one place for each.
 *
 * <p>Mobility everywhere in Mobident is in units of 1e-9 m² V⁻¹ s⁻¹ (= 1e-5 cm² V⁻¹ s⁻¹),
 * signed: cations positive, anions negative (IUPAC Compendium, "electrophoretic mobility").
 */
public final class Units {
    /** Faraday constant in C/mol (CODATA 2018, exact since the 2019 SI redefinition). */
    public static final double FARADAY_C_PER_MOL = 96485.33212;

    /** Zero of the Celsius scale in kelvin. */
    public static final double CELSIUS_ZERO_K = 273.15;

    /** Seconds in a minute. */
    public static final double SECONDS_PER_MINUTE = 60.0;

    private Units() {
    }

    /**
     * Mobility from lengths in cm, voltage in kV and time in s, in 1e-9 m²/(V·s).
     * {@code (Ld[cm]·1e-2)(Lt[cm]·1e-2) / (V[kV]·1e3 · t) · 1e9 = 100·Ld·Lt/(V·t)}.
     */
    public static double mobilityFromCmKvS(double detectorLengthCm, double totalLengthCm,
                                           double voltageKv, double timeS) {
        return 100.0 * detectorLengthCm * totalLengthCm / (voltageKv * timeS);
    }

    /**
     * Limiting ionic mobility (1e-9 m²/(V·s), unsigned) from a limiting molar ionic conductivity
     * λ in S·cm²/mol and the charge number z: μ = λ / (|z|·F) (Robinson &amp; Stokes, Electrolyte
     * Solutions, ch. 2). λ[S cm²/mol] = 1e-4 S m²/mol, so μ[m²/(V s)] = 1e-4·λ/(|z|F).
     */
    public static double mobilityFromConductivity(double conductivityScm2PerMol, int chargeNumber) {
        if (chargeNumber == 0) {
            throw new IllegalArgumentException("a neutral species has no ionic conductivity");
        }
        return 1e-4 * conductivityScm2PerMol / (Math.abs(chargeNumber) * FARADAY_C_PER_MOL) * 1e9;
    }
}
