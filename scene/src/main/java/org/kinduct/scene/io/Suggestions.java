package org.kinduct.scene.io;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/** "Did you mean ...?" for misspelt names: the nearest known name by edit distance. */
final class Suggestions {

    private Suggestions() {
    }

    /**
     * The known name closest to {@code given}, ignoring case, if it is within a third of the
     * name's length (at least 1) of edits: "vertexes" finds "vertices", "colour" finds nothing.
     */
    static Optional<String> closest(String given, Collection<String> known) {
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

    /** " (did you mean 'x'?)" or nothing. */
    static String hint(String given, Collection<String> known) {
        return closest(given, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
    }

    /** Levenshtein distance (insertions, deletions and substitutions each cost 1), two-row form. */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitute = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitute, Math.min(previous[j], current[j - 1]) + 1);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
