package org.mobident.recheck;

import org.mobident.report.recheck.RecheckReportCsv;
import org.mobident.report.recheck.RecheckSummaryText;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.SpeciesModel;
import org.mobident.chem.MobilityPredictor;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Constructed cases, all at infinite dilution and 25 °C so that the model is exact: library A at
 * pH 8 moved to pH 4.76, the pKa of acetic acid (CRC Handbook, from memory). Formic acid pKa 3.75
 * and the limiting mobilities of acetate (−42.39) and formate (−56.59) are the shipped reference
 * library's (CRC Handbook, from memory); "strong21" and "weak7" are invented.
 */
class RecheckerTest {

    static final BufferSpec A = BufferSpec.of("A", 8.0, 0, 25);
    static final BufferSpec B = BufferSpec.of("B", 4.76, 0, 25);

    static final SpeciesModel FORMATE = SpeciesModel.acid("formate", List.of(3.75), List.of(-56.59));
    static final SpeciesModel ACETATE = SpeciesModel.acid("acetate", List.of(4.76), List.of(-42.39));
    static final SpeciesModel WEAK7 = SpeciesModel.acid("weak7", List.of(7.0), List.of(-30.0));

    private static double at(SpeciesModel m, BufferSpec b) {
        return MobilityPredictor.effectiveMobility(m, b.conditions());
    }

    private static LibraryEntry measured(String name, double mu, SpeciesModel m, BufferSpec b) {
        return new LibraryEntry(name, mu, 0.3, 10, -1, Double.NaN, m == null ? List.of() : m.pKa(),
                m == null ? List.of(mu) : m.limitingMobilities(), b.label(), b.pH(), b.ionicStrengthMm(),
                b.temperatureC(), "constructed");
    }

    static Library libraryA() {
        return new Library(List.of(
                measured("chloride", -79.09, null, A),
                measured("formate", at(FORMATE, A), FORMATE, A),
                measured("acetate", at(ACETATE, A), ACETATE, A),
                measured("strong21", -21.0, null, A),
                measured("weak7", at(WEAK7, A), WEAK7, A)), "a.csv", List.of());
    }

    private static PeakTableRow row(long line, int peak, String analyte, double mu) {
        return new PeakTableRow(line, "=r1", peak, "analyte", mu, 0.1, mu, analyte, 0.95, "identified");
    }

    static List<PeakTableRow> table() {
        List<PeakTableRow> rows = new ArrayList<>();
        rows.add(row(2, 1, "chloride", -79.0));
        rows.add(row(3, 2, "formate", at(FORMATE, A) + 0.1));
        rows.add(row(4, 3, "acetate", at(ACETATE, A) - 0.1));
        rows.add(row(5, 4, "weak7", at(WEAK7, A)));
        rows.add(new PeakTableRow(6, "=r1", 5, "analyte", -60.0, 0.1, -60.0, null, 0.99, "unassigned"));
        rows.add(new PeakTableRow(7, "=r1", 6, "neutral marker", 0.0, Double.NaN, Double.NaN, null, Double.NaN,
                "marker"));
        return rows;
    }

    private static Map<String, AssignmentCheck> byAnalyte(RecheckResult r) {
        return r.assignments().stream().collect(Collectors.toMap(AssignmentCheck::analyte, Function.identity()));
    }

    @Test
    void eachVerdictFromAPredictedLibrary() throws InputException {
        RecheckResult r = Rechecker.withPredictedLibrary(table(), "peaks.csv", libraryA(), null, B,
                BufferTransfer.withoutReference(), RecheckSettings.DEFAULT);
        assertTrue(r.predicted());
        assertEquals(4, r.assignments().size(), "the unassigned peak and the marker are not rechecked");
        Map<String, AssignmentCheck> c = byAnalyte(r);

        AssignmentCheck chloride = c.get("chloride");
        assertEquals(Verdict.STILL_HOLDS, chloride.verdict(), chloride.reason());
        assertEquals(0.0, chloride.shift(), 1e-9);

        AssignmentCheck formate = c.get("formate");
        assertEquals(Verdict.MOVED_BUT_STILL_UNIQUE, formate.verdict(), formate.reason());
        // written out: α = 1/(1 + 10^(3.75 − 4.76)) at pH 4.76
        double formateB = -56.59 / (1 + Math.pow(10, 3.75 - 4.76));
        assertEquals(formateB - at(FORMATE, A), formate.shift(), 1e-9);
        assertEquals(formate.oldMobility() + formate.shift(), formate.newMobility(), 1e-12);
        assertTrue(formate.shiftUncertainty() > 0 && formate.shiftUncertainty() < 1.0, "" + formate.shiftUncertainty());

        AssignmentCheck acetate = c.get("acetate");
        // the moved peak now favours strong21: a changed assignment, not an "ambiguous" one
        assertEquals(Verdict.REASSIGNED, acetate.verdict(), acetate.reason());
        assertTrue(acetate.reason().contains("would now be taken for strong21"), acetate.reason());
        assertEquals(List.of("strong21"), acetate.collidesWith());
        assertEquals(-42.39 / 2, acetate.libraryMobilityB(), 1e-9, "half the anion mobility at the pKa");

        AssignmentCheck weak7 = c.get("weak7");
        assertEquals(Verdict.LOST, weak7.verdict());
        assertTrue(weak7.reason().contains("EOF"), weak7.reason());

        assertEquals(List.of("chloride", "formate", "acetate", "weak7"),
                r.assignments().stream().map(AssignmentCheck::analyte).toList(), "table order");
        assertTrue(r.needsAttention());
    }

