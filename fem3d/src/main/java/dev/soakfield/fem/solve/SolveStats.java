package dev.soakfield.fem.solve;

/**
 * What one linear solve did.
 *
 * @param iterations CG iterations taken
 * @param residualNorm final residual norm ‖b − A x‖ (as tracked by CG)
 * @param rhsNorm ‖b‖
 * @param converged whether ‖r‖ ≤ rtol·‖b‖ was reached
 * @param setupSeconds time spent building the preconditioner for the current matrix
 * @param solveSeconds time spent in this solve
 */
public record SolveStats(
    int iterations,
    double residualNorm,
    double rhsNorm,
    boolean converged,
    double setupSeconds,
    double solveSeconds) {

  /** ‖r‖/‖b‖, or 0 when b = 0. */
  public double relativeResidual() {
    return rhsNorm > 0 ? residualNorm / rhsNorm : 0.0;
  }
}
