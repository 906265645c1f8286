package org.mobident.signal;

import org.mobident.Tolerances;

/**
 * Settings of peak detection.
 *
 * @param minSignalToNoise  peaks with a lower S/N (Ph. Eur. 2.2.46, see {@link PeakDetector}) are not
 *                          reported; by default the ICH Q2 detection limit, 3. Whatever its value, a
 *                          peak must also stand significantly above the smoothed noise around it
 * @param smoothingWindowS  width of the smoothing window in s; NaN chooses it from the data
 * @param minWidthS         narrower features (spikes) are not peaks, s; NaN chooses from the data
 */
public record PeakSettings(double minSignalToNoise, double smoothingWindowS, double minWidthS) {

    public static final PeakSettings DEFAULT =
            new PeakSettings(Tolerances.DEFAULT_MIN_SIGNAL_TO_NOISE, Double.NaN, Double.NaN);

    public PeakSettings {
        if (!(minSignalToNoise > 0)) {
            throw new IllegalArgumentException("minimum S/N must be positive, got " + minSignalToNoise);
        }
    }

    public PeakSettings withMinSignalToNoise(double sn) {
        return new PeakSettings(sn, smoothingWindowS, minWidthS);
    }
}
