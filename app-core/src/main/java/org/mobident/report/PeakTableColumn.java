package org.mobident.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;
import org.mobident.io.TextFiles;

/**
 * The peak table's columns, in output order: the one definition of the format that the CSV and
 * JSON writers ({@link PeakTableCsv}, {@link PeakTableJson}, and the workbook's peak sheet) write
 * and the reader ({@code recheck.PeakTableReader}, used by {@code recheck} and {@code assess})
 * reads. Each column has its header name, the {@link Format} its values are written in and read
 * back with, and whether it describes the whole run (repeated on each of the run's rows in CSV,
 * stated once per run in JSON). The words of the {@code status} column are {@link PeakTableStatus}.
 *
 * <p>Columns added later come at the end, just before {@code note}, so that the earlier ones keep
 * their order: {@code centre_time_s} and {@code centre_time_sd_s} (the zone's first moment and its
 * uncertainty), {@code sn_class} (where the S/N stands against the detection and quantitation
 * limits) and the run's scale correction {@code scale_factor … scale_offset_sd}.
 */
public enum PeakTableColumn {
    RUN("run", Format.TEXT, Scope.RUN, true, "run"),
    SAMPLE("sample", Format.TEXT, Scope.RUN, false, "sample"),
    PEAK("peak", Format.INTEGER, Scope.PEAK, true, "peak"),
    ROLE("role", Format.TEXT, Scope.PEAK, true, "role"),
    APEX_TIME_S("apex_time_s", Format.TIME, Scope.PEAK, false, "apex time (s)"),
    APEX_TIME_SD_S("apex_time_sd_s", Format.TIME, Scope.PEAK, false, "apex time SD (s)"),
    START_S("start_s", Format.TIME, Scope.PEAK, false, "start (s)"),
    END_S("end_s", Format.TIME, Scope.PEAK, false, "end (s)"),
    HEIGHT("height", Format.MAGNITUDE, Scope.PEAK, false, "height (signal)"),
    AREA("area", Format.MAGNITUDE, Scope.PEAK, false, "area (signal·s)"),
    CORRECTED_AREA("corrected_area", Format.MAGNITUDE, Scope.PEAK, false, "corrected area A/t (signal)"),
    WIDTH_HALF_S("width_half_s", Format.TIME, Scope.PEAK, false, "width at half height (s)"),
    PLATES("plates", Format.INTEGER, Scope.PEAK, false, "plates"),
    RESOLUTION("resolution", Format.RESOLUTION, Scope.PEAK, false, "resolution"),
    SIGNAL_TO_NOISE("signal_to_noise", Format.SIGNAL_TO_NOISE, Scope.PEAK, false, "S/N"),
    DIRECTION("direction", Format.TEXT, Scope.PEAK, false, "direction"),
    MOBILITY("mobility", Format.MOBILITY, Scope.PEAK, true, "mobility (" + Label.MOBILITY_UNIT + ")"),
    MOBILITY_SD("mobility_sd", Format.MOBILITY, Scope.PEAK, true, "mobility SD (" + Label.MOBILITY_UNIT + ")"),
    MOBILITY_AT_LIBRARY_TEMP("mobility_at_library_temp", Format.MOBILITY, Scope.PEAK, true,
            "mobility at library temperature (" + Label.MOBILITY_UNIT + ")"),
    MOBILITY_CORRECTED("mobility_corrected", Format.MOBILITY, Scope.PEAK, false,
            "mobility compared with library (" + Label.MOBILITY_UNIT + ")"),
    ASSIGNED("assigned", Format.TEXT, Scope.PEAK, true, "assigned"),
    CONFIDENCE("confidence", Format.PROBABILITY, Scope.PEAK, true, "confidence (fraction)"),
    STATUS("status", Format.TEXT, Scope.PEAK, true, "status"),
    RUNNER_UP("runner_up", Format.TEXT, Scope.PEAK, false, "runner-up"),
    RUNNER_UP_PROBABILITY("runner_up_probability", Format.PROBABILITY, Scope.PEAK, false,
            "runner-up probability (fraction)"),
    CANDIDATES("candidates", Format.TEXT, Scope.PEAK, false, "candidates (name:probability)"),
    CENTRE_TIME_S("centre_time_s", Format.TIME, Scope.PEAK, false, "centre time (s)"),
    CENTRE_TIME_SD_S("centre_time_sd_s", Format.TIME, Scope.PEAK, false, "centre time SD (s)"),
    SN_CLASS("sn_class", Format.TEXT, Scope.PEAK, false, "S/N class"),
    SCALE_FACTOR("scale_factor", Format.FACTOR, Scope.RUN, false, "scale factor a"),
    SCALE_FACTOR_SD("scale_factor_sd", Format.FACTOR, Scope.RUN, false, "scale factor a SD"),
    SCALE_OFFSET("scale_offset", Format.MOBILITY, Scope.RUN, false, "scale offset b (" + Label.MOBILITY_UNIT + ")"),
    SCALE_OFFSET_SD("scale_offset_sd", Format.MOBILITY, Scope.RUN, false,
            "scale offset b SD (" + Label.MOBILITY_UNIT + ")"),
    NOTE("note", Format.TEXT, Scope.PEAK, false, "note");

