package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Tick choice: steps of 1, 2 or 5 × 10ⁿ within the limits (Heckbert, Graphics Gems, 1990). */
class RoundTicksTest {
  @Test
  void ticksFallOnRoundNumbersWithinTheLimits() {
    assertEquals(List.of(0.0, 0.5, 1.0, 1.5, 2.0), RoundTicks.within(0, 2, 4));
    assertEquals(List.of(0.02, 0.04, 0.06, 0.08), round(RoundTicks.within(0.013, 0.087, 4)));
    assertEquals(List.of(0.0, 1.0, 2.0), RoundTicks.within(-0.0315, 2.5, 3));
    assertEquals(List.of(-1e-7, 0.0, 1e-7, 2e-7), round(RoundTicks.within(-1.4e-7, 2.1e-7, 4)));
    // a flat field has one value to show
    assertEquals(List.of(3.0), RoundTicks.within(3, 3, 5));
  }

  @Test
  void theStepIsTheLargestRoundOneGivingEnoughTicks() {
    assertEquals(0.5, RoundTicks.step(0, 2, 4), 0);
    assertEquals(2e-4, RoundTicks.step(0, 1e-3, 5), 1e-19);
    assertEquals(1000, RoundTicks.step(0, 7000, 5), 0);
  }

  private static List<Double> round(List<Double> v) {
    return v.stream().map(x -> Math.round(x * 1e12) / 1e12).toList();
  }
}
