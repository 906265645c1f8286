package org.mobident.recheck;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.mobident.InputException;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;
import org.mobident.matching.LibraryMatcher;
import org.mobident.matching.MatchWindow;
import org.mobident.matching.MobilityAdjuster;
import org.mobident.matching.SpreadModel;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;

/**
 * Rechecks earlier assignments for a new buffer B, against a library measured in B or one
 * predicted from library A and B's conditions ({@link BufferTransfer}).
 *
 * <h2>Per assignment</h2>
 * For a peak assigned to analyte X, with μ_A(X) and μ_B(X) X's mobilities in libraries A and B:
 * <ol>
 *   <li>{@link Verdict#LOST} when X is not in library B, when |μ_B(X)| is below
 *       {@link RecheckSettings#lostBelowUnits()} or its sign differs from μ_A(X) (the analyte has
 *       lost or reversed its charge and now migrates with, or against, the EOF), or when μ_B(X)
 *       lies outside the observable range of the settings;</li>
 *   <li>otherwise the peak is moved by X's shift, μ' = μ_peak + (μ_B(X) − μ_A(X)), its standard
 *       uncertainty widened by the model part of the shift (without the part common to all
 *       analytes, {@link PredictedMobility#comparisonModelUncertainty()}), and every moved peak of the run is
 *       re-matched together against library B with the same {@link LibraryMatcher} that made the
 *       original assignments (one-to-one, with probabilities). This is the honest test: it asks
 *       "if this run were made in the new buffer, would the peak be recognised as X, and as X alone?";</li>
 *   <li>{@link Verdict#LOST} also when no window of the new library reaches the moved peak;</li>
 *   <li>{@link Verdict#REASSIGNED} when the re-match gives the moved peak to another analyte
 *       ("would now be taken for Y"), whatever its status;</li>
 *   <li>{@link Verdict#NOW_AMBIGUOUS} when the re-match does not identify X uniquely otherwise (X is
 *       ambiguous, or X is taken by another peak); the other analytes within the moved peak's
 *       windows are listed; {@link Verdict#STILL_AMBIGUOUS} instead when the call was ambiguous
 *       before too;</li>
 *   <li>otherwise X is still the only match, and the verdict says whether the analyst's old window
 *       still catches the peak: {@link Verdict#STILL_HOLDS} when the <em>moved</em> peak (with the
 *       peak's own uncertainty) falls inside X's candidate window of <em>library A</em> (the old
 *       buffer's library, the window the table was matched with), else
 *       {@link Verdict#MOVED_BUT_STILL_UNIQUE} (the window must move). Both reasons state this
 *       comparison with the moved mobility and X's old library value.</li>
 * </ol>
 * The candidate windows are those of the {@link org.mobident.settings.MatchSettings} in the
 * settings; a predicted library B carries each analyte's prediction uncertainty as its spread, so
 * the windows widen where the model is unsure.
 *
 * <h2>Pairs</h2>
 * Every pair of analytes present in both libraries is tested with the {@link SeparationRule}
 * in A (library spreads) and in B (spreads, or the comparison uncertainties of the predictions); the result lists the
 * pairs not resolved in at least one of them.
 *
 * <h2>Model check</h2>
 * With a measured library B and known conditions for both buffers, each analyte with model data
 * is also predicted from A, and measured − predicted is reported ({@link PredictionError}).
 */
public final class Rechecker {

    private Rechecker() {
    }

