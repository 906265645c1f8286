package org.mobident.simulate;

import java.util.List;

/**
 * Everything the lab-day bench decided for one seed, before any file is written.
 *
 * @param seed                          the seed it was drawn from
 * @param methods                       the methods, in order
 * @param standardsTemperatureOffsetC   how far the standards session ran from the stated 25 °C, °C
 * @param standards                     standards runs, method by method, mix by mix
 * @param samples                       sample runs in run order
 */
public record LabDayPlan(long seed, List<LabDayMethod> methods, double standardsTemperatureOffsetC,
                         List<LabDayRun> standards, List<LabDayRun> samples) {
    public LabDayPlan {
        methods = List.copyOf(methods);
        standards = List.copyOf(standards);
        samples = List.copyOf(samples);
    }

    /** The same plan with every dispersed zone drawn in another form. */
    public LabDayPlan withZoneShape(ElectromigrationDispersion.Shape shape) {
        return new LabDayPlan(seed, methods, standardsTemperatureOffsetC,
                standards.stream().map(r -> r.withZoneShape(shape)).toList(),
                samples.stream().map(r -> r.withZoneShape(shape)).toList());
    }

    /** Standards runs of one method. */
    public List<LabDayRun> standards(LabDayMethod method) {
        return standards.stream().filter(r -> r.method().equals(method)).toList();
    }

    /** Sample runs of one method. */
    public List<LabDayRun> samples(LabDayMethod method) {
        return samples.stream().filter(r -> r.method().equals(method)).toList();
    }
}
