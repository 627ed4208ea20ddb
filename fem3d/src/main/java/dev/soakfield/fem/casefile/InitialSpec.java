package dev.soakfield.fem.casefile;

import java.nio.file.Path;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The initial concentration: one value everywhere, or one per volume group.
 *
 * @param uniform the value everywhere, when the case gives a single number
 * @param perGroup values by volume group name, when the case gives an object (empty otherwise)
 */
public record InitialSpec(
    OptionalDouble uniform, Map<String, Double> perGroup, Optional<Path> from) {
  public InitialSpec {
    Objects.requireNonNull(uniform, "uniform");
    perGroup = Map.copyOf(perGroup);
    Objects.requireNonNull(from, "from");
    int given =
        (uniform.isPresent() ? 1 : 0) + (perGroup.isEmpty() ? 0 : 1) + (from.isPresent() ? 1 : 0);
    if (given != 1) {
      throw new IllegalArgumentException(
          "give one of a uniform value, values per group, or an earlier run's results");
    }
  }

  /** Uniform or per-group values. */
  public InitialSpec(OptionalDouble uniform, Map<String, Double> perGroup) {
    this(uniform, perGroup, Optional.empty());
  }

  /** The final state of an earlier run (its result folder), on the same mesh. */
  public static InitialSpec fromResults(Path folder) {
    return new InitialSpec(OptionalDouble.empty(), Map.of(), Optional.of(folder));
  }

  public static InitialSpec uniform(double value) {
    return new InitialSpec(OptionalDouble.of(value), Map.of());
  }

  /** The initial concentration in {@code volumeGroup}. */
  public double valueFor(String volumeGroup) {
    if (from.isPresent()) {
      throw new IllegalStateException("the initial state comes from " + from.get());
    }
    if (uniform.isPresent()) {
      return uniform.getAsDouble();
    }
    Double v = perGroup.get(volumeGroup);
    if (v == null) {
      throw new IllegalArgumentException("no initial value for volume group '" + volumeGroup + "'");
    }
    return v;
  }
}
