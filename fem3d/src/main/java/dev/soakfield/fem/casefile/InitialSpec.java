package dev.soakfield.fem.casefile;

import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The initial concentration: one value everywhere, or one per volume group.
 *
 * @param uniform the value everywhere, when the case gives a single number
 * @param perGroup values by volume group name, when the case gives an object (empty otherwise)
 */
public record InitialSpec(OptionalDouble uniform, Map<String, Double> perGroup) {
  public InitialSpec {
    Objects.requireNonNull(uniform, "uniform");
    perGroup = Map.copyOf(perGroup);
    if (uniform.isPresent() == !perGroup.isEmpty()) {
      throw new IllegalArgumentException("give either a uniform value or values per group");
    }
  }

  public static InitialSpec uniform(double value) {
    return new InitialSpec(OptionalDouble.of(value), Map.of());
  }

  /** The initial concentration in {@code volumeGroup}. */
  public double valueFor(String volumeGroup) {
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
