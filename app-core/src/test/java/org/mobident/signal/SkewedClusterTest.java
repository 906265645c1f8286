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
 * Pairs of skewed zones (electromigration dispersion) one or two per cent apart, and single zones
 * with a long diffuse flank: the zones and their first moments must be recovered.
 *
 * <p>Check values: the first moment of an exponentially modified Gaussian is t_G + τ and its area
 * the area parameter (Grushka, Anal. Chem. 44 (1972) 1733); the zones below are built from those
 * definitions, so the expected centre of each is known exactly.
 */
class SkewedClusterTest {

    /** Adds an EMG of {@code area} whose first moment is at {@code firstMomentS}. */
    static void addEmg(double[] t, double[] y, double area, double firstMomentS, double sigmaS, double tauS) {
        double centre = firstMomentS - tauS; // Grushka 1972: first moment = t_G + τ
        for (int i = 0; i < t.length; i++) {
            y[i] += area * SkewedZoneFit.shape(t[i] - centre, sigmaS, tauS);
        }
    }

    @Test
    void twoFrontingZonesAreRecoveredByTheFit() {
        double[] t = Synthetic.regularTimes(85, 0.04, 750);
        double[] y = new double[t.length];
        // a concentrated zone with a long diffuse front and a smaller one 1 % later
        addEmg(t, y, 2.4, 103.66, 0.30, -3.6);
        addEmg(t, y, 0.30, 104.70, 0.30, -1.0);
        Synthetic.addNoise(y, 0.002, 11);
        SkewedClusterFit.Result fit = SkewedClusterFit.fit(t, y, 0, t.length - 1, new double[] {105.24, 106.72},
                0.4, 0.05, 4.0);
        assertNotNull(fit);
        assertEquals(2, fit.zones().size());
        List<SkewedClusterFit.Zone> z = fit.zones();
        assertEquals(103.66, z.get(0).firstMomentS(), 0.05);
        assertEquals(104.70, z.get(1).firstMomentS(), 0.05);
        assertEquals(2.4, z.get(0).areaTimesS(), 0.05);
        assertEquals(0.30, z.get(1).areaTimesS(), 0.02);
        assertTrue(z.get(0).tauS() < 0 && z.get(1).tauS() < 0, "both fronting");
        // the uncertainties reflect the noise: a few hundredths of a second here, not zero
        assertTrue(z.get(0).firstMomentSdS() > 0 && z.get(0).firstMomentSdS() < 0.05);
        // the larger zone's apex lies at its sharp flank, after its first moment
        assertTrue(z.get(0).apexTimeS() > z.get(0).firstMomentS() + 2.0);
    }

    @Test
    void aSmallZoneHeldNearlySymmetricKeepsItsCentreBehindATailingZone() {
        // a tall tailing zone (first moment 50.0 s, τ 1.2 s) and a small Gaussian one at 51.2 s on
        // its tail, 15 times lower: built from Grushka's definitions, so both first moments are known
        double[] t = Synthetic.regularTimes(44, 0.05, 240);
        double[] y = new double[t.length];
        addEmg(t, y, 1.0, 50.0, 0.25, 1.2);
        Synthetic.addGaussian(t, y, 51.2, 0.06, 0.25);
        Synthetic.addNoise(y, 0.001, 9);
        double[] starts = {48.9, 51.2};
        SkewedClusterFit.Result held = SkewedClusterFit.fit(t, y, 0, t.length - 1, starts, 0.3, 0.05, 3.0,
                0.001, +1, new boolean[] {false, true});
        assertNotNull(held);
        // σ, then A, μ, a of the tall zone and A, μ of the held one
        assertEquals(6, held.parameters());
        SkewedClusterFit.Zone small = held.zones().get(1);
        assertEquals(51.2, small.firstMomentS(), 0.05);
        assertEquals(small.apexTimeS(), small.firstMomentS(), 0.05);
        assertEquals(50.0, held.zones().get(0).firstMomentS(), 0.05);
        // fitted free, the same data need no more parameters to be explained: the held fit reaches
        // the noise (residual variance near 0.001²)
        assertEquals(1.0, held.residualSumOfSquares() / (held.points() - held.parameters()) / 1e-6, 0.3);
    }

