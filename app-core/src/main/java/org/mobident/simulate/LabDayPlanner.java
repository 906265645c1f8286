package org.mobident.simulate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.mobident.mobility.MobilityMath;
import org.mobident.trace.RunConditions;

/**
 * Draws the runs of the lab-day bench: the standards session of every method and a day of sample
 * runs spread over the methods, each with the ordinary troubles of a working day. Every decision
 * comes from one {@link SplittableRandom} seeded by the caller, so a seed always gives the same plan;
 * the standards come from their own split stream, so they do not change with the number of samples.
 *
 * <p>Troubles, all recorded in each {@link LabDayRun} and its truth rows:
 * <ul>
 *   <li>the run sheet says {@value #SHEET_TEMPERATURE_C} °C but the capillary ran warmer or cooler
 *       (samples: ±{@value #SAMPLE_TEMPERATURE_SPREAD_C} K each; standards: one common offset within
 *       ±{@value #STANDARDS_TEMPERATURE_SPREAD_C} K); every mobility, the EOF included, follows the
 *       viscosity of water ({@link MobilityMath#atTemperature});</li>
 *   <li>every zone's mobility scatters from run to run by {@value #ZONE_SCATTER_RSD} (relative SD);</li>
 *   <li>the EOF drifts by up to ±{@value #EOF_DRIFT} (relative) around the method's nominal value;</li>
 *   <li>electromigration dispersion: standards at a moderate concentration, sample zones at
 *       {@value #MIN_CONCENTRATION_FACTOR}–{@value #MAX_CONCENTRATION_FACTOR} times that, growing with
 *       the zone's height;</li>
 *   <li>weak markers, tall foreign zones near the marker, run sheets without a marker window;</li>
 *   <li>faint to huge peaks, foreign zones, spikes, white or autoregressive noise, drifting and
 *       wandering baselines, three file layouts, six sampling rates, voltage ramps.</li>
 * </ul>
 */
public final class LabDayPlanner {

    /** Temperature every run sheet states, °C; also the temperature of the truth mobilities. */
    public static final double SHEET_TEMPERATURE_C = 25.0;
    /** Half-range of the hidden temperature offset of a sample run, K. */
    public static final double SAMPLE_TEMPERATURE_SPREAD_C = 1.5;
    /**
     * Half-range of the common hidden temperature offset of the standards session, K: the lab runs
     * its standards under the method's stated conditions, so the library sets the scale to within a
     * few hundredths of a kelvin (a modelling choice).
     */
    public static final double STANDARDS_TEMPERATURE_SPREAD_C = 0.05;
    /**
     * Relative run-to-run scatter of each zone's mobility, standards and samples alike (Gaussian SD):
     * what stays of a zone's reproducibility after the marker has taken out the EOF (`from memory`:
     * within-day RSDs of effective mobilities of about 0.1–0.5 % are commonly reported).
     */
    public static final double ZONE_SCATTER_RSD = 0.001;
    /** Relative half-range of the EOF drift around the nominal EOF. */
    public static final double EOF_DRIFT = 0.15;

    /** Dispersion strength of the standards (concentration factor 1): a slight asymmetry. */
    public static final double STANDARDS_DISPERSION_STRENGTH = 0.003;
    /** Concentration factor of the faintest sample zone, relative to the standards. */
    public static final double MIN_CONCENTRATION_FACTOR = 0.3;
    /** Concentration factor of the tallest sample zone, relative to the standards. */
    public static final double MAX_CONCENTRATION_FACTOR = 10.0;

