package dev.soakfield.app;

/**
 * Colours for face groups and parts, of our own: hues stepped by the golden angle (about 137.5°) in
 * {@link OkLab} at a fixed mid lightness and moderate chroma, so neighbouring indices differ
 * strongly and none stands out by brightness; the lightness cycles through three tones, so that
 * groups whose hues come close again (8 apart: 20°) still differ. Kept clear of the field ramp by
 * being shown only when no field is.
 */
public final class FaceGroupPalette {
  private static final double GOLDEN_ANGLE_DEG = 137.50776405003785;
  private static final double START_HUE_DEG = 35;
  private static final double[] LIGHTNESS = {0.66, 0.82, 0.74};

  private FaceGroupPalette() {}

  /** The colour of group {@code index} as 0xRRGGBB. */
  public static int colourOf(int index) {
    if (index < 0) {
      return 0x9a9a9a; // faces not in any group (e.g. opened by hiding a part): neutral grey
    }
    double h = Math.toRadians(START_HUE_DEG + GOLDEN_ANGLE_DEG * index);
    double l = LIGHTNESS[index % LIGHTNESS.length];
    double c = 0.10;
    double[] lin = OkLab.toLinearRgb(l, c * Math.cos(h), c * Math.sin(h));
    int rgb = 0;
    for (int k = 0; k < 3; k++) {
      double v = OkLab.encode(Math.min(1, Math.max(0, lin[k])));
      rgb = (rgb << 8) | (int) Math.round(255 * v);
    }
    return rgb;
  }
}
