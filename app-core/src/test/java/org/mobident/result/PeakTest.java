package org.mobident.result;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.mobident.Tolerances;

class PeakTest {

    private static Peak withCentre(double centreSdS, double shapeSdS) {
        return new Peak(100, 120.0, 0.01, 121.0, centreSdS, 118.0, 125.0, 1.0, 2.0, 0.01, 1.5, 30000, 2.0, 50.0,
                false, shapeSdS);
    }

    @Test
    void theUsualSdCutsOnlyTheShapeTerm() {
        // independent terms add in quadrature (JCGM 100:2008, eq. 10): the noise part of 0.5 s is
        // √(0.25 − 0.16) = 0.3 s, and the usual case keeps k = 0.2 of the 0.4 s shape term
        double k = Tolerances.CENTRE_SHAPE_USUAL_SHARE;
        double expected = Math.sqrt(0.3 * 0.3 + (k * 0.4) * (k * 0.4));
        assertEquals(expected, withCentre(0.5, 0.4).migrationTimeUsualSdS(), 1e-12);
        assertEquals(0.5, withCentre(0.5, 0.4).migrationTimeSdS(), 0.0);
    }

    @Test
    void withoutAShapeTermTheUsualSdIsTheStatedOne() {
        assertEquals(0.5, withCentre(0.5, 0.0).migrationTimeUsualSdS(), 0.0);
        Peak apexOnly = new Peak(100, 120.0, 0.02, 118.0, 125.0, 1.0, 2.0, 0.01, 1.5, 30000, 2.0, 50.0, false);
        assertEquals(0.02, apexOnly.migrationTimeUsualSdS(), 0.0);
    }

    @Test
    void aShapeTermAboveTheWholeSdIsCappedAtIt() {
        double k = Tolerances.CENTRE_SHAPE_USUAL_SHARE;
        assertEquals(k * 0.5, withCentre(0.5, 0.9).migrationTimeUsualSdS(), 1e-12);
    }
}
