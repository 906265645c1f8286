package org.mobident.simulate;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.mobident.io.SafeFiles;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.text.NumberText;
import org.mobident.trace.Detection;
import org.mobident.trace.RunConditions;
import org.mobident.trace.Trace;

/**
 * Writes a synthetic archive of anion runs drawn from a library, for benchmarks and trials:
 * reversed polarity with a reversed EOF that drifts ±15 % between runs, indirect detection,
 * noise, drift, random subsets of the library's anions and a neutral marker in every run. The
 * run sheet names each run's marker window. Everything is invented; nothing is measured.
 */
public final class ArchiveGenerator {

    /** Capillary and method of every generated run. */
    static final double TOTAL_LENGTH_CM = 80;
    static final double DETECTOR_LENGTH_CM = 72;
    static final double VOLTAGE_KV = -20;
    static final double NOMINAL_EOF = -50;
    static final double EOF_DRIFT = 0.15;
    static final double DURATION_S = 720;

    private ArchiveGenerator() {
    }

    /**
     * Writes {@code runs} traces of {@code points} points each, and {@code runs.csv}, into {@code dir}.
     *
     * @return the run sheet written
     */
    public static Path write(Library library, int runs, int points, long seed, Path dir, boolean overwrite)
            throws IOException {
        if (runs < 1 || points < 100) {
            throw new IllegalArgumentException("need at least 1 run of 100 points");
        }
        List<LibraryEntry> anions = new ArrayList<>();
        for (LibraryEntry e : library.entries()) {
            if (e.mobility() < 0) {
                anions.add(e);
            }
        }
        if (anions.isEmpty()) {
            throw new IllegalArgumentException("the library has no anions (negative mobilities) to draw from");
        }
        // the run sheet names the buffer of the anions drawn (runs are matched against their buffer's entries)
        String buffer = anions.get(0).buffer() == null ? "" : anions.get(0).buffer().trim();
        for (LibraryEntry e : anions) {
            if (e.buffer() == null || !LibraryEntry.sameBuffer(e.buffer(), buffer)) {
                buffer = "";
            }
        }
        if (buffer.contains(",") || buffer.contains("\"")) {
            buffer = "";
        }
        Files.createDirectories(dir);
        SplittableRandom rnd = new SplittableRandom(seed);
        double hz = points / DURATION_S;
        StringBuilder sheet = new StringBuilder(
                "file,total_length_cm,detector_length_cm,voltage_kv,ramp_s,temperature_c,buffer,"
                        + "marker_from_s,marker_to_s,detection\n");
        for (int k = 1; k <= runs; k++) {
            double eof = NOMINAL_EOF * (1 + rnd.nextDouble(-EOF_DRIFT, EOF_DRIFT));
            RunConditions c = new RunConditions(TOTAL_LENGTH_CM, DETECTOR_LENGTH_CM, VOLTAGE_KV, 0, 25.0,
                    buffer.isEmpty() ? null : buffer, Double.NaN, Double.NaN, Detection.INDIRECT, Double.NaN, Double.NaN,
                    Double.NaN);
            SimulationSpec.Builder b = SimulationSpec.builder(c).eofMobility(eof).neutralMarker(1.0)
                    .samplingHz(hz).durationS(DURATION_S).noiseSd(0.01).baseline(0.5)
                    .drift(rnd.nextDouble(-5e-4, 5e-4), 0).seed(seed * 100_003 + k);
            for (LibraryEntry e : anions) {
                if (rnd.nextDouble() < 0.7) {
                    double sd = Double.isFinite(e.mobilitySd()) ? e.mobilitySd() : 0.3;
                    b.zone(e.name(), e.mobility() + 0.5 * sd * (rnd.nextDouble() * 2 - 1),
                            rnd.nextDouble(0.5, 3.0), 120_000);
                }
            }
            SimulationSpec spec = b.build();
            double markerS = TraceSimulator.apexTimeS(spec, 0.0);
            String name = String.format(Locale.ROOT, "run-%05d", k);
            Trace t = TraceSimulator.simulate(name, spec);
            TraceSimulator.writeCsv(t, dir.resolve(name + ".csv"), overwrite);
            sheet.append(String.format(Locale.ROOT, "%s.csv,%s,%s,%s,0,25,%s,%.1f,%.1f,indirect%n", name,
                    NumberText.trimmed(TOTAL_LENGTH_CM, 1, ""), NumberText.trimmed(DETECTOR_LENGTH_CM, 1, ""),
                    NumberText.trimmed(VOLTAGE_KV, 1, ""), buffer, markerS - 30, markerS + 30));
        }
        Path runSheet = dir.resolve("runs.csv");
        String text = sheet.toString();
        SafeFiles.write(runSheet, overwrite, w -> w.write(text));
        return runSheet;
    }
}
