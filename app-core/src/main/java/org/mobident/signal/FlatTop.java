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
}
