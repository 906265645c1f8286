package org.mobident.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The matching rule of the known-identities format (/work/spec: nearest time within
 * max(2 × width at half height, 1 % of the known time, 0.5 s), one-to-one, nearest first; by name
 * where there is no time).
 */
class ZoneMatchingTest {

    private static final double EXACT = 0;

    private static KnownIdentity analyte(long line, String name, double timeS) {
        return new KnownIdentity(line, "r", KnownKind.ANALYTE, name, timeS, Double.NaN, Double.NaN);
    }

    private static ReportedPeak peak(int number, double apexS, double widthS, String assigned,
                                     ReportedPeak.Status status) {
        return new ReportedPeak(number, ReportedPeak.ROLE_ANALYTE, apexS, widthS, Double.NaN, Double.NaN, assigned,
                Double.NaN, status);
    }

    private static ReportedPeak unassigned(int number, double apexS, double widthS) {
        return peak(number, apexS, widthS, null, ReportedPeak.Status.UNASSIGNED);
    }

    @Test
    void toleranceIsTheLargestOfItsThreeTerms() {
        // 2 x 1.5 s = 3 s beats 1 % of 100 s = 1 s and the 0.5 s floor
        assertEquals(3.0, ZoneMatching.toleranceS(1.5, 100.0), EXACT);
        // 1 % of 300 s = 3 s beats 2 x 0.25 s = 0.5 s
        assertEquals(3.0, ZoneMatching.toleranceS(0.25, 300.0), 1e-12);
        // 2 x 0.1 s = 0.2 s and 1 % of 20 s = 0.2 s: the 0.5 s floor holds
        assertEquals(0.5, ZoneMatching.toleranceS(0.1, 20.0), EXACT);
        // an unknown width leaves the other two terms
        assertEquals(1.0, ZoneMatching.toleranceS(Double.NaN, 100.0), EXACT);
    }

    @Test
    void aPeakExactlyAtTheToleranceBelongsAndOneJustBeyondDoesNot() {
        // width 0.25 s, known time 100 s: tolerance max(0.5, 1.0, 0.5) = 1.0 s
        List<KnownIdentity> known = List.of(analyte(2, "chloride", 100.0));
        assertEquals(1, ZoneMatching.match(known, List.of(unassigned(1, 101.0, 0.25))).size(), "distance 1.0 s");
        assertEquals(1, ZoneMatching.match(known, List.of(unassigned(1, 99.0, 0.25))).size(), "distance 1.0 s early");
        assertTrue(ZoneMatching.match(known, List.of(unassigned(1, 101.01, 0.25))).isEmpty(), "distance 1.01 s");
        // the peak's own width widens its tolerance: 2 x 0.6 s = 1.2 s
        assertEquals(1, ZoneMatching.match(known, List.of(unassigned(1, 101.1, 0.6))).size());
    }

    @Test
    void eachRowTakesItsNearestFreePeakOnce() {
        List<KnownIdentity> known = List.of(analyte(2, "chloride", 100.0));
        // both peaks are within 1 s; the nearer one (0.2 s) takes the row, the other stays without
        List<ZoneMatching.Pair> pairs = ZoneMatching.match(known,
                List.of(unassigned(1, 100.5, 0.25), unassigned(2, 99.8, 0.25)));
        assertEquals(1, pairs.size());
        assertEquals(1, pairs.get(0).peak(), "second peak in the list (99.8 s)");
        assertEquals(MatchedBy.TIME, pairs.get(0).how());
    }

    @Test
    void pairsAreTakenNearestFirstSoALaterPeakFallsBackToTheOtherRow() {
        // rows at 100.0 and 100.5 s; peaks at 100.45 and 100.6 s (tolerance 1 s each)
        // distances: p1-r2 0.05, p2-r2 0.10, p1-r1 0.45, p2-r1 0.60
        // nearest first: p1 takes r2; p2's nearest row is taken, so it takes r1
        KnownIdentity r1 = analyte(2, "chloride", 100.0);
        KnownIdentity r2 = analyte(3, "bromide", 100.5);
        List<ZoneMatching.Pair> pairs = ZoneMatching.match(List.of(r1, r2),
                List.of(unassigned(1, 100.45, 0.25), unassigned(2, 100.6, 0.25)));
        assertEquals(2, pairs.size());
        assertEquals(r2, pairs.get(0).known());
        assertEquals(r1, pairs.get(1).known());
    }

    @Test
    void aSpikeOnAZoneDoesNotTakeTheZonesPeak() {
        // the spike (101.25 s) is nearer the peak (101.27 s) than the zone's own time (101.16 s)
        KnownIdentity zone = analyte(3, "iodide", 101.16);
        KnownIdentity spike = new KnownIdentity(9, "r", KnownKind.SPIKE, "", 101.25, Double.NaN, Double.NaN);
        List<ZoneMatching.Pair> pairs = ZoneMatching.match(List.of(zone, spike),
                List.of(peak(1, 101.27, 1.1, "iodide", ReportedPeak.Status.IDENTIFIED)));
        assertEquals(1, pairs.size());
        assertEquals(zone, pairs.get(0).known());
        // with no zone there, the spike does take a peak at its time: a spike reported
        pairs = ZoneMatching.match(List.of(spike), List.of(unassigned(1, 101.27, 0.1)));
        assertEquals(spike, pairs.get(0).known());
    }

    @Test
    void rowsWithoutTimeAreMatchedByTheNameOfAFreeCall() {
        KnownIdentity nitrate = new KnownIdentity(2, "r", KnownKind.ANALYTE, "Nitrate", Double.NaN, Double.NaN,
                Double.NaN);
        KnownIdentity bromide = new KnownIdentity(3, "r", KnownKind.ANALYTE, "bromide", Double.NaN, Double.NaN,
                Double.NaN);
        KnownIdentity timed = analyte(4, "sulfate", 50.0);
        List<ReportedPeak> peaks = List.of(
                peak(1, 50.1, 0.3, "nitrate", ReportedPeak.Status.IDENTIFIED), // time-matched to sulfate first
                peak(2, 80.0, 0.3, "nitrate", ReportedPeak.Status.AMBIGUOUS),  // free call named nitrate
                unassigned(3, 90.0, 0.3));
        List<ZoneMatching.Pair> pairs = ZoneMatching.match(List.of(nitrate, bromide, timed), peaks);
        assertEquals(2, pairs.size());
        assertEquals(timed, pairs.get(0).known());
        assertEquals(MatchedBy.TIME, pairs.get(0).how());
        assertEquals(1, pairs.get(1).peak());
        assertEquals(nitrate, pairs.get(1).known(), "names compare without regard to case");
        assertEquals(MatchedBy.NAME, pairs.get(1).how());
    }

    @Test
    void peaksWithoutApexTimeAreNotMatchedByTime() {
        List<ZoneMatching.Pair> pairs = ZoneMatching.match(List.of(analyte(2, "chloride", 100.0)),
                List.of(unassigned(1, Double.NaN, 0.25)));
        assertTrue(pairs.isEmpty());
    }
}
