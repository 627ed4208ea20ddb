package dev.soakfield.fem.element;

/**
 * Lagrange shape functions of 4-node (linear) and 10-node (quadratic) tetrahedra in MSH node order:
 * corners 0–3, then mid-edge nodes on (0,1), (1,2), (2,0), (3,0), (3,2), (3,1).
 *
 * <p>Reference coordinates are ξ = (L1, L2, L3) with L0 = 1 − ξ1 − ξ2 − ξ3, so the reference
 * element is the unit tetrahedron with corner 0 at the origin.
 */
public final class TetBasis {
  /** Corner pairs of the mid-edge nodes 4..9. */
  private static final int[] EDGE_A = {0, 1, 2, 3, 3, 3};

  private static final int[] EDGE_B = {1, 2, 0, 0, 2, 1};

  private TetBasis() {}

  /** 4 for order 1, 10 for order 2. */
  public static int nodeCount(int order) {
    checkOrder(order);
    return order == 1 ? 4 : 10;
  }

  /** First corner of the edge that carries mid-edge node {@code 4 + e}. */
  public static int edgeStart(int e) {
    return EDGE_A[e];
  }

  /** Second corner of the edge that carries mid-edge node {@code 4 + e}. */
  public static int edgeEnd(int e) {
    return EDGE_B[e];
  }

  /** N_i at the point with barycentric coordinates l[0..3]; out has nodeCount(order) entries. */
  public static void values(int order, double[] l, double[] out) {
    if (order == 1) {
      System.arraycopy(l, 0, out, 0, 4);
      return;
    }
    for (int a = 0; a < 4; a++) {
      out[a] = l[a] * (2 * l[a] - 1);
    }
    for (int e = 0; e < 6; e++) {
      out[4 + e] = 4 * l[EDGE_A[e]] * l[EDGE_B[e]];
    }
  }

  /**
   * ∂N_i/∂ξ_k at barycentric l, stored out[3 i + k]. For order 1 they are constant: node 0 has (−1,
   * −1, −1) and node k the unit vector e_k.
   */
  public static void referenceGradients(int order, double[] l, double[] out) {
    if (order == 1) {
      for (int i = 0; i < 12; i++) {
        out[i] = 0;
      }
      for (int k = 0; k < 3; k++) {
        out[k] = -1;
        out[3 * (k + 1) + k] = 1;
      }
      return;
    }
    // dN/dL_a as if the four L were independent, then dN/dξ_k = dN/dL_k − dN/dL_0.
    for (int i = 0; i < 30; i++) {
      out[i] = 0;
    }
    for (int a = 0; a < 4; a++) {
      addBaryDerivative(out, a, a, 4 * l[a] - 1);
    }
    for (int e = 0; e < 6; e++) {
      int a = EDGE_A[e];
      int b = EDGE_B[e];
      addBaryDerivative(out, 4 + e, a, 4 * l[b]);
      addBaryDerivative(out, 4 + e, b, 4 * l[a]);
    }
  }

  private static void addBaryDerivative(double[] out, int node, int a, double d) {
    if (a == 0) {
      out[3 * node] -= d;
      out[3 * node + 1] -= d;
      out[3 * node + 2] -= d;
    } else {
      out[3 * node + a - 1] += d;
    }
  }

  static void checkOrder(int order) {
    if (order != 1 && order != 2) {
      throw new IllegalArgumentException("element order must be 1 or 2, got " + order);
    }
  }
}
