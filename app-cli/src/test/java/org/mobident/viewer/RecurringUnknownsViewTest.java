package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.settings.MatchSettings;
import org.mobident.summary.RecurringUnknowns;

/** The viewer names the unknowns that recur in its runs, as the batch reports do. */
class RecurringUnknownsViewTest {

    private static ViewerData data(ViewerRun... runs) {
        return new ViewerData(ViewerFixtures.library(),
                ToleranceBand.matching(ViewerFixtures.library(), MatchSettings.DEFAULT), List.of(runs));
    }

    @Test
    void anUnknownSeenInTwoRunsIsNamedInTheDetailsOfEachOfItsPeaks() {
        // each fixture run holds one unassigned peak at mobility -10 (its third peak)
        ViewerData d = data(ViewerFixtures.run("early", 200, true), ViewerFixtures.run("late", 220, true));
        List<RecurringUnknowns.Group> groups = d.recurringUnknowns();
        assertEquals(1, groups.size(), groups.toString());
        RecurringUnknowns.Group g = groups.get(0);
        assertEquals(List.of("early", "late"), g.runs());
        assertEquals(g, d.recurringUnknownOf(new PeakRef(0, 2)));
        assertEquals(g, d.recurringUnknownOf(new PeakRef(1, 2)));
        assertNull(d.recurringUnknownOf(new PeakRef(0, 3)), "an identified peak belongs to no unknown");
        String html = PeakDetails.html("late", d.runs().get(1).result(), d.peak(new PeakRef(1, 2)),
                d.recurringUnknownOf(new PeakRef(1, 2)));
        assertTrue(html.contains("Recurs as") && html.contains(g.name() + ": μ ≈ -10.00 in 2 of 2 runs"), html);
    }

    @Test
    void anUnknownOfOneRunDoesNotRecur() {
        ViewerData d = data(ViewerFixtures.run("early", 200, true));
        assertTrue(d.recurringUnknowns().isEmpty());
        assertNull(d.recurringUnknownOf(new PeakRef(0, 2)));
    }

    @Test
    void thePeakTableShowsAnUnassignedPeaksConfidenceAsTheReportsDo() {
        // the terminal and HTML reports write an unassigned peak's confidence as "93 % none", the table too;
        // its '± u' column is the uncertainty that decided the match (lithium: |-0.1 / -0.2| = 0.5)
        ViewerData d = data(ViewerFixtures.run("early", 200, true));
        PeakTableModel table = new PeakTableModel();
        table.show(d, List.of(0));
        int unassigned = table.rowOf(new PeakRef(0, 2));
        int lithium = table.rowOf(new PeakRef(0, 0));
        assertEquals("93 % none", table.getValueAt(unassigned, 5));
        assertEquals("55 %", table.getValueAt(lithium, 5));
        assertEquals(0.5, (Double) table.getValueAt(lithium, 3), 1e-12);
        assertEquals("± u", table.getColumnName(3));
    }
}
