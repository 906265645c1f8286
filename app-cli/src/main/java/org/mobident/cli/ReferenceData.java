package org.mobident.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.chem.BufferPh;
import org.mobident.chem.IonisationEnthalpies;
import org.mobident.chem.ReferenceIons;
import org.mobident.chem.SpeciesModel;
import org.mobident.library.LibraryCsv;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.text.NumberText;

/**
 * The reference data a prediction command uses: the reference library given with --reference and
 * the table of enthalpies of ionisation beside it ({@value IonisationEnthalpies#FILE_NAME}), read
 * when present.
 */
final class ReferenceData {

    private ReferenceData() {
    }

    /** The enthalpy table beside the reference library, or none (class values). */
    static IonisationEnthalpies enthalpies(Path referenceFile) throws InputException {
        if (referenceFile == null) {
            return IonisationEnthalpies.none();
        }
        Path parent = referenceFile.toAbsolutePath().getParent();
        Path table = parent == null ? null : parent.resolve(IonisationEnthalpies.FILE_NAME);
        return table != null && Files.isRegularFile(table) ? IonisationEnthalpies.read(table)
                : IonisationEnthalpies.none();
    }

    /** The predictor: reference models by name (when given) and the enthalpy table beside them. */
    static BufferTransfer transfer(Path referenceFile) throws InputException {
        BufferTransfer t = referenceFile == null ? BufferTransfer.withoutReference()
                : BufferTransfer.withReference(LibraryCsv.read(referenceFile));
        return t.withEnthalpies(enthalpies(referenceFile));
    }

    /**
     * The new buffer with its pH moved from the temperature it was measured at to the method's
     * temperature, when --buffer-substance and --ph-measured-at-c say so; one line on {@code out}
     * says what was done.
     */
    static BufferSpec adjusted(BufferSpec b, BufferOptions o, Path referenceFile, PrintWriter out)
            throws InputException {
        if (o.bufferSubstance == null || o.phMeasuredAtC == null || o.phMeasuredAtC == b.temperatureC()) {
            return b;
        }
        if (referenceFile == null) {
            throw new InputException("command line", 0, "--buffer-substance",
                    "the buffer substance is looked up in the reference library: give --reference too");
        }
        Map<String, SpeciesModel> models = ReferenceIons.read(referenceFile);
        SpeciesModel substance = models.entrySet().stream()
                .filter(e -> e.getKey().equalsIgnoreCase(o.bufferSubstance.strip())).map(Map.Entry::getValue)
                .findFirst().orElseThrow(() -> new InputException("command line", 0, "--buffer-substance", "'"
                        + o.bufferSubstance + "' is not in " + referenceFile + "; name it as that library does"));
        IonisationEnthalpies table = enthalpies(referenceFile);
        double pH = BufferPh.pHAt(substance, table, b.pH(), o.phMeasuredAtC, b.temperatureC());
        double sd = BufferPh.shiftSd(substance, table, b.pH(), o.phMeasuredAtC, b.temperatureC());
        out.println(String.format(Locale.ROOT, "Buffer pH: %s at pH %.2f (measured at %s °C) is at pH %.2f ± %.2f at "
                        + "%s °C (van 't Hoff, %s enthalpy of ionisation).", substance.name(), b.pH(),
                NumberText.trimmed(o.phMeasuredAtC, 2, "-"), pH, sd, NumberText.trimmed(b.temperatureC(), 2, "-"),
                BufferPh.tabulated(substance, table, b.pH(), o.phMeasuredAtC) ? "tabulated" : "an assumed"));
        try {
            return new BufferSpec(b.label(), pH, b.ionicStrengthMolar(), b.temperatureC());
        } catch (IllegalArgumentException e) {
            throw new InputException("command line", 0, "--ph", e.getMessage());
        }
    }
}
