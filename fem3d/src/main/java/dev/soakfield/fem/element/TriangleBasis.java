package dev.soakfield.fem.element;

/**
 * Lagrange shape functions of 3-node and 6-node triangles in MSH order: corners 0–2, then mid-edge
 * nodes on (0,1), (1,2), (2,0). Reference coordinates ξ = (L1, L2), L0 = 1 − ξ1 − ξ2.
 */
public final class TriangleBasis {
  private static final int[] EDGE_A = {0, 1, 2};
  private static final int[] EDGE_B = {1, 2, 0};

  private TriangleBasis() {}

  /** 3 for order 1, 6 for order 2. */
  public static int nodeCount(int order) {
    TetBasis.checkOrder(order);
    return order == 1 ? 3 : 6;
  }

  /** N_i at barycentric l[0..2]. */
  public static void values(int order, double[] l, double[] out) {
    if (order == 1) {
      System.arraycopy(l, 0, out, 0, 3);
      return;
    }
    for (int a = 0; a < 3; a++) {
      out[a] = l[a] * (2 * l[a] - 1);
    }
    for (int e = 0; e < 3; e++) {
      out[3 + e] = 4 * l[EDGE_A[e]] * l[EDGE_B[e]];
    }
  }

  /** ∂N_i/∂ξ_k at barycentric l, stored out[2 i + k]. */
  public static void referenceGradients(int order, double[] l, double[] out) {
    int n = order == 1 ? 3 : 6;
    for (int i = 0; i < 2 * n; i++) {
      out[i] = 0;
    }
    if (order == 1) {
      add(out, 0, 0, 1);
      add(out, 1, 1, 1);
      add(out, 2, 2, 1);
      return;
    }
    for (int a = 0; a < 3; a++) {
      add(out, a, a, 4 * l[a] - 1);
    }
    for (int e = 0; e < 3; e++) {
      add(out, 3 + e, EDGE_A[e], 4 * l[EDGE_B[e]]);
      add(out, 3 + e, EDGE_B[e], 4 * l[EDGE_A[e]]);
    }
  }

  private static void add(double[] out, int node, int a, double d) {
    if (a == 0) {
      out[2 * node] -= d;
      out[2 * node + 1] -= d;
    } else {
      out[2 * node + a - 1] += d;
    }
  }
}
