package dev.soakfield.fem.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceGroupMembers;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

class TransientRunTest {
  /** A unit box, D = S = 1, xmin with the given condition. */
  private static DiffusionModel box(FaceKind kind, TimeFunction value) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 4, 4, 4, 1);
    int tets = mesh.tetCount();
    double[] tensor = new double[6 * tets];
    for (int t = 0; t < tets; t++) {
      tensor[6 * t] = 1;
      tensor[6 * t + 1] = 1;
      tensor[6 * t + 2] = 1;
    }
    double[] ones = new double[tets];
    Arrays.fill(ones, 1);
    int g = mesh.faceGroupIndex("xmin");
    int[] faces = FaceGroupMembers.of(mesh, g);
    double[] faceS = new double[faces.length];
    Arrays.fill(faceS, 1);
    return new DiffusionModel(
        FeSpace.of(mesh),
        ones,
        tensor,
        new double[tets],
        new double[tets],
        List.of(new FaceCondition(g, "xmin", kind, value, TimeFunction.constant(0), faces, faceS)),
        new double[mesh.nodeCount()]);
  }

  /** A table with a kink at t = 0.3 (piecewise linear: 0 at 0, 1 at 0.3, 1 at 1). */
  private static TimeFunction ramp() {
    return new TimeFunction() {
      @Override
      public double at(double t) {
        return Math.min(1, t / 0.3);
      }

      @Override
      public double[] breakpoints() {
        return new double[] {0.3};
      }
    };
  }

  /**
   * Fixed steps take exactly the count the case implies: end = 100 steps of 0.1 (not exact in
   * binary) once took 101, the round-off of adding 0.1 up leaving a remainder a hair over one step,
   * which was split in two. Negative control: a remainder really 1e-6 over one step is still split.
   */
  @Test
  void fixedStepsTakeExactlyTheCountTheEndImplies() {
    DiffusionModel m = box(FaceKind.FLUX, TimeFunction.constant(1));
    for (double[] endAndSteps : new double[][] {{10.0, 100}, {1e3 * 0.1 * 3, 3000}}) {
      ThetaStepper stepper = new ThetaStepper(m, false, 1e-12, 2000);
      double end = endAndSteps[0];
      TimeSettings s = new TimeSettings(end, new double[] {end}, false, Double.NaN, 0.1, 0.1, 0.1);
      List<Double> times = new ArrayList<>();
      RunTotals totals =
          TransientRun.run(stepper, m.initialPhi(), s, (t, dt, out, output) -> times.add(t));
      assertEquals((int) endAndSteps[1], totals.steps(), "end " + end);
      assertEquals(end, times.get(times.size() - 1), 0.0);
    }
    ThetaStepper stepper = new ThetaStepper(m, false, 1e-12, 2000);
    double end = 10.0 + 1e-6;
    TimeSettings s = new TimeSettings(end, new double[] {end}, false, Double.NaN, 0.1, 0.1, 0.1);
    RunTotals totals = TransientRun.run(stepper, m.initialPhi(), s, (t, dt, out, output) -> {});
    assertEquals(101, totals.steps());
  }

  @Test
  void adaptiveStepsLandOnOutputsAndTableBreakpoints() {
    DiffusionModel m = box(FaceKind.FLUX, ramp());
    ThetaStepper stepper = new ThetaStepper(m, false, 1e-12, 2000);
    TimeSettings s =
        new TimeSettings(1.0, new double[] {0.25, 0.7, 1.0}, true, 1e-3, Double.NaN, 1e-4, 1);
    List<Double> times = new ArrayList<>();
    List<Double> outputs = new ArrayList<>();
    RunTotals totals =
        TransientRun.run(
            stepper,
            m.initialPhi(),
            s,
            (t, dt, out, output) -> {
              times.add(t);
              if (output) {
                outputs.add(t);
              }
            });
    assertTrue(times.contains(0.3), "breakpoint 0.3 not hit: " + times);
    assertEquals(List.of(0.25, 0.7, 1.0), outputs);
    assertEquals(1.0, times.get(times.size() - 1), 0.0);
    assertEquals(times.size(), totals.steps());
    // the inflow of a flux face is the integral of the ramp over time times the area (exact
    // calculus: 0.3/2 + 0.7 = 0.85, area 1); Crank-Nicolson integrates it by the trapezoidal rule,
    // exact between breakpoints that steps land on, so only the two backward-Euler start steps
    // (of 1e-4) leave an error, of order dt^2 times the slope
    double amount = stepper.amount(totals.finalPhi());
    assertEquals(0.85, amount, 1e-6);
  }

  @Test
  void aStalledSolveStopsTheRunWithTheTimeAndASuggestion() {
    DiffusionModel m = box(FaceKind.CONCENTRATION, TimeFunction.constant(1));
    ThetaStepper stepper = new ThetaStepper(m, false, 1e-14, 1);
    TimeSettings s = new TimeSettings(1.0, new double[] {1.0}, false, Double.NaN, 0.1, 0.1, 0.1);
    RunFailedException e =
        assertThrows(
            RunFailedException.class,
            () -> TransientRun.run(stepper, m.initialPhi(), s, (t, dt, out, output) -> {}));
    assertEquals(0.0, e.simulatedTime(), 0.0);
    assertTrue(e.getMessage().contains("did not converge"), e.getMessage());
    assertTrue(e.getMessage().contains("try shorter steps"), e.getMessage());
  }

  /** Amount at the end, and |amount − start − Σ inflow| over the run, with solves to rtol. */
  private static double[] heldBoxRun(double rtol, int steps) {
    DiffusionModel m = box(FaceKind.CONCENTRATION, TimeFunction.constant(1));
    ThetaStepper stepper = new ThetaStepper(m, false, rtol, 5000);
    double end = 0.05;
    double dt = end / steps;
    TimeSettings s = new TimeSettings(end, new double[] {end}, false, Double.NaN, dt, dt, dt);
    double[] totals = new double[3]; // start amount, inflow, last amount
    TransientRun.run(
        stepper,
        m.initialPhi(),
        s,
        new StepListener() {
          @Override
          public void started(StepOutcome o) {
            totals[0] = o.amount();
            totals[2] = o.amount();
          }

          @Override
          public void accepted(double t, double h, StepOutcome o, boolean output) {
            for (double v : o.faceInflow()) {
              totals[1] += v;
            }
            totals[2] = o.amount();
          }
        });
    return new double[] {totals[2], Math.abs(totals[2] - totals[0] - totals[1])};
  }

  @Test
  void stepsConserveTheAmountEvenWhenTheSolvesAreLoose() {
    // solves stopped at 1e-5 of the right-hand side leave their rows' residuals: summed over 200
    // steps they would show as an imbalance of that order; the conservative shift after each solve
    // removes their sum, so the amount balances to round-off all the same
    double[] loose = heldBoxRun(1e-5, 200);
    double[] tight = heldBoxRun(1e-13, 200);
    assertTrue(loose[1] <= 1e-13 * loose[0], "imbalance " + loose[1] + " of " + loose[0]);
    assertTrue(tight[1] <= 1e-13 * tight[0], "imbalance " + tight[1] + " of " + tight[0]);
    // negative control: the loose solves are far from the tight ones' answer, so the balance
    // above could not have closed by itself
    assertTrue(
        Math.abs(loose[0] - tight[0]) > 1e-9 * tight[0],
        "loose " + loose[0] + " against tight " + tight[0]);
  }
}
