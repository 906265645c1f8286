package org.mobident.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class PeakSegmenterTest {

    // index:                    0  1  2   3  4  5  6  7  8  9  10
    private static final double[] TWO = {0, 0, 5, 10, 5, 2, 6, 9, 4, 0, 0};

    @Test
    void splitsAtTheValleyWhenBothSidesExceedTheHysteresis() {
        // hand-checked: falls 10 → 2 (8 ≥ 3), rises 2 → 9 (7 ≥ 3): valley at index 5
        List<int[]> segments = PeakSegmenter.segments(TWO, 1.0, 3.0);
        assertEquals(2, segments.size());
        assertArrayEquals(new int[] {1, 5}, segments.get(0));
        assertArrayEquals(new int[] {5, 9}, segments.get(1));
    }

    @Test
    void mergesWhenTheValleyIsShallowerThanTheHysteresis() {
        // hand-checked: the rise from the valley, 2 → 9, is below 7.5
        List<int[]> segments = PeakSegmenter.segments(TWO, 1.0, 7.5);
        assertEquals(1, segments.size());
        assertArrayEquals(new int[] {1, 9}, segments.get(0));
    }

    @Test
    void separateRegionsAndEdges() {
        double[] v = {3, 1, 0, 0, 4, 0};
        List<int[]> segments = PeakSegmenter.segments(v, 0.5, 1.0);
        assertEquals(2, segments.size());
        assertArrayEquals(new int[] {0, 2}, segments.get(0));
        assertArrayEquals(new int[] {3, 5}, segments.get(1));
        assertEquals(0, PeakSegmenter.segments(new double[] {0, 0.2, 0.1}, 0.5, 1.0).size());
    }
}
