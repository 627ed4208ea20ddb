package dev.soakfield.app.fit;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.soakfield.fem.fit.Estimate;
import java.util.OptionalDouble;

/** How the fits' JSON output writes estimates and values that may be missing. */
final class FitJson {
  private FitJson() {}

  static ObjectNode tree() {
    return new ObjectMapper().createObjectNode();
  }

  static void put(ObjectNode node, Estimate e) {
    node.put("value", e.value());
    node.put("low", e.low());
    node.put("high", e.high());
    // what a sweep's "from-fit" takes as the sd of a normal distribution
    node.put("standardError", e.standardError());
  }

  static void putOptional(ObjectNode tree, String key, OptionalDouble v) {
    if (v.isPresent()) {
      tree.put(key, v.getAsDouble());
    } else {
      tree.putNull(key);
    }
  }
}
