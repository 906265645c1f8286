package org.mobident.report.prediction;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.ModelCoverage;
import org.mobident.recheck.PredictedMobility;
import org.mobident.recheck.PredictionBasis;
import org.mobident.text.NumberText;

/** The predicted mobilities in a new buffer, for a person: one row per analyte, then what the bases mean. */
public final class PredictionText {
    /** Decimals of mobilities in the tables, 1e-9 m²/(V s). */
    static final int DECIMALS = 2;
    /** A value that is not known (never "NaN" on a terminal). */
    static final String NONE = "-";

    private PredictionText() {
    }

    /**
     * Writes the table of {@code shown} and the notes that apply to them.
     *
     * @param buffer the new buffer, named in the heading
     */
    public static void write(BufferSpec buffer, List<PredictedMobility> shown, PrintWriter o) {
        o.println("Predicted effective mobilities in " + buffer.describe() + " (1e-9 m^2/(V s)).");
        // per row only what is particular to that analyte; what the basis implies is said once below
        boolean remarks = shown.stream().anyMatch(p -> !p.specificNote().isBlank());
        int basisWidth = shown.stream().mapToInt(p -> p.basis().description().length()).max().orElse(5);
        String layout = "%-16s %9s %9s %7s  " + (remarks ? "%-" + basisWidth + "s  %s" : "%s");
        o.println(String.format(Locale.ROOT, layout, "analyte", "measured", "predicted", "+/-", "basis", "remark")
                .stripTrailing());
        for (PredictedMobility p : shown) {
            o.println(String.format(Locale.ROOT, layout, p.name(), NumberText.fixed(p.measuredA(), DECIMALS, NONE),
                    NumberText.fixed(p.predicted(), DECIMALS, NONE), NumberText.fixed(p.uncertainty(), DECIMALS, NONE),
                    p.basis().description(), p.specificNote()).stripTrailing());
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
        List<String> missing = shown.stream().filter(p -> p.basis() == PredictionBasis.NO_MODEL)
                .map(PredictedMobility::name).toList();
        if (!missing.isEmpty()) {
            o.println("No model data for " + String.join(", ", missing) + ". To fix: for each, "
                    + ModelCoverage.HOW_TO_FIX + ".");
        }
        o.println("Predictions are estimates: measure standards in the new buffer before relying on them.");
    }
}
