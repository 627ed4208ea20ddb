package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.util.Arrays;
import java.util.Objects;

/**
 * Preconditioned conjugate gradients for symmetric positive definite {@link CsrMatrix} systems: our
 * own fused, threaded iteration ({@link FusedCg}) with Jacobi or our smoothed-aggregation AMG.
 * MTJ's CG, which ran every vector operation single-threaded, remains the reference the tests and
 * {@code bench solver} hold this one against. Keeps work vectors: use one instance per thread.
 *
 * <p>The stopping rule is ‖D⁻¹(b − A x)‖₂ ≤ rtol·‖D⁻¹ b‖₂ with D the matrix's diagonal: each row's
 * residual is measured as the change of its unknown it stands for, so rows whose scale differs by
 * many orders of magnitude (an exchange face with a large transfer coefficient next to interior
 * nodes) are all solved to the same relative accuracy. With the plain ‖r‖₂ the large rows make up
 * ‖b‖ and the solve stops as soon as they are satisfied, the interior unsolved.
 */
public final class PcgSolver {
  private final double relativeTolerance;
  private final int maxIterations;
  private final PreconditionerKind kind;

  private CsrMatrix matrix;
  private PreconditionerKind active;
  private AmgPreconditioner amg; // null with Jacobi
  private double[] inverseDiagonal = new double[0];
  private final FusedCg cg = new FusedCg();
  private double setupSeconds;

  /**
   * @param relativeTolerance stop at ‖D⁻¹(b − A x)‖ ≤ relativeTolerance·‖D⁻¹b‖; in (0, 1)
   * @param maxIterations iteration limit, at least 1
   * @param kind the preconditioner, or AUTO to decide from each matrix
   */
  public PcgSolver(double relativeTolerance, int maxIterations, PreconditionerKind kind) {
    if (!(relativeTolerance > 0 && relativeTolerance < 1)) {
      throw new IllegalArgumentException(
          "relative tolerance must lie in (0, 1), got " + relativeTolerance);
    }
    if (maxIterations < 1) {
      throw new IllegalArgumentException(
          "iteration limit must be at least 1, got " + maxIterations);
    }
    this.relativeTolerance = relativeTolerance;
    this.maxIterations = maxIterations;
    this.kind = Objects.requireNonNull(kind, "kind");
  }

  /** Declares the matrix for one solve; see {@link #setMatrix(CsrMatrix, int)}. */
  public void setMatrix(CsrMatrix a) {
    setMatrix(a, 1);
  }

  /**
   * Declares the matrix for the following solves (call again when its values change) and builds the
   * preconditioner. With AUTO the choice follows {@link PreconditionerChoice}: the cheaper of
   * Jacobi and AMG in iterations over the {@code expectedSolves} solves that will use this matrix,
   * AMG's set-up included.
   *
   * @throws IllegalArgumentException when a diagonal entry is not positive and finite (the matrix
   *     cannot be positive definite)
   */
  public void setMatrix(CsrMatrix a, int expectedSolves) {
    Objects.requireNonNull(a, "matrix");
    long start = System.nanoTime();
    double[] diagonal = a.diagonal();
    for (int i = 0; i < diagonal.length; i++) {
      if (!(diagonal[i] > 0 && diagonal[i] < Double.POSITIVE_INFINITY)) {
        throw new IllegalArgumentException(
            "row "
                + i
                + " has diagonal entry "
                + diagonal[i]
                + "; a positive definite matrix needs positive finite diagonal entries");
      }
    }
    PreconditionerKind chosen =
        kind == PreconditionerKind.AUTO
            ? PreconditionerChoice.choose(a, diagonal, expectedSolves, relativeTolerance)
            : kind;
    amg = chosen == PreconditionerKind.JACOBI ? null : new AmgPreconditioner(AmgHierarchy.build(a));
    inverseDiagonal = inverse(diagonal);
    matrix = a;
    active = chosen;
    setupSeconds = (System.nanoTime() - start) * 1e-9;
  }

  private static double[] inverse(double[] diagonal) {
    double[] inv = new double[diagonal.length];
    for (int i = 0; i < inv.length; i++) {
      inv[i] = 1.0 / diagonal[i];
    }
    return inv;
  }

