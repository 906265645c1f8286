package org.mobident.recheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.SpeciesModel;
import org.mobident.chem.MobilityPredictor;
import org.mobident.chem.ReferenceIons;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

class BufferTransferTest {

    /** Acetic acid pKa 4.76 (CRC Handbook, 'Dissociation constants of organic acids and bases', from memory). */
    static final double ACETIC_PKA = 4.76;
    /** Acetate: λ 40.9 S cm²/mol (CRC Handbook, 'Ionic conductivity and diffusion at infinite dilution', from memory) → −42.39. */
    static final double ACETATE_MU = -42.39;
    /** Phosphoric acid pKa 2.15, 7.20, 12.35 (CRC Handbook, from memory). */
    static final List<Double> PHOSPHATE_PKA = List.of(2.15, 7.20, 12.35);
    /** H₂PO₄⁻, HPO₄²⁻, PO₄³⁻ limiting mobilities of the shipped reference library (CRC Handbook; Hirokawa et al. 1983; from memory). */
    static final double[] PHOSPHATE_MU = {0.0, -37.31, -59.08, -71.50};

    private static final double TIGHT = 1e-9;

    static LibraryEntry entry(String name, double mu, double sd, int n, int charge, List<Double> pKa,
                              List<Double> limiting, double pH, double ionicMm, double tC) {
        return new LibraryEntry(name, mu, sd, n, charge, Double.NaN, pKa, limiting, "A", pH, ionicMm, tC, "test");
    }

    static SpeciesModel acetic() {
        return SpeciesModel.acid("acetic acid", List.of(ACETIC_PKA), List.of(ACETATE_MU));
    }

    @Test
    void aceticAcidMeasuredAtPh55KeepsHalfItsCalibratedLimitingMobilityAtThePka() {
        // written out: α(pH 5.5) = 1/(1 + 10^(pKa − pH)) at infinite dilution
        double alphaA = 1.0 / (1.0 + Math.pow(10, ACETIC_PKA - 5.5));
        double calibration = 0.95; // the lab's measured value is 5 % below the handbook model
        double measured = calibration * alphaA * ACETATE_MU;
        LibraryEntry e = entry("acetate", measured, 0.3, 8, -1, List.of(ACETIC_PKA), List.of(0.0, ACETATE_MU),
                5.5, 0, 25);
        PredictedMobility p = BufferTransfer.withoutReference().predict(e, BufferSpec.of("A", 5.5, 0, 25),
                BufferSpec.of("B", ACETIC_PKA, 0, 25), "lib");
        assertEquals(PredictedMobility.Method.RATIO, p.method());
        assertEquals(PredictionBasis.ENTRY_MODEL, p.basis());
        assertEquals(calibration * 0.5 * ACETATE_MU, p.predicted(), 1e-9, "½ of the anchored limiting mobility");
        assertEquals(0.5 / alphaA, p.slope(), 1e-9);
        assertEquals(-0.5, p.meanChargeB(), 1e-9);
        // the pKa uncertainty (±0.05) dominates at the pKa: |dμ/dpKa| = |μ|·ln10/4 there, but the anchor at
        // pH 5.5 also depends on the pKa, so the transfer's sensitivity is smaller than the absolute one
        double absolute = Math.abs(calibration * ACETATE_MU) * Math.log(10) / 4 * 0.05;
        assertTrue(p.modelUncertainty() > 0.1 && p.modelUncertainty() < absolute * 1.01, "model sd " + p.modelUncertainty());
        assertTrue(p.uncertainty() > p.modelUncertainty());
    }