    /**
     * Recheck against a library measured in buffer B.
     *
     * @param rows       the earlier peak table
     * @param tableLabel its file name, for messages
     * @param libraryA   the library the table was matched against
     * @param bufferA    library A's buffer for entries that state none (null: only for the model check, skipped if needed)
     * @param libraryB   the library measured in buffer B
     * @param bufferB    buffer B's conditions for the model check (null: taken from library B when it states them)
     * @param predictor  the predictor for the model check
     * @param settings   settings
     * @throws InputException when an assigned analyte is not in library A
     */
    public static RecheckResult withMeasuredLibrary(List<PeakTableRow> rows, String tableLabel, Library libraryA,
                                                    BufferSpec bufferA, Library libraryB, BufferSpec bufferB,
                                                    BufferTransfer predictor, RecheckSettings settings)
            throws InputException {
        List<String> notes = new ArrayList<>();
        Map<String, Transfer> transfers = new LinkedHashMap<>();
        for (LibraryEntry a : libraryA.entries()) {
            LibraryEntry b = libraryB.find(a.name()).orElse(null);
            if (b == null) {
                continue;
            }
            double sA = spread(a, predictor);
            double sB = spread(b, predictor);
            double shiftSd = Math.hypot(sA / Math.sqrt(Math.max(a.n(), 1)), sB / Math.sqrt(Math.max(b.n(), 1)));
            transfers.put(a.name(), new Transfer(b.mobility(), sB, shiftSd, 0.0, null));
        }
        BufferSpec specB = bufferB;
        if (specB == null) {
            try {
                specB = BufferSpec.fromLibrary(libraryB).build();
            } catch (InputException | IllegalArgumentException e) {
                notes.add("model check skipped: the new buffer's conditions are not known (" + e.getMessage() + ")");
            }
        }
        List<PredictedMobility> predictions = new ArrayList<>();
        List<PredictionError> errors = new ArrayList<>();
        if (specB != null) {
            try {
                for (LibraryEntry a : libraryA.entries()) {
                    LibraryEntry b = libraryB.find(a.name()).orElse(null);
                    if (b == null) {
                        continue;
                    }
                    PredictedMobility p = predictor.predict(a, BufferSpec.forEntry(a, bufferA, libraryA.sourceFile()),
                            BufferSpec.forEntry(b, specB, libraryB.sourceFile()), libraryA.sourceFile());
                    predictions.add(p);
                    if (p.basis().modelled()) {
                        errors.add(new PredictionError(a.name(), p.predicted(), p.uncertainty(), b.mobility(),
                                p.basis()));
                    }
                }
            } catch (InputException e) {
                predictions.clear();
                errors.clear();
                notes.add("model check skipped: " + e.getMessage());
            }
        }
        for (LibraryEntry b : libraryB.entries()) {
            if (libraryA.find(b.name()).isEmpty()) {
                notes.add("'" + b.name() + "' is new in the new library (not in the old one)");
            }
        }
        List<String> missing = new ArrayList<>();
        for (LibraryEntry a : libraryA.entries()) {
            if (libraryB.find(a.name()).isEmpty()) {
                missing.add(a.name());
            }
        }
        if (!missing.isEmpty()) {
            notes.add(missing.size() + " analyte(s) of the old library are missing from the new library and cannot "
                    + "be identified with it: " + String.join(", ", missing));
        }
        return check(rows, tableLabel, libraryA, libraryB, specB, false, transfers, predictions, errors, notes,
                predictor, settings);
    }

    /**
     * Recheck against a library predicted from library A for buffer B's conditions.
     *
     * @param rows       the earlier peak table
     * @param tableLabel its file name, for messages
     * @param libraryA   the library the table was matched against
     * @param bufferA    library A's buffer for entries that state none (may be null when all entries state theirs)
     * @param bufferB    the new buffer
     * @param predictor  the predictor
     * @param settings   settings
     * @throws InputException when an entry's buffer is unknown or an assigned analyte is not in library A
     */
    public static RecheckResult withPredictedLibrary(List<PeakTableRow> rows, String tableLabel, Library libraryA,
                                                     BufferSpec bufferA, BufferSpec bufferB, BufferTransfer predictor,
                                                     RecheckSettings settings) throws InputException {
        List<PredictedMobility> predictions = predictor.predictAll(libraryA, bufferA, bufferB);
        Library libraryB = BufferTransfer.asLibrary(predictions, libraryA, bufferB);
        Map<String, Transfer> transfers = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        List<String> withoutModel = new ArrayList<>();
        for (PredictedMobility p : predictions) {
            transfers.put(p.name(), new Transfer(p.predicted(), p.comparisonUncertainty(), p.shiftUncertainty(),
                    p.comparisonModelUncertainty(), p.basis()));
            if (p.basis() == PredictionBasis.NO_MODEL) {
                withoutModel.add(p.name());
            }
        }
        List<String> assumed = predictions.stream().filter(p -> p.note().contains(BufferTransfer.NOTE_ASSUMED_ENTHALPY))
                .map(PredictedMobility::name).toList();
        if (!assumed.isEmpty()) {
            notes.add("pKa values moved to the new temperature with an assumed enthalpy of ionisation (none "
                    + "tabulated; its uncertainty is included): " + String.join(", ", assumed));
        }
        if (!withoutModel.isEmpty()) {
            // once for all of them, not per peak or per analyte
            notes.add("No model data for " + String.join(", ", withoutModel) + ": only temperature and ionic "
                    + "strength are carried over" + (predictions.stream().anyMatch(p -> p.basis() == PredictionBasis.NO_MODEL
                    && Math.abs(p.bufferB().pH() - p.bufferA().pH()) > BufferSpec.SAME_VALUE_TOLERANCE)
                    ? ", the pH change is not accounted for" : "")
                    + ". To fix: for each, " + ModelCoverage.HOW_TO_FIX + ".");
        }
        return check(rows, tableLabel, libraryA, libraryB, bufferB, true, transfers, predictions, List.of(), notes,
                predictor, settings);
    }

