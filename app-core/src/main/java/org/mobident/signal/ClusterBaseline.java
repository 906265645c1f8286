package org.mobident.signal;

/**
 * Lowers the clipped baseline under crowded stretches of peaks to the straight line between the
 * signal on either side of the stretch.
 *
 * <p>SNIP clipping ({@link SnipBaseline}) follows the chord under anything narrower than its
 * window, so under a group of zones that together are wider than the window it rises into the
 * group, lowering their heights and areas and tilting the baseline under each apex. Integration
 * practice in separation science draws the baseline of such a group from its start to its end
 * ("common baseline" or valley-to-valley on the group: Dyson, Chromatographic Integration
 * Methods, 2nd ed. 1998, ch. 3; from memory). Here the group is every run of points more than
 * {@code returnLevel} above the clipped baseline that reaches {@code detectLevel}, runs closer
 * than {@code mergeGapS} joined while the group stays within {@code maxSpanS}; a group of two or more runs gets the chord between the mean
 * signal in a window of {@code edgeS} just outside each end, and the baseline inside becomes the
 * lower of the two. Groups longer than {@code maxSpanS} are left alone (a chord that long would
 * cut across real baseline curvature). Linear in the number of points.
 */
final class ClusterBaseline {

    private ClusterBaseline() {
    }

    /**
     * @param t           times, s
     * @param smooth      smoothed signal, peaks up (not modified)
     * @param baseline    clipped baseline (modified in place and returned)
     * @param returnLevel level above the baseline below which a point counts as baseline
     * @param detectLevel height a run must reach to count as a zone
     * @param mergeGapS   runs closer than this belong to one group, s
     * @param edgeS       width of the windows outside a group that fix its chord, s
     * @param maxSpanS    longest group that is bridged, s
     */
    static double[] bridge(double[] t, double[] smooth, double[] baseline, double returnLevel, double detectLevel,
                           double mergeGapS, double edgeS, double maxSpanS) {
        int n = smooth.length;
        int i = 0;
        int groupStart = -1;
        int groupEnd = -1;
        int runsInGroup = 0;
        while (i < n) {
            if (smooth[i] - baseline[i] <= returnLevel) {
                i++;
                continue;
            }
            int j = i;
            double top = smooth[i] - baseline[i];
            while (j + 1 < n && smooth[j + 1] - baseline[j + 1] > returnLevel) {
                j++;
                top = Math.max(top, smooth[j] - baseline[j]);
            }
            if (top >= detectLevel) {
                if (groupStart >= 0 && t[i] - t[groupEnd] < mergeGapS && t[j] - t[groupStart] <= maxSpanS) {
                    groupEnd = j;
                    runsInGroup++;
                } else {
                    if (runsInGroup >= 2) {
                        lower(t, smooth, baseline, groupStart, groupEnd, edgeS, maxSpanS);
                    }
                    groupStart = i;
                    groupEnd = j;
                    runsInGroup = 1;
                }
            }
            i = j + 1;
        }
        if (runsInGroup >= 2) {
            lower(t, smooth, baseline, groupStart, groupEnd, edgeS, maxSpanS);
        }
        return baseline;
    }

    private static void lower(double[] t, double[] smooth, double[] baseline, int start, int end, double edgeS,
                              double maxSpanS) {
        if (t[end] - t[start] > maxSpanS || start == 0 || end == t.length - 1) {
            return;
        }
        int a = start - 1;
        double sumL = 0;
        double timeL = 0;
        int countL = 0;
        while (a >= 0 && t[start] - t[a] <= edgeS) {
            sumL += smooth[a];
            timeL += t[a];
            countL++;
            a--;
        }
        int b = end + 1;
        double sumR = 0;
        double timeR = 0;
        int countR = 0;
        while (b < t.length && t[b] - t[end] <= edgeS) {
            sumR += smooth[b];
            timeR += t[b];
            countR++;
            b++;
        }
        if (countL == 0 || countR == 0) {
            return;
        }
        double tL = timeL / countL;
        double yL = sumL / countL;
        double tR = timeR / countR;
        double yR = sumR / countR;
        double slope = (yR - yL) / (tR - tL);
        for (int k = start; k <= end; k++) {
            double chord = yL + slope * (t[k] - tL);
            if (chord < baseline[k]) {
                baseline[k] = chord;
            }
        }
    }
}
