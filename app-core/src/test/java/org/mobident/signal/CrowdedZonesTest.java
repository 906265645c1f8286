package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;

/**
 * A crowded stretch of zones on a drifting baseline, as in a CZE anion run: heights and apex
 * times must come back right, and the stated apex uncertainty must cover the error. Check values
 * are the Gaussians the test draws (definition of the Gaussian zone: apex at its centre, height
 * its amplitude).
 */
class CrowdedZonesTest {

    private static final double[] APEX_S = {228.0, 232.5, 238.3, 240.8, 255.0};
    private static final double[] HEIGHT = {0.8, 0.7, 0.5, 0.9, 0.6};
    private static final double SIGMA_S = 0.65;

    private static Trace crowded(long seed, double noise) {
        int n = 12_000;
        double[] t = new double[n];
        double[] y = new double[n];
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int i = 0; i < n; i++) {
            t[i] = i * 0.05;
            double v = 0.3 + 2e-4 * t[i] + 1e-7 * t[i] * t[i];
            for (int k = 0; k < APEX_S.length; k++) {
                double u = (t[i] - APEX_S[k]) / SIGMA_S;
                v += HEIGHT[k] * Math.exp(-0.5 * u * u);
            }
            // Box–Muller normal noise
            v += noise * Math.sqrt(-2 * Math.log(rnd.nextDouble(1e-12, 1))) * Math.cos(2 * Math.PI * rnd.nextDouble());
            y[i] = v;
        }
        return new Trace("crowded", "crowded.csv", t, y);
    }

    @Test
    void heightsAreNotEatenByTheBaselineUnderACrowdedStretch() {
        List<Peak> peaks = PeakDetector.analyse(crowded(1, 0.003), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        assertEquals(APEX_S.length, peaks.size(), peaks::toString);
        for (int k = 0; k < APEX_S.length; k++) {
            Peak p = peaks.get(k);
            assertEquals(HEIGHT[k], p.height(), 0.03 * HEIGHT[k], "height of zone " + k);
            // Gaussian identity: area = H σ √(2π)
            assertEquals(HEIGHT[k] * SIGMA_S * Math.sqrt(2 * Math.PI), p.area(), 0.06 * HEIGHT[k] * SIGMA_S * 2.5,
                    "area of zone " + k);
        }
    }

    @Test
    void statedApexUncertaintyCoversTheErrorOfOverlappingZones() {
        for (long seed = 1; seed <= 8; seed++) {
            List<Peak> peaks = PeakDetector.analyse(crowded(seed, 0.004), Detection.DIRECT, PeakSettings.DEFAULT)
                    .peaks();
            assertEquals(APEX_S.length, peaks.size(), peaks::toString);
            for (int k = 0; k < APEX_S.length; k++) {
                Peak p = peaks.get(k);
                double err = Math.abs(p.apexTimeS() - APEX_S[k]);
                assertTrue(err <= 4 * p.apexTimeSdS(), "seed " + seed + " zone " + k + ": error " + err
                        + " s, stated sd " + p.apexTimeSdS() + " s");
            }
        }
    }
}
