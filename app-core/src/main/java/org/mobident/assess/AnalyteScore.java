package org.mobident.assess;

/**
 * The scores of one library analyte over the scored runs. A call is an identified or ambiguous peak.
 *
 * @param name            analyte name (as first written in the known table, or as called)
 * @param present         runs in which it is present (known analyte rows)
 * @param identifiedRight of those, identified with its name
 * @param ambiguousRight  of those, called ambiguous with its name
 * @param wrongCalls      calls of this name that were wrong (another analyte's peak, or no analyte's)
 * @param missed          of those present, without a right call: present − identifiedRight − ambiguousRight
 * @param mobilityError   reported minus true mobility over its analyte peaks with a known true mobility
 */
public record AnalyteScore(String name, int present, int identifiedRight, int ambiguousRight, int wrongCalls,
                           int missed, MobilityError mobilityError) {

    /** Right calls out of all calls of this name. */
    public Ratio precision() {
        return new Ratio(identifiedRight + ambiguousRight, identifiedRight + ambiguousRight + wrongCalls);
    }

    /** Identified with the right name, out of the runs it is present in (ambiguous calls not counted). */
    public Ratio recall() {
        return new Ratio(identifiedRight, present);
    }
}
