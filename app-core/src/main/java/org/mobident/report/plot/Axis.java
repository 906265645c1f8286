package org.mobident.report.plot;

/** What the horizontal axis of an electropherogram shows. */
public enum Axis {
    /** Migration time in s, as recorded. */
    TIME("Migration time (s)"),
    /**
     * Effective mobility in 1e-9 m²/(V s), from the run's mobility scale. The mapping from time
     * is μ = a/t' + b, so equal time steps are unequal mobility steps; runs whose electro-osmotic
     * flow differs line up on this axis.
     */
    MOBILITY("Effective mobility (10⁻⁹ m² V⁻¹ s⁻¹)");

    private final String title;

    Axis(String title) {
        this.title = title;
    }

    /** The axis title with its unit. */
    public String title() {
        return title;
    }
}
