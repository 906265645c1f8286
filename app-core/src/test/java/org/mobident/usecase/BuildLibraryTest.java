package org.mobident.usecase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.library.standards.BuildResult;
import org.mobident.library.standards.BuildSettings;
import org.mobident.library.standards.BuildWarning;
import org.mobident.library.standards.StandardsSheet;
import org.mobident.library.standards.StandardsSheetReader;
import org.mobident.pipeline.SamplingCheck;
import org.mobident.result.RunResult;
import org.mobident.trace.RunSpec;

/**
 * Building and adding to a library from the demo standards (invented data: two mixes, four
 * replicates each, demo-data/standards).
 */
class BuildLibraryTest {

    private static StandardsSheet sheet;
    private static RunBatch all;
    private static BuildResult full;

    @BeforeAll
    static void buildAll() throws InputException {
        sheet = StandardsSheetReader.read(DemoInputs.DEMO.resolve("standards").resolve("mixes.csv"));
        all = DemoInputs.standards();
        full = new BuildLibrary(sheet, null, all, Double.NaN, Double.NaN)
                .run(DemoInputs.settings(), BuildSettings.defaults());
    }

    /** Replicates {@code from} and {@code from + 1} of each mix (the sheet lists mix A's four, then mix B's). */
    private static RunBatch half(int from) {
        List<RunSpec> r = all.runs();
        return new RunBatch(List.of(r.get(from), r.get(from + 1), r.get(from + 4), r.get(from + 5)), List.of(),
                all.sampleByRun(), all.mixByRun());
    }

    @Test
    void everyAnalyteOfTheSheetIsMeasuredInEveryReplicate() {
        Library lib = full.library();
        assertEquals(10, lib.size());
        for (LibraryEntry e : lib.entries()) {
            assertEquals(4, e.n(), e.name());
        }
        // demo-data/TRUTH.md: chloride simulated at -76.20 (nominal, 25 C) with run-to-run SD 0.25
        LibraryEntry chloride = lib.find("chloride").orElseThrow();
        assertEquals(-76.20, chloride.mobility(), 0.3);
        assertTrue(chloride.mobilitySd() > 0 && chloride.mobilitySd() < 0.5);
    }

    @Test
    void theGuideLibraryComesFromTheSheetsApproximateMobilities() throws InputException {
        Library guide = new BuildLibrary(sheet, null, all, Double.NaN, Double.NaN).guideLibrary();
        // demo-data/standards/mixes.csv: chloride approx -76
        assertEquals(-76, guide.find("chloride").orElseThrow().mobility(), 1e-9);
        assertEquals(BuildLibrary.GUIDE_APPROX_SPREAD, guide.find("chloride").orElseThrow().mobilitySd(), 1e-9);
    }

    @Test
    void anImpossibleBufferIsRefusedBeforeAnyWork() {
        InputException e = assertThrows(InputException.class, () -> new BuildLibrary(sheet, null, all, 15, 10));
        assertEquals("--ph", e.field());
        e = assertThrows(InputException.class, () -> new BuildLibrary(sheet, null, all, 8, -1));
        assertEquals("--ionic-strength-mm", e.field());
    }

    @Test
    void aRunWithoutAMixIsRefused() {
        RunSpec first = all.runs().get(0);
        // neither a mix column, nor a sample text or file name that names a mix of the sheet
        RunSpec unnamed = new RunSpec("mystery", first.traceFile(), first.conditions(), "test", 1);
        RunBatch noMix = new RunBatch(List.of(unnamed), List.of(), Map.of(), Map.of());
        assertThrows(InputException.class, () -> new BuildLibrary(sheet, null, noMix, Double.NaN, Double.NaN));
    }

    @Test
    void addingTheOtherHalfPoolsToTheSameMeansAsBuildingFromAll() throws InputException {
        BuildResult first = new BuildLibrary(sheet, null, half(0), Double.NaN, Double.NaN)
                .run(DemoInputs.settings(), BuildSettings.defaults());
        AddToLibrary.Result added = new AddToLibrary(first.library(),
                new BuildLibrary(sheet, null, half(2), Double.NaN, Double.NaN))
                .run(DemoInputs.settings(), BuildSettings.defaults());
        assertEquals(10, added.merged().pooled().size());
        assertTrue(added.merged().added().isEmpty());
        for (LibraryEntry e : full.library().entries()) {
            LibraryEntry pooled = added.merged().library().find(e.name()).orElseThrow();
            assertEquals(4, pooled.n(), e.name());
            // both sides are kept to 6 significant digits (LibraryCsv.computedValue): pooled from two
            // rounded halves, the mean may differ in its last digit
            assertEquals(e.mobility(), pooled.mobility(), 2e-4, e.name());
        }
        // formate's halves differ by more than twice their combined uncertainty: the merge says so
        assertTrue(added.anyWarning());
    }

    @Test
    void runsAlreadyPooledAreRefused() {
        AddToLibrary again = assertDoesNotThrowNew();
        InputException e = assertThrows(InputException.class,
                () -> again.run(DemoInputs.settings(), BuildSettings.defaults()));
        assertFalse(e.getMessage().isBlank());
    }

    private static AddToLibrary assertDoesNotThrowNew() {
        try {
            return new AddToLibrary(full.library(), new BuildLibrary(sheet, null, all, Double.NaN, Double.NaN));
        } catch (InputException e) {
            throw new AssertionError(e);
        }
    }

    /** The demo standards are recorded fast enough: no run gets the sampling note. */
    @Test
    void theDemoStandardsAreSampledFastEnough() {
        assertTrue(full.warnings(BuildWarning.Kind.SAMPLED_TOO_SLOWLY).isEmpty(), full.warnings().toString());
    }

    /** A standards run noted as sampled too slowly (see SamplingCheck) becomes a build warning naming it. */
    @Test
    void aRunSampledTooSlowlyIsWarnedOf() {
        RunSpec first = all.runs().get(0);
        String note = SamplingCheck.NOTE_START + ": a zone of chloride, expected at 200.0 s, would be about 0.60 s "
                + "wide at half height, 1.2 sampling intervals of 0.500 s";
        RunResult slow = new RunResult(first, null, "", -50, null, List.of(), List.of("other note", note), 0.01);
        RunResult fine = new RunResult(all.runs().get(1), null, "", -50, null, List.of(), List.of("other note"), 0.01);
        List<BuildWarning> w = BuildLibrary.samplingWarnings(List.of(slow, fine), Map.of(first.name(), "A"));
        assertEquals(1, w.size());
        assertEquals(BuildWarning.Kind.SAMPLED_TOO_SLOWLY, w.get(0).kind());
        assertEquals(first.name(), w.get(0).run());
        assertEquals("A", w.get(0).mix());
        assertEquals("Run " + first.name() + " is " + note + ".", w.get(0).message());
        assertFalse(w.get(0).kind().informational(), "a warning, not information");
    }
}
