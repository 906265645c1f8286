package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;

/** One absurd sample (a detector glitch written as 1e100) must not hide the real peaks. */
class WildPointTest {

    private static Trace gaussians(double wild) {
        int n = 12_000;
        double[] t = new double[n];
        double[] y = new double[n];
        SplittableRandom rnd = new SplittableRandom(3);
        double[] apex = {150, 220, 300};
        for (int i = 0; i < n; i++) {
            t[i] = i * 0.05;
            double v = 0.002 * (rnd.nextDouble() - 0.5);
            for (double a : apex) {
                v += Math.exp(-0.5 * Math.pow((t[i] - a) / 0.8, 2));
            }
            y[i] = v;
        }
        y[8_000] = y[8_000] + wild; // at 400 s, on the baseline far from the zones
        return new Trace("wild", "wild.csv", t, y);
    }

    @Test
    void aSingleHugeSampleDoesNotHideThePeaks() {
        List<Peak> clean = PeakDetector.analyse(gaussians(0.0), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        assertEquals(3, clean.size(), clean::toString);
        for (double wild : new double[] {1e6, 1e100, -1e100}) {
            List<Peak> peaks = PeakDetector.analyse(gaussians(wild), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
            long real = peaks.stream().filter(p -> Math.abs(p.apexTimeS() - 150) < 1
                    || Math.abs(p.apexTimeS() - 220) < 1 || Math.abs(p.apexTimeS() - 300) < 1).count();
            assertEquals(3, real, () -> "wild point " + wild + ": " + peaks);
        }
    }
}
