package org.mobident.library.standards;

/**
 * A peak of a standards run that was not used for any analyte.
 *
 * @param mix       the run's mix
 * @param run       run name
 * @param apexTimeS apex time, s
 * @param mobility  effective mobility, 1e-9 m²/(V·s)
 * @param reason    why it was not used (too small, fits no expected analyte, …)
 */
public record UnexpectedPeak(String mix, String run, double apexTimeS, double mobility, String reason) {
}
