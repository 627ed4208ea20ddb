package dev.soakfield.fem.element;

/**
 * The 3-node triangle in closed form: mass A/12 (1 + δij), load A/3 (exact calculus: ∫ L_i L_j dS =
 * A (1 + δij) / 12).
 */
final class LinearTriangleKernel implements TriangleKernel {
  @Override
  public int nodeCount() {
    return 3;
  }

  @Override
  public void mass(double[] x, double[] out) {
    double off = area(x) / 12;
    for (int k = 0; k < 9; k++) {
      out[k] = off;
    }
    out[0] = 2 * off;
    out[4] = 2 * off;
    out[8] = 2 * off;
  }

  @Override
  public void load(double[] x, double[] out) {
    double q = area(x) / 3;
    out[0] = q;
    out[1] = q;
    out[2] = q;
  }

  @Override
  public double area(double[] x) {
    double ax = x[3] - x[0];
    double ay = x[4] - x[1];
    double az = x[5] - x[2];
    double bx = x[6] - x[0];
    double by = x[7] - x[1];
    double bz = x[8] - x[2];
    double nx = ay * bz - az * by;
    double ny = az * bx - ax * bz;
    double nz = ax * by - ay * bx;
    return 0.5 * Math.sqrt(nx * nx + ny * ny + nz * nz);
  }
}
