package org.mobident.chem;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.SpeciesModel;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.mobility.MobilityMath;

/**
 * Turns library entries that carry acidity constants and limiting mobilities into
 * {@link SpeciesModel}s.
 *
 * <p>Conventions of the library columns (see {@code reference-libraries/README.md}):
 * {@code pka} lists the thermodynamic pKa values in ascending order; {@code limiting_mobility}
 * lists one signed limiting mobility per form, most protonated form first (so a weak acid HₙA
 * starts with 0 for the neutral acid); {@code charge} is the charge number of the most highly
 * charged form (largest |z|), whose limiting mobility is also in {@code mobility}. The charge of
 * the most protonated form then follows: for a positive {@code charge} it is that charge (bases,
 * cations), for a negative one it is {@code charge + number of pKa values} (acids).
 *
 * <p>An entry without pKa values is a strong ion: its one form has {@code charge} and the limiting
 * mobility in {@code limiting_mobility} or, if that is empty, in {@code mobility}. Limiting
 * mobilities given at a {@code temperature_c} other than 25 °C are brought to 25 °C with the
 * viscosity of water ({@link MobilityMath#atTemperature}).
 */
public final class ReferenceIons {

    /** Path of the shipped reference library, relative to the project root. */
    public static final String SHIPPED_LIBRARY = "reference-libraries/ions-25C.csv";

    private ReferenceIons() {
    }

    /**
     * The species model of one library entry.
     *
     * @param entry        the entry
     * @param libraryLabel the library's file name, for messages
     * @return the model, limiting mobilities at 25 °C
     * @throws InputException when the entry lacks a charge or its pKa and mobility lists do not fit
     */
    public static SpeciesModel model(LibraryEntry entry, String libraryLabel) throws InputException {
        String name = entry.name();
        int charge = entry.charge();
        if (charge == 0) {
            throw new InputException(libraryLabel, 0, "charge",
                    "analyte '" + name + "' needs the charge number of its most charged form to be modelled");
        }
        List<Double> pKa = entry.pKa();
        List<Double> mobilities = entry.limitingMobilities();
        if (mobilities.isEmpty()) {
            if (!pKa.isEmpty()) {
                throw new InputException(libraryLabel, 0, "limiting_mobility", "analyte '" + name
                        + "' has pKa values but no limiting mobilities (one per form, most protonated first)");
            }
            mobilities = List.of(entry.mobility());
        }
        if (mobilities.size() != pKa.size() + 1) {
            throw new InputException(libraryLabel, 0, "limiting_mobility", "analyte '" + name + "' has "
                    + pKa.size() + " pKa values, so it needs " + (pKa.size() + 1)
                    + " limiting mobilities (one per form), not " + mobilities.size());
        }
        double fromC = entry.temperatureOrDefaultC();
        List<Double> at25 = new ArrayList<>(mobilities.size());
        for (double mu : mobilities) {
            at25.add(fromC == BufferConditions.REFERENCE_TEMPERATURE_C ? mu
                    : MobilityMath.atTemperature(mu, fromC, BufferConditions.REFERENCE_TEMPERATURE_C));
        }
        int highestCharge = charge > 0 ? charge : charge + pKa.size();
        try {
            return new SpeciesModel(name, highestCharge, pKa, at25);
        } catch (IllegalArgumentException e) {
            throw new InputException(libraryLabel, 0, "limiting_mobility", "analyte '" + name
                    + "' does not describe a consistent set of forms: " + e.getMessage(), e);
        }
    }

    /**
     * Models of every entry of a library that can be modelled (a non-zero charge), by name in file
     * order.
     *
     * @throws InputException when an entry with a charge has inconsistent pKa or mobility lists
     */
    public static Map<String, SpeciesModel> models(Library library) throws InputException {
        Map<String, SpeciesModel> out = new LinkedHashMap<>();
        for (LibraryEntry e : library.entries()) {
            if (e.charge() != 0) {
                out.put(e.name(), model(e, library.sourceFile()));
            }
        }
        return out;
    }

    /**
     * The reference library with each entry's mobility replaced by its predicted effective mobility
     * in the given buffer ({@link MobilityPredictor#predict}), so that peaks measured in that buffer
     * can be compared with it. An entry is predicted when it can be modelled ({@link #model}: a
     * non-zero charge and consistent pKa and mobility lists) and its {@code mobility} may be read
     * as a limiting value: it carries {@code limiting_mobility} values, or its stated ionic strength
     * is 0 or not given. Every other entry (no charge, inconsistent lists, or a value measured at a
     * positive ionic strength) is kept exactly as it is.
     *
     * <p>A predicted entry keeps name and charge; its mobility is the prediction, its
     * {@code mobility_sd} the prediction's standard uncertainty (n = 0: not measured), its pH,
     * ionic strength and temperature those of the buffer, its buffer label says "predicted", and its
     * pKa and limiting-mobility lists are left empty so that it is never modelled a second time.
     *
     * @param reference a library of limiting mobilities (for example {@link #SHIPPED_LIBRARY})
     * @param buffer    the buffer the comparison is for
     * @return a library of the same entries in the same order, with the same notes plus one saying so
     */
    public static Library effectiveAt(Library reference, BufferConditions buffer) {
        List<LibraryEntry> out = new ArrayList<>(reference.size());
        int predicted = 0;
        for (LibraryEntry e : reference.entries()) {
            boolean limiting = !e.limitingMobilities().isEmpty() || !(e.ionicStrengthMm() > 0.0);
            if (e.charge() == 0 || !limiting) {
                out.add(e);
                continue;
            }
            SpeciesModel m;
            try {
                m = model(e, reference.sourceFile());
            } catch (InputException ex) {
                out.add(e);
                continue;
            }
            MobilityPrediction p = MobilityPredictor.predict(m, buffer);
            out.add(new LibraryEntry(e.name(), p.mobility(), p.standardUncertainty(), 0, e.charge(), Double.NaN,
                    List.of(), List.of(), "predicted for pH " + buffer.pH() + ", I " + 1000.0 * buffer.ionicStrengthMolar()
                    + " mM", buffer.pH(), 1000.0 * buffer.ionicStrengthMolar(), buffer.temperatureC(),
                    "predicted by the mobility model from: " + (e.source() == null ? "(no source)" : e.source())));
            predicted++;
        }
        List<String> notes = new ArrayList<>(reference.notes());
        notes.add(predicted + " of " + reference.size() + " entries predicted as effective mobilities for pH "
                + buffer.pH() + ", ionic strength " + 1000.0 * buffer.ionicStrengthMolar() + " mmol/L, "
                + buffer.temperatureC() + " °C; the rest kept as stated");
        return new Library(out, reference.sourceFile(), notes);
    }

    /**
     * Reads a library file and models its entries.
     *
     * @param file a library CSV (for example {@link #SHIPPED_LIBRARY})
     * @throws InputException when the file cannot be read or an entry is inconsistent
     */
    public static Map<String, SpeciesModel> read(Path file) throws InputException {
        return models(LibraryCsv.read(file));
    }
}
