package org.mobident.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Insets;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.KeyStroke;
import javax.swing.text.View;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.PlotModel;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.Candidate;
import org.mobident.result.MatchStatus;
import org.mobident.result.PeakMatch;
import org.mobident.result.PeakResult;
import org.mobident.result.RunResult;
import org.mobident.result.RunScale;
import org.mobident.settings.MatchSettings;

/** The window's content laid out without a window (headless), as the frame lays it out. */
class ViewerWindowTest {

    /** The content of a 1400 × 900 window, less a title bar of 40 px. */
    private static final int WIDTH = 1400;
    private static final int HEIGHT = 900 - 40;
    /** Share of the panel's width and height kept free for fonts that draw larger than the test's. */
    private static final double FONT_MARGIN = 0.06;

    static {
        System.setProperty("java.awt.headless", "true");
    }

    @BeforeAll
    static void look() {
        assertTrue(Look.install(Viewer.Theme.LIGHT), "FlatLaf is on the class path");
    }

    /**
     * The fixture data with a first run whose nitrate peak carries everything the details show:
     * six candidates, a value at the library temperature and a scale-corrected value, a fitted scale.
     */
    private static ViewerData richData() {
        ViewerData plain = ViewerFixtures.data();
        ViewerRun first = plain.runs().get(0);
        RunResult r = first.result();
        List<PeakResult> peaks = new ArrayList<>(r.peaks());
        PeakResult nitrate = peaks.get(ViewerFixtures.NITRATE);
        List<Candidate> many = List.of(new Candidate("nitrate", -30.05, 0.05, 0.2, 0.90),
                new Candidate("chlorate (technical grade)", -30.9, 0.9, 1.4, 0.05),
                new Candidate("bromide", -29.2, -0.8, -1.3, 0.03), new Candidate("nitrite", -31.3, 1.3, 2.0, 0.01),
                new Candidate("iodide", -28.9, -1.1, -1.8, 0.007), new Candidate("thiocyanate", -31.6, 1.6, 2.4, 0.003));
        PeakMatch m = new PeakMatch("nitrate", 0.90, MatchStatus.IDENTIFIED, "chlorate (technical grade)", 0.05, many);
        peaks.set(ViewerFixtures.NITRATE, new PeakResult(nitrate.peak(), nitrate.role(), -30.4, 0.05, -30.2, m, -30.1));
        RunScale scale = new RunScale(RunScale.Status.FITTED, 1.002, 0.001, 0.3, 0.05, 0.0, 4.9);
        RunResult rich = new RunResult(r.spec(), null, r.scaleNote(), r.eofMobility(), r.scale(), peaks, r.notes(),
                r.noiseSd(), scale, 1.0);
        List<ViewerRun> runs = new ArrayList<>(plain.runs());
        runs.set(0, new ViewerRun(first.spec(), first.trace(), rich));
        return new ViewerData(plain.library(), ToleranceBand.matching(plain.library(), MatchSettings.DEFAULT), runs);
    }

    private static ViewerWindow window(ViewState state) {
        return ViewerWindow.offScreen(richData(), state, WIDTH, HEIGHT);
    }

    @Test
    void theDetailsOfARichPeakFitWithoutScrollingAt1400By900() {
        PeakRef nitrate = new PeakRef(0, ViewerFixtures.NITRATE);
        ViewerWindow w = window(ViewState.initial(Axis.MOBILITY, List.of(0, 1)).withSelectedPeak(nitrate));
        String html = w.details().getText();
        assertTrue(html.contains("nitrite") && !html.contains("iodide"), "four candidates listed");
        assertTrue(html.contains("and 2 less likely"));
        String plain = html.replace('\u00a0', ' ').replace("&#160;", " ").replace("&nbsp;", " ");
        assertTrue(plain.contains("a = 1.0020, b = +0.30"), "the run's scale correction is shown");

        java.awt.Dimension extent = w.detailsPane().getViewport().getExtentSize();
        Insets in = w.details().getInsets();
        View root = w.details().getUI().getRootView(w.details());
        float innerWidth = extent.width - in.left - in.right;
        root.setSize(innerWidth, Integer.MAX_VALUE / 2f);
        float needed = root.getPreferredSpan(View.Y_AXIS) + in.top + in.bottom;
        assertTrue(extent.width >= 500 && extent.height >= 200, "the panel has a sensible size: " + extent);
        assertTrue(w.runTable().getParent().getWidth() >= ViewerWindow.RUN_LIST_WIDTH - 20,
                "the run list keeps its width: " + w.runTable().getParent().getWidth());
        assertTrue(w.peakTable().getParent().getWidth() >= ViewerWindow.PEAK_TABLE_WIDTH - 30,
                "the peak table keeps its width: " + w.peakTable().getParent().getWidth());
        assertTrue(needed <= extent.height * (1 - FONT_MARGIN), "details need " + needed + " px of " + extent + " min width " + root.getMinimumSpan(View.X_AXIS));
        // with room to spare: a desktop's font settings draw text a few per cent wider than here
        assertTrue(w.details().getMinimumSize().width <= extent.width * (1 - FONT_MARGIN),
                "details need " + w.details().getMinimumSize().width + " px wide of " + extent.width);
    }

