package org.mobident.simulate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.Trace;

class TraceSimulatorTest {

    /** Relative agreement of a numerical integral with the Gaussian area identity. */
    private static final double AREA_RELATIVE_TOLERANCE = 1e-6;

    private static RunConditions conditions(double lt, double ld, double kv, double rampS, Detection d) {
        return new RunConditions(lt, ld, kv, rampS, 25, "test buffer", Double.NaN, Double.NaN, d,
                Double.NaN, Double.NaN, Double.NaN);
    }

    /** Normal polarity, bare silica: Lt 60 cm, Ld 50 cm, +25 kV, ramp 10 s, μ_eof +45. */
    private static SimulationSpec.Builder normal(Detection d) {
        return SimulationSpec.builder(conditions(60, 50, 25, 10, d)).eofMobility(45).durationS(480).samplingHz(20);
    }

    private static int argMax(double[] y) {
        int best = 0;
        for (int i = 1; i < y.length; i++) {
            if (y[i] > y[best]) {
                best = i;
            }
        }
        return best;
    }

    private static int argMin(double[] y) {
        int best = 0;
        for (int i = 1; i < y.length; i++) {
            if (y[i] < y[best]) {
                best = i;
            }
        }
        return best;
    }

    /** Apex by a parabola through the highest sample and its neighbours. */
    private static double refinedApex(Trace tr) {
        double[] y = tr.signals();
        int k = argMax(y);
        double a = y[k - 1];
        double b = y[k];
        double c = y[k + 1];
        double shift = 0.5 * (a - c) / (a - 2 * b + c);
        return tr.timeS(k) + shift * (tr.timeS(k + 1) - tr.timeS(k));
    }

    private static double trapezoid(Trace tr) {
        double area = 0;
        for (int i = 1; i < tr.size(); i++) {
            area += 0.5 * (tr.signal(i) + tr.signal(i - 1)) * (tr.timeS(i) - tr.timeS(i - 1));
        }
        return area;
    }

    @Test
    void apexTimeByHand() {
        // Hand calculation: μ_app = 30 + 45 = 75; t' = 100·50·60/(25·75) = 160 s; t = 160 + 10/2 = 165 s.
        SimulationSpec spec = normal(Detection.DIRECT).build();
        assertEquals(165.0, TraceSimulator.apexTimeS(spec, 30.0), 1e-9);
        // Neutral marker: t' = 300000/(25·45) = 266.67 s, + 5 s.
        assertEquals(300000.0 / (25 * 45) + 5, TraceSimulator.apexTimeS(spec, 0.0), 1e-9);
    }

    @Test
    void reversedPolarityWithReversedEofArrives() {
        // −20 kV, μ_eof −50 (coated wall), chloride-like −76: μ_app = −126, t' = 100·72·80/(20·126).
        SimulationSpec spec = SimulationSpec.builder(conditions(80, 72, -20, 0, Detection.INDIRECT))
                .eofMobility(-50).build();
        assertEquals(576000.0 / (20 * 126), TraceSimulator.apexTimeS(spec, -76.0), 1e-9);
    }

    @Test
    void simulatedApexIsAtPredictedTime() {
        SimulationSpec spec = normal(Detection.DIRECT).zone("k", 30.0, 2.0, 120_000).build();
        Trace tr = TraceSimulator.simulate("apex", spec);
        double predicted = TraceSimulator.apexTimeS(spec, 30.0);
        int k = argMax(tr.signals());
        assertTrue(Math.abs(tr.timeS(k) - predicted) <= 0.5 / spec.samplingHz() + 1e-12,
                "highest sample within half a sampling step of " + predicted);
        assertEquals(predicted, refinedApex(tr), 1e-3, "parabolic apex");
        assertEquals(2.0, tr.signal(k), 2e-3, "height at the apex");
    }

    @Test
    void areaIsHeightTimesSigmaTimesRootTwoPi() {
        double height = 3.0;
        double plates = 90_000;
        SimulationSpec spec = normal(Detection.DIRECT).zone("z", 25.0, height, plates).build();
        Trace tr = TraceSimulator.simulate("area", spec);
        double sigma = TraceSimulator.sigmaS(TraceSimulator.apexTimeS(spec, 25.0), plates);
        // Gaussian identity: ∫ h·exp(−x²/(2σ²)) dx = h·σ·√(2π).
        double expected = height * sigma * Math.sqrt(2 * Math.PI);
        assertEquals(expected, trapezoid(tr), expected * AREA_RELATIVE_TOLERANCE);
    }

