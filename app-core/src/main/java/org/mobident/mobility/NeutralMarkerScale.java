package org.mobident.mobility;

/**
 * Scale set by a neutral marker that moves with the electro-osmotic flow, and the capillary
 * geometry: μ_eof = Ld·Lt/(V·t'_marker), μ_eff = Ld·Lt/(V·t') − μ_eof, with t' = t − τ/2 the
 * ramp-corrected time (IUPAC Compendium, "electrophoretic mobility"; Jumppanen &amp; Riekkola,
 * Anal. Chem. 67 (1995) 1060; Williams &amp; Vigh, Anal. Chem. 68 (1996) 1174).
 *
 * <p>With the signed voltage the formulas hold for every polarity: normal polarity with a
 * cathodic EOF gives μ_eof &gt; 0; reversed polarity with a reversed (coated-wall) EOF gives
 * V &lt; 0 and μ_eof &lt; 0. This is {@link ChargedMarkerScale} with a marker mobility of zero.
 *
 * @param detectorLengthCm inlet-to-detector length Ld, cm
 * @param totalLengthCm    total length Lt, cm (Ld &lt; Lt)
 * @param voltageKv        signed voltage, kV, non-zero
 * @param rampS            linear voltage ramp duration, s, ≥ 0
 * @param markerTimeS      raw apex time of the neutral marker, s, &gt; 0
 * @param markerTimeSdS    standard uncertainty of that time, s, ≥ 0
 */
public record NeutralMarkerScale(double detectorLengthCm, double totalLengthCm, double voltageKv, double rampS,
                                 double markerTimeS, double markerTimeSdS) implements SpecialCaseScale {

    /** @throws IllegalArgumentException for an impossible geometry or time */
    public NeutralMarkerScale {
        asCharged(detectorLengthCm, totalLengthCm, voltageKv, rampS, markerTimeS, markerTimeSdS);
    }

    private static ChargedMarkerScale asCharged(double detectorLengthCm, double totalLengthCm, double voltageKv,
                                                double rampS, double markerTimeS, double markerTimeSdS) {
        return new ChargedMarkerScale(detectorLengthCm, totalLengthCm, voltageKv, rampS, markerTimeS,
                markerTimeSdS, 0.0);
    }

    @Override
    public ChargedMarkerScale general() {
        return asCharged(detectorLengthCm, totalLengthCm, voltageKv, rampS, markerTimeS, markerTimeSdS);
    }

    @Override
    public String describe() {
        return "neutral marker at " + Formats.seconds(markerTimeS) + ", EOF mobility "
                + Formats.mobility(eofMobility())
                + " (" + Formats.geometry(detectorLengthCm, totalLengthCm, voltageKv, rampS) + ")";
    }
}
