package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class WaterViscosityReferenceTest {

    /** Accepted relative deviation from published table values. */
    private static final double TABLE_RELATIVE = 0.003;
    private static final double KELVIN = org.mobident.Units.CELSIUS_ZERO_K;

    @Test
    void matchesTheIapwsTableValues() {
        // IAPWS 2008 release / CRC Handbook "Viscosity of water" at 0.1 MPa (from memory).
        assertEquals(1.0016, WaterViscosity.mPaS(20), TABLE_RELATIVE * 1.0016);
        assertEquals(0.8900, WaterViscosity.mPaS(25), TABLE_RELATIVE * 0.8900);
        assertEquals(0.6527, WaterViscosity.mPaS(40), TABLE_RELATIVE * 0.6527);
    }

    @Test
    void matchesPerrysSaturatedLiquidTable() {
        // Perry's Chemical Engineers' Handbook, 9th ed., Table 2-135 "Thermodynamic properties of water",
        // saturated liquid, viscosity in µPa s (read). The saturation pressure (< 0.1 MPa up to 370 K)
        // changes the viscosity of liquid water by far less than the tolerance.
        double[][] kelvinAndMicroPaS = {
            {273.16, 1791.2}, {280, 1433.7}, {290, 1084.0}, {300, 853.84}, {310, 693.54},
            {320, 577.02}, {330, 489.49}, {340, 421.97}, {350, 368.77}, {360, 326.10}, {370, 291.36},
        };
        for (double[] row : kelvinAndMicroPaS) {
            double expected = row[1] / 1000.0;
            assertEquals(expected, WaterViscosity.mPaS(row[0] - KELVIN), TABLE_RELATIVE * expected,
                    "at " + row[0] + " K");
        }
    }

    @Test
    void fallsSteadilyWithTemperature() {
        double previous = Double.POSITIVE_INFINITY;
        for (double t = WaterViscosity.MIN_TEMPERATURE_C; t <= WaterViscosity.MAX_TEMPERATURE_C; t += 0.5) {
            double eta = WaterViscosity.mPaS(t);
            assertTrue(eta < previous, "at " + t + " °C");
            previous = eta;
        }
    }

    @Test
    void rejectsTemperaturesOutsideTheRange() {
        assertThrows(IllegalArgumentException.class, () -> WaterViscosity.mPaS(-0.5));
        assertThrows(IllegalArgumentException.class, () -> WaterViscosity.mPaS(100.5));
        assertThrows(IllegalArgumentException.class, () -> WaterViscosity.mPaS(Double.NaN));
    }
}
