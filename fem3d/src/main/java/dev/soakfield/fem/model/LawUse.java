package dev.soakfield.fem.model;

import dev.soakfield.law.api.SourceLaw;
import java.util.Objects;

/**
 * A source law in use by one material, with where it came from for messages.
 *
 * @param id the law's id as the case names it
 * @param origin "built in" or the jar it was loaded from
 * @param law the instance for this material
 * @param name what the case calls this instance (the outputs' {@code trapped:<part>:<name>})
 * @param reversible whether what it traps counts as diffusible
 */
public record LawUse(String id, String origin, SourceLaw law, String name, boolean reversible) {
  public LawUse {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(origin, "origin");
    Objects.requireNonNull(law, "law");
    Objects.requireNonNull(name, "name");
  }

  /** An instance named by its id, reversible. */
  public LawUse(String id, String origin, SourceLaw law) {
    this(id, origin, law, id, true);
  }
}
