package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;

/** Zones that merge into one peak (a shoulder, no valley) or overlap deeply are found and fitted. */
class ShoulderResolutionTest {

    /** Gaussian identity: w½ = 2√(2 ln 2) σ. */
    private static final double HALF_WIDTH_PER_SIGMA = 2 * Math.sqrt(2 * Math.log(2));
    private static final double SIGMA = 2.0;
    private static final double FIRST = 300;
    private static final double NOISE = 0.01;
    private static final double[] T = Synthetic.regularTimes(0, 0.1, 6000);

    /** Apex gap for a resolution: Rs = 1.18 Δt / (w½,₁ + w½,₂) (Ph. Eur. 2.2.46) with equal widths. */
    private static double gapFor(double rs) {
        return rs * 2 * HALF_WIDTH_PER_SIGMA * SIGMA / 1.18;
    }

    private static double[] pair(double rs, double h1, double h2, long seed) {
        double[] y = new double[T.length];
        Synthetic.addGaussian(T, y, FIRST, h1, SIGMA);
        Synthetic.addGaussian(T, y, FIRST + gapFor(rs), h2, SIGMA);
        Synthetic.addNoise(y, NOISE, seed);
        return y;
    }

    private static void assertPairFound(List<Peak> peaks, double rs, double h1, double h2, String label) {
        assertEquals(2, peaks.size(), label);
        double[] apex = {FIRST, FIRST + gapFor(rs)};
        double[] height = {h1, h2};
        for (int k = 0; k < 2; k++) {
            Peak p = peaks.get(k);
            double error = Math.abs(p.apexTimeS() - apex[k]);
            assertTrue(error <= 3 * p.apexTimeSdS(), label + " apex " + k + " off by " + error + " s, sd " + p.apexTimeSdS());
            assertTrue(error <= 0.1 * SIGMA, label + " apex " + k + " off by " + error + " s");
            assertEquals(height[k], p.height(), 0.05 * height[k], label + " height " + k);
            double area = height[k] * SIGMA * Math.sqrt(2 * Math.PI); // Gaussian integral
            assertEquals(area, p.area(), 0.05 * area, label + " area " + k);
            assertEquals(HALF_WIDTH_PER_SIGMA * SIGMA, p.widthHalfS(), 0.05 * HALF_WIDTH_PER_SIGMA * SIGMA, label);
            // N = 5.54 (t/w½)² (Ph. Eur. 2.2.46), here from the fitted width
            assertEquals(5.54 * Math.pow(p.apexTimeS() / p.widthHalfS(), 2), p.plates(), 1e-6 * p.plates());
            assertEquals(rs, p.resolution(), 0.1 * rs, label + " resolution");
            assertTrue(p.signalToNoise() > PeakSettings.DEFAULT.minSignalToNoise(), label);
        }
        // the split: where the later zone starts to dominate, between the apexes, shared
        assertEquals(peaks.get(0).endTimeS(), peaks.get(1).startTimeS(), 1e-12, label);
        assertTrue(peaks.get(0).endTimeS() > peaks.get(0).apexTimeS()
                && peaks.get(1).startTimeS() < peaks.get(1).apexTimeS(), label);
        assertTrue(peaks.get(0).startTimeS() < FIRST - 3 * SIGMA && peaks.get(1).endTimeS() > apex[1] + 3 * SIGMA, label);
    }

    @Test
    void closePairsAreResolvedWithApexTimesFromTheFit() {
        double[][] heights = {{2, 2}, {1, 3}, {3, 1}};
        for (double rs : new double[] {0.6, 0.8}) {
            for (double[] h : heights) {
                for (long seed : new long[] {11, 12, 13}) {
                    String label = "Rs " + rs + " heights " + h[0] + ":" + h[1] + " seed " + seed;
                    TraceAnalysis analysis = PeakDetector.analyse(Synthetic.trace(T, pair(rs, h[0], h[1], seed)),
                            Detection.DIRECT, PeakSettings.DEFAULT);
                    assertPairFound(analysis.peaks(), rs, h[0], h[1], label);
                }
            }
        }
    }

    @Test
    void dipsOfIndirectDetectionAreResolvedAlike() {
        double rs = 0.7;
        double[] y = pair(rs, 1, 3, 21);
        for (int i = 0; i < y.length; i++) {
            y[i] = 5 - y[i]; // dips below a background of 5
        }
        TraceAnalysis analysis = PeakDetector.analyse(Synthetic.trace(T, y), Detection.INDIRECT, PeakSettings.DEFAULT);
        assertPairFound(analysis.peaks(), rs, 1, 3, "dips");
        assertTrue(analysis.peaks().get(0).dip() && analysis.peaks().get(1).dip());
    }

    @Test
    void aSingleGaussianIsNeverSplit() {
        // false-shoulder rate zero over 50 seeds, heights from S/N ≈ 8 to S/N ≈ 300
        double[] heights = {0.25, 0.5, 1, 3, 10};
        for (int seed = 0; seed < 50; seed++) {
            double[] y = new double[T.length];
            double height = heights[seed % heights.length];
            double apex = FIRST + 0.037 * seed; // anywhere between samples
            Synthetic.addGaussian(T, y, apex, height, SIGMA);
            Synthetic.addNoise(y, NOISE, 500 + seed);
            TraceAnalysis analysis = PeakDetector.analyse(Synthetic.trace(T, y), Detection.DIRECT, PeakSettings.DEFAULT);
            assertEquals(1, analysis.peaks().size(), "seed " + seed + " height " + height);
            assertEquals(apex, analysis.peaks().get(0).apexTimeS(), 0.1 * SIGMA);
        }
    }

    @Test
    void aTailingZoneIsNotSplit() {
        // exponentially modified Gaussians (Grushka 1972) with τ up to 2σ: one zone, one peak
        for (double tauPerSigma : new double[] {0.5, 1.0, 2.0}) {
            for (int seed = 0; seed < 6; seed++) {
                double[] y = new double[T.length];
                Synthetic.addTailedZone(T, y, FIRST, 2.0, SIGMA, tauPerSigma * SIGMA);
                Synthetic.addNoise(y, 3 * NOISE, 900 + seed);
                TraceAnalysis analysis = PeakDetector.analyse(Synthetic.trace(T, y), Detection.DIRECT, PeakSettings.DEFAULT);
                assertEquals(1, analysis.peaks().size(), "τ/σ " + tauPerSigma + " seed " + seed);
            }
        }
    }

    @Test
    void aPairAmongSeparatePeaksLeavesTheOthersAsTheyWere() {
        double[] y = pair(0.7, 1, 3, 31);
        Synthetic.addGaussian(T, y, 150, 2, SIGMA);
        Synthetic.addGaussian(T, y, 450, 2, SIGMA);
        TraceAnalysis analysis = PeakDetector.analyse(Synthetic.trace(T, y), Detection.DIRECT, PeakSettings.DEFAULT);
        assertEquals(4, analysis.peaks().size());
        assertEquals(150, analysis.peaks().get(0).apexTimeS(), 0.05);
        assertEquals(450, analysis.peaks().get(3).apexTimeS(), 0.05);
        assertPairFound(analysis.peaks().subList(1, 3), 0.7, 1, 3, "pair among others");
    }
}
