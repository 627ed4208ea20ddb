package dev.soakfield.fem.solve;

import dev.soakfield.fem.assembly.CsrMatrix;
import java.util.Random;

/** Small systems built by hand for the solver tests. */
final class TestSystems {
  private TestSystems() {}

  /** A dense SPD matrix Bᵀ B + n·I (B uniform random in [-1, 1]) stored with every entry in CSR. */
  static CsrMatrix denseSpd(int n, long seed) {
    Random random = new Random(seed);
    double[][] b = new double[n][n];
    for (double[] row : b) {
      for (int j = 0; j < n; j++) {
        row[j] = 2 * random.nextDouble() - 1;
      }
    }
    CsrMatrix a = fullPattern(n);
    double[] v = a.values();
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double s = i == j ? n : 0.0;
        for (int k = 0; k < n; k++) {
          s += b[k][i] * b[k][j];
        }
        v[i * n + j] = s;
      }
    }
    return a;
  }

  static CsrMatrix fullPattern(int n) {
    int[] rowStart = new int[n + 1];
    int[] cols = new int[n * n];
    for (int i = 0; i < n; i++) {
      rowStart[i + 1] = (i + 1) * n;
      for (int j = 0; j < n; j++) {
        cols[i * n + j] = j;
      }
    }
    return new CsrMatrix(n, rowStart, cols);
  }

  static double[][] toDense(CsrMatrix a) {
    int n = a.size();
    double[][] d = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int k = a.rowStart()[i]; k < a.rowStart()[i + 1]; k++) {
        d[i][a.cols()[k]] = a.values()[k];
      }
    }
    return d;
  }

  /** A smooth field on the n³ grid, not aligned with any eigenvector of the Laplacian. */
  static double[] smoothField(int n) {
    double[] x = new double[n * n * n];
    for (int z = 0; z < n; z++) {
      for (int y = 0; y < n; y++) {
        for (int i = 0; i < n; i++) {
          x[(z * n + y) * n + i] = 1 + Math.sin(0.3 * i + 0.1) * Math.cos(0.2 * y) + 0.01 * z * z;
        }
      }
    }
    return x;
  }

  static double[] multiply(CsrMatrix a, double[] x) {
    double[] y = new double[a.size()];
    a.multiply(x, y);
    return y;
  }

  static double norm(double[] v) {
    double s = 0;
    for (double e : v) {
      s += e * e;
    }
    return Math.sqrt(s);
  }

  static double distance(double[] a, double[] b) {
    double s = 0;
    for (int i = 0; i < a.length; i++) {
      s += (a[i] - b[i]) * (a[i] - b[i]);
    }
    return Math.sqrt(s);
  }

  static double residualNorm(CsrMatrix a, double[] x, double[] b) {
    double[] ax = multiply(a, x);
    double s = 0;
    for (int i = 0; i < b.length; i++) {
      s += (b[i] - ax[i]) * (b[i] - ax[i]);
    }
    return Math.sqrt(s);
  }
}
