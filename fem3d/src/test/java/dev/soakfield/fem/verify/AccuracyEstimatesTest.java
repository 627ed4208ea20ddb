package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The run's accuracy estimates against exact solutions (Crank 1975, eqs. 4.18 and 6.18; the
 * manufactured TwoPartWall and OrthotropicBox): within a factor of 3, each way.
 */
class AccuracyEstimatesTest {
  @Test
  void theLinearEstimateOfAQuadraticRunFailsTheQuadraticBrackets() {
    // negative control of the quadratic space checks: the corners of each quadratic run judged as
    // a linear field (its estimate sees the linear interpolation error, h² against h³) overstate
    // ∫|c − c_h| far beyond 3 (measured 17 to 153); the linear checks are unchanged and pass
    List<Check> checks = AccuracyEstimates.spaceChecks(true);
    List<Check> failed = checks.stream().filter(c -> !c.passed()).toList();
    assertEquals(3, failed.size(), failed.toString());
    for (Check c : failed) {
      assertTrue(c.caseName().contains("quadratic") && c.caseName().contains("at most 3"));
      assertTrue(c.computed() > 10, c.caseName() + ": " + c.computed());
    }
  }

  @Test
  void theThresholdBracketsRejectAWrongPart() {
    // negative controls of the threshold checks, quadratic elements, the sphere's centre at 0.5
    // (exact time from Crank (1975) eq. 6.18 at r → 0)
    TetMesh mesh = AccuracyEstimates.centreMesh(2);
    double level = AccuracyEstimates.CENTRE_LEVEL;
    double exact = CentreCrossing.exact(level);
    CentreCrossing.Outcome reference = CentreCrossing.run(mesh, level, exact / 400, true);
    double spaceTruth = Math.abs(reference.time() - exact);
    // the space part from the centre's element alone misses the error carried there (measured 0.15)
    assertTrue(reference.ownElement() / spaceTruth < 1.0 / 3, "" + reference.ownElement());
    assertTrue(reference.estimate().space() / spaceTruth > 1.0 / 3);
    // backward Euler's time part held against Crank–Nicolson's true time error (measured 4.4)
    CentreCrossing.Outcome be = CentreCrossing.run(mesh, level, exact / 10, false);
    CentreCrossing.Outcome cn = CentreCrossing.run(mesh, level, exact / 10, true);
    double cnTruth = Math.abs(cn.time() - reference.time());
    assertTrue((be.estimate().time() + be.estimate().interpolation()) / cnTruth > 3);
    // the series: the centre of a sphere reaches half at D t/a² = 0.1388 (Crank (1975) eq. 6.18 at
    // r → 0; 0.5 = 1 + 2 Σ (−1)ⁿ exp(−n²π²τ); its first two terms alone give 0.13878)
    assertEquals(0.13879, exact, 1e-5);
  }

  @Test
  void estimatesBracketTheTrueErrors() {
    List<Check> checks = AccuracyEstimates.checks();
    // space: linear 3 cases × (amount, ∫|c − c_h|) × 2 bounds, quadratic 3 × (amount bound, ∫|c −
    // c_h| × 2); threshold parts: 2 orders × 4 parts × 2 bounds; time: 2 schemes × 2 bounds
    assertEquals(12 + 9 + 16 + 4, checks.size());
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
}
