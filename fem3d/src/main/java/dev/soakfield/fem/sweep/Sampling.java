package dev.soakfield.fem.sweep;

import java.util.Locale;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;

/**
 * How a sweep draws its samples: probabilities in (0, 1), one row per sample and one column per
 * distribution, from a seeded generator (Well19937c, the same numbers on every machine).
 */
public enum Sampling {
  /** Independent uniform probabilities. */
  RANDOM("random"),
  /**
   * Latin hypercube: each column puts exactly one sample into each of n equal strata of (0, 1), in
   * a random order and at a random place inside its stratum (McKay, Beckman and Conover,
   * Technometrics 21 (1979)).
   */
  LATIN_HYPERCUBE("latin-hypercube");

  private final String word;

  Sampling(String word) {
    this.word = word;
  }

  public String word() {
    return word;
  }

  /** The sampling spelled {@code word}, or null. */
  static Sampling of(String word) {
    for (Sampling s : values()) {
      if (s.word.equals(word.toLowerCase(Locale.ROOT))) {
        return s;
      }
    }
    return null;
  }

  /** {@code samples} rows of {@code dimensions} probabilities, each strictly inside (0, 1). */
  public double[][] probabilities(int samples, int dimensions, long seed) {
    RandomGenerator rng = new Well19937c(seed);
    double[][] u = new double[samples][dimensions];
    if (this == RANDOM) {
      for (int s = 0; s < samples; s++) {
        for (int d = 0; d < dimensions; d++) {
          u[s][d] = open(rng);
        }
      }
      return u;
    }
    for (int d = 0; d < dimensions; d++) {
      int[] stratum = new int[samples];
      for (int s = 0; s < samples; s++) {
        stratum[s] = s;
      }
      for (int s = samples - 1; s > 0; s--) { // Fisher–Yates shuffle
        int k = rng.nextInt(s + 1);
        int t = stratum[s];
        stratum[s] = stratum[k];
        stratum[k] = t;
      }
      for (int s = 0; s < samples; s++) {
        u[s][d] = (stratum[s] + open(rng)) / samples;
      }
    }
    return u;
  }

  /** A uniform number strictly inside (0, 1): the quantile of 0 is infinite for some laws. */
  private static double open(RandomGenerator rng) {
    double v;
    do {
      v = rng.nextDouble();
    } while (v <= 0);
    return v;
  }
}