    /** Lowest analyte or foreign zone height in a sample run, in noise SDs. */
    public static final double MIN_HEIGHT_SD = 3.0;
    /** Highest analyte or foreign zone height in a sample run, in noise SDs. */
    public static final double MAX_HEIGHT_SD = 1000.0;
    /** Lowest analyte height in a standards run, in noise SDs. */
    public static final double STANDARDS_MIN_HEIGHT_SD = 30.0;
    /** Highest analyte height in a standards run, in noise SDs. */
    public static final double STANDARDS_MAX_HEIGHT_SD = 300.0;
    /** Lowest usual neutral marker height, in noise SDs. */
    public static final double MARKER_MIN_HEIGHT_SD = 80.0;
    /** Highest usual neutral marker height, in noise SDs. */
    public static final double MARKER_MAX_HEIGHT_SD = 250.0;

    /** Share of sample runs whose marker is weak. */
    public static final double WEAK_MARKER_PROBABILITY = 0.10;
    /** A weak marker has at least this fraction of its usual height. */
    public static final double WEAK_MARKER_MIN_FRACTION = 0.05;
    /** A weak marker has at most this fraction of its usual height. */
    public static final double WEAK_MARKER_MAX_FRACTION = 0.10;
    /** Share of sample runs with a foreign zone near the marker that is taller than the marker. */
    public static final double TALL_FOREIGN_PROBABILITY = 0.10;
    /** Smallest |mobility| of that zone, 1e-9 m²/(V s). */
    public static final double TALL_FOREIGN_MIN_MOBILITY = 1.0;
    /** Largest |mobility| of that zone, 1e-9 m²/(V s). */
    public static final double TALL_FOREIGN_MAX_MOBILITY = 4.0;
    /** That zone is at least this many times as tall as the marker. */
    public static final double TALL_FOREIGN_MIN_RATIO = 1.5;
    /** That zone is at most this many times as tall as the marker. */
    public static final double TALL_FOREIGN_MAX_RATIO = 3.0;
    /** Share of sample runs whose sheet row gives no marker window. */
    public static final double NO_WINDOW_PROBABILITY = 0.15;
    /**
     * Half-width of a sheet's marker window relative to the nominal marker time: covers the EOF
     * drift and the temperature offsets (1/(1 − 0.15) and the ±1.5 K viscosity change stay inside).
     */
    public static final double MARKER_WINDOW_HALF_WIDTH = 0.25;

    /** Chance that a panel analyte is in a sample. */
    public static final double ANALYTE_PROBABILITY = 0.6;
    /** Fewest panel analytes in a sample. */
    public static final int MIN_ANALYTES = 2;
    /** Most foreign zones (substances outside the panel) in a sample run. */
    public static final int MAX_FOREIGN = 3;
    /**
     * Least relative distance of a foreign mobility from every panel mobility; closer substances
     * could not be told from the panel analyte by mobility at all.
     */
    public static final double MIN_FOREIGN_SEPARATION = 0.02;
    /** Tries to draw a foreign mobility before giving up (a panel never covers its whole range). */
    static final int FOREIGN_DRAW_ATTEMPTS = 10_000;

    /** Most spikes in a run. */
    public static final int MAX_SPIKES = 4;
    /** Smallest spike amplitude, in noise SDs. */
    public static final double SPIKE_MIN_SD = 20.0;
    /** Largest spike amplitude, in noise SDs. */
    public static final double SPIKE_MAX_SD = 200.0;
    /** Spikes keep this fraction of the recording away from its start and end. */
    static final double SPIKE_EDGE_FRACTION = 0.02;

