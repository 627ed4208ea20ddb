package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Transients from Crank's membrane solution (§4.3.2), exact or with seeded noise. */
class PermeationEvaluationTest {
  static final double L = 1e-3;
  static final double D = 6e-11;
  static final double JSS = 2e-6; // mol/(m²·s)

  static double[][] exitFlux(int n, double noise, long seed) {
    Random rnd = new Random(seed);
    double[] t = new double[n];
    double[] j = new double[n];
    double tEnd = 1.5 * L * L / D;
    for (int i = 0; i < n; i++) {
      t[i] = tEnd * (i + 1) / n;
      j[i] = JSS * PermeationTransient.fluxRatio(D * t[i] / (L * L)) + noise * rnd.nextGaussian();
    }
    return new double[][] {t, j};
  }

  @Test
  void timeLagRelationHoldsOnTheExactTransient() {
    double[][] d = exitFlux(3000, 0, 0);
    PermeationEvaluation.Result r = PermeationEvaluation.evaluate(d[0], d[1], L);
    // accumulated amount → J_ss·(t − L²/(6D)) (Crank eq. 4.24a)
    assertEquals(D, r.integratedDiffusivity().orElseThrow(), 2e-3 * D);
    // the 0.63 rule of ISO 17081 reads D/0.9786 on the exact transient (see PermeationEvaluation)
    assertEquals(0.9786 * D, r.effectiveDiffusivity().orElseThrow(), 2e-3 * D);
    // J/J_ss = 0.1 at τ = 1/15.13, so the standards' L²/(15.3·t_b) reads D about 1.1 % low
    assertEquals(D, r.breakthroughDiffusivity().orElseThrow(), 1.5e-2 * D);
    assertTrue(r.breakthroughDiffusivity().orElseThrow() < D);
    assertEquals(JSS, r.steadyFlux(), 1e-4 * JSS);
    assertEquals(D, r.fit().diffusivity().value(), 1e-8 * D);
    assertEquals(JSS * L / D, r.fittedSubsurfaceConcentration().value(), 1e-6 * JSS * L / D);
  }

  @Test
  void noisyTransientIsRecoveredWithinTheIntervals() {
    double[][] d = exitFlux(80, 0.01 * JSS, 5);
    PermeationEvaluation.Result r = PermeationEvaluation.evaluate(d[0], d[1], L);
    assertTrue(r.fit().diffusivity().covers(D), r.fit().diffusivity().toString());
    assertTrue(r.fit().level().covers(JSS), r.fit().level().toString());
    assertTrue(
        r.fittedSubsurfaceConcentration().covers(JSS * L / D),
        r.fittedSubsurfaceConcentration().toString());
    assertEquals(D, r.effectiveDiffusivity().orElseThrow(), 0.1 * D);
  }
}
