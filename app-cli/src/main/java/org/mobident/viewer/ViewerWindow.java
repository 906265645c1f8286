package org.mobident.viewer;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GraphicsEnvironment;
import java.awt.Rectangle;
import java.awt.event.KeyEvent;
import java.awt.event.MouseEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComponent;
import javax.swing.JEditorPane;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import javax.swing.ListSelectionModel;
import javax.swing.table.AbstractTableModel;
import org.mobident.report.ScaleCorrectionText;
import org.mobident.report.plot.Axis;
import org.mobident.report.plot.ToleranceBand;
import org.mobident.result.PeakResult;
import org.mobident.settings.IdentifySettings;
import org.mobident.summary.RecurringUnknowns;
import org.mobident.text.NumberText;
import org.mobident.trace.RunSpec;

/**
 * The window: run list on the left, plot above, peak table and peak details below, a row of
 * controls on top and a status line at the bottom. It keeps the current {@link ViewerData} and
 * {@link ViewState}, replaces them on every change and redraws from them; it decides nothing
 * that {@link ViewState} and {@link PlotScene} do not already compute.
 */
final class ViewerWindow implements PlotPanel.Gestures {

    static final String HINT = "Wheel: zoom   Drag: zoom to range   Shift-drag: pan   Click: select a peak";

    /** Share of the height the plot gets when the window opens. */
    static final double PLOT_SHARE = 0.55;

    /** The window's size when the screen allows it. */
    static final Dimension WINDOW = new Dimension(1400, 900);

    /** Width of the run list, px. */
    static final int RUN_LIST_WIDTH = 245;

    /** Width of the peak table when the window opens, px. */
    static final int PEAK_TABLE_WIDTH = 530;

    /** Preferred width of the details panel, px (wide enough for its two columns). */
    static final int DETAILS_WIDTH = 600;

    /** Gap between controls and around panels, px. */
    private static final int GAP = 8;

    /** The window, or null when the content is laid out without one (tests). */
    private final JFrame frame;
    private JSplitPane centreSplit;
    private JSplitPane bottomSplit;
    private JSplitPane mainSplit;
    private JScrollPane detailsPane;
    private final PlotPanel plot = new PlotPanel();
    private final RunListModel runModel = new RunListModel();
    private final JTable runTable;
    private final PeakTableModel peakModel = new PeakTableModel();
    private final JTable peakTable = new JTable(peakModel);
    private final JEditorPane details = new JEditorPane("text/html", "");
    private final JLabel status = new JLabel(" ");
    private final JLabel cursor = new JLabel(" ");
    private final JRadioButton timeAxis = new JRadioButton("Time");
    private final JRadioButton mobilityAxis = new JRadioButton("Mobility");
    private final JCheckBox bandsBox = new JCheckBox("Library windows");
    private final JComponent content;

    private ViewerData data;
    private ViewState state;
    private PlotScene scene;
    private RunLoader loader;
    private boolean loading;
    /** True while the peak table's selection is being set from the state (not by the user). */
    private boolean syncing;

