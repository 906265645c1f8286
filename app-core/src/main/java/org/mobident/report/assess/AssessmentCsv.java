package org.mobident.report.assess;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.QuoteMode;
import org.mobident.assess.AcceptanceLimits;
import org.mobident.assess.AnalyteScore;
import org.mobident.assess.Assessment;
import org.mobident.assess.Calibration;
import org.mobident.assess.Detection;
import org.mobident.assess.Identification;
import org.mobident.assess.KnownIdentity;
import org.mobident.assess.MobilityError;
import org.mobident.assess.PeakVerdict;
import org.mobident.assess.ReliabilityBin;
import org.mobident.assess.ReportedPeak;
import org.mobident.assess.RunCheck;
import org.mobident.assess.StratumScore;
import org.mobident.report.CsvCells;
import org.mobident.text.NumberText;

/**
 * The scores as CSV files.
 *
 * <p><b>Scores</b> ({@link #writeScores}): one long, tidy table with the columns
 * {@code section,subject,measure,value}, one number or word a row. Sections, in order:
 * {@code source} (the two inputs), {@code run} (per run: {@code state} scored, failed, no_scale,
 * not_scored or not_in_peak_table; {@code marker} right, off, not_reported or not_checked),
 * {@code identification}, {@code height_sd} (subject: the band), {@code analyte} (subject: the name),
 * {@code calibration} (subject: calls or unassigned), {@code reliability_calls} and
 * {@code reliability_unassigned} (subject: the confidence bin), {@code mobility_error} (measures {@code n},
 * {@code mae}, {@code bias}; the analyte section has them as {@code mobility_n} and so on),
 * {@code detection}, {@code limit} (when limits were given) and {@code note}. Fractions (precision,
 * recall, rates, confidences, ECE, Brier score) have 4 decimals; mobility errors are in
 * 1e-9 m²/(V s) with 4 decimals; an unknown value is an empty cell.
 *
 * <p><b>Verdicts</b> ({@link #writeVerdicts}): one row per reported peak of the scored runs, then one
 * per known row no peak belongs to, with the columns {@link #VERDICT_COLUMNS}.
 *
 * <p>Text cells are made spreadsheet-safe ({@link CsvCells#inert}); line ends are "\n".
 */
public final class AssessmentCsv {

    /** Columns of the scores table. */
    public static final List<String> SCORE_COLUMNS = List.of("section", "subject", "measure", "value");

    /** Columns of the verdicts table. */
    public static final List<String> VERDICT_COLUMNS = List.of("run", "peak", "role", "time_s", "status",
            "assigned", "confidence", "known_line", "known_kind", "known_name", "known_time_s", "matched_by",
            "verdict");

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n")
            .setQuoteMode(QuoteMode.MINIMAL).get();
    private static final String ALL = "all";

    private AssessmentCsv() {
    }

    /** Writes the scores table (flushed, not closed). */
    public static void writeScores(Assessment a, AcceptanceLimits limits, Writer out) throws IOException {
        Rows rows = new Rows(new CSVPrinter(out, FORMAT));
        rows.printer.printRecord(SCORE_COLUMNS);
        rows.text("source", "known", "file", a.knownSource());
        rows.text("source", "peaks", "from", a.tableSource());
        for (RunCheck r : a.runs()) {
            rows.text("run", r.run(), "state", r.failed() ? "failed" : r.mobilityKnown() ? "scored" : "no_scale");
            rows.text("run", r.run(), "marker", r.marker().label());
        }
        for (String r : a.notScored()) {
            rows.text("run", r, "state", "not_scored");
        }
        for (String r : a.notInTable()) {
            rows.text("run", r, "state", "not_in_peak_table");
        }
        Identification id = a.identification();
        rows.count("identification", ALL, "identified_calls", id.identifiedCalls());
        rows.count("identification", ALL, "identified_right", id.identifiedRight());
        rows.count("identification", ALL, "calls", id.calls());
        rows.count("identification", ALL, "calls_right", id.callsRight());
        rows.count("identification", ALL, "analytes_present", id.analytesPresent());
        rows.count("identification", ALL, "present_identified", id.presentIdentified());
        rows.count("identification", ALL, "present_called", id.presentCalled());
        rows.count("identification", ALL, "wrong_names", id.wrongNames());
        rows.count("identification", ALL, "called_absent", id.calledAbsent());
        rows.count("identification", ALL, "missed", id.missed());
        rows.fraction("identification", ALL, "precision", id.precision().value());
        rows.fraction("identification", ALL, "precision_with_ambiguous", id.precisionWithAmbiguous().value());
        rows.fraction("identification", ALL, "recall", id.recall().value());
        rows.fraction("identification", ALL, "recall_with_ambiguous", id.recallWithAmbiguous().value());
        rows.count("identification", ALL, "present_height_sd_10_up", id.clearPresent());
        rows.fraction("identification", ALL, "recall_height_sd_10_up", id.recallClear().value());
        for (StratumScore s : a.strata()) {
            String k = s.stratum().label();
            rows.count("height_sd", k, "analytes_present", s.analyteRows());
            rows.count("height_sd", k, "identified_right", s.identifiedRight());
            rows.fraction("height_sd", k, "recall", s.recall().value());
            rows.fraction("height_sd", k, "recall_with_ambiguous", s.recallWithAmbiguous().value());
            rows.count("height_sd", k, "zones", s.zones());
            rows.count("height_sd", k, "zones_detected", s.detected());
            rows.fraction("height_sd", k, "detection_rate", s.detectionRate().value());
        }
        for (AnalyteScore s : a.analytes()) {
            rows.count("analyte", s.name(), "present", s.present());
            rows.count("analyte", s.name(), "identified_right", s.identifiedRight());
            rows.count("analyte", s.name(), "ambiguous_right", s.ambiguousRight());
            rows.count("analyte", s.name(), "wrong_calls", s.wrongCalls());
            rows.count("analyte", s.name(), "missed", s.missed());
            rows.fraction("analyte", s.name(), "precision", s.precision().value());
            rows.fraction("analyte", s.name(), "recall", s.recall().value());
            rows.mobilityError("analyte", s.name(), "mobility_", s.mobilityError());
        }
        rows.calibration("calls", a.calls());
        rows.calibration("unassigned", a.unassigned());
        rows.mobilityError("mobility_error", ALL, "", a.mobilityError());
        Detection d = a.detection();
        rows.count("detection", ALL, "analyte_peaks", d.analytePeaks());
        rows.count("detection", ALL, "analyte_peaks_on_zone", d.analytePeaksOnZone());
        rows.fraction("detection", ALL, "precision", d.precision().value());
        rows.count("detection", ALL, "zones", d.zones());
        rows.count("detection", ALL, "zones_detected", d.zonesDetected());
        rows.fraction("detection", ALL, "rate", d.rate().value());
        rows.count("detection", ALL, "spikes_reported", d.spikesReported());
        rows.count("detection", ALL, "runs_failed", d.runsFailed());
        rows.count("detection", ALL, "runs_without_scale", d.runsWithoutScale());
        rows.count("detection", ALL, "runs_marker_off", d.runsMarkerOff());
        for (AcceptanceLimits.Check c : limits.check(a)) {
            rows.fraction("limit", c.name(), c.atLeast() ? "at_least" : "at_most", c.limit());
            rows.fraction("limit", c.name(), "measured", c.value());
            rows.text("limit", c.name(), "met", c.met() ? "yes" : "no");
        }
        for (int i = 0; i < a.notes().size(); i++) {
            rows.text("note", Integer.toString(i + 1), "text", a.notes().get(i));
        }
        rows.printer.flush();
    }

