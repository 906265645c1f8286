package org.mobident.report.plot;

/** Writes the drawing operations as SVG elements; numbers with one decimal, text escaped. */
final class SvgCanvas implements Canvas {
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
            out.append(" fill-opacity=\"").append(num2(opacity)).append('"');
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

    /** A coordinate with one decimal, without locale, trailing ".0" or "-0". */
    static String num(double v) {
        return fixed(v, 10);
    }

    private static String num2(double v) {
        return fixed(v, 100);
    }

    private static String fixed(double v, long scale) {
        if (!Double.isFinite(v)) {
            return "0";
        }
        long t = Math.round(v * scale);
        if (t == 0) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        if (t < 0) {
            sb.append('-');
            t = -t;
        }
        sb.append(t / scale);
        long frac = t % scale;
        if (frac != 0) {
            String f = Long.toString(frac + scale).substring(1);
            int end = f.length();
            while (end > 0 && f.charAt(end - 1) == '0') {
                end--;
            }
            sb.append('.').append(f, 0, end);
        }
        return sb.toString();
    }
}
