package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.MidEdgeNodes;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.function.IntFunction;

/**
 * Orders of convergence against manufactured solutions ({@link TwoPartWall}: a solubility jump
 * between parts, an exchange face and a held face whose values change with time, a source and a
 * sink; {@link OrthotropicBox}: a turned orthotropic diffusivity, a held value rising with time and
 * a source): in space for linear and quadratic elements, in time for backward Euler and
 * Crank–Nicolson, and for adaptive steps, each against the exact solution.
 */
public final class Manufactured {
  private static final double TIME_END = 0.5;
  private static final double BAND = 0.3;
  private static final String WALL_SOURCE = "manufactured (TwoPartWall)";
  private static final String BOX_SOURCE = "manufactured (OrthotropicBox)";

  private Manufactured() {}

  /**
   * A manufactured case: its jittered linear meshes, model, exact field and solubility, the span
   * and steps of its runs, and the levels m of its linear and quadratic studies.
   */
  @SuppressWarnings("ArrayRecordComponent") // constants of the study, never changed
  record Case(
      String name,
      String source,
      IntFunction<TetMesh> meshOfLevel,
      Function<TetMesh, DiffusionModel> model,
      Function<Double, ExactField> exact,
      Function<TetMesh, double[]> solubility,
      double end,
      int steps,
      int[] linearLevels,
      int[] quadraticLevels) {}

  static final Case WALL =
      new Case(
          "two parts (solubility jump, exchange, time-dependent held value, source, sink)",
          WALL_SOURCE,
          m -> TwoPartWall.mesh(m, 40 + m),
          TwoPartWall::model,
          TwoPartWall::at,
          TwoPartWall::solubility,
          0.2,
          48,
          new int[] {2, 4, 8},
          new int[] {1, 2, 4});

  static final Case BOX =
      new Case(
          "turned orthotropic box (anisotropy 20, time-dependent held value, source)",
          BOX_SOURCE,
          m -> OrthotropicBox.mesh(m, 60 + m),
          OrthotropicBox::model,
          OrthotropicBox::at,
          OrthotropicBox::solubility,
          0.05,
          96,
          new int[] {1, 2, 4},
          new int[] {1, 2, 4});

  /**
   * Errors at the case's end time on three meshes of cells 0.2/m (m = 2, 4, 8 for the wall's linear
   * elements, 1, 2, 4 otherwise), Crank–Nicolson steps from the exact field at t = 0 (θ = ½
   * throughout: a smooth start). The steps keep the time error below 5 % of the finest quadratic
   * mesh's L² error: the wall (μ = 2) to t = 0.2 in 48 steps, the box (λ = 12.4) to t = 0.05 in 96.
   */
  static ConvergenceStudy space(Case c, int order) {
    ConvergenceStudy s =
        new ConvergenceStudy(
            c.name() + ", " + (order == 1 ? "linear" : "quadratic"), c.source(), order);
    for (int m : order == 1 ? c.linearLevels() : c.quadraticLevels()) {
      TetMesh linear = c.meshOfLevel().apply(m);
      TetMesh mesh = order == 1 ? linear : MidEdgeNodes.promote(linear);
      double[] phi = RoundParts.crankNicolson(c.model().apply(mesh), c.end(), c.steps());
      s.add(
          RoundParts.size(mesh),
          ErrorNorms.of(mesh, phi, c.solubility().apply(mesh), c.exact().apply(c.end())));
    }
    return s;
  }

  /**
   * The two-part wall on quadratic elements of 0.0125 through the thickness (its space error far
   * below the time error) to t = 0.5 with fixed steps, the run's own time stepping (Crank–Nicolson
   * with its damped start of two backward-Euler steps): L² errors of c at t = 0.5.
   */
  static double[] timeErrors(boolean crank, int[] stepCounts) {
    TetMesh mesh = MidEdgeNodes.promote(TwoPartWall.mesh(1, 32, 48, 1));
    DiffusionModel model = TwoPartWall.model(mesh);
    double[] errors = new double[stepCounts.length];
    for (int i = 0; i < stepCounts.length; i++) {
      double dt = TIME_END / stepCounts[i];
      TimeSettings settings =
          new TimeSettings(TIME_END, new double[] {TIME_END}, crank, Double.NaN, dt, dt, dt);
      errors[i] = errorAtEnd(mesh, model, settings);
    }
    return errors;
  }

