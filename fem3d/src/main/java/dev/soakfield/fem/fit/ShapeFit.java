package dev.soakfield.fem.fit;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Levenberg–Marquardt fit (Commons Math) of y(t) = S·shape(D·t/L²) to data: the diffusivity D and
 * the final level S, with 95 % confidence intervals from s²·(JᵀJ)⁻¹ (s² = residual sum of squares
 * over n − 2) and Student's t with n − 2 degrees of freedom.
 *
 * <p>The fit is made dimensionless before anything is compared with a tolerance, so that a flux of
 * 1e-15 fits exactly as one of 1e3, and a record in seconds as one in years:
 *
 * <ol>
 *   <li>a scan over the decades of D that the sampling can resolve gives a reference D_ref and the
 *       level S_ref that is then linear (so the fit does not depend on a user's guess);
 *   <li>time is divided by the characteristic time t_c = L²/D_ref and the data by S_ref: θ = t/t_c,
 *       ŷ = y/S_ref;
 *   <li>the dimensionless model ŷ = b·shape(a·θ) is fitted for a = D/D_ref and b = S/S_ref, both of
 *       order one, with the optimiser's relative tolerances;
 *   <li>whether the data determine both parameters is judged on dimensionless quantities only (see
 *       {@link #MIN_SENSITIVITY}, {@link #MAX_CORRELATION} and the intervals), and the estimates,
 *       their standard errors and covariance are scaled back: D = a·D_ref, S = b·S_ref.
 * </ol>
 *
 * <p>Before this was so, the rank test of the covariance (an absolute 1e-14 on JᵀJ) saw the data's
 * own unit: a 6.9e-9 mol/(m²·s) flux made JᵀJ of order 1e-16 and failed as "not determined" while
 * the same curve times 10 fitted.
 */
public final class ShapeFit {
  /**
   * Least change of the fitted curve, as a fraction of its final level, that doubling D must make
   * at some measured time (max τ·shape′(τ) over the points, the dimensionless sensitivity to ln D).
   * Below it the record shows no transient: every point lies on the plateau (or before the rise),
   * and any D that is large (or small) enough fits, so none is reported.
   */
  static final double MIN_SENSITIVITY = 1e-4;

  /**
   * Largest |correlation| between the two dimensionless parameters that still counts as two: above
   * it JᵀJ is singular to working precision (a rank test on the column-scaled matrix, so it does
   * not depend on the units of either column).
   */
  static final double MAX_CORRELATION = 1 - 1e-10;

  /** The outcome: estimates, their covariance, and the residuals data − model. */
  public record Result(
      Estimate diffusivity,
      Estimate level,
      double covariance,
      List<Double> residuals,
      double rmsResidual,
      int degreesOfFreedom,
      int iterations) {}

  private ShapeFit() {}

  /**
   * Fits {@code y} at times {@code t} (s) with {@code shape}; {@code lengthSquared} is L² in m²
   * (the squared thickness divided by any edge factor, so that D comes out corrected).
   *
   * @throws IllegalArgumentException with fewer than 4 points, unequal lengths, values that are not
   *     finite or no signal at all
   * @throws FitFailedException when the fit does not converge or the data do not determine both
   *     parameters (no transient in the record, parameters that cannot be told apart, or a 95 %
   *     interval that reaches zero); the message says which
   */
  public static Result fit(double[] t, double[] y, TransientShape shape, double lengthSquared) {
    if (t.length != y.length) {
      throw new IllegalArgumentException("times and values differ in count");
    }
    if (t.length < 4) {
      throw new IllegalArgumentException(
          "a fit of two parameters needs at least 4 points, found " + t.length);
    }
    if (!(lengthSquared > 0) || Double.isInfinite(lengthSquared)) {
      throw new IllegalArgumentException("length squared must be > 0, found " + lengthSquared);
    }
    double tMax = 0;
    double tMinPositive = Double.POSITIVE_INFINITY;
    for (int i = 0; i < t.length; i++) {
      if (!Double.isFinite(t[i]) || !Double.isFinite(y[i])) {
        throw new IllegalArgumentException(
            "point " + (i + 1) + " is not finite: time " + t[i] + ", value " + y[i]);
      }
      tMax = Math.max(tMax, t[i]);
      if (t[i] > 0) {
        tMinPositive = Math.min(tMinPositive, t[i]);
      }
    }
    if (!(tMax > 0)) {
      throw new IllegalArgumentException("all times are zero or negative");
    }
    double[] start = scan(t, y, shape, lengthSquared, tMinPositive, tMax);
    double dRef = start[0];
    double sRef = start[1];
    if (!(sRef != 0) || !Double.isFinite(sRef)) {
      throw new IllegalArgumentException("the data show no change to fit");
    }
    int n = t.length;
    double tc = lengthSquared / dRef; // characteristic time: τ = a·θ with θ = t/t_c
    double[] theta = new double[n];
    double[] yHat = new double[n];
    for (int i = 0; i < n; i++) {
      theta[i] = t[i] / tc;
      yHat[i] = y[i] / sRef;
    }
    LeastSquaresBuilder builder =
        new LeastSquaresBuilder()
            .start(new double[] {1, 1})
            .target(yHat)
            .maxEvaluations(10_000)
            .maxIterations(10_000)
            .model(
                (RealVector p) -> {
                  double[][] jac = jacobian(theta, shape, p.getEntry(0), p.getEntry(1));
                  double[] v = new double[n];
                  for (int i = 0; i < n; i++) {
                    v[i] = p.getEntry(1) * shape.at(p.getEntry(0) * theta[i]);
                  }
                  return new Pair<>(
                      new ArrayRealVector(v, false), new Array2DRowRealMatrix(jac, false));
                });
    LeastSquaresOptimizer.Optimum opt;
    try {
      opt =
          new LevenbergMarquardtOptimizer()
              .withCostRelativeTolerance(1e-14)
              .withParameterRelativeTolerance(1e-14)
              .optimize(builder.build());
    } catch (RuntimeException e) {
      throw new FitFailedException(
          "the " + shape.name() + " fit did not converge: " + e.getMessage());
    }
    double a = opt.getPoint().getEntry(0);
    double b = opt.getPoint().getEntry(1);
    if (!(a > 0)) {
      throw new FitFailedException(
          "the " + shape.name() + " fit gave a non-positive diffusivity " + dRef * a);
    }
    requireTransient(shape, theta, t, a);
    double[] residuals = opt.getResiduals().toArray();
    double rssHat = 0;
    for (int i = 0; i < n; i++) {
      rssHat += residuals[i] * residuals[i];
      residuals[i] *= sRef; // back in the data's unit
    }
    int dof = n - 2;
    double[][] cov = covariance(jacobian(theta, shape, a, b), rssHat / dof, shape);
    double tq = new TDistribution(dof).inverseCumulativeProbability(0.975);
    double seA = Math.sqrt(cov[0][0]);
    double seB = Math.sqrt(cov[1][1]);
    Estimate d = Estimate.symmetric(dRef * a, dRef * seA, dRef * seA * tq);
    Estimate s = scaledSigned(sRef, b, seB, tq);
    requireBounded(shape, "diffusivity", d, " m²/s");
    requireBounded(shape, "final level", s, "");
    double rss = rssHat * sRef * sRef;
    return new Result(
        d,
        s,
        dRef * sRef * cov[0][1],
        Arrays.stream(residuals).boxed().toList(),
        Math.sqrt(rss / n),
        dof,
        opt.getIterations());
  }

  /** ∂ŷ/∂a and ∂ŷ/∂b of ŷ = b·shape(a·θ): both dimensionless. */
  private static double[][] jacobian(double[] theta, TransientShape shape, double a, double b) {
    double[][] jac = new double[theta.length][2];
    for (int i = 0; i < theta.length; i++) {
      double tau = a * theta[i];
      jac[i][0] = b * shape.slopeAt(tau) * theta[i];
      jac[i][1] = shape.at(tau);
    }
    return jac;
  }

  /**
   * Refuses a record in which the fitted curve does not change, relative to its level, by at least
   * {@link #MIN_SENSITIVITY} when D doubles: a flat line, or a rise that lies wholly before the
   * first or after the last point.
   */
  private static void requireTransient(TransientShape shape, double[] theta, double[] t, double a) {
    double sensitivity = 0;
    double first = Double.NaN;
    double last = Double.NaN;
    for (int i = 0; i < theta.length; i++) {
      double tau = a * theta[i];
      sensitivity = Math.max(sensitivity, Math.abs(tau * shape.slopeAt(tau)));
      if (t[i] > 0) {
        double f = shape.at(tau);
        first = Double.isNaN(first) ? f : first;
        last = f;
      }
    }
    if (sensitivity >= MIN_SENSITIVITY) {
      return;
    }
    String where =
        first >= 0.5
            ? String.format(
                Locale.ROOT,
                "the curve is already at %.4g %% of its final level at the first point, so the"
                    + " record shows no transient (a flat line, or the rise was over before the"
                    + " first measurement)",
                100 * first)
            : String.format(
                Locale.ROOT,
                "the curve is still at %.3g %% of its final level at the last point, so the record"
                    + " shows no transient (the rise had not begun by the last measurement)",
                100 * last);
    throw new FitFailedException(
        "the "
            + shape.name()
            + " data do not determine both diffusivity and final level: "
            + where);
  }

  /**
   * s²·(JᵀJ)⁻¹ of the dimensionless problem. The rank test scales JᵀJ to unit diagonal (the
   * correlation matrix of the parameters), so it judges the shape of the problem, not its units.
   */
  private static double[][] covariance(double[][] jac, double s2, TransientShape shape) {
    double g00 = 0;
    double g01 = 0;
    double g11 = 0;
    for (double[] row : jac) {
      g00 += row[0] * row[0];
      g01 += row[0] * row[1];
      g11 += row[1] * row[1];
    }
    double r = g01 / Math.sqrt(g00 * g11);
    if (!(g00 > 0 && g11 > 0) || !(Math.abs(r) <= MAX_CORRELATION)) {
      throw new FitFailedException(
          "the "
              + shape.name()
              + " data do not determine both diffusivity and final level: a change of one can be"
              + " made up by the other (their correlation is "
              + String.format(Locale.ROOT, "%.12f", r)
              + ")");
    }
    double det = g00 * g11 * (1 - r * r);
    RealMatrix inv =
        new Array2DRowRealMatrix(new double[][] {{g11 / det, -g01 / det}, {-g01 / det, g00 / det}});
    return inv.scalarMultiply(s2).getData();
  }

  /** Refuses an estimate whose 95 % interval reaches zero: the data do not fix even its sign. */
  private static void requireBounded(TransientShape shape, String what, Estimate e, String unit) {
    double halfWidth = (e.high() - e.low()) / 2;
    if (halfWidth < Math.abs(e.value())) {
      return;
    }
    throw new FitFailedException(
        String.format(
            Locale.ROOT,
            "the %s data do not determine both diffusivity and final level: the 95 %% interval of"
                + " the %s, %.4g to %.4g%s, reaches zero; the record is too noisy or too short"
                + " for the transient it holds",
            shape.name(),
            what,
            e.low(),
            e.high(),
            unit));
  }

  private static Estimate scaledSigned(double ref, double b, double se, double tq) {
    double v = ref * b;
    double e = Math.abs(ref) * se;
    return Estimate.symmetric(v, e, e * tq);
  }

  /**
   * The best D on a log grid, with the level that is then linear: S = Σ F·y / Σ F². The grid spans
   * what the sampling can resolve, from the rise at the last point (τ = 1e-3 there) to the rise
   * done by the first (τ = 1e3 there), so it is set by t and L² alone; the comparison of residuals
   * is a ratio, so the data's unit does not enter.
   */
  private static double[] scan(
      double[] t, double[] y, TransientShape shape, double l2, double tMin, double tMax) {
    double dLow = 1e-3 * l2 / tMax;
    double dHigh = 1e3 * l2 / tMin;
    int steps = 400;
    double best = Double.POSITIVE_INFINITY;
    double[] out = {dLow, 0};
    for (int k = 0; k <= steps; k++) {
      double d = dLow * Math.pow(dHigh / dLow, k / (double) steps);
      double fy = 0;
      double ff = 0;
      for (int i = 0; i < t.length; i++) {
        double f = shape.at(d * t[i] / l2);
        fy += f * y[i];
        ff += f * f;
      }
      if (ff == 0) {
        continue;
      }
      double s = fy / ff;
      double rss = 0;
      for (int i = 0; i < t.length; i++) {
        double r = y[i] - s * shape.at(d * t[i] / l2);
        rss += r * r;
      }
      if (rss < best) {
        best = rss;
        out = new double[] {d, s};
      }
    }
    return out;
  }
}
