package org.mobident.report.plot;

import java.awt.AlphaComposite;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Composite;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/** Carries out the drawing operations on a Java2D graphics context (works headless). */
final class Java2dCanvas implements Canvas {
    private final Graphics2D g;

    Java2dCanvas(Graphics2D g) {
        this.g = g;
    }

    @Override
    public void begin(String group) {
        // groups carry no meaning in a raster image
    }

    @Override
    public void end() {
        // groups carry no meaning in a raster image
    }

    @Override
    public void rect(double x, double y, double w, double h, String fill, double opacity) {
        Composite before = g.getComposite();
        if (opacity < 1) {
            g.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, (float) opacity));
        }
        g.setColor(colour(fill));
        g.fill(new Rectangle2D.Double(x, y, w, h));
        g.setComposite(before);
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, String stroke, double width) {
        g.setColor(colour(stroke));
        g.setStroke(new BasicStroke((float) width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND));
        g.draw(new Line2D.Double(x1, y1, x2, y2));
    }

    @Override
    public void polyline(double[] xs, double[] ys, String stroke, double width) {
        g.setColor(colour(stroke));
        g.setStroke(new BasicStroke((float) width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(path(xs, ys, false));
    }

    @Override
    public void polygon(double[] xs, double[] ys, String fill, String stroke, double width) {
        Path2D.Double p = path(xs, ys, true);
        if (fill != null) {
            g.setColor(colour(fill));
            g.fill(p);
        }
        g.setColor(colour(stroke));
        g.setStroke(new BasicStroke((float) width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND));
        g.draw(p);
    }

    @Override
    public void circle(double cx, double cy, double r, String fill, String stroke, double width) {
        Ellipse2D.Double e = new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r);
        if (fill != null) {
            g.setColor(colour(fill));
            g.fill(e);
        }
        g.setColor(colour(stroke));
        g.setStroke(new BasicStroke((float) width));
        g.draw(e);
    }

    @Override
    public void text(String text, double x, double y, double fontPx, Anchor anchor, String fill, boolean bold) {
        g.setFont(new Font(PlotStyle.JAVA_FONT, bold ? Font.BOLD : Font.PLAIN, 1).deriveFont((float) fontPx));
        g.setColor(colour(fill));
        FontMetrics fm = g.getFontMetrics();
        double w = fm.getStringBounds(text, g).getWidth();
        double left = anchor == Anchor.START ? x : anchor == Anchor.MIDDLE ? x - w / 2 : x - w;
        g.drawString(text, (float) left, (float) y);
    }

    @Override
    public void verticalText(String text, double x, double y, double fontPx, String fill) {
        AffineTransform before = g.getTransform();
        g.translate(x, y);
        g.rotate(-Math.PI / 2);
        text(text, 0, 0, fontPx, Anchor.MIDDLE, fill, false);
        g.setTransform(before);
    }

    private static Path2D.Double path(double[] xs, double[] ys, boolean closed) {
        Path2D.Double p = new Path2D.Double(Path2D.WIND_NON_ZERO, xs.length);
        for (int i = 0; i < xs.length; i++) {
            if (i == 0) {
                p.moveTo(xs[i], ys[i]);
            } else {
                p.lineTo(xs[i], ys[i]);
            }
        }
        if (closed) {
            p.closePath();
        }
        return p;
    }

    /** "#rrggbb" to a colour. */
    static Color colour(String hex) {
        return new Color(Integer.parseInt(hex.substring(1), 16));
    }
}
