package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import static org.mobident.library.standards.StandardsRuns.anion;
import static org.mobident.library.standards.StandardsRuns.groups;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Naming a mix's groups from approx_mobility values that are all off by one common share, as values
 * taken from the literature (limiting mobilities) are against effective mobilities in a buffer of
 * some ionic strength: 10-20 % lower there for most ions (common practice). Invented mobilities;
 * the rule is this program's ({@link GroupNamer#byApproxMobility}).
 */
class GroupNamerApproxScaleTest {

    private static final BuildSettings DEFAULTS = BuildSettings.defaults();



    private static final StandardsMix MIX = new StandardsMix("m", List.of(anion("a", -80), anion("b", -76),
            anion("c", -71), anion("d", -56), anion("e", -47)));

    @Test
    void valuesTwelvePerCentHighStillNameEveryGroupRightAndSaySo() {
        // the groups at 0.88 times the values, within ±0.3 units: as given, "c" (−71) would take the
        // group of "a" (−70.4) and "e" (−47) that of "d" (−49.3), all within the 5-unit window
        GroupNamer.Naming n = GroupNamer.name(MIX, groups(-70.4, -66.7, -62.6, -49.3, -41.2), null, Set.of(),
                DEFAULTS);
        String[] expected = {"a", "b", "c", "d", "e"};
        for (int g = 0; g < expected.length; g++) {
            assertEquals(expected[g], n.analyteOfGroup()[g].name(), "group " + g);
            assertEquals(NamingBasis.APPROX_MOBILITY, n.basisOfGroup()[g]);
        }
        // the factor found: 0.88, drawn a little towards 1 by the prior (SD 0.10) on it
        BuildWarning w = n.warnings().stream().filter(x -> x.kind() == BuildWarning.Kind.APPROX_SCALED).findFirst()
                .orElseThrow();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("at (\\d\\.\\d+) times").matcher(w.message());
        assertTrue(m.find(), w.message());
        assertEquals(0.88, Double.parseDouble(m.group(1)), 0.015, w.message());
    }

    @Test
    void valuesTenPerCentLowAlsoNameEveryGroupRight() {
        GroupNamer.Naming n = GroupNamer.name(MIX, groups(-88.1, -83.5, -78.0, -61.8, -51.6), null, Set.of(),
                DEFAULTS);
        String[] expected = {"a", "b", "c", "d", "e"};
        for (int g = 0; g < expected.length; g++) {
            assertEquals(expected[g], n.analyteOfGroup()[g].name(), "group " + g);
        }
    }

    @Test
    void valuesThatFitAsGivenAreUsedAsGivenWithoutAWarning() {
        GroupNamer.Naming n = GroupNamer.name(MIX, groups(-80.4, -75.7, -71.2, -55.6, -47.3), null, Set.of(),
                DEFAULTS);
        String[] expected = {"a", "b", "c", "d", "e"};
        for (int g = 0; g < expected.length; g++) {
            assertEquals(expected[g], n.analyteOfGroup()[g].name(), "group " + g);
        }
        assertTrue(n.warnings().stream().noneMatch(w -> w.kind() == BuildWarning.Kind.APPROX_SCALED),
                n.warnings().toString());
    }
}
