package org.mobident.assess;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

/**
 * Scores reported peaks against a known-identities table: ties peaks to known rows
 * ({@link ZoneMatching}), gives every peak a {@link Verdict}, and adds up the scores of an
 * {@link Assessment}. A plain function of its inputs.
 */
public final class Assessor {

    private Assessor() {
    }

    /**
     * Scores the runs.
     *
     * @param known       the known-identities table
     * @param reported    the reported runs (from a peak table or an identification)
     * @param tableSource where the reported runs came from, for the report
     * @param library     the library the peaks were matched against, to point out known analytes it lacks;
     *                    may be null
     */
    public static Assessment assess(KnownIdentities known, List<ReportedRun> reported, String tableSource,
                                    Library library) {
        Map<String, List<KnownIdentity>> knownByRun = known.byRun();
        Set<String> reportedNames = new HashSet<>();
        List<String> notScored = new ArrayList<>();
        Tally tally = new Tally();
        for (ReportedRun run : reported) {
            reportedNames.add(run.name());
            List<KnownIdentity> rows = knownByRun.get(run.name());
            if (rows == null) {
                notScored.add(run.name());
            } else {
                tally.run(run, rows);
            }
        }
        List<String> notInTable = new ArrayList<>();
        for (String name : knownByRun.keySet()) {
            if (!reportedNames.contains(name)) {
                notInTable.add(name);
            }
        }
        List<String> notes = library == null ? List.of() : namesNotInLibrary(known, reportedNames, library);
        return tally.result(known.source(), tableSource, notScored, notInTable, notes);
    }

    /** Notes for known analyte names of scored runs that the library does not hold. */
    private static List<String> namesNotInLibrary(KnownIdentities known, Set<String> scored, Library library) {
        Set<String> libraryKeys = new HashSet<>();
        for (LibraryEntry e : library.entries()) {
            libraryKeys.add(KnownIdentity.key(e.name()));
        }
        Map<String, KnownIdentity> firstOfName = new LinkedHashMap<>();
        for (KnownIdentity r : known.rows()) {
            if (r.kind() == KnownKind.ANALYTE && scored.contains(r.run()) && !libraryKeys.contains(r.nameKey())) {
                firstOfName.putIfAbsent(r.nameKey(), r);
            }
        }
        List<String> notes = new ArrayList<>();
        for (KnownIdentity r : firstOfName.values()) {
            notes.add("analyte '" + r.name() + "' (first on line " + r.line() + " of " + known.source()
                    + ") is not in the library " + library.sourceFile() + ", so it can never be identified");
        }
        return notes;
    }

    /** Running totals over the scored runs; used by one call of {@link #assess} only. */
    private static final class Tally {
        final List<RunCheck> runs = new ArrayList<>();
        final List<PeakVerdict> verdicts = new ArrayList<>();
        final List<Double> confidenceOfCalls = new ArrayList<>();
        final List<Boolean> callRight = new ArrayList<>();
        final List<Double> confidenceOfUnassigned = new ArrayList<>();
        final List<Boolean> unassignedRight = new ArrayList<>();
        final List<Double> mobilityDifferences = new ArrayList<>();
        /** analyte key → per-analyte counters. */
        final Map<String, AnalyteTally> analytes = new TreeMap<>();
        final Map<HeightStratum, int[]> strata = new EnumMap<>(HeightStratum.class);
        int identifiedCalls;
        int identifiedRight;
        int calls;
        int callsRight;
        int present;
        int presentIdentified;
        int presentCalled;
        int clearPresent;
        int clearIdentified;
        int wrongNames;
        int calledAbsent;
        int analytePeaks;
        int analytePeaksOnZone;
        int spikesReported;
        int zones;
        int zonesDetected;
        int runsFailed;
        int runsWithoutScale;
        int runsMarkerOff;
        int peaksWithoutTime;
        int unmatchableRows;

        /** Stratum counters: analytes, identified right, called right, zones, detected. */
        private static final int S_ANALYTES = 0;
        private static final int S_IDENTIFIED = 1;
        private static final int S_CALLED = 2;
        private static final int S_ZONES = 3;
        private static final int S_DETECTED = 4;

        Tally() {
            for (HeightStratum s : HeightStratum.values()) {
                strata.put(s, new int[5]);
            }
        }

