package org.mobident.library;

import java.io.IOException;
import java.io.Reader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.mobident.InputException;
import org.mobident.io.TableReader;
import org.mobident.io.TableRow;
import org.mobident.io.TableSpec;
import org.mobident.io.TextFiles;
import org.mobident.text.NumberText;

/**
 * Reads and writes mobility libraries as human-editable CSV.
 *
 * <h2>Format</h2>
 * <ul>
 *   <li>UTF-8 (a leading byte-order mark is tolerated), comma-delimited, double quotes around
 *       fields that contain commas, quotes or line breaks (RFC 4180), read with {@link TableReader}.
 *       A library a spreadsheet wrote with semicolons or tabs is read too, with decimal commas.</li>
 *   <li>Lines whose first character is {@code #} are comments; their text (without the {@code #}
 *       and surrounding spaces) becomes {@link Library#notes()}, in file order, and is written back
 *       at the top of the file. Blank lines, and lines of nothing but commas, are ignored.</li>
 *   <li>The first other line is the header. Column names are matched without regard to case or
 *       surrounding spaces and may come in any order; only {@code name} and {@code mobility} are
 *       required. Known columns: {@code name, mobility, mobility_sd, n, charge, tolerance, pka,
 *       limiting_mobility, buffer, ph, ionic_strength_mm, temperature_c, source,
 *       internal_standard, session_sd}. Any other column is an error.</li>
 *   <li>{@code internal_standard} is {@code yes} (or {@code true}, {@code 1}) for an analyte the
 *       lab adds to every run so that it pins the run's mobility scale; empty or {@code no}
 *       otherwise. {@code session_sd} is the spread between measuring sessions, in mobility units.</li>
 *   <li>An analyte name may appear once per buffer label; a second row with the same name and
 *       the same (or no) buffer is an error.</li>
 *   <li>Mobilities (and {@code mobility_sd}, {@code tolerance}, {@code limiting_mobility}) are in
 *       1e-9 m²/(V·s), signed: cations positive, anions negative. {@code pka} and
 *       {@code limiting_mobility} hold several numbers separated by spaces, e.g.
 *       {@code 2.15 7.20 12.35}.</li>
 *   <li>Numbers use a decimal point and an optional exponent ({@code 1e-3}); the typographic minus
 *       sign (U+2212) is accepted. NaN and infinities are rejected. An empty optional field means
 *       "unknown" (NaN for measures, 0 for {@code n} and {@code charge}, null for text).</li>
 *   <li>Text fields are trimmed; an empty text field reads as null.</li>
 * </ul>
 *
 * <p>Every problem raises an {@link InputException} naming the file, the 1-based line and the
 * column. {@code read(write(library))} reproduces the library exactly (entries and notes) as long
 * as its text values carry no surrounding spaces and no empty strings, and its notes are single,
 * trimmed lines; numbers are written in their shortest round-tripping decimal form.
 */
public final class LibraryCsv {

    private static final char COMMENT = '#';
    /** A plain decimal number with optional sign, fraction and exponent (no NaN, hex or suffix). */
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final String RECORD_SEPARATOR = "\n";
    private static final Pattern LIST_SEPARATOR = Pattern.compile("\\s+");
    /** The library as the table reader expects it. */
    private static final TableSpec SPEC = TableSpec.of("library file",
            Arrays.stream(LibraryColumn.values()).map(LibraryColumn::header).toList(),
            List.of(LibraryColumn.NAME.header(), LibraryColumn.MOBILITY.header())).withSniffedDelimiter();
    private static final CSVFormat WRITE_FORMAT = CSVFormat.DEFAULT.builder()
            .setCommentMarker(COMMENT)
            .setRecordSeparator(RECORD_SEPARATOR)
            .get();

    private LibraryCsv() {
    }

    /**
     * Reads a library file.
     *
     * @param file the CSV file; its name is used in messages and as {@link Library#sourceFile()}
     * @return the library, entries in file order
     * @throws InputException when the file cannot be read or any line is invalid
     */
    public static Library read(Path file) throws InputException {
        return new Parse(file.toString()).run(TableReader.open(file, SPEC));
    }

