package dev.soakfield.fem.verify;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Crank's series for round parts whose whole surface is held at c = 1 from t = 0, c = 0 inside (J.
 * Crank, The Mathematics of Diffusion, 2nd ed. (1975)), with their gradients:
 *
 * <ul>
 *   <li>sphere of radius a (eq. 6.18): c = 1 + (2a/(πr))·Σ (−1)ⁿ/n·sin(nπr/a)·exp(−Dn²π²t/a²);
 *   <li>infinite cylinder of radius a (eq. 5.22): 1 − c = (2/a)·Σ exp(−Dα²t)·J₀(rα)/(α·J₁(aα)),
 *       J₀(aα) = 0;
 *   <li>plane sheet −l < x < l (eq. 4.17): 1 − c = (4/π)·Σ (−1)ⁿ/(2n+1)·exp(−D(2n+1)²π²t/(4l²))·
 *       cos((2n+1)πx/(2l));
 *   <li>finite cylinder: 1 − c is the product of the last two (the product of one-dimensional
 *       solutions for a region that is their intersection, Crank §5.3; section from memory).
 * </ul>
 *
 * Terms are summed until their factor exp(−…t) falls below 1e-17, so t must not be near 0.
 */
final class RoundSeries {
  private static final int MAX_TERMS = 400;
  private static final double[] BESSEL_ZEROS = besselZeros(9);

  private RoundSeries() {}

  /** The sphere about the origin at time t. */
  static ExactField sphere(double a, double d, double t) {
    return new ExactField() {
      @Override
      public double value(double x, double y, double z) {
        double r = Math.sqrt(x * x + y * y + z * z);
        double sum = 0;
        for (int n = 1; n < MAX_TERMS; n++) {
          double k = n * Math.PI / a;
          double e = Math.exp(-d * k * k * t);
          // sin(kr)/(kr) → 1 at the centre
          double kr = k * r;
          double sinc = kr < 1e-6 ? 1 - kr * kr / 6 : Math.sin(kr) / kr;
          sum += (n % 2 == 0 ? 1 : -1) * e * sinc;
          if (e < 1e-17) {
            break;
          }
        }
        return 1 + 2 * sum; // 2a/(πr)·(1/n)·sin(kr) = 2·sin(kr)/(kr)
      }

      @Override
      public void gradient(double x, double y, double z, double[] g) {
        double r = Math.sqrt(x * x + y * y + z * z);
        double dr = 0;
        for (int n = 1; n < MAX_TERMS; n++) {
          double k = n * Math.PI / a;
          double e = Math.exp(-d * k * k * t);
          double kr = k * r;
          // d/dr [sin(kr)/(kr)] = k·(kr·cos(kr) − sin(kr))/(kr)², → −k²r/3 near the centre
          double slope =
              kr < 1e-3
                  ? -k * kr / 3 * (1 - kr * kr / 10)
                  : k * (kr * Math.cos(kr) - Math.sin(kr)) / (kr * kr);
          dr += (n % 2 == 0 ? 1 : -1) * e * slope;
          if (e < 1e-17) {
            break;
          }
        }
        dr *= 2;
        double s = r == 0 ? 0 : dr / r;
        g[0] = s * x;
        g[1] = s * y;
        g[2] = s * z;
      }
    };
  }

  /**
   * The finite cylinder of radius a on the z axis from z = 0 to 2l at time t: c = 1 − C(r)·P(z)
   * with C the infinite cylinder's and P the sheet's share still to come.
   */
  static ExactField finiteCylinder(double a, double l, double d, double t) {
    return new ExactField() {
      @Override
      public double value(double x, double y, double z) {
        return 1 - radial(Math.hypot(x, y))[0] * axial(z - l)[0];
      }

      @Override
      public void gradient(double x, double y, double z, double[] g) {
        double r = Math.hypot(x, y);
        double[] c = radial(r);
        double[] p = axial(z - l);
        double s = r == 0 ? 0 : -c[1] * p[0] / r;
        g[0] = s * x;
        g[1] = s * y;
        g[2] = -c[0] * p[1];
      }

      /** 1 − c of the infinite cylinder and its r-derivative. */
      private double[] radial(double r) {
        double v = 0;
        double dv = 0;
        double e = 1;
        for (double zero : BESSEL_ZEROS) {
          double alpha = zero / a;
          e = Math.exp(-d * alpha * alpha * t);
          double w = 2 / a * e / (alpha * besselJ(1, zero));
          v += w * besselJ(0, r * alpha);
          dv -= w * alpha * besselJ(1, r * alpha);
          if (e < 1e-17) {
            break;
          }
        }
        if (e >= 1e-14) {
          throw new IllegalArgumentException(
              "cylinder series: D t/a² = " + d * t / (a * a) + " is too early for its terms");
        }
        return new double[] {v, dv};
      }

      /** 1 − c of the sheet −l < s < l and its s-derivative. */
      private double[] axial(double s) {
        double v = 0;
        double dv = 0;
        for (int n = 0; n < MAX_TERMS; n++) {
          double k = (2 * n + 1) * Math.PI / (2 * l);
          double e = Math.exp(-d * k * k * t);
          double w = 4 / Math.PI * (n % 2 == 0 ? 1 : -1) / (2 * n + 1) * e;
          v += w * Math.cos(k * s);
          dv -= w * k * Math.sin(k * s);
          if (e < 1e-17) {
            break;
          }
        }
        return new double[] {v, dv};
      }
    };
  }

  /**
   * J₀ or J₁ by their power series Σ (−1)^k (x/2)^(2k+ν)/(k!(k+ν)!) (M. Abramowitz and I. A.
   * Stegun, Handbook of Mathematical Functions (1964), eq. 9.1.10). Cancellation among terms as
   * large as e^x/(πx) costs accuracy as x grows: 1e-11 at x = 15, 1e-6 at 27, where the cylinder's
   * terms are weighted by exp(−Dα²t) < 1e-10 at the times used; beyond 30 the value is refused.
   */
  static double besselJ(int nu, double x) {
    if (Math.abs(x) > 30) {
      throw new IllegalArgumentException("besselJ: argument " + x + " beyond the series' range");
    }
    double half = x / 2;
    double term = nu == 0 ? 1 : half;
    double sum = term;
    double q = -half * half;
    for (int k = 1; k < 200; k++) {
      term *= q / (k * (double) (k + nu));
      sum += term;
      if (Math.abs(term) < 1e-18 * Math.abs(sum) && k > 2 * Math.abs(half)) {
        break;
      }
    }
    return sum;
  }

  /**
   * The first zeros of J₀ (enough for D t/a² ≥ 0.06), each found by Brent's method near McMahon's
   * (n − ¼)π.
   */
  static double[] besselZeros(int count) {
    BrentSolver brent = new BrentSolver(1e-15, 1e-15);
    double[] z = new double[count];
    for (int n = 1; n <= count; n++) {
      double guess = (n - 0.25) * Math.PI;
      z[n - 1] = brent.solve(200, x -> besselJ(0, x), guess - 0.3, guess + 0.3);
    }
    return z;
  }
}
