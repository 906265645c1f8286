package org.mobident.chem;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.mobident.InputException;
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
     * Reads a library file and models its entries.
     *
     * @param file a library CSV (for example {@link #SHIPPED_LIBRARY})
     * @throws InputException when the file cannot be read or an entry is inconsistent
     */
    public static Map<String, SpeciesModel> read(Path file) throws InputException {
        return models(LibraryCsv.read(file));
    }
}
