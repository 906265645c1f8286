package org.mobident.signal;

import java.util.List;

/**
 * The result of peak detection on one trace.
 *
 * @param peaks    peaks in order of apex time
 * @param noiseSd  standard deviation of the baseline noise, signal units
 * @param noisePeakToPeak peak-to-peak noise h used for S/N, signal units
 */
public record TraceAnalysis(List<Peak> peaks, double noiseSd, double noisePeakToPeak) {
    public TraceAnalysis {
        peaks = List.copyOf(peaks);
    }
}
