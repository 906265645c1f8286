package org.mobident.viewer;

/**
 * A closed interval of the x axis, in the units of the axis it belongs to (s or mobility units).
 *
 * @param lo lower end
 * @param hi upper end, &gt; lo
 */
public record XRange(double lo, double hi) {

    public XRange {
        if (!(Double.isFinite(lo) && Double.isFinite(hi) && hi > lo)) {
            throw new IllegalArgumentException("bad x range " + lo + ".." + hi);
        }
    }

    public double span() {
        return hi - lo;
    }

    public double centre() {
        return (lo + hi) / 2;
    }

    public boolean contains(double x) {
        return x >= lo && x <= hi;
    }

    /** This range moved by {@code dx} (same span). */
    public XRange shifted(double dx) {
        return new XRange(lo + dx, hi + dx);
    }

    /**
     * This range moved, without changing its span, so that it lies inside {@code limits}; a range
     * wider than the limits becomes the limits.
     */
    public XRange keptInside(XRange limits) {
        if (span() >= limits.span()) {
            return limits;
        }
        if (lo < limits.lo) {
            return shifted(limits.lo - lo);
        }
        if (hi > limits.hi) {
            return shifted(limits.hi - hi);
        }
        return this;
    }

    /** The smallest range holding both. */
    public XRange union(XRange other) {
        return new XRange(Math.min(lo, other.lo), Math.max(hi, other.hi));
    }
}
