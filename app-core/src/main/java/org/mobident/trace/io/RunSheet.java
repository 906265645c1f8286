package org.mobident.trace.io;

import java.util.List;

import org.mobident.InputException;
import org.mobident.trace.RunSpec;

/**
 * The runs read from a run sheet, in sheet order, and the rows that could not be used.
 * A bad row never stops the other rows.
 *
 * @param runs        the usable runs (unmodifiable)
 * @param rowProblems one problem per rejected row, each with its sheet line (unmodifiable)
 */
public record RunSheet(List<RunSpec> runs, List<InputException> rowProblems) {

    public RunSheet {
        runs = List.copyOf(runs);
        rowProblems = List.copyOf(rowProblems);
    }

    /** True when every row was usable. */
    public boolean clean() {
        return rowProblems.isEmpty();
    }
}
