package org.mobident.mobility;

import org.mobident.result.MobilityScale;

/**
 * Scale set by two markers of known, different effective mobilities; needs neither lengths nor
 * voltage.
 *
 * <p>For every zone μ_eff + μ_eof = c·u with u = 1/t' the reciprocal ramp-corrected time and
 * c = Ld·Lt/V, so u is linear in μ_eff. Two markers (μ₁, t₁), (μ₂, t₂) fix the line:
 * μ = μ₁ + k·(u − u₁) with k = (μ₂ − μ₁)/(u₂ − u₁), and k takes the place of Ld·Lt/V (multiple
 * marker calibration: Jumppanen &amp; Riekkola, Anal. Chem. 67 (1995) 1060; ramp correction:
 * Williams &amp; Vigh, Anal. Chem. 68 (1996) 1174). The EOF mobility follows too: a zone with
 * u → 0 (infinitely late) has μ_eff = −μ_eof, so μ_eof = k·u₁ − μ₁.
 * A neutral and a charged marker is the case μ₁ = 0 ({@link TwoMarkerScale}).
 *
 * <p>Uncertainty: first-order propagation (JCGM 100:2008, GUM, eq. 10) with the exact partial
 * derivatives ∂μ/∂u = k, ∂μ/∂u₁ = k·(u − u₂)/(u₂ − u₁), ∂μ/∂u₂ = −k·(u − u₁)/(u₂ − u₁), each
 * times du/dt of its own time; the three time errors are taken as independent.
 *
 * @param rampS          linear voltage ramp duration, s, ≥ 0
 * @param firstTimeS     raw apex time of the first marker, s, &gt; 0
 * @param firstSdS       its standard uncertainty, s, ≥ 0
 * @param firstMobility  known effective mobility of the first marker, 1e-9 m²/(V·s)
 * @param secondTimeS    raw apex time of the second marker, s, &gt; 0
 * @param secondSdS      its standard uncertainty, s, ≥ 0
 * @param secondMobility known effective mobility of the second marker, 1e-9 m²/(V·s)
 */
public record TwoChargedMarkerScale(double rampS, double firstTimeS, double firstSdS, double firstMobility,
                                    double secondTimeS, double secondSdS, double secondMobility)
        implements MobilityScale {

    /**
     * @throws IllegalArgumentException for invalid times or uncertainties, equal mobilities, or
     *                                  times that coincide after the ramp correction
     */
    public TwoChargedMarkerScale {
        Checks.ramp(rampS);
        Checks.positiveTime("first marker time", firstTimeS);
        Checks.positiveTime("second marker time", secondTimeS);
        Checks.standardDeviation("first marker time uncertainty", firstSdS);
        Checks.standardDeviation("second marker time uncertainty", secondSdS);
        Checks.finite("first marker mobility", firstMobility);
        Checks.finite("second marker mobility", secondMobility);
        if (Checks.nearlyEqual(firstMobility, secondMobility)) {
            throw new IllegalArgumentException("the two markers must differ in mobility, both are " + firstMobility);
        }
        if (Checks.nearlyEqual(MobilityMath.rampCorrectedTimeS(firstTimeS, rampS),
                MobilityMath.rampCorrectedTimeS(secondTimeS, rampS))) {
            throw new IllegalArgumentException("markers of different mobility cannot arrive together, both at "
                    + firstTimeS + " s");
        }
    }

    private double u1() {
        return MobilityMath.inverseCorrectedTime(firstTimeS, rampS);
    }

    private double u2() {
        return MobilityMath.inverseCorrectedTime(secondTimeS, rampS);
    }

    /** k = (μ₂ − μ₁)/(u₂ − u₁): the calibrated stand-in for Ld·Lt/V. */
    private double slope() {
        return (secondMobility - firstMobility) / (u2() - u1());
    }

    @Override
    public double mobility(double timeS) {
        return firstMobility + slope() * (MobilityMath.inverseCorrectedTime(timeS, rampS) - u1());
    }

    @Override
    public double mobilitySd(double timeS, double timeSdS) {
        Checks.standardDeviation("time uncertainty", timeSdS);
        double u = MobilityMath.inverseCorrectedTime(timeS, rampS);
        double u1 = u1();
        double u2 = u2();
        double k = slope();
        double fromApex = k * MobilityMath.inverseCorrectedTimeSlope(timeS, rampS) * timeSdS;
        double fromFirst = k * (u - u2) / (u2 - u1) * MobilityMath.inverseCorrectedTimeSlope(firstTimeS, rampS)
                * firstSdS;
        double fromSecond = -k * (u - u1) / (u2 - u1) * MobilityMath.inverseCorrectedTimeSlope(secondTimeS, rampS)
                * secondSdS;
        return Math.sqrt(fromApex * fromApex + fromFirst * fromFirst + fromSecond * fromSecond);
    }

    @Override
    public double timeS(double mobility) {
        Checks.finite("mobility", mobility);
        return MobilityMath.rawTimeFromInverse(u1() + (mobility - firstMobility) / slope(), rampS);
    }

    /** μ_eof = k·u₁ − μ₁, determined by the two markers alone. */
    @Override
    public double eofMobility() {
        return slope() * u1() - firstMobility;
    }

    @Override
    public String describe() {
        return "markers of mobility " + Formats.mobility(firstMobility) + " at " + Formats.seconds(firstTimeS)
                + " and " + Formats.mobility(secondMobility) + " at " + Formats.seconds(secondTimeS)
                + ", EOF mobility " + Formats.mobility(eofMobility()) + " (lengths and voltage not used)";
    }
}
