package org.mobident.simulate;

/**
 * One slow sinusoidal component of a wandering baseline: amplitude · sin(2π·t/period + phase).
 *
 * @param amplitude signal units, ≥ 0
 * @param periodS   period in s, &gt; 0
 * @param phaseRad  phase at t = 0, radians
 */
public record BaselineWave(double amplitude, double periodS, double phaseRad) {
    public BaselineWave {
        if (!(amplitude >= 0) || !Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("wave amplitude must be finite and >= 0, got " + amplitude);
        }
        if (!(periodS > 0) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("wave period must be a positive number of s, got " + periodS);
        }
        if (!Double.isFinite(phaseRad)) {
            throw new IllegalArgumentException("wave phase must be finite, got " + phaseRad);
        }
    }

    /** The wave's value at {@code timeS}. */
    public double valueAt(double timeS) {
        return amplitude * Math.sin(2 * Math.PI * timeS / periodS + phaseRad);
    }
}
