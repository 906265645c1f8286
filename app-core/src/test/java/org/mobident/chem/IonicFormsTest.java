package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.buffer.SpeciesModel;

class IonicFormsTest {

    private static final double TIGHT = 1e-12;

    /** Acetic acid pKa 4.76 at 25 °C (CRC Handbook, dissociation constants of organic acids; from memory). */
    private static final double ACETIC_PKA = 4.76;

    /** Phosphoric acid pKa 2.15, 7.20, 12.35 at 25 °C (CRC Handbook, inorganic acids; from memory). */
    private static final double[] PHOSPHORIC_PKA = {2.15, 7.20, 12.35};

    @Test
    void monoproticAcidIsHalfDissociatedAtItsPka() {
        double[] a = IonicForms.fractions(new double[] {ACETIC_PKA}, ACETIC_PKA);
        assertArrayEquals(new double[] {0.5, 0.5}, a, TIGHT);
    }

    @Test
    void monoproticAcidFollowsHendersonHasselbalch() {
        // one pH unit above the pKa: [A-]/[HA] = 10, so alpha(A-) = 10/11
        double[] a = IonicForms.fractions(new double[] {ACETIC_PKA}, ACETIC_PKA + 1.0);
        assertEquals(10.0 / 11.0, a[1], TIGHT);
    }

    /**
     * Triprotic fractions against the textbook closed form (e.g. Harris, Quantitative Chemical
     * Analysis, fractional composition of a triprotic acid): with h = [H+] and K1..K3,
     * D = h³ + K1h² + K1K2h + K1K2K3, α0 = h³/D, α1 = K1h²/D, α2 = K1K2h/D, α3 = K1K2K3/D.
     */
    @Test
    void phosphoricAcidMatchesTheExplicitPolynomial() {
        double k1 = Math.pow(10, -PHOSPHORIC_PKA[0]);
        double k2 = Math.pow(10, -PHOSPHORIC_PKA[1]);
        double k3 = Math.pow(10, -PHOSPHORIC_PKA[2]);
        for (double pH = 0.0; pH <= 14.0; pH += 0.25) {
            double h = Math.pow(10, -pH);
            double d = h * h * h + k1 * h * h + k1 * k2 * h + k1 * k2 * k3;
            double[] expected = {h * h * h / d, k1 * h * h / d, k1 * k2 * h / d, k1 * k2 * k3 / d};
            double[] got = IonicForms.fractions(PHOSPHORIC_PKA, pH);
            assertArrayEquals(expected, got, 1e-12, "pH " + pH);
        }
    }

    @Test
    void phosphateIsMostlyDihydrogenPhosphateAtPh4p7() {
        // halfway between pKa1 and pKa2 the monoanion dominates (> 99 %)
        double[] a = IonicForms.fractions(PHOSPHORIC_PKA, (PHOSPHORIC_PKA[0] + PHOSPHORIC_PKA[1]) / 2);
        assertTrue(a[1] > 0.99, "alpha(H2PO4-) = " + a[1]);
    }

    @Test
    void extremePkaDistancesNeitherOverflowNorLoseTheSum() {
        double[] pKa = {-30.0, 1.0, 60.0};
        double[] a = IonicForms.fractions(pKa, 7.0);
        double sum = 0;
        for (double v : a) {
            assertTrue(Double.isFinite(v) && v >= 0.0);
            sum += v;
        }
        assertEquals(1.0, sum, TIGHT);
        // pH − pKa2 = 6: form 1 is 1e-6 of form 2; form 3 is 1e-53 of it
        assertEquals(1e-6, a[1] / a[2], 1e-15);
        assertEquals(0.0, a[3], 1e-50);
    }

    @Test
    void strongElectrolyteHasOneFormFullyPresent() {
        assertArrayEquals(new double[] {1.0}, IonicForms.fractions(new double[0], 3.0), TIGHT);
    }

    @Test
    void rejectsNonFiniteInput() {
        assertThrows(IllegalArgumentException.class, () -> IonicForms.fractions(new double[] {4.0}, Double.NaN));
        assertThrows(IllegalArgumentException.class,
                () -> IonicForms.fractions(new double[] {Double.POSITIVE_INFINITY}, 4.0));
    }

    @Test
    void speciesModelChargesRunDownFromTheHighest() {
        // glycine: pKa 2.34 and 9.60 (CRC Handbook, amino acids; from memory); H2Gly+, HGly±, Gly-
        SpeciesModel glycine = new SpeciesModel("glycine", 1, List.of(2.34, 9.60), List.of(30.0, 0.0, -30.0));
        assertEquals(1, glycine.charge(0));
        assertEquals(0, glycine.charge(1));
        assertEquals(-1, glycine.charge(2));
    }

    @Test
    void speciesModelRejectsInconsistentInput() {
        assertThrows(IllegalArgumentException.class,
                () -> SpeciesModel.acid("x", List.of(5.0, 4.0), List.of(-30.0, -50.0)));
        assertThrows(IllegalArgumentException.class,
                () -> SpeciesModel.acid("x", List.of(4.0), List.of(-30.0, -50.0)));
        assertThrows(IllegalArgumentException.class,
                () -> SpeciesModel.acid("x", List.of(4.0), List.of(30.0)));
        assertThrows(IllegalArgumentException.class,
                () -> new SpeciesModel("x", 0, List.of(4.0), List.of(1.0, -30.0)));
        assertThrows(IllegalArgumentException.class, () -> SpeciesModel.strong("x", 0, 10.0));
    }
}
