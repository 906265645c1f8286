package org.mobident.library.standards;

/**
 * One analyte peak of one standards run, as used for grouping and statistics.
 *
 * @param run            run name
 * @param mobility       effective mobility, 1e-9 m²/(V·s), signed
 * @param mobilitySd     its standard uncertainty from the run (NaN if unknown)
 * @param apexTimeS      apex time, s
 * @param height         peak height (magnitude), signal units
 * @param relativeHeight height relative to the run's largest analyte peak (0–1)
 */
public record Measurement(String run, double mobility, double mobilitySd, double apexTimeS, double height,
                          double relativeHeight) {
}
