package org.mobident.recheck;

/**
 * When two zones count as resolved by mobility: |Δμ| ≥ max(minimum, k·u_c), with u_c the
 * combined standard uncertainty √(u₁² + u₂²) of the two mobilities.
 *
 * <p>The k-term says the difference is significant (with k = 2 a two-sided coverage of about
 * 95 % under a normal model, JCGM 100:2008, GUM, 6.2–6.3); the floor says that even two perfectly
 * known mobilities closer than about one unit (≈2 % of a typical small-ion mobility) overlap as
 * zones of ordinary efficiency (common practice). Both are stated settings, not physics.
 *
 * @param minimumUnits floor of the required difference, mobility units, ≥ 0
 * @param k            coverage factor on the combined uncertainty, ≥ 0
 */
public record SeparationRule(double minimumUnits, double k) {

    /** Default floor: 1.0 mobility units (common practice). */
    public static final double DEFAULT_MINIMUM_UNITS = 1.0;
    /** Default coverage factor: 2 (≈95 %, GUM). */
    public static final double DEFAULT_K = 2.0;
    /** Floor 1.0 units, k = 2. */
    public static final SeparationRule DEFAULT = new SeparationRule(DEFAULT_MINIMUM_UNITS, DEFAULT_K);

    public SeparationRule {
        if (!(minimumUnits >= 0) || Double.isInfinite(minimumUnits)) {
            throw new IllegalArgumentException("minimum separation must be finite and ≥ 0, got " + minimumUnits);
        }
        if (!(k >= 0) || Double.isInfinite(k)) {
            throw new IllegalArgumentException("k must be finite and ≥ 0, got " + k);
        }
        if (minimumUnits == 0 && k == 0) {
            throw new IllegalArgumentException("a separation rule needs a floor or a k above zero");
        }
    }

    /** The required |Δμ| for two mobilities of standard uncertainties u1 and u2 (NaN counts as 0). */
    public double threshold(double u1, double u2) {
        double uc = Math.hypot(Double.isNaN(u1) ? 0.0 : u1, Double.isNaN(u2) ? 0.0 : u2);
        return Math.max(minimumUnits, k * uc);
    }

    /** Whether a difference {@code delta} is resolved given the two uncertainties. */
    public boolean resolved(double delta, double u1, double u2) {
        return Math.abs(delta) >= threshold(u1, u2);
    }
}
