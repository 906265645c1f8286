package org.mobident.cli;

import org.mobident.InputException;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import picocli.CommandLine.Option;

/** Run conditions given on the command line; they fill what the run sheet leaves empty. */
public final class ConditionOptions {
    @Option(names = "--method", paramLabel = "FILE",
            description = "Method file: the conditions below, and time-unit, time-column and signal-column, as"
                    + " 'name = value' lines (e.g. 'voltage-kv = -20', 'marker-window = 450:700'; '#' starts a"
                    + " comment). An option given as well wins.")
    java.nio.file.Path methodFile;

    /** The method file once read (read at most once). */
    private MethodFile method;

    @Option(names = "--total-length-cm", paramLabel = "CM", description = "Capillary total length Lt in cm.")
    Double totalLengthCm;

    @Option(names = "--detector-length-cm", paramLabel = "CM", description = "Inlet-to-detector length Ld in cm.")
    Double detectorLengthCm;

    @Option(names = "--voltage-kv", paramLabel = "KV",
            description = "Separation voltage in kV, signed: negative when the inlet is at the negative potential.")
    Double voltageKv;

    @Option(names = "--ramp-s", paramLabel = "S", description = "Duration of the linear voltage ramp in s (default 0).")
    Double rampS;

    @Option(names = "--temperature-c", paramLabel = "C", description = "Capillary temperature in °C.")
    Double temperatureC;

    @Option(names = "--buffer", paramLabel = "LABEL", description = "Buffer label.")
    String buffer;

    @Option(names = "--marker-window", paramLabel = "FROM:TO",
            description = "Time window (s) holding the neutral marker, e.g. 180:240. The marker is the peak "
                    + "under which the expected analytes (the library; for standards, the mixes) fit best: the peaks "
                    + "in the window are weighed first (a weak marker is searched for there), others only when the "
                    + "window holds none or nothing fits. Without a window the tallest peaks are weighed.")
    String markerWindow;

    @Option(names = "--detection", paramLabel = "MODE",
            description = "direct (peaks rise) or indirect (peaks dip). Default: direct.")
    String detection;

    @Option(names = "--ref-mobility", paramLabel = "MOB",
            description = "Known effective mobility (1e-9 m²/(V s), signed) of a charged marker in every run, at the"
                    + " run's temperature (--temperature-c): every other mobility of the run is measured against it.")
    Double refMobility;

    @Option(names = "--ref-window", paramLabel = "FROM:TO", description = "Time window (s) holding that charged marker.")
    String refWindow;

    /** The method file, read on first use; null without one. */
    MethodFile method() throws InputException {
        if (method == null && methodFile != null) {
            method = MethodFile.read(methodFile);
        }
        return method;
    }

    /** The conditions given here; unset values stay unset. */
    RunConditions toConditions() throws InputException {
        MethodFile method = method();
        if (method != null) {
            totalLengthCm = totalLengthCm != null ? totalLengthCm : method.number("total-length-cm");
            detectorLengthCm = detectorLengthCm != null ? detectorLengthCm : method.number("detector-length-cm");
            voltageKv = voltageKv != null ? voltageKv : method.number("voltage-kv");
            rampS = rampS != null ? rampS : method.number("ramp-s");
            temperatureC = temperatureC != null ? temperatureC : method.number("temperature-c");
            buffer = buffer != null ? buffer : method.text("buffer");
            markerWindow = markerWindow != null ? markerWindow : method.text("marker-window");
            detection = detection != null ? detection : method.text("detection");
            refMobility = refMobility != null ? refMobility : method.number("ref-mobility");
            refWindow = refWindow != null ? refWindow : method.text("ref-window");
        }
        double[] marker = window(markerWindow, "--marker-window");
        double[] ref = window(refWindow, "--ref-window");
        Detection det = null;
        if (detection != null) {
            det = Detection.parse(detection);
            if (det == null) {
                throw new InputException("command line", 0, "--detection",
                        "expected 'direct' or 'indirect', got '" + detection + "'");
            }
        }
        RunConditions c = new RunConditions(n(totalLengthCm), n(detectorLengthCm), n(voltageKv), n(rampS),
                n(temperatureC), buffer, marker[0], marker[1], det, n(refMobility), ref[0], ref[1]);
        String problem = c.geometryProblem();
        if (problem != null) {
            throw new InputException("command line", 0, culprit(c), problem);
        }
        return c;
    }

    /** The option to blame for an impossible set of conditions: the first value wrong on its own. */
    private static String culprit(RunConditions c) {
        RunConditions e = RunConditions.EMPTY;
        String[] names = {"--total-length-cm", "--detector-length-cm", "--voltage-kv", "--ramp-s", "--temperature-c"};
        RunConditions[] alone = {
            new RunConditions(c.totalLengthCm(), e.detectorLengthCm(), e.voltageKv(), e.rampS(), e.temperatureC(),
                    null, Double.NaN, Double.NaN, null, Double.NaN, Double.NaN, Double.NaN),
            new RunConditions(e.totalLengthCm(), c.detectorLengthCm(), e.voltageKv(), e.rampS(), e.temperatureC(),
                    null, Double.NaN, Double.NaN, null, Double.NaN, Double.NaN, Double.NaN),
            new RunConditions(e.totalLengthCm(), e.detectorLengthCm(), c.voltageKv(), e.rampS(), e.temperatureC(),
                    null, Double.NaN, Double.NaN, null, Double.NaN, Double.NaN, Double.NaN),
            new RunConditions(e.totalLengthCm(), e.detectorLengthCm(), e.voltageKv(), c.rampS(), e.temperatureC(),
                    null, Double.NaN, Double.NaN, null, Double.NaN, Double.NaN, Double.NaN),
            new RunConditions(e.totalLengthCm(), e.detectorLengthCm(), e.voltageKv(), e.rampS(), c.temperatureC(),
                    null, Double.NaN, Double.NaN, null, Double.NaN, Double.NaN, Double.NaN)};
        for (int i = 0; i < names.length; i++) {
            if (alone[i].geometryProblem() != null) {
                return names[i];
            }
        }
        // each value is fine alone: the detector length does not fit the total length
        return "--detector-length-cm";
    }

    private static double n(Double d) {
        return d == null ? Double.NaN : d;
    }

    private static double[] window(String text, String option) throws InputException {
        if (text == null) {
            return new double[] {Double.NaN, Double.NaN};
        }
        String[] parts = text.split(":");
        if (parts.length != 2) {
            throw new InputException("command line", 0, option, "expected FROM:TO in seconds, got '" + text + "'");
        }
        try {
            double a = Double.parseDouble(parts[0].trim());
            double b = Double.parseDouble(parts[1].trim());
            if (!(Double.isFinite(a) && Double.isFinite(b) && a < b && a >= 0)) {
                throw new InputException("command line", 0, option,
                        "the window must satisfy 0 <= FROM < TO, got '" + text + "'");
            }
            return new double[] {a, b};
        } catch (NumberFormatException e) {
            throw new InputException("command line", 0, option, "expected FROM:TO in seconds, got '" + text + "'");
        }
    }
}