    /** An analyte's values in B. */
    private record Transfer(double mobilityB, double sdB, double shiftSd, double moveSd, PredictionBasis basis) {
    }

    private static double spread(LibraryEntry e, BufferTransfer predictor) {
        return Double.isFinite(e.mobilitySd()) ? e.mobilitySd() : predictor.assumedSpread();
    }

    private static RecheckResult check(List<PeakTableRow> rows, String tableLabel, Library libraryA, Library libraryB,
                                       BufferSpec bufferB, boolean predicted, Map<String, Transfer> transfers,
                                       List<PredictedMobility> predictions, List<PredictionError> errors,
                                       List<String> notes, BufferTransfer predictor, RecheckSettings s)
            throws InputException {
        Map<String, List<PeakTableRow>> byRun = new LinkedHashMap<>();
        int skipped = 0;
        for (PeakTableRow r : rows) {
            if (r.isAssignment()) {
                if (libraryA.find(r.assigned()).isEmpty()) {
                    throw new InputException(tableLabel, r.line(), "assigned", "analyte '" + r.assigned()
                            + "' is not in library " + libraryA.sourceFile()
                            + "; was the table matched against another library?");
                }
                byRun.computeIfAbsent(r.run(), k -> new ArrayList<>()).add(r);
            } else if (PeakTableRow.ROLE_ANALYTE.equals(r.role())) {
                skipped++;
            }
        }
        if (skipped > 0) {
            notes.add(skipped + " analyte peak(s) without an assignment were not rechecked");
        }
        Map<PeakTableRow, AssignmentCheck> checks = new HashMap<>();
        for (List<PeakTableRow> run : byRun.values()) {
            checkRun(run, libraryA, libraryB, transfers, s, checks);
        }
        List<AssignmentCheck> ordered = new ArrayList<>();
        for (PeakTableRow r : rows) {
            AssignmentCheck c = checks.get(r);
            if (c != null) {
                ordered.add(c);
            }
        }
        return new RecheckResult(libraryA.sourceFile(), libraryB.sourceFile(), bufferB, predicted, ordered,
                pairs(libraryA, transfers, predictor, s.separation()), predictions, errors, notes,
                analytes(libraryA, libraryB, transfers, ordered, s));
    }

    /** One summary per analyte of library A: its shift, its window in library B and its verdicts. */
    private static List<AnalyteRecheck> analytes(Library libraryA, Library libraryB, Map<String, Transfer> transfers,
                                                 List<AssignmentCheck> checks, RecheckSettings s) {
        List<AnalyteRecheck> out = new ArrayList<>(libraryA.size());
        for (LibraryEntry a : libraryA.entries()) {
            Transfer t = transfers.get(a.name());
            LibraryEntry b = libraryB.find(a.name()).orElse(null);
            double muB = t != null ? t.mobilityB() : b != null ? b.mobility() : Double.NaN;
            double window = b == null ? Double.NaN : oldWindowHalfWidth(libraryB, b, 0.0, s);
            Map<Verdict, Integer> verdicts = new java.util.EnumMap<>(Verdict.class);
            Map<String, Integer> collisions = new LinkedHashMap<>();
            for (AssignmentCheck c : checks) {
                if (c.analyte().equals(a.name())) {
                    verdicts.merge(c.verdict(), 1, Integer::sum);
                    for (String other : c.collidesWith()) {
                        collisions.merge(other, 1, Integer::sum);
                    }
                }
            }
            List<String> collide = collisions.entrySet().stream()
                    .sorted((x, y) -> Integer.compare(y.getValue(), x.getValue())).map(Map.Entry::getKey).toList();
            out.add(new AnalyteRecheck(a.name(), a.mobility(), muB, t == null ? Double.NaN : t.shiftSd(), window,
                    t == null ? null : t.basis(), verdicts, collide));
        }
        return out;
    }

