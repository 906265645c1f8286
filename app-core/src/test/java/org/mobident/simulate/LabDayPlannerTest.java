package org.mobident.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.mobident.mobility.MobilityMath;
import org.mobident.mobility.WaterViscosity;
import org.mobident.trace.RunConditions;

/** What {@link LabDayPlanner} decides, checked against the physics and the bench's stated rules. */
class LabDayPlannerTest {

    /** A large plan for the rates and ranges; planning draws no traces, so it is quick. */
    private static final int MANY_SAMPLES = 3_000;
    private static final LabDayPlan MANY = LabDayPlanner.plan(LabDayMethods.builtIn(), MANY_SAMPLES, 20_240_607L);
    /** Truth times are the simulator's own values; they agree with the hand formula to rounding. */
    private static final double TIME_TOLERANCE_S = 1e-9;
    private static final double RATIO_TOLERANCE = 1e-12;
    /** Binomial rates are checked to within this many standard errors. */
    private static final double RATE_SIGMAS = 4.0;
    /** Near pairs of a panel: 1 % to 2 % apart (relative to the smaller |μ|). */
    private static final double NEAR_PAIR_MIN = 0.01;
    private static final double NEAR_PAIR_MAX = 0.02;

    @Test
    void panelsHoldEightToTwelveAnalytesAndAtLeastTwoNearPairs() {
        for (LabDayMethod m : LabDayMethods.builtIn()) {
            assertTrue(m.panel().size() >= 8 && m.panel().size() <= 12, m.buffer());
            int nearPairs = 0;
            for (int i = 0; i < m.panel().size(); i++) {
                for (int j = i + 1; j < m.panel().size(); j++) {
                    double gap = relativeGap(m.panel().get(i).mobility(), m.panel().get(j).mobility());
                    nearPairs += gap >= NEAR_PAIR_MIN && gap <= NEAR_PAIR_MAX ? 1 : 0;
                }
            }
            assertTrue(nearPairs >= 2, m.buffer() + " has " + nearPairs + " near pairs");
        }
    }

    @Test
    void nearPairsNeverShareAStandardMixAndMixNamesAreUnique() {
        Set<String> names = new HashSet<>();
        for (LabDayMethod m : LabDayMethods.builtIn()) {
            List<List<PanelAnalyte>> mixes = m.mixes();
            assertEquals(LabDayMethod.MIXES, mixes.size());
            assertEquals(m.panel().size(), mixes.stream().mapToInt(List::size).sum(), "every analyte in one mix");
            for (int k = 1; k <= mixes.size(); k++) {
                assertTrue(names.add(m.mixName(k)), m.mixName(k));
                List<PanelAnalyte> mix = mixes.get(k - 1);
                for (int i = 0; i < mix.size(); i++) {
                    for (int j = i + 1; j < mix.size(); j++) {
                        assertTrue(relativeGap(mix.get(i).mobility(), mix.get(j).mobility()) > NEAR_PAIR_MAX,
                                m.mixName(k) + ": " + mix.get(i).name() + " / " + mix.get(j).name());
                    }
                }
            }
        }
    }

    private static double relativeGap(double a, double b) {
        return Math.abs(a - b) / Math.min(Math.abs(a), Math.abs(b));
    }

    @Test
    void truthTimeIsTheMigrationTimeAtTheActualTemperature() {
        for (LabDayRun r : runsOf(LabDayPlanner.plan(LabDayMethods.builtIn(), 60, 3))) {
            RunConditions c = r.spec().conditions();
            double eof = MobilityMath.atTemperature(r.eofMobilityAt25C(), 25, r.actualTemperatureC());
            for (TruthRow t : r.truth()) {
                if (t.kind() == TruthKind.SPIKE) {
                    continue;
                }
                // t = Ld·Lt/(V·(μ + μ_eof)) + τ/2, every mobility at the capillary's real temperature
                double mu = MobilityMath.atTemperature(t.mobility(), 25, r.actualTemperatureC());
                double expected = MobilityMath.migrationTimeS(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(),
                        c.rampS(), mu + eof);
                // each zone's mobility scatters by ZONE_SCATTER_RSD: within 5 SDs of that in time (the marker exactly)
                double scatter = 5 * LabDayPlanner.ZONE_SCATTER_RSD * Math.abs(mu / (mu + eof)) * expected;
                assertEquals(expected, t.timeS(), TIME_TOLERANCE_S * expected + scatter, r.name() + " " + t.analyte());
                double simulated = t.kind() == TruthKind.MARKER ? 0.0 : r.spec().zones().stream()
                        .filter(z -> z.label().equals(t.analyte())).findFirst().orElseThrow().mobility();
                assertEquals(TraceSimulator.apexTimeS(r.spec(), simulated), t.timeS(), TIME_TOLERANCE_S * expected,
                        "the truth time is that of the zone as simulated");
            }
            assertTrue(r.spec().durationS() >= LabDayPlanner.DURATION_MARGIN
                    * r.truth().stream().filter(t -> t.kind() != TruthKind.SPIKE).mapToDouble(TruthRow::timeS)
                    .max().orElseThrow() - 1e-9, r.name());
        }
    }

