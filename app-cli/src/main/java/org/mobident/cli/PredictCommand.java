package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.recheck.PhScan;
import org.mobident.recheck.PredictedMobility;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.SeparationRule;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code mobident predict}: effective mobilities of a library's analytes in another buffer. */
@Command(name = "predict",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        description = "Predicts each analyte's effective mobility in a new buffer (pH, ionic strength, temperature) "
                + "from its measured value and a physico-chemical model (ionic forms, Davies activities, an "
                + "Onsager-type ionic-strength correction, water viscosity), with an uncertainty. With --scan it "
                + "tabulates mobility against pH and lists the pH ranges where two analytes would co-migrate. "
                + "Predictions guide method changes; they do not replace measuring standards in the new buffer.",
        footer = {"", "Exit codes: 0 done; 2 bad command line; 3 unusable library or buffer; 4 output not written."})
public final class PredictCommand implements Callable<Integer> {

    /** A smallest |Δμ| below this (half the printed 0.01) is reported as a crossing of the curves. */
    static final double CROSSING_UNITS = 0.005;

    @Spec
    CommandSpec spec;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "The measured library.")
    Path libraryFile;

    @Option(names = "--reference", paramLabel = "FILE",
            description = "Reference library with pKa values and limiting mobilities for analytes whose entries lack "
                    + "them (e.g. reference-libraries/ions-25C.csv).")
    Path referenceFile;

    @Mixin
    BufferOptions buffers;

    @Option(names = "--scan", paramLabel = "FROM:TO:STEP",
            description = "Tabulate mobility against pH over this range instead (at the new ionic strength and temperature).")
    String scan;

    @Option(names = "--analytes", paramLabel = "NAMES", split = ",", description = "Analytes to include (default all).")
    List<String> analytes = new ArrayList<>();

    @Option(names = {"-o", "--out"}, paramLabel = "FILE",
            description = "Write the predicted library (or, with --scan, the pH table) as CSV.")
    Path out;

    @Option(names = "--overwrite", description = "Replace the output file if it exists.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        PrintWriter o = spec.commandLine().getOut();
        if (scan == null && !buffers.newGiven()) {
            // a usage mistake, exit 2 as in 'recheck'
            spec.commandLine().getErr().println("mobident predict: give the new buffer's --ph and "
                    + "--ionic-strength-mm (or --scan FROM:TO:STEP with --ionic-strength-mm).");
            return ExitCodes.USAGE;
        }
        Outputs.checkFree(overwrite, out);
        Library library = LibraryCsv.read(libraryFile);
        BufferTransfer predictor = ReferenceData.transfer(referenceFile);
        if (scan != null) {
            return scan(library, predictor, o);
        }
        var bufferB = ReferenceData.adjusted(buffers.newBuffer(), buffers, referenceFile, o);
        List<PredictedMobility> predictions = predictor.predictAll(library, buffers.oldBuffer(), bufferB);
        o.println("Predicted effective mobilities in " + bufferB.describe() + " (1e-9 m^2/(V s)).");
        List<PredictedMobility> shown = new ArrayList<>();
        for (PredictedMobility p : predictions) {
            if (analytes.isEmpty() || analytes.contains(p.name())) {
                shown.add(p);
            }
        }
        // per row only what is particular to that analyte; what the basis implies is said once below
        boolean remarks = shown.stream().anyMatch(p -> !p.specificNote().isBlank());
        int basisWidth = shown.stream().mapToInt(p -> p.basis().description().length()).max().orElse(5);
        String layout = "%-16s %9s %9s %7s  " + (remarks ? "%-" + basisWidth + "s  %s" : "%s");
        o.println(String.format(Locale.ROOT, layout, "analyte", "measured", "predicted", "+/-", "basis", "remark")
                .stripTrailing());
        for (PredictedMobility p : shown) {
            o.println(String.format(Locale.ROOT, layout, p.name(), num(p.measuredA()), num(p.predicted()),
                    num(p.uncertainty()), p.basis().description(), p.specificNote()).stripTrailing());
        }
        o.println("basis: own pKa data = the library entry's pKa and limiting mobilities; reference pKa data = "
                + "taken from --reference by name; charge only = a strong ion; no model = the pH change is not "
                + "accounted for.");
        List<String> assumed = shown.stream().filter(p -> p.note().contains(BufferTransfer.NOTE_ASSUMED_ENTHALPY))
                .map(PredictedMobility::name).toList();
        if (!assumed.isEmpty()) {
            o.println("pKa values moved to the method temperature with an assumed enthalpy of ionisation (no tabulated "
                    + "value; ±10 kJ/mol for acids, ±15 for protonated amines, in the uncertainty): "
                    + String.join(", ", assumed) + ".");
        }
        List<String> missing = shown.stream().filter(p -> p.basis() == org.mobident.recheck.PredictionBasis.NO_MODEL)
                .map(PredictedMobility::name).toList();
        if (!missing.isEmpty()) {
            o.println("No model data for " + String.join(", ", missing) + ". To fix: for each, "
                    + org.mobident.recheck.ModelCoverage.HOW_TO_FIX + ".");
        }
        o.println("Predictions are estimates: measure standards in the new buffer before relying on them.");
        if (out != null) {
            Library predicted = BufferTransfer.asLibrary(predictions, library, buffers.newBufferForLibrary());
            LibraryBuildCommand.writeLibrary(out, overwrite, predicted);
            o.println("predicted library written to " + out);
        }
        return ExitCodes.OK;
    }

    /** Two decimals; "-" for a value that is not known (never "NaN" on a terminal). */
    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f", v) : "-";
    }

    /**
     * One line per interval: "co-migration" when the smallest predicted |Δμ| is below the rule's
     * floor (the zones overlap), else "not reliably resolved" (apart, but within the prediction
     * uncertainty); the pH ends are printed with as many decimals as needed to tell them apart.
     */
    static String describe(PhScan.Comigration c, SeparationRule rule) {
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

    /** Most rows of the terminal table; a finer scan is shown at a whole multiple of its step. */
    static final int MAX_SCAN_ROWS = 30;
    /** Widest analyte column of the terminal table; longer names are cut. */
    private static final int SCAN_COLUMN_WIDTH = 10;

    /** The scan as CSV: a pH column and one column per analyte, three decimals. */
    static String scanCsv(PhScan.Result r) {
        StringBuilder table = new StringBuilder("ph");
        for (PhScan.Curve c : r.curves()) {
            table.append(',').append(org.mobident.report.CsvCells.inert(c.name()));
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

    /**
     * The scan for a person: a units line, a header of analyte names, then pH rows (every k-th step
     * so that at most {@value #MAX_SCAN_ROWS} rows are shown, and always the last), two decimals.
     */
    static void writeScanTable(PhScan.Result r, double ionicStrengthMm, double temperatureC, PrintWriter o) {
        int n = r.pH().size();
        int every = Math.max(1, (int) Math.ceil((n - 1) / (double) (MAX_SCAN_ROWS - 1)));
        o.println(String.format(Locale.ROOT, "Predicted effective mobility against pH, 1e-9 m^2/(V s), at I = %s mmol/L "
                        + "and %s °C%s:", plainNumber(ionicStrengthMm), plainNumber(temperatureC),
                every > 1 ? " (one row per " + plainNumber(r.pH().get(every) - r.pH().get(0))
                        + " pH; --out writes every step)" : ""));
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
                row.append(String.format(Locale.ROOT, " %" + SCAN_COLUMN_WIDTH + "s", num(c.mobility().get(i))));
            }
            o.println(row);
        }
    }

    private static String plainNumber(double v) {
        return new java.math.BigDecimal(String.format(Locale.ROOT, "%.3f", v)).stripTrailingZeros().toPlainString();
    }

    private int scan(Library library, BufferTransfer predictor, PrintWriter o) throws InputException, OutputException {
        String[] p = scan.split(":");
        double from;
        double to;
        double step;
        try {
            from = Double.parseDouble(p[0]);
            to = Double.parseDouble(p[1]);
            step = p.length > 2 ? Double.parseDouble(p[2]) : 0.1;
        } catch (RuntimeException e) {
            throw new InputException("command line", 0, "--scan", "expected FROM:TO:STEP, e.g. 3:10:0.1, got '" + scan + "'");
        }
        if (buffers.ionicStrengthMm == null) {
            throw new InputException("command line", 0, "--ionic-strength-mm", "the scan needs the ionic strength");
        }
        PhScan.Result r;
        try {
            r = PhScan.scan(predictor, library, buffers.oldBuffer(), analytes, from, to, step,
                    buffers.ionicStrengthMm / 1000.0, buffers.temperatureC, SeparationRule.DEFAULT);
        } catch (IllegalArgumentException e) {
            throw new InputException("command line", 0, "--scan", e.getMessage());
        }
        if (out != null) {
            String csv = scanCsv(r);
            Outputs.write(out, overwrite, w -> w.write(csv));
        }
        writeScanTable(r, buffers.ionicStrengthMm, buffers.temperatureC, o);
        if (out != null) {
            o.println("full mobility-vs-pH table (CSV, every step) written to " + out);
        }
        if (r.comigrations().isEmpty()) {
            o.println("No pair comes closer than the separation rule allows anywhere in pH " + from + "–" + to + ".");
        }
        for (PhScan.Comigration c : r.comigrations()) {
            o.println(describe(c, r.rule()));
        }
        return ExitCodes.OK;
    }
}
