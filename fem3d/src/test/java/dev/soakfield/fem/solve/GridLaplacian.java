package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * The 7-point finite-difference Laplacian on an n×n×n grid of interior points (Dirichlet values
 * eliminated) plus a diagonal shift, in CSR form: the model of A = M/Δt + K for tests and the
 * bench. A shift c stands for a lumped capacity h²/(D·Δt), so the step ratio Δt·D/h² is 1/c.
 */
final class GridLaplacian {
  private GridLaplacian() {}

  /**
   * @param n points per direction
   * @param shift added to every diagonal entry
   * @param dirichlet whether the grid's outside is held fixed (diagonal 6 everywhere) or sealed
   *     (diagonal = number of neighbours, rows sum to the shift)
   */
  static CsrMatrix build(int n, double shift, boolean dirichlet) {
    if (n < 1 || (long) n * n * n > Integer.MAX_VALUE / 8) {
      throw new IllegalArgumentException("grid size out of range: " + n);
    }
    int rows = n * n * n;
    int[] rowStart = new int[rows + 1];
    int[] cols = new int[7 * rows];
    int[] offsets = {-n * n, -n, -1, 0, 1, n, n * n};
    int nnz = 0;
    for (int z = 0; z < n; z++) {
      for (int y = 0; y < n; y++) {
        for (int x = 0; x < n; x++) {
          int i = (z * n + y) * n + x;
          for (int d = 0; d < 7; d++) {
            if (inside(x, y, z, d, n)) {
              cols[nnz++] = i + offsets[d];
            }
          }
          rowStart[i + 1] = nnz;
        }
      }
    }
    int[] trimmed = java.util.Arrays.copyOf(cols, nnz);
    CsrMatrix a = new CsrMatrix(rows, rowStart, trimmed);
    double[] v = a.values();
    for (int i = 0; i < rows; i++) {
      int neighbours = rowStart[i + 1] - rowStart[i] - 1;
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        v[k] = trimmed[k] == i ? (dirichlet ? 6.0 : neighbours) + shift : -1.0;
      }
    }
    return a;
  }

  private static boolean inside(int x, int y, int z, int d, int n) {
    return switch (d) {
      case 0 -> z > 0;
      case 1 -> y > 0;
      case 2 -> x > 0;
      case 4 -> x < n - 1;
      case 5 -> y < n - 1;
      case 6 -> z < n - 1;
      default -> true;
    };
  }
}
