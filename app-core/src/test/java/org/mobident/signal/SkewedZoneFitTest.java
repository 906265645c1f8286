package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;

/** One exponentially modified Gaussian (Grushka 1972) fitted to a skewed zone. */
class SkewedZoneFitTest {

    private static double[] emg(double[] t, double area, double centre, double sigma, double tau) {
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            y[i] = area * SkewedZoneFit.shape(t[i] - centre, sigma, tau);
        }
        return y;
    }

    @Test
    void theShapeHasUnitAreaAndItsMomentsAreGrushkas() {
        // Grushka 1972: area 1, mean t_G + τ, variance σ² + τ² (numerical integration, fine grid)
        double[] t = Synthetic.regularTimes(-40, 0.001, 80_001);
        for (double tau : new double[] {0.4, 2.0, -1.5}) {
            double[] y = emg(t, 1.0, 0.0, 1.0, tau);
            double area = PeakDetector.trapezoid(t, y, 0, t.length - 1);
            ZoneCentre c = ZoneCentre.of(t, y, 0, t.length - 1);
            double variance = 0;
            for (int i = 0; i < t.length; i++) {
                variance += 0.001 * y[i] * (t[i] - c.centreTimeS()) * (t[i] - c.centreTimeS());
            }
            assertEquals(1.0, area, 1e-6, "τ " + tau);
            assertEquals(tau, c.centreTimeS(), 1e-5, "τ " + tau);
            assertEquals(1 + tau * tau, variance, 1e-4, "τ " + tau);
        }
    }

    @Test
    void recoversTheParametersOfATailingAndAFrontingZone() {
        double[] t = Synthetic.regularTimes(90, 0.05, 801);
        for (double tau : new double[] {0.8, -1.2}) {
            double[] y = emg(t, 2.5, 100.0, 0.6, tau);
            SkewedZoneFit fit = SkewedZoneFit.fit(t, y, 0, t.length - 1, 0.05, 5.0);
            assertNotNull(fit, "τ " + tau);
            assertEquals(2.5, fit.areaTimesS(), 1e-3 * 2.5, "area, τ " + tau);
            assertEquals(100.0, fit.centreS(), 1e-3, "centre, τ " + tau);
            assertEquals(0.6, fit.sigmaS(), 1e-3, "σ, τ " + tau);
            assertEquals(tau, fit.tauS(), 1e-3, "τ");
            assertEquals(100.0 + tau, fit.firstMomentS(), 2e-3);
            assertTrue(fit.residualSumOfSquares() < 1e-10);
        }
    }

    @Test
    void aSymmetricPeakKeepsTheLeastSkew() {
        double[] t = Synthetic.regularTimes(0, 0.05, 401);
        double[] y = new double[t.length];
        Synthetic.addGaussian(t, y, 10.0, 1.0, 1.0);
        SkewedZoneFit fit = SkewedZoneFit.fit(t, y, 0, t.length - 1, 0.05, 5.0);
        // |τ| stays at its floor, 5 % of the starting σ, and the rest is the Gaussian
        assertNotNull(fit);
        assertEquals(0.05, Math.abs(fit.tauS()), 0.005);
        assertEquals(1.0, fit.sigmaS(), 0.01);
        assertEquals(10.0, fit.firstMomentS(), 0.01);
    }

    @Test
    void stronglySkewedZonesAreNotSplit() {
        // electromigration dispersion in the lab-day bench reaches τ of several σ; a sum of Gaussians
        // follows the long flank with a false extra zone unless one skewed zone explains it as well
        double sigma = 0.5;
        for (double tauPerSigma : new double[] {2.0, 4.0, 8.0}) {
            for (int sign = -1; sign <= 1; sign += 2) {
                for (int seed = 0; seed < 3; seed++) {
                    double[] t = Synthetic.regularTimes(0, 0.05, 8_000);
                    double[] y = emg(t, 1.0, 200.0, sigma, sign * tauPerSigma * sigma);
                    Synthetic.addNoise(y, 0.002, 40 + seed);
                    List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT,
                            PeakSettings.DEFAULT).peaks();
                    assertEquals(1, peaks.size(), "τ/σ " + sign * tauPerSigma + " seed " + seed + ": " + peaks);
                }
            }
        }
    }
}
