package org.nullpath.units;

import java.util.Collection;

/** Edit distances for did-you-mean hints. */
public final class Spelling {
    private Spelling() {
    }

    /** Levenshtein distance between two strings. */
    public static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    /** The candidate closest to {@code word} if it is within a third of the word's length (at least 2), else null. */
    public static String closest(String word, Collection<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = distance(word, c);
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        int limit = Math.max(2, word.length() / 3);
        return bestDistance <= limit ? best : null;
    }
}
