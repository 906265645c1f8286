package org.mobident.recheck;

import java.util.List;

/**
 * The outcome of a recheck.
 *
 * @param libraryA         label of the library the earlier results were matched against
 * @param libraryB         label of the new library (measured, or predicted from A)
 * @param bufferB          the new buffer's conditions, or null when not known (measured library without conditions)
 * @param predicted        true when library B was predicted from A and buffer B's conditions
 * @param assignments      one check per earlier assignment, in table order
 * @param pairs            analyte pairs not resolved in A or in B (pairs resolved in both are left out)
 * @param predictions      the per-analyte predictions behind library B (or behind the prediction errors; may be empty)
 * @param predictionErrors measured − predicted per modelled analyte, when a measured library B was compared
 * @param notes            remarks for the analyst
 * @param analytes         one summary per analyte of library A, in its order
 */
public record RecheckResult(String libraryA, String libraryB, BufferSpec bufferB, boolean predicted,
                            List<AssignmentCheck> assignments, List<PairCheck> pairs,
                            List<PredictedMobility> predictions, List<PredictionError> predictionErrors,
                            List<String> notes, List<AnalyteRecheck> analytes) {

    /** The caution a report ends with when the new library was predicted ({@link #caution()}). */
    public static final String CAUTION = "Identification by effective mobility is presumptive, and so is this "
            + "recheck, which rests on a model of the buffer change. Confirm with standards run in the new buffer "
            + "and, where results carry legal, clinical or safety weight, by an orthogonal method and the "
            + "laboratory's validated procedures.";

    /** The caution a report ends with when a library measured in the new buffer was given ({@link #caution()}). */
    public static final String CAUTION_MEASURED = "Identification by effective mobility is presumptive, and so is "
            + "this recheck, which rests on the measured new library (the model is only used to check its "
            + "predictions against it). Confirm doubtful peaks with standards and, where results carry legal, "
            + "clinical or safety weight, by an orthogonal method and the laboratory's validated procedures.";

    public RecheckResult {
        assignments = List.copyOf(assignments);
        pairs = List.copyOf(pairs);
        predictions = List.copyOf(predictions);
        predictionErrors = List.copyOf(predictionErrors);
        notes = List.copyOf(notes);
        analytes = List.copyOf(analytes);
    }

    /** The closing caution: {@link #CAUTION} for a predicted new library, {@link #CAUTION_MEASURED} for a measured one. */
    public String caution() {
        return predicted ? CAUTION : CAUTION_MEASURED;
    }

    /** True when any assignment changes (it neither holds nor stays as ambiguous as it was), or any
     *  pair became unresolvable. */
    public boolean needsAttention() {
        return assignments.stream().anyMatch(a -> !a.verdict().unchanged())
                || pairs.stream().anyMatch(PairCheck::becameUnresolvable);
    }

    /** The pairs not resolved in A but resolved in B. */
    public List<PairCheck> newlyResolvable() {
        return pairs.stream().filter(PairCheck::becameResolvable).toList();
    }

    /** The pairs resolved in A but not in B. */
    public List<PairCheck> newlyUnresolvable() {
        return pairs.stream().filter(PairCheck::becameUnresolvable).toList();
    }

    /** How many assignments got the verdict. */
    public long count(Verdict verdict) {
        return assignments.stream().filter(a -> a.verdict() == verdict).count();
    }
}
