package org.mobident.trace.io;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.mobident.InputException;
import org.mobident.io.TextFiles;
import org.mobident.trace.RunSpec;
import org.mobident.trace.TimeScale;
import org.mobident.trace.Trace;

/**
 * Reads a detector trace from delimited text: a header line naming the columns, then one row
 * per point; or, in a file without a header line, rows of numbers from the first line on.
 *
 * <ul>
 *   <li>Delimiter comma, semicolon or tab, taken from the header (the most frequent of the three;
 *       ties go to tab, then semicolon). With semicolon or tab, numbers may use a decimal comma.
 *       Columns aligned with spaces (rows of numbers separated by spaces alone) are read as
 *       tab-delimited, each run of spaces one delimiter; header names with spaces must then be
 *       quoted.</li>
 *   <li>Lines of the export's own before the header ({@code Sample: …}, {@code Operator;…}) are
 *       skipped when the first line is no usable header: the data block is then the first
 *       {@value #DATA_BLOCK_ROWS} rows of numbers of one shape, its header the line just before
 *       them if that line holds names only (see {@code Parse.run}).</li>
 *   <li>No header line: when the first line (after comments) is a row of two or more numbers, the
 *       columns are known by position only ("column 1", …). The delimiter is then tab, else
 *       semicolon, else comma (beside a tab or a semicolon a comma is a decimal comma); the time
 *       is the first column and the signal the second, unless the options give their positions;
 *       with more than two columns the signal column must be given.</li>
 *   <li>UTF-8 (a byte order mark is skipped); a header that is not valid UTF-8 is read as
 *       ISO-8859-1; UTF-16 text (with a byte order mark, or ASCII with NULs at every other byte) is
 *       read as its UTF-8 equivalent. Binary files are refused. Lines end in LF, CRLF or CR.</li>
 *   <li>Blank lines and lines starting with {@code #} are skipped anywhere. Fields may be quoted.
 *       Trailing empty fields beyond the header are ignored.</li>
 *   <li>Time column: the option (a header name, or a position with 1 for the first column), else a
 *       name such as {@code time}, {@code t}, {@code Time (min)}, {@code time_s}, {@code minutes}.
 *       Unit: the option, else the header, else seconds (a short time column without a unit is
 *       refused as probably minutes, see {@link #UNITLESS_MINUTES_LIMIT}).</li>
 *   <li>Signal column: the option (name or position), else a name with a word such as signal,
 *       absorbance, mAU, intensity, detector, response or value, else the first other named column.</li>
 *   <li>Lines of text after the data ({@code End of data}, {@code Points: …}) end it, when at least
 *       {@value #DATA_BLOCK_ROWS} rows came before and no row follows; a damaged or truncated row
 *       is still an error.</li>
 *   <li>Times must strictly increase (sampling may be irregular); values must be finite.</li>
 * </ul>
 * Every problem is an {@link InputException} naming the file, the 1-based line and the column.
 * Parsing works on the raw bytes with {@link FastDoubleParser}.
 */
public final class DelimitedTraceReader {

    /** Longest piece of a bad field quoted back in a message. */
    private static final int MAX_QUOTED_CHARS = 40;
    /** Arrays start at this many points and grow by half. */
    private static final int INITIAL_CAPACITY = 1024;
    /**
     * After this many data rows the arrays are sized once for the whole file from the mean bytes
     * per row so far, so that a long file is neither grown step by step nor over-allocated.
     */
    private static final int ROWS_BEFORE_ESTIMATE = 256;
    /** Outcomes of {@code Parse.simpleRow} and {@code Parse.plainRow}. */
    private static final int PLAIN_ROW = 2;
    private static final int SIMPLE_ROW = 1;
    private static final int GENERAL_ROW = 0;
    private static final int END_OF_BYTES = -1;
    /** Outcomes of {@code Parse.generalRow}. */
    private static final int ROW_READ = 3;
    private static final int LINE_SKIPPED = 4;
    private static final int FOOTER_REACHED = 5;
    /**
     * Most digits a number of {@code Parse.plainRow} may have: up to 18 digits a long holds them
     * exactly, so the row's significand is the one {@link FastDoubleParser} keeps (it drops digits
     * only beyond 18).
     */
    private static final int PLAIN_MAX_DIGITS = 18;
    /** Largest significand of {@code Parse.plainRow}: 2^53, as in {@link FastDoubleParser}'s exact path. */
    private static final long PLAIN_MAX_SIGNIFICAND = 1L << 53;
    /** 10^0 … 10^18, each exact in a double (5^k &lt; 2^53 for k ≤ 22). */
    private static final double[] PLAIN_POWERS_OF_TEN = new double[PLAIN_MAX_DIGITS + 1];

    static {
        double p = 1.0;
        for (int i = 0; i <= PLAIN_MAX_DIGITS; i++) {
            PLAIN_POWERS_OF_TEN[i] = p;
            p *= 10.0;
        }
    }

    /** Consecutive rows of numbers that make a data block after an export's own opening lines. */
    private static final int DATA_BLOCK_ROWS = 3;
    /** The data block is looked for among the first this many lines that are neither blank nor comments. */
    private static final int MAX_PREAMBLE_LINES = 200;

