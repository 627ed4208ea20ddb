package dev.soakfield.cli;

import dev.soakfield.fem.units.SiValue;
import dev.soakfield.fem.units.UnitException;

/** Command-line values with units ("125 degC", "1000 h"), converted to SI with clear errors. */
final class OptionValues {
  private OptionValues() {}

  /**
   * Parses an option's value.
   *
   * @throws UserInputException naming the option, what was found and what was expected
   */
  static double si(String text, String siUnit, String option) {
    try {
      return SiValue.parse(text, siUnit);
    } catch (UnitException e) {
      throw new UserInputException(
          option + ": found '" + text + "', expected " + e.expected() + " (SI: " + siUnit + ")");
    }
  }
}
