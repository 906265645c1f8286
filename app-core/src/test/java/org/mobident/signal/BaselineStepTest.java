package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;

/**
 * A sharp step of the background is not a zone: the broad hump its edge leaves while the baseline
 * follows is not reported, for small steps (12 noise SDs) and large ones (150), while zones, faint
 * ones included, still are. Check values are the drawn
 * signals themselves.
 */
class BaselineStepTest {

    private static final double NOISE = 0.002;

    private static List<Peak> peaksOf(double stepSds, double stepAtS, long seed) {
        double[] t = Synthetic.regularTimes(0, 0.1, 9_000);
        double[] y = new double[t.length];
        // four zones 0.8 s wide (σ 0.34 s) and a faint broad one, 8 noise SDs tall and 1.4 s wide
        Synthetic.addGaussian(t, y, 150, 0.2, 0.34);
        Synthetic.addGaussian(t, y, 220, 0.15, 0.34);
        Synthetic.addGaussian(t, y, 300, 0.3, 0.34);
        Synthetic.addGaussian(t, y, 380, 8 * NOISE, 0.6);
        Synthetic.addGaussian(t, y, 700, 0.25, 0.34);
        for (int i = 0; i < t.length; i++) {
            y[i] += t[i] >= stepAtS ? stepSds * NOISE : 0.0;
        }
        Synthetic.addNoise(y, NOISE, seed);
        return PeakDetector.analyse(new Trace("step", "step.csv", t, y), Detection.DIRECT, PeakSettings.DEFAULT)
                .peaks();
    }

    @Test
    void theEdgeOfAStepIsNotReportedAndTheZonesAre() {
        for (long seed = 1; seed <= 6; seed++) {
            for (double step : new double[] {-12, 12, -150, 150}) {
                List<Peak> peaks = peaksOf(step, 500.0, seed);
                for (Peak p : peaks) {
                    assertTrue(p.endTimeS() < 490 || p.startTimeS() > 510,
                            "seed " + seed + ", step " + step + ": a peak at the step: " + p);
                }
                for (double zone : new double[] {150, 220, 300, 700}) {
                    assertEquals(1, peaks.stream().filter(p -> Math.abs(p.apexTimeS() - zone) < 1).count(),
                            "seed " + seed + ", step " + step + ": the zone at " + zone + " s");
                }
            }
        }
    }

    @Test
    void aFaintZoneOnAFlatBaselineStaysReported() {
        int found = 0;
        for (long seed = 1; seed <= 6; seed++) {
            found += peaksOf(0, 500.0, seed).stream().filter(p -> Math.abs(p.apexTimeS() - 380) < 1).count();
        }
        // a zone of 8 noise SDs (S/N about 3 to 4, broad for its time, so it is checked for a step)
        assertTrue(found >= 5, "the faint zone was reported in " + found + " of 6 runs");
    }
}