    /** Largest array length the JVM allows, with a margin (the bytes of one file bound the rows anyway). */
    private static final int MAX_ROWS = Integer.MAX_VALUE - 8;
    /** Headroom of that estimate: later rows are usually a little longer (times gain digits). */
    private static final double ESTIMATE_HEADROOM = 1.02;
    /** Extra rows on top of the estimate (short files, rounding). */
    private static final int ESTIMATE_SLACK_ROWS = 64;

    /**
     * A time column without a stated unit that ends at or before this value is refused rather than
     * read as seconds: no CZE separation is that short, so the numbers are almost surely minutes
     * (`common practice`: runs last minutes, not seconds).
     */
    static final double UNITLESS_MINUTES_LIMIT = 60.0;

    private DelimitedTraceReader() {
    }

    /** Reads {@code file}; messages name it as {@code file.toString()}. */
    public static Trace read(Path file, TraceReadOptions options) throws InputException {
        return read(file, file.toString(), options);
    }

    /**
     * Reads {@code file}; the trace is named {@link RunSpec#runNameOf(Path)}.
     *
     * @param displayName how messages and {@link Trace#sourceFile()} name the file
     */
    public static Trace read(Path file, String displayName, TraceReadOptions options) throws InputException {
        byte[] bytes = TextSniffer.readAllBytes(file, displayName);
        return parse(bytes, RunSpec.runNameOf(file), displayName, options);
    }

    /**
     * Parses the bytes of a trace file already in memory (not modified).
     *
     * @param name        trace (run) name
     * @param displayName file name for messages and {@link Trace#sourceFile()}
     */
    public static Trace parse(byte[] bytes, String name, String displayName, TraceReadOptions options)
            throws InputException {
        TraceReadOptions o = options == null ? TraceReadOptions.DEFAULT : options;
        bytes = TextSniffer.asUtf8(bytes);
        Parse plain = new Parse(bytes, displayName, o);
        try {
            return plain.run(name);
        } catch (InputException first) {
            // columns aligned with spaces: read again with each run of spaces as one delimiter
            if (plain.headerTaken || !spaceAligned(bytes)) {
                throw first;
            }
            Parse aligned = new Parse(withTabsForSpaces(bytes), displayName, o);
            try {
                return aligned.run(name);
            } catch (InputException second) {
                throw aligned.headerTaken ? second : first;
            }
        }
    }

    /**
     * True when, among the first lines that are neither blank nor comments, {@value #DATA_BLOCK_ROWS}
     * consecutive ones (or the last two or more of a shorter file) are numbers separated by spaces
     * alone (no semicolon or tab): columns aligned with spaces, as plain text exports write them.
     */
    static boolean spaceAligned(byte[] b) {
        TextLines lines = new TextLines(b, TextFiles.bomLength(b), b.length);
        int seen = 0;
        int run = 0;
        while (seen < MAX_PREAMBLE_LINES && lines.next()) {
            seen++;
            run = spacedNumbers(b, lines.first, lines.end) ? run + 1 : 0;
            if (run == DATA_BLOCK_ROWS) {
                return true;
            }
        }
        return !lines.next() && run >= 2; // a short file: its last rows are such numbers
    }

    /**
     * A cursor over the lines of some bytes that are neither blank nor comments; a CR LF pair ends
     * one line. After {@link #next} returns true: the line's {@link #start}, its first character
     * that is not a space or tab ({@link #first}), its {@link #end} (before the line break) and its
     * 1-based {@link #number} counted from where the cursor began.
     */
    private static final class TextLines {
        private final byte[] b;
        private final int to;
        private int pos;
        int start;
        int first;
        int end;
        long number;

        TextLines(byte[] b, int from, int to) {
            this.b = b;
            this.pos = from;
            this.to = to;
        }

        boolean next() {
            while (pos < to) {
                start = pos;
                int i = pos;
                while (i < to && b[i] != '\n' && b[i] != '\r') {
                    i++;
                }
                end = i;
                if (i + 1 < to && b[i] == '\r' && b[i + 1] == '\n') {
                    i++;
                }
                pos = Math.min(to, i + 1);
                number++;
                int k = start;
                while (k < end && (b[k] == ' ' || b[k] == '\t')) {
                    k++;
                }
                if (k < end && b[k] != '#') {
                    first = k;
                    return true;
                }
            }
            return false;
        }
    }

    /** True for two or more fields of digits, signs, points, commas (decimal) and exponents, separated by spaces. */
    private static boolean spacedNumbers(byte[] b, int from, int to) {
        int fields = 0;
        boolean inField = false;
        for (int k = from; k < to; k++) {
            byte c = b[k];
            if (c == ' ') {
                inField = false;
            } else if ((c >= '0' && c <= '9') || c == '.' || c == ',' || c == '-' || c == '+' || c == 'e' || c == 'E') {
                if (!inField) {
                    fields++;
                    inField = true;
                }
            } else {
                return false;
            }
        }
        return fields >= 2;
    }

