package org.mobident.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.mobident.trace.RunConditions;

/**
 * Everything needed to synthesise one CZE trace. Build it with {@link #builder(RunConditions)}.
 *
 * @param conditions          run conditions; lengths and signed voltage are required, the ramp
 *                            (0 when unset) shifts every apex by τ/2, and the detection mode
 *                            (direct when unset) sets the sign of the peaks
 * @param eofMobility         mobility of the electro-osmotic flow, 1e-9 m²/(V s), signed
 *                            (positive = towards the cathode; negative for a reversed,
 *                            coated-wall EOF)
 * @param zones               analyte zones
 * @param neutralMarkerHeight height of the neutral marker zone (moves with the EOF); 0 = no marker
 * @param samplingHz          detector sampling rate, Hz
 * @param durationS           length of the recording, s; the first point is at 0 s
 * @param noiseSd             marginal standard deviation of the Gaussian noise, signal units
 * @param baselineOffset      constant baseline, signal units
 * @param driftPerS           linear baseline drift, signal units per s
 * @param driftCurvature      quadratic baseline drift, signal units per s²
 * @param seed                seed of the noise generator: the same spec gives the same trace
 * @param noiseCorrelation    lag-one autocorrelation φ of the noise, in [0, {@value #MAX_NOISE_CORRELATION}]:
 *                            0 = white noise, otherwise a first-order autoregressive series
 *                            scaled to the marginal SD {@code noiseSd}
 * @param baselineWaves       slow sinusoids added to the baseline (may be empty)
 * @param spikes              electrical spikes added to the trace (may be empty)
 */
