package dev.soakfield.fem.verify;

/**
 * One verification figure: a computed value held against a published or exact reference.
 *
 * @param caseName what was run
 * @param source where the reference value comes from
 * @param reference the reference value
 * @param computed what Soakfield computed
 * @param tolerance the allowed error; relative to the reference when {@code relative}
 * @param relative whether the tolerance is relative
 */
public record Check(
    String caseName,
    String source,
    double reference,
    double computed,
    double tolerance,
    boolean relative) {
  /** The error: relative to the reference, or absolute. */
  public double error() {
    double e = Math.abs(computed - reference);
    return relative ? e / Math.abs(reference) : e;
  }

  public boolean passed() {
    return error() <= tolerance;
  }

  /** A check that the computed value is at most the bound (reference = the bound). */
  public static Check atMost(String caseName, String source, double bound, double computed) {
    return new Check(caseName, source, 0.0, Math.max(computed, 0.0), bound, false);
  }
}
