package org.mobident.assess;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.recheck.PeakTableReader;
import org.mobident.recheck.PeakTableRow;
import org.mobident.report.PeakTableCsv;
import org.mobident.report.PeakTableStatus;
import org.mobident.result.RunResult;

/** The runs to be scored, from a peak table or from the results of an identification. */
public final class ReportedRuns {

    private static final String STATUS_FAILED = PeakTableStatus.FAILED.word();
    private static final String STATUS_NO_PEAKS = PeakTableStatus.NO_PEAKS.word();
    private static final String RESULTS_LABEL = "identification results";

    private ReportedRuns() {
    }

    /**
     * The runs of a peak table read with {@link PeakTableReader}, in order of first appearance.
     * A run counts as having a mobility scale when any of its rows carries a mobility.
     */
    public static List<ReportedRun> fromTable(List<PeakTableRow> rows) {
        Map<String, List<PeakTableRow>> byRun = new LinkedHashMap<>();
        for (PeakTableRow r : rows) {
            byRun.computeIfAbsent(r.run(), k -> new ArrayList<>()).add(r);
        }
        List<ReportedRun> runs = new ArrayList<>();
        for (Map.Entry<String, List<PeakTableRow>> e : byRun.entrySet()) {
            boolean failed = false;
            boolean mobilityKnown = false;
            List<ReportedPeak> peaks = new ArrayList<>();
            for (PeakTableRow r : e.getValue()) {
                if (STATUS_FAILED.equals(r.status())) {
                    failed = true;
                    continue;
                }
                if (STATUS_NO_PEAKS.equals(r.status()) || r.peak() < 1) {
                    continue;
                }
                mobilityKnown |= Double.isFinite(r.mobility());
                peaks.add(peak(r));
            }
            runs.add(new ReportedRun(e.getKey(), failed, mobilityKnown && !failed, failed ? List.of() : peaks));
        }
        return runs;
    }

    /**
     * The runs of an identification, scored exactly as the peak table it would write: the results go
     * through the CSV peak table writer and back through its reader, so scoring after
     * {@code identify} and scoring its table later give the same numbers.
     */
    public static List<ReportedRun> fromResults(List<RunResult> results) {
        StringWriter table = new StringWriter();
        try {
            PeakTableCsv.write(results, table);
            return fromTable(PeakTableReader.read(new StringReader(table.toString()), RESULTS_LABEL));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InputException e) {
            throw new IllegalStateException("the peak table writer and reader disagree: " + e.getMessage(), e);
        }
    }

    /**
     * The mobility compared with the truth: the scale-corrected mobility when the table has it, else
     * the mobility at the library temperature, else the mobility as measured.
     */
    static double comparedMobility(PeakTableRow r) {
        if (Double.isFinite(r.mobilityCorrected())) {
            return r.mobilityCorrected();
        }
        return Double.isFinite(r.mobilityAtLibraryTemp()) ? r.mobilityAtLibraryTemp() : r.mobility();
    }

    private static ReportedPeak peak(PeakTableRow r) {
        ReportedPeak.Status status = ReportedPeak.Status.valueOf(r.status().toUpperCase(Locale.ROOT));
        double timeS = Double.isFinite(r.centreTimeS()) ? r.centreTimeS() : r.apexTimeS();
        return new ReportedPeak(r.peak(), r.role(), timeS, r.widthHalfS(), r.signalToNoise(),
                comparedMobility(r), r.assigned(), r.confidence(), status);
    }
}
