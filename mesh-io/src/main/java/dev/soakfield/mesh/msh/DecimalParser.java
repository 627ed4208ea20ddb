package dev.soakfield.mesh.msh;

/**
 * Parses a decimal number from ASCII bytes. Plain decimals with at most 15 significant digits and a
 * small power of ten take a fast path that is exact: the digits form an integer below 2^53 and the
 * power of ten is itself exact in a double, so one multiplication or division rounds once,
 * correctly (W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990). Up to 19
 * digits go through {@link EiselLemire}, which is exact too; anything it cannot settle goes to
 * {@link Double#parseDouble}, so every value printed by {@link Double#toString} reads back bit for
 * bit.
 */
final class DecimalParser {
  private static final double[] POW10 = {
    1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16,
    1e17, 1e18, 1e19, 1e20, 1e21, 1e22
  };

  private DecimalParser() {}

  /**
   * The value of {@code buf[from..to)}.
   *
   * @throws NumberFormatException when the bytes are not a decimal number (digits, one point, an
   *     optional sign and exponent); names such as NaN or Infinity are not accepted
   */
  static double parse(byte[] buf, int from, int to) {
    int i = from;
    boolean negative = false;
    if (i < to && (buf[i] == '-' || buf[i] == '+')) {
      negative = buf[i] == '-';
      i++;
    }
    long mantissa = 0;
    int significant = 0;
    int scale = 0;
    int digits = 0;
    boolean point = false;
    for (; i < to; i++) {
      int c = buf[i];
      if (c >= '0' && c <= '9') {
        digits++;
        if (mantissa != 0 || c != '0') {
          if (significant < 19) {
            mantissa = mantissa * 10 + (c - '0');
          }
          significant++;
          if (point) {
            scale--;
          }
        } else if (point) {
          scale--;
        }
      } else if (c == '.' && !point) {
        point = true;
      } else {
        break;
      }
    }
    if (digits == 0) {
      throw new NumberFormatException("no digits");
    }
    int exponent = 0;
    if (i < to) {
      if (buf[i] != 'e' && buf[i] != 'E') {
        throw new NumberFormatException("unexpected character");
      }
      i++;
      boolean negativeExponent = false;
      if (i < to && (buf[i] == '-' || buf[i] == '+')) {
        negativeExponent = buf[i] == '-';
        i++;
      }
      if (i == to) {
        throw new NumberFormatException("no exponent digits");
      }
      for (; i < to; i++) {
        int c = buf[i];
        if (c < '0' || c > '9') {
          throw new NumberFormatException("unexpected character in exponent");
        }
        if (exponent < 100_000) {
          exponent = exponent * 10 + (c - '0');
        }
      }
      if (negativeExponent) {
        exponent = -exponent;
      }
    }
    if (mantissa == 0) {
      return negative ? -0.0 : 0.0;
    }
    int power = scale + exponent;
    if (significant <= 15 && power >= -22 && power <= 22) {
      double v = power >= 0 ? mantissa * POW10[power] : mantissa / POW10[-power];
      return negative ? -v : v;
    }
    if (significant <= 19) {
      double v = EiselLemire.toDouble(mantissa, power, negative);
      if (!Double.isNaN(v)) {
        return v;
      }
    }
    return Double.parseDouble(
        new String(buf, from, to - from, java.nio.charset.StandardCharsets.ISO_8859_1));
  }
}
