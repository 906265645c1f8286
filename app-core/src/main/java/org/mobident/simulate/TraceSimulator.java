package org.mobident.simulate;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.SplittableRandom;
import org.apache.commons.numbers.gamma.Erfc;
import org.apache.commons.numbers.gamma.Erfcx;
import org.mobident.Units;
import org.mobident.io.SafeFiles;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.Trace;

/**
 * Synthesises CZE detector traces from known mobilities, for end-to-end tests and demo data.
 *
 * <p>Physics. A zone of effective mobility μ moves with the apparent mobility μ + μ_eof and
 * passes the detector (Ld from the inlet, capillary Lt, signed voltage V) at
 * t' = Ld·Lt / (V·(μ + μ_eof)); with a linear voltage ramp of τ seconds the recorded apex time is
 * t = t' + τ/2 (the ramp delivers the field integral of V·(t − τ/2), see the design notes; the
 * zone is assumed to arrive after the ramp ends). A zone whose apparent velocity points away
 * from the detector never arrives, and a zone arriving after the end of the recording is absent.
 *
 * <p>Shape. Each zone is a Gaussian in time with σ_t = t/√N (plate number N = (t/σ_t)²), of the
 * given height; optionally skewed by electromigration dispersion
 * ({@link ElectromigrationDispersion}). Direct detection gives positive peaks, indirect
 * detection dips. The neutral marker (mobility 0) has {@link #MARKER_PLATES} plates and the same
 * sign as the analyte peaks (in indirect detection it stands for the system dip at the EOF time).
 *
 * <p>Baseline and noise: offset + drift·t + curvature·t², plus any slow sinusoids of the spec
 * ({@link BaselineWave}), plus Gaussian noise drawn from a {@link SplittableRandom} seeded with the
 * spec's seed through the Box–Muller transform (Box &amp; Muller, Ann. Math. Statist. 29 (1958)
 * 610), so a trace depends on the seed alone and not on the JDK's own Gaussian sampler. The noise
 * is white, or, when the spec gives a lag-one correlation φ &gt; 0, a stationary first-order
 * autoregressive series e_i = φ·e_{i−1} + √(1 − φ²)·σ·z_i started from e_0 = σ·z_0, whose marginal
 * SD is σ and whose lag-k autocorrelation is φ^k (Box &amp; Jenkins, Time Series Analysis:
 * Forecasting and Control, 1970, ch. 3). Electrical spikes ({@link Spike}) are added last, on the
 * sampling points nearest to their times. Sampling points are at i / samplingHz from 0 to the
 * duration.
 */
public final class TraceSimulator {

    /** Plate number of the neutral marker zone. */
    public static final double MARKER_PLATES = 150_000;

    /** Zones are computed out to this many σ (Gaussian part) from the centre; beyond, exp(−x²/2) &lt; 1e-30. */
    static final double GAUSSIAN_REACH_SIGMAS = 12.0;

    /** The exponential flank of a dispersed zone is computed out to this many time constants. */
    static final double EXPONENTIAL_REACH_TAUS = 70.0;

    /** Below this ratio τ/σ the exponential modification is negligible and the zone stays Gaussian. */
    static final double NEGLIGIBLE_TAU_RATIO = 1e-6;

    private static final double SQRT_2 = Math.sqrt(2.0);

    private TraceSimulator() {
    }

    /**
     * The recorded migration time of a zone of effective mobility {@code mobility}, in s: the apex
     * of an undispersed (Gaussian) zone and the centroid of a dispersed one; NaN when the zone
     * moves away from the detector or does not move.
     */
    public static double apexTimeS(SimulationSpec spec, double mobility) {
        RunConditions c = spec.conditions();
        double apparent = mobility + spec.eofMobility();
        // Units.mobilityFromCmKvS evaluates 100·Ld·Lt/(V·x). The expression is symmetric in time
        // and mobility: given a time it yields the apparent mobility, and given the apparent
        // mobility it yields the ramp-corrected time t' (same units: cm, kV, s, 1e-9 m²/(V s)).
        double tPrimeS = Units.mobilityFromCmKvS(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(), apparent);
        if (!(tPrimeS > 0) || !Double.isFinite(tPrimeS)) {
            return Double.NaN;
        }
        return tPrimeS + c.rampOrZeroS() / 2.0;
    }

