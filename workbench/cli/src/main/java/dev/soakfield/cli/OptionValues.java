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

  /**
   * Parses a value that must be positive and finite, e.g. a thickness.
   *
   * @throws UserInputException naming the option, what was found and what was expected
   */
  static double positive(String option, String text, String siUnit) {
    double v;
    try {
      v = SiValue.parse(text, siUnit);
    } catch (UnitException e) {
      throw new UserInputException(option + ": found " + e.found() + ", expected " + e.expected());
    }
    if (!(v > 0) || Double.isInfinite(v)) {
      throw new UserInputException(
          option + ": found '" + text + "', expected a positive value in " + siUnit);
    }
    return v;
  }
}
