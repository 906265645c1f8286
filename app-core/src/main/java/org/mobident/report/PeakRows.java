package org.mobident.report;

import java.util.ArrayList;
import java.util.List;
import org.mobident.result.Candidate;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;

/**
 * The peak table as rows of typed cells, shared by the CSV and JSON writers (and the workbook) so
 * all carry the same columns, values and number formats: the columns and their formats are
 * {@link PeakTableColumn}, the status words {@link PeakTableStatus}; this class says which value of
 * a run or peak goes into each column.
 */
final class PeakRows {

    /** Column names in output order. */
    static final List<String> COLUMNS = PeakTableColumn.headers();

    /** One cell: text, or a number already formatted (null text/number means empty). */
    record Cell(String text, boolean numeric) {
        static Cell text(String s) {
            return new Cell(s, false);
        }

        static Cell number(String formatted) {
            return new Cell(formatted, true);
        }

        boolean empty() {
            return text == null || text.isEmpty();
        }
    }

    private PeakRows() {
    }

    /** All rows of all runs, in run order then peak order; each row has {@link #COLUMNS}.size() cells. */
    static List<List<Cell>> rows(List<RunResult> runs) {
        List<List<Cell>> rows = new ArrayList<>();
        for (RunResult run : runs) {
            rows.addAll(rowsOf(run));
        }
        return rows;
    }

    /** The rows of one run: one per peak, or a single row when it failed or found no peak. */
    static List<List<Cell>> rowsOf(RunResult run) {
        List<List<Cell>> rows = new ArrayList<>();
        String name = run.spec().name();
        if (run.failed()) {
            rows.add(emptyRow(name, run.spec().sample(), PeakTableStatus.FAILED, run.error().getMessage()));
            return rows;
        }
        if (run.peaks().isEmpty()) {
            rows.add(emptyRow(name, run.spec().sample(), PeakTableStatus.NO_PEAKS, "no peaks detected"));
            return rows;
        }
        int number = 0;
        for (PeakResult pr : run.peaks()) {
            number++;
            rows.add(peakRow(run, name, number, pr));
        }
        return rows;
    }

    private static List<Cell> emptyRow(String run, String sample, PeakTableStatus status, String note) {
        List<Cell> row = new ArrayList<>(COLUMNS.size());
        for (PeakTableColumn column : PeakTableColumn.values()) {
            row.add(switch (column) {
                case RUN -> Cell.text(run);
                case SAMPLE -> Cell.text(sample);
                case STATUS -> Cell.text(status.word());
                case NOTE -> Cell.text(note);
                default -> column.format().numeric() ? Cell.number(null) : Cell.text(null);
            });
        }
        return row;
    }

    private static List<Cell> peakRow(RunResult run, String name, int number, PeakResult pr) {
        List<Cell> scale = scaleCells(run);
        List<Cell> row = new ArrayList<>(COLUMNS.size());
        for (PeakTableColumn column : PeakTableColumn.values()) {
            row.add(peakCell(column, run, name, number, pr, scale));
        }
        return row;
    }

    /** The cell of one column on the row of one peak. */
    private static Cell peakCell(PeakTableColumn column, RunResult run, String name, int number, PeakResult pr,
                                 List<Cell> scale) {
        Peak p = pr.peak();
        PeakMatch m = pr.match();
        boolean analyte = pr.role() == PeakRole.ANALYTE;
        boolean matched = analyte && Double.isFinite(pr.mobility());
        return switch (column) {
            case RUN -> Cell.text(name);
            case SAMPLE -> Cell.text(run.spec().sample());
            case PEAK -> number(column, number);
            case ROLE -> Cell.text(pr.role().label());
            case APEX_TIME_S -> number(column, p.apexTimeS());
            case APEX_TIME_SD_S -> number(column, p.apexTimeSdS());
            case START_S -> number(column, p.startTimeS());
            case END_S -> number(column, p.endTimeS());
            case HEIGHT -> number(column, p.height());
            case AREA -> number(column, p.area());
            case CORRECTED_AREA -> number(column, p.correctedArea());
            case WIDTH_HALF_S -> number(column, p.widthHalfS());
            case PLATES -> number(column, p.plates());
            case RESOLUTION -> number(column, p.resolution());
            case SIGNAL_TO_NOISE -> number(column, p.signalToNoise());
            case DIRECTION -> Cell.text(p.dip() ? "dip" : "rise");
            case MOBILITY -> number(column, pr.mobility());
            case MOBILITY_SD -> number(column, pr.mobilitySd());
            case MOBILITY_AT_LIBRARY_TEMP -> number(column, pr.mobilityAtLibraryTemp());
            case MOBILITY_CORRECTED -> number(column, pr.mobilityCorrected());
            case ASSIGNED -> Cell.text(matched ? m.assigned() : null);
            case CONFIDENCE -> matched ? number(column, m.confidence()) : Cell.number(null);
            case STATUS -> Cell.text(statusOf(pr).word());
            case RUNNER_UP -> Cell.text(matched ? m.runnerUp() : null);
            case RUNNER_UP_PROBABILITY -> matched && m.runnerUp() != null
                    ? number(column, m.runnerUpProbability()) : Cell.number(null);
            case CANDIDATES -> Cell.text(matched ? candidatesText(m.candidates()) : null);
            case CENTRE_TIME_S -> number(column, p.centreTimeS());
            case CENTRE_TIME_SD_S -> number(column, p.centreTimeSdS());
            case SN_CLASS -> Cell.text(p.signalToNoiseClass().label());
            case SCALE_FACTOR, SCALE_FACTOR_SD, SCALE_OFFSET, SCALE_OFFSET_SD ->
                    scale.get(PeakTableColumn.runValues().indexOf(column));
            case NOTE -> Cell.text(analyte && !run.mobilityKnown() ? run.scaleNote() : pr.note());
        };
    }

    /**
     * The run's scale correction a ± sd, b ± sd; empty when it was switched off or the run has no
     * mobility scale (a = 1, b = 0 with the prior's SDs when too few peaks matched to fit it).
     */
    static List<Cell> scaleCells(RunResult run) {
        RunScale s = run.runScale();
        if (!run.mobilityKnown() || s.status() == RunScale.Status.OFF) {
            return List.of(Cell.number(null), Cell.number(null), Cell.number(null), Cell.number(null));
        }
        return List.of(number(PeakTableColumn.SCALE_FACTOR, s.factor()),
                number(PeakTableColumn.SCALE_FACTOR_SD, s.factorSd()),
                number(PeakTableColumn.SCALE_OFFSET, s.offset()),
                number(PeakTableColumn.SCALE_OFFSET_SD, s.offsetSd()));
    }

    /** identified / ambiguous / unassigned for analytes, marker for markers. */
    static PeakTableStatus statusOf(PeakResult pr) {
        if (pr.role() != PeakRole.ANALYTE) {
            return PeakTableStatus.MARKER;
        }
        return PeakTableStatus.of(pr.match().status());
    }

    /** "nitrate:0.930 chlorate:0.050": name and probability of each candidate, most likely first. */
    static String candidatesText(List<Candidate> candidates) {
        StringBuilder sb = new StringBuilder();
        for (Candidate c : candidates) {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            String p = PeakTableColumn.Format.PROBABILITY.write(c.probability());
            sb.append(c.name()).append(':').append(p == null ? "" : p);
        }
        return sb.toString();
    }

    /** A number in the column's format. */
    static Cell number(PeakTableColumn column, double value) {
        return Cell.number(column.write(value));
    }
}
