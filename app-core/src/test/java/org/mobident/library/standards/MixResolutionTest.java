package org.mobident.library.standards;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;

/** How a standards run is tied to its mix when the run sheet has no 'mix' column. */
class MixResolutionTest {

    private static StandardsSheet sheet(String... mixes) throws InputException {
        StringBuilder text = new StringBuilder("mix,analyte\n");
        for (String m : mixes) {
            text.append(m).append(",chloride-").append(m).append('\n');
        }
        return StandardsSheetReader.read(text.toString(), "mixes.csv");
    }

    private static RunSpec run(String name, long line) {
        return new RunSpec(name, Path.of(name + ".csv"), RunConditions.EMPTY, "runs.csv", line);
    }

    @Test
    void mixColumnWinsThenSampleThenRunName() throws InputException {
        StandardsSheet s = sheet("mixA", "mixB", "C");
        List<RunSpec> runs = List.of(run("r1", 2), run("r2", 3), run("std-mixB-2", 4), run("r4", 5));
        Map<String, String> mixCells = Map.of("r1", "mixB");
        Map<String, String> samples = Map.of("r1", "mixA", "r2", "Standard MIXA, 0.1 mM, replicate 2",
                "r4", "mix C, replicate 1");
        Map<String, String> resolved = s.resolveMixes(runs, mixCells, samples);
        assertEquals("mixB", resolved.get("r1"));
        assertEquals("mixA", resolved.get("r2"));
        assertEquals("mixB", resolved.get("std-mixB-2"));
        assertEquals("C", resolved.get("r4"));
        s.requireMixes(runs, resolved);
    }

    @Test
    void ambiguousOrMissingMixIsReportedWithItsLine() throws InputException {
        StandardsSheet s = sheet("mixA", "mixB");
        List<RunSpec> runs = List.of(run("r1", 2), run("both-mixA-mixB", 3));
        Map<String, String> resolved = s.resolveMixes(runs, Map.of(), Map.of("r1", "first replicate"));
        assertFalse(resolved.containsKey("r1"));
        assertFalse(resolved.containsKey("both-mixA-mixB"), "two mix names: no guess");
        InputException e = assertThrows(InputException.class, () -> s.requireMixes(runs, resolved));
        assertEquals("runs.csv", e.file());
        assertEquals(2, e.line());
        assertEquals("mix", e.field());
    }

    @Test
    void aSingleMixNeedsNoNaming() throws InputException {
        StandardsSheet s = sheet("only");
        Map<String, String> resolved = s.resolveMixes(List.of(run("a", 2), run("b", 3)), Map.of(), Map.of());
        assertEquals(Map.of("a", "only", "b", "only"), resolved);
    }
}
