package org.mobident.trace.io;

import java.util.List;
import java.util.Map;

import org.mobident.InputException;
import org.mobident.trace.RunSpec;

/**
 * The runs read from a run sheet, in sheet order, and the rows that could not be used.
 * A bad row never stops the other rows.
 *
 * @param runs        the usable runs (unmodifiable)
 * @param rowProblems one problem per rejected row, each with its sheet line (unmodifiable)
 * @param sampleByRun the free-text {@code sample} cell of each usable run that has one, by run name
 * @param mixByRun    the {@code mix} cell (which standards mix a run holds) by run name
 */
public record RunSheet(List<RunSpec> runs, List<InputException> rowProblems,
                       Map<String, String> sampleByRun, Map<String, String> mixByRun) {

    public RunSheet {
        runs = List.copyOf(runs);
        rowProblems = List.copyOf(rowProblems);
        sampleByRun = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(sampleByRun));
        mixByRun = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(mixByRun));
    }

    /** True when every row was usable. */
    public boolean clean() {
        return rowProblems.isEmpty();
    }
}
