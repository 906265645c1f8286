package org.mobident.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.mobident.matching.Candidate;
import org.mobident.matching.MatchStatus;
import org.mobident.matching.PeakMatch;
import org.mobident.matching.RunScale;
import org.mobident.pipeline.PeakResult;
import org.mobident.pipeline.PeakRole;
import org.mobident.pipeline.RunResult;
import org.mobident.signal.Peak;

/**
 * The peak table as rows of typed cells, shared by the CSV and JSON writers so both carry the
 * same columns, values and number formats.
 *
 * <p>Formats (all {@link Locale#ROOT}): times in s with 4 decimals; mobilities with 3 decimals;
 * probabilities with 3 decimals; height, area and corrected area with 6 significant digits;
 * plates as an integer; resolution with 2 decimals; S/N with 1 decimal.
 *
 * <p>Columns added later come at the end, just before {@code note}, so that the earlier ones
 * keep their order: {@code centre_time_s} and {@code centre_time_sd_s} (the zone's first moment
 * and its uncertainty, see {@link Peak}) and {@code sn_class}, where the S/N stands against the
 * detection and quantitation limits ({@link org.mobident.signal.SignalToNoiseClass}).
 */
final class PeakRows {

    /** Column names in output order. */
    static final List<String> COLUMNS = List.of(
            "run", "sample", "peak", "role", "apex_time_s", "apex_time_sd_s", "start_s", "end_s",
            "height", "area", "corrected_area", "width_half_s", "plates", "resolution",
            "signal_to_noise", "direction", "mobility", "mobility_sd", "mobility_at_library_temp",
            "mobility_corrected", "assigned", "confidence", "status", "runner_up", "runner_up_probability",
            "candidates", "centre_time_s", "centre_time_sd_s", "sn_class", "scale_factor", "scale_factor_sd",
            "scale_offset", "scale_offset_sd", "note");

    /** The columns that describe the whole run (repeated on each of its rows in CSV, stated once per run in JSON). */
    static final List<String> RUN_COLUMNS = List.of("scale_factor", "scale_factor_sd", "scale_offset",
            "scale_offset_sd");

    /** Decimals of the scale factor a and its SD. */
    static final int FACTOR_DECIMALS = 5;

    static final int TIME_DECIMALS = 4;
    static final int MOBILITY_DECIMALS = 3;
    static final int PROBABILITY_DECIMALS = 3;
    static final int MAGNITUDE_DIGITS = 6;
    static final int RESOLUTION_DECIMALS = 2;
    static final int SIGNAL_TO_NOISE_DECIMALS = 1;

