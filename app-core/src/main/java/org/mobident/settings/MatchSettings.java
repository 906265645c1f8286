package org.mobident.settings;

/**
 * How peaks are matched to library analytes. Immutable; start from {@link #DEFAULT} (or one of the
 * other presets) and change single settings with the {@code with…} methods, which validate.
 *
 * <h2>Candidate window</h2>
 * A library entry is a candidate for a peak only when the residual (peak mobility, converted to
 * the entry's conditions, minus the entry's mobility) lies within ± the window half-width. An
 * entry's own {@code tolerance} (when given) overrides the rule; otherwise:
 * <ul>
 *   <li>{@link WindowRule#ABSOLUTE}: half-width = {@code windowValue} mobility units;</li>
 *   <li>{@link WindowRule#RELATIVE}: half-width = {@code windowValue} × |μ_entry|, at least
 *       {@code minimumWindow};</li>
 *   <li>{@link WindowRule#SPREAD}: half-width = {@code windowValue} (k) × the combined standard
 *       uncertainty of the residual, at least {@code minimumWindow}. When the entry's spread is
 *       the sample SD of only a few runs, k is replaced by the Student-t quantile of the same
 *       coverage (see {@link org.mobident.matching.LibraryMatcher}).</li>
 * </ul>
 *
 * <h2>Probability model</h2>
 * See {@link org.mobident.matching.LibraryMatcher}. {@code notInLibraryPrior} is the prior fraction of a run's peaks that are
 * none of the library analytes; such peaks are taken as spread evenly over
 * {@code notInLibraryRangeUnits} mobility units. {@code assumedEntrySd} stands in for an entry's spread when
 * the library gives none, and {@code sdFloor} is added in quadrature to every combined
 * uncertainty (rounding of tabulated values, numerical safety).
 *
 * <h2>Status</h2>
 * An assigned peak is {@link org.mobident.result.MatchStatus#AMBIGUOUS} when the runner-up analyte's probability is at
 * least {@code ambiguityRatio} × the assigned analyte's, or when the confidence is below
 * {@code minIdentifiedConfidence}; otherwise {@link org.mobident.result.MatchStatus#IDENTIFIED}.
 *
 * @param windowRule              how the candidate window is set when an entry states no tolerance
 * @param windowValue             units (absolute), fraction of |μ| (relative) or k (spread)
 * @param minimumWindow           floor of the relative and spread windows, mobility units
 * @param notInLibraryPrior       prior fraction of peaks that are not in the library, in (0, 1)
 * @param notInLibraryRangeUnits  width of the mobility range over which an unknown peak is
 *                                assumed uniformly spread, mobility units; NaN: the library's own span
 *                                widened by a margin (see {@link #DEFAULT_NOT_IN_LIBRARY_RANGE})
 * @param assumedEntrySd          spread used for entries without {@code mobility_sd}, mobility units
 * @param sdFloor                 standard uncertainty added in quadrature, mobility units
 * @param ambiguityRatio          runner-up / assigned probability ratio at which a match is ambiguous
 * @param minIdentifiedConfidence confidence below which a match is ambiguous
 * @param sessionRsd              between-session spread of the mobilities, as a fraction of |μ|,
 *                                for libraries that have not learned their own (see {@link org.mobident.matching.SpreadModel})
 * @param scalePrior              what a run's scale correction may be (see {@link ScalePrior});
 *                                null switches the per-run scale correction off
 */
