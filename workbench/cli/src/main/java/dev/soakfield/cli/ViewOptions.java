package dev.soakfield.cli;

import dev.soakfield.app.ViewSettings;
import java.util.Locale;

/** The view options of {@code render} and {@code bench render}: picture size, time and section. */
final class ViewOptions {
  private ViewOptions() {}

  /** A picture size typed as WIDTHxHEIGHT, 64 to 8192 pixels each. */
  static int[] size(String text) {
    String[] p = text.toLowerCase(Locale.ROOT).split("x", -1);
    try {
      if (p.length == 2) {
        int w = Integer.parseInt(p[0].strip());
        int h = Integer.parseInt(p[1].strip());
        if (w >= 64 && h >= 64 && w <= 8192 && h <= 8192) {
          return new int[] {w, h};
        }
      }
    } catch (NumberFormatException e) {
      // the message below
    }
    throw new UserInputException(
        "--size: found '"
            + text
            + "', expected WIDTHxHEIGHT in pixels, 64 to 8192 each, e.g. 1024x768");
  }

  /** Seconds of a time typed as 3600, 90min, 168h or 7d. */
  static double seconds(String text) {
    String t = text.strip().toLowerCase(Locale.ROOT);
    double factor = 1;
    String[][] units = {{"min", "60"}, {"s", "1"}, {"h", "3600"}, {"d", "86400"}};
    for (String[] u : units) {
      if (t.endsWith(u[0])) {
        factor = Double.parseDouble(u[1]);
        t = t.substring(0, t.length() - u[0].length()).strip();
        break;
      }
    }
    try {
      double v = Double.parseDouble(t) * factor;
      if (Double.isFinite(v)) {
        return v;
      }
    } catch (NumberFormatException e) {
      // the message below
    }
    throw new UserInputException(
        "--time: found '" + text + "', expected a time such as 3600, 90min, 168h or 7d");
  }

  /** A plane AXIS:POS with POS a length that may be zero or negative and may carry a unit. */
  static ViewSettings.Plane plane(String text) {
    String[] p = text.split(":", -1);
    if (p.length == 2) {
      String pos = p[1].strip();
      boolean negative = pos.startsWith("-");
      String magnitude = negative ? pos.substring(1) : pos;
      String digits = magnitude.replaceAll("[a-zµ\\s]+$", "");
      double metres;
      try {
        metres = Double.parseDouble(digits) == 0 ? 0 : Lengths.parse(magnitude, "--section");
      } catch (NumberFormatException e) {
        metres = Lengths.parse(magnitude, "--section"); // names the option and the text
      }
      try {
        return ViewSettings.Plane.parse(p[0] + ":" + (negative ? -metres : metres));
      } catch (IllegalArgumentException e) {
        throw new UserInputException("--section: " + e.getMessage());
      }
    }
    throw new UserInputException(
        "--section: found '" + text + "', expected AXIS:POS with AXIS x, y or z (e.g. z:2mm)");
  }
}
