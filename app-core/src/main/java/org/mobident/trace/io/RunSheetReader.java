package org.mobident.trace.io;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.Units;
import org.mobident.io.TableReader;
import org.mobident.io.TableRow;
import org.mobident.io.TableSpec;
import org.mobident.io.TextFiles;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

/**
 * Reads a run sheet: one row per run, naming its trace file and conditions.
 *
 * <p>Columns (case-insensitive, in any order; spaces and hyphens in names count as {@code _}); only
 * {@code file} is required: file, total_length_cm, detector_length_cm, voltage_kv, ramp_s,
 * temperature_c, buffer, marker_from_s, marker_to_s, detection, ref_marker_mobility,
 * ref_marker_from_s, ref_marker_to_s, sample, note. {@code sample} and {@code note} are free text and
 * ignored. An unknown column is an error, so that a misspelt condition is never dropped silently.
 * {@code file} is relative to the sheet's folder. Lengths in cm, signed voltage in kV, times in s,
 * {@code ref_marker_mobility} in 1e-9 m²/(V s), {@code detection} is {@code direct} or
 * {@code indirect}. An empty cell takes the value from the defaults.
 *
 * <p>Delimiter comma, semicolon or tab, taken from the header; with semicolon or tab, numbers may
 * use a decimal comma. A UTF-8 byte order mark, blank lines and {@code #} comment lines are
 * skipped. Read with {@link TableReader} (quoted cells may hold the delimiter).
 */
public final class RunSheetReader {

    /** Origin of a run declared without a sheet. */
    public static final String COMMAND_LINE = "command line";

    /** Label of {@link InputException#file()} for problems in the conditions given to {@link #single}. */
    public static final String OPTIONS = "options";

    static final String FILE = "file";
    static final String TOTAL_LENGTH = "total_length_cm";
    static final String DETECTOR_LENGTH = "detector_length_cm";
    static final String VOLTAGE = "voltage_kv";
    static final String RAMP = "ramp_s";
    static final String TEMPERATURE = "temperature_c";
    static final String BUFFER = "buffer";
    static final String MARKER_FROM = "marker_from_s";
    static final String MARKER_TO = "marker_to_s";
    static final String DETECTION = "detection";
    static final String REF_MOBILITY = "ref_marker_mobility";
    static final String REF_FROM = "ref_marker_from_s";
    static final String REF_TO = "ref_marker_to_s";
    static final String SAMPLE = "sample";
    static final String NOTE = "note";
    static final String MIX = "mix";
    /** Units a number cell may carry when they are its column's own ('|' between; case aside). */
    private static final Map<String, String> OWN_UNITS = Map.of(TOTAL_LENGTH, "cm", DETECTOR_LENGTH, "cm",
            VOLTAGE, "kV", RAMP, "s", TEMPERATURE, "°C|C|degC", MARKER_FROM, "s", MARKER_TO, "s", REF_FROM, "s",
            REF_TO, "s");
    /** Units of the same kinds that are not a column's own: refused, not read as if they were. */
    private static final java.util.Set<String> OTHER_UNITS = java.util.Set.of("mm", "m", "v", "min", "k", "ms",
            "h", "°f", "f");

    private static final String COLUMN_LIST = "file, total_length_cm, detector_length_cm, voltage_kv, ramp_s, "
            + "temperature_c, buffer, marker_from_s, marker_to_s, detection, ref_marker_mobility, "
            + "ref_marker_from_s, ref_marker_to_s, sample, mix, note";

    /** The known columns, in documentation order. */
    public static final List<String> COLUMNS = List.of(COLUMN_LIST.split(", "));

    private static final List<String> NUMBER_COLUMNS = List.of(TOTAL_LENGTH, DETECTOR_LENGTH, VOLTAGE, RAMP,
            TEMPERATURE, MARKER_FROM, MARKER_TO, REF_MOBILITY, REF_FROM, REF_TO);

    /** The run sheet as the table reader expects it. */
    private static final TableSpec SPEC = TableSpec.of("run sheet", COLUMNS, List.of(FILE)).withSniffedDelimiter()
            .withSpacesAsUnderscore().withUnnamedValuesPerRow().listingPresentColumns();

    private RunSheetReader() {
    }