    /** True when a zone of this mobility reaches the detector within the recording. */
    public static boolean arrives(SimulationSpec spec, double mobility) {
        double t = apexTimeS(spec, mobility);
        return Double.isFinite(t) && t <= spec.durationS();
    }

    /** The Gaussian σ of a zone passing at {@code apexTimeS} with {@code plates} plates: t/√N. */
    public static double sigmaS(double apexTimeS, double plates) {
        return apexTimeS / Math.sqrt(plates);
    }

    /** A trace without electromigration dispersion (all zones Gaussian). */
    public static Trace simulate(String name, SimulationSpec spec) {
        return simulate(name, spec, null);
    }

    /**
     * A trace with every zone skewed by {@code dispersion} (null: none). Areas and centroids equal
     * those of the undispersed zones; the apex is lower and moves towards the sharp flank.
     */
    public static Trace simulate(String name, SimulationSpec spec, ElectromigrationDispersion dispersion) {
        int n = (int) Math.floor(spec.durationS() * spec.samplingHz() + RELATIVE_ROUNDING) + 1;
        double[] time = new double[n];
        double[] signal = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i / spec.samplingHz();
            time[i] = t;
            signal[i] = spec.baselineOffset() + spec.driftPerS() * t + spec.driftCurvature() * t * t;
        }
        for (BaselineWave wave : spec.baselineWaves()) {
            for (int i = 0; i < n; i++) {
                signal[i] += wave.valueAt(time[i]);
            }
        }
        double sign = spec.conditions().detectionOrDirect() == Detection.INDIRECT ? -1.0 : 1.0;
        for (SimulatedZone z : spec.zones()) {
            double strength = dispersion == null ? 0.0
                    : z.hasOwnDispersion() ? z.dispersionStrength() : dispersion.strength();
            addZone(spec, time, signal, sign * z.height(), z.mobility(), z.plates(), dispersion, strength);
        }
        if (spec.neutralMarkerHeight() > 0) {
            addZone(spec, time, signal, sign * spec.neutralMarkerHeight(), 0.0, MARKER_PLATES, null, 0.0);
        }
        if (spec.noiseSd() > 0) {
            if (spec.noiseCorrelation() > 0) {
                addCorrelatedNoise(signal, spec.noiseSd(), spec.noiseCorrelation(), spec.seed());
            } else {
                addNoise(signal, spec.noiseSd(), spec.seed());
            }
        }
        for (Spike spike : spec.spikes()) {
            int first = spikeIndex(spec, spike);
            for (int k = 0; k < spike.widthSamples() && first + k < n; k++) {
                signal[first + k] += spike.amplitude();
            }
        }
        return new Trace(name, name + " (simulated)", time, signal);
    }

    /** Index of the sampling point on which {@code spike} starts: the one nearest to its time. */
    public static int spikeIndex(SimulationSpec spec, Spike spike) {
        return (int) Math.round(spike.timeS() * spec.samplingHz());
    }

    /** Slack when counting sampling points, so 600 s at 20 Hz gives exactly 12001 points. */
    private static final double RELATIVE_ROUNDING = 1e-9;

    private static void addZone(SimulationSpec spec, double[] time, double[] signal, double signedHeight,
                                double mobility, double plates, ElectromigrationDispersion dispersion,
                                double strength) {
        double centre = apexTimeS(spec, mobility);
        if (!Double.isFinite(centre) || centre > spec.durationS() || signedHeight == 0) {
            return;
        }
        double sigma = sigmaS(centre, plates);
        double tau = 0;
        boolean fronting = false;
        if (dispersion != null && dispersion.shape() != ElectromigrationDispersion.Shape.NONE && mobility != 0
                && Math.signum(mobility) == Math.signum(dispersion.coIonMobility())) {
            double mismatch = Math.abs(mobility - dispersion.coIonMobility()) / Math.abs(dispersion.coIonMobility());
            tau = strength * centre * mismatch;
            boolean faster = Math.abs(mobility) > Math.abs(dispersion.coIonMobility());
            // Own migration towards the detector when V·μ > 0 (the apparent velocity V·(μ+μ_eof) is > 0 here).
            boolean migratesTowardsDetector = spec.conditions().voltageKv() * mobility > 0;
            fronting = faster == migratesTowardsDetector;
        }
        boolean skewed = tau > NEGLIGIBLE_TAU_RATIO * sigma;
        boolean triangle = skewed && dispersion.triangular(strength);
        double reachBefore = GAUSSIAN_REACH_SIGMAS * sigma + (skewed ? (fronting ? EXPONENTIAL_REACH_TAUS : 1) * tau : 0);
        double reachAfter = GAUSSIAN_REACH_SIGMAS * sigma + (skewed ? (fronting ? 1 : EXPONENTIAL_REACH_TAUS) * tau : 0);
        int from = lowerIndex(time, centre - reachBefore);
        int to = lowerIndex(time, centre + reachAfter);
        for (int i = from; i < to && i < time.length; i++) {
            double x = time[i] - centre;
            double shape;
            if (skewed) {
                // The EMG's first moment lies τ after its Gaussian centre; shifting by τ keeps the
                // zone's centroid at the predicted migration time (the apex moves to the sharp flank).
                shape = triangle ? triangleShape((fronting ? -x : x) + tau, sigma, TRIANGLE_BASE_TAUS * tau)
                        : emgShape((fronting ? -x : x) + tau, sigma, tau);
            } else {
                shape = Math.exp(-0.5 * (x / sigma) * (x / sigma));
            }
            signal[i] += signedHeight * shape;
        }
    }

    private static int lowerIndex(double[] time, double t) {
        int i = java.util.Arrays.binarySearch(time, t);
        return i >= 0 ? i : -i - 1;
    }

    /**
     * Exponentially modified Gaussian (Grushka 1972) with the area of a unit-height Gaussian,
     * σ√(2π): h(x) = σ√(2π) · 1/(2τ) · exp(σ²/(2τ²) − x/τ) · erfc((σ/τ − x/σ)/√2), x = t − t_G.
     * Where the erfc argument z is positive the equivalent form exp(−x²/(2σ²))·erfcx(z) is used,
     * which neither overflows nor underflows (erfcx(z) = exp(z²)·erfc(z)).
     */
    static double emgShape(double x, double sigma, double tau) {
        double z = (sigma / tau - x / sigma) / SQRT_2;
        double scale = sigma * Math.sqrt(2 * Math.PI) / (2 * tau);
        if (z < 0) {
            return scale * Math.exp(sigma * sigma / (2 * tau * tau) - x / tau) * Erfc.value(z);
        }
        return scale * Math.exp(-0.5 * (x / sigma) * (x / sigma)) * Erfcx.value(z);
    }

    /** Base of a triangular zone in units of τ: its first moment then lies τ from its front, as an EMG's. */
    static final double TRIANGLE_BASE_TAUS = 3.0;

    /**
     * A right triangle of base L, highest at its front (y = 0) and falling linearly to zero at
     * y = L, convolved with a Gaussian of SD σ, with the area of a unit-height Gaussian σ√(2π):
     * with peak value h = 2σ√(2π)/L, a = (y − L)/σ, b = y/σ, Φ and φ the standard normal
     * distribution and density,
     * f(y) = h·[(1 − y/L)(Φ(b) − Φ(a)) + (σ/L)(φ(a) − φ(b))]
     * (the two integrals of the linear flank against the Gaussian, worked out by substituting
     * u = y − σz). Written here apart from the detector's fitted form, as {@link #emgShape} is, so
     * that the bench and the detector cannot share one mistake; each is checked against a
     * numerical convolution.
     */
    static double triangleShape(double y, double sigma, double baseS) {
        double h = 2 * sigma * Math.sqrt(2 * Math.PI) / baseS;
        double a = (y - baseS) / sigma;
        double b = y / sigma;
        double mass = normalCdf(b) - normalCdf(a);
        double density = (Math.exp(-0.5 * a * a) - Math.exp(-0.5 * b * b)) / Math.sqrt(2 * Math.PI);
        return h * ((1 - y / baseS) * mass + sigma / baseS * density);
    }

    /** Standard normal distribution function, Φ(z) = erfc(−z/√2)/2. */
    private static double normalCdf(double z) {
        return 0.5 * Erfc.value(-z / SQRT_2);
    }

    private static void addNoise(double[] signal, double sd, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < signal.length; i += 2) {
            // Box–Muller: two independent standard normals from two uniforms on (0, 1].
            double u1 = 1.0 - random.nextDouble();
            double u2 = random.nextDouble();
            double r = Math.sqrt(-2.0 * Math.log(u1));
            signal[i] += sd * r * Math.cos(2 * Math.PI * u2);
            if (i + 1 < signal.length) {
                signal[i + 1] += sd * r * Math.sin(2 * Math.PI * u2);
            }
        }
    }

    /**
     * A stationary AR(1) series of marginal SD {@code sd} and lag-one correlation {@code phi} added to
     * {@code signal}; the standard normals come from the same Box–Muller pairs as the white noise.
     */
    private static void addCorrelatedNoise(double[] signal, double sd, double phi, long seed) {
        double[] innovations = new double[signal.length];
        addNoise(innovations, 1.0, seed);
        double scale = Math.sqrt(1.0 - phi * phi);
        double e = innovations[0];
        signal[0] += sd * e;
        for (int i = 1; i < signal.length; i++) {
            e = phi * e + scale * innovations[i];
            signal[i] += sd * e;
        }
    }

    /** Writes {@code trace} as {@code time_s,signal} to a new file; refuses to replace an existing one. */
    public static void writeCsv(Trace trace, Path target) throws IOException {
        writeCsv(trace, target, false);
    }

    /** Writes {@code trace} as {@code time_s,signal}, atomically through {@link SafeFiles}. */
    public static void writeCsv(Trace trace, Path target, boolean overwrite) throws IOException {
        write(trace, target, overwrite, TraceFileStyle.SECONDS_CSV);
    }

    /** Writes {@code trace} in the given layout, atomically through {@link SafeFiles}. */
    public static void write(Trace trace, Path target, boolean overwrite, TraceFileStyle style) throws IOException {
        SafeFiles.write(target, overwrite, out -> write(trace, out, style));
    }

    /**
     * As {@link #write(Trace, Path, boolean, TraceFileStyle)}, with a first line {@code # comment}
     * (trace readers skip lines that start with {@code #}).
     *
     * @param comment one line of text without line breaks
     */
    public static void write(Trace trace, Path target, boolean overwrite, TraceFileStyle style, String comment)
            throws IOException {
        if (comment.indexOf('\n') >= 0 || comment.indexOf('\r') >= 0) {
            throw new IllegalArgumentException("the comment must be one line");
        }
        SafeFiles.write(target, overwrite, out -> {
            out.write("# " + comment + "\n");
            write(trace, out, style);
        });
    }

    /** Writes {@code trace} as {@code time_s,signal} to {@code out} (not closed). */
    public static void writeCsv(Trace trace, Writer out) throws IOException {
        write(trace, out, TraceFileStyle.SECONDS_CSV);
    }

    /** Writes {@code trace} in the given layout to {@code out} (not closed). Lines end in "\n". */
    public static void write(Trace trace, Writer out, TraceFileStyle style) throws IOException {
        char point = style.decimalComma() ? ',' : '.';
        double perUnit = style.timeUnit().toSeconds(1.0);
        int timeDecimals = style.timeDecimals();
        StringBuilder sb = new StringBuilder(64);
        out.write(style.timeHeader() + style.delimiter() + style.signalHeader() + "\n");
        for (int i = 0; i < trace.size(); i++) {
            sb.setLength(0);
            appendPlain(sb, trace.timeS(i) / perUnit, timeDecimals, point);
            sb.append(style.delimiter());
            appendPlain(sb, trace.signal(i), TraceFileStyle.SIGNAL_DECIMALS, point);
            sb.append('\n');
            out.write(sb.toString());
        }
        out.flush();
    }

    private static final long[] POW10 = {1L, 10L, 100L, 1_000L, 10_000L, 100_000L, 1_000_000L,
        10_000_000L, 100_000_000L, 1_000_000_000L};

    /** Largest |value·10^decimals| that the fast long path formats exactly. */
    private static final double FAST_PATH_LIMIT = 1e15;

    /** {@code v} rounded half-up to {@code decimals} decimals, trailing zeros dropped, no "-0". */
    static void appendPlain(StringBuilder sb, double v, int decimals, char point) {
        long scale = POW10[decimals];
        double scaled = v * scale;
        if (Math.abs(scaled) >= FAST_PATH_LIMIT) {
            String s = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
            sb.append(point == '.' ? s : s.replace('.', point));
            return;
        }
        long r = Math.round(scaled);
        if (r < 0) {
            sb.append('-');
            r = -r;
        }
        sb.append(r / scale);
        long frac = r % scale;
        if (frac != 0) {
            String f = Long.toString(frac);
            int end = f.length();
            while (f.charAt(end - 1) == '0') {
                end--;
            }
            sb.append(point);
            for (int k = f.length(); k < decimals; k++) {
                sb.append('0');
            }
            sb.append(f, 0, end);
        }
    }
}
