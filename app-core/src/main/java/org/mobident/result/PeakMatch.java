package org.mobident.result;

import java.util.List;

/**
 * The matching outcome for one peak.
 *
 * @param assigned            the assigned analyte, or null
 * @param confidence          probability that the assignment is right; for an unassigned peak,
 *                            the probability that it is none of the library analytes
 * @param status              identified, ambiguous or unassigned
 * @param runnerUp            the next most likely analyte (null when none)
 * @param runnerUpProbability its probability (0 when none)
 * @param candidates          every analyte within its tolerance window, most likely first
 */
public record PeakMatch(String assigned, double confidence, MatchStatus status,
                        String runnerUp, double runnerUpProbability, List<Candidate> candidates) {
    public PeakMatch {
        candidates = List.copyOf(candidates);
    }

    public static PeakMatch none() {
        return new PeakMatch(null, 1.0, MatchStatus.UNASSIGNED, null, 0.0, List.of());
    }
}
