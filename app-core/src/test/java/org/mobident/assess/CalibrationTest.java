package org.mobident.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Expected calibration error and Brier score on a hand-worked example. Definitions: ECE =
 * Σ_b (n_b/N)·|acc_b − conf_b| over equal-width confidence bins (Naeini, Cooper &amp; Hauskrecht,
 * AAAI 2015; Guo, Pleiss, Sun &amp; Weinberger, ICML 2017); Brier score = (1/N)·Σ (p − o)²
 * for the event "the statement is right" (Brier, Mon. Weather Rev. 78 (1950) 1).
 */
class CalibrationTest {

    private static final double EXACT = 1e-12;

    @Test
    void handWorkedEceAndBrier() {
        double[] p = {0.95, 0.95, 0.85, 0.62, 0.68, 0.25};
        boolean[] right = {true, true, false, true, false, false};
        Calibration c = Calibration.of(p, right);
        // Bins by hand:
        //   [0.9, 1.0]: 0.95 right, 0.95 right  -> n 2, conf 0.95, acc 1.0, |gap| 0.05
        //   [0.8, 0.9): 0.85 wrong              -> n 1, conf 0.85, acc 0.0, |gap| 0.85
        //   [0.6, 0.7): 0.62 right, 0.68 wrong  -> n 2, conf 0.65, acc 0.5, |gap| 0.15
        //   [0.2, 0.3): 0.25 wrong              -> n 1, conf 0.25, acc 0.0, |gap| 0.25
        // ECE = (2*0.05 + 1*0.85 + 2*0.15 + 1*0.25) / 6 = 1.50 / 6 = 0.25
        assertEquals(0.25, c.ece(), EXACT);
        // Brier = (0.05^2 + 0.05^2 + 0.85^2 + 0.38^2 + 0.68^2 + 0.25^2) / 6
        //       = (0.0025 + 0.0025 + 0.7225 + 0.1444 + 0.4624 + 0.0625) / 6 = 1.3968 / 6 = 0.2328
        assertEquals(0.2328, c.brier(), EXACT);
        // mean confidence 4.30 / 6, accuracy 3 / 6
        assertEquals(4.30 / 6, c.meanConfidence(), EXACT);
        assertEquals(0.5, c.accuracy(), EXACT);
        assertEquals(6, c.count());

        assertEquals(Calibration.BINS, c.bins().size());
        ReliabilityBin top = c.bins().get(9);
        assertEquals(2, top.count());
        assertEquals(0.95, top.meanConfidence(), EXACT);
        assertEquals(1.0, top.accuracy(), EXACT);
        ReliabilityBin sixties = c.bins().get(6);
        assertEquals(2, sixties.count());
        assertEquals(0.65, sixties.meanConfidence(), EXACT);
        assertEquals(0.5, sixties.accuracy(), EXACT);
        assertEquals(0, c.bins().get(0).count());
        assertTrue(Double.isNaN(c.bins().get(0).accuracy()), "an empty bin has no accuracy");
    }

    @Test
    void perfectlyCalibratedStatementsHaveNoCalibrationError() {
        // four statements at 0.75 of which three are right: accuracy equals confidence in the one bin
        Calibration c = Calibration.of(new double[] {0.75, 0.75, 0.75, 0.75}, new boolean[] {true, true, true, false});
        assertEquals(0.0, c.ece(), EXACT);
        // Brier = (3 * 0.25^2 + 0.75^2) / 4 = (0.1875 + 0.5625) / 4 = 0.1875
        assertEquals(0.1875, c.brier(), EXACT);
    }

    @Test
    void binEdgesBelongToTheUpperBinAndOneToTheLast() {
        assertEquals(0, Calibration.bin(0.0));
        assertEquals(1, Calibration.bin(0.1));
        assertEquals(3, Calibration.bin(0.3), "0.3 * 10 is 3.0000000000000004 in binary and still bin 3");
        assertEquals(8, Calibration.bin(0.8999));
        assertEquals(9, Calibration.bin(0.9));
        assertEquals(9, Calibration.bin(1.0));
    }

    @Test
    void nothingToCalibrateGivesUnknownScores() {
        Calibration c = Calibration.of(new double[0], new boolean[0]);
        assertEquals(0, c.count());
        assertTrue(Double.isNaN(c.ece()) && Double.isNaN(c.brier()) && Double.isNaN(c.accuracy()));
        assertThrows(IllegalArgumentException.class, () -> Calibration.of(new double[] {1.2}, new boolean[] {true}));
    }
}
