package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Orders of convergence on a sphere and a finite cylinder (Crank 1975, eqs. 6.18, 5.22 and 4.17),
 * on jittered meshes with curved quadratic walls: L² and H¹, linear and quadratic elements.
 */
class RoundPartsTest {
  @Test
  void ordersOnRoundPartsMatchTheElementsDegree() {
    List<Check> checks = RoundParts.checks();
    assertEquals(8, checks.size()); // 2 parts × 2 degrees × (L², H¹)
    for (Check c : checks) {
      assertTrue(
          c.passed(), c.caseName() + ": order " + c.computed() + ", expected " + c.reference());
    }
  }

  @Test
  void aReferenceAtTheWrongTimeBreaksTheOrderFromAboveOrBelow() {
    // negative controls: the same runs held against the series a little later than they ran.
    // 4 % of the run later, the error stops falling with h: the order drops far below the band
    Check late = RoundParts.sphere(1, RoundParts.END + 2e-3).checks(0.25, 0.25).get(0);
    assertFalse(late.passed(), "order " + late.computed());
    assertTrue(late.computed() < 1, "order " + late.computed());
    // 1 % later, the offset cancels part of the coarse meshes' error: the order comes out too
    // high (2.6), which only the upper bound catches
    Check slightly = RoundParts.sphere(1, RoundParts.END + 5e-4).checks(0.25, 0.25).get(0);
    assertFalse(slightly.passed(), "order " + slightly.computed());
    assertTrue(slightly.computed() > 2.25, "order " + slightly.computed());
  }

  @Test
  void anOrderTooHighFailsAsWellAsOneTooLow() {
    assertFalse(Check.order("x", "s", 2, 2.6, 0.25).passed());
    assertFalse(Check.order("x", "s", 2, 1.4, 0.25).passed());
    assertTrue(Check.order("x", "s", 2, 2.2, 0.25).passed());
    assertEquals(0.2, Check.order("x", "s", 2, 2.2, 0.25).error(), 1e-12);
  }
}
