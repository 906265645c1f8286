package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mobident.library.standards.StandardsRuns.analyte;
import static org.mobident.library.standards.StandardsRuns.run;
import static org.mobident.library.standards.StandardsRuns.sheet;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.trace.RunConditions;

class LibraryBuilderTest {

    private static final BuildStamp STAMP = new BuildStamp(Instant.parse("2024-05-06T07:08:09Z"), "mobident 0.1.0");
    private static final BuildSettings DEFAULTS = BuildSettings.defaults();
    /** Mobilities are recovered through the scale to rounding. */
    private static final double EXACT = 1e-9;

    /**
     * A five-cation mix; the values are invented, of the size of the alkali and alkaline-earth cations in
     * a dilute buffer. Migration order with normal polarity: highest mobility first.
     */
    private static final String[] NAMES = {"potassium", "calcium", "magnesium", "sodium", "lithium"};
    private static final double[] TRUE_MU = {76.2, 61.7, 55.0, 51.9, 40.1};
    /** Per-run replicate scatter added to every analyte (run 1, 2, 3). */
    private static final double[][] SCATTER = {
            {0.05, -0.04, 0.02, -0.03, 0.06},
            {-0.08, 0.03, -0.05, 0.04, -0.02},
            {0.03, 0.01, 0.03, -0.01, -0.04}};
    /** EOF mobility of each run: a drift of 8 units over the day. */
    private static final double[] EOF = {50.0, 46.0, 42.0};

    private static List<RunResult> cationRuns() {
        List<RunResult> runs = new ArrayList<>();
        for (int r = 0; r < 3; r++) {
            double[] mu = new double[5];
            for (int i = 0; i < 5; i++) {
                mu[i] = TRUE_MU[i] + SCATTER[r][i];
            }
            runs.add(run("cat" + (r + 1), EOF[r], mu));
        }
        return runs;
    }

    private static Map<String, String> allTo(String mix, List<RunResult> runs) {
        Map<String, String> m = new HashMap<>();
        for (RunResult r : runs) {
            m.put(r.spec().name(), mix);
        }
        return m;
    }

    private static BuildResult build(List<RunResult> runs, StandardsSheet sheet, BuildSettings s, Library ref) {
        return LibraryBuilder.build(runs, allTo(sheet.mixes().get(0).name(), runs), sheet, s, ref, STAMP);
    }

    private static StandardsSheet orderSheet() {
        StandardAnalyte[] as = new StandardAnalyte[5];
        for (int i = 0; i < 5; i++) {
            as[i] = analyte(NAMES[i], Double.NaN, i + 1);
        }
        return sheet("cations", as);
    }

    @Test
    void groupsDriftingReplicatesIntoOneGroupPerAnalyte() {
        List<RunResult> runs = cationRuns();
        // The drift moves a zone (sodium) between runs by more than the gap to its neighbour (magnesium):
        // grouping by migration time would fail.
        double naRun1 = timeOf(runs.get(0), 51.9);
        double naRun3 = timeOf(runs.get(2), 51.9);
        double mgRun1 = timeOf(runs.get(0), 55.0);
        assertTrue(Math.abs(naRun3 - naRun1) > Math.abs(naRun1 - mgRun1), naRun1 + ", " + naRun3 + ", " + mgRun1);

        BuildResult b = build(runs, orderSheet(), DEFAULTS, null);
        assertEquals(5, b.library().size());
        for (int i = 0; i < 5; i++) {
            AnalyteStats s = b.analyte(NAMES[i]).orElseThrow();
            assertEquals(3, s.n(), NAMES[i]);
            assertEquals(NamingBasis.ORDER, s.basis());
            assertEquals(List.of("cat1", "cat2", "cat3"), s.runs());
            double expected = (3 * TRUE_MU[i] + SCATTER[0][i] + SCATTER[1][i] + SCATTER[2][i]) / 3;
            assertEquals(expected, s.mean(), EXACT, NAMES[i]);
        }
        assertTrue(b.unexpectedPeaks().isEmpty());
        assertTrue(b.outliers().isEmpty());
        // A clean build gives no warnings (the invented trace files do not exist, so they cannot be hashed).
        assertEquals(List.of(), b.warnings().stream()
                .filter(w -> w.kind() != BuildWarning.Kind.TRACE_NOT_HASHED).toList());
    }

