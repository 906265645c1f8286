package org.mobident.io;

import java.util.List;
import java.util.Map;
import org.mobident.InputException;

/**
 * One data row of a table read by {@link TableReader}: its cells by column name, and where it
 * stands (file and 1-based line) for messages.
 */
public final class TableRow {

    private final String file;
    private final long line;
    private final List<String> cells;
    private final Map<String, Integer> columns;
    private final InputException unnamedValue;

    TableRow(String file, long line, List<String> cells, Map<String, Integer> columns, InputException unnamedValue) {
        this.file = file;
        this.line = line;
        this.cells = cells;
        this.columns = columns;
        this.unnamedValue = unnamedValue;
    }

    /**
     * The problem of a value standing under no column (an empty header cell, or beyond the header),
     * or null; only seen here when the table's spec leaves it to the caller.
     */
    public InputException unnamedValueProblem() {
        return unnamedValue;
    }

    /** The file (or label) the row comes from. */
    public String file() {
        return file;
    }

    /** The 1-based line on which the row starts. */
    public long line() {
        return line;
    }

    /** True when the header names {@code column} (in its normalised form). */
    public boolean has(String column) {
        return columns.containsKey(column);
    }

    /** The cell of {@code column}, stripped; "" when empty, missing from the row, or not in the header. */
    public String get(String column) {
        Integer i = columns.get(column);
        return i == null || i >= cells.size() ? "" : cells.get(i).strip();
    }

    /** The cell of {@code column} as written (not stripped); null when absent. */
    public String raw(String column) {
        Integer i = columns.get(column);
        return i == null || i >= cells.size() ? null : cells.get(i);
    }

    /** The number of cells in the row. */
    public int size() {
        return cells.size();
    }

    /** A problem with this row, naming its file, line and {@code field}. */
    public InputException problem(String field, String message) {
        return new InputException(file, line, field, message);
    }

    /** A problem with this row, naming its file, line and {@code field}, with its cause. */
    public InputException problem(String field, String message, Throwable cause) {
        return new InputException(file, line, field, message, cause);
    }
}