    /** Status of a row for a run that could not be processed. */
    static final String STATUS_FAILED = "failed";
    /** Status of a marker peak (markers are not matched against the library). */
    static final String STATUS_MARKER = "marker";
    /** Status of the single row of a processed run in which no peak was found. */
    static final String STATUS_NO_PEAKS = "no_peaks";

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
            rows.add(emptyRow(name, run.spec().sample(), STATUS_FAILED, run.error().getMessage()));
            return rows;
        }
        if (run.peaks().isEmpty()) {
            rows.add(emptyRow(name, run.spec().sample(), STATUS_NO_PEAKS, "no peaks detected"));
            return rows;
        }
        int number = 0;
        for (PeakResult pr : run.peaks()) {
            number++;
            rows.add(peakRow(run, name, number, pr));
        }
        return rows;
    }

    private static List<Cell> emptyRow(String run, String sample, String status, String note) {
        List<Cell> row = new ArrayList<>(COLUMNS.size());
        for (String column : COLUMNS) {
            switch (column) {
                case "run":
                    row.add(Cell.text(run));
                    break;
                case "sample":
                    row.add(Cell.text(sample));
                    break;
                case "status":
                    row.add(Cell.text(status));
                    break;
                case "note":
                    row.add(Cell.text(note));
                    break;
                default:
                    row.add(Cell.text(null));
                    break;
            }
        }
        return row;
    }

    private static List<Cell> peakRow(RunResult run, String name, int number, PeakResult pr) {
        Peak p = pr.peak();
        PeakMatch m = pr.match();
        boolean analyte = pr.role() == PeakRole.ANALYTE;
        boolean matched = analyte && Double.isFinite(pr.mobility());
        List<Cell> row = new ArrayList<>(COLUMNS.size());
        row.add(Cell.text(name));
        row.add(Cell.text(run.spec().sample()));
        row.add(Cell.number(Integer.toString(number)));
        row.add(Cell.text(pr.role().label()));
        row.add(time(p.apexTimeS()));
        row.add(time(p.apexTimeSdS()));
        row.add(time(p.startTimeS()));
        row.add(time(p.endTimeS()));
        row.add(Cell.number(Numbers.significant(p.height(), MAGNITUDE_DIGITS)));
        row.add(Cell.number(Numbers.significant(p.area(), MAGNITUDE_DIGITS)));
        row.add(Cell.number(Numbers.significant(p.correctedArea(), MAGNITUDE_DIGITS)));
        row.add(time(p.widthHalfS()));
        row.add(Cell.number(Numbers.integer(p.plates())));
        row.add(Cell.number(Numbers.fixed(p.resolution(), RESOLUTION_DECIMALS)));
        row.add(Cell.number(Numbers.fixed(p.signalToNoise(), SIGNAL_TO_NOISE_DECIMALS)));
        row.add(Cell.text(p.dip() ? "dip" : "rise"));
        row.add(mobility(pr.mobility()));
        row.add(mobility(pr.mobilitySd()));
        row.add(mobility(pr.mobilityAtLibraryTemp()));
        row.add(mobility(pr.mobilityCorrected()));
        row.add(Cell.text(matched ? m.assigned() : null));
        row.add(matched ? probability(m.confidence()) : Cell.number(null));
        row.add(Cell.text(statusOf(pr)));
        row.add(Cell.text(matched ? m.runnerUp() : null));
        row.add(matched && m.runnerUp() != null ? probability(m.runnerUpProbability()) : Cell.number(null));
        row.add(Cell.text(matched ? candidatesText(m.candidates()) : null));
        row.add(time(p.centreTimeS()));
        row.add(time(p.centreTimeSdS()));
        row.add(Cell.text(p.signalToNoiseClass().label()));
        row.addAll(scaleCells(run));
        row.add(Cell.text(analyte && !run.mobilityKnown() ? run.scaleNote() : null));
        return row;
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
        return List.of(Cell.number(Numbers.fixed(s.factor(), FACTOR_DECIMALS)),
                Cell.number(Numbers.fixed(s.factorSd(), FACTOR_DECIMALS)),
                Cell.number(Numbers.fixed(s.offset(), MOBILITY_DECIMALS)),
                Cell.number(Numbers.fixed(s.offsetSd(), MOBILITY_DECIMALS)));
    }

    /** identified / ambiguous / unassigned for analytes, "marker" for markers. */
    static String statusOf(PeakResult pr) {
        if (pr.role() != PeakRole.ANALYTE) {
            return STATUS_MARKER;
        }
        MatchStatus s = pr.match().status();
        return s == null ? MatchStatus.UNASSIGNED.label() : s.label();
    }

    /** "nitrate:0.930 chlorate:0.050": name and probability of each candidate, most likely first. */
    static String candidatesText(List<Candidate> candidates) {
        StringBuilder sb = new StringBuilder();
        for (Candidate c : candidates) {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            String p = Numbers.fixed(c.probability(), PROBABILITY_DECIMALS);
            sb.append(c.name()).append(':').append(p == null ? "" : p);
        }
        return sb.toString();
    }

    static Cell time(double s) {
        return Cell.number(Numbers.fixed(s, TIME_DECIMALS));
    }

    static Cell mobility(double mu) {
        return Cell.number(Numbers.fixed(mu, MOBILITY_DECIMALS));
    }

    static Cell probability(double p) {
        return Cell.number(Numbers.fixed(p, PROBABILITY_DECIMALS));
    }
}
