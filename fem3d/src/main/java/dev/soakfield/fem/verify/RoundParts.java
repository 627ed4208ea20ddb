package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.util.List;

/**
 * Orders of convergence in space on round parts with curved walls, against Crank's series ({@link
 * RoundSeries}): a sphere of radius 1 and a cylinder of radius 1 and height 2, their whole surface
 * held at c = 1, D = 1. Each run starts from the exact field at D t/a² = 0.1 and runs to 0.15 by
 * Crank–Nicolson steps of 1/480 (θ = ½ from the first step: the start is smooth, so the damped
 * start the runs of a case take is not needed, and its two backward-Euler steps would add a time
 * error of order dt² with a constant about twenty times Crank–Nicolson's); the error is measured
 * there. Meshes are ours, inner nodes jittered ({@link TestMeshes}); quadratic meshes have their
 * mid-edge nodes on the curved walls (isoparametric elements). With these steps the time error is
 * about 2 % of the finest quadratic mesh's L² error (measured against 96 steps).
 *
 * <p>The orders of the finest pair must lie within 0.25 of p+1 (L²) and p (H¹), above and below.
 * Measured: sphere linear 1.92 and 0.92, quadratic 2.95 and 1.94; cylinder linear 1.98 and 0.98,
 * quadratic 2.98 and 1.96 (the coarser pairs 0.05 to 0.3 lower, on their way).
 */
public final class RoundParts {
  private static final double START = 0.1;
  static final double END = 0.15;
  private static final int STEPS = 24;
  private static final double BAND = 0.25;
  private static final String SPHERE_SOURCE = "Crank (1975) eq. 6.18 (sphere)";
  private static final String CYLINDER_SOURCE =
      "Crank (1975) eq. 5.22 x eq. 4.17 (finite cylinder as a product)";

  private RoundParts() {}

  /**
   * The sphere's study with linear (n = 4, 8, 16) or quadratic (n = 3, 6, 12) elements, its errors
   * taken against the series at {@code referenceTime} (END; another time is the negative control).
   */
  static ConvergenceStudy sphere(int order, double referenceTime) {
    ConvergenceStudy s =
        new ConvergenceStudy("sphere, " + word(order) + ", jittered", SPHERE_SOURCE, order);
    int[] cells = order == 1 ? new int[] {4, 8, 16} : new int[] {3, 6, 12};
    for (int k = 0; k < cells.length; k++) {
      TetMesh linear = TestMeshes.ball(1, cells[k], 11 + k);
      TetMesh mesh = order == 1 ? linear : TestMeshes.quadratic(linear, 1, false);
      run(s, mesh, RoundSeries.sphere(1, 1, START), RoundSeries.sphere(1, 1, referenceTime));
    }
    return s;
  }

  /** The finite cylinder's study (O-grid of n radial, 4n around, 2n axial cells; n = 2, 4, 8). */
  static ConvergenceStudy cylinder(int order) {
    ConvergenceStudy s =
        new ConvergenceStudy(
            "finite cylinder, " + word(order) + ", jittered", CYLINDER_SOURCE, order);
    int[] cells = {2, 4, 8};
    for (int k = 0; k < cells.length; k++) {
      int n = cells[k];
      TetMesh linear = TestMeshes.cylinder(1, 2, n, 4 * n, 2 * n, 21 + k);
      TetMesh mesh = order == 1 ? linear : TestMeshes.quadratic(linear, 1, true);
      run(
          s,
          mesh,
          RoundSeries.finiteCylinder(1, 1, 1, START),
          RoundSeries.finiteCylinder(1, 1, 1, END));
    }
    return s;
  }

  /** The checks `verify` lists: both parts, both orders, L² and H¹. */
  public static List<Check> checks() {
    List<Check> all = new java.util.ArrayList<>();
    for (int order = 1; order <= 2; order++) {
      all.addAll(sphere(order, END).checks(BAND, BAND));
      all.addAll(cylinder(order).checks(BAND, BAND));
    }
    return all;
  }

  private static void run(ConvergenceStudy s, TetMesh mesh, ExactField start, ExactField end) {
    DiffusionModel m =
        UniformModels.model(
            mesh,
            new double[] {1},
            new double[] {1},
            new double[] {0},
            0,
            UniformModels.allHeld(mesh, 1));
    m = UniformModels.startingFrom(m, UniformModels.atNodes(mesh, start));
    double[] phi = crankNicolson(m, END - START, STEPS);
    s.add(size(mesh), ErrorNorms.of(mesh, phi, null, end));
  }

  /** Fixed Crank–Nicolson steps from the model's initial potential, θ = ½ from the first. */
  static double[] crankNicolson(DiffusionModel m, double span, int steps) {
    ThetaStepper stepper = new ThetaStepper(m, false, 1e-12, 5000);
    double dt = span / steps;
    double[] phi = m.initialPhi();
    stepper.applyPrescribed(phi, 0);
    for (int k = 0; k < steps; k++) {
      StepOutcome out = stepper.step(phi, k * dt, dt, 0.5);
      stepper.commit(out);
      phi = out.phi();
    }
    return phi;
  }

  /** (volume / tetrahedra)^(1/3), volume by corners (the curved walls do not change the ratio). */
  static double size(TetMesh mesh) {
    double v = 0;
    for (int t = 0; t < mesh.tetCount(); t++) {
      v += Math.abs(MeshGeometry.tetVolume(mesh, t));
    }
    return Math.cbrt(v / mesh.tetCount());
  }

  private static String word(int order) {
    return order == 1 ? "linear" : "quadratic";
  }
}
