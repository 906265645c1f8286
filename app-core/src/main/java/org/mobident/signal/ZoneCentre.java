package org.mobident.signal;

/**
 * The centre of a zone: the first moment (centre of mass) of the baseline-corrected signal between
 * the peak's start and end, with its standard uncertainty.
 *
 * <p><b>Why the centre.</b> Electromigration dispersion skews a concentrated zone: one flank
 * sharpens and the other spreads, and the apex moves towards the sharp flank as the concentration
 * grows (Mikkers, Everaerts &amp; Verheggen, J. Chromatogr. 169 (1979) 1). The position that belongs
 * to the analyte's mobility at infinite dilution lies beyond the apex, towards the diffuse flank;
 * Erny et al. (Anal. Chem. 73 (2001) 4862; not read here, cited as given to us) fit the
 * Haarhoff–van der Linde shape to recover it. The first moment needs no model of the shape, does
 * not move with a symmetric broadening, and lies between the apex and that position: a robust,
 * model-free estimate. For an exponentially modified Gaussian it is t_G + τ exactly (Grushka, Anal.
 * Chem. 44 (1972) 1733).
 *
 * <p><b>Moment.</b> With trapezoid weights w_i on the sample times (so that A = Σ w_i y_i is the
 * trapezoidal area), t_c = Σ w_i y_i t_i / A.
 *
 * <p><b>Uncertainty.</b> ∂t_c/∂y_i = w_i (t_i − t_c)/A, so white noise of SD σ gives
 * Var(t_c) = σ² Σ (w_i (t_i − t_c))² / A² (first-order propagation, GUM, JCGM 100:2008, §5.1).
 * For noise with lag-one correlation ρ (first-order autoregressive), a weighted sum whose weights
 * change slowly over the correlation length has (1 + ρ)/(1 − ρ) times the white-noise variance
 * (Σ_k ρ^|k| = (1 + ρ)/(1 − ρ): Box &amp; Jenkins 1970, ch. 3; from memory); the factor is applied,
 * which overstates the variance somewhat for zones narrower than the correlation length. The
 * shape adds a term: by default k·|t_c − t_apex| with k = {@link SignalLimits#CENTRE_SHAPE_FACTOR} (a
 * modelling choice: the distance between the apex and the centre measures how far the zone is from
 * the symmetric shape for which both agree, and a third of it is how far the centre may itself lie
 * from the zone's infinite-dilution position). Where a second estimate of the same first moment
 * exists, the difference between the two replaces it (never below
 * {@link SignalLimits#CENTRE_SHAPE_FLOOR_FACTOR}·|t_c − t_apex|): the μ + τ of a skewed zone fitted
 * to the peak ({@code PeakDetector}), or, for a zone of a fitted skewed cluster, the moment of its
 * share of the data, with a term for the samples its neighbours share. On the lab-day bench the
 * first moments of most isolated skewed zones lay within about 0.1 s of the truth whatever their
 * skew, while the third of the apex–centre distance grew to 0.8 s: confirmed zones were stated
 * three times too uncertain and many were left ambiguous. Where the fitted skewed zone exists,
 * {@code PeakDetector} reports its moment rather than this one: the samples' moment loses the
 * part of a long diffuse flank beyond the peak's end (RMS error 0.17 s against 0.08 s over 386
 * isolated skewed zones, up to 1.5 s). A peak cut at a valley shared with a neighbour adds a
 * boundary term for each end ({@link #boundaryTermS}); all terms are combined in quadrature
 * (GUM §5.1.2).
 *
 * @param centreTimeS first moment, s; NaN when the area is not positive
 * @param leverS      √(Σ (w_i (t_i − t_c))²) / A, s per signal unit: times σ it is the
 *                    white-noise standard uncertainty of t_c
 */
record ZoneCentre(double centreTimeS, double leverS) {

