package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The built-in verification cases; each reference value and its source (Crank 1975, exact
 * conservation, the discrete maximum principle) is named where the case defines it. Orders of
 * convergence: RoundPartsTest and ManufacturedTest.
 */
class VerificationTest {
  private static void assertAllPass(List<Check> checks) {
    for (Check c : checks) {
      assertTrue(
          c.passed(),
          c.caseName()
              + " ["
              + c.source()
              + "]: computed "
              + c.computed()
              + ", reference "
              + c.reference()
              + ", error "
              + c.error());
    }
  }

  @Test
  void quadraticPlaneSheetMatchesCrankWithinATenthOfAPercent() {
    List<Check> checks = PlaneSheet.run(2, 40, 2.5e-4, 1e-3);
    assertEquals(7, checks.size()); // five uptakes, the centre value, the balance
    assertAllPass(checks);
  }

  @Test
  void linearPlaneSheetMatchesCrankWithinOnePercent() {
    assertAllPass(PlaneSheet.run(1, 80, 2.5e-4, 1e-2));
  }

  @Test
  void compositeWallHasContinuousPotentialAndJumpingConcentration() {
    // each side's c at the joint against the series-resistance value of that side (the jump as
    // the program reports it to users, through probes naming a part: ProbeSidesTest)
    assertAllPass(CompositeWall.run());
  }

  @Test
  void lumpedBackwardEulerKeepsTheMaximumPrinciple() {
    assertAllPass(MaximumPrinciple.run());
  }

  @Test
  void consistentCapacityUndershootsAndTheLowestValueCheckCatchesIt() {
    // negative control of the check above: the consistent capacity at steps far below h²/D is
    // known to undershoot (Fujii 1973, from memory), and the same check must say so
    Check lowest = MaximumPrinciple.run(false).get(0);
    assertFalse(lowest.passed(), "undershoot " + lowest.computed());
    assertTrue(lowest.computed() > 1e-4, "undershoot " + lowest.computed());
  }

  @Test
  void amountChangeMatchesTheGradientFluxThroughTheHeldFace() {
    Check c = GradientFluxBalance.run();
    assertAllPass(List.of(c));
    // the O(h²) discrepancy of linear gradients read h/2 inside the face, measured 0.12 %
    assertTrue(c.error() > 1e-4 && c.error() < 2e-3, "discrepancy " + c.error());
  }

  @Test
  void aCapacityFivePercentOffFailsTheGradientFluxCheck() {
    for (double fault : new double[] {1.05, 0.95}) {
      Check c = GradientFluxBalance.run(fault);
      assertFalse(c.passed(), "capacity x " + fault + ": " + c.error());
      assertEquals(0.05, c.error(), 0.01, "capacity x " + fault);
    }
  }

  @Test
  void balanceClosesWithEveryKindOfTerm() {
    assertAllPass(ExchangeAndSink.run(false));
    assertAllPass(ExchangeAndSink.run(true));
  }

  @Test
  void exchangeFacesFollowCranksSeriesAndBecomeHeldFacesAsTheCoefficientGrows() {
    List<Check> checks = ExchangeSheet.run();
    assertEquals(16, checks.size()); // 2 × (3 uptakes + balance), 3 × (uptake + balance), 2 changes
    assertAllPass(checks);
  }

  @Test
  void theExchangeSeriesHasItsKnownLimits() {
    // L → ∞ is the held sheet: Crank (1975) eq. 4.18 at D t/(2l)² = 0.1, i.e. D t/l² = 0.4
    assertEquals(0.697882, ExchangeSheet.fractionalUptake(1e9, 0.4), 1e-6);
    // L → 0 is a well-stirred sheet: M_t/M_inf = 1 − exp(−L τ) (β₁² → L; Crank §4.3.5, from
    // memory), here L τ = 0.1
    assertEquals(1 - Math.exp(-0.1), ExchangeSheet.fractionalUptake(1e-4, 1e3), 1e-4);
    // negative control: the two limits differ, so the series is not a constant
    assertTrue(ExchangeSheet.fractionalUptake(1, 0.4) < 0.697882 - 0.1);
  }

  @Test
  void checksFailWhenTheyShould() {
    assertTrue(!new Check("x", "s", 1.0, 1.1, 0.05, true).passed());
    assertTrue(!Check.atMost("x", "s", 1e-10, 1e-9).passed());
    assertTrue(!Check.atLeast("x", "s", 1.9, 1.5).passed());
    assertEquals(0.1, new Check("x", "s", 1.0, 1.1, 0.05, true).error(), 1e-12);
  }
}
