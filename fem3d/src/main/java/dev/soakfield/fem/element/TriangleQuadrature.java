package dev.soakfield.fem.element;

/**
 * A symmetric quadrature rule on a triangle: barycentric points and weights summing to one (the
 * integral of f over a triangle of area A is A times the weighted sum for flat triangles).
 */
public final class TriangleQuadrature {
  /**
   * Six points, exact for polynomials of degree 4: two orbits (1 − 2a, a, a) (D. A. Dunavant, "High
   * degree efficient symmetrical Gaussian quadrature rules for the triangle", Int. J. Numer. Meth.
   * Engng. 21 (1985) 1129, its degree-4 rule), constants refined to full double precision on the
   * moment equations; TriangleQuadratureTest checks every monomial up to degree 4.
   */
  public static final TriangleQuadrature DEGREE_4 = degree4();

  private final int degree;
  private final double[] bary;
  private final double[] weights;

  private TriangleQuadrature(int degree, double[] bary, double[] weights) {
    this.degree = degree;
    this.bary = bary;
    this.weights = weights;
  }

  public int degree() {
    return degree;
  }

  public int size() {
    return weights.length;
  }

  /** Barycentric coordinate {@code a} (0–2) of point {@code q}. */
  public double bary(int q, int a) {
    return bary[3 * q + a];
  }

  /** Weight of point {@code q} as a fraction of the area. */
  public double weight(int q) {
    return weights[q];
  }

  private static TriangleQuadrature degree4() {
    double[] bary = new double[18];
    double[] w = new double[6];
    addOrbit(bary, w, 0, 0.4459484909159649, 0.22338158967801147);
    addOrbit(bary, w, 3, 0.09157621350977074, 0.10995174365532187);
    return new TriangleQuadrature(4, bary, w);
  }

  private static void addOrbit(double[] bary, double[] w, int first, double a, double weight) {
    for (int p = 0; p < 3; p++) {
      int q = first + p;
      for (int k = 0; k < 3; k++) {
        bary[3 * q + k] = k == p ? 1 - 2 * a : a;
      }
      w[q] = weight;
    }
  }
}
