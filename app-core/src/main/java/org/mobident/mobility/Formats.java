package org.mobident.mobility;

import org.mobident.text.NumberText;

/** The pieces of {@link MobilityScale#describe()} texts, numbers written by {@link NumberText}. */
final class Formats {
    /** Written for a value that is not known. */
    private static final String NONE = "-";

    private Formats() {
    }

    /** A time with one decimal and its unit, e.g. "512.3 s". */
    static String seconds(double timeS) {
        return NumberText.fixed(timeS, 1, NONE) + " s";
    }

    /** A mobility with sign and unit, e.g. "+45.30e-9 m²/(V s)". */
    static String mobility(double mobility) {
        return NumberText.signed(mobility, 2, NONE) + "e-9 m²/(V s)";
    }

    /** The capillary and voltage, e.g. "Ld 72.0 cm, Lt 80.0 cm, -20.0 kV, ramp 0.0 s". */
    static String geometry(double detectorLengthCm, double totalLengthCm, double voltageKv, double rampS) {
        return "Ld " + NumberText.fixed(detectorLengthCm, 1, NONE) + " cm, Lt "
                + NumberText.fixed(totalLengthCm, 1, NONE) + " cm, " + NumberText.signed(voltageKv, 1, NONE)
                + " kV, ramp " + NumberText.fixed(rampS, 1, NONE) + " s";
    }
}