  /**
   * Declares a matrix of the same size and pattern for the following solves but keeps the current
   * preconditioner: for a sequence of nearby matrices (Newton iterations) where rebuilding it would
   * cost more than the few iterations a slightly stale one adds.
   */
  public void replaceMatrix(CsrMatrix a) {
    Objects.requireNonNull(a, "matrix");
    requireMatrix();
    if (a.size() != matrix.size()) {
      throw new IllegalArgumentException(
          "matrix of size " + a.size() + " replaces one of size " + matrix.size());
    }
    matrix = a;
    inverseDiagonal = inverse(a.diagonal()); // the stopping norm follows the matrix (and Jacobi)
  }

  /** The preconditioner built for the current matrix (JACOBI or AMG; never AUTO). */
  public PreconditionerKind activePreconditioner() {
    requireMatrix();
    return active;
  }

  /**
   * Solves A x = b; {@code x} holds the starting guess (warm start) and receives the solution.
   * Stops at ‖D⁻¹r‖ ≤ rtol·‖D⁻¹b‖. b = 0 gives x = 0 without iterating. The residual and norm in
   * the returned statistics are in that scaled norm.
   *
   * @throws SolverStalledException when the iteration limit passes without convergence, or on a
   *     breakdown (NaN)
   */
  public SolveStats solve(double[] b, double[] x) {
    requireMatrix();
    Objects.requireNonNull(b, "b");
    Objects.requireNonNull(x, "x");
    int n = matrix.size();
    if (b.length != n || x.length != n) {
      throw new IllegalArgumentException(
          "vectors of length " + b.length + " and " + x.length + " for a matrix of " + n + " rows");
    }
    long start = System.nanoTime();
    double rhsNorm = scaledNorm(b);
    if (!(rhsNorm < Double.POSITIVE_INFINITY)) {
      throw new IllegalArgumentException("right-hand side is not finite (norm " + rhsNorm + ")");
    }
    if (rhsNorm == 0) {
      Arrays.fill(x, 0.0);
      return new SolveStats(
          0, 0.0, 0.0, true, setupSeconds, (System.nanoTime() - start) * 1e-9, 0.0);
    }
    // CG's dot products square the residual: far from 1 they underflow (a specimen desorbed to
    // 1e-150 and less) or overflow, and α = 0/0 ends the solve in NaN. Solving for x/s with s =
    // ‖D⁻¹b‖ keeps them near 1; ordinary sizes are left alone, so their results stay bit for bit.
    double scale = rhsNorm < TINY_NORM || rhsNorm > 1 / TINY_NORM ? rhsNorm : 1.0;
    double[] rhs = b;
    if (scale != 1.0) {
      rhs = new double[n];
      for (int i = 0; i < n; i++) {
        rhs[i] = b[i] / scale;
        x[i] /= scale;
      }
    }
    FusedCg.Outcome o =
        cg.solve(
            matrix,
            inverseDiagonal,
            amg,
            rhs,
            x,
            relativeTolerance * rhsNorm / scale,
            maxIterations);
    if (scale != 1.0) {
      for (int i = 0; i < n; i++) {
        x[i] *= scale;
      }
    }
    SolveStats stats =
        new SolveStats(
            o.iterations(),
            o.residual() * scale,
            rhsNorm,
            o.converged(),
            setupSeconds,
            (System.nanoTime() - start) * 1e-9,
            o.residualSum() * scale);
    if (!o.converged()) {
      throw new SolverStalledException(stats, relativeTolerance, active, o.brokeDown());
    }
    return stats;
  }

  /** Right-hand sides whose scaled norm is below this (or above its inverse) are solved scaled. */
  static final double TINY_NORM = 1e-100;

  private double scaledNorm(double[] v) {
    double s = 0;
    for (int i = 0; i < v.length; i++) {
      double e = v[i] * inverseDiagonal[i];
      s += e * e;
    }
    return Math.sqrt(s);
  }

  private void requireMatrix() {
    if (matrix == null) {
      throw new IllegalStateException("no matrix: call setMatrix before solving");
    }
  }
}
