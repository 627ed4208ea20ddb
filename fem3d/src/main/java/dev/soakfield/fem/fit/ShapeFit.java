package dev.soakfield.fem.fit;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.apache.commons.math3.util.Pair;

/**
 * Levenberg–Marquardt fit (Commons Math) of y(t) = S·shape(D·t/L²) to data: the diffusivity D and
 * the final level S, with 95 % confidence intervals from s²·(JᵀJ)⁻¹ (s² = residual sum of squares
 * over n − 2) and Student's t with n − 2 degrees of freedom. The fit is dimensionless: D is fitted
 * as a multiple of a start value found by a scan over twelve decades of D (so it does not depend on
 * a user's guess), and the data are divided by the scan's level before fitting, so a flux of 1e-15
 * fits as well as one of 1e3 (the optimiser's and the covariance's tolerances are absolute in what
 * they see).
 */
public final class ShapeFit {
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
   * @throws IllegalArgumentException with fewer than 4 points, unequal lengths or no signal
   * @throws FitFailedException when the fit does not converge or the parameters are not determined
   */
  public static Result fit(double[] t, double[] y, TransientShape shape, double lengthSquared) {
    if (t.length != y.length) {
      throw new IllegalArgumentException("times and values differ in count");
    }
    if (t.length < 4) {
      throw new IllegalArgumentException(
          "a fit of two parameters needs at least 4 points, found " + t.length);
    }
    double tMax = 0;
    double tMinPositive = Double.POSITIVE_INFINITY;
    for (double ti : t) {
      tMax = Math.max(tMax, ti);
      if (ti > 0) {
        tMinPositive = Math.min(tMinPositive, ti);
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
    double c = dRef / lengthSquared;
    int n = t.length;
    double[] yScaled = new double[n];
    for (int i = 0; i < n; i++) {
      yScaled[i] = y[i] / sRef;
    }
    LeastSquaresBuilder builder =
        new LeastSquaresBuilder()
            .start(new double[] {1, 1})
            .target(yScaled)
            .maxEvaluations(10_000)
            .maxIterations(10_000)
            .model(
                (RealVector p) -> {
                  double a = p.getEntry(0);
                  double b = p.getEntry(1);
                  double[] v = new double[n];
                  double[][] jac = new double[n][2];
                  for (int i = 0; i < n; i++) {
                    double tau = c * a * t[i];
                    v[i] = b * shape.at(tau);
                    jac[i][0] = b * shape.slopeAt(tau) * c * t[i];
                    jac[i][1] = shape.at(tau);
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
    double[] residuals = opt.getResiduals().toArray();
    double rssScaled = 0;
    for (int i = 0; i < n; i++) {
      rssScaled += residuals[i] * residuals[i];
      residuals[i] *= sRef; // back in the data's unit
    }
    double rss = rssScaled * sRef * sRef;
    int dof = n - 2;
    RealMatrix cov;
    try {
      cov = opt.getCovariances(1e-14).scalarMultiply(rssScaled / dof);
    } catch (SingularMatrixException e) {
      throw new FitFailedException(
          "the " + shape.name() + " data do not determine both diffusivity and final level");
    }
    double tq = new TDistribution(dof).inverseCumulativeProbability(0.975);
    double seA = Math.sqrt(cov.getEntry(0, 0));
    double seB = Math.sqrt(cov.getEntry(1, 1));
    Estimate d = Estimate.symmetric(dRef * a, dRef * seA, dRef * seA * tq);
    Estimate s = scaledSigned(sRef, b, seB, tq);
    if (!(d.value() > 0)) {
      throw new FitFailedException(
          "the " + shape.name() + " fit gave a non-positive diffusivity " + d.value());
    }
    return new Result(
        d,
        s,
        dRef * sRef * cov.getEntry(0, 1),
        Arrays.stream(residuals).boxed().toList(),
        Math.sqrt(rss / n),
        dof,
        opt.getIterations());
  }

  private static Estimate scaledSigned(double ref, double b, double se, double tq) {
    double v = ref * b;
    double e = Math.abs(ref) * se;
    return Estimate.symmetric(v, e, e * tq);
  }

  /** The best D on a log grid, with the level that is then linear: S = Σ F·y / Σ F². */
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
