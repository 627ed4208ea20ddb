package dev.soakfield.fem.solve;

import java.util.Locale;

/**
 * Thrown when a solve does not converge within its iteration limit or breaks down (NaN). The
 * message gives the iterations, the residual reached relative to ‖b‖, the target, and what to try.
 */
public final class SolverStalledException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final transient SolveStats stats;

  SolverStalledException(
      SolveStats stats, double relativeTolerance, PreconditionerKind kind, boolean breakdown) {
    super(message(stats, relativeTolerance, kind, breakdown));
    this.stats = stats;
  }

  public SolveStats stats() {
    return stats;
  }

  private static String message(
      SolveStats s, double rtol, PreconditionerKind kind, boolean breakdown) {
    String what =
        breakdown ? "broke down (the residual became NaN or infinite)" : "did not converge";
    return String.format(
        Locale.ROOT,
        "linear solve (CG with %s preconditioner) %s after %d iterations: residual/|b| = %.3e,"
            + " target %.1e. Try smaller time steps, check that the matrix is symmetric positive"
            + " definite (every region needs capacity or a fixed boundary), or allow more"
            + " iterations.",
        kind.name().toLowerCase(Locale.ROOT),
        what,
        s.iterations(),
        s.relativeResidual(),
        rtol);
  }
}
