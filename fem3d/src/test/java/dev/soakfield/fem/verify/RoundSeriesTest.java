package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;

/** The exact solutions the convergence studies hold the solver against, held against others. */
class RoundSeriesTest {
  @Test
  void besselSeriesMatchesAnotherImplementationAndTheTabulatedZeros() {
    // Commons Math's BesselJ, a different algorithm
    for (double x : new double[] {0, 0.3, 1, 2.5, 7, 15}) {
      assertEquals(BesselJ.value(0, x), RoundSeries.besselJ(0, x), 1e-10, "J0(" + x + ")");
      assertEquals(BesselJ.value(1, x), RoundSeries.besselJ(1, x), 1e-10, "J1(" + x + ")");
    }
    // the series' cancellation near its limit (terms weighted there by exp(−Dα²t) < 1e-10)
    assertEquals(BesselJ.value(0, 27), RoundSeries.besselJ(0, 27), 3e-6);
    // Abramowitz & Stegun (1964), table 9.5: zeros of J0 (from memory to 6 digits)
    double[] zeros = RoundSeries.besselZeros(3);
    assertEquals(2.404826, zeros[0], 1e-6);
    assertEquals(5.520078, zeros[1], 1e-6);
    assertEquals(8.653728, zeros[2], 1e-6);
    assertThrows(IllegalArgumentException.class, () -> RoundSeries.besselJ(0, 31));
  }

  @Test
  void sphereFieldIntegratesToCranksUptake() {
    // the field's mean over the ball against the uptake series, Crank (1975) eq. 6.20:
    // M_t/M_inf = 1 − (6/π²)·Σ exp(−n²π²τ)/n², a formula the field code does not use
    double tau = 0.1;
    TetMesh ball = TestMeshes.quadratic(TestMeshes.ball(1, 12, 3), 1, false);
    double mean =
        ErrorNorms.exactIntegral(ball, RoundSeries.sphere(1, 1, tau))
            / ErrorNorms.integral(ball, UniformModels.filled(ball.nodeCount(), 1), null);
    double sum = 0;
    for (int n = 1; n < 100; n++) {
      sum += Math.exp(-n * n * Math.PI * Math.PI * tau) / (n * n);
    }
    assertEquals(1 - 6 / (Math.PI * Math.PI) * sum, mean, 2e-4);
    // at the surface the field is the held value
    assertEquals(1.0, RoundSeries.sphere(1, 1, tau).value(0, 0.6, 0.8), 1e-12);
  }

  @Test
  void finiteCylinderIntegratesToTheProductOfTheUptakes() {
    // 1 − mean = (1 − M_cyl)(1 − M_sheet): Crank (1975) eq. 5.23, M/M_inf = 1 − Σ 4/(aα)²·
    // exp(−Dα²t), and eq. 4.18 for the sheet of thickness 2l
    double tau = 0.1;
    TetMesh cyl = TestMeshes.quadratic(TestMeshes.cylinder(1, 2, 6, 24, 12, 3), 1, true);
    double mean =
        ErrorNorms.exactIntegral(cyl, RoundSeries.finiteCylinder(1, 1, 1, tau))
            / ErrorNorms.integral(cyl, UniformModels.filled(cyl.nodeCount(), 1), null);
    double radial = 0;
    for (double z : RoundSeries.besselZeros(9)) {
      radial += 4 / (z * z) * Math.exp(-z * z * tau);
    }
    double axial = 0;
    for (int n = 0; n < 100; n++) {
      double k = (2 * n + 1) * Math.PI;
      axial += 8 / (k * k) * Math.exp(-k * k * tau / 4);
    }
    assertEquals(1 - radial * axial, mean, 2e-4);
    assertThrows(
        IllegalArgumentException.class,
        () -> RoundSeries.finiteCylinder(1, 1, 1, 0.01).value(0.5, 0, 1));
  }

  @Test
  void gradientsAreTheFieldsDerivatives() {
    ExactField[] fields = {
      RoundSeries.sphere(1, 1, 0.12), RoundSeries.finiteCylinder(1, 1, 1, 0.12)
    };
    double[][] points = {{0.2, -0.3, 0.4}, {0.5, 0.1, 1.3}, {1e-4, 0, 2e-4}, {0, 0, 0}};
    double h = 1e-6;
    for (ExactField f : fields) {
      for (double[] p : points) {
        double[] g = new double[3];
        f.gradient(p[0], p[1], p[2], g);
        for (int r = 0; r < 3; r++) {
          double[] a = p.clone();
          double[] b = p.clone();
          a[r] += h;
          b[r] -= h;
          double fd = (f.value(a[0], a[1], a[2]) - f.value(b[0], b[1], b[2])) / (2 * h);
          assertEquals(fd, g[r], 1e-6, "d/dx" + r + " at " + java.util.Arrays.toString(p));
        }
      }
    }
    // negative control: the derivative check tells a wrong gradient from the right one
    double[] g = new double[3];
    fields[0].gradient(0.2, -0.3, 0.4, g);
    assertTrue(Math.abs(g[0]) > 1e-3);
  }
}