    @Test
    void statisticsToleranceChargeAndSourceOfAnEntry() {
        BuildResult b = build(cationRuns(), orderSheet(), DEFAULTS, null);
        AnalyteStats s = b.analyte("sodium").orElseThrow();
        DescriptiveStatistics ds = new DescriptiveStatistics();
        for (int r = 0; r < 3; r++) {
            ds.addValue(b.analyte("sodium").orElseThrow().measurements().get(r).mobility());
        }
        // Reference implementation: Apache Commons Math DescriptiveStatistics.
        assertEquals(ds.getMean(), s.mean(), 1e-12);
        assertEquals(ds.getStandardDeviation(), s.sd(), 1e-12);
        assertEquals(ds.getMin(), s.min(), 0.0);
        assertEquals(ds.getMax(), s.max(), 0.0);
        assertEquals(100 * ds.getStandardDeviation() / ds.getMean(), s.rsdPercent(), 1e-9);
        // No fixed window is written unless asked for; the window shown is the one identification applies.
        assertTrue(Double.isNaN(s.tolerance()));
        int idx = b.library().entries().indexOf(b.library().find("sodium").orElseThrow());
        assertEquals(LibraryCheck.windows(b.library(), org.mobident.settings.MatchSettings.DEFAULT)[idx], s.window(),
                1e-12);
        assertTrue(Double.isNaN(b.library().find("sodium").orElseThrow().tolerance()));
        LibraryEntry e = b.library().find("sodium").orElseThrow();
        // the file holds the statistics to 6 significant digits (LibraryCsv.computedValue)
        assertEquals(s.mean(), e.mobility(), 5e-6 * Math.abs(s.mean()));
        assertEquals(s.sd(), e.mobilitySd(), 5e-6 * s.sd());
        assertEquals(LibraryCsv.computedValue(s.mean()), e.mobility());
        assertEquals(3, e.n());
        // LibraryEntry.charge is the charge number, 0 when unknown: no charge column, no invented ±1
        assertEquals(0, e.charge(), "the sheet gives no charge, so the charge is unknown");
        assertEquals(StandardsRuns.BUFFER, e.buffer());
        assertEquals(25.0, e.temperatureC());
        assertEquals("standards: cat1, cat2, cat3", e.source());

        BuildResult wide = build(cationRuns(), orderSheet(), DEFAULTS.withTolerance(3, 0.01), null);
        AnalyteStats w = wide.analyte("sodium").orElseThrow();
        assertEquals(3 * w.sd(), w.tolerance(), 1e-12);

        BuildResult shortSource = build(cationRuns(), orderSheet(), DEFAULTS.withMaxRunsInSource(2), null);
        assertEquals("standards: 3 runs, cat1 ... cat3", shortSource.library().find("sodium").orElseThrow().source());
    }

    /**
     * The standards sheet's pKa values and limiting mobilities (invented numbers) reach the library
     * entry, and only that entry; the library then models it (ReferenceIons reads it back).
     */
    @Test
    void labsModelDataFromTheSheetReachTheLibrary() throws Exception {
        StandardsSheet sheet = StandardsSheetReader.read("""
                mix,analyte,order,charge,pka,limiting_mobility
                cations,potassium,1,,,
                cations,calcium,2,+2,,61.64
                cations,magnesium,3,,,
                cations,sodium,4,+1,9.3,53.1 0
                cations,lithium,5,,,
                """, "sheet.csv");
        BuildResult b = build(cationRuns(), sheet, DEFAULTS, null);
        LibraryEntry na = b.library().find("sodium").orElseThrow();
        assertEquals(List.of(9.3), na.pKa());
        assertEquals(List.of(53.1, 0.0), na.limitingMobilities());
        assertEquals(1, na.charge());
        assertTrue(na.source().contains("standards sheet"), na.source());
        assertEquals(List.of(61.64), b.library().find("calcium").orElseThrow().limitingMobilities());
        assertTrue(b.library().find("potassium").orElseThrow().pKa().isEmpty());
        // through the file format and back into a model
        java.io.StringWriter w = new java.io.StringWriter();
        LibraryCsv.write(b.library(), w);
        Library read = LibraryCsv.read(new StringReader(w.toString()), "built.csv");
        org.mobident.buffer.SpeciesModel m = org.mobident.chem.ReferenceIons.model(read.find("sodium").orElseThrow(),
                "built.csv");
        assertEquals(1, m.highestCharge());
        assertEquals(List.of(9.3), m.pKa());
    }