    @Test
    void aTailingPairIsFittedAsTailing() {
        double[] t = Synthetic.regularTimes(40, 0.05, 600);
        double[] y = new double[t.length];
        addEmg(t, y, 1.0, 50.0, 0.25, 1.5);
        addEmg(t, y, 0.6, 51.0, 0.25, 0.8);
        Synthetic.addNoise(y, 0.001, 5);
        SkewedClusterFit.Result fit = SkewedClusterFit.fit(t, y, 0, t.length - 1, new double[] {48.6, 50.3},
                0.3, 0.05, 3.0);
        assertNotNull(fit);
        assertEquals(50.0, fit.zones().get(0).firstMomentS(), 0.05);
        assertEquals(51.0, fit.zones().get(1).firstMomentS(), 0.05);
        assertTrue(fit.zones().get(0).tauS() > 0);
    }

    @Test
    void theDetectorReportsBothZonesOfAnOverlappedSkewedPairAtTheirCentres() {
        double[] t = Synthetic.regularTimes(60, 0.04, 2000);
        double[] y = new double[t.length];
        addEmg(t, y, 2.4, 103.66, 0.30, -3.6);
        addEmg(t, y, 0.30, 104.70, 0.30, -1.0);
        // an isolated reference zone elsewhere sets the typical width
        Synthetic.addGaussian(t, y, 125.0, 0.3, 0.30);
        Synthetic.addNoise(y, 0.002, 3);
        List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        Peak big = nearest(peaks, 103.66);
        Peak small = nearest(peaks, 104.70);
        assertTrue(big != small, "two peaks: " + peaks);
        assertEquals(103.66, big.centreTimeS(), 0.15);
        assertEquals(104.70, small.centreTimeS(), 0.15);
    }

    @Test
    void aLongDiffuseFlankIsNotTakenIntoTheBaseline() {
        // one concentrated zone, τ = 4 s against a typical width of 0.7 s: the clipped baseline rises
        // into its front; the zone's own chord restores it, and the centre stays the first moment
        double[] t = Synthetic.regularTimes(50, 0.04, 3000);
        double[] y = new double[t.length];
        addEmg(t, y, 2.0, 100.0, 0.30, -4.0);
        Synthetic.addGaussian(t, y, 140.0, 0.2, 0.30);
        Synthetic.addGaussian(t, y, 70.0, 0.2, 0.30);
        Synthetic.addNoise(y, 0.002, 9);
        List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        Peak zone = nearest(peaks, 100.0);
        assertEquals(100.0, zone.centreTimeS(), 0.3, "centre of the skewed zone");
        assertEquals(2.0, zone.area(), 0.2, "area of the skewed zone");
    }

