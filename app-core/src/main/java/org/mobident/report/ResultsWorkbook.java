package org.mobident.report;

import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.summary.AnalyteStats;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.summary.SampleCalls;
import org.mobident.text.NumberText;
import org.mobident.trace.RunConditions;

/**
 * The results of a batch as one spreadsheet workbook (Office Open XML, .xlsx), for the lab to
 * keep and hand on. Sheets, in order:
 * <ol>
 *   <li>{@value #SHEET_SAMPLES}: one row per run, for every library analyte its outcome, confidence,
 *       time-corrected area and mobility (two header rows: analyte, then measure);</li>
 *   <li>{@value #SHEET_PEAKS}: the peak table, the same values as the CSV peak table;</li>
 *   <li>{@value #SHEET_ANALYTES}: per analyte and buffer, runs found in, mean mobility and SD, drift;</li>
 *   <li>{@value #SHEET_UNKNOWNS}: unassigned peaks recurring at one mobility ({@link RecurringUnknowns});</li>
 *   <li>{@value #SHEET_RUNS}: conditions, marker, scale correction and failures of every run;</li>
 *   <li>{@value #SHEET_LIBRARY}: the library the batch was matched against;</li>
 *   <li>{@value #SHEET_ABOUT}: version, time, library file and the caution.</li>
 * </ol>
 * Numbers are stored as numbers (so a decimal-comma locale shows them its own way), units are in
 * the headers, and every sheet's header rows are frozen. Missing values are empty cells.
 */
public final class ResultsWorkbook {

    public static final String SHEET_SAMPLES = "Samples";
    public static final String SHEET_PEAKS = "Peaks";
    public static final String SHEET_ANALYTES = "Analytes over batch";
    public static final String SHEET_UNKNOWNS = "Recurring unknowns";
    public static final String SHEET_RUNS = "Runs";
    public static final String SHEET_LIBRARY = "Library";
    public static final String SHEET_ABOUT = "About";

    /** The mobility unit as written in headers. */
    static final String MOBILITY_UNIT = PeakTableColumn.MOBILITY_UNIT;

    /** The measures shown per analyte on the samples sheet. */
    static final List<String> SAMPLE_MEASURES = List.of("result", "confidence", "corrected area",
            "mobility (" + MOBILITY_UNIT + ")");

    private static final Pattern VERSION = Pattern.compile("(\\d+)\\.(\\d+)");
    private static final String HEADER_FILL = "DCE6F0";
    private static final double NAME_WIDTH = 18;
    private static final double NUMBER_WIDTH = 12;
    private static final double WIDE_TEXT_WIDTH = 40;

    /**
     * What the workbook states about itself.
     *
     * @param version   the program version (e.g. "0.1.0")
     * @param timestamp when the results were made, as text
     */
    public record Options(String version, String timestamp) {
    }

    private ResultsWorkbook() {
    }

    /** Writes the workbook of {@code runs} matched against {@code library} to {@code out} (not closed). */
    public static void write(List<RunResult> runs, Library library, List<RecurringUnknowns.Group> unknowns,
                             Options options, OutputStream out) throws IOException {
        Workbook wb = new Workbook(out, "Mobident", workbookVersion(options.version()));
        SampleCalls calls = SampleCalls.of(runs, library);
        samples(wb.newWorksheet(SHEET_SAMPLES), calls);
        peaks(wb.newWorksheet(SHEET_PEAKS), runs);
        analytes(wb.newWorksheet(SHEET_ANALYTES), AnalyteStats.of(calls));
        unknowns(wb.newWorksheet(SHEET_UNKNOWNS), unknowns);
        runFacts(wb.newWorksheet(SHEET_RUNS), runs);
        library(wb.newWorksheet(SHEET_LIBRARY), library);
        about(wb.newWorksheet(SHEET_ABOUT), library, options, runs.size());
        wb.finish();
    }

    /** The writer accepts only "major.minor" as the producing program's version. */
    static String workbookVersion(String version) {
        Matcher m = VERSION.matcher(version == null ? "" : version);
        return m.find() ? m.group(1) + "." + m.group(2) : "0.0";
    }

