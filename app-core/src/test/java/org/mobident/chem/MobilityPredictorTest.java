package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.PhInterval;
import org.mobident.buffer.PredictionUncertainty;
import org.mobident.buffer.SpeciesModel;
import org.mobident.mobility.MobilityMath;

class MobilityPredictorTest {

    private static final double TIGHT = 1e-9;

    /** Acetate: pKa 4.76 (CRC, from memory), λ 40.9 S cm²/mol → μ = −42.39e-9 m²/(V s) (CRC, from memory). */
    private static final double ACETIC_PKA = 4.76;
    private static final double ACETATE_MU = -42.39;

    private static SpeciesModel acetic() {
        return SpeciesModel.acid("acetic acid", List.of(ACETIC_PKA), List.of(ACETATE_MU));
    }

    @Test
    void aceticAcidAtItsPkaMovesAtHalfTheAnionMobility() {
        double mu = MobilityPredictor.effectiveMobility(acetic(), BufferConditions.infiniteDilution(ACETIC_PKA));
        assertEquals(ACETATE_MU / 2, mu, TIGHT);
    }

    @Test
    void strongIonIsIndependentOfPh() {
        SpeciesModel chloride = SpeciesModel.strong("chloride", -1, -79.09);
        assertEquals(-79.09, MobilityPredictor.effectiveMobility(chloride, BufferConditions.infiniteDilution(3)), TIGHT);
        assertEquals(-79.09, MobilityPredictor.effectiveMobility(chloride, BufferConditions.infiniteDilution(11)), TIGHT);
    }

    @Test
    void temperatureScalesThroughTheWaterViscosity() {
        SpeciesModel chloride = SpeciesModel.strong("chloride", -1, -79.09);
        double mu = MobilityPredictor.effectiveMobility(chloride, new BufferConditions(7, 0.0, 35.0));
        assertEquals(MobilityMath.atTemperature(-79.09, 25.0, 35.0), mu, TIGHT);
        assertTrue(mu < -79.09 * 1.15, "about 2 %/K faster at 35 °C: " + mu);
    }

    @Test
    void ionicStrengthShiftsPkaAndLowersTheAnionMobility() {
        BufferConditions buffer = new BufferConditions(ACETIC_PKA, 0.05, 25.0);
        double pKaMixed = Activity.mixedPka(ACETIC_PKA, 0, 0.05, 25.0);
        double alpha = IonicForms.fractions(new double[] {pKaMixed}, ACETIC_PKA)[1];
        double actual = IonicStrengthCorrection.actualMobility(ACETATE_MU, -1, 0.05, 25.0);
        assertEquals(alpha * actual, MobilityPredictor.effectiveMobility(acetic(), buffer), TIGHT);
        assertTrue(alpha > 0.5, "the mixed pKa is lower, so more acetate at the thermodynamic pKa");
    }

    @Test
    void phosphateAcrossPhAgainstTheExplicitFractions() {
        // pKa 2.15, 7.20, 12.35 (CRC, from memory); mobilities of the reference library
        double[] mu = {0.0, -37.31, -59.08, -71.50};
        SpeciesModel phosphate = new SpeciesModel("phosphate", 0, List.of(2.15, 7.20, 12.35),
                List.of(mu[0], mu[1], mu[2], mu[3]));
        double k1 = Math.pow(10, -2.15);
        double k2 = Math.pow(10, -7.20);
        double k3 = Math.pow(10, -12.35);
        for (double pH = 1; pH <= 13; pH += 0.5) {
            double h = Math.pow(10, -pH);
            double d = h * h * h + k1 * h * h + k1 * k2 * h + k1 * k2 * k3;
            double expected = (k1 * h * h * mu[1] + k1 * k2 * h * mu[2] + k1 * k2 * k3 * mu[3]) / d;
            assertEquals(expected, MobilityPredictor.effectiveMobility(phosphate, BufferConditions.infiniteDilution(pH)),
                    1e-9, "pH " + pH);
        }
    }

    /**
     * Analytical check of the propagation: at pH = pKa, dμ/dpKa = −μ(A⁻)·ln10·α(1−α) = −μ(A⁻)·ln10/4
     * and dμ/dμ(A⁻) = ½, so σ² = (μ ln10/4 · 0.05)² + (½ · 0.02 μ)².
     */
    @Test
    void uncertaintyAtThePkaMatchesTheAnalyticalPropagation() {
        MobilityPrediction p = MobilityPredictor.predict(acetic(), BufferConditions.infiniteDilution(ACETIC_PKA));
        double fromPka = Math.abs(ACETATE_MU) * Math.log(10) / 4 * PredictionUncertainty.DEFAULT_PKA_SD;
        double fromMu = 0.5 * PredictionUncertainty.DEFAULT_RELATIVE_MOBILITY_SD * Math.abs(ACETATE_MU);
        assertEquals(Math.hypot(fromPka, fromMu), p.standardUncertainty(), 1e-6);
        assertEquals(-0.5, p.meanCharge(), TIGHT);
    }

