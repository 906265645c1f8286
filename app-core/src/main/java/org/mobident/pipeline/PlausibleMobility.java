package org.mobident.pipeline;

import java.util.Locale;
import org.mobident.mobility.MobilityScale;

/**
 * Physical bounds of effective mobilities in water, used to catch a wrong time unit, voltage sign
 * or capillary length before results are trusted. The fastest ordinary ions in water have limiting
 * mobilities below about 80 units (1e-9 m²/(V s)) apart from H₃O⁺ (36.2 × 10⁻⁸ m²/(V s), i.e. 362
 * units) and OH⁻ (205 units), which never appear as peaks (CRC Handbook of Chemistry and Physics,
 * "Ionic conductivity and diffusion at infinite dilution", via μ = λ/(|z|F)); electro-osmotic
 * mobilities in fused silica stay below about 100 units (`common practice`). Beyond
 * {@value #LIMIT} units a value is taken as a sign of wrong input.
 */
final class PlausibleMobility {

    /** Largest plausible |mobility| of an analyte or of the EOF, 1e-9 m²/(V s). */
    static final double LIMIT = 150.0;

    private PlausibleMobility() {
    }

    /** True when |μ| is within {@link #LIMIT} (NaN counts as plausible: nothing to judge). */
    static boolean plausible(double mobility) {
        return Double.isNaN(mobility) || Math.abs(mobility) <= LIMIT;
    }

    /** True when the scale's EOF mobility (if it determines one) is plausible. */
    static boolean plausibleEof(MobilityScale scale) {
        return plausible(scale.eofMobility());
    }

    /** The message for a scale whose EOF mobility is beyond the bounds, with the likely causes. */
    static String eofProblem(MobilityScale scale) {
        return String.format(Locale.ROOT, "the EOF mobility comes out at %.1f units (1e-9 m²/(V s)), beyond the "
                + "physical bound of ±%.0f: check the time unit of the trace (minutes read as seconds?), the "
                + "voltage and the capillary lengths", scale.eofMobility(), LIMIT);
    }
}
