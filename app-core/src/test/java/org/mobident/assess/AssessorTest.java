package org.mobident.assess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.recheck.PeakTableReader;

/**
 * Scores of a small hand-made peak table against a hand-made known table; every expected value is
 * counted by hand in the comments from the two tables below.
 */
class AssessorTest {

    private static final double EXACT = 1e-12;

    /**
     * r1: every kind of verdict; r2 failed; r3 known analytes without times; r4 not in the known
     * table; r6 the neutral marker chosen at the wrong peak; r7 without a mobility scale.
     */
    static final String PEAKS = String.join("\n",
            "run,peak,role,apex_time_s,width_half_s,mobility,mobility_sd,mobility_at_library_temp,assigned,confidence,"
                    + "status",
            "r1,1,analyte,100.2,0.5,-76.1,0.01,-76.1,chloride,0.900,identified",   // right
            "r1,2,analyte,105.1,0.5,-73.5,0.01,-73.5,nitrate,0.600,ambiguous",     // on sulfate: wrong name
            "r1,3,analyte,110.1,0.5,-69.4,0.01,-69.4,,0.700,unassigned",           // on nitrate: not named
            "r1,4,analyte,120.3,0.5,-49.0,0.01,-49.0,chlorate,0.800,identified",   // on the foreign zone: absent
            "r1,5,analyte,200.0,0.5,-20.0,0.01,-20.0,,0.900,unassigned",           // on the spike
            "r1,6,analyte,250.0,0.5,-10.0,0.01,-10.0,bromide,0.550,identified",    // on nothing: absent
            "r1,7,neutral marker,300.1,1.0,0.000,,0.000,,,marker",                 // on the marker
            "r2,,,,,,,,,,failed",
            "r3,1,analyte,90.0,0.5,-69.0,0.01,-69.0,nitrate,0.950,identified",     // by name: right
            "r3,2,analyte,95.0,0.5,-60.0,0.01,-60.0,,0.800,unassigned",            // bromide left: no verdict
            "r3,3,neutral marker,300.0,1.0,0.000,,0.000,,,marker",
            "r4,1,analyte,100.0,0.5,-76.0,0.01,-76.0,chloride,0.990,identified",   // not scored
            "r6,1,analyte,100.0,0.5,-76.2,0.01,-76.2,chloride,0.990,identified",   // right
            "r6,2,neutral marker,250.0,1.0,0.000,,0.000,,,marker",                 // known marker at 300 s
            "r7,1,analyte,100.0,0.5,,,,,,unassigned",                              // no scale: not named
            "");

    static final String KNOWN = String.join("\n",
            "run,kind,analyte,time_s,mobility,height_sd",
            "r1,analyte,chloride,100.0,-76.0,50",
            "r1,analyte,nitrate,110.0,-69.5,20",
            "r1,analyte,sulfate,105.0,-73.8,5",
            "r1,analyte,fluoride,130.0,,200",
            "r1,foreign,foreign-1,120.0,,15",
            "r1,marker,,300.0,0,40",
            "r1,spike,,200.0,,",
            "r2,analyte,chloride,100.0,-76.0,8",
            "r3,analyte,nitrate,,,",
            "r3,analyte,bromide,,,",
            "r5,analyte,chloride,100.0,,",
            "r6,marker,,300.0,0,30",
            "r6,analyte,chloride,100.0,-76.0,12",
            "r7,analyte,chloride,100.0,-76.0,60",
            "");

    static Assessment assessment() throws InputException {
        KnownIdentities known = KnownIdentitiesReader.read(KNOWN, "known.csv");
        List<ReportedRun> runs = ReportedRuns.fromTable(PeakTableReader.read(new StringReader(PEAKS), "peaks.csv"));
        return Assessor.assess(known, runs, "peaks.csv", null);
    }