    @Test
    void uncertaintyOfAStrongIonIsItsRelativeMobilityUncertainty() {
        MobilityPrediction p = MobilityPredictor.withUncertainty(new PredictionUncertainty(0.1, 0.03))
                .estimate(SpeciesModel.strong("sodium", 1, 51.9), BufferConditions.infiniteDilution(7));
        assertEquals(0.03 * 51.9, p.standardUncertainty(), 1e-6);
        assertEquals(1.0, p.meanCharge(), TIGHT);
    }

    @Test
    void curveCoversTheRangeWithBothEnds() {
        List<CurvePoint> c = MobilityPredictor.curve(acetic(), 3.0, 6.0, 0.25, 0.0, 25.0);
        assertEquals(13, c.size());
        assertEquals(3.0, c.get(0).pH(), 0.0);
        assertEquals(6.0, c.get(12).pH(), 0.0);
        for (int i = 1; i < c.size(); i++) {
            assertTrue(c.get(i).mobility() < c.get(i - 1).mobility(), "acetate gets faster (more negative) with pH");
        }
        List<CurvePoint> odd = MobilityPredictor.curve(acetic(), 3.0, 3.5, 0.2, 0.0, 25.0);
        assertEquals(List.of(3.0, 3.2, 3.4, 3.5), odd.stream().map(CurvePoint::pH).map(v -> Math.round(v * 10) / 10.0).toList());
        assertThrows(IllegalArgumentException.class, () -> MobilityPredictor.curve(acetic(), 5, 4, 0.1, 0, 25));
        assertThrows(IllegalArgumentException.class, () -> MobilityPredictor.curve(acetic(), 4, 5, 0, 0, 25));
    }

    /**
     * A weak acid (pKa 4, anion −30) and a strong anion (−20): |−30α + 20| &lt; 1 for α in
     * (19/30, 21/30), i.e. pH = 4 + log10(α/(1−α)) from 4 + log10(19/11) to 4 + log10(21/9).
     */
    @Test
    void comigrationRangeOfTwoConstructedSpecies() {
        SpeciesModel weak = SpeciesModel.acid("weak", List.of(4.0), List.of(-30.0));
        SpeciesModel strong = SpeciesModel.strong("strong", -1, -20.0);
        List<PhInterval> r = MobilityPredictor.comigrationRanges(weak, strong, 2.0, 8.0, 0.0, 25.0, 1.0);
        assertEquals(1, r.size());
        assertEquals(4 + Math.log10(19.0 / 11.0), r.get(0).fromPh(), 1e-5);
        assertEquals(4 + Math.log10(21.0 / 9.0), r.get(0).toPh(), 1e-5);
    }

    @Test
    void comigrationRangesTouchingTheEndsAndNone() {
        SpeciesModel weak = SpeciesModel.acid("weak", List.of(4.0), List.of(-30.0));
        SpeciesModel other = SpeciesModel.acid("other", List.of(4.1), List.of(-30.0));
        // nearly identical species comigrate over the whole range
        List<PhInterval> all = MobilityPredictor.comigrationRanges(weak, other, 2.0, 8.0, 0.01, 25.0, 3.0);
        assertEquals(List.of(new PhInterval(2.0, 8.0)), all);
        SpeciesModel far = SpeciesModel.strong("far", -1, -70.0);
        assertTrue(MobilityPredictor.comigrationRanges(weak, far, 2.0, 8.0, 0.0, 25.0, 1.0).isEmpty());
        assertThrows(IllegalArgumentException.class,
                () -> MobilityPredictor.comigrationRanges(weak, far, 2.0, 8.0, 0.0, 25.0, 0.0));
    }

    @Test
    void bufferConditionsAreValidated() {
        assertThrows(IllegalArgumentException.class, () -> new BufferConditions(15, 0, 25));
        assertThrows(IllegalArgumentException.class, () -> new BufferConditions(7, 0.6, 25));
        assertThrows(IllegalArgumentException.class, () -> new BufferConditions(7, -0.01, 25));
        assertThrows(IllegalArgumentException.class, () -> new BufferConditions(7, 0.01, 101));
        assertThrows(IllegalArgumentException.class, () -> new BufferConditions(Double.NaN, 0.01, 25));
    }
}