    /** Share of runs with first-order autoregressive instead of white noise. */
    public static final double CORRELATED_NOISE_PROBABILITY = 0.5;
    /** Smallest lag-one autocorrelation of correlated noise. */
    public static final double MIN_NOISE_CORRELATION = 0.5;
    /** Largest lag-one autocorrelation of correlated noise. */
    public static final double MAX_NOISE_CORRELATION = 0.95;
    /** Smallest noise SD, signal units. */
    static final double MIN_NOISE_SD = 0.002;
    /** Largest noise SD, signal units. */
    static final double MAX_NOISE_SD = 0.02;
    /** Range of the baseline offset, signal units. */
    static final double MIN_BASELINE_OFFSET = -0.2;
    static final double MAX_BASELINE_OFFSET = 1.0;
    /** Largest change of the baseline over the run from linear drift, in noise SDs. */
    static final double MAX_LINEAR_DRIFT_SD = 40.0;
    /** Largest change of the baseline at the end of the run from quadratic drift, in noise SDs. */
    static final double MAX_QUADRATIC_DRIFT_SD = 20.0;
    /** Number of sinusoids in the baseline wander. */
    static final int BASELINE_WAVES = 2;
    /** Largest amplitude of one sinusoid, in noise SDs (two together stay within 10 SD). */
    static final double MAX_WAVE_AMPLITUDE_SD = 5.0;
    /** Shortest and longest period of a sinusoid, s. */
    static final double MIN_WAVE_PERIOD_S = 100.0;
    static final double MAX_WAVE_PERIOD_S = 400.0;

    /** Detector sampling rates drawn from, Hz. */
    public static final List<Double> SAMPLING_RATES_HZ = List.of(4.0, 5.0, 10.0, 20.0, 25.0, 50.0);
    /** File layouts drawn from. */
    public static final List<TraceFileStyle> FILE_STYLES = List.of(TraceFileStyle.SECONDS_CSV,
            TraceFileStyle.MINUTES_SEMICOLON_DECIMAL_COMMA, TraceFileStyle.SECONDS_TAB);
    /** Short codes of those layouts, in the same order, for tables. */
    public static final List<String> FILE_STYLE_CODES = List.of("seconds-csv", "minutes-semicolon-decimal-comma",
            "seconds-tab");
    /** Longest voltage ramp, whole s (0 to this). */
    public static final int MAX_RAMP_S = 10;
    /** Range of zone plate numbers. */
    public static final double MIN_PLATES = 80_000;
    public static final double MAX_PLATES = 250_000;
    /** Plate numbers are rounded to this step. */
    static final double PLATES_STEP = 1_000;
    /** The recording lasts this factor times the arrival of the last zone or the marker. */
    public static final double DURATION_MARGIN = 1.10;
    /** Replicate runs of each standard mix. */
    public static final int REPLICATES = 4;

    /** Decimals kept of drawn mobilities (truth and simulation use the same rounded value). */
    private static final double MOBILITY_STEP = 0.01;
    /** Decimals kept of a drawn noise correlation. */
    private static final double CORRELATION_STEP = 0.01;
    /** Decimals kept of drawn heights in noise SDs. */
    private static final double HEIGHT_STEP = 0.1;
    /** Decimals kept of temperatures and window limits. */
    private static final double TEMPERATURE_STEP = 0.01;
    private static final double WINDOW_STEP = 0.1;
    /** Shortest width of a sample run number in its name (lab-s001). */
    private static final int MIN_NAME_DIGITS = 3;

    private LabDayPlanner() {
    }

