package dev.soakfield.fem.element;

/**
 * The 4-node tetrahedron in closed form: constant gradients from the reciprocal basis of the edge
 * vectors, mass V/20 (1 + δij) (exact calculus: ∫ L_i L_j dV = V (1 + δij) / 20).
 */
final class LinearTetKernel implements TetKernel {
  private final double[] grad = new double[12];

  @Override
  public int nodeCount() {
    return 4;
  }

  @Override
  public void stiffness(double[] x, double[] tensor, int off, double[] out) {
    double v = gradients(x, grad);
    double txx = tensor[off];
    double tyy = tensor[off + 1];
    double tzz = tensor[off + 2];
    double txy = tensor[off + 3];
    double tyz = tensor[off + 4];
    double tzx = tensor[off + 5];
    for (int j = 0; j < 4; j++) {
      double gx = grad[3 * j];
      double gy = grad[3 * j + 1];
      double gz = grad[3 * j + 2];
      double fx = v * (txx * gx + txy * gy + tzx * gz);
      double fy = v * (txy * gx + tyy * gy + tyz * gz);
      double fz = v * (tzx * gx + tyz * gy + tzz * gz);
      for (int i = j; i < 4; i++) {
        double k = grad[3 * i] * fx + grad[3 * i + 1] * fy + grad[3 * i + 2] * fz;
        out[4 * i + j] = k;
        out[4 * j + i] = k;
      }
    }
  }

  @Override
  public void mass(double[] x, double[] out) {
    double v = volume(x);
    double off = v / 20;
    for (int k = 0; k < 16; k++) {
      out[k] = off;
    }
    for (int i = 0; i < 4; i++) {
      out[5 * i] = 2 * off;
    }
  }

  @Override
  public void lumpedMass(double[] x, double[] out) {
    load(x, out);
  }

  @Override
  public void load(double[] x, double[] out) {
    double q = volume(x) / 4;
    for (int i = 0; i < 4; i++) {
      out[i] = q;
    }
  }

  @Override
  public double volume(double[] x) {
    return signedVolume(x);
  }

  /** Signed volume of the tetrahedron with corners x[0..11]: positive when positively oriented. */
  static double signedVolume(double[] x) {
    double ax = x[3] - x[0];
    double ay = x[4] - x[1];
    double az = x[5] - x[2];
    double bx = x[6] - x[0];
    double by = x[7] - x[1];
    double bz = x[8] - x[2];
    double cx = x[9] - x[0];
    double cy = x[10] - x[1];
    double cz = x[11] - x[2];
    return (ax * (by * cz - bz * cy) + ay * (bz * cx - bx * cz) + az * (bx * cy - by * cx)) / 6;
  }

  /**
   * Gradients of the four barycentric coordinates into g[3 i + axis]; returns the signed volume.
   * With edge vectors e1, e2, e3 from corner 0, ∇L1 = (e2 × e3)/det and cyclically; ∇L0 = −Σ.
   */
  static double gradients(double[] x, double[] g) {
    double ax = x[3] - x[0];
    double ay = x[4] - x[1];
    double az = x[5] - x[2];
    double bx = x[6] - x[0];
    double by = x[7] - x[1];
    double bz = x[8] - x[2];
    double cx = x[9] - x[0];
    double cy = x[10] - x[1];
    double cz = x[11] - x[2];
    double g1x = by * cz - bz * cy;
    double g1y = bz * cx - bx * cz;
    double g1z = bx * cy - by * cx;
    double det = ax * g1x + ay * g1y + az * g1z;
    double inv = 1 / det;
    g[3] = g1x * inv;
    g[4] = g1y * inv;
    g[5] = g1z * inv;
    g[6] = (cy * az - cz * ay) * inv;
    g[7] = (cz * ax - cx * az) * inv;
    g[8] = (cx * ay - cy * ax) * inv;
    g[9] = (ay * bz - az * by) * inv;
    g[10] = (az * bx - ax * bz) * inv;
    g[11] = (ax * by - ay * bx) * inv;
    g[0] = -(g[3] + g[6] + g[9]);
    g[1] = -(g[4] + g[7] + g[10]);
    g[2] = -(g[5] + g[8] + g[11]);
    return det / 6;
  }
}