    @Test
    void namesByApproxMobilityOneToOne() {
        // Approximate values 1–3 units off, listed out of order; potassium and calcium without order.
        StandardsSheet s = sheet("cations",
                analyte("sodium", 53.5, 0), analyte("potassium", 74.0, 0), analyte("lithium", 38.5, 0),
                analyte("magnesium", 56.0, 0), analyte("calcium", 60.0, 0));
        BuildResult b = build(cationRuns(), s, DEFAULTS, null);
        for (int i = 0; i < 5; i++) {
            AnalyteStats a = b.analyte(NAMES[i]).orElseThrow();
            assertEquals(TRUE_MU[i], a.mean(), 0.1, NAMES[i]);
            assertEquals(NamingBasis.APPROX_MOBILITY, a.basis());
        }
        // Library entries follow the sheet.
        assertEquals(List.of("sodium", "potassium", "lithium", "magnesium", "calcium"),
                b.library().entries().stream().map(LibraryEntry::name).toList());
    }

    @Test
    void approxMobilityAndOrderCombine() {
        // Magnesium and sodium are only 3 units apart; an approximate value names magnesium, and the order
        // names the rest around it.
        StandardsSheet s = sheet("cations",
                analyte("potassium", Double.NaN, 1), analyte("calcium", Double.NaN, 2),
                analyte("magnesium", 55.8, 3), analyte("sodium", Double.NaN, 4), analyte("lithium", Double.NaN, 5));
        BuildResult b = build(cationRuns(), s, DEFAULTS, null);
        for (int i = 0; i < 5; i++) {
            assertEquals(TRUE_MU[i], b.analyte(NAMES[i]).orElseThrow().mean(), 0.1, NAMES[i]);
        }
        assertEquals(NamingBasis.APPROX_MOBILITY, b.analyte("magnesium").orElseThrow().basis());
        assertEquals(NamingBasis.ORDER, b.analyte("lithium").orElseThrow().basis());
    }

    @Test
    void namesByOrderSkippingASmallPeakAndAnImpurity() {
        List<RunResult> runs = new ArrayList<>(cationRuns());
        // Run 2 also shows a tiny system peak and an impurity of ordinary size between sodium and lithium.
        RunResult r2 = runs.get(1);
        double[] mu = {76.12, 61.73, 54.95, 51.94, 40.08, 46.0, 65.0};
        double[] h = {1, 1, 1, 1, 1, 0.5, 0.01};
        runs.set(1, run("cat2", r2.spec().traceFile(), r2.spec().conditions(), EOF[1], mu, h));
        BuildResult b = build(runs, orderSheet(), DEFAULTS, null);
        for (int i = 0; i < 5; i++) {
            AnalyteStats a = b.analyte(NAMES[i]).orElseThrow();
            assertEquals(TRUE_MU[i], a.mean(), 0.1, NAMES[i]);
            assertEquals(3, a.n());
        }
        assertEquals(2, b.unexpectedPeaks().size());
        assertEquals(Set.of(46.0, 65.0), Set.of(Math.rint(b.unexpectedPeaks().get(0).mobility()),
                Math.rint(b.unexpectedPeaks().get(1).mobility())));
        List<BuildWarning> w = b.warnings(BuildWarning.Kind.UNEXPECTED_PEAK);
        assertEquals(2, w.size(), w.toString());
        assertTrue(w.stream().anyMatch(x -> x.message().contains("smaller than 5 %")), w.toString());
        assertTrue(w.stream().anyMatch(x -> x.message().contains("46.0")), w.toString());
    }

