package org.mobident.viewer;

import org.mobident.library.LibraryEntry;
import org.mobident.matching.MatchSettings;
import org.mobident.report.plot.ToleranceBand;

/**
 * The library windows drawn on the mobility axis, from the same settings the matching used.
 * An entry's own tolerance wins; otherwise the settings' rule applies with the entry's spread
 * alone (the peak's own uncertainty, which the matching adds in quadrature, is not known before a
 * peak is chosen, so the drawn window is slightly narrower than the one a given peak meets).
 */
final class MatchBands {

    private MatchBands() {
    }

    /** The half-width rule for {@code settings}. */
    static ToleranceBand rule(MatchSettings settings) {
        return entry -> halfWidth(entry, settings);
    }

    static double halfWidth(LibraryEntry entry, MatchSettings s) {
        if (Double.isFinite(entry.tolerance()) && entry.tolerance() > 0) {
            return entry.tolerance();
        }
        switch (s.windowRule()) {
            case ABSOLUTE:
                return s.windowValue();
            case RELATIVE:
                return Math.max(s.windowValue() * Math.abs(entry.mobility()), s.minimumWindow());
            default: {
                double sd = Double.isFinite(entry.mobilitySd()) && entry.mobilitySd() > 0
                        ? entry.mobilitySd() : s.assumedEntrySd();
                double combined = Math.hypot(sd, s.sdFloor());
                return Math.max(s.windowValue() * combined, s.minimumWindow());
            }
        }
    }
}
