package dev.soakfield.fem.verify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.mesh.TetMesh;
import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * Manufactured solutions (TwoPartWall, OrthotropicBox): orders in space and time against the exact
 * solution, adaptive steps, and Crank–Nicolson's damped start from a discontinuous start.
 */
class ManufacturedTest {
  private static void assertPasses(Check c) {
    assertTrue(
        c.passed(),
        c.caseName() + ": " + c.computed() + " against " + c.reference() + " +- " + c.tolerance());
  }

  @Test
  void spaceOrdersOfBothCasesAndBothDegrees() {
    for (Manufactured.Case c : List.of(Manufactured.WALL, Manufactured.BOX)) {
      for (int order = 1; order <= 2; order++) {
        Manufactured.space(c, order).checks(0.3, 0.3).forEach(ManufacturedTest::assertPasses);
      }
    }
  }

  @Test
  void aTensorWithoutItsOffDiagonalEntriesBreaksTheOrders() {
    // negative control: the turned box with only the diagonal of D·S assembled, the mistake an
    // assembly that ignored the off-diagonal entries would make
    Function<TetMesh, DiffusionModel> diagonalOnly =
        mesh -> {
          DiffusionModel good = OrthotropicBox.model(mesh);
          double[] k = good.conductance().clone();
          for (int t = 0; t < mesh.tetCount(); t++) {
            k[6 * t + 3] = 0;
            k[6 * t + 4] = 0;
            k[6 * t + 5] = 0;
          }
          return UniformModels.withConductance(good, k);
        };
    Manufactured.Case b = Manufactured.BOX;
    Manufactured.Case faulty =
        new Manufactured.Case(
            b.name(),
            b.source(),
            b.meshOfLevel(),
            diagonalOnly,
            b.exact(),
            b.solubility(),
            b.end(),
            b.steps(),
            b.linearLevels(),
            b.quadraticLevels());
    List<Check> checks = Manufactured.space(faulty, 1).checks(0.3, 0.3);
    assertFalse(checks.get(0).passed(), "L2 order " + checks.get(0).computed());
    assertTrue(checks.get(0).computed() < 1, "L2 order " + checks.get(0).computed());
  }

  @Test
  void timeOrdersAgainstTheExactSolution() {
    int[] counts = {8, 16, 32};
    double[] dt = {8, 4, 2}; // in units of T/64: only the ratios matter
    double[] be = Manufactured.slopes(dt, Manufactured.timeErrors(false, counts));
    double[] cn = Manufactured.slopes(dt, Manufactured.timeErrors(true, counts));
    // backward Euler first order, Crank–Nicolson (with its damped start) second; measured 1.01
    // and 1.97 on the finer pair
    assertEquals(1, be[1], 0.1, "backward Euler");
    assertEquals(2, cn[1], 0.1, "Crank-Nicolson");
    assertEquals(1, be[0], 0.1);
    assertEquals(2, cn[0], 0.1);
  }

  @Test
  void adaptiveErrorFollowsTheTolerance() {
    // Crank–Nicolson in proportion to the tolerance, backward Euler as its square root (see
    // Manufactured.adaptiveChecks for why); measured 0.82 and 0.45 over 1e-2 to 1e-5
    Manufactured.adaptiveChecks().forEach(ManufacturedTest::assertPasses);
  }

  @Test
  void crankNicolsonsDampedStartDoesNotRingAndAPureOneDoes() {
    DampedStart.checks().forEach(ManufacturedTest::assertPasses);
    DampedStart.Ringing pure = DampedStart.run(false);
    // negative control: θ = ½ from the first step makes the nodes by the faces swing
    assertTrue(pure.largestFall() > 0.1, "fall " + pure.largestFall());
    assertTrue(pure.largestExcursion() > 0.1, "excursion " + pure.largestExcursion());
  }
}
