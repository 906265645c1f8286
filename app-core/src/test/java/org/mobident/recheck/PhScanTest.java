package org.mobident.recheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.InputException;
import org.mobident.buffer.BufferConditions;
import org.mobident.buffer.SpeciesModel;
import org.mobident.chem.MobilityPredictor;
import org.mobident.library.Library;
import org.mobident.library.LibraryEntry;

class PhScanTest {

    /** Invented species: a weak acid (pKa 4, anion −30) measured at pH 7 and a strong anion (−20). */
    private static Library library() {
        SpeciesModel weak = SpeciesModel.acid("weak", List.of(4.0), List.of(-30.0));
        double measuredWeak = MobilityPredictor.effectiveMobility(weak, new BufferConditions(7, 0, 25));
        return new Library(List.of(
                new LibraryEntry("weak", measuredWeak, 0.2, 0, -1, Double.NaN, List.of(4.0), List.of(0.0, -30.0),
                        null, 7, 0, 25, "invented"),
                new LibraryEntry("strong", -20.0, 0.2, 0, -1, Double.NaN, List.of(), List.of(-20.0),
                        null, 7, 0, 25, "invented")), "lib.csv", List.of());
    }

    /**
     * With a fixed 1-unit threshold (k = 0) the answer is analytical: |−30α + 20| &lt; 1 for α in
     * (19/30, 21/30), i.e. pH 4 + log10(19/11) … 4 + log10(21/9) (written-out Henderson–Hasselbalch).
     */
    @Test
    void comigrationIntervalOfAWeakAcidAndAStrongIon() throws InputException {
        PhScan.Result r = PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of(), 2.0, 8.0, 0.1, 0.0,
                25.0, new SeparationRule(1.0, 0.0));
        assertEquals(61, r.pH().size());
        assertEquals(8.0, r.pH().get(60), 0.0);
        assertEquals(1, r.comigrations().size());
        PhScan.Comigration c = r.comigrations().get(0);
        assertEquals("weak", c.first());
        assertEquals("strong", c.second());
        assertEquals(4 + Math.log10(19.0 / 11.0), c.interval().fromPh(), 2e-4);
        assertEquals(4 + Math.log10(21.0 / 9.0), c.interval().toPh(), 2e-4);
        assertTrue(c.closestUnits() < 1.0);
        // the curve passes through the measured value at pH 7
        assertEquals(library().entries().get(0).mobility(), r.curves().get(0).mobility().get(50), 1e-9);
    }

    @Test
    void uncertaintyWidensTheInterval() throws InputException {
        PhScan.Result fixed = PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of("strong", "weak"),
                2.0, 8.0, 0.1, 0.0, 25.0, new SeparationRule(1.0, 0.0));
        PhScan.Result withK = PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of("strong", "weak"),
                2.0, 8.0, 0.1, 0.0, 25.0, SeparationRule.DEFAULT);
        assertEquals("strong", withK.curves().get(0).name(), "the order asked for");
        assertTrue(withK.comigrations().get(0).interval().width() > fixed.comigrations().get(0).interval().width());
    }

    @Test
    void badArgumentsAreRejected() {
        BufferTransfer p = BufferTransfer.withoutReference();
        assertThrows(IllegalArgumentException.class,
                () -> PhScan.scan(p, library(), null, List.of(), 8, 2, 0.1, 0, 25, SeparationRule.DEFAULT));
        assertThrows(IllegalArgumentException.class,
                () -> PhScan.scan(p, library(), null, List.of(), 2, 8, 0, 0, 25, SeparationRule.DEFAULT));
        assertThrows(IllegalArgumentException.class,
                () -> PhScan.scan(p, library(), null, List.of(), 0, 14, 1e-4, 0, 25, SeparationRule.DEFAULT));
        InputException ex = assertThrows(InputException.class,
                () -> PhScan.scan(p, library(), null, List.of("nitrate"), 2, 8, 0.5, 0, 25, SeparationRule.DEFAULT));
        assertEquals("name", ex.field());
    }

    /**
     * The curves cross at α = 2/3, pH 4 + log10(2) (Henderson–Hasselbalch, written out). With a
     * 3-unit floor the interval is α in (17/30, 23/30); on a 0.5 step only pH 4.5 lies inside it,
     * where |Δμ| is 2.8 — the closest value must still be the crossing, not that grid point.
     */
    @Test
    void closestIsFoundOnTheIntervalNotOnTheGrid() throws InputException {
        PhScan.Result r = PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of(), 2.0, 8.0, 0.5, 0.0,
                25.0, new SeparationRule(3.0, 0.0));
        assertEquals(1, r.comigrations().size(), r.comigrations().toString());
        PhScan.Comigration c = r.comigrations().get(0);
        assertEquals(0.0, c.closestUnits(), 1e-3);
        assertEquals(4 + Math.log10(2.0), c.closestPh(), 2e-4);
        assertEquals(4 + Math.log10(17.0 / 13.0), c.interval().fromPh(), 2e-4);
        assertEquals(4 + Math.log10(23.0 / 7.0), c.interval().toPh(), 2e-4);
        assertTrue(c.overlapping(new SeparationRule(3.0, 0.0)) && c.closestUnits() < c.thresholdUnits());
        assertFalse(c.fromScanStart() || c.toScanEnd());
    }

    /** A crossing between two grid points that are both resolved is still found (1-unit floor, step 0.5). */
    @Test
    void aCrossingBetweenResolvedGridPointsIsFound() throws InputException {
        PhScan.Result r = PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of(), 2.0, 8.0, 0.5, 0.0,
                25.0, new SeparationRule(1.0, 0.0));
        assertEquals(1, r.comigrations().size(), r.comigrations().toString());
        PhScan.Comigration c = r.comigrations().get(0);
        assertEquals(4 + Math.log10(19.0 / 11.0), c.interval().fromPh(), 2e-4);
        assertEquals(4 + Math.log10(21.0 / 9.0), c.interval().toPh(), 2e-4);
        assertEquals(0.0, c.closestUnits(), 1e-3);
    }

    /** Every reported interval has its closest value below the threshold; a clipped one says so. */
    @Test
    void intervalsTouchingTheScanEndsAreMarked() throws InputException {
        PhScan.Result r = PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of(), 4.3, 8.0, 0.1, 0.0,
                25.0, new SeparationRule(1.0, 0.0));
        assertEquals(1, r.comigrations().size(), r.comigrations().toString());
        PhScan.Comigration c = r.comigrations().get(0);
        assertTrue(c.fromScanStart());
        assertEquals(4.3, c.interval().fromPh(), 0.0);
        assertEquals(4 + Math.log10(21.0 / 9.0), c.interval().toPh(), 2e-4);
        assertFalse(c.toScanEnd());
        for (SeparationRule rule : List.of(SeparationRule.DEFAULT, new SeparationRule(1.0, 0.0))) {
            for (PhScan.Comigration x : PhScan.scan(BufferTransfer.withoutReference(), library(), null, List.of(), 2.0,
                    8.0, 0.37, 0.0, 25.0, rule).comigrations()) {
                assertTrue(x.closestUnits() < x.thresholdUnits(), x.toString());
                assertTrue(x.interval().width() > 0, x.toString());
            }
        }
    }
}
