package org.mobident.mobility;

/**
 * Scale set by a neutral marker (t_n) and a marker of known effective mobility μ_m (t_m); needs
 * neither lengths nor voltage:
 * μ_x = μ_m·(1/t'_x − 1/t'_n)/(1/t'_m − 1/t'_n), t' = t − τ/2
 * (Jumppanen &amp; Riekkola, Anal. Chem. 67 (1995) 1060; ramp correction: Williams &amp; Vigh,
 * Anal. Chem. 68 (1996) 1174).
 *
 * <p>The EOF mobility is determined as well, μ_eof = μ_m·(1/t'_n)/(1/t'_m − 1/t'_n), because
 * the two markers calibrate the factor Ld·Lt/V. This is {@link TwoChargedMarkerScale} with the
 * first marker's mobility zero; uncertainty propagation is described there.
 *
 * @param rampS          linear voltage ramp duration, s, ≥ 0
 * @param neutralTimeS   raw apex time of the neutral marker, s, &gt; 0
 * @param neutralSdS     its standard uncertainty, s, ≥ 0
 * @param markerTimeS    raw apex time of the charged marker, s, &gt; 0
 * @param markerSdS      its standard uncertainty, s, ≥ 0
 * @param markerMobility known effective mobility of the charged marker, 1e-9 m²/(V·s), non-zero
 */
public record TwoMarkerScale(double rampS, double neutralTimeS, double neutralSdS, double markerTimeS,
                             double markerSdS, double markerMobility) implements SpecialCaseScale {

    /** @throws IllegalArgumentException for invalid values, a zero marker mobility or coinciding markers */
    public TwoMarkerScale {
        asGeneral(rampS, neutralTimeS, neutralSdS, markerTimeS, markerSdS, markerMobility);
    }

    private static TwoChargedMarkerScale asGeneral(double rampS, double neutralTimeS, double neutralSdS,
                                                   double markerTimeS, double markerSdS, double markerMobility) {
        return new TwoChargedMarkerScale(rampS, neutralTimeS, neutralSdS, 0.0, markerTimeS, markerSdS,
                markerMobility);
    }

    @Override
    public TwoChargedMarkerScale general() {
        return asGeneral(rampS, neutralTimeS, neutralSdS, markerTimeS, markerSdS, markerMobility);
    }

    @Override
    public String describe() {
        return "neutral marker at " + Formats.seconds(neutralTimeS) + " and marker of mobility "
                + Formats.mobility(markerMobility) + " at " + Formats.seconds(markerTimeS)
                + ", EOF mobility " + Formats.mobility(eofMobility()) + " (lengths and voltage not used)";
    }
}
