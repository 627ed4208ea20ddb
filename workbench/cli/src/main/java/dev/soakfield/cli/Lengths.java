package dev.soakfield.cli;

import java.util.Locale;
import java.util.Map;

/**
 * Reads lengths typed on the command line: a plain number is metres; a unit may follow (m, cm, mm,
 * um, in), so {@code 0.002}, {@code 2mm} and {@code 2 mm} are the same length.
 */
final class Lengths {
  private static final Map<String, Double> METRES_PER_UNIT =
      Map.of("m", 1.0, "cm", 1e-2, "mm", 1e-3, "um", 1e-6, "µm", 1e-6, "in", 0.0254);

  private Lengths() {}

  /** One positive length in metres; {@code option} names the option in the error. */
  static double parse(String text, String option) {
    String t = text.trim().toLowerCase(Locale.ROOT);
    int end = t.length();
    while (end > 0 && isUnitChar(t.charAt(end - 1))) {
      end--;
    }
    String unit = t.substring(end).trim();
    String number = t.substring(0, end).trim();
    Double factor = unit.isEmpty() ? Double.valueOf(1.0) : METRES_PER_UNIT.get(unit);
    if (factor == null) {
      throw new UserInputException(
          option + ": found unit '" + unit + "' in '" + text + "', expected m, cm, mm, um or in");
    }
    double value;
    try {
      value = Double.parseDouble(number);
    } catch (NumberFormatException e) {
      throw new UserInputException(
          option + ": found '" + text + "', expected a length such as 0.002 or 2mm");
    }
    if (!(value > 0) || Double.isInfinite(value)) {
      throw new UserInputException(
          option + ": found '" + text + "', expected a positive, finite length");
    }
    return value * factor;
  }

  private static boolean isUnitChar(char c) {
    return Character.isLetter(c) || c == 'µ';
  }

  /** Exactly {@code count} comma-separated positive lengths in metres. */
  static double[] parseList(String text, int count, String option) {
    String[] parts = split(text, count, option, "");
    double[] out = new double[count];
    for (int i = 0; i < count; i++) {
      out[i] = parse(parts[i], option);
    }
    return out;
  }

  /** Exactly {@code count} comma-separated positive integers. */
  static int[] parseCounts(String text, int count, String option) {
    String[] parts = split(text, count, option, " whole numbers");
    int[] out = new int[count];
    for (int i = 0; i < count; i++) {
      out[i] = parseCount(parts[i], option);
    }
    return out;
  }

  private static String[] split(String text, int count, String option, String what) {
    String[] parts = text.split(",", -1);
    if (parts.length != count) {
      throw new UserInputException(
          option
              + ": found "
              + parts.length
              + " value(s) in '"
              + text
              + "', expected "
              + count
              + what
              + " separated by commas");
    }
    return parts;
  }

  /** One positive integer. */
  static int parseCount(String text, String option) {
    int v;
    try {
      v = Integer.parseInt(text.trim());
    } catch (NumberFormatException e) {
      throw new UserInputException(option + ": found '" + text + "', expected a whole number");
    }
    if (v <= 0) {
      throw new UserInputException(option + ": found " + v + ", expected a positive count");
    }
    return v;
  }
}