    @Test
    void namesFromTheReferenceLibrary() {
        StandardAnalyte[] as = new StandardAnalyte[5];
        for (int i = 0; i < 5; i++) {
            as[i] = StandardAnalyte.named(NAMES[i]);
        }
        // Reference values 1–4 units from the measured ones (other ionic strength); an anion of the same
        // magnitude as lithium must not be taken.
        Library ref = new Library(List.of(
                LibraryEntry.of("Potassium", 73.5, Double.NaN), LibraryEntry.of("calcium", 59.5, Double.NaN),
                LibraryEntry.of("magnesium", 53.0, Double.NaN), LibraryEntry.of("sodium", 50.1, Double.NaN),
                LibraryEntry.of("lithium", 38.7, Double.NaN), LibraryEntry.of("fluoride", -40.0, Double.NaN)),
                "reference.csv", List.of());
        // Two well-separated cations: each reference value points to one group only, so both are named.
        List<RunResult> two = List.of(run("k1", 50, 76.2, 40.1), run("k2", 47, 76.1, 40.15),
                run("k3", 44, 76.25, 40.05));
        BuildResult sparse = build(two, sheet("cations", StandardAnalyte.named("potassium"),
                StandardAnalyte.named("lithium")), DEFAULTS, ref);
        assertEquals(NamingBasis.REFERENCE_LIBRARY, sparse.analyte("potassium").orElseThrow().basis());
        assertEquals(76.18, sparse.analyte("potassium").orElseThrow().mean(), 0.01);
        assertEquals(40.1, sparse.analyte("lithium").orElseThrow().mean(), 0.01);
        // ... but the values were compared as stated (no buffer pH / ionic strength): said so.
        assertEquals(1, sparse.warnings(BuildWarning.Kind.REFERENCE_AS_STATED).size(), sparse.warnings().toString());

        // Five cations 3–15 units apart: a stated reference value (its buffer unknown) could have been
        // moved onto a neighbouring group, so no name is clear; none is given, each with a warning.
        BuildResult b = build(cationRuns(), sheet("cations", as), DEFAULTS, ref);
        assertEquals(0, b.library().size(), b.library().entries().toString());
        assertEquals(5, b.warnings(BuildWarning.Kind.UNNAMED_GROUP).size(), b.warnings().toString());
        assertFalse(b.warnings(BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME).isEmpty(), b.warnings().toString());
        // Without a reference nothing can be named: five unnamed groups, five analytes not found.
        BuildResult none = build(cationRuns(), sheet("cations", as), DEFAULTS, null);
        assertEquals(0, none.library().size());
        assertEquals(5, none.warnings(BuildWarning.Kind.UNNAMED_GROUP).size());
        assertEquals(5, none.warnings(BuildWarning.Kind.ANALYTE_NOT_FOUND).size());
    }

    @Test
    void referenceNamingRespectsTheChargeSign() {
        // The sheet says chloride is an anion; the reference (wrongly signed here) puts it near sodium.
        Library ref = new Library(List.of(new LibraryEntry("chloride", 52.0, Double.NaN, 0, -1, Double.NaN, List.of(),
                List.of(), null, Double.NaN, Double.NaN, Double.NaN, null)), "ref.csv", List.of());
        StandardsSheet s = sheet("m", new StandardAnalyte("chloride", -1, -1, Double.NaN, 0, 0));
        List<RunResult> runs = List.of(run("a", 50, 51.9), run("b", 48, 51.95), run("c", 46, 51.85));
        BuildResult b = build(runs, s, DEFAULTS, ref);
        assertTrue(b.analyte("chloride").isEmpty());
        assertEquals(1, b.warnings(BuildWarning.Kind.ANALYTE_NOT_FOUND).size());
    }

    @Test
    void replicateOutlierIsReportedAndKeptByDefault() {
        List<RunResult> runs = new ArrayList<>();
        double[] sodium = {51.90, 51.95, 51.88, 51.93, 53.20};
        for (int r = 0; r < 5; r++) {
            runs.add(run("na" + (r + 1), 50 - r, 40.1, sodium[r]));
        }
        StandardsSheet s = sheet("m", analyte("lithium", 40, 0), analyte("sodium", 52, 0));
        BuildResult kept = build(runs, s, DEFAULTS, null);
        assertEquals(1, kept.outliers().size(), kept.outliers().toString());
        Outlier o = kept.outliers().get(0);
        assertEquals("sodium", o.analyte());
        assertEquals("na5", o.run());
        assertEquals(53.20, o.mobility(), EXACT);
        // Critical value n = 5, two-sided 5 %: 1.715 (Harvey, Analytical Chemistry 2.1, Appendix 7).
        assertEquals(1.715, o.gCritical(), 1e-3);
        assertTrue(o.g() > o.gCritical());
        assertFalse(o.excluded());
        AnalyteStats na = kept.analyte("sodium").orElseThrow();
        assertEquals(5, na.n());
        assertEquals(new DescriptiveStatistics(sodium).getMean(), na.mean(), 1e-9);
        assertEquals(1, kept.warnings(BuildWarning.Kind.OUTLIER).size());
        assertTrue(kept.warnings(BuildWarning.Kind.OUTLIER).get(0).message().contains("kept in"));
        assertTrue(kept.library().notes().stream().anyMatch(n -> n.contains("kept in the statistics")));

        BuildResult excluded = build(runs, s, DEFAULTS.withOutlierTest(0.05, Grubbs.Alternative.TWO_SIDED, true), null);
        AnalyteStats na4 = excluded.analyte("sodium").orElseThrow();
        assertEquals(4, na4.n());
        assertEquals(new DescriptiveStatistics(new double[] {51.90, 51.95, 51.88, 51.93}).getMean(), na4.mean(), 1e-9);
        assertEquals(List.of("na1", "na2", "na3", "na4"), na4.runs());
        assertTrue(excluded.outliers().get(0).excluded());
        assertTrue(excluded.library().notes().stream().anyMatch(n -> n.contains("left out of the statistics")));
        assertTrue(kept.analyte("lithium").orElseThrow().outliers().isEmpty());
    }

