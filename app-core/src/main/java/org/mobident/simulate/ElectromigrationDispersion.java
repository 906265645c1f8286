package org.mobident.simulate;

/**
 * Optional asymmetry of simulated zones from electromigration dispersion (Mikkers, Everaerts &amp;
 * Verheggen, J. Chromatogr. 169 (1979) 1): a zone whose mobility differs from that of the
 * background co-ion changes the local conductivity, so one flank sharpens and the other spreads.
 *
 * <p>Direction (Mikkers et al. 1979): an analyte faster than the co-ion has its diffuse flank on
 * the side it migrates towards (electrophoretically), a slower analyte on the side it comes from.
 * In the detector's time axis that is fronting for a faster analyte whose own migration points
 * towards the detector and tailing when it migrates against a stronger EOF; the reverse for a
 * slower analyte. The simulator uses an exponentially modified Gaussian (Grushka, Anal. Chem. 44
 * (1972) 1733) mirrored for fronting, with the same area as the undispersed zone.
 *
 * <p>Size of the effect: exponential time constant τ = {@code strength} · t · |μ − μ_co| / |μ_co|,
 * with t the migration time. Real dispersion also grows with the sample-to-background
 * concentration ratio; the caller folds that into {@code strength} (a few thousandths give a
 * slight, realistic asymmetry).
 *
 * @param coIonMobility effective mobility of the background co-ion, 1e-9 m²/(V s), signed; zones
 *                      of the opposite sign (or neutral) are left symmetric
 * @param strength      dimensionless, ≥ 0
 * @param shape         the form the skewed zones take
 */
public record ElectromigrationDispersion(double coIonMobility, double strength, Shape shape) {

    /**
     * The form of a dispersed zone. Both keep the undispersed zone's area and first moment.
     */
    public enum Shape {
        /** Exponentially modified Gaussian with time constant τ (Grushka 1972). */
        EXPONENTIAL,
        /**
         * A right triangle, sharp at the shock front and falling linearly over the diffuse flank,
         * smoothed by the zone's diffusion (the triangle convolved with its Gaussian): the form a
         * strongly overloaded zone takes (Mikkers, Everaerts &amp; Verheggen 1979, their figures of
         * concentration-overloaded zones). The triangle's base is 3τ, so that its first moment lies
         * τ from the front, as the EMG's lies τ after its Gaussian centre.
         */
        TRIANGLE,
        /** No skew at all: every zone Gaussian, as in a sample diluted far below the background. */
        NONE,
        /**
         * Each zone as its overload makes it: an exponentially modified Gaussian while its
         * dispersion strength is below {@link #TRIANGLE_FROM_STRENGTH_RATIO} times the common one,
         * a smoothed triangle from there on (a modelling choice: mild overload skews a zone, strong
         * overload makes it triangular).
         */
        MIXED
    }

    /** Under {@link Shape#MIXED}, zones at least this many times as dispersed as the common strength are triangles. */
    public static final double TRIANGLE_FROM_STRENGTH_RATIO = 3.0;

    /** True when a zone of dispersion {@code zoneStrength} is drawn as a triangle. */
    public boolean triangular(double zoneStrength) {
        return shape == Shape.TRIANGLE || (shape == Shape.MIXED && zoneStrength >= TRIANGLE_FROM_STRENGTH_RATIO * strength);
    }

    /** Exponentially modified zones. */
    public ElectromigrationDispersion(double coIonMobility, double strength) {
        this(coIonMobility, strength, Shape.EXPONENTIAL);
    }

    /** The same dispersion with zones of another form. */
    public ElectromigrationDispersion withShape(Shape other) {
        return new ElectromigrationDispersion(coIonMobility, strength, other);
    }

    public ElectromigrationDispersion {
        java.util.Objects.requireNonNull(shape, "shape");
        if (!Double.isFinite(coIonMobility) || coIonMobility == 0) {
            throw new IllegalArgumentException("co-ion mobility must be finite and non-zero, got " + coIonMobility);
        }
        if (!(strength >= 0) || !Double.isFinite(strength)) {
            throw new IllegalArgumentException("strength must be >= 0, got " + strength);
        }
    }
}
