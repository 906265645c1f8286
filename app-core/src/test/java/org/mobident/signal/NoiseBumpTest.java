package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.result.SignalToNoiseClass;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;

/**
 * Noise alone never makes a peak: correlated noise (a detector time constant), whose first
 * differences understate it, and slow baseline wiggles. The zones beside them are still found.
 */
class NoiseBumpTest {

    @Test
    void correlatedNoiseMakesNoPeaksAndItsSdIsMeasured() {
        // AR(1) noise of marginal SD 0.01 (Box & Jenkins 1970): lag-one correlations of 0.5 to 0.95,
        // 20 Hz, 600 s, two zones of 40 noise SDs to give the run a typical width
        for (double phi : new double[] {0.5, 0.8, 0.95}) {
            for (int seed = 0; seed < 4; seed++) {
                double[] t = Synthetic.regularTimes(0, 0.05, 12_000);
                double[] y = new double[t.length];
                Synthetic.addGaussian(t, y, 150, 0.4, 1.0);
                Synthetic.addGaussian(t, y, 450, 0.4, 1.5);
                Synthetic.addCorrelatedNoise(y, 0.01, phi, 77 + seed);
                TraceAnalysis analysis = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT,
                        PeakSettings.DEFAULT);
                String label = "φ " + phi + " seed " + seed;
                assertEquals(2, analysis.peaks().size(), label + ": " + analysis.peaks());
                assertEquals(150, analysis.peaks().get(0).apexTimeS(), 0.5, label);
                assertEquals(450, analysis.peaks().get(1).apexTimeS(), 0.5, label);
                assertEquals(0.01, analysis.noiseSd(), 0.002, label + ": the marginal SD, not the differences'");
            }
        }
    }

    @Test
    void slowBaselineWigglesMakeNoPeaks() {
        // sinusoids of 100 to 400 s period, 5 noise SDs each, and a quadratic drift of 20 noise SDs,
        // as in the lab-day bench; white noise, 10 Hz, 500 s
        double noise = 0.01;
        for (int seed = 0; seed < 8; seed++) {
            double[] t = Synthetic.regularTimes(0, 0.1, 5_000);
            double[] y = new double[t.length];
            double p1 = 100 + 37 * seed;
            double p2 = 400 - 23 * seed;
            for (int i = 0; i < t.length; i++) {
                y[i] = 5 * noise * Math.sin(2 * Math.PI * t[i] / p1 + seed)
                        + 5 * noise * Math.sin(2 * Math.PI * t[i] / p2 + 2 * seed)
                        + 20 * noise * (t[i] / 500) * (t[i] / 500);
            }
            Synthetic.addGaussian(t, y, 200, 0.5, 1.0);
            Synthetic.addNoise(y, noise, 500 + seed);
            List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT)
                    .peaks();
            assertEquals(1, peaks.size(), "seed " + seed + ": " + peaks);
            assertEquals(200, peaks.get(0).apexTimeS(), 0.1);
            // 50 noise SDs: S/N = 2·50/d2(118) ≈ 19 (Tippett 1925), above the quantitation limit
            assertEquals(SignalToNoiseClass.QUANTIFIABLE, peaks.get(0).signalToNoiseClass());
        }
    }
}
