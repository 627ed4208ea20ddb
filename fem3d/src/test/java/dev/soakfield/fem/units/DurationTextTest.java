package dev.soakfield.fem.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DurationTextTest {
  @Test
  void theLadderSwitchesUnitAtTwoOfTheNextOne() {
    // 1 min = 60 s, 1 h = 3600 s, 1 d = 86400 s (SI Brochure, 9th ed., table 8)
    assertEquals(new DurationText.Scaled(119, "s"), DurationText.scaled(119, 2 * 86400));
    assertEquals(new DurationText.Scaled(2, "min"), DurationText.scaled(120, 2 * 86400));
    assertEquals(new DurationText.Scaled(2, "h"), DurationText.scaled(7200, 2 * 86400));
    assertEquals(new DurationText.Scaled(47, "h"), DurationText.scaled(47 * 3600, 2 * 86400));
    assertEquals(new DurationText.Scaled(2, "d"), DurationText.scaled(2 * 86400, 2 * 86400));
    assertEquals("h", DurationText.scaled(1e9, Double.POSITIVE_INFINITY).unit());
  }

  @Test
  void logsAndDecisionsPrintTheirDigits() {
    assertEquals("24.0 h", DurationText.of(86400));
    assertEquals("3.00 d", DurationText.of(3 * 86400));
    assertEquals("?", DurationText.of(Double.NaN));
    assertEquals("9.150 d", DurationText.readable(9.15 * 86400));
    assertEquals("30.0 min", DurationText.readable(1800));
  }
}