    @Test
    void widthFollowsPlateNumber() {
        double plates = 50_000;
        SimulationSpec spec = normal(Detection.DIRECT).zone("z", 20.0, 1.0, plates).build();
        Trace tr = TraceSimulator.simulate("width", spec);
        double t0 = TraceSimulator.apexTimeS(spec, 20.0);
        double m0 = 0;
        double m2 = 0;
        for (int i = 0; i < tr.size(); i++) {
            double dt = tr.timeS(i) - t0;
            m0 += tr.signal(i);
            m2 += tr.signal(i) * dt * dt;
        }
        double sigma = Math.sqrt(m2 / m0);
        assertEquals(plates, (t0 / sigma) * (t0 / sigma), plates * 1e-4, "N = (t/σ)²");
    }

    @Test
    void indirectDetectionGivesDips() {
        SimulationSpec spec = normal(Detection.INDIRECT).zone("na", 46.0, 1.5, 100_000).neutralMarker(0.8).build();
        Trace tr = TraceSimulator.simulate("dips", spec);
        double[] y = tr.signals();
        assertEquals(0.0, y[argMax(y)], 1e-12, "nothing rises above the flat baseline");
        int k = argMin(y);
        assertEquals(-1.5, y[k], 2e-3);
        assertEquals(TraceSimulator.apexTimeS(spec, 46.0), tr.timeS(k), 0.5 / spec.samplingHz() + 1e-12);
        int m = tr.indexAtOrAfter(TraceSimulator.apexTimeS(spec, 0.0));
        assertTrue(y[m] < -0.7 || y[m - 1] < -0.7, "marker is a dip too");
    }

    @Test
    void zonesMovingAwayOrArrivingLateAreAbsent() {
        // Normal polarity, μ_eof +45: an anion at −60 has μ_app = −15 (moves back to the inlet);
        // an anion at −40 has μ_app = +5, t' = 300000/(25·5) = 2400 s > 480 s.
        SimulationSpec spec = normal(Detection.DIRECT).zone("away", -60, 5, 100_000)
                .zone("late", -40, 5, 100_000).build();
        assertTrue(Double.isNaN(TraceSimulator.apexTimeS(spec, -60)));
        assertFalse(TraceSimulator.arrives(spec, -40));
        Trace tr = TraceSimulator.simulate("none", spec);
        for (double v : tr.signals()) {
            assertEquals(0.0, v, 0.0);
        }
    }

    @Test
    void sameSeedSameTraceOtherSeedOtherNoise() {
        SimulationSpec spec = normal(Detection.INDIRECT).zone("z", 30, 1, 100_000).noiseSd(0.05).seed(42).build();
        Trace a = TraceSimulator.simulate("a", spec);
        Trace b = TraceSimulator.simulate("a", spec);
        assertArrayEquals(a.signals(), b.signals(), 0.0);
        Trace c = TraceSimulator.simulate("a", spec.toBuilder().seed(43).build());
        assertFalse(java.util.Arrays.equals(a.signals(), c.signals()));
    }

    @Test
    void noiseHasTheRequestedSpread() {
        double sd = 0.03;
        SimulationSpec spec = normal(Detection.DIRECT).noiseSd(sd).seed(7).build();
        double[] y = TraceSimulator.simulate("noise", spec).signals();
        double mean = 0;
        for (double v : y) {
            mean += v;
        }
        mean /= y.length;
        double var = 0;
        for (double v : y) {
            var += (v - mean) * (v - mean);
        }
        double est = Math.sqrt(var / (y.length - 1));
        // 9601 points: the relative standard error of an SD estimate is about 1/√(2n) ≈ 0.7 %.
        assertEquals(sd, est, sd * 0.04);
        assertEquals(0.0, mean, 4 * sd / Math.sqrt(y.length));
    }

