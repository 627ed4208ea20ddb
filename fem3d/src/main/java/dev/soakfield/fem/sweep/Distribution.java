package dev.soakfield.fem.sweep;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * A distribution a sweep samples a value from: sampling turns a probability in (0, 1) into a value
 * through the inverse of the cumulative distribution, so plain random sampling and Latin hypercube
 * sampling share one path.
 */
public record Distribution(String kind, double a, double b, String described) {
  /** The normal distribution of mean {@code mean} and standard deviation {@code sd}. */
  public static Distribution normal(double mean, double sd) {
    return new Distribution("normal", mean, sd, "normal, mean " + mean + ", sd " + sd);
  }

  /**
   * The log-normal distribution whose logarithm has mean {@code mu} and standard deviation {@code
   * sigma} (median e^mu).
   */
  public static Distribution logNormal(double mu, double sigma, String described) {
    return new Distribution("log-normal", mu, sigma, described);
  }

  /**
   * The log-normal distribution of a value with mean {@code mean} and standard deviation {@code
   * sd}: σ² = ln(1 + sd²/mean²), μ = ln(mean) − σ²/2 (the moments of the log-normal distribution).
   */
  public static Distribution logNormalOfMoments(double mean, double sd) {
    double s2 = Math.log1p(sd * sd / (mean * mean));
    return logNormal(
        Math.log(mean) - s2 / 2, Math.sqrt(s2), "log-normal, mean " + mean + ", sd " + sd);
  }

  /** The uniform distribution on [low, high]. */
  public static Distribution uniform(double low, double high) {
    return new Distribution("uniform", low, high, "uniform on [" + low + ", " + high + "]");
  }

  /**
   * The value below which a fraction {@code p} of the distribution lies. In closed form through the
   * normal quantile (the library's generic inverse stops at an absolute accuracy of 1e-9, useless
   * for a diffusivity of 1e-12).
   */
  public double quantile(double p) {
    return switch (kind) {
      case "normal" -> a + b * Z.inverseCumulativeProbability(p);
      case "log-normal" -> Math.exp(a + b * Z.inverseCumulativeProbability(p));
      case "uniform" -> a + p * (b - a);
      default -> throw new IllegalStateException("unknown distribution " + kind);
    };
  }

  /** The probability of a value at or below {@code x}. */
  public double cumulative(double x) {
    return switch (kind) {
      case "normal" -> Z.cumulativeProbability((x - a) / b);
      case "log-normal" -> x <= 0 ? 0 : Z.cumulativeProbability((Math.log(x) - a) / b);
      case "uniform" -> x <= a ? 0 : x >= b ? 1 : (x - a) / (b - a);
      default -> throw new IllegalStateException("unknown distribution " + kind);
    };
  }

  /** The standard normal distribution (no random generator: values come through quantiles). */
  private static final NormalDistribution Z = new NormalDistribution(null, 0, 1);
}
