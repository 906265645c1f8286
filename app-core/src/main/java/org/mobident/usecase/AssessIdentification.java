package org.mobident.usecase;

import java.util.List;
import java.util.Objects;
import org.mobident.assess.Assessment;
import org.mobident.assess.Assessor;
import org.mobident.assess.KnownIdentities;
import org.mobident.assess.ReportedRun;
import org.mobident.assess.ReportedRuns;
import org.mobident.library.Library;
import org.mobident.recheck.PeakTableRow;

/**
 * Validation: scores an identification against what is known to be in the runs (spiked samples,
 * standards, synthetic runs), from a peak table written earlier or from a batch identified now.
 */
public final class AssessIdentification {

    /** How many run names {@link Result#preview()} lists. */
    static final int PREVIEW_RUNS = 5;

    private AssessIdentification() {
    }

    /**
     * The scores and what was scored.
     *
     * @param assessment the scores (precision, recall, calibration, mobility error, detection)
     * @param reported   the runs as reported, scored or not
     */
    public record Result(Assessment assessment, List<ReportedRun> reported) {
        public Result {
            Objects.requireNonNull(assessment, "assessment");
            reported = List.copyOf(reported);
        }

        /** The first few reported run names, for saying that none matched the known table ("none" when empty). */
        public String preview() {
            List<String> names = reported.stream().limit(PREVIEW_RUNS).map(ReportedRun::name).toList();
            return names.isEmpty() ? "none" : String.join(", ", names) + (reported.size() > PREVIEW_RUNS ? ", ..." : "");
        }
    }

    /**
     * Scores the rows of a peak table.
     *
     * @param source the table's file, named in the report
     */
    public static Result ofTable(KnownIdentities known, List<PeakTableRow> rows, String source) {
        return score(known, ReportedRuns.fromTable(rows), source, null);
    }

    /**
     * Scores a batch just identified.
     *
     * @param source how the batch was identified, named in the report (e.g. "identified now with lib.csv")
     */
    public static Result ofBatch(KnownIdentities known, IdentifiedBatch batch, String source) {
        return score(known, ReportedRuns.fromResults(batch.results()), source, batch.library());
    }

    private static Result score(KnownIdentities known, List<ReportedRun> reported, String source, Library library) {
        return new Result(Assessor.assess(known, reported, source, library), reported);
    }
}
