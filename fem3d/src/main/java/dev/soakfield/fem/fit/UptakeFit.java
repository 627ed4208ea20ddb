package dev.soakfield.fem.fit;

import java.util.OptionalDouble;

/**
 * Diffusivity and saturation level from weighing data of a plate specimen: the gain (uptake) or the
 * loss (desorption) against time, fitted with Crank's plane-sheet solution ({@link
 * PlaneSheetUptake}) with the Shen–Springer edge correction, beside the half-time estimate D =
 * 0.049183·L²/t½ (also edge-corrected).
 */
public final class UptakeFit {
  /**
   * The outcome, in the units of the input (times in s, diffusivity in m²/s, level in the unit of
   * the changes given).
   */
  public record Result(
      ShapeFit.Result fit,
      double thickness,
      double edgeFactor,
      OptionalDouble halfTime,
      OptionalDouble halfTimeDiffusivity) {
    /** Fitted diffusivity, corrected for edges. */
    public Estimate diffusivity() {
      return fit.diffusivity();
    }

    /** Fitted final change (saturation gain, or the total loss for desorption). */
    public Estimate level() {
      return fit.level();
    }

    /** The fitted change at time {@code t} in s. */
    public double model(double t) {
      return level().value() * PlaneSheetUptake.fraction(apparentTau(t));
    }

    private double apparentTau(double t) {
      return diffusivity().value() * edgeFactor * t / (thickness * thickness);
    }
  }

  private UptakeFit() {}

  /**
   * Fits the changes {@code change[i]} (gain for uptake, loss for desorption, both positive as the
   * experiment goes on) at times {@code t[i]} in s since the exposure began.
   *
   * @param thickness plate thickness L in m
   * @param edgeFactor {@link PlaneSheetUptake#edgeFactor}, or 1 for a sheet with sealed edges
   * @throws IllegalArgumentException for times out of order, a bad thickness, too few points
   */
  public static Result fit(double[] t, double[] change, double thickness, double edgeFactor) {
    if (!(thickness > 0) || Double.isInfinite(thickness)) {
      throw new IllegalArgumentException("thickness must be > 0, found " + thickness);
    }
    if (!(edgeFactor >= 1)) {
      throw new IllegalArgumentException("edge factor must be >= 1, found " + edgeFactor);
    }
    requireIncreasing(t);
    double l2 = thickness * thickness / edgeFactor;
    ShapeFit.Result fit = ShapeFit.fit(t, change, PlaneSheetUptake.SHAPE, l2);
    OptionalDouble half = halfTime(t, change, fit.level().value());
    OptionalDouble dHalf =
        half.isPresent()
            ? OptionalDouble.of(PlaneSheetUptake.halfTimeConstant() * l2 / half.getAsDouble())
            : OptionalDouble.empty();
    return new Result(fit, thickness, edgeFactor, half, dHalf);
  }

  /**
   * The time at which the change first reaches half the level, interpolated linearly in √t between
   * the two measurements around it (uptake is near linear in √t early on); empty when it never
   * does.
   */
  static OptionalDouble halfTime(double[] t, double[] change, double level) {
    double target = level / 2;
    for (int i = 1; i < t.length; i++) {
      boolean crossed = level > 0 ? change[i] >= target : change[i] <= target;
      if (crossed) {
        double r0 = Math.sqrt(Math.max(t[i - 1], 0));
        double r1 = Math.sqrt(t[i]);
        double w = (target - change[i - 1]) / (change[i] - change[i - 1]);
        if (!(w >= 0 && w <= 1)) {
          w = 1;
        }
        double r = r0 + w * (r1 - r0);
        return OptionalDouble.of(r * r);
      }
    }
    return OptionalDouble.empty();
  }

  static void requireIncreasing(double[] t) {
    for (int i = 1; i < t.length; i++) {
      if (!(t[i] > t[i - 1])) {
        throw new IllegalArgumentException(
            "times must increase: point " + (i + 1) + " at " + t[i] + " s follows " + t[i - 1]);
      }
    }
  }
}
