package org.mobident.library.standards;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.InputException;
import org.mobident.mobility.NeutralMarkerScale;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

/**
 * Hand-built standards runs for the build tests: a neutral-marker scale with the run's own EOF
 * mobility turns each chosen effective mobility into an apex time, and the pipeline's peak result
 * is assembled from it as the pipeline would.
 */
final class StandardsRuns {

    static final double TOTAL_LENGTH_CM = 60.0;
    static final double DETECTOR_LENGTH_CM = 50.0;
    static final double VOLTAGE_KV = 25.0;
    static final double TEMPERATURE_C = 25.0;
    static final String BUFFER = "20 mM MES/His pH 6";
    /** Standard uncertainty of an apex time, s. */
    static final double APEX_SD_S = 0.02;

    private StandardsRuns() {
    }

    static RunConditions conditions(double temperatureC, String buffer) {
        return new RunConditions(TOTAL_LENGTH_CM, DETECTOR_LENGTH_CM, VOLTAGE_KV, 0.0, temperatureC, buffer,
                Double.NaN, Double.NaN, Detection.DIRECT, Double.NaN, Double.NaN, Double.NaN);
    }

    /** A run with all peaks of equal height 1. */
    static RunResult run(String name, double eofMobility, double... mobilities) {
        double[] heights = new double[mobilities.length];
        java.util.Arrays.fill(heights, 1.0);
        return run(name, Path.of(name + ".csv"), conditions(TEMPERATURE_C, BUFFER), eofMobility, mobilities, heights);
    }

    /**
     * A run whose analyte peaks have the given effective mobilities and heights.
     *
     * @param eofMobility the run's EOF mobility (varied between runs to imitate EOF drift)
     */
    static RunResult run(String name, Path traceFile, RunConditions c, double eofMobility, double[] mobilities,
                         double[] heights) {
        double markerTime = 100.0 * c.detectorLengthCm() * c.totalLengthCm() / (c.voltageKv() * eofMobility);
        NeutralMarkerScale scale = new NeutralMarkerScale(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(), 0.0,
                markerTime, APEX_SD_S);
        List<PeakResult> peaks = new ArrayList<>();
        peaks.add(new PeakResult(peak(markerTime, 1.0), PeakRole.NEUTRAL_MARKER, 0.0, Double.NaN, 0.0,
                PeakMatch.none()));
        for (int i = 0; i < mobilities.length; i++) {
            double t = scale.timeS(mobilities[i]);
            double mu = scale.mobility(t);
            peaks.add(new PeakResult(peak(t, heights[i]), PeakRole.ANALYTE, mu, scale.mobilitySd(t, APEX_SD_S), mu,
                    PeakMatch.none()));
        }
        peaks.sort((a, b) -> Double.compare(a.peak().apexTimeS(), b.peak().apexTimeS()));
        RunSpec spec = new RunSpec(name, traceFile, c, "standards-runs.csv", 2);
        return new RunResult(spec, null, scale.describe(), scale.eofMobility(), scale, peaks, List.of(), 0.001);
    }

    /** A run in which no neutral marker was found: peaks without mobility. */
    static RunResult runWithoutScale(String name, double... times) {
        List<PeakResult> peaks = new ArrayList<>();
        for (double t : times) {
            peaks.add(new PeakResult(peak(t, 1.0), PeakRole.ANALYTE, Double.NaN, Double.NaN, Double.NaN,
                    PeakMatch.none()));
        }
        RunSpec spec = new RunSpec(name, Path.of(name + ".csv"), conditions(TEMPERATURE_C, BUFFER),
                "standards-runs.csv", 3);
        return new RunResult(spec, null, "no neutral marker found", Double.NaN, null, peaks, List.of(), 0.001);
    }

    /** A run that could not be processed at all. */
    static RunResult failedRun(String name) {
        RunSpec spec = new RunSpec(name, Path.of(name + ".csv"), conditions(TEMPERATURE_C, BUFFER),
                "standards-runs.csv", 4);
        return RunResult.failure(spec, new InputException(name + ".csv", 0, null, "trace file not found"));
    }

    static Peak peak(double t, double height) {
        double w = 0.004 * t;
        return new Peak(0, t, APEX_SD_S, t - 2 * w, t + 2 * w, height, height * w * 1.06, height * w * 1.06 / t, w,
                5.54 * (t / w) * (t / w), Double.NaN, 100.0 * height, false);
    }

    static StandardAnalyte analyte(String name, double approx, int order) {
        return new StandardAnalyte(name, 0, 0, approx, order, 0);
    }

    static StandardsSheet sheet(String mix, StandardAnalyte... analytes) {
        return new StandardsSheet("standards.csv", List.of(new StandardsMix(mix, List.of(analytes))));
    }

    /** An anion of the standards sheet with an approx_mobility (NaN: none). */
    static StandardAnalyte anion(String name, double approx) {
        return new StandardAnalyte(name, 0, -1, approx, 0, 0);
    }

    /** Groups of the given mean mobilities, in that order, seen in 4 runs at half the largest peak's
     *  height, the first to pass the detector last. */
    static List<GroupNamer.GroupInfo> groups(double... means) {
        List<GroupNamer.GroupInfo> out = new java.util.ArrayList<>();
        for (int i = 0; i < means.length; i++) {
            out.add(new GroupNamer.GroupInfo(means[i], 4, 0.5, means.length - 1 - i));
        }
        return out;
    }
}
