package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class PeakAlignerTest {

    private static List<Measurement> run(String name, double... mobilities) {
        List<Measurement> out = new ArrayList<>();
        for (double m : mobilities) {
            out.add(new Measurement(name, m, 0.01, 100, 1, 1));
        }
        return out;
    }

    private static List<List<Double>> values(List<List<Measurement>> groups) {
        return groups.stream().map(g -> g.stream().map(Measurement::mobility).toList()).toList();
    }

    @Test
    void shiftedRunIsAlignedAsAWholeNotPeakByPeak() {
        // Run b sits 0.4 above run a, closer to a's next zone (0.2) than to its own (0.4): a nearest-neighbour
        // grouping would pair 30.4 with 30.6; the one-to-one alignment keeps both zones whole.
        List<List<Measurement>> g = PeakAligner.group(List.of(run("a", 30.0, 30.6), run("b", 30.4, 31.0)), 4, 2.0);
        assertEquals(List.of(List.of(30.0, 30.4), List.of(30.6, 31.0)), values(g));
    }

    @Test
    void missingAndExtraPeaksFormTheirOwnGroups() {
        List<List<Measurement>> g = PeakAligner.group(List.of(
                run("a", -70.0, -60.0, -50.0),
                run("b", -70.1, -50.1),
                run("c", -69.9, -60.1, -55.0, -49.9)), 4, 1.0);
        assertEquals(List.of(List.of(-70.0, -70.1, -69.9), List.of(-60.0, -60.1), List.of(-55.0),
                List.of(-50.0, -50.1, -49.9)), values(g));
    }

    @Test
    void aGroupNeverTakesTwoPeaksOfOneRun() {
        // Two zones 0.3 apart, well inside the joining distance, in three runs.
        List<List<Measurement>> g = PeakAligner.group(List.of(run("a", 40.0, 40.3), run("b", 40.05, 40.32),
                run("c", 39.98, 40.29)), 4, 2.0);
        assertEquals(2, g.size());
        for (List<Measurement> group : g) {
            assertEquals(3, group.stream().map(Measurement::run).distinct().count());
        }
    }

    @Test
    void emptyInput() {
        assertEquals(List.of(), PeakAligner.group(List.of(), 4, 1));
        assertEquals(List.of(), PeakAligner.group(List.of(run("a")), 4, 1));
    }

    @Test
    void monotoneMatcherFindsTheCheapestNonCrossingMatching() {
        double[] left = {1.0, 2.0, 3.0};
        double[] right = {2.1, 3.05};
        int[] p = MonotoneMatcher.match(3, 2, (i, j) -> Math.pow(left[i] - right[j], 2), 1.0);
        assertArrayEquals(new int[] {-1, 0, 1}, p);
        int[] forbidden = MonotoneMatcher.match(2, 2, (i, j) -> i == j ? Double.POSITIVE_INFINITY : 0.0, 1.0);
        // Only 0→1 or 1→0 are allowed; they cross, so one of them is taken and the rest left unmatched.
        assertEquals(1, java.util.Arrays.stream(forbidden).filter(x -> x >= 0).count());
    }
}
