package dev.soakfield.app;

/**
 * The colour map for fields: a ramp of our own, perceptually uniform by construction. It is a helix
 * in {@link OkLab}: lightness rises linearly from 0.28 (deep violet) to 0.92 (pale straw) while the
 * hue turns from 300° through blue and teal to 100° at a constant chroma of 0.09, so equal steps of
 * the value are equal steps of perceived colour and the lightness alone already orders values (it
 * reads in grey print and for common colour-vision deficiencies). The chroma is the largest in
 * steps of 0.01 that keeps the whole path inside the sRGB gamut. Held as a 256-entry 8-bit table.
 */
public final class ColourMap {
  public static final int SIZE = 256;
  static final double L_LOW = 0.28;
  static final double L_HIGH = 0.92;
  static final double HUE_LOW_DEG = 300;
  static final double HUE_HIGH_DEG = 100;
  static final double CHROMA = 0.09;

  private static final ColourMap RAMP = new ColourMap();

  private final byte[] rgb = new byte[3 * SIZE];

  private ColourMap() {
    for (int i = 0; i < SIZE; i++) {
      double t = i / (SIZE - 1.0);
      double l = L_LOW + (L_HIGH - L_LOW) * t;
      double h = Math.toRadians(HUE_LOW_DEG + (HUE_HIGH_DEG - HUE_LOW_DEG) * t);
      double[] lin = OkLab.toLinearRgb(l, CHROMA * Math.cos(h), CHROMA * Math.sin(h));
      for (int k = 0; k < 3; k++) {
        double v = OkLab.encode(Math.min(1, Math.max(0, lin[k])));
        rgb[3 * i + k] = (byte) Math.round(255 * v);
      }
    }
  }

  /** The one ramp the workbench uses. */
  public static ColourMap ramp() {
    return RAMP;
  }

  /** Red, green or blue (0..255) of table entry {@code i}. */
  public int channel(int i, int k) {
    return rgb[3 * i + k] & 0xff;
  }

  /**
   * The colour of {@code value} between {@code low} and {@code high} (clamped), as 0xRRGGBB. A
   * value that is not a number, or an empty range, takes the lowest colour.
   */
  public int colourOf(double value, double low, double high) {
    int i = index(value, low, high);
    return (channel(i, 0) << 16) | (channel(i, 1) << 8) | channel(i, 2);
  }

  /** Table entry for {@code value} in [low, high], clamped. */
  public static int index(double value, double low, double high) {
    if (!(high > low) || Double.isNaN(value)) {
      return 0;
    }
    double t = (value - low) / (high - low);
    if (t <= 0) {
      return 0;
    }
    if (t >= 1) {
      return SIZE - 1;
    }
    return (int) (t * (SIZE - 1) + 0.5);
  }

  /** Fills {@code out} with r, g, b floats (0..1) for each value: the renderer's vertex colours. */
  public void fill(double[] values, double low, double high, float[] out) {
    for (int i = 0; i < values.length; i++) {
      int e = index(values[i], low, high);
      out[3 * i] = channel(e, 0) / 255f;
      out[3 * i + 1] = channel(e, 1) / 255f;
      out[3 * i + 2] = channel(e, 2) / 255f;
    }
  }
}