    @Test
    void strongIonFrom25To30CScalesWithTheViscosityRatio() {
        // η(25 °C) = 0.8900 mPa·s, η(30 °C) = 0.7972 mPa·s: IAPWS 2008 (Huber et al., J. Phys. Chem. Ref.
        // Data 38 (2009) 101), liquid water at 0.1 MPa (from memory)
        double ratio = 0.8900 / 0.7972;
        LibraryEntry chloride = entry("chloride", -76.30, 0.4, 12, -1, List.of(), List.of(-79.09), 8.0, 0, 25);
        PredictedMobility p = BufferTransfer.withoutReference().predict(chloride, BufferSpec.of("A", 8, 0, 25),
                BufferSpec.of("A", 8, 0, 30), "lib");
        assertEquals(-76.30 * ratio, p.predicted(), 76.30 * ratio * 5e-4, "within 0.05 % of the IAPWS ratio");
        assertEquals(PredictedMobility.Method.RATIO, p.method());
        // Walden-rule term: 0.2 %/K × 5 K of |μ_B|; the limiting-mobility input cancels in the ratio
        assertEquals(BufferTransfer.WALDEN_RELATIVE_SD_PER_K * 5 * Math.abs(p.predicted()), p.modelUncertainty(), 1e-6);
        // and it is common to all analytes: compared with another one, only the spread is left
        assertEquals(p.modelUncertainty(), p.commonUncertainty(), 1e-12);
        assertEquals(Math.abs(p.slope()) * 0.4 * Math.sqrt(1 + 1.0 / 12), p.comparisonUncertainty(), 1e-9);

        // at a finite ionic strength in both buffers the ratio stays near the viscosity ratio
        PredictedMobility q = BufferTransfer.withoutReference().predict(chloride, BufferSpec.of("A", 8, 10, 25),
                BufferSpec.of("A", 8, 10, 30), "lib");
        assertEquals(ratio, q.predicted() / -76.30, ratio * 0.005);
    }

    @Test
    void phosphateAcrossPhAgainstAWrittenOutCalculation() {
        double k1 = Math.pow(10, -PHOSPHATE_PKA.get(0));
        double k2 = Math.pow(10, -PHOSPHATE_PKA.get(1));
        double k3 = Math.pow(10, -PHOSPHATE_PKA.get(2));
        java.util.function.DoubleUnaryOperator written = pH -> {
            double h = Math.pow(10, -pH);
            double d = h * h * h + k1 * h * h + k1 * k2 * h + k1 * k2 * k3;
            return (k1 * h * h * PHOSPHATE_MU[1] + k1 * k2 * h * PHOSPHATE_MU[2] + k1 * k2 * k3 * PHOSPHATE_MU[3]) / d;
        };
        double calibration = 0.97;
        double measured = calibration * written.applyAsDouble(7.0);
        LibraryEntry e = entry("phosphate", measured, 0.5, 6, -3, PHOSPHATE_PKA,
                List.of(PHOSPHATE_MU[0], PHOSPHATE_MU[1], PHOSPHATE_MU[2], PHOSPHATE_MU[3]), 7.0, 0, 25);
        BufferTransfer predictor = BufferTransfer.withoutReference();
        for (double pH = 2.0; pH <= 12.0; pH += 0.5) {
            PredictedMobility p = predictor.predict(e, BufferSpec.of("A", 7.0, 0, 25), BufferSpec.of("B", pH, 0, 25), "lib");
            assertEquals(calibration * written.applyAsDouble(pH), p.predicted(), 1e-9, "pH " + pH);
        }
    }

    @Test
    void barelyIonisedAnchorAddsTheModelChangeInsteadOfScaling() {
        BufferConditions a = new BufferConditions(2.5, 0, 25);
        BufferConditions b = new BufferConditions(6.0, 0, 25);
        double gA = MobilityPredictor.effectiveMobility(acetic(), a);
        double gB = MobilityPredictor.effectiveMobility(acetic(), b);
        double measured = gA - 0.2; // a small measured value, 0.2 units off the model
        LibraryEntry e = entry("acetate", measured, 0.3, 0, -1, List.of(ACETIC_PKA), List.of(0.0, ACETATE_MU),
                2.5, 0, 25);
        PredictedMobility p = BufferTransfer.withoutReference().predict(e, BufferSpec.of("A", a), BufferSpec.of("B", b), "lib");
        assertEquals(PredictedMobility.Method.DIFFERENCE, p.method());
        assertEquals(measured + gB - gA, p.predicted(), TIGHT);
        assertTrue(p.note().contains("barely ionised"), p.note());
    }

