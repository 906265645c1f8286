package org.mobident.trace;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** A stretch of a trace as a trace of its own. */
class TraceSliceTest {

    @Test
    void aSliceHoldsExactlyItsPointsAndLeavesTheTraceAsItWas() {
        Trace t = new Trace("r", "r.csv", new double[] {0, 1, 2, 3, 4}, new double[] {5, 6, 7, 8, 9});
        Trace s = t.slice(1, 4);
        assertArrayEquals(new double[] {1, 2, 3}, s.timesS());
        assertArrayEquals(new double[] {6, 7, 8}, s.signals());
        assertEquals("r", s.name());
        assertEquals("r.csv", s.sourceFile());
        assertArrayEquals(new double[] {0, 1, 2, 3, 4}, t.timesS());
        assertThrows(IllegalArgumentException.class, () -> t.slice(2, 3), "one point is no trace");
    }
}
