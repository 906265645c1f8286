package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.mobident.result.MobilityScale;
import org.mobident.trace.RunConditions;

class MobilityScalesTest {

    private static RunConditions conditions(double detectorLengthCm, double totalLengthCm, double voltageKv,
                                            double refMarkerMobility) {
        return new RunConditions(totalLengthCm, detectorLengthCm, voltageKv, 6, 25, "borate", Double.NaN,
                Double.NaN, null, refMarkerMobility, Double.NaN, Double.NaN);
    }

    @Test
    void neutralMarkerAndGeometryGiveTheNeutralMarkerScale() {
        MobilityScale scale = MobilityScales.forRun(conditions(50, 60, 25, Double.NaN), 203, 0.5, Double.NaN,
                Double.NaN).orElseThrow();
        assertInstanceOf(NeutralMarkerScale.class, scale);
        assertEquals(60.0, scale.eofMobility(), 1e-9);
    }

    @Test
    void bothMarkersGiveTheTwoMarkerScaleEvenWithGeometry() {
        MobilityScale scale = MobilityScales.forRun(conditions(50, 60, 25, -30), 203, 0.5, 403, 0.5)
                .orElseThrow();
        assertInstanceOf(TwoMarkerScale.class, scale);
        assertEquals(-45.0, scale.mobility(803), 1e-9);
    }

    @Test
    void bothMarkersNeedNoGeometry() {
        RunConditions noGeometry = conditions(Double.NaN, Double.NaN, Double.NaN, -30);
        assertInstanceOf(TwoMarkerScale.class,
                MobilityScales.forRun(noGeometry, 203, 0.5, 403, 0.5).orElseThrow());
    }

    @Test
    void aChargedMarkerAloneNeedsGeometry() {
        assertInstanceOf(ChargedMarkerScale.class,
                MobilityScales.forRun(conditions(50, 60, 25, -30), Double.NaN, Double.NaN, 403, 0.5).orElseThrow());
        assertTrue(MobilityScales.forRun(conditions(Double.NaN, Double.NaN, Double.NaN, -30), Double.NaN,
                Double.NaN, 403, 0.5).isEmpty());
    }

    @Test
    void noMarkerNoScale() {
        assertTrue(MobilityScales.forRun(conditions(50, 60, 25, Double.NaN), Double.NaN, Double.NaN, Double.NaN,
                Double.NaN).isEmpty());
        // A charged-marker time without a declared mobility is ignored.
        assertTrue(MobilityScales.forRun(conditions(50, 60, 25, Double.NaN), Double.NaN, Double.NaN, 403, 0.5)
                .isEmpty());
    }
}