    @Test
    void poorlyMeasuredOutlierIsLeftOutEvenWhenOutliersAreKept() {
        // n = 4: the largest possible G is (n - 1)/sqrt(n) = 1.5 (Grubbs 1969, Technometrics 11, 1), above the
        // two-sided 5 % critical value 1.481 (Harvey, Analytical Chemistry 2.1, Appendix 7).
        double[] sodium = {51.90, 51.95, 51.92, 53.10};
        List<RunResult> runs = new ArrayList<>();
        for (int r = 0; r < sodium.length; r++) {
            runs.add(run("na" + (r + 1), 50 - r, 40.1, sodium[r]));
        }
        StandardsSheet s = sheet("m", analyte("lithium", 40, 0), analyte("sodium", 52, 0));

        BuildResult wellMeasured = build(runs, s, DEFAULTS, null);
        assertEquals(1, wellMeasured.outliers().size(), wellMeasured.outliers().toString());
        assertFalse(wellMeasured.outliers().get(0).excluded());
        assertEquals(4, wellMeasured.analyte("sodium").orElseThrow().n());

        // The same value, but the run's own peak uncertainty is ten times its neighbours' (a badly cut peak).
        RunResult last = runs.get(3);
        List<PeakResult> peaks = new ArrayList<>();
        for (PeakResult p : last.peaks()) {
            boolean na = p.role() == PeakRole.ANALYTE && Math.abs(p.mobility() - 53.10) < 1e-6;
            peaks.add(na ? new PeakResult(p.peak(), p.role(), p.mobility(), 10 * p.mobilitySd(),
                    p.mobilityAtLibraryTemp(), p.match()) : p);
        }
        runs.set(3, new RunResult(last.spec(), null, last.scaleNote(), last.eofMobility(), last.scale(), peaks,
                last.notes(), last.noiseSd()));
        BuildResult poorlyMeasured = build(runs, s, DEFAULTS, null);
        assertEquals(1, poorlyMeasured.outliers().size());
        assertTrue(poorlyMeasured.outliers().get(0).excluded());
        AnalyteStats na3 = poorlyMeasured.analyte("sodium").orElseThrow();
        assertEquals(3, na3.n());
        assertEquals(new DescriptiveStatistics(new double[] {51.90, 51.95, 51.92}).getMean(), na3.mean(), 1e-9);
        assertTrue(poorlyMeasured.warnings(BuildWarning.Kind.OUTLIER).get(0).message().contains("poorly measured"));
    }

    @Test
    void notesRecordConditionsAndProvenance(@TempDir Path dir) throws Exception {
        List<RunResult> runs = new ArrayList<>();
        for (RunResult r : cationRuns()) {
            Path f = dir.resolve(r.spec().name() + ".csv");
            Files.writeString(f, "abc", StandardCharsets.US_ASCII);
            double[] mu = r.peaks().stream().filter(p -> p.role() == org.mobident.result.PeakRole.ANALYTE)
                    .mapToDouble(p -> p.mobility()).toArray();
            double[] h = new double[mu.length];
            java.util.Arrays.fill(h, 1.0);
            runs.add(run(r.spec().name(), f, r.spec().conditions(), r.eofMobility(), mu, h));
        }
        BuildResult b = build(runs, orderSheet(), DEFAULTS, null);
        List<String> notes = b.library().notes();
        String all = String.join("\n", notes);
        assertTrue(all.contains("mobident 0.1.0 on 2024-05-06T07:08:09Z"), all);
        assertTrue(notes.contains("Buffer: " + StandardsRuns.BUFFER), all);
        assertTrue(notes.contains("Temperature: 25 °C"), all);
        assertTrue(notes.contains("Total length: 60 cm; detector length: 50 cm; voltage: 25 kV"), all);
        assertTrue(notes.contains("Mix cations: runs cat1, cat2, cat3"), all);
        // SHA-256 of "abc": FIPS 180-2, Appendix B.1.
        assertTrue(notes.contains("Run cat2: file cat2.csv, sha256 "
                + "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"), all);
        assertTrue(b.warnings(BuildWarning.Kind.TRACE_NOT_HASHED).isEmpty());
    }

