package dev.soakfield.fem.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The distributions a sweep samples from, against textbook values. */
class DistributionTest {
  /** The mean of the quantile function over (0, 1): E[X] = ∫ Q(p) dp (midpoint rule). */
  private static double mean(Distribution d, int n) {
    double s = 0;
    for (int i = 0; i < n; i++) {
      s += d.quantile((i + 0.5) / n);
    }
    return s / n;
  }

  @Test
  void normalQuantilesAreTheMeanPlusTableMultiplesOfTheSd() {
    // standard normal table: z(0.975) = 1.959964, z(0.8413) ≈ 1 (common practice)
    Distribution d = Distribution.normal(10, 2);
    assertEquals(10 + 2 * 1.959964, d.quantile(0.975), 1e-5);
    assertEquals(10, d.quantile(0.5), 1e-12);
    assertEquals(0.975, d.cumulative(10 + 2 * 1.959964), 1e-6);
  }

  /**
   * A log-normal value with mean m and sd s: σ² = ln(1 + s²/m²), μ = ln m − σ²/2 (Aitchison and
   * Brown, The Lognormal Distribution, 1957); its mean must come back as m, its median as e^μ.
   */
  @Test
  void logNormalFromMomentsHasThoseMoments() {
    double m = 3e-12;
    double s = 1e-12;
    Distribution d = Distribution.logNormalOfMoments(m, s);
    assertEquals(m, mean(d, 200_000), 1e-3 * m);
    double sigma2 = Math.log(1 + s * s / (m * m));
    assertEquals(Math.exp(Math.log(m) - sigma2 / 2), d.quantile(0.5), 1e-12 * m);
    // quantiles of tiny values keep full relative accuracy (a generic inverse would not)
    assertEquals(
        d.quantile(0.5) * Math.exp(Math.sqrt(sigma2) * 1.959964), d.quantile(0.975), 1e-5 * m);
  }

  @Test
  void uniformIsLinearBetweenItsEnds() {
    Distribution d = Distribution.uniform(2, 6);
    assertEquals(3, d.quantile(0.25), 1e-15);
    assertEquals(0.75, d.cumulative(5), 1e-15);
    assertEquals(0, d.cumulative(1));
    assertEquals(1, d.cumulative(7));
  }

  @Test
  void logNormalHasNoMassAtOrBelowZero() {
    assertEquals(0, Distribution.logNormal(0, 1, "x").cumulative(0));
    assertEquals(0.5, Distribution.normal(0, 1).cumulative(0), 1e-15);
  }
}
