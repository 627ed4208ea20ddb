package dev.soakfield.fem.post;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The time-error estimate on one decaying mode u' = −λu, whose discrete solutions are known in
 * closed form: backward Euler u_n = (1 + λdt)^(−n), Crank–Nicolson u_n = ((1 − λdt/2)/(1 +
 * λdt/2))^n (amplification factors of the θ scheme; common practice). Their errors against e^(−λt)
 * are the truth the estimate must come near.
 */
class TimeErrorTrackTest {
  private static double[] run(double lambda, double dt, int steps, int backwardSteps) {
    TimeErrorTrack track = new TimeErrorTrack(1);
    double u = 1;
    track.start(0, new double[] {u});
    for (int k = 0; k < steps; k++) {
      boolean be = k < backwardSteps;
      double g = be ? 1 / (1 + lambda * dt) : (1 - lambda * dt / 2) / (1 + lambda * dt / 2);
      u *= g;
      track.step((k + 1) * dt, dt, be ? 1.0 : 0.5, new double[] {u});
    }
    double exact = Math.exp(-lambda * steps * dt);
    return new double[] {track.estimates()[0], Math.abs(u - exact)};
  }

  @Test
  void backwardEulerErrorOfOneModeIsFoundCloserAsStepsShorten() {
    // the estimate is the leading term: 23 % high at λdt = 0.2, within a few % at 0.0125
    double[] allowed = {0.3, 0.1, 0.03};
    int[] counts = {10, 40, 160};
    for (int i = 0; i < counts.length; i++) {
      double[] r = run(1, 2.0 / counts[i], counts[i], counts[i]);
      assertEquals(1, r[0] / r[1], allowed[i], counts[i] + " steps: " + r[0] + " vs " + r[1]);
    }
  }

  @Test
  void crankNicolsonWithADampedStartIsFoundWithinAFactorOfTwo() {
    for (int steps : new int[] {10, 40, 160}) {
      double[] r = run(1, 2.0 / steps, steps, 2);
      double ratio = r[0] / r[1];
      assertTrue(ratio > 0.5 && ratio < 2, steps + " steps: ratio " + ratio);
    }
  }

  @Test
  void aStateSavedAndRestoredGivesTheSameEstimates() {
    TimeErrorTrack a = new TimeErrorTrack(2);
    a.start(0, new double[] {0, 1});
    for (int k = 1; k <= 5; k++) {
      a.step(k * 0.1, 0.1, k < 3 ? 1.0 : 0.5, new double[] {Math.sqrt(k), Math.exp(-k)});
    }
    TimeErrorTrack b = new TimeErrorTrack(2);
    b.restore(a.snapshot());
    assertArrayEquals(a.estimates(), b.estimates(), 0);
    assertEquals(a.rate(0), b.rate(0), 0);
    // negative control: before three values there is no estimate
    TimeErrorTrack c = new TimeErrorTrack(1);
    c.start(0, new double[] {1});
    c.step(1, 1, 1.0, new double[] {0.5});
    assertTrue(Double.isNaN(c.estimates()[0]));
    assertTrue(Double.isNaN(c.secondDerivative(0)));
  }
}
