package org.mobident.library.standards;

import org.mobident.report.library.BuildText;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mobident.library.standards.StandardsRuns.run;
import static org.mobident.library.standards.StandardsRuns.sheet;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.chem.MobilityPredictor;
import org.mobident.chem.ReferenceIons;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.library.LibraryEntry;
import org.mobident.result.RunResult;

/** Findings of a user test of building, adding to and checking libraries. */
class UserTestFindingsTest {

    private static final BuildStamp STAMP = new BuildStamp(Instant.parse("2024-07-01T08:00:00Z"), "mobident 0.1.0");
    private static final BuildSettings DEFAULTS = BuildSettings.defaults();

    /** The constructed buffer: pH 4.8, ionic strength 12 mmol/L (runs at 25 °C). */
    private static final double PH = 4.8;
    private static final double IONIC_STRENGTH_MM = 12.0;

    /**
     * A mix in which the buffer moves mobilities a long way from their limiting values: sulfate is
     * divalent (its effective mobility at 12 mM lies about 9 units below the limiting one, next to
     * nitrate's limiting value), and formate and acetate are weak acids, acetate right at its pKa.
     */
    private static final String[] MIX = {"sulfate", "nitrate", "formate", "chloroacetate", "acetate"};
    /** Replicate scatter added to the true effective mobility, per run. */
    private static final double[][] SCATTER = {{0.05, -0.04, 0.03, -0.02, 0.04}, {-0.03, 0.05, -0.02, 0.03, -0.05},
            {0.01, -0.02, 0.04, -0.04, 0.02}};
    /** Offset of the "true" mobility from the model's prediction: the model is not exact. */
    private static final double[] MODEL_ERROR = {0.3, -0.25, 0.3, -0.25, -0.3};

    private static Path shipped() {
        Path p = Path.of("..").resolve(ReferenceIons.SHIPPED_LIBRARY);
        return Files.exists(p) ? p : Path.of(ReferenceIons.SHIPPED_LIBRARY);
    }

    /** Limiting mobilities of the shipped reference (CRC Handbook values, see its source column). */
    private static Library reference() throws InputException {
        return LibraryCsv.read(shipped());
    }

    private static Map<String, Double> trueMobilities(Library ref) throws InputException {
        BufferConditions buffer = new BufferConditions(PH, IONIC_STRENGTH_MM / 1000.0, StandardsRuns.TEMPERATURE_C);
        Map<String, Double> mu = new HashMap<>();
        for (int i = 0; i < MIX.length; i++) {
            LibraryEntry e = ref.find(MIX[i]).orElseThrow();
            mu.put(MIX[i], MobilityPredictor.predict(ReferenceIons.model(e, "ref"), buffer).mobility() + MODEL_ERROR[i]);
        }
        return mu;
    }

    private static List<RunResult> anionRuns(Map<String, Double> mu) {
        List<RunResult> runs = new ArrayList<>();
        for (int r = 0; r < 3; r++) {
            double[] m = new double[MIX.length];
            for (int i = 0; i < MIX.length; i++) {
                m[i] = mu.get(MIX[i]) + SCATTER[r][i];
            }
            // anions against a strong EOF (normal polarity): net mobility EOF + μ must stay positive
            runs.add(run("an" + (r + 1), 100 - 2 * r, m));
        }
        return runs;
    }

    private static Map<String, String> allTo(String mix, List<RunResult> runs) {
        Map<String, String> m = new HashMap<>();
        runs.forEach(r -> m.put(r.spec().name(), mix));
        return m;
    }

    private static StandardsSheet namesOnly() {
        StandardAnalyte[] as = new StandardAnalyte[MIX.length];
        for (int i = 0; i < MIX.length; i++) {
            as[i] = StandardAnalyte.named(MIX[i]);
        }
        return sheet("anions", as);
    }