    @Test
    void mixedConditionsAreSaidSo() {
        List<RunResult> runs = new ArrayList<>(cationRuns());
        RunResult r = runs.get(2);
        RunConditions warm = StandardsRuns.conditions(30.0, "other buffer");
        double[] mu = {76.2, 61.7, 55.0, 51.9, 40.1};
        double[] h = {1, 1, 1, 1, 1};
        runs.set(2, run("cat3", r.spec().traceFile(), warm, EOF[2], mu, h));
        BuildResult b = build(runs, orderSheet(), DEFAULTS, null);
        assertTrue(b.library().notes().contains("Temperature: mixed (25 °C; 30 °C)"), b.library().notes().toString());
        assertTrue(b.library().notes().contains("Buffer: mixed (" + StandardsRuns.BUFFER + "; other buffer)"));
        assertEquals(1, b.warnings(BuildWarning.Kind.MIXED_CONDITIONS).size());
        LibraryEntry e = b.library().find("lithium").orElseThrow();
        assertEquals("mixed", e.buffer());
        assertEquals((25.0 + 25.0 + 30.0) / 3, e.temperatureC(), 1e-12);
    }

    @Test
    void builtLibraryRoundTripsThroughLibraryCsv() throws Exception {
        List<RunResult> runs = new ArrayList<>(cationRuns());
        StandardsSheet s = new StandardsSheet("standards.csv", List.of(new StandardsMix("cations", List.of(
                new StandardAnalyte("potassium", 1, 1, Double.NaN, 1, 2),
                new StandardAnalyte("calcium", 2, 1, Double.NaN, 2, 3),
                new StandardAnalyte("magnesium", 0, 1, Double.NaN, 3, 4),
                analyte("sodium", Double.NaN, 4), analyte("lithium", Double.NaN, 5)))));
        BuildResult b = build(runs, s, DEFAULTS, null);
        assertEquals(2, b.library().find("calcium").orElseThrow().charge());
        Library back = LibraryCsv.read(new StringReader(LibraryCsv.toCsv(b.library())), "back.csv");
        assertEquals(b.library().entries(), back.entries());
        assertEquals(b.library().notes(), back.notes());
    }

