package org.mobident.signal;

/**
 * A zone top cut flat by a saturated detector, repaired from its flanks (see {@link FlatTops}).
 *
 * @param fromS     time of the first sample at the cut level, s
 * @param toS       time of the last sample at the cut level, s
 * @param centreS   the centre of the flank fit, s
 * @param centreSdS standard uncertainty of that centre, s
 */
public record FlatTop(double fromS, double toS, double centreS, double centreSdS) {

    /** True when the rebuilt top's centre lies in [fromS, toS] (a peak's start and end): the peak is the cut zone. */
    public boolean centredWithin(double fromS, double toS) {
        return centreS >= fromS && centreS <= toS;
    }
}
