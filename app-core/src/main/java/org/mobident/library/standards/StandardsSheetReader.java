package org.mobident.library.standards;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.mobident.InputException;
import org.mobident.io.TableReader;
import org.mobident.io.TableRow;
import org.mobident.io.TableSpec;
import org.mobident.io.TextFiles;

/**
 * Reads a standards sheet: one row per analyte of a standard mix.
 *
 * <h2>Format</h2>
 * <ul>
 *   <li>Columns (case-insensitive, any order; spaces and hyphens count as {@code _}):
 *       {@code mix} and {@code analyte} are required; {@code charge}, {@code approx_mobility},
 *       {@code order}, {@code pka}, {@code limiting_mobility} and {@code note} are optional. Any other
 *       column is an error.</li>
 *   <li>{@code pka} and {@code limiting_mobility}: the lab's own model data for the analyte, as the
 *       library's columns of the same names hold them (space-separated numbers; pKa values at 25 °C
 *       in ascending order; one signed limiting mobility per form at 25 °C, most protonated form
 *       first, 0 for a neutral form). They need the charge number of the most charged form in
 *       {@code charge}, and must describe a consistent set of forms
 *       ({@link org.mobident.chem.ReferenceIons#model}); an analyte listed in several mixes may give
 *       them once or repeat them, but not differently. {@code library build} writes them into the
 *       library so that {@code predict} and {@code recheck} can model the analyte.</li>
 *   <li>{@code charge}: a signed whole number ({@code -2}, {@code +1}, {@code 1}), the charge written
 *       the chemist's way ({@code 2-}), or just the sign ({@code +}, {@code -}).</li>
 *   <li>{@code approx_mobility}: expected effective mobility in 1e-9 m²/(V·s), signed (anions
 *       negative); its sign must agree with {@code charge} when both are given.</li>
 *   <li>{@code order}: expected migration order within the mix, a whole number from 1 (first to
 *       pass the detector); each order at most once per mix.</li>
 *   <li>An analyte appears at most once per mix (names compared without regard to case); the same
 *       analyte may appear in several mixes.</li>
 *   <li>Delimiter comma, semicolon or tab, taken from the header line; with semicolon or tab a
 *       decimal comma is accepted. UTF-8 (a leading byte-order mark is skipped); blank lines and
 *       lines starting with {@code #} are skipped. Read with {@link TableReader} (a quoted cell may
 *       hold the delimiter).</li>
 * </ul>
 * Every problem raises an {@link InputException} naming the file, the 1-based line and the column.
 */
public final class StandardsSheetReader {

    static final String MIX = "mix";
    static final String ANALYTE = "analyte";
    static final String CHARGE = "charge";
    static final String APPROX_MOBILITY = "approx_mobility";
    static final String ORDER = "order";
    static final String NOTE = "note";
    static final String PKA = "pka";
    static final String LIMITING_MOBILITY = "limiting_mobility";

    /** The known columns, in documentation order. */
    public static final List<String> COLUMNS = List.of(MIX, ANALYTE, CHARGE, APPROX_MOBILITY, ORDER, PKA,
            LIMITING_MOBILITY, NOTE);

    /** The standards sheet as the table reader expects it. */
    private static final TableSpec SPEC = TableSpec.of("standards sheet", COLUMNS, List.of(MIX, ANALYTE))
            .withSniffedDelimiter().withSpacesAsUnderscore();
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    /** {@code -2}, {@code +1}, {@code 3}: sign before the number. */
    private static final Pattern CHARGE_SIGN_FIRST = Pattern.compile("([+-]?)(\\d+)");
    /** {@code 2-}, {@code 1+}: the chemist's superscript order. */
    private static final Pattern CHARGE_SIGN_LAST = Pattern.compile("(\\d+)([+-])");

    private StandardsSheetReader() {
    }

    /**
     * Reads a standards sheet.
     *
     * @param file the sheet; its name is used in messages and as {@link StandardsSheet#sourceFile()}
     * @return the mixes in order of first appearance, each with its analytes in sheet order
     * @throws InputException when the file cannot be read, or any line or column is invalid
     */
    public static StandardsSheet read(Path file) throws InputException {
        String label = file.toString();
        return new Parse(label).run(TableReader.open(file, SPEC));
    }

    /**
     * Reads a standards sheet from text.
     *
     * @param text  the sheet's content
     * @param label the name used in messages and as {@link StandardsSheet#sourceFile()}
     * @throws InputException when any line or column is invalid
     */
    public static StandardsSheet read(String text, String label) throws InputException {
        return new Parse(label).run(TableReader.open(new StringReader(text), label, SPEC));
    }

