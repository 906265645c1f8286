package org.mobident.matching;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Exact marginal probabilities of a one-to-one assignment of peaks to library entries.
 *
 * <p>The joint probability of an assignment a (each peak to one candidate entry or to "none",
 * no entry to two peaks) is proportional to the product over peaks of the peak's option weight
 * ({@code 1} for none, the likelihood ratio ρ for an entry). The marginal P(a_t = option) sums
 * that product over every valid assignment. It is computed by a forward–backward pass over the
 * peaks in a fixed order (a sum–product dynamic programme over partial matchings, as in
 * Rabiner, Proc. IEEE 77 (1989) 257 for chains): the state after a peak is the set of entries
 * already taken that a later peak could still want. Entries that only one peak can use never enter
 * the state, and an entry leaves the state after the last peak that can use it, so with narrow
 * candidate windows and peaks ordered by mobility the state sets stay small. When a layer would
 * exceed {@code maxStates}, {@link #compute} returns null and the caller approximates.
 */
final class AssignmentMarginals {

    private AssignmentMarginals() {
    }

    /**
     * @param entryOf   for each peak (in processing order), the entry index of each candidate
     * @param logWeight for each peak, the log likelihood ratio (vs none) of each candidate
     * @param maxStates largest number of states allowed in one layer
     * @return per peak, {@code [P(none), P(candidate 0), P(candidate 1), …]}, or null when too large
     */
    static double[][] compute(int[][] entryOf, double[][] logWeight, int maxStates) {
        Result r = computeWithNormaliser(entryOf, logWeight, maxStates);
        return r == null ? null : r.marginals();
    }

    /**
     * The marginals and ln Z, Z = the sum over every valid assignment of the product of its option
     * weights (the normaliser of the joint posterior; 1 for "every peak none").
     *
     * @param marginals      as {@link #compute}
     * @param logNormaliser  ln Z
     */
    record Result(double[][] marginals, double logNormaliser) {
    }

    /** As {@link #compute}, with ln Z; null when too large. */
    static Result computeWithNormaliser(int[][] entryOf, double[][] logWeight, int maxStates) {
        // each pass is a method of its own, so that the JIT compiles the loop it runs in (and the
        // pass runs long enough to be compiled while it runs) without the rest of the computation
        int peaks = entryOf.length;
        Map<Integer, Integer> bitOf = new HashMap<>();
        int[] lastUser = sharedEntries(entryOf, bitOf);
        double[] noneWeight = new double[peaks];
        double[][] weight = new double[peaks][];
        int[][] bit = new int[peaks][];
        double logZ = optionWeights(entryOf, logWeight, bitOf, noneWeight, weight, bit, 0.0);
        List<Map<BitSet, Double>> forward = new ArrayList<>(peaks + 1);
        double[] logZHolder = {logZ};
        if (!forwardPass(forward, logZHolder, noneWeight, weight, bit, lastUser, maxStates)) {
            return null;
        }
        double[][] marginal = backwardPass(forward, noneWeight, weight, bit, lastUser);
        return marginal == null ? null : new Result(marginal, logZHolder[0]);
    }

    /**
     * Entries wanted by two or more peaks get a bit (in {@code bitOf}); returns, per bit, the last
     * peak that wants the entry.
     */
    private static int[] sharedEntries(int[][] entryOf, Map<Integer, Integer> bitOf) {
        Map<Integer, Integer> firstUser = new HashMap<>();
        List<Integer> lastUserOfBit = new ArrayList<>();
        for (int t = 0; t < entryOf.length; t++) {
            for (int e : entryOf[t]) {
                Integer first = firstUser.putIfAbsent(e, t);
                if (first != null && first != t) {
                    Integer bit = bitOf.get(e);
                    if (bit == null) {
                        bitOf.put(e, lastUserOfBit.size());
                        lastUserOfBit.add(t);
                    } else {
                        lastUserOfBit.set(bit, t);
                    }
                }
            }
        }
        return lastUserOfBit.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * Option weights per peak, scaled so that the largest is 1 (the scale cancels), filled into
     * {@code noneWeight}, {@code weight} and {@code bit}; returns {@code logZ} plus the logs of
     * the scales, added peak by peak.
     */
    private static double optionWeights(int[][] entryOf, double[][] logWeight, Map<Integer, Integer> bitOf,
                                        double[] noneWeight, double[][] weight, int[][] bit, double logZ) {
        for (int t = 0; t < entryOf.length; t++) {
            double maxLog = 0.0;
            for (double lw : logWeight[t]) {
                maxLog = Math.max(maxLog, lw);
            }
            noneWeight[t] = Math.exp(-maxLog);
            logZ += maxLog;
            weight[t] = new double[entryOf[t].length];
            bit[t] = new int[entryOf[t].length];
            for (int k = 0; k < entryOf[t].length; k++) {
                weight[t][k] = Math.exp(logWeight[t][k] - maxLog);
                bit[t][k] = bitOf.getOrDefault(entryOf[t][k], -1);
            }
        }
        return logZ;
    }

    /**
     * The forward layers (normalised), appended to {@code forward}; the log of each layer's total
     * is added to {@code logZ[0]}. False when a layer exceeds {@code maxStates}.
     */
    private static boolean forwardPass(List<Map<BitSet, Double>> forward, double[] logZ, double[] noneWeight,
                                       double[][] weight, int[][] bit, int[] lastUser, int maxStates) {
        Map<BitSet, Double> start = new HashMap<>();
        start.put(new BitSet(), 1.0);
        forward.add(start);
        for (int t = 0; t < noneWeight.length; t++) {
            Map<BitSet, Double> next = new HashMap<>();
            double total = forwardStep(forward.get(t), next, t, noneWeight[t], weight[t], bit[t], lastUser);
            if (next.size() > maxStates) {
                return false;
            }
            if (total > 0) {
                logZ[0] += Math.log(total);
                divideValues(next, total);
            }
            forward.add(next);
        }
        return true;
    }

    /** The marginals, peak by peak from the last; null when a peak's options have no finite positive sum. */
    private static double[][] backwardPass(List<Map<BitSet, Double>> forward, double[] noneWeight,
                                           double[][] weight, int[][] bit, int[] lastUser) {
        int peaks = noneWeight.length;
        double[][] marginal = new double[peaks][];
        Map<BitSet, Double> after = new HashMap<>();
        after.put(new BitSet(), 1.0);
        for (int t = peaks - 1; t >= 0; t--) {
            double[] m = new double[weight[t].length + 1];
            Map<BitSet, Double> here = new HashMap<>();
            double max = backwardStep(forward.get(t), after, here, m, t, noneWeight[t], weight[t], bit[t], lastUser);
            double z = 0.0;
            for (double v : m) {
                z += v;
            }
            if (!(z > 0) || !Double.isFinite(z) || !(max > 0)) {
                return null;
            }
            for (int k = 0; k < m.length; k++) {
                m[k] /= z;
            }
            marginal[t] = m;
            divideValues(here, max);
            after = here;
        }
        return marginal;
    }

    /** Divides every value of the map by {@code divisor}, in place. */
    private static void divideValues(Map<BitSet, Double> layer, double divisor) {
        for (Map.Entry<BitSet, Double> s : layer.entrySet()) {
            s.setValue(s.getValue() / divisor);
        }
    }

    private static double forwardStep(Map<BitSet, Double> before, Map<BitSet, Double> next, int t, double noneWeight,
                                      double[] weight, int[] bit, int[] lastUser) {
        double total = 0.0;
        for (Map.Entry<BitSet, Double> s : before.entrySet()) {
            BitSet used = s.getKey();
            double f = s.getValue();
            total += accumulate(next, project(used, -1, t + 1, lastUser), f * noneWeight);
            for (int k = 0; k < weight.length; k++) {
                int b = bit[k];
                if (b >= 0 && used.get(b)) {
                    continue;
                }
                total += accumulate(next, project(used, b, t + 1, lastUser), f * weight[k]);
            }
        }
        return total;
    }

    /**
     * One backward step: for every state before peak t, the weight of all completions through each
     * option of peak t ({@code after} holds those from peak t + 1 on); adds the forward-times-backward
     * products to {@code m} (none first, then the options) and puts each state's total into
     * {@code here}; returns the largest total.
     */
    private static double backwardStep(Map<BitSet, Double> before, Map<BitSet, Double> after, Map<BitSet, Double> here,
                                       double[] m, int t, double noneWeight, double[] weight, int[] bit,
                                       int[] lastUser) {
        double max = 0.0;
        for (Map.Entry<BitSet, Double> s : before.entrySet()) {
            BitSet used = s.getKey();
            double f = s.getValue();
            double b0 = noneWeight * after.getOrDefault(project(used, -1, t + 1, lastUser), 0.0);
            double sum = b0;
            m[0] += f * b0;
            for (int k = 0; k < weight.length; k++) {
                int b = bit[k];
                if (b >= 0 && used.get(b)) {
                    continue;
                }
                double bk = weight[k] * after.getOrDefault(project(used, b, t + 1, lastUser), 0.0);
                sum += bk;
                m[k + 1] += f * bk;
            }
            here.put(used, sum);
            max = Math.max(max, sum);
        }
        return max;
    }

    private static double accumulate(Map<BitSet, Double> layer, BitSet state, double value) {
        layer.merge(state, value, Double::sum);
        return value;
    }

    /** {@code used ∪ {add}} without the entries no peak from {@code nextPeak} on can use. */
    private static BitSet project(BitSet used, int add, int nextPeak, int[] lastUser) {
        BitSet s = (BitSet) used.clone();
        if (add >= 0) {
            s.set(add);
        }
        for (int b = s.nextSetBit(0); b >= 0; b = s.nextSetBit(b + 1)) {
            if (lastUser[b] < nextPeak) {
                s.clear(b);
            }
        }
        return s;
    }
}
