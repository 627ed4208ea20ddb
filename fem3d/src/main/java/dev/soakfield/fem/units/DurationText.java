package dev.soakfield.fem.units;

import java.util.Locale;

/**
 * Durations as people read them, the one unit ladder every printed time uses: seconds below 2
 * minutes, minutes below 2 hours, hours below a caller's day threshold, then days. Callers pick the
 * threshold and the digits; the ladder is the same everywhere.
 */
public final class DurationText {
  private static final double MINUTE = 60;
  private static final double HOUR = 3600;
  private static final double DAY = 86400;

  private DurationText() {}

  /** A duration in the unit the ladder picks: {@code value} in {@code unit} (s, min, h or d). */
  public record Scaled(double value, String unit) {}

  /**
   * The duration on the ladder, in days from {@code daysFrom} seconds on (infinite: never days).
   */
  public static Scaled scaled(double seconds, double daysFrom) {
    double a = Math.abs(seconds);
    if (a < 2 * MINUTE) {
      return new Scaled(seconds, "s");
    }
    if (a < 2 * HOUR) {
      return new Scaled(seconds / MINUTE, "min");
    }
    if (a < daysFrom) {
      return new Scaled(seconds / HOUR, "h");
    }
    return new Scaled(seconds / DAY, "d");
  }

  /** Three significant digits, days from 2 d on; "?" for a duration that is not finite (logs). */
  public static String of(double seconds) {
    if (!Double.isFinite(seconds)) {
      return "?";
    }
    Scaled s = scaled(seconds, 2 * DAY);
    return String.format(Locale.ROOT, "%.3g %s", s.value(), s.unit());
  }

  /**
   * Three significant digits in seconds and minutes, four in hours and days (from 3 d on), for
   * times users act on (bake and stop times).
   */
  public static String readable(double seconds) {
    Scaled s = scaled(seconds, 3 * DAY);
    String digits = s.unit().equals("s") || s.unit().equals("min") ? "%.3g %s" : "%.4g %s";
    return String.format(Locale.ROOT, digits, s.value(), s.unit());
  }
}