    /**
     * The first moment of {@code v} over the samples [first, last].
     *
     * @param t     times, s
     * @param v     baseline-corrected signal, peak up
     * @param first first sample (inclusive)
     * @param last  last sample (inclusive), &gt; first
     */
    static ZoneCentre of(double[] t, double[] v, int first, int last) {
        if (last <= first) {
            return new ZoneCentre(Double.NaN, Double.NaN);
        }
        double area = 0;
        double moment = 0;
        for (int i = first; i <= last; i++) {
            double w = weight(t, i, first, last);
            area += w * v[i];
            moment += w * v[i] * t[i];
        }
        if (!(area > 0)) {
            return new ZoneCentre(Double.NaN, Double.NaN);
        }
        double centre = moment / area;
        double sum = 0;
        for (int i = first; i <= last; i++) {
            double a = weight(t, i, first, last) * (t[i] - centre);
            sum += a * a;
        }
        return new ZoneCentre(centre, Math.sqrt(sum) / area);
    }

    /** Trapezoid weight of sample i on [first, last]: half of each neighbouring interval inside it. */
    private static double weight(double[] t, int i, int first, int last) {
        double left = i > first ? t[i] - t[i - 1] : 0;
        double right = i < last ? t[i + 1] - t[i] : 0;
        return 0.5 * (left + right);
    }

    /**
     * Standard uncertainty of the centre time, s: the noise, the shape term and the two boundary
     * terms, combined in quadrature.
     *
     * @param noiseSd     SD σ of the noise of the signal the moment was taken on
     * @param correlation lag-one correlation ρ of that noise, in [0, 1)
     * @param apexTimeS   the apex time of the same peak, s
     * @param boundary    the peak's start and end: times, s, and how far the signal stands above the
     *                    baseline's noise there (see {@link #boundaryTermS})
     * @param widthHalfS  the peak's width at half height, s
     * @param area        the peak's area, signal units × s
     */
    double uncertaintyS(double noiseSd, double correlation, double apexTimeS, Boundaries boundary,
                        double widthHalfS, double area) {
        return uncertaintyWithShapeS(noiseSd, correlation,
                SignalLimits.CENTRE_SHAPE_FACTOR * Math.abs(centreTimeS - apexTimeS), boundary, widthHalfS, area);
    }

    /**
     * As {@link #uncertaintyS(double, double, double, Boundaries, double, double)}, with the shape
     * term given (s) instead of taken from the apex–centre distance.
     */
    double uncertaintyWithShapeS(double noiseSd, double correlation, double shapeS, Boundaries boundary,
                                 double widthHalfS, double area) {
        double noise = noiseSd * leverS * Math.sqrt((1 + correlation) / (1 - correlation));
        double shape = shapeS;
        double start = boundaryTermS(boundary.startTimeS(), boundary.startHeight(), widthHalfS, area);
        double end = boundaryTermS(boundary.endTimeS(), boundary.endHeight(), widthHalfS, area);
        return Math.sqrt(noise * noise + shape * shape + start * start + end * end);
    }

    /**
     * A peak's start and end, and how far the smoothed corrected signal stands above the level at
     * which it counts as back on the baseline there (0 at an end on the baseline).
     *
     * @param startTimeS  start, s
     * @param startHeight excess of the signal at the start, signal units
     * @param endTimeS    end, s
     * @param endHeight   excess of the signal at the end, signal units
     */
    record Boundaries(double startTimeS, double startHeight, double endTimeS, double endHeight) {
    }

    /**
     * How far the moment may be off because the peak is cut at a boundary where the signal has not
     * returned to the baseline (a valley shared with a neighbour, or the dominance boundary between
     * fitted zones): the tail of a Gaussian of the peak's own width with the height v found at the
     * boundary holds the mass v·s·√(π/2) beyond it (s = w½/2.3548, the half-Gaussian integral), and
     * that mass, lost from this zone or taken in from the neighbour, moves the moment by about
     * mass · |t_b − t_c| / A. This is an order-of-magnitude bound, not a correction: the zone's own
     * lost tail and the neighbour's tail taken in push the moment in opposite directions. Zero where
     * the signal is back at the baseline.
     */
    double boundaryTermS(double boundaryTimeS, double height, double widthHalfS, double area) {
        if (!(height > 0) || !(area > 0)) {
            return 0.0;
        }
        double tailMass = height * widthHalfS / GaussianClusterFit.HALF_WIDTH_PER_SIGMA * HALF_GAUSSIAN_FACTOR;
        return tailMass * Math.abs(boundaryTimeS - centreTimeS) / area;
    }

    /** √(π/2): the integral of exp(−u²/2) over u ≥ 0. */
    private static final double HALF_GAUSSIAN_FACTOR = Math.sqrt(Math.PI / 2);
}