    @Test
    void everyWarningKindIsTriggered() throws Exception {
        Set<BuildWarning.Kind> seen = EnumSet.noneOf(BuildWarning.Kind.class);

        // Runs that cannot be used: failed, no scale, no mix; and trace files that do not exist (not hashed).
        List<RunResult> runs = new ArrayList<>(cationRuns());
        runs.add(StandardsRuns.failedRun("broken"));
        runs.add(StandardsRuns.runWithoutScale("nomarker", 100, 120));
        runs.add(run("stray", 50, 52.0));
        Map<String, String> mix = allTo("cations", runs);
        mix.remove("stray");
        BuildResult b = LibraryBuilder.build(runs, mix, orderSheet(), DEFAULTS, null, STAMP);
        assertEquals(List.of("cat1", "cat2", "cat3"), b.usedRuns());
        expectOne(b, BuildWarning.Kind.RUN_FAILED, "broken");
        expectOne(b, BuildWarning.Kind.NO_MOBILITY_SCALE, "nomarker");
        expectOne(b, BuildWarning.Kind.RUN_WITHOUT_MIX, "stray");
        assertEquals(3, b.warnings(BuildWarning.Kind.TRACE_NOT_HASHED).size());
        seen.addAll(kinds(b));

        // Two replicates only; sodium scattered (RSD > 2 %); two analytes 0.8 apart (overlapping windows);
        // an analyte whose approximate mobility fits nothing; an impurity once all analytes are named;
        // a temperature that differs.
        List<RunResult> two = List.of(
                run("d1", 50, 76.2, 52.6, 40.1, 40.9, 30.0),
                StandardsRuns.run("d2", Path.of("d2.csv"), StandardsRuns.conditions(27, StandardsRuns.BUFFER), 48,
                        new double[] {76.1, 50.9, 40.2, 41.0}, new double[] {1, 1, 1, 1}));
        StandardsSheet s2 = sheet("m", analyte("potassium", 76, 0), analyte("sodium", 52, 0),
                analyte("lithium", 40, 0), analyte("x", 41, 0), analyte("cesium", 110, 0));
        BuildResult b2 = build(two, s2, DEFAULTS, null);
        assertEquals(4, b2.warnings(BuildWarning.Kind.FEW_REPLICATES).size());
        assertEquals("sodium", b2.warnings(BuildWarning.Kind.HIGH_RSD).get(0).analyte());
        // 0.8 apart: closer than 1 unit, so not only overlapping but indistinguishable
        assertEquals("lithium, x", b2.warnings(BuildWarning.Kind.INDISTINGUISHABLE).get(0).analyte());
        assertEquals("cesium", b2.warnings(BuildWarning.Kind.ANALYTE_NOT_FOUND).get(0).analyte());
        assertTrue(b2.warnings(BuildWarning.Kind.UNNAMED_GROUP).get(0).message().contains("30.000"));
        assertEquals(1, b2.warnings(BuildWarning.Kind.MIXED_CONDITIONS).size());
        seen.addAll(kinds(b2));

        // approx_mobility values all about 12 % above the measured mobilities (from the literature):
        // named at that common factor, and said so
        List<RunResult> lit = List.of(run("e1", 50, 76.2, 60.1, 52.6, 40.1), run("e2", 50, 76.1, 60.0, 52.5, 40.2),
                run("e3", 50, 76.3, 60.2, 52.7, 40.0));
        StandardsSheet s3 = sheet("lit", analyte("potassium", 85, 0), analyte("calcium", 67, 0),
                analyte("sodium", 59, 0), analyte("lithium", 45, 0));
        BuildResult bLit = build(lit, s3, DEFAULTS, null);
        assertEquals(1, bLit.warnings(BuildWarning.Kind.APPROX_SCALED).size(), bLit.warnings().toString());
        assertEquals(76.2, bLit.library().find("potassium").orElseThrow().mobility(), 0.2);
        assertEquals(60.1, bLit.library().find("calcium").orElseThrow().mobility(), 0.2);
        assertEquals(40.1, bLit.library().find("lithium").orElseThrow().mobility(), 0.2);
        seen.addAll(kinds(bLit));

        // All analytes named: an extra group is unexpected; an outlier among five.
        List<RunResult> five = new ArrayList<>();
        double[] na = {51.90, 51.95, 51.88, 51.93, 53.20};
        for (int r = 0; r < 5; r++) {
            five.add(r == 0 ? run("e1", 50, na[r], 30.0) : run("e" + (r + 1), 50 - r, na[r]));
        }
        BuildResult b3 = build(five, sheet("m", analyte("sodium", 52, 0)), DEFAULTS, null);
        expectOne(b3, BuildWarning.Kind.UNEXPECTED_PEAK, null);
        expectOne(b3, BuildWarning.Kind.OUTLIER, "e5");
        seen.addAll(kinds(b3));

        // Approximate mobilities that contradict the expected order.
        StandardsSheet conflict = sheet("cations", analyte("potassium", 76, 2), analyte("lithium", 40, 1),
                analyte("sodium", Double.NaN, 3));
        BuildResult b4 = build(cationRuns(), conflict, DEFAULTS, null);
        assertEquals(1, b4.warnings(BuildWarning.Kind.NAMING_CONFLICT).size(), b4.warnings().toString());
        seen.addAll(kinds(b4));

        // Merging: means that differ, and an existing entry without n.
        Library existing = new Library(List.of(
                new LibraryEntry("potassium", 75.0, 0.05, 4, 1, 0.5, List.of(), List.of(), null, Double.NaN,
                        Double.NaN, 25.0, "earlier build"),
                LibraryEntry.of("sodium", 50.0, Double.NaN)), "lib.csv", List.of());
        MergeResult m = LibraryMerger.merge(existing, build(cationRuns(), orderSheet(), DEFAULTS, null));
        assertEquals(1, m.warnings(BuildWarning.Kind.MEANS_DIFFER).size());
        assertEquals(1, m.warnings(BuildWarning.Kind.NOT_POOLED).size());
        m.warnings().forEach(w -> seen.add(w.kind()));

        // A stated reference whose values could be shifted onto the wrong group: doubtful, compared as stated.
        Library ref = new Library(List.of(LibraryEntry.of("magnesium", 53.0, Double.NaN),
                LibraryEntry.of("sodium", 50.1, Double.NaN)), "reference.csv", List.of());
        BuildResult b5 = build(cationRuns(), sheet("cations", StandardAnalyte.named("magnesium"),
                StandardAnalyte.named("sodium")), DEFAULTS, ref);
        assertFalse(b5.warnings(BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME).isEmpty(), b5.warnings().toString());
        assertEquals(1, b5.warnings(BuildWarning.Kind.REFERENCE_AS_STATED).size());
        seen.addAll(kinds(b5));

        // Checking a library: wrong sign for the charge, absurd magnitude, windows that merely overlap.
        Library bad = new Library(List.of(
                new LibraryEntry("sodium", -46.4, 0.2, 5, 1, Double.NaN, List.of(), List.of(), null, Double.NaN,
                        Double.NaN, 25.0, null),
                new LibraryEntry("chloride", -7630, 0.2, 5, -1, Double.NaN, List.of(), List.of(), null, Double.NaN,
                        Double.NaN, 25.0, null),
                new LibraryEntry("a", 30.0, 0.3, 5, 0, Double.NaN, List.of(), List.of(), null, Double.NaN,
                        Double.NaN, 25.0, null),
                new LibraryEntry("b", 31.5, 0.3, 5, 0, Double.NaN, List.of(), List.of(), null, Double.NaN,
                        Double.NaN, 25.0, null)), "bad.csv", List.of());
        LibraryCheck.check(bad, DEFAULTS).forEach(w -> seen.add(w.kind()));

        // A standards run whose earliest zones are narrower than two samples (its run note).
        RunResult slow = new RunResult(five.get(0).spec(), null, "", 50, null, List.of(),
                List.of(org.mobident.pipeline.SamplingCheck.NOTE_START + ": a zone of sodium, expected at 100.0 s, "
                        + "would be about 0.60 s wide at half height, 1.2 sampling intervals of 0.500 s"), 0.01);
        org.mobident.usecase.BuildLibrary.samplingWarnings(List.of(slow), java.util.Map.of())
                .forEach(w -> seen.add(w.kind()));

        assertEquals(EnumSet.allOf(BuildWarning.Kind.class), seen);
    }