    /**
     * The text with every line's leading and trailing spaces dropped and each run of spaces between
     * fields (outside quotes) turned into one tab; line ends, comment lines and everything else
     * kept, so line numbers stay the same.
     */
    static byte[] withTabsForSpaces(byte[] b) {
        int n = b.length;
        byte[] out = new byte[n];
        int bom = TextFiles.bomLength(b);
        System.arraycopy(b, 0, out, 0, bom);
        int m = bom;
        int i = bom;
        while (i < n) {
            while (i < n && b[i] == ' ') {
                i++;
            }
            boolean comment = i < n && b[i] == '#';
            boolean quoted = false;
            boolean pendingGap = false;
            while (i < n && b[i] != '\n' && b[i] != '\r') {
                byte c = b[i++];
                if (!comment && !quoted && c == ' ') {
                    pendingGap = true;
                    continue;
                }
                if (pendingGap) {
                    out[m++] = '\t';
                    pendingGap = false;
                }
                if (c == '"') {
                    quoted = !quoted;
                }
                out[m++] = c;
            }
            while (i < n && (b[i] == '\n' || b[i] == '\r')) {
                out[m++] = b[i++];
            }
        }
        return Arrays.copyOf(out, m);
    }

    /** State of one parse; not shared. */
    private static final class Parse {
        private final byte[] b;
        private final int n;
        private final String file;
        private final TraceReadOptions options;

        private int pos;
        private long line;
        /** Bounds of the current line, without its terminator. */
        private int lineStart;
        private int lineEnd;

        private byte delimiter;

        /** True when neither the header nor the options said the time unit (seconds assumed). */

        private boolean unitAssumed;
        /** True when the file has no header line: its first line is already a row of numbers. */
        private boolean headerless;
        private List<String> names;
        private int namedCount;
        private int[] fieldStart;
        private int[] fieldEnd;

        Parse(byte[] bytes, String file, TraceReadOptions options) {
            this.b = bytes;
            this.n = bytes.length;
            this.file = file;
            this.options = options;
        }

        /** Moves to the next line; false at the end of the bytes. */
        private boolean nextLine() {
            if (pos >= n) {
                return false;
            }
            line++;
            lineStart = pos;
            int i = pos;
            while (i < n && b[i] != '\n' && b[i] != '\r') {
                i++;
            }
            lineEnd = i;
            if (i < n && b[i] == '\r' && i + 1 < n && b[i + 1] == '\n') {
                i++;
            }
            pos = i < n ? i + 1 : n;
            return true;
        }

        /**
         * The common row in one pass: finds the end of the next line and its field bounds together
         * ({@link #nextLine} then {@link #splitRow} would scan it twice). Only a plain row is taken:
         * it starts with neither a blank, a tab, {@code #}, a quote nor a line end, holds no quote,
         * and has at least the named and at most the header's number of fields. Anything else is
         * left untouched for the general path, which gives the same fields or the same error.
         *
         * @return {@link #SIMPLE_ROW} when the row was read and split, {@link #GENERAL_ROW} when the
         *         line must go the general way, {@link #END_OF_BYTES} when no bytes are left
         */
        private int simpleRow() {
            if (pos >= n) {
                return END_OF_BYTES;
            }
            int i = pos;
            byte first = b[i];
            if (first == ' ' || first == '\t' || first == '#' || first == '"' || first == '\n' || first == '\r') {
                return GENERAL_ROW;
            }
            byte d = delimiter;
            int capacity = fieldStart.length;
            int count = 0;
            int start = i;
            while (i < n) {
                byte c = b[i];
                if (c == d) {
                    if (count == capacity) {
                        return GENERAL_ROW;
                    }
                    fieldStart[count] = start;
                    fieldEnd[count] = i;
                    count++;
                    start = i + 1;
                } else if (c == '\n' || c == '\r') {
                    break;
                } else if (c == '"') {
                    return GENERAL_ROW;
                }
                i++;
            }
            if (count == capacity) {
                return GENERAL_ROW;
            }
            fieldStart[count] = start;
            fieldEnd[count] = i;
            count++;
            if (count < namedCount) {
                return GENERAL_ROW;
            }
            acceptRow(i, count);
            return SIMPLE_ROW;
        }

        /** Takes the row that ends at {@code end} (its line break or the end of the text) with
         *  {@code count} fields: the line's bounds, the position after its line break, and the
         *  fields it lacks set empty. */
        private void acceptRow(int end, int count) {
            line++;
            lineStart = pos;
            lineEnd = end;
            int i = end;
            if (i < n && b[i] == '\r' && i + 1 < n && b[i + 1] == '\n') {
                i++;
            }
            pos = i < n ? i + 1 : n;
            for (int k = count; k < fieldStart.length; k++) {
                fieldStart[k] = lineStart;
                fieldEnd[k] = lineStart;
            }
        }

        /** Time (as written, before the unit) and signal of the row {@link #plainRow} read last. */
        private double plainTime;
        private double plainSignal;

