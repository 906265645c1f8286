package org.mobident.usecase;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mobident.InputException;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceFiles;

/** Writing invented runs, and timing the stages of a batch on them (counts only: no timing is asserted). */
class SimulateAndMeasureTest {

    @TempDir
    Path dir;

    private SimulateRuns.Request archive(Integer count, Integer points, boolean library) {
        return new SimulateRuns.Request(SimulateRuns.ARCHIVE, library, count, points, 5, dir, false, "hint");
    }

    @Test
    void aRequestOutsideTheLimitsSaysWhatIsWrong() {
        assertNull(archive(3, 2000, true).problem());
        assertTrue(archive(0, 2000, true).problem().startsWith("--count must be 1.."));
        assertTrue(archive(3, SimulateRuns.MIN_POINTS - 1, true).problem().contains("--points"));
        assertTrue(archive(3, 2000, false).problem().contains("give --library"));
        assertEquals(SimulateRuns.DEFAULT_ARCHIVE_RUNS, archive(null, null, true).runs());
        assertEquals(SimulateRuns.DEFAULT_POINTS, archive(null, null, true).pointsPerRun());
        SimulateRuns.Request lab = new SimulateRuns.Request(SimulateRuns.LAB_DAY, false, null, null, 5, dir, false, "h");
        assertNull(lab.problem());
        assertEquals(SimulateRuns.DEFAULT_LAB_DAY_SAMPLES, lab.runs());
        assertTrue(new SimulateRuns.Request(SimulateRuns.LAB_DAY, true, 3, null, 5, dir, false, "h").problem()
                .contains("leave out --library"));
        assertTrue(new SimulateRuns.Request(SimulateRuns.LAB_DAY, false, 3, 500, 5, dir, false, "h").problem()
                .contains("leave out --points"));
        assertTrue(new SimulateRuns.Request("other", false, 3, null, 5, dir, false, "h").problem()
                .startsWith("unknown --scenario 'other'"));
    }

    @Test
    void theArchiveIsWrittenAndEveryStageCountsWhatItDid() throws IOException, InputException, InterruptedException {
        Path sheet = SimulateRuns.archive(archive(3, 2000, true), DemoInputs.library());
        assertTrue(Files.isRegularFile(sheet));
        List<RunSpec> runs = RunBatch.fromSheet(sheet, RunConditions.EMPTY).runs();
        assertEquals(3, runs.size());
        long points = 0;
        long bytes = 0;
        for (RunSpec r : runs) {
            Trace t = TraceFiles.read(r.traceFile(), DemoInputs.settings().readOptions());
            assertTrue(Math.abs(t.size() - 2000) <= 1, "points " + t.size());
            points += t.size();
            bytes += Files.size(r.traceFile());
        }
        MeasureStage.Figures read = MeasureStage.run(MeasureStage.Stage.READ, DemoInputs.library(), runs,
                DemoInputs.settings());
        assertEquals(points, read.counted());
        assertEquals(bytes, read.bytes());
        assertEquals(0, read.failed());
        assertEquals(3, read.runs());
        MeasureStage.Figures detect = MeasureStage.run(MeasureStage.Stage.DETECT, DemoInputs.library(), runs,
                DemoInputs.settings());
        MeasureStage.Figures identify = MeasureStage.run(MeasureStage.Stage.IDENTIFY, DemoInputs.library(), runs,
                DemoInputs.settings());
        assertTrue(detect.counted() >= 3, "every invented run has peaks");
        // identification reports every detected peak (plus a marker found by searching its window)
        assertTrue(identify.counted() >= detect.counted(), identify.counted() + " vs " + detect.counted());
        assertEquals(0, identify.failed());
    }

    @Test
    void anExistingFileIsNotReplacedUnlessAsked() throws IOException, InputException {
        SimulateRuns.archive(archive(2, 1000, true), DemoInputs.library());
        org.junit.jupiter.api.Assertions.assertThrows(IOException.class,
                () -> SimulateRuns.archive(archive(2, 1000, true), DemoInputs.library()));
    }
}
