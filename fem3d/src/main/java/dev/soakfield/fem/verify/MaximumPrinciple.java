package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.List;
import java.util.Map;

/**
 * Lumped capacity with backward Euler on a mesh without obtuse dihedral angles satisfies the
 * discrete maximum principle for any step (H. Fujii, "Some remarks on finite element analysis of
 * time-dependent field problems", 1973; from memory): starting from zero with one face raised to 1,
 * no value may fall below zero, even for steps far shorter than h²/D, where the consistent capacity
 * is known to undershoot.
 */
public final class MaximumPrinciple {
  private MaximumPrinciple() {}

  public static List<Check> run() {
    return run(true);
  }

  /**
   * The checks with lumped capacity, or (the negative control) with the consistent one, whose
   * undershoot at steps this short the lowest-value check must catch.
   */
  static List<Check> run(boolean lumped) {
    String label = lumped ? "lumped" : "consistent";
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 8, 8, 8, 1);
    DiffusionModel model =
        UniformModels.model(
            mesh,
            new double[] {1.0},
            new double[] {1.0},
            new double[] {0.0},
            0.0,
            Map.of("xmin", UniformModels.Condition.concentration(1.0)));
    ThetaStepper stepper = new ThetaStepper(model, lumped, 1e-13, 5000);
    double dt = 1e-5;
    TimeSettings settings =
        new TimeSettings(20 * dt, new double[] {20 * dt}, false, Double.NaN, dt, dt, dt);
    double[] phi0 = model.initialPhi();
    Recorder rec = new Recorder(stepper.amount(phi0));
    TransientRun.run(stepper, phi0, settings, rec);
    return List.of(
        Check.atMost(
            label + " backward Euler, lowest value below the initial 0",
            "Fujii (1973), discrete maximum principle (from memory)",
            1e-12,
            -rec.lowest()),
        Check.atMost(
            label + " backward Euler, global balance",
            "conservation (exact)",
            1e-10,
            rec.balanceRelative()));
  }
}
