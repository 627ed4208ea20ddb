package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The run's accuracy estimates against exact solutions (Crank 1975, eqs. 4.18 and 6.18; the
 * manufactured TwoPartWall and OrthotropicBox): within a factor of 3, each way.
 */
class AccuracyEstimatesTest {
  @Test
  void estimatesBracketTheTrueErrors() {
    List<Check> checks = AccuracyEstimates.checks();
    assertEquals(14, checks.size()); // 7 cases × (at least 1/3, at most 3)
    for (Check c : checks) {
      assertTrue(c.passed(), c.caseName() + ": ratio " + c.computed());
    }
  }

  @Test
  void theBracketTellsAWrongEstimateFromARightOne() {
    // negative control: backward Euler's estimate held against Crank–Nicolson's true error (ten
    // times smaller) falls outside the bracket
    double[] be = AccuracyEstimates.time(false, 0.1);
    double[] cn = AccuracyEstimates.time(true, 0.1);
    assertTrue(be[0] / cn[1] > 3, "ratio " + be[0] / cn[1]);
    // the series the truth comes from: Crank (1975) eq. 4.18 at D t/L² = 0.1, 0.697882 (its
    // tabulated value, as PlaneSheet uses)
    assertEquals(0.697882, AccuracyEstimates.uptake(0.1), 1e-6);
  }

  @Test
  void theAdaptiveSheetIsBracketedAndAnEstimateOffByFourIsNot() {
    List<Check> checks = AccuracyEstimates.adaptiveTimeChecks();
    assertEquals(4, checks.size());
    checks.forEach(c -> assertTrue(c.passed(), c.caseName() + ": ratio " + c.computed()));
    // negative control: the same estimate four times too large (or small) leaves the bracket
    double[] be = AccuracyEstimates.timeAdaptive(false, 0.1, 1e-3);
    assertTrue(
        AccuracyEstimates.bracket("x4", "control", 4 * be[0], be[1]).stream()
            .anyMatch(c -> !c.passed()));
    assertTrue(
        AccuracyEstimates.bracket("/4", "control", be[0] / 4, be[1]).stream()
            .anyMatch(c -> !c.passed()));
  }
}
