package org.mobident.assess;

/**
 * The identification scores over the scored runs. A call is an analyte peak reported identified or
 * ambiguous; it is right when the peak belongs to a known analyte row of that name.
 *
 * @param identifiedCalls       peaks reported identified
 * @param identifiedRight       of them, right
 * @param calls                 peaks reported identified or ambiguous
 * @param callsRight            of them, right
 * @param analytesPresent       known analyte rows (library analytes present)
 * @param presentIdentified     of them, identified with the right name
 * @param presentCalled         of them, identified or ambiguous with the right name
 * @param clearPresent          known analyte rows with height over noise SD of at least
 *                              {@link HeightStratum#CLEAR_HEIGHT_SD}
 * @param clearIdentified       of them, identified with the right name
 * @param wrongNames            calls on another library analyte's peak
 * @param calledAbsent          calls where no library analyte is
 * @param missed                analytes present without a right call
 */
public record Identification(int identifiedCalls, int identifiedRight, int calls, int callsRight,
                             int analytesPresent, int presentIdentified, int presentCalled, int clearPresent,
                             int clearIdentified, int wrongNames, int calledAbsent, int missed) {

    /** Right identified calls out of all identified calls. */
    public Ratio precision() {
        return new Ratio(identifiedRight, identifiedCalls);
    }

    /** Right calls out of all calls, identified or ambiguous. */
    public Ratio precisionWithAmbiguous() {
        return new Ratio(callsRight, calls);
    }

    /** Analytes present that were identified with the right name. */
    public Ratio recall() {
        return new Ratio(presentIdentified, analytesPresent);
    }

    /** Analytes present that were identified or called ambiguous with the right name. */
    public Ratio recallWithAmbiguous() {
        return new Ratio(presentCalled, analytesPresent);
    }

    /** Recall among the analytes present at a height of at least {@link HeightStratum#CLEAR_HEIGHT_SD} noise SDs. */
    public Ratio recallClear() {
        return new Ratio(clearIdentified, clearPresent);
    }
}