        void run(ReportedRun run, List<KnownIdentity> rows) {
            List<ReportedPeak> peaks = run.peaks();
            List<ZoneMatching.Pair> pairs = ZoneMatching.match(rows, peaks);
            Map<Integer, ZoneMatching.Pair> byPeak = new HashMap<>();
            Map<KnownIdentity, ReportedPeak> peakOfRow = new IdentityHashMap<>();
            for (ZoneMatching.Pair p : pairs) {
                byPeak.put(p.peak(), p);
                peakOfRow.put(p.known(), peaks.get(p.peak()));
            }
            boolean untimedAnalyteLeft = false;
            for (KnownIdentity r : rows) {
                if (!r.hasTime() && r.kind() != KnownKind.ANALYTE) {
                    unmatchableRows++;
                } else if (!r.hasTime() && !peakOfRow.containsKey(r)) {
                    untimedAnalyteLeft = true;
                }
            }
            for (int i = 0; i < peaks.size(); i++) {
                ReportedPeak peak = peaks.get(i);
                ZoneMatching.Pair pair = byPeak.get(i);
                KnownIdentity truth = pair == null ? null : pair.known();
                if (!Double.isFinite(peak.timeS())) {
                    peaksWithoutTime++;
                }
                if (truth != null && truth.kind() == KnownKind.SPIKE) {
                    spikesReported++;
                }
                Verdict v = verdict(peak, truth, untimedAnalyteLeft);
                verdicts.add(new PeakVerdict(run.name(), peak, truth, pair == null ? null : pair.how(), v));
                peak(peak, truth, v);
            }
            for (KnownIdentity r : rows) {
                ReportedPeak peak = peakOfRow.get(r);
                if (peak == null) {
                    verdicts.add(new PeakVerdict(run.name(), null, r, null, Verdict.NOT_FOUND));
                }
                known(r, peak);
            }
            runs.add(check(run, rows, peaks, byPeak));
        }

        /** The verdict on one peak given the known row it belongs to (or null). */
        private static Verdict verdict(ReportedPeak peak, KnownIdentity truth, boolean untimedAnalyteLeft) {
            if (!peak.isAnalyte()) {
                return truth != null && truth.kind() == KnownKind.MARKER ? Verdict.MARKER_RIGHT
                        : Verdict.MARKER_ELSEWHERE;
            }
            boolean onAnalyte = truth != null && truth.kind() == KnownKind.ANALYTE;
            if (peak.isCall()) {
                if (!onAnalyte) {
                    return Verdict.CALLED_ABSENT;
                }
                return truth.nameKey().equals(KnownIdentity.key(peak.assigned())) ? Verdict.RIGHT : Verdict.WRONG_NAME;
            }
            if (onAnalyte) {
                return Verdict.NOT_NAMED;
            }
            return truth == null && untimedAnalyteLeft ? Verdict.NO_VERDICT : Verdict.RIGHTLY_UNASSIGNED;
        }

        /** Counts for one reported peak. */
        private void peak(ReportedPeak peak, KnownIdentity truth, Verdict v) {
            if (!peak.isAnalyte()) {
                return;
            }
            analytePeaks++;
            if (truth != null && truth.kind().isZone()) {
                analytePeaksOnZone++;
            }
            if (peak.isCall()) {
                boolean right = v == Verdict.RIGHT;
                calls++;
                callsRight += right ? 1 : 0;
                if (peak.status() == ReportedPeak.Status.IDENTIFIED) {
                    identifiedCalls++;
                    identifiedRight += right ? 1 : 0;
                }
                wrongNames += v == Verdict.WRONG_NAME ? 1 : 0;
                calledAbsent += v == Verdict.CALLED_ABSENT ? 1 : 0;
                if (!right) {
                    analyte(peak.assigned()).wrongCalls++;
                }
                if (Double.isFinite(peak.confidence())) {
                    confidenceOfCalls.add(peak.confidence());
                    callRight.add(right);
                }
            } else if ((v == Verdict.NOT_NAMED || v == Verdict.RIGHTLY_UNASSIGNED)
                    && Double.isFinite(peak.confidence())) {
                confidenceOfUnassigned.add(peak.confidence());
                unassignedRight.add(v == Verdict.RIGHTLY_UNASSIGNED);
            }
            if (truth != null && truth.kind() == KnownKind.ANALYTE && Double.isFinite(truth.mobility())
                    && Double.isFinite(peak.mobility())) {
                double d = peak.mobility() - truth.mobility();
                mobilityDifferences.add(d);
                analyte(truth.name()).mobilityDifferences.add(d);
            }
        }

        /** Counts for one known row, with the peak that belongs to it (or null). */
        private void known(KnownIdentity r, ReportedPeak peak) {
            int[] s = strata.get(HeightStratum.of(r.heightSd()));
            if (r.kind() == KnownKind.ANALYTE || r.kind() == KnownKind.FOREIGN) {
                zones++;
                s[S_ZONES]++;
                if (peak != null) {
                    zonesDetected++;
                    s[S_DETECTED]++;
                }
            }
            if (r.kind() != KnownKind.ANALYTE) {
                return;
            }
            boolean named = peak != null && peak.isCall() && r.nameKey().equals(KnownIdentity.key(peak.assigned()));
            boolean identified = named && peak.status() == ReportedPeak.Status.IDENTIFIED;
            boolean clear = r.heightSd() >= HeightStratum.CLEAR_HEIGHT_SD;
            present++;
            presentIdentified += identified ? 1 : 0;
            presentCalled += named ? 1 : 0;
            clearPresent += clear ? 1 : 0;
            clearIdentified += clear && identified ? 1 : 0;
            s[S_ANALYTES]++;
            s[S_IDENTIFIED] += identified ? 1 : 0;
            s[S_CALLED] += named ? 1 : 0;
            AnalyteTally a = analyte(r.name());
            a.present++;
            a.identifiedRight += identified ? 1 : 0;
            a.ambiguousRight += named && !identified ? 1 : 0;
        }