    @Test
    void noModelDataGivesViscosityOnlyWithALargerFlaggedUncertainty() {
        LibraryEntry unknown = LibraryEntry.of("compound X", -30.0, 0.3);
        LibraryEntry strong = entry("strong", -30.0, 0.3, 0, -1, List.of(), List.of(), 6, 0, 25);
        BufferSpec a = BufferSpec.of("A", 6, 0, 25);
        BufferSpec b = BufferSpec.of("B", 7, 0, 30);
        BufferTransfer predictor = BufferTransfer.withoutReference();
        PredictedMobility p = predictor.predict(unknown, a, b, "lib");
        PredictedMobility s = predictor.predict(strong, a, b, "lib");
        assertEquals(PredictionBasis.NO_MODEL, p.basis());
        assertEquals(PredictionBasis.CHARGE_ONLY, s.basis());
        assertEquals(s.predicted(), p.predicted(), 1e-9, "at I = 0 both are the viscosity ratio alone");
        assertTrue(p.uncertainty() > 2 * s.uncertainty(), p.uncertainty() + " vs " + s.uncertainty());
        assertTrue(p.note().contains("no model data") && p.note().contains("pH change is NOT accounted"), p.note());
        assertTrue(Double.isNaN(p.modelB()));
    }

    @Test
    void sameBufferReturnsTheMeasurementWithItsSpreadAsANewRun() {
        LibraryEntry e = entry("acetate", -40.0, 0.4, 4, -1, List.of(ACETIC_PKA), List.of(0.0, ACETATE_MU), 6, 10, 25);
        BufferSpec a = BufferSpec.of("A", 6, 10, 25);
        PredictedMobility p = BufferTransfer.withoutReference().predict(e, a, a, "lib");
        assertEquals(-40.0, p.predicted(), TIGHT);
        assertEquals(0.0, p.modelUncertainty(), 1e-9);
        assertEquals(0.4 * Math.sqrt(1 + 1.0 / 4), p.uncertainty(), 1e-9, "spread × √(1 + 1/n)");
        assertEquals(0.0, p.shiftUncertainty(), 1e-9);
    }

    @Test
    void referenceLibraryFillsInModelDataByName() throws Exception {
        Path shipped = Path.of("..").resolve(ReferenceIons.SHIPPED_LIBRARY);
        if (!Files.exists(shipped)) {
            shipped = Path.of(ReferenceIons.SHIPPED_LIBRARY);
        }
        BufferTransfer predictor = BufferTransfer.withReference(ReferenceIons.read(shipped));
        // no charge, no pKa in the entry: only its name links it to the reference acetate
        LibraryEntry e = LibraryEntry.of("Acetate", -41.3, 0.5);
        PredictedMobility p = predictor.predict(e, BufferSpec.of("A", 8, 0, 25), BufferSpec.of("B", 4.76, 0, 25), "lib");
        assertEquals(PredictionBasis.REFERENCE_MODEL, p.basis());
        assertEquals(-41.3 * 0.5, p.predicted(), 0.05, "about half at the pKa");
        // an entry whose own pKa/mobility lists do not fit (3 pKa, 3 mobilities) falls back on the reference
        LibraryEntry bad = entry("phosphate", -47.4, 0.8, 12, -2, PHOSPHATE_PKA, List.of(-35.1, -59.3, -71.5), 8, 0, 25);
        PredictedMobility q = predictor.predict(bad, BufferSpec.of("A", 8, 0, 25), BufferSpec.of("B", 7, 0, 25), "lib");
        assertEquals(PredictionBasis.REFERENCE_MODEL, q.basis());
        assertTrue(q.note().contains("not used"), q.note());
    }

