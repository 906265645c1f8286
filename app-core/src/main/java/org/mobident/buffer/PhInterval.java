package org.mobident.buffer;

/**
 * A closed pH interval.
 *
 * @param fromPh lower end
 * @param toPh   upper end, ≥ fromPh
 */
public record PhInterval(double fromPh, double toPh) {
    public PhInterval {
        if (!(toPh >= fromPh)) {
            throw new IllegalArgumentException("pH interval end " + toPh + " below its start " + fromPh);
        }
    }

    /** Width in pH units. */
    public double width() {
        return toPh - fromPh;
    }

    /** Whether the pH lies inside (ends included). */
    public boolean contains(double pH) {
        return pH >= fromPh && pH <= toPh;
    }
}