        /**
         * The common row in a single pass over its bytes: splits the row and parses its time and
         * signal fields as it goes, for rows whose two numbers are plain decimals (optional minus,
         * digits with at most one decimal separator, no exponent, at most {@value #PLAIN_MAX_DIGITS}
         * digits and a significand of at most 2^53). Such a number is {@code m} or {@code m / 10^k}
         * with exact operands, one correctly rounded division: the same value, bit for bit, as
         * {@link FastDoubleParser} and {@link Double#parseDouble} give. Anything else (a blank, a
         * quote, a sign '+', an exponent, a comment, a row of the wrong shape) leaves the row
         * untouched for {@link #simpleRow} and the general path.
         *
         * @return {@link #PLAIN_ROW} with {@link #plainTime} and {@link #plainSignal} set,
         *         {@link #GENERAL_ROW} when another path must read the row, {@link #END_OF_BYTES}
         */
        private int plainRow(int timeIndex, int signalIndex, boolean decimalComma) {
            if (pos >= n) {
                return END_OF_BYTES;
            }
            final byte[] b = this.b;
            final int n = this.n;
            int i = pos;
            byte first = b[i];
            if (first == ' ' || first == '\t' || first == '#' || first == '"' || first == '\n' || first == '\r') {
                return GENERAL_ROW;
            }
            final byte d = delimiter;
            final byte decimal = decimalComma ? (byte) ',' : (byte) '.';
            final int capacity = fieldStart.length;
            int count = 0;
            double time = 0;
            double signal = 0;
            while (true) {
                if (count == capacity) {
                    return GENERAL_ROW;
                }
                int start = i;
                if (count == timeIndex || count == signalIndex) {
                    boolean negative = false;
                    if (i < n && b[i] == '-') {
                        negative = true;
                        i++;
                    }
                    long m = 0;
                    int digits = 0;
                    int fraction = 0;
                    int c;
                    // (char) maps the bytes below '0' (and the negative ones) above 9: one test per byte
                    while (i < n && (c = (char) (b[i] - '0')) <= 9) {
                        m = m * 10 + c;
                        digits++;
                        i++;
                    }
                    if (i < n && (b[i] == '.' || b[i] == decimal)) {
                        i++;
                        int before = i;
                        while (i < n && (c = (char) (b[i] - '0')) <= 9) {
                            m = m * 10 + c;
                            i++;
                        }
                        fraction = i - before;
                        digits += fraction;
                    }
                    if (digits == 0 || digits > PLAIN_MAX_DIGITS || m > PLAIN_MAX_SIGNIFICAND) {
                        return GENERAL_ROW;
                    }
                    if (i < n && b[i] != d && b[i] != '\n' && b[i] != '\r') {
                        return GENERAL_ROW;
                    }
                    double v = m == 0 ? 0.0 : fraction == 0 ? (double) m : m / PLAIN_POWERS_OF_TEN[fraction];
                    if (negative) {
                        v = -v;
                    }
                    if (count == timeIndex) {
                        time = v;
                    } else {
                        signal = v;
                    }
                } else {
                    byte c;
                    while (i < n && (c = b[i]) != d && c != '\n' && c != '\r') {
                        if (c == '"') {
                            return GENERAL_ROW;
                        }
                        i++;
                    }
                }
                fieldStart[count] = start;
                fieldEnd[count] = i;
                count++;
                if (i < n && b[i] == d) {
                    i++;
                } else {
                    break;
                }
            }
            if (count < namedCount) {
                return GENERAL_ROW;
            }
            acceptRow(i, count);
            plainTime = time;
            plainSignal = signal;
            return PLAIN_ROW;
        }

        /**
         * Reads the next line the general way (any quoting, spacing and number form), its time and
         * signal into {@link #plainTime} and {@link #plainSignal}.
         *
         * @param rowsTaken the rows read before this one
         * @return {@link #ROW_READ}; {@link #LINE_SKIPPED} for a blank or comment line; or
         *         {@link #FOOTER_REACHED} when the line fails as a row after at least
         *         {@value #DATA_BLOCK_ROWS} rows and it and every line after it are text, not rows
         *         (an export's closing lines, such as {@code End of data}): the data end before it
         */
        private int generalRow(int timeIndex, int signalIndex, String timeName, String signalName,
                               boolean decimalComma, int rowsTaken) throws InputException {
            try {
                if (simpleRow() == GENERAL_ROW) {
                    nextLine(); // there are bytes left, so there is a line
                    if (skippable()) {
                        return LINE_SKIPPED;
                    }
                    splitRow();
                }
                plainTime = value(timeIndex, timeName, decimalComma);
                plainSignal = value(signalIndex, signalName, decimalComma);
                return ROW_READ;
            } catch (InputException rowProblem) {
                if (rowsTaken >= DATA_BLOCK_ROWS && footerFrom(lineStart)) {
                    return FOOTER_REACHED;
                }
                throw rowProblem;
            }
        }

        /**
         * True when every line from {@code start} on that is neither blank nor a comment opens with a
         * word (two or more letters, not {@code NaN} or {@code Inf…}): text after the data, which holds
         * no row that could be lost. A line opening with a digit, a sign, a point or a quote (a
         * truncated or damaged row) is not.
         */
        private boolean footerFrom(int start) {
            TextLines lines = new TextLines(b, start, n);
            while (lines.next()) {
                if (!opensWithWord(lines.first, lines.end)) {
                    return false;
                }
            }
            return true;
        }

        /** True for a line of spaces and tabs only, or a comment line. */
        private boolean skippable() {
            int i = lineStart;
            while (i < lineEnd && (b[i] == ' ' || b[i] == '\t')) {
                i++;
            }
            return i == lineEnd || b[i] == '#';
        }

        /** True once {@link #runFrom} has its columns and time unit from the header (or by position). */
        private boolean headerTaken;
        /** Where the line {@link #runFrom} took for its header (or first row) starts. */
        private int headerStart;

