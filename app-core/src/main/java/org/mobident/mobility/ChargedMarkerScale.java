package org.mobident.mobility;

import org.mobident.result.MobilityScale;

/**
 * Scale set by one marker of known effective mobility μ_m and the capillary geometry.
 *
 * <p>The marker's apparent mobility is μ_app(t_m) = μ_m + μ_eof, so μ_eof = Ld·Lt/(V·t'_m) − μ_m,
 * and a zone at t has μ = Ld·Lt/(V·t') − μ_eof = c·(1/t' − 1/t'_m) + μ_m with c = Ld·Lt/V
 * (apparent/effective mobility: Jumppanen &amp; Riekkola, Anal. Chem. 67 (1995) 1060; ramp
 * correction t' = t − τ/2: Williams &amp; Vigh, Anal. Chem. 68 (1996) 1174). A neutral marker is
 * the case μ_m = 0 ({@link NeutralMarkerScale}).
 *
 * <p>Uncertainty: first-order propagation with independent apex and marker time errors,
 * σ² = (c·u'(t)·σ_t)² + (c·u'(t_m)·σ_m)² with u = 1/t' (JCGM 100:2008, GUM, eq. 10).
 *
 * @param detectorLengthCm inlet-to-detector length Ld, cm
 * @param totalLengthCm    total length Lt, cm (Ld &lt; Lt)
 * @param voltageKv        signed voltage, kV, non-zero
 * @param rampS            linear voltage ramp duration, s, ≥ 0
 * @param markerTimeS      raw apex time of the marker, s, &gt; 0
 * @param markerTimeSdS    standard uncertainty of that time, s, ≥ 0
 * @param markerMobility   known effective mobility of the marker, 1e-9 m²/(V·s), signed
 */
public record ChargedMarkerScale(double detectorLengthCm, double totalLengthCm, double voltageKv, double rampS,
                                 double markerTimeS, double markerTimeSdS, double markerMobility)
        implements MobilityScale {

    /** @throws IllegalArgumentException for an impossible geometry or time, or a non-finite mobility */
    public ChargedMarkerScale {
        Checks.geometry(detectorLengthCm, totalLengthCm, voltageKv);
        Checks.ramp(rampS);
        Checks.positiveTime("marker time", markerTimeS);
        Checks.standardDeviation("marker time uncertainty", markerTimeSdS);
        Checks.finite("marker mobility", markerMobility);
    }

    private double fieldFactor() {
        return MobilityMath.fieldFactor(detectorLengthCm, totalLengthCm, voltageKv);
    }

    private double markerInverseTime() {
        return MobilityMath.inverseCorrectedTime(markerTimeS, rampS);
    }

    @Override
    public double mobility(double timeS) {
        return fieldFactor() * (MobilityMath.inverseCorrectedTime(timeS, rampS) - markerInverseTime())
                + markerMobility;
    }

    @Override
    public double mobilitySd(double timeS, double timeSdS) {
        Checks.positiveTime("time", timeS);
        Checks.standardDeviation("time uncertainty", timeSdS);
        double c = fieldFactor();
        double fromApex = c * MobilityMath.inverseCorrectedTimeSlope(timeS, rampS) * timeSdS;
        double fromMarker = -c * MobilityMath.inverseCorrectedTimeSlope(markerTimeS, rampS) * markerTimeSdS;
        return Math.hypot(fromApex, fromMarker);
    }

    @Override
    public double timeS(double mobility) {
        Checks.finite("mobility", mobility);
        return MobilityMath.rawTimeFromInverse(markerInverseTime() + (mobility - markerMobility) / fieldFactor(),
                rampS);
    }

    /** μ_eof = Ld·Lt/(V·t'_m) − μ_m. */
    @Override
    public double eofMobility() {
        return fieldFactor() * markerInverseTime() - markerMobility;
    }

    @Override
    public String describe() {
        return "marker of mobility " + Formats.mobility(markerMobility) + " at " + Formats.seconds(markerTimeS)
                + ", EOF mobility " + Formats.mobility(eofMobility())
                + " (" + Formats.geometry(detectorLengthCm, totalLengthCm, voltageKv, rampS) + ")";
    }
}
