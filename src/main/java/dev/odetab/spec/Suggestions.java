package dev.odetab.spec;

import java.util.Collection;
import java.util.Optional;

/** "Did you mean …?": the nearest name by edit distance, when it is near enough to help. */
public final class Suggestions {
    private Suggestions() {
    }

    public static Optional<String> nearest(String given, Collection<String> known) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(given, k);
            if (d < bestDistance || (d == bestDistance && best != null && k.compareTo(best) < 0)) {
                best = k;
                bestDistance = d;
            }
        }
        if (best == null || bestDistance > Math.max(2, given.length() / 3)) {
            return Optional.empty();
        }
        return Optional.of(best);
    }

    /** Levenshtein distance. */
    static int distance(String a, String b) {
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

    /** " (did you mean 'x'?)" or "". */
    public static String hint(String given, Collection<String> known) {
        return nearest(given, known).map(s -> "; did you mean '" + s + "'?").orElse("");
    }
}
