package dev.soakfield.fem.fit;

/**
 * A fitted value with its standard error and its two-sided 95 % confidence interval [low, high]
 * (the interval need not be symmetric, e.g. for a value fitted as a logarithm).
 */
public record Estimate(double value, double standardError, double low, double high) {
  /** A value with the symmetric interval value ± halfWidth. */
  public static Estimate symmetric(double value, double standardError, double halfWidth) {
    return new Estimate(value, standardError, value - halfWidth, value + halfWidth);
  }

  /** This estimate multiplied by a positive constant. */
  public Estimate scaled(double factor) {
    if (!(factor > 0)) {
      throw new IllegalArgumentException("scale factor must be > 0, found " + factor);
    }
    return new Estimate(value * factor, standardError * factor, low * factor, high * factor);
  }

  /** Whether {@code x} lies inside the interval. */
  public boolean covers(double x) {
    return x >= low && x <= high;
  }
}
