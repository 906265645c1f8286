package org.mobident.result;

import org.mobident.settings.ScalePrior;

/**
 * The run-wide correction of a run's mobilities: μ_obs = a·μ_lib + b, so a peak's mobility
 * compared with the library is (μ_obs − b)/a. a absorbs what scales every mobility alike
 * (capillary temperature, effective field), b what shifts them alike (the EOF marker's error).
 * Fitted per run from the peaks the library explains (see {@code matching.LibraryMatcher}).
 *
 * @param status     whether the correction was fitted
 * @param factor     a (1 when not fitted)
 * @param factorSd   its standard uncertainty (the prior's when not fitted; 0 when switched off)
 * @param offset     b, 1e-9 m²/(V s) (0 when not fitted)
 * @param offsetSd   its standard uncertainty, same unit
 * @param covariance cov(a, b), same unit
 * @param anchors    expected number of peaks that carried the fit (sum of their match probabilities)
 */
public record RunScale(Status status, double factor, double factorSd, double offset, double offsetSd,
                       double covariance, double anchors) {

    /** How the scale came about. */
    public enum Status {
        /** Fitted from the run's matched peaks. */
        FITTED("fitted"),
        /** Too few peaks matched to fit it: left at the prior's centre with the prior's uncertainty. */
        TOO_FEW_ANCHORS("too few matched peaks"),
        /** Scale correction switched off. */
        OFF("off");

        private final String label;

        Status(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** No correction and no uncertainty (the correction is switched off). */
    public static final RunScale OFF = new RunScale(Status.OFF, 1.0, 0.0, 0.0, 0.0, 0.0, 0.0);

    public RunScale {
        if (status == null) {
            throw new IllegalArgumentException("status must be given");
        }
        if (!(factor > 0) || !Double.isFinite(offset)) {
            throw new IllegalArgumentException("scale factor must be positive and offset finite, got a = " + factor
                    + ", b = " + offset);
        }
    }

    /** Not fitted: the prior's centre (a = 1, b = 0 unless a batch showed otherwise), with the prior's uncertainty. */
    public static RunScale prior(ScalePrior p, double anchors) {
        return new RunScale(Status.TOO_FEW_ANCHORS, p.factorCentre(), p.factorSd(), p.offsetCentre(), p.offsetSd(),
                0.0, anchors);
    }

    /** A run mobility (at the library's temperature) as compared with the library: (μ − b)/a. */
    public double corrected(double mobility) {
        return (mobility - offset) / factor;
    }

    /**
     * Variance that the uncertainty of a and b adds to a corrected mobility near {@code libraryMobility},
     * (1e-9 m²/(V s))²: (μ²·var a + var b + 2μ·cov(a, b)) / a².
     */
    public double varianceAt(double libraryMobility) {
        double v = libraryMobility * libraryMobility * factorSd * factorSd + offsetSd * offsetSd
                + 2 * libraryMobility * covariance;
        return Math.max(0.0, v) / (factor * factor);
    }

    /** True when the correction was fitted from the run's peaks. */
    public boolean fitted() {
        return status == Status.FITTED;
    }
}