    @Test
    void temperatureOffsetScalesEveryMobilityByTheViscosityRatio() {
        // IAPWS 2008 / CRC Handbook "Viscosity of water" (from memory): η(25 °C) = 0.8900 mPa s,
        // η(26 °C) = 0.8705 mPa s, so a run 1 K warm shows mobilities 2.24 % high.
        double tableRatio = 0.8900 / 0.8705;
        assertEquals(tableRatio, MobilityMath.atTemperature(1.0, 25, 26), 0.001 * tableRatio);
        for (LabDayRun r : runsOf(LabDayPlanner.plan(LabDayMethods.builtIn(), 60, 4))) {
            double ratio = WaterViscosity.mPaS(25) / WaterViscosity.mPaS(r.actualTemperatureC());
            assertEquals(ratio, r.spec().eofMobility() / r.eofMobilityAt25C(), RATIO_TOLERANCE, r.name() + " EOF");
            List<TruthRow> zones = r.truth().stream()
                    .filter(t -> t.kind() == TruthKind.ANALYTE || t.kind() == TruthKind.FOREIGN).toList();
            assertEquals(zones.size(), r.spec().zones().size());
            for (SimulatedZone z : r.spec().zones()) {
                TruthRow t = zones.stream().filter(x -> x.analyte().equals(z.label())).findFirst().orElseThrow();
                // the viscosity ratio, times the zone's run-to-run scatter (5 SDs of ZONE_SCATTER_RSD)
                assertEquals(ratio, z.mobility() / t.mobility(), RATIO_TOLERANCE + 5 * LabDayPlanner.ZONE_SCATTER_RSD,
                        r.name() + " " + z.label());
            }
            assertEquals(ratio, r.dispersion().coIonMobility() / r.method().coIonMobility(), RATIO_TOLERANCE);
        }
    }

    @Test
    void truthMobilitiesOfAnalytesAreThePanelValues() {
        for (LabDayRun r : runsOf(MANY)) {
            for (TruthRow t : r.truth(TruthKind.ANALYTE)) {
                PanelAnalyte a = r.method().panel().stream().filter(p -> p.name().equals(t.analyte())).findFirst()
                        .orElseThrow();
                assertEquals(a.mobility(), t.mobility(), 0.0, r.name());
            }
        }
    }

    @Test
    void temperaturesAndEofStayInTheirRanges() {
        Set<Double> standardsTemperatures = new HashSet<>();
        for (LabDayRun r : MANY.standards()) {
            standardsTemperatures.add(r.actualTemperatureC());
        }
        assertEquals(1, standardsTemperatures.size(), "one common offset for the standards session");
        assertTrue(Math.abs(MANY.standardsTemperatureOffsetC()) <= LabDayPlanner.STANDARDS_TEMPERATURE_SPREAD_C);
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        for (LabDayRun r : MANY.samples()) {
            double offset = r.actualTemperatureC() - LabDayPlanner.SHEET_TEMPERATURE_C;
            assertTrue(Math.abs(offset) <= LabDayPlanner.SAMPLE_TEMPERATURE_SPREAD_C + 1e-9, r.name());
            lowest = Math.min(lowest, offset);
            highest = Math.max(highest, offset);
            assertEquals(LabDayPlanner.SHEET_TEMPERATURE_C, r.spec().conditions().temperatureC(), 0.0,
                    "the sheet never knows");
        }
        assertTrue(lowest < -1.4 && highest > 1.4, "the whole ±1.5 K range is used");
        for (LabDayRun r : runsOf(MANY)) {
            double drift = r.eofMobilityAt25C() / r.method().nominalEofMobility() - 1;
            assertTrue(Math.abs(drift) <= LabDayPlanner.EOF_DRIFT + 1e-3, r.name() + " drift " + drift);
        }
    }

