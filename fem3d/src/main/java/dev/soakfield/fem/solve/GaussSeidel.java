package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/**
 * Gauss–Seidel sweeps, in place. A forward sweep before the coarse correction and a backward one
 * after it make the V-cycle a symmetric operator, as CG needs.
 */
final class GaussSeidel {
  private GaussSeidel() {}

  static void forward(CsrMatrix a, double[] inverseDiagonal, double[] b, double[] x) {
    int[] rowStart = a.rowStart();
    int[] cols = a.cols();
    double[] values = a.values();
    int n = a.size();
    for (int i = 0; i < n; i++) {
      double s = b[i];
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        s -= values[k] * x[cols[k]];
      }
      x[i] += s * inverseDiagonal[i];
    }
  }

  static void backward(CsrMatrix a, double[] inverseDiagonal, double[] b, double[] x) {
    int[] rowStart = a.rowStart();
    int[] cols = a.cols();
    double[] values = a.values();
    for (int i = a.size() - 1; i >= 0; i--) {
      double s = b[i];
      for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
        s -= values[k] * x[cols[k]];
      }
      x[i] += s * inverseDiagonal[i];
    }
  }
}
