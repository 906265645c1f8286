package org.mobident.library;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The columns of a library CSV file, in the order they are written. Header names are matched
 * without regard to case or surrounding spaces.
 */
enum LibraryColumn {
    NAME("name"),
    MOBILITY("mobility"),
    MOBILITY_SD("mobility_sd"),
    N("n"),
    CHARGE("charge"),
    TOLERANCE("tolerance"),
    PKA("pka"),
    LIMITING_MOBILITY("limiting_mobility"),
    BUFFER("buffer"),
    PH("ph"),
    IONIC_STRENGTH_MM("ionic_strength_mm"),
    TEMPERATURE_C("temperature_c"),
    SOURCE("source"),
    INTERNAL_STANDARD("internal_standard"),
    SESSION_SD("session_sd");

    private final String header;

    LibraryColumn(String header) {
        this.header = header;
    }

    /** The header text as written. */
    String header() {
        return header;
    }

    /** The column a header cell names, if any (case-insensitive, trimmed). */
    static Optional<LibraryColumn> fromHeader(String cell) {
        String key = cell.trim().toLowerCase(Locale.ROOT);
        for (LibraryColumn c : values()) {
            if (c.header.equals(key)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    /** All header names, comma-separated, for error messages. */
    static String knownHeaders() {
        return Arrays.stream(values()).map(LibraryColumn::header).collect(Collectors.joining(", "));
    }
}