        /**
         * Reads the trace. Where the first line that is neither blank nor a comment is no usable
         * header (an export that opens with lines of its own, such as {@code Sample: …} or
         * {@code Operator;…}), the data block is looked for further down: the first
         * {@value #DATA_BLOCK_ROWS} consecutive rows of numbers of the same shape, with the line just
         * before them as header when it holds names only in their number of fields (and, when those
         * names name no time or signal column, the rows alone by position if that header fails).
         * The lines skipped must each open with a word and name no time column, so that neither a
         * damaged row nor a header is passed over; otherwise, or without a block, the first problem
         * stands.
         */
        Trace run(String traceName) throws InputException {
            TextSniffer.requireText(b, file);
            int start = TextFiles.bomLength(b);
            try {
                return runFrom(start, 0, traceName);
            } catch (InputException first) {
                if (headerTaken) {
                    throw first; // a usable header, and a problem in the rows: that problem is the answer
                }
                int firstStart = headerStart;
                long[] block = dataBlock(start);
                if (block == null) {
                    throw first;
                }
                // the line before the rows as header, else (a last opening line that looks like
                // names, "Operator;A. Tester") the rows alone, by position
                for (int k = 0; k < block.length; k += 2) {
                    if (block[k] <= firstStart || !openingLines(start, (int) block[k])) {
                        continue;
                    }
                    try {
                        headerless = false;
                        unitAssumed = false;
                        return runFrom((int) block[k], block[k + 1], traceName);
                    } catch (InputException again) {
                        if (headerTaken) {
                            throw again;
                        }
                    }
                }
                throw first;
            }
        }

        /**
         * Where the data block starts: {position of its header line, the line number before it},
         * followed, when that line names neither a time nor a signal column (an opening line such
         * as {@code Operator;A. Tester}), by {position of its first row, the line number before it}
         * to read by position instead; only the latter when no line before the rows holds names
         * only; null when the first {@value #MAX_PREAMBLE_LINES} lines hold no block.
         */
        private long[] dataBlock(int from) {
            List<int[]> bounds = new ArrayList<>(); // {start, end, line number}
            TextLines lines = new TextLines(b, from, n);
            while (bounds.size() < MAX_PREAMBLE_LINES && lines.next()) {
                bounds.add(new int[] {lines.start, lines.end, (int) lines.number});
            }
            for (int k = 0; k + DATA_BLOCK_ROWS <= bounds.size(); k++) {
                String row = text(bounds.get(k));
                char d = numericRowDelimiter(row);
                if (d == 0) {
                    continue;
                }
                int fields = splitText(row, d).size();
                boolean block = true;
                for (int j = 1; j < DATA_BLOCK_ROWS && block; j++) {
                    String next = text(bounds.get(k + j));
                    block = numericRowDelimiter(next) == d && splitText(next, d).size() == fields;
                }
                if (!block) {
                    continue;
                }
                int[] first = bounds.get(k);
                if (k > 0) {
                    int[] before = bounds.get(k - 1);
                    String header = text(before);
                    if (namesOnly(header, d, fields)) {
                        // a line that names a time or a signal column is a header: its problem stands
                        return namesAColumn(header, d) ? new long[] {before[0], before[2] - 1}
                                : new long[] {before[0], before[2] - 1, first[0], first[2] - 1};
                    }
                }
                return new long[] {first[0], first[2] - 1};
            }
            return null;
        }

        /** True when {@code header} splits at {@code d} into {@code fields} fields, none blank or a number. */
        private boolean namesOnly(String header, char d, int fields) {
            List<String> parts = splitText(header, d);
            if (parts.size() != fields) {
                return false;
            }
            for (String part : parts) {
                if (part.isEmpty() || !Double.isNaN(parseText(part))) {
                    return false;
                }
            }
            return true;
        }

        /**
         * True when every line from {@code from} up to {@code to} that is neither blank nor a comment
         * can be an export's opening line: it opens with a word (two or more letters, not {@code NaN}
         * or {@code Inf…}: no damaged row is skipped) and names no time column (no header is
         * skipped).
         */
        private boolean openingLines(int from, int to) {
            TextLines lines = new TextLines(b, from, to);
            while (lines.next()) {
                if (!opensWithWord(lines.first, lines.end)) {
                    return false;
                }
                String text = TextFiles.decodeLenient(b, lines.start, lines.end);
                char d = TextFiles.mostFrequentDelimiter(text);
                if (d != 0) {
                    for (String part : splitText(text, d)) {
                        if (ColumnNames.isTime(ColumnNames.parse(part))) {
                            return false;
                        }
                    }
                }
            }
            return true;
        }

        /** True when the text from {@code k} opens with a word of two or more letters, not NaN or Inf…. */
        private boolean opensWithWord(int k, int end) {
            int w = k;
            while (w < end && ((b[w] | 0x20) >= 'a' && (b[w] | 0x20) <= 'z')) {
                w++;
            }
            String word = new String(b, k, w - k, StandardCharsets.ISO_8859_1).toLowerCase(Locale.ROOT);
            return word.length() >= 2 && !word.equals("nan") && !word.startsWith("inf");
        }

        /** True when a field of {@code header} names a time or a signal column. */
        private boolean namesAColumn(String header, char d) {
            for (String part : splitText(header, d)) {
                ColumnNames.Name parsed = ColumnNames.parse(part);
                if (ColumnNames.isTime(parsed) || ColumnNames.isSignal(parsed)) {
                    return true;
                }
            }
            return false;
        }

        private String text(int[] bounds) {
            return TextFiles.decodeLenient(b, bounds[0], bounds[1]);
        }

