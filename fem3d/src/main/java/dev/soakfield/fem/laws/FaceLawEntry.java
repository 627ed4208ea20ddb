package dev.soakfield.fem.laws;

import dev.soakfield.law.api.FaceLawProvider;
import java.util.Objects;

/**
 * One face law of the catalog: its provider and where it came from.
 *
 * @param provider the loaded provider
 * @param origin the class path or the plugin jar that holds it
 */
public record FaceLawEntry(FaceLawProvider provider, LawOrigin origin) {
  public FaceLawEntry {
    Objects.requireNonNull(provider, "provider");
    Objects.requireNonNull(origin, "origin");
  }

  /** The law's id, as a case names it. */
  public String id() {
    return provider.id();
  }

  /** The provider's class name and origin, for messages. */
  public String describe() {
    return provider.getClass().getName() + " in " + origin.describe();
  }
}