    @Test
    void foreignZonesKeepTwoPercentFromEveryPanelValue() {
        int checked = 0;
        for (LabDayRun r : MANY.samples()) {
            for (TruthRow t : r.truth(TruthKind.FOREIGN)) {
                for (PanelAnalyte a : r.method().panel()) {
                    assertTrue(Math.abs(t.mobility() - a.mobility()) >= LabDayPlanner.MIN_FOREIGN_SEPARATION
                            * Math.abs(a.mobility()), r.name() + " " + t.analyte() + " vs " + a.name());
                }
                checked++;
            }
        }
        assertTrue(checked > MANY_SAMPLES, "enough foreign zones were drawn: " + checked);
        assertFalse(LabDayPlanner.farFromPanel(-78.9 * 1.019, LabDayMethods.anionA().panel()), "1.9 % is too close");
    }

    @Test
    void tallForeignZonesLieInTheMarkerWindowAndOutgrowTheMarker() {
        for (LabDayRun r : MANY.samples()) {
            if (!r.tallForeignNearMarker()) {
                continue;
            }
            TruthRow marker = r.truth(TruthKind.MARKER).get(0);
            TruthRow tall = r.truth(TruthKind.FOREIGN).stream().filter(t -> Math.abs(t.mobility())
                    <= LabDayPlanner.TALL_FOREIGN_MAX_MOBILITY).findFirst().orElseThrow();
            assertTrue(tall.heightSd() > marker.heightSd(), r.name());
            RunConditions c = r.spec().conditions();
            double nominal = MobilityMath.migrationTimeS(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(),
                    c.rampS(), r.method().nominalEofMobility());
            assertTrue(Math.abs(tall.timeS() - nominal) <= LabDayPlanner.MARKER_WINDOW_HALF_WIDTH * nominal, r.name());
            if (r.hasMarkerWindow()) {
                assertTrue(tall.timeS() >= c.markerFromS() && tall.timeS() <= c.markerToS(), r.name());
            }
        }
    }

    @Test
    void markerWindowsHoldTheTrueMarker() {
        for (LabDayRun r : runsOf(MANY)) {
            if (r.hasMarkerWindow()) {
                double t = r.truth(TruthKind.MARKER).get(0).timeS();
                RunConditions c = r.spec().conditions();
                assertTrue(t > c.markerFromS() && t < c.markerToS(), r.name());
            }
        }
    }

    @Test
    void troublesComeAtTheirStatedRates() {
        int n = MANY.samples().size();
        int weak = 0;
        int tall = 0;
        int noWindow = 0;
        int correlated = 0;
        for (LabDayRun r : MANY.samples()) {
            weak += r.weakMarker() ? 1 : 0;
            tall += r.tallForeignNearMarker() ? 1 : 0;
            noWindow += r.hasMarkerWindow() ? 0 : 1;
            correlated += r.correlatedNoise() ? 1 : 0;
        }
        assertRate(LabDayPlanner.WEAK_MARKER_PROBABILITY, weak, n, "weak markers");
        assertRate(LabDayPlanner.TALL_FOREIGN_PROBABILITY, tall, n, "tall foreign zones");
        assertRate(LabDayPlanner.NO_WINDOW_PROBABILITY, noWindow, n, "missing windows");
        assertRate(LabDayPlanner.CORRELATED_NOISE_PROBABILITY, correlated, n, "correlated noise");
    }

    private static void assertRate(double p, int hits, int n, String what) {
        double standardError = Math.sqrt(p * (1 - p) / n);
        assertEquals(p, (double) hits / n, RATE_SIGMAS * standardError, what);
    }

