package org.mobident.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.mobility.MobilityMath;
import org.mobident.result.MatchStatus;
import org.mobident.result.RunScale;
import org.mobident.settings.MatchSettings;
import org.mobident.settings.ScalePrior;

/**
 * The per-run scale correction: a run whose every mobility is off by a common factor and offset
 * within the plausible bounds keeps every name; the fitted a and b recover the shift; a run with one
 * peak is not "corrected"; internal standards pin the scale. Library values are invented test values.
 */
class ScaleCorrectionTest {

    /** Anions with two near pairs 1.5–1.8 % apart; SDs as a four-run standards build gives. */
    private static final Library LIB = new Library(List.of(
            entry("bromide", -78.9, 0.10, 4), entry("chloride", -77.6, 0.08, 4), entry("sulfate", -74.9, 0.12, 4),
            entry("nitrite", -71.4, 0.09, 4), entry("nitrate", -70.2, 0.10, 4), entry("chlorate", -63.8, 0.07, 4),
            entry("fluoride", -55.1, 0.10, 4), entry("formate", -54.2, 0.09, 4), entry("phosphate", -46.2, 0.11, 4),
            entry("acetate", -40.1, 0.06, 4)), "test", List.of());

    private static LibraryEntry entry(String name, double mu, double sd, int n) {
        return new LibraryEntry(name, mu, sd, n, -1, Double.NaN, List.of(), List.of(), null, Double.NaN, Double.NaN,
                25.0, null);
    }

    private static RunMatch run(double[] mu, MatchSettings s) {
        double[] sd = new double[mu.length];
        java.util.Arrays.fill(sd, 0.02);
        return LibraryMatcher.matchRun(mu, sd, LIB, SpreadModel.of(LIB, s), s, MobilityAdjuster.IDENTITY);
    }

    @Test
    void aRandomRunWideShiftWithinTheBoundsLeavesEveryNameUnchanged() {
        SplittableRandom rnd = new SplittableRandom(17);
        ScalePrior bounds = ScalePrior.DEFAULT;
        for (int trial = 0; trial < 200; trial++) {
            // a random subset of at least 5 analytes, a random a and b within two prior SDs (a ±4 %: ±1.7 K of
            // capillary temperature; b ±1 unit: a 2 % error in a marker time of ~500 s at μ_eof −50)
            List<LibraryEntry> present = new ArrayList<>();
            for (LibraryEntry e : LIB.entries()) {
                if (rnd.nextDouble() < 0.6) {
                    present.add(e);
                }
            }
            if (present.size() < 5) {
                continue;
            }
            double a = 1 + 2 * bounds.factorSd() * (2 * rnd.nextDouble() - 1);
            double b = 2 * bounds.offsetSd() * (2 * rnd.nextDouble() - 1);
            double[] mu = new double[present.size()];
            for (int i = 0; i < mu.length; i++) {
                // every peak scatters by its library spread around a·μ + b
                LibraryEntry e = present.get(i);
                mu[i] = a * (e.mobility() + e.mobilitySd() * gaussian(rnd)) + b;
            }
            RunMatch m = run(mu, MatchSettings.DEFAULT);
            for (int i = 0; i < mu.length; i++) {
                assertEquals(present.get(i).name(), m.matches().get(i).assigned(),
                        "trial " + trial + " a=" + a + " b=" + b + ": " + m.matches().get(i));
            }
            assertTrue(m.scale().fitted(), "trial " + trial);
            // the fitted line agrees with the true one where the peaks are (within 4 of its SDs plus the scatter)
            double muMid = present.get(present.size() / 2).mobility();
            double fitted = m.scale().factor() * muMid + m.scale().offset();
            double tolerance = 4 * Math.sqrt(m.scale().varianceAt(muMid)) + 0.2;
            assertEquals(a * muMid + b, fitted, tolerance, "trial " + trial);
        }
    }

    @Test
    void aCapillaryOneKelvinWarmIsReportedAsSuch() {
        // every mobility scaled by η(25 °C)/η(26 °C) (IAPWS 2008), the EOF error nil
        double a = MobilityMath.atTemperature(1.0, 25.0, 26.0);
        double[] mu = new double[LIB.size()];
        for (int i = 0; i < mu.length; i++) {
            mu[i] = a * LIB.entries().get(i).mobility();
        }
        RunMatch m = run(mu, MatchSettings.DEFAULT);
        assertEquals(a, m.scale().factor(), 3 * m.scale().factorSd());
        assertEquals(0.0, m.scale().offset(), 3 * m.scale().offsetSd());
        assertEquals(RunScale.Status.FITTED, m.scale().status());
        for (int i = 0; i < mu.length; i++) {
            assertEquals(MatchStatus.IDENTIFIED, m.matches().get(i).status(), m.matches().get(i).toString());
        }
        // with the correction switched off, the same run loses names (the shift is 1.7 units at −78)
        RunMatch fixed = run(mu, MatchSettings.DEFAULT.withScalePrior(null));
        long right = 0;
        for (int i = 0; i < mu.length; i++) {
            right += LIB.entries().get(i).name().equals(fixed.matches().get(i).assigned())
                    && fixed.matches().get(i).status() == MatchStatus.IDENTIFIED ? 1 : 0;
        }
        assertTrue(right < mu.length, "without correction " + right + " of " + mu.length + " stay identified");
        assertEquals(RunScale.Status.OFF, fixed.scale().status());
    }

    @Test
    void onePeakCannotPinAScaleAndStaysHonest() {
        // a lone peak halfway between bromide and chloride could be either under a few tenths of a kelvin
        RunMatch m = run(new double[] {-78.25}, MatchSettings.DEFAULT);
        assertEquals(RunScale.Status.TOO_FEW_ANCHORS, m.scale().status());
        assertEquals(1.0, m.scale().factor(), 0.0);
        assertEquals(MatchStatus.AMBIGUOUS, m.matches().get(0).status(), m.matches().get(0).toString());
    }

    @Test
    void anInternalStandardIsMoreLikelyPresentThanAnOrdinaryAnalyte() {
        LibraryEntry plain = entry("marker-acid", -60.0, 0.1, 4);
        LibraryEntry standard = new LibraryEntry("marker-acid", -60.0, 0.1, 4, -1, Double.NaN, List.of(), List.of(),
                null, Double.NaN, Double.NaN, 25.0, null, true, Double.NaN);
        double p1 = only(plain, -60.25);
        double p2 = only(standard, -60.25);
        // prior presence 0.98 instead of q: odds q/(1−q) against 0.98/0.02 (LibraryMatcher's model)
        assertTrue(p2 > p1, p1 + " vs " + p2);
    }

    private static double only(LibraryEntry e, double mu) {
        Library lib = new Library(List.of(e, entry("other", -40.0, 0.1, 4)), "t", List.of());
        MatchSettings s = MatchSettings.DEFAULT.withScalePrior(null);
        return LibraryMatcher.matchRun(new double[] {mu, -20.0}, new double[] {0.05, 0.05}, lib,
                SpreadModel.of(lib, s), s, MobilityAdjuster.IDENTITY).matches().get(0).confidence();
    }

    private static double gaussian(SplittableRandom r) {
        // Box & Muller, Ann. Math. Statist. 29 (1958) 610
        return Math.sqrt(-2 * Math.log(1 - r.nextDouble())) * Math.cos(2 * Math.PI * r.nextDouble());
    }
}
