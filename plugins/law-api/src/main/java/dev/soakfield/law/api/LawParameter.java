package dev.soakfield.law.api;

import java.util.Objects;

/**
 * One declared parameter of a source law.
 *
 * @param name the key in the case file's {@code source} object
 * @param unit its SI unit as users write it ("1/s", "J/mol", "mol/m^3", "1" for a pure number);
 *     values given with another unit of the same dimension are converted to it; "amount" stands for
 *     the case's own amount unit, the one of c in amount/m^3 ("amount/m^3" for a site density,
 *     "m^3/(amount*s)" for a capture rate constant), and such values are taken as plain numbers
 * @param description one phrase for listings
 * @param defaultValue the value when the case omits the key; {@code NaN} when the key is required
 * @param minimum smallest accepted value (inclusive)
 * @param maximum largest accepted value (inclusive)
 */
public record LawParameter(
    String name,
    String unit,
    String description,
    double defaultValue,
    double minimum,
    double maximum) {
  public LawParameter {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(unit, "unit");
    Objects.requireNonNull(description, "description");
    if (!(minimum <= maximum)) {
      throw new IllegalArgumentException(name + ": minimum " + minimum + " > maximum " + maximum);
    }
  }

  /** A required parameter with a range. */
  public static LawParameter required(
      String name, String unit, String description, double minimum, double maximum) {
    return new LawParameter(name, unit, description, Double.NaN, minimum, maximum);
  }

  /** An optional parameter with a default and a range. */
  public static LawParameter optional(
      String name,
      String unit,
      String description,
      double defaultValue,
      double minimum,
      double maximum) {
    return new LawParameter(name, unit, description, defaultValue, minimum, maximum);
  }

  public boolean isRequired() {
    return Double.isNaN(defaultValue);
  }
}