    @Test
    void theConstructedBufferMovesMobilitiesOntoOtherAnalytesLimitingValues() throws InputException {
        Library ref = reference();
        Map<String, Double> mu = trueMobilities(ref);
        // the premise of the test: sulfate's effective mobility is nearer nitrate's limiting value than its
        // own, and formate's nearer chloroacetate's
        double sulfate = mu.get("sulfate");
        assertTrue(Math.abs(sulfate - ref.find("nitrate").orElseThrow().mobility())
                < Math.abs(sulfate - ref.find("sulfate").orElseThrow().mobility()), "sulfate " + sulfate);
        double formate = mu.get("formate");
        assertTrue(Math.abs(formate - ref.find("chloroacetate").orElseThrow().mobility())
                < Math.abs(formate - ref.find("formate").orElseThrow().mobility()), "formate " + formate);
    }

    @Test
    void withPhAndIonicStrengthGroupsAreNamedAgainstPredictedEffectiveMobilities() throws InputException {
        Library ref = reference();
        Map<String, Double> mu = trueMobilities(ref);
        List<RunResult> runs = anionRuns(mu);
        BuildResult b = LibraryBuilder.build(runs, allTo("anions", runs), namesOnly(), DEFAULTS, ref, PH,
                IONIC_STRENGTH_MM, STAMP);
        for (String name : MIX) {
            AnalyteStats a = b.analyte(name).orElseThrow(() -> new AssertionError(name + " not named: "
                    + b.warnings()));
            assertEquals(mu.get(name), a.mean(), 0.1, name);
            assertEquals(NamingBasis.REFERENCE_LIBRARY, a.basis(), name);
        }
        assertTrue(b.warnings(BuildWarning.Kind.REFERENCE_AS_STATED).isEmpty(), b.warnings().toString());
        assertTrue(b.warnings(BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME).isEmpty(), b.warnings().toString());
        // the buffer chemistry is recorded on the entries
        LibraryEntry e = b.library().find("acetate").orElseThrow();
        assertEquals(PH, e.pH());
        assertEquals(IONIC_STRENGTH_MM, e.ionicStrengthMm());
    }

    @Test
    void withoutPhAndIonicStrengthNoGroupGetsAWrongName() throws InputException {
        Library ref = reference();
        Map<String, Double> mu = trueMobilities(ref);
        List<RunResult> runs = anionRuns(mu);
        BuildResult b = LibraryBuilder.build(runs, allTo("anions", runs), namesOnly(), DEFAULTS, ref, STAMP);
        // Every name written must be right; with limiting values compared here none is clear.
        for (AnalyteStats a : b.analytes()) {
            assertEquals(mu.get(a.name()), a.mean(), 0.1, a.name() + " carries another analyte's peak");
        }
        assertTrue(b.analyte("nitrate").isEmpty(), "the sulfate peak lies nearest nitrate's limiting value");
        assertTrue(b.analyte("chloroacetate").isEmpty(), "the formate peak lies nearest chloroacetate's");
        assertFalse(b.warnings(BuildWarning.Kind.DOUBTFUL_REFERENCE_NAME).isEmpty(), b.warnings().toString());
        List<BuildWarning> stated = b.warnings(BuildWarning.Kind.REFERENCE_AS_STATED);
        assertEquals(1, stated.size(), b.warnings().toString());
        assertTrue(stated.get(0).message().contains("--ph") && stated.get(0).message().contains("limiting"),
                stated.get(0).message());
    }

    @Test
    void effectiveAtPredictsModellableEntriesAndKeepsTheRest() throws InputException {
        LibraryEntry unknown = LibraryEntry.of("mystery", -30.0, Double.NaN);
        LibraryEntry measured = new LibraryEntry("measured", -40.0, 0.1, 5, -1, Double.NaN, List.of(), List.of(),
                "buffer X", 6.0, 20.0, 25.0, "a build");
        Library ref = reference();
        List<LibraryEntry> es = new ArrayList<>(List.of(ref.find("chloride").orElseThrow(),
                ref.find("acetate").orElseThrow(), unknown, measured));
        BufferConditions buffer = new BufferConditions(PH, IONIC_STRENGTH_MM / 1000.0, 25.0);
        Library eff = ReferenceIons.effectiveAt(new Library(es, "ref.csv", List.of()), buffer);
        assertEquals(4, eff.size());
        double acetate = MobilityPredictor.predict(ReferenceIons.model(es.get(1), "ref"), buffer).mobility();
        assertEquals(acetate, eff.find("acetate").orElseThrow().mobility(), 1e-12);
        // at its pKa about half of acetate is charged: far below its limiting value
        assertTrue(Math.abs(acetate) < 0.6 * Math.abs(es.get(1).mobility()), "acetate " + acetate);
        assertTrue(eff.find("chloride").orElseThrow().mobility() > es.get(0).mobility(), "slower than at infinite dilution");
        assertEquals(PH, eff.find("chloride").orElseThrow().pH());
        assertTrue(eff.find("chloride").orElseThrow().pKa().isEmpty());
        assertEquals(unknown, eff.find("mystery").orElseThrow(), "no charge: kept as it is");
        assertEquals(measured, eff.find("measured").orElseThrow(), "measured at 20 mM: kept as it is");
    }