    @Test
    void theRunListShowsEachDrawnRunInItsCurveColour() {
        // runs 0 and 2 ticked on the mobility axis: run 2 has no scale, so only run 0 is drawn
        ViewerWindow w = window(ViewState.initial(Axis.MOBILITY, List.of(0, 2)));
        assertEquals(PlotModel.seriesColour(0), w.scene().colourOf(0));
        assertNull(w.scene().colourOf(1), "not ticked");
        assertNull(w.scene().colourOf(2), "ticked but not drawn on this axis");
        assertEquals(Color.decode(PlotModel.seriesColour(0)), swatch(w, 0).colour);
        assertNull(swatch(w, 1).colour);

        // on the time axis both are drawn, in the order of the list
        ViewerWindow t = window(ViewState.initial(Axis.TIME, List.of(0, 2)));
        assertEquals(PlotModel.seriesColour(1), t.scene().colourOf(2));
        assertEquals(Color.decode(PlotModel.seriesColour(1)), swatch(t, 2).colour);
        assertEquals(2, t.scene().model().series().size());
    }

    private static ViewerWindow.Swatch swatch(ViewerWindow w, int row) {
        JLabel cell = (JLabel) w.runTable().prepareRenderer(w.runTable().getCellRenderer(row, 1), row, 1);
        assertEquals(w.runTable().getValueAt(row, 1), cell.getText());
        return (ViewerWindow.Swatch) cell.getIcon();
    }

    @Test
    void thePeakTableIsWalkedWithTheKeyboard() {
        ViewerWindow w = window(ViewState.initial(Axis.MOBILITY, List.of(0, 1)));
        assertNull(w.state().selectedPeak());
        w.pressInPeakTable(KeyStroke.getKeyStroke(KeyEvent.VK_DOWN, 0));
        assertEquals(0, w.peakTable().getSelectedRow());
        PeakRef first = w.state().selectedPeak();
        assertNotNull(first, "a row chosen with the keyboard selects its peak");
        assertTrue(w.details().getText().contains("Apex time"), "and shows it");
        w.pressInPeakTable(KeyStroke.getKeyStroke(KeyEvent.VK_DOWN, 0));
        w.pressInPeakTable(KeyStroke.getKeyStroke(KeyEvent.VK_ENTER, 0));
        assertEquals(2, w.peakTable().getSelectedRow(), "Enter moves down too");
        assertEquals(w.peakTable().getRowCount() > 2 ? w.state().selectedPeak() : null, w.state().selectedPeak());
        assertFalse(first.equals(w.state().selectedPeak()));
        w.pressInPeakTable(KeyStroke.getKeyStroke(KeyEvent.VK_ESCAPE, 0));
        assertNull(w.state().selectedPeak(), "Esc clears the selection");
        assertEquals(-1, w.peakTable().getSelectedRow());
    }

    @Test
    void thePlotStepsThroughThePeaksFromLeftToRightAndPansToThem() {
        ViewerWindow w = window(ViewState.initial(Axis.MOBILITY, List.of(0)));
        List<PlotScene.PeakSpot> byX = new ArrayList<>(w.scene().spots());
        byX.sort(java.util.Comparator.comparingDouble(PlotScene.PeakSpot::x));
        w.plotPanel().pressKey("next-peak");
        assertEquals(byX.get(0).ref(), w.state().selectedPeak(), "the leftmost first");
        w.plotPanel().pressKey("next-peak");
        assertEquals(byX.get(1).ref(), w.state().selectedPeak());
        w.plotPanel().pressKey("previous-peak");
        assertEquals(byX.get(0).ref(), w.state().selectedPeak());
        w.plotPanel().pressKey("previous-peak");
        assertEquals(byX.get(0).ref(), w.state().selectedPeak(), "stays at the end");
        assertEquals(w.peakTable().convertRowIndexToView(0) >= 0, true);

        // zoomed in around the leftmost peak, stepping to the rightmost pans it into view
        double x0 = byX.get(0).x();
        w.zoomTo(x0 - 1, x0 + 1);
        for (int i = 1; i < byX.size(); i++) {
            w.plotPanel().pressKey("next-peak");
        }
        PlotScene.PeakSpot last = byX.get(byX.size() - 1);
        assertEquals(last.ref(), w.state().selectedPeak());
        assertTrue(w.scene().current().contains(last.x()), "panned to " + last.x() + ": " + w.scene().current());
        w.plotPanel().pressKey("reset-view");
        assertNull(w.state().xRange());
        w.plotPanel().pressKey("clear-selection");
        assertNull(w.state().selectedPeak());
    }

