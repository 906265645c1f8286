package org.mobident.mobility;

import java.util.Locale;

/** Number formats for {@link MobilityScale#describe()} texts. */
final class Formats {
    private Formats() {
    }

    static String seconds(double timeS) {
        return String.format(Locale.ROOT, "%.1f s", timeS);
    }

    /** A mobility with sign and unit, e.g. "+45.30e-9 m²/(V s)". */
    static String mobility(double mobility) {
        return String.format(Locale.ROOT, "%+.2fe-9 m²/(V s)", mobility);
    }

    static String geometry(double detectorLengthCm, double totalLengthCm, double voltageKv, double rampS) {
        return String.format(Locale.ROOT, "Ld %.1f cm, Lt %.1f cm, %+.1f kV, ramp %.1f s",
                detectorLengthCm, totalLengthCm, voltageKv, rampS);
    }
}
