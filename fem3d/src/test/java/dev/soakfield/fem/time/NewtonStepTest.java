package dev.soakfield.fem.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.LawUse;
import dev.soakfield.fem.model.MaterialBehaviour;
import dev.soakfield.fem.physics.SorptionLaw;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Newton's method around the theta step, on source laws of our own with known solutions. */
class NewtonStepTest {
  /** Second-order consumption π = −k·c², a smooth nonlinear law. */
  private static class SecondOrder implements SourceLaw {
    final double k;

    SecondOrder(double k) {
      this.k = k;
    }

    @Override
    public List<String> stateNames() {
      return List.of();
    }

    @Override
    public void initialState(double concentration, double temperature, double[] state) {}

    @Override
    public void rate(LawPoint at, StateView start, RateSink out) {
      double c = at.concentration();
      out.set(-k * c * c, -2 * k * c);
    }

    @Override
    public void advance(LawPoint at, StateView start, double[] end) {}
  }

  /** A sealed unit box, D = 1, S given, c0 uniform, one material with the law. */
  private static DiffusionModel sealedBox(SourceLaw law, double s, double c0) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 3, 3, 3, 1);
    int tets = mesh.tetCount();
    double[] tensor = new double[6 * tets];
    double[] sol = new double[tets];
    Arrays.fill(sol, s);
    for (int t = 0; t < tets; t++) {
      tensor[6 * t] = s;
      tensor[6 * t + 1] = s;
      tensor[6 * t + 2] = s;
    }
    double[] phi0 = new double[mesh.nodeCount()];
    Arrays.fill(phi0, c0 / s);
    return new DiffusionModel(
        FeSpace.of(mesh),
        sol,
        tensor,
        new double[tets],
        new double[tets],
        List.of(),
        phi0,
        new int[tets],
        List.of(new MaterialBehaviour("body", 0, 0, List.of(new LawUse("test", "test", law)))),
        TimeFunction.constant(300),
        SorptionLaw.PLAIN);
  }

  @Test
  void uniformConsumptionFollowsTheImplicitRecursionAndTheExactDecay() {
    double k = 2.0;
    double c0 = 1.0;
    double s = 0.5;
    DiffusionModel model = sealedBox(new SecondOrder(k), s, c0);
    ThetaStepper stepper = new ThetaStepper(model, true, 1e-12, 1000);
    double dt = 1e-3;
    double[] phi = model.initialPhi();
    double c = c0;
    double t = 0;
    for (int n = 0; n < 500; n++) {
      StepOutcome out = stepper.step(phi, t, dt, 1.0);
      stepper.commit(out);
      phi = out.phi();
      t += dt;
      // backward Euler on dc/dt = −k c²: c₁ = (−1 + √(1 + 4 k dt c₀)) / (2 k dt), exact algebra
      c = (-1 + Math.sqrt(1 + 4 * k * dt * c)) / (2 * k * dt);
      double[] cNow = new double[phi.length];
      for (int i = 0; i < phi.length; i++) {
        cNow[i] = s * phi[i];
      }
      assertEquals(c, cNow[0], 1e-9 * c);
      assertEquals(c, cNow[cNow.length - 1], 1e-9 * c);
      assertTrue(out.newtonIterations() <= 4, "iterations " + out.newtonIterations());
    }
    // exact solution of dc/dt = −k c²: c = c0 / (1 + k c0 t); backward Euler is first order
    double exact = c0 / (1 + k * c0 * t);
    assertEquals(exact, c, 2e-3 * exact);
  }

  @Test
  void newtonConvergesQuadratically() {
    DiffusionModel model = sealedBox(new SecondOrder(50.0), 1.0, 1.0);
    ThetaStepper stepper = new ThetaStepper(model, true, 1e-14, 1000);
    StepOutcome out = stepper.step(model.initialPhi(), 0, 0.1, 1.0);
    double[] r = stepper.lastNewtonResiduals();
    assertTrue(r.length >= 4, Arrays.toString(r));
    // quadratic: r_{k+1} / r_k² stays bounded while r falls by orders of magnitude; the ratio of
    // logarithms log(r_{k+1}/r_0) / log(r_k/r_0) approaches 2 (Kelley, Iterative Methods for
    // Linear and Nonlinear Equations, 1995, §5.1)
    int last = r.length - 2;
    double order = Math.log(r[last + 1] / r[last]) / Math.log(r[last] / r[last - 1]);
    assertTrue(order > 1.8, "observed order " + order + " from " + Arrays.toString(r));
    assertTrue(out.newtonIterations() <= 8);
  }

  @Test
  void aLawThatReturnsNaNStopsTheRunNamingItsMaterialAndTime() {
    SourceLaw broken =
        new SecondOrder(1) {
          @Override
          public void rate(LawPoint at, StateView start, RateSink out) {
            out.set(at.time() > 0.05 ? Double.NaN : 0, 0);
          }
        };
    DiffusionModel model = sealedBox(broken, 1.0, 1.0);
    ThetaStepper stepper = new ThetaStepper(model, true, 1e-12, 1000);
    TimeSettings s = new TimeSettings(1.0, new double[] {1.0}, false, Double.NaN, 0.01, 0.01, 0.01);
    RunFailedException e =
        assertThrows(
            RunFailedException.class,
            () -> TransientRun.run(stepper, model.initialPhi(), s, (t, dt, out, o) -> {}));
    assertTrue(e.getMessage().contains("source law 'test'"), e.getMessage());
    assertTrue(e.getMessage().contains("material 'body'"), e.getMessage());
    assertTrue(e.getMessage().contains("returned NaN"), e.getMessage());
    assertTrue(e.simulatedTime() > 0.05 && e.simulatedTime() < 0.07, "t " + e.simulatedTime());
  }
}