    /** Constants the column labels use (a holder, since enum constants cannot use the enum's own). */
    private static final class Label {
        static final String MOBILITY_UNIT = "1e-9 m²/(V·s)";
    }

    /** Whether a column describes one peak or the whole run. */
    public enum Scope {
        /** A value of the peak (or of the run's single failed/no-peaks row). */
        PEAK,
        /** A value of the whole run, repeated on each of its rows in CSV. */
        RUN
    }

    /**
     * How a column's values are written and read back. All numbers are written with
     * {@link Locale#ROOT} (decimal point, no grouping); a value that is not finite is an empty
     * cell (CSV) or {@code null} (JSON), and a value that rounds to zero has no minus sign.
     * Reading accepts a decimal number with an optional exponent and the typographic minus sign
     * (U+2212); an empty cell reads as NaN.
     */
    public enum Format {
        /** Free text: made spreadsheet-safe in CSV ({@link CsvCells#inert}), read back without that guard. */
        TEXT(-1, -1),
        /** A whole number. */
        INTEGER(0, -1),
        /** Times in s, 4 decimals. */
        TIME(4, -1),
        /** Mobilities in 1e-9 m²/(V s), 3 decimals. */
        MOBILITY(3, -1),
        /** Probabilities as fractions, 3 decimals. */
        PROBABILITY(3, -1),
        /** Height, area and corrected area: 6 significant digits. */
        MAGNITUDE(-1, 6),
        /** Resolution, 2 decimals. */
        RESOLUTION(2, -1),
        /** Signal-to-noise ratio, 1 decimal. */
        SIGNAL_TO_NOISE(1, -1),
        /** The run's scale factor a and its SD, 5 decimals. */
        FACTOR(5, -1);

        private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

        private final int decimals;
        private final int significantDigits;

        Format(int decimals, int significantDigits) {
            this.decimals = decimals;
            this.significantDigits = significantDigits;
        }

        /** True for the numeric formats. */
        public boolean numeric() {
            return this != TEXT;
        }

        /** The number as written, or null when it is not finite (an empty cell). */
        public String write(double value) {
            if (!numeric()) {
                throw new IllegalStateException("a text column holds no numbers");
            }
            return significantDigits > 0 ? Numbers.significant(value, significantDigits)
                    : Numbers.fixed(value, decimals);
        }

        /**
         * A cell read back as a number: NaN when empty (or null).
         *
         * @throws NumberFormatException when the cell holds something else than a finite decimal
         *                               number (the message says what was wrong)
         */
        public double read(String cell) {
            String s = cell == null ? "" : cell.strip();
            if (s.isEmpty()) {
                return Double.NaN;
            }
            String plain = s.replace(TextFiles.UNICODE_MINUS, '-');
            if (!DECIMAL.matcher(plain).matches()) {
                throw new NumberFormatException("expected a number, got '" + s + "'");
            }
            double v = Double.parseDouble(plain);
            if (!Double.isFinite(v)) {
                throw new NumberFormatException("the number '" + s + "' is out of range");
            }
            return v;
        }