public record SimulationSpec(
        RunConditions conditions,
        double eofMobility,
        List<SimulatedZone> zones,
        double neutralMarkerHeight,
        double samplingHz,
        double durationS,
        double noiseSd,
        double baselineOffset,
        double driftPerS,
        double driftCurvature,
        long seed,
        double noiseCorrelation,
        List<BaselineWave> baselineWaves,
        List<Spike> spikes) {

    /**
     * Largest accepted lag-one autocorrelation of the noise; nearer to 1 the series hardly
     * forgets its start and the marginal SD is no longer reached within a trace.
     */
    public static final double MAX_NOISE_CORRELATION = 0.99;

    public SimulationSpec {
        Objects.requireNonNull(conditions, "conditions");
        zones = List.copyOf(zones);
        baselineWaves = List.copyOf(baselineWaves);
        spikes = List.copyOf(spikes);
        if (!conditions.hasGeometry()) {
            throw new IllegalArgumentException("simulation needs total length, detector length and voltage");
        }
        String problem = conditions.geometryProblem();
        if (problem != null) {
            throw new IllegalArgumentException(problem);
        }
        if (!Double.isFinite(eofMobility)) {
            throw new IllegalArgumentException("EOF mobility must be finite (0 for no EOF), got " + eofMobility);
        }
        requireNonNegative("neutral marker height", neutralMarkerHeight);
        if (!(samplingHz > 0) || !Double.isFinite(samplingHz)) {
            throw new IllegalArgumentException("sampling rate must be positive, got " + samplingHz);
        }
        if (!(durationS > 0) || !Double.isFinite(durationS) || durationS * samplingHz < 1) {
            throw new IllegalArgumentException("duration must give at least two points, got " + durationS + " s");
        }
        requireNonNegative("noise sd", noiseSd);
        if (!Double.isFinite(baselineOffset) || !Double.isFinite(driftPerS) || !Double.isFinite(driftCurvature)) {
            throw new IllegalArgumentException("baseline offset and drifts must be finite");
        }
        if (!(noiseCorrelation >= 0 && noiseCorrelation <= MAX_NOISE_CORRELATION)) {
            throw new IllegalArgumentException("noise correlation must be between 0 and " + MAX_NOISE_CORRELATION
                    + ", got " + noiseCorrelation);
        }
        for (Spike spike : spikes) {
            if (spike.timeS() > durationS) {
                throw new IllegalArgumentException("spike at " + spike.timeS() + " s lies after the end of the recording ("
                        + durationS + " s)");
            }
        }
    }

    private static void requireNonNegative(String what, double v) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be finite and >= 0, got " + v);
        }
    }

    /**
     * A builder with 20 Hz sampling, 600 s, no noise (white when an SD is set), flat zero baseline,
     * no marker, no spikes, seed 1.
     */
    public static Builder builder(RunConditions conditions) {
        return new Builder(conditions);
    }

    /** A builder pre-filled with this spec's values. */
    public Builder toBuilder() {
        Builder b = new Builder(conditions).eofMobility(eofMobility).neutralMarker(neutralMarkerHeight)
                .samplingHz(samplingHz).durationS(durationS).noiseSd(noiseSd).baseline(baselineOffset)
                .drift(driftPerS, driftCurvature).seed(seed).noiseCorrelation(noiseCorrelation);
        zones.forEach(b::zone);
        baselineWaves.forEach(b::baselineWave);
        spikes.forEach(b::spike);
        return b;
    }

    /** Collects the values of a {@link SimulationSpec}; {@link #build()} validates them. */
    public static final class Builder {
        /** Default sampling rate, Hz (a common CE detector setting). */
        public static final double DEFAULT_SAMPLING_HZ = 20.0;
        /** Default recording length, s. */
        public static final double DEFAULT_DURATION_S = 600.0;

        private RunConditions conditions;
        private double eofMobility = Double.NaN;
        private final List<SimulatedZone> zones = new ArrayList<>();
        private double neutralMarkerHeight;
        private double samplingHz = DEFAULT_SAMPLING_HZ;
        private double durationS = DEFAULT_DURATION_S;
        private double noiseSd;
        private double baselineOffset;
        private double driftPerS;
        private double driftCurvature;
        private long seed = 1L;
        private double noiseCorrelation;
        private final List<BaselineWave> baselineWaves = new ArrayList<>();
        private final List<Spike> spikes = new ArrayList<>();

        private Builder(RunConditions conditions) {
            this.conditions = Objects.requireNonNull(conditions, "conditions");
        }

        public Builder conditions(RunConditions c) {
            this.conditions = Objects.requireNonNull(c, "conditions");
            return this;
        }

        /** EOF mobility, 1e-9 m²/(V s), signed; required. */
        public Builder eofMobility(double mu) {
            this.eofMobility = mu;
            return this;
        }

        public Builder zone(SimulatedZone zone) {
            zones.add(Objects.requireNonNull(zone, "zone"));
            return this;
        }

        public Builder zone(String label, double mobility, double height, double plates) {
            return zone(new SimulatedZone(label, mobility, height, plates));
        }

        /** Adds a neutral marker of this height (0 removes it). */
        public Builder neutralMarker(double height) {
            this.neutralMarkerHeight = height;
            return this;
        }

        public Builder samplingHz(double hz) {
            this.samplingHz = hz;
            return this;
        }

        public Builder durationS(double s) {
            this.durationS = s;
            return this;
        }

        public Builder noiseSd(double sd) {
            this.noiseSd = sd;
            return this;
        }

        public Builder baseline(double offset) {
            this.baselineOffset = offset;
            return this;
        }

        /** Linear drift (signal/s) and quadratic drift (signal/s²). */
        public Builder drift(double perS, double curvature) {
            this.driftPerS = perS;
            this.driftCurvature = curvature;
            return this;
        }

        public Builder seed(long s) {
            this.seed = s;
            return this;
        }

        /** Lag-one autocorrelation φ of the noise (0: white, the default). */
        public Builder noiseCorrelation(double phi) {
            this.noiseCorrelation = phi;
            return this;
        }

        /** Adds a slow sinusoid to the baseline. */
        public Builder baselineWave(BaselineWave wave) {
            baselineWaves.add(Objects.requireNonNull(wave, "wave"));
            return this;
        }

        /** Adds an electrical spike. */
        public Builder spike(Spike spike) {
            spikes.add(Objects.requireNonNull(spike, "spike"));
            return this;
        }

        /** Removes every spike added so far. */
        public Builder clearSpikes() {
            spikes.clear();
            return this;
        }

        public SimulationSpec build() {
            return new SimulationSpec(conditions, eofMobility, zones, neutralMarkerHeight, samplingHz, durationS,
                    noiseSd, baselineOffset, driftPerS, driftCurvature, seed, noiseCorrelation, baselineWaves,
                    spikes);
        }
    }
}