    @Test
    void aPairBecomesUnresolvableAtThePkaOfOneMember() throws InputException {
        RecheckResult r = Rechecker.withPredictedLibrary(table(), "peaks.csv", libraryA(), null, B,
                BufferTransfer.withoutReference(), RecheckSettings.DEFAULT);
        List<PairCheck> lost = r.newlyUnresolvable();
        assertEquals(1, lost.size(), lost.toString());
        PairCheck p = lost.get(0);
        assertEquals("acetate", p.first());
        assertEquals("strong21", p.second());
        assertEquals(at(ACETATE, A) + 21.0, p.deltaA(), 1e-9);
        assertEquals(-42.39 / 2 + 21.0, p.deltaB(), 1e-9);
        assertTrue(p.resolvedA());
        assertFalse(p.resolvedB());
        // one pH unit above the pKa the same pair is still resolved
        RecheckResult above = Rechecker.withPredictedLibrary(table(), "peaks.csv", libraryA(), null,
                B.withPh(5.76), BufferTransfer.withoutReference(), RecheckSettings.DEFAULT);
        assertTrue(above.newlyUnresolvable().isEmpty(), above.pairs().toString());
    }

    @Test
    void noChangeOfBufferNeedsNoAttention() throws InputException {
        RecheckResult r = Rechecker.withPredictedLibrary(table(), "peaks.csv", libraryA(), null, A,
                BufferTransfer.withoutReference(), RecheckSettings.DEFAULT);
        assertTrue(r.assignments().stream().allMatch(a -> a.verdict() == Verdict.STILL_HOLDS), r.assignments().toString());
        assertTrue(r.pairs().isEmpty(), r.pairs().toString());
        assertFalse(r.needsAttention());
    }

