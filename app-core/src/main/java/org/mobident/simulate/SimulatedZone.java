package org.mobident.simulate;

import java.util.Objects;

/**
 * One analyte zone to put into a simulated trace.
 *
 * @param label    name of the zone (for the caller's bookkeeping; not written to the trace)
 * @param mobility effective mobility, 1e-9 m²/(V s), signed (cations +, anions −)
 * @param height   apex height of the undispersed (Gaussian) zone in signal units, a magnitude:
 *                 the sign comes from the detection mode
 * @param plates   plate number N of the zone; the Gaussian time width is σ_t = t/√N
 */
public record SimulatedZone(String label, double mobility, double height, double plates) {
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
    }
}
