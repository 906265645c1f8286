package org.mobident.library.standards;

/**
 * How a library is built from standards runs. Immutable; start from {@link #defaults()} and change
 * single values with the {@code with…} methods. Mobility values are in 1e-9 m²/(V·s).
 *
 * @param toleranceSdMultiple  k of a fixed match window max(k·SD, floor) written into the library as
 *                             each entry's {@code tolerance}; NaN by default: no window is written, and
 *                             identification applies its prediction interval
 *                             ({@link org.mobident.matching.MatchWindow}), which a fixed window would
 *                             override. Only when the lab asks for a fixed window.
 * @param toleranceFloor       the floor of that fixed window, mobility units; NaN by default
 * @param rsdLimitPercent      replicate RSD above which a warning is given, %; 2 by default (common practice)
 * @param minReplicates        fewer replicates than this give a warning; 3 by default (the Grubbs test
 *                             and a meaningful SD need at least three)
 * @param outlierAlpha         significance level of the Grubbs test; 0.05 by default (ASTM E178)
 * @param outlierAlternative   which extreme the Grubbs test examines; two-sided by default, since a
 *                             replicate mobility can err either way (ASTM E178)
 * @param excludeOutliers      when true, a value found to be an outlier is left out of the statistics
 *                             (it is still reported); false by default: outliers are reported and kept
 * @param minRelativeHeight    peaks lower than this fraction of their run's largest analyte peak are
 *                             set aside as unexpected (impurities, system peaks); 0.05 by default
 *                             (common practice)
 * @param groupingSdMultiple   a peak may join an analyte group when its distance to the group centre
 *                             is at most max(this × the peak's mobility SD, {@code groupingFloor}); 4
 * @param groupingFloor        floor of that distance, mobility units; 2.0 by default (common practice:
 *                             well above the usual between-run scatter of a few tenths; zones closer
 *                             than this are still kept apart when both appear in a run, because a
 *                             group takes at most one peak per run)
 * @param approxWindow         a group is named after an analyte's approx_mobility only within this
 *                             distance, mobility units; 5.0 by default (approximate values come from
 *                             other buffers or the literature)
 * @param referenceWindow      a group is named from the reference library only within
 *                             max(this, the entry's tolerance), mobility units; 5.0 by default
 * @param mergeCoverageFactor  coverage factor k for the merge check |m₁ − m₂| ≤ k·√(s₁²/n₁ + s₂²/n₂);
 *                             2 by default (about 95 %, JCGM 100:2008 (GUM) §6.3)
 * @param maxRunsInSource      up to this many run names are listed in an entry's source; more are
 *                             abbreviated to first…last and a count; 6 by default
 */
