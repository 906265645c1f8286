package org.mobident.library;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * A mobility library: analytes, plus free-text notes (the file's comment lines: conditions,
 * provenance). An analyte name is unique within one buffer: the same analyte may appear once per
 * buffer label (its mobility differs between buffers), and an entry without a label applies to
 * every buffer.
 *
 * @param entries    the analytes, in file order
 * @param sourceFile where the library was read from (for messages), or a label
 * @param notes      comment lines without the leading '#'
 * @param entryLines the 1-based file line of each entry (same order), or empty when the library
 *                   was not read from a file
 */
public record Library(List<LibraryEntry> entries, String sourceFile, List<String> notes, List<Long> entryLines) {
    public Library {
        entries = List.copyOf(entries);
        notes = List.copyOf(notes);
        entryLines = List.copyOf(entryLines);
        if (!entryLines.isEmpty() && entryLines.size() != entries.size()) {
            throw new IllegalArgumentException("entryLines must give one line per entry or be empty");
        }
        Set<String> seen = new HashSet<>();
        for (LibraryEntry e : entries) {
            if (!seen.add(key(e))) {
                throw new IllegalArgumentException("duplicate analyte name: " + e.name()
                        + (e.buffer() == null ? "" : " (buffer " + e.buffer() + ")"));
            }
        }
    }

    /** A library not read from a file (no line numbers). */
    public Library(List<LibraryEntry> entries, String sourceFile, List<String> notes) {
        this(entries, sourceFile, notes, List.of());
    }

    /** The uniqueness key of an entry: its name within its buffer (case and spaces of the label ignored). */
    public static String key(LibraryEntry e) {
        return e.name() + "\u0000" + (e.buffer() == null ? "" : e.buffer().trim().toLowerCase(Locale.ROOT));
    }

    /** The first entry of that name (in file order). */
    public Optional<LibraryEntry> find(String name) {
        return entries.stream().filter(e -> e.name().equals(name)).findFirst();
    }

    public int size() {
        return entries.size();
    }

    /** The file line of entry {@code index}, or 0 when unknown. */
    public long lineOf(int index) {
        return entryLines.isEmpty() ? 0 : entryLines.get(index);
    }

    /** The distinct buffer labels the entries name, in file order. */
    public List<String> bufferLabels() {
        Set<String> seen = new LinkedHashSet<>();
        Set<String> lower = new HashSet<>();
        for (LibraryEntry e : entries) {
            if (e.buffer() != null && lower.add(e.buffer().trim().toLowerCase(Locale.ROOT))) {
                seen.add(e.buffer().trim());
            }
        }
        return List.copyOf(seen);
    }

    /**
     * The entries that apply to runs in {@code runBuffer} (those of that buffer and those without
     * a label, unless the buffer has its own entry of that name), as a library with the same notes
     * and lines; the whole library when {@code runBuffer} is null.
     */
    public Library forBuffer(String runBuffer) {
        if (runBuffer == null) {
            return this;
        }
        Set<String> labelled = new HashSet<>();
        for (LibraryEntry e : entries) {
            if (e.buffer() != null && LibraryEntry.sameBuffer(e.buffer(), runBuffer)) {
                labelled.add(e.name());
            }
        }
        List<LibraryEntry> kept = new ArrayList<>();
        List<Long> lines = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            LibraryEntry e = entries.get(i);
            // an entry measured in the run's own buffer replaces an unlabelled one of the same name
            boolean replaced = e.buffer() == null && labelled.contains(e.name());
            if (e.appliesToBuffer(runBuffer) && !replaced) {
                kept.add(e);
                if (!entryLines.isEmpty()) {
                    lines.add(entryLines.get(i));
                }
            }
        }
        return kept.size() == entries.size() ? this : new Library(kept, sourceFile, notes, lines);
    }
}