    private static void samples(Worksheet ws, SampleCalls calls) {
        String[] fixed = {"order", "run", "sample", "buffer"};
        for (int c = 0; c < fixed.length; c++) {
            header(ws, 0, c, fixed[c]);
            header(ws, 1, c, "");
        }
        int col = fixed.length;
        for (String analyte : calls.analytes()) {
            header(ws, 0, col, analyte);
            for (int k = 1; k < SAMPLE_MEASURES.size(); k++) {
                header(ws, 0, col + k, "");
            }
            ws.range(0, col, 0, col + SAMPLE_MEASURES.size() - 1).merge();
            for (int k = 0; k < SAMPLE_MEASURES.size(); k++) {
                header(ws, 1, col + k, SAMPLE_MEASURES.get(k));
                ws.width(col + k, NUMBER_WIDTH);
            }
            col += SAMPLE_MEASURES.size();
        }
        int r = 2;
        for (SampleCalls.RunRow row : calls.runs()) {
            ws.value(r, 0, row.order());
            ws.value(r, 1, row.run().spec().name());
            text(ws, r, 2, row.run().spec().sample());
            text(ws, r, 3, row.run().spec().conditions().buffer());
            int c = fixed.length;
            for (SampleCalls.Call call : row.calls()) {
                ws.value(r, c, call.outcome().label());
                number(ws, r, c + 1, call.confidence());
                number(ws, r, c + 2, call.correctedArea());
                number(ws, r, c + 3, call.mobility());
                c += SAMPLE_MEASURES.size();
            }
            r++;
        }
        ws.width(1, NAME_WIDTH);
        ws.width(2, NAME_WIDTH);
        ws.freezePane(2, 2);
    }

    private static void peaks(Worksheet ws, List<RunResult> runs) {
        List<String> columns = PeakRows.COLUMNS;
        for (int c = 0; c < columns.size(); c++) {
            header(ws, 0, c, PeakTableColumn.values()[c].label());
            ws.width(c, NUMBER_WIDTH);
        }
        int r = 1;
        for (List<PeakRows.Cell> row : PeakRows.rows(runs)) {
            for (int c = 0; c < row.size(); c++) {
                PeakRows.Cell cell = row.get(c);
                if (cell.empty()) {
                    continue;
                }
                if (cell.numeric()) {
                    // the number the CSV shows, parsed back: both outputs carry the same value
                    ws.value(r, c, Double.parseDouble(cell.text()));
                } else {
                    ws.value(r, c, cell.text());
                }
            }
            r++;
        }
        ws.width(0, NAME_WIDTH);
        ws.freezePane(1, 1);
    }

    private static void analytes(Worksheet ws, List<AnalyteStats> stats) {
        String[] headers = {"analyte", "buffer", "runs looked for", "runs identified", "runs ambiguous",
            "runs found (identified or ambiguous)", "mean mobility (" + MOBILITY_UNIT + ")",
            "mobility SD (" + MOBILITY_UNIT + ")",
            "mean mobility before scale correction (" + MOBILITY_UNIT + ")",
            "SD before scale correction (" + MOBILITY_UNIT + ")",
            "drift before scale correction (" + MOBILITY_UNIT + " per run)",
            "drift SD (" + MOBILITY_UNIT + " per run)", "mean corrected area A/t (signal)",
            "corrected area RSD (%)"};
        headerRow(ws, headers);
        int r = 1;
        for (AnalyteStats s : stats) {
            ws.value(r, 0, s.analyte());
            text(ws, r, 1, s.buffer());
            ws.value(r, 2, s.runsLookedFor());
            ws.value(r, 3, s.runsIdentified());
            ws.value(r, 4, s.runsAmbiguous());
            ws.value(r, 5, s.runsCalled());
            number(ws, r, 6, s.meanMobility());
            number(ws, r, 7, s.mobilitySd());
            number(ws, r, 8, s.meanUncorrected());
            number(ws, r, 9, s.uncorrectedSd());
            number(ws, r, 10, s.driftPerRun());
            number(ws, r, 11, s.driftSd());
            number(ws, r, 12, s.meanCorrectedArea());
            number(ws, r, 13, s.correctedAreaRsd());
            r++;
        }
        ws.freezePane(1, 1);
    }