public record BuildSettings(
        double toleranceSdMultiple,
        double toleranceFloor,
        double rsdLimitPercent,
        int minReplicates,
        double outlierAlpha,
        Grubbs.Alternative outlierAlternative,
        boolean excludeOutliers,
        double minRelativeHeight,
        double groupingSdMultiple,
        double groupingFloor,
        double approxWindow,
        double referenceWindow,
        double mergeCoverageFactor,
        int maxRunsInSource) {

    /** The defaults described on each component. */
    public static BuildSettings defaults() {
        return new BuildSettings(Double.NaN, Double.NaN, 2.0, 3, 0.05, Grubbs.Alternative.TWO_SIDED, false, 0.05,
                4.0, 2.0, 5.0, 5.0, 2.0, 6);
    }

    /** k of a fixed window when only the floor is asked for (three standard deviations: common practice). */
    public static final double DEFAULT_FIXED_WINDOW_K = 3.0;
    /** Floor of a fixed window when only k is asked for, mobility units (common practice). */
    public static final double DEFAULT_FIXED_WINDOW_FLOOR = 0.5;

    /** True when a fixed window is written into the library. */
    public boolean writesTolerance() {
        return Double.isFinite(toleranceSdMultiple);
    }

    /** @throws IllegalArgumentException when a value is out of its range */
    public BuildSettings {
        if (Double.isNaN(toleranceSdMultiple) != Double.isNaN(toleranceFloor)) {
            throw new IllegalArgumentException("a fixed window needs both its k and its floor (or neither)");
        }
        if (!Double.isNaN(toleranceSdMultiple)) {
            positive("toleranceSdMultiple", toleranceSdMultiple);
            positive("toleranceFloor", toleranceFloor);
        }
        positive("rsdLimitPercent", rsdLimitPercent);
        if (minReplicates < 1) {
            throw new IllegalArgumentException("minReplicates must be at least 1, got " + minReplicates);
        }
        if (!(outlierAlpha > 0 && outlierAlpha < 1)) {
            throw new IllegalArgumentException("outlierAlpha must be between 0 and 1, got " + outlierAlpha);
        }
        if (outlierAlternative == null) {
            throw new IllegalArgumentException("outlierAlternative is required");
        }
        if (!(minRelativeHeight >= 0 && minRelativeHeight < 1)) {
            throw new IllegalArgumentException("minRelativeHeight must be in [0, 1), got " + minRelativeHeight);
        }
        positive("groupingSdMultiple", groupingSdMultiple);
        positive("groupingFloor", groupingFloor);
        positive("approxWindow", approxWindow);
        positive("referenceWindow", referenceWindow);
        positive("mergeCoverageFactor", mergeCoverageFactor);
        if (maxRunsInSource < 1) {
            throw new IllegalArgumentException("maxRunsInSource must be at least 1, got " + maxRunsInSource);
        }
    }

    private static void positive(String name, double v) {
        if (!(v > 0 && Double.isFinite(v))) {
            throw new IllegalArgumentException(name + " must be a positive number, got " + v);
        }
    }

    /**
     * The fixed window half-width to write for a replicate SD: max(k·SD, floor), the floor when SD is
     * unknown; NaN when no fixed window was asked for.
     */
    public double toleranceFor(double sd) {
        if (!writesTolerance()) {
            return Double.NaN;
        }
        return Double.isNaN(sd) ? toleranceFloor : Math.max(toleranceSdMultiple * sd, toleranceFloor);
    }

    public BuildSettings withTolerance(double sdMultiple, double floor) {
        return new BuildSettings(sdMultiple, floor, rsdLimitPercent, minReplicates, outlierAlpha, outlierAlternative,
                excludeOutliers, minRelativeHeight, groupingSdMultiple, groupingFloor, approxWindow, referenceWindow,
                mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withRsdLimitPercent(double limit) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, limit, minReplicates, outlierAlpha,
                outlierAlternative, excludeOutliers, minRelativeHeight, groupingSdMultiple, groupingFloor,
                approxWindow, referenceWindow, mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withMinReplicates(int min) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, min, outlierAlpha,
                outlierAlternative, excludeOutliers, minRelativeHeight, groupingSdMultiple, groupingFloor,
                approxWindow, referenceWindow, mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withOutlierTest(double alpha, Grubbs.Alternative alternative, boolean exclude) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, minReplicates, alpha,
                alternative, exclude, minRelativeHeight, groupingSdMultiple, groupingFloor, approxWindow,
                referenceWindow, mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withMinRelativeHeight(double fraction) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, minReplicates, outlierAlpha,
                outlierAlternative, excludeOutliers, fraction, groupingSdMultiple, groupingFloor, approxWindow,
                referenceWindow, mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withGrouping(double sdMultiple, double floor) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, minReplicates, outlierAlpha,
                outlierAlternative, excludeOutliers, minRelativeHeight, sdMultiple, floor, approxWindow,
                referenceWindow, mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withNamingWindows(double approx, double reference) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, minReplicates, outlierAlpha,
                outlierAlternative, excludeOutliers, minRelativeHeight, groupingSdMultiple, groupingFloor, approx,
                reference, mergeCoverageFactor, maxRunsInSource);
    }

    public BuildSettings withMergeCoverageFactor(double k) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, minReplicates, outlierAlpha,
                outlierAlternative, excludeOutliers, minRelativeHeight, groupingSdMultiple, groupingFloor,
                approxWindow, referenceWindow, k, maxRunsInSource);
    }

    public BuildSettings withMaxRunsInSource(int max) {
        return new BuildSettings(toleranceSdMultiple, toleranceFloor, rsdLimitPercent, minReplicates, outlierAlpha,
                outlierAlternative, excludeOutliers, minRelativeHeight, groupingSdMultiple, groupingFloor,
                approxWindow, referenceWindow, mergeCoverageFactor, max);
    }
}