    // ---- finding 2: runs pooled twice ----

    private static BuildResult builtFrom(Path dir, String... runNames) throws Exception {
        List<RunResult> runs = new ArrayList<>();
        double[] eof = {50, 47, 44, 41};
        for (int i = 0; i < runNames.length; i++) {
            Path f = dir.resolve(runNames[i] + ".csv");
            if (!Files.exists(f)) {
                Files.writeString(f, "time,signal\n0," + runNames[i].length() + runNames[i] + "\n");
            }
            runs.add(run(runNames[i], f, StandardsRuns.conditions(25.0, StandardsRuns.BUFFER), eof[i],
                    new double[] {51.9 + 0.02 * i}, new double[] {1.0}));
        }
        return LibraryBuilder.build(runs, allTo("m", runs), sheet("m", StandardAnalyte.named("sodium")), DEFAULTS,
                null, STAMP);
    }

    @Test
    void runsAlreadyInTheLibraryAreNotPooledAgain(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        BuildResult first = builtFrom(dir, "r1", "r2", "r3");
        // written and read back, as 'library add' does
        Library existing = LibraryCsv.read(new java.io.StringReader(LibraryCsv.toCsv(first.library())), "lib.csv");
        BuildResult again = builtFrom(dir, "r1", "r2", "r3");
        assertEquals(List.of("r1 (r1.csv)", "r2 (r2.csv)", "r3 (r3.csv)"), LibraryMerger.alreadyPooled(existing, again));
        InputException ex = assertThrows(InputException.class, () -> LibraryMerger.merge(existing, again));
        assertTrue(ex.getMessage().contains("already pooled") && ex.getMessage().contains("r2 (r2.csv)"),
                ex.getMessage());

        // a copy of run r1 under another name is the same measurement
        Files.copy(dir.resolve("r1.csv"), dir.resolve("copy.csv"));
        BuildResult renamed = builtFrom(dir, "copy", "r4");
        assertEquals(List.of("copy (copy.csv) = run r1"), LibraryMerger.alreadyPooled(existing, renamed));

        // genuinely new runs pool as before
        BuildResult fresh = builtFrom(dir, "r5", "r6", "r7");
        assertTrue(LibraryMerger.alreadyPooled(existing, fresh).isEmpty());
        assertEquals(6, LibraryMerger.merge(existing, fresh).library().find("sodium").orElseThrow().n());
    }

    // ---- findings 4 and 5: library check ----

    private static LibraryEntry entry(String name, double mu, double sd, int charge) {
        return new LibraryEntry(name, mu, sd, 5, charge, Double.NaN, List.of(), List.of(), null, Double.NaN,
                Double.NaN, 25.0, null);
    }

    @Test
    void checkReportsSignsAgainstTheChargeAndImpossibleMagnitudes() {
        Library lib = new Library(List.of(entry("sodium", -46.4, 0.2, 1), entry("sulfate", -73.8, 0.2, 2),
                entry("chloride", -7630, 0.2, -1), entry("nitrate", -70.1, 0.2, -1), entry("x", 129.0, 0.2, 0)),
                "lib.csv", List.of());
        List<BuildWarning> f = LibraryCheck.check(lib, DEFAULTS);
        List<String> sign = f.stream().filter(w -> w.kind() == BuildWarning.Kind.SIGN_CONTRADICTS_CHARGE)
                .map(BuildWarning::analyte).toList();
        assertEquals(List.of("sodium", "sulfate"), sign);
        List<String> absurd = f.stream().filter(w -> w.kind() == BuildWarning.Kind.IMPLAUSIBLE_MOBILITY)
                .map(BuildWarning::analyte).toList();
        // beyond ±130: faster than any common ion but H+ (362) and OH- (205), CRC Handbook, from memory
        assertEquals(List.of("chloride"), absurd);
    }

