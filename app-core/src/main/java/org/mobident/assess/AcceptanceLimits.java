package org.mobident.assess;

import java.util.ArrayList;
import java.util.List;

/**
 * A lab's acceptance limits for a validation: the least precision of identified calls, the least
 * recall of the analytes present, the largest expected calibration error of the calls. A limit that
 * is NaN is not set.
 *
 * @param minPrecision least {@link Identification#precision()}, a fraction in [0, 1]
 * @param minRecall    least {@link Identification#recall()}, a fraction in [0, 1]
 * @param maxEce       largest expected calibration error of the calls ({@link Assessment#calls()}), in [0, 1]
 */
public record AcceptanceLimits(double minPrecision, double minRecall, double maxEce) {

    /** No limits. */
    public static final AcceptanceLimits NONE = new AcceptanceLimits(Double.NaN, Double.NaN, Double.NaN);

    public AcceptanceLimits {
        for (double v : new double[] {minPrecision, minRecall, maxEce}) {
            if (!Double.isNaN(v) && !(v >= 0 && v <= 1)) {
                throw new IllegalArgumentException("an acceptance limit is a fraction between 0 and 1, got " + v);
            }
        }
    }

    /**
     * One limit checked.
     *
     * @param name  what was limited ("precision", "recall", "ECE")
     * @param limit the limit
     * @param value the measured value (NaN when it could not be measured: the limit is then not met)
     * @param atLeast true when the value must reach the limit, false when it must not exceed it
     * @param met   whether the value is within the limit
     */
    public record Check(String name, double limit, double value, boolean atLeast, boolean met) {
    }

    /** True when any limit is set. */
    public boolean any() {
        return !Double.isNaN(minPrecision) || !Double.isNaN(minRecall) || !Double.isNaN(maxEce);
    }

    /** The set limits checked against an assessment, in the order precision, recall, ECE. */
    public List<Check> check(Assessment a) {
        List<Check> out = new ArrayList<>();
        if (!Double.isNaN(minPrecision)) {
            double v = a.identification().precision().value();
            out.add(new Check("precision", minPrecision, v, true, v >= minPrecision));
        }
        if (!Double.isNaN(minRecall)) {
            double v = a.identification().recall().value();
            out.add(new Check("recall", minRecall, v, true, v >= minRecall));
        }
        if (!Double.isNaN(maxEce)) {
            double v = a.calls().ece();
            out.add(new Check("ECE", maxEce, v, false, v <= maxEce));
        }
        return out;
    }

    /** True when every set limit is met. */
    public boolean allMet(Assessment a) {
        return check(a).stream().allMatch(Check::met);
    }
}
