package dev.soakfield.fem.fit;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Exit flux of a membrane of thickness L, initially free of hydrogen, whose entry face is held at
 * C0 from t = 0 and whose exit face is held at zero (Crank, The Mathematics of Diffusion, 2nd ed.,
 * §4.3.2): J/J_ss = 1 + 2Σ(−1)^n exp(−n²π²τ), τ = D·t/L², and for short times the equivalent
 * image-source form (2/√(πτ))·Σ exp(−(2m+1)²/(4τ)), m = 0, 1, ... The accumulated amount tends to
 * J_ss·(t − L²/(6D)) (Crank eq. 4.24a): the time lag is L²/(6D).
 */
public final class PermeationTransient {
  static final double SHORT_TIME_LIMIT = 0.05;

  /** J/J_ss as a {@link TransientShape}. */
  public static final TransientShape SHAPE =
      new TransientShape(
          "permeation exit flux", PermeationTransient::fluxRatio, PermeationTransient::slope);

  private PermeationTransient() {}

  /** J/J_ss at τ = D·t/L² (0 for τ ≤ 0). */
  public static double fluxRatio(double tau) {
    if (!(tau > 0)) {
      return 0;
    }
    if (tau < SHORT_TIME_LIMIT) {
      double sum = 0;
      for (int m = 0; m < 50; m++) {
        double a = 2 * m + 1;
        double term = Math.exp(-a * a / (4 * tau));
        sum += term;
        if (term < 1e-18 * sum || term == 0) {
          break;
        }
      }
      return 2 / Math.sqrt(Math.PI * tau) * sum;
    }
    double sum = 0;
    for (int n = 1; n < 400; n++) {
      double term = Math.exp(-n * n * Math.PI * Math.PI * tau);
      sum += (n % 2 == 0 ? 2 : -2) * term;
      if (term < 1e-18) {
        break;
      }
    }
    return 1 + sum;
  }

  /** d(J/J_ss)/dτ (0 for τ ≤ 0). */
  public static double slope(double tau) {
    if (!(tau > 0)) {
      return 0;
    }
    if (tau < SHORT_TIME_LIMIT) {
      double sum = 0;
      for (int m = 0; m < 50; m++) {
        double a = 2 * m + 1;
        double term = Math.exp(-a * a / (4 * tau)) * (a * a / (4 * tau) - 0.5);
        sum += term;
        if (Math.abs(term) < 1e-18 * Math.abs(sum) || term == 0) {
          break;
        }
      }
      return 2 / Math.sqrt(Math.PI) * Math.pow(tau, -1.5) * sum;
    }
    double sum = 0;
    for (int n = 1; n < 400; n++) {
      double k2 = n * n * Math.PI * Math.PI;
      double term = k2 * Math.exp(-k2 * tau);
      sum += (n % 2 == 0 ? -2 : 2) * term;
      if (term < 1e-18) {
        break;
      }
    }
    return sum;
  }

  /** τ at which J/J_ss reaches {@code ratio} (0 < ratio < 1). */
  public static double tauAtRatio(double ratio) {
    if (!(ratio > 0 && ratio < 1)) {
      throw new IllegalArgumentException("flux ratio must lie in (0, 1), found " + ratio);
    }
    return new BrentSolver(1e-16, 1e-15).solve(500, t -> fluxRatio(t) - ratio, 1e-4, 5);
  }
}
