package org.kinduct.scene.io;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/** "Did you mean ...?" for misspelt names: the nearest known name by edit distance. */
public final class Suggestions {

    private Suggestions() {
    }

    /**
     * The known name closest to {@code given}, ignoring case, if it is within a third of the
     * name's length (at least 1) of edits: "vertexes" finds "vertices", "colour" finds nothing.
     */
    public static Optional<String> closest(String given, Collection<String> known) {
        String g = given.toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(g, k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return best != null && bestDistance <= Math.max(1, best.length() / 3) ? Optional.of(best) : Optional.empty();
    }

    /**
     * Up to {@code max} known names nearest to {@code given} by {@link #distance}, nearest first,
     * each within the distance {@link #closest} allows (ties in the order of {@code known}).
     */
    public static java.util.List<String> nearest(String given, Collection<String> known, int max) {
        String g = given.toLowerCase(Locale.ROOT);
        return known.stream()
                .filter(k -> distance(g, k.toLowerCase(Locale.ROOT)) <= Math.max(1, k.length() / 3))
                .sorted(java.util.Comparator.comparingInt(k -> distance(g, k.toLowerCase(Locale.ROOT))))
                .limit(max).toList();
    }

    /** " (did you mean 'x'?)" or nothing. */
    static String hint(String given, Collection<String> known) {
        return closest(given, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
    }

    /**
     * Optimal string alignment distance: insertions, deletions, substitutions and swaps of two
     * neighbouring characters each cost 1 (Damerau 1964, restricted so no substring is edited twice).
     */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(d[i - 1][j - 1] + cost, Math.min(d[i - 1][j], d[i][j - 1]) + 1);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }
}
