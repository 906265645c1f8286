package org.mobident.assess;

/**
 * Bands of zone height over noise SD ({@code height_sd} of the known-identities table), for results
 * by how faint a zone is. Each band includes its lower edge and excludes its upper one.
 */
public enum HeightStratum {
    UNDER_3(0, 3, "under 3"),
    FROM_3(3, 10, "3-10"),
    FROM_10(10, 30, "10-30"),
    FROM_30(30, 100, "30-100"),
    FROM_100(100, 1000, "100-1000"),
    FROM_1000(1000, Double.POSITIVE_INFINITY, "1000 and over"),
    UNKNOWN(Double.NaN, Double.NaN, "unknown");

    /** The height over noise SD from which a zone counts as clearly above the noise in the headline recall. */
    public static final double CLEAR_HEIGHT_SD = 10.0;

    private final double lower;
    private final double upper;
    private final String label;

    HeightStratum(double lower, double upper, String label) {
        this.lower = lower;
        this.upper = upper;
        this.label = label;
    }

    /** Lower edge (included), NaN for {@link #UNKNOWN}. */
    public double lower() {
        return lower;
    }

    /** Upper edge (excluded), NaN for {@link #UNKNOWN}. */
    public double upper() {
        return upper;
    }

    /** The band's name in reports, e.g. "10-30". */
    public String label() {
        return label;
    }

    /** The band of a height over noise SD; NaN is {@link #UNKNOWN}. */
    public static HeightStratum of(double heightSd) {
        if (!Double.isFinite(heightSd)) {
            return UNKNOWN;
        }
        for (HeightStratum s : values()) {
            if (s != UNKNOWN && heightSd >= s.lower && heightSd < s.upper) {
                return s;
            }
        }
        return UNKNOWN;
    }
}
