package org.mobident.chem;

import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.buffer.SpeciesModel;
import org.mobident.io.TableReader;
import org.mobident.io.TableRow;
import org.mobident.io.TableSpec;

/**
 * Tabulated enthalpies of ionisation by species name and step, as shipped in
 * {@value #SHIPPED_TABLE} (columns {@code name, step, pka_25c, enthalpy_kj_per_mol,
 * heat_capacity_j_per_k_mol, source}), with the class values of {@link PkaTemperature} for
 * everything the table lacks.
 */
public final class IonisationEnthalpies {

    /** Path of the shipped table, relative to the project root. */
    public static final String SHIPPED_TABLE = "reference-libraries/ionisation-enthalpies.csv";
    /** File name of the table, looked for beside a reference library. */
    public static final String FILE_NAME = "ionisation-enthalpies.csv";

    private static final IonisationEnthalpies NONE = new IonisationEnthalpies(Map.of());

    /** name (lower case) → step (1-based) → values. */
    private final Map<String, Map<Integer, PkaTemperature.Step>> byName;

    private IonisationEnthalpies(Map<String, Map<Integer, PkaTemperature.Step>> byName) {
        this.byName = byName;
    }

    /** No table: every step gets its class value. */
    public static IonisationEnthalpies none() {
        return NONE;
    }

    /** The enthalpy table as the table reader expects it (other columns, such as a source, are kept out). */
    private static final TableSpec SPEC = TableSpec.of("enthalpy table", List.of("name", "step", "pka_25c",
            "enthalpy_kj_per_mol", "heat_capacity_j_per_k_mol", "source"), List.of("name", "step",
            "enthalpy_kj_per_mol")).ignoringUnknownColumns();

    /** Reads a table file. */
    public static IonisationEnthalpies read(Path file) throws InputException {
        return read(TableReader.open(file, SPEC));
    }

    /** Reads a table (the reader is not closed). */
    public static IonisationEnthalpies read(Reader in, String label) throws InputException {
        return read(TableReader.open(in, label, SPEC));
    }

    private static IonisationEnthalpies read(TableReader opened) throws InputException {
        Map<String, Map<Integer, PkaTemperature.Step>> out = new HashMap<>();
        try (TableReader table = opened) {
            for (TableRow r = table.next(); r != null; r = table.next()) {
                String name = r.get("name");
                int step = (int) number(r, "step");
                double h = number(r, "enthalpy_kj_per_mol");
                String cp = r.get("heat_capacity_j_per_k_mol");
                double heat = cp.isEmpty() ? Double.NaN : number(r, "heat_capacity_j_per_k_mol");
                if (step < 1 || name.isEmpty()) {
                    throw r.problem("step", "needs a name and a step of 1 or more");
                }
                out.computeIfAbsent(key(name), k -> new HashMap<>()).put(step,
                        new PkaTemperature.Step(h, PkaTemperature.TABULATED_ENTHALPY_SD_KJ, heat, true));
            }
        }
        return new IonisationEnthalpies(out);
    }

    private static double number(TableRow r, String column) throws InputException {
        try {
            return Double.parseDouble(r.get(column));
        } catch (NumberFormatException e) {
            throw r.problem(column, "'" + r.get(column) + "' is not a number", e);
        }
    }

    private static String key(String name) {
        return name.strip().toLowerCase(Locale.ROOT);
    }

    /** True when the table has a value for some step of this name. */
    public boolean covers(String name) {
        return byName.containsKey(key(name));
    }

    /**
     * One entry per pKa of the model, in its order: the tabulated values under the model's name, or
     * the class value of {@link PkaTemperature.Step#assumed} for the charge of that step's acid form.
     */
    public List<PkaTemperature.Step> steps(SpeciesModel model) {
        Map<Integer, PkaTemperature.Step> known = byName.getOrDefault(key(model.name()), Map.of());
        List<PkaTemperature.Step> out = new ArrayList<>(model.pKa().size());
        for (int i = 0; i < model.pKa().size(); i++) {
            PkaTemperature.Step s = known.get(i + 1);
            out.add(s != null ? s : PkaTemperature.Step.assumed(model.charge(i)));
        }
        return out;
    }

    /** The model's pKa values at a temperature ({@link PkaTemperature#atTemperature}). */
    public SpeciesModel atTemperature(SpeciesModel model, double temperatureC) {
        return PkaTemperature.atTemperature(model, steps(model), temperatureC);
    }

    /**
     * Standard uncertainty of the pKa change between two temperatures, the largest over the model's
     * steps (0 for a strong ion or equal temperatures).
     */
    public double shiftSd(SpeciesModel model, double fromC, double toC) {
        double max = 0.0;
        for (PkaTemperature.Step s : steps(model)) {
            max = Math.max(max, PkaTemperature.shiftSd(s.enthalpySdKjPerMol(), fromC, toC));
        }
        return max;
    }
}
