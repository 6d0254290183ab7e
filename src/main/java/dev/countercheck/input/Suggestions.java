package dev.countercheck.input;

import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** "Did you mean ...?": the known word nearest to a misspelt one, by Levenshtein distance. */
public final class Suggestions {

    private Suggestions() {
    }

    /**
     * The candidate nearest to {@code word} among the plausible ones: those at most 2 edits away
     * (a third of the candidate's length for longer words), and those {@code word} abbreviates
     * ({@code as_req} for {@code as_required}). Empty when none is plausible, or when several are
     * equally near ({@code XC5} is as near to XC1 as to XC4): a guess would then mislead.
     */
    public static Optional<String> nearest(String word, Collection<String> candidates) {
        List<String> plausible = candidates.stream()
                .filter(c -> distance(word, c) <= Math.max(2, c.length() / 3)
                        || (word.length() >= 2 && c.toLowerCase(Locale.ROOT).startsWith(word.toLowerCase(Locale.ROOT))))
                .sorted(Comparator.comparingInt((String c) -> distance(word, c)))
                .toList();
        boolean tie = plausible.size() > 1 && distance(word, plausible.get(0)) == distance(word, plausible.get(1));
        return plausible.isEmpty() || tie ? Optional.empty() : Optional.of(plausible.get(0));
    }

    /** "; did you mean 'x'?" or "; expected one of: a, b, c". */
    public static String hint(String word, Collection<String> candidates) {
        return nearest(word, candidates)
                .map(c -> "; did you mean '" + c + "'?")
                .orElse("; expected one of: " + String.join(", ", candidates));
    }

    /** Levenshtein distance, case-insensitive (so that a wrong capital is one small slip, not a new word). */
    public static int distance(String a, String b) {
        String s = a.toLowerCase(Locale.ROOT);
        String t = b.toLowerCase(Locale.ROOT);
        int[] previous = new int[t.length() + 1];
        int[] current = new int[t.length() + 1];
        for (int j = 0; j <= t.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= s.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= t.length(); j++) {
                int substitution = previous[j - 1] + (s.charAt(i - 1) == t.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j], current[j - 1]) + 1);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[t.length()];
    }
}
