package dev.soakfield.fem.model;

import dev.soakfield.law.api.SourceLaw;
import java.util.Objects;

/**
 * A source law in use by one material, with where it came from for messages.
 *
 * @param id the law's id as the case names it
 * @param origin "built in" or the jar it was loaded from
 * @param law the instance for this material
 */
public record LawUse(String id, String origin, SourceLaw law) {
  public LawUse {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(origin, "origin");
    Objects.requireNonNull(law, "law");
  }
}
