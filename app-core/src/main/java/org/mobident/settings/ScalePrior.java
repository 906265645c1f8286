package org.mobident.settings;

/**
 * What a run's mobility scale may be off by, before its peaks are seen. All mobilities of one run
 * share systematic errors: the capillary runs warmer or cooler than stated (about 2.3 % of every
 * mobility per kelvin near 25 °C, through the viscosity of water; IAPWS 2008), the effective field
 * differs from V/L<sub>t</sub>, and the marker apex is biased by its shape. The matcher models the
 * run's mobilities as μ_obs = a·μ_lib + b (see {@link org.mobident.result.RunScale}) with a normal prior on a and b
 * centred on (1, 0) — or on what a batch of runs showed (see {@link #centredOn}) — cut at the
 * plausible bounds given here (always around a = 1, b = 0: they are physical).
 *
 * @param factorCentre       centre of the prior on a
 * @param offsetCentre       centre of the prior on b, mobility units
 * @param factorSd           standard deviation of the prior on the scale factor a (a fraction)
 * @param offsetSd           standard deviation of the prior on the offset b, mobility units
 * @param maxFactorDeviation largest plausible |a − 1|
 * @param maxOffset          largest plausible |b|, mobility units
 */
public record ScalePrior(double factorCentre, double offsetCentre, double factorSd, double offsetSd,
                         double maxFactorDeviation, double maxOffset) {

    /**
     * a: SD 0.02 (about ±0.9 K of unnoticed capillary temperature error at 2.3 %/K, or a few per
     * cent of field error), at most ±0.06 (about 2.6 K); b: SD 0.5 units, at most ±3 units (a
     * modelling choice, `common practice` for thermostatted capillaries with a neutral marker).
     */
    public static final ScalePrior DEFAULT = new ScalePrior(1.0, 0.0, 0.02, 0.5, 0.06, 3.0);

    public ScalePrior {
        if (!(factorCentre > 0) || !Double.isFinite(factorCentre) || !Double.isFinite(offsetCentre)) {
            throw new IllegalArgumentException("prior centre must be finite with a > 0, got " + factorCentre + ", "
                    + offsetCentre);
        }
        positive("factorSd", factorSd);
        positive("offsetSd", offsetSd);
        positive("maxFactorDeviation", maxFactorDeviation);
        positive("maxOffset", maxOffset);
        if (maxFactorDeviation >= 1) {
            throw new IllegalArgumentException("maxFactorDeviation must be below 1, got " + maxFactorDeviation);
        }
    }

    private static void positive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and > 0, got " + v);
        }
    }

    /** The same bounds with another centre and spread (a prior learned from a batch of runs). */
    public ScalePrior centredOn(double factor, double factorSd, double offset, double offsetSd) {
        return new ScalePrior(factor, offset, factorSd, offsetSd, maxFactorDeviation, maxOffset);
    }

    /** ln of the (unnormalised-at-the-bounds) normal prior density at (a, b). */
    public double logDensity(double factor, double offset) {
        double za = (factor - factorCentre) / factorSd;
        double zb = (offset - offsetCentre) / offsetSd;
        return -0.5 * (za * za + zb * zb) - Math.log(2 * Math.PI * factorSd * offsetSd);
    }

    /** True when (a, b) lies within the plausible bounds. */
    public boolean plausible(double factor, double offset) {
        return Math.abs(factor - 1.0) <= maxFactorDeviation && Math.abs(offset) <= maxOffset;
    }
}
