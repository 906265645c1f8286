package org.mobident.pipeline;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.matching.Matcher;
import org.mobident.matching.MobilityAdjuster;
import org.mobident.matching.PeakMatch;
import org.mobident.mobility.MobilityMath;
import org.mobident.mobility.MobilityScale;
import org.mobident.signal.Peak;
import org.mobident.signal.PeakDetector;
import org.mobident.signal.TraceAnalysis;
import org.mobident.trace.RunConditions;
import org.mobident.trace.RunSpec;
import org.mobident.trace.Trace;
import org.mobident.trace.io.TraceFiles;

/**
 * Identifies the peaks of runs against a library: trace → peaks → markers → mobilities →
 * matches. Stateless apart from its immutable configuration, so one instance may serve many
 * threads. A run that cannot be processed becomes a failed {@link RunResult}; the others go on.
 */
public final class Identifier {

    /** Temperatures closer than this are treated as equal (no viscosity conversion), K. */
    static final double SAME_TEMPERATURE_K = 0.05;

    private final Library library;
    private final IdentifySettings settings;
    private final MarkerLocator markers;

    public Identifier(Library library, IdentifySettings settings) {
        this.library = Objects.requireNonNull(library, "library");
        this.settings = Objects.requireNonNull(settings, "settings");
        this.markers = new MarkerLocator(library, settings.matchSettings());
    }

    /**
     * Processes the runs, several at once (at most {@code settings.threads()} traces in memory),
     * and returns their results in the order given.
     */
    public List<RunResult> identifyAll(List<RunSpec> runs) {
        if (runs.isEmpty()) {
            return List.of();
        }
        int threads = Math.min(settings.threads(), runs.size());
        if (threads == 1) {
            List<RunResult> out = new ArrayList<>(runs.size());
            for (RunSpec r : runs) {
                out.add(identify(r));
            }
            return out;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "mobident-run");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<RunResult>> futures = new ArrayList<>(runs.size());
            for (RunSpec r : runs) {
                futures.add(pool.submit(() -> identify(r)));
            }
            List<RunResult> out = new ArrayList<>(runs.size());
            for (int i = 0; i < futures.size(); i++) {
                out.add(await(futures.get(i), runs.get(i)));
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    private static RunResult await(Future<RunResult> f, RunSpec spec) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return RunResult.failure(spec, new InputException(spec.traceFile().toString(), 0, null,
                    "processing was interrupted"));
        } catch (ExecutionException e) {
            return RunResult.failure(spec, unexpected(spec, e.getCause()));
        }
    }

    private static InputException unexpected(RunSpec spec, Throwable t) {
        return new InputException(spec.traceFile().toString(), 0, null,
                "could not be processed (" + t + "); please report this with the file", t);
    }

    /** Reads the run's trace and identifies its peaks; never throws for bad user data. */
    public RunResult identify(RunSpec run) {
        try {
            Trace trace = TraceFiles.read(run.traceFile(), settings.readOptions());
            return identify(run, trace);
        } catch (InputException e) {
            return RunResult.failure(run, e);
        } catch (RuntimeException e) {
            return RunResult.failure(run, unexpected(run, e));
        }
    }

