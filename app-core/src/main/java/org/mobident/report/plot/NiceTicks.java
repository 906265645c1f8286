package org.mobident.report.plot;

import java.util.Locale;

/**
 * Axis ticks at "nice" values (1, 2 or 5 times a power of ten), by the loose-labelling method
 * of P. S. Heckbert, "Nice numbers for graph labels", in A. S. Glassner (ed.), Graphics Gems,
 * Academic Press 1990, pp. 61–63: the data range is first rounded up to a nice span, the tick
 * step is the nice number nearest to span / (ticks − 1), and the axis is widened outwards to
 * whole multiples of the step, so the first and last ticks are the axis ends.
 *
 * @param first         first tick (the lower end of the widened axis)
 * @param last          last tick (the upper end of the widened axis)
 * @param step          distance between ticks, &gt; 0
 * @param fractionDigits digits after the decimal point that show every tick exactly
 */
public record NiceTicks(double first, double last, double step, int fractionDigits) {

    /** Smallest number of ticks asked for; fewer cannot show a scale. */
    public static final int MIN_TICKS = 2;

    /** Width given to an empty range (min == max) around its single value, relative to |value|. */
    private static final double DEGENERATE_RELATIVE_HALF_WIDTH = 0.1;

    /** Half-width given to an empty range at zero. */
    private static final double DEGENERATE_ZERO_HALF_WIDTH = 1.0;

    public NiceTicks {
        if (!(step > 0) || !Double.isFinite(first) || !Double.isFinite(last) || !(last >= first)) {
            throw new IllegalArgumentException("bad ticks: " + first + ".." + last + " by " + step);
        }
    }

    /**
     * Ticks covering [{@code min}, {@code max}] with about {@code targetTicks} ticks (Heckbert's
     * "loose_label"). An empty range is widened around its value first.
     *
     * @throws IllegalArgumentException when a bound is not finite, min &gt; max or targetTicks &lt; 2
     */
    public static NiceTicks of(double min, double max, int targetTicks) {
        if (!Double.isFinite(min) || !Double.isFinite(max) || min > max) {
            throw new IllegalArgumentException("need finite min <= max, got " + min + ", " + max);
        }
        if (targetTicks < MIN_TICKS) {
            throw new IllegalArgumentException("need at least " + MIN_TICKS + " ticks, got " + targetTicks);
        }
        if (min == max) {
            double half = min == 0 ? DEGENERATE_ZERO_HALF_WIDTH : Math.abs(min) * DEGENERATE_RELATIVE_HALF_WIDTH;
            min -= half;
            max += half;
        }
        double span = niceNumber(max - min, false);
        double step = niceNumber(span / (targetTicks - 1), true);
        double first = Math.floor(min / step) * step;
        double last = Math.ceil(max / step) * step;
        int digits = Math.max(0, -(int) Math.floor(Math.log10(step)));
        return new NiceTicks(clean(first, digits), clean(last, digits), step, digits);
    }

    /**
     * Ticks at nice values lying inside [{@code min}, {@code max}], for an axis whose ends are the
     * data's own (a tight axis): the step is chosen as in {@link #of}, then the ticks are the
     * multiples of the step within the range (Heckbert's "tight" labelling) instead of widening
     * the range to them. When fewer than {@link #MIN_TIGHT_TICKS} multiples fall inside, the next finer
     * nice step is taken, so the axis always carries a scale.
     *
     * @throws IllegalArgumentException as {@link #of}
     */
    public static NiceTicks within(double min, double max, int targetTicks) {
        NiceTicks loose = of(min, max, targetTicks);
        if (min == max) {
            return loose;
        }
        double step = loose.step();
        for (int finer = 0; finer < MAX_REFINEMENTS; finer++) {
            double first = Math.ceil(min / step - STEP_ROUNDING) * step;
            double last = Math.floor(max / step + STEP_ROUNDING) * step;
            if (Math.round((last - first) / step) + 1 >= MIN_TIGHT_TICKS) {
                int digits = Math.max(0, -(int) Math.floor(Math.log10(step)));
                return new NiceTicks(clean(first, digits), clean(last, digits), step, digits);
            }
            step = niceNumber(step * FINER_STEP, true);
        }
        return loose;
    }

    /** Fewest ticks inside a tight range: two ticks show a scale, three make it readable. */
    public static final int MIN_TIGHT_TICKS = 3;

    /** Steps tried below the first when too few ticks fall inside a tight range. */
    private static final int MAX_REFINEMENTS = 4;

    /** A finer step is the nice number nearest to this fraction of the last one (10 → 5 → 2 → 1). */
    private static final double FINER_STEP = 0.45;

    /** Relative slack when deciding whether a tick at the very end of a tight range is inside it. */
    private static final double STEP_ROUNDING = 1e-9;

    /**
     * Heckbert's "nicenum": a number of the form {1, 2, 5, 10}·10ⁿ near {@code x} (&gt; 0). With
     * {@code round} the nearest such number (thresholds 1.5, 3, 7); without, the smallest one
     * not below {@code x}.
     */
    public static double niceNumber(double x, boolean round) {
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException("nice number of a non-positive value: " + x);
        }
        double exponent = Math.floor(Math.log10(x));
        double power = Math.pow(10, exponent);
        double fraction = x / power;
        double nice;
        if (round) {
            nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
        } else {
            nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        }
        return nice * power;
    }

    /** Number of ticks, first and last included. */
    public int count() {
        return (int) Math.round((last - first) / step) + 1;
    }

    /** The tick values, each computed from {@code first} (no accumulated rounding). */
    public double[] values() {
        int n = count();
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = clean(first + i * step, fractionDigits);
        }
        return v;
    }

    /** A tick value as text with {@link #fractionDigits} decimals, never "-0". */
    public String format(double value) {
        String s = String.format(Locale.ROOT, "%." + fractionDigits + "f", value);
        return isNegativeZeroText(s) ? s.substring(1) : s;
    }

    private static boolean isNegativeZeroText(String s) {
        if (!s.startsWith("-")) {
            return false;
        }
        for (int i = 1; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '0' && c != '.') {
                return false;
            }
        }
        return true;
    }

    /** Rounds away the binary noise of a tick value (0.30000000000000004 → 0.3) and turns −0 into 0. */
    private static double clean(double value, int digits) {
        double scale = Math.pow(10, digits);
        double r = Math.round(value * scale) / scale;
        return r == 0 ? 0.0 : r;
    }
}
