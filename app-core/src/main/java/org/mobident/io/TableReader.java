package org.mobident.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.mobident.InputException;

/**
 * The one reader of the tool's text tables: mobility libraries, run sheets, standards sheets, peak
 * tables, known-identities tables and the enthalpy table (the byte-level trace reader is apart,
 * for speed). What each kind of table expects is a {@link TableSpec}; each data row a
 * {@link TableRow}.
 *
 * <ul>
 *   <li>UTF-8; a leading byte-order mark is stripped ({@link TextFiles}, the only place that does).</li>
 *   <li>Lines whose first non-blank character is {@code #} are comments, kept in {@link #comments()}
 *       (unless the spec has none); blank lines and rows of nothing but delimiters are skipped.</li>
 *   <li>The first other line is the header. The delimiter is a comma, or with
 *       {@link TableSpec#sniffDelimiter()} the one the header uses most (comma, semicolon or tab).</li>
 *   <li>Header names are compared trimmed and in lower case ({@link TableSpec#normalise}); an unknown
 *       name is an error with a "did you mean" ({@link Suggestions}) unless the spec ignores them; a
 *       known name given twice and a missing required name are errors.</li>
 *   <li>The rows are streamed with Commons CSV (RFC 4180 quoting: a quoted cell may hold the
 *       delimiter, quotes and line breaks). A value under no column is an error unless the spec
 *       ignores it.</li>
 * </ul>
 * Every problem is an {@link InputException} naming the file, the 1-based line and the field.
 */
public final class TableReader implements AutoCloseable {

    private static final char COMMENT = '#';

    private final String file;
    private final TableSpec spec;
    private final List<String> comments = new ArrayList<>();
    private final Map<String, Integer> columns = new HashMap<>();
    private final List<String> headerCells = new ArrayList<>();
    private final long headerLine;
    private final char delimiter;
    private final CSVParser parser;
    private final Iterator<CSVRecord> records;
    /** The reader of a file this table opened itself (closed with it), or null. */
    private final Reader owned;
    /** The last line of the last record read (file lines). */
    private long lastLine;

    private TableReader(String file, TableSpec spec, BufferedReader in, Reader owned) throws InputException,
            IOException {
        this.file = file;
        this.spec = spec;
        this.owned = owned;
        long line = 0;
        String header = null;
        for (String l = in.readLine(); l != null; l = in.readLine()) {
            line++;
            String s = l.strip();
            if (s.isEmpty()) {
                continue;
            }
            if (spec.comments() && s.charAt(0) == COMMENT) {
                comments.add(s.substring(1).strip());
                continue;
            }
            if (onlyDelimiters(s)) {
                continue;
            }
            header = l;
            break;
        }
        if (header == null) {
            throw new InputException(file, 0, null, "the " + spec.what() + " is empty (no header line)");
        }
        this.headerLine = line;
        this.lastLine = line - 1;
        this.delimiter = spec.sniffDelimiter() ? sniff(header) : ',';
        CSVFormat format = CSVFormat.DEFAULT.builder()
                .setDelimiter(delimiter)
                .setIgnoreEmptyLines(true)
                .setIgnoreSurroundingSpaces(true)
                .get();
        Reader rest = spec.comments() ? new CommentFilter(in, comments) : in;
        this.parser = CSVParser.builder().setReader(new Prefixed(header + "\n", rest)).setFormat(format).get();
        this.records = parser.iterator();
        CSVRecord head = nextRecord();
        if (head == null) {
            throw new InputException(file, headerLine, null, "cannot split the header into cells (check the quotes)");
        }
        header(head.toList());
    }

    /**
     * Opens a table file, streamed as strict UTF-8 with a byte-order mark skipped, and reads the
     * header; the file is closed with the reader.
     *
     * @throws InputException when the file cannot be read, is not UTF-8, has no header line, or the
     *                        header is not what {@code spec} expects
     */
    public static TableReader open(Path file, TableSpec spec) throws InputException {
        Reader in = TextFiles.openUtf8(file, spec.what());
        try {
            return open(in, file.toString(), spec, in);
        } catch (InputException e) {
            try {
                in.close();
            } catch (IOException closing) {
                e.addSuppressed(closing);
            }
            throw e;
        }
    }