    /**
     * Plans a bench: every standards run of every method, then {@code sampleCount} sample runs
     * dealt out to the methods in turn.
     */
    public static LabDayPlan plan(List<LabDayMethod> methods, int sampleCount, long seed) {
        if (methods.isEmpty()) {
            throw new IllegalArgumentException("need at least one method");
        }
        if (sampleCount < 1) {
            throw new IllegalArgumentException("need at least one sample run, got " + sampleCount);
        }
        SplittableRandom master = new SplittableRandom(seed);
        SplittableRandom standardsRandom = master.split();
        SplittableRandom samplesRandom = master.split();

        double standardsOffset = round(standardsRandom.nextDouble(-STANDARDS_TEMPERATURE_SPREAD_C,
                STANDARDS_TEMPERATURE_SPREAD_C), TEMPERATURE_STEP);
        List<LabDayRun> standards = new ArrayList<>();
        for (LabDayMethod m : methods) {
            List<List<PanelAnalyte>> mixes = m.mixes();
            for (int k = 1; k <= mixes.size(); k++) {
                for (int r = 1; r <= REPLICATES; r++) {
                    String mix = m.mixName(k);
                    String name = "std-" + mix + "-r" + r;
                    String text = "standard " + mix + " replicate " + r + " (invented)";
                    standards.add(new RunMaker(standardsRandom, m, name, SHEET_TEMPERATURE_C + standardsOffset)
                            .standard(mix, text, mixes.get(k - 1)));
                }
            }
        }

        int digits = Math.max(MIN_NAME_DIGITS, Integer.toString(sampleCount).length());
        List<LabDayRun> samples = new ArrayList<>();
        for (int k = 1; k <= sampleCount; k++) {
            LabDayMethod m = methods.get((k - 1) % methods.size());
            String number = String.format(Locale.ROOT, "%0" + digits + "d", k);
            double temperature = SHEET_TEMPERATURE_C + round(samplesRandom.nextDouble(-SAMPLE_TEMPERATURE_SPREAD_C,
                    SAMPLE_TEMPERATURE_SPREAD_C), TEMPERATURE_STEP);
            samples.add(new RunMaker(samplesRandom, m, "lab-s" + number, temperature).sample("bench sample " + number));
        }
        return new LabDayPlan(seed, methods, standardsOffset, standards, samples);
    }

    /**
     * The concentration factor (relative to the standards) of a sample zone of this height: a power
     * law that takes {@value #MIN_HEIGHT_SD} SD to {@value #MIN_CONCENTRATION_FACTOR} and
     * {@value #MAX_HEIGHT_SD} SD to {@value #MAX_CONCENTRATION_FACTOR}, so taller zones are also more
     * dispersed. The runs' noise differs, so this stands for "a taller peak came from a richer sample".
     */
    public static double concentrationFactor(double heightSd) {
        double exponent = Math.log(MAX_CONCENTRATION_FACTOR / MIN_CONCENTRATION_FACTOR)
                / Math.log(MAX_HEIGHT_SD / MIN_HEIGHT_SD);
        return MIN_CONCENTRATION_FACTOR * Math.pow(heightSd / MIN_HEIGHT_SD, exponent);
    }

    /** True when {@code mobility} is at least {@value #MIN_FOREIGN_SEPARATION} (relative) from every panel value. */
    public static boolean farFromPanel(double mobility, List<PanelAnalyte> panel) {
        for (PanelAnalyte a : panel) {
            if (Math.abs(mobility - a.mobility()) < MIN_FOREIGN_SEPARATION * Math.abs(a.mobility())) {
                return false;
            }
        }
        return true;
    }

    /** File name of a run's trace: tab-separated layouts get {@code .txt}, the others {@code .csv}. */
    static String fileName(String run, TraceFileStyle style) {
        return run + (style.delimiter() == '\t' ? ".txt" : ".csv");
    }

    /**
     * {@code v} rounded to a decimal step (0.1, 0.01): the double nearest to the rounded decimal
     * number, as if it had been read from text.
     */
    static double round(double v, double step) {
        double perUnit = Math.rint(1 / step);
        return Math.round(v * perUnit) / perUnit;
    }

    /** A standard normal deviate by the Box–Muller transform (Box &amp; Muller, Ann. Math. Statist. 29 (1958) 610). */
    static double gaussian(SplittableRandom random) {
        double u1 = 1.0 - random.nextDouble();
        double u2 = random.nextDouble();
        return Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    }

    static double logUniform(SplittableRandom random, double low, double high) {
        return low * Math.exp(random.nextDouble() * Math.log(high / low));
    }

    /** A zone decided for a run, before the simulation turns it into signal. */
    private record PlannedZone(TruthKind kind, String label, double mobilityAt25C, double heightSd, double plates,
                               double dispersionStrength) {
    }

