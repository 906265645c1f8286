package org.mobident.library;

import java.util.List;

/**
 * One analyte of a mobility library.
 *
 * @param name               analyte name, unique within a library
 * @param mobility           effective mobility in 1e-9 m²/(V·s), signed
 * @param mobilitySd         standard deviation of the mobility between runs (NaN if unknown)
 * @param n                  number of measurements behind the mean (0 if unknown)
 * @param charge             charge number of the most highly charged form (signed; 0 when unknown)
 * @param tolerance          per-entry match window half-width in mobility units (NaN: use the rule)
 * @param pKa                acidity constants (may be empty)
 * @param limitingMobilities limiting mobilities of the ionic forms, 1e-9 m²/(V·s), signed (may be empty)
 * @param buffer             buffer label the value was measured in (may be null)
 * @param pH                 buffer pH (NaN if unknown)
 * @param ionicStrengthMm    buffer ionic strength in mmol/L (NaN if unknown)
 * @param temperatureC       temperature the mobility applies to, °C (NaN: 25 °C assumed)
 * @param source             where the value came from (free text, may be null)
 * @param internalStandard   true when the lab adds this analyte to every run on purpose, so
 *                           that its peak pins the run's mobility scale
 * @param sessionSd          spread between measuring sessions (days, capillaries) beyond the
 *                           replicate spread, 1e-9 m²/(V·s); NaN when unknown (learned when
 *                           runs of another session are pooled into the library)
 */
public record LibraryEntry(
        String name,
        double mobility,
        double mobilitySd,
        int n,
        int charge,
        double tolerance,
        List<Double> pKa,
        List<Double> limitingMobilities,
        String buffer,
        double pH,
        double ionicStrengthMm,
        double temperatureC,
        String source,
        boolean internalStandard,
        double sessionSd) {

    /** Reference temperature assumed when an entry states none. */
    public static final double DEFAULT_TEMPERATURE_C = 25.0;

    public LibraryEntry {
        pKa = List.copyOf(pKa);
        limitingMobilities = List.copyOf(limitingMobilities);
    }

    /** An entry that is no internal standard and has no known between-session spread. */
    public LibraryEntry(String name, double mobility, double mobilitySd, int n, int charge, double tolerance,
                        List<Double> pKa, List<Double> limitingMobilities, String buffer, double pH,
                        double ionicStrengthMm, double temperatureC, String source) {
        this(name, mobility, mobilitySd, n, charge, tolerance, pKa, limitingMobilities, buffer, pH, ionicStrengthMm,
                temperatureC, source, false, Double.NaN);
    }

    /** A minimal entry: name, mobility and spread, everything else unknown. */
    public static LibraryEntry of(String name, double mobility, double mobilitySd) {
        return new LibraryEntry(name, mobility, mobilitySd, 0, 0, Double.NaN, List.of(), List.of(),
                null, Double.NaN, Double.NaN, Double.NaN, null);
    }

    /** This entry with another per-entry window (NaN: the matching rule applies). */
    public LibraryEntry withTolerance(double halfWidth) {
        return new LibraryEntry(name, mobility, mobilitySd, n, charge, halfWidth, pKa, limitingMobilities, buffer, pH,
                ionicStrengthMm, temperatureC, source, internalStandard, sessionSd);
    }

    /** This entry with another between-session spread. */
    public LibraryEntry withSessionSd(double sd) {
        return new LibraryEntry(name, mobility, mobilitySd, n, charge, tolerance, pKa, limitingMobilities, buffer, pH,
                ionicStrengthMm, temperatureC, source, internalStandard, sd);
    }

    /** True when this entry applies to runs in {@code runBuffer}: it names no buffer, or the same one. */
    public boolean appliesToBuffer(String runBuffer) {
        return buffer == null || runBuffer == null || sameBuffer(buffer, runBuffer);
    }

    /** Buffer labels are compared without regard to case or surrounding spaces. */
    public static boolean sameBuffer(String a, String b) {
        return a != null && b != null && a.trim().equalsIgnoreCase(b.trim());
    }

    /** The temperature this entry's mobility applies to, 25 °C when none is stated. */
    public double temperatureOrDefaultC() {
        return Double.isNaN(temperatureC) ? DEFAULT_TEMPERATURE_C : temperatureC;
    }
}
