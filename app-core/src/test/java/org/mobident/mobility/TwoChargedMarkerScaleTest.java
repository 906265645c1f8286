package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.mobident.result.MobilityScale;

class TwoChargedMarkerScaleTest extends MobilityScaleContractTest {

    /** Ld 50 cm, Lt 60 cm, +25 kV, 6 s ramp, EOF +60e-9 m²/(V s). */
    private static final SyntheticRun RUN = new SyntheticRun(50, 60, 25, 6, 60);
    private static final double FIRST_MOBILITY = -30;
    private static final double SECOND_MOBILITY = -45;
    private static final double FIRST_SD_S = 0.5;
    private static final double SECOND_SD_S = 0.9;

    @Override
    MobilityScale scale() {
        return withMarkerTimes(markerTimesS());
    }

    @Override
    double[] markerTimesS() {
        return new double[] {RUN.rawTimeS(FIRST_MOBILITY), RUN.rawTimeS(SECOND_MOBILITY)};
    }

    @Override
    double[] markerSdsS() {
        return new double[] {FIRST_SD_S, SECOND_SD_S};
    }

    @Override
    MobilityScale withMarkerTimes(double[] timesS) {
        return new TwoChargedMarkerScale(6, timesS[0], FIRST_SD_S, FIRST_MOBILITY, timesS[1], SECOND_SD_S,
                SECOND_MOBILITY);
    }

    @Override
    double[] sampleTimesS() {
        return new double[] {4.0, RUN.rawTimeS(60), RUN.rawTimeS(-20), RUN.rawTimeS(-50)};
    }

    @Test
    void reciprocalTimeIsLinearInMobility() {
        // Markers −30 at t' = 400 s and −45 at t' = 800 s: k = (−45 + 30)/(1/800 − 1/400) = 12000 = Ld·Lt/V.
        // Zone at t' = 300 s: μ = −30 + 12000·(1/300 − 1/400) = −30 + 10 = −20; μ_eof = 12000/400 + 30 = 60.
        TwoChargedMarkerScale scale = new TwoChargedMarkerScale(6, 403, 0, -30, 803, 0, -45);
        assertEquals(-20.0, scale.mobility(303), 1e-9);
        assertEquals(60.0, scale.eofMobility(), 1e-9);
        assertEquals(303.0, scale.timeS(-20), 1e-9);
    }

    @Test
    void withANeutralFirstMarkerItIsTheTwoMarkerScale() {
        TwoChargedMarkerScale general = new TwoChargedMarkerScale(6, 203, 0.4, 0, 403, 0.7, -30);
        TwoMarkerScale special = new TwoMarkerScale(6, 203, 0.4, 403, 0.7, -30);
        for (double t : sampleTimesS()) {
            assertEquals(special.mobility(t), general.mobility(t), 1e-12);
            assertEquals(special.mobilitySd(t, 0.5), general.mobilitySd(t, 0.5), 1e-12);
        }
    }

    @Test
    void markerOrderDoesNotMatter() {
        TwoChargedMarkerScale forward = (TwoChargedMarkerScale) scale();
        TwoChargedMarkerScale swapped = new TwoChargedMarkerScale(6, markerTimesS()[1], SECOND_SD_S,
                SECOND_MOBILITY, markerTimesS()[0], FIRST_SD_S, FIRST_MOBILITY);
        for (double t : sampleTimesS()) {
            assertEquals(forward.mobility(t), swapped.mobility(t), 1e-9);
            assertEquals(forward.mobilitySd(t, 0.5), swapped.mobilitySd(t, 0.5), 1e-9);
        }
    }

    @Test
    void rejectsDegenerateMarkers() {
        assertThrows(IllegalArgumentException.class, () -> new TwoChargedMarkerScale(0, 400, 0, -30, 800, 0, -30));
        assertThrows(IllegalArgumentException.class, () -> new TwoChargedMarkerScale(0, 400, 0, -30, 400, 0, -45));
        assertThrows(IllegalArgumentException.class,
                () -> new TwoChargedMarkerScale(0, 400, 0, Double.POSITIVE_INFINITY, 800, 0, -45));
    }
}
