package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;

/** A = L Lᵀ of a small SPD matrix (the AMG coarsest level), row-major lower triangle. */
final class DenseCholesky {
  private final int n;
  private final double[] lower;

  private DenseCholesky(int n, double[] lower) {
    this.n = n;
    this.lower = lower;
  }

  /**
   * @throws IllegalArgumentException when a pivot is not positive (A is not positive definite)
   */
  static DenseCholesky factor(CsrMatrix a) {
    int n = a.size();
    double[] l = new double[n * n];
    for (int i = 0; i < n; i++) {
      for (int k = a.rowStart()[i]; k < a.rowStart()[i + 1]; k++) {
        l[i * n + a.cols()[k]] = a.values()[k];
      }
    }
    for (int j = 0; j < n; j++) {
      double d = l[j * n + j];
      for (int k = 0; k < j; k++) {
        d -= l[j * n + k] * l[j * n + k];
      }
      if (!(d > 0)) {
        throw new IllegalArgumentException(
            "matrix is not positive definite: Cholesky pivot "
                + j
                + " of the "
                + n
                + "-row coarse level is "
                + d);
      }
      double ljj = Math.sqrt(d);
      l[j * n + j] = ljj;
      for (int i = j + 1; i < n; i++) {
        double s = l[i * n + j];
        for (int k = 0; k < j; k++) {
          s -= l[i * n + k] * l[j * n + k];
        }
        l[i * n + j] = s / ljj;
      }
    }
    return new DenseCholesky(n, l);
  }

  /** x = A⁻¹ b. */
  void solve(double[] b, double[] x) {
    for (int i = 0; i < n; i++) {
      double s = b[i];
      for (int k = 0; k < i; k++) {
        s -= lower[i * n + k] * x[k];
      }
      x[i] = s / lower[i * n + i];
    }
    for (int i = n - 1; i >= 0; i--) {
      double s = x[i];
      for (int k = i + 1; k < n; k++) {
        s -= lower[k * n + i] * x[k];
      }
      x[i] = s / lower[i * n + i];
    }
  }
}