    /** State of one sheet parse; not shared. */
    private static final class Parse {
        private final String file;
        private char delimiter;
        /** Mix key → analytes in sheet order. */
        private final Map<String, List<StandardAnalyte>> analytesByMix = new LinkedHashMap<>();
        /** Mix key → the mix name as first written. */
        private final Map<String, String> mixNames = new HashMap<>();
        /** "mix key / analyte key" → line of first declaration. */
        private final Map<String, Long> analyteLines = new HashMap<>();
        /** "mix key / order" → line of first use. */
        private final Map<String, Long> orderLines = new HashMap<>();
        /** analyte key → the first row that gave model data for it. */
        private final Map<String, StandardAnalyte> modelRows = new HashMap<>();

        Parse(String file) {
            this.file = file;
        }

        StandardsSheet run(TableReader opened) throws InputException {
            try (TableReader table = opened) {
                delimiter = table.delimiter();
                for (TableRow row = table.next(); row != null; row = table.next()) {
                    row(row);
                }
            }
            if (analytesByMix.isEmpty()) {
                throw new InputException(file, 0, null, "the standards sheet has a header but no analytes");
            }
            List<StandardsMix> mixes = new ArrayList<>();
            for (Map.Entry<String, List<StandardAnalyte>> e : analytesByMix.entrySet()) {
                mixes.add(new StandardsMix(mixNames.get(e.getKey()), e.getValue()));
            }
            return new StandardsSheet(file, mixes);
        }

        private void row(TableRow row) throws InputException {
            long lineNo = row.line();
            Map<String, String> v = new HashMap<>();
            for (String column : COLUMNS) {
                if (row.has(column)) {
                    v.put(column, row.get(column));
                }
            }
            String mix = v.getOrDefault(MIX, "");
            if (mix.isEmpty()) {
                throw new InputException(file, lineNo, MIX, "the mix name is empty");
            }
            String name = v.getOrDefault(ANALYTE, "");
            if (name.isEmpty()) {
                throw new InputException(file, lineNo, ANALYTE, "the analyte name is empty");
            }
            String mixKey = StandardsSheet.key(mix);
            Long earlier = analyteLines.putIfAbsent(mixKey + "/" + name.toLowerCase(Locale.ROOT), lineNo);
            if (earlier != null) {
                throw new InputException(file, lineNo, ANALYTE, "duplicate analyte '" + name + "' in mix '" + mix
                        + "' (lines " + earlier + " and " + lineNo + ")");
            }
            int[] charge = charge(v.getOrDefault(CHARGE, ""), lineNo);
            double approx = approx(v.getOrDefault(APPROX_MOBILITY, ""), lineNo);
            if (!Double.isNaN(approx) && approx != 0 && charge[1] != 0 && Math.signum(approx) != charge[1]) {
                throw new InputException(file, lineNo, APPROX_MOBILITY, "approx_mobility " + v.get(APPROX_MOBILITY)
                        + " has the opposite sign to charge " + v.get(CHARGE)
                        + " (mobilities are signed: cations positive, anions negative)");
            }
            int order = order(v.getOrDefault(ORDER, ""), lineNo);
            if (order > 0) {
                Long first = orderLines.putIfAbsent(mixKey + "/" + order, lineNo);
                if (first != null) {
                    throw new InputException(file, lineNo, ORDER, "order " + order + " is already used in mix '"
                            + mix + "' on line " + first);
                }
            }
            List<Double> pKa = numbers(v.getOrDefault(PKA, ""), PKA, lineNo);
            List<Double> limiting = numbers(v.getOrDefault(LIMITING_MOBILITY, ""), LIMITING_MOBILITY, lineNo);
            StandardAnalyte analyte = new StandardAnalyte(name, charge[0], charge[1], approx, order, lineNo, pKa,
                    limiting);
            if (analyte.hasModelData()) {
                checkModel(analyte, lineNo);
            }
            mixNames.putIfAbsent(mixKey, mix);
            analytesByMix.computeIfAbsent(mixKey, k -> new ArrayList<>()).add(analyte);
        }

        /** The model data must make a consistent species, and agree with an earlier row of the same analyte. */
        private void checkModel(StandardAnalyte a, long lineNo) throws InputException {
            if (a.chargeNumber() == 0) {
                throw new InputException(file, lineNo, CHARGE, "analyte '" + a.name() + "' gives pka or "
                        + "limiting_mobility, so it needs the charge number of its most charged form in 'charge' "
                        + "(e.g. -2 for a dicarboxylic acid, +1 for an amine)");
            }
            org.mobident.library.LibraryEntry probe = new org.mobident.library.LibraryEntry(a.name(),
                    a.limitingMobilities().isEmpty() ? Double.NaN : mostCharged(a), Double.NaN, 0, a.chargeNumber(),
                    Double.NaN, a.pKa(), a.limitingMobilities(), null, Double.NaN, Double.NaN, Double.NaN, null);
            if (a.limitingMobilities().isEmpty()) {
                throw new InputException(file, lineNo, LIMITING_MOBILITY, "analyte '" + a.name()
                        + "' has pKa values but no limiting mobilities (one per form, most protonated first; "
                        + "0 for a neutral form)");
            }
            try {
                org.mobident.chem.ReferenceIons.model(probe, file);
            } catch (InputException e) {
                throw new InputException(file, lineNo, e.field(), e.problem(), e);
            }
            String key = a.name().toLowerCase(Locale.ROOT);
            StandardAnalyte earlier = modelRows.putIfAbsent(key, a);
            if (earlier != null && (!earlier.pKa().equals(a.pKa())
                    || !earlier.limitingMobilities().equals(a.limitingMobilities())
                    || earlier.chargeNumber() != a.chargeNumber())) {
                throw new InputException(file, lineNo, PKA, "analyte '" + a.name() + "' has other charge, pka or "
                        + "limiting_mobility values than on line " + earlier.line() + "; give them once, or the same");
            }
        }