    @Test
    void baselineOffsetAndDrift() {
        SimulationSpec spec = normal(Detection.DIRECT).baseline(1.5).drift(2e-3, -1e-6).durationS(100).build();
        Trace tr = TraceSimulator.simulate("drift", spec);
        assertEquals(2001, tr.size(), "100 s at 20 Hz from 0 s inclusive");
        double t = tr.timeS(1000);
        assertEquals(50.0, t, 1e-12);
        assertEquals(1.5 + 2e-3 * 50 - 1e-6 * 2500, tr.signal(1000), 1e-12);
    }

    /** Asserts that a fronting zone drawn with {@code emd} keeps its area and centroid; returns its trace. */
    private static Trace frontingZoneKeepsAreaAndCentroid(SimulationSpec spec, ElectromigrationDispersion emd) {
        Trace skewed = TraceSimulator.simulate("emd", spec, emd);
        Trace plain = TraceSimulator.simulate("plain", spec);
        assertEquals(trapezoid(plain), trapezoid(skewed), trapezoid(plain) * 1e-5, "area conserved");
        double t0 = TraceSimulator.apexTimeS(spec, 60);
        assertTrue(thirdMoment(skewed, t0) < 0, "fronting: skewed to earlier times");
        assertEquals(t0, firstMoment(skewed), 1e-3, "centroid stays at the predicted time");
        assertTrue(refinedApex(skewed) > t0, "apex moves to the sharp (late) side");
        return skewed;
    }

    @Test
    void dispersionKeepsAreaAndSkewsTheRightWay() {
        double plates = 100_000;
        // Normal polarity cation faster than a co-ion of +30, migrating towards the detector: fronting.
        SimulationSpec spec = normal(Detection.DIRECT).zone("fast", 60, 2, plates).build();
        frontingZoneKeepsAreaAndCentroid(spec, new ElectromigrationDispersion(30, 0.004));
        double t0 = TraceSimulator.apexTimeS(spec, 60);

        // The same ion slower than the co-ion (+90): tailing.
        Trace tail = TraceSimulator.simulate("emd2", spec, new ElectromigrationDispersion(90, 0.008));
        assertTrue(thirdMoment(tail, t0) > 0, "tailing: skewed to later times");

        // Counter-EOF anion (normal polarity, μ_eof +45, μ −20) faster than its co-ion (−10): its
        // diffuse front points to the inlet, which passes the detector last: tailing.
        SimulationSpec counter = normal(Detection.DIRECT).durationS(700).zone("anion", -20, 2, plates).build();
        Trace ct = TraceSimulator.simulate("ct", counter, new ElectromigrationDispersion(-10, 0.004));
        assertTrue(thirdMoment(ct, TraceSimulator.apexTimeS(counter, -20)) > 0);
    }

    @Test
    void triangularZonesKeepAreaAndCentroidAndFallStraight() {
        // The same fronting zone drawn as a smoothed triangle: area and first moment are those of the
        // undispersed zone (both forms are built to keep them), the skew points the same way, and the
        // diffuse flank is straight: half-way along it the second difference over ±0.3 τ is below 2 %
        // of the first (a triangle's flank is linear), where the exponential flank bends by far more.
        double plates = 100_000;
        SimulationSpec spec = normal(Detection.DIRECT).zone("fast", 60, 2, plates).build();
        // (strongly overloaded: τ about six times σ, so that the flank is longer than the smoothing)
        Trace triangle = frontingZoneKeepsAreaAndCentroid(spec, new ElectromigrationDispersion(30, 0.02,
                ElectromigrationDispersion.Shape.TRIANGLE));
        Trace exponential = TraceSimulator.simulate("emg", spec, new ElectromigrationDispersion(30, 0.02));
        double t0 = TraceSimulator.apexTimeS(spec, 60);
        double tau = 0.02 * t0 * (60 - 30) / 30.0; // τ = strength · t · |μ − μ_co| / |μ_co|
        double middle = t0 - 0.5 * tau; // the triangle's flank runs from t0 + τ down to t0 − 2τ
        double d = 0.3 * tau;
        assertTrue(bend(triangle, middle, d) < 0.02, "triangle bends by " + bend(triangle, middle, d));
        assertTrue(bend(exponential, middle, d) > 0.1, "EMG bends by " + bend(exponential, middle, d));
    }

