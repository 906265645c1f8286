package org.mobident.simulate;

/**
 * An electrical spike: a jump of the detector signal on one or two consecutive sampling points,
 * not a zone (it has no migration and no width in time beyond the sampling interval).
 *
 * @param timeS         time of its first point, s; the simulator puts it on the sampling point
 *                      nearest to this time
 * @param amplitude     signed jump in signal units, added to every point of the spike
 * @param widthSamples  number of points it covers, {@value #MIN_WIDTH_SAMPLES} or {@value #MAX_WIDTH_SAMPLES}
 */
public record Spike(double timeS, double amplitude, int widthSamples) {

    /** Narrowest spike, points. */
    public static final int MIN_WIDTH_SAMPLES = 1;
    /** Widest spike, points. */
    public static final int MAX_WIDTH_SAMPLES = 2;

    public Spike {
        if (!(timeS >= 0) || !Double.isFinite(timeS)) {
            throw new IllegalArgumentException("spike time must be a finite number of s >= 0, got " + timeS);
        }
        if (!Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("spike amplitude must be finite, got " + amplitude);
        }
        if (widthSamples < MIN_WIDTH_SAMPLES || widthSamples > MAX_WIDTH_SAMPLES) {
            throw new IllegalArgumentException("a spike covers " + MIN_WIDTH_SAMPLES + " or " + MAX_WIDTH_SAMPLES
                    + " points, got " + widthSamples);
        }
    }
}
