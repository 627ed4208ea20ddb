package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Synthetic diffusivities from D = D0·exp(−Q/(R·T)) with seeded 5 % log-normal scatter. */
class ArrheniusFitTest {
  static final double D0 = 4.7e-6;
  static final double Q = 42e3;

  @Test
  void recoversD0AndQWithinTheIntervals() {
    Random rnd = new Random(11);
    double[] t = {298.15, 313.15, 328.15, 343.15, 358.15, 373.15};
    double[] d = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      d[i] =
          D0
              * Math.exp(-Q / (ArrheniusFit.GAS_CONSTANT * t[i]))
              * Math.exp(0.05 * rnd.nextGaussian());
    }
    ArrheniusFit.Result r = ArrheniusFit.fit(t, d);
    assertTrue(r.d0().covers(D0), r.d0().toString());
    assertTrue(r.activationEnergy().covers(Q), r.activationEnergy().toString());
    assertTrue(r.d0().low() > 0 && r.d0().low() < r.d0().value());
    assertEquals(6, r.lnResiduals().size());
  }

  @Test
  void exactDataGiveTheLawBack() {
    double[] t = {300, 350, 400};
    double[] d = new double[3];
    for (int i = 0; i < 3; i++) {
      d[i] = D0 * Math.exp(-Q / (ArrheniusFit.GAS_CONSTANT * t[i]));
    }
    ArrheniusFit.Result r = ArrheniusFit.fit(t, d);
    assertEquals(Q, r.activationEnergy().value(), 1e-6 * Q);
    assertEquals(D0, r.d0().value(), 1e-6 * D0);
    assertEquals(d[1], r.diffusivityAt(350), 1e-9 * d[1]);
  }

  @Test
  void refusesTooFewPointsAndNonPositiveValues() {
    assertThrows(
        IllegalArgumentException.class,
        () -> ArrheniusFit.fit(new double[] {300, 310}, new double[] {1e-12, 2e-12}));
    assertThrows(
        IllegalArgumentException.class,
        () -> ArrheniusFit.fit(new double[] {300, 310, 320}, new double[] {1e-12, 0, 2e-12}));
  }
}