    @Test
    void theFlankWalkDoesNotFollowADriftingBaseline() {
        // a tailing zone on the falling side of a slow baseline wave (period 200 s): the walk down
        // its outer flank must stop where the zone ends, not follow the falling baseline to the
        // trough, where a chord would cut across the wave's curvature and move the centre. Expected
        // centre: the first moment the zone was built with (Grushka 1972).
        double[] t = Synthetic.regularTimes(200, 0.1, 2000);
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            y[i] = 0.1 * Math.cos(2 * Math.PI * (t[i] - 270.0) / 200.0);
        }
        addEmg(t, y, 0.9, 289.2, 0.9, 2.6);
        Synthetic.addGaussian(t, y, 230.0, 0.1, 0.60);
        Synthetic.addGaussian(t, y, 380.0, 0.1, 0.60);
        Synthetic.addNoise(y, 0.002, 17);
        List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        Peak zone = nearest(peaks, 289.2);
        // the walk stops where the zone ends (its tail is down to the noise about 12 s after the
        // apex), far before the wave's trough at 370 s
        assertTrue(zone.endTimeS() < 310, "end of the tailing zone: " + zone.endTimeS());
        // the centre within its stated uncertainty (3 SDs) and a few per cent of its width of the
        // first moment it was built with
        assertEquals(289.2, zone.centreTimeS(), Math.min(3 * zone.centreTimeSdS(), 0.15), "centre of the tailing zone");
        // the shape term inside the stated SD is carried apart, for the matcher's usual case
        assertTrue(zone.centreShapeSdS() > 0 && zone.centreShapeSdS() <= zone.centreTimeSdS(),
                "shape term " + zone.centreShapeSdS() + " of SD " + zone.centreTimeSdS());
        assertTrue(zone.migrationTimeUsualSdS() < zone.centreTimeSdS());
    }

    @Test
    void frontingZonesSplitAtAHighValleyAreFittedTogether() {
        // two concentrated fronting zones 5 s apart: the second one's long front runs under the
        // first, and the valley between them stays at about a fifth of the smaller maximum. Split at
        // the valley, the first zone takes in that front and the second loses it (both centres late
        // by a few tenths of a second); fitted together, each keeps its own first moment.
        double[] t = Synthetic.regularTimes(80, 0.06, 900);
        double[] y = new double[t.length];
        addEmg(t, y, 1.6, 99.6, 0.25, -1.6);
        addEmg(t, y, 3.4, 104.6, 0.25, -2.6);
        Synthetic.addGaussian(t, y, 125.0, 0.3, 0.30);
        Synthetic.addNoise(y, 0.01, 23);
        List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT).peaks();
        assertEquals(99.6, nearest(peaks, 99.6).centreTimeS(), 0.15, "first zone");
        assertEquals(104.6, nearest(peaks, 104.6).centreTimeS(), 0.15, "second zone");
    }

    @Test
    void statedCentreUncertaintiesCoverTheErrorsOfOverlappedSkewedZones() {
        // The pair of the test above under twelve noise draws: each zone's centre lies within three
        // of its stated SDs of the first moment it was built with (Grushka 1972) in every draw, and the
        // large zone, whose fitted and model-free moments agree, is stated more precisely than a third
        // of its apex-centre distance (the term given to a skewed zone nothing confirms).
        for (long seed = 1; seed <= 12; seed++) {
            double[] t = Synthetic.regularTimes(60, 0.04, 2000);
            double[] y = new double[t.length];
            addEmg(t, y, 2.4, 103.66, 0.30, -3.6);
            addEmg(t, y, 0.30, 104.70, 0.30, -1.0);
            Synthetic.addGaussian(t, y, 125.0, 0.3, 0.30);
            Synthetic.addNoise(y, 0.002, 100 + seed);
            List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT)
                    .peaks();
            Peak big = nearest(peaks, 103.66);
            Peak small = nearest(peaks, 104.70);
            assertTrue(big != small, "seed " + seed + ": " + peaks);
            for (Object[] zone : new Object[][] {{big, 103.66}, {small, 104.70}}) {
                Peak p = (Peak) zone[0];
                double error = p.centreTimeS() - (double) zone[1];
                assertTrue(Math.abs(error) <= 3 * p.centreTimeSdS(),
                        "seed " + seed + ": centre " + p.centreTimeS() + " off by " + error + ", SD " + p.centreTimeSdS());
            }
            assertTrue(big.centreTimeSdS() < Math.abs(big.apexTimeS() - big.centreTimeS()) / 3,
                    "seed " + seed + ": SD " + big.centreTimeSdS());
            for (Peak p : List.of(big, small)) {
                assertTrue(p.centreShapeSdS() > 0 && p.centreShapeSdS() <= p.centreTimeSdS(),
                        "seed " + seed + ": shape term " + p.centreShapeSdS() + " of SD " + p.centreTimeSdS());
            }
        }
    }

    @Test
    void aZoneTheFitCannotPlaceWithinItsWidthIsNotResolved() {
        // σ 0.25 s and τ -2.5 s: w½ of the EMG is about 1.9 s (its full width at half maximum, computed by
        // the zone itself). A first-moment SD of 0.3 s places the zone; one of 8 s (seen on fits that put
        // two components on one dispersed zone) does not.
        SkewedClusterFit.Zone placed = new SkewedClusterFit.Zone(1.0, 108.0, 0.25, -2.5, 0.3, 0.3,
                ZoneForm.EXPONENTIAL);
        SkewedClusterFit.Zone lost = new SkewedClusterFit.Zone(1.0, 108.0, 0.25, -2.5, 8.0, 8.0,
                ZoneForm.EXPONENTIAL);
        assertTrue(placed.widthHalfS() > 1.0 && placed.widthHalfS() < 3.0, "w1/2 " + placed.widthHalfS());
        assertTrue(placed.placed());
        assertTrue(!lost.placed());
    }

    @Test
    void aSmallZoneOnALongDiffuseFrontIsOneOfTwoZonesNotThree() {
        // A concentrated zone (τ -3.8 s, σ 0.22 s) whose diffuse front carries a small zone 5 s earlier:
        // Gaussians follow the front with an extra zone, and the skewed fit started from all their tops
        // fails; with one start left out, two skewed zones explain the cluster. Expected first moments:
        // 106.15 s (Grushka 1972: t_G + τ) and the small zone's 101.27 s. Two more zones follow at 114 and
        // 116 s, as in the run this case was found in. The concentrated zone must keep its moment (Gaussians
        // put it 1.2 s late in one of these draws); the small zone, where reported, its own (in one draw the
        // fit cannot place it and it is absorbed, a known limit).
        for (long seed = 1; seed <= 4; seed++) {
            double[] t = Synthetic.regularTimes(60, 0.2, 600);
            double[] y = new double[t.length];
            Synthetic.addGaussian(t, y, 101.27, 0.28, 0.47);
            addEmg(t, y, 8.32, 106.15, 0.22, -3.77);
            Synthetic.addGaussian(t, y, 114.23, 0.30, 0.43);
            addEmg(t, y, 2.74, 115.83, 0.31, -1.39);
            Synthetic.addGaussian(t, y, 140.0, 0.3, 0.40);
            Synthetic.addCorrelatedNoise(y, 0.016, 0.69, 60 + seed);
            List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT)
                    .peaks();
            List<Peak> cluster = peaks.stream().filter(p -> p.apexTimeS() > 90 && p.apexTimeS() < 112).toList();
            assertTrue(cluster.size() == 1 || cluster.size() == 2, "seed " + seed + ": " + cluster);
            Peak concentrated = cluster.get(cluster.size() - 1);
            assertEquals(106.15, concentrated.centreTimeS(), 0.5, "seed " + seed + ": concentrated zone");
            assertTrue(Math.abs(concentrated.centreTimeS() - 106.15) <= 3 * concentrated.centreTimeSdS(),
                    "seed " + seed + ": stated SD " + concentrated.centreTimeSdS());
            if (cluster.size() == 2) {
                assertEquals(101.27, cluster.get(0).centreTimeS(), 0.3, "seed " + seed + ": small zone");
            }
        }
    }

    private static Peak nearest(List<Peak> peaks, double timeS) {
        Peak best = null;
        for (Peak p : peaks) {
            if (best == null || Math.abs(p.migrationTimeS() - timeS) < Math.abs(best.migrationTimeS() - timeS)) {
                best = p;
            }
        }
        return best;
    }

    @Test
    void twoConcentratedZonesAWidthApartAreSplitWhereGaussiansFindNoPair() {
        // two tailing zones of equal area 1.3 s apart with τ = 1.5 s (about 270 noise SDs each): the
        // curvature shows both, but no pair of Gaussians follows their sum plausibly (the fit puts
        // one broad and one narrow Gaussian at the same place); two skewed zones do, far better than
        // one (F-test at 1e-6)
        int found = 0;
        for (long seed = 1; seed <= 5; seed++) {
            double[] t = Synthetic.regularTimes(100, 0.2, 150);
            double[] y = new double[t.length];
            addEmg(t, y, 2.0, 115.86, 0.45, 1.5);
            addEmg(t, y, 2.0, 117.16, 0.45, 1.5);
            Synthetic.addGaussian(t, y, 105.0, 0.3, 0.45); // a reference zone for the typical width
            Synthetic.addNoise(y, 0.003, seed);
            List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, PeakSettings.DEFAULT)
                    .peaks();
            Peak first = nearest(peaks, 115.86);
            Peak second = nearest(peaks, 117.16);
            if (first != second && Math.abs(first.centreTimeS() - 115.86) <= 3 * first.centreTimeSdS() + 0.05
                    && Math.abs(second.centreTimeS() - 117.16) <= 3 * second.centreTimeSdS() + 0.05) {
                found++;
            }
        }
        assertTrue(found >= 4, "pairs split at their centres: " + found + " of 5");
    }
}
