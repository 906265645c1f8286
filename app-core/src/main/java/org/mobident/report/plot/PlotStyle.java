package org.mobident.report.plot;

/**
 * Colours, sizes and fonts shared by the SVG and PNG renderers. Colours are "#rrggbb".
 * Status markers differ in colour and in shape (filled circle, filled diamond, hollow
 * triangle, hollow square), so they stay apart for colour-blind readers and in grey print.
 */
final class PlotStyle {
    static final String BACKGROUND = "#ffffff";
    static final String AXIS = "#3d4650";
    static final String TEXT = "#262b30";
    static final String MUTED_TEXT = "#66707a";
    static final String LEADER = "#a3abb4";
    static final String BAND_FILL = "#d6e1ec";
    static final double BAND_OPACITY = 0.55;
    static final String BAND_TEXT = "#586a7d";

    /** Curve colours, used in turn. */
    static final String[] SERIES = {"#2f5d8a", "#7b4f8c", "#3f8391", "#8c6239", "#6f7a2e", "#9c4a6a"};

    static final String IDENTIFIED = "#1b7a4b";
    static final String AMBIGUOUS = "#c77d0a";
    static final String UNASSIGNED = "#b4304a";
    static final String MARKER = "#55606b";

    static final String FONT_FAMILY = "DejaVu Sans, Verdana, Arial, sans-serif";
    /** Logical Java2D font that maps to a sans-serif face on every platform. */
    static final String JAVA_FONT = "SansSerif";

    static final double TITLE_FONT = 13;
    static final double AXIS_TITLE_FONT = 12;
    static final double TICK_FONT = 11;
    static final double LABEL_FONT = 11;
    static final double BAND_FONT = 10;
    static final double LEGEND_FONT = 11;

    static final double SERIES_WIDTH = 1.4;
    static final double AXIS_WIDTH = 1.0;
    static final double TICK_LENGTH = 5;
    static final double MARKER_RADIUS = 4.5;
    static final double MARKER_STROKE = 1.6;
    /** Vertical gap between a peak's apex and the edge of its marker, px. */
    static final double MARKER_GAP = 3;

    /** Average advance of a character of the sans-serif font, in font sizes (DejaVu Sans ≈ 0.6). */
    private static final double CHAR_WIDTH_EM = 0.6;
    /** Height of capitals above the baseline, in font sizes. */
    static final double ASCENT_EM = 0.78;
    /** Depth of descenders below the baseline, in font sizes. */
    static final double DESCENT_EM = 0.22;

    private PlotStyle() {
    }

    /** An estimate of the drawn width of {@code text} at {@code fontPx}, the same for both renderers. */
    static double textWidth(String text, double fontPx) {
        return text.codePointCount(0, text.length()) * CHAR_WIDTH_EM * fontPx;
    }

    static String seriesColour(int index) {
        return SERIES[Math.floorMod(index, SERIES.length)];
    }

    static String statusColour(PeakStatus s) {
        switch (s) {
            case IDENTIFIED:
                return IDENTIFIED;
            case AMBIGUOUS:
                return AMBIGUOUS;
            case UNASSIGNED:
                return UNASSIGNED;
            default:
                return MARKER;
        }
    }
}
