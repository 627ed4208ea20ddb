package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * The filtered matrix A_F of smoothed aggregation (Vaněk, Mandel & Brezina, Computing 56 (1996)
 * 179): an off-diagonal a_ij is strong when |a_ij| ≥ ε·sqrt(a_ii·a_jj); weak ones are dropped and
 * added to the diagonal, which keeps the row sums (so constants stay in A_F's near-null space). The
 * off-diagonal entries of A_F are also the strong-connection graph used for aggregation.
 */
final class StrengthFilter {
  /** The smallest share of a row's diagonal that lumping may leave. */
  static final double KEPT_DIAGONAL = 0.25;

  private StrengthFilter() {}

  /** A_F of {@code a} (diagonal {@code diagonal}) for threshold ε; rows keep A's column order. */
  static SparseRows filter(CsrMatrix a, double[] diagonal, double epsilon) {
    int[] rowStart = a.rowStart();
    int[] cols = a.cols();
    double[] values = a.values();
    double eps2 = epsilon * epsilon;
    return SparseRows.build(
        a.size(),
        a.size(),
        rowStart[a.size()] / Math.max(1, a.size()),
        (from, to, out) -> {
          for (int i = from; i < to; i++) {
            double lumped = diagonal[i];
            for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
              int j = cols[k];
              double v = values[k];
              if (j != i && v * v < eps2 * diagonal[i] * diagonal[j]) {
                lumped += v;
              }
            }
            if (!(lumped >= KEPT_DIAGONAL * diagonal[i])) {
              // positive weak entries (quadratic elements, a consistent capacity that outweighs
              // diffusion) would take the diagonal to zero or below, and the prolongator's D⁻¹
              // to NaN: such a row keeps its own diagonal
              lumped = diagonal[i];
            }
            for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
              int j = cols[k];
              double v = values[k];
              if (j == i) {
                out.put(i, lumped);
              } else if (v * v >= eps2 * diagonal[i] * diagonal[j]) {
                out.put(j, v);
              }
            }
            out.endRow(false);
          }
        });
  }
}