    /** Draws one run; one instance per run. */
    private static final class RunMaker {
        private final SplittableRandom random;
        private final LabDayMethod method;
        private final String name;
        private final double temperatureC;
        private final double eofAt25C;
        private final double eofActual;
        private final int rampS;
        private final double samplingHz;
        private final TraceFileStyle style;
        private final double noiseSd;
        private final double noiseCorrelation;
        private final long noiseSeed;
        private final double nominalMarkerTimeS;
        private final List<PlannedZone> zones = new ArrayList<>();

        RunMaker(SplittableRandom random, LabDayMethod method, String name, double temperatureC) {
            this.random = random;
            this.method = method;
            this.name = name;
            this.temperatureC = temperatureC;
            this.eofAt25C = round(method.nominalEofMobility() * (1 + random.nextDouble(-EOF_DRIFT, EOF_DRIFT)),
                    MOBILITY_STEP);
            this.eofActual = actual(eofAt25C);
            this.rampS = random.nextInt(MAX_RAMP_S + 1);
            this.samplingHz = SAMPLING_RATES_HZ.get(random.nextInt(SAMPLING_RATES_HZ.size()));
            this.style = FILE_STYLES.get(random.nextInt(FILE_STYLES.size()));
            this.noiseSd = logUniform(random, MIN_NOISE_SD, MAX_NOISE_SD);
            this.noiseCorrelation = random.nextDouble() < CORRELATED_NOISE_PROBABILITY
                    ? round(random.nextDouble(MIN_NOISE_CORRELATION, MAX_NOISE_CORRELATION), CORRELATION_STEP) : 0.0;
            this.noiseSeed = random.nextLong();
            this.nominalMarkerTimeS = MobilityMath.migrationTimeS(method.detectorLengthCm(), method.totalLengthCm(),
                    method.voltageKv(), rampS, method.nominalEofMobility());
        }

        /** A mobility at 25 °C as the capillary at its actual temperature shows it. */
        private double actual(double mobilityAt25C) {
            return MobilityMath.atTemperature(mobilityAt25C, SHEET_TEMPERATURE_C, temperatureC);
        }

        private double plates() {
            return Math.round(random.nextDouble(MIN_PLATES, MAX_PLATES) / PLATES_STEP) * PLATES_STEP;
        }

        LabDayRun standard(String mix, String text, List<PanelAnalyte> analytes) {
            for (PanelAnalyte a : analytes) {
                double h = round(logUniform(random, STANDARDS_MIN_HEIGHT_SD, STANDARDS_MAX_HEIGHT_SD), HEIGHT_STEP);
                zones.add(new PlannedZone(TruthKind.ANALYTE, a.name(), a.mobility(), h, plates(), Double.NaN));
            }
            double markerSd = round(logUniform(random, MARKER_MIN_HEIGHT_SD, MARKER_MAX_HEIGHT_SD), HEIGHT_STEP);
            return finish(mix, text, markerSd, true, false, false);
        }

        LabDayRun sample(String text) {
            List<PanelAnalyte> panel = method.panel();
            boolean[] present = new boolean[panel.size()];
            int count = 0;
            for (int i = 0; i < panel.size(); i++) {
                present[i] = random.nextDouble() < ANALYTE_PROBABILITY;
                count += present[i] ? 1 : 0;
            }
            while (count < MIN_ANALYTES) {
                int i = random.nextInt(panel.size());
                if (!present[i]) {
                    present[i] = true;
                    count++;
                }
            }
            for (int i = 0; i < panel.size(); i++) {
                if (present[i]) {
                    zones.add(sampleZone(TruthKind.ANALYTE, panel.get(i).name(), panel.get(i).mobility()));
                }
            }
            int foreign = random.nextInt(MAX_FOREIGN + 1);
            for (int f = 1; f <= foreign; f++) {
                zones.add(sampleZone(TruthKind.FOREIGN, "foreign-" + f, foreignMobility()));
            }
            double markerSd = round(logUniform(random, MARKER_MIN_HEIGHT_SD, MARKER_MAX_HEIGHT_SD), HEIGHT_STEP);
            boolean weak = random.nextDouble() < WEAK_MARKER_PROBABILITY;
            if (weak) {
                markerSd = round(markerSd * random.nextDouble(WEAK_MARKER_MIN_FRACTION, WEAK_MARKER_MAX_FRACTION),
                        HEIGHT_STEP);
            }
            boolean tall = random.nextDouble() < TALL_FOREIGN_PROBABILITY;
            if (tall) {
                double h = round(markerSd * random.nextDouble(TALL_FOREIGN_MIN_RATIO, TALL_FOREIGN_MAX_RATIO),
                        HEIGHT_STEP);
                // a minor component: too dilute to disturb the conductivity, so its zone stays symmetric
                zones.add(new PlannedZone(TruthKind.FOREIGN, "foreign-" + (foreign + 1), nearMarkerMobility(), h,
                        plates(), 0.0));
            }
            boolean window = random.nextDouble() >= NO_WINDOW_PROBABILITY;
            return finish(null, text, markerSd, window, weak, tall);
        }

