package org.mobident.simulate;

import java.io.IOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.mobident.io.SafeFiles;
import org.mobident.text.NumberText;

/**
 * Writes a lab-day bench: standards and sample runs of the built-in invented methods with the
 * troubles of a working day, their run sheets and standards sheets, the truth tables in the
 * known-identities format, and a README. See {@link LabDayPlanner} for what is drawn.
 *
 * <p>Layout under the target folder:
 * <pre>
 * README.txt                    what the bench holds and how to use it
 * truth.csv                     truth of every sample run
 * hidden-conditions.csv         what the sheets do not say: actual temperature, EOF, noise, layout
 * standards/runs.csv            run sheet of every standards run (with a mix column)
 * standards/mixes.csv           standards sheet of every mix
 * standards/BUFFER-runs.csv     the same, one method each, to build one library per method
 * standards/BUFFER-mixes.csv
 * standards/truth.csv           truth of the standards runs
 * standards/std-*.csv|.txt      standards traces
 * samples/runs.csv              run sheet of every sample run
 * samples/BUFFER-runs.csv       the same, one method each
 * samples/BUFFER-truth.csv      truth of one method's sample runs
 * samples/lab-s*.csv|.txt       sample traces
 * </pre>
 * Every file goes through {@link SafeFiles}; unless overwriting is allowed, nothing is written when
 * any of the files already exists.
 */
public final class LabDayBench {

    /** Folder of the standards runs. */
    public static final String STANDARDS_FOLDER = "standards";
    /** Folder of the sample runs. */
    public static final String SAMPLES_FOLDER = "samples";
    /** Truth table name (in the bench folder for the samples, in the standards folder for those). */
    public static final String TRUTH_FILE = "truth.csv";
    /** Run sheet name. */
    public static final String RUN_SHEET = "runs.csv";
    /** Standards sheet name. */
    public static final String MIXES_SHEET = "mixes.csv";
    /** The bench's description. */
    public static final String README = "README.txt";
    /** What the run sheets leave unsaid. */
    public static final String HIDDEN_CONDITIONS = "hidden-conditions.csv";

    /** Columns of a known-identities table, as the shared specification names them. */
    public static final String TRUTH_HEADER = "run,kind,analyte,time_s,mobility,height_sd";
    static final String RUN_SHEET_COLUMNS = "file,total_length_cm,detector_length_cm,voltage_kv,ramp_s,"
            + "temperature_c,buffer,marker_from_s,marker_to_s,detection";

    private LabDayBench() {
    }

    /**
     * Plans a bench with the built-in methods and writes it into {@code dir} (created if needed).
     *
     * @param sampleCount   number of sample runs
     * @param overwriteHint how the caller lets a user allow overwriting (for the error message)
     * @return what was written
     * @throws FileAlreadyExistsException when a file exists and {@code overwrite} is false; nothing
     *                                    has been written then
     */
    public static LabDaySummary write(int sampleCount, long seed, Path dir, boolean overwrite, String overwriteHint)
            throws IOException {
        return write(LabDayPlanner.plan(LabDayMethods.builtIn(), sampleCount, seed), dir, overwrite, overwriteHint);
    }

    /** Writes a planned bench into {@code dir}; see {@link #write(int, long, Path, boolean, String)}. */
    public static LabDaySummary write(LabDayPlan plan, Path dir, boolean overwrite, String overwriteHint)
            throws IOException {
        Path standards = dir.resolve(STANDARDS_FOLDER);
        Path samples = dir.resolve(SAMPLES_FOLDER);
        LabDaySummary summary = LabDaySummary.of(plan);
        List<Output> outputs = outputs(plan, dir, summary);
        if (!overwrite) {
            for (Output o : outputs) {
                if (Files.exists(o.target())) {
                    throw new FileAlreadyExistsException(o.target().toString(), null, "exists; " + overwriteHint);
                }
            }
            for (LabDayRun r : plan.standards()) {
                refuseExisting(standards.resolve(r.fileName()), overwriteHint);
            }
            for (LabDayRun r : plan.samples()) {
                refuseExisting(samples.resolve(r.fileName()), overwriteHint);
            }
        }
        Files.createDirectories(standards);
        Files.createDirectories(samples);
        String comment = "invented trace from mobident simulate --scenario lab-day (seed " + plan.seed()
                + "); not a measurement";
        for (LabDayRun r : plan.standards()) {
            TraceSimulator.write(r.trace(), standards.resolve(r.fileName()), overwrite, r.style(), comment);
        }
        for (LabDayRun r : plan.samples()) {
            TraceSimulator.write(r.trace(), samples.resolve(r.fileName()), overwrite, r.style(), comment);
        }
        for (Output o : outputs) {
            SafeFiles.write(o.target(), overwrite, overwriteHint, w -> w.write(o.text()));
        }
        return summary;
    }

    private static void refuseExisting(Path target, String hint) throws FileAlreadyExistsException {
        if (Files.exists(target)) {
            throw new FileAlreadyExistsException(target.toString(), null, "exists; " + hint);
        }
    }

    /** A text file to write. */
    private record Output(Path target, String text) {
    }

