package dev.soakfield.fem.element;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The straight-edge shortcut against the isoparametric path, and the latter on a curved tet. */
class QuadraticTetPathsTest {
  private static final double[] T = {2.0, 0.7, 1.3, 0.2, -0.1, 0.3};

  @Test
  void shortcutAndIsoparametricPathAgreeOnAStraightTetrahedron() {
    double[] x =
        TetKernelTest.withMidEdgeNodes(
            new double[] {0.1, 0.0, 0.05, 1.3, 0.2, 0.1, 0.3, 1.1, 0.2, 0.2, 0.4, 0.9});
    QuadraticTetKernel fast = new QuadraticTetKernel(true);
    QuadraticTetKernel iso = new QuadraticTetKernel(false);
    double[] a = new double[100];
    double[] b = new double[100];
    fast.stiffness(x, T, 0, a);
    iso.stiffness(x, T, 0, b);
    assertClose(a, b, 1e-14);
    fast.mass(x, a);
    iso.mass(x, b);
    assertClose(a, b, 1e-14);
    double[] c = new double[10];
    double[] d = new double[10];
    fast.lumpedMass(x, c);
    iso.lumpedMass(x, d);
    assertClose(c, d, 1e-14);
    fast.load(x, c);
    iso.load(x, d);
    assertClose(c, d, 1e-14);
  }

  @Test
  void curvedTetrahedronHasTheExactVolumeAndReproducesLinearFields() {
    // unit tetrahedron with mid-edge node 4 (edge 0-1, on the x axis) pushed out by 0.1 in −y
    double[] x = TetKernelTest.withMidEdgeNodes(new double[] {0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1});
    x[13] = -0.1;
    // exact calculus: x(ξ) = ξ + N4(ξ) δ, det J = 1 + ∇ξN4 · δ (matrix determinant lemma);
    // ∫ ∇ξN4 dξ = (0, −1/6, −1/6), so V = 1/6 + 0.1/6
    double volume = 1.1 / 6;
    TetKernel kernel = TetKernel.forOrder(2);
    assertEquals(volume, kernel.volume(x), 1e-15);
    double[] m = new double[100];
    kernel.mass(x, m);
    double total = 0;
    for (double v : m) {
      total += v;
    }
    assertEquals(volume, total, 1e-15);
    double[] lumped = new double[10];
    kernel.lumpedMass(x, lumped);
    double lumpedTotal = 0;
    for (double v : lumped) {
      assertTrue(v > 0);
      lumpedTotal += v;
    }
    assertEquals(volume, lumpedTotal, 1e-15);
    double[] f = new double[10];
    kernel.load(x, f);
    double loadTotal = 0;
    for (double v : f) {
      loadTotal += v;
    }
    assertEquals(volume, loadTotal, 1e-15);
    // isoparametric elements reproduce u = g · x exactly, so uᵀKu = V g · T g (exact calculus;
    // det J is linear here and the degree-2 rule integrates it exactly)
    double[] g = {0.4, -1.1, 0.8};
    double[] u = new double[10];
    for (int i = 0; i < 10; i++) {
      u[i] = g[0] * x[3 * i] + g[1] * x[3 * i + 1] + g[2] * x[3 * i + 2];
    }
    double[] k = new double[100];
    kernel.stiffness(x, T, 0, k);
    double tgx = T[0] * g[0] + T[3] * g[1] + T[5] * g[2];
    double tgy = T[3] * g[0] + T[1] * g[1] + T[4] * g[2];
    double tgz = T[5] * g[0] + T[4] * g[1] + T[2] * g[2];
    double expected = volume * (g[0] * tgx + g[1] * tgy + g[2] * tgz);
    double energy = 0;
    for (int i = 0; i < 10; i++) {
      double row = 0;
      for (int j = 0; j < 10; j++) {
        energy += u[i] * k[10 * i + j] * u[j];
        row += k[10 * i + j];
      }
      assertEquals(0.0, row, 1e-14);
    }
    assertEquals(expected, energy, 1e-14 * expected);
  }

  private static void assertClose(double[] a, double[] b, double rel) {
    double scale = 0;
    for (double v : b) {
      scale = Math.max(scale, Math.abs(v));
    }
    for (int k = 0; k < a.length; k++) {
      assertEquals(b[k], a[k], rel * scale, "entry " + k);
    }
  }
}
