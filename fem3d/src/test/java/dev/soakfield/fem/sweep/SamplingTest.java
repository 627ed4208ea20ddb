package dev.soakfield.fem.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Latin hypercube sampling after McKay, Beckman and Conover (Technometrics 21, 1979): in every
 * dimension each of the n equal strata of (0, 1) holds exactly one of the n samples.
 */
class SamplingTest {
  /** True when every column puts exactly one sample into each of the n strata. */
  private static boolean stratified(double[][] u) {
    int n = u.length;
    for (int d = 0; d < u[0].length; d++) {
      boolean[] hit = new boolean[n];
      for (double[] row : u) {
        int s = (int) Math.floor(row[d] * n);
        if (s < 0 || s >= n || hit[s]) {
          return false;
        }
        hit[s] = true;
      }
    }
    return true;
  }

  @Test
  void latinHypercubePutsOneSampleInEveryStratumOfEveryDimension() {
    for (int n : new int[] {1, 2, 7, 50, 333}) {
      double[][] u = Sampling.LATIN_HYPERCUBE.probabilities(n, 3, 42);
      assertEquals(n, u.length);
      assertTrue(stratified(u), "n = " + n);
    }
  }

  /** Negative control: plain random sampling of 50 leaves strata empty and doubles others. */
  @Test
  void plainRandomSamplingIsNotStratified() {
    assertFalse(stratified(Sampling.RANDOM.probabilities(50, 3, 42)));
  }

  @Test
  void theSameSeedGivesTheSameProbabilitiesAndAnotherSeedOthers() {
    for (Sampling s : Sampling.values()) {
      double[][] a = s.probabilities(20, 2, 7);
      double[][] b = s.probabilities(20, 2, 7);
      double[][] c = s.probabilities(20, 2, 8);
      for (int i = 0; i < a.length; i++) {
        assertArrayEquals(a[i], b[i]);
        for (double v : a[i]) {
          assertTrue(v > 0 && v < 1);
        }
      }
      assertFalse(java.util.Arrays.equals(a[0], c[0]));
    }
  }

  /**
   * The columns of a Latin hypercube are shuffled independently: the correlation of two columns of
   * 2000 samples stays near 0 (its sd is 1/√n ≈ 0.022 for independent columns).
   */
  @Test
  void latinHypercubeColumnsAreUncorrelated() {
    double[][] u = Sampling.LATIN_HYPERCUBE.probabilities(2000, 2, 3);
    double sxy = 0;
    double sxx = 0;
    double syy = 0;
    for (double[] r : u) {
      sxy += (r[0] - 0.5) * (r[1] - 0.5);
      sxx += (r[0] - 0.5) * (r[0] - 0.5);
      syy += (r[1] - 0.5) * (r[1] - 0.5);
    }
    assertEquals(0, sxy / Math.sqrt(sxx * syy), 0.07);
  }
}
