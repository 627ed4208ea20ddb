package dev.soakfield.fem.casefile;

import java.util.OptionalDouble;

/** How the time steps are chosen: adaptive to a tolerance, or fixed. */
public sealed interface StepControl {
  /** The tolerance used when a case gives neither {@code tolerance} nor {@code step}. */
  double DEFAULT_TOLERANCE = 1e-3;

  /**
   * Steps sized by an error estimate.
   *
   * @param tolerance positive
   * @param initialStep the first step in seconds, when the case gives one
   * @param maxStep the largest step in seconds, when the case gives one
   */
  record Adaptive(double tolerance, OptionalDouble initialStep, OptionalDouble maxStep)
      implements StepControl {
    public Adaptive {
      if (!(tolerance > 0) || !Double.isFinite(tolerance)) {
        throw new IllegalArgumentException("tolerance must be positive, got " + tolerance);
      }
    }
  }

  /**
   * Steps of one length (shortened where an output time or breakpoint falls inside a step).
   *
   * @param step seconds, positive
   */
  record Fixed(double step) implements StepControl {
    public Fixed {
      if (!(step > 0) || !Double.isFinite(step)) {
        throw new IllegalArgumentException("step must be positive, got " + step);
      }
    }
  }
}
