package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MobilityMathTest {

    /** Absolute agreement for exact arithmetic, 1e-9 m²/(V s) or s. */
    private static final double EXACT = 1e-12;
    /** Relative agreement for handbook-derived mobilities (the tables carry 4 digits). */
    private static final double HANDBOOK_RELATIVE = 5e-4;
    /** Relative agreement of a viscosity ratio with the ratio of table values (0.3 % each). */
    private static final double VISCOSITY_RATIO_RELATIVE = 0.006;

    @Test
    void apparentMobilityHandWorkedFromTheDefinition() {
        // Worked from the definition, IUPAC ("electrophoretic mobility"): μ_app = v/E = (Ld/t)/(V/Lt).
        // Ld = 0.50 m, Lt = 0.60 m, V = 25 000 V, t = 300 s:
        // μ = 0.50·0.60 / (25 000·300) = 0.30 / 7.5e6 = 4.0e-8 m²/(V s) = 40 ×1e-9 m²/(V s).
        assertEquals(40.0, MobilityMath.apparentMobility(50, 60, 25, 300), EXACT);
        // Reversed polarity flips the sign only.
        assertEquals(-40.0, MobilityMath.apparentMobility(50, 60, -25, 300), EXACT);
    }

    @Test
    void migrationTimeInvertsApparentMobility() {
        assertEquals(300.0, MobilityMath.migrationTimeS(50, 60, 25, 0, 40), 1e-9);
        // With a 10 s ramp the zone arrives τ/2 = 5 s later.
        assertEquals(305.0, MobilityMath.migrationTimeS(50, 60, 25, 10, 40), 1e-9);
        assertEquals(300.0, MobilityMath.migrationTimeS(50, 60, -25, 0, -40), 1e-9);
    }

    @Test
    void aZoneMovingAwayFromTheDetectorHasNoTime() {
        assertTrue(Double.isNaN(MobilityMath.migrationTimeS(50, 60, 25, 0, -40)));
        assertTrue(Double.isNaN(MobilityMath.migrationTimeS(50, 60, -25, 0, 40)));
        assertTrue(Double.isNaN(MobilityMath.migrationTimeS(50, 60, 25, 0, 0)));
    }

    @Test
    void rampCorrectionSubtractsHalfTheRamp() {
        // Williams & Vigh 1996: a linear ramp of τ delivers the voltage integral V·(t − τ/2) for t ≥ τ.
        assertEquals(295.0, MobilityMath.rampCorrectedTimeS(300, 10), EXACT);
        assertEquals(300.0, MobilityMath.rampCorrectedTimeS(300, 0), EXACT);
        assertEquals(5.0, MobilityMath.rampCorrectedTimeS(10, 10), EXACT);
    }

    @Test
    void rampCorrectionEqualsTheIntegralOfTheVoltageProfile() {
        // Worked from the definition: integrate V(s)/V over a linear ramp (τ = 12 s) by the midpoint rule.
        double rampS = 12;
        for (double t : new double[] {3.0, 9.0, 12.0, 47.5, 300.0}) {
            int steps = 200_000;
            double h = t / steps;
            double integral = 0;
            for (int i = 0; i < steps; i++) {
                double s = (i + 0.5) * h;
                integral += Math.min(1.0, s / rampS) * h;
            }
            assertEquals(integral, MobilityMath.rampCorrectedTimeS(t, rampS), 1e-6, "t = " + t);
        }
    }

    @Test
    void rampCorrectionAndItsInverseAgree() {
        for (double t : new double[] {0.5, 4.0, 8.0, 8.5, 120.0}) {
            double corrected = MobilityMath.rampCorrectedTimeS(t, 8);
            assertEquals(t, MobilityMath.rawTimeS(corrected, 8), 1e-12);
        }
    }

    @Test
    void rejectsInvalidArguments() {
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.rampCorrectedTimeS(0, 5));
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.rampCorrectedTimeS(100, -1));
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.apparentMobility(60, 50, 25, 300));
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.apparentMobility(50, 60, 0, 300));
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.apparentMobility(50, 60, 25, -1));
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.limitingMobility(76.31, 0));
    }

    @Test
    void chlorideLimitingMobilityFromItsConductivity() {
        // CRC Handbook, "Ionic conductivity and diffusion at infinite dilution" (Vanýsek), 25 °C:
        // λ(Cl⁻) = 76.31 S cm²/mol (from memory). μ = 76.31e-4/96485.33 m²/(V s) = 79.09e-9, negative for an anion.
        assertEquals(-79.09, MobilityMath.limitingMobility(76.31, -1), HANDBOOK_RELATIVE * 79.09);
    }

    @Test
    void sulfateLimitingMobilityRespectsThePerChargeConvention() {
        // CRC Handbook, same table: λ(½SO₄²⁻) = 80.0 S cm²/mol per unit charge (from memory); the table
        // heading states values are "per unit charge". Molar λ(SO₄²⁻) = 2·80.0 = 160.0 S cm²/mol.
        // μ = λ(½SO₄²⁻)/F = 80.0e-4/96485.33 = 82.91e-9 m²/(V s).
        double fromTable = MobilityMath.limitingMobilityPerCharge(80.0, -2);
        double fromMolar = MobilityMath.limitingMobility(160.0, -2);
        assertEquals(-82.91, fromTable, HANDBOOK_RELATIVE * 82.91);
        assertEquals(fromMolar, fromTable, EXACT);
        // Treating the table value as molar would halve the mobility: the trap this API guards against.
        assertEquals(-41.46, MobilityMath.limitingMobility(80.0, -2), HANDBOOK_RELATIVE * 41.46);
    }

    @Test
    void cationsComeOutPositive() {
        // λ(Na⁺) = 50.08 S cm²/mol at 25 °C, CRC Handbook (from memory): μ = 51.90e-9 m²/(V s).
        assertEquals(51.90, MobilityMath.limitingMobility(50.08, 1), HANDBOOK_RELATIVE * 51.90);
    }

    @Test
    void temperatureConversionIsTheViscosityRatio() {
        double at25 = -79.09;
        double at20 = MobilityMath.atTemperature(at25, 25, 20);
        assertEquals(at25 * WaterViscosity.mPaS(25) / WaterViscosity.mPaS(20), at20, EXACT);
        // Against table viscosities (IAPWS 2008 / CRC Handbook, from memory): η(25) = 0.8900, η(20) = 1.0016 mPa s.
        assertEquals(at25 * 0.8900 / 1.0016, at20, VISCOSITY_RATIO_RELATIVE * Math.abs(at20));
        // About 2 % per kelvin near 25 °C (common practice).
        double perKelvin = (1 - at20 / at25) / 5;
        assertTrue(perKelvin > 0.018 && perKelvin < 0.026, "per kelvin " + perKelvin);
        // There and back again.
        assertEquals(at25, MobilityMath.atTemperature(at20, 20, 25), 1e-12);
        assertEquals(at25, MobilityMath.atTemperature(at25, 25, 25), EXACT);
    }

    @Test
    void temperatureConversionRejectsTemperaturesWithoutLiquidWater() {
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.atTemperature(40, 25, 120));
        assertThrows(IllegalArgumentException.class, () -> MobilityMath.atTemperature(40, Double.NaN, 25));
    }
}
