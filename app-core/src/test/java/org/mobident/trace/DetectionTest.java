package org.mobident.trace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/** How a run sheet's detection cell is read (the words are the trade's: direct and indirect UV). */
class DetectionTest {

    @Test
    void theTwoWordsAloneOrWithMore() {
        assertEquals(Detection.INDIRECT, Detection.parse("indirect"));
        assertEquals(Detection.DIRECT, Detection.parse(" Direct "));
        assertEquals(Detection.INDIRECT, Detection.parse("indirect UV"));
        assertEquals(Detection.INDIRECT, Detection.parse("Indirect (UV 254 nm)"));
        assertEquals(Detection.DIRECT, Detection.parse("UV, direct, 214 nm"));
        assertEquals(Detection.INDIRECT, Detection.parse("indirect-UV"));
    }

    @Test
    void neitherOrBothIsNoDetection() {
        assertNull(Detection.parse("UV 214 nm"));
        assertNull(Detection.parse("direct or indirect"));
        assertNull(Detection.parse("directly"));
        assertNull(Detection.parse(""));
        assertNull(Detection.parse(null));
    }
}
