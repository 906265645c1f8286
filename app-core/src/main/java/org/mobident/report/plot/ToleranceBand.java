package org.mobident.report.plot;

import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.matching.MatchWindow;
import org.mobident.settings.MatchSettings;

/**
 * The half-width, in mobility units (1e-9 m²/(V s)), of the band drawn around a library
 * entry's mobility. The plots only draw it; {@link #matching} gives exactly the window matching
 * applies ({@link MatchWindow}) to a peak measured without uncertainty.
 */
@FunctionalInterface
public interface ToleranceBand {

    /** Half-width of the band around {@code entry}; not finite or &le; 0 means "draw no band". */
    double halfWidth(LibraryEntry entry);

    /**
     * The window matching applies to each entry of {@code library} under {@code settings}, for a
     * peak measured without uncertainty ({@link MatchWindow}, with the spreads of the whole library);
     * NaN (no band) for an entry of another library.
     */
    static ToleranceBand matching(Library library, MatchSettings settings) {
        double[] w = MatchWindow.halfWidths(library, settings);
        java.util.Map<LibraryEntry, Integer> index = new java.util.HashMap<>();
        for (int j = 0; j < library.size(); j++) {
            index.put(library.entries().get(j), j);
        }
        return entry -> {
            Integer j = index.get(entry);
            return j == null ? Double.NaN : w[j];
        };
    }

}