    /**
     * Opens a table given as text (a leading byte-order mark is skipped). The reader is not closed.
     *
     * @param in    the text
     * @param label the file name used in messages
     */
    public static TableReader open(Reader in, String label, TableSpec spec) throws InputException {
        return open(in, label, spec, null);
    }

    private static TableReader open(Reader in, String label, TableSpec spec, Reader owned) throws InputException {
        try {
            return new TableReader(label, spec, new BufferedReader(TextFiles.withoutBom(in)), owned);
        } catch (CharacterCodingException e) {
            throw new InputException(label, 0, null, "the " + spec.what() + " is not valid UTF-8 text", e);
        } catch (IOException | UncheckedIOException e) {
            if (e.getCause() instanceof CharacterCodingException) {
                throw new InputException(label, 0, null, "the " + spec.what() + " is not valid UTF-8 text", e);
            }
            throw new InputException(label, 0, null, "cannot read the " + spec.what() + ": " + e.getMessage(), e);
        }
    }

    /** The file (or label) being read. */
    public String file() {
        return file;
    }

    /** The delimiter in use. */
    public char delimiter() {
        return delimiter;
    }

    /** The 1-based line of the header. */
    public long headerLine() {
        return headerLine;
    }

    /** The header cells as written (stripped), in order. */
    public List<String> headerCells() {
        return Collections.unmodifiableList(headerCells);
    }

    /** True when the header names {@code column} (normalised form). */
    public boolean has(String column) {
        return columns.containsKey(column);
    }

    /** The text of the comment lines read so far (without {@code #}, trimmed), in file order. */
    public List<String> comments() {
        return Collections.unmodifiableList(comments);
    }

    /**
     * The next data row, or null at the end of the table.
     *
     * @throws InputException when the quotes do not close, or a value stands under no column
     */
    public TableRow next() throws InputException {
        while (true) {
            CSVRecord rec = nextRecord();
            if (rec == null) {
                return null;
            }
            long line = startLine(rec);
            List<String> cells = rec.toList();
            if (blank(cells)) {
                continue;
            }
            InputException unnamed = unnamedValue(cells, line);
            if (unnamed != null && spec.extraCellIsError()) {
                throw unnamed;
            }
            return new TableRow(file, line, cells, columns, unnamed);
        }
    }

    @Override
    public void close() throws InputException {
        try {
            parser.close();
            if (owned != null) {
                owned.close();
            }
        } catch (IOException e) {
            throw new InputException(file, 0, null, "cannot read the " + spec.what() + ": " + e.getMessage(), e);
        }
    }

    private CSVRecord nextRecord() throws InputException {
        try {
            if (!records.hasNext()) {
                return null;
            }
            CSVRecord rec = records.next();
            lastLine = headerLine - 1 + parser.getCurrentLineNumber();
            return rec;
        } catch (UncheckedIOException | IllegalStateException e) {
            if (e.getCause() instanceof CharacterCodingException) {
                // the decoder reads ahead of the rows, so the line of the bad bytes is not known here
                throw new InputException(file, 0, null, "the " + spec.what() + " is not valid UTF-8 text", e);
            }
            throw new InputException(file, lastLine + 1, null, "malformed CSV from this line on (check the quotes): "
                    + rootMessage(e), e);
        }
    }

    /** True when more than half of the named header cells are no column of this kind of table. */
    private boolean mostlyForeign(List<String> cells) {
        int named = 0;
        int unknown = 0;
        for (String cell : cells) {
            String raw = cell.strip();
            if (!raw.isEmpty()) {
                named++;
                unknown += spec.known().contains(spec.normalise(raw)) ? 0 : 1;
            }
        }
        return 2 * unknown > named;
    }

