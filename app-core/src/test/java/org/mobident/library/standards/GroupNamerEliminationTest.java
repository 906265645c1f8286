package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import static org.mobident.library.standards.StandardsRuns.anion;
import static org.mobident.library.standards.StandardsRuns.groups;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/** Naming the last groups of a mix by elimination (invented mobilities; the rules are this program's). */
class GroupNamerEliminationTest {

    private static final BuildSettings DEFAULTS = BuildSettings.defaults();



    private static Library reference(String[] names, double[] mobilities) {
        List<LibraryEntry> es = new ArrayList<>();
        for (int i = 0; i < names.length; i++) {
            es.add(new LibraryEntry(names[i], mobilities[i], Double.NaN, 0, -1, Double.NaN, List.of(), List.of(), null,
                    Double.NaN, Double.NaN, Double.NaN, null));
        }
        return new Library(es, "reference.csv", List.of());
    }

    @Test
    void theLastAnalyteTakesTheLastGroup() {
        // two analytes named by approx_mobility; the third has neither approx nor reference value
        StandardsMix mix = new StandardsMix("m", List.of(anion("a", -70), anion("b", -60), anion("c", Double.NaN)));
        GroupNamer.Naming n = GroupNamer.name(mix, groups(-70.2, -60.1, -45.0), null, Set.of(), DEFAULTS);
        assertEquals("c", n.analyteOfGroup()[2].name());
        assertEquals(NamingBasis.ELIMINATION, n.basisOfGroup()[2]);
        assertEquals("a", n.analyteOfGroup()[0].name());
    }

    @Test
    void notWhenAnExtraGroupIsSeenInEveryRun() {
        StandardsMix mix = new StandardsMix("m", List.of(anion("a", -70), anion("b", -60), anion("c", Double.NaN)));
        GroupNamer.Naming n = GroupNamer.name(mix, groups(-70.2, -60.1, -45.0, -40.0), null, Set.of(), DEFAULTS);
        assertNull(n.analyteOfGroup()[2]);
        assertNull(n.analyteOfGroup()[3]);
    }

    @Test
    void notWhenTheLastGroupIsOutOfReachOfTheReferenceValue() {
        StandardsMix mix = new StandardsMix("m", List.of(anion("a", -70), anion("b", -60), anion("c", Double.NaN)));
        Library ref = reference(new String[] {"c"}, new double[] {-30.0});
        GroupNamer.Naming n = GroupNamer.name(mix, groups(-70.2, -60.1, -45.0), ref, Set.of("c"), DEFAULTS);
        assertNull(n.analyteOfGroup()[2]);
    }

    @Test
    void twoLeftArePairedWhenOnlyOnePairingFits() {
        // Predicted values -70 and -66; groups -71.5 and -67.8. Each pairing alone is unclear (the other group
        // is 2.2 units from -70, less than twice 1.5), but together: 1.5 + 1.8 = 3.3 against 5.5 + 2.2 = 7.7.
        StandardsMix mix = new StandardsMix("m", List.of(anion("x", Double.NaN), anion("y", Double.NaN)));
        Library ref = reference(new String[] {"x", "y"}, new double[] {-70.0, -66.0});
        GroupNamer.Naming n = GroupNamer.name(mix, groups(-71.5, -67.8), ref, Set.of("x", "y"), DEFAULTS);
        assertEquals("x", n.analyteOfGroup()[0].name());
        assertEquals("y", n.analyteOfGroup()[1].name());
        assertEquals(NamingBasis.ELIMINATION, n.basisOfGroup()[0]);
        assertTrue(n.warnings().stream().noneMatch(w -> w.kind() == BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME),
                n.warnings().toString());
    }

    @Test
    void twoLeftStayUnnamedWhenBothPairingsFitAboutAsWell() {
        // Predicted -74.3 and -73.6 against groups -76.2 and -73.9: 2.1 units in all one way, 3.1 the other.
        StandardsMix mix = new StandardsMix("m", List.of(anion("x", Double.NaN), anion("y", Double.NaN)));
        Library ref = reference(new String[] {"x", "y"}, new double[] {-74.3, -73.6});
        GroupNamer.Naming n = GroupNamer.name(mix, groups(-76.2, -73.9), ref, Set.of("x", "y"), DEFAULTS);
        assertNull(n.analyteOfGroup()[0]);
        assertNull(n.analyteOfGroup()[1]);
        List<BuildWarning> doubtful = n.warnings().stream()
                .filter(w -> w.kind() == BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME).toList();
        assertEquals(1, doubtful.size(), doubtful.toString());
        assertTrue(doubtful.get(0).message().contains("x and y in some order"), doubtful.get(0).message());
        assertTrue(n.notFoundReasons().get(mix.analytes().get(0)).contains("approx_mobility or order"));
    }
}
