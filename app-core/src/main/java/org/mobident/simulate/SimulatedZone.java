package org.mobident.simulate;

import java.util.Objects;

/**
 * One analyte zone to put into a simulated trace.
 *
 * @param label              name of the zone (for the caller's bookkeeping; not written to the trace)
 * @param mobility           effective mobility, 1e-9 m²/(V s), signed (cations +, anions −)
 * @param height             apex height of the undispersed (Gaussian) zone in signal units, a magnitude:
 *                           the sign comes from the detection mode
 * @param plates             plate number N of the zone; the Gaussian time width is σ_t = t/√N
 * @param dispersionStrength this zone's own electromigration-dispersion strength (dimensionless, ≥ 0,
 *                           see {@link ElectromigrationDispersion}), used with the co-ion of the
 *                           dispersion given to the simulator; NaN = the simulator's common strength.
 *                           Without a dispersion given to the simulator every zone stays Gaussian.
 */
public record SimulatedZone(String label, double mobility, double height, double plates, double dispersionStrength) {
    public SimulatedZone {
        Objects.requireNonNull(label, "label");
        if (!Double.isFinite(mobility)) {
            throw new IllegalArgumentException("zone " + label + ": mobility must be finite, got " + mobility);
        }
        if (!(height >= 0) || !Double.isFinite(height)) {
            throw new IllegalArgumentException("zone " + label + ": height must be a finite magnitude >= 0, got "
                    + height);
        }
        if (!(plates > 0) || !Double.isFinite(plates)) {
            throw new IllegalArgumentException("zone " + label + ": plates must be positive, got " + plates);
        }
        if (!Double.isNaN(dispersionStrength) && !(dispersionStrength >= 0 && Double.isFinite(dispersionStrength))) {
            throw new IllegalArgumentException("zone " + label + ": dispersion strength must be >= 0 or NaN, got "
                    + dispersionStrength);
        }
    }

    /** A zone that takes the simulator's common dispersion strength. */
    public SimulatedZone(String label, double mobility, double height, double plates) {
        this(label, mobility, height, plates, Double.NaN);
    }

    /** True when this zone carries its own dispersion strength. */
    public boolean hasOwnDispersion() {
        return !Double.isNaN(dispersionStrength);
    }
}
