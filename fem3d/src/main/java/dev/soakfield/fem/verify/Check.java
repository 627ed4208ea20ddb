package dev.soakfield.fem.verify;

/**
 * One verification figure: a computed value held against a published or exact reference.
 *
 * @param caseName what was run
 * @param source where the reference value comes from
 * @param reference the reference value, or the bound for {@link Mode#AT_MOST}/{@link Mode#AT_LEAST}
 * @param computed what Soakfield computed
 * @param tolerance the allowed error for {@link Mode#NEAR}; relative to the reference when {@code
 *     relative}
 * @param relative whether the tolerance is relative
 * @param mode how computed is held against reference
 */
public record Check(
    String caseName,
    String source,
    double reference,
    double computed,
    double tolerance,
    boolean relative,
    Mode mode) {
  /** How a check passes. */
  public enum Mode {
    /** computed within tolerance of reference */
    NEAR,
    /** computed at most reference */
    AT_MOST,
    /** computed at least reference */
    AT_LEAST,
    /**
     * an observed order of convergence (computed) within tolerance of the expected one (reference),
     * bounded above and below
     */
    ORDER
  }

  /** A check that computed lies within tolerance of reference. */
  public Check(
      String caseName,
      String source,
      double reference,
      double computed,
      double tolerance,
      boolean relative) {
    this(caseName, source, reference, computed, tolerance, relative, Mode.NEAR);
  }

  /** The error: relative to the reference, or absolute; for bounds, how far past it (or 0). */
  public double error() {
    return switch (mode) {
      case NEAR -> {
        double e = Math.abs(computed - reference);
        yield relative ? e / Math.abs(reference) : e;
      }
      case ORDER -> Math.abs(computed - reference);
      case AT_MOST -> Math.max(0, computed - reference);
      case AT_LEAST -> Math.max(0, reference - computed);
    };
  }

  public boolean passed() {
    return switch (mode) {
      case NEAR, ORDER -> error() <= tolerance;
      case AT_MOST -> computed <= reference;
      case AT_LEAST -> computed >= reference;
    };
  }

  /**
   * An observed order of convergence held against the expected one: it passes within expected ±
   * band, so an order too high (a reference that is not what it seems, a norm computed wrongly)
   * fails as well as one too low.
   */
  public static Check order(
      String caseName, String source, double expected, double observed, double band) {
    return new Check(caseName, source, expected, observed, band, false, Mode.ORDER);
  }

  /** A check that the computed value is at most the bound. */
  public static Check atMost(String caseName, String source, double bound, double computed) {
    return new Check(caseName, source, bound, computed, 0, false, Mode.AT_MOST);
  }

  /** A check that the computed value is at least the bound. */
  public static Check atLeast(String caseName, String source, double bound, double computed) {
    return new Check(caseName, source, bound, computed, 0, false, Mode.AT_LEAST);
  }
}
