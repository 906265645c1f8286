package org.mobident.simulate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.library.standards.StandardsMix;
import org.mobident.library.standards.StandardsSheet;
import org.mobident.library.standards.StandardsSheetReader;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.RunSheet;
import org.mobident.trace.io.RunSheetReader;
import org.mobident.trace.io.TraceFiles;
import org.mobident.trace.io.TraceReadOptions;

/** The files of a lab-day bench: complete, readable by the tool's own readers, and repeatable. */
class LabDayBenchTest {

    /** Small benches keep the test quick; two runs per method cover every kind of run. */
    private static final int SAMPLES = 6;
    private static final long SEED = 7;
    private static final String HINT = "allow it";
    /** Written signals have 6 decimals, minute times 8 decimals of a minute. */
    private static final double SIGNAL_ROUNDING = 1e-6;
    private static final double TIME_ROUNDING_S = 1e-6;

    private static Map<String, byte[]> contents(Path dir) throws IOException {
        Map<String, byte[]> files = new HashMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                files.put(dir.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        return files;
    }

    @Test
    void theSameSeedWritesTheSameFiles(@TempDir Path a, @TempDir Path b, @TempDir Path c) throws IOException {
        // README.txt names its own folder in the commands; compare it without that
        LabDayBench.write(SAMPLES, SEED, a, false, HINT);
        LabDayBench.write(SAMPLES, SEED, b, false, HINT);
        LabDayBench.write(SAMPLES, SEED + 1, c, false, HINT);
        Map<String, byte[]> first = contents(a);
        Map<String, byte[]> second = contents(b);
        assertEquals(first.keySet(), second.keySet());
        for (String name : first.keySet()) {
            if (name.equals(LabDayBench.README)) {
                String ra = new String(first.get(name), StandardCharsets.UTF_8).replace(a.toAbsolutePath().toString(), "D");
                String rb = new String(second.get(name), StandardCharsets.UTF_8).replace(b.toAbsolutePath().toString(), "D");
                assertEquals(ra, rb);
            } else {
                assertArrayEquals(first.get(name), second.get(name), name);
            }
        }
        assertFalse(java.util.Arrays.equals(first.get(LabDayBench.TRUTH_FILE),
                contents(c).get(LabDayBench.TRUTH_FILE)), "another seed, another bench");
    }

    @Test
    void everyTraceReadsBackThroughTheToolsReaders(@TempDir Path dir) throws IOException, InputException {
        LabDayPlan plan = LabDayPlanner.plan(LabDayMethods.builtIn(), SAMPLES, SEED);
        LabDayBench.write(plan, dir, false, HINT);
        List<LabDayRun> runs = new ArrayList<>(plan.standards());
        runs.addAll(plan.samples());
        for (LabDayRun r : runs) {
            Path folder = dir.resolve(r.isStandard() ? LabDayBench.STANDARDS_FOLDER : LabDayBench.SAMPLES_FOLDER);
            Trace read = TraceFiles.read(folder.resolve(r.fileName()), TraceReadOptions.DEFAULT);
            Trace made = r.trace();
            assertEquals(made.size(), read.size(), r.name());
            assertEquals(r.name(), read.name());
            for (int i = 0; i < made.size(); i++) {
                assertEquals(made.timeS(i), read.timeS(i), TIME_ROUNDING_S, r.name());
                assertEquals(made.signal(i), read.signal(i), SIGNAL_ROUNDING, r.name());
            }
        }
        assertEquals(3, runs.stream().map(LabDayRun::style).distinct().count(), "all three layouts occur");
    }

    @Test
    void spikesAreInTheWrittenTracesAtTheTruthTimes(@TempDir Path dir) throws IOException, InputException {
        LabDayPlan plan = LabDayPlanner.plan(LabDayMethods.builtIn(), SAMPLES, SEED);
        LabDayBench.write(plan, dir, false, HINT);
        int seen = 0;
        for (LabDayRun r : plan.samples()) {
            Trace read = TraceFiles.read(dir.resolve(LabDayBench.SAMPLES_FOLDER).resolve(r.fileName()),
                    TraceReadOptions.DEFAULT);
            double[] clean = TraceSimulator.simulate(r.name(), r.spec().toBuilder().clearSpikes().build(),
                    r.dispersion()).signals();
            List<TruthRow> spikes = r.truth(TruthKind.SPIKE);
            assertEquals(r.spec().spikes().size(), spikes.size());
            for (TruthRow spike : spikes) {
                int i = read.indexAtOrAfter(spike.timeS() - TIME_ROUNDING_S);
                assertEquals(spike.timeS(), read.timeS(i), TIME_ROUNDING_S, r.name());
                // what the spikes of the plan put on this point (two may meet on one point)
                double expected = 0;
                for (Spike s : r.spec().spikes()) {
                    int first = TraceSimulator.spikeIndex(r.spec(), s);
                    expected += i >= first && i < first + s.widthSamples() ? s.amplitude() : 0;
                }
                assertTrue(Math.abs(expected) >= LabDayPlanner.SPIKE_MIN_SD * r.spec().noiseSd() / 2, r.name());
                assertEquals(expected, read.signal(i) - clean[i], 2 * SIGNAL_ROUNDING, r.name());
                seen++;
            }
        }
        assertTrue(seen > 0, "the seed gives spikes to check");
    }

    @Test
    void sheetsParseWithTheToolsReadersAndNameEveryRun(@TempDir Path dir) throws IOException, InputException {
        LabDayPlan plan = LabDayPlanner.plan(LabDayMethods.builtIn(), SAMPLES, SEED);
        LabDayBench.write(plan, dir, false, HINT);
        Path standards = dir.resolve(LabDayBench.STANDARDS_FOLDER);
        RunSheet std = RunSheetReader.read(standards.resolve(LabDayBench.RUN_SHEET), RunConditions.EMPTY);
        assertTrue(std.clean(), () -> std.rowProblems().toString());
        assertEquals(plan.standards().size(), std.runs().size());
        StandardsSheet mixes = StandardsSheetReader.read(standards.resolve(LabDayBench.MIXES_SHEET));
        for (RunSpec s : std.runs()) {
            StandardsMix mix = mixes.mix(std.mixByRun().get(s.name())).orElseThrow();
            assertTrue(Files.exists(s.traceFile()), s.name());
            assertEquals(25.0, s.conditions().temperatureC(), 0.0);
            assertTrue(s.conditions().hasMarkerWindow(), "standards always state a window");
            assertFalse(mix.analytes().isEmpty());
        }
        for (LabDayMethod m : plan.methods()) {
            RunSheet one = RunSheetReader.read(standards.resolve(m.buffer() + "-runs.csv"), RunConditions.EMPTY);
            assertEquals(plan.standards(m).size(), one.runs().size());
            StandardsSheet own = StandardsSheetReader.read(standards.resolve(m.buffer() + "-mixes.csv"));
            assertEquals(LabDayMethod.MIXES, own.mixes().size());
            // the analyst's approximate mobility: the true value rounded to whole units
            for (StandardsMix mix : own.mixes()) {
                mix.analytes().forEach(a -> assertEquals(Math.round(m.panel().stream()
                        .filter(p -> p.name().equals(a.name())).findFirst().orElseThrow().mobility()),
                        a.approxMobility(), 0.0, a.name()));
            }
        }
        RunSheet samples = RunSheetReader.read(dir.resolve(LabDayBench.SAMPLES_FOLDER).resolve(LabDayBench.RUN_SHEET),
                RunConditions.EMPTY);
        assertTrue(samples.clean(), () -> samples.rowProblems().toString());
        assertEquals(plan.samples().size(), samples.runs().size());
        assertTrue(samples.mixByRun().isEmpty(), "sample rows name no mix");
        assertEquals("bench sample 001", samples.sampleByRun().get("lab-s001"));
    }

    @Test
    void truthTablesFollowTheKnownIdentitiesFormat(@TempDir Path dir) throws IOException {
        LabDayPlan plan = LabDayPlanner.plan(LabDayMethods.builtIn(), SAMPLES, SEED);
        LabDayBench.write(plan, dir, false, HINT);
        for (Path truth : List.of(dir.resolve(LabDayBench.TRUTH_FILE),
                dir.resolve(LabDayBench.STANDARDS_FOLDER).resolve(LabDayBench.TRUTH_FILE))) {
            List<String> lines = Files.readAllLines(truth).stream().filter(l -> !l.startsWith("#")).toList();
            assertEquals("run,kind,analyte,time_s,mobility,height_sd", lines.get(0), "header of /work/spec");
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.split(",", -1);
                assertEquals(6, f.length, line);
                assertTrue(List.of("analyte", "foreign", "marker", "spike").contains(f[1]), line);
                assertTrue(Double.parseDouble(f[3]) > 0, line);
                assertTrue(f[3].contains("."), "numbers with a decimal point: " + line);
                switch (f[1]) {
                    case "spike" -> assertTrue(f[2].isEmpty() && f[4].isEmpty() && f[5].isEmpty(), line);
                    case "marker" -> assertTrue(f[2].isEmpty() && Double.parseDouble(f[4]) == 0, line);
                    default -> assertFalse(f[2].isEmpty() || f[4].isEmpty() || f[5].isEmpty(), line);
                }
            }
        }
        String first = Files.readAllLines(dir.resolve(LabDayBench.TRUTH_FILE)).stream()
                .filter(l -> l.startsWith("lab-s001,")).findFirst().orElseThrow();
        TruthRow row = plan.samples().get(0).truth().get(0);
        assertEquals(String.format(java.util.Locale.ROOT, "lab-s001,%s,%s,%.3f,%.2f,%.1f", row.kind().label(),
                row.analyte() == null ? "" : row.analyte(), row.timeS(), row.mobility(), row.heightSd()), first);
        String readme = Files.readString(dir.resolve(LabDayBench.README));
        assertTrue(readme.contains("invented"), "the README says the data are invented");
        assertTrue(readme.contains("mobident assess --known"));
    }

    @Test
    void refusesToOverwriteAndWritesNothingThen(@TempDir Path dir) throws IOException {
        LabDayBench.write(SAMPLES, SEED, dir, false, HINT);
        Path sheet = dir.resolve(LabDayBench.SAMPLES_FOLDER).resolve(LabDayBench.RUN_SHEET);
        Files.writeString(sheet, "edited by hand\n");
        Map<String, byte[]> before = contents(dir);
        FileAlreadyExistsException e = assertThrows(FileAlreadyExistsException.class,
                () -> LabDayBench.write(SAMPLES, SEED + 1, dir, false, HINT));
        assertTrue(e.getMessage().contains(HINT), e.getMessage());
        Map<String, byte[]> after = contents(dir);
        assertEquals(before.keySet(), after.keySet());
        before.forEach((name, bytes) -> assertArrayEquals(bytes, after.get(name), name));
        LabDayBench.write(SAMPLES, SEED, dir, true, HINT);
        assertNotEquals("edited by hand\n", Files.readString(sheet));
    }
}
