package dev.soakfield.fem.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class NameSuggestionTest {
  @Test
  void levenshteinDistanceOfKnownPairs() {
    // V. I. Levenshtein's edit distance; "kitten"/"sitting" = 3 is the textbook example (from
    // memory); the others are counted by hand
    assertEquals(3, NameSuggestion.distance("kitten", "sitting"));
    assertEquals(1, NameSuggestion.distance("vaue", "value")); // one insertion
    assertEquals(2, NameSuggestion.distance("xmni", "xmin")); // two substitutions
    assertEquals(4, NameSuggestion.distance("", "zmax"));
    assertEquals(0, NameSuggestion.distance("ymin", "ymin"));
  }

  @Test
  void closestPicksTheSmallestDistanceAndLikelyRejectsFarNames() {
    List<String> groups = List.of("xmin", "xmax", "ymin", "ymax", "zmin", "zmax");
    assertEquals(Optional.of("xmin"), NameSuggestion.closest("xmni", groups));
    assertEquals(Optional.of("ymax"), NameSuggestion.closest("YMAX", groups));
    assertEquals(Optional.empty(), NameSuggestion.closest("a", List.of()));
    assertEquals(Optional.of("value"), NameSuggestion.likely("vaue", List.of("kind", "value")));
    assertEquals(Optional.empty(), NameSuggestion.likely("colour", List.of("kind", "value")));
  }
}
