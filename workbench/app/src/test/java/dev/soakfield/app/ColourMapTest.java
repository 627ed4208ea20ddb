package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ColourMapTest {
  @Test
  void okLabMapsWhiteToLightnessOneAndRoundTrips() {
    // Ottosson (2020): the matrices are normalised so that sRGB white has L = 1, a = b = 0
    double[] white = OkLab.fromLinearRgb(1, 1, 1);
    assertEquals(1, white[0], 1e-4);
    assertEquals(0, white[1], 1e-4);
    assertEquals(0, white[2], 1e-4);
    double[] lab = OkLab.fromLinearRgb(0.2, 0.5, 0.9);
    double[] back = OkLab.toLinearRgb(lab[0], lab[1], lab[2]);
    assertEquals(0.2, back[0], 1e-12);
    assertEquals(0.5, back[1], 1e-12);
    assertEquals(0.9, back[2], 1e-12);
    // IEC 61966-2-1: encoding 0.5 linear gives 0.7354 (from the transfer function)
    assertEquals(0.7354, OkLab.encode(0.5), 1e-4);
    assertEquals(0.5, OkLab.decode(OkLab.encode(0.5)), 1e-12);
  }

  @Test
  void rampIsPerceptuallyUniformAndRisesInLightness() {
    ColourMap map = ColourMap.ramp();
    double[] prev = null;
    double sum = 0;
    double sumSq = 0;
    int steps = 0;
    double prevL = -1;
    for (int i = 0; i < ColourMap.SIZE; i += 15) {
      double[] lab =
          OkLab.fromLinearRgb(
              OkLab.decode(map.channel(i, 0) / 255.0),
              OkLab.decode(map.channel(i, 1) / 255.0),
              OkLab.decode(map.channel(i, 2) / 255.0));
      assertTrue(lab[0] > prevL, "lightness rises at entry " + i);
      prevL = lab[0];
      if (prev != null) {
        double d =
            Math.sqrt(
                Math.pow(lab[0] - prev[0], 2)
                    + Math.pow(lab[1] - prev[1], 2)
                    + Math.pow(lab[2] - prev[2], 2));
        sum += d;
        sumSq += d * d;
        steps++;
      }
      prev = lab;
    }
    double mean = sum / steps;
    double sd = Math.sqrt(sumSq / steps - mean * mean);
    // equal value steps are equal colour steps in Oklab, up to 8-bit rounding
    assertTrue(sd / mean < 0.05, "spread of step sizes " + sd / mean);
    // the ends: dark at the low end, light at the high end
    assertTrue(map.colourOf(0, 0, 1) != map.colourOf(1, 0, 1));
    assertEquals(map.colourOf(-5, 0, 1), map.colourOf(0, 0, 1));
    assertEquals(map.colourOf(7, 0, 1), map.colourOf(1, 0, 1));
    assertEquals(0, ColourMap.index(Double.NaN, 0, 1));
    assertEquals(128, ColourMap.index(0.5, 0, 1));
  }

  @Test
  void rampPathLiesInsideTheSrgbGamutWithoutClamping() {
    for (int i = 0; i < ColourMap.SIZE; i++) {
      double t = i / (ColourMap.SIZE - 1.0);
      double l = ColourMap.L_LOW + (ColourMap.L_HIGH - ColourMap.L_LOW) * t;
      double h =
          Math.toRadians(
              ColourMap.HUE_LOW_DEG + (ColourMap.HUE_HIGH_DEG - ColourMap.HUE_LOW_DEG) * t);
      double[] rgb =
          OkLab.toLinearRgb(l, ColourMap.CHROMA * Math.cos(h), ColourMap.CHROMA * Math.sin(h));
      for (double v : rgb) {
        assertTrue(v >= 0 && v <= 1, "entry " + i + " outside sRGB: " + v);
      }
    }
  }

  @Test
  void paletteTellsNeighbouringGroupsApart() {
    for (int i = 0; i < 12; i++) {
      for (int j = i + 1; j < 12; j++) {
        double[] a = lab(FaceGroupPalette.colourOf(i));
        double[] b = lab(FaceGroupPalette.colourOf(j));
        double d =
            Math.sqrt(
                Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
        // 0.02 in Oklab is about a just noticeable difference (Ottosson 2020, from memory): ask for
        // 2x
        assertTrue(d > 0.04, i + " and " + j + " too close: " + d);
      }
    }
  }

  private static double[] lab(int rgb) {
    return OkLab.fromLinearRgb(
        OkLab.decode(((rgb >> 16) & 0xff) / 255.0),
        OkLab.decode(((rgb >> 8) & 0xff) / 255.0),
        OkLab.decode((rgb & 0xff) / 255.0));
  }
}