    @Test
    void scoredRunsAreThoseInBothTables() throws InputException {
        Assessment a = assessment();
        assertEquals(List.of("r1", "r2", "r3", "r6", "r7"), a.runs().stream().map(RunCheck::run).toList());
        assertEquals(List.of("r4"), a.notScored());
        assertEquals(List.of("r5"), a.notInTable());
        assertTrue(a.anythingScored());
    }

    @Test
    void precisionRecallAndErrorCounts() throws InputException {
        Identification id = assessment().identification();
        // identified calls: r1 p1 (right), p4 (absent), p6 (absent), r3 p1 (right), r6 p1 (right) -> 3 of 5
        assertEquals(new Ratio(3, 5), id.precision());
        // all calls add r1 p2 (ambiguous, wrong name) -> 3 of 6
        assertEquals(new Ratio(3, 6), id.precisionWithAmbiguous());
        // analytes present: r1 4, r2 1, r3 2, r6 1, r7 1 = 9; identified right: r1 chloride, r3 nitrate, r6 chloride
        assertEquals(new Ratio(3, 9), id.recall());
        assertEquals(new Ratio(3, 9), id.recallWithAmbiguous(), "the one ambiguous call names the wrong analyte");
        // height >= 10: r1 chloride 50, nitrate 20, fluoride 200, r6 chloride 12, r7 chloride 60 = 5;
        // identified right among them: r1 chloride, r6 chloride
        assertEquals(new Ratio(2, 5), id.recallClear());
        assertEquals(1, id.wrongNames());
        assertEquals(2, id.calledAbsent());
        assertEquals(6, id.missed(), "9 present - 3 called right");
    }

    @Test
    void recallAndDetectionByZoneHeight() throws InputException {
        Map<HeightStratum, StratumScore> s = assessment().strata().stream()
                .collect(Collectors.toMap(StratumScore::stratum, Function.identity()));
        assertEquals(HeightStratum.values().length, s.size());
        // 3-10: r1 sulfate (5, peak with a wrong name), r2 chloride (8, run failed)
        assertEquals(new StratumScore(HeightStratum.FROM_3, 2, 0, 0, 2, 1), s.get(HeightStratum.FROM_3));
        // 10-30: r1 nitrate (20, not named), r6 chloride (12, right); zones add r1 foreign-1 (15, found)
        assertEquals(new StratumScore(HeightStratum.FROM_10, 2, 1, 1, 3, 3), s.get(HeightStratum.FROM_10));
        // 30-100: r1 chloride (50, right), r7 chloride (60, not named); the marker is not counted as a zone
        assertEquals(new StratumScore(HeightStratum.FROM_30, 2, 1, 1, 2, 2), s.get(HeightStratum.FROM_30));
        // 100-1000: r1 fluoride (200), no peak
        assertEquals(new StratumScore(HeightStratum.FROM_100, 1, 0, 0, 1, 0), s.get(HeightStratum.FROM_100));
        // unknown: r3 nitrate (by name, right), r3 bromide (no peak)
        assertEquals(new StratumScore(HeightStratum.UNKNOWN, 2, 1, 1, 2, 1), s.get(HeightStratum.UNKNOWN));
        assertEquals(new StratumScore(HeightStratum.UNDER_3, 0, 0, 0, 0, 0), s.get(HeightStratum.UNDER_3));
    }

