package dev.soakfield.fem.casefile;

import java.util.Objects;

/** A named point where the concentration is recorded over time; coordinates in metres. */
public record ProbeSpec(String name, double x, double y, double z) {
  public ProbeSpec {
    Objects.requireNonNull(name, "name");
  }
}
