package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.mobident.result.MobilityScale;

class ChargedMarkerScaleTest extends MobilityScaleContractTest {

    /** Ld 50 cm, Lt 60 cm, +25 kV, 6 s ramp, EOF +60e-9 m²/(V s). */
    private static final SyntheticRun RUN = new SyntheticRun(50, 60, 25, 6, 60);
    private static final double MARKER_MOBILITY = -30;
    private static final double MARKER_SD_S = 0.8;

    @Override
    MobilityScale scale() {
        return withMarkerTimes(markerTimesS());
    }

    @Override
    double[] markerTimesS() {
        return new double[] {RUN.rawTimeS(MARKER_MOBILITY)};
    }

    @Override
    double[] markerSdsS() {
        return new double[] {MARKER_SD_S};
    }

    @Override
    MobilityScale withMarkerTimes(double[] timesS) {
        return new ChargedMarkerScale(50, 60, 25, 6, timesS[0], MARKER_SD_S, MARKER_MOBILITY);
    }

    @Override
    double[] sampleTimesS() {
        return new double[] {4.0, RUN.rawTimeS(30), RUN.rawTimeS(-20), RUN.rawTimeS(-45)};
    }

    @Test
    void eofFollowsFromTheChargedMarker() {
        // Marker −30 at t' = 12000/(−30 + 60) = 400 s (raw 403 s): μ_app = 12000/400 = 30,
        // μ_eof = 30 − (−30) = 60; zone at t' = 800 s: μ_app = 15, μ = 15 − 60 = −45.
        ChargedMarkerScale scale = (ChargedMarkerScale) scale();
        assertEquals(403.0, markerTimesS()[0], 1e-9);
        assertEquals(60.0, scale.eofMobility(), 1e-9);
        assertEquals(-45.0, scale.mobility(803), 1e-9);
        assertEquals(MARKER_MOBILITY, scale.mobility(403), 1e-9);
    }

    @Test
    void aMarkerOfZeroMobilityIsANeutralMarker() {
        ChargedMarkerScale charged = new ChargedMarkerScale(50, 60, 25, 6, 203, 0.5, 0);
        NeutralMarkerScale neutral = new NeutralMarkerScale(50, 60, 25, 6, 203, 0.5);
        for (double t : sampleTimesS()) {
            assertEquals(neutral.mobility(t), charged.mobility(t), 1e-12);
            assertEquals(neutral.mobilitySd(t, 0.3), charged.mobilitySd(t, 0.3), 1e-12);
        }
        assertEquals(neutral.eofMobility(), charged.eofMobility(), 1e-12);
    }

    @Test
    void reversedPolarityWithReversedEof() {
        // −25 kV, EOF −80; a cation marker +40 has μ_app = −40 and arrives at 300000/(25·40) = 300 s.
        SyntheticRun reversed = new SyntheticRun(50, 60, -25, 0, -80);
        assertEquals(300.0, reversed.rawTimeS(40), 1e-9);
        ChargedMarkerScale scale = new ChargedMarkerScale(50, 60, -25, 0, 300, 0, 40);
        assertEquals(-80.0, scale.eofMobility(), 1e-9);
        assertEquals(-40.0, scale.mobility(reversed.rawTimeS(-40)), 1e-9);
    }

    @Test
    void rejectsANonFiniteMarkerMobility() {
        assertThrows(IllegalArgumentException.class,
                () -> new ChargedMarkerScale(50, 60, 25, 0, 400, 0, Double.NaN));
    }
}
