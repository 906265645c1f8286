package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class GaussianClusterFitTest {

    private static final double[] T = Synthetic.regularTimes(280, 0.1, 400);

    @Test
    void recoversTwoOverlappingGaussiansWithoutNoise() {
        double[] y = new double[T.length];
        Synthetic.addGaussian(T, y, 300, 1.0, 2.0);
        Synthetic.addGaussian(T, y, 305.5, 3.0, 1.8);
        // started 0.7 s and 0.4 s off, with a common SD of 2.3 s
        GaussianClusterFit.Result fit = GaussianClusterFit.fit(T, y, 0, T.length - 1,
                new double[] {300.7, 305.1}, 2.3, 0.2, 20);
        assertNotNull(fit);
        List<GaussianClusterFit.Component> c = fit.components();
        assertEquals(2, c.size());
        assertEquals(300, c.get(0).apexTimeS(), 1e-6);
        assertEquals(305.5, c.get(1).apexTimeS(), 1e-6);
        assertEquals(1.0, c.get(0).height(), 1e-6);
        assertEquals(3.0, c.get(1).height(), 1e-6);
        assertEquals(2.0, c.get(0).sigmaS(), 1e-6);
        assertEquals(1.8, c.get(1).sigmaS(), 1e-6);
        // Gaussian identities: A = H σ √(2π), w½ = 2√(2 ln 2) σ
        assertEquals(3.0 * 1.8 * Math.sqrt(2 * Math.PI), c.get(1).area(), 1e-5);
        assertEquals(2.354820045 * 1.8, c.get(1).widthHalfS(), 1e-6);
        assertTrue(fit.residualSumOfSquares() < 1e-12);
    }

    @Test
    void extraZoneIsSignificantOnlyWhenItIsThere() {
        double[] pair = new double[T.length];
        Synthetic.addGaussian(T, pair, 300, 1.0, 2.0);
        Synthetic.addGaussian(T, pair, 304.8, 3.0, 2.0); // Rs = 0.6
        Synthetic.addNoise(pair, 0.01, 7);
        GaussianClusterFit.Result one = GaussianClusterFit.fit(T, pair, 0, T.length - 1, new double[] {304.5}, 2, 0.2, 20);
        GaussianClusterFit.Result two = GaussianClusterFit.fit(T, pair, 0, T.length - 1, new double[] {300, 305}, 2, 0.2, 20);
        assertTrue(GaussianClusterFit.extraZonesPValue(one, two) < 1e-6);

        double[] single = new double[T.length];
        Synthetic.addGaussian(T, single, 302, 3.0, 2.0);
        Synthetic.addNoise(single, 0.01, 8);
        GaussianClusterFit.Result oneS = GaussianClusterFit.fit(T, single, 0, T.length - 1, new double[] {302}, 2, 0.2, 20);
        GaussianClusterFit.Result twoS = GaussianClusterFit.fit(T, single, 0, T.length - 1, new double[] {299, 304}, 2, 0.2, 20);
        assertNotNull(oneS);
        assertNotNull(twoS);
        assertTrue(GaussianClusterFit.extraZonesPValue(oneS, twoS) > 1e-3,
                "p = " + GaussianClusterFit.extraZonesPValue(oneS, twoS));
    }

    @Test
    void apexUncertaintyFollowsTheScatterOfRepeatedFits() {
        // Monte Carlo check of s²(JᵀJ)⁻¹: the predicted SD within 30 % of the observed scatter
        int runs = 60;
        double sumSq = 0;
        double sumPredicted = 0;
        for (int r = 0; r < runs; r++) {
            double[] y = new double[T.length];
            Synthetic.addGaussian(T, y, 300, 1.0, 2.0);
            Synthetic.addGaussian(T, y, 305.6, 3.0, 2.0);
            Synthetic.addNoise(y, 0.02, 100 + r);
            GaussianClusterFit.Result fit = GaussianClusterFit.fit(T, y, 0, T.length - 1,
                    new double[] {300.3, 305.3}, 2, 0.2, 20);
            double e = fit.components().get(0).apexTimeS() - 300;
            sumSq += e * e;
            sumPredicted += fit.components().get(0).apexTimeSdS() * fit.components().get(0).apexTimeSdS();
        }
        assertEquals(1.0, Math.sqrt(sumPredicted / sumSq), 0.3);
    }

    @Test
    void dominanceBoundaryBetweenTwoZones() {
        // equal SDs: ln H1 − (t − t1)²/2σ² = ln H2 − (t − t2)²/2σ² gives
        // t = (t1 + t2)/2 + σ² ln(H1/H2)/(t2 − t1) (hand-derived)
        GaussianClusterFit.Component a = new GaussianClusterFit.Component(300, 0, 1.0, 2.0);
        GaussianClusterFit.Component b = new GaussianClusterFit.Component(305, 0, 3.0, 2.0);
        double expected = 302.5 + 4 * Math.log(1.0 / 3.0) / 5;
        assertEquals(expected, GaussianClusterFit.dominanceBoundaryS(a, b), 1e-9);
        // the two zones are equal there
        assertEquals(a.value(expected), b.value(expected), 1e-12);
        // unequal SDs: still the crossing between the apexes
        GaussianClusterFit.Component c = new GaussianClusterFit.Component(305, 0, 2.0, 1.5);
        double x = GaussianClusterFit.dominanceBoundaryS(a, c);
        assertTrue(x > 300 && x < 305);
        assertEquals(a.value(x), c.value(x), 1e-12);
    }

    @Test
    void failsCleanlyOnTooFewPoints() {
        double[] y = new double[T.length];
        Synthetic.addGaussian(T, y, 300, 1.0, 2.0);
        assertEquals(null, GaussianClusterFit.fit(T, y, 10, 15, new double[] {300, 301}, 2, 0.2, 20));
    }
}
