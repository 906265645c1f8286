package org.mobident.library.standards;

import java.util.List;

/**
 * One analyte of a standard mix, as the standards sheet declares it.
 *
 * @param name           analyte name (as it will appear in the library)
 * @param chargeNumber   signed charge number, 0 when not given or when only the sign is given
 * @param chargeSign     sign of the charge: +1 cation, −1 anion, 0 unknown or neutral
 * @param approxMobility expected effective mobility, 1e-9 m²/(V·s), signed; NaN when not given
 * @param order          expected migration order within the mix, 1 = first to pass the detector;
 *                       0 when not given
 * @param line           1-based line of the standards sheet that declared it (0 when built in code)
 * @param pKa            the lab's thermodynamic pKa values at 25 °C, ascending (empty when not given)
 * @param limitingMobilities the lab's limiting mobilities, one per form, most protonated first, signed,
 *                       1e-9 m²/(V·s) at 25 °C (empty when not given); read as the library's
 *                       {@code limiting_mobility} column is read
 */
public record StandardAnalyte(String name, int chargeNumber, int chargeSign, double approxMobility, int order,
                              long line, List<Double> pKa, List<Double> limitingMobilities) {

    /** An analyte without model data. */
    public StandardAnalyte(String name, int chargeNumber, int chargeSign, double approxMobility, int order, long line) {
        this(name, chargeNumber, chargeSign, approxMobility, order, line, List.of(), List.of());
    }

    public StandardAnalyte {
        pKa = pKa == null ? List.of() : List.copyOf(pKa);
        limitingMobilities = limitingMobilities == null ? List.of() : List.copyOf(limitingMobilities);
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("an analyte needs a name");
        }
        if (chargeSign < -1 || chargeSign > 1) {
            throw new IllegalArgumentException("charge sign must be -1, 0 or +1, got " + chargeSign);
        }
        if (chargeNumber != 0 && Integer.signum(chargeNumber) != chargeSign) {
            throw new IllegalArgumentException("charge number " + chargeNumber + " and sign " + chargeSign
                    + " disagree");
        }
        if (order < 0) {
            throw new IllegalArgumentException("order must be positive or 0 (not given), got " + order);
        }
    }

    /** An analyte known only by name. */
    public static StandardAnalyte named(String name) {
        return new StandardAnalyte(name, 0, 0, Double.NaN, 0, 0);
    }

    /** True when the sheet gives pKa values or limiting mobilities for the mobility model. */
    public boolean hasModelData() {
        return !pKa.isEmpty() || !limitingMobilities.isEmpty();
    }

    /** True when an approximate mobility is given. */
    public boolean hasApproxMobility() {
        return !Double.isNaN(approxMobility);
    }

    /** True when an expected migration order is given. */
    public boolean hasOrder() {
        return order > 0;
    }

    /**
     * The sign this analyte's mobility must have, from the charge or else the approximate mobility;
     * 0 when neither tells.
     */
    public int expectedSign() {
        if (chargeSign != 0) {
            return chargeSign;
        }
        return hasApproxMobility() ? (int) Math.signum(approxMobility) : 0;
    }
}