        private PlannedZone sampleZone(TruthKind kind, String label, double mobilityAt25C) {
            double h = round(logUniform(random, MIN_HEIGHT_SD, MAX_HEIGHT_SD), HEIGHT_STEP);
            double strength = STANDARDS_DISPERSION_STRENGTH * concentrationFactor(h);
            return new PlannedZone(kind, label, mobilityAt25C, h, plates(), strength);
        }

        /** A mobility inside the panel's range, at least the least separation from every panel value. */
        private double foreignMobility() {
            double sign = method.panelSign();
            for (int attempt = 0; attempt < FOREIGN_DRAW_ATTEMPTS; attempt++) {
                double mu = round(sign * random.nextDouble(method.minAbsMobility(), method.maxAbsMobility()),
                        MOBILITY_STEP);
                if (farFromPanel(mu, method.panel())) {
                    return mu;
                }
            }
            throw new IllegalStateException(method.buffer() + ": the panel leaves no room for foreign zones");
        }

        /** A small mobility of either sign whose zone arrives inside the nominal marker window. */
        private double nearMarkerMobility() {
            for (int attempt = 0; attempt < FOREIGN_DRAW_ATTEMPTS; attempt++) {
                double sign = random.nextBoolean() ? 1.0 : -1.0;
                double mu = round(sign * random.nextDouble(TALL_FOREIGN_MIN_MOBILITY, TALL_FOREIGN_MAX_MOBILITY),
                        MOBILITY_STEP);
                double t = MobilityMath.migrationTimeS(method.detectorLengthCm(), method.totalLengthCm(),
                        method.voltageKv(), rampS, actual(mu) + eofActual);
                if (Math.abs(t - nominalMarkerTimeS) <= MARKER_WINDOW_HALF_WIDTH * nominalMarkerTimeS) {
                    return mu;
                }
            }
            throw new IllegalStateException(method.buffer() + ": no small mobility arrives inside the marker window");
        }

