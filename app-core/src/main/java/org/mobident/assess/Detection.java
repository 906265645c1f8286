package org.mobident.assess;

/**
 * Peak finding and markers over the scored runs.
 *
 * @param analytePeaks       reported peaks in the analyte role
 * @param analytePeaksOnZone of them, on a known zone (analyte, foreign or marker row)
 * @param spikesReported     known spikes that a reported peak (of any role) belongs to; should be 0
 * @param zones              known zones (analyte and foreign rows)
 * @param zonesDetected      of them, with a reported peak
 * @param runsFailed         scored runs that could not be processed
 * @param runsWithoutScale   scored runs processed without a mobility scale
 * @param runsMarkerOff      scored runs whose chosen neutral marker is not on the known marker (or is missing)
 */
public record Detection(int analytePeaks, int analytePeaksOnZone, int spikesReported, int zones, int zonesDetected,
                        int runsFailed, int runsWithoutScale, int runsMarkerOff) {

    /** Analyte-role peaks on a known zone, out of all analyte-role peaks. */
    public Ratio precision() {
        return new Ratio(analytePeaksOnZone, analytePeaks);
    }

    /** Known zones with a reported peak. */
    public Ratio rate() {
        return new Ratio(zonesDetected, zones);
    }
}
