package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;

/**
 * Zones in the second form electromigration dispersion gives them: a triangle with a sharp front
 * and a straight diffuse flank, smoothed by diffusion (strong overload; Mikkers, Everaerts &amp;
 * Verheggen, J. Chromatogr. 169 (1979) 1).
 *
 * <p>Check values: the zones are built here by numerical convolution of the triangle with its
 * Gaussian (midpoint rule), independently of the closed form under test; a right triangle of base L
 * has its centroid L/3 behind its sharp side (plane geometry) and unit area when its height is 2/L.
 * The EMG's first moment is τ behind its Gaussian centre (Grushka, Anal. Chem. 44 (1972) 1733).
 */
class TriangleZoneTest {

    /** The smoothed right triangle of unit area by quadrature: ∫_0^L (2/L)(1 − u/L) φ((x − u)/σ)/σ du. */
    private static double convolved(double x, double sigma, double base) {
        int steps = 4000;
        double du = base / steps;
        double sum = 0;
        for (int k = 0; k < steps; k++) {
            double u = (k + 0.5) * du;
            double z = (x - u) / sigma;
            sum += 2 / base * (1 - u / base) * Math.exp(-0.5 * z * z) / (sigma * Math.sqrt(2 * Math.PI)) * du;
        }
        return sum;
    }

    /** Adds a triangular zone of {@code area} whose centroid is at {@code centroidS}; fronting when base < 0. */
    static void addTriangle(double[] t, double[] y, double area, double centroidS, double sigmaS,
                            double baseS) {
        double s = Math.signum(baseS);
        double l = Math.abs(baseS);
        double front = centroidS - s * l / 3; // the centroid lies L/3 behind the sharp front
        for (int i = 0; i < t.length; i++) {
            double x = s * (t[i] - front);
            if (x > -8 * sigmaS && x < l + 8 * sigmaS) {
                y[i] += area * convolved(x, sigmaS, l);
            }
        }
    }

    @Test
    void theClosedFormIsTheConvolution() {
        for (double x : new double[] {-1.2, -0.2, 0.0, 0.5, 1.7, 2.95, 3.6}) {
            // size a = L/3 = 1: base 3
            assertEquals(convolved(x, 0.35, 3.0), ZoneForm.TRIANGLE.value(x, 0.35, 1.0), 1e-7, "x = " + x);
        }
    }

    @Test
    void bothFormsHaveUnitAreaAndTheirFirstMomentAtSizeA() {
        for (ZoneForm form : ZoneForm.values()) {
            double sigma = 0.3;
            double a = 1.2;
            double area = 0;
            double moment = 0;
            double dx = 0.001;
            for (double x = -5; x < 60; x += dx) {
                double g = form.value(x + 0.5 * dx, sigma, a);
                area += g * dx;
                moment += g * (x + 0.5 * dx) * dx;
            }
            assertEquals(1.0, area, 1e-6, form + " area");
            assertEquals(a, moment / area, 1e-5, form + " first moment");
        }
    }

    @Test
    void derivativesMatchFiniteDifferences() {
        double[] g = new double[4];
        for (ZoneForm form : ZoneForm.values()) {
            for (double x : new double[] {-0.4, 0.1, 0.9, 2.2, 4.0}) {
                double sigma = 0.4;
                double a = 0.9;
                form.evaluate(x, sigma, a, g);
                double h = 1e-6;
                double dx = (form.value(x + h, sigma, a) - form.value(x - h, sigma, a)) / (2 * h);
                double ds = (form.value(x, sigma + h, a) - form.value(x, sigma - h, a)) / (2 * h);
                double da = (form.value(x, sigma, a + h) - form.value(x, sigma, a - h)) / (2 * h);
                assertEquals(form.value(x, sigma, a), g[0], 1e-15);
                assertEquals(dx, g[1], 1e-6, form + " d/dx at " + x);
                assertEquals(ds, g[2], 1e-6, form + " d/dsigma at " + x);
                assertEquals(da, g[3], 1e-6, form + " d/da at " + x);
            }
        }
    }

