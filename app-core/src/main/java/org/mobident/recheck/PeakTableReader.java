package org.mobident.recheck;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.mobident.InputException;
import org.mobident.io.TableReader;
import org.mobident.io.TableRow;
import org.mobident.io.TableSpec;
import org.mobident.io.TextFiles;
import org.mobident.report.CsvCells;
import org.mobident.report.PeakTableColumn;
import org.mobident.report.PeakTableStatus;

/**
 * Reads back the peak table CSV that Mobident writes ({@link org.mobident.report.PeakTableCsv}),
 * with the columns, formats and status words of {@link PeakTableColumn} and {@link PeakTableStatus}:
 * every known column the table has is read and its numbers checked; a row names directly what a
 * recheck or a scoring needs (run, peak, role, mobility, mobility_sd, mobility_at_library_temp,
 * assigned, confidence, status, and when present apex_time_s, width_half_s, signal_to_noise,
 * mobility_corrected and centre_time_s) and gives the rest through {@link PeakTableRow#text} and
 * {@link PeakTableRow#number}.
 *
 * <p>The header must name the required columns (any case, any order; the other known columns are
 * read when present, unknown columns are ignored). Text
 * cells that the writer made spreadsheet-safe ({@link CsvCells#inert}: a leading apostrophe
 * before {@code = + - @}, tab or carriage return) are read back without the apostrophe. Numbers
 * use a decimal point; an empty cell is unknown. Every problem raises an {@link InputException}
 * with the file, the 1-based line and the column.
 */
public final class PeakTableReader {

    /** The columns that must be present ({@link PeakTableColumn#requiredToRead}). */
    public static final List<String> REQUIRED = PeakTableColumn.requiredHeaders();

    /** Status values the writer produces ({@link PeakTableStatus}). */
    public static final Set<String> STATUSES = Arrays.stream(PeakTableStatus.values()).map(PeakTableStatus::word)
            .collect(Collectors.toUnmodifiableSet());

    /** The peak table as the table reader expects it: the known columns, the required ones, no comments. */
    private static final TableSpec SPEC = TableSpec.of("peak table", PeakTableColumn.headers(), REQUIRED)
            .ignoringUnknownColumns().withoutComments().withMissingHint(" (is this a Mobident peak table?)");

    /** How far ahead the check for a JSON table looks for its first character. */
    private static final int LOOK_AHEAD = 1 << 16;

    private PeakTableReader() {
    }

    /**
     * Reads a peak table file.
     *
     * @param file the CSV file
     * @return its rows in file order
     * @throws InputException when the file cannot be read or a line is invalid
     */
    public static List<PeakTableRow> read(Path file) throws InputException {
        try (Reader in = TextFiles.openUtf8(file, SPEC.what())) {
            return read(in, file.toString());
        } catch (IOException e) {
            throw new InputException(file.toString(), 0, null, "cannot read the peak table: " + e.getMessage(), e);
        }
    }

    /**
     * Reads a peak table from text.
     *
     * @param in    the CSV text (a leading byte-order mark is skipped)
     * @param label file name for messages
     */
    public static List<PeakTableRow> read(Reader in, String label) throws InputException {
        BufferedReader text = new BufferedReader(in);
        rejectJson(text, label);
        List<PeakTableRow> rows = new ArrayList<>();
        Map<String, Long> seen = new HashMap<>();
        try (TableReader table = TableReader.open(text, label, SPEC)) {
            for (TableRow r = table.next(); r != null; r = table.next()) {
                PeakTableRow row = row(r);
                if (row.peak() > 0) {
                    String key = row.run() + "\u0000" + row.peak();
                    Long earlier = seen.putIfAbsent(key, r.line());
                    if (earlier != null) {
                        throw r.problem("peak", "run '" + row.run() + "' peak " + row.peak()
                                + " appears twice (lines " + earlier + " and " + r.line() + ")");
                    }
                }
                rows.add(row);
            }
        }
        return rows;
    }

    /** The JSON peak table is not read here: say so, rather than that the header lacks columns. */
    private static void rejectJson(BufferedReader text, String label) throws InputException {
        try {
            text.mark(LOOK_AHEAD);
            int c = text.read();
            for (int n = 1; n < LOOK_AHEAD && c >= 0 && (Character.isWhitespace(c) || c == TextFiles.BYTE_ORDER_MARK);
                 n++) {
                c = text.read();
            }
            text.reset();
            if (c == '{') {
                throw new InputException(label, 1, null, "this looks like the JSON peak table; give the CSV "
                        + "peak table (write it with 'identify --csv')");
            }
        } catch (CharacterCodingException e) {
            throw new InputException(label, 0, null, "the peak table is not valid UTF-8 text", e);
        } catch (IOException e) {
            throw new InputException(label, 0, null, "cannot read the peak table: " + e.getMessage(), e);
        }
    }