    /** Identifies the peaks of an already loaded trace. */
    public RunResult identify(RunSpec run, Trace trace) {
        RunConditions c = run.conditions();
        String geometry = c.geometryProblem();
        if (geometry != null) {
            return RunResult.failure(run, new InputException(run.origin(), run.originLine(), "conditions", geometry));
        }
        if (c.hasMarkerWindow() && (c.markerToS() < trace.startTimeS() || c.markerFromS() > trace.endTimeS())) {
            return RunResult.failure(run, new InputException(run.origin(), run.originLine(), "marker_from_s",
                    String.format(Locale.ROOT, "marker window %.1f–%.1f s lies outside the run (%.1f–%.1f s)",
                            c.markerFromS(), c.markerToS(), trace.startTimeS(), trace.endTimeS())));
        }
        if (c.hasRefMarker() && !(c.refMarkerFromS() < c.refMarkerToS())) {
            return RunResult.failure(run, new InputException(run.origin(), run.originLine(), "ref_marker_from_s",
                    "a charged marker of known mobility needs a window ref_marker_from_s < ref_marker_to_s"));
        }
        if (!c.hasGeometry() && !c.hasRefMarker()) {
            String missing = Double.isNaN(c.totalLengthCm()) ? "total_length_cm"
                    : Double.isNaN(c.detectorLengthCm()) ? "detector_length_cm" : "voltage_kv";
            return RunResult.failure(run, new InputException(run.origin(), run.originLine(), missing,
                    "lengths and voltage are needed unless a charged marker of known mobility is given"));
        }
        TraceAnalysis analysis = PeakDetector.analyse(trace, c.detectionOrDirect(), settings.peakSettings());
        List<Peak> peaks = analysis.peaks();
        List<String> notes = new ArrayList<>();
        MarkerLocator.Choice choice = markers.locate(run, peaks, adjusterFor(c, notes));
        if (choice.scale() == null) {
            List<PeakResult> rows = new ArrayList<>();
            for (Peak p : peaks) {
                rows.add(new PeakResult(p, PeakRole.ANALYTE, Double.NaN, Double.NaN, Double.NaN, PeakMatch.none()));
            }
            notes.add(choice.note());
            return new RunResult(run, null, choice.note(), Double.NaN, null, rows, notes, analysis.noiseSd());
        }
        MobilityScale scale = choice.scale();
        MobilityAdjuster adjuster = adjusterFor(c, notes);
        List<Integer> analyteIdx = new ArrayList<>();
        for (int i = 0; i < peaks.size(); i++) {
            if (i != choice.neutralIndex() && i != choice.refIndex()) {
                analyteIdx.add(i);
            }
        }
        double[] mob = new double[analyteIdx.size()];
        double[] sd = new double[analyteIdx.size()];
        for (int k = 0; k < mob.length; k++) {
            Peak p = peaks.get(analyteIdx.get(k));
            mob[k] = scale.mobility(p.apexTimeS());
            sd[k] = scale.mobilitySd(p.apexTimeS(), p.apexTimeSdS());
        }
        List<PeakMatch> matches = Matcher.match(mob, sd, library, settings.matchSettings(), adjuster);
        double libraryTempC = libraryTemperatureC();
        double runTempC = c.temperatureC();
        List<PeakResult> rows = new ArrayList<>(peaks.size());
        int k = 0;
        for (int i = 0; i < peaks.size(); i++) {
            Peak p = peaks.get(i);
            double m = scale.mobility(p.apexTimeS());
            double s = scale.mobilitySd(p.apexTimeS(), p.apexTimeSdS());
            double atLib = convert(m, runTempC, libraryTempC);
            if (i == choice.neutralIndex()) {
                rows.add(new PeakResult(p, PeakRole.NEUTRAL_MARKER, m, s, atLib, PeakMatch.none()));
            } else if (i == choice.refIndex()) {
                rows.add(new PeakResult(p, PeakRole.MOBILITY_MARKER, m, s, atLib, PeakMatch.none()));
            } else {
                rows.add(new PeakResult(p, PeakRole.ANALYTE, m, s, atLib, matches.get(k)));
                k++;
            }
        }
        if (!Double.isNaN(runTempC) && Math.abs(runTempC - libraryTempC) >= SAME_TEMPERATURE_K) {
            notes.add(String.format(Locale.ROOT,
                    "run at %.1f °C, library at %.1f °C: mobilities compared at the library temperature "
                            + "(scaled by the viscosity of water, IAPWS 2008; factor %.4f)",
                    runTempC, libraryTempC, MobilityMath.atTemperature(1.0, runTempC, libraryTempC)));
        } else if (Double.isNaN(runTempC)) {
            notes.add("run temperature not given: assumed equal to the library temperature");
        }
        if (choice.note() != null && !choice.note().isEmpty()) {
            notes.add(0, choice.note());
        }
        return new RunResult(run, null, scale.describe(), scale.eofMobility(), scale, rows, notes, analysis.noiseSd());
    }

    /** The temperature most library entries refer to (25 °C when none states one). */
    double libraryTemperatureC() {
        return library.entries().stream()
                .map(LibraryEntry::temperatureOrDefaultC)
                .collect(java.util.stream.Collectors.groupingBy(t -> t, java.util.stream.Collectors.counting()))
                .entrySet().stream()
                .max(Comparator.comparingLong(java.util.Map.Entry<Double, Long>::getValue)
                        .thenComparing(java.util.Map.Entry::getKey))
                .map(java.util.Map.Entry::getKey)
                .orElse(LibraryEntry.DEFAULT_TEMPERATURE_C);
    }

    private static double convert(double mobility, double fromC, double toC) {
        if (Double.isNaN(mobility) || Double.isNaN(fromC) || Math.abs(fromC - toC) < SAME_TEMPERATURE_K) {
            return mobility;
        }
        return MobilityMath.atTemperature(mobility, fromC, toC);
    }

    /** Converts a run mobility to the temperature of each library entry. */
    private static MobilityAdjuster adjusterFor(RunConditions c, List<String> notes) {
        double runC = c.temperatureC();
        if (Double.isNaN(runC)) {
            return MobilityAdjuster.IDENTITY;
        }
        return (mobility, entry) -> convert(mobility, runC, entry.temperatureOrDefaultC());
    }
}
