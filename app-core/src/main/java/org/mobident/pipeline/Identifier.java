package org.mobident.pipeline;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.matching.LibraryMatcher;
import org.mobident.matching.MatchWindow;
import org.mobident.matching.MobilityAdjuster;
import org.mobident.matching.RunMatch;
import org.mobident.matching.SpreadModel;
import org.mobident.mobility.MobilityMath;
import org.mobident.mobility.NeutralMarkerScale;
import org.mobident.mobility.PhysicalBounds;
import org.mobident.result.BatchProgress;
import org.mobident.result.MatchStatus;
import org.mobident.result.MobilityScale;
import org.mobident.result.Peak;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunListener;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.settings.IdentifySettings;
import org.mobident.settings.MatchSettings;
import org.mobident.settings.PeakSettings;
import org.mobident.settings.ScalePrior;
import org.mobident.signal.ExpectedZoneProbe;
import org.mobident.signal.FlatTop;
import org.mobident.signal.PeakDetector;
import org.mobident.signal.Selection;
import org.mobident.signal.TraceAnalysis;
import org.mobident.trace.Detection;
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

    /** Lowest S/N of the targeted search for a weak marker inside its window (a modelling choice). */
    static final double MARKER_SEARCH_MIN_SN = 1.5;
    /** A zone found by the targeted marker search must be within this factor of the width a zone has
     *  at its time (the lower quartile of w½/t over the run's peaks of S/N 10 or more, times its time;
     *  zones of one run have about the same plate number, so w½ grows in proportion to t; a
     *  modelling choice). */
    static final double MARKER_SEARCH_WIDTH_FACTOR = 2.5;
    /** Least S/N of a zone in the marker window pointing the other way from the run's peaks to be
     *  taken as a marker candidate: the quantitation limit (a neutral marker is added to be seen; a
     *  modelling choice that keeps noise on the other side out of the choice). */
    static final double OTHER_WAY_MARKER_MIN_SN = org.mobident.Tolerances.QUANTITATION_LIMIT_SIGNAL_TO_NOISE;
    /** The other-way screen: noise SDs beyond the window's median (a modelling choice, well below the
     *  height of a zone at the quantitation limit). */
    static final double OTHER_WAY_SCREEN_SIGMAS = 10.0;
    /** A trace that leans the other way from its stated detection by this ratio ({@link #leansOtherWay})
     *  is analysed the other way ... */
    static final int OTHER_WAY_DETECTION_RATIO = 3;
    /** ... and read that way when it shows at least this many zones at the quantitation limit, and
     *  more than the stated way (a modelling choice: a sample run shows a few clear zones, the marker
     *  among them). */
    static final int MIN_STRONG_ZONES_TO_TRUST_DETECTION = 3;
    /** Noise SDs beyond the median from which a sample weighs in {@link #leansOtherWay}. */
    static final double LEAN_SIGMAS = 5.0;
    /** Blocks per trace for the medians of {@link #leansOtherWay}, and their least size. */
    static final int LEAN_BLOCKS = 40;
    static final int LEAN_MIN_BLOCK_SAMPLES = 50;
    /** Samples per block from which its median is taken (a level, not a statistic to report). */
    static final int LEAN_MEDIAN_SAMPLES = 101;
    /** Pairs of these many of the tallest peaks with every library entry vote for the marker time. */
    static final int MARKER_VOTE_PEAKS = 12;
    /** Votes within this relative distance of a common centre agree (a modelling choice: peak times
     *  and library mobilities agree to a few tenths of a per cent once the run's scale factor is
     *  right). */
    static final double MARKER_VOTE_TOLERANCE = 0.004;
    /** The run's mobility scale factor a is searched over 1 ± this (about ±2.5 K of temperature)... */
    static final double MARKER_VOTE_FACTOR_REACH = 0.06;
    /** ... in steps of this. */
    static final double MARKER_VOTE_FACTOR_STEP = 0.004;
    /** At least this many different peaks must agree on the marker time. */
    static final int MARKER_VOTE_MIN_PEAKS = 3;
    /** Half-width of the search around a predicted marker time, relative. */
    static final double MARKER_SEARCH_REACH = 0.05;
    /** The window must hold this many samples for the targeted search. */
    static final int MARKER_SEARCH_MIN_POINTS = 50;

    /** Temperatures closer than this are treated as equal (no viscosity conversion), K. */
    static final double SAME_TEMPERATURE_K = 0.05;
    /** Relative time step of the numerical slope dμ/dt of a run's scale at an expected zone. */
    static final double EXPECTED_SLOPE_STEP = 1e-4;
    /** The remark on a peak whose mobility no ion in water reaches. */
    static final String BEYOND_ANY_ION = String.format(Locale.ROOT, "mobility beyond any ion's (±%.0f units): a "
            + "disturbance of the run (the injection, the voltage coming on, a bubble), not an ion's zone",
            PhysicalBounds.MAX_ION_MOBILITY);

    /** The remark on a peak found by the second look where the library expected a zone. */
    static final String FOUND_WHERE_EXPECTED = "found by a fitted zone where the library expects one "
            + "(hidden in a larger peak or on its flank)";

    private final Library library;
    private final IdentifySettings settings;
    /** The entries and spread model for each buffer label of the library (lower case; "" for runs without one). */
    private final Map<String, Prepared> byBuffer;

    /** A run's share of the library: the entries of its buffer and their spreads. */
    record Prepared(Library library, SpreadModel spread) {
    }

    public Identifier(Library library, IdentifySettings settings) {
        this.library = Objects.requireNonNull(library, "library");
        this.settings = Objects.requireNonNull(settings, "settings");
        Map<String, Prepared> map = new HashMap<>();
        map.put("", prepare(library, settings.matchSettings()));
        for (String label : library.bufferLabels()) {
            map.put(bufferKey(label), prepare(library.forBuffer(label), settings.matchSettings()));
        }
        this.byBuffer = Map.copyOf(map);
    }

    private static Prepared prepare(Library lib, MatchSettings s) {
        return new Prepared(lib, SpreadModel.of(lib, s));
    }

    /**
     * The key under which a run's buffer finds its entries: "" for a run without a label or a
     * library without labels (every entry applies); the label itself otherwise, so that an
     * unknown label finds nothing.
     */
    private String bufferKey(String runBuffer) {
        if (runBuffer == null || runBuffer.isBlank() || library.bufferLabels().isEmpty()) {
            return "";
        }
        return runBuffer.trim().toLowerCase(Locale.ROOT);
    }

    /**
     * Processes the runs, several at once (at most {@code settings.threads()} traces in memory),
     * and returns their results in the order given.
     *
     * <p>Two passes: the first detects every run's peaks and matches them with the settings' scale
     * prior; when a buffer's runs then show with enough of them how their scales scatter
     * ({@link BatchScalePrior}), the second matches that buffer's runs again (peaks are kept, traces
     * are not read twice) with the prior learned from the batch, so that runs with few peaks borrow
     * the certainty of the others.
     */
    public List<RunResult> identifyAll(List<RunSpec> runs) {
        return identifyAll(runs, BatchProgress.NONE);
    }

    /** As {@link #identifyAll(List)}, telling {@code progress} as runs are done. */
    public List<RunResult> identifyAll(List<RunSpec> runs, BatchProgress progress) {
        return identifyAll(runs, progress, RunListener.NONE);
    }

    /** As {@link #identifyAll(List, BatchProgress)}, telling {@code listener} each run's result as it is known. */
    public List<RunResult> identifyAll(List<RunSpec> runs, BatchProgress progress, RunListener listener) {
        if (runs.isEmpty()) {
            return List.of();
        }
        // pass 1: each run read, detected and matched in one task, so that at most one trace per thread is held
        progress.passStarted(1, runs.size());
        List<Integer> all = java.util.stream.IntStream.range(0, runs.size()).boxed().toList();
        List<Finished> done = parallel(all, i -> told(listener, i,
                        counted(progress, 1, finishing(detect(runs.get(i)), null))),
                (i, e) -> new Finished(RunResult.failure(runs.get(i), e),
                        new Detected(runs.get(i), RunResult.failure(runs.get(i), e), List.of(), Double.NaN)));
        List<Detected> detected = new ArrayList<>(done.size());
        for (Finished f : done) {
            detected.add(f.settled());
        }
        List<RunResult> first = new ArrayList<>(done.size());
        for (Finished f : done) {
            first.add(f.result());
        }
        Map<String, BatchScalePrior.Learned> learned = new HashMap<>();
        MatchSettings ms = settings.matchSettings();
        if (ms.fitsScale()) {
            Map<String, List<RunResult>> groups = new LinkedHashMap<>();
            for (RunResult r : first) {
                if (!r.failed()) {
                    groups.computeIfAbsent(bufferKey(r.spec().conditions().buffer()), k -> new ArrayList<>()).add(r);
                }
            }
            for (Map.Entry<String, List<RunResult>> g : groups.entrySet()) {
                BatchScalePrior.learn(g.getValue(), ms.scalePrior()).ifPresent(l -> learned.put(g.getKey(), l));
            }
        }
        if (learned.isEmpty()) {
            return first;
        }
        List<Integer> again = new ArrayList<>();
        for (int i = 0; i < detected.size(); i++) {
            Detected d = detected.get(i);
            if (d.failure() == null && learned.containsKey(bufferKey(d.run().conditions().buffer()))
                    && priorMatters(first.get(i))) {
                again.add(i);
            }
        }
        progress.passStarted(2, again.size());
        List<RunResult> second = parallel(again, i -> {
                    BatchScalePrior.Learned prior = learned.get(bufferKey(detected.get(i).run().conditions().buffer()));
                    return told(listener, i, counted(progress, 2, secondPass(done.get(i), detected.get(i), prior)));
                },
                (i, e) -> first.get(i));
        List<RunResult> out = new ArrayList<>(first);
        for (int k = 0; k < again.size(); k++) {
            out.set(again.get(k), second.get(k));
        }
        return out;
    }

    /**
     * The run matched again under the batch's prior; or, when its own scale factor lies far outside
     * the batch's and its peaks say so, under the batch's prior with the settings' spread of a.
     *
     * <p>A temperature, voltage or length misstated for one run moves its scale factor a away from the
     * batch's, while its offset b still behaves like the others'. When the first pass put a more than
     * {@value #OUTSIDE_BATCH_SDS} combined SDs from the batch's centre, the run is matched a third time
     * with the batch's prior widened on a alone; the evidences of the two matches (same peaks and
     * markers) then weigh "a run like the others" against "a run whose factor is its own", the latter
     * held to {@link #BATCH_OUTLIER_SHARE} of runs beforehand. A run a kelvin off in a batch of runs
     * that agree closely is thus read with its own factor instead of being pulled to the batch's (which
     * renamed its peaks), and says so; a run that merely reads its pattern shifted by one entry, with
     * an offset the batch does not allow, stays under the batch's prior.
     */
    private RunResult secondPass(Finished own, Detected d, BatchScalePrior.Learned learned) {
        Finished batch = finishing(d, learned);
        ScalePrior prior = learned.prior();
        RunScale first = own.result().runScale();
        double wide = settings.matchSettings().scalePrior().factorSd();
        if (!first.fitted() || !(wide > prior.factorSd()) || !(Math.abs(first.factor() - prior.factorCentre())
                > OUTSIDE_BATCH_SDS * Math.hypot(prior.factorSd(), first.factorSd()))) {
            return batch.result();
        }
        BatchScalePrior.Learned ownFactor = new BatchScalePrior.Learned(prior.centredOn(prior.factorCentre(), wide,
                prior.offsetCentre(), prior.offsetSd()), learned.runs());
        Finished alone = finishing(d, ownFactor);
        double threshold = Math.log((1 - BATCH_OUTLIER_SHARE) / BATCH_OUTLIER_SHARE);
        if (!Double.isFinite(alone.logEvidence()) || !Double.isFinite(batch.logEvidence())
                || !sameReading(alone.result(), batch.result())
                || !(alone.logEvidence() - batch.logEvidence() > threshold)) {
            return batch.result();
        }
        RunScale s = alone.result().runScale();
        return alone.result().withFirstNote(String.format(Locale.ROOT, "the run's scale factor (a = %.4f ± %.4f) "
                        + "lies outside its batch's (a = %.4f ± %.4f): read with a factor of its own (prior SD %.3f) "
                        + "and the batch's offset; check the temperature, voltage and lengths stated for it",
                s.factor(), s.factorSd(), prior.factorCentre(), prior.factorSd(), wide));
    }

    /** How far, in combined SDs, a run's first-pass factor must lie from its batch's to be looked at again. */
    static final double OUTSIDE_BATCH_SDS = 2.0;

    /**
     * Share of a batch's runs whose scale factor is held beforehand to depart from the others' (a
     * modelling choice: a temperature, voltage or length misstated on about one run in ten).
     */
    static final double BATCH_OUTLIER_SHARE = 0.1;

    /** True when two results of one run hold the same peaks in the same roles (the same markers). */
    private static boolean sameReading(RunResult a, RunResult b) {
        if (a.peaks().size() != b.peaks().size()) {
            return false;
        }
        for (int k = 0; k < a.peaks().size(); k++) {
            if (!a.peaks().get(k).peak().equals(b.peaks().get(k).peak())
                    || a.peaks().get(k).role() != b.peaks().get(k).role()) {
                return false;
            }
        }
        return true;
    }

    /**
     * True when a run's matches could change with the batch's prior: its scale was not pinned by
     * several peaks, or one of its peaks is not yet a near-certain call. A run whose every candidate
     * peak is identified at {@value #SETTLED_CONFIDENCE} or more with a scale from
     * {@link BatchScalePrior#MIN_ANCHORS} peaks keeps its first result (the prior would move its
     * confidences in the third decimal at most).
     */
    static boolean priorMatters(RunResult r) {
        if (r.failed() || !r.mobilityKnown()) {
            return false;
        }
        if (!r.runScale().fitted() || r.runScale().anchors() < BatchScalePrior.MIN_ANCHORS) {
            return true;
        }
        for (PeakResult p : r.peaks()) {
            PeakMatch m = p.match();
            if (p.role() == PeakRole.ANALYTE && !m.candidates().isEmpty()
                    && (m.status() != org.mobident.result.MatchStatus.IDENTIFIED || m.confidence() < SETTLED_CONFIDENCE)) {
                return true;
            }
        }
        return false;
    }

    /** Tells {@code listener} the result of run {@code index}; returns it. */
    private static <R> R told(RunListener listener, int index, R done) {
        listener.runDone(index, done instanceof Finished f ? f.result() : (RunResult) done);
        return done;
    }

    /** Tells {@code progress} that a run of {@code pass} is done; returns its result. */
    private static <R> R counted(BatchProgress progress, int pass, R result) {
        progress.runDone(pass);
        return result;
    }

    /** Confidence above which a call needs no second pass. */
    static final double SETTLED_CONFIDENCE = 0.99;

    /** Applies {@code work} to every item, several at once, keeping the order; a crash becomes {@code onCrash}. */
    private <T, R> List<R> parallel(List<T> items, java.util.function.Function<T, R> work,
                                    java.util.function.BiFunction<T, InputException, R> onCrash) {
        int threads = Math.min(settings.threads(), items.size());
        List<R> out = new ArrayList<>(items.size());
        if (threads <= 1) {
            for (T item : items) {
                out.add(work.apply(item));
            }
            return out;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "mobident-run");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<R>> futures = new ArrayList<>(items.size());
            for (T item : items) {
                futures.add(pool.submit(() -> work.apply(item)));
            }
            for (int i = 0; i < futures.size(); i++) {
                try {
                    out.add(futures.get(i).get());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    out.add(onCrash.apply(items.get(i), new InputException("batch", 0, null,
                            "processing was interrupted")));
                } catch (ExecutionException e) {
                    out.add(onCrash.apply(items.get(i), new InputException("batch", 0, null,
                            "could not be processed (" + e.getCause() + "); please report this with the file",
                            e.getCause())));
                }
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    private static InputException unexpected(RunSpec spec, Throwable t) {
        return new InputException(spec.traceFile().toString(), 0, null,
                "could not be processed (" + t + "); please report this with the file", t);
    }

    /** Reads the run's trace and identifies its peaks; never throws for bad user data. */
    public RunResult identify(RunSpec run) {
        return finish(detect(run), null);
    }

    /** Identifies the peaks of an already loaded trace. */
    public RunResult identify(RunSpec run, Trace trace) {
        return finish(detect(run, trace), null);
    }

    /**
     * The second look's zones are dropped when they lower the odds of an identification of the
     * run by more than this factor (a modelling choice: on the lab-day bench no rightly found zone
     * lowered a neighbour's confidence by more than 0.02; the wrong ones, a triangle split into
     * two, lowered it from 0.99 to 0.93 or took the name away).
     */
    static final double LOOK_MAX_ODDS_LOSS = 2.0;

    /**
     * A run after peak detection: its peaks, ready to be matched, or the failure that stops it.
     *
     * @param run     the run
     * @param failure the run's failure, or null
     * @param peaks   its peaks in order of apex time
     * @param noiseSd its baseline noise SD
     * @param otherWay zones in the marker window that point the other way from the run's peaks
     *                 (candidates for the neutral marker only)
     * @param readingNotes how the run was read where that was not as stated: the other way from its
     *                     stated detection, or matched as a buffer it did not name (first in its notes)
     * @param otherReading the run read the other way from its stated detection, where its trace
     *                     leans that way (the library decides between the two), or null
     * @param flatTops     zone tops the detector cut flat, rebuilt from their flanks (their peaks'
     *                     rows say so)
     */
    record Detected(RunSpec run, RunResult failure, List<Peak> peaks, double noiseSd, Trace markerWindow,
                    ExpectedZoneProbe probe, List<Peak> foundWhereExpected, List<Peak> beforeLook,
                    SamplingCheck.Span sampling, List<Peak> otherWay, List<String> readingNotes,
                    Detected otherReading, List<FlatTop> flatTops) {
        Detected {
            readingNotes = List.copyOf(readingNotes);
            flatTops = List.copyOf(flatTops);
        }

        Detected(RunSpec run, RunResult failure, List<Peak> peaks, double noiseSd) {
            this(run, failure, peaks, noiseSd, null, null, List.of(), null, SamplingCheck.Span.UNKNOWN, List.of(),
                    List.of(), null, List.of());
        }

        /** The same run with the marker searches done: these peaks, no window, probe or candidates kept. */
        Detected settled(List<Peak> withMarker) {
            return new Detected(run, failure, withMarker, noiseSd, null, null, foundWhereExpected, beforeLook,
                    sampling, List.of(), readingNotes, null, flatTops);
        }

        /** The same with one more note on how the run was read. */
        Detected withReadingNote(String note) {
            List<String> more = new ArrayList<>(readingNotes);
            more.add(note);
            return new Detected(run, failure, peaks, noiseSd, markerWindow, probe, foundWhereExpected, beforeLook,
                    sampling, otherWay, more, otherReading, flatTops);
        }

        /** The run with the peaks it had before the second look added its zones. */
        Detected withoutLook() {
            return new Detected(run, failure, beforeLook, noiseSd, null, null, List.of(), null, sampling, List.of(),
                    readingNotes, null, flatTops);
        }

        /** This run taken as one of another buffer. */
        Detected inBuffer(String label) {
            return new Detected(run.withConditions(run.conditions().withBuffer(label)), failure, peaks, noiseSd,
                    markerWindow, probe, foundWhereExpected, beforeLook, sampling, otherWay, readingNotes,
                    otherReading, flatTops);
        }

        /** This reading, with the other one to weigh against it. */
        Detected orReadAs(Detected other) {
            return new Detected(run, failure, peaks, noiseSd, markerWindow, probe, foundWhereExpected, beforeLook,
                    sampling, otherWay, readingNotes, other, flatTops);
        }
    }

    /** Reads the run's trace and detects its peaks; never throws for bad user data. */
    Detected detect(RunSpec run) {
        try {
            Trace trace = TraceFiles.read(run.traceFile(), settings.readOptions());
            return detect(run, trace);
        } catch (InputException e) {
            return new Detected(run, RunResult.failure(run, e), List.of(), Double.NaN);
        } catch (RuntimeException e) {
            return new Detected(run, RunResult.failure(run, unexpected(run, e)), List.of(), Double.NaN);
        }
    }

    /** Checks the run's conditions and detects the peaks of its trace. */
    Detected detect(RunSpec run, Trace trace) {
        RunResult problem = conditionProblem(run, trace);
        if (problem != null) {
            return new Detected(run, problem, List.of(), Double.NaN);
        }
        TraceAnalysis analysis = PeakDetector.analyse(trace, run.conditions().detectionOrDirect(),
                settings.peakSettings());
        Detected asStated = detected(run, trace, analysis, null);
        Detection stated = run.conditions().detectionOrDirect();
        boolean notGiven = run.conditions().detection() == null;
        if (notGiven || leansOtherWay(trace.signals(), stated == Detection.INDIRECT, analysis.noiseSd())) {
            // a trace exported already inverted (indirect runs drawn as peaks), or a detection column
            // left out, shows its zones the other way from the stated detection: read both ways, and
            // the library decides (see finishing)
            TraceAnalysis otherWay = PeakDetector.analyse(trace, opposite(stated), settings.peakSettings());
            if (notGiven ? strongZones(otherWay.peaks()) > 0
                    : strongZones(otherWay.peaks()) >= MIN_STRONG_ZONES_TO_TRUST_DETECTION) {
                String note = String.format(Locale.ROOT, "the trace's zones %s its baseline, although the run is "
                                + "%s: read as %s; check the detection column, or whether the trace was exported "
                                + "already inverted",
                        stated == Detection.INDIRECT ? "rise above" : "dip below",
                        run.conditions().detection() == null ? "taken as direct (no detection given)"
                                : "marked " + stated.label(), opposite(stated).label());
                RunSpec flipped = run.withConditions(run.conditions().withDetection(opposite(stated)));
                return asStated.orReadAs(detected(flipped, trace, otherWay, note));
            }
        }
        return asStated;
    }

    /** A run detected in one direction, before matching. */
    private Detected detected(RunSpec run, Trace trace, TraceAnalysis analysis, String detectionNote) {
        RunConditions c = run.conditions();
        Trace window = c.hasMarkerWindow() ? markerWindow(c, trace, analysis.peaks())
                : c.hasGeometry() ? trace : null;
        List<String> notes = new ArrayList<>(3);
        if (!trace.readingNote().isEmpty()) {
            notes.add(trace.readingNote());
        }
        if (detectionNote != null) {
            notes.add(detectionNote);
        }
        if (!analysis.flatTops().isEmpty()) {
            notes.add(flatTopNote(analysis.flatTops()));
        }
        return new Detected(run, null, analysis.peaks(), analysis.noiseSd(), window,
                settings.lookWhereExpected() ? analysis.probe() : null, List.of(), null, SamplingCheck.Span.of(trace),
                otherWayInWindow(c, trace, analysis.peaks(), analysis.noiseSd()), notes, null, analysis.flatTops());
    }

    /** The remark on a peak whose top the detector cut flat. */
    static final String CUT_TOP = "top cut flat by the detector (saturated) and rebuilt from the flanks: height, area "
            + "and corrected area are estimates";

    /** {@link #CUT_TOP} when one of the cut tops lies within the peak, else null. */
    private static String cutTopRemark(List<FlatTop> tops, Peak p) {
        for (FlatTop top : tops) {
            if (top.centredWithin(p.startTimeS(), p.endTimeS())) {
                return CUT_TOP;
            }
        }
        return null;
    }

    /** The run note on zone tops the detector cut flat. */
    static String flatTopNote(List<FlatTop> tops) {
        StringBuilder at = new StringBuilder();
        for (FlatTop top : tops) {
            at.append(at.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.1f-%.1f s",
                    top.fromS(), top.toS()));
        }
        return String.format(Locale.ROOT, "the detector saturated (a flat top at %s): %s rebuilt from the "
                        + "flanks, so height and area there are estimates and the centre carries the fit's "
                        + "uncertainty; dilute or inject less to quantify",
                at, tops.size() == 1 ? "that zone's top was" : "those zones' tops were");
    }

    /** A run result's peaks. */
    private static List<Peak> peaksOf(RunResult r) {
        List<Peak> out = new ArrayList<>(r.peaks().size());
        for (PeakResult pr : r.peaks()) {
            out.add(pr.peak());
        }
        return out;
    }

    /** The analyte peaks a run's result identifies. */
    private static int identifiedPeaks(RunResult r) {
        int n = 0;
        for (PeakResult pr : r.peaks()) {
            n += pr.role() == PeakRole.ANALYTE && pr.match().status() == MatchStatus.IDENTIFIED ? 1 : 0;
        }
        return n;
    }

    /** The peaks at the quantitation limit or above. */
    private static int strongZones(List<Peak> peaks) {
        int n = 0;
        for (Peak p : peaks) {
            n += p.signalToNoise() >= org.mobident.Tolerances.QUANTITATION_LIMIT_SIGNAL_TO_NOISE ? 1 : 0;
        }
        return n;
    }

    /**
     * The zones in the marker window that point the other way from the run's peaks, at S/N
     * {@value #OTHER_WAY_MARKER_MIN_SN} or more: a neutral marker that absorbs gives a peak where the
     * ions of an indirect method give dips, and the vacancy of a sample solvent that absorbs less than
     * the buffer a dip in a direct one. They are candidates for the marker only; none is reported unless chosen as the
     * marker. Empty without a window.
     */
    private List<Peak> otherWayInWindow(RunConditions c, Trace trace, List<Peak> peaks, double noiseSd) {
        if (!c.hasMarkerWindow()) {
            return List.of();
        }
        int from = Math.max(0, trace.indexAtOrAfter(c.markerFromS()));
        int to = Math.min(trace.size(), trace.indexAtOrAfter(c.markerToS()));
        if (to - from < MARKER_SEARCH_MIN_POINTS) {
            return List.of();
        }
        Trace window = trace.slice(from, to);
        if (!reachesOtherWay(window.signals(), c.detectionOrDirect() == Detection.INDIRECT, noiseSd)) {
            return List.of();
        }
        PeakSettings search = settings.peakSettings().withMinSignalToNoise(OTHER_WAY_MARKER_MIN_SN);
        List<Peak> out = new ArrayList<>();
        for (Peak p : PeakDetector.analyse(window, opposite(c.detectionOrDirect()), search).peaks()) {
            // no width test: a marker is narrower than the run's dispersed zones, and at this S/N
            // noise does not pass; the library's evidence decides
            if (p.signalToNoise() >= OTHER_WAY_MARKER_MIN_SN) {
                out.add(p);
            }
        }
        return out;
    }

    /**
     * A cheap test before the window is analysed the other way: some sample lies at least {@value
     * #OTHER_WAY_SCREEN_SIGMAS} noise SDs beyond the window's median (of about a thousand evenly
     * strided samples) the other way from the run's
     * peaks (up when they are dips). A zone at the quantitation limit stands about 25 noise SDs tall
     * (S/N = 2H/h with h about 5 SDs); a wandering baseline may take some of that, and lets more
     * windows through, which costs time only. True when the noise is not known.
     */
    static boolean reachesOtherWay(double[] signal, boolean dips, double noiseSd) {
        if (!(noiseSd > 0) || signal.length == 0) {
            return true;
        }
        double median = Selection.stridedMedian(signal, 0, signal.length, 10 * LEAN_MEDIAN_SAMPLES);
        double reach = 0;
        for (double v : signal) {
            reach = Math.max(reach, dips ? v - median : median - v);
        }
        return reach >= OTHER_WAY_SCREEN_SIGMAS * noiseSd;
    }

    /**
     * A cheap test of whether a trace's zones point the other way from its stated detection: in
     * blocks of a {@value #LEAN_BLOCKS}th of the trace (at least {@value #LEAN_MIN_BLOCK_SAMPLES}
     * samples), the samples more than {@value #LEAN_SIGMAS} noise SDs beyond the block's median, summed
     * by how far beyond they lie, weigh at least {@value #OTHER_WAY_DETECTION_RATIO} times as much the
     * other way (up when the run's peaks should be dips). Zones span many samples and lie on one side;
     * noise and spikes weigh little, and the block medians follow a drifting baseline. On 80 traces of
     * the lab-day bench (seed 131) the other way weighed at most 0.63 of the stated way; on 12 of its
     * indirect traces written inverted, 8 to 250 times as much. False when the noise is not known.
     */
    static boolean leansOtherWay(double[] signal, boolean dips, double noiseSd) {
        if (!(noiseSd > 0) || signal.length == 0) {
            return false;
        }
        int block = Math.max(LEAN_MIN_BLOCK_SAMPLES, signal.length / LEAN_BLOCKS);
        double limit = LEAN_SIGMAS * noiseSd;
        double up = 0;
        double down = 0;
        for (int from = 0; from < signal.length; from += block) {
            int length = Math.min(block, signal.length - from);
            // the block's level from about LEAN_MEDIAN_SAMPLES of its samples, evenly strided
            double level = Selection.stridedMedian(signal, from, length, LEAN_MEDIAN_SAMPLES);
            for (int i = from; i < from + length; i++) {
                double d = signal[i] - level;
                if (d > limit) {
                    up += d - limit;
                } else if (d < -limit) {
                    down += -d - limit;
                }
            }
        }
        double otherWay = dips ? up : down;
        double statedWay = dips ? down : up;
        return otherWay > 0 && otherWay >= OTHER_WAY_DETECTION_RATIO * statedWay;
    }

    /** True when a peak is as wide as a zone at its time (within {@value #MARKER_SEARCH_WIDTH_FACTOR}
     *  of w½/t times its time), or when the run gives no width to compare with. */
    private static boolean zoneWide(Peak p, double widthPerTime) {
        double expected = widthPerTime * p.apexTimeS();
        return !(expected > 0) || (p.widthHalfS() >= expected / MARKER_SEARCH_WIDTH_FACTOR
                && p.widthHalfS() <= expected * MARKER_SEARCH_WIDTH_FACTOR);
    }

    /**
     * Where the library and the run's peaks put the neutral marker when no window was given: for a
     * run scale factor a (all mobilities of the run a times the library's: temperature, field),
     * every pair of one of the run's tallest peaks and one library entry puts the marker at the
     * time t_m with a·μ_entry = A/t' − A/t_m' (A = Ld·Lt/V, t' the ramp-corrected time); over a grid
     * of a, the time that the most different peaks agree on within
     * {@value #MARKER_VOTE_TOLERANCE} (relative) wins, the a nearest 1 on ties, when at least
     * {@value #MARKER_VOTE_MIN_PEAKS} peaks agree. NaN when none does (a Hough-type vote).
     */
    static double predictedMarkerTimeS(RunConditions c, List<Peak> peaks, Library library) {
        if (peaks.isEmpty() || library.size() == 0) {
            return Double.NaN;
        }
        double ramp = c.rampOrZeroS();
        double t1 = peaks.get(0).migrationTimeS();
        double t2 = peaks.get(peaks.size() - 1).migrationTimeS();
        if (!(t2 > t1 && t1 > ramp)) {
            return Double.NaN;
        }
        MobilityScale probe = new NeutralMarkerScale(c.detectorLengthCm(), c.totalLengthCm(), c.voltageKv(), ramp,
                2 * t2, 0.0);
        double a = (probe.mobility(t1) - probe.mobility(t2)) / (1 / (t1 - ramp / 2) - 1 / (t2 - ramp / 2));
        List<Peak> tallest = new ArrayList<>(peaks);
        tallest.sort(Comparator.comparingDouble((Peak p) -> -p.height()));
        tallest = tallest.subList(0, Math.min(MARKER_VOTE_PEAKS, tallest.size()));
        double best = Double.NaN;
        int bestPeaks = 0;
        double bestDistance = Double.POSITIVE_INFINITY;
        int steps = (int) Math.round(MARKER_VOTE_FACTOR_REACH / MARKER_VOTE_FACTOR_STEP);
        for (int step = -steps; step <= steps; step++) {
            double factor = 1 + step * MARKER_VOTE_FACTOR_STEP;
            List<double[]> votes = new ArrayList<>();
            for (int i = 0; i < tallest.size(); i++) {
                double inverse = 1 / (tallest.get(i).migrationTimeS() - ramp / 2);
                for (LibraryEntry e : library.entries()) {
                    double inverseMarker = inverse - factor * e.mobility() / a;
                    if (inverseMarker > 0) {
                        votes.add(new double[] {Math.log(1 / inverseMarker + ramp / 2), i});
                    }
                }
            }
            votes.sort(Comparator.comparingDouble(v -> v[0]));
            int from = 0;
            for (int to = 0; to < votes.size(); to++) {
                while (votes.get(to)[0] - votes.get(from)[0] > 2 * MARKER_VOTE_TOLERANCE) {
                    from++;
                }
                java.util.BitSet agreeing = new java.util.BitSet();
                for (int k = from; k <= to; k++) {
                    agreeing.set((int) votes.get(k)[1]);
                }
                int count = agreeing.cardinality();
                double distance = Math.abs(factor - 1);
                if (count >= MARKER_VOTE_MIN_PEAKS
                        && (count > bestPeaks || (count == bestPeaks && distance < bestDistance))) {
                    bestPeaks = count;
                    bestDistance = distance;
                    best = Math.exp(0.5 * (votes.get(from)[0] + votes.get(to)[0]));
                }
            }
        }
        return best;
    }

    /** The stretch of {@code trace} within {@value #MARKER_SEARCH_REACH} (relative) of a time; null when too short. */
    private static Trace around(Trace trace, double timeS) {
        int from = Math.max(0, trace.indexAtOrAfter(timeS * (1 - MARKER_SEARCH_REACH)));
        int to = Math.min(trace.size(), trace.indexAtOrAfter(timeS * (1 + MARKER_SEARCH_REACH)));
        if (to - from < MARKER_SEARCH_MIN_POINTS) {
            return null;
        }
        return trace.slice(from, to);
    }

    /**
     * The stretch of the trace inside the marker window, kept for a targeted search for a weak
     * marker (see {@link #withWeakMarkers}) when the window holds at most one detected peak; null
     * otherwise. Only the window is kept, and only until the run's first matching.
     */
    private Trace markerWindow(RunConditions c, Trace trace, List<Peak> peaks) {
        if (!c.hasMarkerWindow()) {
            return null;
        }
        int inside = 0;
        for (Peak p : peaks) {
            inside += p.apexTimeS() >= c.markerFromS() && p.apexTimeS() <= c.markerToS() ? 1 : 0;
        }
        int from = Math.max(0, trace.indexAtOrAfter(c.markerFromS()));
        int to = Math.min(trace.size(), trace.indexAtOrAfter(c.markerToS()));
        if (inside > 1 || to - from < MARKER_SEARCH_MIN_POINTS) {
            return null;
        }
        return trace.slice(from, to);
    }

    /**
     * A targeted search for a weak neutral marker: when the marker window holds at most one
     * detected peak and the marker chosen among the peaks leaves the run poorly explained (or lies
     * outside the window, or is uncertain), the window alone is analysed again, with its own baseline
     * and widths, down to S/N {@value #MARKER_SEARCH_MIN_SN}, and the zones found there that are not
     * already peaks are added (only the one chosen as the marker is reported). A marker is expected in
     * that window, so this is no fishing in noise: the marker choice still has to make the library
     * explain the run.
     */
    private List<Peak> withWeakMarkers(RunConditions c, Trace window, List<Peak> peaks) {
        double widthPerTime = typicalWidthPerTime(peaks);
        double middleS = 0.5 * (window.startTimeS() + window.endTimeS());
        PeakSettings search = settings.peakSettings().withMinSignalToNoise(MARKER_SEARCH_MIN_SN);
        // the stretch analysed as it is, and as a stretch of this run's zones (its own width estimate
        // comes from its noise when it holds no clear zone; a zone narrower than the run's trend is
        // found by the first)
        List<Peak> found = new ArrayList<>();
        for (Detection direction : List.of(c.detectionOrDirect(), opposite(c.detectionOrDirect()))) {
            // the marker may also point the other way: a neutral that absorbs gives a peak where the
            // ions of an indirect method give dips (and a vacancy of the sample solvent a dip in a
            // direct one)
            found.addAll(PeakDetector.analyse(window, direction, search).peaks());
            if (Double.isFinite(widthPerTime)) {
                found.addAll(PeakDetector.analyse(window, direction,
                        search.forZonesOfWidth(widthPerTime * middleS)).peaks());
            }
        }
        List<Peak> out = new ArrayList<>(peaks);
        for (Peak w : found) {
            // a zone this faint must also be as wide as a zone there would be: noise found at S/N 1.5
            // is mostly narrower or wider than that
            boolean zoneLike = zoneWide(w, widthPerTime);
            boolean known = false;
            for (Peak p : out) {
                known |= Math.abs(p.apexTimeS() - w.apexTimeS()) < Math.max(p.widthHalfS(), w.widthHalfS());
            }
            if (zoneLike && !known) {
                out.add(w);
            }
        }
        out.sort(java.util.Comparator.comparingDouble(Peak::apexTimeS));
        return out;
    }

    private static Detection opposite(Detection d) {
        return d == Detection.INDIRECT ? Detection.DIRECT : Detection.INDIRECT;
    }

    /**
     * The detected peaks and, of the faint zones the marker search added ({@code more} without
     * {@code peaks}), only those that {@code choice} takes as a marker.
     */
    private static List<Peak> chosenSearchPeaks(List<Peak> peaks, List<Peak> more, MarkerLocator.Choice choice) {
        MarkerLocator.Hypothesis best = choice.best();
        List<Peak> out = new ArrayList<>(more.size());
        for (int i = 0; i < more.size(); i++) {
            Peak p = more.get(i);
            boolean marker = best != null && (i == best.neutralIndex() || i == best.refIndex());
            if (marker || peaks.contains(p)) {
                out.add(p);
            }
        }
        return out;
    }

    /** The failure a run's conditions (with its trace) make inevitable, or null. */
    private RunResult conditionProblem(RunSpec run, Trace trace) {
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
        if (byBuffer.get(bufferKey(c.buffer())) == null) {
            return RunResult.failure(run, new InputException(run.origin(), run.originLine(), "buffer",
                    String.format(Locale.ROOT, "the run's buffer '%s' has no entries in the library %s, whose "
                                    + "entries are for %s; give the buffer label the library uses, or a library "
                                    + "built in this buffer", c.buffer().trim(), library.sourceFile(),
                            String.join(", ", library.bufferLabels()))));
        }
        return null;
    }

    /**
     * Finds the markers, sets the mobility scale and matches the peaks of a detected run.
     *
     * @param learned a scale prior learned from the batch for the run's buffer, or null for the settings' own
     */
    RunResult finish(Detected d, BatchScalePrior.Learned learned) {
        return finishing(d, learned).result();
    }

    /**
     * A finished run with the run as detected after the weak-marker search (for a second pass), and
     * the log evidence of its peaks under the library and the scale prior it was matched with
     * ({@link RunMatch#logEvidence()}; NaN when nothing was matched).
     */
    private record Finished(RunResult result, Detected settled, double logEvidence) {
        Finished(RunResult result, Detected settled) {
            this(result, settled, Double.NaN);
        }
    }

    private Finished finishing(Detected d, BatchScalePrior.Learned learned) {
        String label = d.run().conditions().buffer();
        if (d.failure() == null && (label == null || label.isBlank()) && library.bufferLabels().size() > 1) {
            // no buffer given and a library of several: the run is matched with each buffer's entries
            // and taken as the one under which the library identifies most of its peaks (the first
            // such on a tie), and says so
            Finished best = null;
            int bestCount = -1;
            StringBuilder others = new StringBuilder();
            for (String b : library.bufferLabels()) {
                Finished f = finishing(d.inBuffer(b), learned);
                int n = identifiedPeaks(f.result());
                others.append(others.length() == 0 ? "" : ", ").append(b).append(": ").append(n);
                if (n > bestCount) {
                    best = f;
                    bestCount = n;
                }
            }
            String note = String.format(Locale.ROOT, "no buffer given: matched with the entries of %s, under which "
                            + "the library identifies most of the run's peaks (identified per buffer: %s); give "
                            + "the run's buffer to fix it", best.result().spec().conditions().buffer(), others);
            // the note rides on with the run as settled, for the pass under the batch's prior
            return new Finished(best.result().withFirstNote(note), best.settled().withReadingNote(note),
                    best.logEvidence());
        }
        if (d.otherReading() != null) {
            // the trace leans the other way from its stated detection: read that way unless the stated
            // reading lets the library identify more peaks (reading a trace the wrong way leaves
            // artefacts beside its zones that the library may half explain, never as well)
            Finished asStated = finishing(d.orReadAs(null), learned);
            Finished otherWay = finishing(d.otherReading(), learned);
            int other = identifiedPeaks(otherWay.result());
            int stated = identifiedPeaks(asStated.result());
            if (d.run().conditions().detection() == null) {
                // no detection given: the reading the library identifies more under, then the one
                // with more clear zones, then direct
                return other > stated || (other == stated && strongZones(peaksOf(otherWay.result()))
                        > strongZones(peaksOf(asStated.result()))) ? otherWay : asStated;
            }
            return other >= stated ? otherWay : asStated;
        }
        if (d.beforeLook() == null || d.failure() != null) {
            return finishingOnce(d, learned);
        }
        // zones the second look kept in the first pass: judged again under this pass's scale prior
        Finished with = finishingOnce(d, learned);
        Finished plain = finishingOnce(d.withoutLook(), learned);
        return keepsEveryIdentification(plain.result().peaks(), with.result().peaks()) ? with : plain;
    }

    private Finished finishingOnce(Detected d, BatchScalePrior.Learned learned) {
        if (d.failure() != null) {
            return new Finished(d.failure(), d);
        }
        RunSpec run = d.run();
        RunConditions c = run.conditions();
        Prepared prepared = byBuffer.get(bufferKey(c.buffer()));
        List<Peak> peaks = d.peaks();
        List<String> notes = new ArrayList<>();
        MobilityAdjuster adjuster = adjusterFor(c);
        MatchSettings ms = learned == null ? settings.matchSettings()
                : settings.matchSettings().withScalePrior(learned.prior());
        MarkerLocator.Evaluator evaluator = prepared.library().size() == 0 ? null
                : (mob, sd, usual) -> LibraryMatcher.matchRun(mob, sd, usual, prepared.library(), prepared.spread(), ms,
                        adjuster);
        MarkerLocator locator = new MarkerLocator(prepared.library().size() == 0);
        MarkerLocator.Choice choice = locator.locate(c, peaks, evaluator);
        if (!d.otherWay().isEmpty()) {
            // the marker may point the other way: the candidates stay only when chosen as the marker
            List<Peak> more = new ArrayList<>(peaks);
            more.addAll(d.otherWay());
            more.sort(Comparator.comparingDouble(Peak::apexTimeS));
            MarkerLocator.Choice withMore = locator.locate(c, more, evaluator);
            List<Peak> kept = chosenSearchPeaks(peaks, more, withMore);
            if (kept.size() > peaks.size()) {
                peaks = kept;
                choice = locator.locate(c, peaks, evaluator);
            }
        }
        Trace searchWindow = d.markerWindow();
        if (searchWindow != null && !c.hasMarkerWindow() && !MarkerLocator.settled(choice, c)) {
            // no window given and the peaks at hand leave the run unexplained: search where the
            // library and the peaks put the marker
            double predicted = predictedMarkerTimeS(c, peaks, prepared.library());
            searchWindow = Double.isFinite(predicted) ? around(searchWindow, predicted) : null;
        }
        if (searchWindow != null && (!MarkerLocator.settled(choice, c) || faintMarker(choice, peaks))) {
            List<Peak> more = withWeakMarkers(c, searchWindow, peaks);
            if (more.size() > peaks.size()) {
                // the faint zones found by the search are marker candidates, not analyte peaks: only the
                // one chosen as a marker stays (the others lie below the detection limit asked for)
                MarkerLocator.Choice withMore = locator.locate(c, more, evaluator);
                List<Peak> kept = chosenSearchPeaks(peaks, more, withMore);
                if (kept.size() == more.size()) {
                    peaks = more;
                    choice = withMore;
                } else if (kept.size() > peaks.size()) {
                    peaks = kept;
                    choice = locator.locate(c, peaks, evaluator);
                }
            }
        }
        Detected settled = d.settled(peaks);
        double libraryTempC = libraryTemperatureC();
        double runTempC = c.temperatureC();
        double temperatureFactor = Double.isNaN(runTempC) || Math.abs(runTempC - libraryTempC) < SAME_TEMPERATURE_K
                ? 1.0 : MobilityMath.atTemperature(1.0, runTempC, libraryTempC);
        if (choice.best() == null) {
            List<PeakResult> rows = new ArrayList<>();
            for (Peak p : peaks) {
                rows.add(new PeakResult(p, PeakRole.ANALYTE, Double.NaN, Double.NaN, Double.NaN, PeakMatch.none(),
                        Double.NaN, cutTopRemark(d.flatTops(), p)));
            }
            notes.addAll(d.readingNotes());
            notes.add(choice.note());
            return new Finished(new RunResult(run, null, choice.note(), Double.NaN, null, rows, notes, d.noiseSd(),
                    RunScale.OFF, temperatureFactor), settled);
        }
        MarkerLocator.Hypothesis best = choice.best();
        MobilityScale scale = best.scale();
        int analyteCount = best.analytes().length;
        int beyond = 0;
        for (double mu : best.mobility()) {
            beyond += PhysicalBounds.plausibleIon(mu) ? 0 : 1;
        }
        if (analyteCount > 0 && 2 * beyond > analyteCount) {
            return new Finished(RunResult.failure(run, new InputException(run.origin(), run.originLine(), "conditions",
                    String.format(Locale.ROOT, "%d of %d peaks come out with mobilities beyond ±%.0f units "
                                    + "(1e-9 m²/(V s)): check the time unit of the trace (minutes read as seconds?), "
                                    + "the voltage and the capillary lengths", beyond, analyteCount,
                            PhysicalBounds.MAX_ION_MOBILITY))), settled);
        }
        RunMatch match = best.match();
        RunScale runScale = match == null ? RunScale.OFF : match.scale();
        List<PeakResult> rows = new ArrayList<>(peaks.size());
        int k = 0;
        for (int i = 0; i < peaks.size(); i++) {
            Peak p = peaks.get(i);
            double m = scale.mobility(p.migrationTimeS());
            double s = scale.mobilitySd(p.migrationTimeS(), p.migrationTimeSdS());
            double atLib = convert(m, runTempC, libraryTempC);
            if (i == best.neutralIndex()) {
                rows.add(new PeakResult(p, PeakRole.NEUTRAL_MARKER, m, s, atLib, PeakMatch.none(), atLib,
                        cutTopRemark(d.flatTops(), p)));
            } else if (i == best.refIndex()) {
                rows.add(new PeakResult(p, PeakRole.MOBILITY_MARKER, m, s, atLib, PeakMatch.none(), atLib,
                        cutTopRemark(d.flatTops(), p)));
            } else {
                PeakMatch pm = match == null ? PeakMatch.none() : mixed(choice, i, k, ms);
                rows.add(new PeakResult(p, PeakRole.ANALYTE, m, s, atLib, pm, runScale.corrected(atLib),
                        PhysicalBounds.plausibleIon(m) ? cutTopRemark(d.flatTops(), p) : BEYOND_ANY_ION));
                k++;
            }
        }
        rows = CoMigration.remarked(rows, pr -> zoneWidthInMobility(scale, pr.peak(), runTempC, libraryTempC));
        if (d.probe() != null && match != null && settings.lookWhereExpected()) {
            // a second look where the library expects zones that no peak explains
            List<ExpectedZoneProbe.ExpectedZone> expected = expectedZones(rows, prepared, scale, runScale, ms,
                    runTempC);
            if (!expected.isEmpty()) {
                ExpectedZoneProbe.Outcome look = d.probe().lookFor(peaks, expected);
                if (!look.added().isEmpty()) {
                    Finished withFound = finishingOnce(new Detected(run, null, look.peaks(), d.noiseSd(), null, null,
                            look.added(), peaks, d.sampling(), List.of(), d.readingNotes(), null, d.flatTops()),
                            learned);
                    if (keepsEveryIdentification(rows, withFound.result().peaks())) {
                        return withFound;
                    }
                    // the zones found took an identified name from the run: a zone fitted into the
                    // flank of one whose shape neither form follows, not a zone of its own
                }
            }
        }
        rows = withFoundRemark(rows, d.foundWhereExpected());
        if (beyond > 0) {
            notes.add(String.format(Locale.ROOT, "%d peak(s) with a mobility beyond ±%.0f units cannot be an ion in "
                    + "water and were not matched", beyond, PhysicalBounds.MAX_ION_MOBILITY));
        }
        if (temperatureFactor != 1.0) {
            notes.add(String.format(Locale.ROOT,
                    "run at %.1f °C, library at %.1f °C: mobilities compared at the library temperature "
                            + "(scaled by the viscosity of water, IAPWS 2008; factor %.4f)",
                    runTempC, libraryTempC, temperatureFactor));
        } else if (Double.isNaN(runTempC)) {
            notes.add("run temperature not given: assumed equal to the library temperature");
        }
        String sampling = samplingNote(d.sampling(), peaks, prepared, scale, runScale, runTempC);
        if (!sampling.isEmpty()) {
            notes.add(sampling);
        }
        if (match != null) {
            notes.add(ScaleNotes.describe(runScale, match.modes(), libraryTempC, ms)
                    + (learned == null ? "" : "; " + learned.describe()));
            String sign = ScaleNotes.voltageSignHint(best, match, evaluator);
            if (sign != null) {
                notes.add(sign);
            }
        }
        if (best.neutralIndex() >= 0
                && peaks.get(best.neutralIndex()).dip() != (c.detectionOrDirect() == Detection.INDIRECT)) {
            notes.add(0, String.format(Locale.ROOT, "neutral marker at %.2f s points the other way from the run's "
                            + "%s (a neutral that absorbs more, or less, than the buffer)",
                    peaks.get(best.neutralIndex()).apexTimeS(),
                    c.detectionOrDirect() == Detection.INDIRECT ? "dips" : "peaks"));
        }
        if (choice.note() != null && !choice.note().isEmpty()) {
            notes.add(0, choice.note());
        }
        notes.addAll(0, d.readingNotes());
        return new Finished(new RunResult(run, null, scale.describe(), scale.eofMobility(), scale, rows, notes,
                d.noiseSd(), runScale, temperatureFactor), settled, match == null ? Double.NaN : match.logEvidence());
    }

    /**
     * Where the run's scale puts the zones of the library entries that no peak was assigned to: for
     * entry e, the run mobility a·μ_e + b (the run's scale correction) at the run temperature turned
     * into a time, with the entry's match window (for a peak measured without error, plus the
     * correction's own variance) turned into a reach in time through the slope of the scale there.
     * An entry whose window already holds an unassigned analyte peak or a marker is not looked for
     * (that peak was judged and left); nor one outside the run.
     */
    private static List<ExpectedZoneProbe.ExpectedZone> expectedZones(List<PeakResult> rows, Prepared prepared,
                                                                      MobilityScale scale, RunScale runScale,
                                                                      MatchSettings ms, double runTempC) {
        java.util.Set<String> named = new java.util.HashSet<>();
        for (PeakResult pr : rows) {
            if (pr.match().assigned() != null) {
                named.add(pr.match().assigned());
            }
        }
        List<ExpectedZoneProbe.ExpectedZone> out = new ArrayList<>();
        List<LibraryEntry> entries = prepared.library().entries();
        for (int j = 0; j < entries.size(); j++) {
            LibraryEntry e = entries.get(j);
            if (named.contains(e.name()) || !Double.isFinite(e.mobility())) {
                continue;
            }
            double timeS = expectedTimeS(e, scale, runScale, runTempC);
            if (!(timeS > 0)) {
                continue;
            }
            double window = runScale.factor() * MatchWindow.halfWidth(e, prepared.spread(), j,
                    runScale.varianceAt(e.mobility()), ms);
            double step = EXPECTED_SLOPE_STEP * timeS;
            double slope = Math.abs(scale.mobility(timeS + step) - scale.mobility(timeS - step)) / (2 * step);
            double reachS = window / slope;
            if (!(reachS > 0) || !Double.isFinite(reachS)) {
                continue;
            }
            boolean judged = false;
            for (PeakResult pr : rows) {
                boolean left = pr.role() != PeakRole.ANALYTE || pr.match().assigned() == null;
                judged |= left && Math.abs(pr.peak().migrationTimeS() - timeS) <= reachS;
            }
            if (!judged) {
                out.add(new ExpectedZoneProbe.ExpectedZone(timeS, reachS));
            }
        }
        return out;
    }

    /** Where the run's scale puts the zone of a library entry: the run mobility a·μ_e + b at the run
     *  temperature turned into a time, s (not positive when the zone would never arrive). */
    private static double expectedTimeS(LibraryEntry e, MobilityScale scale, RunScale runScale, double runTempC) {
        double atEntry = runScale.factor() * e.mobility() + runScale.offset();
        // (a run without a temperature is taken at the library's, as the matcher takes it)
        double runMobility = Double.isNaN(runTempC) ? atEntry : convert(atEntry, e.temperatureOrDefaultC(), runTempC);
        return scale.timeS(runMobility);
    }

    /** The run's note on its sampling ({@link SamplingCheck}) for the earliest zone the library puts
     *  in the run, with the widths of the run's own narrower zones; "" when it is fine or unknown. */
    private static String samplingNote(SamplingCheck.Span span, List<Peak> peaks, Prepared prepared,
                                       MobilityScale scale, RunScale runScale, double runTempC) {
        LibraryEntry earliest = null;
        double earliestS = Double.POSITIVE_INFINITY;
        for (LibraryEntry e : prepared.library().entries()) {
            double timeS = Double.isFinite(e.mobility()) ? expectedTimeS(e, scale, runScale, runTempC) : Double.NaN;
            if (timeS > 0 && span.covers(timeS) && timeS < earliestS) {
                earliestS = timeS;
                earliest = e;
            }
        }
        return earliest == null ? "" : SamplingCheck.note(span, typicalWidthPerTime(peaks), earliest.name(), earliestS);
    }

    /**
     * True when every analyte identified in {@code before} is still identified in {@code after}
     * (on whichever peak), at odds c/(1 − c) at least 1/{@value #LOOK_MAX_ODDS_LOSS} of what they
     * were, and every name called at all (identified or ambiguous) is still called. A zone found
     * by the second look adds a name and, where it splits a merged pair, makes its neighbour's
     * name surer; when it takes a name away instead, or makes it much less sure, the look has made
     * two zones of one whose shape neither fitted form follows, and its zones are dropped. The
     * ambiguous names count too: in a run that reads two ways (a pattern that also fits shifted by
     * one entry), a zone looked for under one reading tips the run to it and renames the others
     * (a lab-day run went from three ambiguous right names to four identified wrong ones).
     */
    static boolean keepsEveryIdentification(List<PeakResult> before, List<PeakResult> after) {
        Map<String, Double> still = new HashMap<>();
        Set<String> called = new HashSet<>();
        for (PeakResult pr : after) {
            if (pr.match().status() == MatchStatus.IDENTIFIED) {
                still.merge(pr.match().assigned(), pr.match().confidence(), Math::max);
            }
            if (pr.match().assigned() != null) {
                called.add(pr.match().assigned());
            }
        }
        for (PeakResult pr : before) {
            if (pr.match().assigned() != null && !called.contains(pr.match().assigned())) {
                return false;
            }
        }
        for (PeakResult pr : before) {
            if (pr.match().status() != MatchStatus.IDENTIFIED) {
                continue;
            }
            Double now = still.get(pr.match().assigned());
            double was = pr.match().confidence();
            // odds(now) >= odds(was) / k, without dividing by 1 - c
            if (now == null || LOOK_MAX_ODDS_LOSS * now * (1 - was) < was * (1 - now)) {
                return false;
            }
        }
        return true;
    }

    /** The rows with a remark on each peak found by the second look where the library expected a zone. */
    private static List<PeakResult> withFoundRemark(List<PeakResult> rows, List<Peak> found) {
        if (found.isEmpty()) {
            return rows;
        }
        List<PeakResult> out = new ArrayList<>(rows.size());
        for (PeakResult pr : rows) {
            out.add(!found.contains(pr.peak()) ? pr : new PeakResult(pr.peak(), pr.role(), pr.mobility(),
                    pr.mobilitySd(), pr.mobilityAtLibraryTemp(), pr.match(), pr.mobilityCorrected(),
                    pr.note() == null ? FOUND_WHERE_EXPECTED : pr.note() + "; " + FOUND_WHERE_EXPECTED));
        }
        return out;
    }

    /**
     * The width at half height of a peak, in mobility units at the library temperature: the mobility
     * span of its half-height interval centred on its migration time (NaN when unknown).
     */
    private static double zoneWidthInMobility(MobilityScale scale, Peak p, double runTempC, double libraryTempC) {
        double half = 0.5 * p.widthHalfS();
        double t = p.migrationTimeS();
        if (!(half > 0) || !(t - half > 0)) {
            return Double.NaN;
        }
        double early = convert(scale.mobility(t - half), runTempC, libraryTempC);
        double late = convert(scale.mobility(t + half), runTempC, libraryTempC);
        return Math.abs(late - early);
    }

    /**
     * Peak {@code index} (the {@code k}-th analyte peak of the chosen reading) with its probabilities
     * averaged over every marker choice that carries weight; where the peak is itself the marker, its
     * share counts as "none of the library analytes".
     */
    private static PeakMatch mixed(MarkerLocator.Choice choice, int index, int k, MatchSettings ms) {
        MarkerLocator.Hypothesis best = choice.best();
        PeakMatch own = best.match().matches().get(k);
        if (choice.others().size() <= 1) {
            return own;
        }
        List<PeakMatch> per = new ArrayList<>();
        for (MarkerLocator.Hypothesis h : choice.others()) {
            int pos = -1;
            for (int q = 0; q < h.analytes().length; q++) {
                if (h.analytes()[q] == index) {
                    pos = q;
                }
            }
            per.add(pos < 0 || h.match() == null ? null : h.match().matches().get(pos));
        }
        return LibraryMatcher.mix(per, choice.weights(), own, ms);
    }

    /** True when the chosen neutral marker is itself faint (S/N below the quantitation limit): then a
     *  zone of about the same size elsewhere in the window may as well be the marker, and the window
     *  is searched even when the choice looks settled. */
    private static boolean faintMarker(MarkerLocator.Choice choice, List<Peak> peaks) {
        MarkerLocator.Hypothesis best = choice.best();
        return best != null && best.neutralIndex() >= 0
                && peaks.get(best.neutralIndex()).signalToNoise() < org.mobident.Tolerances.QUANTITATION_LIMIT_SIGNAL_TO_NOISE;
    }

    /** Lower quartile of w½/t over the peaks of S/N 10 or more (NaN when there are none): the
     *  narrowest zones are the ones shaped by diffusion alone, as a neutral marker is; concentrated
     *  zones are widened by electromigration dispersion. */
    private static double typicalWidthPerTime(List<Peak> peaks) {
        double[] ratio = new double[peaks.size()];
        int m = 0;
        for (Peak p : peaks) {
            if (p.signalToNoise() >= org.mobident.Tolerances.QUANTITATION_LIMIT_SIGNAL_TO_NOISE && p.apexTimeS() > 0) {
                ratio[m++] = p.widthHalfS() / p.apexTimeS();
            }
        }
        if (m == 0) {
            return Double.NaN;
        }
        java.util.Arrays.sort(ratio, 0, m);
        return ratio[(m - 1) / 4];
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
    private static MobilityAdjuster adjusterFor(RunConditions c) {
        double runC = c.temperatureC();
        if (Double.isNaN(runC)) {
            return MobilityAdjuster.IDENTITY;
        }
        return (mobility, entry) -> convert(mobility, runC, entry.temperatureOrDefaultC());
    }
}