    private static void checkRun(List<PeakTableRow> run, Library libraryA, Library libraryB,
                                 Map<String, Transfer> transfers, RecheckSettings s,
                                 Map<PeakTableRow, AssignmentCheck> out) {
        int n = run.size();
        double[] moved = new double[n];
        double[] movedSd = new double[n];
        double[] unmovedSd = new double[n];
        String[] lostReason = new String[n];
        for (int i = 0; i < n; i++) {
            PeakTableRow r = run.get(i);
            double muA = libraryA.find(r.assigned()).orElseThrow().mobility();
            Transfer t = transfers.get(r.assigned());
            moved[i] = Double.NaN;
            double sd = Double.isFinite(r.mobilitySd()) ? r.mobilitySd() : 0.0;
            if (t == null) {
                lostReason[i] = "not in the new library";
                continue;
            }
            if (Math.abs(t.mobilityB()) < s.lostBelowUnits()) {
                lostReason[i] = String.format(Locale.ROOT,
                        "its mobility in the new buffer, %.2f, is within %.2f of zero: it would migrate with the EOF",
                        t.mobilityB(), s.lostBelowUnits());
                continue;
            }
            if (Math.signum(t.mobilityB()) != Math.signum(muA)) {
                lostReason[i] = String.format(Locale.ROOT,
                        "its charge changes sign (%.2f in the old buffer, %.2f in the new): it would migrate the "
                                + "other way", muA,
                        t.mobilityB());
                continue;
            }
            if (!s.observable(t.mobilityB())) {
                lostReason[i] = String.format(Locale.ROOT,
                        "its mobility in the new buffer, %.2f, is outside the observable range",
                        t.mobilityB());
                continue;
            }
            moved[i] = r.comparedMobility() + (t.mobilityB() - muA);
            movedSd[i] = Math.hypot(sd, t.moveSd());
            unmovedSd[i] = sd;
        }
        List<PeakMatch> movedMatch = LibraryMatcher.match(moved, movedSd, libraryB, s.match(), MobilityAdjuster.IDENTITY);
        // the old window: the moved peak, with its own uncertainty, against library A as first matched
        List<PeakMatch> oldWindow = LibraryMatcher.match(moved, unmovedSd, libraryA, s.match(), MobilityAdjuster.IDENTITY);
        for (int i = 0; i < n; i++) {
            PeakTableRow r = run.get(i);
            String x = r.assigned();
            double muA = libraryA.find(x).orElseThrow().mobility();
            Transfer t = transfers.get(x);
            double muB = t == null ? Double.NaN : t.mobilityB();
            double shift = muB - muA;
            double shiftSd = t == null ? Double.NaN : t.shiftSd();
            PredictionBasis basis = t == null ? null : t.basis();
            if (lostReason[i] != null) {
                out.put(r, new AssignmentCheck(r.run(), r.peak(), x, r.status(), r.confidence(), r.comparedMobility(),
                        r.mobilitySd(), muA, muB, shift, shiftSd, r.comparedMobility() + shift, Double.NaN,
                        Verdict.LOST, List.of(), basis, lostReason[i]));
                continue;
            }
            PeakMatch m = movedMatch.get(i);
            Candidate own = null;
            List<String> others = new ArrayList<>();
            for (Candidate c : m.candidates()) {
                if (c.name().equals(x)) {
                    own = c;
                } else {
                    others.add(c.name());
                }
            }
            boolean unique = x.equals(m.assigned()) && m.status() == MatchStatus.IDENTIFIED;
            boolean inOldWindow = oldWindow.get(i).candidates().stream().anyMatch(c -> c.name().equals(x));
            Verdict verdict;
            String reason;
            String shiftText = String.format(Locale.ROOT, "shift %+.2f ± %.2f", shift, shiftSd);
            double halfWidth = oldWindowHalfWidth(libraryA, libraryA.find(x).orElseThrow(), unmovedSd[i], s);
            String where = String.format(Locale.ROOT, "the moved peak (%.2f) %s the window of %s in the old "
                    + "library (%.2f ± %.2f)", moved[i], inOldWindow ? "stays inside" : "falls outside", x, muA,
                    halfWidth);
            if (own == null && others.isEmpty()) {
                verdict = Verdict.LOST;
                reason = shiftText + String.format(Locale.ROOT, "; the moved peak (%.2f) falls outside the window of %s "
                        + "in the new library (centred on %.2f) and of every other analyte", moved[i], x, muB);
            } else if (m.assigned() != null && !x.equals(m.assigned())) {
                verdict = Verdict.REASSIGNED;
                reason = shiftText + String.format(Locale.ROOT, "; would now be taken for %s (%.2f likely)",
                        m.assigned(), m.confidence());
                reason += own == null ? "; the moved peak is outside the window of " + x + " in the new library"
                        : String.format(Locale.ROOT, " rather than %s (%.2f likely)", x, own.probability());
            } else if (!unique) {
                verdict = Verdict.NOW_AMBIGUOUS;
                if (own == null) {
                    reason = shiftText + "; outside its own window in the new library, within that of "
                            + String.join(", ", others);
                } else if (!x.equals(m.assigned())) {
                    reason = shiftText + "; " + x + " is better explained by another peak of the run";
                } else {
                    reason = shiftText + String.format(Locale.ROOT, "; %s only %.2f likely", x, own.probability());
                }
                if (PeakTableRow.STATUS_AMBIGUOUS.equals(r.status())) {
                    verdict = Verdict.STILL_AMBIGUOUS;
                    reason += " (ambiguous before too)";
                }
            } else if (inOldWindow) {
                verdict = Verdict.STILL_HOLDS;
                reason = shiftText + "; " + where + ", and " + x + " is still the only match";
            } else {
                verdict = Verdict.MOVED_BUT_STILL_UNIQUE;
                reason = shiftText + "; " + where + ": the window must move, but " + x
                        + " is still the only match in the new library";
            }
            out.put(r, new AssignmentCheck(r.run(), r.peak(), x, r.status(), r.confidence(), r.comparedMobility(),
                    r.mobilitySd(), muA, muB, shift, shiftSd, moved[i], own == null ? Double.NaN : own.probability(),
                    verdict, verdict == Verdict.NOW_AMBIGUOUS || verdict == Verdict.STILL_AMBIGUOUS
                            || verdict == Verdict.REASSIGNED ? others : List.of(), basis,
                    reason));
        }
    }

