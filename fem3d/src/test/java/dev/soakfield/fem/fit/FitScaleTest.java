package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The fits read the same diffusivity whatever the scale of the measured quantity: a permeation
 * transient (Crank, The Mathematics of Diffusion, 2nd ed., §4.3.2: J/J_ss as in {@link
 * PermeationTransient}) and a weighing curve (Crank eq. 4.18) at levels from 1e-15 to 1e3, exact
 * and with 1 % seeded noise. A 6.9e-9 mol/(m²·s) flux is a thick steel wall's (the case that failed
 * before the fit was made dimensionless).
 */
class FitScaleTest {
  private static final double L = 2e-3;
  private static final double D = 3e-11;

  private static double[][] permeation(double jss, double noise, long seed) {
    Random rnd = new Random(seed);
    int n = 60;
    double[] t = new double[n];
    double[] j = new double[n];
    double tEnd = 1.2 * L * L / D;
    for (int i = 0; i < n; i++) {
      t[i] = tEnd * (i + 1) / n;
      j[i] = jss * (PermeationTransient.fluxRatio(D * t[i] / (L * L)) + noise * rnd.nextGaussian());
    }
    return new double[][] {t, j};
  }

  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e-12, 6.9e-9, 1e-6, 1e3})
  void permeationFitsRecoverTheDiffusivityAtAnyFluxScale(double jss) {
    PermeationEvaluation.Result exact =
        PermeationEvaluation.evaluate(permeation(jss, 0, 1)[0], permeation(jss, 0, 1)[1], L);
    assertEquals(D, exact.fit().diffusivity().value(), 1e-6 * D);
    assertEquals(jss, exact.fit().level().value(), 1e-6 * jss);
    double[][] noisy = permeation(jss, 0.01, 3);
    PermeationEvaluation.Result r = PermeationEvaluation.evaluate(noisy[0], noisy[1], L);
    assertEquals(D, r.fit().diffusivity().value(), 0.01 * D);
    assertTrue(r.fit().diffusivity().covers(D), r.fit().diffusivity().toString());
    // the intervals scale with the data: the relative width does not depend on the flux scale
    double width = r.fit().level().high() - r.fit().level().low();
    assertTrue(width > 0 && width < 0.02 * jss, r.fit().level().toString());
  }

  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e-12, 1e-9, 1e-5, 1e3})
  void weighingFitsRecoverTheDiffusivityAtAnyMassScale(double gain) {
    Random rnd = new Random(11);
    int n = 30;
    double[] t = new double[n];
    double[] y = new double[n];
    for (int i = 0; i < n; i++) {
      double r = (i + 1.0) / n;
      t[i] = r * r * 0.6 * L * L / D;
      y[i] = gain * (PlaneSheetUptake.fraction(D * t[i] / (L * L)) + 0.01 * rnd.nextGaussian());
    }
    UptakeFit.Result r = UptakeFit.fit(t, y, L, 1);
    assertEquals(D, r.diffusivity().value(), 0.01 * D);
    assertEquals(gain, r.level().value(), 0.01 * gain);
  }

  /** Negative control: a flat record has no transient, at any scale, and says so. */
  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e3})
  void aFlatRecordIsRefusedNotFitted(double level) {
    double[] t = new double[20];
    double[] y = new double[20];
    for (int i = 0; i < t.length; i++) {
      t[i] = 100.0 * (i + 1);
      y[i] = 0;
    }
    assertThrows(IllegalArgumentException.class, () -> UptakeFit.fit(t, y, L, 1));
    java.util.Arrays.fill(y, level);
    RuntimeException e =
        assertThrows(RuntimeException.class, () -> PermeationEvaluation.evaluate(t, y, L));
    assertTrue(
        e instanceof FitFailedException || e instanceof IllegalArgumentException, e.toString());
  }
}