    @Test
    void measuredLibraryBReportsHowFarTheModelWasOff() throws InputException {
        BufferTransfer predictor = BufferTransfer.withoutReference();
        Library a = libraryA();
        List<LibraryEntry> bEntries = new ArrayList<>();
        for (LibraryEntry e : a.entries()) {
            if (e.name().equals("weak7")) {
                continue; // not measured in B
            }
            double predicted = predictor.predict(e, A, B, "a.csv").predicted();
            double offset = e.name().equals("acetate") ? 0.5 : 0.0;
            bEntries.add(new LibraryEntry(e.name(), predicted + offset, 0.3, 10, e.charge(), Double.NaN, e.pKa(),
                    e.limitingMobilities(), "B", 4.76, 0, 25, "measured in B (constructed)"));
        }
        Library b = new Library(bEntries, "b.csv", List.of());
        RecheckResult r = Rechecker.withMeasuredLibrary(table(), "peaks.csv", a, null, b, null, predictor,
                RecheckSettings.DEFAULT);
        assertFalse(r.predicted());
        assertEquals(B, r.bufferB(), "buffer B read from library B");
        Map<String, AssignmentCheck> c = byAnalyte(r);
        assertEquals(Verdict.LOST, c.get("weak7").verdict());
        assertEquals("not in the new library", c.get("weak7").reason());
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("missing from the new library") && n.endsWith(": weak7")),
                r.notes().toString());
        StringWriter text = new StringWriter();
        RecheckSummaryText.write(r, new PrintWriter(text));
        String summary = text.toString();
        assertTrue(summary.contains("missing from the new library and cannot be identified with it: weak7"), summary);
        assertTrue(summary.strip().endsWith(RecheckResult.CAUTION_MEASURED), summary);
        assertFalse(summary.contains("rests on a model"), "a measured new library was given: " + summary);
        assertEquals(Verdict.STILL_HOLDS, c.get("chloride").verdict());
        assertNull(c.get("chloride").basis(), "measured, not predicted");
        assertEquals(Verdict.MOVED_BUT_STILL_UNIQUE, c.get("formate").verdict());
        assertEquals(Verdict.NOW_AMBIGUOUS, c.get("acetate").verdict(), "acetate measured 0.5 off: still favoured, not uniquely");

        assertEquals(4, r.predictionErrors().size());
        PredictionError acetate = r.predictionErrors().stream().filter(e -> e.analyte().equals("acetate"))
                .findFirst().orElseThrow();
        assertEquals(0.5, acetate.error(), 1e-9);
        assertEquals(0.5 / acetate.uncertainty(), acetate.errorInSd(), 1e-9);
        PredictionError chloride = r.predictionErrors().stream().filter(e -> e.analyte().equals("chloride"))
                .findFirst().orElseThrow();
        assertEquals(0.0, chloride.error(), 1e-9);
    }

    @Test
    void observableRangeAndSignChangeLoseAnAnalyte() throws InputException {
        RecheckResult r = Rechecker.withPredictedLibrary(table(), "peaks.csv", libraryA(), null, B,
                BufferTransfer.withoutReference(), RecheckSettings.DEFAULT.withObservableRange(-60, -10));
        AssignmentCheck chloride = byAnalyte(r).get("chloride");
        assertEquals(Verdict.LOST, chloride.verdict());
        assertTrue(chloride.reason().contains("observable range"), chloride.reason());

        // glycine-like ampholyte (invented: pKa 2.35/9.78, +30/−30) measured at pH 10 reverses at pH 4
        SpeciesModel amph = new SpeciesModel("amph", 1, List.of(2.35, 9.78), List.of(30.0, 0.0, -30.0));
        BufferSpec a10 = BufferSpec.of("A", 10, 0, 25);
        double mu = MobilityPredictor.effectiveMobility(amph, new BufferConditions(10, 0, 25));
        Library lib = new Library(List.of(new LibraryEntry("amph", mu, 0.3, 5, 1, Double.NaN, amph.pKa(),
                amph.limitingMobilities(), "A", 10, 0, 25, "invented")), "amph.csv", List.of());
        List<PeakTableRow> rows = List.of(row(2, 1, "amph", mu));
        RecheckResult flip = Rechecker.withPredictedLibrary(rows, "p.csv", lib, null, BufferSpec.of("B", 2.0, 0, 25),
                BufferTransfer.withoutReference(), RecheckSettings.DEFAULT);
        assertEquals(Verdict.LOST, flip.assignments().get(0).verdict());
        assertTrue(flip.assignments().get(0).reason().contains("sign"), flip.assignments().get(0).reason());
    }

    @Test
    void anAssignmentMissingFromLibraryAIsAnInputError() {
        List<PeakTableRow> rows = List.of(row(9, 1, "bromide", -77.0));
        InputException ex = assertThrows(InputException.class, () -> Rechecker.withPredictedLibrary(rows, "peaks.csv",
                libraryA(), null, B, BufferTransfer.withoutReference(), RecheckSettings.DEFAULT));
        assertEquals(9, ex.line());
        assertEquals("assigned", ex.field());
        assertEquals("peaks.csv", ex.file());
    }

    @Test
    void writersCarryVerdictsSafelyAndEndWithTheCaution() throws Exception {
        RecheckResult r = Rechecker.withPredictedLibrary(table(), "peaks.csv", libraryA(), null, B,
                BufferTransfer.withoutReference(), RecheckSettings.DEFAULT);
        StringWriter assignments = new StringWriter();
        RecheckReportCsv.writeAssignments(r, assignments);
        String[] lines = assignments.toString().split("\n");
        assertEquals(String.join(",", RecheckReportCsv.ASSIGNMENT_COLUMNS), lines[0]);
        assertEquals(5, lines.length);
        assertTrue(lines[1].startsWith("'=r1,1,chloride,identified,0.950,-79.000,0.100,-79.090,-79.090,0.000,"),
                lines[1]);
        assertTrue(lines[3].contains(",reassigned,strong21,entry_model,"), lines[3]);

        StringWriter pairs = new StringWriter();
        RecheckReportCsv.writePairs(r, pairs);
        assertTrue(pairs.toString().contains("\nacetate,strong21,"), pairs.toString());
        assertTrue(pairs.toString().contains(",1.000,true,-0.195,"), pairs.toString());
        assertTrue(pairs.toString().endsWith(",false,true\n"), pairs.toString());

        StringWriter analytes = new StringWriter();
        RecheckReportCsv.writeAnalytes(r, analytes);
        assertEquals(6, analytes.toString().split("\n").length);
        assertTrue(analytes.toString().contains("\nacetate,A,"), analytes.toString());

        StringWriter text = new StringWriter();
        RecheckSummaryText.write(r, new PrintWriter(text));
        String s = text.toString();
        assertTrue(s.contains("1 still hold, 1 moved but still unique, 0 still ambiguous, 0 now ambiguous, 1 reassigned, 1 lost"), s);
        // one line per analyte: its verdict, shift ± SD, affected/assigned peaks, new window
        String formate = s.lines().filter(l -> l.startsWith("formate ")).findFirst().orElseThrow();
        assertTrue(formate.contains("moved but still unique") && formate.contains("1/1"), formate);
        String acetate = s.lines().filter(l -> l.startsWith("acetate ")).findFirst().orElseThrow();
        assertTrue(acetate.contains("reassigned to strong21"), acetate);
        assertFalse(s.contains("NaN"), s);
        assertFalse(s.contains("moved still unique"), s);
        assertFalse(s.matches("(?s).*\\b(library|buffer) [AB]\\b.*"), "no bare A/B: " + s);
        assertTrue(s.contains("acetate / strong21"), s);
        assertTrue(s.strip().endsWith(RecheckResult.CAUTION), s);
    }

    private static LibraryEntry entry(String name, double mu, String buffer) {
        return new LibraryEntry(name, mu, 0.3, 10, -1, Double.NaN, List.of(), List.of(mu), buffer, 8.0, 0, 25,
                "invented");
    }

    /**
     * The rule for "still holds": the moved peak (old peak + the analyte's shift) is compared with
     * the analyte's window in the OLD library. Both nitrate peaks get the same shift +1.14; with a
     * fixed ±1.0 window around −69.50 the first (−69.35 → −68.21) leaves it, the second
     * (−69.87 → −68.73) stays in it. (Comparing the unmoved peak with the new library's window
     * gave the opposite answers.) Values invented.
     */
    @Test
    void stillHoldsMeansTheMovedPeakStaysInTheOldWindow() throws InputException {
        Library a = new Library(List.of(entry("nitrate", -69.50, "A"), entry("chloride", -79.0, "A")), "a.csv",
                List.of());
        Library b = new Library(List.of(entry("nitrate", -68.36, "B"), entry("chloride", -79.0, "B")), "b.csv",
                List.of());
        List<PeakTableRow> rows = List.of(
                new PeakTableRow(2, "spring", 1, "analyte", -69.35, 0.001, -69.35, "nitrate", 0.96, "identified"),
                new PeakTableRow(3, "well", 1, "analyte", -69.87, 0.001, -69.87, "nitrate", 0.97, "identified"));
        RecheckSettings settings = RecheckSettings.DEFAULT.withMatch(org.mobident.settings.MatchSettings.ABSOLUTE);
        RecheckResult r = Rechecker.withMeasuredLibrary(rows, "peaks.csv", a, null, b, null,
                BufferTransfer.withoutReference(), settings);
        AssignmentCheck spring = r.assignments().get(0);
        AssignmentCheck well = r.assignments().get(1);
        assertEquals(1.14, spring.shift(), 1e-9);
        assertEquals(1.14, well.shift(), 1e-9);
        assertEquals(-68.21, spring.newMobility(), 1e-9);
        assertEquals(Verdict.MOVED_BUT_STILL_UNIQUE, spring.verdict(), spring.reason());
        assertTrue(spring.reason().contains("(-68.21) falls outside the window of nitrate in the old library (-69.50 ± 1.00)"),
                spring.reason());
        assertEquals(Verdict.STILL_HOLDS, well.verdict(), well.reason());
        assertTrue(well.reason().contains("(-68.73) stays inside the window of nitrate in the old library (-69.50 ± 1.00)"),
                well.reason());
    }

    /** A moved peak that lands on another analyte is REASSIGNED, not "ambiguous". Values invented. */
    @Test
    void aPeakTakenForAnotherAnalyteIsReassigned() throws Exception {
        Library a = new Library(List.of(entry("x1", -30.0, "A"), entry("y", -50.0, "A")), "a.csv", List.of());
        Library b = new Library(List.of(entry("x1", -35.0, "B"), entry("y", -36.0, "B")), "b.csv", List.of());
        List<PeakTableRow> rows = List.of(
                new PeakTableRow(2, "r1", 1, "analyte", -30.9, 0.05, -30.9, "x1", 0.9, "identified"));
        RecheckResult r = Rechecker.withMeasuredLibrary(rows, "peaks.csv", a, null, b, null,
                BufferTransfer.withoutReference(),
                RecheckSettings.DEFAULT.withMatch(org.mobident.settings.MatchSettings.ABSOLUTE));
        AssignmentCheck x = r.assignments().get(0);
        assertEquals(-35.9, x.newMobility(), 1e-9);
        assertEquals(Verdict.REASSIGNED, x.verdict(), x.reason());
        assertTrue(x.reason().contains("would now be taken for y"), x.reason());
        assertFalse(x.reason().contains("ambiguous"), x.reason());
        assertTrue(r.needsAttention());
        StringWriter csv = new StringWriter();
        RecheckReportCsv.writeAssignments(r, csv);
        assertTrue(csv.toString().contains(",reassigned,"), csv.toString());
        StringWriter text = new StringWriter();
        RecheckSummaryText.write(r, new PrintWriter(text));
        assertTrue(text.toString().contains("1 reassigned"), text.toString());
        assertTrue(text.toString().lines().anyMatch(l -> l.startsWith("x1 ") && l.contains("reassigned to y")),
                text.toString());

        // nearer to x1 (residual 0.4) than to y (0.6) in the new library: still x1, but not uniquely
        List<PeakTableRow> near = List.of(
                new PeakTableRow(2, "r1", 1, "analyte", -30.4, 0.05, -30.4, "x1", 0.9, "identified"));
        AssignmentCheck amb = Rechecker.withMeasuredLibrary(near, "peaks.csv", a, null, b, null,
                BufferTransfer.withoutReference(),
                RecheckSettings.DEFAULT.withMatch(org.mobident.settings.MatchSettings.ABSOLUTE)).assignments().get(0);
        assertEquals(Verdict.NOW_AMBIGUOUS, amb.verdict(), amb.reason());
        assertEquals(List.of("y"), amb.collidesWith());

        // the same peak called ambiguous already: it stays so, which the new buffer does not change
        List<PeakTableRow> before = List.of(
                new PeakTableRow(2, "r1", 1, "analyte", -30.4, 0.05, -30.4, "x1", 0.6, "ambiguous"));
        RecheckResult same = Rechecker.withMeasuredLibrary(before, "peaks.csv", a, null, b, null,
                BufferTransfer.withoutReference(),
                RecheckSettings.DEFAULT.withMatch(org.mobident.settings.MatchSettings.ABSOLUTE));
        assertEquals(Verdict.STILL_AMBIGUOUS, same.assignments().get(0).verdict(), same.assignments().get(0).reason());
        assertEquals(List.of("y"), same.assignments().get(0).collidesWith());
        assertFalse(same.needsAttention());
    }

    /**
     * A day of 30 runs against the demo library (16 analytes, invented values) fits one screen: at
     * most 40 lines, one per analyte, no "NaN" anywhere (the per-peak detail goes to the CSV).
     */
    @Test
    void thirtyRunsFitOneScreenPerAnalyte() throws Exception {
        Library demo = org.mobident.library.LibraryCsv.read(Path.of("..", "demo-data", "library.csv"));
        List<PeakTableRow> rows = new ArrayList<>();
        long line = 2;
        java.util.SplittableRandom random = new java.util.SplittableRandom(12);
        for (int run = 1; run <= 30; run++) {
            int peak = 1;
            for (LibraryEntry e : demo.entries()) {
                if (random.nextDouble() < 0.2) {
                    continue; // not every analyte in every sample
                }
                double mu = e.mobility() + 0.1 * random.nextGaussian();
                rows.add(new PeakTableRow(line++, "run" + run, peak++, "analyte", mu, 0.1, mu, e.name(), 0.95,
                        "identified"));
            }
        }
        Path ref = Path.of("..").resolve(org.mobident.chem.ReferenceIons.SHIPPED_LIBRARY);
        RecheckResult r = Rechecker.withPredictedLibrary(rows, "day.csv", demo, null, BufferSpec.of("new", 5.2, 15, 30),
                BufferTransfer.withReference(org.mobident.library.LibraryCsv.read(ref)), RecheckSettings.DEFAULT);
        StringWriter text = new StringWriter();
        RecheckSummaryText.write(r, new PrintWriter(text));
        List<String> lines = text.toString().lines().toList();
        assertTrue(lines.size() <= 40, lines.size() + " lines:\n" + text);
        assertTrue(rows.size() > 300, "a day's worth of assignments: " + rows.size());
        for (LibraryEntry e : demo.entries()) {
            assertEquals(1, lines.stream().filter(l -> l.startsWith(e.name() + " ")).count(), e.name() + "\n" + text);
        }
        assertFalse(text.toString().contains("NaN"), text.toString());
    }
}
