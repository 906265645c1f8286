package org.mobident.summary;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * One analyte over a batch, per buffer: in how many runs it was looked for and called, the mean
 * and SD of its mobility, and its drift over the batch.
 *
 * <p>The drift is the ordinary least-squares slope of the peak's mobility before the run's scale
 * correction (at the library temperature) against the run's position in the batch, with the
 * slope's standard error s/√Sxx (n − 2 degrees of freedom; unknown below three runs). It is
 * measured before the correction because the correction is what absorbs a drift: a slope that is
 * clearly not zero says the EOF, the temperature or the buffer changed through the day.
 *
 * @param analyte          the library name
 * @param buffer           the runs' buffer label (null when the runs name none)
 * @param runsLookedFor    processed runs with a mobility scale whose library has the analyte
 * @param runsIdentified   runs in which it was identified
 * @param runsAmbiguous    runs in which it was the most likely but ambiguous call
 * @param meanMobility     mean of the called peaks' compared mobilities, 1e-9 m²/(V s) (NaN when none)
 * @param mobilitySd       their sample SD (NaN below two)
 * @param meanUncorrected  mean mobility before the scale correction, at the library temperature (NaN when none)
 * @param uncorrectedSd    its sample SD (NaN below two)
 * @param driftPerRun      slope of the uncorrected mobility against run order, 1e-9 m²/(V s) per run (NaN below two)
 * @param driftSd          the slope's standard error (NaN below three)
 * @param meanCorrectedArea mean time-corrected area of the called peaks (NaN when none)
 * @param correctedAreaRsd relative SD of that area, in % (NaN below two)
 */
public record AnalyteStats(String analyte, String buffer, int runsLookedFor, int runsIdentified, int runsAmbiguous,
                           double meanMobility, double mobilitySd, double meanUncorrected, double uncorrectedSd,
                           double driftPerRun, double driftSd, double meanCorrectedArea, double correctedAreaRsd) {

    /** Runs in which it was called, identified or ambiguous. */
    public int runsCalled() {
        return runsIdentified + runsAmbiguous;
    }

    /** Statistics of every analyte in every buffer of the table, in analyte order then buffer order. */
    public static List<AnalyteStats> of(SampleCalls table) {
        List<AnalyteStats> out = new ArrayList<>();
        for (int a = 0; a < table.analytes().size(); a++) {
            Map<String, List<SampleCalls.RunRow>> byBuffer = new LinkedHashMap<>();
            Map<String, String> labels = new LinkedHashMap<>();
            for (SampleCalls.RunRow row : table.runs()) {
                SampleCalls.Outcome o = row.calls().get(a).outcome();
                if (o == SampleCalls.Outcome.IDENTIFIED || o == SampleCalls.Outcome.AMBIGUOUS
                        || o == SampleCalls.Outcome.NOT_FOUND) {
                    String label = row.run().spec().conditions().buffer();
                    String key = bufferKey(label);
                    byBuffer.computeIfAbsent(key, k -> new ArrayList<>()).add(row);
                    labels.putIfAbsent(key, label == null ? null : label.trim());
                }
            }
            for (Map.Entry<String, List<SampleCalls.RunRow>> e : byBuffer.entrySet()) {
                out.add(statsOf(table.analytes().get(a), labels.get(e.getKey()), a, e.getValue()));
            }
        }
        return out;
    }

    /** Buffer labels are grouped without regard to case or surrounding spaces. */
    static String bufferKey(String label) {
        return label == null ? "" : label.trim().toLowerCase(Locale.ROOT);
    }

    private static AnalyteStats statsOf(String name, String buffer, int column, List<SampleCalls.RunRow> rows) {
        int identified = 0;
        int ambiguous = 0;
        List<Double> mobility = new ArrayList<>();
        List<Double> uncorrected = new ArrayList<>();
        List<Double> order = new ArrayList<>();
        List<Double> area = new ArrayList<>();
        for (SampleCalls.RunRow row : rows) {
            SampleCalls.Call c = row.calls().get(column);
            if (!c.outcome().called()) {
                continue;
            }
            if (c.outcome() == SampleCalls.Outcome.IDENTIFIED) {
                identified++;
            } else {
                ambiguous++;
            }
            addIfFinite(mobility, c.mobility());
            addIfFinite(area, c.correctedArea());
            if (Double.isFinite(c.uncorrectedMobility())) {
                uncorrected.add(c.uncorrectedMobility());
                order.add((double) row.order());
            }
        }
        double[] line = Stats.slope(order, uncorrected);
        double meanArea = Stats.mean(area);
        double areaSd = Stats.sd(area);
        double rsd = meanArea != 0 && Double.isFinite(areaSd) ? 100.0 * areaSd / Math.abs(meanArea) : Double.NaN;
        return new AnalyteStats(name, buffer, rows.size(), identified, ambiguous, Stats.mean(mobility),
                Stats.sd(mobility), Stats.mean(uncorrected), Stats.sd(uncorrected), line[0], line[1], meanArea, rsd);
    }

    private static void addIfFinite(List<Double> values, double v) {
        if (Double.isFinite(v)) {
            values.add(v);
        }
    }
}
