package org.mobident.signal;

import java.util.List;
import org.mobident.result.Peak;

/**
 * The result of peak detection on one trace.
 *
 * @param peaks    peaks in order of apex time
 * @param noiseSd  standard deviation of the baseline noise of the whole run (the robust SD of the
 *                 baseline-corrected signal outside the peaks), signal units
 * @param noisePeakToPeak peak-to-peak noise h of the run for a peak of the typical width,
 *                 d₂(n)·noiseSd over 5 typical widths, signal units; each peak's own S/N uses the
 *                 noise where it sits and its own width
 * @param probe    a second look at the trace at times where zones are expected, or null (it
 *                 holds the corrected trace: drop the analysis once the look is done)
 * @param flatTops zone tops the detector cut flat (saturation), repaired from their flanks before
 *                 detection; empty for most runs
 */
public record TraceAnalysis(List<Peak> peaks, double noiseSd, double noisePeakToPeak, ExpectedZoneProbe probe,
                            List<FlatTop> flatTops) {
    public TraceAnalysis {
        peaks = List.copyOf(peaks);
        flatTops = List.copyOf(flatTops);
    }

    /** An analysis that cannot look again (no probe) and found no cut tops. */
    public TraceAnalysis(List<Peak> peaks, double noiseSd, double noisePeakToPeak) {
        this(peaks, noiseSd, noisePeakToPeak, null, List.of());
    }
}
