package org.mobident.chem;

/**
 * Mole fractions of the protolytic forms of a weak electrolyte at a given pH.
 *
 * <p>A species with n acidity constants pKa₁ ≤ … ≤ pKaₙ has n + 1 forms, indexed i = 0 (most
 * protonated) to n (least protonated). From the successive Henderson–Hasselbalch equilibria
 * [Xᵢ]/[Xᵢ₋₁] = 10^(pH − pKaᵢ) the amount of form i relative to form 0 is the cumulative product
 * 10^(i·pH − Σₖ₌₁..ᵢ pKaₖ), and the mole fractions are these weights normalised to a sum of one
 * (e.g. Harris, Quantitative Chemical Analysis, "fractional composition" of polyprotic systems;
 * Pospíchal, Gebauer &amp; Boček, Chem. Rev. 89 (1989) 419, for its use in electrophoresis).
 *
 * <p>Numerics: the weights are kept as base-10 logarithms and normalised by a log-sum-exp (the
 * largest exponent is factored out), so no overflow or underflow occurs however far the pH lies
 * from the pKa values.
 *
 * <p>The pKa values given here must already be the ones that apply in the buffer (for a
 * finite ionic strength the mixed constants of {@link Activity#mixedPka}).
 */
public final class IonicForms {

    private IonicForms() {
    }

    /**
     * Base-10 logarithms of the unnormalised weights: logWᵢ = i·pH − Σₖ≤ᵢ pKaₖ.
     *
     * @param pKa acidity constants in ascending order (may be empty: one form)
     * @param pH  pH
     * @return n + 1 log-weights, most protonated form first
     */
    static double[] logWeights(double[] pKa, double pH) {
        double[] w = new double[pKa.length + 1];
        double cumulative = 0.0;
        for (int i = 1; i <= pKa.length; i++) {
            cumulative += pKa[i - 1];
            w[i] = i * pH - cumulative;
        }
        return w;
    }

    /**
     * Mole fractions αᵢ(pH) of the forms, most protonated first; they sum to one.
     *
     * @param pKa acidity constants (ascending; not modified); empty for a strong electrolyte
     * @param pH  pH (finite)
     * @return n + 1 fractions in [0, 1]
     * @throws IllegalArgumentException if the pH or a pKa is not finite
     */
    public static double[] fractions(double[] pKa, double pH) {
        if (!Double.isFinite(pH)) {
            throw new IllegalArgumentException("pH must be finite, got " + pH);
        }
        for (double p : pKa) {
            if (!Double.isFinite(p)) {
                throw new IllegalArgumentException("pKa values must be finite, got " + p);
            }
        }
        double[] w = logWeights(pKa, pH);
        double max = Double.NEGATIVE_INFINITY;
        for (double v : w) {
            max = Math.max(max, v);
        }
        double sum = 0.0;
        for (int i = 0; i < w.length; i++) {
            w[i] = Math.pow(10.0, w[i] - max);
            sum += w[i];
        }
        for (int i = 0; i < w.length; i++) {
            w[i] /= sum;
        }
        return w;
    }
}
