package org.mobident.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.QuoteMode;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;

/**
 * The batch summaries as CSV, in long form (one row per run and analyte, one row per peak of a
 * recurring unknown), formatted like the peak table: {@link java.util.Locale#ROOT}, mobilities in
 * 1e-9 m²/(V s) with 3 decimals, probabilities as fractions with 3 decimals, areas to 6
 * significant digits, empty cells for unknown values, text cells made spreadsheet-safe.
 */
public final class BatchSummaryCsv {

    /** Columns of the sample × analyte CSV. */
    public static final List<String> SAMPLE_COLUMNS = List.of("run", "sample", "buffer", "analyte", "result",
            "confidence", "corrected_area", "mobility_corrected", "peak");

    /** Columns of the recurring-unknowns CSV. */
    public static final List<String> UNKNOWN_COLUMNS = List.of("unknown", "buffer", "runs_seen", "runs_in_buffer",
            "mean_mobility", "mobility_sd", "run", "peak", "apex_time_s", "mobility_corrected", "uncertainty",
            "corrected_area");

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder()
            .setRecordSeparator("\n")
            .setQuoteMode(QuoteMode.MINIMAL)
            .get();

    private BatchSummaryCsv() {
    }

    /** Writes one row per run and library analyte. */
    public static void writeSamples(SampleCalls table, Writer out) throws IOException {
        CSVPrinter p = new CSVPrinter(out, FORMAT);
        p.printRecord(SAMPLE_COLUMNS);
        for (SampleCalls.RunRow row : table.runs()) {
            for (int a = 0; a < table.analytes().size(); a++) {
                SampleCalls.Call c = row.calls().get(a);
                List<String> cells = new ArrayList<>();
                cells.add(text(row.run().spec().name()));
                cells.add(text(row.run().spec().sample()));
                cells.add(text(row.run().spec().conditions().buffer()));
                cells.add(text(table.analytes().get(a)));
                cells.add(c.outcome().label());
                cells.add(num(PeakTableColumn.Format.PROBABILITY.write(c.confidence())));
                cells.add(num(PeakTableColumn.Format.MAGNITUDE.write(c.correctedArea())));
                cells.add(num(PeakTableColumn.Format.MOBILITY.write(c.mobility())));
                cells.add(c.peakNumber() > 0 ? Integer.toString(c.peakNumber()) : "");
                p.printRecord(cells);
            }
        }
        p.flush();
    }

    /** Writes one row per peak of every recurring unknown, group by group. */
    public static void writeUnknowns(List<RecurringUnknowns.Group> groups, Writer out) throws IOException {
        CSVPrinter p = new CSVPrinter(out, FORMAT);
        p.printRecord(UNKNOWN_COLUMNS);
        for (RecurringUnknowns.Group g : groups) {
            for (RecurringUnknowns.Member m : g.members()) {
                p.printRecord(g.name(), text(g.buffer()), g.runs().size(), g.runsInBuffer(),
                        num(PeakTableColumn.Format.MOBILITY.write(g.meanMobility())),
                        num(PeakTableColumn.Format.MOBILITY.write(g.mobilitySd())), text(m.run()), m.peakNumber(),
                        num(PeakTableColumn.Format.TIME.write(m.apexTimeS())),
                        num(PeakTableColumn.Format.MOBILITY.write(m.mobility())),
                        num(PeakTableColumn.Format.MOBILITY.write(m.uncertainty())),
                        num(PeakTableColumn.Format.MAGNITUDE.write(m.correctedArea())));
            }
        }
        p.flush();
    }

    private static String text(String s) {
        return s == null ? "" : CsvCells.inert(s);
    }


    private static String num(String formatted) {
        return formatted == null ? "" : formatted;
    }
}
