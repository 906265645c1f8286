package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.library.LibraryCsv;
import org.mobident.matching.MatchStatus;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.Identifier;
import org.mobident.trace.RunSpec;
import org.mobident.trace.io.DelimitedTraceReader;
import org.mobident.trace.io.RunSheetReader;
import org.mobident.trace.io.TraceReadOptions;

/** One run's processing as the background loader does it (called directly, no threads). */
class RunLoaderTest {

    private static RunLoader loader(TraceLoader traces) {
        Identifier id = new Identifier(ViewerFixtures.library(), IdentifySettings.defaults());
        return new RunLoader(List.of(), id, traces, TraceReadOptions.DEFAULT, 1, (i, r) -> { }, () -> { });
    }

    @Test
    void anUnreadableTraceBecomesAFailedRunWithTheReason() {
        RunSpec spec = ViewerFixtures.spec("broken");
        ViewerRun run = loader((f, o) -> {
            throw new InputException(f.toString(), 7, "signal", "not a number: 'x'");
        }).process(spec);
        assertFalse(run.drawable());
        assertFalse(run.isWaiting());
        assertEquals("not processed", run.statusText());
        assertTrue(run.statusDetail().contains("not a number"), run.statusDetail());
    }

    @Test
    void anUnexpectedErrorIsKeptToItsRun() {
        ViewerRun run = loader((f, o) -> {
            throw new IllegalStateException("boom");
        }).process(ViewerFixtures.spec("odd"));
        assertEquals("not processed", run.statusText());
        assertTrue(run.statusDetail().contains("boom"));
    }

    @Test
    void aDemoRunIsReadAndIdentified() throws Exception {
        Path demo = Path.of("..", "demo-data");
        assumeTrue(Files.isRegularFile(demo.resolve("runs.csv")), "demo data next to the module");
        List<RunSpec> specs = RunSheetReader.read(demo.resolve("runs.csv"),
                org.mobident.trace.RunConditions.EMPTY).runs();
        Identifier id = new Identifier(LibraryCsv.read(demo.resolve("library.csv")), IdentifySettings.defaults());
        RunLoader l = new RunLoader(List.of(), id, DelimitedTraceReader::read, TraceReadOptions.DEFAULT, 1,
                (i, r) -> { }, () -> { });
        ViewerRun run = l.process(specs.get(0));
        assertTrue(run.drawable(), run.statusDetail());
        assertTrue(run.result().mobilityKnown());
        assertNotNull(run.trace());
        assertTrue(run.result().peaks().stream()
                .anyMatch(p -> p.match() != null && p.match().status() == MatchStatus.IDENTIFIED));
        assertTrue(run.statusText().startsWith("EOF"), run.statusText());
    }
}
