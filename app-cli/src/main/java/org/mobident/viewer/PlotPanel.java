package org.mobident.viewer;

import java.awt.AlphaComposite;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Cursor;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.ActionEvent;
import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import javax.swing.AbstractAction;
import javax.swing.JComponent;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import org.mobident.report.plot.PlotLayout;
import org.mobident.report.plot.PngPlot;

/**
 * The electropherogram component. It paints the current {@link PlotScene} through the same
 * routine as the PNG and SVG files ({@link PngPlot#paint}), marks the selected peak, and turns
 * mouse gestures into calls on {@link Gestures} in data units: wheel = zoom about the mouse,
 * drag = zoom to the dragged range, shift-drag or right-drag = pan, click = pick a peak; and
 * keys into the same calls ({@link #KEYS_HINT}).
 */
final class PlotPanel extends JComponent {
    private static final long serialVersionUID = 1L;

    /** A drag shorter than this many pixels is a click. */
    static final int CLICK_SLOP_PX = 4;

    /** Radius of the ring drawn around the selected peak's apex, px. */
    static final double RING_RADIUS_PX = 8;

    static final Color BACKGROUND = Color.WHITE;
    static final Color SELECTION = new Color(0x1f4e79);
    static final Color DRAG_FILL = new Color(0x2f5d8a);
    static final float DRAG_ALPHA = 0.15f;
    static final Color MESSAGE = new Color(0x66707a);

    /** What the panel reports, in axis units. */
    interface Gestures {
        void zoomAt(double anchorX, double factor);

        void zoomTo(double x1, double x2);

        void panBy(double dx);

        /** A click; {@code picked} is the peak under it or null. */
        void clicked(PeakRef picked);

        /** The mouse is over x (NaN when it left the plot area). */
        void hover(double x);

        /** Select the peak {@code step} places to the right (positive) or left of the selected one. */
        void step(int step);

        /** Zoom by {@code factor} about the centre of the range shown (below 1: in). */
        void zoomCentre(double factor);

        /** Back to the range chosen from the peaks and data. */
        void resetView();
    }

    /** Keys of the plot, with what they do (also shown in the status line's hint). */
    static final String KEYS_HINT = "←/→: previous/next peak   +/−: zoom   Home: reset   Esc: clear";

    private transient PlotScene scene;
    private transient PlotLayout layout;
    private String message = "";
    private transient Gestures gestures;

    private int dragStartX = -1;
    private int dragNowX = -1;
    private boolean panning;

    PlotPanel() {
        setOpaque(true);
        setPreferredSize(new Dimension(900, 420));
        setMinimumSize(new Dimension(300, 200));
        setCursor(Cursor.getPredefinedCursor(Cursor.CROSSHAIR_CURSOR));
        MouseAdapter mouse = new Mouse();
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        addMouseWheelListener(mouse);
        setFocusable(true);
        bindKeys();
        addFocusListener(new FocusAdapter() {
            @Override
            public void focusGained(FocusEvent e) {
                repaint();
            }

            @Override
            public void focusLost(FocusEvent e) {
                repaint();
            }
        });
    }

    /** The plot's keys: they act while the plot has the keyboard focus (a click gives it). */
    private void bindKeys() {
        key("LEFT", "previous-peak", () -> gestures.step(-1));
        key("RIGHT", "next-peak", () -> gestures.step(1));
        key("ESCAPE", "clear-selection", () -> gestures.clicked(null));
        key("PLUS", "zoom-in", () -> gestures.zoomCentre(ViewState.ZOOM_STEP));
        key("EQUALS", "zoom-in", () -> gestures.zoomCentre(ViewState.ZOOM_STEP));
        key("ADD", "zoom-in", () -> gestures.zoomCentre(ViewState.ZOOM_STEP));
        key("MINUS", "zoom-out", () -> gestures.zoomCentre(1 / ViewState.ZOOM_STEP));
        key("SUBTRACT", "zoom-out", () -> gestures.zoomCentre(1 / ViewState.ZOOM_STEP));
        key("HOME", "reset-view", () -> gestures.resetView());
    }