    /**
     * Refuses a first row that names no known column and reads like data (numbers, file names): a
     * table whose header row was left out. Said as such, rather than as an unknown column named
     * after the first run's trace file.
     */
    private void refuseDataAsHeader(List<String> cells) throws InputException {
        int filled = 0;
        int dataLike = 0;
        for (String cell : cells) {
            String raw = cell.strip();
            if (raw.isEmpty()) {
                continue;
            }
            if (spec.known().contains(spec.normalise(raw))) {
                return;
            }
            filled++;
            dataLike += DATA_CELL.matcher(raw).matches() ? 1 : 0;
        }
        if (filled > 0 && 2 * dataLike >= filled) {
            List<String> shown = cells.subList(0, Math.min(cells.size(), 4));
            throw new InputException(file, headerLine, null, "the first row is not a header: it reads like data ("
                    + String.join(", ", shown) + (cells.size() > 4 ? ", ..." : "") + "); the first row must name "
                    + "the columns: " + String.join(", ", spec.known()));
        }
    }

    /** A cell that reads as data rather than a column name: a number (decimal point or comma, sign,
     *  exponent, optional unit word after it) or a file name with an extension. */
    private static final java.util.regex.Pattern DATA_CELL = java.util.regex.Pattern.compile(
            "[+\\-\u2212]?(\\d+([.,]\\d*)?|[.,]\\d+)([eE][+\\-]?\\d+)?(\\s*\\p{L}+)?"
                    + "|.*\\.(?i:csv|txt|tsv|dat|cdf|nc|asc)");

    private void header(List<String> cells) throws InputException {
        refuseDataAsHeader(cells);
        Map<String, Integer> firstAt = new HashMap<>();
        for (int i = 0; i < cells.size(); i++) {
            String raw = cells.get(i).strip();
            headerCells.add(raw);
            if (raw.isEmpty()) {
                continue;
            }
            String name = spec.normalise(raw);
            if (!spec.known().contains(name)) {
                if (spec.unknownIsError()) {
                    String hint = !spec.sniffDelimiter() && (raw.indexOf(';') >= 0 || raw.indexOf('\t') >= 0)
                            ? " (the " + spec.what() + " is comma-delimited)"
                            : mostlyForeign(cells) ? "; most of this header's columns are not a " + spec.what()
                            + "'s: is it the right file (or were two files given the other way round)?" : "";
                    throw new InputException(file, headerLine, raw, "unknown column '" + raw + "'"
                            + Suggestions.didYouMean(name, spec.known()) + "; known columns: "
                            + String.join(", ", spec.known()) + hint);
                }
                continue;
            }
            Integer earlier = firstAt.putIfAbsent(name, i);
            if (earlier != null) {
                throw new InputException(file, headerLine, name, "column '" + raw + "' appears twice (columns "
                        + (earlier + 1) + " and " + (i + 1) + ")");
            }
            columns.put(name, i);
        }
        for (String required : spec.required()) {
            if (!columns.containsKey(required)) {
                String present = spec.listPresentColumns() ? "; columns present: " + String.join(", ", headerCells)
                        : "";
                throw new InputException(file, headerLine, required, "required column '" + required
                        + "' is missing from the header" + spec.missingHint() + present);
            }
        }
    }

    /** The error of a value under an empty header cell or beyond the header, or null. */
    private InputException unnamedValue(List<String> cells, long line) {
        for (int k = 0; k < cells.size(); k++) {
            String v = cells.get(k).strip();
            if (v.isEmpty() || (k < headerCells.size() && !headerCells.get(k).isEmpty())) {
                continue;
            }
            String hint = k >= headerCells.size() && delimiter == ','
                    ? " (the row has " + cells.size() + " cells but the header has " + headerCells.size()
                    + "; a decimal comma in a comma-delimited file does this: use decimal points, or quote the"
                    + " value, or separate the columns with semicolons)" : "";
            return new InputException(file, line, "column " + (k + 1), "value '" + v
                    + "' stands in a column that has no name in the header" + hint);
        }
        return null;
    }

