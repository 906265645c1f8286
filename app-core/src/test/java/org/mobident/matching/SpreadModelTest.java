package org.mobident.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.library.LibraryEntry;
import org.mobident.settings.MatchSettings;

/** The library's spread model: moderation of few-run spreads, the prediction variance, the window quantile. */
class SpreadModelTest {

    private static final MatchSettings NO_SESSION = MatchSettings.DEFAULT.withSessionRsd(0.0);

    private static LibraryEntry entry(String name, double mu, double sd, int n) {
        return new LibraryEntry(name, mu, sd, n, 0, Double.NaN, List.of(), List.of(), null, Double.NaN, Double.NaN,
                Double.NaN, null);
    }

    @Test
    void inverseTrigammaMatchesKnownValues() {
        // ψ′(1) = π²/6 and ψ′(1/2) = π²/2 (Abramowitz & Stegun, Handbook of Mathematical Functions, 6.4.2)
        assertEquals(1.0, SpreadModel.inverseTrigamma(Math.PI * Math.PI / 6), 1e-9);
        assertEquals(0.5, SpreadModel.inverseTrigamma(Math.PI * Math.PI / 2), 1e-9);
    }

    @Test
    void fewAnalytesArePooledWithTheDefaultPriorWeightByTheModeratedFormula() {
        // three analytes (fewer than the 8 needed to estimate d0): d0 = 4, s0² = df-weighted mean RSD²
        List<LibraryEntry> es = List.of(entry("a", -50.0, 0.10, 3), entry("b", -60.0, 0.30, 5),
                entry("c", -40.0, 0.08, 4));
        SpreadModel m = SpreadModel.of(es, NO_SESSION);
        double r1 = 0.10 / 50;
        double r2 = 0.30 / 60;
        double r3 = 0.08 / 40;
        double s0sq = (2 * r1 * r1 + 4 * r2 * r2 + 3 * r3 * r3) / 9;
        assertEquals(Math.sqrt(s0sq), m.pooledRsd(), 1e-12);
        assertEquals(SpreadModel.DEFAULT_PRIOR_DF, m.pooledDf(), 0.0);
        // Smyth (2004): s̃² = (d0 s0² μ² + d s²)/(d0 + d), degrees of freedom d0 + d; × (1 + 1/n) for a new run
        double moderated = (4 * s0sq * 50 * 50 + 2 * 0.01) / (4 + 2);
        double floor2 = NO_SESSION.sdFloor() * NO_SESSION.sdFloor();
        assertEquals(moderated * (1 + 1.0 / 3) + floor2, m.predictiveVariance(0), 1e-12);
        assertEquals(6.0, m.degreesOfFreedom(0), 0.0);
    }

    @Test
    void equalSpreadsGiveAnAlmostKnownPooledValue() {
        // ten analytes with the same RSD: the log variances scatter no more than sampling explains, d0 → large
        List<LibraryEntry> es = new ArrayList<>();
        for (int k = 0; k < 10; k++) {
            double mu = -30.0 - 5 * k;
            es.add(entry("x" + k, mu, 0.002 * Math.abs(mu), 8));
        }
        SpreadModel m = SpreadModel.of(es, NO_SESSION);
        assertEquals(SpreadModel.MAX_PRIOR_DF, m.pooledDf(), 0.0);
        // Smyth (2004), sect. 6.2: with d0 → ∞, s0² = exp(mean of ln s² − ψ(d/2) + ln(d/2)); for identical
        // s² with d = 7 that is s²·exp(ln 3.5 − ψ(3.5)) (ψ from Commons Math, the reference implementation here)
        double expected = 0.002 * Math.sqrt(Math.exp(Math.log(3.5)
                - org.apache.commons.math3.special.Gamma.digamma(3.5)));
        assertEquals(expected, m.pooledRsd(), 1e-12);
    }

    @Test
    void aBetweenSessionSpreadIsAddedAndLearnedValuesWin() {
        List<LibraryEntry> es = List.of(entry("a", -50.0, 0.10, 3));
        SpreadModel plain = SpreadModel.of(es, NO_SESSION);
        SpreadModel withSession = SpreadModel.of(es, NO_SESSION.withSessionRsd(0.004));
        assertEquals(plain.predictiveVariance(0) + 0.2 * 0.2, withSession.predictiveVariance(0), 1e-12, "0.4 % of 50");
        LibraryEntry learned = es.get(0).withSessionSd(0.05);
        assertEquals(plain.predictiveVariance(0) + 0.05 * 0.05,
                SpreadModel.of(List.of(learned), NO_SESSION.withSessionRsd(0.004)).predictiveVariance(0), 1e-12);
    }

    @Test
    void theWindowQuantileIsStudentsT() {
        // two-sided 95 % points of Student's t (t table, e.g. NIST/SEMATECH e-Handbook of Statistical
        // Methods, sect. 1.3.6.7.2; from memory): 12.706 (1 df), 4.303 (2), 2.228 (10), 2.042 (30)
        double k95 = 1.959964; // normal 97.5 % point
        assertEquals(4.303, MatchWindow.coverageFactor(k95, 2), 5e-4);
        assertEquals(2.228, MatchWindow.coverageFactor(k95, 10), 5e-4);
        assertEquals(2.042, MatchWindow.coverageFactor(k95, 30), 5e-4);
        assertEquals(MatchWindow.MAX_T_WIDENING * k95, MatchWindow.coverageFactor(k95, 1), 1e-12, "12.7 is capped");
        assertEquals(k95, MatchWindow.coverageFactor(k95, Double.POSITIVE_INFINITY), 0.0);
        // a prediction interval for one new value from n = 3 runs needs t(0.975, 2)·√(1 + 1/3) = 4.97 SDs
        assertEquals(4.97, MatchWindow.coverageFactor(k95, 2) * Math.sqrt(1 + 1.0 / 3), 0.005);
        assertTrue(MatchWindow.combinedDf(2.0, 1.0, 4.0) > 4.0, "known variance raises the degrees of freedom");
    }
}