    @Test
    void closeAnalytesAreWordedByHowCloseTheyAre() {
        // chloride and sulfate 2.5 apart with windows of 1.5 (SD 0.5): windows overlap, but they are
        // 3.5 combined SDs apart, so they can be told apart.
        Library lib = new Library(List.of(entry("chloride", -76.2, 0.5, -1), entry("sulfate", -73.7, 0.5, -2)),
                "lib.csv", List.of());
        List<BuildWarning> f = LibraryCheck.check(lib, DEFAULTS);
        assertEquals(1, f.size(), f.toString());
        assertEquals(BuildWarning.Kind.OVERLAPPING_WINDOWS, f.get(0).kind());
        String msg = f.get(0).message();
        assertFalse(msg.contains("cannot be told apart"), msg);
        assertTrue(msg.contains("may be ambiguous") && msg.contains("2.500 units apart")
                && msg.contains("3.5 combined SDs"), msg);

        // 1.2 apart with SD 0.5 each: less than 2 × √(0.5² + 0.5²) = 1.414, so indistinguishable
        Library close = new Library(List.of(entry("a", -50.0, 0.5, -1), entry("b", -51.2, 0.5, -1)), "l.csv",
                List.of());
        List<BuildWarning> g = LibraryCheck.check(close, DEFAULTS);
        assertEquals(List.of(BuildWarning.Kind.INDISTINGUISHABLE), g.stream().map(BuildWarning::kind).toList());
        assertTrue(g.get(0).message().contains("cannot be told apart by mobility alone"), g.get(0).message());

        // tiny SDs: the 1-unit floor still applies
        Library tight = new Library(List.of(entry("a", -50.0, 0.02, -1), entry("b", -50.8, 0.02, -1)), "l.csv",
                List.of());
        assertEquals(BuildWarning.Kind.INDISTINGUISHABLE, LibraryCheck.check(tight, DEFAULTS).get(0).kind());
    }

    @Test
    void checkShowsTheWindowIdentificationApplies() {
        LibraryEntry own = new LibraryEntry("own", -60.0, 0.1, 5, -1, 0.8, List.of(), List.of(), null, Double.NaN,
                Double.NaN, 25.0, null);
        Library lib = new Library(List.of(own, entry("spread", -40.0, 0.3, -1),
                LibraryEntry.of("handbook", -20.0, Double.NaN)), "lib.csv", List.of());
        org.mobident.settings.MatchSettings match = org.mobident.settings.MatchSettings.DEFAULT;
        double[] w = LibraryCheck.windows(lib, match);
        assertEquals(0.8, w[0], 0.0, "an entry's own fixed window replaces the rule");
        org.mobident.matching.SpreadModel spread = org.mobident.matching.SpreadModel.of(lib, match);
        for (int j = 0; j < 3; j++) {
            // the same definition the matcher applies (MatchWindow), for a peak without uncertainty
            assertEquals(org.mobident.matching.MatchWindow.halfWidth(lib.entries().get(j), spread, j, 0.0, match),
                    w[j], 0.0);
        }
        java.io.StringWriter text = new java.io.StringWriter();
        BuildText.write(lib, LibraryCheck.check(lib, DEFAULTS), match, new java.io.PrintWriter(text));
        String out = text.toString();
        assertTrue(out.contains("0.800="), out);
        assertTrue(out.contains(String.format(java.util.Locale.ROOT, "%.3f ", w[1])), out);
        assertTrue(out.lines().filter(l -> l.startsWith("handbook")).findFirst().orElseThrow()
                .contains(String.format(java.util.Locale.ROOT, "%.3f ", w[2])), out);
        assertTrue(out.contains("'=' marks an entry's own fixed window"), out);
    }

}