    private static PeakTableRow row(TableRow r) throws InputException {
        String label = r.file();
        long line = r.line();
        Map<PeakTableColumn, String> cells = new EnumMap<>(PeakTableColumn.class);
        for (PeakTableColumn c : PeakTableColumn.values()) {
            if (!r.has(c.header())) {
                continue;
            }
            String cell = r.get(c.header());
            if (c.format().numeric()) {
                number(cell, c, label, line); // every number is checked where it stands
            } else {
                cell = PeakTableColumn.Format.readText(cell);
            }
            if (cell != null && !cell.isEmpty()) {
                cells.put(c, cell);
            }
        }
        String run = cells.get(PeakTableColumn.RUN);
        if (run == null) {
            throw new InputException(label, line, "run", "the run name is empty");
        }
        String peakText = cells.get(PeakTableColumn.PEAK);
        int peak = 0;
        if (peakText != null) {
            double p = number(peakText, PeakTableColumn.PEAK, label, line);
            if (p != Math.rint(p) || Math.abs(p) > Integer.MAX_VALUE) {
                throw new InputException(label, line, "peak", "expected a whole peak number, got '" + peakText + "'");
            }
            peak = (int) p;
            if (peak < 1) {
                throw new InputException(label, line, "peak", "peak numbers start at 1, got " + peak);
            }
        }
        String statusText = cells.get(PeakTableColumn.STATUS);
        Optional<PeakTableStatus> known = PeakTableStatus.fromWord(statusText);
        if (known.isEmpty()) {
            throw new InputException(label, line, "status", "unknown status '" + (statusText == null ? "" : statusText)
                    + "'; expected one of " + PeakTableStatus.words());
        }
        PeakTableStatus status = known.get();
        String role = cells.get(PeakTableColumn.ROLE);
        String assigned = cells.get(PeakTableColumn.ASSIGNED);
        double confidence = value(cells, PeakTableColumn.CONFIDENCE);
        if (Double.isFinite(confidence) && (confidence < 0 || confidence > 1)) {
            throw new InputException(label, line, "confidence", "a confidence lies between 0 and 1, got " + confidence);
        }
        double sd = value(cells, PeakTableColumn.MOBILITY_SD);
        if (sd < 0) {
            throw new InputException(label, line, "mobility_sd", "a standard uncertainty cannot be negative, got " + sd);
        }
        if (assigned != null && (status == PeakTableStatus.UNASSIGNED || status == PeakTableStatus.MARKER)) {
            throw new InputException(label, line, "assigned", "analyte '" + assigned + "' is assigned but the status is "
                    + status.word());
        }
        return new PeakTableRow(line, run, peak, role == null ? "" : role.toLowerCase(Locale.ROOT),
                value(cells, PeakTableColumn.MOBILITY), sd, value(cells, PeakTableColumn.MOBILITY_AT_LIBRARY_TEMP),
                assigned, confidence, status.word(), value(cells, PeakTableColumn.APEX_TIME_S),
                value(cells, PeakTableColumn.WIDTH_HALF_S), value(cells, PeakTableColumn.SIGNAL_TO_NOISE),
                value(cells, PeakTableColumn.MOBILITY_CORRECTED), value(cells, PeakTableColumn.CENTRE_TIME_S), cells);
    }

    /** A number already checked by {@link #number}: NaN when the cell is empty or the column absent. */
    private static double value(Map<PeakTableColumn, String> cells, PeakTableColumn c) {
        return c.format().read(cells.get(c));
    }

    /** A numeric cell in the column's format: NaN when empty; an error naming the column otherwise. */
    private static double number(String cell, PeakTableColumn c, String label, long line) throws InputException {
        try {
            return c.format().read(cell);
        } catch (NumberFormatException e) {
            if (c == PeakTableColumn.PEAK) {
                throw new InputException(label, line, c.header(), "expected a whole peak number, got '"
                        + cell.strip() + "'");
            }
            throw new InputException(label, line, c.header(), e.getMessage());
        }
    }
}