    private static void unknowns(Worksheet ws, List<RecurringUnknowns.Group> groups) {
        String[] headers = {"unknown", "buffer", "runs seen in", "runs in buffer", "mean mobility (" + MOBILITY_UNIT + ")",
            "mobility SD (" + MOBILITY_UNIT + ")", "lowest (" + MOBILITY_UNIT + ")", "highest (" + MOBILITY_UNIT + ")",
            "mean corrected area A/t (signal)", "run", "peak", "apex time (s)", "peak mobility (" + MOBILITY_UNIT + ")",
            "grouping uncertainty (" + MOBILITY_UNIT + ")", "peak corrected area A/t (signal)"};
        headerRow(ws, headers);
        int r = 1;
        for (RecurringUnknowns.Group g : groups) {
            for (RecurringUnknowns.Member m : g.members()) {
                ws.value(r, 0, g.name());
                text(ws, r, 1, g.buffer());
                ws.value(r, 2, g.runs().size());
                ws.value(r, 3, g.runsInBuffer());
                number(ws, r, 4, g.meanMobility());
                number(ws, r, 5, g.mobilitySd());
                number(ws, r, 6, g.lowest());
                number(ws, r, 7, g.highest());
                number(ws, r, 8, g.meanCorrectedArea());
                ws.value(r, 9, m.run());
                ws.value(r, 10, m.peakNumber());
                number(ws, r, 11, m.apexTimeS());
                number(ws, r, 12, m.mobility());
                number(ws, r, 13, m.uncertainty());
                number(ws, r, 14, m.correctedArea());
                r++;
            }
        }
        if (groups.isEmpty()) {
            ws.value(1, 0, "no unassigned peak recurs in " + RecurringUnknowns.DEFAULT_MIN_RUNS
                    + " or more runs of one buffer");
        }
        ws.freezePane(1, 1);
    }

    private static void runFacts(Worksheet ws, List<RunResult> runs) {
        String[] headers = {"order", "run", "sample", "trace file", "buffer", "total length (cm)",
            "detector length (cm)", "voltage (kV)", "ramp (s)", "temperature (°C)", "detection",
            "marker window from (s)", "marker window to (s)", "mobility marker (" + MOBILITY_UNIT + ")",
            "how mobilities were set", "EOF mobility (" + MOBILITY_UNIT + ")", "scale correction",
            "scale factor a", "scale factor a SD", "scale offset b (" + MOBILITY_UNIT + ")",
            "scale offset b SD (" + MOBILITY_UNIT + ")", "library temperature factor", "noise SD (signal)",
            "analyte peaks", "identified", "ambiguous", "unassigned", "failure", "notes"};
        headerRow(ws, headers);
        int r = 1;
        for (RunResult run : runs) {
            RunConditions c = run.spec().conditions();
            ws.value(r, 0, r);
            ws.value(r, 1, run.spec().name());
            text(ws, r, 2, run.spec().sample());
            text(ws, r, 3, run.spec().traceFile() == null ? null : run.spec().traceFile().toString());
            text(ws, r, 4, c.buffer());
            number(ws, r, 5, c.totalLengthCm());
            number(ws, r, 6, c.detectorLengthCm());
            number(ws, r, 7, c.voltageKv());
            number(ws, r, 8, c.rampS());
            number(ws, r, 9, c.temperatureC());
            text(ws, r, 10, c.detection() == null ? null : c.detection().name().toLowerCase(java.util.Locale.ROOT));
            number(ws, r, 11, c.markerFromS());
            number(ws, r, 12, c.markerToS());
            number(ws, r, 13, c.refMarkerMobility());
            text(ws, r, 14, run.scaleNote());
            if (!run.failed()) {
                number(ws, r, 15, run.eofMobility());
                RunScale s = run.runScale();
                ws.value(r, 16, run.mobilityKnown() ? s.status().label() : "no mobility scale");
                if (run.mobilityKnown() && s.status() != RunScale.Status.OFF) {
                    number(ws, r, 17, s.factor());
                    number(ws, r, 18, s.factorSd());
                    number(ws, r, 19, s.offset());
                    number(ws, r, 20, s.offsetSd());
                }
                number(ws, r, 21, run.temperatureFactor());
                number(ws, r, 22, run.noiseSd());
                int[] counts = counts(run);
                for (int k = 0; k < counts.length; k++) {
                    ws.value(r, 23 + k, counts[k]);
                }
            } else {
                text(ws, r, 27, run.error().getMessage());
            }
            text(ws, r, 28, run.notes().isEmpty() ? null : String.join(" | ", run.notes()));
            r++;
        }
        ws.width(1, NAME_WIDTH);
        ws.width(14, WIDE_TEXT_WIDTH);
        ws.freezePane(2, 1);
    }

