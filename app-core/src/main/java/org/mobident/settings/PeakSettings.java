package org.mobident.settings;

import org.mobident.Tolerances;

/**
 * Settings of peak detection.
 *
 * @param minSignalToNoise  peaks with a lower S/N (Ph. Eur. 2.2.46, see {@link org.mobident.signal.PeakDetector}) are not
 *                          reported; by default 0 (none). Whatever its value, a peak must stand
 *                          significantly above the noise around it
 * @param smoothingWindowS  width of the smoothing window in s; NaN chooses it from the data
 * @param minWidthS         narrower features (spikes) are not peaks, s; NaN chooses from the data
 * @param zoneWidthS        typical width at half height of the zones, s, which sets the smoothing,
 *                          the baseline's reach and the noise windows; NaN measures it on the trace
 */
public record PeakSettings(double minSignalToNoise, double smoothingWindowS, double minWidthS, double zoneWidthS) {

    public static final PeakSettings DEFAULT =
            new PeakSettings(Tolerances.DEFAULT_MIN_SIGNAL_TO_NOISE, Double.NaN, Double.NaN);

    /** Settings whose typical zone width is measured on the trace. */
    public PeakSettings(double minSignalToNoise, double smoothingWindowS, double minWidthS) {
        this(minSignalToNoise, smoothingWindowS, minWidthS, Double.NaN);
    }

    public PeakSettings {
        if (!(minSignalToNoise >= 0) || !Double.isFinite(minSignalToNoise)) {
            throw new IllegalArgumentException("minimum S/N must be zero or more, got " + minSignalToNoise);
        }
    }

    /**
     * These settings for a stretch of a run whose zones are known to be about {@code widthHalfS}
     * wide: smoothed, clipped and judged as the whole run would be, not by the stretch's own width
     * estimate, which comes from its noise when it holds no clear zone. Unchanged when the width is
     * unknown.
     */
    public PeakSettings forZonesOfWidth(double widthHalfS) {
        if (!(widthHalfS > 0) || !Double.isFinite(widthHalfS)) {
            return this;
        }
        return new PeakSettings(minSignalToNoise, smoothingWindowS, minWidthS, widthHalfS);
    }

    /**
     * The least S/N of a peak found as a segment of the smoothed signal: {@link #minSignalToNoise()}
     * when one is set, otherwise (0, the default) the lower end of the ICH Q2 detection limit, 2.
     * Fainter zones are then found by the matched filter alone ({@code FaintZoneSearch}), which
     * looks for zones as wide as the run's: below S/N 2 the segments of the smoothed signal are
     * mostly the narrow tops of noise and of what the spike filter left.
     */
    public double segmentMinSignalToNoise() {
        return minSignalToNoise > 0 ? minSignalToNoise : Tolerances.LOWEST_DETECTION_LIMIT_SIGNAL_TO_NOISE;
    }

    public PeakSettings withMinSignalToNoise(double sn) {
        return new PeakSettings(sn, smoothingWindowS, minWidthS, zoneWidthS);
    }
}