    @Test
    void heightsSpikesAndNoiseStayInTheirRanges() {
        for (LabDayRun r : runsOf(MANY)) {
            SimulationSpec s = r.spec();
            double sd = s.noiseSd();
            for (TruthRow t : r.truth(TruthKind.ANALYTE)) {
                double low = r.isStandard() ? LabDayPlanner.STANDARDS_MIN_HEIGHT_SD : LabDayPlanner.MIN_HEIGHT_SD;
                double high = r.isStandard() ? LabDayPlanner.STANDARDS_MAX_HEIGHT_SD : LabDayPlanner.MAX_HEIGHT_SD;
                assertTrue(t.heightSd() >= low - 0.05 && t.heightSd() <= high + 0.05, r.name());
            }
            for (SimulatedZone z : s.zones()) {
                assertTrue(z.plates() >= LabDayPlanner.MIN_PLATES && z.plates() <= LabDayPlanner.MAX_PLATES);
            }
            assertTrue(s.spikes().size() <= LabDayPlanner.MAX_SPIKES);
            assertEquals(s.spikes().size(), r.truth(TruthKind.SPIKE).size());
            for (Spike k : s.spikes()) {
                double onGrid = TraceSimulator.spikeIndex(s, k) / s.samplingHz();
                assertEquals(onGrid, k.timeS(), 1e-9, "spikes start on a sampling point");
                double amp = Math.abs(k.amplitude()) / sd;
                assertTrue(amp >= LabDayPlanner.SPIKE_MIN_SD && amp <= LabDayPlanner.SPIKE_MAX_SD, r.name());
            }
            double phi = s.noiseCorrelation();
            assertTrue(phi == 0 || phi >= LabDayPlanner.MIN_NOISE_CORRELATION
                    && phi <= LabDayPlanner.MAX_NOISE_CORRELATION);
            assertTrue(LabDayPlanner.SAMPLING_RATES_HZ.contains(s.samplingHz()));
            assertTrue(s.conditions().rampS() >= 0 && s.conditions().rampS() <= LabDayPlanner.MAX_RAMP_S);
        }
    }

    @Test
    void samplesHoldAtLeastTwoPanelAnalytes() {
        for (LabDayRun r : MANY.samples()) {
            assertTrue(r.truth(TruthKind.ANALYTE).size() >= LabDayPlanner.MIN_ANALYTES, r.name());
            assertEquals(1, r.truth(TruthKind.MARKER).size());
        }
    }

    @Test
    void concentrationFactorSpansPointThreeToTen() {
        // the bench's stated span, 0.3× to 10× the standards, at the lowest and highest height
        assertEquals(LabDayPlanner.MIN_CONCENTRATION_FACTOR,
                LabDayPlanner.concentrationFactor(LabDayPlanner.MIN_HEIGHT_SD), 1e-12);
        assertEquals(LabDayPlanner.MAX_CONCENTRATION_FACTOR,
                LabDayPlanner.concentrationFactor(LabDayPlanner.MAX_HEIGHT_SD), 1e-9);
        for (LabDayRun r : MANY.samples()) {
            for (SimulatedZone z : r.spec().zones()) {
                if (z.dispersionStrength() > 0) {
                    double c = z.dispersionStrength() / LabDayPlanner.STANDARDS_DISPERSION_STRENGTH;
                    assertTrue(c >= LabDayPlanner.MIN_CONCENTRATION_FACTOR - 1e-9
                            && c <= LabDayPlanner.MAX_CONCENTRATION_FACTOR + 1e-9, r.name());
                }
            }
        }
    }

    @Test
    void theStandardsDoNotDependOnTheNumberOfSamples() {
        LabDayPlan few = LabDayPlanner.plan(LabDayMethods.builtIn(), 5, 99);
        LabDayPlan more = LabDayPlanner.plan(LabDayMethods.builtIn(), 50, 99);
        assertEquals(few.standards(), more.standards());
        assertEquals(few.samples(), more.samples().subList(0, 5));
        assertEquals(LabDayMethods.builtIn().size() * LabDayMethod.MIXES * LabDayPlanner.REPLICATES,
                few.standards().size());
    }

    private static List<LabDayRun> runsOf(LabDayPlan plan) {
        List<LabDayRun> all = new java.util.ArrayList<>(plan.standards());
        all.addAll(plan.samples());
        return all;
    }
}
