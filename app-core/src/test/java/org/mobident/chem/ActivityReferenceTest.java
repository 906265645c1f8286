package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ActivityReferenceTest {

    private static final double T25 = 25.0;

    /**
     * Debye–Hückel A on the molar scale at 25 °C: 0.5115 (mol/L)^-1/2, Robinson &amp; Stokes,
     * Electrolyte Solutions, Appendix 7.1 (from memory).
     */
    private static final double A_ROBINSON_STOKES_25C = 0.5115;

    /** The rounded A = 0.509 at 25 °C quoted with the Davies equation (KTH Eq-Diagr/SPANA documentation, read). */
    private static final double A_COMMON_25C = 0.509;

    @Test
    void debyeHuckelAAt25C() {
        assertEquals(A_ROBINSON_STOKES_25C, Activity.debyeHuckelA(T25), 0.001);
        assertEquals(A_COMMON_25C, Activity.debyeHuckelA(T25), 0.004);
    }

    @Test
    void debyeHuckelAGrowsWithTemperature() {
        // Robinson & Stokes Appendix 7.1 (from memory): A ≈ 0.4918 at 0 °C (molar scale)
        assertEquals(0.4918, Activity.debyeHuckelA(0.0), 0.003);
        double previous = 0.0;
        for (double t = 0.0; t <= 100.0; t += 10.0) {
            double a = Activity.debyeHuckelA(t);
            assertTrue(a > previous, "A rises with temperature (ε·T falls): " + t + " °C");
            previous = a;
        }
    }

    @Test
    void inverseDebyeLengthAt25C() {
        // κ = 3.29 nm^-1 · √(I / mol L^-1) at 25 °C (Debye length 0.304 nm at 1 mol/L; Israelachvili,
        // Intermolecular and Surface Forces, ch. 14; from memory)
        assertEquals(3.29e9, Activity.inverseDebyeLengthPerRootMolar(T25), 0.01e9);
    }

    @Test
    void waterDielectricConstant() {
        // Malmberg & Maryott, J. Res. NBS 56 (1956) 1: 87.74 at 0 °C, 78.30 at 25 °C, 55.72 at 100 °C (from memory)
        assertEquals(87.74, WaterDielectric.relativePermittivity(0.0), 0.01);
        assertEquals(78.30, WaterDielectric.relativePermittivity(25.0), 0.02);
        assertEquals(55.72, WaterDielectric.relativePermittivity(100.0), 0.05);
        assertThrows(IllegalArgumentException.class, () -> WaterDielectric.relativePermittivity(-1.0));
    }

    /**
     * Davies equation as printed (Davies, Ion Association, 1962, p. 41):
     * log10 γ = −A z² (√I/(1+√I) − 0.3 I), evaluated here by hand with A = 0.5115.
     */
    @Test
    void daviesCoefficientsMatchTheEquationAsPrinted() {
        double[] strengths = {0.001, 0.01, 0.1};
        int[] charges = {1, 2};
        for (int z : charges) {
            for (double i : strengths) {
                double root = Math.sqrt(i);
                double expected = -A_ROBINSON_STOKES_25C * z * z * (root / (1 + root) - 0.3 * i);
                assertEquals(expected, Activity.daviesLog10Gamma(z, i, T25), 2e-4 * z * z,
                        "z=" + z + " I=" + i);
            }
        }
    }

    @Test
    void daviesCoefficientsHandValues() {
        // written out: z=1, I=0.01: √I=0.1, 0.1/1.1 − 0.003 = 0.087909; × 0.5115 → log γ = −0.044966, γ = 0.9017
        assertEquals(0.9017, Math.pow(10, Activity.daviesLog10Gamma(1, 0.01, T25)), 3e-4);
        // z=2, I=0.1: √I=0.31623, 0.31623/1.31623 − 0.03 = 0.210253; × 4 × 0.5115 → −0.430178, γ = 0.3713
        assertEquals(0.3713, Math.pow(10, Activity.daviesLog10Gamma(2, 0.1, T25)), 1.5e-3);
        // Kielland's table (J. Am. Chem. Soc. 59 (1937) 1675; from memory) gives γ ≈ 0.96–0.97 for univalent
        // ions at I = 0.001 and 0.38–0.40 for divalent ions at 0.1: Davies agrees within a few per cent
        assertEquals(0.965, Math.pow(10, Activity.daviesLog10Gamma(-1, 0.001, T25)), 0.005);
        assertEquals(0.39, Math.pow(10, Activity.daviesLog10Gamma(2, 0.1, T25)), 0.03);
    }

    @Test
    void neutralSpeciesAndZeroIonicStrengthAreIdeal() {
        assertEquals(0.0, Activity.daviesLog10Gamma(0, 0.1, T25), 0.0);
        assertEquals(0.0, Activity.daviesLog10Gamma(3, 0.0, T25), 0.0);
        assertThrows(IllegalArgumentException.class, () -> Activity.daviesLog10Gamma(1, -0.01, T25));
    }

    @Test
    void mixedPkaOfANeutralAcidFallsAndOfACationicAcidRises() {
        double f = Math.sqrt(0.1) / (1 + Math.sqrt(0.1)) - 0.03;
        double a = Activity.debyeHuckelA(T25);
        // acetic acid (HA^0 -> A^-): pKa' = pKa + log γ(−1) − log γ(0) = pKa − A f
        assertEquals(4.76 - a * f, Activity.mixedPka(4.76, 0, 0.1, T25), 1e-12);
        // ammonium (BH+ -> B): pKa' = pKa + 0 − log γ(+1) = pKa + A f
        assertEquals(9.25 + a * f, Activity.mixedPka(9.25, 1, 0.1, T25), 1e-12);
        // H2PO4- -> HPO4 2-: log γ(−2) − log γ(−1) = −3 A f
        assertEquals(7.20 - 3 * a * f, Activity.mixedPka(7.20, -1, 0.1, T25), 1e-12);
        assertTrue(Activity.mixedPka(7.20, -1, 0.1, T25) < 7.0, "phosphate pKa2' at 0.1 M is near 6.9");
    }
}
