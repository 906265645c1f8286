package org.mobident.mobility;

import org.mobident.Units;

/**
 * The formulas that turn times into mobilities, one place for each. All static, no state.
 *
 * <p>Units: lengths in cm, voltage in kV (signed), times in s, mobilities in 1e-9 m²/(V·s)
 * (signed), temperatures in °C, conductivities in S·cm²/mol.
 */
public final class MobilityMath {

    private MobilityMath() {
    }

    /**
     * Migration time corrected for a linear voltage ramp at the start of the run.
     *
     * <p>While the voltage rises linearly from 0 to V over τ seconds, the time integral of the
     * voltage up to a time t ≥ τ is V·(t − τ/2): the zone has moved as far as it would have in
     * t − τ/2 seconds at full voltage (Williams &amp; Vigh, Anal. Chem. 68 (1996) 1174;
     * Jumppanen &amp; Riekkola, Anal. Chem. 67 (1995) 1060). So t' = t − τ/2 for t ≥ τ.
     *
     * <p>For a time still inside the ramp (t &lt; τ), the same integral is V·t²/(2τ), so
     * t' = t²/(2τ) there; both branches meet with equal value and slope at t = τ. Real zones
     * arrive long after the ramp, but the continuation keeps the mapping monotone and positive.
     *
     * @param timeS raw time since the voltage was switched on, s, &gt; 0
     * @param rampS ramp duration τ, s, ≥ 0 (0: no ramp)
     * @return the ramp-corrected time t' in s, &gt; 0
     * @throws IllegalArgumentException if the time is not positive or the ramp is negative
     */
    public static double rampCorrectedTimeS(double timeS, double rampS) {
        Checks.positiveTime("time", timeS);
        Checks.ramp(rampS);
        if (timeS >= rampS) {
            return timeS - 0.5 * rampS;
        }
        return timeS * timeS / (2.0 * rampS);
    }

    /** d t'/d t of {@link #rampCorrectedTimeS}: 1 after the ramp, t/τ during it. */
    static double rampCorrectedTimeSlope(double timeS, double rampS) {
        return timeS >= rampS ? 1.0 : timeS / rampS;
    }

    /**
     * Inverse of {@link #rampCorrectedTimeS}: the raw time at which the ramp-corrected time is
     * {@code correctedTimeS} (t = t' + τ/2 when t' ≥ τ/2, else t = √(2τt')).
     */
    static double rawTimeS(double correctedTimeS, double rampS) {
        if (correctedTimeS >= 0.5 * rampS) {
            return correctedTimeS + 0.5 * rampS;
        }
        return Math.sqrt(2.0 * rampS * correctedTimeS);
    }

    /** Reciprocal ramp-corrected time u = 1/t', in 1/s; every scale is linear in it. */
    static double inverseCorrectedTime(double timeS, double rampS) {
        return 1.0 / rampCorrectedTimeS(timeS, rampS);
    }

    /** du/dt of {@link #inverseCorrectedTime}: −(dt'/dt)/t'². */
    static double inverseCorrectedTimeSlope(double timeS, double rampS) {
        double corrected = rampCorrectedTimeS(timeS, rampS);
        return -rampCorrectedTimeSlope(timeS, rampS) / (corrected * corrected);
    }

    /** Raw time for a reciprocal corrected time u, or NaN when u ≤ 0 (the zone never arrives). */
    static double rawTimeFromInverse(double inverseCorrectedTime, double rampS) {
        if (!(inverseCorrectedTime > 0) || Double.isInfinite(inverseCorrectedTime)) {
            return Double.NaN;
        }
        return rawTimeS(1.0 / inverseCorrectedTime, rampS);
    }

    /**
     * The product μ_app·t' for a capillary: Ld·Lt/V in 1e-9 m²/(V·s) × s. Negative for reversed
     * polarity.
     */
    static double fieldFactor(double detectorLengthCm, double totalLengthCm, double voltageKv) {
        return Units.mobilityFromCmKvS(detectorLengthCm, totalLengthCm, voltageKv, 1.0);
    }