    private ViewerWindow(ViewerData initialData, ViewState initialState, String title, Runnable onClosed,
                         boolean withFrame) {
        data = initialData;
        state = initialState;
        runTable = new JTable(runModel) {
            private static final long serialVersionUID = 1L;

            @Override
            public String getToolTipText(MouseEvent e) {
                int row = rowAtPoint(e.getPoint());
                return row < 0 ? null : runTip(data.runs().get(row));
            }
        };
        content = layoutContent();
        plot.setGestures(this);
        refreshAll(true);
        if (!withFrame) {
            frame = null;
            return;
        }
        frame = new JFrame(title.isEmpty() ? "Mobident viewer" : "Mobident viewer – " + title);
        frame.setDefaultCloseOperation(JFrame.DISPOSE_ON_CLOSE);
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosed(WindowEvent e) {
                if (loader != null) {
                    loader.cancel(true);
                }
                onClosed.run();
            }
        });
        frame.setContentPane(content);
        Rectangle screen = GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
        frame.setSize(Math.min(WINDOW.width, screen.width), Math.min(WINDOW.height, screen.height));
        frame.setLocationRelativeTo(null);
    }

    /** The state a window of {@code setup} starts in: the runs asked for ticked (else the first). */
    private static ViewState initialState(Viewer.Setup setup, ViewerData data) {
        List<Integer> ticked = new ArrayList<>();
        for (int i : setup.tickedAtStart()) {
            if (i >= 0 && i < data.runs().size()) {
                ticked.add(i);
            }
        }
        if (ticked.isEmpty() && !data.runs().isEmpty()) {
            ticked.add(0);
        }
        return ViewState.initial(setup.axis(), ticked);
    }

    /** Builds and shows the window, then starts processing the runs; call on the Event Dispatch Thread. */
    static ViewerWindow show(Viewer.Setup setup, Runnable onClosed) {
        Look.install(setup.theme());
        ViewerData data = new ViewerData(setup.library(),
                ToleranceBand.matching(setup.library(), setup.settings().matchSettings()), setup.initialRuns());
        ViewerWindow w = new ViewerWindow(data, initialState(setup, data), setup.title(), onClosed, true);
        w.frame.setVisible(true);
        w.placeDividers();
        w.peakTable.requestFocusInWindow();
        w.startLoading(setup);
        return w;
    }

    /**
     * The window's content without a window, laid out at {@code width} × {@code height} as the
     * frame would lay it out, for tests (works headless).
     */
    static ViewerWindow offScreen(ViewerData data, ViewState state, int width, int height) {
        ViewerWindow w = new ViewerWindow(data, state, "", () -> { }, false);
        w.content.setSize(width, height);
        layOut(w.content);
        w.placeDividers();
        layOut(w.content);
        return w;
    }

    /**
     * Sets the dividers as the window opens: the run list and the peak table at their widths,
     * the plot at its share of the height; the details panel takes the rest of the width.
     */
    private void placeDividers() {
        mainSplit.setDividerLocation(RUN_LIST_WIDTH);
        bottomSplit.setDividerLocation(PEAK_TABLE_WIDTH);
        centreSplit.setDividerLocation(PLOT_SHARE);
    }

    /** Lays out {@code c} and everything in it, top down, as a shown window does. */
    private static void layOut(java.awt.Component c) {
        if (c instanceof java.awt.Container) {
            java.awt.Container box = (java.awt.Container) c;
            box.doLayout();
            for (java.awt.Component child : box.getComponents()) {
                layOut(child);
            }
        }
    }

    private void startLoading(Viewer.Setup setup) {
        List<RunSpec> todo = setup.runs();
        if (todo.isEmpty()) {
            return;
        }
        IdentifySettings settings = setup.settings();
        loading = true;
        loader = new RunLoader(todo, setup.job(), settings, setup.loader(), this::runFinished, this::loadingFinished);
        loader.execute();
        updateStatus();
    }

    private JComponent layoutContent() {
        JPanel controls = new JPanel(new FlowLayout(FlowLayout.LEFT, GAP, GAP / 2));
        controls.setBorder(BorderFactory.createEmptyBorder(2, GAP / 2, 0, GAP / 2));
        controls.add(new JLabel("Axis:"));
        timeAxis.setMnemonic(KeyEvent.VK_T);
        mobilityAxis.setMnemonic(KeyEvent.VK_M);
        bandsBox.setMnemonic(KeyEvent.VK_W);
        ButtonGroup axes = new ButtonGroup();
        axes.add(timeAxis);
        axes.add(mobilityAxis);
        controls.add(timeAxis);
        controls.add(mobilityAxis);
        timeAxis.addActionListener(e -> apply(state.withAxis(Axis.TIME)));
        mobilityAxis.addActionListener(e -> apply(state.withAxis(Axis.MOBILITY)));
        timeAxis.setToolTipText("Migration time as recorded");
        mobilityAxis.setToolTipText("Effective mobility: runs with different electro-osmotic flow line up");
        controls.add(gap());
        bandsBox.setToolTipText("Match windows of the library entries (mobility axis, or a single run on the time axis)");
        bandsBox.addActionListener(e -> apply(state.withBands(bandsBox.isSelected())));
        controls.add(bandsBox);
        controls.add(gap());
        controls.add(button("Zoom in", "Narrow the range about its centre",
                () -> zoomAt(scene.current().centre(), ViewState.ZOOM_STEP)));
        controls.add(button("Zoom out", "Widen the range about its centre",
                () -> zoomAt(scene.current().centre(), 1 / ViewState.ZOOM_STEP)));
        controls.add(button("Reset view", "Back to the range chosen from the peaks and data", () -> apply(state.reset())));
        controls.add(gap());
        controls.add(button("Save PNG…", "Save the plot as shown as a PNG image",
                () -> Exporter.export(frame, scene.model(), plotSize(), Exporter.Format.PNG, suggestedName(), this::say)));
        controls.add(button("Save SVG…", "Save the plot as shown as an SVG drawing",
                () -> Exporter.export(frame, scene.model(), plotSize(), Exporter.Format.SVG, suggestedName(), this::say)));

        runTable.setFillsViewportHeight(true);
        runTable.setRowSelectionAllowed(false);
        runTable.setShowGrid(false);
        runTable.setIntercellSpacing(new Dimension(0, 0));
        runTable.getColumnModel().getColumn(0).setMaxWidth(30);
        runTable.getColumnModel().getColumn(0).setPreferredWidth(30);
        runTable.getColumnModel().getColumn(1).setPreferredWidth(120);
        runTable.getColumnModel().getColumn(1).setCellRenderer(new RunNameRenderer());
        runTable.getColumnModel().getColumn(2).setPreferredWidth(90);
        JScrollPane runs = titled(new JScrollPane(runTable), "Runs");
        runs.setPreferredSize(new Dimension(RUN_LIST_WIDTH, 400));

        peakTable.setAutoCreateRowSorter(true);
        int[] digits = {-1, 2, 2, 3};
        int[] widths = {80, 66, 62, 48, 84, 90, 74};
        for (int c = 0; c < widths.length; c++) {
            peakTable.getColumnModel().getColumn(c).setPreferredWidth(widths[c]);
            if (c < digits.length && digits[c] >= 0) {
                peakTable.getColumnModel().getColumn(c).setCellRenderer(new FixedDigits(digits[c]));
            }
        }
        peakTable.setFillsViewportHeight(true);
        peakTable.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        peakTable.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && !syncing) {
                int row = peakTable.getSelectedRow();
                if (row >= 0) {
                    select(peakModel.refAt(peakTable.convertRowIndexToModel(row)));
                }
            }
        });
        // keyboard: the arrows, Page Up/Down and Ctrl+Home/End move through the rows (JTable's
        // own keys), each row shown at once; Enter moves down instead of wrapping to the top;
        // Esc clears the selection
        peakTable.getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT)
                .put(KeyStroke.getKeyStroke(KeyEvent.VK_ENTER, 0), "selectNextRow");
        peakTable.getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT)
                .put(KeyStroke.getKeyStroke(KeyEvent.VK_ESCAPE, 0), "clear-peak");
        peakTable.getActionMap().put("clear-peak", new javax.swing.AbstractAction() {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(java.awt.event.ActionEvent e) {
                clicked(null);
            }
        });
        peakTable.setShowVerticalLines(false);
        details.setEditable(false);
        details.putClientProperty(JEditorPane.HONOR_DISPLAY_PROPERTIES, Boolean.TRUE);
        details.setFont(peakTable.getFont());
        details.setBorder(BorderFactory.createEmptyBorder(GAP / 2, GAP - 2, GAP / 2, GAP - 2));
        detailsPane = titled(new JScrollPane(details), "Selected peak");
        detailsPane.setPreferredSize(new Dimension(DETAILS_WIDTH, 290));
        detailsPane.setMinimumSize(new Dimension(DETAILS_WIDTH / 2, 100));
        JScrollPane peaksPane = titled(new JScrollPane(peakTable), "Peaks");
        peaksPane.setPreferredSize(new Dimension(PEAK_TABLE_WIDTH, 290));
        JSplitPane bottom = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, peaksPane, detailsPane);
        bottomSplit = bottom;
        bottom.setResizeWeight(1.0);
        bottom.setBorder(null);

        plot.setToolTipText(null);
        JSplitPane centre = new JSplitPane(JSplitPane.VERTICAL_SPLIT, plot, bottom);
        centreSplit = centre;
        centre.setResizeWeight(PLOT_SHARE);
        centre.setBorder(null);
        JSplitPane main = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, runs, centre);
        mainSplit = main;
        main.setResizeWeight(0);
        main.setBorder(null);

        JPanel statusBar = new JPanel(new BorderLayout(12, 0));
        statusBar.setBorder(BorderFactory.createEmptyBorder(4, GAP, 4, GAP));
        statusBar.add(status, BorderLayout.CENTER);
        JLabel hint = new JLabel(HINT);
        hint.setToolTipText("In the plot: " + PlotPanel.KEYS_HINT + ".  In the peak table: ↑/↓, Page Up/Down, "
                + "Enter: next peak; Esc: clear.  Alt+T / Alt+M: time / mobility axis.");
        hint.setForeground(PlotPanel.MESSAGE);
        JPanel right = new JPanel(new FlowLayout(FlowLayout.RIGHT, 16, 0));
        right.add(hint);
        cursor.setPreferredSize(new Dimension(170, cursor.getPreferredSize().height));
        right.add(cursor);
        statusBar.add(right, BorderLayout.EAST);

        JPanel content = new JPanel(new BorderLayout());
        content.add(controls, BorderLayout.NORTH);
        content.add(main, BorderLayout.CENTER);
        content.add(statusBar, BorderLayout.SOUTH);
        return content;
    }

    // ---- state changes -------------------------------------------------------------------

    /** Makes {@code next} the current state and redraws what depends on it. */
    private void apply(ViewState next) {
        boolean runsChanged = !next.tickedRuns().equals(state.tickedRuns());
        state = next;
        refreshAll(runsChanged);
    }

    private void refreshAll(boolean peakRowsChanged) {
        scene = PlotScene.of(data, state);
        plot.show(scene, emptyMessage());
        if (peakRowsChanged) {
            syncing = true;
            try {
                peakModel.show(data, state.tickedRuns());
            } finally {
                syncing = false;
            }
        }
        syncPeakSelection();
        showDetails();
        timeAxis.setSelected(state.axis() == Axis.TIME);
        mobilityAxis.setSelected(state.axis() == Axis.MOBILITY);
        bandsBox.setSelected(state.bands());
        runTable.repaint();
        updateStatus();
    }

    private void runFinished(int index, ViewerRun run) {
        data = data.withRun(index, run);
        runModel.fireTableRowsUpdated(index, index);
        if (state.selectedPeak() != null && data.peak(state.selectedPeak()) == null) {
            state = state.withSelectedPeak(null);
        }
        refreshAll(state.isTicked(index));
    }

    private void loadingFinished() {
        loading = false;
        updateStatus();
    }

    @Override
    public void zoomAt(double anchorX, double factor) {
        apply(state.zoomedAt(scene.current(), anchorX, factor, scene.limits()));
    }

    @Override
    public void zoomTo(double x1, double x2) {
        apply(state.zoomedTo(x1, x2, scene.limits()));
    }

    @Override
    public void panBy(double dx) {
        apply(state.pannedBy(scene.current(), dx, scene.limits()));
    }

    @Override
    public void clicked(PeakRef picked) {
        apply(state.withSelectedPeak(picked));
    }

    @Override
    public void step(int step) {
        PeakRef next = scene.neighbour(state.selectedPeak(), step);
        if (next != null) {
            select(next);
        }
    }

    @Override
    public void zoomCentre(double factor) {
        zoomAt(scene.current().centre(), factor);
    }

    @Override
    public void resetView() {
        apply(state.reset());
    }

    /** Selects {@code ref} and, when its apex is outside the range shown, pans to centre it. */
    private void select(PeakRef ref) {
        ViewState next = state.withSelectedPeak(ref);
        PlotScene.PeakSpot spot = scene.spotOf(ref);
        XRange shown = scene.current();
        if (spot != null && (spot.x() < shown.lo() || spot.x() > shown.hi())) {
            next = next.pannedBy(shown, spot.x() - shown.centre(), scene.limits());
        }
        apply(next);
    }

    @Override
    public void hover(double x) {
        if (Double.isNaN(x)) {
            cursor.setText(" ");
        } else if (state.axis() == Axis.TIME) {
            cursor.setText(String.format(Locale.ROOT, "t = %.2f s", x));
        } else {
            cursor.setText(String.format(Locale.ROOT, "μ = %.2f", x));
        }
    }

    // ---- views of the state ------------------------------------------------------------

    private void syncPeakSelection() {
        int modelRow = peakModel.rowOf(state.selectedPeak());
        syncing = true;
        try {
            if (modelRow < 0) {
                peakTable.clearSelection();
            } else {
                int row = peakTable.convertRowIndexToView(modelRow);
                if (row >= 0 && peakTable.getSelectedRow() != row) {
                    peakTable.setRowSelectionInterval(row, row);
                    peakTable.scrollRectToVisible(peakTable.getCellRect(row, 0, true));
                }
            }
        } finally {
            syncing = false;
        }
    }

    private void showDetails() {
        PeakRef ref = state.selectedPeak();
        PeakResult pr = data.peak(ref);
        String html = pr == null
                ? "<html><body><p><font color='" + PeakDetails.labelColour() + "'>Click a peak in the plot, or pick one in the table, "
                        + "to see its measures and candidate analytes.</font></p></body></html>"
                : PeakDetails.html(data.runs().get(ref.run()).name(), data.runs().get(ref.run()).result(), pr,
                        data.recurringUnknownOf(ref));
        details.setText(html);
        details.setCaretPosition(0);
    }

    private String emptyMessage() {
        if (state.tickedRuns().isEmpty()) {
            return "Tick a run in the list to draw it.";
        }
        boolean waiting = false;
        boolean drawable = false;
        for (int i : state.tickedRuns()) {
            waiting |= data.runs().get(i).isWaiting();
            drawable |= data.runs().get(i).drawable();
        }
        if (waiting) {
            return "Reading and identifying the runs…";
        }
        if (drawable && state.axis() == Axis.MOBILITY) {
            return "The ticked runs have no mobility scale. Switch to the time axis to see them.";
        }
        return "The ticked runs could not be processed; point at a run to see why.";
    }

    /** The status line, for tests. */
    String statusText() {
        return status.getText();
    }

    private void updateStatus() {
        int ready = 0;
        for (ViewerRun r : data.runs()) {
            ready += r.isWaiting() ? 0 : 1;
        }
        StringBuilder sb = new StringBuilder();
        if (loading || ready < data.runs().size()) {
            sb.append(String.format(Locale.ROOT, "Processing runs: %d of %d done.  ", ready, data.runs().size()));
        }
        int shown = scene.model().series().size();
        sb.append(shown == 1 ? "1 run shown" : shown + " runs shown");
        sb.append(", ").append(scene.spots().size()).append(" peaks");
        if (!scene.omittedRuns().isEmpty()) {
            sb.append(".  No mobility scale, so not on this axis: ").append(String.join(", ", scene.omittedRuns()));
        }
        if (scene.bufferGroups().size() > 1) {
            List<String> groups = new ArrayList<>();
            for (var g : scene.bufferGroups()) {
                groups.add(g.title());
            }
            sb.append(".  Runs of ").append(groups.size()).append(" buffers share this axis (")
                    .append(String.join("; ", groups)).append("); 'mobident plot' draws a panel for each");
        }
        List<RecurringUnknowns.Group> recurring = data.recurringUnknowns();
        if (!recurring.isEmpty()) {
            List<String> names = new ArrayList<>();
            for (RecurringUnknowns.Group g : recurring) {
                names.add(PeakDetails.recurrence(g));
            }
            sb.append(".  Recurring unknowns: ").append(String.join("; ", names));
        }
        status.setText(sb.toString());
    }

    /** The run list's tooltip: where the run stands and its scale correction in full. */
    private static String runTip(ViewerRun r) {
        String detail = r.statusDetail();
        if (r.result() != null && !r.result().failed() && r.result().mobilityKnown()) {
            detail += "; run scale correction: " + ScaleCorrectionText.of(r.result());
        }
        return detail;
    }

    private void say(String text) {
        status.setText(text);
    }

    private Dimension plotSize() {
        return plot.getSize();
    }

    // ---- for tests ------------------------------------------------------------------------

    JTable peakTable() {
        return peakTable;
    }

    JTable runTable() {
        return runTable;
    }

    PlotPanel plotPanel() {
        return plot;
    }

    JEditorPane details() {
        return details;
    }

    JScrollPane detailsPane() {
        return detailsPane;
    }

    ViewState state() {
        return state;
    }

    PlotScene scene() {
        return scene;
    }

    /** Carries out the peak table's key binding for {@code key} (as pressing it in the table would). */
    void pressInPeakTable(KeyStroke key) {
        Object name = peakTable.getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT).get(key);
        peakTable.getActionMap().get(name).actionPerformed(
                new java.awt.event.ActionEvent(peakTable, java.awt.event.ActionEvent.ACTION_PERFORMED, ""));
    }

    private String suggestedName() {
        List<String> names = new ArrayList<>();
        for (int i : state.tickedRuns()) {
            names.add(data.runs().get(i).name());
        }
        String base = names.size() == 1 ? names.get(0) : names.isEmpty() ? "plot" : names.size() + "-runs";
        return base + (state.axis() == Axis.TIME ? "-time" : "-mobility");
    }

    private static JButton button(String text, String tip, Runnable action) {
        JButton b = new JButton(text);
        b.setToolTipText(tip);
        b.addActionListener(e -> action.run());
        return b;
    }

    private static JComponent gap() {
        JPanel p = new JPanel();
        p.setPreferredSize(new Dimension(10, 1));
        return p;
    }

    private static <T extends JComponent> T titled(T c, String title) {
        c.setBorder(BorderFactory.createTitledBorder(BorderFactory.createEmptyBorder(2, 2, 2, 2), title));
        return c;
    }

    /** Right-aligned numbers with a fixed number of decimals; unknown values as a dash. */
    private static final class FixedDigits extends javax.swing.table.DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;
        private final int digits;

        FixedDigits(int digits) {
            this.digits = digits;
            setHorizontalAlignment(RIGHT);
        }

        @Override
        protected void setValue(Object value) {
            setText(value instanceof Double ? NumberText.fixed((Double) value, digits, PeakDetails.UNKNOWN)
                    : PeakDetails.UNKNOWN);
        }
    }

    /** A run's name after a swatch of the colour it is drawn in (blank space when it is not drawn). */
    private final class RunNameRenderer extends javax.swing.table.DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public java.awt.Component getTableCellRendererComponent(JTable table, Object value, boolean selected,
                                                                boolean focused, int row, int column) {
            super.getTableCellRendererComponent(table, value, selected, focused, row, column);
            String colour = scene == null ? null : scene.colourOf(row);
            setIcon(new Swatch(colour == null ? null : java.awt.Color.decode(colour)));
            setIconTextGap(GAP - 2);
            return this;
        }
    }

    /** A short thick line in a run's colour, as the plot's legend draws it. */
    static final class Swatch implements javax.swing.Icon {
        static final int WIDTH = 16;
        static final int HEIGHT = 10;
        final java.awt.Color colour;

        Swatch(java.awt.Color colour) {
            this.colour = colour;
        }

        @Override
        public void paintIcon(java.awt.Component c, java.awt.Graphics g, int x, int y) {
            if (colour == null) {
                return;
            }
            java.awt.Graphics2D g2 = (java.awt.Graphics2D) g.create();
            try {
                g2.setRenderingHint(java.awt.RenderingHints.KEY_ANTIALIASING, java.awt.RenderingHints.VALUE_ANTIALIAS_ON);
                g2.setColor(colour);
                g2.fillRoundRect(x, y + HEIGHT / 2 - 2, WIDTH, 4, 3, 3);
            } finally {
                g2.dispose();
            }
        }

        @Override
        public int getIconWidth() {
            return WIDTH;
        }

        @Override
        public int getIconHeight() {
            return HEIGHT;
        }
    }

    /** The run list: a tick to draw a run, its name and where it stands. */
    private final class RunListModel extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private final String[] columns = {"", "Run", "Status"};

        @Override
        public int getRowCount() {
            return data.runs().size();
        }

        @Override
        public int getColumnCount() {
            return columns.length;
        }

        @Override
        public String getColumnName(int column) {
            return columns[column];
        }

        @Override
        public Class<?> getColumnClass(int column) {
            return column == 0 ? Boolean.class : String.class;
        }

        @Override
        public boolean isCellEditable(int row, int column) {
            return column == 0;
        }

        @Override
        public Object getValueAt(int row, int column) {
            ViewerRun r = data.runs().get(row);
            switch (column) {
                case 0:
                    return state.isTicked(row);
                case 1:
                    return r.name();
                default:
                    return r.statusText();
            }
        }

        @Override
        public void setValueAt(Object value, int row, int column) {
            if (column == 0 && value instanceof Boolean) {
                apply(state.withRunTicked(row, (Boolean) value));
                fireTableRowsUpdated(row, row);
            }
        }
    }
}
