package org.mobident.pipeline;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.ToDoubleFunction;
import org.mobident.result.Candidate;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;

/**
 * The remark for a peak whose two likeliest library analytes cannot be told apart in this run:
 * their library mobilities lie closer than the peak's own width at half height (in mobility
 * units), so the two zones would overlap to resolution Rs = 1.18·Δμ/(2·w½,μ) &lt; 0.6 and come out
 * as one peak (resolution from the half-height widths, Ph. Eur. 2.2.46; two zones of equal width
 * assumed). The zone may then hold both, and neither name can be trusted from the mobility alone:
 * the analyst should look at the zone's shape, or dilute or change the buffer.
 */
final class CoMigration {

    /** Both candidates must carry at least this posterior probability for the remark. */
    static final double MIN_SHARE = 0.15;

    private CoMigration() {
    }

    /**
     * The rows with the remark set on every analyte peak that calls for it.
     *
     * @param rows            a run's peaks
     * @param widthInMobility a peak's width at half height in mobility units (library temperature)
     */
    static List<PeakResult> remarked(List<PeakResult> rows, ToDoubleFunction<PeakResult> widthInMobility) {
        List<PeakResult> out = new ArrayList<>(rows.size());
        for (PeakResult pr : rows) {
            String note = null;
            if (pr.role() == PeakRole.ANALYTE && pr.match().candidates().size() >= 2) {
                Set<String> elsewhere = new HashSet<>();
                for (PeakResult other : rows) {
                    if (other != pr && other.match().assigned() != null) {
                        elsewhere.add(other.match().assigned());
                    }
                }
                note = note(pr.match(), widthInMobility.applyAsDouble(pr), elsewhere);
            }
            out.add(note == null ? pr : new PeakResult(pr.peak(), pr.role(), pr.mobility(), pr.mobilitySd(),
                    pr.mobilityAtLibraryTemp(), pr.match(), pr.mobilityCorrected(), note));
        }
        return out;
    }

    /**
     * The remark for an ambiguous peak, or null.
     *
     * @param match            the peak's match
     * @param widthInMobility  the peak's width at half height in mobility units (library temperature)
     * @param namedElsewhere   the analytes assigned to other peaks of the run
     */
    static String note(PeakMatch match, double widthInMobility, Set<String> namedElsewhere) {
        if (match.candidates().size() < 2 || !(widthInMobility > 0)) {
            return null;
        }
        Candidate first = null;
        Candidate second = null;
        for (Candidate c : match.candidates()) {
            if (first == null || c.probability() > first.probability()) {
                second = first;
                first = c;
            } else if (second == null || c.probability() > second.probability()) {
                second = c;
            }
        }
        if (second == null || second.probability() < MIN_SHARE || first.probability() < MIN_SHARE) {
            return null;
        }
        String other = first.name().equals(match.assigned()) ? second.name() : first.name();
        if (namedElsewhere.contains(other)) {
            return null; // the other analyte has a peak of its own in this run
        }
        double gap = Math.abs(first.libraryMobility() - second.libraryMobility());
        if (!(gap < widthInMobility)) {
            return null;
        }
        return String.format(Locale.ROOT, "%s and %s co-migrate at this zone's width: their library mobilities "
                        + "differ by %.2f units, the zone is %.2f units wide at half height; it may hold both",
                first.name(), second.name(), gap, widthInMobility);
    }
}
