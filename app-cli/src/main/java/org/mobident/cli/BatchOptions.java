package org.mobident.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.matching.MatchSettings;
import org.mobident.pipeline.IdentifySettings;
import org.mobident.pipeline.Identifier;
import org.mobident.pipeline.RunResult;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceFiles;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The inputs every command that identifies runs shares: the runs, the library and the match
 * settings. {@link #identify()} does the work.
 */
public final class BatchOptions {

    @Mixin
    RunInputs inputs;

    @Option(names = {"-l", "--library"}, required = true, paramLabel = "FILE", description = "Mobility library (CSV).")
    Path libraryFile;

    @Mixin
    MatchOptions matching;

    /** The loaded inputs and the results, in run order (rejected sheet rows last). */
    record Batch(Library library, List<RunResult> results, IdentifySettings settings) {
        /** Re-reads the traces of the runs that were processed, for plots; runs that fail are left out. */
        Map<String, Trace> traces() {
            return BatchOptions.traces(results, settings);
        }
    }

    /** True when exactly one of run sheet and trace files was given. */
    boolean runsGiven() {
        return inputs.given();
    }

    Batch identify() throws InputException {
        return identify(org.mobident.pipeline.BatchProgress.NONE);
    }

    /** Loads the inputs and identifies the runs, telling {@code progress} as runs are done. */
    Batch identify(org.mobident.pipeline.BatchProgress progress) throws InputException {
        Library library = LibraryCsv.read(libraryFile);
        org.mobident.library.standards.LibraryCheck.requirePlausible(library);
        RunInputs.Loaded loaded = inputs.load();
        IdentifySettings settings = inputs.settings(matching.toSettings(MatchSettings.DEFAULT));
        List<RunResult> results = new ArrayList<>(new Identifier(library, settings).identifyAll(loaded.runs(), progress));
        results.addAll(loaded.rejected());
        return new Batch(library, OptionNames.forCommandLine(results), settings);
    }

    /** Re-reads the traces of processed runs, for plots; a trace that vanished meanwhile is left out. */
    static Map<String, Trace> traces(List<RunResult> results, IdentifySettings settings) {
        Map<String, Trace> out = new LinkedHashMap<>();
        for (RunResult r : results) {
            if (!r.failed() && r.spec().traceFile() != null) {
                try {
                    out.put(r.spec().name(), TraceFiles.read(r.spec().traceFile(), settings.readOptions()));
                } catch (InputException e) {
                    // read once already; if it vanished since, its plot is left out
                }
            }
        }
        return out;
    }
}
