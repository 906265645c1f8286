package org.mobident.result;

import org.mobident.Tolerances;

/**
 * One detected peak, measured on the baseline-corrected signal. Heights and areas are
 * magnitudes (positive) whether the peak rises (direct detection) or dips (indirect).
 *
 * <p>Two migration times are given. The apex time is the pharmacopoeial migration time, at the
 * maximum of the peak. The centre time is the zone's first moment (centre of mass); for a zone
 * skewed by electromigration dispersion the apex moves towards the sharp flank as the
 * concentration grows while the centre of mass stays put, so the centre time is the one to turn
 * into a mobility that does not depend on concentration (see {@link org.mobident.signal.ZoneCentre}).
 *
 * @param apexIndex      index of the sample nearest the apex
 * @param apexTimeS      apex time in s, refined between samples
 * @param apexTimeSdS    standard uncertainty of the apex time in s (from noise and sampling)
 * @param centreTimeS    zone centre time in s: first moment of the corrected signal between start
 *                       and end, or the centre of the fitted Gaussian for a zone resolved by the
 *                       cluster fit
 * @param centreTimeSdS  standard uncertainty of the centre time in s: the noise propagated through
 *                       the moment combined with a shape term (see {@link org.mobident.signal.ZoneCentre})
 * @param startTimeS     start of the peak (where it leaves the baseline), s
 * @param endTimeS       end of the peak (where it returns to the baseline), s
 * @param height         apex height above (or depth below) the baseline, signal units
 * @param area           peak area between start and end, signal units × s
 * @param correctedArea  time-corrected area A / t_apex (Altria 1993), signal units
 * @param widthHalfS     full width at half height, s
 * @param plates         plate number N = 5.54 (t / w½)² (Ph. Eur. 2.2.46)
 * @param resolution     resolution to the nearest neighbour, 1.18 (t₂ − t₁)/(w½,₁ + w½,₂)
 *                       (Ph. Eur. 2.2.46); NaN when the peak has no neighbour
 * @param signalToNoise  S/N = 2H/h with h the peak-to-peak noise of the background around the peak
 *                       (Ph. Eur. 2.2.46; see {@link org.mobident.signal.PeakDetector})
 * @param dip            true when the peak points below the baseline
 * @param centreShapeSdS the shape term inside {@code centreTimeSdS}, s (0 when it has none): the
 *                       part that allows for the zone departing from the model its centre was
 *                       measured with (see {@link #migrationTimeUsualSdS()})
 */
public record Peak(
        int apexIndex,
        double apexTimeS,
        double apexTimeSdS,
        double centreTimeS,
        double centreTimeSdS,
        double startTimeS,
        double endTimeS,
        double height,
        double area,
        double correctedArea,
        double widthHalfS,
        double plates,
        double resolution,
        double signalToNoise,
        boolean dip,
        double centreShapeSdS) {

    /** A peak whose centre uncertainty has no shape term. */
    public Peak(int apexIndex, double apexTimeS, double apexTimeSdS, double centreTimeS, double centreTimeSdS,
                double startTimeS, double endTimeS, double height, double area, double correctedArea,
                double widthHalfS, double plates, double resolution, double signalToNoise, boolean dip) {
        this(apexIndex, apexTimeS, apexTimeSdS, centreTimeS, centreTimeSdS, startTimeS, endTimeS, height, area,
                correctedArea, widthHalfS, plates, resolution, signalToNoise, dip, 0.0);
    }

    /**
     * A peak without a separate centre measurement (hand-made peaks, callers written before the
     * centre time existed): the centre time and its uncertainty are those of the apex, which is
     * exact for a symmetric zone.
     */
    public Peak(int apexIndex, double apexTimeS, double apexTimeSdS, double startTimeS, double endTimeS,
                double height, double area, double correctedArea, double widthHalfS, double plates,
                double resolution, double signalToNoise, boolean dip) {
        this(apexIndex, apexTimeS, apexTimeSdS, apexTimeS, apexTimeSdS, startTimeS, endTimeS, height, area,
                correctedArea, widthHalfS, plates, resolution, signalToNoise, dip);
    }

    /** The time turned into the zone's mobility: the centre time when measured, else the apex time, s. */
    public double migrationTimeS() {
        return Double.isFinite(centreTimeS) ? centreTimeS : apexTimeS;
    }

    /** Standard uncertainty of {@link #migrationTimeS()}, s. */
    public double migrationTimeSdS() {
        return Double.isFinite(centreTimeS) ? centreTimeSdS : apexTimeSdS;
    }

    /**
     * Standard uncertainty of {@link #migrationTimeS()} in the usual case, s: that of
     * {@link #migrationTimeSdS()} with the shape term cut to
     * {@link Tolerances#CENTRE_SHAPE_USUAL_SHARE} of itself. The errors of skewed zones'
     * centres are heavy-tailed (see that constant); the matcher weighs both readings.
     */
    public double migrationTimeUsualSdS() {
        double sd = migrationTimeSdS();
        if (!Double.isFinite(centreTimeS) || !(centreShapeSdS > 0)) {
            return sd;
        }
        double shape = Math.min(centreShapeSdS, sd);
        double k = Tolerances.CENTRE_SHAPE_USUAL_SHARE;
        return Math.sqrt(Math.max(0.0, sd * sd - (1 - k * k) * shape * shape));
    }

    /** Where the S/N stands against the ICH Q2 detection and quantitation limits. */
    public SignalToNoiseClass signalToNoiseClass() {
        return SignalToNoiseClass.of(signalToNoise);
    }
}
