package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.mobident.library.Library;
import org.mobident.library.LibraryCsv;
import org.mobident.pipeline.Identifier;
import org.mobident.recheck.PeakTableReader;
import org.mobident.recheck.PeakTableRow;
import org.mobident.report.plot.PlotFixtures;
import org.mobident.result.Candidate;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.settings.IdentifySettings;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.RunSheetReader;

/**
 * The peak table written by {@link PeakTableCsv} and read back by {@link PeakTableReader} gives
 * every column of {@link PeakTableColumn} its value again. The results are real: the demo runs
 * identified by the engine, plus a run that failed and a run without peaks. The check values are
 * the engine's own values (the source is what was written), allowed to differ by half a unit in
 * the last place the column's format writes.
 */
class PeakTableRoundTripTest {

    private static final Path DEMO = Path.of("..", "demo-data");

    @Test
    void everyColumnReadsBackAsWritten() throws Exception {
        List<RunResult> runs = demoResults();
        StringWriter csv = new StringWriter();
        PeakTableCsv.write(runs, csv);
        List<PeakTableRow> rows = PeakTableReader.read(new StringReader(csv.toString()), "peaks.csv");

        Set<PeakTableColumn> filled = EnumSet.noneOf(PeakTableColumn.class);
        int i = 0;
        for (RunResult run : runs) {
            List<PeakResult> peaks = run.failed() ? List.of() : run.peaks();
            if (peaks.isEmpty()) {
                PeakTableRow row = rows.get(i++);
                for (PeakTableColumn c : PeakTableColumn.values()) {
                    check(c, emptyRowValue(c, run), row, run.spec().name() + " (single row)", filled);
                }
                continue;
            }
            for (int k = 0; k < peaks.size(); k++) {
                PeakTableRow row = rows.get(i++);
                for (PeakTableColumn c : PeakTableColumn.values()) {
                    check(c, value(c, run, k + 1, peaks.get(k)), row, run.spec().name() + " peak " + (k + 1),
                            filled);
                }
            }
        }
        assertEquals(rows.size(), i, "one row per peak, one for a run without peaks");
        assertEquals(EnumSet.allOf(PeakTableColumn.class), filled, "every column carries a value somewhere");
    }

    @Test
    void bothWritersFollowTheSchema() throws Exception {
        List<RunResult> runs = demoResults();
        StringWriter csv = new StringWriter();
        PeakTableCsv.write(runs, csv);
        assertEquals(String.join(",", PeakTableColumn.headers()), csv.toString().lines().findFirst().orElseThrow());

        StringWriter json = new StringWriter();
        PeakTableJson.write(runs, json);
        String peakObject = json.toString().lines().filter(l -> l.strip().startsWith("{\"peak\": "))
                .findFirst().orElseThrow();
        List<String> keys = new ArrayList<>();
        for (PeakTableColumn c : PeakTableColumn.values()) {
            if (c.scope() == PeakTableColumn.Scope.PEAK) {
                keys.add(c.header());
            }
        }
        int at = -1;
        for (String key : keys) {
            int next = peakObject.indexOf("\"" + key + "\": ", at + 1);
            assertTrue(next > at, "peak object has '" + key + "' in schema order: " + peakObject);
            at = next;
        }
        for (PeakTableColumn c : PeakTableColumn.runValues()) {
            assertTrue(json.toString().contains("\"" + c.header() + "\": "), c.header() + " stated for the run");
        }
    }

