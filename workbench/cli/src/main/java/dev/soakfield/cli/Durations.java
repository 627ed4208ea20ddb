package dev.soakfield.cli;

import java.util.Locale;

/** Durations as people read them: seconds, minutes, hours or days with the unit. */
final class Durations {
  private Durations() {}

  static String readable(double seconds) {
    double a = Math.abs(seconds);
    if (a < 120) {
      return String.format(Locale.ROOT, "%.3g s", seconds);
    }
    if (a < 7200) {
      return String.format(Locale.ROOT, "%.3g min", seconds / 60);
    }
    if (a < 3 * 86400) {
      return String.format(Locale.ROOT, "%.4g h", seconds / 3600);
    }
    return String.format(Locale.ROOT, "%.4g d", seconds / 86400);
  }
}
