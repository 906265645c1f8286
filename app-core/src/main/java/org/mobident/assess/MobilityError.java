package org.mobident.assess;

import java.util.List;

/**
 * Reported minus true effective mobility over some peaks, in 1e-9 m²/(V s).
 *
 * @param count             how many peaks had both a reported and a true mobility
 * @param meanAbsoluteError mean of |reported − true| (NaN when count is 0)
 * @param bias              mean of (reported − true), signed (NaN when count is 0)
 */
public record MobilityError(int count, double meanAbsoluteError, double bias) {

    /** The error over the given differences (reported − true), 1e-9 m²/(V s). */
    public static MobilityError of(List<Double> differences) {
        if (differences.isEmpty()) {
            return new MobilityError(0, Double.NaN, Double.NaN);
        }
        double sum = 0;
        double sumAbs = 0;
        for (double d : differences) {
            sum += d;
            sumAbs += Math.abs(d);
        }
        return new MobilityError(differences.size(), sumAbs / differences.size(), sum / differences.size());
    }
}
