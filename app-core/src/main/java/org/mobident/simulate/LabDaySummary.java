package org.mobident.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Counts of what a lab-day bench holds: runs and the troubles put into them.
 *
 * @param seed                     seed of the bench
 * @param buffers                  method buffer labels, in order
 * @param samplesPerMethod         sample runs of each method, in the order of {@code buffers}
 * @param standardsRuns            standards runs, all methods
 * @param sampleRuns               sample runs
 * @param standardsOffsetC         hidden temperature offset of the standards session, K
 * @param minSampleTemperatureC    lowest actual temperature of a sample run, °C
 * @param maxSampleTemperatureC    highest actual temperature of a sample run, °C
 * @param minEofDrift              largest EOF slow-down over all runs, relative (negative)
 * @param maxEofDrift              largest EOF speed-up over all runs, relative
 * @param weakMarkers              sample runs with a weak neutral marker
 * @param tallForeignNearMarker    sample runs with a foreign zone taller than the marker close to it
 * @param noMarkerWindow           sample runs whose sheet row gives no marker window
 * @param analyteZones             panel analyte zones in the sample runs
 * @param faintAnalytes            of those, zones lower than {@link #FAINT_HEIGHT_SD} noise SDs
 * @param foreignZones             foreign zones in the panel's mobility range (the tall ones near the
 *                                 marker not included)
 * @param runsWithForeign          sample runs holding at least one of those
 * @param sampleSpikes             spikes in the sample runs
 * @param standardsSpikes          spikes in the standards runs
 * @param correlatedNoiseRuns      runs (standards and samples) with autoregressive noise
 * @param filesPerStyle            runs written in each layout of {@link LabDayPlanner#FILE_STYLES}
 * @param minConcentrationFactor   smallest concentration factor of a sample analyte zone
 * @param maxConcentrationFactor   largest concentration factor of a sample analyte zone
 */
public record LabDaySummary(long seed, List<String> buffers, List<Integer> samplesPerMethod, int standardsRuns,
                            int sampleRuns, double standardsOffsetC, double minSampleTemperatureC,
                            double maxSampleTemperatureC, double minEofDrift, double maxEofDrift, int weakMarkers,
                            int tallForeignNearMarker, int noMarkerWindow, int analyteZones, int faintAnalytes,
                            int foreignZones, int runsWithForeign, int sampleSpikes, int standardsSpikes,
                            int correlatedNoiseRuns, List<Integer> filesPerStyle, double minConcentrationFactor,
                            double maxConcentrationFactor) {

    /**
     * Zones below this many noise SDs count as faint: the usual limit of quantitation is a
     * signal-to-noise ratio of 10 (common practice).
     */
    public static final double FAINT_HEIGHT_SD = 10.0;

    /** Short names of the file layouts, in the order of {@link LabDayPlanner#FILE_STYLES}. */
    public static final List<String> STYLE_NAMES = List.of("seconds CSV", "minutes with ';' and decimal comma",
            "tab-separated seconds");

    public LabDaySummary {
        buffers = List.copyOf(buffers);
        samplesPerMethod = List.copyOf(samplesPerMethod);
        filesPerStyle = List.copyOf(filesPerStyle);
    }

    /** Counts what {@code plan} holds. */
    public static LabDaySummary of(LabDayPlan plan) {
        List<String> buffers = plan.methods().stream().map(LabDayMethod::buffer).toList();
        List<Integer> perMethod = plan.methods().stream().map(m -> plan.samples(m).size()).toList();
        double minT = Double.POSITIVE_INFINITY;
        double maxT = Double.NEGATIVE_INFINITY;
        int weak = 0;
        int tall = 0;
        int noWindow = 0;
        int analytes = 0;
        int faint = 0;
        int foreign = 0;
        int withForeign = 0;
        int sampleSpikes = 0;
        double minC = Double.POSITIVE_INFINITY;
        double maxC = Double.NEGATIVE_INFINITY;
        for (LabDayRun r : plan.samples()) {
            minT = Math.min(minT, r.actualTemperatureC());
            maxT = Math.max(maxT, r.actualTemperatureC());
            weak += r.weakMarker() ? 1 : 0;
            tall += r.tallForeignNearMarker() ? 1 : 0;
            noWindow += r.hasMarkerWindow() ? 0 : 1;
            for (TruthRow t : r.truth(TruthKind.ANALYTE)) {
                analytes++;
                faint += t.heightSd() < FAINT_HEIGHT_SD ? 1 : 0;
                double c = LabDayPlanner.concentrationFactor(t.heightSd());
                minC = Math.min(minC, c);
                maxC = Math.max(maxC, c);
            }
            int ordinaryForeign = r.truth(TruthKind.FOREIGN).size() - (r.tallForeignNearMarker() ? 1 : 0);
            foreign += ordinaryForeign;
            withForeign += ordinaryForeign > 0 ? 1 : 0;
            sampleSpikes += r.truth(TruthKind.SPIKE).size();
        }
        int standardsSpikes = 0;
        for (LabDayRun r : plan.standards()) {
            standardsSpikes += r.truth(TruthKind.SPIKE).size();
        }
        List<LabDayRun> all = new ArrayList<>(plan.standards());
        all.addAll(plan.samples());
        double minDrift = Double.POSITIVE_INFINITY;
        double maxDrift = Double.NEGATIVE_INFINITY;
        int correlated = 0;
        int[] styles = new int[LabDayPlanner.FILE_STYLES.size()];
        for (LabDayRun r : all) {
            double drift = r.eofMobilityAt25C() / r.method().nominalEofMobility() - 1;
            minDrift = Math.min(minDrift, drift);
            maxDrift = Math.max(maxDrift, drift);
            correlated += r.correlatedNoise() ? 1 : 0;
            styles[LabDayPlanner.FILE_STYLES.indexOf(r.style())]++;
        }
        List<Integer> perStyle = new ArrayList<>();
        for (int s : styles) {
            perStyle.add(s);
        }
        return new LabDaySummary(plan.seed(), buffers, perMethod, plan.standards().size(), plan.samples().size(),
                plan.standardsTemperatureOffsetC(), minT, maxT, minDrift, maxDrift, weak, tall, noWindow, analytes,
                faint, foreign, withForeign, sampleSpikes, standardsSpikes, correlated, perStyle, minC, maxC);
    }

    /** One paragraph for the terminal. */
    public String paragraph() {
        StringBuilder methods = new StringBuilder();
        for (int i = 0; i < buffers.size(); i++) {
            methods.append(i == 0 ? "" : ", ").append(buffers.get(i)).append(" (").append(samplesPerMethod.get(i))
                    .append(" samples)");
        }
        StringBuilder styles = new StringBuilder();
        for (int i = 0; i < filesPerStyle.size(); i++) {
            styles.append(i == 0 ? "" : ", ").append(filesPerStyle.get(i)).append(' ').append(STYLE_NAMES.get(i));
        }
        return String.format(Locale.ROOT,
                "Lab-day bench, seed %d (invented data): %d sample runs and %d standards runs written over %d "
                        + "methods: %s. Hidden troubles in the samples: actual temperature %.2f to %.2f °C while "
                        + "the sheets say 25 °C (standards session %+.2f K); EOF %+.1f %% to %+.1f %% of nominal "
                        + "(all runs); %d weak markers; %d foreign zones taller than the marker beside it; %d runs "
                        + "without a marker window; %d analyte zones, %d of them below %.0f noise SD, concentration "
                        + "factors %.2f to %.1f (dispersion grows with them); %d foreign zones in %d runs; %d spikes "
                        + "(and %d in the standards); correlated noise in %d of %d runs; files: %s.",
                seed, sampleRuns, standardsRuns, buffers.size(), methods, minSampleTemperatureC, maxSampleTemperatureC,
                standardsOffsetC, 100 * minEofDrift, 100 * maxEofDrift, weakMarkers, tallForeignNearMarker,
                noMarkerWindow, analyteZones, faintAnalytes, FAINT_HEIGHT_SD, minConcentrationFactor,
                maxConcentrationFactor, foreignZones, runsWithForeign, sampleSpikes, standardsSpikes,
                correlatedNoiseRuns, standardsRuns + sampleRuns, styles);
    }
}
