package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * The AUTO rule: Jacobi when the capacity term dominates the diagonal, AMG otherwise.
 *
 * <p>For A = M/Δt + K the stiffness rows sum to zero, so a row's sum is its lumped capacity. The
 * capacity share of row i is s_i = (Σ_j a_ij) / a_ii, clamped to [0, 1]. For an M-matrix,
 * Gershgorin's theorem bounds the spectrum of D⁻¹A in [s, 2 − s], so κ(D⁻¹A) ≤ (2 − s)/s. With s ≥
 * 0.05 that is κ ≤ 39, about 60 Jacobi-PCG iterations to 1e-8 — fewer operations than building an
 * AMG hierarchy and running it. The rule takes Jacobi when at least half of the rows (the median)
 * reach that share: a few boundary rows with a large share (Dirichlet neighbours) do not count, nor
 * do the vertex rows of quadratic elements whose lumped mass is negative.
 */
final class PreconditionerChoice {
  /** Capacity share from which Jacobi is chosen (dt·D/h² ≈ 3 on a structured mesh). */
  static final double JACOBI_CAPACITY_SHARE = 0.05;

  private PreconditionerChoice() {}

  /** JACOBI or AMG for this matrix; {@code diagonal} holds its (positive) diagonal. */
  static PreconditionerKind choose(CsrMatrix a, double[] diagonal) {
    int n = a.size();
    int[] rowStart = a.rowStart();
    double[] values = a.values();
    int dominantRows = 0;
    for (int i = 0; i < n; i++) {
      double rowSum = 0;
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        rowSum += values[k];
      }
      if (rowSum >= JACOBI_CAPACITY_SHARE * diagonal[i]) {
        dominantRows++;
      }
    }
    return 2L * dominantRows >= n ? PreconditionerKind.JACOBI : PreconditionerKind.AMG;
  }
}