    /** The first line of a record: its last line minus the line breaks inside its cells. */
    private long startLine(CSVRecord rec) {
        long breaks = 0;
        for (String v : rec.values()) {
            for (int i = 0; i < v.length(); i++) {
                char c = v.charAt(i);
                if (c == '\n' || (c == '\r' && (i + 1 == v.length() || v.charAt(i + 1) != '\n'))) {
                    breaks++;
                }
            }
        }
        return Math.max(headerLine + 1, lastLine - breaks);
    }

    private static boolean blank(List<String> cells) {
        for (String v : cells) {
            if (!v.isBlank()) {
                return false;
            }
        }
        return true;
    }

    private static boolean onlyDelimiters(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != ',' && c != ';' && c != '\t' && c != ' ') {
                return false;
            }
        }
        return true;
    }

    /** The delimiter the header uses most outside quotes (tab, then semicolon, then comma on ties); comma when none occurs. */
    static char sniff(String header) {
        char d = TextFiles.mostFrequentDelimiter(header);
        return d == 0 ? ',' : d;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null) {
            t = t.getCause();
        }
        return t.getMessage();
    }

    /**
     * The text after the header with each comment line (first non-blank character {@code #},
     * outside a quoted cell) taken out into {@code comments} and left as an empty line, so that
     * line numbers stay true. Line ends are kept as they are.
     */
    private static final class CommentFilter extends Reader {
        private final Reader in;
        private final List<String> comments;
        private final StringBuilder line = new StringBuilder();
        private String pending = "";
        private int at;
        private boolean inQuotes;
        private boolean ended;

        CommentFilter(Reader in, List<String> comments) {
            this.in = in;
            this.comments = comments;
        }

        @Override
        public int read(char[] buf, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            while (at >= pending.length()) {
                if (ended) {
                    return -1;
                }
                pending = nextLine();
                at = 0;
            }
            int n = Math.min(len, pending.length() - at);
            pending.getChars(at, at + n, buf, off);
            at += n;
            return n;
        }

        /** The next line with its line end; a comment line becomes its line end alone. */
        private String nextLine() throws IOException {
            line.setLength(0);
            int end = -1;
            for (int c = in.read(); ; c = in.read()) {
                if (c < 0) {
                    ended = true;
                    break;
                }
                line.append((char) c);
                if (c == '\n') {
                    end = line.length() - 1;
                    break;
                }
                if (c == '\r') {
                    end = line.length() - 1;
                    in.mark(1);
                    int next = in.read();
                    if (next == '\n') {
                        line.append('\n');
                    } else if (next >= 0) {
                        in.reset();
                    }
                    break;
                }
            }
            String content = end < 0 ? line.toString() : line.substring(0, end);
            boolean comment = !inQuotes && content.strip().startsWith(String.valueOf(COMMENT));
            for (int i = 0; i < content.length(); i++) {
                if (content.charAt(i) == '"') {
                    inQuotes = !inQuotes;
                }
            }
            if (comment) {
                inQuotes = false;
                comments.add(content.strip().substring(1).strip());
                return end < 0 ? "" : line.substring(end);
            }
            return line.toString();
        }

        @Override
        public void close() {
            // the text's own reader is closed by whoever opened it
        }
    }

    /** The header line given back in front of the rest of the text. */
    private static final class Prefixed extends Reader {
        private final String prefix;
        private final Reader rest;
        private int at;

        Prefixed(String prefix, Reader rest) {
            this.prefix = prefix;
            this.rest = rest;
        }

        @Override
        public int read(char[] buf, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            if (at < prefix.length()) {
                int n = Math.min(len, prefix.length() - at);
                prefix.getChars(at, at + n, buf, off);
                at += n;
                return n;
            }
            return rest.read(buf, off, len);
        }

        @Override
        public void close() {
            // the text's own reader is closed by whoever opened it
        }
    }
}
