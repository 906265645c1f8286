package org.mobident.library.standards;

import java.util.Arrays;

/**
 * Optimal one-to-one partial matching of two sorted lists of numbers on a line.
 *
 * <p>Matching item i of the left list to item j of the right list costs c(i, j) ≥ 0 (or is
 * forbidden: {@code Double.POSITIVE_INFINITY}); leaving an item unmatched costs {@code gapCost}.
 * For points on a line and a cost convex in their distance an optimal matching never crosses
 * (Karp &amp; Li, Discrete Math. 13 (1975) 129, from memory), so the best matching is found by the
 * alignment recursion of Needleman &amp; Wunsch (J. Mol. Biol. 48 (1970) 443) in O(m·n):
 * D[i][j] = min(D[i−1][j] + gap, D[i][j−1] + gap, D[i−1][j−1] + c(i, j)).
 * Ties are broken towards matching, then towards skipping the left item, so results are
 * deterministic.
 */
final class MonotoneMatcher {

    /** Cost of matching left item i to right item j; infinite when forbidden. */
    @FunctionalInterface
    interface Cost {
        double of(int left, int right);
    }

    private static final byte MATCH = 0;
    private static final byte SKIP_LEFT = 1;
    private static final byte SKIP_RIGHT = 2;

    private MonotoneMatcher() {
    }

    /**
     * @param leftCount  number of left items (in their sorted order)
     * @param rightCount number of right items (in their sorted order)
     * @param cost       matching cost
     * @param gapCost    cost of leaving one item unmatched, &gt; 0
     * @return for each left item, the index of its right partner, or −1 when unmatched
     */
    static int[] match(int leftCount, int rightCount, Cost cost, double gapCost) {
        double[][] d = new double[leftCount + 1][rightCount + 1];
        byte[][] step = new byte[leftCount + 1][rightCount + 1];
        for (int i = 1; i <= leftCount; i++) {
            d[i][0] = i * gapCost;
            step[i][0] = SKIP_LEFT;
        }
        for (int j = 1; j <= rightCount; j++) {
            d[0][j] = j * gapCost;
            step[0][j] = SKIP_RIGHT;
        }
        for (int i = 1; i <= leftCount; i++) {
            for (int j = 1; j <= rightCount; j++) {
                double best = d[i - 1][j] + gapCost;
                byte how = SKIP_LEFT;
                if (d[i][j - 1] + gapCost < best) {
                    best = d[i][j - 1] + gapCost;
                    how = SKIP_RIGHT;
                }
                double c = cost.of(i - 1, j - 1);
                if (c < Double.POSITIVE_INFINITY && d[i - 1][j - 1] + c <= best) {
                    best = d[i - 1][j - 1] + c;
                    how = MATCH;
                }
                d[i][j] = best;
                step[i][j] = how;
            }
        }
        int[] partner = new int[leftCount];
        Arrays.fill(partner, -1);
        int i = leftCount;
        int j = rightCount;
        while (i > 0 && j > 0) {
            if (step[i][j] == MATCH) {
                partner[i - 1] = j - 1;
                i--;
                j--;
            } else if (step[i][j] == SKIP_LEFT) {
                i--;
            } else {
                j--;
            }
        }
        return partner;
    }
}
