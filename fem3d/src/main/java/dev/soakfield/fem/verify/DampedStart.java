package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.List;
import java.util.Map;

/**
 * Crank–Nicolson from a discontinuous start: a sheet at c = 0 whose faces are raised to 1 at t = 0,
 * steps sixteen times h²/D. Crank–Nicolson's amplification factor tends to −1 for the mesh's
 * shortest modes, so the jump at the start rings from step to step (P. M. Gresho and R. L. Sani,
 * Incompressible Flow and the Finite Element Method (1998), §3.16, from memory; common practice).
 * The exact solution rises everywhere and stays within [0, 1], so each output must too: every
 * node's value must not fall from one output to the next, and none may leave [0, 1]. The damped
 * start (two backward-Euler steps first) must pass; pure Crank–Nicolson, the negative control, must
 * not.
 */
public final class DampedStart {
  private static final int CELLS = 40;
  private static final double STEP = 16.0 / (CELLS * CELLS);
  private static final int STEPS = 12;

  private DampedStart() {}

  /** What the outputs showed: the largest fall between outputs and the largest overshoot. */
  record Ringing(double largestFall, double largestExcursion) {}

  private static DiffusionModel sheet(TetMesh mesh) {
    return UniformModels.model(
        mesh,
        new double[] {1},
        new double[] {1},
        new double[] {0},
        0,
        Map.of(
            "xmin", UniformModels.Condition.concentration(1.0),
            "xmax", UniformModels.Condition.concentration(1.0)));
  }

  /** The run's own stepping (damped start) or, as the negative control, θ = ½ from the start. */
  static Ringing run(boolean damped) {
    TetMesh mesh = StructuredMesher.box(1, 0.05, 0.05, CELLS, 1, 1, 1);
    DiffusionModel model = sheet(mesh);
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-13, 5000);
    double[] worst = new double[2];
    double[][] previous = {null};
    StepListener watch =
        new StepListener() {
          @Override
          public void started(StepOutcome initial) {
            previous[0] = initial.phi();
          }

          @Override
          public void accepted(double t, double dt, StepOutcome out, boolean output) {
            double[] phi = out.phi();
            for (int i = 0; i < phi.length; i++) {
              worst[0] = Math.max(worst[0], previous[0][i] - phi[i]);
              worst[1] = Math.max(worst[1], Math.max(phi[i] - 1, -phi[i]));
            }
            previous[0] = phi;
          }
        };
    double end = STEPS * STEP;
    double[] outputs = new double[STEPS];
    for (int k = 0; k < STEPS; k++) {
      outputs[k] = (k + 1) * STEP;
    }
    if (damped) {
      TransientRun.run(
          stepper,
          model.initialPhi(),
          new TimeSettings(end, outputs, true, Double.NaN, STEP, STEP, STEP),
          watch);
    } else {
      double[] phi = model.initialPhi();
      stepper.raise(phi, 0);
      watch.started(new StepOutcome(phi, new double[0], 0, 0, 0, 0));
      for (int k = 0; k < STEPS; k++) {
        StepOutcome out = stepper.step(phi, k * STEP, STEP, 0.5);
        stepper.commit(out);
        watch.accepted((k + 1) * STEP, STEP, out, true);
        phi = out.phi();
      }
    }
    return new Ringing(worst[0], worst[1]);
  }

  /** The checks `verify` lists: no fall between outputs, nothing outside [0, 1]. */
  public static List<Check> checks() {
    Ringing r = run(true);
    String source = "exact solution rises monotonically within [0, 1] (Crank (1975) eq. 4.17)";
    return List.of(
        Check.atMost(
            "Crank-Nicolson, damped start, steps 16 h^2/D: largest fall of a node between outputs",
            source,
            1e-9,
            r.largestFall()),
        Check.atMost(
            "Crank-Nicolson, damped start, steps 16 h^2/D: largest value outside [0, 1]",
            source,
            1e-9,
            r.largestExcursion()));
  }
}
