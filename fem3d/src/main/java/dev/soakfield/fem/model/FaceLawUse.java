package dev.soakfield.fem.model;

import dev.soakfield.law.api.FaceLaw;
import java.util.Objects;

/**
 * A face law in use on one face group, with where it came from for messages.
 *
 * @param id the law's id as the case names it
 * @param origin the provider's class and where it was loaded from
 * @param law the instance for this face group
 */
public record FaceLawUse(String id, String origin, FaceLaw law) {
  public FaceLawUse {
    Objects.requireNonNull(id, "id");
    Objects.requireNonNull(origin, "origin");
    Objects.requireNonNull(law, "law");
  }
}
