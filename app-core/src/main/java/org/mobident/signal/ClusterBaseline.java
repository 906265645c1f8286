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
                           double mergeGapS, double edgeS, double maxSpanS, double wideS) {
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
                    if (runsInGroup >= 2 || (groupStart >= 0 && t[groupEnd] - t[groupStart] > wideS)) {
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
        if (runsInGroup >= 2 || (groupStart >= 0 && t[groupEnd] - t[groupStart] > wideS)) {
            lower(t, smooth, baseline, groupStart, groupEnd, edgeS, spanOf(maxSpanS, dipInGroup), dipInGroup);
        }
        return baseline;
    }

    /**
     * Where a group's outer flank reaches the floor of the signal: from {@code index}, steps of
     * {@code edgeS} outwards while the mean smoothed signal of the next step lies lower than that of
     * the current one, never beyond {@code limitS} (on the baseline's noise the walk stops after a step or two, the chance of
     * going on halving with each step), and only while each step falls clearly less than the one before
     * ({@link SignalLimits#WALK_DRIFT_DROP_RATIO}): an exponential flank falls by a shrinking amount per
     * step, a drifting baseline by a steady one, and the walk must not follow the drift away from the zone. A concentrated zone's diffuse flank
     * (electromigration dispersion) runs on far beyond where the clipped baseline, which rose into
     * it, lets it end; its chord must start where the signal stops falling.
     */
    private static int walkOut(double[] t, double[] smooth, int index, int direction, double edgeS, double limitS) {
        int current = index;
        double currentMean = stepMean(t, smooth, current, direction, edgeS);
        double lastDrop = Double.POSITIVE_INFINITY;
        while (true) {
            int next = current;
            while (next + direction >= 0 && next + direction < t.length
                    && Math.abs(t[next + direction] - t[current]) <= edgeS) {
                next += direction;
            }
            if (next == current || next == 0 || next == t.length - 1 || (t[next] - limitS) * direction > 0) {
                return current;
            }
            double nextMean = stepMean(t, smooth, next, direction, edgeS);
            double drop = currentMean - nextMean;
            if (!(drop > 0) || drop >= SignalLimits.WALK_DRIFT_DROP_RATIO * lastDrop) {
                return current; // back on the floor, or falling as steadily as a drifting baseline
            }
            current = next;
            currentMean = nextMean;
            lastDrop = drop;
        }
    }

    /** Mean of the smoothed signal over one step of {@code edgeS} outwards from {@code index}. */
    private static double stepMean(double[] t, double[] smooth, int index, int direction, double edgeS) {
        double sum = 0;
        int count = 0;
        int k = index;
        while (k >= 0 && k < t.length && Math.abs(t[k] - t[index]) <= edgeS) {
            sum += smooth[k];
            count++;
            k += direction;
        }
        return sum / count;
    }

    private static double spanOf(double maxSpanS, boolean dipInGroup) {
        return dipInGroup ? SignalLimits.GROUP_DIP_SPAN_FACTOR * maxSpanS : maxSpanS;
    }

    /** The chord over [start, end]: the baseline there becomes the lower of the two, or the chord
     *  itself when {@code replace} (a group holding a dip). */
    private static void lower(double[] t, double[] smooth, double[] baseline, int start, int end, double edgeS,
                              double maxSpanS, boolean replace) {
        if (!replace) {
            // steps a quarter of the group long: an exponential flank falls by a fifth or more per
            // step, well above the noise of the step means
            double step = Math.max(edgeS, SignalLimits.WALK_STEP_OF_GROUP * (t[end] - t[start]));
            start = walkOut(t, smooth, start, -1, step, t[end] - maxSpanS);
            end = walkOut(t, smooth, end, +1, step, t[start] + maxSpanS);
        }
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