    @Test
    void aTriangleIsFittedBetterByItsOwnFormAndItsCentroidRecovered() {
        double[] t = Synthetic.regularTimes(80, 0.05, 800);
        double[] y = new double[t.length];
        addTriangle(t, y, 2.0, 100.0, 0.3, -6.0);
        Synthetic.addNoise(y, 0.002, 17);
        SkewedZoneFit best = SkewedZoneFit.better(t, y, 0, t.length - 1, 0.05, 3.0);
        assertNotNull(best);
        assertEquals(ZoneForm.TRIANGLE, best.form(), "the triangle fits better than an EMG: " + best);
        assertEquals(-1.0, best.direction());
        assertEquals(100.0, best.firstMomentS(), 0.02);
        SkewedZoneFit emg = SkewedZoneFit.fit(t, y, 0, t.length - 1, 0.05, 3.0);
        assertNotNull(emg);
        assertTrue(emg.residualSumOfSquares() > 5 * best.residualSumOfSquares(),
                "EMG RSS " + emg.residualSumOfSquares() + " triangle " + best.residualSumOfSquares());
    }

    @Test
    void anOverloadedTriangularZoneIsOneZoneAtItsCentroid() {
        // 800 noise SDs, a straight diffuse front of 7 s: the curvature shows the sharp top and the
        // foot, and a sum of Gaussians or of EMGs follows the straight flank with an extra zone. It
        // must come out as one peak, its centre at the centroid, stated to better than 0.2 s.
        for (long seed = 1; seed <= 6; seed++) {
            double[] t = Synthetic.regularTimes(60, 0.05, 1600);
            double[] y = new double[t.length];
            double noise = 0.001;
            double height = 800 * noise;
            addTriangle(t, y, height * 7.0 / 2, 110.0, 0.3, -7.0); // a triangle's height is 2A/L
            Synthetic.addGaussian(t, y, 90.0, 0.05, 0.35);
            Synthetic.addGaussian(t, y, 125.0, 0.05, 0.40);
            Synthetic.addNoise(y, noise, seed);
            List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT)
                    .peaks();
            long inZone = peaks.stream().filter(p -> p.apexTimeS() > 101 && p.apexTimeS() < 116).count();
            assertEquals(1, inZone, "seed " + seed + ": " + peaks);
            Peak zone = peaks.stream().filter(p -> p.apexTimeS() > 101 && p.apexTimeS() < 116).findFirst().get();
            assertEquals(110.0, zone.centreTimeS(), 3 * zone.centreTimeSdS() + 0.02, "seed " + seed);
            assertTrue(zone.centreTimeSdS() < 0.2, "seed " + seed + ": SD " + zone.centreTimeSdS());
        }
    }

    @Test
    void aPairOfTriangularZonesIsFittedAsTrianglesAtTheirCentroids() {
        // a concentrated fronting zone and a smaller one 1.5 % later, both triangular: a sum of
        // EMGs follows their straight flanks with the zones misplaced; the sum of triangles
        // recovers both centroids.
        double[] t = Synthetic.regularTimes(85, 0.05, 700);
        double[] y = new double[t.length];
        addTriangle(t, y, 3.0, 104.0, 0.3, -5.0);
        addTriangle(t, y, 0.5, 105.6, 0.3, -1.5);
        double noise = 0.002;
        Synthetic.addNoise(y, noise, 23);
        SkewedClusterFit.Result fit = SkewedClusterFit.fit(t, y, 0, t.length - 1, new double[] {105.6, 106.4},
                0.35, 0.05, 4.0, noise);
        assertNotNull(fit);
        assertEquals(2, fit.zones().size());
        assertEquals(ZoneForm.TRIANGLE, fit.zones().get(0).form());
        assertEquals(104.0, fit.zones().get(0).firstMomentS(), 0.05);
        assertEquals(105.6, fit.zones().get(1).firstMomentS(), 0.05);
        assertEquals(3.0, fit.zones().get(0).areaTimesS(), 0.05);
        assertEquals(0.5, fit.zones().get(1).areaTimesS(), 0.05);
    }

    @Test
    void exponentialZonesStayExponential() {
        // the pair of SkewedClusterTest drawn as EMGs: the triangles must not take it over
        double[] t = Synthetic.regularTimes(85, 0.04, 750);
        double[] y = new double[t.length];
        SkewedClusterTest.addEmg(t, y, 2.4, 103.66, 0.30, -3.6);
        SkewedClusterTest.addEmg(t, y, 0.30, 104.70, 0.30, -1.0);
        Synthetic.addNoise(y, 0.002, 11);
        SkewedClusterFit.Result fit = SkewedClusterFit.fit(t, y, 0, t.length - 1, new double[] {105.24, 106.72},
                0.4, 0.05, 4.0, 0.002);
        assertNotNull(fit);
        assertEquals(ZoneForm.EXPONENTIAL, fit.zones().get(0).form());
        assertEquals(103.66, fit.zones().get(0).firstMomentS(), 0.05);
    }
}
