package org.mobident.assess;

import java.util.List;

/**
 * The scores of reported peaks against a known-identities table. Every figure is taken over the
 * scored runs only: the runs that are both in the peak table and in the known table.
 *
 * @param knownSource      the known-identities file
 * @param tableSource      where the reported peaks came from (a peak table file, or the identification)
 * @param runs             the scored runs, in peak-table order
 * @param notScored        runs of the peak table that the known table does not name (ignored)
 * @param notInTable       runs of the known table that the peak table does not hold (ignored)
 * @param identification   precision, recall and error counts of the calls
 * @param strata           recall and detection by zone height over noise SD, one entry per band
 * @param analytes         the scores per library analyte, by name
 * @param calls            calibration of the calls' confidences (identified and ambiguous peaks)
 * @param unassigned       calibration of the unassigned peaks' confidences (that the peak is none of the
 *                         library analytes)
 * @param mobilityError    reported minus true mobility over analyte peaks on known analyte rows with a mobility
 * @param detection        peak finding and markers
 * @param verdicts         every reported peak of the scored runs with its verdict, then every known row no
 *                         peak belongs to, run by run
 * @param notes            remarks on how the scoring went (rows that cannot be matched, names not in the library)
 */
public record Assessment(String knownSource, String tableSource, List<RunCheck> runs, List<String> notScored,
                         List<String> notInTable, Identification identification, List<StratumScore> strata,
                         List<AnalyteScore> analytes, Calibration calls, Calibration unassigned,
                         MobilityError mobilityError, Detection detection, List<PeakVerdict> verdicts,
                         List<String> notes) {

    public Assessment {
        runs = List.copyOf(runs);
        notScored = List.copyOf(notScored);
        notInTable = List.copyOf(notInTable);
        strata = List.copyOf(strata);
        analytes = List.copyOf(analytes);
        verdicts = List.copyOf(verdicts);
        notes = List.copyOf(notes);
    }

    /** True when at least one run was scored. */
    public boolean anythingScored() {
        return !runs.isEmpty();
    }
}
