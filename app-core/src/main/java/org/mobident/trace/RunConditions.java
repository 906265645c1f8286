package org.mobident.trace;

/**
 * The conditions of one run. A value not given is {@code NaN} (numbers) or {@code null}
 * (text, detection); {@link #orElse} fills gaps from defaults. Validation with file and line
 * happens where the values are read (run sheet, options); see {@link #geometryProblem()}.
 *
 * @param totalLengthCm          capillary total length Lt in cm
 * @param detectorLengthCm       inlet-to-detector length Ld in cm (Ld &lt; Lt)
 * @param voltageKv              signed separation voltage in kV: positive when the inlet is at
 *                               the positive potential (normal polarity), negative when reversed
 * @param rampS                  duration of the linear voltage ramp at the start, s (0 = none)
 * @param temperatureC           capillary (cassette) temperature in °C
 * @param buffer                 buffer label, free text
 * @param markerFromS            start of the window in which the neutral marker is expected, s
 * @param markerToS              end of that window, s
 * @param detection              direct (positive peaks) or indirect (dips)
 * @param refMarkerMobility      known effective mobility of a charged marker (1e-9 m²/(V s)) at the run's
 *                               temperature (the run's other mobilities are measured against it, then
 *                               carried to the library temperature); NaN when there is none
 * @param refMarkerFromS         start of the window where the charged marker migrates, s
 * @param refMarkerToS           end of that window, s
 */
public record RunConditions(
        double totalLengthCm,
        double detectorLengthCm,
        double voltageKv,
        double rampS,
        double temperatureC,
        String buffer,
        double markerFromS,
        double markerToS,
        Detection detection,
        double refMarkerMobility,
        double refMarkerFromS,
        double refMarkerToS) {

    /** All values unset. */
    public static final RunConditions EMPTY = new RunConditions(Double.NaN, Double.NaN, Double.NaN,
            Double.NaN, Double.NaN, null, Double.NaN, Double.NaN, null,
            Double.NaN, Double.NaN, Double.NaN);

    /** Each unset value of this is taken from {@code defaults}. */
    public RunConditions orElse(RunConditions defaults) {
        return new RunConditions(
                pick(totalLengthCm, defaults.totalLengthCm),
                pick(detectorLengthCm, defaults.detectorLengthCm),
                pick(voltageKv, defaults.voltageKv),
                pick(rampS, defaults.rampS),
                pick(temperatureC, defaults.temperatureC),
                buffer != null ? buffer : defaults.buffer,
                pick(markerFromS, defaults.markerFromS),
                pick(markerToS, defaults.markerToS),
                detection != null ? detection : defaults.detection,
                pick(refMarkerMobility, defaults.refMarkerMobility),
                pick(refMarkerFromS, defaults.refMarkerFromS),
                pick(refMarkerToS, defaults.refMarkerToS));
    }

    private static double pick(double own, double fallback) {
        return Double.isNaN(own) ? fallback : own;
    }

    /** Ramp duration in s, 0 when not given. */
    public double rampOrZeroS() {
        return Double.isNaN(rampS) ? 0.0 : rampS;
    }

    /** The same conditions with another buffer label. */
    public RunConditions withBuffer(String other) {
        return new RunConditions(totalLengthCm, detectorLengthCm, voltageKv, rampS, temperatureC, other, markerFromS,
                markerToS, detection, refMarkerMobility, refMarkerFromS, refMarkerToS);
    }

    /** The same conditions with another detection mode. */
    public RunConditions withDetection(Detection other) {
        return new RunConditions(totalLengthCm, detectorLengthCm, voltageKv, rampS, temperatureC, buffer, markerFromS,
                markerToS, other, refMarkerMobility, refMarkerFromS, refMarkerToS);
    }

    /** Detection mode, direct when not given. */
    public Detection detectionOrDirect() {
        return detection == null ? Detection.DIRECT : detection;
    }

    /** True when lengths and voltage are all given (needed unless two markers are used). */
    public boolean hasGeometry() {
        return !Double.isNaN(totalLengthCm) && !Double.isNaN(detectorLengthCm) && !Double.isNaN(voltageKv);
    }

    /** True when a neutral marker window is given. */
    public boolean hasMarkerWindow() {
        return !Double.isNaN(markerFromS) && !Double.isNaN(markerToS);
    }

    /** True when a charged marker of known mobility is declared (two-marker mode). */
    public boolean hasRefMarker() {
        return !Double.isNaN(refMarkerMobility);
    }

    /**
     * Describes what is physically impossible in the given geometry, or returns {@code null}
     * when nothing is. Unset values are not checked.
     */
    public String geometryProblem() {
        if (!Double.isNaN(totalLengthCm) && !(totalLengthCm > 0 && Double.isFinite(totalLengthCm))) {
            return "total length must be a positive number of cm, got " + totalLengthCm;
        }
        if (!Double.isNaN(detectorLengthCm) && !(detectorLengthCm > 0 && Double.isFinite(detectorLengthCm))) {
            return "detector length must be a positive number of cm, got " + detectorLengthCm;
        }
        if (!Double.isNaN(totalLengthCm) && !Double.isNaN(detectorLengthCm) && !(detectorLengthCm < totalLengthCm)) {
            return "detector length (" + detectorLengthCm + " cm) must be shorter than total length ("
                    + totalLengthCm + " cm)";
        }
        if (!Double.isNaN(voltageKv) && (voltageKv == 0 || !Double.isFinite(voltageKv))) {
            return "voltage must be a non-zero number of kV (signed), got " + voltageKv;
        }
        if (!Double.isNaN(rampS) && !(rampS >= 0 && Double.isFinite(rampS))) {
            return "ramp must be zero or a positive number of s, got " + rampS;
        }
        if (!Double.isNaN(markerFromS) && !Double.isNaN(markerToS) && !(markerFromS < markerToS)) {
            return "marker window start (" + markerFromS + " s) must be before its end (" + markerToS + " s)";
        }
        if (!Double.isNaN(temperatureC) && !(temperatureC >= 0 && temperatureC <= 100)) {
            return "temperature must be between 0 and 100 °C, got " + temperatureC;
        }
        return null;
    }
}
