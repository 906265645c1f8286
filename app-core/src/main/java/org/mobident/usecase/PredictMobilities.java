package org.mobident.usecase;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.PhScan;
import org.mobident.recheck.PredictedMobility;
import org.mobident.recheck.SeparationRule;

/**
 * Predicts each analyte's effective mobility in another buffer (pH, ionic strength, temperature)
 * from its measured value and a physico-chemical model ({@link BufferTransfer}), or scans mobility
 * against pH and finds where two analytes would co-migrate ({@link PhScan}).
 */
public final class PredictMobilities {

    private final Library library;
    private final BufferTransfer predictor;
    private final BufferSpec oldBuffer;
    private final List<String> analytes;

    /**
     * @param library   the measured library
     * @param predictor the model, with the reference data it may use
     * @param oldBuffer the library's buffer where its entries do not say, or null
     * @param analytes  the analytes to include; empty for all
     */
    public PredictMobilities(Library library, BufferTransfer predictor, BufferSpec oldBuffer, List<String> analytes) {
        this.library = Objects.requireNonNull(library, "library");
        this.predictor = Objects.requireNonNull(predictor, "predictor");
        this.oldBuffer = oldBuffer;
        this.analytes = List.copyOf(analytes);
    }

    /**
     * The predictions in one buffer.
     *
     * @param buffer the new buffer
     * @param all    every analyte's prediction, in the library's order
     * @param shown  those asked for
     * @param source the measured library
     */
    public record Prediction(BufferSpec buffer, List<PredictedMobility> all, List<PredictedMobility> shown,
                             Library source) {
        public Prediction {
            all = List.copyOf(all);
            shown = List.copyOf(shown);
        }

        /** The predictions as a library (every analyte), its entries carrying {@code libraryBuffer}. */
        public Library asLibrary(BufferSpec libraryBuffer) {
            return BufferTransfer.asLibrary(all, source, libraryBuffer);
        }
    }

    /** Predicts every analyte's mobility in {@code newBuffer}. */
    public Prediction inBuffer(BufferSpec newBuffer) throws InputException {
        List<PredictedMobility> all = predictor.predictAll(library, oldBuffer, newBuffer);
        List<PredictedMobility> shown = new ArrayList<>();
        for (PredictedMobility p : all) {
            if (analytes.isEmpty() || analytes.contains(p.name())) {
                shown.add(p);
            }
        }
        return new Prediction(newBuffer, all, shown, library);
    }

    /**
     * Tabulates mobility against pH from {@code fromPh} to {@code toPh} in steps of {@code stepPh}, at
     * one ionic strength and temperature, with the default separation rule.
     *
     * @throws InputException naming {@code --scan} when the range cannot be scanned
     */
    public PhScan.Result scan(double fromPh, double toPh, double stepPh, double ionicStrengthMm, double temperatureC)
            throws InputException {
        try {
            return PhScan.scan(predictor, library, oldBuffer, analytes, fromPh, toPh, stepPh,
                    ionicStrengthMm / 1000.0, temperatureC, SeparationRule.DEFAULT);
        } catch (IllegalArgumentException e) {
            throw new InputException("command line", 0, "--scan", e.getMessage());
        }
    }
}
