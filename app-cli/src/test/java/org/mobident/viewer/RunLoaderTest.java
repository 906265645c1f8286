package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.library.LibraryCsv;
import org.mobident.result.MatchStatus;
import org.mobident.result.RunResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.DelimitedTraceReader;
import org.mobident.trace.io.RunSheetReader;
import org.mobident.usecase.IdentifyBatch;

/** How the background loader turns the use case's per-run results into the window's runs (called directly, no threads). */
class RunLoaderTest {

    private static RunLoader loader(TraceLoader traces) throws InputException {
        return new RunLoader(List.of(), new IdentifyBatch(ViewerFixtures.library()), IdentifySettings.defaults(), traces,
                (i, r) -> { }, () -> { });
    }

    /** A run of the demo data identified as {@code identify} does, with its spec. */
    private static RunResult demoResult() throws InputException {
        Path demo = Path.of("..", "demo-data");
        assumeTrue(Files.isRegularFile(demo.resolve("runs.csv")), "demo data next to the module");
        List<RunSpec> specs = RunSheetReader.read(demo.resolve("runs.csv"),
                org.mobident.trace.RunConditions.EMPTY).runs();
        return new IdentifyBatch(LibraryCsv.read(demo.resolve("library.csv")))
                .run(new org.mobident.usecase.RunBatch(specs.subList(0, 1), List.of(), java.util.Map.of(),
                        java.util.Map.of()), IdentifySettings.defaults()).results().get(0);
    }

    @Test
    void aFailedRunIsShownNotProcessedWithTheReason() throws InputException {
        RunSpec spec = ViewerFixtures.spec("broken");
        RunResult failed = RunResult.failure(spec, new InputException("broken.csv", 7, "signal", "not a number: 'x'"));
        ViewerRun run = loader((f, o) -> {
            throw new AssertionError("a failed run's trace is not read");
        }).shown(0, failed);
        assertFalse(run.drawable());
        assertFalse(run.isWaiting());
        assertEquals("not processed", run.statusText());
        assertTrue(run.statusDetail().contains("not a number"), run.statusDetail());
    }

    @Test
    void aTraceThatCannotBeReadForDrawingIsKeptToItsRun() throws InputException {
        RunResult done = demoResult();
        ViewerRun run = loader((f, o) -> {
            throw new IllegalStateException("boom");
        }).shown(0, done);
        assertEquals("not processed", run.statusText());
        assertTrue(run.statusDetail().contains("boom"));
    }

    @Test
    void aDemoRunIsShownWithItsTraceReadOnce() throws InputException {
        RunResult done = demoResult();
        AtomicInteger reads = new AtomicInteger();
        RunLoader l = loader((f, o) -> {
            reads.incrementAndGet();
            return DelimitedTraceReader.read(f, o);
        });
        ViewerRun run = l.shown(3, done);
        assertTrue(run.drawable(), run.statusDetail());
        assertTrue(run.result().mobilityKnown());
        Trace trace = run.trace();
        assertNotNull(trace);
        assertTrue(run.result().peaks().stream()
                .anyMatch(p -> p.match() != null && p.match().status() == MatchStatus.IDENTIFIED));
        assertTrue(run.statusText().startsWith("EOF"), run.statusText());
        // a second result for the same run (the batch's second pass) reuses the trace
        assertSame(trace, l.shown(3, done).trace());
        assertEquals(1, reads.get());
    }
}