        private Trace runFrom(int start, long lineBefore, String traceName) throws InputException {
            pos = start;
            line = lineBefore;
            headerTaken = false;
            boolean found = false;
            while (nextLine()) {
                if (!skippable()) {
                    found = true;
                    break;
                }
            }
            if (!found) {
                throw new InputException(file, 0, null, n == 0 ? "the file is empty"
                        : "the file has no header line (only blank or comment lines)");
            }
            long headerLine = line;
            headerStart = lineStart;
            String header = TextFiles.decodeLenient(b, lineStart, lineEnd);
            readHeader(header, headerLine);
            if (headerless) {
                pos = lineStart; // the first line is data: read it again as a row
                line = headerLine - 1;
            }

            int timeIndex = timeColumn(headerLine);
            int signalIndex = signalColumn(headerLine, timeIndex);
            TimeScale scale = timeScale(timeIndex, headerLine);
            headerTaken = true;
            String timeName = names.get(timeIndex);
            String signalName = names.get(signalIndex);
            boolean decimalComma = delimiter != ',';

            double[] times = new double[INITIAL_CAPACITY];
            double[] signal = new double[INITIAL_CAPACITY];
            int count = 0;
            int dataStart = pos;
            double previousRaw = Double.NaN;
            long previousLine = 0;
            InputException firstRepeat = null;
            while (true) {
                int plain = plainRow(timeIndex, signalIndex, decimalComma);
                if (plain == END_OF_BYTES) {
                    break;
                }
                double t;
                double y;
                if (plain == PLAIN_ROW) {
                    t = plainTime;
                    y = plainSignal;
                } else {
                    int general = generalRow(timeIndex, signalIndex, timeName, signalName, decimalComma, count);
                    if (general == LINE_SKIPPED) {
                        continue;
                    }
                    if (general == FOOTER_REACHED) {
                        break;
                    }
                    t = plainTime;
                    y = plainSignal;
                }
                double tS = scale.toSeconds(t);
                if (!Double.isFinite(tS)) {
                    throw new InputException(file, line, timeName, "time " + quote(timeIndex)
                            + " is too large to be converted to seconds");
                }
                if (count > 0 && !(tS > times[count - 1])) {
                    boolean repeats = t == previousRaw || tS == times[count - 1];
                    // a repeat after rows that rose is most often a time written with too few decimals
                    // for the sampling rate (minutes to three decimals are 0.06 s)
                    String hint = repeats && count > 1
                            ? "; if the time is written with too few decimals for the sampling rate, export more"
                            : "";
                    boolean rounded = repeats && count > 1 && tS == times[count - 1];
                    if (!rounded || firstRepeat == null) {
                        InputException e = new InputException(file, line, timeName, "time " + quote(timeIndex) + " "
                                + (repeats ? "repeats" : "is before") + " the previous time "
                                + shortNumber(previousRaw) + " (line " + previousLine + "); times must strictly increase"
                                + hint);
                        if (!rounded) {
                            throw e;
                        }
                        // kept for now: an even grid may explain every repeat (checked once all rows are read)
                        firstRepeat = e;
                    }
                }
                if (count == ROWS_BEFORE_ESTIMATE && pos < n) {
                    double bytesPerRow = (double) (pos - dataStart) / (count + 1); // this row included
                    long estimate = count + (long) Math.ceil(ESTIMATE_HEADROOM * (n - pos) / bytesPerRow)
                            + ESTIMATE_SLACK_ROWS;
                    int sized = (int) Math.min(estimate, MAX_ROWS);
                    if (sized > times.length) {
                        times = Arrays.copyOf(times, sized);
                        signal = Arrays.copyOf(signal, sized);
                    }
                }
                if (count == times.length) {
                    int grown = (int) Math.min(MAX_ROWS, count + (long) (count >> 1) + 1);
                    times = Arrays.copyOf(times, grown);
                    signal = Arrays.copyOf(signal, grown);
                }
                times[count] = tS;
                signal[count] = y;
                count++;
                previousRaw = t;
                previousLine = line;
            }
            if (count == 0) {
                throw new InputException(file, 0, null, "the file has a header but no data rows");
            }
            if (count == 1) {
                throw new InputException(file, previousLine, null,
                        "the file has a single data point; a trace needs at least two");
            }
            if (count < times.length) {
                times = Arrays.copyOf(times, count);
                signal = Arrays.copyOf(signal, count);
            }
            String note = "";
            if (firstRepeat != null) {
                EvenGrid grid = EvenGrid.under(times);
                if (grid == null) {
                    throw firstRepeat;
                }
                times = grid.timesS();
                note = grid.describe();
            }
            if (unitAssumed && times[count - 1] <= UNITLESS_MINUTES_LIMIT) {
                throw new InputException(file, headerLine, timeName, "the time column states no unit and ends at "
                        + shortNumber(times[count - 1]) + ", which looks like minutes rather than seconds; "
                        + "name the unit in the header (e.g. time_min or time_s) or give it as an option "
                        + "(--time-unit min or s)");
            }
            // the arrays are ours alone: hand them over rather than have the trace copy them again
            Trace trace = Trace.adopting(traceName, file, times, signal);
            return note.isEmpty() ? trace : trace.withReadingNote(note);
        }

        // ---- header ----

