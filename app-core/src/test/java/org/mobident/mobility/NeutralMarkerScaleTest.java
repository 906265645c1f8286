package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.mobident.result.MobilityScale;

class NeutralMarkerScaleTest extends MobilityScaleContractTest {

    /** Ld 50 cm, Lt 60 cm, +25 kV, 6 s ramp, EOF +60e-9 m²/(V s): neutral marker at 203 s. */
    private static final SyntheticRun RUN = new SyntheticRun(50, 60, 25, 6, 60);
    private static final double MARKER_SD_S = 0.5;

    @Override
    MobilityScale scale() {
        return withMarkerTimes(markerTimesS());
    }

    @Override
    double[] markerTimesS() {
        return new double[] {RUN.rawTimeS(0)};
    }

    @Override
    double[] markerSdsS() {
        return new double[] {MARKER_SD_S};
    }

    @Override
    MobilityScale withMarkerTimes(double[] timesS) {
        return new NeutralMarkerScale(50, 60, 25, 6, timesS[0], MARKER_SD_S);
    }

    @Override
    double[] sampleTimesS() {
        return new double[] {4.0, RUN.rawTimeS(60), RUN.rawTimeS(-36), RUN.rawTimeS(-45)};
    }

    @Test
    void handWorkedNeutralMarkerExample() {
        // Worked from the definition (IUPAC, "electrophoretic mobility"), no ramp:
        // marker at 150 s: μ_eof = 100·50·60/(25·150) = 300000/3750 = 80 (1e-9 m²/(V s));
        // zone at 300 s: μ_app = 300000/7500 = 40; μ_eff = 40 − 80 = −40, an anion against the EOF.
        NeutralMarkerScale scale = new NeutralMarkerScale(50, 60, 25, 0, 150, 0);
        assertEquals(80.0, scale.eofMobility(), 1e-12);
        assertEquals(-40.0, scale.mobility(300), 1e-12);
        assertEquals(0.0, scale.mobility(150), 1e-12);
        assertEquals(300.0, scale.timeS(-40), 1e-9);
    }

    @Test
    void reversedPolarityWithReversedEofGivesTheRightSigns() {
        // Coated capillary, reversed polarity: inlet at −25 kV, EOF towards the anode (detector side),
        // so the EOF mobility is negative. Marker at 150 s: μ_eof = 300000/(−25·150) = −80.
        NeutralMarkerScale scale = new NeutralMarkerScale(50, 60, -25, 0, 150, 0);
        assertEquals(-80.0, scale.eofMobility(), 1e-12);
        // An anion runs ahead of the marker: at 100 s, μ_app = 300000/(−25·100) = −120, μ_eff = −120 + 80 = −40.
        assertEquals(-40.0, scale.mobility(100), 1e-12);
        // A slow cation is carried behind the marker: at 300 s, μ_app = −40, μ_eff = +40.
        assertEquals(40.0, scale.mobility(300), 1e-12);
        assertEquals(100.0, scale.timeS(-40), 1e-9);
        // A cation faster than the EOF (μ_app = +20) moves back to the inlet: never detected.
        assertTrue(Double.isNaN(scale.timeS(100)));
    }

    @Test
    void rampIsTakenOutOfMarkerAndAnalyteAlike() {
        // 10 s linear ramp: raw 155 s and 305 s are 150 s and 300 s at full voltage (t − τ/2),
        // so the hand-worked example above must come out unchanged.
        NeutralMarkerScale ramped = new NeutralMarkerScale(50, 60, 25, 10, 155, 0);
        assertEquals(80.0, ramped.eofMobility(), 1e-12);
        assertEquals(-40.0, ramped.mobility(305), 1e-12);
        assertEquals(305.0, ramped.timeS(-40), 1e-9);
        // Ignoring the ramp would be off by more than 0.5 units.
        NeutralMarkerScale ignored = new NeutralMarkerScale(50, 60, 25, 0, 155, 0);
        assertTrue(Math.abs(ignored.mobility(305) - (-40.0)) > 0.5);
    }

    @Test
    void recoversSynthesisedMobilities() {
        NeutralMarkerScale scale = (NeutralMarkerScale) scale();
        assertEquals(60.0, scale.eofMobility(), 1e-9);
        for (double mu : new double[] {-45, -20, 0, 15, 70}) {
            assertEquals(mu, scale.mobility(RUN.rawTimeS(mu)), 1e-9);
        }
    }

    @Test
    void rejectsImpossibleGeometry() {
        assertThrows(IllegalArgumentException.class, () -> new NeutralMarkerScale(60, 60, 25, 0, 150, 0));
        assertThrows(IllegalArgumentException.class, () -> new NeutralMarkerScale(-1, 60, 25, 0, 150, 0));
        assertThrows(IllegalArgumentException.class, () -> new NeutralMarkerScale(50, 60, 0, 0, 150, 0));
        assertThrows(IllegalArgumentException.class, () -> new NeutralMarkerScale(50, 60, 25, -1, 150, 0));
        assertThrows(IllegalArgumentException.class, () -> new NeutralMarkerScale(50, 60, 25, 0, 150, -0.1));
        assertThrows(IllegalArgumentException.class, () -> new NeutralMarkerScale(50, 60, 25, 0, 150, Double.NaN));
    }
}
