package org.mobident.simulate;

import java.util.Objects;

/**
 * One analyte of an invented bench panel.
 *
 * @param name     ordinary ion name, unique within its panel
 * @param mobility the "true" effective mobility at 25 °C in 1e-9 m²/(V s), signed (anions
 *                 negative); an invented value, not a measured or published one
 */
public record PanelAnalyte(String name, double mobility) {
    public PanelAnalyte {
        Objects.requireNonNull(name, "name");
        if (name.isBlank()) {
            throw new IllegalArgumentException("analyte name must not be blank");
        }
        if (!Double.isFinite(mobility) || mobility == 0) {
            throw new IllegalArgumentException(name + ": mobility must be finite and non-zero, got " + mobility);
        }
    }
}
