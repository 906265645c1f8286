package org.mobident.recheck;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.Optional;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.mobident.InputException;
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

    private static final char BYTE_ORDER_MARK = '\uFEFF';
    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setIgnoreEmptyLines(true).get();

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
        String label = file.toString();
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new InputException(label, 0, null, "cannot read the peak table: " + e.getMessage(), e);
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new InputException(label, 0, null, "the peak table is not valid UTF-8 text", e);
        }
        return read(new StringReader(text), label);
    }

    /**
     * Reads a peak table from text.
     *
     * @param in    the CSV text (not closed)
     * @param label file name for messages
     */
    public static List<PeakTableRow> read(Reader in, String label) throws InputException {
        String text;
        try {
            StringBuilder sb = new StringBuilder();
            char[] buffer = new char[8192];
            for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
                sb.append(buffer, 0, n);
            }
            text = sb.toString();
        } catch (IOException e) {
            throw new InputException(label, 0, null, "cannot read the peak table: " + e.getMessage(), e);
        }
        if (!text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK) {
            text = " " + text.substring(1);
        }
        if (text.strip().startsWith("{")) {
            throw new InputException(label, 1, null, "this looks like the JSON peak table; give the CSV "
                    + "peak table (write it with 'identify --csv')");
        }
        int[] lineStarts = lineStarts(text);
        List<PeakTableRow> rows = new ArrayList<>();
        Map<String, Long> seen = new HashMap<>();
        Map<PeakTableColumn, Integer> column = null;
        try (CSVParser parser = CSVParser.parse(new StringReader(text), FORMAT)) {
            Iterator<CSVRecord> it = parser.iterator();
            while (true) {
                CSVRecord rec;
                try {
                    if (!it.hasNext()) {
                        break;
                    }
                    rec = it.next();
                } catch (UncheckedIOException | IllegalStateException e) {
                    throw new InputException(label, parser.getCurrentLineNumber() + 1, null,
                            "malformed CSV (check the quotes)", e);
                }
                long line = lineOf(lineStarts, firstContent(text, rec.getCharacterPosition()));
                if (blank(rec)) {
                    continue;
                }
                if (column == null) {
                    column = header(rec, label, line);
                    continue;
                }
                PeakTableRow row = row(rec, column, label, line);
                if (row.peak() > 0) {
                    String key = row.run() + "\u0000" + row.peak();
                    Long earlier = seen.putIfAbsent(key, line);
                    if (earlier != null) {
                        throw new InputException(label, line, "peak", "run '" + row.run() + "' peak " + row.peak()
                                + " appears twice (lines " + earlier + " and " + line + ")");
                    }
                }
                rows.add(row);
            }
        } catch (IOException | UncheckedIOException e) {
            throw new InputException(label, 0, null, "cannot read the peak table: " + e.getMessage(), e);
        }
        if (column == null) {
            throw new InputException(label, 0, null, "the peak table is empty (no header)");
        }
        return rows;
    }

    /** Offsets at which lines begin (after "\n", "\r\n" or a lone "\r"). */
    private static int[] lineStarts(String text) {
        List<Integer> starts = new ArrayList<>();
        starts.add(0);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 == text.length() || text.charAt(i + 1) != '\n'))) {
                starts.add(i + 1);
            }
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The offset of the first character after any line breaks at {@code from} (skipped empty lines). */
    private static long firstContent(String text, long from) {
        int i = (int) from;
        while (i < text.length() && (text.charAt(i) == '\n' || text.charAt(i) == '\r')) {
            i++;
        }
        return i;
    }

    /** 1-based line of a character offset. */
    private static long lineOf(int[] lineStarts, long offset) {
        int i = java.util.Arrays.binarySearch(lineStarts, (int) offset);
        return i >= 0 ? i + 1 : -i - 1;
    }

    private static boolean blank(CSVRecord rec) {
        for (String v : rec.values()) {
            if (!v.isBlank()) {
                return false;
            }
        }
        return true;
    }

    /** Column index of every known column the header names. */
    private static Map<PeakTableColumn, Integer> header(CSVRecord rec, String label, long line) throws InputException {
        Map<PeakTableColumn, Integer> column = new EnumMap<>(PeakTableColumn.class);
        for (int i = 0; i < rec.size(); i++) {
            Optional<PeakTableColumn> known = PeakTableColumn.fromHeader(rec.get(i));
            if (known.isPresent() && column.putIfAbsent(known.get(), i) != null) {
                String name = known.get().header();
                throw new InputException(label, line, name, "column '" + name + "' appears twice");
            }
        }
        for (PeakTableColumn c : PeakTableColumn.values()) {
            if (c.requiredToRead() && !column.containsKey(c)) {
                throw new InputException(label, line, c.header(), "required column '" + c.header()
                        + "' is missing from the header (is this a Mobident peak table?)");
            }
        }
        return column;
    }

    private static PeakTableRow row(CSVRecord rec, Map<PeakTableColumn, Integer> column, String label, long line)
            throws InputException {
        Map<PeakTableColumn, String> cells = new EnumMap<>(PeakTableColumn.class);
        for (Map.Entry<PeakTableColumn, Integer> e : column.entrySet()) {
            PeakTableColumn c = e.getKey();
            String cell = e.getValue() < rec.size() ? rec.get(e.getValue()) : "";
            if (c.format().numeric()) {
                number(cell, c, label, line); // every number is checked where it stands
                cell = cell.strip();
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
