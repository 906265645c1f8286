package org.mobident.recheck;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The recheck of one library analyte, over all its earlier assignments: what a person asks after a
 * buffer change ("does it still hold, where is its window now?"), for the terminal summary.
 *
 * @param name            the analyte (library A's order)
 * @param mobilityA       its mobility in library A, 1e-9 m²/(V s)
 * @param mobilityB       its mobility in library B (measured or predicted), NaN when it is not there
 * @param shiftSd         standard uncertainty of the shift, NaN when unknown
 * @param windowHalfWidth half-width of its match window in library B for a peak measured without
 *                        uncertainty, NaN when it is not in library B
 * @param basis           what a prediction rested on (null when library B was measured)
 * @param verdicts        how many of its earlier assignments got each verdict (absent: none)
 * @param collidesWith    analytes its moved peaks now fall in with (ambiguous or reassigned), most frequent first
 */
public record AnalyteRecheck(String name, double mobilityA, double mobilityB, double shiftSd, double windowHalfWidth,
                             PredictionBasis basis, Map<Verdict, Integer> verdicts, List<String> collidesWith) {

    public AnalyteRecheck {
        verdicts = verdicts.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(verdicts));
        collidesWith = List.copyOf(collidesWith);
    }

    /** mobilityB − mobilityA (NaN when not in library B). */
    public double shift() {
        return mobilityB - mobilityA;
    }

    /** Number of earlier assignments of this analyte. */
    public int peaks() {
        return verdicts.values().stream().mapToInt(Integer::intValue).sum();
    }

    /** Number of its assignments that change (neither hold nor stay as ambiguous as they were). */
    public int affected() {
        return peaks() - verdicts.getOrDefault(Verdict.STILL_HOLDS, 0)
                - verdicts.getOrDefault(Verdict.STILL_AMBIGUOUS, 0);
    }

    /**
     * The verdict that matters most for the analyte: the worst among its assignments (in the
     * order still holds &lt; moved but still unique &lt; still ambiguous &lt; now ambiguous &lt; reassigned &lt; lost), or
     * null when it was not assigned to any peak.
     */
    public Verdict worst() {
        Verdict worst = null;
        for (Verdict v : verdicts.keySet()) {
            if (worst == null || v.ordinal() > worst.ordinal()) {
                worst = v;
            }
        }
        return worst;
    }
}
