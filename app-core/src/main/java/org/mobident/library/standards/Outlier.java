package org.mobident.library.standards;

/**
 * A replicate that failed the Grubbs test (ASTM E178).
 *
 * @param analyte   analyte name
 * @param run       the run the value came from
 * @param mobility  the value, 1e-9 m²/(V·s)
 * @param g         Grubbs statistic G of the value
 * @param gCritical critical value at the settings' significance level
 * @param excluded  whether the value was left out of the statistics
 */
public record Outlier(String analyte, String run, double mobility, double g, double gCritical, boolean excluded) {
}
