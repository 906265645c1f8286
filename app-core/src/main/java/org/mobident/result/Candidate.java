package org.mobident.result;

/**
 * One library analyte considered for a peak.
 *
 * @param name             analyte name
 * @param libraryMobility  the analyte's library mobility (at the library temperature)
 * @param residual         peak mobility minus library mobility, same temperature, 1e-9 m²/(V s)
 * @param z                residual divided by the combined standard uncertainty
 * @param probability      posterior probability that the peak is this analyte
 */
public record Candidate(String name, double libraryMobility, double residual, double z, double probability) {

    /**
     * The combined standard uncertainty the residual was divided by: measurement, run scale and
     * library spread together, the uncertainty that decides the match (|residual / z|); NaN when
     * the residual is zero and it cannot be recovered.
     */
    public double combinedSd() {
        return z != 0 && Double.isFinite(z) ? Math.abs(residual / z) : Double.NaN;
    }
}
