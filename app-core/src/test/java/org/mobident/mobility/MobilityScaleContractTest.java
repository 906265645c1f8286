package org.mobident.mobility;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.mobident.result.MobilityScale;

/**
 * Properties every {@link MobilityScale} must have. Each implementation's test subclasses this and
 * supplies a scale together with a way to rebuild it with other marker times.
 */
abstract class MobilityScaleContractTest {

    /** Relative agreement of a round trip time → mobility → time (rounding only). */
    static final double ROUND_TRIP_RELATIVE = 1e-9;
    /** Relative agreement of the analytic propagation with central differences. */
    static final double NUMERICAL_DERIVATIVE_RELATIVE = 1e-5;
    /** Step of the central differences, s. */
    static final double DERIVATIVE_STEP_S = 1e-3;
    /** Relative agreement of the analytic propagation with a Monte-Carlo standard deviation. */
    static final double MONTE_CARLO_RELATIVE = 0.05;
    static final int MONTE_CARLO_DRAWS = 100_000;
    static final long MONTE_CARLO_SEED = 20_240_611L;
    /** Apex time uncertainty used by the propagation checks, s. */
    static final double APEX_SD_S = 0.6;
    /** A time so late that 1/t' is practically zero, s. */
    static final double VERY_LATE_S = 1e13;
    /** Absolute agreement for mobility values, 1e-9 m²/(V s). */
    static final double MOBILITY_ABS = 1e-9;

    /** The scale under test. */
    abstract MobilityScale scale();

    /** Raw marker times of {@link #scale()}, in a fixed order. */
    abstract double[] markerTimesS();

    /** Standard uncertainties of those marker times, same order. */
    abstract double[] markerSdsS();

    /** The same scale with the marker times replaced (same order as {@link #markerTimesS()}). */
    abstract MobilityScale withMarkerTimes(double[] timesS);

    /** Raw apex times of zones that reach the detector, s. */
    abstract double[] sampleTimesS();

    @Test
    void timeOfMobilityInvertsMobilityOfTime() {
        MobilityScale s = scale();
        for (double t : sampleTimesS()) {
            double back = s.timeS(s.mobility(t));
            assertEquals(t, back, ROUND_TRIP_RELATIVE * t, "round trip at " + t + " s");
        }
    }

    @Test
    void mobilityOfTimeInvertsTimeOfMobility() {
        MobilityScale s = scale();
        for (double t : sampleTimesS()) {
            double mu = s.mobility(t);
            assertEquals(mu, s.mobility(s.timeS(mu)), MOBILITY_ABS, "round trip of " + mu);
        }
    }

    @Test
    void aZoneArrivingInfinitelyLateHasMinusTheEofMobility() {
        MobilityScale s = scale();
        assertEquals(-s.eofMobility(), s.mobility(VERY_LATE_S), 1e-6);
    }

    @Test
    void aZoneOnTheFarSideOfTheEofNeverArrives() {
        MobilityScale s = scale();
        double standStill = -s.eofMobility();
        double reachable = s.mobility(sampleTimesS()[0]);
        double mirrored = standStill - (reachable - standStill);
        assertTrue(Double.isNaN(s.timeS(mirrored)), "mobility " + mirrored + " moves away from the detector");
        assertFalse(Double.isNaN(s.timeS(reachable)));
    }

    @Test
    void standardUncertaintyMatchesNumericalDerivatives() {
        MobilityScale s = scale();
        double[] markers = markerTimesS();
        double[] sds = markerSdsS();
        for (double t : sampleTimesS()) {
            double dApex = (s.mobility(t + DERIVATIVE_STEP_S) - s.mobility(t - DERIVATIVE_STEP_S))
                    / (2 * DERIVATIVE_STEP_S);
            double variance = Math.pow(dApex * APEX_SD_S, 2);
            for (int i = 0; i < markers.length; i++) {
                double[] up = markers.clone();
                double[] down = markers.clone();
                up[i] += DERIVATIVE_STEP_S;
                down[i] -= DERIVATIVE_STEP_S;
                double dMarker = (withMarkerTimes(up).mobility(t) - withMarkerTimes(down).mobility(t))
                        / (2 * DERIVATIVE_STEP_S);
                variance += Math.pow(dMarker * sds[i], 2);
            }
            double expected = Math.sqrt(variance);
            assertEquals(expected, s.mobilitySd(t, APEX_SD_S), NUMERICAL_DERIVATIVE_RELATIVE * expected,
                    "propagated uncertainty at " + t + " s");
        }
    }

    @Test
    void standardUncertaintyMatchesMonteCarlo() {
        MobilityScale s = scale();
        double[] markers = markerTimesS();
        double[] sds = markerSdsS();
        double t = sampleTimesS()[sampleTimesS().length - 1];
        Random random = new Random(MONTE_CARLO_SEED);
        double sum = 0;
        double sumSq = 0;
        double[] drawn = new double[markers.length];
        for (int n = 0; n < MONTE_CARLO_DRAWS; n++) {
            for (int i = 0; i < markers.length; i++) {
                drawn[i] = markers[i] + sds[i] * random.nextGaussian();
            }
            double mu = withMarkerTimes(drawn).mobility(t + APEX_SD_S * random.nextGaussian());
            sum += mu;
            sumSq += mu * mu;
        }
        double mean = sum / MONTE_CARLO_DRAWS;
        double sd = Math.sqrt((sumSq - MONTE_CARLO_DRAWS * mean * mean) / (MONTE_CARLO_DRAWS - 1));
        double analytic = s.mobilitySd(t, APEX_SD_S);
        assertTrue(analytic > 0);
        assertEquals(sd, analytic, MONTE_CARLO_RELATIVE * sd, "Monte-Carlo sd " + sd + " vs " + analytic);
    }

    @Test
    void uncertaintyGrowsWithTheApexUncertainty() {
        MobilityScale s = scale();
        double t = sampleTimesS()[0];
        assertTrue(s.mobilitySd(t, 2 * APEX_SD_S) > s.mobilitySd(t, APEX_SD_S));
        assertTrue(s.mobilitySd(t, 0) >= 0);
    }

    @Test
    void rejectsImpossibleArguments() {
        MobilityScale s = scale();
        assertThrows(IllegalArgumentException.class, () -> s.mobility(0));
        assertThrows(IllegalArgumentException.class, () -> s.mobility(-5));
        assertThrows(IllegalArgumentException.class, () -> s.mobility(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> s.mobilitySd(100, -1));
        assertThrows(IllegalArgumentException.class, () -> s.mobilitySd(100, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> s.timeS(Double.NaN));
    }

    @Test
    void rejectsNonPositiveMarkerTimes() {
        double[] markers = markerTimesS();
        for (int i = 0; i < markers.length; i++) {
            double[] bad = markers.clone();
            bad[i] = 0;
            assertThrows(IllegalArgumentException.class, () -> withMarkerTimes(bad));
        }
    }

    @Test
    void describesItselfWithTheMarkerTimes() {
        String text = scale().describe();
        assertFalse(text.isBlank());
        for (double t : markerTimesS()) {
            assertTrue(text.contains(String.format(java.util.Locale.ROOT, "%.1f s", t)), text);
        }
    }

    @Test
    void equalValuesMakeEqualScales() {
        assertEquals(scale(), withMarkerTimes(markerTimesS()));
    }
}
