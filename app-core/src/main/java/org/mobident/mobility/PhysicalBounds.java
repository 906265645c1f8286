package org.mobident.mobility;

/**
 * Physical bounds of mobilities in water, used to catch a wrong time unit, voltage sign, capillary
 * length or library unit before results are trusted. One place for the bounds every check uses.
 */
public final class PhysicalBounds {

    /**
     * Largest plausible |effective mobility| of an analyte, 1e-9 m²/(V·s). The fastest common ions
     * apart from H⁺ (limiting mobility ≈ 362) and OH⁻ (≈ 205) reach about 115 (¼[Fe(CN)₆]⁴⁻,
     * λ ≈ 110 S cm²/mol per charge); sulfate is 83 (limiting molar conductivities: CRC Handbook of
     * Chemistry and Physics, table "Ionic conductivity and diffusion at infinite dilution", from
     * memory, via μ = λ/(|z|F)). Effective mobilities are smaller still, so anything beyond this
     * bound is almost surely a unit, sign or typing error.
     */
    public static final double MAX_ION_MOBILITY = 130.0;

    /**
     * Largest plausible |electro-osmotic mobility|, 1e-9 m²/(V·s): bare fused silica at high pH and
     * low ionic strength stays below about 100 (`common practice`); beyond this bound the time unit,
     * voltage or lengths are wrong.
     */
    public static final double MAX_EOF_MOBILITY = 150.0;

    /**
     * Smallest |mobility| a charged analyte's library value can have in this unit: values below it are
     * a library written in m²/(V·s) or cm²/(V·s) rather than 1e-9 m²/(V·s) (a modelling choice: an ion
     * with a known charge is never 1000 times slower than the slowest common ions, about 20).
     */
    public static final double MIN_CHARGED_MOBILITY = 0.01;

    private PhysicalBounds() {
    }

    /** True when |μ| is within {@link #MAX_ION_MOBILITY} (NaN counts as plausible: nothing to judge). */
    public static boolean plausibleIon(double mobility) {
        return Double.isNaN(mobility) || Math.abs(mobility) <= MAX_ION_MOBILITY;
    }

    /** True when |μ_eof| is within {@link #MAX_EOF_MOBILITY} (NaN counts as plausible: not determined). */
    public static boolean plausibleEof(double mobility) {
        return Double.isNaN(mobility) || Math.abs(mobility) <= MAX_EOF_MOBILITY;
    }

    /**
     * A hint at the unit a library value was written in, or null: "multiply by 1e9" for a value in
     * m²/(V·s), "multiply by 1e5" for one in cm²/(V·s), "divide by ..." for values too large.
     */
    public static String unitHint(double mobility) {
        double m = Math.abs(mobility);
        if (m == 0 || !Double.isFinite(m) || (m >= MIN_CHARGED_MOBILITY && m <= MAX_ION_MOBILITY)) {
            return null;
        }
        if (plausibleAfter(m, 1e9)) {
            return "it looks like a value in m^2/(V s): multiply by 1e9";
        }
        if (plausibleAfter(m, 1e5)) {
            return "it looks like a value in cm^2/(V s): multiply by 1e5";
        }
        if (plausibleAfter(m, 1e-1)) {
            return "it looks like a value in 1e-10 m^2/(V s): divide by 10";
        }
        return "mobilities are in 1e-9 m^2/(V s), signed";
    }

    private static boolean plausibleAfter(double m, double factor) {
        double v = m * factor;
        return v >= 1.0 && v <= MAX_ION_MOBILITY;
    }
}
