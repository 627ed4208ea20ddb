package dev.soakfield.fem.units;

/**
 * Values with units as users write them in case files and on the command line, converted to SI.
 * Placeholder contract: plain numbers only; the units issue replaces the body with a units library.
 */
public final class SiValue {
  private SiValue() {}

  /**
   * Parses "2.5e-12 m^2/s", "168 h", "85 degC", "10 MPa" or a plain number (taken as already in
   * {@code siUnit}) into a value in {@code siUnit}.
   *
   * @param siUnit the SI unit wanted, as users write it ("m^2/s", "s", "K", "Pa", "J/mol", "1")
   * @throws UnitException when the text is not a number with a unit, or its unit has another
   *     dimension than {@code siUnit}; the message says what was found and what was expected
   */
  public static double parse(String text, String siUnit) throws UnitException {
    try {
      return Double.parseDouble(text.strip());
    } catch (NumberFormatException e) {
      throw new UnitException("'" + text + "'", "a number in " + siUnit);
    }
  }
}
