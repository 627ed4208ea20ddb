package dev.soakfield.fem.post;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The permeation figures of one face group from a run's record of it: the flux per unit area over
 * time, the steady flux once reached, the time lag from the intercept of the cumulative flow with
 * the time axis (Daynes 1920, Barrer 1939: Q(t) → J_ss·(t − t_lag) once the flux is steady) and the
 * breakthrough time, the first time the flux reaches a share of the steady flux.
 *
 * <p>The direction is the one the net flow takes at the end of the run: an exit face (outflow)
 * counts outflow as positive, an entry face inflow. The flux is steady when it changed by less than
 * {@link #STEADY_CHANGE} of its final value over the last {@link #STEADY_WINDOW} of the run's time.
 *
 * @param direction "out" for an exit face, "in" for an entry face
 * @param area the group's area, m²
 * @param steadyFlux J_ss per unit area, NaN when the flux did not become steady
 * @param timeLag t_lag, s (NaN when not steady)
 * @param breakthrough the first time the flux reached {@code share}·J_ss, s (NaN when not steady,
 *     and for an entry face)
 * @param share the breakthrough share of the steady flux
 */
public record PermeationFigures(
    String direction,
    double area,
    double steadyFlux,
    double timeLag,
    double breakthrough,
    double share) {
  /** The default breakthrough share of the steady flux (common practice). */
  public static final double DEFAULT_SHARE = 0.1;

  /** The last share of the run's time over which a steady flux changes by less than ... */
  static final double STEADY_WINDOW = 0.2;

  /** ... this share of itself. */
  static final double STEADY_CHANGE = 0.01;

  /**
   * The figures of one group, or empty when nothing flowed through it.
   *
   * @param time the record's times, s, increasing, the first the start of the run
   * @param rate inflow rate at each time (amount per second, positive inward), the mean over the
   *     step that ended there
   * @param cumulative cumulative inflow at each time (amount, positive inward)
   * @param area the group's area, m² (positive)
   * @param share the breakthrough share, in (0, 1)
   */
  public static java.util.Optional<PermeationFigures> of(
      double[] time, double[] rate, double[] cumulative, double area, double share) {
    if (!(area > 0) || !(share > 0 && share < 1)) {
      throw new IllegalArgumentException("area " + area + " and share " + share);
    }
    int n = time.length;
    if (n < 2 || rate.length != n || cumulative.length != n) {
      return java.util.Optional.empty();
    }
    double last = rate[n - 1];
    double sign = last != 0 ? Math.signum(last) : Math.signum(cumulative[n - 1]);
    if (sign == 0) {
      return java.util.Optional.empty();
    }
    String direction = sign > 0 ? "in" : "out";
    double end = time[n - 1];
    double jEnd = sign * last / area;
    double jBefore = sign * at(time, rate, end - STEADY_WINDOW * (end - time[0])) / area;
    boolean steady = jEnd > 0 && Math.abs(jEnd - jBefore) <= STEADY_CHANGE * jEnd;
    if (!steady) {
      return java.util.Optional.of(
          new PermeationFigures(direction, area, Double.NaN, Double.NaN, Double.NaN, share));
    }
    double lag = end - sign * cumulative[n - 1] / (area * jEnd);
    double breakthrough = Double.NaN;
    double level = share * jEnd;
    // breakthrough is an exit face's figure: an entry face's flux starts at its largest and would
    // "break through" in the first step
    for (int i = 1; i < n && sign < 0; i++) {
      double j = sign * rate[i] / area;
      if (j >= level) {
        // the rate of a row is its step's mean: it stands for the step's middle
        double prevJ = i > 1 ? sign * rate[i - 1] / area : 0.0;
        double tPrev = i > 1 ? 0.5 * (time[i - 2] + time[i - 1]) : time[0];
        double tNow = 0.5 * (time[i - 1] + time[i]);
        breakthrough = j == prevJ ? tNow : tPrev + (tNow - tPrev) * (level - prevJ) / (j - prevJ);
        break;
      }
    }
    return java.util.Optional.of(
        new PermeationFigures(direction, area, jEnd, lag, breakthrough, share));
  }

  /** The rate at time t, linear between the rows. */
  private static double at(double[] time, double[] v, double t) {
    int n = time.length;
    if (t <= time[0]) {
      return v[0];
    }
    for (int i = 1; i < n; i++) {
      if (time[i] >= t) {
        double w = (t - time[i - 1]) / (time[i] - time[i - 1]);
        return v[i - 1] + w * (v[i] - v[i - 1]);
      }
    }
    return v[n - 1];
  }

  /** As summary.json gives it: SI per unit area, null where not reached. */
  public Map<String, Object> toMap() {
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("steady_flux", orNull(steadyFlux));
    m.put("time_lag", orNull(timeLag));
    m.put("breakthrough", orNull(breakthrough));
    m.put("direction", direction);
    m.put("area", area);
    m.put("breakthrough_share", share);
    return m;
  }

  private static Object orNull(double v) {
    return Double.isNaN(v) ? null : v;
  }
}
