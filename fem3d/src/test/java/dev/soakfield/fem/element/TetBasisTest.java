package dev.soakfield.fem.element;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class TetBasisTest {
  /** Barycentric coordinates of the ten MSH nodes: corners, then midpoints of the listed edges. */
  private static double[] nodeBary(int node) {
    double[] l = new double[4];
    if (node < 4) {
      l[node] = 1;
    } else {
      l[TetBasis.edgeStart(node - 4)] = 0.5;
      l[TetBasis.edgeEnd(node - 4)] = 0.5;
    }
    return l;
  }

  @Test
  void midEdgeNodesFollowMshOrder() {
    // MSH format description: nodes 4..9 on edges (0,1), (1,2), (2,0), (3,0), (3,2), (3,1)
    int[][] expected = {{0, 1}, {1, 2}, {2, 0}, {3, 0}, {3, 2}, {3, 1}};
    for (int e = 0; e < 6; e++) {
      assertEquals(expected[e][0], TetBasis.edgeStart(e));
      assertEquals(expected[e][1], TetBasis.edgeEnd(e));
    }
  }

  @Test
  void shapeFunctionsAreOneAtTheirNodeAndZeroAtTheOthers() {
    for (int order = 1; order <= 2; order++) {
      int n = TetBasis.nodeCount(order);
      double[] values = new double[n];
      for (int node = 0; node < n; node++) {
        TetBasis.values(order, nodeBary(node), values);
        for (int i = 0; i < n; i++) {
          // Lagrange property (common practice): N_i(x_j) = δij
          assertEquals(i == node ? 1.0 : 0.0, values[i], 1e-15, "order " + order + " N" + i);
        }
      }
    }
  }

  @Test
  void valuesSumToOneAndGradientsToZeroAnywhere() {
    double[] l = {0.1, 0.2, 0.3, 0.4};
    for (int order = 1; order <= 2; order++) {
      int n = TetBasis.nodeCount(order);
      double[] v = new double[n];
      double[] g = new double[3 * n];
      TetBasis.values(order, l, v);
      TetBasis.referenceGradients(order, l, g);
      double sum = 0;
      double[] gs = new double[3];
      for (int i = 0; i < n; i++) {
        sum += v[i];
        for (int k = 0; k < 3; k++) {
          gs[k] += g[3 * i + k];
        }
      }
      // partition of unity (common practice): Σ N_i = 1, so Σ ∇N_i = 0
      assertEquals(1.0, sum, 1e-15);
      for (int k = 0; k < 3; k++) {
        assertEquals(0.0, gs[k], 1e-14);
      }
    }
  }

  @Test
  void gradientsMatchCentralDifferencesOfTheValues() {
    // exact calculus: a central difference is exact for polynomials of degree ≤ 2
    double[] xi = {0.15, 0.25, 0.35};
    double h = 1e-3;
    for (int order = 1; order <= 2; order++) {
      int n = TetBasis.nodeCount(order);
      double[] g = new double[3 * n];
      TetBasis.referenceGradients(order, bary(xi), g);
      double[] plus = new double[n];
      double[] minus = new double[n];
      for (int k = 0; k < 3; k++) {
        double[] p = xi.clone();
        double[] m = xi.clone();
        p[k] += h;
        m[k] -= h;
        TetBasis.values(order, bary(p), plus);
        TetBasis.values(order, bary(m), minus);
        for (int i = 0; i < n; i++) {
          assertEquals((plus[i] - minus[i]) / (2 * h), g[3 * i + k], 1e-11, "N" + i + " d" + k);
        }
      }
    }
  }

  private static double[] bary(double[] xi) {
    return new double[] {1 - xi[0] - xi[1] - xi[2], xi[0], xi[1], xi[2]};
  }

  @Test
  void triangleShapeFunctionsHaveTheLagrangePropertyAndMatchDifferences() {
    double[][] nodes = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}, {.5, .5, 0}, {0, .5, .5}, {.5, 0, .5}};
    for (int order = 1; order <= 2; order++) {
      int n = TriangleBasis.nodeCount(order);
      double[] v = new double[n];
      for (int node = 0; node < n; node++) {
        TriangleBasis.values(order, nodes[node], v);
        for (int i = 0; i < n; i++) {
          assertEquals(i == node ? 1.0 : 0.0, v[i], 1e-15);
        }
      }
      double h = 1e-3;
      double[] g = new double[2 * n];
      double[] plus = new double[n];
      double[] minus = new double[n];
      TriangleBasis.referenceGradients(order, new double[] {0.5, 0.2, 0.3}, g);
      for (int k = 0; k < 2; k++) {
        double[] p = {0.2, 0.3};
        double[] m = {0.2, 0.3};
        p[k] += h;
        m[k] -= h;
        TriangleBasis.values(order, new double[] {1 - p[0] - p[1], p[0], p[1]}, plus);
        TriangleBasis.values(order, new double[] {1 - m[0] - m[1], m[0], m[1]}, minus);
        for (int i = 0; i < n; i++) {
          assertEquals((plus[i] - minus[i]) / (2 * h), g[2 * i + k], 1e-11);
        }
      }
    }
  }
}
