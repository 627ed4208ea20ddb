package dev.soakfield.fem.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class HydrogenFugacityTest {
  @Test
  void fugacityTendsToPressureAtLowPressure() {
    // an ideal gas in the limit p → 0: f/p → 1 (any equation of state; common practice)
    assertEquals(1.0, HydrogenFugacity.fugacity(100, 300) / 100, 1e-6);
    assertEquals(1.0, HydrogenFugacity.fugacity(1e3, 500) / 1e3, 1e-5);
  }

  @Test
  void tenMegapascalsAtThreeHundredKelvin() {
    // by hand from f = p·exp(b·p/(R·T)): b·p/(R·T) = 15.84e-6·1e7/(8.314462618·300) = 0.06350380,
    // exp(0.06350380) = 1.06556354, so f = 10.6556354 MPa
    assertEquals(10.6556354e6, HydrogenFugacity.fugacity(1e7, 300), 1);
  }

  @Test
  void refusesNegativePressureAndZeroTemperature() {
    assertThrows(IllegalArgumentException.class, () -> HydrogenFugacity.fugacity(-1, 300));
    assertThrows(IllegalArgumentException.class, () -> HydrogenFugacity.fugacity(1e6, 0));
  }
}
