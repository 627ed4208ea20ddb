package dev.soakfield.fem.fit;

import java.util.OptionalDouble;
import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * Evaluations of a hydrogen permeation transient (exit flux against time after charging starts at
 * the entry face) after ISO 17081 / ASTM G148, beside a fit of the whole transient with {@link
 * PermeationTransient}.
 *
 * <ul>
 *   <li>steady flux J_ss: mean of the points in the last tenth of the record (at least 3);
 *   <li>time lag t_lag: the time at J/J_ss = 0.63, D_lag = L²/(6·t_lag) (ISO 17081 definition, from
 *       memory; on Crank's exact transient J/J_ss = 0.6167 at t = L²/(6D), so this rule reads D
 *       about 2 % low);
 *   <li>time lag from the accumulated amount: the time-axis intercept of the straight line the
 *       integral of J approaches (Crank eq. 4.24a, exact L²/(6D)), fitted to the points after four
 *       time lags;
 *   <li>breakthrough time t_b: the time at J/J_ss = 0.1, D_b = L²/(15.3·t_b) (ISO 17081 / ASTM
 *       G148, from memory; on the exact transient J/J_ss = 0.1 at D·t/L² = 1/15.13);
 *   <li>effective diffusivity D_eff = D_lag, and subsurface concentration C0 = J_ss·L/D_eff.
 * </ul>
 */
public final class PermeationEvaluation {
  /** Flux ratio that defines the time lag in ISO 17081 (from memory). */
  public static final double TIME_LAG_RATIO = 0.63;

  /** Flux ratio that defines the breakthrough time (from memory). */
  public static final double BREAKTHROUGH_RATIO = 0.1;

  /** D_b = L²/(BREAKTHROUGH_CONSTANT·t_b) (ISO 17081 / ASTM G148, from memory). */
  public static final double BREAKTHROUGH_CONSTANT = 15.3;

  /** All evaluations; fluxes in the unit given (mol/(m²·s) from the CLI), times in s. */
  public record Result(
      double thickness,
      double steadyFlux,
      OptionalDouble timeLag,
      OptionalDouble integratedTimeLag,
      OptionalDouble breakthroughTime,
      ShapeFit.Result fit) {
    /** D_lag = L²/(6·t_lag), the effective diffusivity of ISO 17081. */
    public OptionalDouble effectiveDiffusivity() {
      return timeLag.isPresent()
          ? OptionalDouble.of(thickness * thickness / (6 * timeLag.getAsDouble()))
          : OptionalDouble.empty();
    }

    /** L²/(6·t_lag) with the time lag of the accumulated amount. */
    public OptionalDouble integratedDiffusivity() {
      return integratedTimeLag.isPresent()
          ? OptionalDouble.of(thickness * thickness / (6 * integratedTimeLag.getAsDouble()))
          : OptionalDouble.empty();
    }

    /** D_b = L²/(15.3·t_b). */
    public OptionalDouble breakthroughDiffusivity() {
      return breakthroughTime.isPresent()
          ? OptionalDouble.of(
              thickness * thickness / (BREAKTHROUGH_CONSTANT * breakthroughTime.getAsDouble()))
          : OptionalDouble.empty();
    }

    /** C0 = J_ss·L/D_eff. */
    public OptionalDouble subsurfaceConcentration() {
      OptionalDouble d = effectiveDiffusivity();
      return d.isPresent()
          ? OptionalDouble.of(steadyFlux * thickness / d.getAsDouble())
          : OptionalDouble.empty();
    }

    /**
     * C0 = J_ss·L/D from the fit of the whole transient, with a 95 % interval by first-order
     * propagation of the fit's covariance through ln C0 = ln J_ss + ln L − ln D.
     */
    public Estimate fittedSubsurfaceConcentration() {
      Estimate d = fit.diffusivity();
      Estimate j = fit.level();
      double c0 = j.value() * thickness / d.value();
      double rj = j.standardError() / j.value();
      double rd = d.standardError() / d.value();
      double rel2 = rj * rj + rd * rd - 2 * fit.covariance() / (j.value() * d.value());
      double se = Math.abs(c0) * Math.sqrt(Math.max(rel2, 0));
      double tq =
          new org.apache.commons.math3.distribution.TDistribution(fit.degreesOfFreedom())
              .inverseCumulativeProbability(0.975);
      return Estimate.symmetric(c0, se, tq * se);
    }

    /** The fitted exit flux at {@code t} s. */
    public double model(double t) {
      return fit.level().value()
          * PermeationTransient.fluxRatio(fit.diffusivity().value() * t / (thickness * thickness));
    }
  }

  private PermeationEvaluation() {}

  /**
   * Evaluates exit fluxes {@code flux[i]} (background already removed) at times {@code t[i]} s
   * since charging began, for a membrane of {@code thickness} m.
   *
   * @throws IllegalArgumentException for times out of order, too few points, no rise in flux
   */
  public static Result evaluate(double[] t, double[] flux, double thickness) {
    if (!(thickness > 0) || Double.isInfinite(thickness)) {
      throw new IllegalArgumentException("thickness must be > 0, found " + thickness);
    }
    UptakeFit.requireIncreasing(t);
    int n = t.length;
    if (n < 6) {
      throw new IllegalArgumentException(
          "a permeation transient needs at least 6 points, found " + n);
    }
    double tEnd = t[n - 1];
    double sum = 0;
    int count = 0;
    for (int i = n - 1; i >= 0 && (count < 3 || t[i] >= 0.9 * tEnd); i--) {
      sum += flux[i];
      count++;
    }
    double jss = sum / count;
    if (!(jss > 0)) {
      throw new IllegalArgumentException(
          "the exit flux does not rise above its start: steady flux " + jss);
    }
    OptionalDouble lag = crossing(t, flux, TIME_LAG_RATIO * jss);
    OptionalDouble breakthrough = crossing(t, flux, BREAKTHROUGH_RATIO * jss);
    OptionalDouble integrated =
        lag.isPresent() ? integratedLag(t, flux, 4 * lag.getAsDouble()) : lag;
    ShapeFit.Result fit = ShapeFit.fit(t, flux, PermeationTransient.SHAPE, thickness * thickness);
    return new Result(thickness, jss, lag, integrated, breakthrough, fit);
  }

  /** First time the flux reaches {@code level}, interpolated linearly; empty when it never does. */
  static OptionalDouble crossing(double[] t, double[] flux, double level) {
    for (int i = 1; i < t.length; i++) {
      if (flux[i] >= level && flux[i - 1] < level) {
        double w = (level - flux[i - 1]) / (flux[i] - flux[i - 1]);
        return OptionalDouble.of(t[i - 1] + w * (t[i] - t[i - 1]));
      }
    }
    return OptionalDouble.empty();
  }

  /** Intercept on the time axis of the line fitted to the accumulated amount after {@code from}. */
  static OptionalDouble integratedLag(double[] t, double[] flux, double from) {
    SimpleRegression reg = new SimpleRegression(true);
    double q = 0;
    if (t[0] > 0) {
      q = 0.5 * flux[0] * t[0];
    }
    for (int i = 0; i < t.length; i++) {
      if (i > 0) {
        q += 0.5 * (flux[i] + flux[i - 1]) * (t[i] - t[i - 1]);
      }
      if (t[i] >= from) {
        reg.addData(t[i], q);
      }
    }
    if (reg.getN() < 3 || !(reg.getSlope() > 0)) {
      return OptionalDouble.empty();
    }
    return OptionalDouble.of(-reg.getIntercept() / reg.getSlope());
  }
}
