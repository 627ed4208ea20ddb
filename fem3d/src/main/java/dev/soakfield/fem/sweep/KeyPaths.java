package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.casefile.NameSuggestion;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Key paths into a case file's JSON tree, such as {@code materials.body.diffusivity} or {@code
 * faces.xmax.value.1.1} (a number indexes a list): found, and set to a new value. A sweep varies
 * only keys the base case already has, so a misspelt key is refused instead of added.
 */
final class KeyPaths {
  private KeyPaths() {}

  static List<String> segments(String path) {
    return List.of(path.split("\\.", -1));
  }

  /**
   * Why {@code path} names no value of {@code root}, in words (the part that is missing and what is
   * there instead); empty when it names one.
   */
  static Optional<String> problem(JsonNode root, String path) {
    JsonNode at = root;
    String walked = "";
    for (String key : segments(path)) {
      if (key.isEmpty()) {
        return Optional.of("an empty key between dots");
      }
      String here = walked.isEmpty() ? "the top level" : "'" + walked + "'";
      if (at instanceof ObjectNode obj) {
        if (!obj.has(key)) {
          List<String> names = new ArrayList<>();
          obj.fieldNames().forEachRemaining(names::add);
          String near =
              NameSuggestion.likely(key, names).map(n -> "; did you mean '" + n + "'?").orElse("");
          return Optional.of(
              "found no key '" + key + "' at " + here + " (it holds " + list(names) + ")" + near);
        }
        at = obj.get(key);
      } else if (at instanceof ArrayNode arr) {
        int index = index(key);
        if (index < 0 || index >= arr.size()) {
          return Optional.of(
              "found '"
                  + key
                  + "' for the list at "
                  + here
                  + ", expected an index 0 to "
                  + (arr.size() - 1));
        }
        at = arr.get(index);
      } else {
        return Optional.of(
            "found a single value at " + here + ", which has no key '" + key + "' inside it");
      }
      walked = walked.isEmpty() ? key : walked + "." + key;
    }
    return Optional.empty();
  }

  /** Replaces the value at {@code path} (which must exist, see {@link #problem}). */
  static void set(JsonNode root, String path, JsonNode value) {
    List<String> keys = segments(path);
    JsonNode at = root;
    for (int i = 0; i < keys.size() - 1; i++) {
      at = at.isArray() ? at.get(index(keys.get(i))) : at.get(keys.get(i));
    }
    String last = keys.get(keys.size() - 1);
    if (at instanceof ArrayNode arr) {
      arr.set(index(last), value);
    } else {
      ((ObjectNode) at).set(last, value);
    }
  }

  private static int index(String key) {
    if (key.isEmpty() || key.length() > 9 || !key.chars().allMatch(Character::isDigit)) {
      return -1;
    }
    return Integer.parseInt(key);
  }

  private static String list(List<String> names) {
    return names.isEmpty() ? "nothing" : String.join(", ", names);
  }
}