    /**
     * Reads a run sheet. Rows that cannot be used go to {@link RunSheet#rowProblems()}, the others
     * are returned with {@code defaults} filling their empty cells.
     *
     * @param defaults conditions for cells left empty (use {@link RunConditions#EMPTY} for none)
     * @throws InputException when the sheet as a whole cannot be used: unreadable, empty, without a
     *                        {@code file} column, with an unknown or repeated column, or without rows
     */
    public static RunSheet read(Path sheet, RunConditions defaults) throws InputException {
        String name = sheet.toString();
        byte[] bytes = TextSniffer.asUtf8(TextSniffer.readAllBytes(sheet, name));
        TextSniffer.requireText(bytes, name);
        String text = TextFiles.decodeLenient(bytes, TextFiles.bomLength(bytes), bytes.length);
        return new SheetParse(sheet, name, defaults == null ? RunConditions.EMPTY : defaults).run(text);
    }

    /**
     * A run for one trace file without a sheet, with origin {@value #COMMAND_LINE}.
     *
     * @param conditions the run's full conditions ({@code null}: none)
     *
     * @throws InputException when the conditions are impossible (file {@value #OPTIONS}) or the trace
     *                        file is missing or unreadable
     */
    public static RunSpec single(Path traceFile, RunConditions conditions) throws InputException {
        if (conditions == null) {
            conditions = RunConditions.EMPTY;
        }
        String problem = conditionsProblem(conditions);
        if (problem != null) {
            throw new InputException(OPTIONS, 0, problemField(conditions), problem);
        }
        String fileProblem = traceFileProblem(traceFile);
        if (fileProblem != null) {
            throw new InputException(traceFile.toString(), 0, null, fileProblem);
        }
        return new RunSpec(RunSpec.runNameOf(traceFile), traceFile, conditions, COMMAND_LINE, 0);
    }

    // ---- checks shared by sheet rows and single runs ----

    /** Geometry problem, or a half-given marker window, or {@code null}. */
    private static String conditionsProblem(RunConditions c) {
        String g = c.geometryProblem();
        if (g != null) {
            return g;
        }
        if (fieldFactorOutOfRange(c)) {
            return "lengths and voltage are out of range: 100·Ld·Lt/V (Ld " + c.detectorLengthCm() + " cm, Lt "
                    + c.totalLengthCm() + " cm, V " + c.voltageKv() + " kV) is not a finite non-zero number;"
                    + " give the lengths in cm and the voltage in kV";
        }
        if (Double.isNaN(c.markerFromS()) != Double.isNaN(c.markerToS())) {
            return "the neutral marker window needs both " + MARKER_FROM + " and " + MARKER_TO;
        }
        if (Double.isNaN(c.refMarkerFromS()) != Double.isNaN(c.refMarkerToS())) {
            return "the charged marker window needs both " + REF_FROM + " and " + REF_TO;
        }
        if (!Double.isNaN(c.refMarkerFromS()) && !(c.refMarkerFromS() < c.refMarkerToS())) {
            return "charged marker window start (" + c.refMarkerFromS() + " s) must be before its end ("
                    + c.refMarkerToS() + " s)";
        }
        if (!Double.isNaN(c.refMarkerMobility()) && !Double.isFinite(c.refMarkerMobility())) {
            return "charged marker mobility must be a finite number";
        }
        return null;
    }

    /**
     * True when lengths and voltage are each valid but the factor 100·Ld·Lt/V that turns a time into a
     * mobility ({@link Units#mobilityFromCmKvS}) overflows or underflows, so that every mobility of the
     * run would be infinite, NaN or zero.
     */
    private static boolean fieldFactorOutOfRange(RunConditions c) {
        if (!c.hasGeometry()) {
            return false;
        }
        double factor = Units.mobilityFromCmKvS(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(), 1.0);
        return !Double.isFinite(factor) || factor == 0;
    }

