package dev.soakfield.fem.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * Conversion factors are the definitions of the SI brochure (BIPM, The International System of
 * Units, 9th ed., Tables 8 and 9): h = 3600 s, min = 60 s, d = 86400 s, bar = 1e5 Pa, t/°C = T/K −
 * 273.15; the prefixes are exact powers of ten.
 */
class SiValueTest {
  private static void near(double expected, double actual) {
    assertEquals(expected, actual, Math.abs(expected) * 1e-14);
  }

  @Test
  void theIssuesExamplesConvertToSi() throws UnitException {
    near(2.5e-12, SiValue.parse("2.5e-12 m^2/s", "m^2/s"));
    near(0.009e-6 / 3600, SiValue.parse("0.009 mm^2/h", "m^2/s"));
    near(168 * 3600.0, SiValue.parse("168 h", "s"));
    near(358.15, SiValue.parse("85 degC", "K"));
    near(358.15, SiValue.parse("85 °C", "K"));
    near(1e7, SiValue.parse("10 MPa", "Pa"));
    near(3, SiValue.parse("3 kg/m^3", "kg/m^3"));
    near(0.003, SiValue.parse("0.3 wt%", "1"));
    near(1.2e-6, SiValue.parse("1.2 wppm", "1"));
    near(0.5, SiValue.parse("50 %", "1"));
    near(42e3, SiValue.parse("42 kJ/mol", "J/mol"));
    near(1e-3, SiValue.parse("1 mm", "m"));
    near(1e-3, SiValue.parse("1mm", "m"));
    near(1e-8, SiValue.parse("1e-8 m/s", "m/s"));
    near(2e5, SiValue.parse("2 bar", "Pa"));
    near(1800, SiValue.parse("30 min", "s"));
    near(7 * 86400.0, SiValue.parse("7 d", "s"));
    near(1.2e-3, SiValue.parse("1.2g", "kg"));
    near(-38e3, SiValue.parse("-38 kJ/mol", "J/mol"));
  }

  @Test
  void aPlainNumberIsAlreadySi() throws UnitException {
    assertEquals(358.15, SiValue.parse(" 358.15 ", "K"));
    assertEquals(4.7e-6, SiValue.parse("4.7e-6", "m^2/s"));
    assertEquals(0.85, SiValue.parse("0.85", "1"));
  }

  @Test
  void repeatedSolidusDividesByEveryFactor() throws UnitException {
    // mol/m^2/s means mol/(m^2·s) (common practice); 1 mA/cm^2 = 10 A/m^2 by the prefixes
    near(2.0, SiValue.parse("2 mol/m^2/s", "mol/(m^2*s)"));
    near(10, SiValue.parse("1 mA/cm^2", "A/m^2"));
    near(0.5, SiValue.parse("30 1/min", "1/s"));
  }

  @Test
  void aWrongDimensionNamesWhatWasFoundAndExpected() {
    UnitException e = assertThrows(UnitException.class, () -> SiValue.parse("10 MPa", "K"));
    assertTrue(e.found().contains("10 MPa"), e.getMessage());
    assertTrue(e.expected().contains("K"), e.getMessage());
    assertTrue(e.getMessage().contains("[Θ]"), e.getMessage());
    UnitException u = assertThrows(UnitException.class, () -> SiValue.parse("3 furlongs", "m"));
    assertTrue(u.found().contains("furlongs"), u.getMessage());
    assertThrows(UnitException.class, () -> SiValue.parse("fast", "m/s"));
    assertThrows(UnitException.class, () -> SiValue.parse("", "s"));
    assertThrows(UnitException.class, () -> SiValue.parse("0.3 wt%", "kg/m^3"));
  }

  @Test
  void columnConvertersAndOutputConversions() throws UnitException {
    DoubleUnaryOperator c = SiValue.converterTo("degC", "K");
    near(373.15, c.applyAsDouble(100));
    near(2.5, SiValue.converterTo("", "s").applyAsDouble(2.5));
    near(1.2e-6, SiValue.converterTo("mg", "kg").applyAsDouble(1.2));
    near(0.009, SiValue.fromSi(2.5e-12, "m^2/s", "mm^2/h"));
    near(85, SiValue.fromSi(358.15, "K", "degC"));
    assertThrows(UnitException.class, () -> SiValue.converterTo("h", "kg"));
  }

  @Test
  void dimensionsAndReadableOutput() throws UnitException {
    assertEquals("[L]²/[T]", SiValue.dimensionOf("0.009 mm^2/h"));
    assertEquals("[Θ]", SiValue.dimensionOf("degC"));
    assertEquals(SiValue.dimensionOf("1"), SiValue.dimensionOf("0.3 wt%"));
    assertEquals("2.500e-12 m²/s", SiValue.format(2.5e-12, "m^2/s"));
    assertEquals("300.0 K", SiValue.format(300, "K"));
    assertEquals("0.8500", SiValue.format(0.85, "1"));
  }

  @Test
  void manyThreadsGetTheSameValuesAsOne() throws Exception {
    String[] texts = {"0.009 mm^2/h", "85 degC", "2 bar", "1.2 wppm", "30 min", "3 kg/m^3"};
    String[] units = {"m^2/s", "K", "Pa", "1", "s", "kg/m^3"};
    double[] expected = new double[texts.length];
    for (int i = 0; i < texts.length; i++) {
      expected[i] = SiValue.parse(texts[i], units[i]);
    }
    ExecutorService pool = Executors.newFixedThreadPool(4);
    try {
      List<Future<Integer>> jobs = new ArrayList<>();
      for (int job = 0; job < 8; job++) {
        jobs.add(
            pool.submit(
                () -> {
                  int bad = 0;
                  for (int k = 0; k < 2000; k++) {
                    int i = k % texts.length;
                    if (SiValue.parse(texts[i], units[i]) != expected[i]) {
                      bad++;
                    }
                  }
                  return bad;
                }));
      }
      for (Future<Integer> f : jobs) {
        assertEquals(0, f.get());
      }
    } finally {
      pool.shutdown();
    }
  }
}
