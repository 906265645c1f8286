package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.Units;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.SpeciesModel;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.mobility.MobilityMath;

class ReferenceIonsTest {

    /** Rounding of the shipped values to 0.01 mobility units. */
    private static final double ROUNDING = 0.005 + 1e-9;

    private static Path shipped() {
        // tests run in app-core/; the library lives at the project root
        Path p = Path.of("..").resolve(ReferenceIons.SHIPPED_LIBRARY);
        if (!Files.exists(p)) {
            p = Path.of(ReferenceIons.SHIPPED_LIBRARY);
        }
        return p;
    }

    private static Library library() throws InputException {
        return LibraryCsv.read(shipped());
    }

    @Test
    void shippedLibraryHasAtLeastFortyRowsEachWithASource() throws InputException {
        Library lib = library();
        assertTrue(lib.size() >= 40, "rows: " + lib.size());
        for (LibraryEntry e : lib.entries()) {
            assertNotNull(e.source(), e.name());
            assertFalse(e.source().isBlank(), e.name());
            assertTrue(e.charge() != 0, e.name() + " has a charge");
            assertEquals(25.0, e.temperatureOrDefaultC(), 0.0, e.name());
        }
    }

    /**
     * Handbook limiting conductivities at 25 °C, S cm²/mol (CRC Handbook, "Ionic conductivity and
     * diffusion at infinite dilution"): Cl⁻ 76.31 and NO₃⁻ 71.42 and Na⁺ 50.08 (from memory),
     * K⁺ 73.48, ½Ca²⁺ 59.47, ½Mg²⁺ 53.0 (read in a stored copy of the 87th-edition table).
     */
    @Test
    void handbookRowsConvertCorrectly() throws InputException {
        Library lib = library();
        assertEquals(-Units.mobilityFromConductivity(76.31, -1), lib.find("chloride").orElseThrow().mobility(), ROUNDING);
        assertEquals(-Units.mobilityFromConductivity(71.42, -1), lib.find("nitrate").orElseThrow().mobility(), ROUNDING);
        assertEquals(Units.mobilityFromConductivity(50.08, 1), lib.find("sodium").orElseThrow().mobility(), ROUNDING);
        assertEquals(Units.mobilityFromConductivity(73.48, 1), lib.find("potassium").orElseThrow().mobility(), ROUNDING);
        // per-charge convention for divalent ions: molar λ = 2 × the tabulated ½Ca²⁺ value
        assertEquals(Units.mobilityFromConductivity(2 * 59.47, 2), lib.find("calcium").orElseThrow().mobility(), ROUNDING);
        assertEquals(MobilityMath.limitingMobilityPerCharge(53.0, 2), lib.find("magnesium").orElseThrow().mobility(),
                ROUNDING);
        // ½SO4²⁻ 80.0 (CRC, from memory)
        assertEquals(MobilityMath.limitingMobilityPerCharge(80.0, -2), lib.find("sulfate").orElseThrow().mobility(),
                ROUNDING);
    }

    @Test
    void sodiumAgreesWithOtherCompilations() throws InputException {
        // Na+ 50.10 (Robinson & Stokes, Appendix 6.2, as quoted in PMC2576370 Table 5, read);
        // 50.11 (Lange's Handbook, Table 8.32, read)
        double mu = library().find("sodium").orElseThrow().mobility();
        assertEquals(Units.mobilityFromConductivity(50.10, 1), mu, 0.05);
        assertEquals(Units.mobilityFromConductivity(50.11, 1), mu, 0.05);
    }

    @Test
    void everyRowBecomesAConsistentModel() throws InputException {
        Map<String, SpeciesModel> models = ReferenceIons.read(shipped());
        assertEquals(library().size(), models.size());
        SpeciesModel phosphate = models.get("phosphate");
        assertEquals(0, phosphate.highestCharge());
        assertEquals(4, phosphate.formCount());
        assertEquals(-3, phosphate.charge(3));
        SpeciesModel sulfate = models.get("sulfate");
        assertEquals(-1, sulfate.highestCharge());
        SpeciesModel ammonium = models.get("ammonium");
        assertEquals(1, ammonium.highestCharge());
        assertEquals(0, ammonium.charge(1));
        SpeciesModel chloride = models.get("chloride");
        assertEquals(1, chloride.formCount());
        assertEquals(-1, chloride.highestCharge());
        // the most charged form carries the row's mobility
        for (LibraryEntry e : library().entries()) {
            SpeciesModel m = models.get(e.name());
            double top = e.charge() < 0 ? m.limitingMobilities().get(m.formCount() - 1) : m.limitingMobilities().get(0);
            assertEquals(e.mobility(), top, 1e-12, e.name());
        }
    }

    @Test
    void shippedAcetateAtItsPkaPredictsHalfItsMobility() throws InputException {
        SpeciesModel acetate = ReferenceIons.read(shipped()).get("acetate");
        double mu = MobilityPredictor.effectiveMobility(acetate, BufferConditions.infiniteDilution(4.76));
        assertEquals(acetate.limitingMobilities().get(1) / 2, mu, 1e-9);
    }

    @Test
    void inconsistentEntriesAreInputErrors() {
        LibraryEntry noCharge = LibraryEntry.of("x", -40.0, Double.NaN);
        InputException e = assertThrows(InputException.class, () -> ReferenceIons.model(noCharge, "lib.csv"));
        assertEquals("charge", e.field());
        assertEquals("lib.csv", e.file());
        LibraryEntry wrongCount = new LibraryEntry("y", -40.0, Double.NaN, 0, -1, Double.NaN, List.of(4.0, 5.0),
                List.of(0.0, -40.0), null, Double.NaN, Double.NaN, Double.NaN, null);
        assertThrows(InputException.class, () -> ReferenceIons.model(wrongCount, "lib.csv"));
        LibraryEntry wrongSign = new LibraryEntry("z", -40.0, Double.NaN, 0, -1, Double.NaN, List.of(4.0),
                List.of(0.0, 40.0), null, Double.NaN, Double.NaN, Double.NaN, null);
        assertThrows(InputException.class, () -> ReferenceIons.model(wrongSign, "lib.csv"));
        LibraryEntry noMobilities = new LibraryEntry("w", -40.0, Double.NaN, 0, -1, Double.NaN, List.of(4.0),
                List.of(), null, Double.NaN, Double.NaN, Double.NaN, null);
        assertThrows(InputException.class, () -> ReferenceIons.model(noMobilities, "lib.csv"));
    }

    @Test
    void strongIonFromMobilityAloneAndOtherTemperatures() throws InputException {
        LibraryEntry warm = new LibraryEntry("k", 90.0, Double.NaN, 0, 1, Double.NaN, List.of(), List.of(),
                null, Double.NaN, Double.NaN, 35.0, null);
        SpeciesModel m = ReferenceIons.model(warm, "lib.csv");
        assertEquals(MobilityMath.atTemperature(90.0, 35.0, 25.0), m.limitingMobilities().get(0), 1e-12);
    }
}
