package org.mobident.report.plot;

import java.util.Locale;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;

/** How a peak is drawn: what the matching said about it, or that it is a marker. */
public enum PeakStatus {
    /** One library analyte clearly explains the peak. */
    IDENTIFIED,
    /** An analyte is assigned, but another explanation is nearly as likely. */
    AMBIGUOUS,
    /** No library analyte explains the peak. */
    UNASSIGNED,
    /** A neutral or mobility marker of the run. */
    MARKER;

    /** The status of a pipeline peak: markers by their role, analytes by their match. */
    public static PeakStatus of(PeakResult peak) {
        if (peak.role() != PeakRole.ANALYTE) {
            return MARKER;
        }
        MatchStatus s = peak.match() == null ? MatchStatus.UNASSIGNED : peak.match().status();
        switch (s) {
            case IDENTIFIED:
                return IDENTIFIED;
            case AMBIGUOUS:
                return AMBIGUOUS;
            default:
                return UNASSIGNED;
        }
    }

    /** Lower-case word for legends and tables. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
