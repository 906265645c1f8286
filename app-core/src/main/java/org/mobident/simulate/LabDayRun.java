package org.mobident.simulate;

import java.util.List;
import java.util.Objects;
import org.mobident.trace.Trace;

/**
 * One planned run of the lab-day bench: everything that was decided for it, the simulation that
 * produces its trace, and the truth about what it contains.
 *
 * @param name                  run name (trace file name without extension)
 * @param fileName              trace file name
 * @param method                the method it was run with
 * @param mix                   standard mix name for a standards run, {@code null} for a sample run
 * @param sampleText            the run sheet's {@code sample} text
 * @param actualTemperatureC    temperature the capillary really had, °C (the sheet always says
 *                              {@link LabDayPlanner#SHEET_TEMPERATURE_C})
 * @param eofMobilityAt25C      the run's EOF mobility after drift, at 25 °C, 1e-9 m²/(V s)
 * @param spec                  the simulation: mobilities and EOF already at the actual temperature,
 *                              the conditions as the run sheet states them
 * @param dispersion            co-ion and common (standards) dispersion strength of the run
 * @param style                 file layout of the trace
 * @param truth                 what the run contains, in migration order, spikes last
 * @param weakMarker            the neutral marker is only a small fraction of its usual height
 * @param tallForeignNearMarker a foreign zone of small mobility, taller than the marker, migrates
 *                              close to the EOF
 */
public record LabDayRun(String name, String fileName, LabDayMethod method, String mix, String sampleText,
                        double actualTemperatureC, double eofMobilityAt25C, SimulationSpec spec,
                        ElectromigrationDispersion dispersion, TraceFileStyle style, List<TruthRow> truth,
                        boolean weakMarker, boolean tallForeignNearMarker) {

    public LabDayRun {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(fileName, "fileName");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(sampleText, "sampleText");
        Objects.requireNonNull(spec, "spec");
        Objects.requireNonNull(dispersion, "dispersion");
        Objects.requireNonNull(style, "style");
        truth = List.copyOf(truth);
    }

    /** True for a standards run. */
    public boolean isStandard() {
        return mix != null;
    }

    /** True when the run sheet gives a neutral marker window. */
    public boolean hasMarkerWindow() {
        return spec.conditions().hasMarkerWindow();
    }

    /** True when the noise is first-order autoregressive rather than white. */
    public boolean correlatedNoise() {
        return spec.noiseCorrelation() > 0;
    }

    /** The rows of one kind. */
    public List<TruthRow> truth(TruthKind kind) {
        return truth.stream().filter(r -> r.kind() == kind).toList();
    }

    /** The same run with its dispersed zones drawn in another form (same zones, times and noise). */
    public LabDayRun withZoneShape(ElectromigrationDispersion.Shape shape) {
        return new LabDayRun(name, fileName, method, mix, sampleText, actualTemperatureC, eofMobilityAt25C, spec,
                dispersion.withShape(shape), style, truth, weakMarker, tallForeignNearMarker);
    }

    /** The simulated trace (noise from the run's seed, so always the same). */
    public Trace trace() {
        return TraceSimulator.simulate(name, spec, dispersion);
    }
}
