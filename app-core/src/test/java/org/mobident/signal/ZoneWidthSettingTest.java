package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.settings.PeakSettings;
import org.mobident.trace.Detection;

/**
 * A stretch of a run searched for one faint zone (a weak marker): with the run's zone width given,
 * the stretch is smoothed and clipped as the whole run would be. Check value: the Gaussian's width
 * at half height is 2√(2 ln 2)·σ (definition).
 */
class ZoneWidthSettingTest {

    @Test
    void aFaintWideZoneInAShortStretchIsFoundWithTheRunsZoneWidth() {
        double sigma = 1.4;
        double[] t = Synthetic.regularTimes(543, 0.04, 1430);
        double[] y = new double[t.length];
        Synthetic.addGaussian(t, y, 578.6, 0.03, sigma);
        Synthetic.addNoise(y, 0.004, 17);
        double widthHalf = 2 * Math.sqrt(2 * Math.log(2)) * sigma;
        PeakSettings settings = PeakSettings.DEFAULT.withMinSignalToNoise(1.5).forZonesOfWidth(widthHalf);
        assertEquals(widthHalf, settings.zoneWidthS(), 0);
        List<Peak> peaks = PeakDetector.analyse(Synthetic.trace(t, y), Detection.DIRECT, settings).peaks();
        assertEquals(1, peaks.size(), "peaks " + peaks);
        assertEquals(578.6, peaks.get(0).apexTimeS(), 0.5);
        assertTrue(Math.abs(peaks.get(0).widthHalfS() - widthHalf) < 0.3 * widthHalf, "width " + peaks.get(0));
    }

    @Test
    void anUnknownWidthLeavesTheSettingsAsTheyAre() {
        assertEquals(PeakSettings.DEFAULT, PeakSettings.DEFAULT.forZonesOfWidth(Double.NaN));
        assertEquals(PeakSettings.DEFAULT, PeakSettings.DEFAULT.forZonesOfWidth(0));
    }
}
