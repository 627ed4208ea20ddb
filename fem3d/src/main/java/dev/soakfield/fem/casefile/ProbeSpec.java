package dev.soakfield.fem.casefile;

import java.util.Objects;
import java.util.Optional;

/**
 * A named point where the concentration is recorded over time; coordinates in metres.
 *
 * @param part the part whose side the probe reads, for a point where parts meet (c jumps there when
 *     the solubilities differ); empty for a point inside one part
 */
public record ProbeSpec(String name, double x, double y, double z, Optional<String> part) {
  public ProbeSpec {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(part, "part");
  }

  /** A probe that names no part. */
  public ProbeSpec(String name, double x, double y, double z) {
    this(name, x, y, z, Optional.empty());
  }
}