        /** The run's state and its marker check. */
        private RunCheck check(ReportedRun run, List<KnownIdentity> rows, List<ReportedPeak> peaks,
                               Map<Integer, ZoneMatching.Pair> byPeak) {
            if (run.failed()) {
                runsFailed++;
                return new RunCheck(run.name(), true, false, RunCheck.MarkerCheck.NOT_CHECKED, null);
            }
            if (!run.mobilityKnown()) {
                runsWithoutScale++;
            }
            KnownIdentity knownMarker = null;
            for (KnownIdentity r : rows) {
                if (r.kind() == KnownKind.MARKER && r.hasTime()) {
                    knownMarker = r;
                }
            }
            if (knownMarker == null) {
                return new RunCheck(run.name(), false, run.mobilityKnown(), RunCheck.MarkerCheck.NOT_CHECKED, null);
            }
            ReportedPeak chosen = null;
            boolean onKnown = false;
            for (int i = 0; i < peaks.size(); i++) {
                if (peaks.get(i).isNeutralMarker()) {
                    chosen = peaks.get(i);
                    ZoneMatching.Pair pair = byPeak.get(i);
                    onKnown = pair != null && pair.known() == knownMarker;
                    break;
                }
            }
            RunCheck.MarkerCheck state;
            String note = null;
            if (chosen == null) {
                state = RunCheck.MarkerCheck.NOT_REPORTED;
                note = String.format(Locale.ROOT, "no neutral marker was reported; the known marker is at %.2f s",
                        knownMarker.timeS());
            } else if (onKnown) {
                state = RunCheck.MarkerCheck.RIGHT;
            } else {
                state = RunCheck.MarkerCheck.OFF;
                note = String.format(Locale.ROOT, "the neutral marker chosen is at %.2f s; the known marker is at "
                        + "%.2f s", chosen.timeS(), knownMarker.timeS());
            }
            runsMarkerOff += state.problem() ? 1 : 0;
            return new RunCheck(run.name(), false, run.mobilityKnown(), state, note);
        }

        private AnalyteTally analyte(String name) {
            return analytes.computeIfAbsent(KnownIdentity.key(name), k -> new AnalyteTally(name.strip()));
        }

        Assessment result(String knownSource, String tableSource, List<String> notScored, List<String> notInTable,
                          List<String> extraNotes) {
            List<String> allNotes = new ArrayList<>();
            if (peaksWithoutTime > 0) {
                allNotes.add(peaksWithoutTime + " reported peak(s) have no time (no centre_time_s or apex_time_s column?) and "
                        + "can only be tied to known analytes by name");
            }
            if (unmatchableRows > 0) {
                allNotes.add(unmatchableRows + " known foreign, marker or spike row(s) have no time_s and cannot be "
                        + "tied to a peak");
            }
            allNotes.addAll(extraNotes);
            List<StratumScore> strataScores = new ArrayList<>();
            for (Map.Entry<HeightStratum, int[]> e : strata.entrySet()) {
                int[] s = e.getValue();
                strataScores.add(new StratumScore(e.getKey(), s[S_ANALYTES], s[S_IDENTIFIED], s[S_CALLED], s[S_ZONES],
                        s[S_DETECTED]));
            }
            List<AnalyteScore> analyteScores = new ArrayList<>();
            for (AnalyteTally a : analytes.values()) {
                analyteScores.add(new AnalyteScore(a.name, a.present, a.identifiedRight, a.ambiguousRight, a.wrongCalls,
                        a.present - a.identifiedRight - a.ambiguousRight, MobilityError.of(a.mobilityDifferences)));
            }
            Identification id = new Identification(identifiedCalls, identifiedRight, calls, callsRight, present,
                    presentIdentified, presentCalled, clearPresent, clearIdentified, wrongNames, calledAbsent,
                    present - presentCalled);
            Detection detection = new Detection(analytePeaks, analytePeaksOnZone, spikesReported, zones, zonesDetected,
                    runsFailed, runsWithoutScale, runsMarkerOff);
            return new Assessment(knownSource, tableSource, runs, notScored, notInTable, id, strataScores,
                    analyteScores, calibration(confidenceOfCalls, callRight),
                    calibration(confidenceOfUnassigned, unassignedRight), MobilityError.of(mobilityDifferences),
                    detection, verdicts, allNotes);
        }

        private static Calibration calibration(List<Double> confidence, List<Boolean> right) {
            double[] p = new double[confidence.size()];
            boolean[] o = new boolean[right.size()];
            for (int i = 0; i < p.length; i++) {
                p[i] = confidence.get(i);
                o[i] = right.get(i);
            }
            return Calibration.of(p, o);
        }
    }

    /** Counters of one analyte. */
    private static final class AnalyteTally {
        final String name;
        final List<Double> mobilityDifferences = new ArrayList<>();
        int present;
        int identifiedRight;
        int ambiguousRight;
        int wrongCalls;

        AnalyteTally(String name) {
            this.name = name;
        }
    }
}
