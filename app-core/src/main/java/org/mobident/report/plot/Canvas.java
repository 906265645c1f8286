package org.mobident.report.plot;

/**
 * The few drawing operations a plot needs, in pixels (origin top left, y down), with colours
 * as "#rrggbb". One implementation writes SVG, the other draws with Java2D.
 */
interface Canvas {

    /** Horizontal alignment of text relative to its x. */
    enum Anchor { START, MIDDLE, END }

    /** Opens a named group of drawing operations (SVG: a {@code g} element; Java2D: nothing). */
    void begin(String group);

    /** Closes the last group opened. */
    void end();

    void rect(double x, double y, double w, double h, String fill, double opacity);

    void line(double x1, double y1, double x2, double y2, String stroke, double width);

    void polyline(double[] xs, double[] ys, String stroke, double width);

    /** A closed polygon; {@code fill} null leaves it unfilled. */
    void polygon(double[] xs, double[] ys, String fill, String stroke, double width);

    void circle(double cx, double cy, double r, String fill, String stroke, double width);

    /** Text whose baseline passes through y. */
    void text(String text, double x, double y, double fontPx, Anchor anchor, String fill, boolean bold);

    /** Text turned a quarter left (reading upwards), centred on y, baseline at x. */
    void verticalText(String text, double x, double y, double fontPx, String fill);
}
