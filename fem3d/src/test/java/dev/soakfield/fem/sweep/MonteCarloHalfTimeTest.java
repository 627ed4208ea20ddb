package dev.soakfield.fem.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.distribution.LogNormalDistribution;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A Monte Carlo sweep over D on Crank's plane sheet. Crank, The Mathematics of Diffusion (2nd ed.,
 * 1975), eq. 4.18: the sheet of thickness L with both faces held takes up half its final amount at
 * t½ = 0.049183·L²/D. With ln D normal (mean μ, sd σ), ln t½ = ln(0.049183·L²) − ln D is normal
 * with mean ln(0.049183·L²) − μ and the same σ: t½ is log-normal. The sampled half-times must
 * follow that distribution within sampling error (Kolmogorov–Smirnov test; quantiles within their
 * standard errors).
 */
class MonteCarloHalfTimeTest {
  /** Crank eq. 4.18: Dt/L² at M_t/M_∞ = 0.5 for a sheet exposed on both faces. */
  private static final double CRANK_HALF = 0.049183;

  private static final double MEDIAN_D = 1e-10;
  private static final double GSD = 1.3;
  private static final int SAMPLES = 200;

  @TempDir Path dir;

  @Test
  void sampledHalfTimesFollowTheDistributionImpliedByCrank() throws Exception {
    SheetSweep.writeCase(
        dir,
        50,
        """
        { "end": 4000, "scheme": "crank-nicolson", "tolerance": 1e-3,
          "stop": { "probe": "centre", "above": 0.3 } }""");
    Path sweep =
        SheetSweep.writeSweep(
            dir,
            """
            { "base": "sheet.json",
              "vary": { "materials.body.diffusivity":
                          { "distribution": "log-normal", "median": %s, "gsd": %s } },
              "samples": %d, "seed": 16, "sampling": "random" }
            """
                .formatted(MEDIAN_D, GSD, SAMPLES));
    SweepRun.Outcome out =
        SweepRun.run(
            SweepPlan.of(SweepFile.read(sweep)),
            new LocalSweepEngine(),
            new EngineSettings(
                dir.resolve("out"),
                dir.resolve("sheet.msh"),
                List.of(),
                0,
                Optional.empty(),
                s -> {}),
            false,
            false);
    assertTrue(out.failures().isEmpty(), () -> out.failures().toString());
    double[] halfTimes =
        out.table().rows().stream().mapToDouble(r -> r.value("threshold:half")).toArray();
    assertEquals(SAMPLES, halfTimes.length);

    double k = CRANK_HALF * SheetSweep.L * SheetSweep.L;
    double sigma = Math.log(GSD);
    LogNormalDistribution expected = new LogNormalDistribution(Math.log(k / MEDIAN_D), sigma);
    org.apache.commons.math3.distribution.NormalDistribution z =
        new org.apache.commons.math3.distribution.NormalDistribution();
    KolmogorovSmirnovTest ks = new KolmogorovSmirnovTest();
    double p = ks.kolmogorovSmirnovTest(expected, halfTimes);
    assertTrue(p > 0.01, "KS p-value " + p + " against t½ = 0.049183·L²/D");

    // each quantile within 3 standard errors: se(q_p) = sqrt(p(1−p)/n)/f(q_p) (Cramér, 1946)
    double[] sorted = halfTimes.clone();
    java.util.Arrays.sort(sorted);
    for (double level : new double[] {0.1, 0.5, 0.9}) {
      double q = k / MEDIAN_D * Math.exp(sigma * z.inverseCumulativeProbability(level));
      double se = Math.sqrt(level * (1 - level) / SAMPLES) / expected.density(q);
      double sample = SweepStatistics.percentile(sorted, level);
      assertEquals(q, sample, 3 * se, "quantile " + level);
    }

    // negative control: a half-time constant 10 % off (0.054 instead of 0.049183) is rejected
    LogNormalDistribution wrong = new LogNormalDistribution(Math.log(1.1 * k / MEDIAN_D), sigma);
    assertTrue(ks.kolmogorovSmirnovTest(wrong, halfTimes) < 0.01, "a 10 % shift must be seen");
  }
}
