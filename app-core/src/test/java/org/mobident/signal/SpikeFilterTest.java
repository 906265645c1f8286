package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;

/**
 * Electrical spikes (one or two samples, either sign) are removed whatever their height, never
 * reported as peaks, and do not move the apex, height or area of a peak they ride on; zones two or
 * more sampling intervals wide at half height are left as they are. Check values are the drawn
 * signals themselves.
 */
class SpikeFilterTest {

    /** Gaussian identity: w½ = 2√(2 ln 2) σ. */
    private static final double HALF_WIDTH_PER_SIGMA = 2 * Math.sqrt(2 * Math.log(2));

    @Test
    void spikesOfOneAndTwoSamplesAreRemovedWhateverTheirHeight() {
        double noise = 0.01;
        SplittableRandom random = new SplittableRandom(3);
        for (int run = 0; run < 20; run++) {
            double[] t = Synthetic.regularTimes(0, 0.2, 3_000);
            double[] clean = new double[t.length];
            Synthetic.addDrift(t, clean, 1, 1e-3, 0);
            Synthetic.addNoise(clean, noise, 100 + run);
            double[] y = clean.clone();
            List<int[]> spikes = new ArrayList<>();
            for (int k = 0; k < 6; k++) {
                int at = 50 + k * 480 + random.nextInt(100);
                int width = 1 + random.nextInt(2);
                // 20 to 2,000 noise SDs, either sign
                double amplitude = (random.nextBoolean() ? 1 : -1) * noise * 20 * Math.pow(100, random.nextDouble());
                Synthetic.addSpike(y, at, width, amplitude);
                spikes.add(new int[] {at, width});
            }
            assertEquals(spikes.size(), SpikeFilter.despike(t, y), "run " + run);
            // the parabola through four anchors at ±2 and ±3 samples has a noise of √1.94 = 1.39 noise SDs
            // at the block (variance of (9 m₂ − 4 m₃)/5, m the means of the anchor pairs), the clean
            // sample one more: their difference has an SD of 1.71 noise SDs; 8 noise SDs is 4.7 of those
            for (int[] s : spikes) {
                for (int i = s[0]; i < s[0] + s[1]; i++) {
                    assertEquals(clean[i], y[i], 8 * noise, "run " + run + " sample " + i);
                }
            }
        }
    }

    @Test
    void narrowZonesAreNotTakenForSpikes() {
        // zones 2.5 to 4 sampling intervals wide at half height, 30 to 300 noise SDs, apex anywhere
        // between samples: not a single sample changes
        double noise = 0.01;
        for (double widthSamples : new double[] {2.5, 3.0, 4.0}) {
            for (int k = 0; k < 10; k++) {
                double[] t = Synthetic.regularTimes(0, 0.25, 2_000);
                double[] y = new double[t.length];
                double sigma = widthSamples * 0.25 / HALF_WIDTH_PER_SIGMA;
                double height = noise * 30 * Math.pow(10, k / 9.0);
                Synthetic.addGaussian(t, y, 250 + 0.025 * k, height, sigma);
                Synthetic.addNoise(y, noise, 200 + k);
                double[] before = y.clone();
                assertEquals(0, SpikeFilter.despike(t, y), "w½ " + widthSamples + " samples, height " + height);
                assertTrue(java.util.Arrays.equals(before, y));
            }
        }
    }

    @Test
    void aSpikeOnAPeakLeavesItsApexHeightAndAreaAlone() {
        double noise = 0.005;
        double sigma = 1.5;
        double[] t = Synthetic.regularTimes(0, 0.1, 6_000);
        double[] clean = new double[t.length];
        Synthetic.addGaussian(t, clean, 300, 1.0, sigma);
        Synthetic.addNoise(clean, noise, 41);
        Peak reference = only(clean, t);
        // on the apex, on the flank (where the signal is steepest), and just beside the foot
        for (int at : new int[] {3_000, 3_015, 3_046}) {
            for (double amplitude : new double[] {3.0, -2.0, 0.3}) {
                double[] y = clean.clone();
                Synthetic.addSpike(y, at, 2, amplitude);
                Peak p = only(y, t);
                String label = "spike of " + amplitude + " at " + t[at] + " s";
                // the two replaced samples lose their noise (unknowable under the spike): the apex may
                // move within its noise-driven uncertainty, never more
                assertEquals(reference.apexTimeS(), p.apexTimeS(), reference.apexTimeSdS(), label);
                assertEquals(reference.height(), p.height(), 2 * noise, label);
                assertEquals(reference.area(), p.area(), 0.01 * reference.area(), label);
                assertEquals(reference.centreTimeS(), p.centreTimeS(), 0.01, label);
            }
        }
    }

    @Test
    void spikesAreNeverReported() {
        // runs with zones and 0-4 spikes of 20-200 noise SDs (the lab-day bench's range), at 4 to 50 Hz
        SplittableRandom random = new SplittableRandom(11);
        double noise = 0.01;
        double[] rates = {4, 5, 10, 20, 50};
        for (int run = 0; run < 30; run++) {
            double hz = rates[run % rates.length];
            double[] t = Synthetic.regularTimes(0, 1 / hz, (int) (400 * hz));
            double[] y = new double[t.length];
            double[] apex = {100, 180, 260, 340};
            for (double a : apex) {
                Synthetic.addGaussian(t, y, a, noise * (10 + 200 * random.nextDouble()), 0.6 + 0.6 * random.nextDouble());
            }
            Synthetic.addNoise(y, noise, 300 + run);
            List<Double> spikeTimes = new ArrayList<>();
            int spikes = random.nextInt(5);
            for (int k = 0; k < spikes; k++) {
                int at = 20 + random.nextInt(t.length - 40);
                double amplitude = (random.nextBoolean() ? 1 : -1) * noise * (20 + 180 * random.nextDouble());
                Synthetic.addSpike(y, at, 1 + random.nextInt(2), amplitude);
                spikeTimes.add(t[at]);
            }
            for (Peak p : PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT).peaks()) {
                boolean zone = false;
                for (double a : apex) {
                    zone |= Math.abs(p.apexTimeS() - a) < 2;
                }
                assertTrue(zone, "run " + run + " at " + hz + " Hz: a peak " + p + ", spikes at "
                        + spikeTimes);
            }
        }
    }

    @Test
    void aBarelySampledLowZoneIsNotDroppedAsASpike() {
        // w½ of 2.4 samples and about 8 noise SDs: its shoulders drown in the noise, so the shape
        // cannot call it a spike (the lab-day bench has such zones at 4-5 Hz)
        double[] t = Synthetic.regularTimes(0, 0.2, 2_000);
        double[] y = new double[t.length];
        double sigma = 2.4 * 0.2 / HALF_WIDTH_PER_SIGMA;
        Synthetic.addGaussian(t, y, 200.1, 0.08, sigma);
        Synthetic.addNoise(y, 0.01, 5);
        int top = 1_000;
        int pair = y[top - 1] > y[top + 1] ? top - 1 : top;
        assertFalse(SpikeFilter.looksLikeSpike(t, y, pair, 2, 0.01));
        // a spike of the same height at the same place is one
        double[] spike = new double[t.length];
        Synthetic.addNoise(spike, 0.01, 5);
        Synthetic.addSpike(spike, top, 2, 0.3);
        assertTrue(SpikeFilter.looksLikeSpike(t, spike, top, 2, 0.01));
    }

    private static Peak only(double[] y, double[] t) {
        List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        assertEquals(1, peaks.size(), peaks::toString);
        return peaks.get(0);
    }
}
