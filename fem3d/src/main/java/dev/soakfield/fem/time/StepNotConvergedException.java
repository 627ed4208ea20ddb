package dev.soakfield.fem.time;

import java.util.Locale;

/**
 * Newton's method did not converge within a step; the run retries the step shorter and fails with a
 * clear message only when the step cannot shrink further.
 */
public final class StepNotConvergedException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public StepNotConvergedException(double t0, double dt, int iterations, double residual) {
    super(
        String.format(
            Locale.ROOT,
            "Newton's method did not converge in %d iterations in the step from t = %.6g s (dt ="
                + " %.3g s); relative residual %.2e",
            iterations,
            t0,
            dt,
            residual));
  }
}
