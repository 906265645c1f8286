package org.mobident.usecase;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.result.RunResult;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.io.RunSheet;
import org.mobident.trace.io.RunSheetReader;

/**
 * The runs of a job as given: those that can be processed, the sheet rows or trace files that
 * cannot (already as failed results, listed after the others), and the sheet's text columns.
 *
 * @param runs        runs to process, in the order given
 * @param rejected    rows or files refused before processing, as failed results
 * @param sampleByRun the sheet's sample column by run name (empty without a sheet)
 * @param mixByRun    the sheet's mix column by run name (empty without a sheet)
 */
public record RunBatch(List<RunSpec> runs, List<RunResult> rejected, Map<String, String> sampleByRun,
                       Map<String, String> mixByRun) {

    public RunBatch {
        runs = List.copyOf(runs);
        rejected = List.copyOf(rejected);
        sampleByRun = Collections.unmodifiableMap(new LinkedHashMap<>(sampleByRun));
        mixByRun = Collections.unmodifiableMap(new LinkedHashMap<>(mixByRun));
    }

    /** The runs of a run sheet; a row that cannot be used becomes a failed run named after its line. */
    public static RunBatch fromSheet(Path sheetFile, RunConditions defaults) throws InputException {
        RunSheet sheet = RunSheetReader.read(sheetFile, defaults);
        List<RunResult> rejected = new ArrayList<>();
        for (InputException problem : sheet.rowProblems()) {
            rejected.add(RunResult.failure(new RunSpec("sheet line " + problem.line(), null,
                    RunConditions.EMPTY, sheetFile.toString(), problem.line()), problem));
        }
        return new RunBatch(sheet.runs(), rejected, sheet.sampleByRun(), sheet.mixByRun());
    }

    /**
     * Trace files run under the same conditions; a file that cannot be used becomes a failed run.
     *
     * @param source where the conditions came from, named in the failed runs (e.g. "command line")
     */
    public static RunBatch fromTraces(List<Path> traces, RunConditions defaults, String source) {
        List<RunSpec> runs = new ArrayList<>();
        List<RunResult> rejected = new ArrayList<>();
        for (Path t : traces) {
            try {
                runs.add(RunSheetReader.single(t, defaults));
            } catch (InputException e) {
                rejected.add(RunResult.failure(new RunSpec(RunSpec.runNameOf(t), null, defaults, source, 0), e));
            }
        }
        return new RunBatch(runs, rejected, Map.of(), Map.of());
    }
}
