package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.matching.MatchStatus;
import org.mobident.matching.PeakMatch;
import org.mobident.pipeline.PeakResult;
import org.mobident.pipeline.PeakRole;
import org.mobident.pipeline.RunResult;
import org.mobident.trace.Trace;

class PlotLayoutTest {

    @Test
    void ticksSpanThePlotArea() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotLayout l = PlotLayout.of(PlotModel.of(a.trace(), a.result(), null, Axis.TIME), 900, 330);
        assertEquals(l.plotLeft(), l.px(l.xTicks().first()), 1e-9);
        assertEquals(l.plotRight(), l.px(l.xTicks().last()), 1e-9);
        assertEquals(l.plotBottom(), l.py(l.yTicks().first()), 1e-9);
        assertEquals(l.plotTop(), l.py(l.yTicks().last()), 1e-9);
        assertTrue(l.yTicks().last() > PlotFixtures.BASELINE + PlotFixtures.ANION_HEIGHT, "room for labels");
    }

    @Test
    void decimationKeepsASingleSampleSpikeIn60000Points() {
        int n = 60_000;
        double[] t = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i * 0.01;
            y[i] = Math.sin(i * 0.001) * 0.1;
        }
        int spike = 41_234;
        y[spike] = 5.0;
        PlotModel m = PlotModel.builder(Axis.TIME).run(new Trace("s", "s.csv", t, y), null).build();
        PlotLayout l = PlotLayout.of(m, 800, 300);
        PlotLayout.Polyline p = l.curves().get(0);
        assertTrue(p.size() <= 4 * (l.plotRight() - l.plotLeft() + 2), "at most four points per column: " + p.size());
        assertTrue(p.size() > l.plotRight() - l.plotLeft(), "at least one point per column");
        double spikeY = l.py(5.0);
        boolean found = false;
        for (int i = 0; i < p.size(); i++) {
            found |= Math.abs(p.ys()[i] - spikeY) < 1e-9 && Math.abs(p.xs()[i] - l.px(t[spike])) < 1e-9;
            if (i > 0) {
                assertTrue(p.xs()[i] >= p.xs()[i - 1], "points stay in order");
            }
        }
        assertTrue(found, "the spike survives decimation");
    }

    @Test
    void closePeaksGetLabelsThatDoNotOverlap() {
        double[] t = new double[4001];
        double[] y = new double[t.length];
        double[] apex = {100, 101.5, 103};
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 0.05;
            for (double c : apex) {
                y[i] += 5 * Math.exp(-0.5 * Math.pow((t[i] - c) / 0.3, 2));
            }
        }
        List<PeakResult> peaks = new java.util.ArrayList<>();
        for (double c : apex) {
            peaks.add(new PeakResult(PlotFixtures.peak(c, 5), PeakRole.ANALYTE, 1, 0.1, 1,
                    new PeakMatch("a rather long analyte name", 0.9, MatchStatus.IDENTIFIED, null, 0, List.of())));
        }
        RunResult r = new RunResult(PlotFixtures.spec("c", null), null, "x", Double.NaN, null, peaks, List.of(), 0);
        PlotLayout l = PlotLayout.of(PlotModel.of(new Trace("c", "c.csv", t, y), r, null, Axis.TIME), 900, 330);
        List<PlotLayout.TextBox> labels = l.peakLabels();
        assertEquals(3, labels.size());
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                assertFalse(labels.get(i).overlaps(labels.get(j), 0), "labels " + i + " and " + j + " overlap");
            }
            assertTrue(labels.get(i).top() >= l.plotTop(), "label inside the plot");
        }
        assertTrue(labels.stream().anyMatch(PlotLayout.TextBox::leader), "a raised label has a leader line");
    }

    @Test
    void dipsAreMarkedBelowTheirApex() {
        double[] t = new double[2001];
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 0.1;
            y[i] = -4 * Math.exp(-0.5 * Math.pow((t[i] - 100) / 1.0, 2));
        }
        org.mobident.signal.Peak p = new org.mobident.signal.Peak(1000, 100, 0.01, 96, 104, 4, 10, 0.1, 2.35,
                10000, Double.NaN, 100, true);
        RunResult r = new RunResult(PlotFixtures.spec("d", null), null, "x", Double.NaN, null,
                List.of(new PeakResult(p, PeakRole.ANALYTE, 1, 0.1, 1, PeakMatch.none())), List.of(), 0);
        PlotLayout l = PlotLayout.of(PlotModel.of(new Trace("d", "d.csv", t, y), r, null, Axis.TIME), 900, 330);
        PlotLayout.MarkerSpot m = l.markers().get(0);
        assertTrue(m.cy() > l.py(-4), "marker below the dip");
        assertTrue(l.peakLabels().get(0).top() > m.cy(), "label below the marker");
        assertTrue(l.peakLabels().get(0).bottom() <= l.plotBottom(), "and inside the plot");
    }

    @Test
    void refusesATinyCanvas() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotModel m = PlotModel.of(a.trace(), a.result(), null, Axis.TIME);
        assertThrows(IllegalArgumentException.class, () -> PlotLayout.of(m, 40, 30));
    }
}
