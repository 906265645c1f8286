package org.mobident.trace;

/** How the detector sees the analytes. */
public enum Detection {
    /** The analyte absorbs: peaks rise above the baseline. */
    DIRECT,
    /** The background absorbs and the analyte displaces it: peaks are dips below the baseline. */
    INDIRECT;

    /** Parses {@code direct}/{@code indirect} (case-insensitive), or returns {@code null}. */
    public static Detection parse(String text) {
        if (text == null) {
            return null;
        }
        switch (text.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "direct":
                return DIRECT;
            case "indirect":
                return INDIRECT;
            default:
                return null;
        }
    }

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