    /**
     * Reads a library from text.
     *
     * @param in          the CSV text (not closed)
     * @param sourceLabel the name used in messages and as {@link Library#sourceFile()}
     * @return the library, entries in file order
     * @throws InputException when the text cannot be read or any line is invalid
     */
    public static Library read(Reader in, String sourceLabel) throws InputException {
        return new Parse(sourceLabel).run(TableReader.open(in, sourceLabel, SPEC));
    }

    /**
     * Writes a library as CSV: its notes as comment lines, a header, then one analyte per line.
     * Columns that no entry uses are left out (only {@code name, mobility, mobility_sd} are always
     * written). The writer is flushed but not closed.
     *
     * @param library the library
     * @param out     where to write
     * @throws IOException              when writing fails
     * @throws IllegalArgumentException when a value is infinite (it could not be read back)
     */
    public static void write(Library library, Writer out) throws IOException {
        List<LibraryColumn> columns = usedColumns(library.entries());
        for (String note : library.notes()) {
            for (String line : note.split("\r\n|\r|\n", -1)) {
                out.write(line.isBlank() ? "#" : "# " + line.trim());
                out.write(RECORD_SEPARATOR);
            }
        }
        CSVPrinter printer = new CSVPrinter(out, WRITE_FORMAT);
        List<String> header = new ArrayList<>();
        for (LibraryColumn c : columns) {
            header.add(c.header());
        }
        printer.printRecord(header);
        for (LibraryEntry e : library.entries()) {
            List<String> row = new ArrayList<>(columns.size());
            for (LibraryColumn c : columns) {
                row.add(cell(e, c));
            }
            printer.printRecord(row);
        }
        printer.flush();
    }

