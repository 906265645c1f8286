package org.mobident.buffer;

/**
 * The input uncertainties propagated into a predicted mobility.
 *
 * @param pKaSd                   standard uncertainty of every pKa value, pKa units, ≥ 0
 * @param relativeMobilitySd      relative standard uncertainty of every limiting mobility, ≥ 0 (0.02 = 2 %)
 */
public record PredictionUncertainty(double pKaSd, double relativeMobilitySd) {

    /**
     * Default pKa uncertainty, 0.05. Common practice: independent compilations of pKa values at
     * 25 °C typically differ by a few hundredths (e.g. acetic acid 4.756 vs 4.76, phosphoric acid
     * pKa₃ 12.32–12.67), so ±0.05 is a modest default for handbook values.
     */
    public static final double DEFAULT_PKA_SD = 0.05;
    /**
     * Default relative limiting-mobility uncertainty, 2 %. Common practice: limiting ionic
     * conductivities of common ions agree to about 1 % between compilations, less well-studied
     * ions to a few per cent.
     */
    public static final double DEFAULT_RELATIVE_MOBILITY_SD = 0.02;

    /** The defaults above. */
    public static final PredictionUncertainty DEFAULT =
            new PredictionUncertainty(DEFAULT_PKA_SD, DEFAULT_RELATIVE_MOBILITY_SD);

    public PredictionUncertainty {
        if (!(pKaSd >= 0.0) || Double.isInfinite(pKaSd)) {
            throw new IllegalArgumentException("pKa uncertainty must be finite and ≥ 0, got " + pKaSd);
        }
        if (!(relativeMobilitySd >= 0.0) || Double.isInfinite(relativeMobilitySd)) {
            throw new IllegalArgumentException("relative mobility uncertainty must be finite and ≥ 0, got "
                    + relativeMobilitySd);
        }
    }
}