    @Test
    void perAnalyteScores() throws InputException {
        Map<String, AnalyteScore> byName = assessment().analytes().stream()
                .collect(Collectors.toMap(AnalyteScore::name, Function.identity()));
        assertEquals(List.of("bromide", "chlorate", "chloride", "fluoride", "nitrate", "sulfate"),
                assessment().analytes().stream().map(AnalyteScore::name).toList(), "sorted by name");
        AnalyteScore chloride = byName.get("chloride");
        // present in r1, r2, r6, r7; identified right in r1 and r6; never called wrongly
        assertEquals(4, chloride.present());
        assertEquals(2, chloride.identifiedRight());
        assertEquals(0, chloride.wrongCalls());
        assertEquals(2, chloride.missed());
        assertEquals(new Ratio(2, 2), chloride.precision());
        assertEquals(new Ratio(2, 4), chloride.recall());
        // mobility: r1 -76.1 - (-76.0) = -0.1, r6 -76.2 - (-76.0) = -0.2 -> MAE 0.15, bias -0.15
        assertEquals(2, chloride.mobilityError().count());
        assertEquals(0.15, chloride.mobilityError().meanAbsoluteError(), 1e-9);
        assertEquals(-0.15, chloride.mobilityError().bias(), 1e-9);
        AnalyteScore nitrate = byName.get("nitrate");
        // present in r1 (not named) and r3 (right by name); r1 p2 called nitrate on the sulfate zone
        assertEquals(new AnalyteScore("nitrate", 2, 1, 0, 1, 1, nitrate.mobilityError()), nitrate);
        assertEquals(new Ratio(1, 2), nitrate.precision());
        AnalyteScore chlorate = byName.get("chlorate");
        // never present, called once on the foreign zone
        assertEquals(0, chlorate.present());
        assertEquals(new Ratio(0, 1), chlorate.precision());
        assertTrue(Double.isNaN(chlorate.recall().value()));
        assertEquals(1, byName.get("bromide").wrongCalls());
        assertEquals(1, byName.get("bromide").missed());
    }

    @Test
    void calibrationOfCallsAndOfUnassignedPeaks() throws InputException {
        Assessment a = assessment();
        // calls: 0.90 T, 0.60 F, 0.80 F, 0.55 F, 0.95 T, 0.99 T
        //   bin 0.9-1.0: n 3, conf 2.84/3, acc 1 -> gap 0.16/3; bins 0.8, 0.6, 0.5: n 1 each, acc 0
        //   ECE = (0.16 + 0.80 + 0.60 + 0.55) / 6 = 2.11 / 6
        //   Brier = (0.01 + 0.36 + 0.64 + 0.3025 + 0.0025 + 0.0001) / 6 = 1.3151 / 6
        assertEquals(6, a.calls().count());
        assertEquals(2.11 / 6, a.calls().ece(), 1e-12);
        assertEquals(1.3151 / 6, a.calls().brier(), 1e-12);
        assertEquals(0.5, a.calls().accuracy(), EXACT);
        // unassigned with a verdict: r1 p3 0.70 (on nitrate: wrong), r1 p5 0.90 (on the spike: right);
        // r3 p2 has no verdict and r7 p1 no confidence
        //   ECE = (0.70 + 0.10) / 2 = 0.40; Brier = (0.49 + 0.01) / 2 = 0.25
        assertEquals(2, a.unassigned().count());
        assertEquals(0.40, a.unassigned().ece(), 1e-12);
        assertEquals(0.25, a.unassigned().brier(), 1e-12);
    }

    @Test
    void mobilityErrorOverAnalytePeaksOnKnownAnalytes() throws InputException {
        MobilityError e = assessment().mobilityError();
        // r1 p1 -0.1 (chloride), r1 p2 +0.3 (sulfate), r1 p3 +0.1 (nitrate), r6 p1 -0.2 (chloride);
        // r3 nitrate has no known mobility, r7 no reported one
        assertEquals(4, e.count());
        assertEquals(0.7 / 4, e.meanAbsoluteError(), 1e-9);
        assertEquals(0.1 / 4, e.bias(), 1e-9);
    }