    @Test
    void predictedLibraryCarriesBConditionsAndPredictedSpread() throws InputException {
        Library a = new Library(List.of(
                entry("acetate", -41.0, 0.3, 8, -1, List.of(ACETIC_PKA), List.of(0.0, ACETATE_MU), 8, 0, 25),
                entry("chloride", -76.3, 0.4, 12, -1, List.of(), List.of(-79.09), 8, 0, 25)), "a.csv", List.of());
        BufferSpec b = BufferSpec.of("B", 4.76, 0, 25);
        List<PredictedMobility> ps = BufferTransfer.withoutReference().predictAll(a, null, b);
        Library lb = BufferTransfer.asLibrary(ps, a, b);
        LibraryEntry ac = lb.find("acetate").orElseThrow();
        assertEquals(ps.get(0).predicted(), ac.mobility(), TIGHT);
        assertEquals(ps.get(0).uncertainty(), ac.mobilitySd(), TIGHT);
        assertEquals(0, ac.n());
        assertEquals(4.76, ac.pH(), TIGHT);
        assertEquals("B", ac.buffer());
        assertFalse(lb.notes().isEmpty());
    }

    /**
     * A Tris-like base measured at its pKa at 25 °C and predicted at 37 °C: with the shipped
     * enthalpy its pKa falls to 8.072 − 0.3249 (see PkaTemperatureTest for the outside check), so
     * the cation fraction falls from ½ to 1/(1 + 10^0.3249), on top of the viscosity ratio (written
     * out here at I = 0, where activities play no part).
     */
    @Test
    void warmerMethodMovesThePkaOfAnAmineBuffer() throws InputException {
        Path table = Path.of("..").resolve(org.mobident.chem.IonisationEnthalpies.SHIPPED_TABLE);
        Path shipped = Files.exists(table) ? table : Path.of(org.mobident.chem.IonisationEnthalpies.SHIPPED_TABLE);
        LibraryEntry tris = entry("Tris", 14.75, 0.2, 6, 1, List.of(8.072), List.of(29.5, 0.0), 8.072, 0, 25);
        BufferSpec a = BufferSpec.of("A", 8.072, 0, 25);
        BufferSpec b = BufferSpec.of("B", 8.072, 0, 37);
        PredictedMobility p = BufferTransfer.withoutReference().withEnthalpyTable(shipped).predict(tris, a, b, "lib");
        PredictedMobility read = BufferTransfer.withoutReference()
                .withEnthalpies(org.mobident.chem.IonisationEnthalpies.read(shipped)).predict(tris, a, b, "lib");
        assertEquals(read, p, "the table read by file is the table read beforehand");
        double pKa37 = org.mobident.chem.PkaTemperature.pKaAt(8.072, 47.45, -59, 37.0);
        double alpha37 = 1.0 / (1.0 + Math.pow(10, 8.072 - pKa37));
        double viscosity = org.mobident.mobility.MobilityMath.atTemperature(1.0, 25, 37);
        assertEquals(14.75 * alpha37 / 0.5 * viscosity, p.predicted(), 1e-6);
        assertEquals(0.321, alpha37, 0.005);
        // without the table the class value (45 kJ/mol) stands in, with a wider uncertainty and a remark
        PredictedMobility q = BufferTransfer.withoutReference().predict(tris, a, b, "lib");
        assertEquals(p.predicted(), q.predicted(), 0.5);
        assertTrue(q.modelUncertainty() > p.modelUncertainty(), q.modelUncertainty() + " vs " + p.modelUncertainty());
        assertTrue(q.note().contains("assumed enthalpy"), q.note());
        assertFalse(p.note().contains("assumed enthalpy"), p.note());
    }

    @Test
    void aMalformedEnthalpyTableIsRefusedNamingTheFile(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("ionisation-enthalpies.csv");
        Files.writeString(bad, "name,step,enthalpy_kj_per_mol\nTris,1,not-a-number\n");
        InputException e = assertThrows(InputException.class,
                () -> BufferTransfer.withoutReference().withEnthalpyTable(bad));
        assertTrue(e.getMessage().contains("ionisation-enthalpies.csv"), e.getMessage());
    }
}