    /** The column to blame for {@link #conditionsProblem}: each value is checked alone, then in pairs. */
    private static String problemField(RunConditions c) {
        double x = Double.NaN;
        if (cond(c.totalLengthCm(), x, x, x, x, x, x).geometryProblem() != null) {
            return TOTAL_LENGTH;
        }
        if (cond(x, c.detectorLengthCm(), x, x, x, x, x).geometryProblem() != null
                || cond(c.totalLengthCm(), c.detectorLengthCm(), x, x, x, x, x).geometryProblem() != null) {
            return DETECTOR_LENGTH;
        }
        if (cond(x, x, c.voltageKv(), x, x, x, x).geometryProblem() != null) {
            return VOLTAGE;
        }
        if (fieldFactorOutOfRange(c)) {
            double lengths = 100.0 * c.detectorLengthCm() * c.totalLengthCm();
            return Double.isFinite(lengths) && lengths != 0 ? VOLTAGE : TOTAL_LENGTH;
        }
        if (cond(x, x, x, c.rampS(), x, x, x).geometryProblem() != null) {
            return RAMP;
        }
        if (cond(x, x, x, x, c.temperatureC(), x, x).geometryProblem() != null) {
            return TEMPERATURE;
        }
        if (Double.isNaN(c.markerToS()) && !Double.isNaN(c.markerFromS())) {
            return MARKER_TO;
        }
        if (Double.isNaN(c.markerFromS()) && !Double.isNaN(c.markerToS())) {
            return MARKER_FROM;
        }
        if (cond(x, x, x, x, x, c.markerFromS(), c.markerToS()).geometryProblem() != null) {
            return MARKER_TO;
        }
        if (!Double.isNaN(c.refMarkerMobility()) && !Double.isFinite(c.refMarkerMobility())) {
            return REF_MOBILITY;
        }
        return Double.isNaN(c.refMarkerFromS()) ? REF_FROM : REF_TO;
    }

    private static RunConditions cond(double lt, double ld, double v, double ramp, double temp,
            double markerFrom, double markerTo) {
        return new RunConditions(lt, ld, v, ramp, temp, null, markerFrom, markerTo, null,
                Double.NaN, Double.NaN, Double.NaN);
    }

    private static String traceFileProblem(Path file) {
        if (!Files.exists(file)) {
            return "trace file not found: " + file;
        }
        if (!Files.isRegularFile(file)) {
            return "trace file is not a regular file: " + file;
        }
        if (!Files.isReadable(file)) {
            return "trace file cannot be read: " + file;
        }
        return null;
    }

    /** State of one sheet parse; not shared. */
    private static final class SheetParse {
        private final Path sheet;
        private final String name;
        private final RunConditions defaults;
        private char delimiter;
        private final Map<String, Long> runNames = new HashMap<>();
        private final Map<String, String> samples = new java.util.LinkedHashMap<>();
        private final Map<String, String> mixes = new java.util.LinkedHashMap<>();

        SheetParse(Path sheet, String name, RunConditions defaults) {
            this.sheet = sheet;
            this.name = name;
            this.defaults = defaults;
        }

        RunSheet run(String text) throws InputException {
            List<RunSpec> runs = new ArrayList<>();
            List<InputException> problems = new ArrayList<>();
            int rows = 0;
            try (TableReader table = TableReader.open(new StringReader(text), name, SPEC)) {
                delimiter = table.delimiter();
                for (TableRow r = table.next(); r != null; r = table.next()) {
                    rows++;
                    try {
                        runs.add(row(r));
                    } catch (InputException e) {
                        problems.add(e);
                    }
                }
            }
            if (rows == 0) {
                throw new InputException(name, 0, null, "the run sheet has a header but no runs");
            }
            return new RunSheet(runs, problems, samples, mixes);
        }

