package org.mobident.assess;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.mobident.InputException;
import org.mobident.io.Suggestions;
import org.mobident.io.TableReader;
import org.mobident.io.TableRow;
import org.mobident.io.TableSpec;
import org.mobident.io.TextFiles;

/**
 * Reads a known-identities table (the shared format of the bench generator and the scoring).
 *
 * <h2>Format</h2>
 * <ul>
 *   <li>Comma-delimited, UTF-8 (a leading byte-order mark is skipped); blank lines and lines
 *       starting with {@code #} are skipped; the first other line is the header. Read with
 *       {@link TableReader}.</li>
 *   <li>Columns, any order, header names in any case: {@code run} (required), {@code kind}
 *       ({@code analyte}, {@code foreign}, {@code marker} or {@code spike}; empty means
 *       {@code analyte}), {@code analyte} (the library name; required on analyte rows, a free label
 *       on the others), {@code time_s} (true migration time in s, &gt; 0), {@code mobility} (true
 *       effective mobility at the library temperature, 1e-9 m²/(V s), signed) and {@code height_sd}
 *       (zone height over the run's noise SD, ≥ 0). Any other column is refused with a "did you
 *       mean" hint.</li>
 *   <li>Numbers use a decimal point; an empty cell is unknown.</li>
 *   <li>Within a run, an analyte appears at most once (names compared without regard to case) and
 *       there is at most one marker row.</li>
 * </ul>
 * Every problem raises an {@link InputException} naming the file, the 1-based line and the column.
 */
public final class KnownIdentitiesReader {

    static final String RUN = "run";
    static final String KIND = "kind";
    static final String ANALYTE = "analyte";
    static final String TIME_S = "time_s";
    static final String MOBILITY = "mobility";
    static final String HEIGHT_SD = "height_sd";

    /** The columns of the format, in documentation order. */
    public static final List<String> COLUMNS = List.of(RUN, KIND, ANALYTE, TIME_S, MOBILITY, HEIGHT_SD);
    /** Free text a lab may keep beside each row (what was spiked, at what concentration); not read. */
    static final String NOTE = "note";

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    /** The table as the table reader expects it. */
    private static final TableSpec SPEC = TableSpec.of("known-identities table",
                    java.util.stream.Stream.concat(COLUMNS.stream(), java.util.stream.Stream.of(NOTE)).toList(),
                    List.of(RUN))
            .listingPresentColumns().withSniffedDelimiter();

    private KnownIdentitiesReader() {
    }

    /**
     * Reads a known-identities file.
     *
     * @throws InputException when it cannot be read or any line or cell is invalid
     */
    public static KnownIdentities read(Path file) throws InputException {
        return new Parse(file.toString()).run(TableReader.open(file, SPEC));
    }

    /**
     * Reads a known-identities table from text.
     *
     * @param text  the table
     * @param label the file name used in messages and as {@link KnownIdentities#source()}
     * @throws InputException when any line or cell is invalid
     */
    public static KnownIdentities read(String text, String label) throws InputException {
        return new Parse(label).run(TableReader.open(new StringReader(text), label, SPEC));
    }

    /** State of one parse; not shared. */
    private static final class Parse {
        private final String file;
        private final List<KnownIdentity> rows = new ArrayList<>();
        /** "run / analyte key" or "run / marker" → line of first appearance. */
        private final Map<String, Long> firstLine = new HashMap<>();

        /** A semicolon- or tab-delimited table (as spreadsheets write it) may use decimal commas. */
        private boolean decimalComma;

        Parse(String file) {
            this.file = file;
        }

        KnownIdentities run(TableReader opened) throws InputException {
            try (TableReader table = opened) {
                decimalComma = table.delimiter() != ',';
                List<String> header = table.headerCells();
                for (int k = 0; k < header.size(); k++) {
                    if (header.get(k).isEmpty()) {
                        throw new InputException(file, table.headerLine(), "column " + (k + 1),
                                "a column has no name in the header");
                    }
                }
                for (TableRow row = table.next(); row != null; row = table.next()) {
                    row(row);
                }
            }
            if (rows.isEmpty()) {
                throw new InputException(file, 0, null, "the known-identities table has a header but no rows");
            }
            return new KnownIdentities(file, rows);
        }

        private void row(TableRow row) throws InputException {
            long lineNo = row.line();
            Map<String, String> v = new HashMap<>();
            for (String column : COLUMNS) {
                if (row.has(column)) {
                    v.put(column, row.get(column));
                }
            }
            String run = v.get(RUN);
            if (run.isEmpty()) {
                throw new InputException(file, lineNo, RUN, "the run name is empty");
            }
            String kindText = v.getOrDefault(KIND, "");
            KnownKind kind = kindText.isEmpty() ? KnownKind.ANALYTE : KnownKind.parse(kindText);
            if (kind == null) {
                throw new InputException(file, lineNo, KIND, "unknown kind '" + kindText + "'"
                        + Suggestions.didYouMean(kindText, KnownKind.labels()) + "; expected one of "
                        + String.join(", ", KnownKind.labels()));
            }
            String name = v.getOrDefault(ANALYTE, "");
            if (kind == KnownKind.ANALYTE && name.isEmpty()) {
                throw new InputException(file, lineNo, ANALYTE, "an analyte row needs the library name of the "
                        + "analyte");
            }
            double time = number(v, TIME_S, lineNo);
            if (time <= 0) {
                throw new InputException(file, lineNo, TIME_S, "a migration time is positive, got " + v.get(TIME_S));
            }
            double mobility = number(v, MOBILITY, lineNo);
            double height = number(v, HEIGHT_SD, lineNo);
            if (height < 0) {
                throw new InputException(file, lineNo, HEIGHT_SD, "a height over the noise SD cannot be negative, got "
                        + v.get(HEIGHT_SD));
            }
            once(run, kind, name, lineNo);
            rows.add(new KnownIdentity(lineNo, run, kind, name.isEmpty() ? null : name, time, mobility, height));
        }

        /** Refuses a second row of the same analyte, or a second marker, in one run. */
        private void once(String run, KnownKind kind, String name, long lineNo) throws InputException {
            String what;
            if (kind == KnownKind.ANALYTE) {
                what = "analyte '" + name + "'";
            } else if (kind == KnownKind.MARKER) {
                what = "a marker row";
            } else {
                return;
            }
            String key = run + "\u0000" + (kind == KnownKind.ANALYTE ? KnownIdentity.key(name) : "\u0001marker");
            Long earlier = firstLine.putIfAbsent(key, lineNo);
            if (earlier != null) {
                throw new InputException(file, lineNo, kind == KnownKind.ANALYTE ? ANALYTE : KIND, "run '" + run
                        + "' has " + what + " twice (lines " + earlier + " and " + lineNo + ")");
            }
        }

        /** The cell as a finite number, NaN when empty or the column is absent. */
        private double number(Map<String, String> v, String column, long lineNo) throws InputException {
            String raw = v.getOrDefault(column, "");
            if (raw.isEmpty()) {
                return Double.NaN;
            }
            String s = raw.replace(TextFiles.UNICODE_MINUS, '-');
            if (decimalComma) {
                s = s.replace(',', '.');
            }
            if (!DECIMAL.matcher(s).matches()) {
                throw new InputException(file, lineNo, column, "expected a number with a decimal point, got '"
                        + raw + "'");
            }
            double d = Double.parseDouble(s);
            if (!Double.isFinite(d)) {
                throw new InputException(file, lineNo, column, "the number '" + raw + "' is out of range");
            }
            return d;
        }
    }
}
