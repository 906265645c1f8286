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
        String source) {

    /** Reference temperature assumed when an entry states none. */
    public static final double DEFAULT_TEMPERATURE_C = 25.0;

    public LibraryEntry {
        pKa = List.copyOf(pKa);
        limitingMobilities = List.copyOf(limitingMobilities);
    }

    /** A minimal entry: name, mobility and spread, everything else unknown. */
    public static LibraryEntry of(String name, double mobility, double mobilitySd) {
        return new LibraryEntry(name, mobility, mobilitySd, 0, 0, Double.NaN, List.of(), List.of(),
                null, Double.NaN, Double.NaN, Double.NaN, null);
    }

    /** The temperature this entry's mobility applies to, 25 °C when none is stated. */
    public double temperatureOrDefaultC() {
        return Double.isNaN(temperatureC) ? DEFAULT_TEMPERATURE_C : temperatureC;
    }
}
