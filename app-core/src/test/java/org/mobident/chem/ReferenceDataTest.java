package org.mobident.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.buffer.SpeciesModel;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.mobility.MobilityMath;

/**
 * The shipped reference data checked against themselves and against a second handbook: every
 * mobility recomputed from the conductivity its source cell states, signs against charges, every
 * row sourced, the ions a lab asks for present, and spot checks against Lange's table.
 */
class ReferenceDataTest {

    /** Rounding of the shipped values to 0.01 mobility units. */
    private static final double ROUNDING = 0.005 + 1e-9;

    /** "λ(form, z=-2) = 80 S cm²/mol" in a source cell. */
    private static final Pattern LAMBDA = Pattern.compile("λ\\(([^,]+), z=([+-]\\d)\\) = ([0-9.]+) S cm²/mol");
    /** "μ(form, z=-1) = -35.00" in a source cell. */
    private static final Pattern MOBILITY = Pattern.compile("μ\\(([^,]+), z=([+-]\\d)\\) = (-?[0-9.]+)");

    private static Library library() throws InputException {
        Path p = Path.of("..").resolve(ReferenceIons.SHIPPED_LIBRARY);
        return LibraryCsv.read(Files.exists(p) ? p : Path.of(ReferenceIons.SHIPPED_LIBRARY));
    }

    @Test
    void atLeastNinetyIonsEachWithAnHonestSource() throws InputException {
        Library lib = library();
        assertTrue(lib.size() >= 90, "rows: " + lib.size());
        for (LibraryEntry e : lib.entries()) {
            String s = e.source();
            assertTrue(s.contains("[read in a stored copy]") || s.contains("[from memory") || s.contains("estimate"),
                    e.name() + " says how its values were obtained: " + s);
            assertTrue(LAMBDA.matcher(s).find() || MOBILITY.matcher(s).find(), e.name() + " states its numbers");
            if (!e.pKa().isEmpty()) {
                assertTrue(s.contains("pKa"), e.name() + " names the source of its pKa values");
            }
        }
    }

    @Test
    void theIonsTheIssueNamesArePresent() throws InputException {
        Library lib = library();
        for (String name : List.of("malate", "maleate", "fumarate", "mesylate", "tosylate", "besylate",
                "trifluoroacetate", "chromate", "phthalate", "borate", "chlorite", "glycolate", "pyruvate", "gluconate",
                "Tris", "imidazole", "ethanolammonium", "diethanolammonium", "triethanolammonium", "iron(II)",
                "iron(III)", "nickel", "cobalt(II)", "cadmium", "lead", "aluminium")) {
            assertTrue(lib.find(name).isPresent(), name);
        }
    }

    /**
     * μ = λ/(|z|F) with λ the molar conductivity, i.e. μ = λ₁/F with the per-charge value λ₁ the
     * handbooks print (Robinson &amp; Stokes, Electrolyte Solutions, ch. 2; IUPAC Gold Book, "ionic
     * conductivity"): every λ a source cell states is recomputed and compared with the form's
     * limiting mobility, and every stated mobility with the column; the sign follows the charge.
     */
    @Test
    void everyMobilityFollowsFromTheStatedConductivityWithTheSignOfItsCharge() throws InputException {
        Map<String, SpeciesModel> models = ReferenceIons.models(library());
        int checked = 0;
        for (LibraryEntry e : library().entries()) {
            SpeciesModel m = models.get(e.name());
            List<Integer> formsSeen = new ArrayList<>();
            Matcher l = LAMBDA.matcher(e.source());
            while (l.find()) {
                int z = Integer.parseInt(l.group(2));
                int form = m.highestCharge() - z;
                assertTrue(form >= 0 && form < m.formCount(), e.name() + ": no form of charge " + z);
                double mu = m.limitingMobilities().get(form);
                double expected = MobilityMath.limitingMobilityPerCharge(Double.parseDouble(l.group(3)), z);
                assertEquals(expected, mu, ROUNDING, e.name() + " " + l.group(1));
                formsSeen.add(form);
                checked++;
            }
            Matcher u = MOBILITY.matcher(e.source());
            while (u.find()) {
                int z = Integer.parseInt(u.group(2));
                int form = m.highestCharge() - z;
                assertEquals(Double.parseDouble(u.group(3)), m.limitingMobilities().get(form), 1e-9, e.name());
                formsSeen.add(form);
            }
            for (int i = 0; i < m.formCount(); i++) {
                int z = m.charge(i);
                double mu = m.limitingMobilities().get(i);
                assertEquals(Integer.signum(z), (int) Math.signum(mu), e.name() + " form " + i + " sign against charge");
                if (z != 0) {
                    assertTrue(formsSeen.contains(i), e.name() + ": form " + i + " has no stated origin");
                }
            }
            assertEquals(Integer.signum(e.charge()), (int) Math.signum(e.mobility()), e.name());
        }
        assertTrue(checked >= 100, "λ values recomputed: " + checked);
    }

    /**
     * Ten rows against a second handbook: Lange's Handbook of Chemistry, Table 8.32 "Limiting
     * equivalent ionic conductances in aqueous solutions", 25 °C column, per unit charge, read in a
     * stored copy: Li⁺ 38.69, K⁺ 73.5, Ag⁺ 61.9, ½Ba²⁺ 63.9, ½Ca²⁺ 59.5, ½Fe²⁺ 53.5, ⅓Fe³⁺ 69, ½Ni²⁺ 50,
     * ½Pb²⁺ 71, ⅓Al³⁺ 61. The shipped rows come from the CRC table; the two compilations agree within
     * 2 % for these ions (they differ by 4–6 % for Co²⁺ and Cu²⁺, which are therefore not used here).
     */
    @Test
    void tenRowsAgreeWithLangesTable() throws InputException {
        Library lib = library();
        Object[][] lange = {
                {"lithium", 38.69, 1}, {"potassium", 73.5, 1}, {"silver", 61.9, 1}, {"barium", 63.9, 2},
                {"calcium", 59.5, 2}, {"iron(II)", 53.5, 2}, {"iron(III)", 69.0, 3}, {"nickel", 50.0, 2},
                {"lead", 71.0, 2}, {"aluminium", 61.0, 3}};
        for (Object[] row : lange) {
            double expected = MobilityMath.limitingMobilityPerCharge((Double) row[1], (Integer) row[2]);
            double shipped = lib.find((String) row[0]).orElseThrow().mobility();
            assertEquals(expected, shipped, 0.02 * Math.abs(expected), (String) row[0]);
        }
    }
}
