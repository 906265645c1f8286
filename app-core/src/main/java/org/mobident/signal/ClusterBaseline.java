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
 *
 * <p>The same chord serves a stretch where the signal dips below the clipped baseline by the
 * detection level: clipping cannot rise into a dip, so a dip wider than the closing of
 * {@link SnipBaseline} drags the baseline down with it, and the rims of the dip then stand above the
 * sagging baseline like broad, low peaks. A group therefore also takes in every run more than
 * {@code returnLevel} below the baseline that reaches {@code detectLevel}, and a group holding such a
 * dip gets the chord itself as its baseline (raised as well as lowered): the chord from the
 * undisturbed signal before the stretch to that after it is then the only baseline the data
 * support. Dips and their rims chain into long disturbed stretches, so such a group may span
 * {@link SignalLimits#GROUP_DIP_SPAN_FACTOR} times the usual longest group.
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
        boolean dipInGroup = false;
        while (i < n) {
            double v = smooth[i] - baseline[i];
            int j = i;
            double top;
            double sign;
            if (v > returnLevel) {
                sign = 1;
                top = v;
                while (j + 1 < n && smooth[j + 1] - baseline[j + 1] > returnLevel) {
                    j++;
                    top = Math.max(top, smooth[j] - baseline[j]);
                }
            } else if (v < -returnLevel) {
                sign = -1;
                top = -v;
                while (j + 1 < n && baseline[j + 1] - smooth[j + 1] > returnLevel) {
                    j++;
                    top = Math.max(top, baseline[j] - smooth[j]);
                }
            } else {
                i++;
                continue;
            }
            if (top >= detectLevel) {
                double span = dipInGroup || sign < 0 ? SignalLimits.GROUP_DIP_SPAN_FACTOR * maxSpanS : maxSpanS;
                if (groupStart >= 0 && t[i] - t[groupEnd] < mergeGapS && t[j] - t[groupStart] <= span) {
                    groupEnd = j;
                    runsInGroup++;
                    dipInGroup |= sign < 0;
                } else {
                    if (runsInGroup >= 2) {
                        lower(t, smooth, baseline, groupStart, groupEnd, edgeS, spanOf(maxSpanS, dipInGroup),
                                dipInGroup);
                    }
                    groupStart = i;
                    groupEnd = j;
                    runsInGroup = 1;
                    dipInGroup = sign < 0;
                }
            }
            i = j + 1;
        }
        if (runsInGroup >= 2) {
            lower(t, smooth, baseline, groupStart, groupEnd, edgeS, spanOf(maxSpanS, dipInGroup), dipInGroup);
        }
        return baseline;
    }

    private static double spanOf(double maxSpanS, boolean dipInGroup) {
        return dipInGroup ? SignalLimits.GROUP_DIP_SPAN_FACTOR * maxSpanS : maxSpanS;
    }

    /** The chord over [start, end]: the baseline there becomes the lower of the two, or the chord
     *  itself when {@code replace} (a group holding a dip). */
    private static void lower(double[] t, double[] smooth, double[] baseline, int start, int end, double edgeS,
                              double maxSpanS, boolean replace) {
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
            if (replace || chord < baseline[k]) {
                baseline[k] = chord;
            }
        }
    }
}
