package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.buffer.SpeciesModel;

class PkaTemperatureTest {

    private static IonisationEnthalpies shipped() throws InputException {
        Path p = Path.of("..").resolve(IonisationEnthalpies.SHIPPED_TABLE);
        return IonisationEnthalpies.read(Files.exists(p) ? p : Path.of(IonisationEnthalpies.SHIPPED_TABLE));
    }

    private static SpeciesModel tris() {
        // TrisH+ ⇌ Tris + H+, pKa 8.072 at 25 °C (Goldberg, Kishore & Lennen 2002, from memory)
        return SpeciesModel.base("Tris", List.of(8.072), List.of(29.5));
    }

    /**
     * Tris at 37 °C, against an outside value: ΔrH° = 47.53 kJ/mol and ΔrCp° = −67 J/(K mol) for the
     * ionisation (J. Solution Chem. 16 (1987), doi 10.1007/BF00646335, abstract, read; given there for
     * the association, with the opposite sign) put pKa(37 °C) − pKa(25 °C) at −0.3249 by the same
     * van 't Hoff form (computed by hand from those numbers: −0.32218 from ΔH, −0.00269 from ΔCp).
     * The shipped table's values (from memory) must agree within 0.005. The measured slope of about
     * −0.028 pKa units per kelvin near 25 °C (Good et al., Biochemistry 5 (1966) 467, from memory,
     * give −0.031) bounds it from outside too.
     */
    @Test
    void trisAt37DegreesFollowsTheTabulatedEnthalpy() throws InputException {
        SpeciesModel warm = shipped().atTemperature(tris(), 37.0);
        double shift = warm.pKa().get(0) - 8.072;
        assertEquals(-0.3249, shift, 0.005);
        assertEquals(8.072 - 0.3249, PkaTemperature.pKaAt(8.072, 47.53, -67, 37.0), 1e-4);
        assertTrue(shift / 12.0 < -0.025 && shift / 12.0 > -0.034, "slope " + shift / 12.0);
    }

    /** Acetic acid barely moves: ΔrH° −0.41 kJ/mol (Goldberg et al. 2002, from memory), so |ΔpKa| < 0.01 over 12 K. */
    @Test
    void carboxylicAcidsBarelyMove() throws InputException {
        SpeciesModel acetic = SpeciesModel.acid("acetate", List.of(4.756), List.of(-42.39));
        SpeciesModel warm = shipped().atTemperature(acetic, 37.0);
        assertEquals(4.756, warm.pKa().get(0), 0.01);
        assertTrue(shipped().steps(acetic).get(0).tabulated());
    }

    /** Written out: with ΔCp = 0 the shift is ΔH/(R ln10)·(1/T − 1/θ). */
    @Test
    void formulaWrittenOut() {
        double expected = 50_000.0 / (8.314462618 * Math.log(10)) * (1 / 310.15 - 1 / 298.15);
        assertEquals(5.0 + expected, PkaTemperature.pKaAt(5.0, 50.0, Double.NaN, 37.0), 1e-12);
        assertEquals(5.0, PkaTemperature.pKaAt(5.0, 50.0, -100, 25.0), 1e-12);
    }

    /** An amine missing from the table gets the class value, 45 ± 15 kJ/mol (common practice), and says so. */
    @Test
    void missingEnthalpyFallsBackWithAStatedUncertainty() throws InputException {
        SpeciesModel amine = SpeciesModel.base("some amine", List.of(10.0), List.of(40.0));
        PkaTemperature.Step s = shipped().steps(amine).get(0);
        assertFalse(s.tabulated());
        assertEquals(PkaTemperature.CATIONIC_ACID_ENTHALPY_KJ, s.enthalpyKjPerMol());
        double sdTris = shipped().shiftSd(tris(), 25, 37);
        double sdAmine = shipped().shiftSd(amine, 25, 37);
        assertTrue(sdAmine > 5 * sdTris, sdAmine + " vs " + sdTris);
        // 15 kJ/mol over 25 → 37 °C: 15000/(R ln10)·(1/298.15 − 1/310.15) = 0.1017
        assertEquals(0.1017, sdAmine, 5e-4);
        SpeciesModel acid = SpeciesModel.acid("some acid", List.of(4.0), List.of(-30.0));
        assertEquals(0.0, shipped().steps(acid).get(0).enthalpyKjPerMol());
    }

    /**
     * A Tris buffer adjusted to pH 8.10 at 25 °C runs at about pH 7.78 at 37 °C (the shift above); a
     * phosphate buffer hardly moves: the equimolal phosphate pH standard reads 6.865 at 25 °C and
     * 6.840 at 37 °C (Bates, Determination of pH, 1973, table of standard values, from memory), a
     * shift of −0.025, which the second step's enthalpy must reproduce within 0.015.
     */
    @Test
    void buffersOwnPhFollowsItsBufferingStep() throws InputException {
        assertEquals(8.10 - 0.3249, BufferPh.pHAt(tris(), shipped(), 8.10, 25, 37), 0.006);
        SpeciesModel phosphate = SpeciesModel.acid("phosphate", List.of(2.148, 7.198, 12.35),
                List.of(-37.31, -59.08, -71.50));
        double warm = BufferPh.pHAt(phosphate, shipped(), 6.865, 25, 37);
        assertEquals(6.840, warm, 0.015);
        assertTrue(warm < 6.865, "a positive enthalpy lowers the pH on warming");
        assertEquals(7.2, BufferPh.pHAt(SpeciesModel.strong("chloride", -1, -79.1), shipped(), 7.2, 25, 37));
    }
}
