package org.mobident.report.plot;

import org.mobident.library.LibraryEntry;

/**
 * The half-width, in mobility units (1e-9 m²/(V s)), of the band drawn around a library
 * entry's mobility. The plots only draw it; the rule that matching really uses belongs to the
 * matching settings, and a caller that has them should pass that rule here instead of
 * {@link #defaultRule()}.
 */
@FunctionalInterface
public interface ToleranceBand {

    /** Multiple of the entry's between-run standard deviation in the default rule (common practice: 3 σ). */
    double SD_MULTIPLE = 3.0;

    /** Smallest half-width of the default rule, 1e-9 m²/(V s) (common practice). */
    double FLOOR = 0.5;

    /** Half-width of the band around {@code entry}; not finite or &le; 0 means "draw no band". */
    double halfWidth(LibraryEntry entry);

    /**
     * The entry's own tolerance when it states one; otherwise 3 × its mobility standard
     * deviation, but at least {@link #FLOOR} (also when the deviation is unknown).
     */
    static ToleranceBand defaultRule() {
        return entry -> {
            if (Double.isFinite(entry.tolerance()) && entry.tolerance() > 0) {
                return entry.tolerance();
            }
            double sd = entry.mobilitySd();
            return Double.isFinite(sd) ? Math.max(SD_MULTIPLE * sd, FLOOR) : FLOOR;
        };
    }
}