    @Test
    void theDarkThemeKeepsTheDetailsReadable() {
        try {
            assertTrue(Look.install(Viewer.Theme.DARK));
            java.awt.Color bg = javax.swing.UIManager.getColor("Panel.background");
            java.awt.Color label = Color.decode(PeakDetails.labelColour());
            // the labels stand out from the dark panel by at least half the brightness scale
            assertTrue(brightness(label) - brightness(bg) > 0.4, "labels " + label + " on " + bg);
        } finally {
            Look.install(Viewer.Theme.LIGHT);
        }
        java.awt.Color bg = javax.swing.UIManager.getColor("Panel.background");
        assertTrue(brightness(bg) - brightness(Color.decode(PeakDetails.labelColour())) > 0.4, "and on the light one");
    }

    private static float brightness(Color c) {
        return Color.RGBtoHSB(c.getRed(), c.getGreen(), c.getBlue(), null)[2];
    }

    @Test
    void runsOfTwoBuffersOnOneAxisAreNamedInTheStatusLine() {
        ViewerData d = richData();
        ViewerRun late = d.runs().get(1);
        org.mobident.trace.RunSpec other = new org.mobident.trace.RunSpec("late", late.spec().traceFile(),
                new org.mobident.trace.RunConditions(60, 50, 25, 0, 25, "acetate", Double.NaN, Double.NaN,
                        org.mobident.trace.Detection.DIRECT, Double.NaN, Double.NaN, Double.NaN), "runs.csv", 3);
        RunResult r = late.result();
        RunResult moved = new RunResult(other, null, r.scaleNote(), r.eofMobility(), r.scale(), r.peaks(), r.notes(),
                r.noiseSd());
        List<ViewerRun> runs = new ArrayList<>(d.runs());
        runs.set(1, new ViewerRun(other, late.trace(), moved));
        ViewerData mixed = new ViewerData(d.library(), ToleranceBand.matching(d.library(), MatchSettings.DEFAULT), runs);
        ViewerWindow w = ViewerWindow.offScreen(mixed, ViewState.initial(Axis.MOBILITY, List.of(0, 1)), WIDTH, HEIGHT);
        assertEquals(2, w.scene().bufferGroups().size());
        assertTrue(w.statusText().contains("Runs of 2 buffers share this axis (Buffer borate, anions: 1 run; "
                + "Buffer acetate, anions: 1 run)"), w.statusText());
        ViewerWindow same = window(ViewState.initial(Axis.MOBILITY, List.of(0, 1)));
        assertEquals(1, same.scene().bufferGroups().size());
        assertFalse(same.statusText().contains("buffers"), same.statusText());
    }

    @Test
    void theMarkerHasThePlotsWordInTheTable() {
        PeakResult marker = ViewerFixtures.run("early", 200, true).result().peaks().get(1);
        assertEquals("marker", PeakTableModel.assigned(marker));
        assertEquals(PlotModel.labelOf(marker), PeakTableModel.assigned(marker));
    }

    @Test
    void theRunListTipGivesTheScaleCorrectionInFull() {
        ViewerWindow w = window(ViewState.initial(Axis.MOBILITY, List.of(0)));
        java.awt.Rectangle cell = w.runTable().getCellRect(0, 1, true);
        String tip = w.runTable().getToolTipText(new java.awt.event.MouseEvent(w.runTable(), 0, 0, 0,
                cell.x + 2, cell.y + 2, 0, false));
        assertTrue(tip.contains("run scale correction: a = 1.0020 ± 0.0010, b = +0.30 ± 0.05 (from 4.9 matched peaks)"), tip);
    }
}
