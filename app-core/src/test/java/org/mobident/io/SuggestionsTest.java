package org.mobident.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Edit distance against hand-counted cases, and the hint built on it. */
class SuggestionsTest {

    @Test
    void editDistanceByHand() {
        // kitten → sitting: k→s, e→i, +g = 3 (the textbook example of the Levenshtein distance)
        assertEquals(3, Suggestions.distance("kitten", "sitting"));
        assertEquals(0, Suggestions.distance("ramp_s", "ramp_s"));
        assertEquals(1, Suggestions.distance("voltage_kw", "voltage_kv"));
        assertEquals(6, Suggestions.distance("", "ramp_s"));
    }

    @Test
    void suggestsOnlyWhatIsClose() {
        List<String> known = List.of("voltage_kv", "ramp_s", "temperature_c");
        assertEquals(" (did you mean 'voltage_kv'?)", Suggestions.didYouMean("voltage_kw", known));
        assertEquals(" (did you mean 'temperature_c'?)", Suggestions.didYouMean("temprature_c", known));
        assertEquals("", Suggestions.didYouMean("operator", known));
        assertEquals("", Suggestions.didYouMean("ramp_s", known), "an exact name needs no hint");
    }
}