    @Test
    void mixedDrawsStronglyOverloadedZonesAsTriangles() {
        // the common strength is 0.004; a zone of 0.02 (5 times) is a triangle, one of 0.008 (2 times)
        // an EMG: each trace equals the one drawn in that form alone
        for (double own : new double[] {0.02, 0.008}) {
            SimulationSpec spec = normal(Detection.DIRECT)
                    .zone(new SimulatedZone("fast", 60, 2, 100_000, own)).build();
            Trace mixed = TraceSimulator.simulate("m", spec, new ElectromigrationDispersion(30, 0.004,
                    ElectromigrationDispersion.Shape.MIXED));
            ElectromigrationDispersion.Shape expected = own >= 3 * 0.004 ? ElectromigrationDispersion.Shape.TRIANGLE
                    : ElectromigrationDispersion.Shape.EXPONENTIAL;
            Trace alone = TraceSimulator.simulate("a", spec, new ElectromigrationDispersion(30, 0.004, expected));
            for (int i = 0; i < alone.size(); i++) {
                assertEquals(alone.signal(i), mixed.signal(i), 0.0, "strength " + own);
            }
        }
    }

    @Test
    void withoutSkewEveryZoneIsGaussian() {
        SimulationSpec spec = normal(Detection.DIRECT).zone("fast", 60, 2, 100_000).build();
        Trace none = TraceSimulator.simulate("none", spec, new ElectromigrationDispersion(30, 0.02,
                ElectromigrationDispersion.Shape.NONE));
        Trace plain = TraceSimulator.simulate("plain", spec);
        for (int i = 0; i < plain.size(); i++) {
            assertEquals(plain.signal(i), none.signal(i), 0.0);
        }
    }

    /** |y(t + d) − 2y(t) + y(t − d)| / |y(t + d) − y(t − d)| on samples k apart, k the nearest to d. */
    private static double bend(Trace tr, double t, double d) {
        int i = tr.indexAtOrAfter(t);
        int k = (int) Math.round(d / (tr.timeS(i + 1) - tr.timeS(i)));
        double after = tr.signal(i + k);
        double before = tr.signal(i - k);
        return Math.abs(after - 2 * tr.signal(i) + before) / Math.abs(after - before);
    }

    @Test
    void triangleShapeIsTheTriangleSmoothedByItsGaussian() {
        // Checked against the convolution computed directly (midpoint rule over the triangle, 20,000
        // steps): f(y) = h ∫_0^L (1 − u/L) φ((y − u)/σ)/σ du with h = 2σ√(2π)/L.
        double sigma = 0.4;
        double base = 3.0;
        for (double y : new double[] {-1.0, 0.0, 0.3, 1.5, 2.9, 3.5}) {
            int steps = 20_000;
            double sum = 0;
            double du = base / steps;
            for (int k = 0; k < steps; k++) {
                double u = (k + 0.5) * du;
                double z = (y - u) / sigma;
                sum += (1 - u / base) * Math.exp(-0.5 * z * z) / (sigma * Math.sqrt(2 * Math.PI)) * du;
            }
            double expected = 2 * sigma * Math.sqrt(2 * Math.PI) / base * sum;
            assertEquals(expected, TraceSimulator.triangleShape(y, sigma, base), 1e-7, "y = " + y);
        }
    }

    private static double firstMoment(Trace tr) {
        double m0 = 0;
        double m1 = 0;
        for (int i = 0; i < tr.size(); i++) {
            m0 += tr.signal(i);
            m1 += tr.signal(i) * tr.timeS(i);
        }
        return m1 / m0;
    }

    private static double thirdMoment(Trace tr, double t0) {
        double m0 = 0;
        double m1 = 0;
        for (int i = 0; i < tr.size(); i++) {
            m0 += tr.signal(i);
            m1 += tr.signal(i) * tr.timeS(i);
        }
        double mean = m1 / m0;
        double m3 = 0;
        for (int i = 0; i < tr.size(); i++) {
            double d = tr.timeS(i) - mean;
            m3 += tr.signal(i) * d * d * d;
        }
        return m3 / m0;
    }

