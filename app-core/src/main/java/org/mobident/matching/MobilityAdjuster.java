package org.mobident.matching;

import org.mobident.library.LibraryEntry;

/**
 * Converts a measured peak mobility to the conditions a library entry applies to (for example
 * from the run temperature to the entry's temperature), so that the two can be compared.
 * Implementations must be pure functions; they are called once per (peak, entry) pair.
 */
@FunctionalInterface
public interface MobilityAdjuster {

    /** Leaves mobilities unchanged: the run and the library share their conditions. */
    MobilityAdjuster IDENTITY = (mobility, entry) -> mobility;

    /**
     * @param mobility peak effective mobility at the run conditions, 1e-9 m²/(V s), signed
     * @param entry    the library entry it is about to be compared with (not modified)
     * @return the mobility at the entry's conditions, same unit; NaN when it cannot be converted
     *         (the entry is then not a candidate)
     */
    double adjust(double mobility, LibraryEntry entry);
}
