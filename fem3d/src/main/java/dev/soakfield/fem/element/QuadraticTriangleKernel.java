package dev.soakfield.fem.element;

/**
 * The 6-node triangle, isoparametric with the degree-4 rule: the area element |∂x/∂ξ1 × ∂x/∂ξ2| is
 * taken at every point, so curved faces are integrated as well; exact on flat straight-edged ones.
 */
final class QuadraticTriangleKernel implements TriangleKernel {
  private static final TriangleQuadrature RULE = TriangleQuadrature.DEGREE_4;
  private static final double[] DN = new double[12 * RULE.size()];
  private static final double[] N = new double[6 * RULE.size()];

  static {
    double[] l = new double[3];
    double[] dn = new double[12];
    double[] n = new double[6];
    for (int q = 0; q < RULE.size(); q++) {
      for (int a = 0; a < 3; a++) {
        l[a] = RULE.bary(q, a);
      }
      TriangleBasis.referenceGradients(2, l, dn);
      TriangleBasis.values(2, l, n);
      System.arraycopy(dn, 0, DN, 12 * q, 12);
      System.arraycopy(n, 0, N, 6 * q, 6);
    }
  }

  @Override
  public int nodeCount() {
    return 6;
  }

  @Override
  public void mass(double[] x, double[] out) {
    for (int k = 0; k < 36; k++) {
      out[k] = 0;
    }
    for (int q = 0; q < RULE.size(); q++) {
      double w = RULE.weight(q) * areaRatio(x, 12 * q) / 2;
      for (int i = 0; i < 6; i++) {
        double wi = w * N[6 * q + i];
        for (int j = 0; j < 6; j++) {
          out[6 * i + j] += wi * N[6 * q + j];
        }
      }
    }
  }

  @Override
  public void load(double[] x, double[] out) {
    for (int i = 0; i < 6; i++) {
      out[i] = 0;
    }
    for (int q = 0; q < RULE.size(); q++) {
      double w = RULE.weight(q) * areaRatio(x, 12 * q) / 2;
      for (int i = 0; i < 6; i++) {
        out[i] += w * N[6 * q + i];
      }
    }
  }

  @Override
  public double area(double[] x) {
    double a = 0;
    for (int q = 0; q < RULE.size(); q++) {
      a += RULE.weight(q) * areaRatio(x, 12 * q);
    }
    return a / 2;
  }

  /** |∂x/∂ξ1 × ∂x/∂ξ2| at one point: twice the local area ratio to the reference triangle. */
  private static double areaRatio(double[] x, int base) {
    double ux = 0, uy = 0, uz = 0, vx = 0, vy = 0, vz = 0;
    for (int i = 0; i < 6; i++) {
      double d0 = DN[base + 2 * i];
      double d1 = DN[base + 2 * i + 1];
      ux += x[3 * i] * d0;
      uy += x[3 * i + 1] * d0;
      uz += x[3 * i + 2] * d0;
      vx += x[3 * i] * d1;
      vy += x[3 * i + 1] * d1;
      vz += x[3 * i + 2] * d1;
    }
    double nx = uy * vz - uz * vy;
    double ny = uz * vx - ux * vz;
    double nz = ux * vy - uy * vx;
    return Math.sqrt(nx * nx + ny * ny + nz * nz);
  }
}
