package org.mobident.report.plot;

import org.mobident.text.NumberText;

/** Writes the drawing operations as SVG elements; numbers with one decimal, text escaped. */
final class SvgCanvas implements Canvas {
    /** Decimals of coordinates and sizes, px: a tenth of a pixel is below what any screen shows. */
    private static final int COORDINATE_DECIMALS = 1;
    /** Decimals of opacities (0 to 1). */
    private static final int OPACITY_DECIMALS = 2;

    private final StringBuilder out;
    private int depth = 1;

    SvgCanvas(StringBuilder out) {
        this.out = out;
    }

    @Override
    public void begin(String group) {
        indent().append("<g class=\"").append(Markup.escape(group)).append("\">\n");
        depth++;
    }

    @Override
    public void end() {
        depth--;
        indent().append("</g>\n");
    }

    @Override
    public void rect(double x, double y, double w, double h, String fill, double opacity) {
        indent().append("<rect x=\"").append(num(x)).append("\" y=\"").append(num(y))
                .append("\" width=\"").append(num(w)).append("\" height=\"").append(num(h))
                .append("\" fill=\"").append(fill).append('"');
        if (opacity < 1) {
            out.append(" fill-opacity=\"").append(NumberText.trimmed(opacity, OPACITY_DECIMALS, "0")).append('"');
        }
        out.append("/>\n");
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, String stroke, double width) {
        indent().append("<line x1=\"").append(num(x1)).append("\" y1=\"").append(num(y1))
                .append("\" x2=\"").append(num(x2)).append("\" y2=\"").append(num(y2))
                .append("\" stroke=\"").append(stroke).append("\" stroke-width=\"").append(num(width))
                .append("\"/>\n");
    }

    @Override
    public void polyline(double[] xs, double[] ys, String stroke, double width) {
        indent().append("<polyline fill=\"none\" stroke=\"").append(stroke).append("\" stroke-width=\"")
                .append(num(width)).append("\" stroke-linejoin=\"round\" points=\"");
        points(xs, ys);
        out.append("\"/>\n");
    }

    @Override
    public void polygon(double[] xs, double[] ys, String fill, String stroke, double width) {
        indent().append("<polygon fill=\"").append(fill == null ? "none" : fill).append("\" stroke=\"")
                .append(stroke).append("\" stroke-width=\"").append(num(width))
                .append("\" stroke-linejoin=\"round\" points=\"");
        points(xs, ys);
        out.append("\"/>\n");
    }

    @Override
    public void circle(double cx, double cy, double r, String fill, String stroke, double width) {
        indent().append("<circle cx=\"").append(num(cx)).append("\" cy=\"").append(num(cy))
                .append("\" r=\"").append(num(r)).append("\" fill=\"").append(fill == null ? "none" : fill)
                .append("\" stroke=\"").append(stroke).append("\" stroke-width=\"").append(num(width))
                .append("\"/>\n");
    }

    @Override
    public void text(String text, double x, double y, double fontPx, Anchor anchor, String fill, boolean bold) {
        indent().append("<text x=\"").append(num(x)).append("\" y=\"").append(num(y))
                .append("\" font-size=\"").append(num(fontPx)).append('"');
        if (anchor != Anchor.START) {
            out.append(" text-anchor=\"").append(anchor == Anchor.MIDDLE ? "middle" : "end").append('"');
        }
        if (bold) {
            out.append(" font-weight=\"bold\"");
        }
        out.append(" fill=\"").append(fill).append("\">").append(Markup.escape(text)).append("</text>\n");
    }

    @Override
    public void verticalText(String text, double x, double y, double fontPx, String fill) {
        indent().append("<text transform=\"translate(").append(num(x)).append(' ').append(num(y))
                .append(") rotate(-90)\" font-size=\"").append(num(fontPx))
                .append("\" text-anchor=\"middle\" fill=\"").append(fill).append("\">")
                .append(Markup.escape(text)).append("</text>\n");
    }

    private void points(double[] xs, double[] ys) {
        for (int i = 0; i < xs.length; i++) {
            if (i > 0) {
                out.append(' ');
            }
            out.append(num(xs[i])).append(',').append(num(ys[i]));
        }
    }

    private StringBuilder indent() {
        for (int i = 0; i < depth; i++) {
            out.append("  ");
        }
        return out;
    }

    /** A coordinate: at most one decimal, without locale, trailing ".0" or "-0"; "0" when not finite. */
    static String num(double v) {
        return NumberText.trimmed(v, COORDINATE_DECIMALS, "0");
    }
}
