package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.settings.PeakSettings;
import org.mobident.simulate.SimulationSpec;
import org.mobident.simulate.TraceSimulator;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/**
 * End to end: traces synthesised from known mobilities (EOF drifting ±15 % between runs, noise,
 * baseline drift, both polarities, dips from indirect detection) must be identified correctly and
 * their mobilities must come back within the stated uncertainty. The traces are made by
 * {@link TraceSimulator} from the definition μ_app = Ld·Lt/(V·t') (IUPAC) — the same physics the
 * engine inverts, but through separate code (the simulator never calls the mobility package).
 */
class IdentifierEndToEndTest {

    /** Anions, effective mobilities in 1e-9 m²/(V s); invented test values, not a source. */
    private static final Library ANIONS = new Library(List.of(
            entry("chloride", -76.2, 0.4), entry("sulfate", -73.9, 0.4), entry("nitrite", -71.1, 0.4),
            entry("nitrate", -69.8, 0.4), entry("chlorate", -63.3, 0.4), entry("fluoride", -55.6, 0.5),
            entry("formate", -53.3, 0.4), entry("phosphate", -47.3, 0.6), entry("acetate", -40.9, 0.4)),
            "test", List.of());

    private static final Library CATIONS = new Library(List.of(
            entry("potassium", 70.2, 0.4), entry("ammonium", 68.8, 0.4), entry("calcium", 54.8, 0.5),
            entry("magnesium", 50.6, 0.5), entry("sodium", 46.2, 0.4), entry("lithium", 36.5, 0.4)),
            "test", List.of());

    /** The mobility must come back within this many of its stated standard uncertainties. */
    private static final double SD_COVERAGE = 4.0;

    private static LibraryEntry entry(String name, double mobility, double sd) {
        return new LibraryEntry(name, mobility, sd, 6, mobility < 0 ? -1 : 1, Double.NaN, List.of(), List.of(),
                "test buffer", Double.NaN, Double.NaN, 25.0, "test");
    }

    private static RunConditions conditions(double ltCm, double ldCm, double kv, double rampS, Detection det,
                                            double markerFromS, double markerToS) {
        return new RunConditions(ltCm, ldCm, kv, rampS, 25.0, "test buffer", markerFromS, markerToS, det,
                Double.NaN, Double.NaN, Double.NaN);
    }

    private record Truth(String name, double mobility) {
    }

    private static RunResult run(Library library, RunConditions c, double eof, List<Truth> zones, long seed,
                                 double noiseSd) {
        return run(library, c, eof, zones, seed, noiseSd, 1.0);
    }

