package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The fits read the same diffusivity whatever the scale of the measured quantity, from 1e-15 to 1e3
 * in its unit, exact and with seeded noise; and a record without a transient is refused at every
 * scale, not fitted.
 *
 * <p>The synthetic data come from the published solutions, written out here and not taken from the
 * code under test:
 *
 * <ul>
 *   <li>exit flux of a membrane charged at its entry face from t = 0, exit face held at zero: the
 *       short-time (image-source) form that Devanathan and Stachurski (Proc. R. Soc. A 270 (1962)
 *       90) fitted to their rising transients, J/J_ss = (2/√(πτ))·Σ_{m≥0} exp(−(2m+1)²/(4τ)), τ =
 *       D·t/L², which converges at every τ &gt; 0 (the code under test switches to the Fourier
 *       series at τ = 0.05);
 *   <li>the amount that has come through, Crank, The Mathematics of Diffusion, 2nd ed., §4.3.2:
 *       Q/(L·C1) = τ − 1/6 − (2/π²)·Σ_{n≥1} ((−1)ⁿ/n²)·exp(−n²π²τ), whose asymptote Q → J_ss·(t −
 *       L²/(6D)) gives the time lag t_lag = L²/(6D) of ISO 17081's accumulated-amount evaluation;
 *       the generator is checked against it below, and the evaluations against both;
 *   <li>uptake of a plane sheet of thickness L from both faces, Crank eq. 4.18: M_t/M_∞ = 1 −
 *       Σ_{n≥0} 8/((2n+1)²π²)·exp(−(2n+1)²π²τ); desorption of a saturated sheet loses mass along
 *       the same curve (Crank §4.3).
 * </ul>
 *
 * <p>A 6.9e-9 mol/(m²·s) flux is a thick steel wall's: before the fit was made dimensionless it
 * failed with "do not determine both diffusivity and final level" while the same curve times 10
 * fitted.
 */
class FitScaleTest {
  private static final double L = 2e-3; // m
  private static final double D = 3e-11; // m²/s

  /**
   * Noise of the records that must give D to 1 %, as a fraction of the final level: 0.2 %, a
   * microbalance's or a potentiostat's scatter; the standard error of D is then 0.1 to 0.3 %, so 1
   * % is more than three of them whatever the seed. The scale test uses 1 %.
   */
  private static final double NOISE = 0.002;

  private static final String NOT_DETERMINED = "do not determine both diffusivity and final level";

  /** J/J_ss, Devanathan–Stachurski's image-source form, summed until the terms vanish. */
  static double publishedFluxRatio(double tau) {
    if (!(tau > 0)) {
      return 0;
    }
    double sum = 0;
    for (int m = 0; m < 100_000; m++) {
      double k = 2 * m + 1;
      double term = Math.exp(-k * k / (4 * tau));
      sum += term;
      if (term <= 1e-17 * sum) {
        break;
      }
    }
    return 2 / Math.sqrt(Math.PI * tau) * sum;
  }

  /** Q/(L·C1) of Crank §4.3.2 (the amount permeated; asymptote τ − 1/6). */
  static double publishedAmount(double tau) {
    double sum = 0;
    for (int n = 1; n < 10_000; n++) {
      double term = Math.exp(-n * n * Math.PI * Math.PI * tau) / (n * n);
      sum += (n % 2 == 0 ? 1 : -1) * term;
      if (term < 1e-18) {
        break;
      }
    }
    return tau - 1.0 / 6 - 2 / (Math.PI * Math.PI) * sum;
  }

  /** M_t/M_∞ of Crank eq. 4.18, summed until the terms vanish. */
  static double publishedUptake(double tau) {
    double sum = 0;
    for (int n = 0; n < 100_000; n++) {
      double k = (2 * n + 1) * Math.PI;
      double term = 8 / (k * k) * Math.exp(-k * k * tau);
      sum += term;
      if (term < 1e-18) {
        break;
      }
    }
    return 1 - sum;
  }

