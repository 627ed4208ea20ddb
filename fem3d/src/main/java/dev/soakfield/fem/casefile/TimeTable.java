package dev.soakfield.fem.casefile;

import dev.soakfield.fem.physics.TimeFunction;
import java.util.Arrays;

/**
 * A value that changes with time: piecewise linear between its breakpoints and held at the first or
 * last value outside them. A constant table has no breakpoints. Immutable; {@link #at} is cheap
 * enough to call once per step and face group.
 */
public final class TimeTable implements TimeFunction {
  private final double[] times;
  private final double[] values;

  private TimeTable(double[] times, double[] values) {
    this.times = times;
    this.values = values;
  }

  /** The same value at every time. */
  public static TimeTable constant(double value) {
    checkFinite(value, "value");
    return new TimeTable(new double[0], new double[] {value});
  }

  /**
   * A table through the points (times[i], values[i]).
   *
   * @throws IllegalArgumentException when the arrays are empty, differ in length, hold a number
   *     that is not finite, or the times do not increase strictly
   */
  public static TimeTable of(double[] times, double[] values) {
    if (times.length == 0 || times.length != values.length) {
      throw new IllegalArgumentException(
          "a time table needs one value per time and at least one point, got "
              + times.length
              + " times and "
              + values.length
              + " values");
    }
    for (int i = 0; i < times.length; i++) {
      checkFinite(times[i], "time " + i);
      checkFinite(values[i], "value " + i);
      if (i > 0 && !(times[i] > times[i - 1])) {
        throw new IllegalArgumentException(
            "time table times must increase strictly, got " + times[i] + " after " + times[i - 1]);
      }
    }
    return new TimeTable(times.clone(), values.clone());
  }

  private static void checkFinite(double x, String what) {
    if (!Double.isFinite(x)) {
      throw new IllegalArgumentException(what + " must be finite, got " + x);
    }
  }

  /** The value at time {@code t}: linear between breakpoints, held outside them. */
  @Override
  public double at(double t) {
    int n = times.length;
    if (n == 0 || t <= times[0]) {
      return values[0];
    }
    if (t >= times[n - 1]) {
      return values[n - 1];
    }
    // times[lo] < t < times[hi] after the search; the interval holding t is [lo, lo + 1]
    int lo = 0;
    int hi = n - 1;
    while (hi - lo > 1) {
      int mid = (lo + hi) >>> 1;
      if (times[mid] <= t) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    double w = (t - times[lo]) / (times[hi] - times[lo]);
    return values[lo] + w * (values[hi] - values[lo]);
  }

  /** The times where the slope may change (a copy); empty for a constant table. */
  @Override
  public double[] breakpoints() {
    return times.clone();
  }

  /** True when the value never changes. */
  public boolean isConstant() {
    for (int i = 1; i < values.length; i++) {
      if (values[i] != values[0]) {
        return false;
      }
    }
    return true;
  }

  /** Largest value the table takes (at a breakpoint, since it is piecewise linear). */
  public double max() {
    double m = values[0];
    for (int i = 1; i < values.length; i++) {
      m = Math.max(m, values[i]);
    }
    return m;
  }

  /** Smallest value the table takes (at a breakpoint, since it is piecewise linear). */
  public double min() {
    double m = values[0];
    for (int i = 1; i < values.length; i++) {
      m = Math.min(m, values[i]);
    }
    return m;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof TimeTable other
        && Arrays.equals(times, other.times)
        && Arrays.equals(values, other.values);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(times) + Arrays.hashCode(values);
  }

  @Override
  public String toString() {
    if (times.length == 0) {
      return "TimeTable[" + values[0] + "]";
    }
    StringBuilder sb = new StringBuilder("TimeTable[");
    for (int i = 0; i < times.length; i++) {
      sb.append(i == 0 ? "" : ", ").append('(').append(times[i]).append(", ");
      sb.append(values[i]).append(')');
    }
    return sb.append(']').toString();
  }
}
