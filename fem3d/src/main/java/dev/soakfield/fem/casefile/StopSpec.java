package dev.soakfield.fem.casefile;

import java.util.Objects;

/**
 * A condition that ends a run early: a volume group's maximum concentration, or a probe's value,
 * crosses a level.
 *
 * @param target "group" or "probe"
 * @param name the volume group or probe name
 * @param below true: stop when the value falls below the level; false: when it rises above it
 * @param level the concentration level
 */
public record StopSpec(String target, String name, boolean below, double level) {
  public StopSpec {
    Objects.requireNonNull(target, "target");
    Objects.requireNonNull(name, "name");
    if (!target.equals("group") && !target.equals("probe")) {
      throw new IllegalArgumentException("target must be group or probe, got " + target);
    }
  }

  /** Whether a value meets the condition. */
  public boolean met(double value) {
    return below ? value < level : value > level;
  }

  /** As users read it: "max of body below 0.05". */
  public String describe() {
    return (target.equals("group") ? "maximum in '" + name + "'" : "probe '" + name + "'")
        + (below ? " below " : " above ")
        + CaseFields.plain(level);
  }
}
