package dev.soakfield.fem.fit;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.Erf;

/**
 * Fractional uptake M_t/M_∞ of a plane sheet of thickness L, initially empty, both faces held at
 * the same concentration (Crank, The Mathematics of Diffusion, 2nd ed., §4.3): the series of eq.
 * 4.18, 1 − Σ 8/((2n+1)²π²)·exp(−(2n+1)²π²τ) with τ = D·t/L², and for short times, where that
 * series converges slowly, the error-function form of eq. 4.20, 4√τ·(1/√π + 2Σ(−1)^n
 * ierfc(n/(2√τ))). The same curve describes desorption of a saturated sheet (Crank §4.3).
 */
public final class PlaneSheetUptake {
  /** Below this τ the short-time form is used (both forms agree to round-off there). */
  static final double SHORT_TIME_LIMIT = 0.05;

  /** M_t/M_∞ as a {@link TransientShape}. */
  public static final TransientShape SHAPE =
      new TransientShape("plane sheet uptake", PlaneSheetUptake::fraction, PlaneSheetUptake::slope);

  private static final double HALF_TIME_CONSTANT = solveHalfTime();

  private PlaneSheetUptake() {}

  /** M_t/M_∞ at τ = D·t/L² (0 for τ ≤ 0). */
  public static double fraction(double tau) {
    if (!(tau > 0)) {
      return 0;
    }
    return tau < SHORT_TIME_LIMIT ? shortTimeFraction(tau) : seriesFraction(tau);
  }

  /** d(M_t/M_∞)/dτ (0 for τ ≤ 0). */
  public static double slope(double tau) {
    if (!(tau > 0)) {
      return 0;
    }
    return tau < SHORT_TIME_LIMIT ? shortTimeSlope(tau) : seriesSlope(tau);
  }

  /** Crank eq. 4.18. */
  static double seriesFraction(double tau) {
    double sum = 0;
    for (int n = 0; n < 400; n++) {
      double k = (2 * n + 1) * Math.PI;
      double term = 8 / (k * k) * Math.exp(-k * k * tau);
      sum += term;
      if (term < 1e-18) {
        break;
      }
    }
    return 1 - sum;
  }

  static double seriesSlope(double tau) {
    double sum = 0;
    for (int n = 0; n < 400; n++) {
      double k = (2 * n + 1) * Math.PI;
      double term = 8 * Math.exp(-k * k * tau);
      sum += term;
      if (term < 1e-18 * sum) {
        break;
      }
    }
    return sum;
  }

  /** Crank eq. 4.20 with l = L/2, so that D·t/l² = 4τ. */
  static double shortTimeFraction(double tau) {
    double root = Math.sqrt(tau);
    double sum = 0;
    for (int n = 1; n < 50; n++) {
      double term = ierfc(n / (2 * root));
      sum += (n % 2 == 0 ? 2 : -2) * term;
      if (term < 1e-18) {
        break;
      }
    }
    return 4 * root * (1 / Math.sqrt(Math.PI) + sum);
  }

  /** Derivative of eq. 4.20: (2/√(πτ))·(1 + 2Σ(−1)^n exp(−n²/(4τ))). */
  static double shortTimeSlope(double tau) {
    double sum = 1;
    for (int n = 1; n < 50; n++) {
      double term = Math.exp(-n * n / (4 * tau));
      sum += (n % 2 == 0 ? 2 : -2) * term;
      if (term < 1e-18) {
        break;
      }
    }
    return 2 / Math.sqrt(Math.PI * tau) * sum;
  }

  /** The first repeated integral of erfc: exp(−x²)/√π − x·erfc(x). */
  static double ierfc(double x) {
    return Math.exp(-x * x) / Math.sqrt(Math.PI) - x * Erf.erfc(x);
  }

  /**
   * τ at which M_t/M_∞ = 1/2, the root of eq. 4.18 (about 0.049183): D = constant·L²/t½ for a sheet
   * of full thickness L exposed on both faces.
   */
  public static double halfTimeConstant() {
    return HALF_TIME_CONSTANT;
  }

  private static double solveHalfTime() {
    return new BrentSolver(1e-16, 1e-15).solve(200, t -> fraction(t) - 0.5, 0.01, 0.2);
  }

  /**
   * The edge factor (1 + L/a + L/b)² of Shen and Springer (J. Compos. Mater. 10 (1976) 2) for a
   * plate of thickness L and edge lengths a, b that also takes up through its edges: the
   * diffusivity seen by the plane-sheet formula is the true one times this factor, so D =
   * D_apparent·(1 + L/a + L/b)^−2. Pass infinite edges for no correction.
   */
  public static double edgeFactor(double thickness, double edgeA, double edgeB) {
    if (!(thickness > 0 && edgeA > 0 && edgeB > 0)) {
      throw new IllegalArgumentException(
          "edge correction: thickness and edges must be > 0, found "
              + thickness
              + ", "
              + edgeA
              + ", "
              + edgeB);
    }
    double f = 1 + thickness / edgeA + thickness / edgeB;
    return f * f;
  }
}
