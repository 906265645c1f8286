package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.report.plot.Axis;

class ViewStateTest {
    private static final double EPS = 1e-9;
    private static final XRange LIMITS = new XRange(0, 1000);

    @Test
    void tickedRunsAreSortedAndWithoutRepeats() {
        ViewState s = ViewState.initial(Axis.TIME, List.of(3, 1, 3));
        assertEquals(List.of(1, 3), s.tickedRuns());
        assertNull(s.xRange());
        assertNull(s.selectedPeak());
        assertTrue(s.bands());
    }

    @Test
    void zoomingKeepsTheAnchorInPlace() {
        ViewState s = ViewState.initial(Axis.TIME, List.of(0));
        XRange current = new XRange(100, 200);
        ViewState z = s.zoomedAt(current, 125, 0.5, LIMITS);
        // span 100 → 50; 125 stays a quarter of the way in: 125 − 0.25·50 = 112.5
        assertEquals(112.5, z.xRange().lo(), EPS);
        assertEquals(162.5, z.xRange().hi(), EPS);
        ViewState back = z.zoomedAt(z.xRange(), 125, 2.0, LIMITS);
        assertEquals(100, back.xRange().lo(), EPS);
        assertEquals(200, back.xRange().hi(), EPS);
    }

    @Test
    void zoomStopsAtTheDeepestZoomAndAtTheLimits() {
        ViewState s = ViewState.initial(Axis.TIME, List.of(0));
        ViewState deep = s.zoomedAt(new XRange(100, 200), 150, 1e-6, LIMITS);
        assertEquals(LIMITS.span() * ViewState.MIN_SPAN_FRACTION, deep.xRange().span(), EPS);
        assertEquals(150, deep.xRange().centre(), EPS);

        ViewState wide = s.zoomedAt(new XRange(100, 200), 150, 1000, LIMITS);
        assertEquals(LIMITS, wide.xRange());

        // zooming out near an end slides the range back inside rather than past the data
        ViewState edge = s.zoomedAt(new XRange(0, 100), 0, 3, LIMITS);
        assertEquals(0, edge.xRange().lo(), EPS);
        assertEquals(300, edge.xRange().hi(), EPS);
    }

    @Test
    void zoomToADraggedRangeAcceptsEitherDirection() {
        ViewState s = ViewState.initial(Axis.MOBILITY, List.of(0));
        XRange limits = new XRange(-80, 60);
        ViewState z = s.zoomedTo(-20, -40, limits);
        assertEquals(new XRange(-40, -20), z.xRange());
        ViewState tiny = s.zoomedTo(10, 10.0001, limits);
        assertEquals(limits.span() * ViewState.MIN_SPAN_FRACTION, tiny.xRange().span(), EPS);
        assertEquals(10.00005, tiny.xRange().centre(), EPS);
        ViewState outside = s.zoomedTo(50, 90, limits);
        assertEquals(new XRange(20, 60), outside.xRange(), "moved back inside, span kept");
    }

    @Test
    void panningMovesTheRangeAndStopsAtTheEnds() {
        ViewState s = ViewState.initial(Axis.TIME, List.of(0));
        XRange current = new XRange(300, 400);
        assertEquals(new XRange(350, 450), s.pannedBy(current, 50, LIMITS).xRange());
        assertEquals(new XRange(900, 1000), s.pannedBy(current, 5000, LIMITS).xRange());
        assertEquals(new XRange(0, 100), s.pannedBy(current, -5000, LIMITS).xRange());
    }

    @Test
    void resetAndAxisSwitchReturnToTheAutomaticRangeButKeepTheSelection() {
        ViewState s = ViewState.initial(Axis.TIME, List.of(0, 2)).withSelectedPeak(new PeakRef(2, 1))
                .zoomedTo(10, 20, LIMITS);
        ViewState reset = s.reset();
        assertNull(reset.xRange());
        assertEquals(new PeakRef(2, 1), reset.selectedPeak());
        assertEquals(List.of(0, 2), reset.tickedRuns());

        ViewState mob = s.withAxis(Axis.MOBILITY);
        assertEquals(Axis.MOBILITY, mob.axis());
        assertNull(mob.xRange(), "a range in seconds means nothing on the mobility axis");
        assertEquals(new PeakRef(2, 1), mob.selectedPeak());
        assertSame(s, s.withAxis(Axis.TIME));
    }

    @Test
    void untickingTheRunOfTheSelectedPeakClearsTheSelection() {
        ViewState s = ViewState.initial(Axis.MOBILITY, List.of(0, 1)).withSelectedPeak(new PeakRef(1, 3));
        assertEquals(new PeakRef(1, 3), s.withRunTicked(0, false).selectedPeak());
        assertNull(s.withRunTicked(1, false).selectedPeak());
        assertEquals(List.of(0, 1, 4), s.withRunTicked(4, true).tickedRuns());
        assertThrows(IllegalArgumentException.class, () -> s.withSelectedPeak(new PeakRef(5, 0)));
    }

    @Test
    void badInputIsRefused() {
        ViewState s = ViewState.initial(Axis.TIME, List.of(0));
        assertThrows(IllegalArgumentException.class, () -> s.zoomedAt(new XRange(0, 1), 0.5, 0, LIMITS));
        assertThrows(IllegalArgumentException.class, () -> s.pannedBy(new XRange(0, 1), Double.NaN, LIMITS));
        assertThrows(IllegalArgumentException.class, () -> new XRange(2, 2));
        assertThrows(IllegalArgumentException.class, () -> ViewState.initial(Axis.TIME, List.of(-1)));
    }
}
