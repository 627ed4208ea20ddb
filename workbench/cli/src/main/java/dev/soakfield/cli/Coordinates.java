package dev.soakfield.cli;

/** Reads a point typed as X,Y,Z with optional length units; zero and negative values allowed. */
final class Coordinates {
  private Coordinates() {}

  static double[] parse(String text, String option) {
    String[] parts = text.split(",", -1);
    if (parts.length != 3) {
      throw new UserInputException(
          option + ": found '" + text + "', expected a point X,Y,Z such as 2mm,2mm,0");
    }
    double[] p = new double[3];
    for (int i = 0; i < 3; i++) {
      String s = parts[i].trim();
      boolean negative = s.startsWith("-");
      String magnitude = negative ? s.substring(1) : s;
      p[i] = isZero(magnitude) ? 0.0 : Lengths.parse(magnitude, option);
      if (negative) {
        p[i] = -p[i];
      }
    }
    return p;
  }

  private static boolean isZero(String s) {
    String digits = s.replaceAll("[a-zA-Zµ\\s]", "");
    try {
      return Double.parseDouble(digits) == 0.0;
    } catch (NumberFormatException e) {
      return false;
    }
  }
}