        /** The limiting mobility of the most charged form: the last for anions, the first for cations. */
        private static double mostCharged(StandardAnalyte a) {
            List<Double> mu = a.limitingMobilities();
            return a.chargeNumber() < 0 ? mu.get(mu.size() - 1) : mu.get(0);
        }

        /** Space-separated numbers (a decimal comma in semicolon or tab sheets); empty when the cell is. */
        private List<Double> numbers(String raw, String column, long lineNo) throws InputException {
            List<Double> out = new ArrayList<>();
            if (raw.isBlank()) {
                return out;
            }
            for (String part : raw.strip().split("\\s+")) {
                String s = part.replace(TextFiles.UNICODE_MINUS, '-');
                if (delimiter != ',') {
                    s = s.replace(',', '.');
                }
                if (!DECIMAL.matcher(s).matches()) {
                    throw new InputException(file, lineNo, column, "'" + part + "' in '" + raw + "' is not a number; "
                            + "write the values separated by spaces, e.g. 3.40 5.20");
                }
                double d = Double.parseDouble(s);
                if (!Double.isFinite(d)) {
                    throw new InputException(file, lineNo, column, "the number '" + part + "' is out of range");
                }
                out.add(d);
            }
            return out;
        }

        /** {charge number (0 when only the sign is given), sign}. */
        private int[] charge(String raw, long lineNo) throws InputException {
            String s = raw.replace(TextFiles.UNICODE_MINUS, '-').replace(" ", "");
            if (s.isEmpty()) {
                return new int[] {0, 0};
            }
            if (s.equals("+") || s.equals("-")) {
                int sign = s.equals("+") ? 1 : -1;
                return new int[] {0, sign};
            }
            Matcher first = CHARGE_SIGN_FIRST.matcher(s);
            Matcher last = CHARGE_SIGN_LAST.matcher(s);
            String digits;
            String sign;
            if (first.matches()) {
                digits = first.group(2);
                sign = first.group(1);
            } else if (last.matches()) {
                digits = last.group(1);
                sign = last.group(2);
            } else {
                throw new InputException(file, lineNo, CHARGE, "'" + raw
                        + "' is not a charge; write a signed whole number (-2, +1), 2- or just the sign (+, -)");
            }
            int magnitude;
            try {
                magnitude = Integer.parseInt(digits);
            } catch (NumberFormatException e) {
                throw new InputException(file, lineNo, CHARGE, "charge '" + raw + "' is too large", e);
            }
            int z = "-".equals(sign) ? -magnitude : magnitude;
            return new int[] {z, Integer.signum(z)};
        }

        private double approx(String raw, long lineNo) throws InputException {
            if (raw.isEmpty()) {
                return Double.NaN;
            }
            String s = raw.replace(TextFiles.UNICODE_MINUS, '-');
            if (delimiter != ',') {
                s = s.replace(',', '.');
            }
            if (!DECIMAL.matcher(s).matches()) {
                String hint = delimiter == ',' && raw.indexOf(',') >= 0
                        ? " (a decimal comma needs a semicolon-delimited sheet)" : "";
                throw new InputException(file, lineNo, APPROX_MOBILITY, "'" + raw + "' is not a number" + hint);
            }
            double d = Double.parseDouble(s);
            if (!Double.isFinite(d)) {
                throw new InputException(file, lineNo, APPROX_MOBILITY, "the number '" + raw + "' is out of range");
            }
            return d;
        }

        private int order(String raw, long lineNo) throws InputException {
            if (raw.isEmpty()) {
                return 0;
            }
            int n;
            try {
                n = Integer.parseInt(raw.startsWith("+") ? raw.substring(1) : raw);
            } catch (NumberFormatException e) {
                throw new InputException(file, lineNo, ORDER, "'" + raw
                        + "' is not a migration order; write a whole number from 1 (first to pass the detector)", e);
            }
            if (n < 1) {
                throw new InputException(file, lineNo, ORDER, "order must be 1 or more (1 = first to pass the"
                        + " detector), got " + n);
            }
            return n;
        }
    }
}
