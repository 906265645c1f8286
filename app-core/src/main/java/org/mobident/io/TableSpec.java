package org.mobident.io;

import java.util.List;
import java.util.Locale;

/**
 * What a {@link TableReader} expects of one kind of table: its name for messages, its
 * delimiter, its known and required columns, how header names are compared, and what to do with
 * unknown columns and with values under no column. Immutable; the {@code with…} methods return
 * a changed copy.
 *
 * @param what               what the table is, for messages ("library file", "run sheet")
 * @param sniffDelimiter     take the delimiter from the header line (comma, semicolon or tab);
 *                           otherwise always a comma
 * @param known              the known column names in documentation order (normalised form)
 * @param required           the columns that must be present
 * @param unknownIsError     an unknown column is an error (otherwise it is ignored)
 * @param extraCellIsError   a value in a column without a name, or beyond the header, is an error
 * @param spacesAsUnderscore header names compare with spaces, hyphens, slashes and brackets read as
 *                           {@code _} (one for a run of them, none at either end) and a degree sign
 *                           dropped, so that {@code Total length (cm)} and {@code Temperature [°C]}
 *                           name {@code total_length_cm} and {@code temperature_c}
 * @param missingHint        appended to the message of a missing required column ("" for none)
 * @param listPresentColumns a missing required column's message lists the columns present
 * @param comments           lines starting with {@code #} are comments (otherwise they are rows)
 */
public record TableSpec(String what, boolean sniffDelimiter, List<String> known, List<String> required,
                        boolean unknownIsError, boolean extraCellIsError, boolean spacesAsUnderscore,
                        String missingHint, boolean listPresentColumns, boolean comments) {

    public TableSpec {
        known = List.copyOf(known);
        required = List.copyOf(required);
        missingHint = missingHint == null ? "" : missingHint;
    }

    /**
     * A comma-delimited table with these known and required columns: unknown columns and values
     * under no column are errors.
     */
    public static TableSpec of(String what, List<String> known, List<String> required) {
        return new TableSpec(what, false, known, required, true, true, false, "", false, true);
    }

    /** The same, with the delimiter taken from the header line (comma, semicolon or tab). */
    public TableSpec withSniffedDelimiter() {
        return new TableSpec(what, true, known, required, unknownIsError, extraCellIsError, spacesAsUnderscore,
                missingHint, listPresentColumns, comments);
    }

    /** The same, with unknown columns and values under no column ignored. */
    public TableSpec ignoringUnknownColumns() {
        return new TableSpec(what, sniffDelimiter, known, required, false, false, spacesAsUnderscore, missingHint,
                listPresentColumns, comments);
    }

    /**
     * The same, with a value under no column left to the caller: {@link TableRow#unnamedValueProblem}
     * says what is wrong, so that one bad row need not stop the table.
     */
    public TableSpec withUnnamedValuesPerRow() {
        return new TableSpec(what, sniffDelimiter, known, required, unknownIsError, false, spacesAsUnderscore,
                missingHint, listPresentColumns, comments);
    }

    /** The same, with spaces and hyphens in header names read as {@code _}. */
    public TableSpec withSpacesAsUnderscore() {
        return new TableSpec(what, sniffDelimiter, known, required, unknownIsError, extraCellIsError, true,
                missingHint, listPresentColumns, comments);
    }

    /** The same, with a hint appended to the message of a missing required column. */
    public TableSpec withMissingHint(String hint) {
        return new TableSpec(what, sniffDelimiter, known, required, unknownIsError, extraCellIsError,
                spacesAsUnderscore, hint, listPresentColumns, comments);
    }

    /** The same, with the columns present listed when a required one is missing. */
    public TableSpec listingPresentColumns() {
        return new TableSpec(what, sniffDelimiter, known, required, unknownIsError, extraCellIsError,
                spacesAsUnderscore, missingHint, true, comments);
    }

    /** The same, without comment lines: a line starting with {@code #} is a row like any other. */
    public TableSpec withoutComments() {
        return new TableSpec(what, sniffDelimiter, known, required, unknownIsError, extraCellIsError,
                spacesAsUnderscore, missingHint, listPresentColumns, false);
    }

    /** A header cell in the form the known names are written in: trimmed, lower case (and {@code _}). */
    public String normalise(String headerCell) {
        String c = headerCell.strip().toLowerCase(Locale.ROOT);
        if (!spacesAsUnderscore) {
            return c;
        }
        String joined = SEPARATORS.matcher(c.replace("°", "")).replaceAll("_");
        int from = 0;
        int to = joined.length();
        while (from < to && joined.charAt(from) == '_') {
            from++;
        }
        while (to > from && joined.charAt(to - 1) == '_') {
            to--;
        }
        return joined.substring(from, to);
    }

    /** Runs of what separates the words of a header name: blanks, hyphens, underscores, slashes, brackets. */
    private static final java.util.regex.Pattern SEPARATORS = java.util.regex.Pattern.compile("[\\s\\-_/()\\[\\]]+");

}
