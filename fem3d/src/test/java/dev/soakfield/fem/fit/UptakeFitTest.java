package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Synthetic weighing data from Crank's plane-sheet solution (eq. 4.18) with known parameters and
 * seeded Gaussian noise: the fit must recover them within its 95 % intervals.
 */
class UptakeFitTest {
  static final double L = 1e-3;
  static final double D = 2.5e-13;
  static final double GAIN = 12e-6; // kg

  static double[][] data(long seed, double noise, double edgeFactor) {
    Random rnd = new Random(seed);
    int n = 30;
    double[] t = new double[n];
    double[] y = new double[n];
    double tEnd = 0.6 * L * L / D; // M_t/M_∞ ≈ 0.99
    for (int i = 0; i < n; i++) {
      double r = (i + 1.0) / n;
      t[i] = r * r * tEnd; // evenly spaced in √t, as weighing plans usually are
      y[i] = GAIN * PlaneSheetUptake.fraction(D * edgeFactor * t[i] / (L * L));
      y[i] += noise * rnd.nextGaussian();
    }
    return new double[][] {t, y};
  }

  @Test
  void recoversDiffusivityAndSaturationWithinTheIntervals() {
    double[][] d = data(42, 0.05e-6, 1);
    UptakeFit.Result r = UptakeFit.fit(d[0], d[1], L, 1);
    assertTrue(r.diffusivity().covers(D), r.diffusivity().toString());
    assertTrue(r.level().covers(GAIN), r.level().toString());
    assertTrue(r.diffusivity().high() - r.diffusivity().low() < 0.1 * D);
    assertEquals(30, r.fit().residuals().size());
    assertEquals(28, r.fit().degreesOfFreedom());
    // the half-time estimate sits beside the fit; with this noise it agrees to a few percent
    assertEquals(D, r.halfTimeDiffusivity().orElseThrow(), 0.05 * D);
  }

  @Test
  void intervalsCoverTheTrueValuesAboutNineteenTimesInTwenty() {
    int covered = 0;
    int runs = 40;
    for (int seed = 0; seed < runs; seed++) {
      double[][] d = data(1000 + seed, 0.1e-6, 1);
      if (UptakeFit.fit(d[0], d[1], L, 1).diffusivity().covers(D)) {
        covered++;
      }
    }
    // binomial(40, 0.95): fewer than 34 covered has probability below 0.2 % (common practice)
    assertTrue(covered >= 34 && covered <= 40, covered + " of " + runs);
  }

  @Test
  void edgeCorrectionGivesTheTrueDiffusivity() {
    double k = PlaneSheetUptake.edgeFactor(L, 20e-3, 30e-3);
    double[][] d = data(7, 0.05e-6, k);
    UptakeFit.Result corrected = UptakeFit.fit(d[0], d[1], L, k);
    UptakeFit.Result plain = UptakeFit.fit(d[0], d[1], L, 1);
    assertTrue(corrected.diffusivity().covers(D), corrected.diffusivity().toString());
    assertEquals(k, plain.diffusivity().value() / corrected.diffusivity().value(), 1e-6);
  }

  @Test
  void exactDataGiveTheExactHalfTime() {
    double[][] d = data(0, 0, 1);
    UptakeFit.Result r = UptakeFit.fit(d[0], d[1], L, 1);
    assertEquals(D, r.diffusivity().value(), 1e-9 * D);
    assertEquals(GAIN, r.level().value(), 1e-9 * GAIN);
    assertEquals(GAIN * 0.5, r.model(PlaneSheetUptake.halfTimeConstant() * L * L / D), 1e-12);
  }

  @Test
  void refusesTooFewPointsAndTimesOutOfOrder() {
    assertThrows(
        IllegalArgumentException.class,
        () -> UptakeFit.fit(new double[] {1, 2, 3}, new double[] {1, 2, 3}, L, 1));
    assertThrows(
        IllegalArgumentException.class,
        () -> UptakeFit.fit(new double[] {1, 3, 2, 4}, new double[] {1, 2, 3, 4}, L, 1));
  }
}
