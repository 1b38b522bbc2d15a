package io.github.atomledger.checker;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * Suggests the known name nearest to a misspelt one ("did you mean ..."), by edit distance
 * (Levenshtein: insertions, deletions and substitutions, case ignored). A name is suggested only
 * when it is close enough to be a plausible typo: at most a third of the letters after the prefix
 * both names share ({@code atomledger.}, {@code balance.}), and at least two edits are always
 * allowed. Ties go to the first in the collection's order, so a
 * sorted collection gives a stable answer. Thread-safe.
 */
public final class NearestName {

    private NearestName() {
    }

    /** The nearest known name, or empty when none is close. */
    public static Optional<String> of(String typed, Collection<String> known) {
        String t = typed.strip().toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(t, k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        if (best == null) {
            return Optional.empty();
        }
        String b = best.toLowerCase(Locale.ROOT);
        int common = 0;
        while (common < Math.min(t.length(), b.length()) && t.charAt(common) == b.charAt(common)) {
            common++;
        }
        int allowed = Math.max(2, (Math.max(t.length(), b.length()) - common) / 3);
        return bestDistance <= allowed ? Optional.of(best) : Optional.empty();
    }

    /** "; did you mean 'x'?" or "" when nothing is close. */
    public static String hint(String typed, Collection<String> known) {
        return of(typed, known).map(k -> "; did you mean '" + k + "'?").orElse("");
    }

    /**
     * The end of a sentence about {@code typed}: the hint, or "." when nothing is close, so that
     * another sentence may follow ("unknown rule id 'x'" + this + " Known rule ids: ...").
     */
    public static String sentence(String typed, Collection<String> known) {
        String h = hint(typed, known);
        return h.isEmpty() ? "." : h;
    }

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