        private LabDayRun finish(String mix, String text, double markerSd, boolean window, boolean weak, boolean tall) {
            double from = window ? round(nominalMarkerTimeS * (1 - MARKER_WINDOW_HALF_WIDTH), WINDOW_STEP) : Double.NaN;
            double to = window ? round(nominalMarkerTimeS * (1 + MARKER_WINDOW_HALF_WIDTH), WINDOW_STEP) : Double.NaN;
            RunConditions sheet = new RunConditions(method.totalLengthCm(), method.detectorLengthCm(),
                    method.voltageKv(), rampS, SHEET_TEMPERATURE_C, method.buffer(), from, to, method.detection(),
                    Double.NaN, Double.NaN, Double.NaN);
            SimulationSpec.Builder b = SimulationSpec.builder(sheet).eofMobility(eofActual)
                    .neutralMarker(markerSd * noiseSd).samplingHz(samplingHz).noiseSd(noiseSd)
                    .noiseCorrelation(noiseCorrelation).seed(noiseSeed);
            for (PlannedZone z : zones) {
                double scatter = 1.0 + ZONE_SCATTER_RSD * gaussian(random);
                b.zone(new SimulatedZone(z.label(), actual(z.mobilityAt25C()) * scatter, z.heightSd() * noiseSd,
                        z.plates(), z.dispersionStrength()));
            }
            // the recording lasts until shortly after the last arrival (zone or marker)
            SimulationSpec timing = b.build();
            double last = TraceSimulator.apexTimeS(timing, 0.0);
            for (SimulatedZone z : timing.zones()) {
                last = Math.max(last, TraceSimulator.apexTimeS(timing, z.mobility()));
            }
            double durationS = Math.ceil(DURATION_MARGIN * last);
            b.durationS(durationS);

            b.baseline(random.nextDouble(MIN_BASELINE_OFFSET, MAX_BASELINE_OFFSET));
            double linear = random.nextDouble(-MAX_LINEAR_DRIFT_SD, MAX_LINEAR_DRIFT_SD) * noiseSd;
            double quadratic = random.nextDouble(-MAX_QUADRATIC_DRIFT_SD, MAX_QUADRATIC_DRIFT_SD) * noiseSd;
            b.drift(linear / durationS, quadratic / (durationS * durationS));
            for (int w = 0; w < BASELINE_WAVES; w++) {
                b.baselineWave(new BaselineWave(random.nextDouble(MAX_WAVE_AMPLITUDE_SD) * noiseSd,
                        random.nextDouble(MIN_WAVE_PERIOD_S, MAX_WAVE_PERIOD_S), random.nextDouble(2 * Math.PI)));
            }
            int lastIndex = (int) Math.floor(durationS * samplingHz);
            int edge = (int) Math.ceil(SPIKE_EDGE_FRACTION * lastIndex);
            int spikes = random.nextInt(MAX_SPIKES + 1);
            for (int s = 0; s < spikes; s++) {
                int index = random.nextInt(edge, lastIndex - edge);
                int width = random.nextInt(Spike.MIN_WIDTH_SAMPLES, Spike.MAX_WIDTH_SAMPLES + 1);
                double sign = random.nextBoolean() ? 1.0 : -1.0;
                double amplitude = sign * random.nextDouble(SPIKE_MIN_SD, SPIKE_MAX_SD) * noiseSd;
                b.spike(new Spike(index / samplingHz, amplitude, width));
            }
            SimulationSpec spec = b.build();

            List<TruthRow> truth = new ArrayList<>();
            for (int i = 0; i < zones.size(); i++) {
                PlannedZone z = zones.get(i);
                double t = TraceSimulator.apexTimeS(spec, spec.zones().get(i).mobility());
                truth.add(new TruthRow(name, z.kind(), z.label(), t, z.mobilityAt25C(), z.heightSd()));
            }
            truth.add(new TruthRow(name, TruthKind.MARKER, null, TraceSimulator.apexTimeS(spec, 0.0), 0.0, markerSd));
            truth.sort(Comparator.comparingDouble(TruthRow::timeS));
            List<TruthRow> spikeRows = new ArrayList<>();
            for (Spike s : spec.spikes()) {
                spikeRows.add(new TruthRow(name, TruthKind.SPIKE, null, s.timeS(), Double.NaN, Double.NaN));
            }
            spikeRows.sort(Comparator.comparingDouble(TruthRow::timeS));
            truth.addAll(spikeRows);
            ElectromigrationDispersion dispersion = new ElectromigrationDispersion(actual(method.coIonMobility()),
                    STANDARDS_DISPERSION_STRENGTH);
            return new LabDayRun(name, fileName(name, style), method, mix, text, temperatureC, eofAt25C, spec,
                    dispersion, style, truth, weak, tall);
        }
    }
}
