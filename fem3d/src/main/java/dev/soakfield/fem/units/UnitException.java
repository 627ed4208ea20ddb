package dev.soakfield.fem.units;

/**
 * A value whose unit is unknown or of the wrong dimension: what was found and what was expected.
 */
public final class UnitException extends Exception {
  private static final long serialVersionUID = 1L;
  private final String found;
  private final String expected;

  public UnitException(String found, String expected) {
    super("found " + found + ", expected " + expected);
    this.found = found;
    this.expected = expected;
  }

  public String found() {
    return found;
  }

  public String expected() {
    return expected;
  }
}
