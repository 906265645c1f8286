package org.mobident.usecase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.result.BatchProgress;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;

/** The identify use case on the demo scenario (invented data; its truth in demo-data/TRUTH.md). */
class IdentifyBatchTest {

    private static IdentifiedBatch batch;
    private static final Map<Integer, List<RunResult>> told = new ConcurrentHashMap<>();
    private static final AtomicInteger runsDone = new AtomicInteger();

    @BeforeAll
    static void identify() throws InputException {
        BatchProgress counting = new BatchProgress() {
            @Override
            public void passStarted(int pass, int runs) {
            }

            @Override
            public void runDone(int pass) {
                runsDone.incrementAndGet();
            }
        };
        batch = new IdentifyBatch(DemoInputs.library()).run(DemoInputs.runs(), DemoInputs.settings(), counting,
                (i, r) -> told.computeIfAbsent(i, k -> java.util.Collections.synchronizedList(new ArrayList<>())).add(r));
    }

    @Test
    void everyRunOfTheSheetIsIdentifiedInSheetOrder() {
        List<String> names = batch.results().stream().map(r -> r.spec().name()).toList();
        assertEquals(List.of("spring-01", "spring-02", "well-01", "well-02", "well-03", "spring-03-uv214",
                "well-04-cations"), names);
        assertTrue(batch.problems().isEmpty(), "the demo runs all get a scale: " + batch.problems());
        // demo-data/TRUTH.md, spring-01: chloride, sulfate, nitrate, fluoride and the neutral marker
        List<String> assigned = batch.results().get(0).peaks().stream().map(p -> p.match().assigned())
                .filter(a -> a != null).toList();
        assertEquals(List.of("chloride", "sulfate", "nitrate", "fluoride"), assigned);
    }

    @Test
    void theRunAt30DegreesCarriesItsTemperatureFactor() {
        for (RunResult r : batch.results()) {
            if (r.spec().name().equals("well-02")) {
                // demo-data/TRUTH.md: eta(25 C)/eta(30 C) = 1.1162 (IAPWS 2008), so the factor is about 1/1.1162
                assertEquals(1 / 1.1162, r.temperatureFactor(), 0.002);
                PeakResult p = r.peaks().get(0);
                assertEquals(p.mobility() * r.temperatureFactor(), p.mobilityAtLibraryTemp(), 1e-9);
            } else {
                assertEquals(1.0, r.temperatureFactor(), 0.0, r.spec().name());
            }
        }
    }

    @Test
    void theListenerIsToldEveryRunAndLastTheFinalResult() {
        assertEquals(batch.results().size(), told.size());
        for (int i = 0; i < batch.results().size(); i++) {
            List<RunResult> seen = told.get(i);
            assertSame(batch.results().get(i), seen.get(seen.size() - 1), "run " + i);
        }
        assertTrue(runsDone.get() >= batch.results().size());
    }

    @Test
    void tracesAreReopenedForPlotsAndReports() throws InputException {
        Map<String, Trace> traces = batch.traces();
        assertEquals(batch.results().size(), traces.size());
        RunResult first = batch.results().get(0);
        Trace t = first.reopenTrace(batch.settings().readOptions());
        assertEquals(traces.get("spring-01").size(), t.size());
        // the apex of every peak lies inside the reopened trace
        for (PeakResult p : first.peaks()) {
            assertTrue(p.peak().apexTimeS() > t.timeS(0) && p.peak().apexTimeS() < t.timeS(t.size() - 1));
        }
    }

    @Test
    void everyEntryHasItsWindow() {
        double[] w = batch.windowHalfWidths();
        assertEquals(batch.library().size(), w.length);
        for (double x : w) {
            assertTrue(x > 0 && x < 5, "half-width " + x);
        }
    }

    @Test
    void aRejectedRowComesLastAndIsAProblem() throws InputException {
        RunSpec bad = new RunSpec("sheet line 9", null, RunConditions.EMPTY, "runs.csv", 9);
        RunResult rejected = RunResult.failure(bad, new InputException("runs.csv", 9, "file", "no such file"));
        RunBatch runs = DemoInputs.runs();
        RunBatch one = new RunBatch(runs.runs().subList(0, 1), List.of(rejected), Map.of(), Map.of());
        IdentifiedBatch b = new IdentifyBatch(DemoInputs.library()).run(one, DemoInputs.settings());
        assertEquals(2, b.results().size());
        assertSame(rejected, b.results().get(1));
        assertEquals(1, b.problems().size());
        assertTrue(b.problems().get(0).failed());
        assertEquals(1, b.traces().size());
    }

    @Test
    void aTraceThatCannotBeReadBecomesAFailedRun() throws InputException {
        RunSpec missing = new RunSpec("gone", Path.of("no-such-trace.csv"), DemoInputs.runs().runs().get(0).conditions(),
                "test", 1);
        IdentifiedBatch b = new IdentifyBatch(DemoInputs.library())
                .run(new RunBatch(List.of(missing), List.of(), Map.of(), Map.of()), DemoInputs.settings());
        assertTrue(b.results().get(0).failed());
        assertFalse(b.problems().isEmpty());
        assertTrue(b.traces().isEmpty());
    }
}
