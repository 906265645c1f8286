package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.Peak;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;

/** The prior of the neutral-marker choice before the library is asked. */
class MarkerPriorTest {

    private static Peak peak(double apexS, double height, double signalToNoise) {
        return new Peak(100, apexS, 0.01, apexS - 2, apexS + 2, height, height, height / apexS, 1.5, 100_000, Double.NaN,
                signalToNoise, false);
    }

    /**
     * With no library evidence (no evaluator: no reading explains the run, so the peak outside the
     * window is tried too), the weights of the readings are the prior alone: the window's share
     * {@link MarkerLocator#IN_WINDOW_PRIOR} is split with a detected peak weighing 1 and one below the
     * detection limit {@link MarkerLocator#FAINT_CANDIDATE_WEIGHT}, so 0.95 × 1/1.2 and
     * 0.95 × 0.2/1.2; the peak outside gets the rest, 0.05 (normalised weights of a discrete prior).
     */
    @Test
    void aCandidateBelowTheDetectionLimitWeighsLess() {
        RunConditions c = new RunConditions(60, 52, 25, 0, 25.0, "b", 250, 350, Detection.DIRECT, Double.NaN,
                Double.NaN, Double.NaN);
        List<Peak> peaks = List.of(peak(120, 0.5, 80), peak(280, 0.002, 1.5), peak(300, 0.2, 40));
        MarkerLocator.Choice choice = new MarkerLocator(false).locate(c, peaks, null);
        assertEquals(3, choice.others().size());
        assertEquals(2, choice.best().neutralIndex(), "the detected peak in the window");
        // 0.95 / 1.2 and 0.95 × 0.2 / 1.2, worked by hand
        double[] expected = {0.05, 0.158333333333, 0.791666666667};
        for (int k = 0; k < 3; k++) {
            assertEquals(expected[choice.others().get(k).neutralIndex()], choice.weights()[k], 1e-9);
        }
    }

    @Test
    void weightsFollowTheDetectionLimit() {
        // the detection limit S/N = 3 (ICH Q2(R1), signal-to-noise approach)
        assertEquals(1.0, MarkerLocator.candidateWeight(peak(100, 1, 3.0)), 0.0);
        assertEquals(1.0, MarkerLocator.candidateWeight(peak(100, 1, Double.NaN)), 0.0);
        assertEquals(0.2, MarkerLocator.candidateWeight(peak(100, 1, 2.99)), 0.0);
        assertEquals(0.2, MarkerLocator.candidateWeight(peak(100, 1, 1.5)), 0.0);
    }
}