    /**
     * Half-width of an entry's candidate window for a peak of standard uncertainty {@code peakSd},
     * exactly as matching applies it ({@link MatchWindow}, with the spreads of the whole library),
     * so that the number printed in a reason is the one the verdict used.
     */
    public static double oldWindowHalfWidth(Library library, LibraryEntry entry, double peakSd, RecheckSettings s) {
        int j = library.entries().indexOf(entry);
        double peakVariance = Double.isFinite(peakSd) ? peakSd * peakSd : 0.0;
        return MatchWindow.halfWidth(entry, SpreadModel.of(library, s.match()), j, peakVariance, s.match());
    }

    private static List<PairCheck> pairs(Library libraryA, Map<String, Transfer> transfers, BufferTransfer predictor,
                                         SeparationRule rule) {
        List<LibraryEntry> present = new ArrayList<>();
        for (LibraryEntry e : libraryA.entries()) {
            if (transfers.containsKey(e.name())) {
                present.add(e);
            }
        }
        List<PairCheck> out = new ArrayList<>();
        for (int i = 0; i < present.size(); i++) {
            LibraryEntry a = present.get(i);
            Transfer ta = transfers.get(a.name());
            for (int j = i + 1; j < present.size(); j++) {
                LibraryEntry b = present.get(j);
                Transfer tb = transfers.get(b.name());
                PairCheck p = new PairCheck(a.name(), b.name(), a.mobility() - b.mobility(),
                        rule.threshold(spread(a, predictor), spread(b, predictor)), ta.mobilityB() - tb.mobilityB(),
                        Math.hypot(ta.sdB(), tb.sdB()), rule.threshold(ta.sdB(), tb.sdB()));
                if (!p.resolvedA() || !p.resolvedB()) {
                    out.add(p);
                }
            }
        }
        return out;
    }
}