    /** Writes the verdicts table (flushed, not closed). */
    public static void writeVerdicts(Assessment a, Writer out) throws IOException {
        CSVPrinter printer = new CSVPrinter(out, FORMAT);
        printer.printRecord(VERDICT_COLUMNS);
        for (PeakVerdict v : a.verdicts()) {
            ReportedPeak p = v.peak();
            KnownIdentity k = v.known();
            printer.printRecord(
                    CsvCells.inert(v.run()),
                    p == null ? "" : Integer.toString(p.number()),
                    p == null ? "" : CsvCells.inert(p.role()),
                    p == null ? "" : NumberText.fixed(p.timeS(), Figures.TABLE_TIME_DECIMALS, ""),
                    p == null ? "" : p.status().label(),
                    p == null ? "" : CsvCells.inert(p.assigned()),
                    p == null ? "" : NumberText.fixed(p.confidence(), Figures.CONFIDENCE_DECIMALS, ""),
                    k == null || k.line() <= 0 ? "" : Long.toString(k.line()),
                    k == null ? "" : k.kind().label(),
                    k == null ? "" : CsvCells.inert(k.name()),
                    k == null ? "" : NumberText.fixed(k.timeS(), Figures.TABLE_TIME_DECIMALS, ""),
                    v.how() == null ? "" : v.how().label(),
                    v.verdict().label());
        }
        printer.flush();
    }

    /** Printing helper for the long table. */
    private static final class Rows {
        final CSVPrinter printer;

        Rows(CSVPrinter printer) {
            this.printer = printer;
        }

        void text(String section, String subject, String measure, String value) throws IOException {
            printer.printRecord(section, CsvCells.inert(subject), measure, CsvCells.inert(value));
        }

        void count(String section, String subject, String measure, int value) throws IOException {
            printer.printRecord(section, CsvCells.inert(subject), measure, Integer.toString(value));
        }

        void fraction(String section, String subject, String measure, double value) throws IOException {
            printer.printRecord(section, CsvCells.inert(subject), measure,
                    NumberText.fixed(value, Figures.FRACTION_DECIMALS, ""));
        }

        void mobilityError(String section, String subject, String prefix, MobilityError e) throws IOException {
            count(section, subject, prefix + "n", e.count());
            printer.printRecord(section, CsvCells.inert(subject), prefix + "mae",
                    NumberText.fixed(e.meanAbsoluteError(), Figures.MOBILITY_DECIMALS, ""));
            printer.printRecord(section, CsvCells.inert(subject), prefix + "bias",
                    NumberText.fixed(e.bias(), Figures.MOBILITY_DECIMALS, ""));
        }

        void calibration(String subject, Calibration c) throws IOException {
            count("calibration", subject, "count", c.count());
            fraction("calibration", subject, "mean_confidence", c.meanConfidence());
            fraction("calibration", subject, "accuracy", c.accuracy());
            fraction("calibration", subject, "ece", c.ece());
            fraction("calibration", subject, "brier", c.brier());
            for (ReliabilityBin b : c.bins()) {
                String section = "reliability_" + subject;
                count(section, Figures.bin(b), "count", b.count());
                fraction(section, Figures.bin(b), "mean_confidence", b.meanConfidence());
                fraction(section, Figures.bin(b), "accuracy", b.accuracy());
            }
        }
    }
}
