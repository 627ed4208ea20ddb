package dev.soakfield.fem.casefile;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/** The closest name to a misspelt one, by Levenshtein edit distance (case-insensitive). */
public final class NameSuggestion {
  private NameSuggestion() {}

  /** The candidate with the smallest edit distance; empty when there are no candidates. */
  public static Optional<String> closest(String name, Collection<String> candidates) {
    String best = null;
    int bestDistance = Integer.MAX_VALUE;
    for (String c : candidates) {
      int d = distance(name.toLowerCase(Locale.ROOT), c.toLowerCase(Locale.ROOT));
      if (d < bestDistance) {
        bestDistance = d;
        best = c;
      }
    }
    return Optional.ofNullable(best);
  }

  /**
   * The closest candidate when it is close enough to be a likely typo: at most a third of the
   * longer name's letters differ, and never more than 3 (common practice for "did you mean").
   */
  public static Optional<String> likely(String name, Collection<String> candidates) {
    return closest(name, candidates)
        .filter(
            c -> {
              int d = distance(name.toLowerCase(Locale.ROOT), c.toLowerCase(Locale.ROOT));
              return d <= Math.min(3, Math.max(1, Math.max(name.length(), c.length()) / 3));
            });
  }

  /** Levenshtein distance: fewest single-character insertions, deletions and substitutions. */
  public static int distance(String a, String b) {
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
