package org.mobident.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.QuoteMode;
import org.mobident.result.RunResult;

/**
 * The machine-readable peak table as CSV: one row per peak, a single row for a run that failed
 * (status {@code failed}, the reason in {@code note}) or that found no peak (status
 * {@code no_peaks}).
 *
 * <p>The columns, their order and number formats are {@link PeakTableColumn}; the status words
 * {@link PeakTableStatus}. Unknown values are empty cells; {@code confidence} is left empty where
 * no mobility is known.
 * Output is deterministic ({@link java.util.Locale#ROOT}, "\n" line ends) and text cells are made
 * spreadsheet-safe with {@link CsvCells#inert}; numbers are written as they are.
 */
public final class PeakTableCsv {

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder()
            .setRecordSeparator("\n")
            .setQuoteMode(QuoteMode.MINIMAL)
            .get();

    private PeakTableCsv() {
    }

    /** The column names in output order. */
    public static List<String> columns() {
        return PeakRows.COLUMNS;
    }

    /** Writes the header and the rows of every run to {@code out} (which is flushed, not closed). */
    public static void write(List<RunResult> runs, Writer out) throws IOException {
        CSVPrinter printer = new CSVPrinter(out, FORMAT);
        printer.printRecord(PeakRows.COLUMNS);
        List<String> cells = new ArrayList<>(PeakRows.COLUMNS.size());
        for (List<PeakRows.Cell> row : PeakRows.rows(runs)) {
            cells.clear();
            for (PeakRows.Cell cell : row) {
                if (cell.empty()) {
                    cells.add("");
                } else {
                    cells.add(cell.numeric() ? cell.text() : CsvCells.inert(cell.text()));
                }
            }
            printer.printRecord(cells);
        }
        printer.flush();
    }
}