    @Test
    void singleAnalyteMixNeedsNoNamingHints() {
        List<RunResult> runs = List.of(run("a", 50, 51.9), run("b", 48, 51.95), run("c", 46, 51.85));
        BuildResult b = build(runs, sheet("m", StandardAnalyte.named("sodium")), DEFAULTS, null);
        AnalyteStats s = b.analyte("sodium").orElseThrow();
        assertEquals(NamingBasis.ONLY_ANALYTE, s.basis());
        assertEquals(3, s.n());
    }

    @Test
    void fewerGroupsThanOrderedAnalytesNamesNothingByGuess() {
        // Magnesium is missing from all runs: with order alone it cannot be told which analyte is absent.
        List<RunResult> runs = List.of(run("a", 50, 76.2, 61.7, 51.9, 40.1), run("b", 47, 76.1, 61.8, 51.95, 40.05),
                run("c", 44, 76.25, 61.65, 51.88, 40.12));
        BuildResult b = build(runs, orderSheet(), DEFAULTS, null);
        assertEquals(0, b.library().size());
        assertEquals(5, b.warnings(BuildWarning.Kind.ANALYTE_NOT_FOUND).size());
        assertTrue(b.warnings(BuildWarning.Kind.ANALYTE_NOT_FOUND).get(0).message().contains("cannot be told"));
        // One approximate value pins magnesium's absence down: the others are named around it.
        StandardsSheet s = sheet("cations", analyte("potassium", Double.NaN, 1), analyte("calcium", 61, 2),
                analyte("magnesium", Double.NaN, 3), analyte("sodium", 52.5, 4), analyte("lithium", Double.NaN, 5));
        BuildResult pinned = build(runs, s, DEFAULTS, null);
        assertEquals(4, pinned.library().size());
        assertEquals("magnesium", pinned.warnings(BuildWarning.Kind.ANALYTE_NOT_FOUND).get(0).analyte());
        assertNotNull(pinned.library().find("lithium").orElse(null));
    }

    /** Apex time of the analyte peak nearest to a mobility. */
    private static double timeOf(RunResult r, double mobility) {
        return r.peaks().stream().filter(p -> p.role() == org.mobident.result.PeakRole.ANALYTE)
                .min((a, b) -> Double.compare(Math.abs(a.mobility() - mobility), Math.abs(b.mobility() - mobility)))
                .orElseThrow().peak().apexTimeS();
    }

    private static Set<BuildWarning.Kind> kinds(BuildResult b) {
        Set<BuildWarning.Kind> k = EnumSet.noneOf(BuildWarning.Kind.class);
        b.warnings().forEach(w -> k.add(w.kind()));
        return k;
    }

    private static void expectOne(BuildResult b, BuildWarning.Kind kind, String run) {
        List<BuildWarning> w = b.warnings(kind);
        assertEquals(1, w.size(), kind + ": " + b.warnings());
        assertEquals(run, w.get(0).run());
    }
}
