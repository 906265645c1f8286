package org.mobident.report.recheck;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.QuoteMode;
import org.mobident.recheck.AssignmentCheck;
import org.mobident.recheck.PairCheck;
import org.mobident.recheck.PredictedMobility;
import org.mobident.recheck.PredictionError;
import org.mobident.recheck.RecheckResult;
import org.mobident.recheck.Verdict;
import org.mobident.report.CsvCells;
import org.mobident.text.NumberText;

/**
 * A recheck as three CSV tables: assignments (one row per earlier assignment), pairs (analyte
 * pairs not resolved before or after) and analytes (the mobility each analyte has in the new
 * buffer, predicted and, where the new library was measured, how far the model was off). Column
 * names say "old" for the buffer and library the table was matched with (library A) and "new" for
 * the new buffer and its library (library B). The verdict column holds {@link Verdict#label()}:
 * still_holds, moved_but_still_unique, now_ambiguous, reassigned or lost.
 *
 * <p>Mobilities in 1e-9 m²/(V s) with 3 decimals, ratios (·_in_sd) and probabilities with 3
 * decimals, mean charge with 3 decimals; unknown values are empty cells; booleans are
 * {@code true}/{@code false}. Deterministic ({@link Locale#ROOT}, "\n" line ends); every text
 * cell passes through {@link CsvCells#inert}. Lists inside a cell are separated by spaces.
 */
public final class RecheckReportCsv {

    /** Columns of the assignments table. */
    public static final List<String> ASSIGNMENT_COLUMNS = List.of("run", "peak", "analyte", "old_status",
            "old_confidence", "old_mobility", "old_mobility_sd", "old_library_mobility", "new_library_mobility", "shift",
            "shift_sd", "shift_in_sd", "new_mobility", "new_confidence", "verdict", "collides_with",
            "prediction_basis", "reason");
    /** Columns of the pairs table. */
    public static final List<String> PAIR_COLUMNS = List.of("first", "second", "delta_old", "threshold_old",
            "resolved_old", "delta_new", "delta_new_sd", "threshold_new", "resolved_new", "became_unresolvable");
    /** Columns of the analytes table. */
    public static final List<String> ANALYTE_COLUMNS = List.of("analyte", "old_buffer", "old_library_mobility",
            "old_library_spread", "predicted_new", "predicted_new_sd", "model_sd", "predicted_shift", "method", "prediction_basis",
            "mean_charge_new", "measured_new", "prediction_error", "prediction_error_in_sd", "note");

    private static final int DECIMALS = 3;
    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n")
            .setQuoteMode(QuoteMode.MINIMAL).get();

    private RecheckReportCsv() {
    }

    /** Writes the assignments table (header and rows); the writer is flushed, not closed. */
    public static void writeAssignments(RecheckResult result, Writer out) throws IOException {
        CSVPrinter p = new CSVPrinter(out, FORMAT);
        p.printRecord(ASSIGNMENT_COLUMNS);
        for (AssignmentCheck a : result.assignments()) {
            p.printRecord(text(a.run()), Integer.toString(a.peak()), text(a.analyte()), text(a.oldStatus()),
                    number(a.oldConfidence()), number(a.oldMobility()), number(a.oldMobilitySd()),
                    number(a.libraryMobilityA()), number(a.libraryMobilityB()), number(a.shift()),
                    number(a.shiftUncertainty()), number(a.shiftInSd()), number(a.newMobility()),
                    number(a.newConfidence()), text(a.verdict().label()), text(String.join(" ", a.collidesWith())),
                    text(a.basis() == null ? "measured" : a.basis().label()), text(a.reason()));
        }
        p.flush();
    }

    /** Writes the pairs table; the writer is flushed, not closed. */
    public static void writePairs(RecheckResult result, Writer out) throws IOException {
        CSVPrinter p = new CSVPrinter(out, FORMAT);
        p.printRecord(PAIR_COLUMNS);
        for (PairCheck c : result.pairs()) {
            p.printRecord(text(c.first()), text(c.second()), number(c.deltaA()), number(c.thresholdA()),
                    Boolean.toString(c.resolvedA()), number(c.deltaB()), number(c.uncertaintyB()),
                    number(c.thresholdB()), Boolean.toString(c.resolvedB()), Boolean.toString(c.becameUnresolvable()));
        }
        p.flush();
    }

    /** Writes the analytes table (one row per prediction); the writer is flushed, not closed. */
    public static void writeAnalytes(RecheckResult result, Writer out) throws IOException {
        Map<String, PredictionError> errors = new HashMap<>();
        for (PredictionError e : result.predictionErrors()) {
            errors.put(e.analyte(), e);
        }
        CSVPrinter p = new CSVPrinter(out, FORMAT);
        p.printRecord(ANALYTE_COLUMNS);
        for (PredictedMobility m : result.predictions()) {
            PredictionError e = errors.get(m.name());
            List<String> row = new ArrayList<>(ANALYTE_COLUMNS.size());
            row.add(text(m.name()));
            row.add(text(m.bufferA().label()));
            row.add(number(m.measuredA()));
            row.add(number(m.spreadA()));
            row.add(number(m.predicted()));
            row.add(number(m.uncertainty()));
            row.add(number(m.modelUncertainty()));
            row.add(number(m.shift()));
            row.add(text(m.method().label()));
            row.add(text(m.basis().label()));
            row.add(number(m.meanChargeB()));
            row.add(e == null ? "" : number(e.measured()));
            row.add(e == null ? "" : number(e.error()));
            row.add(e == null ? "" : number(e.errorInSd()));
            row.add(text(m.note()));
            p.printRecord(row);
        }
        p.flush();
    }

    private static String text(String s) {
        return CsvCells.inert(s);
    }

    /** A number cell: {@value #DECIMALS} decimals, empty when not known. */
    private static String number(double v) {
        return NumberText.fixed(v, DECIMALS, "");
    }
}
