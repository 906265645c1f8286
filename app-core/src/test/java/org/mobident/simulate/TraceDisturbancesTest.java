package org.mobident.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.Trace;

/** Correlated noise, baseline wander, spikes and per-zone dispersion in {@link TraceSimulator}. */
class TraceDisturbancesTest {

    /** Points of the long noise-only traces used for the statistics. */
    private static final int LONG_DURATION_S = 10_000;
    private static final double LONG_RATE_HZ = 20;
    /** Relative tolerance of the sample SD against the stated marginal SD. */
    private static final double SD_RELATIVE_TOLERANCE = 0.03;
    /** Absolute tolerance of the sample lag-one autocorrelation. */
    private static final double LAG1_TOLERANCE = 0.01;
    /** Signal values agree to this (pure additions of doubles). */
    private static final double EXACT = 1e-12;

    private static RunConditions conditions() {
        return new RunConditions(60, 50, 25, 0, 25, "test", Double.NaN, Double.NaN, Detection.DIRECT,
                Double.NaN, Double.NaN, Double.NaN);
    }

    private static SimulationSpec.Builder noiseOnly(double sd, double phi, long seed) {
        return SimulationSpec.builder(conditions()).eofMobility(45).durationS(LONG_DURATION_S)
                .samplingHz(LONG_RATE_HZ).noiseSd(sd).noiseCorrelation(phi).seed(seed);
    }

    private static double sd(double[] y) {
        double mean = 0;
        for (double v : y) {
            mean += v;
        }
        mean /= y.length;
        double ss = 0;
        for (double v : y) {
            ss += (v - mean) * (v - mean);
        }
        return Math.sqrt(ss / (y.length - 1));
    }

    /** Sample autocorrelation at lag one, r1 = Σ(y_t − ȳ)(y_{t+1} − ȳ) / Σ(y_t − ȳ)² (Box & Jenkins 1970, §2.1). */
    private static double lag1(double[] y) {
        double mean = 0;
        for (double v : y) {
            mean += v;
        }
        mean /= y.length;
        double num = 0;
        double den = 0;
        for (int i = 0; i < y.length; i++) {
            den += (y[i] - mean) * (y[i] - mean);
            if (i + 1 < y.length) {
                num += (y[i] - mean) * (y[i + 1] - mean);
            }
        }
        return num / den;
    }

    @Test
    void autoregressiveNoiseHasTheStatedMarginalSdAndLagOneCorrelation() {
        // Box & Jenkins, Time Series Analysis (1970), ch. 3: an AR(1) series with coefficient φ has
        // autocorrelation φ at lag one; scaling the innovations by √(1 − φ²) keeps the marginal SD.
        // Tolerances: 200,001 points; for φ = 0.9 about 10,000 effectively independent ones, so the
        // SD is known to ~1 % and r1 to ~0.003 (Bartlett's approximation, var r1 ≈ (1 − φ²)/n).
        for (double phi : new double[] {0.5, 0.8, 0.9}) {
            double sd = 0.02;
            Trace t = TraceSimulator.simulate("ar", noiseOnly(sd, phi, 42).build());
            double[] y = t.signals();
            assertEquals(sd, sd(y), SD_RELATIVE_TOLERANCE * sd, "φ = " + phi);
            assertEquals(phi, lag1(y), LAG1_TOLERANCE, "φ = " + phi);
        }
    }

    @Test
    void whiteNoiseHasNoLagOneCorrelation() {
        double[] y = TraceSimulator.simulate("white", noiseOnly(0.02, 0.0, 42).build()).signals();
        assertEquals(0.0, lag1(y), LAG1_TOLERANCE);
        assertEquals(0.02, sd(y), SD_RELATIVE_TOLERANCE * 0.02);
    }

    @Test
    void spikesSitOnTheirSamplingPointsAndNowhereElse() {
        SimulationSpec.Builder b = SimulationSpec.builder(conditions()).eofMobility(45).durationS(300)
                .samplingHz(4).noiseSd(0.01).noiseCorrelation(0.7).seed(5).zone("a", 30, 1.0, 100_000);
        SimulationSpec clean = b.build();
        Spike one = new Spike(100.25, 0.8, 1);
        Spike two = new Spike(200.0, -1.5, 2);
        SimulationSpec spiked = b.spike(one).spike(two).build();
        double[] without = TraceSimulator.simulate("x", clean).signals();
        double[] with = TraceSimulator.simulate("x", spiked).signals();
        int i1 = TraceSimulator.spikeIndex(spiked, one);
        int i2 = TraceSimulator.spikeIndex(spiked, two);
        assertEquals(401, i1, "100.25 s at 4 Hz");
        assertEquals(800, i2, "200 s at 4 Hz");
        for (int i = 0; i < with.length; i++) {
            double expected = i == i1 ? 0.8 : (i == i2 || i == i2 + 1) ? -1.5 : 0.0;
            assertEquals(expected, with[i] - without[i], EXACT, "point " + i);
        }
    }

