package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The cheap screens before a trace or its marker window is analysed the other way from the run's
 * stated detection ({@link Identifier#leansOtherWay}, {@link Identifier#reachesOtherWay}). A zone at the quantitation limit, S/N = 2H/h = 10 with h the
 * peak-to-peak noise, stands H = 5h; for white noise over a window of about 20 widths h is about
 * 5 noise SDs (the expected range of a few hundred normal values, Tippett, Biometrika 17 (1925)
 * 364; from memory), so about 25 SDs. The screen asks for 10 SDs beyond the window's median.
 */
class OtherWayScreenTest {

    private static final double NOISE_SD = 0.01;

    private static double[] noise(long seed, int n) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            double u = rnd.nextDouble(1e-12, 1.0);
            v[i] = 0.5 + NOISE_SD * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rnd.nextDouble());
        }
        return v;
    }

    private static double[] withZone(double[] v, int centre, double width, double height) {
        double[] out = v.clone();
        for (int i = 0; i < out.length; i++) {
            double z = (i - centre) / width;
            out[i] += height * Math.exp(-0.5 * z * z);
        }
        return out;
    }

    @Test
    void noiseAloneDoesNotPass() {
        // 6,000 white-noise samples: beyond 10 SDs with probability about 1e-19 each
        for (long seed = 1; seed <= 20; seed++) {
            double[] v = noise(seed, 6000);
            assertFalse(Identifier.reachesOtherWay(v, true, NOISE_SD), "seed " + seed);
            assertFalse(Identifier.reachesOtherWay(v, false, NOISE_SD), "seed " + seed);
        }
    }

    @Test
    void aZoneAtTheQuantitationLimitPassesOnlyTheOtherWay() {
        // a rise of 25 noise SDs: the other way for a run of dips (indirect), the same way for a run
        // of peaks (direct), where the window is not searched the other way
        double[] v = withZone(noise(7, 6000), 3000, 30, 25 * NOISE_SD);
        assertTrue(Identifier.reachesOtherWay(v, true, NOISE_SD));
        assertFalse(Identifier.reachesOtherWay(v, false, NOISE_SD));
        double[] dip = withZone(noise(8, 6000), 3000, 30, -25 * NOISE_SD);
        assertTrue(Identifier.reachesOtherWay(dip, false, NOISE_SD));
        assertFalse(Identifier.reachesOtherWay(dip, true, NOISE_SD));
    }

    @Test
    void aTraceOfDipsLeansTheOtherWayFromADirectReadingOnly() {
        // five dips of 40-200 noise SDs on a baseline drifting by 30 noise SDs over the run
        double[] v = noise(11, 20_000);
        for (int i = 0; i < v.length; i++) {
            v[i] += 30 * NOISE_SD * i / v.length;
        }
        for (int k = 0; k < 5; k++) {
            v = withZone(v, 3000 + 3000 * k, 25, -(40 + 40 * k) * NOISE_SD);
        }
        assertTrue(Identifier.leansOtherWay(v, false, NOISE_SD), "stated direct: the zones dip");
        assertFalse(Identifier.leansOtherWay(v, true, NOISE_SD), "stated indirect: as stated");
    }

    @Test
    void spikesAndAWanderingBaselineDoNotOutweighTheRunsZones() {
        // three dips of 30 noise SDs (an indirect run), a baseline wandering by 10 noise SDs and four
        // one-sample spikes of 100 SDs up: the spikes weigh a sample each, the zones dozens
        double[] v = noise(12, 20_000);
        for (int i = 0; i < v.length; i++) {
            v[i] += 10 * NOISE_SD * Math.sin(2 * Math.PI * i / 7000.0);
        }
        for (int k = 1; k <= 4; k++) {
            v[4000 * k + 500] += 100 * NOISE_SD;
        }
        for (int k = 0; k < 3; k++) {
            v = withZone(v, 5000 + 5000 * k, 25, -30 * NOISE_SD);
        }
        assertFalse(Identifier.leansOtherWay(v, true, NOISE_SD));
        assertTrue(Identifier.leansOtherWay(v, false, NOISE_SD));
    }

    @Test
    void anUnknownNoiseLetsTheSearchRun() {
        assertTrue(Identifier.reachesOtherWay(noise(9, 100), true, Double.NaN));
    }
}
