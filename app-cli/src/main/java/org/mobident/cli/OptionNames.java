package org.mobident.cli;

import java.util.List;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.result.RunResult;

/**
 * Run-sheet column names and the options that give the same value, so that a message about a run
 * given on the command line names the option the user typed rather than a column they never saw.
 */
final class OptionNames {

    /** The origin the run inputs give to runs declared on the command line. */
    static final String COMMAND_LINE = org.mobident.trace.io.RunSheetReader.COMMAND_LINE;

    /** Run-sheet column → condition option. */
    static final Map<String, String> BY_COLUMN = Map.ofEntries(
            Map.entry("total_length_cm", "--total-length-cm"),
            Map.entry("detector_length_cm", "--detector-length-cm"),
            Map.entry("voltage_kv", "--voltage-kv"),
            Map.entry("ramp_s", "--ramp-s"),
            Map.entry("temperature_c", "--temperature-c"),
            Map.entry("buffer", "--buffer"),
            Map.entry("marker_from_s", "--marker-window"),
            Map.entry("marker_to_s", "--marker-window"),
            Map.entry("detection", "--detection"),
            Map.entry("ref_marker_mobility", "--ref-mobility"),
            Map.entry("ref_marker_from_s", "--ref-window"),
            Map.entry("ref_marker_to_s", "--ref-window"));

    private OptionNames() {
    }

    /** The results with each command-line run's failure naming the option instead of the sheet column. */
    static List<RunResult> forCommandLine(List<RunResult> results) {
        return results.stream().map(OptionNames::forCommandLine).toList();
    }

    static RunResult forCommandLine(RunResult r) {
        if (!r.failed() || !COMMAND_LINE.equals(r.error().file())) {
            return r;
        }
        String option = BY_COLUMN.get(r.error().field());
        if (option == null) {
            return r;
        }
        InputException e = r.error();
        return RunResult.failure(r.spec(), new InputException(e.file(), e.line(), option, e.problem(), e.getCause()));
    }
}