    @Test
    void emgMatchesGaussianForTinyTauAndIsStableFarOut() {
        double sigma = 0.8;
        for (double x = -4; x <= 4; x += 0.5) {
            assertEquals(Math.exp(-0.5 * x * x / (sigma * sigma)), TraceSimulator.emgShape(x, sigma, 1e-5), 1e-4);
        }
        assertTrue(Double.isFinite(TraceSimulator.emgShape(-50, sigma, 1e-3)));
        assertTrue(Double.isFinite(TraceSimulator.emgShape(500, sigma, 2.0)));
        // the two ways of writing the EMG (erfc behind the switch, erfcx before it) meet at the
        // switch z = 0, x = σ²/τ
        double tau = 0.6;
        double atSwitch = sigma * sigma / tau;
        double before = TraceSimulator.emgShape(atSwitch - 1e-9, sigma, tau);
        double after = TraceSimulator.emgShape(atSwitch + 1e-9, sigma, tau);
        assertEquals(before, after, 1e-8 * before);
        // at the switch erfc(0) = 1: the EMG is σ√(2π)/(2τ)·exp(−σ²/(2τ²)) there (Grushka 1972's form)
        assertEquals(sigma * Math.sqrt(2 * Math.PI) / (2 * tau) * Math.exp(-0.5 * sigma * sigma / (tau * tau)),
                TraceSimulator.emgShape(atSwitch, sigma, tau), 1e-12);
    }

    @Test
    void invalidSpecsAreRejected() {
        RunConditions noVoltage = new RunConditions(60, 50, Double.NaN, 0, 25, null, Double.NaN, Double.NaN,
                null, Double.NaN, Double.NaN, Double.NaN);
        assertThrows(IllegalArgumentException.class, () -> SimulationSpec.builder(noVoltage).eofMobility(1).build());
        assertThrows(IllegalArgumentException.class, () -> normal(Detection.DIRECT).eofMobility(Double.NaN).build());
        assertThrows(IllegalArgumentException.class, () -> new SimulatedZone("x", 1, -1, 100));
        assertThrows(IllegalArgumentException.class, () -> new SimulatedZone("x", 1, 1, 0));
        assertThrows(IllegalArgumentException.class, () -> normal(Detection.DIRECT).noiseSd(-1).build());
    }

    @Test
    void csvHasHeaderAndReadableNumbers(@TempDir Path dir) throws IOException {
        SimulationSpec spec = normal(Detection.INDIRECT).durationS(1).baseline(-0.25).build();
        Trace tr = TraceSimulator.simulate("tiny", spec);
        Path file = dir.resolve("tiny.csv");
        TraceSimulator.writeCsv(tr, file);
        List<String> lines = Files.readAllLines(file);
        assertEquals("time_s,signal", lines.get(0));
        assertEquals("0,-0.25", lines.get(1));
        assertEquals("0.05,-0.25", lines.get(2));
        assertEquals(tr.size() + 1, lines.size());
        assertThrows(FileAlreadyExistsException.class, () -> TraceSimulator.writeCsv(tr, file));
        TraceSimulator.writeCsv(tr, file, true);

        StringWriter minutes = new StringWriter();
        TraceSimulator.write(tr, minutes, TraceFileStyle.MINUTES_SEMICOLON_DECIMAL_COMMA);
        String[] m = minutes.toString().split("\n");
        assertEquals("Time (min);Signal", m[0]);
        assertEquals("0,00083333;-0,25", m[2], "0.05 s = 0.000833… min, 8 decimals, decimal comma");
    }

    @Test
    void csvRoundTripsTheSignal() throws IOException {
        SimulationSpec spec = normal(Detection.DIRECT).zone("z", 30, 2.5, 100_000).noiseSd(0.02).build();
        Trace tr = TraceSimulator.simulate("rt", spec);
        StringWriter out = new StringWriter();
        TraceSimulator.writeCsv(tr, out);
        String[] lines = out.toString().split("\n");
        for (int i = 1; i < lines.length; i++) {
            String[] f = lines[i].split(",");
            assertEquals(tr.timeS(i - 1), Double.parseDouble(f[0]), 5e-7);
            assertEquals(tr.signal(i - 1), Double.parseDouble(f[1]), 5e-7);
        }
    }
}
