package org.mobident.signal;

/**
 * One detected peak, measured on the baseline-corrected signal. Heights and areas are
 * magnitudes (positive) whether the peak rises (direct detection) or dips (indirect).
 *
 * @param apexIndex      index of the sample nearest the apex
 * @param apexTimeS      apex time in s, refined between samples
 * @param apexTimeSdS    standard uncertainty of the apex time in s (from noise and sampling)
 * @param startTimeS     start of the peak (where it leaves the baseline), s
 * @param endTimeS       end of the peak (where it returns to the baseline), s
 * @param height         apex height above (or depth below) the baseline, signal units
 * @param area           peak area between start and end, signal units × s
 * @param correctedArea  time-corrected area A / t_apex (Altria 1993), signal units
 * @param widthHalfS     full width at half height, s
 * @param plates         plate number N = 5.54 (t / w½)² (Ph. Eur. 2.2.46)
 * @param resolution     resolution to the nearest neighbour, 1.18 (t₂ − t₁)/(w½,₁ + w½,₂)
 *                       (Ph. Eur. 2.2.46); NaN when the peak has no neighbour
 * @param signalToNoise  S/N = 2H/h with h the peak-to-peak noise (Ph. Eur. 2.2.46)
 * @param dip            true when the peak points below the baseline
 */
public record Peak(
        int apexIndex,
        double apexTimeS,
        double apexTimeSdS,
        double startTimeS,
        double endTimeS,
        double height,
        double area,
        double correctedArea,
        double widthHalfS,
        double plates,
        double resolution,
        double signalToNoise,
        boolean dip) {
}