    private static List<Output> outputs(LabDayPlan plan, Path dir, LabDaySummary summary) {
        Path standards = dir.resolve(STANDARDS_FOLDER);
        Path samples = dir.resolve(SAMPLES_FOLDER);
        String note = "# Invented bench data (mobident simulate --scenario lab-day, seed " + plan.seed()
                + "): no real samples, nothing measured.\n";
        List<Output> out = new ArrayList<>();
        out.add(new Output(standards.resolve(RUN_SHEET), note + runSheet(plan.standards(), true)));
        out.add(new Output(standards.resolve(MIXES_SHEET), note + mixesSheet(plan.methods())));
        out.add(new Output(standards.resolve(TRUTH_FILE), note + truthTable(plan.standards())));
        out.add(new Output(samples.resolve(RUN_SHEET), note + runSheet(plan.samples(), false)));
        out.add(new Output(dir.resolve(TRUTH_FILE), note + truthTable(plan.samples())));
        for (LabDayMethod m : plan.methods()) {
            out.add(new Output(standards.resolve(m.buffer() + "-runs.csv"), note + runSheet(plan.standards(m), true)));
            out.add(new Output(standards.resolve(m.buffer() + "-mixes.csv"), note + mixesSheet(List.of(m))));
            out.add(new Output(samples.resolve(m.buffer() + "-runs.csv"), note + runSheet(plan.samples(m), false)));
            out.add(new Output(samples.resolve(m.buffer() + "-truth.csv"), note + truthTable(plan.samples(m))));
        }
        out.add(new Output(dir.resolve(HIDDEN_CONDITIONS), note + hiddenConditions(plan)));
        out.add(new Output(dir.resolve(README), LabDayReadme.text(plan, summary, dir)));
        return out;
    }

    /** A run sheet: the standard columns, {@code mix} for standards runs, {@code sample} text. */
    static String runSheet(List<LabDayRun> runs, boolean withMix) {
        StringBuilder sb = new StringBuilder(RUN_SHEET_COLUMNS).append(withMix ? ",mix" : "").append(",sample\n");
        for (LabDayRun r : runs) {
            var c = r.spec().conditions();
            sb.append(r.fileName()).append(',');
            sb.append(NumberText.trimmed(c.totalLengthCm(), 1, "")).append(',');
            sb.append(NumberText.trimmed(c.detectorLengthCm(), 1, "")).append(',');
            sb.append(NumberText.trimmed(c.voltageKv(), 1, "")).append(',');
            sb.append(NumberText.trimmed(c.rampS(), 1, "")).append(',');
            sb.append(NumberText.trimmed(c.temperatureC(), 2, "")).append(',');
            sb.append(c.buffer()).append(',');
            if (c.hasMarkerWindow()) {
                sb.append(NumberText.trimmed(c.markerFromS(), 1, "")).append(',');
                sb.append(NumberText.trimmed(c.markerToS(), 1, ""));
            } else {
                sb.append(',');
            }
            sb.append(',').append(c.detectionOrDirect().label());
            if (withMix) {
                sb.append(',').append(r.mix());
            }
            sb.append(',').append(r.sampleText()).append('\n');
        }
        return sb.toString();
    }

    /** A standards sheet: every mix with its analytes and their mobility rounded to whole units. */
    static String mixesSheet(List<LabDayMethod> methods) {
        StringBuilder sb = new StringBuilder("mix,analyte,approx_mobility\n");
        for (LabDayMethod m : methods) {
            List<List<PanelAnalyte>> mixes = m.mixes();
            for (int k = 1; k <= mixes.size(); k++) {
                for (PanelAnalyte a : mixes.get(k - 1)) {
                    sb.append(m.mixName(k)).append(',').append(a.name()).append(',')
                            .append(Math.round(a.mobility())).append('\n');
                }
            }
        }
        return sb.toString();
    }

    /** A known-identities table of the given runs. */
    static String truthTable(List<LabDayRun> runs) {
        StringBuilder sb = new StringBuilder(TRUTH_HEADER).append('\n');
        for (LabDayRun r : runs) {
            for (TruthRow t : r.truth()) {
                sb.append(t.run()).append(',').append(t.kind().label()).append(',')
                        .append(t.analyte() == null ? "" : t.analyte()).append(',')
                        .append(NumberText.fixed(t.timeS(), 3, "")).append(',')
                        .append(NumberText.fixed(t.mobility(), 2, "")).append(',')
                        .append(NumberText.fixed(t.heightSd(), 1, "")).append('\n');
            }
        }
        return sb.toString();
    }

    /** What the run sheets do not say, one row per run. */
    static String hiddenConditions(LabDayPlan plan) {
        StringBuilder sb = new StringBuilder("run,set,buffer,actual_temperature_c,eof_mobility_25c,eof_mobility_actual,"
                + "noise_sd,noise_lag1_correlation,sampling_hz,file_layout,weak_marker,tall_foreign_near_marker,"
                + "marker_window_given\n");
        List<LabDayRun> all = new ArrayList<>(plan.standards());
        all.addAll(plan.samples());
        for (LabDayRun r : all) {
            SimulationSpec s = r.spec();
            sb.append(r.name()).append(',').append(r.isStandard() ? "standards" : "samples").append(',')
                    .append(r.method().buffer()).append(',')
                    .append(NumberText.fixed(r.actualTemperatureC(), 2, "")).append(',')
                    .append(NumberText.fixed(r.eofMobilityAt25C(), 2, "")).append(',')
                    .append(NumberText.fixed(s.eofMobility(), 3, "")).append(',')
                    .append(NumberText.fixed(s.noiseSd(), 5, "")).append(',')
                    .append(NumberText.fixed(s.noiseCorrelation(), 2, "")).append(',');
            sb.append(NumberText.trimmed(s.samplingHz(), 1, "")).append(',')
                    .append(LabDayPlanner.FILE_STYLE_CODES.get(LabDayPlanner.FILE_STYLES.indexOf(r.style())))
                    .append(',')
                    .append(r.weakMarker() ? "yes" : "no").append(',')
                    .append(r.tallForeignNearMarker() ? "yes" : "no").append(',')
                    .append(r.hasMarkerWindow() ? "yes" : "no").append('\n');
        }
        return sb.toString();
    }
}
