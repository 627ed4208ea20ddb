package dev.soakfield.law.api;

/** Checked parameter values of one law instance, in the SI units their declarations name. */
public interface LawParameters {
  /**
   * The value of a declared parameter.
   *
   * @throws IllegalArgumentException when the law did not declare {@code name}
   */
  double get(String name);
}
