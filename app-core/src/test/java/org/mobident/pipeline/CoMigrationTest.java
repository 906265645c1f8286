package org.mobident.pipeline;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;

/**
 * The co-migration remark: two candidates closer in library mobility than the zone is wide at
 * half height would give Rs = 1.18·Δμ/(2·w½) &lt; 0.6 (Ph. Eur. 2.2.46 resolution from half-height
 * widths) and come out as one peak.
 */
class CoMigrationTest {

    private static PeakMatch ambiguous(double p1, double p2) {
        return new PeakMatch("nitrite", p1, MatchStatus.AMBIGUOUS, "nitrate", p2, List.of(
                new Candidate("nitrite", -72.2, 0.4, 0.5, p1), new Candidate("nitrate", -71.0, -0.8, -1.0, p2)));
    }

    @Test
    void twoLikelyCandidatesCloserThanTheZoneWidthAreNamed() {
        String note = CoMigration.note(ambiguous(0.6, 0.38), 2.1, Set.of());
        assertNotNull(note);
        assertTrue(note.contains("nitrite and nitrate") && note.contains("1.20 units") && note.contains("2.10"), note);
    }

    @Test
    void noRemarkWhenTheZoneIsNarrowerThanTheGap() {
        // Δμ = 1.2 units, w½ = 0.9 units: Rs = 1.18·1.2/1.8 = 0.79, two peaks could be seen
        assertNull(CoMigration.note(ambiguous(0.6, 0.38), 0.9, Set.of()));
    }

    @Test
    void noRemarkWhenTheOtherAnalyteHasItsOwnPeakOrIsUnlikely() {
        assertNull(CoMigration.note(ambiguous(0.6, 0.38), 2.1, Set.of("nitrate")));
        assertNull(CoMigration.note(ambiguous(0.9, 0.08), 2.1, Set.of()));
        assertNull(CoMigration.note(ambiguous(0.6, 0.38), Double.NaN, Set.of()));
    }
}