  /** A record at times t_i of scale·(shape(D·t/L²) + noise·N(0,1)), seeded. */
  private static double[][] record(
      DoubleUnaryOperator shape, double[] t, double scale, double noise, long seed) {
    Random rnd = new Random(seed);
    double[] y = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      y[i] = scale * (shape.applyAsDouble(D * t[i] / (L * L)) + noise * rnd.nextGaussian());
    }
    return new double[][] {t, y};
  }

  /** n times evenly spaced up to {@code tauEnd}·L²/D. */
  private static double[] even(int n, double tauEnd) {
    double[] t = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = tauEnd * L * L / D * (i + 1) / n;
    }
    return t;
  }

  /** n times evenly spaced in √t up to {@code tauEnd}·L²/D, as weighing plans usually are. */
  private static double[] evenInRootTime(int n, double tauEnd) {
    double[] t = new double[n];
    for (int i = 0; i < n; i++) {
      double r = (i + 1.0) / n;
      t[i] = r * r * tauEnd * L * L / D;
    }
    return t;
  }

  @Test
  void theGeneratorIsCranksPermeationSolution() {
    // ∫₀^τ J/J_ss dτ' (Simpson, 20 000 panels) equals Crank's amount Q/(L·C1): two published forms
    for (double tau : new double[] {0.1, 0.3, 1.0}) {
      int m = 20_000;
      double h = tau / m;
      double s = publishedFluxRatio(0) + publishedFluxRatio(tau);
      for (int i = 1; i < m; i++) {
        s += (i % 2 == 0 ? 2 : 4) * publishedFluxRatio(i * h);
      }
      assertEquals(publishedAmount(tau), s * h / 3, 1e-9, "at τ = " + tau);
    }
    // the time lag: Q → τ − 1/6, so the intercept on the time axis is L²/(6D)
    assertEquals(3 - 1.0 / 6, publishedAmount(3), 1e-12);
    // the code under test agrees with the published form on both sides of its switch
    for (double tau : new double[] {0.01, 0.049, 0.051, 0.2, 1}) {
      assertEquals(publishedFluxRatio(tau), PermeationTransient.fluxRatio(tau), 1e-12);
      assertEquals(publishedUptake(tau), PlaneSheetUptake.fraction(tau), 1e-12);
    }
  }

  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e-12, 6.9e-9, 1e-6, 1e3})
  void permeationFitRecoversTheDiffusivityAtAnyFluxScale(double jss) {
    double[][] exact = record(FitScaleTest::publishedFluxRatio, even(200, 1.5), jss, 0, 0);
    PermeationEvaluation.Result r = PermeationEvaluation.evaluate(exact[0], exact[1], L);
    assertEquals(D, r.fit().diffusivity().value(), 1e-6 * D);
    assertEquals(jss, r.fit().level().value(), 1e-6 * jss);
    assertEquals(jss * L / D, r.fittedSubsurfaceConcentration().value(), 1e-6 * jss * L / D);
    // ISO 17081 accumulated amount: intercept of Q(t) → J_ss·(t − L²/(6D)) (Crank §4.3.2)
    assertEquals(D, r.integratedDiffusivity().orElseThrow(), 0.01 * D);
    // breakthrough at J/J_ss = 0.1: D_b = L²/(15.3·t_b), the exact curve gives τ_b = 1/15.13
    assertEquals(D, r.breakthroughDiffusivity().orElseThrow(), 0.015 * D);
    // the 0.63 rule reads D/0.9786 on the exact curve (see PermeationEvaluation)
    assertEquals(0.9786 * D, r.effectiveDiffusivity().orElseThrow(), 0.005 * D);
    assertEquals(jss, r.steadyFlux(), 1e-3 * jss);

    double[][] noisy = record(FitScaleTest::publishedFluxRatio, even(60, 1.2), jss, NOISE, 3);
    PermeationEvaluation.Result n = PermeationEvaluation.evaluate(noisy[0], noisy[1], L);
    assertEquals(D, n.fit().diffusivity().value(), 0.01 * D);
    assertTrue(n.fit().diffusivity().covers(D), n.fit().diffusivity().toString());
    assertTrue(n.fit().level().covers(jss), n.fit().level().toString());
    assertTrue(
        n.fittedSubsurfaceConcentration().covers(jss * L / D),
        n.fittedSubsurfaceConcentration().toString());
    double width = n.fit().level().high() - n.fit().level().low();
    assertTrue(width > 0 && width < 0.02 * jss, n.fit().level().toString());
  }

  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e-12, 1e-9, 1e-5, 1e3})
  void uptakeFitRecoversTheDiffusivityAtAnyMassScale(double gain) {
    double[] t = evenInRootTime(30, 0.6);
    UptakeFit.Result exact =
        UptakeFit.fit(t, record(FitScaleTest::publishedUptake, t, gain, 0, 0)[1], L, 1);
    assertEquals(D, exact.diffusivity().value(), 1e-6 * D);
    assertEquals(gain, exact.level().value(), 1e-6 * gain);
    // Crank's half-time rule D = 0.049183·L²/t½ beside the fit
    assertEquals(D, exact.halfTimeDiffusivity().orElseThrow(), 0.01 * D);

    UptakeFit.Result r =
        UptakeFit.fit(t, record(FitScaleTest::publishedUptake, t, gain, NOISE, 11)[1], L, 1);
    assertEquals(D, r.diffusivity().value(), 0.01 * D);
    assertTrue(r.diffusivity().covers(D), r.diffusivity().toString());
    assertEquals(gain, r.level().value(), 0.01 * gain);
  }

  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e-12, 1e-9, 1e-5, 1e3})
  void desorptionFitRecoversTheDiffusivityAtAnyMassScale(double water) {
    // masses of a saturated plate drying out, dry mass a thousand times the water it holds; the
    // loss since drying began is what the weighing fit is given (as WeighingAnalysis does)
    double dry = 1e3 * water;
    double[] t = evenInRootTime(25, 0.6);
    double[] dimensionless = record(FitScaleTest::publishedUptake, t, 1, NOISE, 5)[1];
    double[] loss = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      double mass = dry + water * (1 - dimensionless[i]);
      loss[i] = (dry + water) - mass;
    }
    UptakeFit.Result r = UptakeFit.fit(t, loss, L, 1);
    assertEquals(D, r.diffusivity().value(), 0.01 * D);
    assertTrue(r.diffusivity().covers(D), r.diffusivity().toString());
    assertEquals(water, r.level().value(), 0.01 * water);
    // drying data read as uptake: a negative level at every scale, which the weighing command
    // turns into its --desorption hint, with the diffusivity unchanged
    double[] gain = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      gain[i] = -loss[i];
    }
    UptakeFit.Result wrongWay = UptakeFit.fit(t, gain, L, 1);
    assertEquals(-water, wrongWay.level().value(), 0.01 * water);
    assertEquals(r.diffusivity().value(), wrongWay.diffusivity().value(), 1e-9 * D);
  }

  /**
   * The fit sees only dimensionless numbers: the same curve at any scale gives the same D, the same
   * level relative to the scale and the same relative intervals, to round-off.
   */
  @Test
  void resultsRelativeToTheScaleDoNotDependOnIt() {
    double[] tp = even(60, 1.2);
    double[] tu = evenInRootTime(30, 0.6);
    PermeationEvaluation.Result p0 =
        PermeationEvaluation.evaluate(
            tp, record(FitScaleTest::publishedFluxRatio, tp, 1, 0.01, 3)[1], L);
    UptakeFit.Result u0 =
        UptakeFit.fit(tu, record(FitScaleTest::publishedUptake, tu, 1, 0.01, 11)[1], L, 1);
    for (double scale : new double[] {1e-15, 1e-12, 6.9e-9, 1e-6, 1e3}) {
      PermeationEvaluation.Result p =
          PermeationEvaluation.evaluate(
              tp, record(FitScaleTest::publishedFluxRatio, tp, scale, 0.01, 3)[1], L);
      sameRelative(p0.fit(), p.fit(), scale);
      assertEquals(
          p0.integratedDiffusivity().orElseThrow(),
          p.integratedDiffusivity().orElseThrow(),
          1e-9 * D);
      assertEquals(
          p0.breakthroughDiffusivity().orElseThrow(),
          p.breakthroughDiffusivity().orElseThrow(),
          1e-9 * D);
      UptakeFit.Result u =
          UptakeFit.fit(tu, record(FitScaleTest::publishedUptake, tu, scale, 0.01, 11)[1], L, 1);
      sameRelative(u0.fit(), u.fit(), scale);
    }
  }

  private static void sameRelative(ShapeFit.Result ref, ShapeFit.Result r, double scale) {
    String at = "at scale " + scale;
    assertEquals(ref.diffusivity().value(), r.diffusivity().value(), 1e-9 * D, at);
    assertEquals(ref.diffusivity().standardError(), r.diffusivity().standardError(), 1e-7 * D, at);
    assertEquals(ref.level().value(), r.level().value() / scale, 1e-9, at);
    assertEquals(ref.level().standardError(), r.level().standardError() / scale, 1e-9, at);
    assertEquals(ref.rmsResidual(), r.rmsResidual() / scale, 1e-9, at);
  }

  /** Negative control: a flat record has no transient, at any scale, and is refused with why. */
  @ParameterizedTest
  @ValueSource(doubles = {1e-15, 1e-12, 6.9e-9, 1e-6, 1e3})
  void aFlatRecordIsRefusedNotFitted(double level) {
    double[] t = even(40, 1.5);
    for (long seed = 0; seed < 6; seed++) {
      double noise = seed == 0 ? 0 : 0.01;
      double[] y = new double[t.length];
      Random rnd = new Random(seed);
      for (int i = 0; i < t.length; i++) {
        y[i] = level * (1 + noise * rnd.nextGaussian());
      }
      String at = "level " + level + ", seed " + seed;
      FitFailedException p =
          assertThrows(FitFailedException.class, () -> PermeationEvaluation.evaluate(t, y, L), at);
      assertTrue(p.getMessage().contains(NOT_DETERMINED), p.getMessage());
      FitFailedException u =
          assertThrows(FitFailedException.class, () -> UptakeFit.fit(t, y, L, 1), at);
      assertTrue(u.getMessage().contains(NOT_DETERMINED), u.getMessage());
    }
    // a noise-free flat line says why: it is at its final level from the first point on
    double[] flat = new double[t.length];
    java.util.Arrays.fill(flat, level);
    FitFailedException e =
        assertThrows(FitFailedException.class, () -> UptakeFit.fit(t, flat, L, 1));
    assertTrue(e.getMessage().contains("no transient"), e.getMessage());
  }

  @Test
  void aRecordOfZerosOrOfNoiseAloneIsRefused() {
    double[] t = even(40, 1.5);
    double[] zeros = new double[t.length];
    IllegalArgumentException u =
        assertThrows(IllegalArgumentException.class, () -> UptakeFit.fit(t, zeros, L, 1));
    assertTrue(u.getMessage().contains("no change"), u.getMessage());
    IllegalArgumentException p =
        assertThrows(
            IllegalArgumentException.class, () -> PermeationEvaluation.evaluate(t, zeros, L));
    assertTrue(p.getMessage().contains("does not rise"), p.getMessage());
    for (double scale : new double[] {1e-15, 1e3}) {
      for (long seed = 1; seed <= 5; seed++) {
        double[] y = record(tau -> 0, t, scale, 1, seed)[1];
        RuntimeException e = assertThrows(RuntimeException.class, () -> UptakeFit.fit(t, y, L, 1));
        assertTrue(e instanceof FitFailedException, e.toString());
        assertTrue(e.getMessage().contains(NOT_DETERMINED), e.getMessage());
        RuntimeException q =
            assertThrows(RuntimeException.class, () -> PermeationEvaluation.evaluate(t, y, L));
        assertTrue(
            q.getMessage().contains(NOT_DETERMINED) || q.getMessage().contains("does not rise"),
            q.getMessage());
      }
    }
  }

  /** A record that starts after the transient is over holds no information on D. */
  @Test
  void aRecordThatStartsOnThePlateauIsRefused() {
    double[] t = new double[20];
    for (int i = 0; i < t.length; i++) {
      t[i] = (3 + 0.2 * i) * L * L / D; // τ from 3 on: within 1e-12 of the plateau
    }
    for (double scale : new double[] {1e-15, 6.9e-9, 1e3}) {
      double[] y = record(FitScaleTest::publishedUptake, t, scale, 0, 0)[1];
      FitFailedException e =
          assertThrows(FitFailedException.class, () -> UptakeFit.fit(t, y, L, 1));
      assertTrue(e.getMessage().contains("no transient"), e.getMessage());
      double[] j = record(FitScaleTest::publishedFluxRatio, t, scale, 0, 0)[1];
      FitFailedException f =
          assertThrows(FitFailedException.class, () -> PermeationEvaluation.evaluate(t, j, L));
      assertTrue(f.getMessage().contains(NOT_DETERMINED), f.getMessage());
    }
  }
}
