package org.mobident.report.prediction;

import java.io.PrintWriter;
import java.util.Locale;
import org.mobident.recheck.PhScan;
import org.mobident.recheck.SeparationRule;
import org.mobident.text.NumberText;

/** The mobility-against-pH scan for a person: the table, then the pH ranges where two analytes co-migrate. */
public final class PhScanText {

    /** A smallest |Δμ| below this (half the printed 0.01) is reported as a crossing of the curves. */
    public static final double CROSSING_UNITS = 0.005;

    /** Most rows of the terminal table; a finer scan is shown at a whole multiple of its step. */
    public static final int MAX_SCAN_ROWS = 30;

    /** Widest analyte column of the terminal table; longer names are cut. */
    private static final int SCAN_COLUMN_WIDTH = 10;
    /** Most decimals of the ionic strength, temperature and pH step in the heading. */
    private static final int PLAIN_DECIMALS = 3;

    private PhScanText() {
    }

    /**
     * The scan for a person: a units line, a header of analyte names, then pH rows (every k-th step
     * so that at most {@value #MAX_SCAN_ROWS} rows are shown, and always the last), two decimals.
     */
    public static void writeTable(PhScan.Result r, double ionicStrengthMm, double temperatureC, PrintWriter o) {
        int n = r.pH().size();
        int every = Math.max(1, (int) Math.ceil((n - 1) / (double) (MAX_SCAN_ROWS - 1)));
        String step = every > 1
                ? NumberText.trimmed(r.pH().get(every) - r.pH().get(0), PLAIN_DECIMALS, PredictionText.NONE) : "";
        o.println(String.format(Locale.ROOT, "Predicted effective mobility against pH, 1e-9 m^2/(V s), at I = %s mmol/L "
                        + "and %s °C%s:", NumberText.trimmed(ionicStrengthMm, PLAIN_DECIMALS, PredictionText.NONE),
                NumberText.trimmed(temperatureC, PLAIN_DECIMALS, PredictionText.NONE),
                every > 1 ? " (one row per " + step + " pH; --out writes every step)" : ""));
        StringBuilder header = new StringBuilder(String.format(Locale.ROOT, "%6s", "pH"));
        for (PhScan.Curve c : r.curves()) {
            String name = c.name().length() <= SCAN_COLUMN_WIDTH ? c.name()
                    : c.name().substring(0, SCAN_COLUMN_WIDTH - 1) + "…";
            header.append(String.format(Locale.ROOT, " %" + SCAN_COLUMN_WIDTH + "s", name));
        }
        o.println(header);
        for (int i = 0; i < n; i++) {
            if (i % every != 0 && i != n - 1) {
                continue;
            }
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%6.2f", r.pH().get(i)));
            for (PhScan.Curve c : r.curves()) {
                row.append(String.format(Locale.ROOT, " %" + SCAN_COLUMN_WIDTH + "s",
                        NumberText.fixed(c.mobility().get(i), PredictionText.DECIMALS, PredictionText.NONE)));
            }
            o.println(row);
        }
    }

    /**
     * The co-migrations, one line each, or a line saying there are none.
     *
     * @param fromPh the scan's start as given, for that line
     * @param toPh   the scan's end as given
     */
    public static void writeComigrations(PhScan.Result r, double fromPh, double toPh, PrintWriter o) {
        if (r.comigrations().isEmpty()) {
            o.println("No pair comes closer than the separation rule allows anywhere in pH " + fromPh + "–" + toPh + ".");
        }
        for (PhScan.Comigration c : r.comigrations()) {
            o.println(describe(c, r.rule()));
        }
    }

    /**
     * One line per interval: "co-migration" when the smallest predicted |Δμ| is below the rule's
     * floor (the zones overlap), else "not reliably resolved" (apart, but within the prediction
     * uncertainty); the pH ends are printed with as many decimals as needed to tell them apart.
     */
    public static String describe(PhScan.Comigration c, SeparationRule rule) {
        double from = c.interval().fromPh();
        double to = c.interval().toPh();
        int decimals = 2;
        while (decimals < 4 && String.format(Locale.ROOT, "%." + decimals + "f", from)
                .equals(String.format(Locale.ROOT, "%." + decimals + "f", to))) {
            decimals++;
        }
        String f = "%." + decimals + "f";
        String range = String.format(Locale.ROOT, "pH " + f + (c.fromScanStart() ? " (scan start, may extend below)" : "")
                + " to " + f + (c.toScanEnd() ? " (scan end, may extend above)" : ""), from, to);
        String closest = c.closestUnits() < CROSSING_UNITS
                ? String.format(Locale.ROOT, "the curves cross at pH %.2f", c.closestPh())
                : String.format(Locale.ROOT, "closest %.2f units at pH %.2f", c.closestUnits(), c.closestPh());
        if (c.overlapping(rule)) {
            return String.format(Locale.ROOT, "co-migration: %s and %s, %s (%s%s)", c.first(), c.second(), range,
                    closest, c.closestUnits() < CROSSING_UNITS ? ""
                            : String.format(Locale.ROOT, ", under the %.2f-unit minimum", rule.minimumUnits()));
        }
        return String.format(Locale.ROOT, "not reliably resolved: %s and %s, %s (%s; the prediction uncertainty "
                + "asks for %.2f)", c.first(), c.second(), range, closest, c.thresholdUnits());
    }
}