    @Test
    void detectionSpikesScalesAndMarkers() throws InputException {
        Assessment a = assessment();
        Detection d = a.detection();
        // analyte-role peaks: r1 6, r3 2, r6 1, r7 1 = 10; on a known zone: r1 p1-p4, r3 p1, r6 p1, r7 p1 = 7
        assertEquals(new Ratio(7, 10), d.precision());
        // zones (analyte and foreign rows): r1 5, r2 1, r3 2, r6 1, r7 1 = 10; found: r1 4, r3 1, r6 1, r7 1 = 7
        assertEquals(new Ratio(7, 10), d.rate());
        assertEquals(1, d.spikesReported());
        assertEquals(1, d.runsFailed());
        assertEquals(1, d.runsWithoutScale(), "r7; the failed r2 is counted as failed only");
        assertEquals(1, d.runsMarkerOff(), "r6 chose the peak at 250 s");
        Map<String, RunCheck> runs = a.runs().stream().collect(Collectors.toMap(RunCheck::run, Function.identity()));
        assertEquals(RunCheck.MarkerCheck.RIGHT, runs.get("r1").marker());
        assertEquals(RunCheck.MarkerCheck.OFF, runs.get("r6").marker());
        assertTrue(runs.get("r6").markerNote().contains("250.00 s"), runs.get("r6").markerNote());
        assertEquals(RunCheck.MarkerCheck.NOT_CHECKED, runs.get("r3").marker(), "no known marker");
        assertTrue(runs.get("r2").failed());
        assertTrue(!runs.get("r7").mobilityKnown());
    }

    @Test
    void everyPeakAndEveryUnfoundRowHasAVerdict() throws InputException {
        List<PeakVerdict> r1 = assessment().verdicts().stream().filter(v -> v.run().equals("r1")).toList();
        assertEquals(List.of(Verdict.RIGHT, Verdict.WRONG_NAME, Verdict.NOT_NAMED, Verdict.CALLED_ABSENT,
                Verdict.RIGHTLY_UNASSIGNED, Verdict.CALLED_ABSENT, Verdict.MARKER_RIGHT, Verdict.NOT_FOUND),
                r1.stream().map(PeakVerdict::verdict).toList());
        assertEquals("fluoride", r1.get(7).known().name());
        assertNull(r1.get(7).peak());
        assertEquals(KnownKind.SPIKE, r1.get(4).known().kind());
        List<PeakVerdict> r3 = assessment().verdicts().stream().filter(v -> v.run().equals("r3")).toList();
        assertEquals(MatchedBy.NAME, r3.get(0).how());
        assertEquals(Verdict.NO_VERDICT, r3.get(1).verdict());
        assertEquals(Verdict.MARKER_ELSEWHERE, r3.get(2).verdict(), "a marker peak with no known marker");
    }

    @Test
    void limitsPassOrFailOnTheMeasuredScores() throws InputException {
        Assessment a = assessment();
        // precision 0.6, recall 1/3, ECE 2.11/6 = 0.352
        assertTrue(new AcceptanceLimits(0.6, Double.NaN, Double.NaN).allMet(a));
        assertTrue(!new AcceptanceLimits(0.61, Double.NaN, Double.NaN).allMet(a));
        assertTrue(!new AcceptanceLimits(Double.NaN, 0.34, Double.NaN).allMet(a));
        assertTrue(new AcceptanceLimits(Double.NaN, Double.NaN, 0.36).allMet(a));
        assertTrue(!new AcceptanceLimits(Double.NaN, Double.NaN, 0.35).allMet(a));
        assertTrue(AcceptanceLimits.NONE.allMet(a) && !AcceptanceLimits.NONE.any());
    }

    @Test
    void nothingInCommonScoresNothing() throws InputException {
        KnownIdentities known = KnownIdentitiesReader.read("run,analyte\nelsewhere,chloride\n", "k.csv");
        List<ReportedRun> runs = ReportedRuns.fromTable(PeakTableReader.read(new StringReader(PEAKS), "peaks.csv"));
        Assessment a = Assessor.assess(known, runs, "peaks.csv", null);
        assertTrue(!a.anythingScored());
        assertEquals(List.of("elsewhere"), a.notInTable());
        assertTrue(Double.isNaN(a.identification().precision().value()));
        assertTrue(!new AcceptanceLimits(0.5, Double.NaN, Double.NaN).allMet(a), "an unmeasurable limit is not met");
    }
}
