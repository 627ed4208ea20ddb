package dev.soakfield.fem.element;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TetKernelTest {
  /** A general, positively oriented tetrahedron. */
  private static final double[] CORNERS = {
    0.1, 0.0, 0.05, 1.3, 0.2, 0.1, 0.3, 1.1, 0.2, 0.2, 0.4, 0.9
  };

  /** Exact geometry: V = (e1 · (e2 × e3)) / 6 with the edge vectors from corner 0. */
  private static double volume(double[] x) {
    double[] a = {x[3] - x[0], x[4] - x[1], x[5] - x[2]};
    double[] b = {x[6] - x[0], x[7] - x[1], x[8] - x[2]};
    double[] c = {x[9] - x[0], x[10] - x[1], x[11] - x[2]};
    return (a[0] * (b[1] * c[2] - b[2] * c[1])
            - a[1] * (b[0] * c[2] - b[2] * c[0])
            + a[2] * (b[0] * c[1] - b[1] * c[0]))
        / 6;
  }

  /** The ten nodes with mid-edge nodes at the midpoints (a straight-edged quadratic tet). */
  static double[] withMidEdgeNodes(double[] corners) {
    double[] x = new double[30];
    System.arraycopy(corners, 0, x, 0, 12);
    for (int e = 0; e < 6; e++) {
      int a = TetBasis.edgeStart(e);
      int b = TetBasis.edgeEnd(e);
      for (int k = 0; k < 3; k++) {
        x[3 * (4 + e) + k] = 0.5 * (corners[3 * a + k] + corners[3 * b + k]);
      }
    }
    return x;
  }

  private static double[] nodes(int order) {
    return order == 1 ? CORNERS.clone() : withMidEdgeNodes(CORNERS);
  }

  @Test
  void linearStiffnessOfTheUnitTetrahedronIsTheTextbookMatrix() {
    double[] x = {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1};
    double[] k = new double[16];
    TetKernel.forOrder(1).stiffness(x, new double[] {1, 1, 1, 0, 0, 0}, 0, k);
    // exact geometry: ∇L0 = (−1,−1,−1), ∇Lk = e_k, V = 1/6, K_ij = V ∇L_i · ∇L_j
    assertEquals(0.5, k[0], 1e-15);
    assertEquals(-1.0 / 6, k[1], 1e-15);
    assertEquals(-1.0 / 6, k[12], 1e-15);
    assertEquals(1.0 / 6, k[5], 1e-15);
    assertEquals(0.0, k[6], 1e-15);
  }

  @Test
  void energyOfALinearFieldIsVolumeTimesGradientFlux() {
    double[] t = {2.0, 0.7, 1.3, 0.2, -0.1, 0.3}; // xx yy zz xy yz zx, positive definite
    double[] g = {0.4, -1.1, 0.8};
    double[] tg = {
      t[0] * g[0] + t[3] * g[1] + t[5] * g[2],
      t[3] * g[0] + t[1] * g[1] + t[4] * g[2],
      t[5] * g[0] + t[4] * g[1] + t[2] * g[2]
    };
    // exact calculus: for u = g · x, ∫ ∇u · T ∇u dV = V g · T g
    double expected = volume(CORNERS) * (g[0] * tg[0] + g[1] * tg[1] + g[2] * tg[2]);
    for (int order = 1; order <= 2; order++) {
      double[] x = nodes(order);
      int n = order == 1 ? 4 : 10;
      double[] u = new double[n];
      for (int i = 0; i < n; i++) {
        u[i] = 0.3 + g[0] * x[3 * i] + g[1] * x[3 * i + 1] + g[2] * x[3 * i + 2];
      }
      double[] k = new double[n * n];
      TetKernel.forOrder(order).stiffness(x, t, 0, k);
      assertEquals(expected, quadraticForm(k, u, u), 1e-13 * expected, "order " + order);
      // a constant field carries no flux: every row sums to zero (common practice)
      for (int i = 0; i < n; i++) {
        double row = 0;
        for (int j = 0; j < n; j++) {
          row += k[n * i + j];
        }
        assertEquals(0.0, row, 1e-13, "row " + i);
      }
    }
  }

  @Test
  void quadraticStiffnessIntegratesQuadraticFieldsExactly() {
    double[] x = withMidEdgeNodes(new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1});
    double[] ux2 = new double[10];
    double[] uxy = new double[10];
    for (int i = 0; i < 10; i++) {
      ux2[i] = x[3 * i] * x[3 * i];
      uxy[i] = x[3 * i] * x[3 * i + 1];
    }
    double[] k = new double[100];
    TetKernel.forOrder(2).stiffness(x, new double[] {3, 1, 1, 0, 0, 0}, 0, k);
    // exact calculus on the unit tet (∫ x^2 = 2!/5! = 1/60): u = x^2, ∫ 3 (2x)^2 = 12/60
    assertEquals(12.0 / 60, quadraticForm(k, ux2, ux2), 1e-14);
    // u = xy: ∫ 3 y^2 + x^2 = 4/60
    assertEquals(4.0 / 60, quadraticForm(k, uxy, uxy), 1e-14);
  }

  @Test
  void stiffnessIsSymmetric() {
    double[] t = {2.0, 0.7, 1.3, 0.2, -0.1, 0.3};
    for (int order = 1; order <= 2; order++) {
      int n = order == 1 ? 4 : 10;
      double[] k = new double[n * n];
      TetKernel.forOrder(order).stiffness(nodes(order), t, 0, k);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          assertEquals(k[n * i + j], k[n * j + i], 0.0);
        }
      }
    }
  }

  @Test
  void consistentMassMatchesExactBarycentricIntegrals() {
    double v = volume(CORNERS);
    for (int order = 1; order <= 2; order++) {
      int n = order == 1 ? 4 : 10;
      double[] m = new double[n * n];
      TetKernel kernel = TetKernel.forOrder(order);
      kernel.mass(nodes(order), m);
      assertEquals(v, kernel.volume(nodes(order)), 1e-15);
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          double exact =
              BaryPolynomial.shape(4, order, i)
                  .times(BaryPolynomial.shape(4, order, j))
                  .integrate(v);
          assertEquals(exact, m[n * i + j], 1e-15, "M" + i + "," + j);
        }
      }
    }
    // exact calculus, by hand: linear V/20 (1 + δij); quadratic corner V/70, mid-edge 32V/420
    double[] m1 = new double[16];
    TetKernel.forOrder(1).mass(CORNERS, m1);
    assertEquals(v / 10, m1[0], 1e-15);
    assertEquals(v / 20, m1[1], 1e-15);
    double[] m2 = new double[100];
    TetKernel.forOrder(2).mass(withMidEdgeNodes(CORNERS), m2);
    assertEquals(v / 70, m2[0], 1e-15);
    assertEquals(32 * v / 420, m2[44], 1e-15);
  }

  @Test
  void lumpedMassIsPositiveAndSumsToTheVolume() {
    double v = volume(CORNERS);
    double[] l1 = new double[4];
    TetKernel.forOrder(1).lumpedMass(CORNERS, l1);
    for (int i = 0; i < 4; i++) {
      // exact calculus: row sum of V/20 (1 + δij) is V/4
      assertEquals(v / 4, l1[i], 1e-15);
    }
    double[] l2 = new double[10];
    TetKernel.forOrder(2).lumpedMass(withMidEdgeNodes(CORNERS), l2);
    // Hinton, Rock & Zienkiewicz (1976) diagonal scaling of V/70 and 32V/420 to a total of V:
    // corners V/36, mid-edge nodes 4V/27 (exact calculus)
    for (int i = 0; i < 4; i++) {
      assertEquals(v / 36, l2[i], 1e-15);
    }
    for (int i = 4; i < 10; i++) {
      assertEquals(4 * v / 27, l2[i], 1e-15);
    }
  }

  @Test
  void loadVectorIsTheIntegralOfEachShapeFunction() {
    double v = volume(CORNERS);
    double[] f1 = new double[4];
    TetKernel.forOrder(1).load(CORNERS, f1);
    assertEquals(v / 4, f1[2], 1e-15); // exact calculus: ∫ L = V/4
    double[] f2 = new double[10];
    TetKernel.forOrder(2).load(withMidEdgeNodes(CORNERS), f2);
    for (int i = 0; i < 10; i++) {
      // exact calculus: ∫ L(2L − 1) = −V/20, ∫ 4 L_a L_b = V/5
      assertEquals(i < 4 ? -v / 20 : v / 5, f2[i], 1e-15, "node " + i);
    }
  }

  @Test
  void trianglesIntegrateMassAndLoadExactly() {
    double[] c = {0.1, 0.2, 0.3, 1.2, 0.1, 0.5, 0.4, 0.9, -0.2};
    double[] ab = {c[3] - c[0], c[4] - c[1], c[5] - c[2]};
    double[] ac = {c[6] - c[0], c[7] - c[1], c[8] - c[2]};
    double nx = ab[1] * ac[2] - ab[2] * ac[1];
    double ny = ab[2] * ac[0] - ab[0] * ac[2];
    double nz = ab[0] * ac[1] - ab[1] * ac[0];
    double area = 0.5 * Math.sqrt(nx * nx + ny * ny + nz * nz); // exact geometry
    double[] x6 = new double[18];
    System.arraycopy(c, 0, x6, 0, 9);
    int[][] edges = {{0, 1}, {1, 2}, {2, 0}};
    for (int e = 0; e < 3; e++) {
      for (int k = 0; k < 3; k++) {
        x6[3 * (3 + e) + k] = 0.5 * (c[3 * edges[e][0] + k] + c[3 * edges[e][1] + k]);
      }
    }
    for (int order = 1; order <= 2; order++) {
      int n = order == 1 ? 3 : 6;
      double[] x = order == 1 ? c : x6;
      TriangleKernel kernel = TriangleKernel.forOrder(order);
      assertEquals(area, kernel.area(x), 1e-15);
      double[] m = new double[n * n];
      double[] f = new double[n];
      kernel.mass(x, m);
      kernel.load(x, f);
      for (int i = 0; i < n; i++) {
        BaryPolynomial ni = BaryPolynomial.shape(3, order, i);
        // ∫ N_i dS = ∫ N_i (L0 + L1 + L2) dS, since the barycentric coordinates sum to one
        BaryPolynomial one =
            BaryPolynomial.shape(3, 1, 0)
                .plus(BaryPolynomial.shape(3, 1, 1))
                .plus(BaryPolynomial.shape(3, 1, 2));
        assertEquals(ni.times(one).integrate(area), f[i], 1e-15, "load " + i);
        for (int j = 0; j < n; j++) {
          double exact = ni.times(BaryPolynomial.shape(3, order, j)).integrate(area);
          assertEquals(exact, m[n * i + j], 1e-15, "mass " + i + "," + j);
        }
      }
      if (order == 2) {
        // exact calculus: ∫ L(2L − 1) dS = 0, ∫ 4 L_a L_b dS = A/3
        assertEquals(0.0, f[0], 1e-15);
        assertEquals(area / 3, f[4], 1e-15);
      }
    }
  }

  private static double quadraticForm(double[] k, double[] u, double[] v) {
    int n = u.length;
    double s = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        s += u[i] * k[n * i + j] * v[j];
      }
    }
    return s;
  }

  @Test
  void kernelsReportTheirNodeCount() {
    assertEquals(4, TetKernel.forOrder(1).nodeCount());
    assertEquals(10, TetKernel.forOrder(2).nodeCount());
    assertEquals(3, TriangleKernel.forOrder(1).nodeCount());
    assertEquals(6, TriangleKernel.forOrder(2).nodeCount());
    assertTrue(volume(CORNERS) > 0);
  }
}
