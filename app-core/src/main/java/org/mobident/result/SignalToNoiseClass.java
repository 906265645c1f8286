package org.mobident.result;

import org.mobident.Tolerances;

/**
 * Where a peak's signal-to-noise ratio stands against the limits that ICH Q2(R1) names for the
 * signal-to-noise approach (ICH Q2(R1), 2005, §§ 6.2 and 7.2: a ratio of about 3:1 for the
 * detection limit and 10:1 for the quantitation limit; from memory). The ratio itself is the
 * pharmacopoeial S/N = 2H/h ({@link Peak#signalToNoise()}).
 */
public enum SignalToNoiseClass {
    /** S/N of at least {@link Tolerances#QUANTITATION_LIMIT_SIGNAL_TO_NOISE}: the peak can be quantified. */
    QUANTIFIABLE("quantifiable"),
    /** Detected (S/N of at least {@link Tolerances#DETECTION_LIMIT_SIGNAL_TO_NOISE}) but below the
     *  quantitation limit: its height and area are too noisy to quantify. */
    BELOW_QUANTITATION_LIMIT("below quantitation limit"),
    /** At the detection limit: S/N from {@link Tolerances#LOWEST_DETECTION_LIMIT_SIGNAL_TO_NOISE} (2:1)
     *  up to {@link Tolerances#DETECTION_LIMIT_SIGNAL_TO_NOISE} (3:1), the range ICH Q2(R1) § 6.2
     *  accepts for the detection limit: seen, but barely. */
    AT_DETECTION_LIMIT("at detection limit"),
    /** Below the detection limit (S/N under 2): a zone the matched filter found significant
     *  ({@code FaintZoneSearch}), or a segment reported because a lower {@code --min-sn} asks for it. */
    BELOW_DETECTION_LIMIT("below detection limit");

    private final String label;

    SignalToNoiseClass(String label) {
        this.label = label;
    }

    /** The text of the peak table's {@code sn_class} column. */
    public String label() {
        return label;
    }

    /** The class of a signal-to-noise ratio; NaN counts as below the detection limit. */
    public static SignalToNoiseClass of(double signalToNoise) {
        if (signalToNoise >= Tolerances.QUANTITATION_LIMIT_SIGNAL_TO_NOISE) {
            return QUANTIFIABLE;
        }
        if (signalToNoise >= Tolerances.DETECTION_LIMIT_SIGNAL_TO_NOISE) {
            return BELOW_QUANTITATION_LIMIT;
        }
        if (signalToNoise >= Tolerances.LOWEST_DETECTION_LIMIT_SIGNAL_TO_NOISE) {
            return AT_DETECTION_LIMIT;
        }
        return BELOW_DETECTION_LIMIT;
    }
}
