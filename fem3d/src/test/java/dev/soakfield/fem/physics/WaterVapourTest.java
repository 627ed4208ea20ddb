package dev.soakfield.fem.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class WaterVapourTest {
  /** Relative agreement to 9 significant figures: half a unit in the ninth digit. */
  private static void nineFigures(double expected, double actual) {
    assertEquals(expected, actual, Math.abs(expected) * 5e-9);
  }

  @Test
  void matchesTheIf97VerificationTable() {
    // IAPWS R7-97(2012), Table 35 (verification values of the saturation-pressure equation)
    nineFigures(3.53658941e3, WaterVapour.saturationPressure(300));
    nineFigures(2.63889776e6, WaterVapour.saturationPressure(500));
    nineFigures(12.3443146e6, WaterVapour.saturationPressure(600));
  }

  @Test
  void boilsNearOneAtmosphereAtOneHundredCelsius() {
    // the normal boiling point of water on ITS-90 is 99.97 °C (common practice), so p_sat(100 °C)
    // lies just above 101325 Pa
    double p = WaterVapour.saturationPressure(373.15);
    assertTrue(p > 101325 && p < 101325 * 1.002, Double.toString(p));
  }

  @Test
  void refusesTemperaturesOutsideRegionFour() {
    IllegalArgumentException e =
        assertThrows(IllegalArgumentException.class, () -> WaterVapour.saturationPressure(650));
    assertTrue(e.getMessage().contains("647.096"), e.getMessage());
    assertThrows(IllegalArgumentException.class, () -> WaterVapour.saturationPressure(273.0));
    assertThrows(IllegalArgumentException.class, () -> WaterVapour.saturationPressure(Double.NaN));
    assertThrows(IllegalArgumentException.class, () -> WaterVapour.partialPressure(1.2, 300));
  }

  @Test
  void partialPressureScalesWithHumidity() {
    double p = WaterVapour.saturationPressure(358.15);
    assertEquals(0.85 * p, WaterVapour.partialPressure(0.85, 358.15), 1e-9 * p);
  }
}
