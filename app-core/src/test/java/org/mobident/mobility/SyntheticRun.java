package org.mobident.mobility;

/**
 * A made-up run used to synthesise apex times from known mobilities, straight from the
 * definition in SI units (not through the code under test): the zone moves with
 * v = (μ_eff + μ_eof)·E, E = V/Lt, and passes the detector after Ld/v of full-voltage time,
 * plus half the ramp (a linear ramp of τ delivers V·(t − τ/2); Williams &amp; Vigh 1996).
 */
record SyntheticRun(double detectorLengthCm, double totalLengthCm, double voltageKv, double rampS,
                    double eofMobility) {

    /** Raw apex time of a zone of effective mobility {@code mobility} (1e-9 m²/(V s)), s. */
    double rawTimeS(double mobility) {
        double ldM = detectorLengthCm / 100.0;
        double ltM = totalLengthCm / 100.0;
        double fieldVPerM = voltageKv * 1000.0 / ltM;
        double velocityMPerS = (mobility + eofMobility) * 1e-9 * fieldVPerM;
        return ldM / velocityMPerS + rampS / 2.0;
    }
}
