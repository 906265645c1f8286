package org.mobident.trace;

/** How the detector sees the analytes. */
public enum Detection {
    /** The analyte absorbs: peaks rise above the baseline. */
    DIRECT,
    /** The background absorbs and the analyte displaces it: peaks are dips below the baseline. */
    INDIRECT;

    /**
     * Parses {@code direct}/{@code indirect} (case-insensitive), also where the cell says more
     * ({@code indirect UV}, {@code Direct (214 nm)}): the one of the two words it holds, alone;
     * {@code null} when it holds neither or both.
     */
    public static Detection parse(String text) {
        if (text == null) {
            return null;
        }
        boolean direct = false;
        boolean indirect = false;
        for (String word : text.toLowerCase(java.util.Locale.ROOT).split("[^a-z]+")) {
            direct |= word.equals("direct");
            indirect |= word.equals("indirect");
        }
        if (direct == indirect) {
            return null;
        }
        return direct ? DIRECT : INDIRECT;
    }

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