    /**
     * Apparent (observed) mobility μ_app = Ld·Lt / (V·t'): the zone's velocity Ld/t' divided by the
     * field strength V/Lt (IUPAC Compendium of Chemical Terminology, "electrophoretic mobility";
     * Jumppanen &amp; Riekkola 1995). Signed through V.
     *
     * @param detectorLengthCm inlet-to-detector length Ld, cm
     * @param totalLengthCm    total capillary length Lt, cm
     * @param voltageKv        signed separation voltage, kV
     * @param correctedTimeS   ramp-corrected migration time t', s (see {@link #rampCorrectedTimeS})
     * @return apparent mobility, 1e-9 m²/(V·s)
     */
    public static double apparentMobility(double detectorLengthCm, double totalLengthCm, double voltageKv,
                                          double correctedTimeS) {
        Checks.geometry(detectorLengthCm, totalLengthCm, voltageKv);
        Checks.positiveTime("corrected time", correctedTimeS);
        return Units.mobilityFromCmKvS(detectorLengthCm, totalLengthCm, voltageKv, correctedTimeS);
    }

    /**
     * Raw migration time of a zone with the given apparent mobility: t' = Ld·Lt/(V·μ_app), then
     * t = t' + τ/2 (inverse of {@link #apparentMobility} and {@link #rampCorrectedTimeS}).
     *
     * @return the raw time in s, or NaN when the zone never reaches the detector (its apparent
     *         velocity points back towards the inlet, or it does not move)
     */
    public static double migrationTimeS(double detectorLengthCm, double totalLengthCm, double voltageKv,
                                        double rampS, double apparentMobility) {
        Checks.geometry(detectorLengthCm, totalLengthCm, voltageKv);
        Checks.ramp(rampS);
        double corrected = fieldFactor(detectorLengthCm, totalLengthCm, voltageKv) / apparentMobility;
        return corrected > 0 && Double.isFinite(corrected) ? rawTimeS(corrected, rampS) : Double.NaN;
    }

    /**
     * Converts a mobility measured at one temperature to another: μ(to) = μ(from)·η(from)/η(to).
     *
     * <p>The friction on a migrating ion is proportional to the solvent viscosity (Stokes' law),
     * so mobility varies inversely with viscosity, Walden's rule Λ°·η ≈ constant (Walden, 1906;
     * Robinson &amp; Stokes, Electrolyte Solutions). The buffer is taken to have the
     * temperature dependence of water, {@link WaterViscosity} (IAPWS 2008 / Pátek et al. 2009).
     * Near 25 °C this is about +2 % per kelvin.
     *
     * @param mobility      mobility at {@code fromTemperatureC}, any unit (kept)
     * @param fromTemperatureC temperature of the given value, °C
     * @param toTemperatureC   target temperature, °C
     * @throws IllegalArgumentException outside the range of {@link WaterViscosity}
     */
    public static double atTemperature(double mobility, double fromTemperatureC, double toTemperatureC) {
        return mobility * WaterViscosity.mPaS(fromTemperatureC) / WaterViscosity.mPaS(toTemperatureC);
    }

    /**
     * Signed limiting mobility from a limiting <em>molar</em> ionic conductivity λ(X^z):
     * μ = sign(z)·λ/(|z|·F) (Robinson &amp; Stokes, Electrolyte Solutions, ch. 2), via
     * {@link Units#mobilityFromConductivity}.
     *
     * <p>Convention: handbook tables (CRC Handbook, "Ionic conductivity and diffusion at
     * infinite dilution") list multivalent ions per unit charge, e.g. ½SO₄²⁻ = 80.0 S·cm²/mol.
     * The molar value is |z| times that (SO₄²⁻: 160.0 S·cm²/mol). Use
     * {@link #limitingMobilityPerCharge} for a table value of that kind.
     *
     * @param molarConductivityScm2PerMol λ(X^z), S·cm²/mol, the conductivity per mole of ions
     * @param chargeNumber                z, non-zero, signed
     * @return mobility in 1e-9 m²/(V·s), positive for cations, negative for anions
     */
    public static double limitingMobility(double molarConductivityScm2PerMol, int chargeNumber) {
        return Integer.signum(chargeNumber) * Units.mobilityFromConductivity(molarConductivityScm2PerMol, chargeNumber);
    }

    /**
     * Signed limiting mobility from a conductivity per unit charge λ(X^z/|z|), as handbook tables
     * list it (½SO₄²⁻, ⅓La³⁺): μ = sign(z)·λ(X^z/|z|)/F, i.e. {@link #limitingMobility} of
     * |z|·λ. The charge number enters only through its sign, since per unit charge the |z|
     * cancels.
     *
     * @param perChargeConductivityScm2PerMol λ per mole of unit charges, S·cm²/mol
     * @param chargeNumber                    z of the ion, non-zero, signed
     */
    public static double limitingMobilityPerCharge(double perChargeConductivityScm2PerMol, int chargeNumber) {
        return limitingMobility(Math.abs(chargeNumber) * perChargeConductivityScm2PerMol, chargeNumber);
    }
}
