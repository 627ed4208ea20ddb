package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.util.Arrays;

/**
 * The AUTO rule: the cheaper of Jacobi and AMG for the solves that will reuse the matrix, counted
 * in iterations (never in wall time, so the same case always makes the same choice and a resumed
 * run repeats its series bit for bit).
 *
 * <p><b>Jacobi's iterations</b> are estimated from the matrix. For A = M/Δt + K the stiffness rows
 * sum to zero, so a row's sum is its lumped capacity; its share of the diagonal is s_i = (Σ_j a_ij)
 * / a_ii. For an M-matrix Gershgorin's theorem bounds the spectrum of D⁻¹A in [s, 2 − s], so κ ≤ (2
 * − s)/s, taken at the median share (a few rows next to held faces do not count). Long steps make s
 * tiny, and then the stiffness alone bounds κ: on a mesh of n nodes of even size, κ(D⁻¹K) ≈
 * 0.5·n^(2/3) (fitted to the structured mesher's boxes of 17³ and 33³ nodes: 0.56 and 0.50). The
 * two combine as 1/κ = s/(2 − s) + 1/κ_K. CG needs about ½·√κ·ln(2/tol) iterations (the classic
 * bound, Saad, Iterative Methods for Sparse Linear Systems, 2nd ed., §6.11.3, eq. 6.128); on those
 * boxes at tol = 1e-11 the estimate was within 10 % (low) to 30 % (high) of the count.
 *
 * <p><b>AMG</b> took 6 to 14 iterations on the same boxes at every step ratio from 0.1 to 1000
 * ({@link #AMG_ITERATIONS} takes the top), and 18 on quadratic tetrahedra (8³ cells: the same rows,
 * about 28 entries a row against 15), 20.6 a step in a 100-step run of a 32³-cell quadratic box
 * ({@link #AMG_ITERATIONS_WIDE_STENCIL}). An iteration costs about 8.5 Jacobi iterations (a
 * V-cycle's Gauss–Seidel sweeps run on one thread; 8.8 measured on linear, 8.2 on quadratic
 * elements at 274,625 rows), and the set-up as much as about 150 Jacobi iterations (136 and 91
 * measured). All measured with {@code soakfield bench solver} on the 2-core machine the project is
 * developed on. AMG is chosen when its set-up plus its iterations over the expected solves cost
 * less than Jacobi's iterations.
 */
final class PreconditionerChoice {
  /** AMG iterations per solve (the most measured, see above). */
  static final int AMG_ITERATIONS = 14;

  /** AMG iterations per solve with quadratic elements' stencil (see above). */
  static final int AMG_ITERATIONS_WIDE_STENCIL = 20;

  /** Entries a row above which a stencil counts as wide (linear: about 15, quadratic: 28). */
  static final double WIDE_STENCIL_ENTRIES = 20;

  /** Cost of one AMG-preconditioned iteration in Jacobi-preconditioned iterations (measured). */
  static final double AMG_ITERATION_COST = 8.5;

  /** Cost of building the AMG hierarchy in Jacobi-preconditioned iterations (measured). */
  static final double AMG_SETUP_COST = 150;

  /** κ(D⁻¹K) ≈ this · n^(2/3) for the stiffness alone (fitted, see above). */
  static final double STIFFNESS_CONDITION = 0.5;

  private PreconditionerChoice() {}

  /**
   * JACOBI or AMG for this matrix; {@code diagonal} holds its (positive) diagonal, {@code
   * expectedSolves} how many solves will use it, {@code tolerance} their relative tolerance.
   */
  static PreconditionerKind choose(
      CsrMatrix a, double[] diagonal, int expectedSolves, double tolerance) {
    double solves = Math.max(1, expectedSolves);
    double jacobi = solves * jacobiIterations(a, diagonal, tolerance);
    double amg = AMG_SETUP_COST + solves * amgIterations(a) * AMG_ITERATION_COST;
    return amg < jacobi ? PreconditionerKind.AMG : PreconditionerKind.JACOBI;
  }

  /** AMG iterations per solve expected for this matrix's stencil (see the class comment). */
  static int amgIterations(CsrMatrix a) {
    return a.nonZeros() > WIDE_STENCIL_ENTRIES * a.size()
        ? AMG_ITERATIONS_WIDE_STENCIL
        : AMG_ITERATIONS;
  }

  /** Estimated Jacobi-PCG iterations to {@code tolerance} (see the class comment). */
  static double jacobiIterations(CsrMatrix a, double[] diagonal, double tolerance) {
    double s = medianCapacityShare(a, diagonal);
    double stiffness = STIFFNESS_CONDITION * Math.pow(a.size(), 2.0 / 3.0);
    double kappa = 1 / (s / (2 - s) + 1 / Math.max(1, stiffness));
    return 0.5 * Math.sqrt(kappa) * Math.log(2 / tolerance);
  }

  /** The median over the rows of (row sum)/diagonal, clamped to [0, 1]. */
  static double medianCapacityShare(CsrMatrix a, double[] diagonal) {
    int n = a.size();
    int[] rowStart = a.rowStart();
    double[] values = a.values();
    double[] share = new double[n];
    for (int i = 0; i < n; i++) {
      double rowSum = 0;
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        rowSum += values[k];
      }
      share[i] = Math.max(0, Math.min(1, rowSum / diagonal[i]));
    }
    Arrays.sort(share);
    return share[n / 2];
  }
}