        private void readHeader(String header, long headerLine) throws InputException {
            char numeric = numericRowDelimiter(header);
            if (numeric != 0) {
                // no header line: the columns are known by position only
                headerless = true;
                delimiter = (byte) numeric;
                int count = splitText(header, numeric).size();
                names = new ArrayList<>(count);
                for (int k = 1; k <= count; k++) {
                    names.add("column " + k);
                }
                namedCount = count;
                fieldStart = new int[count];
                fieldEnd = new int[count];
                return;
            }
            char d = TextFiles.mostFrequentDelimiter(header);
            if (d == 0) {
                String only = unquote(header.trim());
                if (!Double.isNaN(parseText(only))) {
                    throw new InputException(file, headerLine, null, "the first line holds a number, not column "
                            + "names; add a header line such as time_s,signal");
                }
                throw new InputException(file, headerLine, null, "the header names a single column ('"
                        + clip(only) + "'); expected a time and a signal column separated by comma, "
                        + "semicolon or tab");
            }
            delimiter = (byte) d;
            names = splitText(header, d);
            namedCount = names.size();
            while (namedCount > 0 && names.get(namedCount - 1).isEmpty()) {
                namedCount--;
            }
            fieldStart = new int[names.size()];
            fieldEnd = new int[names.size()];
        }

        /**
         * The delimiter of a first line that is a row of two or more numbers, or 0 when it is not one
         * (a header, or a single number). Tab first, then semicolon, then comma: beside a tab or a
         * semicolon, a comma is a decimal comma.
         */
        private char numericRowDelimiter(String first) {
            char d = first.indexOf('\t') >= 0 ? '\t' : first.indexOf(';') >= 0 ? ';' : first.indexOf(',') >= 0 ? ',' : 0;
            if (d == 0) {
                return 0;
            }
            List<String> parts = splitText(first, d);
            if (parts.size() < 2) {
                return 0;
            }
            for (String part : parts) {
                if (part.isEmpty() || Double.isNaN(parseText(part))) {
                    return 0;
                }
            }
            return d;
        }

        private int timeColumn(long headerLine) throws InputException {
            String wanted = options.timeColumn();
            if (wanted != null) {
                return find(wanted, headerLine);
            }
            if (headerless) {
                return 0;
            }
            for (int i = 0; i < namedCount; i++) {
                if (ColumnNames.isTime(ColumnNames.parse(names.get(i)))) {
                    return i;
                }
            }
            throw new InputException(file, headerLine, "time", "no time column found (expected a name such as"
                    + " time, time_s, Time (min)); columns present: " + present()
                    + "; name the time column, or give its position (1 = first), in the options (--time-column)");
        }

        private int signalColumn(long headerLine, int timeIndex) throws InputException {
            String wanted = options.signalColumn();
            if (wanted != null) {
                int i = find(wanted, headerLine);
                if (i == timeIndex) {
                    throw new InputException(file, headerLine, names.get(i),
                            "the signal column is the same as the time column");
                }
                return i;
            }
            if (headerless) {
                if (namedCount == 2) {
                    return 1 - timeIndex;
                }
                throw new InputException(file, headerLine, "signal", "the file has no header line and " + namedCount
                        + " columns; say which column holds the signal, by its position (1 = first), in the options"
                        + " (--signal-column)");
            }
            for (int i = 0; i < namedCount; i++) {
                if (i != timeIndex && ColumnNames.isSignal(ColumnNames.parse(names.get(i)))) {
                    return i;
                }
            }
            for (int i = 0; i < namedCount; i++) {
                if (i != timeIndex && !names.get(i).isEmpty()) {
                    return i;
                }
            }
            throw new InputException(file, headerLine, "signal", "no signal column: the header names only the "
                    + "time column; columns present: " + present());
        }

        private TimeScale timeScale(int timeIndex, long headerLine) throws InputException {
            if (options.timeScale() != null) {
                return options.timeScale();
            }
            String unit = ColumnNames.parse(names.get(timeIndex)).unit();
            if (unit.isEmpty()) {
                unitAssumed = true;
                return TimeScale.SECONDS;
            }
            TimeScale s = ColumnNames.scaleOf(unit);
            if (s == null) {
                throw new InputException(file, headerLine, names.get(timeIndex), "time unit '" + unit
                        + "' is not supported; use s, min or ms in the header, or give the time unit in the options");
            }
            return s;
        }

        private int find(String wanted, long headerLine) throws InputException {
            String w = wanted.trim();
            for (int i = 0; i < namedCount; i++) {
                if (names.get(i).equalsIgnoreCase(w)) {
                    return i;
                }
            }
            for (int i = 0; i < namedCount; i++) {
                if (!names.get(i).isEmpty() && ColumnNames.matches(w, ColumnNames.parse(names.get(i)))) {
                    return i;
                }
            }
            int position = position(w);
            if (position >= 1 && position <= namedCount) {
                return position - 1;
            }
            throw new InputException(file, headerLine, wanted, "column '" + wanted + "' not found; columns present: "
                    + present() + (position > namedCount ? " (" + namedCount + " in all)" : ""));
        }

        /** A column position as written (1 = first), or -1 when the text is not a whole number. */
        private static int position(String text) {
            if (text.isEmpty() || text.length() > 6) {
                return -1;
            }
            for (int i = 0; i < text.length(); i++) {
                if (text.charAt(i) < '0' || text.charAt(i) > '9') {
                    return -1;
                }
            }
            return Integer.parseInt(text);
        }

        private String present() {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < namedCount; i++) {
                if (sb.length() > 0) {
                    sb.append(", ");
                }
                sb.append(names.get(i).isEmpty() ? "(unnamed)" : names.get(i));
            }
            return sb.toString();
        }

