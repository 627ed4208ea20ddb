package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.post.SpaceErrorEstimate;
import dev.soakfield.fem.post.TimeErrorTrack;
import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The run's own accuracy estimate held against the true error, which must lie within a factor of 3
 * of it: in space (the recovered-gradient estimate of the amount, linear elements) on the sphere
 * against Crank's eq. 6.18 and on both manufactured solutions; in time (the estimate from the
 * accepted steps) on the plane sheet against Crank's eq. 4.18, backward Euler and Crank–Nicolson,
 * with fixed and with adaptive steps.
 */
public final class AccuracyEstimates {
  private static final String SPACE = "recovered-gradient estimate of the amount error";
  private static final String TIME = "time-error estimate of the uptake from the accepted steps";

  private AccuracyEstimates() {}

  /** The ratio estimate / true error as two checks, at least 1/3 and at most 3. */
  static List<Check> bracket(String name, String source, double estimate, double truth) {
    double ratio = estimate / truth;
    String label = String.format(Locale.ROOT, "%s: estimate/true error (true %.2e)", name, truth);
    return List.of(
        Check.atLeast(label + ", at least 1/3", source, 1.0 / 3, ratio),
        Check.atMost(label + ", at most 3", source, 3, ratio));
  }

  /** Space: the amount's estimated error against its true error at the end of a smooth run. */
  static double[] space(
      TetMesh mesh, DiffusionModel m, double[] tetS, ExactField end, double span) {
    double[] phi = RoundParts.crankNicolson(m, span, 48);
    double truth =
        Math.abs(ErrorNorms.integral(mesh, phi, tetS) - ErrorNorms.exactIntegral(mesh, end));
    return new double[] {SpaceErrorEstimate.of(mesh, phi, tetS).amountError(), truth};
  }

  /**
   * Time: a sheet of quadratic elements fine enough that its space error is negligible (80 cells),
   * both faces held at 1 from t = 0 (D = 1, L = 1), to D t/L² = {@code end} with 20 steps.
   */
  static double[] time(boolean crank, double end) {
    double dt = end / 20;
    return time(new TimeSettings(end, new double[] {end}, crank, Double.NaN, dt, dt, dt));
  }

  /**
   * The same sheet with adaptive steps at {@code tolerance}, from a first step of 1e-6 of the end.
   */
  static double[] timeAdaptive(boolean crank, double end, double tolerance) {
    return time(
        new TimeSettings(end, new double[] {end}, crank, tolerance, Double.NaN, end * 1e-6, end));
  }

  /** The sheet run with {@code s}: {estimated, true} time error of the uptake, Crank eq. 4.18. */
  private static double[] time(TimeSettings s) {
    boolean crank = s.crankNicolson();
    double end = s.end();
    TetMesh mesh = StructuredMesher.box(1, 0.1, 0.1, 80, 1, 1, 2);
    DiffusionModel m =
        UniformModels.model(
            mesh,
            new double[] {1},
            new double[] {1},
            new double[] {0},
            0,
            Map.of(
                "xmin", UniformModels.Condition.concentration(1.0),
                "xmax", UniformModels.Condition.concentration(1.0)));
    ThetaStepper stepper = new ThetaStepper(m, false, 1e-13, 5000);
    TimeErrorTrack track = new TimeErrorTrack(1);
    int[] steps = {0};
    double[] last = {0};
    TransientRun.run(
        stepper,
        m.initialPhi(),
        s,
        new StepListener() {
          @Override
          public void started(StepOutcome o) {
            track.start(0, new double[] {o.amount()});
          }

          @Override
          public void accepted(double t, double h, StepOutcome o, boolean output) {
            track.step(
                t, h, TimeSettings.thetaOfStep(crank, steps[0]++), new double[] {o.amount()});
            last[0] = o.amount();
          }
        });
    double volume = 0.01;
    double truth = Math.abs(last[0] / volume - uptake(end));
    return new double[] {track.estimates()[0] / volume, truth};
  }

  /**
   * Crank (1975) eq. 4.18, M_t/M_∞ = 1 − Σ 8/((2n+1)²π²)·exp(−(2n+1)²π²τ), τ = D t/L², L the full
   * thickness.
   */
  static double uptake(double tau) {
    double s = 0;
    for (int n = 0; n < 4000; n++) {
      double k = (2 * n + 1) * Math.PI;
      s += 8 / (k * k) * Math.exp(-k * k * tau);
    }
    return 1 - s;
  }

  /** The checks `verify` lists. */
  public static List<Check> checks() {
    List<Check> all = new ArrayList<>();
    TetMesh ball = TestMeshes.ball(1, 8, 3);
    DiffusionModel sphere =
        UniformModels.startingFrom(
            UniformModels.model(
                ball,
                new double[] {1},
                new double[] {1},
                new double[] {0},
                0,
                UniformModels.allHeld(ball, 1)),
            UniformModels.atNodes(ball, RoundSeries.sphere(1, 1, 0.02)));
    double[] r =
        space(
            ball,
            sphere,
            UniformModels.filled(ball.tetCount(), 1),
            RoundSeries.sphere(1, 1, 0.1),
            0.08);
    all.addAll(
        bracket(
            "sphere, linear, amount at Dt/a^2=0.1", SPACE + "; Crank (1975) eq. 6.18", r[0], r[1]));
    TetMesh wall = TwoPartWall.mesh(2, 3);
    r =
        space(
            wall, TwoPartWall.model(wall), TwoPartWall.solubility(wall), TwoPartWall.at(0.2), 0.2);
    all.addAll(bracket("two parts (manufactured), linear, amount", SPACE, r[0], r[1]));
    TetMesh box = OrthotropicBox.mesh(2, 3);
    r =
        space(
            box,
            OrthotropicBox.model(box),
            OrthotropicBox.solubility(box),
            OrthotropicBox.at(0.05),
            0.05);
    all.addAll(bracket("turned orthotropic box (manufactured), linear, amount", SPACE, r[0], r[1]));
    for (boolean crank : new boolean[] {false, true}) {
      r = time(crank, 0.1);
      all.addAll(
          bracket(
              (crank ? "Crank-Nicolson" : "backward Euler")
                  + ", 20 fixed steps, sheet uptake at Dt/L^2=0.1",
              TIME + "; Crank (1975) eq. 4.18",
              r[0],
              r[1]));
    }
    all.addAll(adaptiveTimeChecks());
    return all;
  }

  /**
   * Time, adaptive steps: the sheet to D t/L² = 0.1 at tolerance 1e-3, backward Euler (error per
   * unit step) and Crank–Nicolson (error per step); measured ratios 0.93 and 1.01.
   */
  static List<Check> adaptiveTimeChecks() {
    List<Check> all = new ArrayList<>();
    for (boolean crank : new boolean[] {false, true}) {
      double[] r = timeAdaptive(crank, 0.1, 1e-3);
      all.addAll(
          bracket(
              (crank ? "Crank-Nicolson" : "backward Euler")
                  + ", adaptive steps at 1e-3, sheet uptake at Dt/L^2=0.1",
              TIME + "; Crank (1975) eq. 4.18",
              r[0],
              r[1]));
    }
    return all;
  }
}
