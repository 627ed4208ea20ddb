package dev.soakfield.fem.time;

/** Sums and dot products of nodal vectors, in one order so balances add up the same everywhere. */
final class VectorSums {
  private VectorSums() {}

  static double sum(double[] a) {
    double s = 0;
    for (double v : a) {
      s += v;
    }
    return s;
  }

  static double dot(double[] a, double[] b) {
    double s = 0;
    for (int i = 0; i < a.length; i++) {
      s += a[i] * b[i];
    }
    return s;
  }
}
