package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;
import org.mobident.trace.Trace;

/**
 * Zone tops cut flat by a saturated detector: found, rebuilt from the flanks, reported as one zone at
 * its true centre; tops that are not cut are left exactly as they are. Check values are the drawn
 * (uncut) zones themselves.
 */
class FlatTopsTest {

    private static final double STEP_S = 0.05;
    private static final double NOISE = 0.002;

    /** A trace of one Gaussian (or bi-Gaussian) zone on a level baseline with white noise. */
    private static double[] zone(double[] t, double centreS, double height, double leftSdS, double rightSdS,
                                 long seed) {
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            double u = (t[i] - centreS) / (t[i] < centreS ? leftSdS : rightSdS);
            y[i] = 0.2 + height * Math.exp(-0.5 * u * u);
        }
        Synthetic.addNoise(y, NOISE, seed);
        return y;
    }

    private static int cut(double[] y, double level) {
        int clipped = 0;
        for (int i = 0; i < y.length; i++) {
            if (y[i] > level) {
                y[i] = level;
                clipped++;
            }
        }
        return clipped;
    }

    @Test
    void aCutGaussianTopIsRebuiltFromItsFlanks() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 4_000);
        for (double cutShare : new double[] {0.3, 0.5, 0.8}) {
            double[] y = zone(t, 100.013, 1.0, 1.0, 1.0, 7);
            double level = 0.2 + cutShare;
            int clipped = cut(y, level);
            List<FlatTop> tops = FlatTops.repair(t, y);
            assertEquals(1, tops.size(), "cut at " + cutShare);
            FlatTop top = tops.get(0);
            // the plateau of a Gaussian cut at a share c of its height spans ±σ√(2 ln(1/c))
            double halfSpan = Math.sqrt(2 * Math.log(1 / cutShare));
            assertEquals(100.013 - halfSpan, top.fromS(), 2 * STEP_S, "cut at " + cutShare);
            assertEquals(100.013 + halfSpan, top.toS(), 2 * STEP_S, "cut at " + cutShare);
            assertEquals(clipped, (int) Math.round((top.toS() - top.fromS()) / STEP_S) + 1);
            // the centre to a few hundredths of σ, and within the uncertainty the fit claims (4 SD)
            assertEquals(100.013, top.centreS(), Math.max(0.03, 4 * top.centreSdS()), "cut at " + cutShare);
            assertTrue(top.centreSdS() > 0 && top.centreSdS() < 0.05, "sd " + top.centreSdS());
            // the rebuilt top reaches the drawn height to within 5 %
            double highest = 0;
            for (double v : y) {
                highest = Math.max(highest, v);
            }
            assertEquals(1.2, highest, 0.05, "cut at " + cutShare);
        }
    }

    @Test
    void aLopsidedZoneKeepsItsApexInsideThePlateau() {
        // a zone dispersed by its own concentration: a slow rise (σ 2 s) and a steep fall (σ 0.5 s)
        double[] t = Synthetic.regularTimes(0, STEP_S, 4_000);
        double[] y = zone(t, 80.0, 1.0, 2.0, 0.5, 11);
        cut(y, 0.2 + 0.6);
        List<FlatTop> tops = FlatTops.repair(t, y);
        assertEquals(1, tops.size());
        assertEquals(80.0, tops.get(0).centreS(), 0.1);
        int apex = 0;
        for (int i = 1; i < y.length; i++) {
            if (y[i] > y[apex]) {
                apex = i;
            }
        }
        assertEquals(80.0, t[apex], 0.1);
        assertEquals(1.2, y[apex], 0.08);
    }

    @Test
    void tracesWithoutACutAreLeftAlone() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 4_000);
        assertLeftAlone(t, zone(t, 100.0, 1.0, 1.0, 1.0, 5));
    }

    private static void assertLeftAlone(double[] t, double[] y) {
        double[] before = y.clone();
        assertTrue(FlatTops.repair(t, y).isEmpty());
        assertArrayEquals(before, y, 0.0);
    }

    @Test
    void aCoarseConverterRepeatingATrueApexIsNotACut() {
        // a broad zone read by a converter with steps of 1 % of its height: the samples near the apex
        // share one value, but the flanks ask for no higher top
        double[] t = Synthetic.regularTimes(0, STEP_S, 4_000);
        double[] y = zone(t, 100.0, 1.0, 3.0, 3.0, 9);
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.round(y[i] / 0.01) * 0.01;
        }
        double top = 0;
        int atTop = 0;
        for (double v : y) {
            top = Math.max(top, v);
        }
        for (double v : y) {
            atTop += v == top ? 1 : 0;
        }
        assertTrue(atTop >= 3, "the drawn trace must repeat its highest value: " + atTop);
        assertLeftAlone(t, y);
    }

    @Test
    void aCutTopIsReportedAsOneZoneAtItsCentre() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 8_000);
        double[] y = zone(t, 150.0, 1.0, 0.8, 0.8, 13);
        Synthetic.addGaussian(t, y, 120.0, 0.3, 0.8);
        Synthetic.addGaussian(t, y, 250.0, 0.3, 0.8);
        cut(y, 0.2 + 0.5);
        TraceAnalysis analysis = PeakDetector.analyse(new Trace("cut", "cut.csv", t, y), Detection.DIRECT,
                PeakSettings.DEFAULT);
        assertEquals(1, analysis.flatTops().size());
        List<Peak> near = analysis.peaks().stream().filter(p -> Math.abs(p.apexTimeS() - 150.0) < 3).toList();
        assertEquals(1, near.size(), "one zone, not the plateau's two edges: " + analysis.peaks());
        assertEquals(150.0, near.get(0).migrationTimeS(), 0.05);
        assertEquals(1.0, near.get(0).height(), 0.05);
        assertEquals(3, analysis.peaks().size());
    }

    @Test
    void aCutDipOfAnIndirectRunIsRebuiltToo() {
        double[] t = Synthetic.regularTimes(0, STEP_S, 8_000);
        double[] y = zone(t, 150.0, 1.0, 0.8, 0.8, 17);
        for (int i = 0; i < y.length; i++) {
            y[i] = 2.0 - y[i]; // the zone is a dip to 0.8 below a background of 1.8
        }
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.max(y[i], 1.3); // the converter reads nothing below 1.3
        }
        TraceAnalysis analysis = PeakDetector.analyse(new Trace("dip", "dip.csv", t, y), Detection.INDIRECT,
                PeakSettings.DEFAULT);
        assertEquals(1, analysis.flatTops().size());
        assertEquals(1, analysis.peaks().size());
        assertEquals(150.0, analysis.peaks().get(0).migrationTimeS(), 0.05);
        assertEquals(1.0, analysis.peaks().get(0).height(), 0.05);
    }
}
