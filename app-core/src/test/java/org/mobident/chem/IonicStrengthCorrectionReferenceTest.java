package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.mobident.Units;

class IonicStrengthCorrectionReferenceTest {

    private static final double T25 = 25.0;

    /** Limiting conductivities, S cm²/mol, 25 °C: K+ 73.48 (CRC Handbook, read), Cl- 76.31 (CRC, from memory). */
    private static final double LAMBDA_K = 73.48;
    private static final double LAMBDA_CL = 76.31;

    /**
     * Onsager limiting law for 1:1 electrolytes in water at 25 °C, Λ = Λ⁰ − (A + BΛ⁰)√c with
     * A = 60.20 S cm² mol⁻¹ (mol/L)^-1/2 and B = 0.2289 (mol/L)^-1/2 (Robinson &amp; Stokes,
     * Electrolyte Solutions; from memory). Those were computed with ε = 78.54 and an older water
     * viscosity; with ε = 78.30 (Malmberg &amp; Maryott) the theory gives 0.5 % and 0.8 % more.
     */
    private static final double KOHLRAUSCH_A = 60.20;
    private static final double KOHLRAUSCH_B = 0.2289;

    @Test
    void limitingLawCoefficientsMatchRobinsonAndStokes() {
        double b1 = IonicStrengthCorrection.relaxationCoefficient(1, T25);
        double b2Conductance = 2 * IonicStrengthCorrection.electrophoreticCoefficient(1, T25) * 1e-9
                * Units.FARADAY_C_PER_MOL * 1e4; // both ions; m²/(V s) · C/mol → S m²/mol → S cm²/mol
        assertEquals(KOHLRAUSCH_B, b1, 0.01 * KOHLRAUSCH_B);
        assertEquals(KOHLRAUSCH_A, b2Conductance, 0.01 * KOHLRAUSCH_A);
    }

    /** Molar conductivity of KCl from the two ions' actual mobilities, S cm²/mol. */
    private static double kclConductivity(double c, double ionSizeNm) {
        double muK = IonicStrengthCorrection.actualMobility(
                Units.mobilityFromConductivity(LAMBDA_K, 1), 1, c, T25, ionSizeNm);
        double muCl = -IonicStrengthCorrection.actualMobility(
                -Units.mobilityFromConductivity(LAMBDA_CL, 1), -1, c, T25, ionSizeNm);
        return (muK + muCl) * 1e-9 * Units.FARADAY_C_PER_MOL * 1e4;
    }

    @Test
    void withZeroIonSizeItIsTheKohlrauschLimitingLaw() {
        double c = 1e-4;
        double lambda0 = LAMBDA_K + LAMBDA_CL;
        double expected = lambda0 - (KOHLRAUSCH_A + KOHLRAUSCH_B * lambda0) * Math.sqrt(c);
        // the slope itself agrees to 1 %; at 0.1 mmol/L that is 0.01 S cm²/mol in Λ
        assertEquals(expected, kclConductivity(c, 0.0), 0.02);
    }

    /**
     * Molar conductivity of KCl at 25 °C, S cm²/mol: 146.9 at 0.001 M, 141.2 at 0.01 M, 128.9 at
     * 0.1 M (CRC Handbook, "Equivalent conductivity of electrolytes in aqueous solution"; from memory).
     */
    @Test
    void reproducesTheMolarConductivityOfPotassiumChloride() {
        assertEquals(146.9, kclConductivity(0.001, IonicStrengthCorrection.DEFAULT_ION_SIZE_NM), 0.005 * 146.9);
        assertEquals(141.2, kclConductivity(0.01, IonicStrengthCorrection.DEFAULT_ION_SIZE_NM), 0.005 * 141.2);
        assertEquals(128.9, kclConductivity(0.1, IonicStrengthCorrection.DEFAULT_ION_SIZE_NM), 0.01 * 128.9);
    }

    @Test
    void keepsSignLowersMagnitudeAndLeavesNeutralFormsAlone() {
        double muCl = -79.09;
        double actual = IonicStrengthCorrection.actualMobility(muCl, -1, 0.02, T25);
        assertTrue(actual < 0 && actual > muCl, "chloride at 20 mM: " + actual);
        assertEquals(muCl, IonicStrengthCorrection.actualMobility(muCl, -1, 0.0, T25), 0.0);
        assertEquals(0.0, IonicStrengthCorrection.actualMobility(0.0, 0, 0.1, T25), 0.0);
        // never past zero, even where the formula would overshoot
        assertEquals(0.0, IonicStrengthCorrection.actualMobility(2.0, 3, 0.5, T25), 0.0);
        assertThrows(IllegalArgumentException.class,
                () -> IonicStrengthCorrection.actualMobility(-50, -1, -0.1, T25));
    }

    @Test
    void multivalentIonsLoseMoreThanUnivalentOnes() {
        double i = 0.05;
        double uni = IonicStrengthCorrection.actualMobility(-80, -1, i, T25) / -80;
        double di = IonicStrengthCorrection.actualMobility(-80, -2, i, T25) / -80;
        assertTrue(di < uni, "relative actual mobility z=2 " + di + " vs z=1 " + uni);
    }

    @Test
    void electrophoreticTermScalesWithCharge() {
        assertEquals(2 * IonicStrengthCorrection.electrophoreticCoefficient(1, T25),
                IonicStrengthCorrection.electrophoreticCoefficient(-2, T25), 1e-12);
        // Onsager's q = 1/2 for a symmetric univalent pair
        assertEquals(0.5, IonicStrengthCorrection.onsagerQ(1), 1e-15);
    }

    /**
     * For multivalent ions the correction lowers more, not less, than the empirical
     * μ = μ⁰·exp(−0.77·√(|z|·I)) (Friedl, Reijenga &amp; Kenndler, J. Chromatogr. A 709 (1995) 163,
     * from memory): at I = 0.05 mol/L, 25 °C and μ⁰ = 60 units, 25 % against 22 % for z = 2 and
     * 37 % against 26 % for z = 3 (the empirical percentages computed from that formula; ours as
     * the class javadoc states them).
     */
    @Test
    void multivalentIonsAreLoweredMoreThanTheEmpiricalFormula() {
        double mu0 = 60.0;
        double ionicStrength = 0.05;
        for (int z = 2; z <= 3; z++) {
            double ours = IonicStrengthCorrection.actualMobility(mu0, z, ionicStrength, 25.0) / mu0;
            double empirical = Math.exp(-0.77 * Math.sqrt(z * ionicStrength));
            assertTrue(ours < empirical, "z = " + z + ": " + ours + " vs " + empirical);
        }
        assertEquals(0.75, IonicStrengthCorrection.actualMobility(mu0, 2, ionicStrength, 25.0) / mu0, 0.01);
        assertEquals(0.63, IonicStrengthCorrection.actualMobility(mu0, 3, ionicStrength, 25.0) / mu0, 0.01);
    }
}
