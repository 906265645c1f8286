package org.mobident.mobility;

import java.util.Optional;
import org.mobident.result.MobilityScale;
import org.mobident.trace.RunConditions;

/** Chooses the marker scheme for a run from what is known about it. */
public final class MobilityScales {

    private MobilityScales() {
    }

    /**
     * The mobility scale of a run, from its conditions and the marker peaks found in its trace.
     * Order of preference:
     * <ol>
     *   <li>neutral marker and declared charged marker both found: {@link TwoMarkerScale}, which
     *       does not depend on the stated lengths and voltage (Jumppanen &amp; Riekkola 1995);</li>
     *   <li>neutral marker and geometry: {@link NeutralMarkerScale};</li>
     *   <li>charged marker and geometry: {@link ChargedMarkerScale};</li>
     *   <li>otherwise empty: no mobility can be given.</li>
     * </ol>
     *
     * @param conditions     the run's conditions (geometry, ramp, declared marker mobility)
     * @param neutralTimeS   raw apex time of the neutral marker, s, or NaN when none was found
     * @param neutralSdS     its standard uncertainty, s (ignored when the time is NaN)
     * @param refMarkerTimeS raw apex time of the charged marker, s, or NaN when none was found
     * @param refMarkerSdS   its standard uncertainty, s (ignored when the time is NaN)
     * @throws IllegalArgumentException when a chosen scheme rejects the values (see each scale)
     */
    public static Optional<MobilityScale> forRun(RunConditions conditions, double neutralTimeS, double neutralSdS,
                                                 double refMarkerTimeS, double refMarkerSdS) {
        boolean neutral = !Double.isNaN(neutralTimeS);
        boolean charged = conditions.hasRefMarker() && !Double.isNaN(refMarkerTimeS);
        double rampS = conditions.rampOrZeroS();
        if (neutral && charged) {
            return Optional.of(new TwoMarkerScale(rampS, neutralTimeS, neutralSdS, refMarkerTimeS, refMarkerSdS,
                    conditions.refMarkerMobility()));
        }
        if (!conditions.hasGeometry()) {
            return Optional.empty();
        }
        if (neutral) {
            return Optional.of(new NeutralMarkerScale(conditions.detectorLengthCm(), conditions.totalLengthCm(),
                    conditions.voltageKv(), rampS, neutralTimeS, neutralSdS));
        }
        if (charged) {
            return Optional.of(new ChargedMarkerScale(conditions.detectorLengthCm(), conditions.totalLengthCm(),
                    conditions.voltageKv(), rampS, refMarkerTimeS, refMarkerSdS, conditions.refMarkerMobility()));
        }
        return Optional.empty();
    }
}
