package org.mobident.matching;

import java.util.List;
import org.mobident.result.Candidate;
import org.mobident.result.PeakMatch;
import org.mobident.result.RunScale;

/**
 * The matching outcome for one run.
 *
 * @param matches     one match per peak, in the order the mobilities were given
 * @param scale       the run's scale correction
 * @param logEvidence ln of the run's marginal likelihood under the library, relative to "every
 *                    peak foreign" (used to compare marker choices); NaN when no peak had a mobility
 * @param modes       number of distinct scale corrections that carried weight (1 when the run's
 *                    peaks pin the scale; more when they fit several ways and the confidences mix them)
 */
public record RunMatch(List<PeakMatch> matches, RunScale scale, double logEvidence, int modes) {
    public RunMatch {
        matches = List.copyOf(matches);
    }

    /** Expected number of peaks the library explains: the sum over peaks of 1 − P(none). */
    public double explainedPeaks() {
        double sum = 0;
        for (PeakMatch m : matches) {
            for (Candidate c : m.candidates()) {
                sum += c.probability();
            }
        }
        return sum;
    }
}
