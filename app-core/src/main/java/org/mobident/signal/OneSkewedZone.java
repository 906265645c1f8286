package org.mobident.signal;

/**
 * One skewed zone fitted to the samples of a peak, in one of the forms electromigration dispersion
 * gives a zone: the exponentially modified Gaussian ({@link SkewedZoneFit}) of a mildly
 * overloaded zone, or the smoothed triangle ({@link TriangleZoneFit}) of a strongly overloaded one.
 * A peak is judged one zone, and its first moment checked, against the form that fits it better
 * ({@link #better}).
 */
sealed interface OneSkewedZone permits SkewedZoneFit, TriangleZoneFit {

    /** The zone's first moment (centre of mass), s. */
    double firstMomentS();

    /** +1 when the diffuse flank trails (tailing), −1 when it leads (fronting). */
    double direction();

    /** Residual sum of squares of the fit, signal units². */
    double residualSumOfSquares();

    /** Samples fitted. */
    int points();

    /** Parameters of the form. */
    int parameters();

    /**
     * p-value of the extra-sum-of-squares F-test of this one zone against a fit of several
     * Gaussian zones to the same samples: the probability of an improvement at least as large if
     * one skewed zone were the truth. The models are not nested, so the test is approximate
     * (Bates &amp; Watts, Nonlinear Regression Analysis and Its Applications, 1988, §3.5; from memory);
     * it is used only to keep a split that the data clearly ask for.
     */
    default double pValueAgainst(GaussianClusterFit.Result zones) {
        if (zones.points() != points()) {
            throw new IllegalArgumentException("the Gaussian fit must have more parameters on the same samples");
        }
        return GaussianClusterFit.extraParametersPValue(residualSumOfSquares(), zones.residualSumOfSquares(),
                zones.parameters() - parameters(), zones.points() - zones.parameters());
    }

    /**
     * The form that describes the zone, fitted to {@code v[first..last]}, or null when neither
     * fits: the triangle when it lowers n·ln(RSS) by at least
     * {@link SignalLimits#TRIANGLE_FORM_MIN_GAIN} (both forms have four parameters), the EMG
     * otherwise. For the zone's first moment.
     */
    static OneSkewedZone better(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
        OneSkewedZone emg = SkewedZoneFit.fit(t, v, first, last, minSigmaS, maxSigmaS);
        OneSkewedZone triangle = TriangleZoneFit.fit(t, v, first, last, minSigmaS, maxSigmaS);
        if (emg == null || triangle == null) {
            return emg == null ? triangle : emg;
        }
        return clearlyBetter(triangle.residualSumOfSquares(), emg.residualSumOfSquares(), emg.points())
                ? triangle : emg;
    }

    /**
     * Of the two forms fitted to {@code v[first..last]}, the one with the smaller residual, or null
     * when neither fits. Against it a split into several zones is judged: the samples are one zone
     * when either form explains them as well as the split does (two triangles can follow an
     * exponential flank, and two EMGs a straight one).
     */
    static OneSkewedZone closest(double[] t, double[] v, int first, int last, double minSigmaS, double maxSigmaS) {
        OneSkewedZone emg = SkewedZoneFit.fit(t, v, first, last, minSigmaS, maxSigmaS);
        OneSkewedZone triangle = TriangleZoneFit.fit(t, v, first, last, minSigmaS, maxSigmaS);
        if (emg == null || triangle == null) {
            return emg == null ? triangle : emg;
        }
        return triangle.residualSumOfSquares() < emg.residualSumOfSquares() ? triangle : emg;
    }

    /**
     * True when a fit of residual sum of squares {@code rss} beats one of {@code reference} with as
     * many parameters on the same {@code points} by {@link SignalLimits#TRIANGLE_FORM_MIN_GAIN} in
     * n·ln(RSS).
     */
    static boolean clearlyBetter(double rss, double reference, int points) {
        return points * Math.log(reference / rss) >= SignalLimits.TRIANGLE_FORM_MIN_GAIN;
    }
}
