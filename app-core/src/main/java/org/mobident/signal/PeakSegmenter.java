package org.mobident.signal;

import java.util.ArrayList;
import java.util.List;

/**
 * Cuts a smoothed, baseline-corrected signal (peaks up) into peak segments, in one pass.
 *
 * <p><b>Start and end.</b> A run of points above the return level (the signal has not yet come
 * back to the baseline) is one region; it starts at the last point at or below that level
 * before the run and ends at the first one after it.
 *
 * <p><b>Split and merge.</b> Inside a region, maxima are separate peaks only when the signal
 * falls from the first by at least the hysteresis and then rises again by at least the
 * hysteresis; the boundary between them is the lowest point of the valley, where a
 * perpendicular is dropped to the baseline (the perpendicular-drop rule, e.g. Dyson,
 * Chromatographic Integration Methods, 2nd ed. 1998; from memory). Smaller wiggles, and shoulders
 * without a local maximum, stay within one peak (they merge). This is the hysteresis rule of
 * a two-threshold peak detector, linear in the number of points.
 */
final class PeakSegmenter {

    private PeakSegmenter() {
    }

    /**
     * @param smooth      smoothed corrected signal (not modified)
     * @param returnLevel the signal is back at the baseline at or below this level
     * @param hysteresis  fall and rise that separate two maxima, &gt; 0
     * @return segments as {first, last} index pairs (inclusive), in time order; neighbours of an
     *         overlapped group share their valley point
     */
    static List<int[]> segments(double[] smooth, double returnLevel, double hysteresis) {
        int n = smooth.length;
        List<int[]> out = new ArrayList<>();
        int i = 0;
        while (i < n) {
            if (!(smooth[i] > returnLevel)) {
                i++;
                continue;
            }
            int a = i;
            while (i + 1 < n && smooth[i + 1] > returnLevel) {
                i++;
            }
            int b = i;
            int segmentStart = Math.max(a - 1, 0);
            int top = a;
            int valley = -1;
            for (int j = a; j <= b; j++) {
                if (valley < 0) {
                    if (smooth[j] > smooth[top]) {
                        top = j;
                    } else if (smooth[top] - smooth[j] >= hysteresis) {
                        valley = j;
                    }
                } else if (smooth[j] < smooth[valley]) {
                    valley = j;
                } else if (smooth[j] - smooth[valley] >= hysteresis) {
                    out.add(new int[] {segmentStart, valley});
                    segmentStart = valley;
                    top = j;
                    valley = -1;
                }
            }
            out.add(new int[] {segmentStart, Math.min(b + 1, n - 1)});
            i = b + 1;
        }
        return out;
    }
}