    private void key(String keyStroke, String name, Runnable action) {
        getInputMap(WHEN_FOCUSED).put(KeyStroke.getKeyStroke(keyStroke), name);
        getActionMap().put(name, new AbstractAction(name) {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(ActionEvent e) {
                if (gestures != null && scene != null) {
                    action.run();
                }
            }
        });
    }

    /** Carries out the plot's key binding {@code name} (as a key press would). */
    void pressKey(String name) {
        getActionMap().get(name).actionPerformed(new ActionEvent(this, ActionEvent.ACTION_PERFORMED, name));
    }

    void setGestures(Gestures g) {
        this.gestures = g;
    }

    /**
     * Shows {@code newScene}; {@code emptyMessage} is written over the plot when it has no curve
     * (what the user can do about it).
     */
    void show(PlotScene newScene, String emptyMessage) {
        this.scene = newScene;
        this.message = emptyMessage == null ? "" : emptyMessage;
        repaint();
    }

    PlotScene scene() {
        return scene;
    }

    /** The layout of the last painting, or null before the first one or when the panel is too small. */
    PlotLayout layoutOrNull() {
        return layout;
    }

    @Override
    protected void paintComponent(Graphics g) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            layout = paintPlot(g2, getWidth(), getHeight());
            paintDragRange(g2);
            if (isFocusOwner()) {
                g2.setColor(SELECTION);
                g2.setStroke(new BasicStroke(1f));
                g2.drawRect(0, 0, getWidth() - 1, getHeight() - 1);
            }
        } finally {
            g2.dispose();
        }
    }

    /** The panel's picture at {@code w} × {@code h} (as painted on screen, without a drag in progress). */
    BufferedImage snapshot(int w, int h) {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            layout = paintPlot(g, w, h);
        } finally {
            g.dispose();
        }
        return img;
    }

    /** Paints plot, selection and message at {@code w} × {@code h}; returns the layout (null if too small). */
    PlotLayout paintPlot(Graphics2D g, int w, int h) {
        g.setColor(BACKGROUND);
        g.fillRect(0, 0, w, h);
        if (scene == null) {
            drawMessage(g, w / 2.0, h / 2.0, message);
            return null;
        }
        PlotLayout drawn;
        try {
            drawn = PngPlot.paint((Graphics2D) g.create(), scene.model(), w, h);
        } catch (IllegalArgumentException tooSmall) {
            drawMessage(g, w / 2.0, h / 2.0, "Enlarge the window to see the plot.");
            return null;
        }
        paintSelection(g, drawn);
        if (!scene.hasCurves() && !message.isEmpty()) {
            drawMessage(g, (drawn.plotLeft() + drawn.plotRight()) / 2, (drawn.plotTop() + drawn.plotBottom()) / 2,
                    message);
        }
        return drawn;
    }

    private void paintSelection(Graphics2D g, PlotLayout drawn) {
        PeakRef ref = scene.state().selectedPeak();
        PlotScene.PeakSpot spot = ref == null ? null : scene.spotOf(ref);
        if (spot == null) {
            return;
        }
        double x = drawn.px(spot.x());
        if (x < drawn.plotLeft() || x > drawn.plotRight()) {
            return;
        }
        double y = drawn.py(spot.y());
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(SELECTION);
        g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {4f, 4f}, 0f));
        g.draw(new Line2D.Double(x, drawn.plotTop(), x, drawn.plotBottom()));
        g.setStroke(new BasicStroke(2f));
        g.draw(new Ellipse2D.Double(x - RING_RADIUS_PX, y - RING_RADIUS_PX, 2 * RING_RADIUS_PX, 2 * RING_RADIUS_PX));
    }

    private void paintDragRange(Graphics2D g) {
        if (dragStartX < 0 || panning || layout == null || Math.abs(dragNowX - dragStartX) < CLICK_SLOP_PX) {
            return;
        }
        double a = clampX(Math.min(dragStartX, dragNowX));
        double b = clampX(Math.max(dragStartX, dragNowX));
        Rectangle2D r = new Rectangle2D.Double(a, layout.plotTop(), b - a, layout.plotBottom() - layout.plotTop());
        g.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, DRAG_ALPHA));
        g.setColor(DRAG_FILL);
        g.fill(r);
        g.setComposite(AlphaComposite.SrcOver);
        g.setStroke(new BasicStroke(1f));
        g.draw(r);
    }

    private static void drawMessage(Graphics2D g, double cx, double cy, String text) {
        if (text == null || text.isEmpty()) {
            return;
        }
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
        g.setColor(MESSAGE);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(text, (float) (cx - fm.stringWidth(text) / 2.0), (float) (cy + fm.getAscent() / 2.0));
    }

    private double clampX(double x) {
        return Math.max(layout.plotLeft(), Math.min(layout.plotRight(), x));
    }

    private boolean insidePlot(MouseEvent e) {
        return layout != null && e.getX() >= layout.plotLeft() && e.getX() <= layout.plotRight()
                && e.getY() >= layout.plotTop() && e.getY() <= layout.plotBottom();
    }

    private final class Mouse extends MouseAdapter {
        private int lastX;

        @Override
        public void mousePressed(MouseEvent e) {
            if (layout == null || gestures == null) {
                return;
            }
            requestFocusInWindow();
            dragStartX = e.getX();
            dragNowX = e.getX();
            lastX = e.getX();
            panning = e.isShiftDown() || SwingUtilities.isRightMouseButton(e) || SwingUtilities.isMiddleMouseButton(e);
            if (panning) {
                setCursor(Cursor.getPredefinedCursor(Cursor.MOVE_CURSOR));
            }
        }

        @Override
        public void mouseDragged(MouseEvent e) {
            if (dragStartX < 0 || layout == null) {
                return;
            }
            dragNowX = e.getX();
            if (panning) {
                double perPx = (layout.xTicks().last() - layout.xTicks().first())
                        / (layout.plotRight() - layout.plotLeft());
                int moved = e.getX() - lastX;
                if (moved != 0) {
                    lastX = e.getX();
                    gestures.panBy(-moved * perPx);
                }
            }
            hover(e);
            repaint();
        }

        @Override
        public void mouseReleased(MouseEvent e) {
            if (dragStartX < 0 || layout == null) {
                dragStartX = -1;
                return;
            }
            int start = dragStartX;
            boolean wasPanning = panning;
            dragStartX = -1;
            panning = false;
            setCursor(Cursor.getPredefinedCursor(Cursor.CROSSHAIR_CURSOR));
            if (Math.abs(e.getX() - start) < CLICK_SLOP_PX) {
                if (!wasPanning || !SwingUtilities.isRightMouseButton(e)) {
                    gestures.clicked(scene.pick(layout, e.getX(), e.getY()));
                }
            } else if (!wasPanning) {
                double a = PlotScene.dataX(layout, clampX(start));
                double b = PlotScene.dataX(layout, clampX(e.getX()));
                if (a != b) {
                    gestures.zoomTo(a, b);
                }
            }
            repaint();
        }

        @Override
        public void mouseMoved(MouseEvent e) {
            hover(e);
        }

        @Override
        public void mouseExited(MouseEvent e) {
            if (gestures != null) {
                gestures.hover(Double.NaN);
            }
        }

        @Override
        public void mouseWheelMoved(MouseWheelEvent e) {
            if (layout == null || gestures == null) {
                return;
            }
            double anchor = PlotScene.dataX(layout, clampX(e.getX()));
            gestures.zoomAt(anchor, Math.pow(1 / ViewState.ZOOM_STEP, e.getPreciseWheelRotation()));
        }

        private void hover(MouseEvent e) {
            if (gestures != null) {
                gestures.hover(insidePlot(e) ? PlotScene.dataX(layout, e.getX()) : Double.NaN);
            }
        }
    }
}
