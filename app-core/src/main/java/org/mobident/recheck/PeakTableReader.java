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
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.mobident.InputException;
import org.mobident.report.CsvCells;

/**
 * Reads back the peak table CSV that Mobident writes ({@link org.mobident.report.PeakTableCsv}),
 * keeping only what a recheck or a scoring needs: run, peak, role, mobility, mobility_sd,
 * mobility_at_library_temp, assigned, confidence, status, and when present apex_time_s,
 * width_half_s, signal_to_noise, mobility_corrected and centre_time_s.
 *
 * <p>The header must name the required columns (any case, any order; the optional ones are read
 * when present, other columns are ignored). Text
 * cells that the writer made spreadsheet-safe ({@link CsvCells#inert}: a leading apostrophe
 * before {@code = + - @}, tab or carriage return) are read back without the apostrophe. Numbers
 * use a decimal point; an empty cell is unknown. Every problem raises an {@link InputException}
 * with the file, the 1-based line and the column.
 */
public final class PeakTableReader {

    /** The columns that must be present. */
    public static final List<String> REQUIRED = List.of("run", "peak", "role", "mobility", "mobility_sd",
            "mobility_at_library_temp", "assigned", "confidence", "status");

    /** Columns read when the table has them; an empty or absent one reads as unknown (NaN). */
    public static final List<String> OPTIONAL = List.of("apex_time_s", "width_half_s", "signal_to_noise",
            "mobility_corrected", "centre_time_s");

    /** Status values the writer produces. */
    public static final Set<String> STATUSES = Set.of("identified", "ambiguous", "unassigned", "marker", "failed",
            "no_peaks");

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
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
        Map<String, Integer> column = null;
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

    private static Map<String, Integer> header(CSVRecord rec, String label, long line) throws InputException {
        Map<String, Integer> column = new HashMap<>();
        for (int i = 0; i < rec.size(); i++) {
            String name = rec.get(i).strip().toLowerCase(Locale.ROOT);
            if (column.putIfAbsent(name, i) != null && (REQUIRED.contains(name) || OPTIONAL.contains(name))) {
                throw new InputException(label, line, name, "column '" + name + "' appears twice");
            }
        }
        for (String required : REQUIRED) {
            if (!column.containsKey(required)) {
                throw new InputException(label, line, required, "required column '" + required
                        + "' is missing from the header (is this a Mobident peak table?)");
            }
        }
        return column;
    }

    private static PeakTableRow row(CSVRecord rec, Map<String, Integer> column, String label, long line)
            throws InputException {
        String run = text(rec, column, "run");
        if (run == null) {
            throw new InputException(label, line, "run", "the run name is empty");
        }
        String peakText = text(rec, column, "peak");
        int peak = 0;
        if (peakText != null) {
            try {
                peak = Integer.parseInt(peakText);
            } catch (NumberFormatException e) {
                throw new InputException(label, line, "peak", "expected a whole peak number, got '" + peakText + "'");
            }
            if (peak < 1) {
                throw new InputException(label, line, "peak", "peak numbers start at 1, got " + peak);
            }
        }
        String status = text(rec, column, "status");
        if (status == null || !STATUSES.contains(status.toLowerCase(Locale.ROOT))) {
            throw new InputException(label, line, "status", "unknown status '" + (status == null ? "" : status)
                    + "'; expected one of identified, ambiguous, unassigned, marker, failed, no_peaks");
        }
        status = status.toLowerCase(Locale.ROOT);
        String role = text(rec, column, "role");
        String assigned = text(rec, column, "assigned");
        double confidence = number(rec, column, "confidence", label, line);
        if (Double.isFinite(confidence) && (confidence < 0 || confidence > 1)) {
            throw new InputException(label, line, "confidence", "a confidence lies between 0 and 1, got " + confidence);
        }
        double sd = number(rec, column, "mobility_sd", label, line);
        if (sd < 0) {
            throw new InputException(label, line, "mobility_sd", "a standard uncertainty cannot be negative, got " + sd);
        }
        if (assigned != null && ("unassigned".equals(status) || "marker".equals(status))) {
            throw new InputException(label, line, "assigned", "analyte '" + assigned + "' is assigned but the status is "
                    + status);
        }
        return new PeakTableRow(line, run, peak, role == null ? "" : role.toLowerCase(Locale.ROOT),
                number(rec, column, "mobility", label, line), sd,
                number(rec, column, "mobility_at_library_temp", label, line), assigned, confidence, status,
                optional(rec, column, "apex_time_s", label, line), optional(rec, column, "width_half_s", label, line),
                optional(rec, column, "signal_to_noise", label, line),
                optional(rec, column, "mobility_corrected", label, line),
                optional(rec, column, "centre_time_s", label, line));
    }

    /** An optional numeric column: NaN when the table has no such column. */
    private static double optional(CSVRecord rec, Map<String, Integer> column, String name, String label, long line)
            throws InputException {
        return column.containsKey(name) ? number(rec, column, name, label, line) : Double.NaN;
    }

    /** The cell, trimmed, with the spreadsheet-safety apostrophe removed; null when empty or absent. */
    private static String text(CSVRecord rec, Map<String, Integer> column, String name) {
        int i = column.get(name);
        if (i >= rec.size()) {
            return null;
        }
        String s = rec.get(i).strip();
        if (s.length() > 1 && s.charAt(0) == CsvCells.TEXT_PREFIX && CsvCells.startsDangerously(s.substring(1))) {
            s = s.substring(1);
        }
        return s.isEmpty() ? null : s;
    }

    private static double number(CSVRecord rec, Map<String, Integer> column, String name, String label, long line)
            throws InputException {
        int i = column.get(name);
        String s = i < rec.size() ? rec.get(i).strip() : "";
        if (s.isEmpty()) {
            return Double.NaN;
        }
        String plain = s.replace('\u2212', '-');
        if (!DECIMAL.matcher(plain).matches()) {
            throw new InputException(label, line, name, "expected a number, got '" + s + "'");
        }
        double v = Double.parseDouble(plain);
        if (!Double.isFinite(v)) {
            throw new InputException(label, line, name, "the number '" + s + "' is out of range");
        }
        return v;
    }
}
