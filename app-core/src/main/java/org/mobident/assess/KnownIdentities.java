package org.mobident.assess;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A known-identities table: what is really in some runs.
 *
 * @param source the file it was read from (for messages and reports)
 * @param rows   its rows in file order
 */
public record KnownIdentities(String source, List<KnownIdentity> rows) {

    public KnownIdentities {
        rows = List.copyOf(rows);
    }

    /** The rows grouped by run, runs in order of first appearance. */
    public Map<String, List<KnownIdentity>> byRun() {
        Map<String, List<KnownIdentity>> out = new LinkedHashMap<>();
        for (KnownIdentity r : rows) {
            out.computeIfAbsent(r.run(), k -> new ArrayList<>()).add(r);
        }
        out.replaceAll((k, v) -> List.copyOf(v));
        return out;
    }
}