        // ---- rows ----

        /** Splits the current line at the delimiter; throws when the field count does not fit the header. */
        private void splitRow() throws InputException {
            int capacity = fieldStart.length;
            int count = 0;
            boolean extraContent = false;
            int i = lineStart;
            while (true) {
                int start = i;
                if (i < lineEnd && b[i] == '"') {
                    i++;
                    while (i < lineEnd && b[i] != '"') {
                        i++;
                    }
                }
                while (i < lineEnd && b[i] != delimiter) {
                    i++;
                }
                if (count < capacity) {
                    fieldStart[count] = start;
                    fieldEnd[count] = i;
                } else if (!blank(start, i)) {
                    extraContent = true;
                }
                count++;
                if (i >= lineEnd) {
                    break;
                }
                i++;
            }
            if (count < namedCount || extraContent) {
                throw rowShapeProblem(count);
            }
            for (int k = count; k < capacity; k++) {
                fieldStart[k] = lineStart;
                fieldEnd[k] = lineStart;
            }
        }

        private InputException rowShapeProblem(int count) {
            int expected = namedCount;
            String fields = "the row has " + count + (count == 1 ? " field" : " fields") + " but the header has "
                    + expected;
            String missing = count < expected ? names.get(count) : null;
            boolean unterminated = lineEnd == n;
            if (count < expected && unterminated) {
                return new InputException(file, line, missing, "the last line lacks fields (" + fields
                        + "); the file looks truncated");
            }
            for (byte other : new byte[] {',', ';', '\t'}) {
                if (other != delimiter && occurrences(other) + 1 == expected) {
                    return new InputException(file, line, missing, fields + "; the row seems to use "
                            + delimiterName(other) + " as delimiter but the header uses " + delimiterName(delimiter)
                            + " (mixed delimiters)");
                }
            }
            if (delimiter == ',' && count > expected) {
                return new InputException(file, line, null, fields + "; this looks like a decimal comma in a "
                        + "comma-delimited file: use decimal points, or separate the columns with semicolons or tabs");
            }
            return new InputException(file, line, missing, fields);
        }

        private int occurrences(byte c) {
            int k = 0;
            for (int i = lineStart; i < lineEnd; i++) {
                if (b[i] == c) {
                    k++;
                }
            }
            return k;
        }

        /** Parses field {@code index} of the current row. */
        private double value(int index, String column, boolean decimalComma) throws InputException {
            int s = fieldStart[index];
            int e = fieldEnd[index];
            while (s < e && (b[s] == ' ' || b[s] == '\t')) {
                s++;
            }
            while (e > s && (b[e - 1] == ' ' || b[e - 1] == '\t')) {
                e--;
            }
            if (e - s >= 2 && b[s] == '"' && b[e - 1] == '"') {
                s++;
                e--;
            }
            if (s == e) {
                throw new InputException(file, line, column, "the value is empty");
            }
            double v = FastDoubleParser.parse(b, s, e, decimalComma);
            if (Double.isNaN(v)) {
                String text = TextFiles.decodeLenient(b, s, e);
                String lower = text.toLowerCase(Locale.ROOT).replace("+", "").replace("-", "");
                if (lower.equals("nan") || lower.startsWith("inf") || lower.contains("#inf")) {
                    throw new InputException(file, line, column, "'" + clip(text)
                            + "' is not allowed: values must be finite numbers");
                }
                throw new InputException(file, line, column, "'" + clip(text) + "' is not a number");
            }
            if (Double.isInfinite(v)) {
                throw new InputException(file, line, column, "'" + clip(TextFiles.decodeLenient(b, s, e))
                        + "' is too large for a double (overflows to infinity)");
            }
            return v;
        }

        private String quote(int index) {
            String text = TextFiles.decodeLenient(b, fieldStart[index], fieldEnd[index]).trim();
            return clip(text);
        }

        private boolean blank(int s, int e) {
            for (int i = s; i < e; i++) {
                if (b[i] != ' ' && b[i] != '\t') {
                    return false;
                }
            }
            return true;
        }

        private double parseText(String s) {
            byte[] bytes = s.trim().getBytes(StandardCharsets.ISO_8859_1);
            return FastDoubleParser.parse(bytes, 0, bytes.length, true);
        }
    }

    // ---- text helpers ----

    /** Splits at {@code d} outside quotes; each part trimmed and unquoted. */
    static List<String> splitText(String text, char d) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '"') {
                quoted = !quoted;
                cur.append(c);
            } else if (c == d && !quoted) {
                out.add(unquote(cur.toString().trim()));
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        out.add(unquote(cur.toString().trim()));
        return out;
    }

    private static String unquote(String s) {
        if (s.length() >= 2 && s.charAt(0) == '"' && s.charAt(s.length() - 1) == '"') {
            return s.substring(1, s.length() - 1).replace("\"\"", "\"").trim();
        }
        return s;
    }

    static String delimiterName(byte d) {
        switch (d) {
            case '\t':
                return "tab";
            case ';':
                return "semicolon";
            default:
                return "comma";
        }
    }

    private static String clip(String s) {
        return s.length() <= MAX_QUOTED_CHARS ? s : s.substring(0, MAX_QUOTED_CHARS) + "…";
    }

    private static String shortNumber(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