    /** The demo runs identified by the engine, a failed run and a run whose trace holds no peak. */
    static List<RunResult> demoResults() throws Exception {
        Library library = LibraryCsv.read(DEMO.resolve("library.csv"));
        Identifier identifier = new Identifier(library, IdentifySettings.defaults().withThreads(1));
        List<RunResult> runs = new ArrayList<>(identifier.identifyAll(
                RunSheetReader.read(DEMO.resolve("runs.csv"), RunConditions.EMPTY).runs()));
        runs.add(PlotFixtures.failed("=broken", "not a number"));
        RunSpec flat = RunSheetReader.single(DEMO.resolve("spring-01.csv"), RunConditions.EMPTY);
        double[] t = new double[2000];
        double[] y = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            t[k] = 0.5 * k;
        }
        runs.add(identifier.identify(new RunSpec("flat", flat.traceFile(), runs.get(0).spec().conditions(),
                "test", 0, "a flat line"), new Trace("flat", "flat.csv", t, y)));
        assertTrue(runs.get(runs.size() - 1).peaks().isEmpty(), "the flat run finds no peak");
        return runs;
    }

    /** What the engine says a peak's row holds in column {@code c}: a String, a Double, or null. */
    private static Object value(PeakTableColumn c, RunResult run, int number, PeakResult pr) {
        Peak p = pr.peak();
        PeakMatch m = pr.match();
        boolean analyte = pr.role() == PeakRole.ANALYTE;
        boolean matched = analyte && Double.isFinite(pr.mobility());
        RunScale s = run.runScale();
        boolean scaled = run.mobilityKnown() && s.status() != RunScale.Status.OFF;
        return switch (c) {
            case RUN -> run.spec().name();
            case SAMPLE -> run.spec().sample();
            case PEAK -> (double) number;
            case ROLE -> pr.role().label();
            case APEX_TIME_S -> p.apexTimeS();
            case APEX_TIME_SD_S -> p.apexTimeSdS();
            case START_S -> p.startTimeS();
            case END_S -> p.endTimeS();
            case HEIGHT -> p.height();
            case AREA -> p.area();
            case CORRECTED_AREA -> p.correctedArea();
            case WIDTH_HALF_S -> p.widthHalfS();
            case PLATES -> p.plates();
            case RESOLUTION -> p.resolution();
            case SIGNAL_TO_NOISE -> p.signalToNoise();
            case DIRECTION -> p.dip() ? "dip" : "rise";
            case MOBILITY -> pr.mobility();
            case MOBILITY_SD -> pr.mobilitySd();
            case MOBILITY_AT_LIBRARY_TEMP -> pr.mobilityAtLibraryTemp();
            case MOBILITY_CORRECTED -> pr.mobilityCorrected();
            case ASSIGNED -> matched ? m.assigned() : null;
            case CONFIDENCE -> matched ? m.confidence() : null;
            case STATUS -> analyte ? (m.status() == null ? "unassigned" : m.status().label()) : "marker";
            case RUNNER_UP -> matched ? m.runnerUp() : null;
            case RUNNER_UP_PROBABILITY -> matched && m.runnerUp() != null ? m.runnerUpProbability() : null;
            case CANDIDATES -> matched ? candidates(m.candidates()) : null;
            case CENTRE_TIME_S -> p.centreTimeS();
            case CENTRE_TIME_SD_S -> p.centreTimeSdS();
            case SN_CLASS -> p.signalToNoiseClass().label();
            case SCALE_FACTOR -> scaled ? s.factor() : null;
            case SCALE_FACTOR_SD -> scaled ? s.factorSd() : null;
            case SCALE_OFFSET -> scaled ? s.offset() : null;
            case SCALE_OFFSET_SD -> scaled ? s.offsetSd() : null;
            case NOTE -> analyte && !run.mobilityKnown() ? run.scaleNote() : null;
        };
    }

    /** The single row of a failed run or of a run without peaks: run, sample, status and note only. */
    private static Object emptyRowValue(PeakTableColumn c, RunResult run) {
        return switch (c) {
            case RUN -> run.spec().name();
            case SAMPLE -> run.spec().sample();
            case STATUS -> run.failed() ? "failed" : "no_peaks";
            case NOTE -> run.failed() ? run.error().getMessage() : "no peaks detected";
            default -> null;
        };
    }

    private static String candidates(List<Candidate> list) {
        List<String> parts = new ArrayList<>();
        for (Candidate c : list) {
            parts.add(c.name() + ":" + String.format(Locale.ROOT, "%.3f", c.probability()));
        }
        return String.join(" ", parts);
    }

    private static void check(PeakTableColumn c, Object expected, PeakTableRow row, String where,
                              Set<PeakTableColumn> filled) {
        String what = c.header() + " of " + where;
        if (!c.format().numeric()) {
            String text = (String) expected;
            assertEquals(text == null || text.isBlank() ? null : text.strip(), row.text(c), what);
            if (row.text(c) != null) {
                filled.add(c);
            }
            return;
        }
        double want = expected == null ? Double.NaN : (Double) expected;
        double got = row.number(c);
        if (!Double.isFinite(want)) {
            assertTrue(Double.isNaN(got), what + ": empty expected, got " + got);
            return;
        }
        assertNotNull(row.text(c), what + " is written");
        double allowed = c.format().halfUnit(want) * (1 + 1e-9) + Math.ulp(want);
        assertTrue(Math.abs(got - want) <= allowed, what + ": wrote " + want + ", read " + got + " (allowed ±"
                + allowed + ")");
        filled.add(c);
    }
}
