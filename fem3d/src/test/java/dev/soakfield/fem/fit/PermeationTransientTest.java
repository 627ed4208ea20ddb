package dev.soakfield.fem.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Crank, The Mathematics of Diffusion, 2nd ed., §4.3.2 (membrane, exit face held at zero). */
class PermeationTransientTest {
  @Test
  void seriesAndShortTimeFormsAgree() {
    double limit = PermeationTransient.SHORT_TIME_LIMIT;
    double below = PermeationTransient.fluxRatio(limit * (1 - 1e-12));
    double above = PermeationTransient.fluxRatio(limit);
    assertEquals(above, below, 1e-12);
    double sBelow = PermeationTransient.slope(limit * (1 - 1e-12));
    double sAbove = PermeationTransient.slope(limit);
    assertEquals(sAbove, sBelow, 1e-9 * sAbove);
  }

  @Test
  void slopeIsTheDerivativeOfTheFluxRatio() {
    for (double tau : new double[] {0.01, 0.04, 0.08, 0.2, 0.6}) {
      double h = tau * 1e-6;
      double fd =
          (PermeationTransient.fluxRatio(tau + h) - PermeationTransient.fluxRatio(tau - h))
              / (2 * h);
      assertEquals(fd, PermeationTransient.slope(tau), 1e-6 * Math.abs(fd) + 1e-12);
    }
  }

  @Test
  void breakthroughConstantOfTheStandards() {
    // D = L²/(15.3·t_b) with t_b the time at J/J_ss = 0.1 (ISO 17081 / ASTM G148, from memory):
    // the exact transient reaches 0.1 at D·t/L² = 1/15.13, within the rounding of the standards
    assertEquals(15.3, 1 / PermeationTransient.tauAtRatio(0.1), 0.2);
  }

  @Test
  void fluxAtTheTimeLag() {
    // at t = L²/(6D), the first terms 1 − 2·exp(−π²/6) + 2·exp(−4π²/6) give 0.61673
    assertEquals(0.61673, PermeationTransient.fluxRatio(1.0 / 6), 1e-5);
    assertEquals(1.0, PermeationTransient.fluxRatio(10), 1e-15);
  }
}
