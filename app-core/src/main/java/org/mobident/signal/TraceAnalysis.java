package org.mobident.signal;

import java.util.List;

/**
 * The result of peak detection on one trace.
 *
 * @param peaks    peaks in order of apex time
 * @param noiseSd  standard deviation of the baseline noise of the whole run (the robust SD of the
 *                 baseline-corrected signal outside the peaks), signal units
 * @param noisePeakToPeak peak-to-peak noise h of the run for a peak of the typical width,
 *                 d₂(n)·noiseSd over 5 typical widths, signal units; each peak's own S/N uses the
 *                 noise where it sits and its own width
 */
public record TraceAnalysis(List<Peak> peaks, double noiseSd, double noisePeakToPeak) {
    public TraceAnalysis {
        peaks = List.copyOf(peaks);
    }
}
