package org.mobident;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.library.standards.LibraryCheck;
import org.mobident.matching.LibraryMatcher;
import org.mobident.matching.MatchWindow;
import org.mobident.matching.MobilityAdjuster;
import org.mobident.matching.SpreadModel;
import org.mobident.recheck.RecheckSettings;
import org.mobident.recheck.Rechecker;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.PeakMatch;
import org.mobident.settings.MatchSettings;

/**
 * The window contract: what a user sees is what matching applies. For every entry of a varied
 * library and every window rule, the half-width drawn by plots and the viewer
 * ({@link ToleranceBand#matching}), printed by {@code library check} ({@link LibraryCheck#windows})
 * and quoted by {@code recheck} equals {@link MatchWindow#halfWidth}, and the matcher accepts a peak
 * measured without uncertainty just inside that edge and refuses it just outside.
 */
class WindowContractTest {

    /** Relative step inside and outside an edge. */
    private static final double EDGE_STEP = 1e-6;

    private static LibraryEntry entry(String name, double mu, double sd, int n, double tolerance, String buffer) {
        return new LibraryEntry(name, mu, sd, n, 0, tolerance, List.of(), List.of(), buffer, Double.NaN, Double.NaN,
                Double.NaN, null);
    }

    /** Twelve entries far apart (so that neighbours never share a window), of every kind. */
    private static Library library() {
        List<LibraryEntry> es = new ArrayList<>();
        double[] sds = {0.05, 0.12, 0.3, 0.02, 0.4, 0.08, 0.2, 0.15};
        int[] ns = {3, 4, 8, 5, 3, 12, 6, 4};
        for (int k = 0; k < sds.length; k++) {
            es.add(entry("e" + k, -80.0 + 12.0 * k, sds[k], ns[k], Double.NaN, null));
        }
        es.add(entry("fixed", 30.0, 0.2, 4, 1.3, null));
        es.add(entry("no-spread", 45.0, Double.NaN, 0, Double.NaN, null));
        es.add(entry("no-n", 60.0, 0.25, 0, Double.NaN, null));
        es.add(entry("one-run", 75.0, 0.0, 1, Double.NaN, null));
        return new Library(es, "contract", List.of());
    }

    @Test
    void everyShownWindowIsTheAppliedOne() {
        Library lib = library();
        List<MatchSettings> rules = List.of(MatchSettings.DEFAULT, MatchSettings.ABSOLUTE, MatchSettings.RELATIVE,
                MatchSettings.DEFAULT.withSpreadWindow(2.5, 0.3), MatchSettings.DEFAULT.withSessionRsd(0.0));
        for (MatchSettings s : rules) {
            SpreadModel spread = SpreadModel.of(lib, s);
            ToleranceBand drawn = ToleranceBand.matching(lib, s);
            double[] printed = LibraryCheck.windows(lib, s);
            RecheckSettings recheck = RecheckSettings.DEFAULT.withMatch(s);
            for (int j = 0; j < lib.size(); j++) {
                LibraryEntry e = lib.entries().get(j);
                double h = MatchWindow.halfWidth(e, spread, j, 0.0, s);
                String what = e.name() + " under " + s.windowRule() + " k=" + s.windowValue();
                assertTrue(h > 0 && Double.isFinite(h), what);
                assertEquals(h, drawn.halfWidth(e), 0.0, "drawn band, " + what);
                assertEquals(h, printed[j], 0.0, "library check, " + what);
                assertEquals(h, Rechecker.oldWindowHalfWidth(lib, e, 0.0, recheck), 0.0, "recheck, " + what);
                for (double side : new double[] {-1, 1}) {
                    assertTrue(candidate(lib, s, e.mobility() + side * h * (1 - EDGE_STEP), e.name()),
                            "just inside the edge is a candidate, " + what);
                    assertFalse(candidate(lib, s, e.mobility() + side * h * (1 + EDGE_STEP), e.name()),
                            "just outside the edge is not, " + what);
                }
            }
        }
    }

    @Test
    void aPeaksOwnUncertaintyEntersTheWindowAsStated() {
        Library lib = library();
        MatchSettings s = MatchSettings.DEFAULT;
        SpreadModel spread = SpreadModel.of(lib, s);
        double peakSd = 0.4;
        for (int j = 0; j < 8; j++) {
            LibraryEntry e = lib.entries().get(j);
            double h = MatchWindow.halfWidth(e, spread, j, peakSd * peakSd, s);
            assertTrue(candidate(lib, s, e.mobility() + h * (1 - EDGE_STEP), e.name(), peakSd), e.name());
            assertFalse(candidate(lib, s, e.mobility() + h * (1 + EDGE_STEP), e.name(), peakSd), e.name());
        }
    }

    private static boolean candidate(Library lib, MatchSettings s, double mobility, String name) {
        return candidate(lib, s, mobility, name, 0.0);
    }

    private static boolean candidate(Library lib, MatchSettings s, double mobility, String name, double sd) {
        PeakMatch m = LibraryMatcher.match(new double[] {mobility}, new double[] {sd}, lib, s,
                MobilityAdjuster.IDENTITY).get(0);
        return m.candidates().stream().anyMatch(c -> c.name().equals(name));
    }
}
