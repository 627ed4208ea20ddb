package dev.soakfield.fem.element;

/**
 * A polynomial in the barycentric coordinates of a simplex (3 or 4 of them, degree ≤ 4), integrated
 * exactly with ∫ Π L_k^{a_k} = dim! · size · Π a_k! / (Σ a_k + dim)! (exact calculus; the formula
 * of A. Eisenberg and L. E. Malvern, "On finite element integration in natural co-ordinates", Int.
 * J. Numer. Meth. Engng. 7 (1973) 574). An independent path to element matrices: no quadrature.
 */
final class BaryPolynomial {
  private static final int B = 5;
  private final int vars;
  private final double[] c;

  private BaryPolynomial(int vars) {
    this.vars = vars;
    this.c = new double[(int) Math.pow(B, vars)];
  }

  /** The shape function N_node of a simplex with {@code vars} corners, order 1 or 2, MSH order. */
  static BaryPolynomial shape(int vars, int order, int node) {
    int[] ea = vars == 4 ? new int[] {0, 1, 2, 3, 3, 3} : new int[] {0, 1, 2};
    int[] eb = vars == 4 ? new int[] {1, 2, 0, 0, 2, 1} : new int[] {1, 2, 0};
    BaryPolynomial p = new BaryPolynomial(vars);
    if (order == 1) {
      p.c[unit(node)] = 1;
    } else if (node < vars) {
      // L (2L − 1) = 2 L^2 − L
      p.c[2 * unit(node)] = 2;
      p.c[unit(node)] = -1;
    } else {
      int e = node - vars;
      p.c[unit(ea[e]) + unit(eb[e])] = 4;
    }
    return p;
  }

  private static int unit(int k) {
    int u = 1;
    for (int i = 0; i < k; i++) {
      u *= B;
    }
    return u;
  }

  BaryPolynomial plus(BaryPolynomial o) {
    BaryPolynomial r = new BaryPolynomial(vars);
    for (int i = 0; i < c.length; i++) {
      r.c[i] = c[i] + o.c[i];
    }
    return r;
  }

  BaryPolynomial times(BaryPolynomial o) {
    BaryPolynomial r = new BaryPolynomial(vars);
    for (int i = 0; i < c.length; i++) {
      if (c[i] == 0) {
        continue;
      }
      for (int j = 0; j < o.c.length; j++) {
        if (o.c[j] != 0) {
          r.c[i + j] += c[i] * o.c[j]; // exponents stay below B for degree ≤ 4
        }
      }
    }
    return r;
  }

  /** ∫ over a simplex of the given volume (tetrahedron) or area (triangle). */
  double integrate(double size) {
    int dim = vars - 1;
    double s = 0;
    for (int i = 0; i < c.length; i++) {
      if (c[i] == 0) {
        continue;
      }
      int rest = i;
      int total = 0;
      double num = 1;
      for (int k = 0; k < vars; k++) {
        int a = rest % B;
        rest /= B;
        total += a;
        num *= TetQuadratureTest.factorial(a);
      }
      s += c[i] * num / TetQuadratureTest.factorial(total + dim);
    }
    return s * TetQuadratureTest.factorial(dim) * size;
  }
}
