package org.mobident.io;

import java.util.Collection;
import java.util.Locale;

/** "Did you mean …" for misspelt column names, by edit distance (Levenshtein, 1966). */
public final class Suggestions {

    /** Names further than this many edits (or a quarter of their length) are not suggested. */
    static final int MAX_EDITS = 2;

    private Suggestions() {
    }

    /**
     * A hint naming the known name closest to {@code given}, such as {@code " (did you mean
     * 'voltage_kv'?)"}, or an empty string when none is close.
     */
    public static String didYouMean(String given, Collection<String> known) {
        String g = given.strip().toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(g, k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = k;
            }
        }
        int allowed = Math.max(MAX_EDITS, g.length() / 4);
        return best != null && bestDistance > 0 && bestDistance <= allowed ? " (did you mean '" + best + "'?)" : "";
    }

    /** Levenshtein edit distance: insertions, deletions and substitutions, one each. */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
