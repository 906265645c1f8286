package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.mobident.result.MobilityScale;

class TwoMarkerScaleTest extends MobilityScaleContractTest {

    /** Ld 50 cm, Lt 60 cm, +25 kV, 6 s ramp, EOF +60e-9 m²/(V s). */
    private static final SyntheticRun RUN = new SyntheticRun(50, 60, 25, 6, 60);
    private static final double MARKER_MOBILITY = -30;
    private static final double NEUTRAL_SD_S = 0.4;
    private static final double MARKER_SD_S = 0.7;

    @Override
    MobilityScale scale() {
        return withMarkerTimes(markerTimesS());
    }

    @Override
    double[] markerTimesS() {
        return new double[] {RUN.rawTimeS(0), RUN.rawTimeS(MARKER_MOBILITY)};
    }

    @Override
    double[] markerSdsS() {
        return new double[] {NEUTRAL_SD_S, MARKER_SD_S};
    }

    @Override
    MobilityScale withMarkerTimes(double[] timesS) {
        return new TwoMarkerScale(6, timesS[0], NEUTRAL_SD_S, timesS[1], MARKER_SD_S, MARKER_MOBILITY);
    }

    @Override
    double[] sampleTimesS() {
        return new double[] {4.0, RUN.rawTimeS(30), RUN.rawTimeS(-20), RUN.rawTimeS(-45)};
    }

    @Test
    void recoversTheMobilityWithoutGeometry() {
        // Synthesised: t'_n = 12000/60 = 200 s, t'_m = 12000/30 = 400 s, zone −45: t'_x = 12000/15 = 800 s.
        // (1/800 − 1/200)/(1/400 − 1/200) = (−3/800)/(−2/800) = 1.5, so μ = −30 · 1.5 = −45
        // (two-marker formula, Jumppanen & Riekkola 1995).
        TwoMarkerScale scale = new TwoMarkerScale(6, 203, 0, 403, 0, -30);
        assertEquals(-45.0, scale.mobility(803), 1e-9);
        assertEquals(60.0, scale.eofMobility(), 1e-9);
    }

    @Test
    void givesTheSameMobilitiesForAnyCapillaryAndVoltage() {
        SyntheticRun other = new SyntheticRun(41.5, 72, 18, 12, 47);
        TwoMarkerScale scale = new TwoMarkerScale(12, other.rawTimeS(0), 0, other.rawTimeS(-30), 0, -30);
        for (double mu : new double[] {-45, -20, 10, 35}) {
            assertEquals(mu, scale.mobility(other.rawTimeS(mu)), 1e-9);
        }
        assertEquals(47.0, scale.eofMobility(), 1e-9);
    }

    @Test
    void isImmuneToAWrongNominalVoltage() {
        // The supply delivers 24 kV while the method says 25 kV: the neutral-marker scale is off by
        // 4 %, the two-marker scale is not.
        SyntheticRun actual = new SyntheticRun(50, 60, 24, 0, 60);
        double t = actual.rawTimeS(-45);
        NeutralMarkerScale nominal = new NeutralMarkerScale(50, 60, 25, 0, actual.rawTimeS(0), 0);
        TwoMarkerScale twoMarkers = new TwoMarkerScale(0, actual.rawTimeS(0), 0, actual.rawTimeS(-30), 0, -30);
        assertTrue(Math.abs(nominal.mobility(t) - (-45)) > 1.0);
        assertEquals(-45.0, twoMarkers.mobility(t), 1e-9);
    }

    @Test
    void rejectsDegenerateMarkers() {
        assertThrows(IllegalArgumentException.class, () -> new TwoMarkerScale(0, 200, 0, 400, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new TwoMarkerScale(0, 200, 0, 200, 0, -30));
        assertThrows(IllegalArgumentException.class, () -> new TwoMarkerScale(0, 200, -1, 400, 0, -30));
    }
}