        /**
         * A text cell read back: stripped, without the apostrophe that {@link CsvCells#inert} put
         * before text a spreadsheet would take for a formula; null when empty (or null).
         */
        public static String readText(String cell) {
            if (cell == null) {
                return null;
            }
            String s = cell.strip();
            if (s.length() > 1 && s.charAt(0) == CsvCells.TEXT_PREFIX && CsvCells.startsDangerously(s.substring(1))) {
                s = s.substring(1);
            }
            return s.isEmpty() ? null : s;
        }

        /**
         * How far a value read back may lie from the value written: half a unit in the last place
         * written (for significant digits, of the written value's own magnitude). 0 for text.
         */
        public double halfUnit(double value) {
            if (!numeric()) {
                return 0;
            }
            if (significantDigits > 0) {
                if (value == 0 || !Double.isFinite(value)) {
                    return 0;
                }
                int exponent = (int) Math.floor(Math.log10(Math.abs(value)));
                return 0.5 * Math.pow(10, exponent - significantDigits + 1);
            }
            return 0.5 * Math.pow(10, -decimals);
        }
    }

    /** The mobility unit as the labels write it. */
    public static final String MOBILITY_UNIT = Label.MOBILITY_UNIT;

    private final String header;
    private final String label;
    private final Format format;
    private final Scope scope;
    private final boolean requiredToRead;

    PeakTableColumn(String header, Format format, Scope scope, boolean requiredToRead, String label) {
        this.header = header;
        this.label = label;
        this.format = format;
        this.scope = scope;
        this.requiredToRead = requiredToRead;
    }

    /** The header name as written. */
    public String header() {
        return header;
    }

    /**
     * The header for people, with its unit (the results workbook's peak sheet): "apex time (s)";
     * the CSV name stays recognisable in it.
     */
    public String label() {
        return label;
    }

    /** How the column's values are written and read back. */
    public Format format() {
        return format;
    }

    /** Whether the column describes one peak or the whole run. */
    public Scope scope() {
        return scope;
    }

    /**
     * True for the columns a reader needs (run, peak, role, mobility, mobility_sd,
     * mobility_at_library_temp, assigned, confidence, status); the others are read when present.
     */
    public boolean requiredToRead() {
        return requiredToRead;
    }

    /** The value written in this column's numeric format (null: an empty cell). */
    public String write(double value) {
        return format.write(value);
    }

    /** The column a header cell names (any case, surrounding spaces ignored), if any. */
    public static Optional<PeakTableColumn> fromHeader(String cell) {
        String key = cell.strip().toLowerCase(Locale.ROOT);
        for (PeakTableColumn c : values()) {
            if (c.header.equals(key)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    /** All header names in output order. */
    public static List<String> headers() {
        return HEADERS;
    }

    /** The header names of the columns a reader needs, in output order. */
    public static List<String> requiredHeaders() {
        return REQUIRED_HEADERS;
    }

    /** The numeric columns that describe the whole run (the scale correction), in output order. */
    public static List<PeakTableColumn> runValues() {
        return RUN_VALUES;
    }

    private static final List<String> HEADERS = Arrays.stream(values()).map(PeakTableColumn::header).toList();
    private static final List<String> REQUIRED_HEADERS = Arrays.stream(values())
            .filter(PeakTableColumn::requiredToRead).map(PeakTableColumn::header).toList();
    private static final List<PeakTableColumn> RUN_VALUES;

    static {
        List<PeakTableColumn> run = new ArrayList<>();
        for (PeakTableColumn c : values()) {
            if (c.scope == Scope.RUN && c.format.numeric()) {
                run.add(c);
            }
        }
        RUN_VALUES = Collections.unmodifiableList(run);
    }
}
