package dev.soakfield.app;

/**
 * The Oklab colour space (B. Ottosson, "A perceptual color space for image processing", 2020):
 * linear sRGB to LMS by matrix M1, a cube root, then to L, a, b by matrix M2. Euclidean distance in
 * Oklab approximates perceived colour difference, which is what a uniform colour map is built on.
 * The inverse matrices are computed from the published forward ones, so the two directions agree to
 * rounding.
 */
public final class OkLab {
  // Ottosson (2020), linear sRGB -> LMS
  private static final double[][] M1 = {
    {0.4122214708, 0.5363325363, 0.0514459929},
    {0.2119034982, 0.6806995451, 0.1073969566},
    {0.0883024619, 0.2817188376, 0.6299787005}
  };
  // Ottosson (2020), LMS' (cube roots) -> Lab
  private static final double[][] M2 = {
    {0.2104542553, 0.7936177850, -0.0040720468},
    {1.9779984951, -2.4285922050, 0.4505937099},
    {0.0259040371, 0.7827717662, -0.8086757660}
  };
  private static final double[][] M1_INV = invert(M1);
  private static final double[][] M2_INV = invert(M2);

  private OkLab() {}

  /** Linear-light sRGB (0..1 each) to L, a, b. */
  public static double[] fromLinearRgb(double r, double g, double b) {
    double[] lms = mul(M1, r, g, b);
    return mul(M2, Math.cbrt(lms[0]), Math.cbrt(lms[1]), Math.cbrt(lms[2]));
  }

  /** L, a, b to linear-light sRGB (may fall outside 0..1 for colours outside the sRGB gamut). */
  public static double[] toLinearRgb(double l, double a, double b) {
    double[] q = mul(M2_INV, l, a, b);
    return mul(M1_INV, q[0] * q[0] * q[0], q[1] * q[1] * q[1], q[2] * q[2] * q[2]);
  }

  /** sRGB transfer function (IEC 61966-2-1): linear light to encoded value. */
  public static double encode(double linear) {
    return linear <= 0.0031308 ? 12.92 * linear : 1.055 * Math.pow(linear, 1 / 2.4) - 0.055;
  }

  /** Inverse of {@link #encode} (IEC 61966-2-1). */
  public static double decode(double encoded) {
    return encoded <= 0.04045 ? encoded / 12.92 : Math.pow((encoded + 0.055) / 1.055, 2.4);
  }

  private static double[] mul(double[][] m, double x, double y, double z) {
    return new double[] {
      m[0][0] * x + m[0][1] * y + m[0][2] * z,
      m[1][0] * x + m[1][1] * y + m[1][2] * z,
      m[2][0] * x + m[2][1] * y + m[2][2] * z
    };
  }

  private static double[][] invert(double[][] m) {
    double a = m[0][0];
    double b = m[0][1];
    double c = m[0][2];
    double d = m[1][0];
    double e = m[1][1];
    double f = m[1][2];
    double g = m[2][0];
    double h = m[2][1];
    double i = m[2][2];
    double det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
    return new double[][] {
      {(e * i - f * h) / det, (c * h - b * i) / det, (b * f - c * e) / det},
      {(f * g - d * i) / det, (a * i - c * g) / det, (c * d - a * f) / det},
      {(d * h - e * g) / det, (b * g - a * h) / det, (a * e - b * d) / det}
    };
  }
}