    @Test
    void baselineWavesAddTheirSinusoids() {
        SimulationSpec.Builder b = SimulationSpec.builder(conditions()).eofMobility(45).durationS(400).samplingHz(5)
                .baseline(0.3).drift(1e-4, -2e-7);
        double[] flat = TraceSimulator.simulate("x", b.build()).signals();
        BaselineWave w1 = new BaselineWave(0.05, 120, 0.4);
        BaselineWave w2 = new BaselineWave(0.02, 333, 2.0);
        Trace wavy = TraceSimulator.simulate("x", b.baselineWave(w1).baselineWave(w2).build());
        for (int i = 0; i < wavy.size(); i++) {
            double t = wavy.timeS(i);
            double expected = 0.05 * Math.sin(2 * Math.PI * t / 120 + 0.4) + 0.02 * Math.sin(2 * Math.PI * t / 333 + 2.0);
            assertEquals(expected, wavy.signal(i) - flat[i], EXACT, "at " + t + " s");
        }
    }

    @Test
    void eachZoneMayCarryItsOwnDispersionStrength() {
        ElectromigrationDispersion common = new ElectromigrationDispersion(-78, 0.004);
        RunConditions reversed = new RunConditions(80, 72, -20, 0, 25, "t", Double.NaN, Double.NaN,
                Detection.DIRECT, Double.NaN, Double.NaN, Double.NaN);
        SimulationSpec.Builder base = SimulationSpec.builder(reversed).eofMobility(-50).durationS(500).samplingHz(20);
        // a zone stating the common strength as its own looks exactly like one taking the common strength
        double[] implicit = TraceSimulator.simulate("x", base.build().toBuilder()
                .zone(new SimulatedZone("a", -40, 1, 100_000)).build(), common).signals();
        double[] explicit = TraceSimulator.simulate("x", base.build().toBuilder()
                .zone(new SimulatedZone("a", -40, 1, 100_000, 0.004)).build(), common).signals();
        for (int i = 0; i < implicit.length; i++) {
            assertEquals(implicit[i], explicit[i], EXACT);
        }
        // strength 0 keeps the zone Gaussian: its apex stays at the migration time
        SimulationSpec sym = base.build().toBuilder().zone(new SimulatedZone("a", -40, 1, 100_000, 0.0)).build();
        double[] gaussian = TraceSimulator.simulate("x", sym).signals();
        double[] own = TraceSimulator.simulate("x", sym, common).signals();
        for (int i = 0; i < gaussian.length; i++) {
            assertEquals(gaussian[i], own[i], EXACT);
        }
        // a larger own strength skews more: the apex drops below the common-strength one
        double[] strong = TraceSimulator.simulate("x", base.build().toBuilder()
                .zone(new SimulatedZone("a", -40, 1, 100_000, 0.04)).build(), common).signals();
        assertTrue(max(strong) < max(implicit), "a stronger dispersion lowers the apex (same area)");
        assertNotEquals(max(implicit), max(gaussian));
    }

    private static double max(double[] y) {
        double m = Double.NEGATIVE_INFINITY;
        for (double v : y) {
            m = Math.max(m, v);
        }
        return m;
    }

    @Test
    void refusesImpossibleDisturbances() {
        assertThrows(IllegalArgumentException.class, () -> noiseOnly(0.01, -0.1, 1).build());
        assertThrows(IllegalArgumentException.class, () -> noiseOnly(0.01, 1.0, 1).build());
        assertThrows(IllegalArgumentException.class,
                () -> noiseOnly(0.01, 0, 1).spike(new Spike(LONG_DURATION_S + 1, 1, 1)).build());
        assertThrows(IllegalArgumentException.class, () -> new Spike(1, 1, 3));
        assertThrows(IllegalArgumentException.class, () -> new Spike(-1, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> new BaselineWave(1, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new SimulatedZone("z", -40, 1, 1000, -0.1));
    }
}
