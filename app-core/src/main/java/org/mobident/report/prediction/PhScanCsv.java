package org.mobident.report.prediction;

import java.io.IOException;
import java.io.Writer;
import java.util.Locale;
import org.mobident.recheck.PhScan;
import org.mobident.report.CsvCells;

/** The mobility-against-pH scan as CSV: a pH column and one column per analyte, three decimals, every step. */
public final class PhScanCsv {

    private PhScanCsv() {
    }

    public static void write(PhScan.Result r, Writer w) throws IOException {
        w.write(text(r));
    }

    /** The whole table as text. */
    public static String text(PhScan.Result r) {
        StringBuilder table = new StringBuilder("ph");
        for (PhScan.Curve c : r.curves()) {
            table.append(',').append(CsvCells.inert(c.name()));
        }
        table.append('\n');
        for (int i = 0; i < r.pH().size(); i++) {
            table.append(String.format(Locale.ROOT, "%.3f", r.pH().get(i)));
            for (PhScan.Curve c : r.curves()) {
                table.append(String.format(Locale.ROOT, ",%.3f", c.mobility().get(i)));
            }
            table.append('\n');
        }
        return table.toString();
    }
}
