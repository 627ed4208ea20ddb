package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Crank, The Mathematics of Diffusion, 2nd ed., §4.3, eqs. 4.18 and 4.20. */
class PlaneSheetUptakeTest {
  @Test
  void halfTimeConstantIsTheRootOfTheSeries() {
    // D·t½/L² = 0.049183 for a sheet of thickness L exposed on both faces (root of eq. 4.18)
    assertEquals(0.049183, PlaneSheetUptake.halfTimeConstant(), 5e-7);
    assertEquals(0.5, PlaneSheetUptake.seriesFraction(PlaneSheetUptake.halfTimeConstant()), 1e-14);
    // Crank's two-term estimate in §4.3, 0.04919, agrees to its four figures
    assertEquals(0.04919, PlaneSheetUptake.halfTimeConstant(), 1e-5);
  }

  @Test
  void seriesAndShortTimeFormsAgree() {
    // eqs. 4.18 and 4.20 are two expansions of the same solution
    for (double tau : new double[] {0.005, 0.02, 0.05, 0.1, 0.3}) {
      assertEquals(
          PlaneSheetUptake.seriesFraction(tau), PlaneSheetUptake.shortTimeFraction(tau), 1e-13);
      assertEquals(
          PlaneSheetUptake.seriesSlope(tau),
          PlaneSheetUptake.shortTimeSlope(tau),
          1e-11 * PlaneSheetUptake.seriesSlope(tau));
    }
  }

  @Test
  void earlyUptakeGrowsWithTheSquareRootOfTime() {
    // Crank eq. 4.20 without its ierfc terms: M_t/M_∞ = 4·√(τ/π) while τ is small
    double tau = 1e-4;
    assertEquals(4 * Math.sqrt(tau / Math.PI), PlaneSheetUptake.fraction(tau), 1e-15);
    assertEquals(1.0, PlaneSheetUptake.fraction(5), 1e-15);
    assertEquals(0.0, PlaneSheetUptake.fraction(0));
  }

  @Test
  void slopeIsTheDerivativeOfTheFraction() {
    for (double tau : new double[] {1e-3, 0.03, 0.049, 0.051, 0.2, 1}) {
      double h = tau * 1e-6;
      double fd =
          (PlaneSheetUptake.fraction(tau + h) - PlaneSheetUptake.fraction(tau - h)) / (2 * h);
      assertEquals(fd, PlaneSheetUptake.slope(tau), 1e-6 * Math.abs(fd) + 1e-12);
    }
  }

  @Test
  void edgeFactorOfShenAndSpringer() {
    // (1 + L/a + L/b)² with L = 1 mm, a = b = 50 mm: 1.04² = 1.0816
    assertEquals(1.0816, PlaneSheetUptake.edgeFactor(1e-3, 50e-3, 50e-3), 1e-12);
  }
}