  /** The same wall with adaptive steps at each tolerance: L² errors of c at t = 0.5. */
  static double[] adaptiveErrors(boolean crank, double[] tolerances) {
    TetMesh mesh = MidEdgeNodes.promote(TwoPartWall.mesh(1, 32, 48, 1));
    DiffusionModel model = TwoPartWall.model(mesh);
    double[] errors = new double[tolerances.length];
    for (int i = 0; i < tolerances.length; i++) {
      TimeSettings settings =
          new TimeSettings(
              TIME_END,
              new double[] {TIME_END},
              crank,
              tolerances[i],
              Double.NaN,
              TIME_END * 1e-6,
              TIME_END);
      errors[i] = errorAtEnd(mesh, model, settings);
    }
    return errors;
  }

  private static double errorAtEnd(TetMesh mesh, DiffusionModel model, TimeSettings settings) {
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-13, 5000);
    double[] phi =
        TransientRun.run(stepper, model.initialPhi(), settings, (t, dt, out, output) -> {})
            .finalPhi();
    return ErrorNorms.of(mesh, phi, TwoPartWall.solubility(mesh), TwoPartWall.at(TIME_END)).l2();
  }

  /** The slope of log(error) against log(x) between successive entries. */
  static double[] slopes(double[] x, double[] error) {
    double[] s = new double[x.length - 1];
    for (int i = 0; i + 1 < x.length; i++) {
      s[i] = Math.log(error[i] / error[i + 1]) / Math.log(x[i] / x[i + 1]);
    }
    return s;
  }

  /** The checks `verify` lists: space orders of both cases, time orders of both schemes. */
  public static List<Check> checks() {
    List<Check> all = new ArrayList<>();
    for (Case c : List.of(WALL, BOX)) {
      for (int order = 1; order <= 2; order++) {
        all.addAll(space(c, order).checks(BAND, BAND));
      }
    }
    int[] counts = {8, 16, 32};
    double[] dts = {TIME_END / 8, TIME_END / 16, TIME_END / 32};
    for (boolean crank : new boolean[] {false, true}) {
      double[] slope = slopes(dts, timeErrors(crank, counts));
      all.add(
          Check.order(
              String.format(
                  Locale.ROOT,
                  "%s, time order of the L2 error at t=0.5, dt=T/16 to T/32 (T/8 to T/16: %.2f)",
                  crank ? "Crank-Nicolson (damped start)" : "backward Euler",
                  slope[0]),
              WALL_SOURCE + "; theta scheme order (common practice)",
              crank ? 2 : 1,
              slope[1],
              BAND));
    }
    all.addAll(adaptiveChecks());
    return all;
  }

  /**
   * How the error at the end follows the adaptive steps' tolerance, from 1e-2 to 1e-5. The step
   * control holds each step's local error estimate to the tolerance (TransientRun).
   * Crank–Nicolson's own local error is a power of dt higher than the backward-Euler-type estimate,
   * so its steps grow as √tol and its global error as dt² ∝ tol: in proportion. Backward Euler's
   * global error is the sum of about T/dt local errors of size tol, with dt ∝ √tol: it falls only
   * as √tol (common practice for error-per-step control of a first-order scheme). Both are checked
   * as measured: the order of the error in the tolerance over the three decades.
   */
  static List<Check> adaptiveChecks() {
    double[] tol = {1e-2, 1e-3, 1e-4, 1e-5};
    List<Check> checks = new ArrayList<>();
    for (boolean crank : new boolean[] {false, true}) {
      double[] e = adaptiveErrors(crank, tol);
      double[] perDecade = slopes(tol, e);
      double overall = Math.log(e[0] / e[3]) / Math.log(tol[0] / tol[3]);
      checks.add(
          Check.order(
              String.format(
                  Locale.ROOT,
                  "%s, adaptive steps: order of the error in the tolerance, 1e-2 to 1e-5"
                      + " (per decade %.2f, %.2f, %.2f)",
                  crank ? "Crank-Nicolson" : "backward Euler",
                  perDecade[0],
                  perDecade[1],
                  perDecade[2]),
              WALL_SOURCE + "; error-per-step control (common practice)",
              crank ? 1 : 0.5,
              overall,
              crank ? 0.3 : 0.2));
    }
    return checks;
  }
}
