package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.mobident.InputException;
import org.mobident.recheck.BufferSpec;
import org.mobident.text.NumberText;
import org.mobident.usecase.ReferenceData;
import picocli.CommandLine.Option;

/** The new buffer, and optionally the old buffer (the library's) when the library does not state it. */
public final class BufferOptions {

    @Option(names = "--ph", paramLabel = "PH", description = "pH of the new buffer.")
    Double ph;

    @Option(names = "--ionic-strength-mm", paramLabel = "MM", description = "Ionic strength of the new buffer, mmol/L.")
    Double ionicStrengthMm;

    @Option(names = "--temperature-c", paramLabel = "C", description = "Temperature of the new method, °C (default 25).")
    double temperatureC = 25.0;

    @Option(names = {"--buffer", "--buffer-label"}, paramLabel = "LABEL",
            description = "Label of the new buffer (the same option as the runs' buffer label elsewhere), written into the predicted library's buffer column "
                    + "(default: its conditions, e.g. 'predicted: pH 7.00, I 20 mM, 25 °C').")
    String label;

    @Option(names = "--buffer-substance", paramLabel = "NAME",
            description = "The new buffer's buffering substance as the reference library names it (e.g. Tris, "
                    + "imidazole, phosphate); with --ph-measured-at-c the new pH is moved to the method temperature "
                    + "by the substance's enthalpy of ionisation.")
    String bufferSubstance;

    @Option(names = "--ph-measured-at-c", paramLabel = "C",
            description = "Temperature at which the new buffer's pH was measured, °C (default: the method temperature, "
                    + "i.e. no shift). Needs --buffer-substance and --reference.")
    Double phMeasuredAtC;

    @Option(names = "--old-ph", paramLabel = "PH", description = "pH of the library's buffer, where its entries do not state it.")
    Double oldPh;

    @Option(names = "--old-ionic-strength-mm", paramLabel = "MM",
            description = "Ionic strength of the library's buffer (mmol/L), where its entries do not state it.")
    Double oldIonicStrengthMm;

    @Option(names = "--old-temperature-c", paramLabel = "C",
            description = "Temperature of the library's values, where its entries do not state it (default 25).")
    double oldTemperatureC = 25.0;

    /** True when the new buffer's pH and ionic strength were both given. */
    boolean newGiven() {
        return ph != null && ionicStrengthMm != null;
    }

    BufferSpec newBuffer() throws InputException {
        if (!newGiven()) {
            throw new InputException("command line", 0, ph == null ? "--ph" : "--ionic-strength-mm",
                    "the new buffer needs both --ph and --ionic-strength-mm");
        }
        return spec(label, ph, ionicStrengthMm, temperatureC, "--ph");
    }

    /** True when --buffer-label was given (not blank). */
    boolean labelGiven() {
        return label != null && !label.isBlank();
    }

    /**
     * The new buffer for writing into a library's {@code buffer} column: labelled with
     * --buffer-label, or else with its conditions, e.g. {@code "predicted: pH 7.00, I 20 mM, 25 °C"}.
     */
    BufferSpec newBufferForLibrary() throws InputException {
        BufferSpec b = newBuffer();
        if (labelGiven()) {
            return b;
        }
        return spec(String.format(java.util.Locale.ROOT, "predicted: pH %.2f, I %s mM, %s °C", ph,
                NumberText.trimmed(ionicStrengthMm, 3, "-"), NumberText.trimmed(temperatureC, 3, "-")), ph,
                ionicStrengthMm, temperatureC, "--ph");
    }

    /** The old buffer when given on the command line, else null (each entry's own conditions are used). */
    BufferSpec oldBuffer() throws InputException {
        if (oldPh == null && oldIonicStrengthMm == null) {
            return null;
        }
        if (oldPh == null || oldIonicStrengthMm == null) {
            throw new InputException("command line", 0, oldPh == null ? "--old-ph" : "--old-ionic-strength-mm",
                    "the library's buffer needs both --old-ph and --old-ionic-strength-mm");
        }
        return spec("library buffer", oldPh, oldIonicStrengthMm, oldTemperatureC, "--old-ph");
    }

    private static BufferSpec spec(String label, double ph, double mm, double t, String field) throws InputException {
        try {
            return BufferSpec.of(label, ph, mm, t);
        } catch (IllegalArgumentException e) {
            throw new InputException("command line", 0, field, e.getMessage());
        }
    }

    /**
     * The new buffer, its pH moved to the method's temperature when --buffer-substance and
     * --ph-measured-at-c say so; the line that says what was done goes to {@code out}.
     */
    static BufferSpec adjustedNewBuffer(BufferOptions o, Path referenceFile, PrintWriter out)
            throws InputException {
        ReferenceData.AdjustedBuffer a = ReferenceData.adjusted(o.newBuffer(), o.bufferSubstance, o.phMeasuredAtC,
                referenceFile);
        if (a.note() != null) {
            out.println(a.note());
        }
        return a.buffer();
    }
}