public record MatchSettings(WindowRule windowRule, double windowValue, double minimumWindow,
                            double notInLibraryPrior, double notInLibraryRangeUnits,
                            double assumedEntrySd, double sdFloor,
                            double ambiguityRatio, double minIdentifiedConfidence,
                            double sessionRsd, ScalePrior scalePrior) {

    /** How the candidate window half-width is chosen. */
    public enum WindowRule {
        /** A fixed half-width in mobility units. */
        ABSOLUTE,
        /** A fraction of the entry's |mobility|. */
        RELATIVE,
        /** k times the combined standard uncertainty of the residual. */
        SPREAD
    }

    /** k of the spread window: ±3 standard uncertainties (`common practice`, a 99.7 % normal interval). */
    public static final double DEFAULT_SPREAD_K = 3.0;
    /** Floor of the spread and relative windows, 0.5 mobility units (`common practice`). */
    public static final double DEFAULT_MINIMUM_WINDOW = 0.5;
    /** Half-width of the absolute preset, 1.0 mobility units (`common practice`). */
    public static final double DEFAULT_ABSOLUTE_WINDOW = 1.0;
    /** Fraction of the relative preset: 2 % of |μ| (`common practice`, day-to-day reproducibility of μ_eff). */
    public static final double DEFAULT_RELATIVE_WINDOW = 0.02;
    /** Prior that a peak is not in the library (`common practice` for screening runs). */
    public static final double DEFAULT_NOT_IN_LIBRARY_PRIOR = 0.2;
    /**
     * NaN: unknown peaks are taken as spread over the library's own mobility range, widened by
     * {@link #RANGE_MARGIN_UNITS} on each side (at least {@link #MIN_RANGE_UNITS}): peaks of a run
     * appear where the method separates, not over every mobility an ion could have.
     */
    public static final double DEFAULT_NOT_IN_LIBRARY_RANGE = Double.NaN;
    /** Margin added on each side of the library's mobility span for the range of unknown peaks (a modelling choice). */
    public static final double RANGE_MARGIN_UNITS = 10.0;
    /** Smallest range of unknown peaks, mobility units (a modelling choice). */
    public static final double MIN_RANGE_UNITS = 20.0;
    /** Spread assumed for entries without one: 1 unit, ≈2 % of a typical |μ| of 50 (`common practice`). */
    public static final double DEFAULT_ASSUMED_ENTRY_SD = 1.0;
    /** Standard uncertainty added in quadrature: 0.05 units (rounding of tabulated values). */
    public static final double DEFAULT_SD_FLOOR = 0.05;
    /** Ambiguous when the runner-up is at least a quarter as likely as the assigned analyte. */
    public static final double DEFAULT_AMBIGUITY_RATIO = 0.25;
    /**
     * Identified only when the assignment is at least four times as likely right as wrong (0.8), the
     * same odds as {@link #DEFAULT_AMBIGUITY_RATIO}; below it a call is ambiguous. A modelling choice,
     * measured on the lab-day bench (seeds 3, 7, 11, invented data): at 0.5 one identified call in 55
     * was wrong (runs whose scale had two readings), at 0.8 one in 200, for 1 % fewer zones named.
     */
    public static final double DEFAULT_MIN_IDENTIFIED_CONFIDENCE = 0.8;
    /**
     * Between-session RSD of effective mobilities once a run's scale is corrected: 0.3 % (a
     * modelling choice, `from memory`: day-to-day RSDs of μ_eff with a neutral marker are reported
     * around 0.5–1 % (Drouin et al., Anal. Chem. 92 (2020) 14103), most of it run-wide and taken out
     * by the scale correction).
     */
    public static final double DEFAULT_SESSION_RSD = 0.003;

    /** Spread window (k = 3, floor 0.5 units), prior 0.2 of peaks not in the library, scale correction on. */
    public static final MatchSettings DEFAULT = new MatchSettings(WindowRule.SPREAD, DEFAULT_SPREAD_K,
            DEFAULT_MINIMUM_WINDOW, DEFAULT_NOT_IN_LIBRARY_PRIOR, DEFAULT_NOT_IN_LIBRARY_RANGE,
            DEFAULT_ASSUMED_ENTRY_SD, DEFAULT_SD_FLOOR, DEFAULT_AMBIGUITY_RATIO, DEFAULT_MIN_IDENTIFIED_CONFIDENCE,
            DEFAULT_SESSION_RSD, ScalePrior.DEFAULT);

    /** As {@link #DEFAULT} but with a fixed ±1.0 unit window. */
    public static final MatchSettings ABSOLUTE = DEFAULT.withAbsoluteWindow(DEFAULT_ABSOLUTE_WINDOW);

    /** As {@link #DEFAULT} but with a ±2 % of |μ| window (at least 0.5 units). */
    public static final MatchSettings RELATIVE = DEFAULT.withRelativeWindow(DEFAULT_RELATIVE_WINDOW);

    public MatchSettings {
        if (windowRule == null) {
            throw new IllegalArgumentException("windowRule must be given");
        }
        requirePositive("windowValue", windowValue);
        if (!(minimumWindow >= 0) || Double.isInfinite(minimumWindow)) {
            throw new IllegalArgumentException("minimumWindow must be finite and >= 0, got " + minimumWindow);
        }
        if (!(notInLibraryPrior > 0 && notInLibraryPrior < 1)) {
            throw new IllegalArgumentException("notInLibraryPrior must lie strictly between 0 and 1, got "
                    + notInLibraryPrior);
        }
        if (!Double.isNaN(notInLibraryRangeUnits)) {
            requirePositive("notInLibraryRangeUnits", notInLibraryRangeUnits);
        }
        requirePositive("assumedEntrySd", assumedEntrySd);
        requirePositive("sdFloor", sdFloor);
        if (!(ambiguityRatio > 0 && ambiguityRatio <= 1)) {
            throw new IllegalArgumentException("ambiguityRatio must lie in (0, 1], got " + ambiguityRatio);
        }
        if (!(minIdentifiedConfidence >= 0 && minIdentifiedConfidence < 1)) {
            throw new IllegalArgumentException("minIdentifiedConfidence must lie in [0, 1), got "
                    + minIdentifiedConfidence);
        }
        if (!(sessionRsd >= 0 && sessionRsd < 1)) {
            throw new IllegalArgumentException("sessionRsd must lie in [0, 1), got " + sessionRsd);
        }
    }

    /** The range over which unknown peaks are spread for a library whose mobilities span [low, high]. */
    public double notInLibraryRange(double lowMobility, double highMobility) {
        if (!Double.isNaN(notInLibraryRangeUnits)) {
            return notInLibraryRangeUnits;
        }
        double span = Double.isFinite(highMobility - lowMobility) ? highMobility - lowMobility : 0.0;
        return Math.max(span + 2 * RANGE_MARGIN_UNITS, MIN_RANGE_UNITS);
    }

    /** True when each run's mobility scale is corrected from its matched peaks. */
    public boolean fitsScale() {
        return scalePrior != null;
    }

    private static void requirePositive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and > 0, got " + v);
        }
    }

    /** A fixed window of ± {@code halfWidthUnits} mobility units. */
    public MatchSettings withAbsoluteWindow(double halfWidthUnits) {
        return new MatchSettings(WindowRule.ABSOLUTE, halfWidthUnits, minimumWindow, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                scalePrior);
    }

    /** A window of ± {@code fraction} × |μ_entry| (at least {@link #minimumWindow()}). */
    public MatchSettings withRelativeWindow(double fraction) {
        return new MatchSettings(WindowRule.RELATIVE, fraction, minimumWindow, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                scalePrior);
    }

    /** A window of ± k combined standard uncertainties, at least {@code floorUnits}. */
    public MatchSettings withSpreadWindow(double k, double floorUnits) {
        return new MatchSettings(WindowRule.SPREAD, k, floorUnits, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                scalePrior);
    }

    /** Sets the floor of the relative and spread windows. */
    public MatchSettings withMinimumWindow(double floorUnits) {
        return new MatchSettings(windowRule, windowValue, floorUnits, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                scalePrior);
    }

    /** Sets the prior probability that a peak is not in the library. */
    public MatchSettings withNotInLibraryPrior(double prior) {
        return new MatchSettings(windowRule, windowValue, minimumWindow, prior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                scalePrior);
    }

    /** Sets the width of the range over which unknown peaks are assumed spread. */
    public MatchSettings withNotInLibraryRange(double rangeUnits) {
        return new MatchSettings(windowRule, windowValue, minimumWindow, notInLibraryPrior,
                rangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd, scalePrior);
    }

    /** Sets the spread assumed for entries that state none. */
    public MatchSettings withAssumedEntrySd(double sdUnits) {
        return new MatchSettings(windowRule, windowValue, minimumWindow, notInLibraryPrior,
                notInLibraryRangeUnits, sdUnits, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                scalePrior);
    }

    /** Sets the ambiguity thresholds. */
    public MatchSettings withAmbiguity(double ratio, double minConfidence) {
        return new MatchSettings(windowRule, windowValue, minimumWindow, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ratio, minConfidence, sessionRsd, scalePrior);
    }

    /** Sets the between-session RSD for libraries that have not learned their own. */
    public MatchSettings withSessionRsd(double rsd) {
        return new MatchSettings(windowRule, windowValue, minimumWindow, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, rsd,
                scalePrior);
    }

    /** Sets what a run's scale correction may be; null switches the correction off. */
    public MatchSettings withScalePrior(ScalePrior prior) {
        return new MatchSettings(windowRule, windowValue, minimumWindow, notInLibraryPrior,
                notInLibraryRangeUnits, assumedEntrySd, sdFloor, ambiguityRatio, minIdentifiedConfidence, sessionRsd,
                prior);
    }
}