        private RunSpec row(TableRow r) throws InputException {
            if (r.unnamedValueProblem() != null) {
                throw r.unnamedValueProblem();
            }
            long lineNo = r.line();
            Map<String, String> values = new HashMap<>();
            for (String column : COLUMNS) {
                if (r.has(column)) {
                    values.put(column, r.get(column));
                }
            }

            String fileText = values.getOrDefault(FILE, "");
            if (fileText.isEmpty()) {
                throw new InputException(name, lineNo, FILE, "no trace file given");
            }
            Path traceFile;
            try {
                traceFile = sheet.resolveSibling(fileText);
                if (fileText.indexOf('\\') >= 0 && !Files.exists(traceFile)) {
                    // a sheet written on Windows read elsewhere: its folders are separated by backslashes
                    Path forward = sheet.resolveSibling(fileText.replace('\\', '/'));
                    traceFile = Files.exists(forward) ? forward : traceFile;
                }
            } catch (InvalidPathException e) {
                throw new InputException(name, lineNo, FILE, "'" + fileText + "' is not a valid path", e);
            }
            String runName = RunSpec.runNameOf(traceFile);
            String key = runName.toLowerCase(Locale.ROOT);
            Long first = runNames.putIfAbsent(key, lineNo);
            if (first != null) {
                throw new InputException(name, lineNo, FILE, "run name '" + runName + "' is already used on line "
                        + first + " (a run is named by its trace file without extension)");
            }

            double[] numbers = new double[NUMBER_COLUMNS.size()];
            for (int k = 0; k < numbers.length; k++) {
                numbers[k] = number(values.get(NUMBER_COLUMNS.get(k)), NUMBER_COLUMNS.get(k), lineNo);
            }
            String buffer = values.getOrDefault(BUFFER, "");
            String detectionText = values.getOrDefault(DETECTION, "");
            Detection detection = null;
            if (!detectionText.isEmpty()) {
                detection = Detection.parse(detectionText);
                if (detection == null) {
                    throw new InputException(name, lineNo, DETECTION, "'" + detectionText
                            + "' is not a detection mode; use direct or indirect");
                }
            }
            RunConditions own = new RunConditions(numbers[0], numbers[1], numbers[2], numbers[3], numbers[4],
                    buffer.isEmpty() ? null : buffer, numbers[5], numbers[6], detection,
                    numbers[7], numbers[8], numbers[9]);
            RunConditions conditions = own.orElse(defaults);
            String problem = conditionsProblem(conditions);
            if (problem != null) {
                throw new InputException(name, lineNo, problemField(conditions), problem);
            }
            String fileProblem = traceFileProblem(traceFile);
            if (fileProblem != null) {
                throw new InputException(name, lineNo, FILE, fileProblem);
            }
            String sample = values.getOrDefault(SAMPLE, "");
            if (!sample.isEmpty()) {
                samples.put(runName, sample);
            }
            String mix = values.getOrDefault(MIX, "");
            if (!mix.isEmpty()) {
                mixes.put(runName, mix);
            }
            return new RunSpec(runName, traceFile, conditions, name, lineNo, sample.isEmpty() ? null : sample);
        }

        /** An empty cell is NaN (unset); anything else must be a finite number, optionally followed by
         *  the column's own unit ({@code -20 kV}, {@code 25 °C}). */
        private double number(String text, String column, long lineNo) throws InputException {
            if (text == null || text.isEmpty()) {
                return Double.NaN;
            }
            text = withoutOwnUnit(text.strip(), column, lineNo);
            byte[] b = text.replace(TextFiles.UNICODE_MINUS, '-').getBytes(StandardCharsets.UTF_8);
            double v = FastDoubleParser.parse(b, 0, b.length, delimiter != ',');
            if (Double.isNaN(v)) {
                String hint = delimiter == ',' && text.indexOf(',') >= 0
                        ? " (a decimal comma needs a semicolon-delimited sheet)" : "";
                throw new InputException(name, lineNo, column, "'" + text + "' is not a number" + hint);
            }
            if (Double.isInfinite(v)) {
                throw new InputException(name, lineNo, column, "'" + text + "' is too large a number");
            }
            return v;
        }

        /**
         * The cell without a trailing unit when that unit is the column's own (case aside: cm, kV, s,
         * °C or C); a cell that ends in another unit of the same kind (mm, m, V, min, K) is refused
         * with both named, rather than read as a number in the wrong unit.
         */
        private String withoutOwnUnit(String text, String column, long lineNo) throws InputException {
            int end = text.length();
            int start = end;
            while (start > 0 && (Character.isLetter(text.charAt(start - 1)) || text.charAt(start - 1) == '°')) {
                start--;
            }
            if (start == end || start == 0) {
                return text;
            }
            String unit = text.substring(start).toLowerCase(Locale.ROOT);
            String number = text.substring(0, start).strip();
            String own = OWN_UNITS.get(column);
            if (own == null) {
                return text;
            }
            String[] accepted = own.split("\\|");
            for (String a : accepted) {
                if (a.toLowerCase(Locale.ROOT).equals(unit)) {
                    return number;
                }
            }
            if (OTHER_UNITS.contains(unit)) {
                throw new InputException(name, lineNo, column, "'" + text + "' is in " + text.substring(start)
                        + ", but this column is in " + accepted[0] + ": convert the value or leave the unit out");
            }
            return text;
        }
    }
}
