package dev.soakfield.app;

import java.util.ArrayList;
import java.util.List;

/**
 * Tick values a reader takes in at a glance: multiples of a step of 1, 2 or 5 × 10ⁿ that lie within
 * the limits (common practice; P. Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990,
 * picks steps the same way).
 */
public final class RoundTicks {
  private RoundTicks() {}

  /** The largest round step that still gives at least {@code minTicks} ticks in [lo, hi]. */
  public static double step(double lo, double hi, int minTicks) {
    double span = hi - lo;
    if (!(span > 0) || !Double.isFinite(span)) {
      return 0;
    }
    double raw = span / Math.max(1, minTicks - 1);
    double decade = Math.pow(10, Math.floor(Math.log10(raw)));
    for (double m : new double[] {5, 2, 1}) {
      if (m * decade <= raw * (1 + 1e-9)) {
        return m * decade;
      }
    }
    return decade;
  }

  /** Round values within [lo, hi], at least {@code minTicks} of them when the span allows. */
  public static List<Double> within(double lo, double hi, int minTicks) {
    double step = step(lo, hi, minTicks);
    List<Double> out = new ArrayList<>();
    if (step == 0) {
      out.add(lo);
      return out;
    }
    double eps = 1e-9 * step;
    for (long k = (long) Math.ceil((lo - eps) / step); k * step <= hi + eps; k++) {
      double v = k * step;
      out.add(Math.abs(v) < eps ? 0.0 : v); // no "-0" and no 1e-17 for zero
    }
    return out;
  }
}