    /** Analyte peaks, identified, ambiguous, unassigned. */
    private static int[] counts(RunResult run) {
        int[] n = new int[4];
        for (PeakResult pr : run.peaks()) {
            if (pr.role() != PeakRole.ANALYTE) {
                continue;
            }
            n[0]++;
            PeakTableStatus status = PeakRows.statusOf(pr);
            if (status == PeakTableStatus.IDENTIFIED) {
                n[1]++;
            } else if (status == PeakTableStatus.AMBIGUOUS) {
                n[2]++;
            } else {
                n[3]++;
            }
        }
        return n;
    }

    private static void library(Worksheet ws, Library library) {
        String[] headers = {"analyte", "buffer", "mobility (" + MOBILITY_UNIT + ")", "SD (" + MOBILITY_UNIT + ")", "n",
            "charge", "fixed window half-width (" + MOBILITY_UNIT + ")", "pKa", "limiting mobilities (" + MOBILITY_UNIT + ")",
            "pH", "ionic strength (mM)", "temperature (°C)", "internal standard",
            "between-session SD (" + MOBILITY_UNIT + ")", "source"};
        headerRow(ws, headers);
        int r = 1;
        for (LibraryEntry e : library.entries()) {
            ws.value(r, 0, e.name());
            text(ws, r, 1, e.buffer());
            number(ws, r, 2, e.mobility());
            number(ws, r, 3, e.mobilitySd());
            if (e.n() > 0) {
                ws.value(r, 4, e.n());
            }
            if (e.charge() != 0) {
                ws.value(r, 5, e.charge());
            }
            number(ws, r, 6, e.tolerance());
            text(ws, r, 7, joined(e.pKa()));
            text(ws, r, 8, joined(e.limitingMobilities()));
            number(ws, r, 9, e.pH());
            number(ws, r, 10, e.ionicStrengthMm());
            number(ws, r, 11, e.temperatureC());
            ws.value(r, 12, e.internalStandard() ? "yes" : "no");
            number(ws, r, 13, e.sessionSd());
            text(ws, r, 14, e.source());
            r++;
        }
        ws.width(14, WIDE_TEXT_WIDTH);
        ws.freezePane(1, 1);
    }

    private static void about(Worksheet ws, Library library, Options options, int runs) {
        headerRow(ws, new String[] {"item", "value"});
        String[][] rows = {
            {"program", "Mobident " + (options.version() == null ? "" : options.version())},
            {"made", options.timestamp()},
            {"library file", library.sourceFile()},
            {"runs", Integer.toString(runs)},
            {"mobility unit", MOBILITY_UNIT + ", signed: cations positive, anions negative"},
            {"caution", RunSummaryText.CAUTION}};
        for (int i = 0; i < rows.length; i++) {
            ws.value(i + 1, 0, rows[i][0]);
            text(ws, i + 1, 1, rows[i][1]);
        }
        ws.width(0, NAME_WIDTH);
        ws.width(1, WIDE_TEXT_WIDTH * 2);
        ws.freezePane(0, 1);
    }

    private static String joined(List<Double> values) {
        return values.isEmpty() ? null
                : values.stream()
                        .map(v -> NumberText.significant(v, Numbers.LIBRARY_DIGITS, null))
                        .collect(Collectors.joining(" "));
    }

    private static void headerRow(Worksheet ws, String[] headers) {
        for (int c = 0; c < headers.length; c++) {
            header(ws, 0, c, headers[c]);
            if (ws.value(0, c) != null) {
                ws.width(c, Math.max(NUMBER_WIDTH, Math.min(WIDE_TEXT_WIDTH, headers[c].length() * 0.6)));
            }
        }
    }

    private static void header(Worksheet ws, int r, int c, String text) {
        ws.value(r, c, text);
        ws.style(r, c).bold().fillColor(HEADER_FILL).wrapText(true).set();
    }

    private static void text(Worksheet ws, int r, int c, String text) {
        if (text != null && !text.isEmpty()) {
            ws.value(r, c, text);
        }
    }

    /** A finite number as a numeric cell; anything else leaves the cell empty. */
    private static void number(Worksheet ws, int r, int c, double v) {
        if (Double.isFinite(v)) {
            ws.value(r, c, v);
        }
    }
}
