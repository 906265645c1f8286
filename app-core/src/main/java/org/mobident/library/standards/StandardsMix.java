package org.mobident.library.standards;

import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * A standard mixture: a name and the analytes it holds.
 *
 * @param name     the mix name, as the run sheet's {@code sample} column names it
 * @param analytes its analytes in sheet order; names unique (case-insensitive), orders unique
 */
public record StandardsMix(String name, List<StandardAnalyte> analytes) {
    public StandardsMix {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a mix needs a name");
        }
        analytes = List.copyOf(analytes);
        if (analytes.isEmpty()) {
            throw new IllegalArgumentException("mix " + name + " has no analytes");
        }
        Set<String> names = new HashSet<>();
        Set<Integer> orders = new HashSet<>();
        for (StandardAnalyte a : analytes) {
            if (!names.add(a.name().toLowerCase(Locale.ROOT))) {
                throw new IllegalArgumentException("analyte " + a.name() + " appears twice in mix " + name);
            }
            if (a.hasOrder() && !orders.add(a.order())) {
                throw new IllegalArgumentException("order " + a.order() + " appears twice in mix " + name);
            }
        }
    }
}