    private static RunResult run(Library library, RunConditions c, double eof, List<Truth> zones, long seed,
                                 double noiseSd, double markerHeight) {
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(eof).neutralMarker(markerHeight)
                .samplingHz(20).durationS(900).noiseSd(noiseSd).baseline(0.3).drift(2e-4, 1e-7).seed(seed);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 120_000);
        }
        Trace t = TraceSimulator.simulate("run-" + seed, b.build());
        RunSpec spec = new RunSpec("run-" + seed, Path.of("run-" + seed + ".csv"), c, "test", 0);
        return new Identifier(library, IdentifySettings.defaults().withThreads(1)).identify(spec, t);
    }

    private static void assertIdentified(RunResult r, List<Truth> zones) {
        assertFalse(r.failed(), () -> "run failed: " + r.error());
        assertTrue(r.mobilityKnown(), r.scaleNote());
        for (Truth z : zones) {
            PeakResult best = null;
            for (PeakResult p : r.peaks()) {
                if (p.role() == PeakRole.ANALYTE && (best == null
                        || Math.abs(p.mobility() - z.mobility()) < Math.abs(best.mobility() - z.mobility()))) {
                    best = p;
                }
            }
            assertNotNull(best, "no peak for " + z.name());
            PeakResult found = best;
            double err = Math.abs(found.mobility() - z.mobility());
            assertTrue(err <= SD_COVERAGE * found.mobilitySd(),
                    () -> z.name() + ": mobility " + found.mobility() + " vs true " + z.mobility()
                            + ", stated sd " + found.mobilitySd());
            if (z.name().startsWith("unknown")) {
                assertNull(found.match().assigned(), () -> z.name() + " must stay unassigned: " + found.match());
                assertEquals(MatchStatus.UNASSIGNED, found.match().status());
            } else {
                assertEquals(z.name(), found.match().assigned(), () -> "peak at " + found.peak().apexTimeS()
                        + " s, mobility " + found.mobility() + ": " + found.match());
            }
        }
        long analytes = r.peaks().stream().filter(p -> p.role() == PeakRole.ANALYTE).count();
        assertEquals(zones.size(), analytes, () -> "extra or missing peaks: " + r.peaks());
    }

    /** Each zone's true mobility scatters around its library value as between real runs. */
    private static List<Truth> draw(Library library, SplittableRandom rnd, int skipEvery) {
        List<Truth> zones = new ArrayList<>();
        int i = 0;
        for (LibraryEntry e : library.entries()) {
            if (skipEvery > 0 && i++ % skipEvery == 0) {
                continue;
            }
            zones.add(new Truth(e.name(), e.mobility() + 0.5 * e.mobilitySd() * gaussian(rnd)));
        }
        return zones;
    }

    private static double gaussian(SplittableRandom rnd) {
        double u = rnd.nextDouble(1e-12, 1.0);
        double v = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }

    @ParameterizedTest(name = "reversed polarity, coated wall, indirect: seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6})
    void reversedPolarityAnionsWithDriftingEof(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double eof = -50.0 * (1 + rnd.nextDouble(-0.15, 0.15));
        List<Truth> zones = draw(ANIONS, rnd, (int) (seed % 4) + 2);
        zones.add(new Truth("unknown-a", -59.8));
        RunConditions c = conditions(80, 72, -20, 6, Detection.INDIRECT, 380, 800);
        assertIdentified(run(ANIONS, c, eof, zones, seed, 0.004), zones);
    }

    @ParameterizedTest(name = "normal polarity, bare silica, cations: seed {0}")
    @ValueSource(longs = {11, 12, 13, 14})
    void normalPolarityCationsWithDriftingEof(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double eof = 45.0 * (1 + rnd.nextDouble(-0.15, 0.15));
        List<Truth> zones = draw(CATIONS, rnd, 0);
        Detection det = seed % 2 == 0 ? Detection.DIRECT : Detection.INDIRECT;
        RunConditions c = conditions(60, 52, 25, 0, det, 200, 500);
        assertIdentified(run(CATIONS, c, eof, zones, seed, 0.004), zones);
    }

    @Test
    void aRunWhoseDetectorSaturatedIsNamedAsIfItHadNotAndSaysSo() {
        // the same cation run read whole and read by a detector that cuts every value above a level
        // half-way up the tallest zones: the same names, the mobilities within their uncertainty of
        // the whole run's, and a note on the flat tops
        SplittableRandom rnd = new SplittableRandom(41);
        double eof = 45.0;
        List<Truth> zones = draw(CATIONS, rnd, 0);
        RunConditions c = conditions(60, 52, 25, 0, Detection.DIRECT, 200, 500);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(eof).neutralMarker(1.0)
                .samplingHz(20).durationS(900).noiseSd(0.004).baseline(0.3).seed(41);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 120_000);
        }
        Trace whole = TraceSimulator.simulate("whole", b.build());
        double[] y = whole.signals();
        double level = 0.3 + 0.45;
        int cut = 0;
        for (int i = 0; i < y.length; i++) {
            if (y[i] > level) {
                y[i] = level;
                cut++;
            }
        }
        assertTrue(cut > 20, "the drawn run must be cut: " + cut);
        Trace saturated = new Trace("cut", "cut.csv", whole.timesS(), y);
        Identifier identifier = new Identifier(CATIONS, IdentifySettings.defaults().withThreads(1));
        RunResult a = identifier.identify(new RunSpec("whole", Path.of("whole.csv"), c, "test", 0), whole);
        RunResult r = identifier.identify(new RunSpec("cut", Path.of("cut.csv"), c, "test", 0), saturated);
        assertIdentified(a, zones);
        assertIdentified(r, zones);
        assertTrue(r.notes().stream().anyMatch(n -> n.startsWith("the detector saturated")), r.notes().toString());
        assertTrue(a.notes().stream().noneMatch(n -> n.contains("saturated")), a.notes().toString());
        // the rows of the cut zones say so (the tallest zones: those above the cut level)
        long remarked = r.peaks().stream().filter(p -> Identifier.CUT_TOP.equals(p.note())).count();
        assertTrue(remarked >= 1, r.peaks().toString());
        for (PeakResult p : r.peaks()) {
            if (Identifier.CUT_TOP.equals(p.note())) {
                assertTrue(p.peak().height() > 0.45, "a zone below the cut remarked: " + p);
            }
        }
        assertTrue(a.peaks().stream().noneMatch(p -> Identifier.CUT_TOP.equals(p.note())));
    }

    @Test
    void aRunWhoseTemperatureIsMistypedInABatchThatAgreesIsReadWithItsOwnScale(@org.junit.jupiter.api.io.TempDir
                                                                                 Path dir) throws Exception {
        // twenty runs of one method that agree closely; the sheet states 26 °C for one that ran at 25
        // like the others: a 1 K error is 2.3 % on every mobility (the viscosity of water, IAPWS
        // 2008), about as far as neighbouring anions lie apart
        Library library = org.mobident.library.LibraryCsv.read(Path.of("..", "demo-data", "library.csv"));
        Path sheet = org.mobident.simulate.ArchiveGenerator.write(library, 20, 14_000, 5, dir, false);
        List<String> lines = java.nio.file.Files.readAllLines(sheet);
        String[] row = lines.get(7).split(",", -1);
        assertEquals("25", row[5], lines.get(0));
        row[5] = "26";
        lines.set(7, String.join(",", row));
        Path mistyped = dir.resolve("mistyped.csv");
        java.nio.file.Files.write(mistyped, lines);
        Identifier identifier = new Identifier(library, IdentifySettings.defaults().withThreads(1));
        List<RunResult> right = identifier.identifyAll(
                org.mobident.trace.io.RunSheetReader.read(sheet, RunConditions.EMPTY).runs());
        List<RunResult> typo = identifier.identifyAll(
                org.mobident.trace.io.RunSheetReader.read(mistyped, RunConditions.EMPTY).runs());
        for (int r = 0; r < right.size(); r++) {
            List<PeakResult> a = right.get(r).peaks();
            List<PeakResult> b = typo.get(r).peaks();
            assertEquals(a.size(), b.size());
            for (int k = 0; k < a.size(); k++) {
                assertEquals(a.get(k).match().assigned(), b.get(k).match().assigned(), "run " + r + " peak " + k);
                assertEquals(a.get(k).match().status(), b.get(k).match().status(), "run " + r + " peak " + k);
            }
            boolean told = typo.get(r).notes().stream().anyMatch(n -> n.contains("lies outside its batch's"));
            assertEquals(r == 6, told, "run " + r + ": " + typo.get(r).notes());
        }
        // the mistyped run's fitted scale undoes the wrong conversion: η(26)/η(25) = 0.8705/0.8900
        // (IAPWS 2008, from memory)
        assertEquals(0.8705 / 0.8900, typo.get(6).runScale().factor(), 0.008);
    }

    @Test
    void aDisturbanceAtTheStartIsMarkedAsNoIonAndLeavesTheNamesAlone() {
        // a swing of the signal in the first seconds (the injection, the voltage coming on) comes out
        // at a mobility beyond any ion's: no name, and a remark saying what it is
        SplittableRandom rnd = new SplittableRandom(51);
        List<Truth> zones = draw(CATIONS, rnd, 0);
        RunConditions c = conditions(60, 52, 25, 0, Detection.DIRECT, 200, 500);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(45.0).neutralMarker(1.0)
                .samplingHz(20).durationS(900).noiseSd(0.004).baseline(0.3).seed(51);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 120_000);
        }
        Trace clean = TraceSimulator.simulate("swing", b.build());
        double[] t = clean.timesS();
        double[] y = clean.signals();
        for (int i = 0; i < t.length; i++) {
            double u = (t[i] - 2.0) / 0.5;
            y[i] += 3.0 * Math.exp(-0.5 * u * u);
        }
        RunResult r = new Identifier(CATIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("swing", Path.of("swing.csv"), c, "test", 0), new Trace("swing", "swing.csv", t, y));
        List<PeakResult> early = r.peaks().stream().filter(p -> p.peak().apexTimeS() < 10).toList();
        assertEquals(1, early.size(), r.peaks().toString());
        // μ_app = Ld·Lt/(V·t) at t = 2 s: 52·60/(25,000·2) = 0.0624 cm²/(V s), 6,240 units: far beyond any ion
        assertTrue(Math.abs(early.get(0).mobility()) > 130, String.valueOf(early.get(0).mobility()));
        assertNull(early.get(0).match().assigned());
        assertEquals(Identifier.BEYOND_ANY_ION, early.get(0).note());
        for (Truth z : zones) {
            assertTrue(r.peaks().stream().anyMatch(p -> z.name().equals(p.match().assigned())), z.name());
        }
    }

    /** The anion and cation libraries in one, each entry labelled with its own buffer. */
    private static Library twoBuffers() {
        List<LibraryEntry> all = new ArrayList<>();
        for (LibraryEntry e : ANIONS.entries()) {
            all.add(new LibraryEntry(e.name(), e.mobility(), e.mobilitySd(), 6, -1, Double.NaN, List.of(), List.of(),
                    "ANION-7", Double.NaN, Double.NaN, 25.0, "test"));
        }
        for (LibraryEntry e : CATIONS.entries()) {
            all.add(new LibraryEntry(e.name(), e.mobility(), e.mobilitySd(), 6, 1, Double.NaN, List.of(), List.of(),
                    "CATION-4", Double.NaN, Double.NaN, 25.0, "test"));
        }
        return new Library(all, "test", List.of());
    }

    @Test
    void aRunWithoutABufferIsMatchedWithTheBufferThatExplainsItAndSaysSo() {
        SplittableRandom rnd = new SplittableRandom(31);
        List<Truth> zones = draw(CATIONS, rnd, 0);
        RunConditions c = new RunConditions(60, 52, 25, 0, 25.0, null, 200, 500, Detection.DIRECT, Double.NaN,
                Double.NaN, Double.NaN);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(45.0).neutralMarker(1.0)
                .samplingHz(20).durationS(900).noiseSd(0.004).baseline(0.3).seed(31);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 120_000);
        }
        Trace t = TraceSimulator.simulate("no-buffer", b.build());
        RunResult r = new Identifier(twoBuffers(), IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("no-buffer", Path.of("no-buffer.csv"), c, "test", 0), t);
        assertIdentified(r, zones);
        assertEquals("CATION-4", r.spec().conditions().buffer());
        assertTrue(r.notes().get(0).startsWith("no buffer given: matched with the entries of CATION-4"),
                r.notes().toString());
    }

    @Test
    void aBatchWithoutBuffersCallsAsWithThemAndEveryRunSaysWhichBufferItTook() throws Exception {
        // a consistency check on the bundled demo runs (two buffers in the library): the batch's second
        // pass, under the prior learned from its runs, must keep each run's note
        Path demo = Path.of("..", "demo-data");
        Library library = org.mobident.library.LibraryCsv.read(demo.resolve("library.csv"));
        List<RunSpec> withBuffers = org.mobident.trace.io.RunSheetReader.read(demo.resolve("runs.csv"),
                RunConditions.EMPTY).runs();
        List<RunSpec> without = new ArrayList<>();
        for (RunSpec r : withBuffers) {
            without.add(r.withConditions(r.conditions().withBuffer(null)));
        }
        Identifier identifier = new Identifier(library, IdentifySettings.defaults().withThreads(1));
        List<RunResult> a = identifier.identifyAll(withBuffers);
        List<RunResult> b = identifier.identifyAll(without);
        for (int i = 0; i < a.size(); i++) {
            RunResult x = a.get(i);
            RunResult y = b.get(i);
            assertEquals(x.spec().conditions().buffer(), y.spec().conditions().buffer(), x.spec().name());
            assertTrue(y.notes().get(0).startsWith("no buffer given: matched with the entries of "
                    + x.spec().conditions().buffer()), y.notes().toString());
            for (int k = 0; k < x.peaks().size(); k++) {
                assertEquals(x.peaks().get(k).match().assigned(), y.peaks().get(k).match().assigned(),
                        x.spec().name() + " peak " + (k + 1));
            }
        }
    }

    @Test
    void markerFoundWithoutWindowByLibraryFit() {
        SplittableRandom rnd = new SplittableRandom(21);
        List<Truth> zones = draw(ANIONS, rnd, 0);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, Double.NaN, Double.NaN);
        RunResult r = run(ANIONS, c, -46.0, zones, 21, 0.004);
        assertIdentified(r, zones);
        assertTrue(r.notes().get(0).contains("no marker window"), r.notes().toString());
        assertEquals(-46.0, r.eofMobility(), 0.05, "EOF mobility recovered (value used to synthesise)");
    }

    @Test
    void twoMarkerModeNeedsNoGeometryAndResistsAWrongVoltage() {
        // The charged marker (sulfate-like, known mobility -73.9) and the neutral marker fix the scale;
        // the stated voltage is 10 % off, which would bias the neutral-marker-only scale.
        SplittableRandom rnd = new SplittableRandom(31);
        List<Truth> zones = new ArrayList<>(draw(ANIONS, rnd, 0));
        zones.removeIf(z -> z.name().equals("sulfate"));
        RunConditions truth = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        SimulationSpec.Builder b = SimulationSpec.builder(truth).eofMobility(-48).neutralMarker(1.0)
                .samplingHz(20).durationS(900).noiseSd(0.004).seed(31).zone("sulfate", -73.9, 0.8, 120_000);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 120_000);
        }
        Trace t = TraceSimulator.simulate("two-marker", b.build());
        double sulfateTimeS = TraceSimulator.apexTimeS(b.build(), -73.9);
        RunConditions stated = new RunConditions(Double.NaN, Double.NaN, Double.NaN, 0, 25.0, "test buffer", 380, 800,
                Detection.INDIRECT, -73.9, sulfateTimeS - 1.0, sulfateTimeS + 1.0);
        Library noSulfate = new Library(ANIONS.entries().stream().filter(e -> !e.name().equals("sulfate")).toList(),
                "test", List.of());
        RunResult r = new Identifier(noSulfate, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("two-marker", Path.of("two-marker.csv"), stated, "test", 0), t);
        assertIdentified(r, zones);
        assertTrue(r.peaks().stream().anyMatch(p -> p.role() == PeakRole.MOBILITY_MARKER));
    }

    @Test
    void markerOutsideItsWindowIsFoundByThePatternAndSaidSo() {
        SplittableRandom rnd = new SplittableRandom(41);
        List<Truth> zones = draw(ANIONS, rnd, 0);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 800, 880);
        RunResult r = run(ANIONS, c, -50, zones, 41, 0.004);
        assertFalse(r.failed());
        assertIdentified(r, zones);
        assertEquals(-50.0, r.eofMobility(), 0.05, "EOF mobility recovered (value used to synthesise)");
        assertTrue(r.notes().get(0).contains("no peak in the marker window 800.0–880.0 s"), r.notes().toString());
    }

    @Test
    void runWithoutPeaksHasNoMobilities() {
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 800, 880);
        RunResult r = run(ANIONS, c, -50, List.of(), 41, 0.004, 0.0);
        assertFalse(r.failed());
        assertFalse(r.mobilityKnown());
        assertTrue(r.scaleNote().contains("no peaks found"), r.scaleNote());
    }

    @Test
    void temperatureDifferenceIsCorrectedThroughWaterViscosity() {
        // Zones synthesised at 30 °C with mobilities scaled from the 25 °C library by η(25)/η(30):
        // IAPWS 2008 viscosities 0.8900 and 0.7972 mPa s (from memory), ratio 1.1164.
        SplittableRandom rnd = new SplittableRandom(51);
        List<Truth> at25 = draw(ANIONS, rnd, 0);
        List<Truth> at30 = at25.stream().map(z -> new Truth(z.name(), z.mobility() * 0.8900 / 0.7972)).toList();
        RunConditions c = new RunConditions(80, 72, -20, 0, 30.0, "test buffer", 380, 800, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        RunResult r = run(ANIONS, c, -52, at30, 51, 0.004);
        assertIdentified(r, at30);
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("30.0 °C")), r.notes().toString());
        for (PeakResult p : r.peaks()) {
            if (p.role() == PeakRole.ANALYTE) {
                assertEquals(p.mobility() * 0.7972 / 0.8900, p.mobilityAtLibraryTemp(), 0.01);
            }
        }
    }

    @Test
    void batchGoesOnPastAMissingFile() {
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunSpec missing = new RunSpec("gone", Path.of("does-not-exist.csv"), c, "sheet.csv", 4);
        List<RunResult> out = new Identifier(ANIONS, IdentifySettings.defaults()).identifyAll(List.of(missing));
        assertEquals(1, out.size());
        assertTrue(out.get(0).failed());
        assertTrue(out.get(0).error().getMessage().contains("does-not-exist.csv"), out.get(0).error().getMessage());
    }

    @Test
    void aMissingVoltageIsNamedAsSuch() {
        RunConditions full = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        Trace t = TraceSimulator.simulate("v", SimulationSpec.builder(full).eofMobility(-50).neutralMarker(1.0)
                .samplingHz(20).durationS(900).zone("chloride", -76.2, 0.8, 120_000).build());
        RunConditions noVoltage = new RunConditions(80, 72, Double.NaN, 0, 25.0, "b", 380, 800, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("v", Path.of("v.csv"), noVoltage, "runs.csv", 7), t);
        assertTrue(r.failed());
        assertEquals("voltage_kv", r.error().field());
        assertEquals(7, r.error().line());
    }

    /** One anion run from the simulator, with extra zones (name, mobility, height) and a marker height. */
    private static Trace anionTrace(String name, double eof, double markerHeight, List<Truth> zones,
                                    double[][] extra, long seed) {
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(eof).neutralMarker(markerHeight)
                .samplingHz(20).durationS(900).noiseSd(0.004).baseline(0.3).seed(seed);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 120_000);
        }
        for (int k = 0; k < extra.length; k++) {
            b.zone("foreign" + k, extra[k][0], extra[k][1], 120_000);
        }
        return TraceSimulator.simulate(name, b.build());
    }

    @Test
    void aTallerForeignPeakInTheMarkerWindowDoesNotWin() {
        // a weakly charged substance (μ = −2) 2.5 times as tall as the marker, inside the window 380–800 s
        List<Truth> zones = draw(ANIONS, new SplittableRandom(61), 0);
        Trace t = anionTrace("tall", -48.0, 1.0, zones, new double[][] {{-2.0, 2.5}}, 61);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("tall", Path.of("tall.csv"), c, "test", 0), t);
        assertEquals(-48.0, r.eofMobility(), 0.05, "the real marker: EOF mobility used to synthesise");
        assertTrue(r.notes().get(0).contains("not the taller one"), r.notes().toString());
        for (Truth z : zones) {
            assertTrue(r.peaks().stream().anyMatch(p -> z.name().equals(p.match().assigned())), z.name());
        }
    }

    /**
     * The trace with a Gaussian zone added at a time, pointing up in the raw signal (in an indirect
     * run, where the ions are dips, the peak of a neutral marker that absorbs). σ = t/√N with the
     * marker's plate number, as the simulator draws its zones.
     */
    private static Trace withRise(Trace t, double timeS, double height) {
        double sigma = timeS / Math.sqrt(TraceSimulator.MARKER_PLATES);
        double[] time = t.timesS();
        double[] signal = t.signals();
        for (int i = 0; i < time.length; i++) {
            double z = (time[i] - timeS) / sigma;
            signal[i] += height * Math.exp(-0.5 * z * z);
        }
        return t.withSignal(signal);
    }

    /** Where a neutral marker arrives in {@link #anionTrace}'s conditions: t = Ld·Lt/(μ_EOF·V) (IUPAC),
     *  72 cm, 80 cm, −20 kV, no ramp. */
    private static double anionMarkerTimeS(double eof) {
        return 0.72 * 0.80 / (eof * 1e-9 * -20_000);
    }

    @ParameterizedTest(name = "a marker pointing the other way: seed {0}")
    @ValueSource(longs = {81, 82, 83})
    void aMarkerPointingTheOtherWayFromTheIonsIsFoundInItsWindow(long seed) {
        // indirect detection: the ions are dips, the neutral marker (an absorbing neutral) a peak of
        // half their height; nothing else in the window 380–800 s
        List<Truth> zones = draw(ANIONS, new SplittableRandom(seed), 0);
        Trace t = withRise(anionTrace("rise", -48.0, 0.0, zones, new double[0][], seed), anionMarkerTimeS(-48.0),
                0.4);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("rise", Path.of("rise.csv"), c, "test", 0), t);
        assertIdentified(r, zones);
        assertEquals(-48.0, r.eofMobility(), 0.05, "the EOF mobility used to synthesise; " + r.notes());
        PeakResult marker = r.peaks().stream().filter(p -> p.role() == PeakRole.NEUTRAL_MARKER).findFirst()
                .orElseThrow();
        assertFalse(marker.peak().dip(), "the marker is reported as the peak it is: " + marker.peak());
        assertTrue(r.notes().toString().contains("points the other way from the run's dips"), r.notes().toString());
    }

    @Test
    void aSolventDipMarksTheEofInADirectRunOfWiderZones() {
        // direct detection, cations at 15,000 plates (zones three times as wide per time as the marker
        // at 150,000), and the EOF marked by a dip (a sample solvent absorbing less than the buffer)
        List<Truth> zones = draw(CATIONS, new SplittableRandom(86), 0);
        RunConditions c = conditions(60, 52, 25, 0, Detection.DIRECT, 200, 500);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(45.0).neutralMarker(0.0)
                .samplingHz(20).durationS(900).noiseSd(0.004).baseline(0.3).seed(86);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.8, 15_000);
        }
        double markerS = 0.52 * 0.60 / (45.0e-9 * 25_000); // t = Ld·Lt/(μ_EOF·V) (IUPAC)
        Trace t = withRise(TraceSimulator.simulate("solvent-dip", b.build()), markerS, -0.4);
        RunResult r = new Identifier(CATIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("solvent-dip", Path.of("solvent-dip.csv"), c, "test", 0), t);
        assertEquals(45.0, r.eofMobility(), 0.05, "the EOF mobility used to synthesise; " + r.notes());
        for (Truth z : zones) {
            assertTrue(r.peaks().stream().anyMatch(p -> z.name().equals(p.match().assigned())), z.name());
        }
    }

    @Test
    void aMarkerPointingTheOtherWayWinsOverATallerForeignDipInTheWindow() {
        // as above, with a weakly charged substance (μ = −2) 2.5 times the ions' height, a dip, in the window
        List<Truth> zones = draw(ANIONS, new SplittableRandom(84), 0);
        Trace t = withRise(anionTrace("rise-tall", -48.0, 0.0, zones, new double[][] {{-2.0, 2.5}}, 84),
                anionMarkerTimeS(-48.0), 0.4);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("rise-tall", Path.of("rise-tall.csv"), c, "test", 0), t);
        assertEquals(-48.0, r.eofMobility(), 0.05, "the EOF mobility used to synthesise; " + r.notes());
        for (Truth z : zones) {
            assertTrue(r.peaks().stream().anyMatch(p -> z.name().equals(p.match().assigned())), z.name());
        }
    }

    @Test
    void aZonePointingTheOtherWayIsNeitherTheMarkerNorReportedWhenTheMarkerIsThere() {
        // the marker as usual (a dip like the ions) and, in the window, a peak the other way of half the
        // ions' height 40 s before it (a system zone): the marker stays the real one and the other
        // peak is not reported as an analyte
        List<Truth> zones = draw(ANIONS, new SplittableRandom(85), 0);
        double markerS = anionMarkerTimeS(-48.0);
        Trace t = withRise(anionTrace("system", -48.0, 1.0, zones, new double[0][], 85), markerS - 40, 0.4);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("system", Path.of("system.csv"), c, "test", 0), t);
        assertIdentified(r, zones);
        assertEquals(-48.0, r.eofMobility(), 0.05, "the EOF mobility used to synthesise; " + r.notes());
        assertTrue(r.peaks().stream().allMatch(p -> p.peak().dip()), "only dips reported: " + r.peaks());
        assertFalse(r.notes().toString().contains("points the other way"), r.notes().toString());
    }

    @ParameterizedTest(name = "an indirect trace exported already inverted: seed {0}")
    @ValueSource(longs = {91, 92})
    void anIndirectTraceExportedAsPeaksIsReadAsItShowsAndSaysSo(long seed) {
        // the software drew the dips of an indirect run as peaks; the run sheet still says indirect
        List<Truth> zones = draw(ANIONS, new SplittableRandom(seed), 0);
        Trace dips = anionTrace("inverted", -48.0, 1.0, zones, new double[0][], seed);
        double[] signal = dips.signals();
        for (int i = 0; i < signal.length; i++) {
            signal[i] = -signal[i];
        }
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("inverted", Path.of("inverted.csv"), c, "test", 0), dips.withSignal(signal));
        assertIdentified(r, zones);
        assertEquals(-48.0, r.eofMobility(), 0.05, r.notes().toString());
        assertEquals(Detection.DIRECT, r.spec().conditions().detection(), "read as the peaks it shows");
        assertTrue(r.notes().get(0).contains("rise above its baseline, although the run is marked indirect"),
                r.notes().toString());
    }

    @Test
    void dipsWithoutADetectionColumnAreReadAsDips() {
        // no detection given (taken as direct), but the trace holds the dips of an indirect run
        List<Truth> zones = draw(ANIONS, new SplittableRandom(93), 0);
        Trace dips = anionTrace("no-detection", -48.0, 1.0, zones, new double[0][], 93);
        RunConditions c = conditions(80, 72, -20, 0, null, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("no-detection", Path.of("no-detection.csv"), c, "test", 0), dips);
        assertIdentified(r, zones);
        assertEquals(Detection.INDIRECT, r.spec().conditions().detection());
        assertTrue(r.notes().get(0).contains("taken as direct (no detection given): read as indirect"),
                r.notes().toString());
    }

    @Test
    void faintDipsWithoutADetectionColumnAreReadAsDips() {
        // no detection given; the ions' dips only 12 noise SDs deep on correlated noise and a wandering
        // baseline, too faint for the screen to call the trace inverted: both readings are weighed
        List<Truth> zones = draw(ANIONS, new SplittableRandom(95), 2);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(-48.0).neutralMarker(0.3)
                .samplingHz(20).durationS(900).noiseSd(0.004).baseline(0.3).drift(2e-4, 1e-7).seed(95);
        for (Truth z : zones) {
            b.zone(z.name(), z.mobility(), 0.048, 120_000);
        }
        Trace dips = TraceSimulator.simulate("faint-dips", b.build());
        RunConditions none = conditions(80, 72, -20, 0, null, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("faint-dips", Path.of("faint-dips.csv"), none, "test", 0), dips);
        assertEquals(Detection.INDIRECT, r.spec().conditions().detection(), r.notes().toString());
        long named = r.peaks().stream().filter(p -> p.match().status() == MatchStatus.IDENTIFIED).count();
        assertTrue(named >= zones.size() - 1, () -> named + " of " + zones.size() + " named: " + r.peaks());
    }

    @Test
    void aTraceThatShowsItsStatedDetectionIsReadAsStatedWithoutANote() {
        List<Truth> zones = draw(ANIONS, new SplittableRandom(94), 0);
        Trace dips = anionTrace("as-stated", -48.0, 1.0, zones, new double[0][], 94);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("as-stated", Path.of("as-stated.csv"), c, "test", 0), dips);
        assertIdentified(r, zones);
        assertEquals(Detection.INDIRECT, r.spec().conditions().detection());
        assertFalse(r.notes().toString().contains("although the run is"), r.notes().toString());
    }

    @Test
    void aFaintMarkerBesideAFaintNearlyNeutralZoneIsFoundByTheWindowSearch() {
        // the marker about 7 noise SDs tall; a foreign zone of mobility +2.9 (nearly neutral, moving
        // against the anions) about 12 noise SDs tall, both inside the window 380–800 s
        List<Truth> zones = draw(ANIONS, new SplittableRandom(63), 0);
        Trace t = anionTrace("faint", -48.0, 0.028, zones, new double[][] {{2.9, 0.05}}, 63);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("faint", Path.of("faint.csv"), c, "test", 0), t);
        assertEquals(-48.0, r.eofMobility(), 0.1, "the real marker: EOF mobility used to synthesise; " + r.notes());
        // the search went down to S/N 1.5 for marker candidates only: no analyte peak below the default
        // detection limit (S/N 2, ICH Q2 "3 or 2:1") is reported
        for (PeakResult pr : r.peaks()) {
            if (pr.role() == PeakRole.ANALYTE) {
                assertTrue(pr.peak().signalToNoise() >= 2.0, "reported below the detection limit: " + pr.peak());
            }
        }
    }

    @Test
    void theWindowSearchReportsOnlyTheMarkerItChoseAmongItsFaintZones() {
        // a marker about 5 noise SDs tall (S/N below 2: the window holds no detected peak) and a foreign
        // zone of mobility +4 about 6 noise SDs tall in the window. With the run's peaks asked for down
        // to S/N 2 (ICH Q2 "3 or 2:1"), the window search finds both down to S/N 1.5 and takes the
        // marker; the other is not reported as an analyte peak (it was, in both draws, before the
        // rule). With the default (significance decides), the foreign zone is a faint peak of the run
        // in its own right and is reported, below the detection limit, and the marker is still the
        // real one.
        for (long seed = 66; seed <= 67; seed++) {
            List<Truth> zones = draw(ANIONS, new SplittableRandom(seed), 0);
            Trace t = anionTrace("two-faint", -48.0, 0.02, zones, new double[][] {{4.0, 0.024}}, seed);
            RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
            IdentifySettings toTwo = IdentifySettings.defaults().withThreads(1)
                    .withPeakSettings(PeakSettings.DEFAULT.withMinSignalToNoise(2.0));
            RunResult r = new Identifier(ANIONS, toTwo)
                    .identify(new RunSpec("two-faint", Path.of("two-faint.csv"), c, "test", 0), t);
            assertEquals(-48.0, r.eofMobility(), 0.05, "seed " + seed + ": the real marker; " + r.notes());
            for (PeakResult pr : r.peaks()) {
                if (pr.role() == PeakRole.ANALYTE) {
                    assertTrue(pr.peak().signalToNoise() >= 2.0,
                            "seed " + seed + ": reported below the detection limit: " + pr.peak());
                }
            }
            RunResult all = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                    .identify(new RunSpec("two-faint", Path.of("two-faint.csv"), c, "test", 0), t);
            assertEquals(-48.0, all.eofMobility(), 0.05, "seed " + seed + ": the real marker; " + all.notes());
            boolean faintInWindow = false;
            for (PeakResult pr : all.peaks()) {
                faintInWindow |= pr.role() == PeakRole.ANALYTE && pr.peak().signalToNoise() < 2.0
                        && pr.peak().apexTimeS() >= 380 && pr.peak().apexTimeS() <= 800;
            }
            assertTrue(faintInWindow, "seed " + seed + ": the faint foreign zone is reported; " + all.peaks());
        }
    }

    @Test
    void anEmptyMarkerWindowAndNoPeakThatExplainsTheRunGiveNoScaleRatherThanAGuess() {
        // one analyte zone and no marker at all (injected without it): the window 380–800 s is empty,
        // and the only peak taken as marker would leave nothing to explain
        List<Truth> zones = List.of(new Truth("chloride", -76.2));
        Trace t = anionTrace("nomarker", -48.0, 1e-6, zones, new double[0][], 64);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("nomarker", Path.of("nomarker.csv"), c, "test", 0), t);
        assertFalse(r.mobilityKnown(), r.notes().toString());
        assertTrue(r.notes().toString().contains("no peak in the marker window 380.0–800.0 s"), r.notes().toString());
    }

    @Test
    void aWeakMarkerStillGivesTheScale() {
        // the marker at a tenth of its usual height (0.1 against analytes of 0.8, noise 0.004: 25 noise SDs)
        List<Truth> zones = draw(ANIONS, new SplittableRandom(62), 0);
        Trace t = anionTrace("weak", -52.0, 0.1, zones, new double[0][], 62);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("weak", Path.of("weak.csv"), c, "test", 0), t);
        assertIdentified(r, zones);
        assertEquals(-52.0, r.eofMobility(), 0.05);
    }

    @Test
    void aRunInABufferTheLibraryLacksIsRefusedNamingBoth() {
        List<Truth> zones = draw(ANIONS, new SplittableRandom(63), 0);
        Trace t = anionTrace("nope", -50.0, 1.0, zones, new double[0][], 63);
        RunConditions c = new RunConditions(80, 72, -20, 0, 25.0, "NOPE-9", 380, 800, Detection.INDIRECT,
                Double.NaN, Double.NaN, Double.NaN);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("nope", Path.of("nope.csv"), c, "runs.csv", 3), t);
        assertTrue(r.failed());
        assertEquals("buffer", r.error().field());
        assertEquals(3, r.error().line());
        assertTrue(r.error().getMessage().contains("'NOPE-9'") && r.error().getMessage().contains("test buffer"),
                r.error().getMessage());
    }

    @Test
    void onlyTheRunsBufferIsOffered() {
        // one library with both buffers: the anion run never sees the cation entries, whatever its mobilities
        List<LibraryEntry> both = new ArrayList<>(ANIONS.entries());
        for (LibraryEntry e : CATIONS.entries()) {
            both.add(new LibraryEntry(e.name(), -e.mobility(), e.mobilitySd(), e.n(), -1, Double.NaN, List.of(),
                    List.of(), "other buffer", Double.NaN, Double.NaN, 25.0, "test"));
        }
        Library lib = new Library(both, "both", List.of());
        List<Truth> zones = draw(ANIONS, new SplittableRandom(64), 0);
        Trace t = anionTrace("mine", -50.0, 1.0, zones, new double[0][], 64);
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(lib, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("mine", Path.of("mine.csv"), c, "test", 0), t);
        for (PeakResult p : r.peaks()) {
            for (org.mobident.result.Candidate cand : p.match().candidates()) {
                assertTrue(ANIONS.find(cand.name()).isPresent(), cand.name() + " is of another buffer");
            }
        }
        assertIdentified(r, zones);
    }

    @Test
    void minutesReadAsSecondsFailTheRunWithTheLikelyCause() {
        List<Truth> zones = draw(ANIONS, new SplittableRandom(65), 0);
        Trace t = anionTrace("minutes", -50.0, 1.0, zones, new double[0][], 65);
        double[] times = t.timesS();
        for (int i = 0; i < times.length; i++) {
            times[i] /= 60.0; // a trace in minutes whose header says seconds
        }
        Trace wrong = new Trace("minutes", "minutes", times, t.signals());
        RunConditions c = conditions(80, 72, -20, 0, Detection.INDIRECT, Double.NaN, Double.NaN);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("minutes", Path.of("minutes.csv"), c, "test", 0), wrong);
        boolean refused = r.failed() || !r.mobilityKnown();
        assertTrue(refused, "a run whose EOF mobility is some 3000 units must not pass: " + r.scaleNote());
        String why = r.failed() ? r.error().getMessage() : r.scaleNote();
        assertTrue(why.contains("time unit"), why);
    }

    @Test
    void aMistypedVoltageSignIsPointedOut() {
        List<Truth> zones = draw(ANIONS, new SplittableRandom(66), 0);
        Trace t = anionTrace("sign", -50.0, 1.0, zones, new double[0][], 66);
        RunConditions c = conditions(80, 72, +20, 0, Detection.INDIRECT, 380, 800);
        RunResult r = new Identifier(ANIONS, IdentifySettings.defaults().withThreads(1))
                .identify(new RunSpec("sign", Path.of("sign.csv"), c, "test", 0), t);
        assertTrue(r.peaks().stream().noneMatch(p -> p.match().status() == MatchStatus.IDENTIFIED));
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("opposite voltage sign")), r.notes().toString());
    }
}