    /**
     * Writes a library to a file (UTF-8, no byte-order mark), replacing it.
     *
     * @param library the library
     * @param file    the target file
     * @throws IOException when writing fails
     */
    public static void write(Library library, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            write(library, w);
        }
    }

    /** The library as CSV text, exactly as {@link #write(Library, Writer)} writes it. */
    public static String toCsv(Library library) {
        StringWriter w = new StringWriter();
        try {
            write(library, w);
        } catch (IOException e) {
            throw new UncheckedIOException("a StringWriter does not fail", e);
        }
        return w.toString();
    }

    /**
     * A number of the library file: {@link NumberText#roundTrip}, so it reads back to the same
     * double ({@code -55.43}, {@code 0.001}, {@code 25}, {@code 1.5e-7}); empty for NaN, and an
     * infinite value is refused.
     */
    static String formatNumber(double v) {
        if (Double.isInfinite(v)) {
            throw new IllegalArgumentException("an infinite value cannot be written to a library file");
        }
        return NumberText.roundTrip(v, "");
    }

    /**
     * A value computed for a library file (a mean, an SD) to {@value #COMPUTED_DIGITS} significant
     * digits: a person reads and edits the file, a mobility's sixth digit (10⁻⁴ units) lies far
     * below any uncertainty it carries, and 17 digits suggest a precision nobody has. The writer
     * itself stays exact ({@link #formatNumber}), so what is rounded here reads back unchanged.
     */
    public static double computedValue(double v) {
        if (!Double.isFinite(v) || v == 0) {
            return v;
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(COMPUTED_DIGITS)).doubleValue();
    }

    /** Significant digits of the values a build or a merge computes for a library file. */
    public static final int COMPUTED_DIGITS = 6;

    private static String formatList(List<Double> values) {
        StringBuilder sb = new StringBuilder();
        for (Double v : values) {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            if (v == null || Double.isNaN(v)) {
                throw new IllegalArgumentException("a missing value inside a list cannot be written");
            }
            sb.append(formatNumber(v));
        }
        return sb.toString();
    }

    private static List<LibraryColumn> usedColumns(List<LibraryEntry> entries) {
        Set<LibraryColumn> used = EnumSet.of(LibraryColumn.NAME, LibraryColumn.MOBILITY, LibraryColumn.MOBILITY_SD);
        for (LibraryEntry e : entries) {
            for (LibraryColumn c : LibraryColumn.values()) {
                if (!cell(e, c).isEmpty()) {
                    used.add(c);
                }
            }
        }
        return new ArrayList<>(used);
    }

    private static String cell(LibraryEntry e, LibraryColumn c) {
        return switch (c) {
            case NAME -> text(e.name());
            case MOBILITY -> formatNumber(e.mobility());
            case MOBILITY_SD -> formatNumber(e.mobilitySd());
            case N -> e.n() == 0 ? "" : Integer.toString(e.n());
            case CHARGE -> e.charge() == 0 ? "" : Integer.toString(e.charge());
            case TOLERANCE -> formatNumber(e.tolerance());
            case PKA -> formatList(e.pKa());
            case LIMITING_MOBILITY -> formatList(e.limitingMobilities());
            case BUFFER -> text(e.buffer());
            case PH -> formatNumber(e.pH());
            case IONIC_STRENGTH_MM -> formatNumber(e.ionicStrengthMm());
            case TEMPERATURE_C -> formatNumber(e.temperatureC());
            case SOURCE -> text(e.source());
            case INTERNAL_STANDARD -> e.internalStandard() ? "yes" : "";
            case SESSION_SD -> formatNumber(e.sessionSd());
        };
    }

    private static String text(String s) {
        return s == null ? "" : s;
    }

    /** One reading of one library: keeps the location for messages. */
    private static final class Parse {
        private final String file;
        private final List<String> notes = new ArrayList<>();
        private final List<LibraryEntry> entries = new ArrayList<>();
        private final List<Long> lines = new ArrayList<>();
        private final Map<String, Long> lineOfName = new HashMap<>();
        private long line;
        /** A semicolon- or tab-delimited library (as spreadsheets write it) may use decimal commas. */
        private boolean decimalComma;

        Parse(String file) {
            this.file = file;
        }

        Library run(TableReader opened) throws InputException {
            try (TableReader table = opened) {
                decimalComma = table.delimiter() != ',';
                for (TableRow row = table.next(); row != null; row = table.next()) {
                    line = row.line();
                    entries.add(entry(row));
                    lines.add(line);
                }
                notes.addAll(table.comments());
            }
            if (entries.isEmpty()) {
                throw new InputException(file, 0, null, "the library has a header but no analytes");
            }
            return new Library(entries, file, notes, lines);
        }

        private LibraryEntry entry(TableRow row) throws InputException {
            Map<LibraryColumn, String> v = new EnumMap<>(LibraryColumn.class);
            for (LibraryColumn c : LibraryColumn.values()) {
                if (row.has(c.header())) {
                    v.put(c, row.get(c.header()));
                }
            }
            String name = v.getOrDefault(LibraryColumn.NAME, "");
            if (name.isEmpty()) {
                throw new InputException(file, line, LibraryColumn.NAME.header(), "the analyte name is empty");
            }
            String mob = v.getOrDefault(LibraryColumn.MOBILITY, "");
            if (mob.isEmpty()) {
                throw new InputException(file, line, LibraryColumn.MOBILITY.header(),
                        "the mobility of '" + name + "' is missing");
            }
            double mobility = number(LibraryColumn.MOBILITY, mob);
            double sd = optionalNumber(v, LibraryColumn.MOBILITY_SD);
            requireNotNegative(LibraryColumn.MOBILITY_SD, sd);
            int n = optionalInteger(v, LibraryColumn.N);
            if (n < 0) {
                throw new InputException(file, line, LibraryColumn.N.header(), "n must not be negative, got " + n);
            }
            int charge = optionalInteger(v, LibraryColumn.CHARGE);
            double tolerance = optionalNumber(v, LibraryColumn.TOLERANCE);
            if (tolerance <= 0) {
                throw new InputException(file, line, LibraryColumn.TOLERANCE.header(),
                        "the tolerance must be positive (or empty to use the matching rule), got "
                                + v.get(LibraryColumn.TOLERANCE));
            }
            List<Double> pKa = numberList(v, LibraryColumn.PKA);
            List<Double> limiting = numberList(v, LibraryColumn.LIMITING_MOBILITY);
            String buffer = optionalText(v, LibraryColumn.BUFFER);
            double pH = optionalNumber(v, LibraryColumn.PH);
            double ionic = optionalNumber(v, LibraryColumn.IONIC_STRENGTH_MM);
            requireNotNegative(LibraryColumn.IONIC_STRENGTH_MM, ionic);
            double temperature = optionalNumber(v, LibraryColumn.TEMPERATURE_C);
            String source = optionalText(v, LibraryColumn.SOURCE);
            boolean internalStandard = yesNo(v, LibraryColumn.INTERNAL_STANDARD);
            double sessionSd = optionalNumber(v, LibraryColumn.SESSION_SD);
            requireNotNegative(LibraryColumn.SESSION_SD, sessionSd);
            LibraryEntry entry = new LibraryEntry(name, mobility, sd, n, charge, tolerance, pKa, limiting, buffer, pH,
                    ionic, temperature, source, internalStandard, sessionSd);
            Long earlier = lineOfName.putIfAbsent(Library.key(entry), line);
            if (earlier != null) {
                throw new InputException(file, line, LibraryColumn.NAME.header(),
                        "duplicate analyte name '" + name + "'" + (buffer == null ? "" : " in buffer " + buffer)
                                + " (lines " + earlier + " and " + line + "); the same name may appear once per buffer");
            }
            return entry;
        }

        private boolean yesNo(Map<LibraryColumn, String> v, LibraryColumn c) throws InputException {
            String s = v.getOrDefault(c, "").toLowerCase(java.util.Locale.ROOT);
            return switch (s) {
                case "", "no", "false", "0" -> false;
                case "yes", "true", "1" -> true;
                default -> throw new InputException(file, line, c.header(),
                        "expected yes or no (or empty), got '" + v.get(c) + "'");
            };
        }

        private void requireNotNegative(LibraryColumn c, double value) throws InputException {
            if (value < 0) {
                throw new InputException(file, line, c.header(), c.header() + " must not be negative, got "
                        + formatNumber(value));
            }
        }

        private static String optionalText(Map<LibraryColumn, String> v, LibraryColumn c) {
            String s = v.getOrDefault(c, "");
            return s.isEmpty() ? null : s;
        }

        private double optionalNumber(Map<LibraryColumn, String> v, LibraryColumn c) throws InputException {
            String s = v.getOrDefault(c, "");
            return s.isEmpty() ? Double.NaN : number(c, s);
        }

        private int optionalInteger(Map<LibraryColumn, String> v, LibraryColumn c) throws InputException {
            String s = v.getOrDefault(c, "");
            if (s.isEmpty()) {
                return 0;
            }
            double d = number(c, s);
            if (d != Math.rint(d) || Math.abs(d) > Integer.MAX_VALUE) {
                throw new InputException(file, line, c.header(), "expected a whole number, got '" + s + "'");
            }
            return (int) d;
        }

        private List<Double> numberList(Map<LibraryColumn, String> v, LibraryColumn c) throws InputException {
            String s = v.getOrDefault(c, "");
            if (s.isEmpty()) {
                return List.of();
            }
            List<Double> out = new ArrayList<>();
            for (String part : LIST_SEPARATOR.split(s)) {
                out.add(number(c, part));
            }
            return out;
        }

        private double number(LibraryColumn c, String raw) throws InputException {
            String s = raw.trim().replace(TextFiles.UNICODE_MINUS, '-');
            if (decimalComma) {
                s = s.replace(',', '.');
            }
            if (!DECIMAL.matcher(s).matches()) {
                String hint = c == LibraryColumn.PKA || c == LibraryColumn.LIMITING_MOBILITY
                        ? " (separate several values with spaces)" : "";
                throw new InputException(file, line, c.header(), "expected a number, got '" + raw + "'" + hint);
            }
            double d = Double.parseDouble(s);
            if (!Double.isFinite(d)) {
                throw new InputException(file, line, c.header(), "the number '" + raw + "' is out of range");
            }
            return d;
        }
    }
}
