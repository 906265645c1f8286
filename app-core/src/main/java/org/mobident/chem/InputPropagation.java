package org.mobident.chem;

/**
 * Standard uncertainty of a model output from the uncertainties of its inputs (pKa values and
 * limiting mobilities), by first-order propagation with central-difference derivatives
 * (JCGM 100:2008 (GUM) eq. 10, inputs taken as independent). The arrays are perturbed in place
 * one element at a time and restored.
 */
public final class InputPropagation {

    /** Step of the pKa derivatives, pH units. */
    public static final double PKA_STEP = 1e-3;

    /** Relative step of the limiting-mobility derivatives. */
    public static final double RELATIVE_MOBILITY_STEP = 1e-3;

    /** A model output as a function of its pKa values and limiting mobilities. */
    @FunctionalInterface
    public interface Output {
        double value(double[] pKa, double[] limitingMobilities);
    }

    private InputPropagation() {
    }

    /**
     * Variance of {@code f} for independent input uncertainties.
     *
     * @param pKaSd              standard uncertainty of every pKa (0: none)
     * @param relativeMobilitySd relative standard uncertainty of every non-zero limiting mobility (0: none)
     */
    public static double variance(Output f, double[] pKa, double[] mu, double pKaSd, double relativeMobilitySd) {
        double variance = 0.0;
        if (pKaSd > 0.0) {
            for (int k = 0; k < pKa.length; k++) {
                double keep = pKa[k];
                pKa[k] = keep + PKA_STEP;
                double up = f.value(pKa, mu);
                pKa[k] = keep - PKA_STEP;
                double down = f.value(pKa, mu);
                pKa[k] = keep;
                variance += square((up - down) / (2.0 * PKA_STEP) * pKaSd);
            }
        }
        if (relativeMobilitySd > 0.0) {
            for (int i = 0; i < mu.length; i++) {
                double keep = mu[i];
                if (keep == 0.0) {
                    continue;
                }
                double step = Math.abs(keep) * RELATIVE_MOBILITY_STEP;
                mu[i] = keep + step;
                double up = f.value(pKa, mu);
                mu[i] = keep - step;
                double down = f.value(pKa, mu);
                mu[i] = keep;
                variance += square((up - down) / (2.0 * step) * Math.abs(keep) * relativeMobilitySd);
            }
        }
        return variance;
    }

    private static double square(double x) {
        return x * x;
    }
}
