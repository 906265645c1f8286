package org.mobident.assess;

/**
 * Recall and detection in one band of zone height over noise SD.
 *
 * @param stratum         the band
 * @param analyteRows     library analytes present (known analyte rows) in the band
 * @param identifiedRight of them, identified with the right name
 * @param calledRight     of them, identified or ambiguous with the right name
 * @param zones           known zones (analyte and foreign rows) in the band
 * @param detected        of them, with a reported peak
 */
public record StratumScore(HeightStratum stratum, int analyteRows, int identifiedRight, int calledRight, int zones,
                           int detected) {

    /** Identified with the right name, out of the analytes present. */
    public Ratio recall() {
        return new Ratio(identifiedRight, analyteRows);
    }

    /** Identified or ambiguous with the right name, out of the analytes present. */
    public Ratio recallWithAmbiguous() {
        return new Ratio(calledRight, analyteRows);
    }

    /** Zones with a reported peak, out of the known zones. */
    public Ratio detectionRate() {
        return new Ratio(detected, zones);
    }
}
