package org.mobident.buffer;

import java.util.ArrayList;
import java.util.List;

/**
 * A weak or strong electrolyte described by its acidity constants and the limiting mobilities of
 * its ionic forms.
 *
 * <p>Forms are indexed from 0 (most protonated) to n = number of pKa values (least protonated).
 * Form i carries the charge {@code highestCharge − i}: one proton, one unit of charge, less per
 * step. So an acid HₙA has highestCharge 0 (forms 0, −1, …, −n), a base B that takes up n protons
 * has highestCharge n (forms +n, …, +1, 0), and an ampholyte such as glycine (H₂Gly⁺, HGly±,
 * Gly⁻) has highestCharge +1. A strong ion has no pKa and a single form.
 *
 * <p>Limiting mobilities are at infinite dilution and 25 °C, in 1e-9 m²/(V·s), signed: a form
 * of charge 0 must have mobility 0, a cation a positive and an anion a negative one.
 *
 * @param name               species name (for messages)
 * @param highestCharge      charge number of form 0
 * @param pKa                thermodynamic acidity constants at 25 °C, non-decreasing
 * @param limitingMobilities one limiting mobility per form, most protonated first (pKa.size() + 1)
 */
public record SpeciesModel(String name, int highestCharge, List<Double> pKa, List<Double> limitingMobilities) {

    public SpeciesModel {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a species needs a name");
        }
        pKa = List.copyOf(pKa);
        limitingMobilities = List.copyOf(limitingMobilities);
        for (int i = 0; i < pKa.size(); i++) {
            if (!Double.isFinite(pKa.get(i))) {
                throw new IllegalArgumentException(name + ": pKa values must be finite");
            }
            if (i > 0 && pKa.get(i) < pKa.get(i - 1)) {
                throw new IllegalArgumentException(name + ": pKa values must be in ascending order, got " + pKa);
            }
        }
        if (limitingMobilities.size() != pKa.size() + 1) {
            throw new IllegalArgumentException(name + ": " + pKa.size() + " pKa values need "
                    + (pKa.size() + 1) + " limiting mobilities (one per form), got " + limitingMobilities.size());
        }
        for (int i = 0; i < limitingMobilities.size(); i++) {
            double mu = limitingMobilities.get(i);
            int z = highestCharge - i;
            if (!Double.isFinite(mu)) {
                throw new IllegalArgumentException(name + ": limiting mobilities must be finite");
            }
            if (z == 0 ? mu != 0.0 : Math.signum(mu) != Integer.signum(z)) {
                throw new IllegalArgumentException(name + ": form " + i + " has charge " + z
                        + " but limiting mobility " + mu + " (cations +, anions −, neutral 0)");
            }
        }
    }

    /** A strong ion: one form of the given charge and signed limiting mobility. */
    public static SpeciesModel strong(String name, int charge, double limitingMobility) {
        if (charge == 0) {
            throw new IllegalArgumentException(name + ": a strong ion needs a non-zero charge");
        }
        return new SpeciesModel(name, charge, List.of(), List.of(limitingMobility));
    }

    /**
     * An acid HₙA (neutral fully protonated form). {@code anionMobilities} are the n mobilities
     * of H_{n−1}A⁻ … Aⁿ⁻ (negative); the neutral form's 0 is added in front.
     */
    public static SpeciesModel acid(String name, List<Double> pKa, List<Double> anionMobilities) {
        List<Double> mu = new ArrayList<>(anionMobilities.size() + 1);
        mu.add(0.0);
        mu.addAll(anionMobilities);
        return new SpeciesModel(name, 0, pKa, mu);
    }

    /**
     * A base that takes up n protons (neutral free base). {@code cationMobilities} are the n
     * mobilities of BHₙⁿ⁺ … BH⁺ (positive), most protonated first; the free base's 0 is appended.
     */
    public static SpeciesModel base(String name, List<Double> pKa, List<Double> cationMobilities) {
        List<Double> mu = new ArrayList<>(cationMobilities);
        mu.add(0.0);
        return new SpeciesModel(name, pKa.size(), pKa, mu);
    }

    /** Number of forms, pKa count + 1. */
    public int formCount() {
        return limitingMobilities.size();
    }

    /** Charge number of form {@code index} (0 = most protonated). */
    public int charge(int index) {
        if (index < 0 || index >= formCount()) {
            throw new IndexOutOfBoundsException("form " + index + " of " + formCount());
        }
        return highestCharge - index;
    }

    /** The pKa values as a fresh array. */
    public double[] pKaArray() {
        return pKa.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** The limiting mobilities as a fresh array, most protonated form first. */
    public double[] limitingMobilityArray() {
        return limitingMobilities.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
