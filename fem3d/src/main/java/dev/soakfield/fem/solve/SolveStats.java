package dev.soakfield.fem.solve;

/**
 * What one linear solve did.
 *
 * @param iterations CG iterations taken
 * @param residualNorm final residual norm ‖D⁻¹(b − A x)‖ (as tracked by CG; D the diagonal)
 * @param rhsNorm ‖D⁻¹b‖
 * @param converged whether ‖D⁻¹r‖ ≤ rtol·‖D⁻¹b‖ was reached
 * @param setupSeconds time spent building the preconditioner for the current matrix
 * @param solveSeconds time spent in this solve
 * @param residualSum Σ r_i of the final residual b − A x, as tracked by CG (0 when b = 0)
 */
public record SolveStats(
    int iterations,
    double residualNorm,
    double rhsNorm,
    boolean converged,
    double setupSeconds,
    double solveSeconds,
    double residualSum) {

  /** ‖D⁻¹r‖/‖D⁻¹b‖, or 0 when b = 0. */
  public double relativeResidual() {
    return rhsNorm > 0 ? residualNorm / rhsNorm : 0.0;
  }
}
