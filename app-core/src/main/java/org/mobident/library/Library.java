package org.mobident.library;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * A mobility library: analytes with unique names, plus free-text notes (the file's comment
 * lines: conditions, provenance).
 *
 * @param entries    the analytes, in file order
 * @param sourceFile where the library was read from (for messages), or a label
 * @param notes      comment lines without the leading '#'
 */
public record Library(List<LibraryEntry> entries, String sourceFile, List<String> notes) {
    public Library {
        entries = List.copyOf(entries);
        notes = List.copyOf(notes);
        Set<String> seen = new HashSet<>();
        for (LibraryEntry e : entries) {
            if (!seen.add(e.name())) {
                throw new IllegalArgumentException("duplicate analyte name: " + e.name());
            }
        }
    }

    public Optional<LibraryEntry> find(String name) {
        return entries.stream().filter(e -> e.name().equals(name)).findFirst();
    }

    public int size() {
        return entries.size();
    }
}
