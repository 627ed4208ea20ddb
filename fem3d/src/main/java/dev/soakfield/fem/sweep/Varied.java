package dev.soakfield.fem.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;

/** One key a sweep varies: by listed levels (the factorial) or by a sampled distribution. */
public sealed interface Varied {
  /** The key path in the case file, e.g. {@code materials.body.diffusivity}. */
  String key();

  /** Levels crossed with every other key's levels: listed values or an evenly spaced range. */
  record Levels(String key, List<JsonNode> values) implements Varied {
    public Levels {
      values = List.copyOf(values);
    }
  }

  /** A value drawn {@code samples} times from a distribution. */
  record Sampled(String key, Distribution distribution) implements Varied {}
}
