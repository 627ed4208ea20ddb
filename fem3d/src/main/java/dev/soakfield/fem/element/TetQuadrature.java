package dev.soakfield.fem.element;

/**
 * A symmetric quadrature rule on a tetrahedron: points in barycentric coordinates and weights that
 * sum to one, so that the integral of f over a tetrahedron of volume V is V times the weighted sum
 * (times the Jacobian ratio for curved elements).
 */
public final class TetQuadrature {
  /**
   * Four points, exact for polynomials of degree 2: the classic rule with barycentric coordinates
   * (a, b, b, b), a = (5 + 3√5)/20, b = (5 − √5)/20, weights 1/4 (P. Keast, "Moderate-degree
   * tetrahedral quadrature formulas", Comput. Methods Appl. Mech. Engrg. 55 (1986) 339, its
   * four-point rule).
   */
  public static final TetQuadrature DEGREE_2 = degree2();

  /**
   * Fourteen points, exact for polynomials of degree 5, all weights positive: two orbits of four
   * points (a, a, a, 1 − 3a) and one orbit of six points (b, b, ½ − b, ½ − b). The constants are
   * those of the fully symmetric 14-point rule (from memory), refined to full double precision by
   * Newton's method on the moment equations; TetQuadratureTest checks every monomial up to degree
   * 5.
   */
  public static final TetQuadrature DEGREE_5 = degree5();

  private final int degree;
  private final double[] bary;
  private final double[] weights;

  private TetQuadrature(int degree, double[] bary, double[] weights) {
    this.degree = degree;
    this.bary = bary;
    this.weights = weights;
  }

  /** Highest polynomial degree integrated exactly. */
  public int degree() {
    return degree;
  }

  public int size() {
    return weights.length;
  }

  /** Barycentric coordinate {@code a} (0–3) of point {@code q}. */
  public double bary(int q, int a) {
    return bary[4 * q + a];
  }

  /** Weight of point {@code q} as a fraction of the volume. */
  public double weight(int q) {
    return weights[q];
  }

  private static TetQuadrature degree2() {
    double b = (5 - Math.sqrt(5)) / 20;
    double[] bary = new double[16];
    double[] w = new double[4];
    addVertexOrbit(bary, w, 0, b, 0.25);
    return new TetQuadrature(2, bary, w);
  }

  private static TetQuadrature degree5() {
    double[] bary = new double[4 * 14];
    double[] w = new double[14];
    addVertexOrbit(bary, w, 0, 0.09273525031089122, 0.07349304311636196);
    addVertexOrbit(bary, w, 4, 0.3108859192633006, 0.11268792571801585);
    double b = 0.04550370412564965;
    double c = 0.5 - b;
    int q = 8;
    for (int i = 0; i < 4; i++) {
      for (int j = i + 1; j < 4; j++) {
        for (int k = 0; k < 4; k++) {
          bary[4 * q + k] = (k == i || k == j) ? c : b;
        }
        w[q++] = 0.042546020777081466;
      }
    }
    return new TetQuadrature(5, bary, w);
  }

  /** Four points (a, a, a, 1 − 3a) with the odd coordinate at each corner in turn. */
  private static void addVertexOrbit(
      double[] bary, double[] w, int first, double a, double weight) {
    for (int p = 0; p < 4; p++) {
      int q = first + p;
      for (int k = 0; k < 4; k++) {
        bary[4 * q + k] = k == p ? 1 - 3 * a : a;
      }
      w[q] = weight;
    }
  }
}
