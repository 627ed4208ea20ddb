package dev.soakfield.app;

import dev.soakfield.fem.units.DurationText;
import java.util.Locale;

/** Numbers and words for the picture's annotations: scale bar length, values, times. */
public final class Annotations {
  private Annotations() {}

  /**
   * The longest "round" length (1, 2 or 5 × 10^k) not above {@code max}: what a scale bar shows
   * (common practice in technical drawing and microscopy).
   */
  public static double roundLength(double max) {
    if (!(max > 0) || !Double.isFinite(max)) {
      throw new IllegalArgumentException("length: found " + max + ", expected a positive length");
    }
    double decade = Math.pow(10, Math.floor(Math.log10(max)));
    for (double m : new double[] {5, 2, 1}) {
      if (m * decade <= max * (1 + 1e-12)) {
        return m * decade;
      }
    }
    return decade;
  }

  /** A length in metres in the unit that reads best: m, mm or um (ASCII, for the bitmap font). */
  public static String length(double metres) {
    double a = Math.abs(metres);
    if (a == 0) {
      return "0 m";
    }
    if (a >= 1) {
      return number(metres) + " m";
    }
    if (a >= 1e-3) {
      return number(metres * 1e3) + " mm";
    }
    return number(metres * 1e6) + " um";
  }

  /** A time in seconds in s, min, h or d. */
  public static String time(double s) {
    DurationText.Scaled d = DurationText.scaled(s, 4 * 86400);
    return number(d.value()) + " " + d.unit();
  }

  /** Three significant digits, no trailing zeros, exponent form for very large or small. */
  public static String number(double v) {
    if (v == 0) {
      return "0";
    }
    double a = Math.abs(v);
    if (a >= 1e5 || a < 1e-3) {
      String s = String.format(Locale.ROOT, "%.2e", v);
      int e = s.indexOf('e');
      String mant = trimZeros(s.substring(0, e));
      int exp = Integer.parseInt(s.substring(e + 1));
      return mant + "e" + exp;
    }
    return trimZeros(
        String.format(
            Locale.ROOT, "%." + Math.max(0, 2 - (int) Math.floor(Math.log10(a))) + "f", v));
  }

  private static String trimZeros(String s) {
    if (!s.contains(".")) {
      return s;
    }
    s = s.replaceAll("0+$", "");
    return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
  }
}
