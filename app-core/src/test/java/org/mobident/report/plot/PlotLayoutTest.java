package org.mobident.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.PeakRole;
import org.mobident.result.RunResult;
import org.mobident.trace.Trace;

class PlotLayoutTest {

    @Test
    void xTicksSpanThePlotAreaAndYTicksLieInsideIt() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotLayout l = PlotLayout.of(PlotModel.of(a.trace(), a.result(), null, Axis.TIME), 900, 330);
        assertEquals(l.plotLeft(), l.px(l.xTicks().first()), 1e-9);
        assertEquals(l.plotRight(), l.px(l.xTicks().last()), 1e-9);
        assertEquals(l.plotBottom(), l.py(l.yAxisLow()), 1e-9);
        assertEquals(l.plotTop(), l.py(l.yAxisHigh()), 1e-9);
        assertTrue(l.yTicks().count() >= 3, "a y scale: " + l.yTicks());
        for (double v : l.yTicks().values()) {
            assertTrue(v >= l.yAxisLow() - 1e-9 && v <= l.yAxisHigh() + 1e-9, "tick " + v + " inside the axis");
        }
        assertTrue(l.yAxisHigh() > PlotFixtures.BASELINE + PlotFixtures.ANION_HEIGHT, "room for labels");
    }

    @Test
    void theYRangeIsTightAroundTheSignal() {
        // A flat run without peaks from 0.5 to 10.5: the axis keeps only a few pixels beyond the signal
        // (Heckbert's loose labels would have widened 0.5..10.5 to 0..12).
        double[] t = new double[1001];
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 0.1;
            y[i] = 0.5 + 10.0 * i / (t.length - 1);
        }
        PlotLayout l = PlotLayout.of(PlotModel.builder(Axis.TIME).run(new Trace("f", "f.csv", t, y), null).build(), 900, 330);
        double pxPerUnit = (l.plotBottom() - l.plotTop()) / (l.yAxisHigh() - l.yAxisLow());
        assertEquals(PlotLayout.PLAIN_PAD_PX, (0.5 - l.yAxisLow()) * pxPerUnit, 1e-6);
        assertEquals(PlotLayout.PLAIN_PAD_PX, (l.yAxisHigh() - 10.5) * pxPerUnit, 1e-6);
        assertTrue(l.yAxisLow() > 0 && l.yAxisHigh() < 11, l.yAxisLow() + ".." + l.yAxisHigh());
    }

    @Test
    void labelledPeaksGetOnlyTheRoomTheirLabelsNeed() {
        PlotFixtures.SyntheticRun a = PlotFixtures.run("a", 200, 1.0);
        PlotLayout l = PlotLayout.of(PlotModel.of(a.trace(), a.result(), null, Axis.TIME), 900, 330);
        double top = PlotFixtures.BASELINE + PlotFixtures.ANION_HEIGHT;
        double roomPx = l.py(top) - l.plotTop();
        // the marker, its label and one spare row of labels: under a fifth of the plot's height
        assertTrue(roomPx > PlotLayout.LABEL_ROOM_ROWS * PlotStyle.LABEL_FONT && roomPx < 0.2 * (l.plotBottom() - l.plotTop()),
                "room above the tallest peak: " + roomPx + " px");
        PlotLayout.TextBox tallest = l.peakLabels().stream().filter(b -> b.text().startsWith("nitrate")).findFirst()
                .orElseThrow();
        assertFalse(tallest.leader(), "the tallest peak's label sits right above it");
        assertTrue(tallest.top() >= l.plotTop(), "inside the plot");
        assertEquals(PlotLayout.PLAIN_PAD_PX, l.plotBottom() - l.py(PlotFixtures.BASELINE), 0.5, "nothing below");
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
        assertEquals(3, labels.size() + l.hiddenLabels());
        assertTrue(labels.size() >= 2, "two of three long labels find a place: " + labels.size());
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                assertFalse(labels.get(i).overlaps(labels.get(j), 0), "labels " + i + " and " + j + " overlap");
            }
            assertTrue(labels.get(i).top() >= l.plotTop(), "label inside the plot");
        }
        assertTrue(labels.stream().anyMatch(PlotLayout.TextBox::leader), "a raised label has a leader line");
    }

    /** A crowded run: {@code n} peaks within a few seconds, of random heights, named, ambiguous and unknown. */
    private static PlotModel crowded(long seed, int n, boolean dips) {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(seed);
        double[] t = new double[6001];
        double[] y = new double[t.length];
        double[] apex = new double[n];
        double[] height = new double[n];
        for (int k = 0; k < n; k++) {
            apex[k] = 120 + 30.0 * k / n + rnd.nextDouble(0, 0.4);
            height[k] = rnd.nextDouble(0.5, 8);
        }
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 0.05;
            for (int k = 0; k < n; k++) {
                y[i] += (dips ? -1 : 1) * height[k] * Math.exp(-0.5 * Math.pow((t[i] - apex[k]) / 0.2, 2));
            }
        }
        List<PeakResult> peaks = new java.util.ArrayList<>();
        for (int k = 0; k < n; k++) {
            org.mobident.result.Peak p = PlotFixtures.peak(apex[k], height[k]);
            if (dips) {
                p = new org.mobident.result.Peak(p.apexIndex(), p.apexTimeS(), p.apexTimeSdS(), p.startTimeS(),
                        p.endTimeS(), p.height(), p.area(), p.correctedArea(), p.widthHalfS(), p.plates(),
                        p.resolution(), p.signalToNoise(), true);
            }
            int kind = rnd.nextInt(4);
            PeakMatch m = kind == 0 ? PeakMatch.none()
                    : new PeakMatch("analyte number " + k, 0.9, kind == 1 ? MatchStatus.AMBIGUOUS : MatchStatus.IDENTIFIED,
                    null, 0, List.of());
            peaks.add(new PeakResult(p, PeakRole.ANALYTE, 1, 0.1, 1, m));
        }
        RunResult r = new RunResult(PlotFixtures.spec("crowd", null), null, "x", Double.NaN, null, peaks, List.of(), 0);
        return PlotModel.of(new Trace("crowd", "crowd.csv", t, y), r, null, Axis.TIME);
    }

    @Test
    void crowdedLabelsNeverOverlapEachOtherMarkersOrLeaders() {
        int hidden = 0;
        for (long seed = 1; seed <= 12; seed++) {
            PlotModel m = crowded(seed, 10 + (int) seed * 3, seed % 2 == 0);
            PlotLayout l = PlotLayout.of(m, 900, 360);
            List<PlotLayout.TextBox> labels = l.peakLabels();
            long labelled = m.peaks().stream().filter(p -> !p.label().isEmpty()).count();
            assertEquals(labelled, labels.size() + l.hiddenLabels(), "every label is drawn or counted as hidden");
            assertTrue(labels.size() >= 3, "seed " + seed + ": some labels are drawn");
            hidden += l.hiddenLabels();
            double reach = PlotLayout.markerReach();
            for (int i = 0; i < labels.size(); i++) {
                PlotLayout.TextBox a = labels.get(i);
                assertTrue(a.left() >= l.plotLeft() && a.right() <= l.plotRight()
                        && a.top() >= l.plotTop() && a.bottom() <= l.plotBottom(), "seed " + seed + ": inside the plot");
                for (int j = 0; j < labels.size(); j++) {
                    PlotLayout.TextBox b = labels.get(j);
                    if (i != j) {
                        assertFalse(a.overlaps(b, 0), "seed " + seed + ": labels '" + a.text() + "' and '" + b.text() + "' overlap");
                        assertFalse(a.leaderCrosses(b), "seed " + seed + ": a leader line crosses label '" + b.text() + "'");
                    }
                }
                for (PlotLayout.MarkerSpot s : l.markers()) {
                    assertFalse(a.overlaps(s.cx() - reach, s.cy() - reach, s.cx() + reach, s.cy() + reach, 0),
                            "seed " + seed + ": label '" + a.text() + "' covers a marker");
                }
            }
        }
        assertTrue(hidden > 0, "so crowded that some labels must be left out");
    }

    @Test
    void whereLabelsCrowdNamedAndLargerPeaksKeepTheirs() {
        for (long seed = 1; seed <= 12; seed++) {
            PlotModel m = crowded(seed, 40, false);
            PlotLayout l = PlotLayout.of(m, 900, 360);
            assertTrue(l.hiddenLabels() > 0, "seed " + seed + ": crowded");
            java.util.Set<String> shown = new java.util.HashSet<>();
            l.peakLabels().forEach(b -> shown.add(b.text()));
            PlotModel.PeakMark largestNamed = m.peaks().stream().filter(PlotModel.PeakMark::named)
                    .max(java.util.Comparator.comparingDouble(PlotModel.PeakMark::size)).orElseThrow();
            assertTrue(shown.contains(largestNamed.label()), "seed " + seed + ": the largest named peak keeps its label");
            // Unknown peaks' labels are placed last: without them the named labels sit exactly where they are.
            List<PlotModel.PeakMark> namedOnly = m.peaks().stream().map(p -> p.named() ? p
                    : new PlotModel.PeakMark(p.series(), p.x(), p.y(), p.dip(), "", p.status(), p.size())).toList();
            PlotModel withoutUnknowns = new PlotModel(m.axis(), m.title(), m.series(), namedOnly, m.bands(), m.xMin(),
                    m.xMax(), m.yMin(), m.yMax(), true, false, List.of());
            assertEquals(l.peakLabels().stream().filter(b -> !b.text().equals("?")).toList(),
                    PlotLayout.of(withoutUnknowns, 900, 360).peakLabels(), "seed " + seed);
            // Likewise the smaller half of the named peaks does not move the larger half's labels.
            double median = m.peaks().stream().filter(PlotModel.PeakMark::named).mapToDouble(PlotModel.PeakMark::size)
                    .sorted().skip(namedOnly.stream().filter(PlotModel.PeakMark::named).count() / 2).findFirst().orElseThrow();
            List<PlotModel.PeakMark> largeOnly = namedOnly.stream().map(p -> p.size() >= median ? p
                    : new PlotModel.PeakMark(p.series(), p.x(), p.y(), p.dip(), "", p.status(), p.size())).toList();
            java.util.Set<String> large = new java.util.HashSet<>();
            largeOnly.stream().filter(p -> !p.label().isEmpty()).forEach(p -> large.add(p.label()));
            PlotModel largeModel = new PlotModel(m.axis(), m.title(), m.series(), largeOnly, m.bands(), m.xMin(),
                    m.xMax(), m.yMin(), m.yMax(), true, false, List.of());
            assertEquals(l.peakLabels().stream().filter(b -> large.contains(b.text())).toList(),
                    PlotLayout.of(largeModel, 900, 360).peakLabels(), "seed " + seed);
        }
    }

    @Test
    void dipsAreMarkedBelowTheirApex() {
        double[] t = new double[2001];
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 0.1;
            y[i] = -4 * Math.exp(-0.5 * Math.pow((t[i] - 100) / 1.0, 2));
        }
        org.mobident.result.Peak p = new org.mobident.result.Peak(1000, 100, 0.01, 96, 104, 4, 10, 0.1, 2.35,
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
