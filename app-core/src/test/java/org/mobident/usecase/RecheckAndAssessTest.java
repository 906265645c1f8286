package org.mobident.usecase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.assess.KnownIdentities;
import org.mobident.assess.KnownIdentitiesReader;
import org.mobident.recheck.BufferSpec;
import org.mobident.recheck.BufferTransfer;
import org.mobident.recheck.PeakTableReader;
import org.mobident.recheck.PeakTableRow;
import org.mobident.recheck.RecheckResult;
import org.mobident.recheck.Verdict;
import org.mobident.report.PeakTableCsv;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotLayout;
import org.mobident.report.plot.PlotModel;

/**
 * Recheck, assess and plot from one identification of the demo batch (invented data; truth in
 * demo-data/TRUTH.md), its peak table written and read back as a user's file would be.
 */
class RecheckAndAssessTest {

    private static IdentifiedBatch batch;
    private static List<PeakTableRow> table;

    @BeforeAll
    static void identify() throws Exception {
        batch = DemoInputs.identified();
        StringWriter csv = new StringWriter();
        PeakTableCsv.write(batch.results(), csv);
        table = PeakTableReader.read(new StringReader(csv.toString()), "peaks.csv");
    }

    private static RecheckAssignments recheck() throws InputException {
        return new RecheckAssignments(table, "peaks.csv", DemoInputs.library(), null, BufferTransfer.withoutReference());
    }

    @Test
    void againstTheSameLibraryNothingMoves() throws InputException {
        RecheckResult r = recheck().againstMeasured(DemoInputs.library(), null);
        assertFalse(r.assignments().isEmpty());
        // every identified call still holds; the one ambiguous call of the demo (spring-03-uv214) stays ambiguous
        long ambiguous = table.stream().filter(t -> "ambiguous".equals(t.status())).count();
        assertEquals(r.assignments().size() - ambiguous, r.count(Verdict.STILL_HOLDS));
        assertEquals(ambiguous, r.count(Verdict.STILL_AMBIGUOUS));
        assertEquals(0, r.count(Verdict.LOST) + r.count(Verdict.REASSIGNED) + r.count(Verdict.NOW_AMBIGUOUS));
        assertFalse(r.predicted());
    }

    @Test
    void aBufferNearTheWeakAcidsPkaMovesThem() throws InputException {
        RecheckResult r = recheck().againstPredicted(BufferSpec.of("", 4.5, 8, 25));
        assertTrue(r.predicted());
        long identified = table.stream().filter(t -> "identified".equals(t.status())).count();
        assertTrue(r.assignments().size() >= identified);
        // strong ions stay put; formate and phosphate (pKa 3.75 and 2.15 in the demo library) shift by several units
        assertTrue(r.count(Verdict.STILL_HOLDS) > 0);
        assertTrue(r.count(Verdict.STILL_HOLDS) < r.assignments().size());
    }

    @Test
    void theTruthOfOneRunScoresItsCallsRight() throws InputException {
        // demo-data/TRUTH.md, spring-01: the four analytes and the neutral marker with their times
        String truth = """
                run,kind,analyte,time_s,mobility,height_sd
                spring-01,analyte,chloride,228.30,-76.15,
                spring-01,analyte,sulfate,232.61,-73.81,
                spring-01,analyte,nitrate,241.30,-69.35,
                spring-01,analyte,fluoride,271.51,-56.08,
                spring-01,marker,,576.00,0,
                """;
        KnownIdentities known = KnownIdentitiesReader.read(truth, "truth.csv");
        AssessIdentification.Result fromTable = AssessIdentification.ofTable(known, table, "peaks.csv");
        AssessIdentification.Result now = AssessIdentification.ofBatch(known, batch, "identified now");
        for (AssessIdentification.Result r : List.of(fromTable, now)) {
            assertTrue(r.assessment().anythingScored());
            assertEquals(1, r.assessment().runs().size());
            assertEquals(4, r.assessment().identification().identifiedCalls());
            assertEquals(4, r.assessment().identification().identifiedRight());
        }
        assertEquals("spring-01, spring-02, well-01, well-02, well-03, ...", now.preview());
    }

    @Test
    void aTruthOfOtherRunsScoresNothing() throws InputException {
        KnownIdentities known = KnownIdentitiesReader.read("run,kind,analyte,time_s,mobility,height_sd\n"
                + "elsewhere,analyte,chloride,228.30,-76.15,\n", "truth.csv");
        AssessIdentification.Result r = AssessIdentification.ofBatch(known, batch, "identified now");
        assertFalse(r.assessment().anythingScored());
        assertEquals(List.of("elsewhere"), r.assessment().notInTable());
    }

    @Test
    void aBatchOfAnionAndCationBuffersIsDrawnInOnePanelPerBuffer() {
        // The demo sheet: six anion runs in CHR-8 and one cation run in IMZ-4.5.
        PlotRuns.Drawing all = PlotRuns.plot(batch, List.of(), Axis.MOBILITY, true);
        assertEquals(2, all.figure().size());
        PlotModel anions = all.figure().panels().get(0);
        PlotModel cations = all.figure().panels().get(1);
        assertEquals("Buffer CHR-8, anions: 6 runs", anions.title());
        assertEquals("Buffer IMZ-4.5, cations: 1 run", cations.title());
        assertEquals(6, anions.series().size());
        assertEquals(1, cations.series().size());
        assertEquals(List.of("well-04-cations"), cations.series().stream().map(PlotModel.Series::label).toList());
        assertFalse(anions.peakLabels(), "six runs: markers only");
        assertTrue(cations.peakLabels(), "a single run keeps its labels");
        for (PlotModel.PeakMark p : anions.peaks()) {
            assertTrue(p.x() < 1, "only anions and the neutral marker in the anion panel: " + p.x());
        }
        for (PlotModel.PeakMark p : cations.peaks()) {
            assertTrue(p.x() > -1, "only cations and the neutral marker in the cation panel: " + p.x());
        }
        assertTrue(cations.xMin() > -20 && anions.xMax() < 20, "each panel keeps to its own ions' range: "
                + anions.xMin() + ".." + anions.xMax() + " and " + cations.xMin() + ".." + cations.xMax());
        assertTrue(anions.bandLabels() && cations.bandLabels());
        PlotRuns.Drawing time = PlotRuns.plot(batch, List.of(), Axis.TIME, false);
        assertEquals(2, time.figure().size(), "on the time axis too");
    }

    @Test
    void thePlotDrawsTheRunsAskedFor() {
        PlotRuns.Drawing two = PlotRuns.plot(batch, List.of("spring-01", " well-02"), Axis.MOBILITY, true);
        assertEquals(2, two.drawn());
        assertEquals(1, two.figure().size(), "two runs of one buffer share a panel");
        PlotModel m = two.figure().panels().get(0);
        assertEquals(2, m.series().size());
        assertTrue(m.peakLabels());
        assertFalse(m.bands().isEmpty());
        assertTrue(m.bandLabels(), "an overlay names its library bands");
        assertTrue(PlotLayout.of(m, 1200, 520).bandLabels().size() >= 3, "band names are drawn");
        PlotRuns.Drawing all = PlotRuns.plot(batch, List.of(), Axis.TIME, false);
        assertEquals(batch.results().size(), all.drawn());
        for (PlotModel p : all.figure().panels()) {
            assertTrue(p.bands().isEmpty());
        }
        PlotRuns.Drawing unknown = PlotRuns.plot(batch, List.of("spring-01", "nowhere"), Axis.MOBILITY, true);
        assertNull(unknown.figure());
        assertEquals("nowhere", unknown.unknownName());
    }
}
