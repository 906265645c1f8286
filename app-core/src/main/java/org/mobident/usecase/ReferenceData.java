package org.mobident.usecase;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.buffer.SpeciesModel;
import org.mobident.chem.BufferPh;
import org.mobident.chem.IonisationEnthalpies;
import org.mobident.chem.ReferenceIons;
import org.mobident.library.LibraryCsv;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.text.NumberText;

/**
 * The reference data a prediction uses: the reference library (limiting mobilities and pKa values,
 * e.g. {@code reference-libraries/ions-25C.csv}) and the table of enthalpies of ionisation beside it
 * ({@value IonisationEnthalpies#FILE_NAME}), read when present.
 */
public final class ReferenceData {

    private ReferenceData() {
    }

    /** The enthalpy table beside the reference library, or none (class values). */
    private static IonisationEnthalpies enthalpies(Path referenceFile) throws InputException {
        Path table = enthalpyTable(referenceFile);
        return table == null ? IonisationEnthalpies.none() : IonisationEnthalpies.read(table);
    }

    /** The enthalpy table file beside the reference library, or null when there is none. */
    private static Path enthalpyTable(Path referenceFile) {
        if (referenceFile == null) {
            return null;
        }
        Path parent = referenceFile.toAbsolutePath().getParent();
        Path table = parent == null ? null : parent.resolve(IonisationEnthalpies.FILE_NAME);
        return table != null && Files.isRegularFile(table) ? table : null;
    }

    /** The predictor: reference models by name (when given) and the enthalpy table beside them. */
    public static BufferTransfer transfer(Path referenceFile) throws InputException {
        BufferTransfer t = referenceFile == null ? BufferTransfer.withoutReference()
                : BufferTransfer.withReference(LibraryCsv.read(referenceFile));
        Path table = enthalpyTable(referenceFile);
        return table == null ? t : t.withEnthalpyTable(table);
    }

    /**
     * A buffer with its pH at the method's temperature, and the sentence that says what was done
     * (null when nothing was).
     *
     * @param buffer the buffer to use
     * @param note   one line for the user, or null
     */
    public record AdjustedBuffer(BufferSpec buffer, String note) {
    }

    /**
     * The new buffer with its pH moved from the temperature it was measured at to the method's
     * temperature (van 't Hoff with the buffer substance's enthalpy of ionisation), when both the
     * substance (named as in the reference library) and that temperature are given; otherwise the
     * buffer unchanged.
     *
     * @param b             the buffer as given (pH as measured)
     * @param substanceName the buffer substance, or null
     * @param measuredAtC   the temperature the pH was measured at, °C, or null
     * @param referenceFile the reference library, or null
     */
    public static AdjustedBuffer adjusted(BufferSpec b, String substanceName, Double measuredAtC, Path referenceFile)
            throws InputException {
        if (substanceName == null || measuredAtC == null || measuredAtC == b.temperatureC()) {
            return new AdjustedBuffer(b, null);
        }
        if (referenceFile == null) {
            throw new InputException("command line", 0, "--buffer-substance",
                    "the buffer substance is looked up in the reference library: give --reference too");
        }
        Map<String, SpeciesModel> models = ReferenceIons.read(referenceFile);
        SpeciesModel substance = models.entrySet().stream()
                .filter(e -> e.getKey().equalsIgnoreCase(substanceName.strip())).map(Map.Entry::getValue)
                .findFirst().orElseThrow(() -> new InputException("command line", 0, "--buffer-substance", "'"
                        + substanceName + "' is not in " + referenceFile + "; name it as that library does"));
        IonisationEnthalpies table = enthalpies(referenceFile);
        double pH = BufferPh.pHAt(substance, table, b.pH(), measuredAtC, b.temperatureC());
        double sd = BufferPh.shiftSd(substance, table, b.pH(), measuredAtC, b.temperatureC());
        String note = String.format(Locale.ROOT, "Buffer pH: %s at pH %.2f (measured at %s °C) is at pH %.2f ± %.2f at "
                        + "%s °C (van 't Hoff, %s enthalpy of ionisation).", substance.name(), b.pH(),
                NumberText.trimmed(measuredAtC, 2, "-"), pH, sd, NumberText.trimmed(b.temperatureC(), 2, "-"),
                BufferPh.tabulated(substance, table, b.pH(), measuredAtC) ? "tabulated" : "an assumed");
        try {
            return new AdjustedBuffer(new BufferSpec(b.label(), pH, b.ionicStrengthMolar(), b.temperatureC()), note);
        } catch (IllegalArgumentException e) {
            throw new InputException("command line", 0, "--ph", e.getMessage());
        }
    }
}
