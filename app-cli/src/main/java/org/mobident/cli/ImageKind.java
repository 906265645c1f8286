package org.mobident.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import org.mobident.io.SafeFiles;
import org.mobident.report.plot.PlotFigure;
import org.mobident.report.plot.PngPlot;
import org.mobident.report.plot.SvgPlot;

/** The image formats {@code plot} writes, chosen by the name's extension. */
enum ImageKind {
    PNG, SVG;

    /** Smallest and largest image sides accepted, pixels. */
    private static final int MIN_WIDTH = 200;
    private static final int MIN_HEIGHT = 150;
    private static final int MAX_SIDE = 10000;

    /** The kind a file name asks for, or null when it names no format written here. */
    static ImageKind of(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".png")) {
            return PNG;
        }
        return name.endsWith(".svg") ? SVG : null;
    }

    /** Width and height from "WxH", or null after saying on {@code err} what is wrong. */
    static int[] size(String size, PrintWriter err) {
        String[] wh = size.toLowerCase(Locale.ROOT).split("x");
        int w;
        int h;
        try {
            w = Integer.parseInt(wh[0].trim());
            h = Integer.parseInt(wh[1].trim());
        } catch (RuntimeException e) {
            err.println("mobident plot: --size must look like 1200x520, got '" + size + "'");
            return null;
        }
        if (w < MIN_WIDTH || h < MIN_HEIGHT || w > MAX_SIDE || h > MAX_SIDE) {
            err.println("mobident plot: --size must be between 200x150 and 10000x10000 pixels");
            return null;
        }
        return new int[] {w, h};
    }

    /** Renders the figure into {@code out} (each panel {@code w} × {@code h}), replacing it only when allowed. */
    void write(PlotFigure figure, int w, int h, Path out, boolean overwrite) throws OutputException {
        try {
            if (this == SVG) {
                String svg = SvgPlot.render(figure, w, h);
                SafeFiles.write(out, overwrite, "add --overwrite to replace it", wr -> wr.write(svg));
            } else {
                PngPlot.write(figure, w, h, out, overwrite);
            }
        } catch (IOException e) {
            throw new OutputException(out + ": " + e.getMessage(), e);
        }
    }
}
