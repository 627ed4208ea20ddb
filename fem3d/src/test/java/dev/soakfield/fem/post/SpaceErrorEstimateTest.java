package dev.soakfield.fem.post;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import org.junit.jupiter.api.Test;

/** The recovered-gradient estimate on fields whose interpolation error is known exactly. */
class SpaceErrorEstimateTest {
  private static double[] nodal(TetMesh mesh, java.util.function.DoubleUnaryOperator f) {
    double[] u = new double[mesh.nodeCount()];
    for (int v = 0; v < u.length; v++) {
      u[v] = f.applyAsDouble(mesh.coord(v, 0));
    }
    return u;
  }

  private static double[] ones(TetMesh mesh) {
    double[] s = new double[mesh.tetCount()];
    java.util.Arrays.fill(s, 1);
    return s;
  }

  @Test
  void aFieldTheElementsHoldExactlyHasNoError() {
    for (int order = 1; order <= 2; order++) {
      TetMesh mesh = StructuredMesher.box(1, 0.2, 0.2, 8, 2, 2, order);
      double[] u = nodal(mesh, x -> 3 - 2 * x);
      assertEquals(0, SpaceErrorEstimate.of(mesh, u, ones(mesh)).amountError(), 1e-12);
    }
  }

  @Test
  void aParabolaGivesItsInterpolationError() {
    // c = x² on linear elements of h = 1/10: the interpolant lies above by h²/6 on average
    // (∫ of h²/4·(1 − s²)... exact: mean of c_h − c over an element is h²/6), so the amount error
    // over the bar of cross-section 0.04 is 0.04·h²/6 (exact calculus)
    TetMesh mesh = StructuredMesher.box(1, 0.2, 0.2, 10, 2, 2, 1);
    double[] u = nodal(mesh, x -> x * x);
    double exact = 0.04 * 0.01 / 6;
    double estimate = SpaceErrorEstimate.of(mesh, u, ones(mesh)).amountError();
    assertTrue(estimate > exact / 3 && estimate < 3 * exact, estimate + " against " + exact);
    // the sign: c curves up, the elements lie above it (c_h − c > 0)
    double signed = 0;
    SpaceErrorEstimate e = SpaceErrorEstimate.of(mesh, u, ones(mesh));
    for (double v : e.elementErrors()) {
      signed += v;
    }
    assertTrue(signed > 0);
  }

  @Test
  void aFirstLayerThatFilledAtOnceIsSeen() {
    // the held face's node at 1, every other node at 0: the first layer holds h/2 per unit area
    // that a field of diffusion length far below h does not (NearSurfaceCheck's one-dimensional
    // picture); the estimate must find about that much
    TetMesh mesh = StructuredMesher.box(1, 0.2, 0.2, 10, 2, 2, 1);
    double[] u = nodal(mesh, x -> x == 0 ? 1 : 0);
    double overstated = 0.04 * 0.1 / 2;
    double estimate = SpaceErrorEstimate.of(mesh, u, ones(mesh)).amountError();
    assertTrue(
        estimate > overstated / 3 && estimate < 3 * overstated,
        estimate + " against " + overstated);
    // negative control: where nothing happens there is no error
    double[] flat = nodal(mesh, x -> 0.5);
    assertEquals(0, SpaceErrorEstimate.of(mesh, flat, ones(mesh)).amountError(), 1e-15);
  }

  @Test
  void partsAreRecoveredApartSoAJumpInCIsNoError() {
    // two layers of solubility 1 and 3 with φ linear through both: c = S·φ jumps at the joint but
    // is linear in each part, which the elements hold exactly
    TetMesh mesh =
        StructuredMesher.layers(
            0.2,
            0.2,
            2,
            2,
            java.util.List.of(
                new StructuredMesher.Layer("a", 0.5, 4), new StructuredMesher.Layer("b", 0.5, 4)),
            1);
    double[] phi = new double[mesh.nodeCount()];
    for (int v = 0; v < phi.length; v++) {
      phi[v] = 1 + mesh.coord(v, 2);
    }
    double[] s = new double[mesh.tetCount()];
    for (int t = 0; t < s.length; t++) {
      s[t] = mesh.tetGroup(t) == 0 ? 1 : 3;
    }
    assertEquals(0, SpaceErrorEstimate.of(mesh, phi, s).amountError(), 1e-12);
  }
}
