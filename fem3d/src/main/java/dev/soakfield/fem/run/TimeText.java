package dev.soakfield.fem.run;

import java.util.Locale;

/** Durations in seconds as people read them: s, min, h or d, three significant digits. */
public final class TimeText {
  private static final double MINUTE = 60;
  private static final double HOUR = 3600;
  private static final double DAY = 86400;

  private TimeText() {}

  /** {@code seconds} in the largest unit that keeps the number at or above 1. */
  public static String of(double seconds) {
    double a = Math.abs(seconds);
    if (!Double.isFinite(seconds)) {
      return "?";
    }
    if (a >= 2 * DAY) {
      return format(seconds / DAY, "d");
    }
    if (a >= 2 * HOUR) {
      return format(seconds / HOUR, "h");
    }
    if (a >= 2 * MINUTE) {
      return format(seconds / MINUTE, "min");
    }
    return format(seconds, "s");
  }

  private static String format(double v, String unit) {
    return String.format(Locale.ROOT, "%.3g %s", v, unit);
  }
}
