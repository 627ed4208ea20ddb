package dev.soakfield.fem.tds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Peaks of a desorption curve: two separate ones, a shoulder that is none, and the edges. */
class TdsPeaksTest {
  private static double[] temperatures(int n) {
    double[] t = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = 300 + 0.5 * i;
    }
    return t;
  }

  /** Gaussian bumps (height, centre, width) summed: peaks at the centres when well apart. */
  private static double[] bumps(double[] t, double... hcw) {
    double[] r = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      for (int k = 0; k < hcw.length; k += 3) {
        double z = (t[i] - hcw[k + 1]) / hcw[k + 2];
        r[i] += hcw[k] * Math.exp(-0.5 * z * z);
      }
    }
    return r;
  }

  @Test
  void twoSeparatePeaksAreFoundAtTheirCentres() {
    double[] t = temperatures(1000);
    List<TdsPeaks.Peak> p = TdsPeaks.find(t, bumps(t, 1.0, 400.3, 12, 0.4, 620.1, 15), 0);
    assertEquals(2, p.size(), p.toString());
    // the parabola's vertex lies well within a step (0.5 K) of a Gaussian's centre
    assertEquals(400.3, p.get(0).temperature(), 0.05);
    assertEquals(620.1, p.get(1).temperature(), 0.05);
    assertEquals(1.0, TdsPeaks.highest(p).rate(), 1e-3);
  }

  @Test
  void smallWigglesAndTinyBumpsAreNoPeaks() {
    double[] t = temperatures(1000);
    double[] r = bumps(t, 1.0, 450, 20, 0.01, 650, 5);
    // a ripple of 0.5 % on the flank is no peak of its own
    for (int i = 0; i < r.length; i++) {
      r[i] *= 1 + 0.005 * Math.sin(i);
    }
    List<TdsPeaks.Peak> p = TdsPeaks.find(t, r, 0);
    assertEquals(1, p.size(), p.toString());
    // the ripple moves the top by up to w·√(2·0.005) = 2 K on a bump of width w = 20 K
    assertEquals(450, p.get(0).temperature(), 2.0);
    assertTrue(TdsPeaks.find(t, new double[t.length], 0).isEmpty());
  }
}
